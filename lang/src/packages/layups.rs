//! Layups: which material fills which part of the outline.
use super::args::{options, Fallible};
use crate::help::{FnDoc, Registrar};
use crate::options::OptionSpec;
use rhai::{Array, Dynamic, Map, NativeCallContext};
use spinfoil_engine::{Layup, Material};

const RIM_OPTIONS: &[OptionSpec] =
    &[OptionSpec::number("split_radius_cm", 0.0, 100.0, "radius where the rim material meets the plate material")];
const RING_OPTIONS: &[OptionSpec] = &[
    OptionSpec::number("inner_radius_cm", 0.0, 100.0, "inner radius of the insert ring"),
    OptionSpec::number("outer_radius_cm", 0.0, 100.0, "outer radius of the insert ring"),
];

/// Registers the layup functions and the `Layup` type.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("layups", "how materials fill the cross-section");
    reg.engine.register_type_with_name::<Layup>("Layup");
    reg.engine.register_fn("single_layup", |m: Material| Layup::single(m));
    reg.doc(FnDoc::new(
        "single_layup(material: Material) -> Layup",
        "One material throughout the disc.",
        "let l = single_layup(material(\"base blend\", 0.95));",
    ));
    reg.engine.register_fn("rim_layup", rim_layup);
    reg.doc(
        FnDoc::new(
            "rim_layup(rim: Material, plate: Material, options: map) -> Layup",
            "Two materials (an overmold): `rim` outboard of the split radius, `plate` inboard.",
            "let l = rim_layup(material(\"dense rim blend\", 1.24), material(\"soft base blend\", 0.95), #{ split_radius_cm: 8.4 });",
        )
        .with_options(RIM_OPTIONS),
    );
    reg.engine.register_fn("ring_layup", ring_layup);
    reg.doc(
        FnDoc::new(
            "ring_layup(base: Material, insert: Material, options: map) -> Layup",
            "A base material with a dense insert ring between two radii, at all heights.",
            "let l = ring_layup(material(\"base\", 0.95), material(\"filled ring\", 2.1), #{ inner_radius_cm: 9.0, outer_radius_cm: 9.6 });",
        )
        .with_options(RING_OPTIONS),
    );
    reg.getter("Layup", "kind", "\"single\", \"overmold\" or \"regions\"", |l: &mut Layup| layup_kind(l).to_string());
    reg.getter("Layup", "materials", "the materials, in order", |l: &mut Layup| -> Array {
        l.materials().into_iter().map(|m| Dynamic::from(m.clone())).collect()
    });
    reg.text(|l: &mut Layup| {
        let names: Vec<String> = l.materials().iter().map(|m| m.name.clone()).collect();
        format!("{} layup of {}", layup_kind(l), names.join(", "))
    });
}

fn layup_kind(layup: &Layup) -> &'static str {
    match layup {
        Layup::Single { .. } => "single",
        Layup::Overmold { .. } => "overmold",
        Layup::Regions { .. } => "regions",
    }
}

fn rim_layup(ctx: NativeCallContext, rim: Material, plate: Material, opts: Map) -> Fallible<Layup> {
    let values = options(&ctx, &opts, RIM_OPTIONS)?;
    let split_cm = values.number("split_radius_cm").unwrap_or_default();
    Ok(Layup::overmold(plate, rim, split_cm / 100.0))
}

fn ring_layup(ctx: NativeCallContext, base: Material, insert: Material, opts: Map) -> Fallible<Layup> {
    let values = options(&ctx, &opts, RING_OPTIONS)?;
    let inner = values.number("inner_radius_cm").unwrap_or_default();
    let outer = values.number("outer_radius_cm").unwrap_or_default();
    if outer <= inner {
        return Err(values.error(&format!("outer_radius_cm = {outer} must be larger than inner_radius_cm = {inner}")));
    }
    Ok(Layup::insert_ring(base, insert, inner / 100.0, outer / 100.0))
}
