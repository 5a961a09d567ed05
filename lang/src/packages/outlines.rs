//! Outlines: parametric cross-sections of putters, midranges and drivers, in cm and mm.
use super::args::{design_error, options, Fallible};
use crate::help::{FnDoc, Registrar};
use crate::options::OptionSpec;
use rhai::{Map, NativeCallContext};
use spinfoil_engine::{
    Dimension, DiscFamily, GeometryError, Outline, OutlineSource, ParametricOutline, RzPoint, SamplingSettings,
};

/// An outline as scripts hold it: how it was described and the polygon it builds to.
#[derive(Debug, Clone, PartialEq)]
pub(crate) struct OutlineValue {
    /// The description (kept for saving designs).
    pub source: OutlineSource,
    /// The sampled polygon, m.
    pub built: Outline,
}

/// Option keys of the outline functions: (key, dimension, metres per unit).
const KEYS: [(&str, Dimension, f64); 8] = [
    ("diameter_cm", Dimension::Diameter, 0.01),
    ("rim_width_cm", Dimension::RimWidth, 0.01),
    ("rim_depth_cm", Dimension::RimDepth, 0.01),
    ("rim_thickness_cm", Dimension::RimThickness, 0.01),
    ("plate_mm", Dimension::PlateThickness, 0.001),
    ("dome_mm", Dimension::DomeHeight, 0.001),
    ("edge_radius_mm", Dimension::LeadingEdgeRadius, 0.001),
    ("parting_line_cm", Dimension::PartingLineHeight, 0.01),
];

pub(crate) const OUTLINE_OPTIONS: &[OptionSpec] = &[
    OptionSpec::optional("diameter_cm", 1.0, 200.0, "outside diameter (family default)"),
    OptionSpec::optional("rim_width_cm", 0.0, 100.0, "radial width of the rim, outer edge to inner rim wall"),
    OptionSpec::optional("rim_depth_cm", 0.0, 50.0, "inner rim depth, rim bottom to plate underside"),
    OptionSpec::optional("rim_thickness_cm", 0.0, 50.0, "vertical thickness of the nose at the outer edge"),
    OptionSpec::optional("plate_mm", 0.0, 100.0, "flight-plate thickness"),
    OptionSpec::optional("dome_mm", 0.0, 500.0, "rise of the flight plate from the inner rim wall to the centre"),
    OptionSpec::optional("edge_radius_mm", 0.0, 100.0, "radius of the rounded leading edge"),
    OptionSpec::optional("parting_line_cm", 0.0, 50.0, "height of the middle of the nose above the rim bottom"),
];

/// Registers the outline functions and the `Outline` type.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("outlines", "cross-sections of a disc (parametric families of our own design)");
    reg.engine.register_type_with_name::<OutlineValue>("Outline");
    for (name, family) in [
        ("putter_outline", DiscFamily::Putter),
        ("midrange_outline", DiscFamily::Midrange),
        ("driver_outline", DiscFamily::Driver),
    ] {
        reg.engine.register_fn(name, move |ctx: NativeCallContext, opts: Map| outline(&ctx, family, &opts));
        reg.engine.register_fn(name, move |ctx: NativeCallContext| outline(&ctx, family, &Map::new()));
        let doc = format!("{name}(options: map) -> Outline");
        let summary = format!(
            "A parametric {} cross-section; dimensions not given take the family's defaults. Each dimension is checked against the others (e.g. the rim must leave room for the flight plate).",
            family_name(family)
        );
        reg.doc(
            FnDoc::new(
                &doc,
                &summary,
                &format!("let o = {name}(#{{ diameter_cm: 21.1, rim_width_cm: 2.0, plate_mm: 2.0 }});"),
            )
            .with_options(OUTLINE_OPTIONS),
        );
    }
    reg.engine.register_fn("outline_points", outline_points);
    reg.doc(FnDoc::new(
        "outline_points(points: array of [r_cm, z_cm]) -> Outline",
        "An outline from measured points of the half cross-section: radius r from the axis and height z, in cm, in order around the section (at least 3; closed, no self-crossing, r ≥ 0).",
        "let o = outline_points([[0, 1.6], [10.55, 1.2], [10.55, 0.0], [8.4, 0.0], [8.4, 1.0], [0, 1.0]]);",
    ));
    register_fields(reg);
}

