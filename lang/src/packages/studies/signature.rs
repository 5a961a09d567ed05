//! `signature`: a disc's flight signature (a fixed battery of test throws) on our own scales,
//! as a table and a chart of turn bank and fade hook against release speed.
use super::control::watched;
use super::result::StudyValue;
use super::sweep::plain_name;
use crate::help::{FnDoc, Registrar};
use crate::packages::args::{value_error, Fallible};
use crate::packages::compare::items_of;
use crate::packages::{DiscValue, PackageContext};
use crate::{Axis, Cell, GroupedLines, Table};
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
        "Each disc's flight signature: a fixed battery of right-hand backhand throws (flat, launch 10°, nose 0°, 1 m high, 16/20/24/28 m/s, sea-level standard calm air) with the same effort for every disc: the spin's kinetic energy is 0.2 of the translational one, so a rim-heavy disc spins slower but carries more angular momentum. Scales (angles, so they do not grow with carry): high_speed_turn_deg, the greatest bank toward the turn side (anhyzer) at 28 m/s (°, 0 for a disc that never rolls past flat); low_speed_fade_deg, how far the ground track hooks toward the fade side from the apex to landing at 16 m/s (°); glide_s, time aloft at 20 m/s (s); carry_at_24_m (m); lift_to_drag_at_5deg, the set's lift-to-drag ratio at 5°. The chart draws, against release speed, each disc's greatest turn bank (below zero) and its fade hook after the apex (above zero), in degrees toward the fade side.",
        "signature([one_piece, rim_heavy])",
    ));
}

fn signature(ctx: &NativeCallContext, context: &PackageContext, discs: Vec<DiscValue>) -> Fallible<StudyValue> {
    let mut signatures = Vec::new();
    for disc in &discs {
        let case = StudyCase::new(
            CaseDisc::Design { design: disc.design.clone() },
            CaseModel::linear(disc.aero.clone()),
            spinfoil_engine::signature_release(20.0, disc.report.properties.mass_kg, disc.report.properties.spin_inertia_kg_m2),
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
    let mut chart = GroupedLines::new(
        "Turn and fade against release speed",
        Axis::new("release speed", "m/s"),
        Axis::new("angle, fade side positive", "°"),
    );
    chart.subtitle = Some("Colour and marker: design; turn bank below zero, the hook after the apex above. Battery: flat right-hand backhand, launch 10°, spin energy 0.2 of the translational, calm air".into());
    chart.zero_line = true;
    for (name, sig) in signatures {
        let turn = sig.throws.iter().map(|t| (t.speed_mps, -t.turn_bank_deg)).collect();
        chart = chart.line(name, "greatest turn bank", turn);
        let fade = sig.throws.iter().map(|t| (t.speed_mps, t.fade_hook_deg)).collect();
        chart = chart.line(name, "fade hook after apex", fade);
    }
    StudyValue::new(table.note(crate::SAFETY_CAUTION), &chart)
}
