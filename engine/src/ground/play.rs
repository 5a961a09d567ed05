use nalgebra::Vector3;
use serde::{Deserialize, Serialize};

use super::body::ContactBody;
use super::settings::GroundSettings;
use super::state::ContactState;
use super::terrain::Ground;

/// What the disc is doing at a ground-phase sample.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
#[non_exhaustive]
pub enum GroundPhase {
    /// At the instant of a rim impact (state just after it).
    Impact,
    /// In the air between impacts (a skip): ballistic, torque-free rotation.
    Airborne,
    /// Lying flat and sliding (and spinning) on the ground.
    Sliding,
    /// Rolling on its rim.
    Rolling,
    /// At rest.
    Rest,
}

/// How the ground phase ended.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
#[non_exhaustive]
pub enum GroundEnding {
    /// The last impact took all tangential motion; the disc stopped where it hit.
    Stopped,
    /// The disc flattened and slid to rest.
    Slid,
    /// The disc rolled on its rim to rest.
    Rolled,
    /// The disc was still moving when the time limit ran out (e.g. a slope steeper than the
    /// surface's friction can hold).
    Unsettled,
}

impl GroundEnding {
    /// A lower-case word for tables ("stopped", "slid", "rolled", "unsettled").
    pub fn label(self) -> &'static str {
        match self {
            GroundEnding::Stopped => "stopped",
            GroundEnding::Slid => "slid",
            GroundEnding::Rolled => "rolled",
            GroundEnding::Unsettled => "unsettled",
        }
    }
}

/// One recorded moment of the ground phase. Time 0 is first contact (landing).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct GroundSample {
    /// Time since landing, s.
    pub time_s: f64,
    /// Centre-of-mass position, m.
    pub position_m: Vector3<f64>,
    /// Centre-of-mass velocity, m/s.
    pub velocity_mps: Vector3<f64>,
    /// Disc axis **n** (unit).
    pub normal: Vector3<f64>,
    /// Spin ω·**n**, rad/s.
    pub spin_rad_s: f64,
    /// What the disc is doing.
    pub phase: GroundPhase,
}

impl GroundSample {
    /// A sample of `state` at `time_s`.
    pub fn of(time_s: f64, state: &ContactState, phase: GroundPhase) -> Self {
        GroundSample {
            time_s,
            position_m: state.position_m,
            velocity_mps: state.velocity_mps,
            normal: state.normal,
            spin_rad_s: state.spin_rad_s(),
            phase,
        }
    }
}

/// Everything that happened between landing and rest.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct GroundPlay {
    /// The ground-phase trajectory, in time order, from landing to rest.
    pub samples: Vec<GroundSample>,
    /// Centre of mass at first contact, m.
    pub landing_position_m: Vector3<f64>,
    /// Centre of mass at rest (or when the time limit ran out), m.
    pub rest_position_m: Vector3<f64>,
    /// Horizontal (x, y) distance from landing to rest, m.
    pub ground_play_m: f64,
    /// Time from landing to rest, s.
    pub time_to_rest_s: f64,
    /// How the motion ended.
    pub ending: GroundEnding,
    /// Number of rim impacts (the landing included).
    pub impacts: usize,
    /// Number of times the disc left the ground again after an impact.
    pub skips: usize,
    /// Kinetic energy at landing, J.
    pub landing_energy_j: f64,
    /// The final state.
    pub rest_state: ContactState,
}

impl GroundPlay {
    /// A short phrase such as "skipped 2×, then slid".
    pub fn describe(&self) -> String {
        match self.skips {
            0 => self.ending.label().to_string(),
            1 => format!("skipped once, then {}", self.ending.label()),
            n => format!("skipped {n}×, then {}", self.ending.label()),
        }
    }

    /// Horizontal displacement (x, y) from landing to rest, m.
    pub fn displacement_m(&self) -> Vector3<f64> {
        let d = self.rest_position_m - self.landing_position_m;
        Vector3::new(d.x, d.y, 0.0)
    }
}

/// Collects samples at a fixed interval, always keeping the first and last of each phase.
#[derive(Debug)]
pub(crate) struct Recorder {
    pub(crate) samples: Vec<GroundSample>,
    interval_s: f64,
    next_s: f64,
}

impl Recorder {
    pub(crate) fn new(interval_s: f64) -> Self {
        Recorder { samples: Vec::new(), interval_s, next_s: 0.0 }
    }

    /// Records unconditionally.
    pub(crate) fn mark(&mut self, time_s: f64, state: &ContactState, phase: GroundPhase) {
        self.samples.push(GroundSample::of(time_s, state, phase));
        self.next_s = time_s + self.interval_s;
    }

    /// Records if the sample interval has passed since the last sample.
    pub(crate) fn offer(&mut self, time_s: f64, state: &ContactState, phase: GroundPhase) {
        if time_s >= self.next_s {
            self.mark(time_s, state, phase);
        }
    }
}

/// What a settling phase (slide or roll) needs: the disc, the ground and the settings.
#[derive(Debug, Clone, Copy)]
pub(crate) struct PhaseContext<'a> {
    pub(crate) body: &'a ContactBody,
    pub(crate) ground: &'a Ground,
    pub(crate) settings: &'a GroundSettings,
}

/// How a settling phase ended: the ending, its duration (s) and the final state.
#[derive(Debug, Clone, Copy)]
pub(crate) struct Settled {
    pub(crate) ending: GroundEnding,
    pub(crate) elapsed_s: f64,
    pub(crate) state: ContactState,
}
