//! `dispersion`, `normal` and `uniform`: landing scatter under throw scatter, with its summary
//! table, the scatter chart with 50 %/95 % ellipses and the safety caution.
use super::case::{input_name, study_case};
use super::control::watched;
use super::options::study_error_text;
use super::result::StudyValue;
use super::shards::{current_shard, keep, next_ordinal, Partial};
use crate::help::{FnDoc, Registrar};
use crate::options::OptionSpec;
use crate::packages::args::{number_arg, options, value_error, Fallible};
use crate::packages::{DiscValue, EnvironmentValue, PackageContext, ThrowValue};
use crate::{Axis, Cell, ScatterEllipses, Series, Table};
use rhai::{Dynamic, Map, NativeCallContext};
use spinfoil_engine::{
    input_unit, run_dispersion, DispersionResult, DispersionSpec, Scatter, ScatterStats, Spread, StudyCase, Zone,
};

/// A spread as scripts write it: the engine's zero-mean spread and a shift of the mean.
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct SpreadValue {
    /// Offset of the mean from the throw's value, in the input's unit.
    pub mean: f64,
    /// The spread around that mean.
    pub spread: Spread,
}

const DISPERSION_OPTIONS: &[OptionSpec] = &[
    OptionSpec::integer("count", 2, 100_000, "number of throws (default 200)"),
    OptionSpec::integer("seed", 0, i64::MAX, "seed of the random draws (default 1); the same seed gives the same table"),
    OptionSpec::optional("gust_intensity", 0.0, 0.5, "turbulence intensity σ_u/ū of seeded gusts, a new gust per throw (default none)"),
];

const TARGET_OPTIONS: &[OptionSpec] = &[
    OptionSpec::number("x_m", -1e4, 1e4, "target centre downrange"),
    OptionSpec::number("y_m", -1e4, 1e4, "target centre to the left"),
    OptionSpec::number("radius_m", 0.01, 1e4, "target radius"),
];

const FAIRWAY_OPTIONS: &[OptionSpec] = &[
    OptionSpec::number("to_x_m", -1e4, 1e4, "end of the fairway's centre line downrange (it starts at the release point)"),
    OptionSpec::optional("to_y_m", -1e4, 1e4, "end of the centre line to the left (default 0)"),
    OptionSpec::number("half_width_m", 0.01, 1e4, "half the fairway's width"),
];

/// Registers `dispersion`, `normal` and `uniform`.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    reg.engine.register_type_with_name::<SpreadValue>("Spread");
    reg.engine.register_fn("normal", |ctx: NativeCallContext, mean: Dynamic, sd: Dynamic| {
        let mean = number_arg(&ctx, "mean", &mean, -1e6, 1e6)?;
        let sd = number_arg(&ctx, "sd", &sd, 0.0, 1e6)?;
        Ok::<_, Box<rhai::EvalAltResult>>(SpreadValue { mean, spread: Spread::Normal { sd } })
    });
    reg.doc(FnDoc::new("normal(mean, sd) -> Spread", "A normal spread of an input around the throw's value: mean offset and standard deviation, in the input's unit.", "normal(0, 0.8)"));
    reg.engine.register_fn("uniform", |ctx: NativeCallContext, low: Dynamic, high: Dynamic| {
        let low = number_arg(&ctx, "low", &low, -1e6, 1e6)?;
        let high = number_arg(&ctx, "high", &high, low, 1e6)?;
        Ok::<_, Box<rhai::EvalAltResult>>(SpreadValue { mean: 0.5 * (low + high), spread: Spread::Uniform { half_width: 0.5 * (high - low) } })
    });
    reg.doc(FnDoc::new("uniform(low, high) -> Spread", "A uniform spread of offsets from low to high around the throw's value, in the input's unit.", "uniform(-1, 1)"));
    reg.text(|s: &mut SpreadValue| match s.spread {
        Spread::Normal { sd } => format!("normal(mean {}, sd {sd})", s.mean),
        Spread::Uniform { half_width } => format!("uniform({}, {})", s.mean - half_width, s.mean + half_width),
    });
    super::register_case_study(reg, context, "dispersion", dispersion, FnDoc::new(
        "dispersion(disc: Disc, throw: Throw, environment: Environment, options: map) -> Study",
        "Flies many throws whose inputs scatter around the throw's values (Monte Carlo, seeded: the same seed gives the same result) and summarises the landing points: means, standard deviations and the 50 % and 95 % ellipses (m), and the share landing inside a target circle or a fairway. Options: count, seed, gust_intensity, scatter: #{ input: normal(mean, sd) or uniform(low, high), ... } (inputs as in study_inputs(); a bare name such as speed_mps means throw.speed_mps; for an effort throw scatter its work_j, torque_nm or rim_speed_ratio, since its speed and spin come from the effort and the disc), target: #{ x_m, y_m, radius_m } or fairway: #{ to_x_m, to_y_m, half_width_m } (drawn on the scatter chart with the landing points). Predictions are estimates: keep clear of the throwing lane, check landing zones for people and property, and follow local rules and the course designer's safety guidance.",
        "dispersion(d, t, environment(), #{ count: 500, seed: 7,\n  scatter: #{ speed_mps: normal(0, 0.8), hyzer_deg: normal(0, 3), launch_deg: uniform(-1, 1) },\n  target: #{ x_m: 90, y_m: 0, radius_m: 10 } })",
    ));
}

