//! `sweep`: one or two inputs over ranges or listed values; a table and a line chart (or a panel
//! per metric) or a heat map.
use super::case::{input_name, study_case};
use super::control::watched;
use super::options::{lists_only, number_list, study_error_text, take_list, text_list};
use super::result::{input_title, StudyValue};
use super::shards::{current_shard, keep, next_ordinal, Partial};
use crate::help::{FnDoc, Registrar};
use crate::options::{OptionKind, OptionSpec, OptionValues};
use crate::packages::args::{options, value_error, Fallible};
use crate::packages::{DiscValue, EnvironmentValue, PackageContext, ThrowValue};
use crate::{Axis, Cell, HeatMap, LineChart, Panel, Series, Table, TimeSeries};
use rhai::{Map, NativeCallContext};
use spinfoil_engine::{input_unit, metric_unit, run_sweep, SweepAxis, SweepResult, SweepSpec};

const REQUIRED_TEXT: OptionKind = OptionKind::Text;

/// Keys of the sweep options besides the lists `values`, `values2` and `metrics`.
pub(crate) const SWEEP_OPTIONS: &[OptionSpec] = &[
    OptionSpec { key: "input", kind: REQUIRED_TEXT, required: true, doc: "the input to vary, e.g. \"throw.speed_mps\" (see study_inputs())" },
    OptionSpec::optional("from", -1e9, 1e9, "first value of an evenly spaced range, in the input's unit"),
    OptionSpec::optional("to", -1e9, 1e9, "last value of the range"),
    OptionSpec::integer("count", 1, 1000, "number of values of the range (default 5); or give values: [...]"),
    OptionSpec::text("input2", "a second input for a two-way sweep (heat map)"),
    OptionSpec::optional("from2", -1e9, 1e9, "first value of the second input's range"),
    OptionSpec::optional("to2", -1e9, 1e9, "last value of the second input's range"),
    OptionSpec::integer("count2", 1, 1000, "number of values of the second range (default 5); or values2: [...]"),
    OptionSpec::text("values", "a list of values of the input, e.g. [16, 20, 24] (instead of from/to/count)"),
    OptionSpec::text("values2", "a list of values of the second input"),
    OptionSpec::text("metrics", "a list of metric names (default [\"carry_m\", \"turn_m\", \"fade_m\"]; see study_metrics())"),
];

/// Registers `sweep`.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    super::register_case_study(reg, context, "sweep", sweep, FnDoc::new(
        "sweep(disc: Disc, throw: Throw, environment: Environment, options: map) -> Study",
        "Flies the throw once per value of one input (a line chart of the metrics against it; a panel per metric when their units differ or one shared scale would flatten some) or per pair of values of two inputs (a heat map of the first metric). Options: input, from, to, count (or values: [...]); input2, from2, to2, count2 (or values2: [...]); metrics: [...] (default [\"carry_m\", \"turn_m\", \"fade_m\"]; see study_metrics()). Units are those in the names. Points that fail show an error in their row. Progress is shown; an interrupt stops the sweep.",
        "sweep(d, throw_release(#{ speed_mps: 22, spin_rpm: 900, launch_deg: 10 }), environment(),\n      #{ input: \"throw.speed_mps\", from: 16, to: 28, count: 7, metrics: [\"carry_m\", \"turn_m\", \"fade_m\"] })",
    ));
}

