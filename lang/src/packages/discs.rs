//! Discs: outline + layup + aerodynamics + target mass, with mass properties and the standard's
//! warnings readable as fields.
use super::aero_choice::{aero_by_name, default_aero_name, AERO_NAMES};
use super::args::{design_error, options, Fallible};
use super::outlines::OutlineValue;
use crate::help::{FnDoc, Registrar};
use crate::options::OptionSpec;
use rhai::{Array, Dynamic, Map, NativeCallContext};
use spinfoil_engine::{DesignReport, Dimension, DiscBody, DiscDesign, Layup, LinearCoefficients, MassTarget};

/// A disc as scripts hold it: the design, its evaluated report and its coefficient set.
#[derive(Debug, Clone)]
pub(crate) struct DiscValue {
    /// The design (outline, layup, target), as saved.
    pub design: DiscDesign,
    /// Mass properties, region shares, target outcome and standard checks.
    pub report: DesignReport,
    /// Name of the coefficient set (one of the `aero` choices).
    pub aero_name: String,
    /// The coefficient set.
    pub aero: LinearCoefficients,
}

impl DiscValue {
    /// Evaluates `design` with the coefficient set `aero_name`.
    pub fn evaluate(design: DiscDesign, aero_name: &str) -> Result<Self, String> {
        let aero = aero_by_name(aero_name)
            .ok_or_else(|| format!("unknown aero set '{aero_name}'; known: {}", AERO_NAMES.join(", ")))?;
        let report = design.evaluate().map_err(|e| e.to_string())?;
        Ok(Self { design, report, aero_name: aero_name.to_string(), aero })
    }

    /// The rigid body the flight integrator needs.
    pub fn body(&self) -> DiscBody {
        DiscBody::from_mass_properties(&self.report.properties, self.report.outline.diameter_m())
    }

    /// The standard's failed rules, as sentences.
    pub fn warnings(&self) -> Vec<String> {
        self.report.warnings().iter().map(|c| c.to_string()).collect()
    }
}

const MASS_BY: &[&str] = &["densities", "plate_mm", "rim_depth_cm", "dome_mm", "rim_width_cm"];

const DISC_OPTIONS: &[OptionSpec] = &[
    OptionSpec::optional("mass_g", 1.0, 10_000.0, "target mass; without it the mass is what the densities give"),
    OptionSpec::choice(
        "meet_mass_by",
        MASS_BY,
        "how the target mass is met: scale every density (default) or change one outline dimension",
    ),
    OptionSpec::choice("aero", AERO_NAMES, "coefficient set (default: the invented demo set of the outline's family)"),
];

/// Registers `disc`, `compare_mass` and the `Disc` type.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section(
        "discs",
        "an outline, a layup, aerodynamics and a target mass: mass properties and the standard's checks",
    );
    reg.engine.register_type_with_name::<DiscValue>("Disc");
    reg.engine.register_fn("disc", disc);
    reg.engine.register_fn("disc", |ctx: NativeCallContext, name: &str, o: OutlineValue, l: Layup| {
        disc(ctx, name, o, l, Map::new())
    });
    reg.doc(
        FnDoc::new(
            "disc(name: string, outline: Outline, layup: Layup, options: map) -> Disc",
            "A disc design: its mass properties (mass, centre of mass, I_z, I_x) and the sport standard's checks are computed at once. The options map may be left out.",
            "let d = disc(\"P-7 rim-heavy\", driver_outline(#{ diameter_cm: 21.1 }),\n    rim_layup(material(\"dense rim blend\", 1.24), material(\"soft base blend\", 0.95), #{ split_radius_cm: 8.4 }),\n    #{ mass_g: 174 });\nd.spin_inertia_g_cm2",
        )
        .with_options(DISC_OPTIONS),
    );
    register_fields(reg);
    super::compare::register_compare_mass(reg);
}