fn dispersion(
    ctx: &NativeCallContext,
    context: &PackageContext,
    disc: &DiscValue,
    throw: &ThrowValue,
    env: &EnvironmentValue,
    mut map: Map,
) -> Fallible<StudyValue> {
    let scatter = map.remove("scatter");
    let target = map.remove("target");
    let fairway = map.remove("fairway");
    let opts = options(ctx, &map, DISPERSION_OPTIONS)?;
    let mut case = study_case(disc, throw, env).map_err(|e| value_error(ctx, e))?;
    let scatter = match scatter {
        Some(s) => scatter_list(ctx, s, &mut case)?,
        None => Vec::new(),
    };
    let mut zones = Vec::new();
    if let Some(t) = target {
        let o = options(ctx, &sub_map(ctx, "target", t)?, TARGET_OPTIONS)?;
        zones.push(Zone::Circle { centre_m: [o.number_or("x_m", 0.0), o.number_or("y_m", 0.0)], radius_m: o.number_or("radius_m", 1.0) });
    }
    if let Some(f) = fairway {
        let o = options(ctx, &sub_map(ctx, "fairway", f)?, FAIRWAY_OPTIONS)?;
        let end = [o.number_or("to_x_m", 0.0), o.number_or("to_y_m", 0.0)];
        zones.push(Zone::Corridor { centre_line_m: vec![[0.0, 0.0], end], half_width_m: o.number_or("half_width_m", 1.0) });
    }
    let spec = DispersionSpec {
        throws: opts.number("count").unwrap_or(200.0) as usize,
        seed: opts.number("seed").unwrap_or(1.0) as u64,
        scatter,
        gust_intensity: opts.number("gust_intensity"),
        zones,
    };
    let shard = current_shard(ctx)?;
    let total = shard.indices(spec.throws).len();
    crate::session::check_study_flights(ctx, "a dispersion", total)?;
    let result = watched(ctx, context, "dispersion", total, |control| run_dispersion(&case, &spec, shard, control))?;
    if shard.count > 1 {
        let partial = Partial::Dispersion { ordinal: next_ordinal(), design: disc.design.name.clone(), result: Box::new(result.clone()) };
        keep(ctx, &partial, shard)?;
    }
    Ok(dispersion_value(&result, &disc.design.name))
}

fn sub_map(ctx: &NativeCallContext, key: &str, value: Dynamic) -> Fallible<Map> {
    value.clone().try_cast::<Map>().ok_or_else(|| value_error(ctx, format!("{key} must be a map #{{ ... }}, got {value}")))
}

/// The scatter entries, in the map's (sorted) key order; mean offsets move the case's value.
fn scatter_list(ctx: &NativeCallContext, value: Dynamic, case: &mut StudyCase) -> Fallible<Vec<Scatter>> {
    let map = sub_map(ctx, "scatter", value)?;
    let mut list = Vec::new();
    for (key, v) in map {
        let input = input_name(&key);
        input_unit(&input).map_err(|e| value_error(ctx, format!("scatter: {}", study_error_text(&e))))?;
        let s = v.clone().try_cast::<SpreadValue>().ok_or_else(|| {
            value_error(ctx, format!("scatter.{key} must be normal(mean, sd) or uniform(low, high), got {v}"))
        })?;
        if s.mean != 0.0 {
            let base = case.get(&input).map_err(|e| value_error(ctx, e.to_string()))?;
            case.set(&input, base + s.mean).map_err(|e| value_error(ctx, e.to_string()))?;
        }
        list.push(Scatter { input, spread: s.spread });
    }
    Ok(list)
}

