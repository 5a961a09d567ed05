//! `measured_from_csv`, `load_measured` and `calibrate`: fitting chosen coefficients of a disc's
//! linear set to measured flights, with standard errors and a residual chart.
use super::control::watched;
use super::options::{lists_only, take_list, text_list};
use super::result::StudyValue;
use super::sweep::plain_name;
use crate::help::{FnDoc, Registrar};
use crate::options::OptionSpec;
use crate::packages::args::{options, value_error, Fallible};
use crate::packages::{DiscValue, EnvironmentValue, PackageContext};
use crate::{Axis, Cell, LineChart, Series, Table};
use rhai::{Map, NativeCallContext};
use spinfoil_engine::{calibrate, parse_measured_flights, CalibrationResult, CalibrationSpec, CaseDisc, CaseModel, MeasuredFlight, StudyCase};

/// Measured flights as scripts hold them.
#[derive(Debug, Clone)]
pub(crate) struct MeasuredValue {
    /// The flights, in file order.
    pub flights: Vec<MeasuredFlight>,
}

const CALIBRATE_OPTIONS: &[OptionSpec] = &[
    OptionSpec::text("fit", "a list of coefficient names to fit, e.g. [\"model.drag_min\", \"model.lift_slope_per_rad\"] (see study_inputs())"),
    OptionSpec::optional("position_sd_m", 0.001, 100.0, "measurement uncertainty of positions (default 0.5)"),
    OptionSpec::optional("time_sd_s", 0.001, 10.0, "measurement uncertainty of times aloft (default 0.05)"),
    OptionSpec::integer("max_iterations", 1, 500, "solver patience: at most max_iterations × (coefficients + 1) Levenberg–Marquardt trial steps (default 30)"),
];

/// Registers the measured-flight functions and `calibrate`.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    reg.engine.register_type_with_name::<MeasuredValue>("MeasuredFlights");
    reg.engine.register_fn("measured_from_csv", |ctx: NativeCallContext, text: &str| measured(&ctx, text));
    reg.doc(FnDoc::new(
        "measured_from_csv(text: string) -> MeasuredFlights",
        "Measured flights from CSV text: a header naming the columns flight, speed_mps, spin_rps, launch_deg, nose_deg, hyzer_deg (heading_deg, height_m, style, hand optional), t_s, x_m, y_m and z_m (empty z_m: a landing point and time aloft). Rows with the same flight label belong to one flight. Errors name the line and column.",
        "let m = measured_from_csv(\"flight,speed_mps,spin_rps,launch_deg,nose_deg,hyzer_deg,t_s,x_m,y_m,z_m\\nA,22,15,10,0,0,3.9,71.2,-2.1,\");",
    ));
    reg.engine.register_fn("load_measured", |ctx: NativeCallContext, path: &str| {
        let text = crate::files::read_confined(&ctx, path, &["csv"])?;
        measured(&ctx, &text)
    });
    reg.doc(FnDoc::new(
        "load_measured(path: string) -> MeasuredFlights",
        "Measured flights from a CSV file in the study's folder (columns as for measured_from_csv).",
        "let m = load_measured(\"field_day.csv\");",
    ));
    reg.getter("MeasuredFlights", "count", "number of flights", |m: &mut MeasuredValue| m.flights.len() as rhai::INT);
    reg.text(|m: &mut MeasuredValue| format!("{} measured flight(s)", m.flights.len()));
    let context = context.clone();
    reg.engine.register_fn("calibrated", |ctx: NativeCallContext, d: DiscValue, s: StudyValue| calibrated(&ctx, &d, &s));
    reg.doc(FnDoc::new(
        "calibrated(disc: Disc, calibration: Study) -> Disc",
        "The disc with the fitted values of a calibrate() result in its coefficient set (scale factors folded into the linear coefficients: lift on C_L0 and C_Lα, drag on C_D0 and C_Dα, pitch on C_M0, C_Mα and C_Mq), to fly new throws with the fitted set. Its set is named \"... (calibrated)\".",
        "let fitted = calibrated(d, calibrate(d, environment(), m, #{ fit: [\"model.drag_scale\"] }));",
    ));
    reg.engine.register_fn(
        "calibrate",
        move |ctx: NativeCallContext, d: DiscValue, e: EnvironmentValue, m: MeasuredValue, map: Map| fit(&ctx, &context, &d, &e, &m, map),
    );
    reg.doc(FnDoc::new(
        "calibrate(disc: Disc, environment: Environment, measured: MeasuredFlights, options: map) -> Study",
        "Fits the listed coefficients of the disc's linear set (fit: [\"model.drag_min\", ...]; scale factors model.lift_scale etc. too) to the measured flights by Levenberg–Marquardt, each flight flown from its own release in the environment's air. The table lists start and fitted values with standard errors; the chart shows each flight's position residuals (predicted − measured, m) against time. A coefficient the data cannot determine is an error naming it. Options: fit, position_sd_m, time_sd_s, max_iterations (the solver's patience: at most max_iterations × (coefficients + 1) trial steps). Not sharded: each step depends on the one before, so the whole fit runs in every process of a `--shard i/N` run (its flights run in parallel on this machine's cores); run it in a script of its own rather than as an array job.",
        "calibrate(d, environment(), load_measured(\"field_day.csv\"), #{ fit: [\"model.drag_min\", \"model.lift_slope_per_rad\"] })",
    ));
}

