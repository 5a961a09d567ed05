//! `signature`: a disc's flight signature (a fixed battery of test throws) on our own scales,
//! as a table and a chart of the landing offset against release speed.
use super::control::watched;
use super::result::StudyValue;
use super::sweep::plain_name;
use crate::help::{FnDoc, Registrar};
use crate::packages::args::{value_error, Fallible};
use crate::packages::compare::items_of;
use crate::packages::{DiscValue, PackageContext};
use crate::{Axis, Cell, LineChart, Series, Table};
use rhai::{Array, NativeCallContext};
use spinfoil_engine::{flight_signature, CaseDisc, CaseModel, FlightSignature, StudyCase, SIGNATURE_SCALES};

/// Registers `signature` for one disc or an array of discs.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    let c = context.clone();
    reg.engine.register_fn("signature", move |ctx: NativeCallContext, d: DiscValue| signature(&ctx, &c, vec![d]));
    let c = context.clone();
    reg.engine.register_fn("signature", move |ctx: NativeCallContext, items: Array| {
        let discs = items_of::<DiscValue>(&ctx, &items, "Disc")?;
        signature(&ctx, &c, discs)
    });
    reg.doc(FnDoc::new(
        "signature(discs: Disc or array of Disc) -> Study",
        "Each disc's flight signature: a fixed battery of right-hand backhand throws (flat, launch 10°, nose 0°, 1 m high, 16/20/24/28 m/s, spin with ωR/V = 0.5, sea-level standard calm air) reduced to high-speed turn (m, at 28 m/s), low-speed fade (m, at 16 m/s), glide (s aloft at 20 m/s), carry at 24 m/s (m) and the set's lift-to-drag ratio at 5°. The chart draws each disc's landing offset toward the fade side (m) against release speed (m/s): a curve that rises steeply marks a disc that fades hard when thrown slowly; one below zero at high speed marks high-speed turn.",
        "signature([one_piece, rim_heavy])",
    ));
}

fn signature(ctx: &NativeCallContext, context: &PackageContext, discs: Vec<DiscValue>) -> Fallible<StudyValue> {
    let mut signatures = Vec::new();
    for disc in &discs {
        let case = StudyCase::new(
            CaseDisc::Design { design: disc.design.clone() },
            CaseModel::linear(disc.aero.clone()),
            spinfoil_engine::signature_release(20.0, disc.report.outline.diameter_m()),
        );
        let what = format!("signature of {}", disc.design.name);
        let sig = watched(ctx, context, &what, 4, |control| flight_signature(&case, control))?;
        signatures.push((disc.design.name.clone(), sig));
    }
    if signatures.is_empty() {
        return Err(value_error(ctx, "give at least one disc".into()));
    }
    Ok(signature_value(&signatures))
}

/// The table and chart of the signatures of named discs.
pub(crate) fn signature_value(signatures: &[(String, FlightSignature)]) -> StudyValue {
    let mut table = Table::new("Flight signatures").column("design", "", 0);
    for (name, unit, _) in SIGNATURE_SCALES {
        table = table.column(plain_name(name), unit, if unit == "1" { 2 } else { 1 });
    }
    for (name, sig) in signatures {
        let mut row = vec![Cell::from(name.as_str())];
        row.extend(sig.scales.iter().map(|s| Cell::Number(s.value)));
        table = table.row(row);
    }
    for (_, _, meaning) in SIGNATURE_SCALES {
        table = table.note(meaning);
    }
    let mut chart = LineChart::new(
        "Fade against release speed",
        Axis::new("release speed", "m/s"),
        Axis::new("landing offset, fade side positive", "m"),
    );
    chart.subtitle = Some("Signature battery: flat backhand, launch 10°, ωR/V = 0.5, calm standard air".into());
    chart.zero_line = true;
    for (name, sig) in signatures {
        let points = sig.throws.iter().map(|t| (t.speed_mps, t.landing_lateral_m)).collect();
        chart = chart.series(Series::new(name.clone(), points));
    }
    StudyValue::new(table.note(crate::SAFETY_CAUTION), &chart)
}