fn register_fields(reg: &mut Registrar) {
    let p = |d: &DiscValue| d.report.properties;
    reg.getter("Disc", "name", "the design's name", |d: &mut DiscValue| d.design.name.clone());
    reg.getter("Disc", "mass_g", "mass, g", move |d: &mut DiscValue| p(d).mass_kg * 1000.0);
    reg.getter(
        "Disc",
        "spin_inertia_g_cm2",
        "moment of inertia about the spin axis I_z, g·cm²",
        move |d: &mut DiscValue| p(d).spin_inertia_kg_m2 * 1e7,
    );
    reg.getter(
        "Disc",
        "transverse_inertia_g_cm2",
        "moment of inertia about a diameter through the centre of mass I_x, g·cm²",
        move |d: &mut DiscValue| p(d).transverse_inertia_kg_m2 * 1e7,
    );
    reg.getter(
        "Disc",
        "cg_height_mm",
        "height of the centre of mass above the rim bottom, mm",
        move |d: &mut DiscValue| p(d).cg_height_m * 1000.0,
    );
    reg.getter(
        "Disc",
        "spin_gyration_radius_mm",
        "radius of gyration about the spin axis √(I_z/m), mm",
        move |d: &mut DiscValue| p(d).spin_radius_of_gyration_m() * 1000.0,
    );
    reg.getter(
        "Disc",
        "transverse_gyration_radius_mm",
        "radius of gyration about a diameter √(I_x/m), mm",
        move |d: &mut DiscValue| p(d).transverse_radius_of_gyration_m() * 1000.0,
    );
    reg.getter("Disc", "diameter_cm", "outside diameter, cm", |d: &mut DiscValue| {
        d.report.outline.diameter_m() * 100.0
    });
    reg.getter("Disc", "volume_cm3", "volume of plastic, cm³", |d: &mut DiscValue| d.report.volume_m3 * 1e6);
    reg.getter("Disc", "aero", "name of the coefficient set", |d: &mut DiscValue| d.aero_name.clone());
    reg.getter(
        "Disc",
        "warnings",
        "the sport standard's failed rules, as sentences (empty when it passes)",
        |d: &mut DiscValue| -> Array { d.warnings().into_iter().map(Dynamic::from).collect() },
    );
    reg.getter(
        "Disc",
        "checks",
        "every rule of the standard that could be checked, passed or not",
        |d: &mut DiscValue| -> Array { d.report.standard.iter().map(|c| Dynamic::from(c.to_string())).collect() },
    );
    reg.getter("Disc", "mass_target", "how the target mass was met", |d: &mut DiscValue| {
        format!("{:?}", d.report.target)
    });
    reg.text(|d: &mut DiscValue| {
        format!(
            "disc \"{}\": {:.1} g, I_z {:.0} g·cm²",
            d.design.name,
            d.report.properties.mass_kg * 1000.0,
            d.report.properties.spin_inertia_kg_m2 * 1e7
        )
    });
}

fn disc(ctx: NativeCallContext, name: &str, outline: OutlineValue, layup: Layup, opts: Map) -> Fallible<DiscValue> {
    let values = options(&ctx, &opts, DISC_OPTIONS)?;
    let target = match (values.number("mass_g"), values.text("meet_mass_by")) {
        (None, Some(_)) => return Err(values.error("meet_mass_by needs mass_g")),
        (None, None) => MassTarget::AsDesigned,
        (Some(g), None | Some("densities")) => MassTarget::ScaleDensities { mass_kg: g / 1000.0 },
        (Some(g), Some(key)) => MassTarget::SolveDimension { mass_kg: g / 1000.0, dimension: dimension_of(key) },
    };
    let aero_name = values.text("aero").unwrap_or_else(|| default_aero_name(&outline.source)).to_string();
    let design = DiscDesign::new(name, outline.source, layup).with_target(target);
    DiscValue::evaluate(design, &aero_name).map_err(|e| design_error(&ctx, e))
}

fn dimension_of(key: &str) -> Dimension {
    match key {
        "rim_depth_cm" => Dimension::RimDepth,
        "dome_mm" => Dimension::DomeHeight,
        "rim_width_cm" => Dimension::RimWidth,
        _ => Dimension::PlateThickness,
    }
}
