//! Throws: a release state in user units, or an effort that a disc's mass and inertia turn into
//! speed and spin.
use super::args::{design_error, options, Fallible};
use super::discs::DiscValue;
use crate::help::{FnDoc, Registrar};
use crate::options::{OptionSpec, OptionValues};
use rhai::{Dynamic, Map, NativeCallContext};
use serde::{Deserialize, Serialize};
use spinfoil_engine::{
    release_with_wobble, CoupledEffort, Effort, EffortThrow, Hand, IndependentEffort, ReleasePose, ReleaseState, Style,
};
use std::f64::consts::PI;

/// A throw as scripts hold it.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(tag = "form", rename_all = "snake_case")]
pub(crate) enum ThrowValue {
    /// Speed and spin given directly.
    Release(ReleaseState),
    /// Speed and spin follow from the disc.
    Effort(EffortThrow),
}

impl ThrowValue {
    /// The release state this throw gives `disc`.
    pub fn release_for(&self, disc: &DiscValue) -> Result<ReleaseState, String> {
        match self {
            ThrowValue::Release(state) => Ok(*state),
            ThrowValue::Effort(effort) => effort
                .release(&disc.report.properties, disc.report.outline.diameter_m() / 2.0)
                .map_err(|e| e.to_string()),
        }
    }

    fn pose(&self) -> ReleasePose {
        match self {
            ThrowValue::Release(state) => state.pose(),
            ThrowValue::Effort(effort) => effort.pose,
        }
    }
}

const RPM_PER_RAD_S: f64 = 60.0 / (2.0 * PI);

const POSE_OPTIONS: [OptionSpec; 8] = [
    OptionSpec::choice("style", &["backhand", "forehand"], "throwing style (default backhand)"),
    OptionSpec::choice("hand", &["right", "left"], "throwing hand (default right)"),
    OptionSpec::optional("launch_deg", -90.0, 90.0, "angle of the velocity above horizontal (default 0)"),
    OptionSpec::optional(
        "nose_deg",
        -60.0,
        60.0,
        "angle of the disc plane above the velocity, nose up positive (default 0)",
    ),
    OptionSpec::optional(
        "hyzer_deg",
        -90.0,
        90.0,
        "roll about the velocity, hyzer positive, anhyzer negative (default 0)",
    ),
    OptionSpec::optional(
        "heading_deg",
        -180.0,
        180.0,
        "direction of the velocity from downrange, to the left positive (default 0)",
    ),
    OptionSpec::optional("height_m", 0.0, 3.0, "release height of the centre of mass (default 1)"),
    OptionSpec::optional(
        "wobble_rad_s",
        0.0,
        50.0,
        "off-axis angular velocity at release (default 0); for an angle in degrees see release_for(throw, disc, #{ wobble_deg })",
    ),
];

const WOBBLE_OPTIONS: [OptionSpec; 2] = [
    OptionSpec::number(
        "wobble_deg",
        0.0,
        60.0,
        "wobble angle at release: the cone half-angle between the disc's axis and its angular momentum",
    ),
    OptionSpec::optional(
        "wobble_direction_deg",
        -180.0,
        180.0,
        "direction of the off-axis rate in the disc plane, from forward toward the left (default 0)",
    ),
];

const RELEASE_ONLY: [OptionSpec; 4] = [
    OptionSpec::optional("speed_mps", 0.0, 45.0, "release speed (give this or speed_kmh)"),
    OptionSpec::optional("speed_kmh", 0.0, 162.0, "release speed (give this or speed_mps)"),
    OptionSpec::optional("spin_rpm", 0.0, 2387.0, "spin (give this or spin_rps)"),
    OptionSpec::optional("spin_rps", 0.0, 39.78, "spin in revolutions per second (give this or spin_rpm)"),
];

const EFFORT_ONLY: [OptionSpec; 5] = [
    OptionSpec::number(
        "work_j",
        0.0,
        1000.0,
        "work the arm puts into the disc's travel (or all work, with rim_speed_ratio)",
    ),
    OptionSpec::optional("torque_nm", 0.0, 30.0, "wrist torque that spins the disc (with wrist_deg)"),
    OptionSpec::optional("wrist_deg", 0.0, 360.0, "angle the wrist turns the disc through while applying torque_nm"),
    OptionSpec::optional(
        "rim_speed_ratio",
        0.0,
        2.0,
        "rim speed over travel speed ωR/V, instead of torque_nm and wrist_deg",
    ),
    OptionSpec::optional(
        "arm_mass_kg",
        0.0,
        5.0,
        "arm mass moving with the disc (default 0.4 with torque_nm, 0 with rim_speed_ratio)",
    ),
];

fn release_options() -> Vec<OptionSpec> {
    RELEASE_ONLY.iter().chain(POSE_OPTIONS.iter()).copied().collect()
}

