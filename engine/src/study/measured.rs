//! Measured flights for calibration, and their CSV form.
//!
//! # CSV columns
//! A header line names the columns (any order; blank lines and lines starting with `#` are
//! skipped; fields separated by commas, no quoting):
//!
//! | column | unit | required | meaning |
//! | --- | --- | --- | --- |
//! | `flight` | text | yes | label; rows with the same label belong to one flight |
//! | `speed_mps` | m/s | yes | release speed |
//! | `spin_rps` | rev/s | yes | release spin |
//! | `launch_deg` | ° | yes | launch angle |
//! | `nose_deg` | ° | yes | nose angle |
//! | `hyzer_deg` | ° | yes | roll, positive hyzer |
//! | `heading_deg` | ° | no (0) | heading, positive to the left |
//! | `height_m` | m | no (1.0) | release height |
//! | `style` | `backhand`/`forehand` | no (backhand) | throwing style |
//! | `hand` | `right`/`left` | no (right) | throwing hand |
//! | `t_s` | s | yes | time of the observation since release (the flight time for a landing) |
//! | `x_m`, `y_m` | m | yes | position downrange and to the left |
//! | `z_m` | m | no | height; empty or absent: the row is a landing point (x, y) and time aloft |
//!
//! Release columns must agree on every row of a flight.
use serde::{Deserialize, Serialize};

use crate::{Hand, ReleaseState, Style};

use super::StudyError;

/// One observation of a measured flight.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Observation {
    /// The centre of mass at a time.
    Position {
        /// Time since release, s.
        time_s: f64,
        /// Position (x, y, z), m.
        position_m: [f64; 3],
    },
    /// Where and when the disc landed.
    Landing {
        /// Time aloft, s.
        time_s: f64,
        /// Landing point (x, y), m.
        landing_m: [f64; 2],
    },
}

/// A measured flight: its release and what was observed.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct MeasuredFlight {
    /// Label.
    pub label: String,
    /// The release state.
    pub release: ReleaseState,
    /// Observations.
    pub observations: Vec<Observation>,
}

const REQUIRED: [&str; 9] = ["flight", "speed_mps", "spin_rps", "launch_deg", "nose_deg", "hyzer_deg", "t_s", "x_m", "y_m"];
const OPTIONAL: [&str; 5] = ["heading_deg", "height_m", "style", "hand", "z_m"];

fn csv_error(line: usize, column: usize, message: impl Into<String>) -> StudyError {
    StudyError::Csv { line, column, message: message.into() }
}

struct Header(Vec<String>);

impl Header {
    fn parse(line_no: usize, line: &str) -> Result<Self, StudyError> {
        let names: Vec<String> = line.split(',').map(|s| s.trim().to_string()).collect();
        for (k, name) in names.iter().enumerate() {
            if !REQUIRED.contains(&name.as_str()) && !OPTIONAL.contains(&name.as_str()) {
                let known = [REQUIRED.as_slice(), OPTIONAL.as_slice()].concat().join(", ");
                return Err(csv_error(line_no, k + 1, format!("unknown column \"{name}\"; known: {known}")));
            }
            if names[..k].contains(name) {
                return Err(csv_error(line_no, k + 1, format!("column \"{name}\" appears twice")));
            }
        }
        if let Some(missing) = REQUIRED.iter().find(|r| !names.iter().any(|n| n == *r)) {
            return Err(csv_error(line_no, 0, format!("missing column \"{missing}\"")));
        }
        Ok(Self(names))
    }

    fn column(&self, name: &str) -> Option<usize> {
        self.0.iter().position(|n| n == name)
    }
}

struct Row<'a> {
    line: usize,
    fields: Vec<&'a str>,
    header: &'a Header,
}

