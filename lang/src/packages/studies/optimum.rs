//! `best_release`: the release angles (any inputs, within bounds) that carry farthest or land
//! nearest a target.
use super::case::{input_name, study_case};
use super::control::watched;
use super::options::{lists_only, number_list, study_error_text, take_list, text_list};
use super::result::StudyValue;
use super::sweep::plain_name;
use crate::help::{FnDoc, Registrar};
use crate::options::OptionSpec;
use crate::packages::args::{options, value_error, Fallible};
use crate::packages::{DiscValue, EnvironmentValue, PackageContext, ThrowValue};
use crate::{Axis, Cell, MassBars, Table};
use rhai::{Map, NativeCallContext};
use spinfoil_engine::{input_unit, optimise, Objective, OptimiseResult, OptimiseSpec, OptimiseVariable, SimplexSettings};

const BEST_OPTIONS: &[OptionSpec] = &[
    OptionSpec::choice("goal", &["carry"], "what to maximise when no target is given (default carry)"),
    OptionSpec::integer("max_flights", 10, 5000, "most flights the search may fly (default 200)"),
    OptionSpec::text("vary", "a list of input names to vary, e.g. [\"launch_deg\", \"nose_deg\"]"),
];

const TARGET_OPTIONS: &[OptionSpec] = &[
    OptionSpec::number("x_m", -1e4, 1e4, "target downrange"),
    OptionSpec::number("y_m", -1e4, 1e4, "target to the left"),
];

/// Registers `best_release`.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    super::register_case_study(reg, context, "best_release", best, FnDoc::new(
        "best_release(disc: Disc, throw: Throw, environment: Environment, options: map) -> Study",
        "Searches the listed inputs within their bounds (bounded Nelder–Mead simplex, starting from the throw's values) for the greatest carry (goal: \"carry\") or the landing point nearest a target (target: #{ x_m, y_m }; the rest point when the environment has a ground). Options: vary: [...] input names (a bare name such as launch_deg means throw.launch_deg), bounds: #{ name: [low, high] } in the inputs' units, goal or target, max_flights. The table lists the optimum, the objective (m) and the flights used. Not sharded: each step depends on the one before, so the whole search runs in every process of a `--shard i/N` run (its flights run in parallel on this machine's cores); run it in a script of its own rather than as an array job. Predictions are estimates: keep clear of the throwing lane, check landing zones for people and property, and follow local rules and the course designer's safety guidance.",
        "best_release(d, t, environment(), #{ vary: [\"launch_deg\", \"nose_deg\"],\n  bounds: #{ launch_deg: [0, 25], nose_deg: [-5, 10] }, goal: \"carry\" })",
    ));
}

fn best(
    ctx: &NativeCallContext,
    context: &PackageContext,
    disc: &DiscValue,
    throw: &ThrowValue,
    env: &EnvironmentValue,
    mut map: Map,
) -> Fallible<StudyValue> {
    let vary = take_list(&mut map, "vary");
    let bounds = map.remove("bounds").and_then(|b| b.try_cast::<Map>()).ok_or_else(|| value_error(ctx, "give bounds: #{ name: [low, high] } for every varied input".into()))?;
    let target = map.remove("target");
    let opts = options(ctx, &map, BEST_OPTIONS)?;
    lists_only(ctx, &opts, &["vary"])?;
    let vary = vary.ok_or_else(|| value_error(ctx, "give vary: [\"launch_deg\", ...]".into()))?;
    let mut variables = Vec::new();
    for key in text_list(ctx, "vary", &vary)? {
        let input = input_name(&key);
        input_unit(&input).map_err(|e| value_error(ctx, study_error_text(&e)))?;
        let range = bounds.get(key.as_str()).or_else(|| bounds.get(input.as_str())).and_then(|b| b.clone().try_cast::<rhai::Array>());
        let range = range.ok_or_else(|| value_error(ctx, format!("bounds has no [low, high] for {key}")))?;
        let pair = number_list(ctx, &format!("bounds.{key}"), &range)?;
        if pair.len() != 2 || pair[0] >= pair[1] {
            return Err(value_error(ctx, format!("bounds.{key} must be [low, high] with low < high")));
        }
        variables.push(OptimiseVariable { input, min: pair[0], max: pair[1] });
    }
    let objective = match target {
        Some(t) => {
            let t = t.try_cast::<Map>().ok_or_else(|| value_error(ctx, "target must be a map #{ x_m, y_m }".into()))?;
            let o = options(ctx, &t, TARGET_OPTIONS)?;
            Objective::NearestTarget { target_m: [o.number_or("x_m", 0.0), o.number_or("y_m", 0.0)] }
        }
        None => Objective::MaxCarry,
    };
    let max_flights = opts.number("max_flights").unwrap_or(200.0) as usize;
    let settings = SimplexSettings { max_evaluations: max_flights, ..SimplexSettings::default() };
    let spec = OptimiseSpec { variables, objective, settings };
    let case = study_case(disc, throw, env).map_err(|e| value_error(ctx, e))?;
    let result = watched(ctx, context, "best release", max_flights, |control| optimise(&case, &spec, control))?;
    Ok(optimum_value(&result, &spec, &disc.design.name))
}

/// The table and chart of an optimisation.
pub(crate) fn optimum_value(result: &OptimiseResult, spec: &OptimiseSpec, design: &str) -> StudyValue {
    let objective = match spec.objective {
        Objective::MaxCarry => "carry".to_string(),
        Objective::NearestTarget { target_m } => format!("distance to target ({}, {})", target_m[0], target_m[1]),
    };
    let mut table = Table::new(format!("Best release of {design}")).column("quantity", "", 0).column("value", "", 2).column("unit", "", 0);
    for (v, var) in result.optimum.iter().zip(&spec.variables) {
        let name = format!("{} (bounds {} … {})", plain_name(&v.name), var.min, var.max);
        table = table.row(vec![Cell::from(name.as_str()), Cell::Number(v.value), Cell::from(v.unit.as_str())]);
    }
    let m = &result.outcome.metrics;
    for (name, value, unit) in [
        (objective.as_str(), result.objective_m, "m"),
        ("carry at the optimum", m.carry_m, "m"),
        ("landing x", m.landing_position_m.x, "m"),
        ("landing y", m.landing_position_m.y, "m"),
        ("flights used", result.flights as f64, ""),
    ] {
        table = table.row(vec![Cell::from(name), Cell::Number(value), Cell::from(unit)]);
    }
    let quantities = result.optimum.iter().map(|v| format!("{} ({})", plain_name(&v.name), v.unit)).collect();
    let chart = MassBars::new(format!("Best release of {design}"), Axis::new("value at the optimum", "input units"), quantities)
        .group(design.to_string(), result.optimum.iter().map(|v| v.value).collect());
    StudyValue::new(table.note(crate::SAFETY_CAUTION), &chart)
}