fn effort_options() -> Vec<OptionSpec> {
    EFFORT_ONLY.iter().chain(POSE_OPTIONS.iter()).copied().collect()
}

/// Registers `throw_release`, `effort` and the `Throw` type.
pub(crate) fn register(reg: &mut Registrar) {
    reg.section("throws", "how the disc leaves the hand: a release state, or an effort");
    reg.engine.register_type_with_name::<ThrowValue>("Throw");
    reg.engine.register_fn("throw_release", throw_release);
    reg.doc(FnDoc::new(
        "throw_release(options: map) -> Throw",
        "A release state in user units: speed (m/s or km/h), spin (rpm or rev/s), angles in degrees (hyzer positive, anhyzer negative), height in m, style and hand.",
        "let t = throw_release(#{ speed_mps: 24, spin_rpm: 900, launch_deg: 10, nose_deg: 1, hyzer_deg: 5 });",
    ).with_options(&release_options()));
    reg.engine.register_fn("effort", effort);
    reg.doc(FnDoc::new(
        "effort(options: map) -> Throw",
        "A throw described by the player's work: work_j with torque_nm and wrist_deg (linear and wrist work given separately) or with rim_speed_ratio (one work shared by a rim-speed ratio). Each disc's mass and spin inertia turn it into its own speed and spin.",
        "let arm = effort(#{ style: \"backhand\", work_j: 165, torque_nm: 2.5, wrist_deg: 140, launch_deg: 9, hyzer_deg: 4 });",
    ).with_options(&effort_options()));
    reg.engine.register_fn("release_for", release_for);
    reg.doc(FnDoc::new(
        "release_for(throw: Throw, disc: Disc) -> Throw",
        "The release state a throw gives one disc (for an effort: the speed and spin this disc's mass and inertia give).",
        "effort(#{ work_j: 165, torque_nm: 2.5, wrist_deg: 140 }).release_for(d).speed_mps",
    ));
    reg.engine.register_fn("release_for", release_for_wobbling);
    reg.doc(FnDoc::new(
        "release_for(throw: Throw, disc: Disc, options: map) -> Throw",
        "The release state a throw gives one disc, leaving the hand wobbling by wobble_deg: the off-axis rate is set from the disc's I_z and I_x and the release spin, |ω⊥| = I_z |ω_s| tan θ / I_x (it replaces any wobble_rad_s). The same angle is a larger rate on a disc with a larger I_z/I_x.",
        "let wobbly = throw_release(#{ speed_mps: 22, spin_rpm: 900, launch_deg: 10 }).release_for(d, #{ wobble_deg: 5 });",
    ).with_options(&WOBBLE_OPTIONS));
    register_fields(reg);
}

fn register_fields(reg: &mut Registrar) {
    let release = |t: &ThrowValue| match t {
        ThrowValue::Release(s) => Some(*s),
        ThrowValue::Effort(_) => None,
    };
    let or_unit = |x: Option<f64>| x.map_or(Dynamic::UNIT, Dynamic::from_float);
    reg.getter("Throw", "form", "\"release\" or \"effort\"", |t: &mut ThrowValue| match t {
        ThrowValue::Release(_) => "release".to_string(),
        ThrowValue::Effort(_) => "effort".to_string(),
    });
    reg.getter(
        "Throw",
        "speed_mps",
        "release speed, m/s (nothing for an effort: see release_for)",
        move |t: &mut ThrowValue| or_unit(release(t).map(|s| s.speed_mps)),
    );
    reg.getter("Throw", "spin_rpm", "spin, rpm (nothing for an effort)", move |t: &mut ThrowValue| {
        or_unit(release(t).map(|s| s.spin_rad_s * RPM_PER_RAD_S))
    });
    reg.getter("Throw", "launch_deg", "launch angle, °", |t: &mut ThrowValue| t.pose().launch_rad.to_degrees());
    reg.getter("Throw", "nose_deg", "nose angle, °", |t: &mut ThrowValue| t.pose().nose_rad.to_degrees());
    reg.getter("Throw", "hyzer_deg", "roll angle, ° (hyzer positive, anhyzer negative)", |t: &mut ThrowValue| {
        t.pose().roll_rad.to_degrees()
    });
    reg.getter("Throw", "heading_deg", "heading, ° (left positive)", |t: &mut ThrowValue| {
        t.pose().heading_rad.to_degrees()
    });
    reg.getter("Throw", "height_m", "release height, m", |t: &mut ThrowValue| t.pose().height_m);
    reg.getter("Throw", "wobble_rad_s", "off-axis angular velocity at release, rad/s", |t: &mut ThrowValue| {
        t.pose().off_axis_rate_rad_s
    });
    reg.getter("Throw", "style", "\"backhand\" or \"forehand\"", |t: &mut ThrowValue| {
        style_name(t.pose().style).to_string()
    });
    reg.getter("Throw", "hand", "\"right\" or \"left\"", |t: &mut ThrowValue| hand_name(t.pose().hand).to_string());
    reg.text(|t: &mut ThrowValue| describe(t));
}