impl Row<'_> {
    fn text(&self, name: &str) -> Option<(usize, &str)> {
        let k = self.header.column(name)?;
        let field = self.fields[k].trim();
        (!field.is_empty()).then_some((k + 1, field))
    }

    fn number(&self, name: &str, default: Option<f64>) -> Result<f64, StudyError> {
        match (self.text(name), default) {
            (None, Some(d)) => Ok(d),
            (None, None) => Err(csv_error(self.line, self.header.column(name).map_or(0, |k| k + 1), format!("{name} is empty"))),
            (Some((col, text)), _) => match text.parse::<f64>() {
                Ok(v) if v.is_finite() => Ok(v),
                _ => Err(csv_error(self.line, col, format!("{name}: \"{text}\" is not a finite number"))),
            },
        }
    }

    fn release(&self) -> Result<ReleaseState, StudyError> {
        let style = match self.text("style") {
            None | Some((_, "backhand")) => Style::Backhand,
            Some((_, "forehand")) => Style::Forehand,
            Some((col, other)) => return Err(csv_error(self.line, col, format!("style \"{other}\": use backhand or forehand"))),
        };
        let hand = match self.text("hand") {
            None | Some((_, "right")) => Hand::Right,
            Some((_, "left")) => Hand::Left,
            Some((col, other)) => return Err(csv_error(self.line, col, format!("hand \"{other}\": use right or left"))),
        };
        Ok(ReleaseState {
            speed_mps: self.number("speed_mps", None)?,
            spin_rad_s: self.number("spin_rps", None)? * std::f64::consts::TAU,
            launch_rad: self.number("launch_deg", None)?.to_radians(),
            nose_rad: self.number("nose_deg", None)?.to_radians(),
            roll_rad: self.number("hyzer_deg", None)?.to_radians(),
            heading_rad: self.number("heading_deg", Some(0.0))?.to_radians(),
            height_m: self.number("height_m", Some(1.0))?,
            off_axis_rate_rad_s: 0.0,
            off_axis_direction_rad: 0.0,
            style,
            hand,
        })
    }

    fn observation(&self) -> Result<Observation, StudyError> {
        let time_s = self.number("t_s", None)?;
        let (x, y) = (self.number("x_m", None)?, self.number("y_m", None)?);
        Ok(match self.text("z_m") {
            None => Observation::Landing { time_s, landing_m: [x, y] },
            Some(_) => Observation::Position { time_s, position_m: [x, y, self.number("z_m", None)?] },
        })
    }
}

/// Parses measured flights from CSV text (columns in the module docs). Errors name the line and
/// column (1-based).
pub fn parse_measured_flights(text: &str) -> Result<Vec<MeasuredFlight>, StudyError> {
    let mut lines = text.lines().enumerate().map(|(k, l)| (k + 1, l)).filter(|(_, l)| !l.trim().is_empty() && !l.trim_start().starts_with('#'));
    let (header_line, header_text) = lines.next().ok_or_else(|| csv_error(1, 0, "no header line"))?;
    let header = Header::parse(header_line, header_text)?;
    let mut flights: Vec<MeasuredFlight> = Vec::new();
    for (line, text) in lines {
        let fields: Vec<&str> = text.split(',').collect();
        if fields.len() != header.0.len() {
            return Err(csv_error(line, 0, format!("{} fields, the header has {}", fields.len(), header.0.len())));
        }
        let row = Row { line, fields, header: &header };
        let (_, label) = row.text("flight").ok_or_else(|| csv_error(line, header.column("flight").map_or(0, |k| k + 1), "flight label is empty"))?;
        let release = row.release()?;
        let observation = row.observation()?;
        match flights.iter_mut().find(|f| f.label == label) {
            Some(f) if f.release != release => return Err(csv_error(line, 0, format!("release of flight \"{label}\" differs from its first row"))),
            Some(f) => f.observations.push(observation),
            None => flights.push(MeasuredFlight { label: label.to_string(), release, observations: vec![observation] }),
        }
    }
    if flights.is_empty() {
        return Err(csv_error(header_line, 0, "no data rows after the header"));
    }
    Ok(flights)
}
