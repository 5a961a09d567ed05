//! Flying a disc: `fly(disc, throw, environment)` and the `Flight` result.
use super::args::{engine_error, Fallible};
use super::discs::DiscValue;
use super::environments::EnvironmentValue;
use super::throws::ThrowValue;
use crate::help::{FnDoc, Registrar};
use crate::{Axis, Cell, Panel, Render, Series, Table, TimeSeries};
use rhai::NativeCallContext;
use spinfoil_engine::{
    fly_to_rest, DiscBody, Flight, FlightMetrics, FlightSettings, GroundPlay, GroundSettings, ReleaseState,
};
use std::sync::Arc;

/// A flight as scripts hold it: the engine's flight and what it was flown with.
#[derive(Debug, Clone)]
pub(crate) struct FlightValue {
    /// The flight's label in tables and charts: the disc's name unless the script set another.
    pub label: String,
    /// The release state the throw gave this disc.
    pub release: ReleaseState,
    /// The computed flight.
    pub flight: Arc<Flight>,
    /// The ground play after landing, when the environment names a ground.
    pub ground: Option<Arc<GroundPlay>>,
    /// The rigid body that flew (mass, I_z, I_x, diameter).
    pub body: DiscBody,
}

const RPM_PER_RAD_S: f64 = 60.0 / std::f64::consts::TAU;

/// Flies `disc` with `throw` in `environment` (the computation behind the script's `fly`).
pub(crate) fn fly_disc(
    disc: &DiscValue,
    throw: &ThrowValue,
    environment: &EnvironmentValue,
) -> Result<FlightValue, String> {
    let release = throw.release_for(disc)?;
    let conditions = environment.conditions()?;
    let label = disc.design.name.clone();
    let settings = FlightSettings::default();
    let body = disc.body();
    if let Some(ground) = environment.ground()? {
        let to_rest = fly_to_rest(
            &body,
            &disc.aero,
            &release,
            &conditions,
            &settings,
            &ground,
            &GroundSettings::default(),
        )
        .map_err(|e| e.to_string())?;
        return Ok(FlightValue {
            label,
            release,
            flight: Arc::new(to_rest.flight),
            ground: Some(Arc::new(to_rest.ground)),
            body,
        });
    }
    let flight = spinfoil_engine::fly(&body, &disc.aero, &release, &conditions, &settings).map_err(|e| e.to_string())?;
    Ok(FlightValue { label, release, flight: Arc::new(flight), ground: None, body })
}

/// Registers `fly`, the `Flight` type and its exports.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("flights", "flying a disc from its release to its first ground contact; metrics and the trajectory");
    reg.engine.register_type_with_name::<FlightValue>("Flight");
    reg.engine.register_fn("fly", fly);
    reg.engine.register_fn("fly", |ctx: NativeCallContext, d: DiscValue, t: ThrowValue| {
        fly(ctx, d, t, EnvironmentValue::standard())
    });
    reg.doc(FnDoc::new(
        "fly(disc: Disc, throw: Throw, environment: Environment) -> Flight",
        "Integrates the 6-degree-of-freedom flight from release to the first ground contact of the rim. The environment may be left out (sea-level standard air, no wind). Predictions are estimates: keep clear of the throwing lane, check landing zones for people and property, and follow local rules and the course designer's safety guidance.",
        "let f = fly(d, throw_release(#{ speed_mps: 24, spin_rpm: 900, launch_deg: 10 }), environment());\nf.carry_m",
    ));
    reg.engine.register_fn("trajectory", |f: &mut FlightValue| trajectory_table(f));
    reg.doc(FnDoc::new(
        "trajectory(flight: Flight) -> Table",
        "The sampled trajectory as a table: time (s), position x, y, z (m; x downrange, y left, z up), speed (m/s), spin (rpm), roll (°, hyzer positive), angle of attack (°), wobble (°).",
        "fly(d, t).trajectory().to_csv()",
    ));
    reg.engine.register_fn("to_csv", |f: &mut FlightValue| trajectory_table(f).to_csv());
    reg.doc(FnDoc::new(
        "to_csv(flight: Flight) -> string",
        "The trajectory as CSV text (headers carry units).",
        "let text = fly(d, t).to_csv();",
    ));
    register_metric_fields(reg);
    register_wobble_view(reg);
    super::compare::register_compare_flights(reg);
    reg.text(|f: &mut FlightValue| {
        let m = f.flight.metrics;
        format!(
            "flight of \"{}\": carry {:.1} m, apex {:.1} m, {:.2} s aloft, turn {:.1} m, fade {:.1} m",
            f.label, m.carry_m, m.apex_m, m.time_aloft_s, m.turn_m, m.fade_m
        )
    });
}