fn measured(ctx: &NativeCallContext, text: &str) -> Fallible<MeasuredValue> {
    let flights = parse_measured_flights(text).map_err(|e| value_error(ctx, e.to_string()))?;
    Ok(MeasuredValue { flights })
}

fn fit(ctx: &NativeCallContext, context: &PackageContext, disc: &DiscValue, env: &EnvironmentValue, m: &MeasuredValue, mut map: Map) -> Fallible<StudyValue> {
    let fit = take_list(&mut map, "fit");
    let opts = options(ctx, &map, CALIBRATE_OPTIONS)?;
    lists_only(ctx, &opts, &["fit"])?;
    let names = text_list(ctx, "fit", &fit.ok_or_else(|| value_error(ctx, "give fit: [\"model.drag_min\", ...]".into()))?)?;
    let mut spec = CalibrationSpec::new(names);
    spec.position_sd_m = opts.number_or("position_sd_m", spec.position_sd_m);
    spec.time_sd_s = opts.number_or("time_sd_s", spec.time_sd_s);
    spec.max_iterations = opts.number_or("max_iterations", spec.max_iterations as f64) as usize;
    let first = m.flights.first().map(|f| f.release).ok_or_else(|| value_error(ctx, "no measured flights".into()))?;
    let mut case = StudyCase::new(CaseDisc::Design { design: disc.design.clone() }, CaseModel::linear(disc.aero.clone()), first);
    case.air = env.air;
    case.wind = env.wind;
    let estimate = m.flights.len() * (spec.parameters.len() + 1) * spec.max_iterations;
    let result = watched(ctx, context, "calibration", estimate, |control| calibrate(&case, &m.flights, &spec, control))?;
    Ok(calibration_value(&result, &disc.design.name))
}

/// The table of fitted coefficients and the residual chart.
pub(crate) fn calibration_value(result: &CalibrationResult, design: &str) -> StudyValue {
    let mut table = Table::new(format!("Calibration of {design}"))
        .column("coefficient", "", 0)
        .column("unit", "", 0)
        .column("start", "", 5)
        .column("fitted", "", 5)
        .column("standard error", "", 5);
    for p in &result.parameters {
        table = table.row(vec![Cell::from(p.name.as_str()), Cell::from(p.unit.as_str()), p.initial.into(), p.value.into(), p.standard_error.into()]);
    }
    let table = table
        .note(format!("{} flights flown, {} iterations, residual variance s² = {:.3} (≈ 1 when the stated uncertainties are right)", result.flights_flown, result.iterations, result.residual_variance))
        .note("Standard errors from s²(JᵀJ)⁻¹ at the solution (linearised least squares).");
    let mut chart = LineChart::new(format!("Residuals of the calibration of {design}"), Axis::new("time since release", "s"), Axis::new("predicted − measured position", "m"));
    chart.zero_line = true;
    let mut labels: Vec<(String, String)> = Vec::new();
    for r in result.residuals.iter().filter(|r| r.quantity.ends_with("_m")) {
        let key = (r.flight.clone(), r.quantity.clone());
        if !labels.contains(&key) {
            labels.push(key);
        }
    }
    for (flight, quantity) in labels {
        let points = result.residuals.iter().filter(|r| r.flight == flight && r.quantity == quantity).map(|r| (r.time_s, r.residual)).collect();
        chart = chart.series(Series::new(format!("{flight} {}", plain_name(&quantity)), points));
    }
    let mut value = StudyValue::new(table, &chart);
    value.fitted = result.parameters.iter().map(|p| (p.name.clone(), p.value)).collect();
    value
}

/// `disc` with the fitted values of a calibration `study` in its coefficient set (scale factors
/// folded into the linear set), named as calibrated.
fn calibrated(ctx: &NativeCallContext, disc: &DiscValue, study: &StudyValue) -> Fallible<DiscValue> {
    if study.fitted.is_empty() {
        return Err(value_error(ctx, "calibrated() takes the result of calibrate(); this study fitted nothing".into()));
    }
    let release = spinfoil_engine::ReleasePose::default().with_speed_and_spin(20.0, 15.0);
    let mut case = StudyCase::new(CaseDisc::Design { design: disc.design.clone() }, CaseModel::linear(disc.aero.clone()), release);
    for (name, value) in &study.fitted {
        case.set(name, *value).map_err(|e| value_error(ctx, e.to_string()))?;
    }
    let set = case.model.folded_linear().ok_or_else(|| value_error(ctx, "the disc's coefficient set is not linear".into()))?;
    set.validate().map_err(|e| value_error(ctx, format!("the fitted set is not usable: {e}")))?;
    Ok(DiscValue { aero_name: format!("{} (calibrated)", disc.aero_name), aero: set, ..disc.clone() })
}
