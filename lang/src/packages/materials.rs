//! Materials: a name and a density (g/cm³).
use super::args::{design_error, number_arg, Fallible};
use crate::help::{FnDoc, Registrar};
use rhai::{Dynamic, NativeCallContext};
use spinfoil_engine::Material;

/// Registers `material` and the `Material` type.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("materials", "plastics and inserts: a name and a density");
    reg.engine.register_type_with_name::<Material>("Material");
    reg.engine.register_fn("material", material);
    reg.doc(FnDoc::new(
        "material(name: string, density_g_cm3: float) -> Material",
        "A material of a layup with its density in g/cm³ (1 g/cm³ = 1000 kg/m³), from 0 (exclusive) to 30.",
        "let plate = material(\"soft base blend\", 0.95);",
    ));
    reg.getter("Material", "name", "the material's name", |m: &mut Material| m.name.clone());
    reg.getter("Material", "density_g_cm3", "density, g/cm³", |m: &mut Material| m.density_g_cm3());
    reg.text(|m: &mut Material| format!("material \"{}\" ({:.3} g/cm³)", m.name, m.density_g_cm3()));
}

fn material(ctx: NativeCallContext, name: &str, density_g_cm3: Dynamic) -> Fallible<Material> {
    let density = number_arg(&ctx, "density_g_cm3", &density_g_cm3, f64::MIN, f64::MAX)?;
    Material::from_g_cm3(name, density).map_err(|e| design_error(&ctx, format!("{e}{}", kg_m3_hint(density))))
}

/// A hint for a density that reads like kg/m³ given where g/cm³ is expected (950 → 0.95).
fn kg_m3_hint(density: f64) -> String {
    if density > 30.0 && density <= 30_000.0 {
        let g_cm3 = density / 1000.0;
        format!("; material() takes g/cm³: for {density} kg/m³ write {g_cm3}")
    } else {
        String::new()
    }
}