type Metric = (&'static str, &'static str, fn(&FlightValue) -> f64);

/// Every metric readable as a field: (field, doc, value in the field's unit).
pub(crate) const METRICS: &[Metric] = &[
    ("carry_m", "horizontal distance from release to landing, m", |f| m(f).carry_m),
    ("landing_downrange_m", "distance along the release heading to the landing point, m", |f| m(f).landing_downrange_m),
    (
        "landing_lateral_m",
        "offset of the landing point from the release heading line, m (positive toward the fade side)",
        |f| m(f).landing_lateral_m,
    ),
    ("apex_m", "greatest height of the centre of mass, m", |f| m(f).apex_m),
    ("apex_time_s", "time of the apex, s", |f| m(f).apex_time_s),
    ("time_aloft_s", "time from release to landing, s", |f| m(f).time_aloft_s),
    ("turn_m", "largest excursion to the turn side of the release line, m", |f| m(f).turn_m),
    ("fade_m", "lateral change from the point of largest turn to landing, toward the fade side, m", |f| m(f).fade_m),
    (
        "heading_change_deg",
        "ground-track heading change from release to landing, ° (positive toward the fade side)",
        |f| m(f).heading_change_rad.to_degrees(),
    ),
    ("release_speed_mps", "release speed, m/s", |f| f.release.speed_mps),
    ("release_spin_rpm", "release spin, rpm", |f| m(f).release_spin_rad_s * RPM_PER_RAD_S),
    ("landing_speed_mps", "speed at landing, m/s", |f| m(f).landing_speed_mps),
    ("landing_angle_deg", "descent angle at landing, ° below horizontal", |f| m(f).landing_angle_rad.to_degrees()),
    ("landing_spin_rpm", "spin at landing, rpm", |f| m(f).landing_spin_rad_s * RPM_PER_RAD_S),
    ("spin_kept_pct", "share of the release spin kept at landing, %", |f| m(f).spin_kept_fraction * 100.0),
    ("release_angular_momentum_g_m2_s", "angular momentum at release, g·m²/s", |f| {
        m(f).release_angular_momentum_kg_m2_s * 1000.0
    }),
    ("landing_angular_momentum_g_m2_s", "angular momentum at landing, g·m²/s", |f| {
        m(f).landing_angular_momentum_kg_m2_s * 1000.0
    }),
    ("max_axis_rate_deg_s", "largest rate of the disc's axis (roll and pitch motion), °/s", |f| {
        m(f).max_axis_rate_rad_s.to_degrees()
    }),
    (
        "initial_wobble_deg",
        "wobble angle at release, °: the angle between the disc's axis and its angular momentum (0 for a clean release)",
        |f| m(f).initial_wobble_rad.to_degrees(),
    ),
    (
        "wobble_frequency_hz",
        "rate at which the axis circles its angular momentum at release, Hz: I_z ω_s / (I_x cos θ) / 2π",
        |f| wobble_frequency_hz(f),
    ),
];

/// The torque-free cone rate of the axis at release, Hz (Goldstein, Poole & Safko (2002), §5.6).
fn wobble_frequency_hz(f: &FlightValue) -> f64 {
    let b = &f.body;
    let theta = m(f).initial_wobble_rad;
    b.spin_inertia_kg_m2 * f.release.spin_rad_s.abs() / (b.transverse_inertia_kg_m2 * theta.cos()) / std::f64::consts::TAU
}

fn m(f: &FlightValue) -> &FlightMetrics {
    &f.flight.metrics
}

fn register_metric_fields(reg: &mut Registrar) {
    for (field, doc, get) in METRICS {
        let get = *get;
        reg.getter("Flight", field, doc, move |f: &mut FlightValue| get(f));
    }
    super::flight_name::register(reg);
    reg.getter(
        "Flight",
        "wobble_half_time_s",
        "time after release for the wobble angle to fall to half its release value, s (nothing for a clean release or a wobble that never halved before landing)",
        |f: &mut FlightValue| m(f).wobble_half_time_s.map_or(rhai::Dynamic::UNIT, rhai::Dynamic::from_float),
    );
    register_ground_fields(reg);
    reg.getter("Flight", "landed", "true when the flight ended by ground contact", |f: &mut FlightValue| {
        f.flight.landed
    });
}

fn fly(
    ctx: NativeCallContext,
    disc: DiscValue,
    throw: ThrowValue,
    environment: EnvironmentValue,
) -> Fallible<FlightValue> {
    crate::session::check_trajectory_samples(&ctx, &FlightSettings::default())?;
    fly_disc(&disc, &throw, &environment).map_err(|e| engine_error(&ctx, e))
}

