//! Charts of discs and flights, drawn by the display module from plain data.
use super::args::{design_error, Fallible};
use super::compare::items_of;
use super::discs::DiscValue;
use super::flights::FlightValue;
use crate::help::{FnDoc, Registrar};
use crate::output::MimeBundle;
use crate::{
    Axis, CoefficientCurves, CrossSection, MassBars, Panel, PlanView, Render, Series, SideView, TimeSeries, Track,
};
use rhai::{Array, NativeCallContext};
use spinfoil_engine::fill_outline;

/// A drawn chart as scripts hold it: its rendering (SVG plus a text summary).
#[derive(Debug, Clone)]
pub(crate) struct ChartValue {
    /// The rendering.
    pub bundle: MimeBundle,
}

impl ChartValue {
    fn of(chart: &impl Render) -> Self {
        Self { bundle: chart.render() }
    }
}

const RPM_PER_RAD_S: f64 = 60.0 / std::f64::consts::TAU;

/// Registers the chart functions and the `Chart` type.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("charts", "pictures of flights and discs (SVG in notebooks, a short summary in a terminal)");
    reg.engine.register_type_with_name::<ChartValue>("Chart");
    reg.engine
        .register_fn("to_svg", |c: &mut ChartValue| c.bundle.data.get("image/svg+xml").cloned().unwrap_or_default());
    reg.doc(FnDoc::new(
        "to_svg(chart: Chart) -> string",
        "The chart as SVG text (save it with save_text).",
        "save_text(plan_view([a, b]).to_svg(), \"plan.svg\");",
    ));
    reg.text(|c: &mut ChartValue| c.bundle.text_plain().unwrap_or_default().to_string());
    register_flight_charts(reg);
    register_disc_charts(reg);
}

fn flights_arg(ctx: &NativeCallContext, items: Array) -> Fallible<Vec<FlightValue>> {
    items_of::<FlightValue>(ctx, &items, "Flight")
}

fn register_flight_charts(reg: &mut Registrar) {
    reg.engine.register_fn("plan_view", |ctx: NativeCallContext, items: Array| {
        Ok::<_, Box<rhai::EvalAltResult>>(ChartValue::of(&plan_view(&flights_arg(&ctx, items)?)))
    });
    reg.engine.register_fn("plan_view", |f: FlightValue| ChartValue::of(&plan_view(&[f])));
    reg.doc(FnDoc::new("plan_view(flights: Flight or array of Flight) -> Chart", "Ground tracks seen from above: downrange x (m) against lateral y (m, left positive), landing points marked, with the safety caution.", "plan_view([fly(a, arm, day), fly(b, arm, day)])"));
    reg.engine.register_fn("side_view", |ctx: NativeCallContext, items: Array| {
        Ok::<_, Box<rhai::EvalAltResult>>(ChartValue::of(&side_view(&flights_arg(&ctx, items)?)))
    });
    reg.engine.register_fn("side_view", |f: FlightValue| ChartValue::of(&side_view(&[f])));
    reg.doc(FnDoc::new(
        "side_view(flights: Flight or array of Flight) -> Chart",
        "Height z (m) against downrange x (m).",
        "side_view(fly(d, t))",
    ));
    reg.engine.register_fn("time_series", |ctx: NativeCallContext, items: Array| {
        Ok::<_, Box<rhai::EvalAltResult>>(ChartValue::of(&time_series(&flights_arg(&ctx, items)?)))
    });
    reg.engine.register_fn("time_series", |f: FlightValue| ChartValue::of(&time_series(&[f])));
    reg.doc(FnDoc::new("time_series(flights: Flight or array of Flight) -> Chart", "Speed (m/s), spin (rpm), roll (°, hyzer positive), angle of attack (°) and wobble (°) against time (s), one panel each. The wobble panel shows a thin band even for a clean release: the pitching moment keeps the wobble angle oscillating at the cone rate (about twice the spin rate, some 30 Hz at 900 rpm; see wobble_frequency_hz), faster than samples 10 ms apart can draw as a smooth wave; read the band's middle as the wobble and its width as that oscillation.", "time_series([a, b])"));
}

