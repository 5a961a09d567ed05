//! What one case produces: the flight's metrics and, with ground play, the rest point.
use serde::{Deserialize, Serialize};

use crate::{Flight, FlightMetrics, FlightToRest};

use super::StudyError;

/// The named metrics a study can report, with units: (name, unit, meaning).
pub const METRICS: &[(&str, &str, &str)] = &[
    ("carry_m", "m", "horizontal distance from the release point's ground track origin to landing"),
    ("landing_x_m", "m", "landing position downrange (world x)"),
    ("landing_y_m", "m", "landing position to the left (world y)"),
    ("landing_downrange_m", "m", "landing distance along the release heading"),
    ("landing_lateral_m", "m", "landing offset from the heading line, positive toward the fade side"),
    ("apex_m", "m", "greatest height of the centre of mass"),
    ("time_aloft_s", "s", "time from release to first ground contact"),
    ("landing_speed_mps", "m/s", "speed at landing"),
    ("turn_m", "m", "greatest excursion away from the fade side"),
    ("fade_m", "m", "lateral travel toward the fade side after the turn"),
    ("spin_kept_fraction", "1", "landing spin over release spin"),
    ("heading_change_deg", "°", "change of the ground track toward the fade side"),
    ("rest_x_m", "m", "rest position downrange (world x; ground play on)"),
    ("rest_y_m", "m", "rest position to the left (world y; ground play on)"),
    ("rest_distance_m", "m", "horizontal distance from release to rest (ground play on)"),
];

/// One flight's results, as plain numbers.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct CaseOutcome {
    /// The flight's metrics.
    pub metrics: FlightMetrics,
    /// Rest position (x, y) in m, when the ground was played out.
    pub rest_m: Option<[f64; 2]>,
    /// Horizontal distance from release to rest in m, when the ground was played out.
    pub rest_distance_m: Option<f64>,
}

impl CaseOutcome {
    /// From a flight that ends at first contact.
    pub fn from_flight(flight: &Flight) -> Self {
        Self { metrics: flight.metrics, rest_m: None, rest_distance_m: None }
    }

    /// From a flight played out to rest.
    pub fn from_rest(to_rest: &FlightToRest) -> Self {
        let rest = to_rest.ground.rest_position_m;
        Self { metrics: to_rest.flight.metrics, rest_m: Some([rest.x, rest.y]), rest_distance_m: Some(to_rest.rest_distance_m()) }
    }

    /// Landing point (x, y) in m.
    pub fn landing_m(&self) -> [f64; 2] {
        [self.metrics.landing_position_m.x, self.metrics.landing_position_m.y]
    }

    /// The metric called `name` (see [`METRICS`]); rest metrics are NaN-free: without ground
    /// play they are an error.
    pub fn metric(&self, name: &str) -> Result<f64, StudyError> {
        let m = &self.metrics;
        let no_rest = || StudyError::NotApplicable { name: name.to_string(), reason: "the case has no ground play".into() };
        Ok(match name {
            "carry_m" => m.carry_m,
            "landing_x_m" => m.landing_position_m.x,
            "landing_y_m" => m.landing_position_m.y,
            "landing_downrange_m" => m.landing_downrange_m,
            "landing_lateral_m" => m.landing_lateral_m,
            "apex_m" => m.apex_m,
            "time_aloft_s" => m.time_aloft_s,
            "landing_speed_mps" => m.landing_speed_mps,
            "turn_m" => m.turn_m,
            "fade_m" => m.fade_m,
            "spin_kept_fraction" => m.spin_kept_fraction,
            "heading_change_deg" => m.heading_change_rad.to_degrees(),
            "rest_x_m" => self.rest_m.ok_or_else(no_rest)?[0],
            "rest_y_m" => self.rest_m.ok_or_else(no_rest)?[1],
            "rest_distance_m" => self.rest_distance_m.ok_or_else(no_rest)?,
            _ => return Err(unknown_metric(name)),
        })
    }
}

/// The unit of a metric, or [`StudyError::UnknownMetric`].
pub fn metric_unit(name: &str) -> Result<&'static str, StudyError> {
    METRICS.iter().find(|(n, _, _)| *n == name).map(|(_, u, _)| *u).ok_or_else(|| unknown_metric(name))
}

fn unknown_metric(name: &str) -> StudyError {
    let known: Vec<&str> = METRICS.iter().map(|(n, _, _)| *n).collect();
    StudyError::UnknownMetric { name: name.to_string(), known: known.join(", ") }
}