/// The trajectory samples as a table with units.
pub(crate) fn trajectory_table(f: &FlightValue) -> Table {
    let mut table = Table::new(format!("Trajectory of {}", f.label))
        .column("time", "s", 3)
        .column("x", "m", 2)
        .column("y", "m", 2)
        .column("z", "m", 2)
        .column("speed", "m/s", 2)
        .column("spin", "rpm", 0)
        .column("roll", "°", 1)
        .column("angle of attack", "°", 1)
        .column("wobble", "°", 2);
    for s in &f.flight.samples {
        let row: Vec<Cell> = vec![
            s.time_s.into(),
            s.position_m.x.into(),
            s.position_m.y.into(),
            s.position_m.z.into(),
            s.velocity_mps.norm().into(),
            (s.spin_rad_s.abs() * RPM_PER_RAD_S).into(),
            s.roll_rad.to_degrees().into(),
            s.angle_of_attack_rad.to_degrees().into(),
            s.wobble_rad.to_degrees().into(),
        ];
        table = table.row(row);
    }
    table
}

fn register_ground_fields(reg: &mut Registrar) {
    let ground = |f: &FlightValue, get: fn(&GroundPlay) -> f64| {
        f.ground.as_ref().map_or(rhai::Dynamic::UNIT, |g| rhai::Dynamic::from_float(get(g)))
    };
    reg.getter(
        "Flight",
        "ground_play_m",
        "distance from landing to rest, m (nothing without a ground)",
        move |f: &mut FlightValue| ground(f, |g| g.ground_play_m),
    );
    reg.getter(
        "Flight",
        "time_to_rest_s",
        "time from landing to rest, s (nothing without a ground)",
        move |f: &mut FlightValue| ground(f, |g| g.time_to_rest_s),
    );
    reg.getter(
        "Flight",
        "rest_downrange_m",
        "downrange x of the rest point, m (nothing without a ground)",
        move |f: &mut FlightValue| ground(f, |g| g.rest_position_m.x),
    );
    reg.getter(
        "Flight",
        "rest_lateral_m",
        "lateral y of the rest point, m, left positive (nothing without a ground)",
        move |f: &mut FlightValue| ground(f, |g| g.rest_position_m.y),
    );
    reg.getter(
        "Flight",
        "skips",
        "times the disc left the ground again after landing (nothing without a ground)",
        move |f: &mut FlightValue| ground(f, |g| g.skips as f64),
    );
    reg.getter(
        "Flight",
        "ground_ending",
        "how the ground play ended (\"stopped\", \"slid\", ...; nothing without a ground)",
        |f: &mut FlightValue| f.ground.as_ref().map_or(rhai::Dynamic::UNIT, |g| rhai::Dynamic::from(g.describe())),
    );
}

fn register_wobble_view(reg: &mut Registrar) {
    reg.engine.register_fn("wobble_view", |ctx: NativeCallContext, items: rhai::Array| {
        let flights = super::compare::items_of::<FlightValue>(&ctx, &items, "Flight")?;
        Ok::<_, Box<rhai::EvalAltResult>>(wobble_view(&flights))
    });
    reg.engine.register_fn("wobble_view", |f: FlightValue| wobble_view(&[f]));
    reg.doc(FnDoc::new(
        "wobble_view(flights: Flight or array of Flight) -> Chart",
        "The wobble angle (°, between the disc's axis and its angular momentum) against time (s) over the first part of each flight, one line per flight, to compare how fast the air damps an off-axis release. The small saw-tooth on each line is the angle's own oscillation at the cone rate (wobble_frequency_hz: about twice the spin rate, some 30 Hz at 900 rpm), sampled every 10 ms.",
        "wobble_view([fly(one_piece, wobbly), fly(rim_heavy, wobbly)])",
    ));
}

/// Shown span of a wobble chart: four times the slowest half time (at least 1 s), or the flight.
fn wobble_span_s(flights: &[FlightValue]) -> f64 {
    let halves = flights.iter().filter_map(|f| m(f).wobble_half_time_s);
    let span = halves.fold(0.25_f64, f64::max) * 4.0;
    let longest = flights.iter().map(|f| m(f).time_aloft_s).fold(0.0, f64::max);
    span.min(longest).max(longest.min(1.0))
}

fn wobble_view(flights: &[FlightValue]) -> super::charts::ChartValue {
    let span_s = wobble_span_s(flights);
    let panel = flights.iter().fold(Panel::new(Axis::new("wobble", "°")), |panel, f| {
        let points = f.flight.samples.iter().take_while(|s| s.time_s <= span_s);
        panel.series(Series::new(f.label.clone(), points.map(|s| (s.time_s, s.wobble_rad.to_degrees())).collect()))
    });
    let chart = TimeSeries::new("Wobble after release").panel(panel);
    super::charts::ChartValue { bundle: chart.render() }
}