fn describe(t: &ThrowValue) -> String {
    let pose = t.pose();
    let how = format!("{} {}", hand_name(pose.hand), style_name(pose.style));
    let wobble = match pose.off_axis_rate_rad_s {
        rate if rate > 0.0 => format!(", off-axis {rate:.2} rad/s"),
        _ => String::new(),
    };
    match t {
        ThrowValue::Release(s) => format!(
            "{how} release: {:.1} m/s, {:.0} rpm, launch {:.1}°, hyzer {:.1}°{wobble}",
            s.speed_mps,
            s.spin_rad_s * RPM_PER_RAD_S,
            pose.launch_rad.to_degrees(),
            pose.roll_rad.to_degrees()
        ),
        ThrowValue::Effort(_) => format!(
            "{how} effort, launch {:.1}°, hyzer {:.1}°{wobble}",
            pose.launch_rad.to_degrees(),
            pose.roll_rad.to_degrees()
        ),
    }
}

fn style_name(style: Style) -> &'static str {
    match style {
        Style::Backhand => "backhand",
        Style::Forehand => "forehand",
    }
}

fn hand_name(hand: Hand) -> &'static str {
    match hand {
        Hand::Right => "right",
        Hand::Left => "left",
    }
}

fn pose_of(v: &OptionValues) -> ReleasePose {
    let style = if v.text("style") == Some("forehand") { Style::Forehand } else { Style::Backhand };
    let hand = if v.text("hand") == Some("left") { Hand::Left } else { Hand::Right };
    let deg = |key: &str| v.number_or(key, 0.0).to_radians();
    ReleasePose {
        launch_rad: deg("launch_deg"),
        nose_rad: deg("nose_deg"),
        roll_rad: deg("hyzer_deg"),
        heading_rad: deg("heading_deg"),
        height_m: v.number_or("height_m", 1.0),
        off_axis_rate_rad_s: v.number_or("wobble_rad_s", 0.0),
        ..ReleasePose::thrown(style, hand)
    }
}

fn throw_release(ctx: NativeCallContext, opts: Map) -> Fallible<ThrowValue> {
    let v = options(&ctx, &opts, &release_options())?;
    let speed_mps = match v.one_of(&["speed_mps", "speed_kmh"])? {
        ("speed_kmh", kmh) => kmh / 3.6,
        (_, mps) => mps,
    };
    let spin_rad_s = match v.one_of(&["spin_rpm", "spin_rps"])? {
        ("spin_rps", rps) => rps * 2.0 * PI,
        (_, rpm) => rpm / RPM_PER_RAD_S,
    };
    let state = pose_of(&v).with_speed_and_spin(speed_mps, spin_rad_s);
    state.validated().map(ThrowValue::Release).map_err(|e| design_error(&ctx, e))
}

fn effort(ctx: NativeCallContext, opts: Map) -> Fallible<ThrowValue> {
    let v = options(&ctx, &opts, &effort_options())?;
    let work_j = v.number_or("work_j", 0.0);
    let effort = match (v.number("rim_speed_ratio"), v.number("torque_nm"), v.number("wrist_deg")) {
        (Some(k), None, None) => Effort::Coupled(CoupledEffort {
            arm_mass_kg: v.number_or("arm_mass_kg", 0.0),
            ..CoupledEffort::new(work_j, k)
        }),
        (None, Some(torque), Some(wrist)) => {
            let base = IndependentEffort::new(work_j, torque, wrist.to_radians());
            Effort::Independent(IndependentEffort { arm_mass_kg: v.number_or("arm_mass_kg", base.arm_mass_kg), ..base })
        }
        _ => return Err(v.error("give torque_nm and wrist_deg together, or rim_speed_ratio alone")),
    };
    Ok(ThrowValue::Effort(EffortThrow { effort, pose: pose_of(&v) }))
}

fn release_for(ctx: NativeCallContext, throw: &mut ThrowValue, disc: DiscValue) -> Fallible<ThrowValue> {
    throw.release_for(&disc).map(ThrowValue::Release).map_err(|e| design_error(&ctx, e))
}

fn release_for_wobbling(ctx: NativeCallContext, throw: &mut ThrowValue, disc: DiscValue, opts: Map) -> Fallible<ThrowValue> {
    let v = options(&ctx, &opts, &WOBBLE_OPTIONS)?;
    let release = throw.release_for(&disc).map_err(|e| design_error(&ctx, e))?;
    let wobble_rad = v.number_or("wobble_deg", 0.0).to_radians();
    let direction_rad = v.number_or("wobble_direction_deg", 0.0).to_radians();
    let state = release_with_wobble(&release, &disc.body(), wobble_rad, direction_rad).map_err(|e| design_error(&ctx, e))?;
    state.validated().map(ThrowValue::Release).map_err(|e| design_error(&ctx, e))
}