/// The summary table and scatter chart of a (merged) dispersion.
pub(crate) fn dispersion_value(result: &DispersionResult, design: &str) -> StudyValue {
    let mut table = Table::new(format!("Dispersion of {design}: {} throws, seed {}", result.spec.throws, result.spec.seed))
        .column("quantity", "", 0)
        .column("value", "", 2)
        .column("unit", "", 0);
    let mut add_cell = |name: &str, value: Cell, unit: &str| {
        table = std::mem::take(&mut table).row(vec![Cell::from(name), value, Cell::from(unit)]);
    };
    let count = |n: usize| Cell::Count(n as u64);
    if result.summary.is_none() {
        add_cell(&format!("throws in shard {}", result.shard), count(result.rows.len()), "");
    }
    if let Some(summary) = &result.summary {
        add_cell("throws flown", count(summary.flown), "");
        add_cell("throws failed", count(summary.failed), "");
    }
    let mut add = |name: &str, value: f64, unit: &str| add_cell(name, Cell::Number(value), unit);
    if let Some(summary) = &result.summary {
        add("mean carry", summary.mean_carry_m, "m");
        if let Some(stats) = &summary.landing {
            stats_rows(&mut add, "landing", stats);
        }
        if let Some(stats) = &summary.rest {
            stats_rows(&mut add, "rest", stats);
        }
        for share in &summary.zones {
            add(&format!("landings inside {}", zone_name(&share.zone)), share.landing_share * 100.0, "%");
            if let Some(rest) = share.rest_share {
                add(&format!("rests inside {}", zone_name(&share.zone)), rest * 100.0, "%");
            }
        }
    }
    let table = table.note(crate::SAFETY_CAUTION);
    StudyValue::new(table, &scatter_chart(result, design))
}

fn stats_rows(add: &mut impl FnMut(&str, f64, &str), what: &str, s: &ScatterStats) {
    add(&format!("{what} mean x (downrange)"), s.mean_m[0], "m");
    add(&format!("{what} mean y (left)"), s.mean_m[1], "m");
    add(&format!("{what} sd x"), s.sd_m[0], "m");
    add(&format!("{what} sd y"), s.sd_m[1], "m");
    for e in [&s.ellipse_50, &s.ellipse_95] {
        let level = (e.level * 100.0).round();
        add(&format!("{what} {level} % ellipse semi-major axis"), e.semi_major_m, "m");
        add(&format!("{what} {level} % ellipse semi-minor axis"), e.semi_minor_m, "m");
        add(&format!("{what} {level} % ellipse angle from x"), e.angle_deg, "°");
    }
}

fn zone_name(zone: &Zone) -> String {
    match zone {
        Zone::Circle { centre_m, radius_m } => format!("target ({:.0}, {:.0}) m, radius {radius_m} m", centre_m[0], centre_m[1]),
        Zone::Corridor { centre_line_m, half_width_m } => {
            let end = centre_line_m.last().copied().unwrap_or([0.0, 0.0]);
            format!("fairway ±{half_width_m} m to ({:.0}, {:.0}) m", end[0], end[1])
        }
        Zone::Polygon { .. } => "polygon".into(),
    }
}

fn scatter_chart(result: &DispersionResult, design: &str) -> ScatterEllipses {
    let landings = result.rows.iter().filter_map(|r| r.outcome.as_ref()).map(|o| (o.landing_m[0], o.landing_m[1])).collect();
    let rests: Vec<(f64, f64)> = result.rows.iter().filter_map(|r| r.outcome.as_ref()?.rest_m).map(|p| (p[0], p[1])).collect();
    let mut chart = ScatterEllipses::new(
        format!("Landing scatter of {design}"),
        Axis::new("downrange x", "m"),
        Axis::new("lateral y (left positive)", "m"),
    )
    .cloud(Series::new("landing points", landings));
    if !rests.is_empty() {
        chart = chart.cloud(Series::new("rest points", rests));
    }
    for zone in &result.spec.zones {
        let rings = zone.outline_m(96).into_iter().map(|ring| ring.into_iter().map(|p| (p[0], p[1])).collect()).collect();
        chart = chart.zone(zone_name(zone), rings);
    }
    chart
}