fn outline_points(ctx: NativeCallContext, points: rhai::Array) -> Fallible<OutlineValue> {
    let mut rz = Vec::with_capacity(points.len());
    for (i, point) in points.iter().enumerate() {
        let pair = point.read_lock::<rhai::Array>().map(|a| a.iter().map(number_of).collect::<Vec<_>>());
        match pair.as_deref() {
            Some([Some(r), Some(z)]) => rz.push(RzPoint::new(r / 100.0, z / 100.0)),
            _ => {
                return Err(super::args::value_error(
                    &ctx,
                    format!("point {i} must be [r_cm, z_cm] (two numbers), got {point}"),
                ))
            }
        }
    }
    let built = Outline::from_points(rz).map_err(|e| design_error(&ctx, e))?;
    Ok(OutlineValue { source: OutlineSource::Points(built.clone()), built })
}

fn number_of(value: &rhai::Dynamic) -> Option<f64> {
    value.as_float().ok().or_else(|| value.as_int().ok().map(|i| i as f64))
}

fn register_fields(reg: &mut Registrar) {
    reg.getter("Outline", "family", "\"putter\", \"midrange\", \"driver\" or \"points\"", |o: &mut OutlineValue| {
        source_family(&o.source)
    });
    reg.getter("Outline", "diameter_cm", "outside diameter, cm", |o: &mut OutlineValue| o.built.diameter_m() * 100.0);
    reg.getter("Outline", "rim_width_cm", "rim width, cm", |o: &mut OutlineValue| o.built.rim_width_m() * 100.0);
    reg.getter("Outline", "rim_depth_cm", "inner rim depth, cm", |o: &mut OutlineValue| o.built.rim_depth_m() * 100.0);
    reg.getter("Outline", "rim_thickness_cm", "nose thickness, cm", |o: &mut OutlineValue| {
        o.built.rim_thickness_m() * 100.0
    });
    reg.getter("Outline", "plate_mm", "flight-plate thickness, mm", |o: &mut OutlineValue| {
        o.built.plate_thickness_m() * 1000.0
    });
    reg.getter("Outline", "area_cm2", "area of the cross-section, cm²", |o: &mut OutlineValue| {
        o.built.area_m2() * 1e4
    });
    reg.text(|o: &mut OutlineValue| {
        format!(
            "{} outline, {:.1} cm across, rim {:.2} cm wide and {:.2} cm deep",
            source_family(&o.source),
            o.built.diameter_m() * 100.0,
            o.built.rim_width_m() * 100.0,
            o.built.rim_depth_m() * 100.0
        )
    });
}

fn outline(ctx: &NativeCallContext, family: DiscFamily, opts: &Map) -> Fallible<OutlineValue> {
    let values = options(ctx, opts, OUTLINE_OPTIONS)?;
    let mut parametric = ParametricOutline::new(family);
    for (key, dimension, metres) in KEYS {
        if let Some(v) = values.number(key) {
            parametric = parametric.with(dimension, v * metres);
        }
    }
    let given: Vec<Dimension> = KEYS.iter().filter(|(key, ..)| values.has(key)).map(|(_, d, _)| *d).collect();
    let built =
        parametric.build(&SamplingSettings::default()).map_err(|e| outline_error(ctx, &parametric, &given, e))?;
    Ok(OutlineValue { source: OutlineSource::Parametric(parametric), built })
}

/// Engine dimension errors restated in the script's keys and units, blaming a dimension the
/// script gave when one of those is out of its range.
fn outline_error(
    ctx: &NativeCallContext,
    outline: &ParametricOutline,
    given: &[Dimension],
    err: GeometryError,
) -> Box<rhai::EvalAltResult> {
    let GeometryError::DimensionOutOfRange { dimension, .. } = &err else { return design_error(ctx, err) };
    let out_of_range = |d: &Dimension| {
        let (lo, hi) = outline.allowed_range_m(*d);
        !(lo..=hi).contains(&outline.get(*d))
    };
    let blamed = given.iter().find(|d| out_of_range(d)).unwrap_or(dimension);
    let Some((key, _, metres)) = KEYS.iter().find(|(_, d, _)| d == blamed) else { return design_error(ctx, err) };
    let (lo, hi) = outline.allowed_range_m(*blamed);
    let short = |x: f64| crate::options::fmt_short(x / metres, 4);
    let why = if lo > hi { "; no value fits: change the other dimensions first" } else { "" };
    let message = format!(
        "{key} = {} is outside its allowed range {} to {} given the other dimensions{why}",
        short(outline.get(*blamed)),
        short(lo),
        short(hi)
    );
    design_error(ctx, message)
}

fn family_name(family: DiscFamily) -> &'static str {
    match family {
        DiscFamily::Putter => "putter",
        DiscFamily::Midrange => "midrange",
        DiscFamily::Driver => "driver",
    }
}

fn source_family(source: &OutlineSource) -> String {
    match source {
        OutlineSource::Parametric(p) => family_name(p.family).to_string(),
        OutlineSource::Points(_) => "points".to_string(),
    }
}