fn sweep(
    ctx: &NativeCallContext,
    context: &PackageContext,
    disc: &DiscValue,
    throw: &ThrowValue,
    env: &EnvironmentValue,
    mut map: Map,
) -> Fallible<StudyValue> {
    let values = take_list(&mut map, "values");
    let values2 = take_list(&mut map, "values2");
    let metrics = take_list(&mut map, "metrics");
    let opts = options(ctx, &map, SWEEP_OPTIONS)?;
    lists_only(ctx, &opts, &["values", "values2", "metrics"])?;
    let mut axes = vec![axis(ctx, &opts, "", values)?];
    if opts.has("input2") || values2.is_some() {
        axes.push(axis(ctx, &opts, "2", values2)?);
    }
    let metrics = match metrics {
        Some(list) => text_list(ctx, "metrics", &list)?,
        None => vec!["carry_m".into(), "turn_m".into(), "fade_m".into()],
    };
    for m in &metrics {
        metric_unit(m).map_err(|e| value_error(ctx, study_error_text(&e)))?;
    }
    let spec = SweepSpec { axes, metrics };
    let case = study_case(disc, throw, env).map_err(|e| value_error(ctx, e))?;
    let shard = current_shard(ctx)?;
    let total = shard.indices(spec.total()).len();
    crate::session::check_study_flights(ctx, "a sweep", total)?;
    let result = watched(ctx, context, "sweep", total, |control| run_sweep(&case, &spec, shard, control))?;
    if shard.count > 1 {
        let partial = Partial::Sweep { ordinal: next_ordinal(), design: disc.design.name.clone(), result: result.clone() };
        keep(ctx, &partial, shard)?;
    }
    Ok(sweep_value(&result, &disc.design.name))
}

fn axis(ctx: &NativeCallContext, opts: &OptionValues, suffix: &str, values: Option<rhai::Array>) -> Fallible<SweepAxis> {
    let key = format!("input{suffix}");
    let input = input_name(opts.text(&key).ok_or_else(|| value_error(ctx, format!("give {key}, e.g. \"throw.launch_deg\"")))?);
    input_unit(&input).map_err(|e| value_error(ctx, study_error_text(&e)))?;
    if let Some(list) = values {
        return Ok(SweepAxis::values(input, number_list(ctx, &format!("values{suffix}"), &list)?));
    }
    let (from, to) = match (opts.number(&format!("from{suffix}")), opts.number(&format!("to{suffix}"))) {
        (Some(a), Some(b)) => (a, b),
        _ => return Err(value_error(ctx, format!("give from{suffix} and to{suffix}, or values{suffix}: [...], for {input}"))),
    };
    let count = opts.number(&format!("count{suffix}")).unwrap_or(5.0) as usize;
    SweepAxis::range(input, from, to, count).map_err(|e| value_error(ctx, e.to_string()))
}

/// A name without its unit suffix, for column headers (`carry_m` → `carry`).
pub(crate) fn plain_name(name: &str) -> String {
    const SUFFIXES: [&str; 14] =
        ["_rad_s", "_n_m", "_g_cm3", "_mps", "_rps", "_deg", "_pct", "_cm", "_m", "_s", "_g", "_j", "_k", "_rad"];
    let stem = SUFFIXES.iter().find_map(|s| name.strip_suffix(s)).unwrap_or(name);
    stem.replace('_', " ")
}

/// The table and chart of a (merged) sweep.
pub(crate) fn sweep_value(result: &SweepResult, design: &str) -> StudyValue {
    let spec = &result.spec;
    let mut table = Table::new(format!("Sweep of {design}"));
    for (axis, unit) in spec.axes.iter().zip(&result.input_units) {
        table = table.column(plain_name(&axis.input), unit.clone(), 2);
    }
    for (m, unit) in spec.metrics.iter().zip(&result.metric_units) {
        table = table.column(plain_name(m), unit.clone(), 2);
    }
    let failed = result.rows.iter().any(|r| r.error.is_some());
    if failed {
        table = table.column("error", "", 0);
    }
    for row in &result.rows {
        let mut cells: Vec<Cell> = row.inputs.iter().map(|v| Cell::Number(*v)).collect();
        cells.extend((0..spec.metrics.len()).map(|k| row.values.get(k).map_or(Cell::Empty, |v| Cell::Number(*v))));
        if failed {
            cells.push(row.error.as_deref().map_or(Cell::Empty, Cell::from));
        }
        table = table.row(cells);
    }
    table = table.note(crate::SAFETY_CAUTION);
    if spec.axes.len() == 2 {
        StudyValue::new(table, &heat_map(result, design))
    } else if needs_panels(result) {
        StudyValue::new(table, &panels(result, design))
    } else {
        StudyValue::new(table, &line_chart(result, design))
    }
}