fn register_disc_charts(reg: &mut Registrar) {
    reg.engine.register_fn("cross_section", |ctx: NativeCallContext, d: DiscValue| cross_section(&ctx, &d));
    reg.doc(FnDoc::new(
        "cross_section(disc: Disc) -> Chart",
        "The disc's cross-section (mm) with its layup regions shaded by material.",
        "cross_section(rim_heavy)",
    ));
    reg.engine.register_fn("mass_bars", |ctx: NativeCallContext, items: Array| {
        Ok::<_, Box<rhai::EvalAltResult>>(ChartValue::of(&mass_bars(&items_of::<DiscValue>(&ctx, &items, "Disc")?)))
    });
    reg.doc(FnDoc::new(
        "mass_bars(discs: array of Disc) -> Chart",
        "Bars of the spin and transverse moments of inertia I_z and I_x (g·cm²) of several discs.",
        "mass_bars([one_piece, rim_heavy])",
    ));
    reg.engine.register_fn("coefficient_curves", |d: DiscValue| ChartValue::of(&coefficient_curves(&d)));
    reg.doc(FnDoc::new("coefficient_curves(disc: Disc) -> Chart", "The disc's lift, drag and pitching-moment coefficients against angle of attack (−10° to 30°), with the set's source.", "coefficient_curves(d)"));
}

fn track_points(f: &FlightValue, pick: fn(&nalgebra::Vector3<f64>) -> (f64, f64)) -> Track {
    let points = f.flight.samples.iter().map(|s| pick(&s.position_m)).collect();
    let track = Track::new(f.label.clone(), points).landing(pick(&f.flight.metrics.landing_position_m));
    match &f.ground {
        Some(ground) => track
            .rest(pick(&ground.rest_position_m))
            .ground(ground.samples.iter().map(|s| pick(&s.position_m)).collect()),
        None => track,
    }
}

fn plan_view(flights: &[FlightValue]) -> PlanView {
    flights.iter().fold(PlanView::new("Ground tracks"), |chart, f| chart.track(track_points(f, |p| (p.x, p.y))))
}

fn side_view(flights: &[FlightValue]) -> SideView {
    flights
        .iter()
        .fold(SideView::new("Height along the flight"), |chart, f| chart.track(track_points(f, |p| (p.x, p.z))))
}

type SampleValue = fn(&spinfoil_engine::FlightSample) -> f64;

const PANELS: [(&str, &str, SampleValue); 5] = [
    ("speed", "m/s", |s| s.velocity_mps.norm()),
    ("spin", "rpm", |s| s.spin_rad_s.abs() * RPM_PER_RAD_S),
    ("roll", "°", |s| s.roll_rad.to_degrees()),
    ("angle of attack", "°", |s| s.angle_of_attack_rad.to_degrees()),
    ("wobble", "°", |s| s.wobble_rad.to_degrees()),
];

fn time_series(flights: &[FlightValue]) -> TimeSeries {
    let mut chart = TimeSeries::new("Flight over time");
    for (name, unit, get) in PANELS {
        let panel = flights.iter().fold(Panel::new(Axis::new(name, unit)), |panel, f| {
            panel.series(Series::new(f.label.clone(), f.flight.samples.iter().map(|s| (s.time_s, get(s))).collect()))
        });
        chart = chart.panel(panel);
    }
    chart
}

fn cross_section(ctx: &NativeCallContext, d: &DiscValue) -> Fallible<ChartValue> {
    let regions = fill_outline(&d.report.outline, &d.report.layup).map_err(|e| design_error(ctx, e))?;
    let mut chart = CrossSection::new(format!("Cross-section of {}", d.design.name));
    for region in &regions {
        for piece in &region.pieces {
            let mm = piece.iter().map(|p| (p.r_m * 1000.0, p.z_m * 1000.0)).collect();
            chart = chart.region(region.material.name.clone(), region.material.density_g_cm3(), mm);
        }
    }
    Ok(ChartValue::of(&chart))
}

fn mass_bars(discs: &[DiscValue]) -> MassBars {
    let quantities = vec!["I_z (spin)".to_string(), "I_x (transverse)".to_string()];
    discs.iter().fold(
        MassBars::new("Moments of inertia", Axis::new("moment of inertia", "g·cm²"), quantities),
        |chart, d| {
            let p = d.report.properties;
            chart.group(d.design.name.clone(), vec![p.spin_inertia_kg_m2 * 1e7, p.transverse_inertia_kg_m2 * 1e7])
        },
    )
}

fn coefficient_curves(d: &DiscValue) -> CoefficientCurves {
    let alphas: Vec<f64> = (-10..=30).map(f64::from).collect();
    let curve = |f: &dyn Fn(f64) -> f64| alphas.iter().map(|a| (*a, f(a.to_radians()))).collect::<Vec<_>>();
    let aero = &d.aero;
    CoefficientCurves::new(format!("Coefficients of {} ({})", d.design.name, d.aero_name), aero.info.source.clone())
        .curve("lift C_L", curve(&|a| aero.lift(a)))
        .curve("drag C_D", curve(&|a| aero.drag(a)))
        .curve("pitching moment C_M", curve(&|a| aero.static_pitch(a)))
}
