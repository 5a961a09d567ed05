//! A first-guess coefficient set from a disc's outline dimensions: estimate from the outline,
//! first guess, not a measurement.
//!
//! Formulas (α in rad, d the diameter, f the dome height, t the total thickness
//! max(rim depth, dome height + plate thickness), w the rim width, r_le the leading-edge radius):
//! - lift slope, Helmbold's equation for a low-aspect-ratio wing with the circular planform's
//!   aspect ratio AR = 4/π: C_Lα = 2π·AR / (2 + √(AR² + 4)) ≈ 1.83 /rad
//!   (source: Helmbold (1942), as given in aerodynamics textbooks; CHECKS.md: ≈ 1.8 /rad);
//! - camber from the dome, read as a parabolic mean line of relative camber ε = f/d. Thin-aerofoil
//!   theory gives the zero-lift angle α_L0 = −2ε, so C_L0 = −C_Lα·α_L0 = 2ε·C_Lα, and the
//!   quarter-chord moment C_m,c/4 = −πε;
//! - pitching moment about the centre: lift acts at the quarter chord, d/4 ahead of the centre,
//!   so C_M = C_m,c/4 + ¼·C_L, i.e. C_M0 = −πε + ¼·C_L0 and C_Mα = ¼·C_Lα (common practice, no
//!   published source for discs);
//! - induced drag (Prandtl's lifting-line result, span efficiency 1): C_Di = C_L²/(π·AR), so
//!   C_Dα = C_Lα²/(π·AR) about α0 = α_L0;
//! - least drag C_D0: laminar skin friction on both faces, 2·1.328/√Re at Re = 3×10⁵ (Blasius),
//!   plus the rim's frontal area 4t/(πd) (relative to the planform) times a pressure-drag factor
//!   k = e/(1 + w/t), where e = 1 − ½·min(1, 2r_le/t) credits a rounded nose (k is a heuristic,
//!   common practice, no published source);
//! - rate terms: Hummel's (2003) damping values C_Mq, C_Rp, C_Nr (rad/s, values from memory,
//!   unverified); his roll-from-spin term C_Rr is left out (zero): as remembered it outweighs
//!   every other moment at typical spins (see [`hummel_2003`]), and spin effects on the
//!   forces and moments are small in wind-tunnel tests (Potts & Crowther, 2002).
use serde::{Deserialize, Serialize};

use super::error::{check_range, AeroError};
use super::linear::LinearCoefficients;
use super::model::ModelInfo;
use super::published::hummel_2003;
use super::rates::RateTerms;

/// Aspect ratio of a circular planform, b²/S = d²/(πd²/4) = 4/π.
pub const CIRCULAR_ASPECT_RATIO: f64 = 4.0 / std::f64::consts::PI;

/// Reynolds number at which the skin friction of the estimate is taken (about 22 m/s on a
/// 0.21 m disc at sea level).
const ESTIMATE_REYNOLDS: f64 = 3.0e5;

/// The outline dimensions the estimate reads, in m.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct WingShape {
    /// Outside diameter d, m (0.05 to 1).
    pub diameter_m: f64,
    /// Rim depth (from the rim's underside to the top of the wing), m.
    pub rim_depth_m: f64,
    /// Dome height of the flight plate above the rim's top, m.
    pub dome_height_m: f64,
    /// Rim width (radial, from the outer edge to the inner rim), m.
    pub rim_width_m: f64,
    /// Leading-edge (nose) radius, m.
    pub leading_edge_radius_m: f64,
    /// Flight-plate thickness, m.
    pub plate_thickness_m: f64,
}

impl WingShape {
    /// Checks each dimension is finite and plausible relative to the diameter.
    pub fn validate(&self) -> Result<(), AeroError> {
        check_range("diameter_m (m)", self.diameter_m, 0.05, 1.0)?;
        let d = self.diameter_m;
        check_range("rim_depth_m (m)", self.rim_depth_m, 1e-4, 0.5 * d)?;
        check_range("dome_height_m (m)", self.dome_height_m, 0.0, 0.25 * d)?;
        check_range("rim_width_m (m)", self.rim_width_m, 1e-4, 0.5 * d)?;
        check_range("leading_edge_radius_m (m)", self.leading_edge_radius_m, 0.0, 0.25 * d)?;
        check_range("plate_thickness_m (m)", self.plate_thickness_m, 1e-4, 0.25 * d)
    }

    /// Total thickness t = max(rim depth, dome height + plate thickness), m.
    pub fn thickness_m(&self) -> f64 {
        self.rim_depth_m.max(self.dome_height_m + self.plate_thickness_m)
    }
}

/// Helmbold's lift slope (per rad) of a wing of aspect ratio `aspect_ratio`:
/// 2π·AR / (2 + √(AR² + 4)).
pub fn helmbold_lift_slope_per_rad(aspect_ratio: f64) -> f64 {
    2.0 * std::f64::consts::PI * aspect_ratio / (2.0 + (aspect_ratio * aspect_ratio + 4.0).sqrt())
}

/// A first-guess [`LinearCoefficients`] set from the outline (formulas in the module docs),
/// labelled "estimate from the outline: first guess, not a measurement".
pub fn estimate_coefficients(shape: &WingShape) -> Result<LinearCoefficients, AeroError> {
    shape.validate()?;
    let pi = std::f64::consts::PI;
    let lift_slope = helmbold_lift_slope_per_rad(CIRCULAR_ASPECT_RATIO);
    let camber = shape.dome_height_m / shape.diameter_m;
    let zero_lift_alpha = -2.0 * camber;
    let lift_at_zero = -lift_slope * zero_lift_alpha;
    LinearCoefficients {
        info: estimate_info(),
        lift_at_zero,
        lift_slope_per_rad: lift_slope,
        drag_min: least_drag(shape),
        drag_growth_per_rad2: lift_slope * lift_slope / (pi * CIRCULAR_ASPECT_RATIO),
        drag_min_alpha_rad: zero_lift_alpha,
        pitch_at_zero: -pi * camber + 0.25 * lift_at_zero,
        pitch_slope_per_rad: 0.25 * lift_slope,
        rates: RateTerms { roll_from_spin: 0.0, ..hummel_2003().rates },
    }
    .validated()
}

/// C_D0 of the estimate: skin friction plus the rim's pressure drag (module docs).
fn least_drag(shape: &WingShape) -> f64 {
    let skin = 2.0 * 1.328 / ESTIMATE_REYNOLDS.sqrt();
    let t = shape.thickness_m();
    let rounded_nose = 1.0 - 0.5 * (2.0 * shape.leading_edge_radius_m / t).min(1.0);
    let pressure_factor = rounded_nose / (1.0 + shape.rim_width_m / t);
    let frontal_over_planform = 4.0 * t / (std::f64::consts::PI * shape.diameter_m);
    skin + pressure_factor * frontal_over_planform
}

fn estimate_info() -> ModelInfo {
    ModelInfo {
        name: "estimate from the outline".into(),
        source: "estimate from the outline: Helmbold lift slope, thin-aerofoil camber, lifting-line induced drag, rim pressure-drag heuristic".into(),
        confidence: "estimate from the outline: first guess, not a measurement".into(),
    }
}