/// A one-way sweep's points of metric `k`: (input, value).
fn metric_points(result: &SweepResult, k: usize) -> Vec<(f64, f64)> {
    result.rows.iter().map(|r| (r.inputs[0], r.values.get(k).copied().unwrap_or(f64::NAN))).collect()
}

/// Whether a one-way sweep's metrics need a panel each: they have different units, or on one
/// shared scale some metric would vary over less than a fifth of the axis and look flat.
fn needs_panels(result: &SweepResult) -> bool {
    let units = &result.metric_units;
    if units.len() < 2 {
        return false;
    }
    if units.iter().any(|u| *u != units[0]) {
        return true;
    }
    let span = |values: &mut dyn Iterator<Item = f64>| {
        let (lo, hi) = values.filter(|v| v.is_finite()).fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), v| (lo.min(v), hi.max(v)));
        if lo <= hi { Some((lo, hi)) } else { None }
    };
    let spans: Vec<(f64, f64)> =
        (0..units.len()).filter_map(|k| span(&mut metric_points(result, k).into_iter().map(|p| p.1))).collect();
    let Some((lo, hi)) = span(&mut spans.iter().flat_map(|s| [s.0, s.1])) else { return false };
    hi > lo && spans.iter().any(|s| s.1 - s.0 < 0.2 * (hi - lo))
}

/// One panel per metric (its own unit and scale) against the swept input.
fn panels(result: &SweepResult, design: &str) -> TimeSeries {
    let spec = &result.spec;
    let x = Axis::new(input_title(&spec.axes[0].input), result.input_units[0].clone());
    let chart = TimeSeries::new(format!("Sweep of {design}")).against(x);
    spec.metrics.iter().enumerate().fold(chart, |chart, (k, m)| {
        let quantity = Axis::new(plain_name(m), result.metric_units[k].clone());
        chart.panel(Panel::new(quantity).series(Series::new(plain_name(m), metric_points(result, k))))
    })
}

/// One line per metric on a shared scale: only called when every metric has the same unit
/// (`needs_panels` sends mixed units to panels).
fn line_chart(result: &SweepResult, design: &str) -> LineChart {
    let spec = &result.spec;
    let unit = result.metric_units.first().cloned().unwrap_or_default();
    let x = Axis::new(input_title(&spec.axes[0].input), result.input_units[0].clone());
    let y_title = if spec.metrics.len() > 1 { "result".to_string() } else { plain_name(&spec.metrics[0]) };
    let mut chart = LineChart::new(format!("Sweep of {design}"), x, Axis::new(y_title, unit));
    chart.zero_line = true;
    for (k, m) in spec.metrics.iter().enumerate() {
        chart = chart.series(Series::new(plain_name(m), metric_points(result, k)));
    }
    chart
}

fn heat_map(result: &SweepResult, design: &str) -> HeatMap {
    let spec = &result.spec;
    let sorted = |k: usize| {
        let mut v = spec.axes[k].values.clone();
        v.sort_by(f64::total_cmp);
        v.dedup();
        v
    };
    let (xs, ys) = (sorted(0), sorted(1));
    let mut grid = vec![vec![f64::NAN; xs.len()]; ys.len()];
    for row in &result.rows {
        let i = xs.iter().position(|v| *v == row.inputs[0]);
        let j = ys.iter().position(|v| *v == row.inputs[1]);
        if let (Some(i), Some(j), Some(v)) = (i, j, row.values.first()) {
            grid[j][i] = *v;
        }
    }
    let axis = |k: usize| Axis::new(input_title(&spec.axes[k].input), result.input_units[k].clone());
    let value = Axis::new(plain_name(&spec.metrics[0]), result.metric_units[0].clone());
    HeatMap::new(format!("Two-way sweep of {design}"), axis(0), axis(1), value).grid(xs, ys, grid)
}
