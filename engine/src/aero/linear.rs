//! The linear coefficient model (the form of Hummel, 2003): coefficients linear in α (drag
//! quadratic), plus rate terms.
use serde::{Deserialize, Serialize};

use super::error::{check_range, AeroError};
use super::model::{AeroCoefficients, AeroInput, AeroModel, ModelInfo};
use super::rates::RateTerms;

/// A linear coefficient set in our axes (see [`AeroInput`]), α in rad:
///
/// - C_L = `lift_at_zero` + `lift_slope_per_rad` · α
/// - C_D = `drag_min` + `drag_growth_per_rad2` · (α − `drag_min_alpha_rad`)²
/// - C_M = `pitch_at_zero` + `pitch_slope_per_rad` · α + pitch-rate term (positive nose-up)
/// - roll and spin moments from [`RateTerms`] only.
///
/// The model is linear at every α; published sets were fitted below stall (|α| up to about
/// 30°), so values far outside that range are extrapolations.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct LinearCoefficients {
    /// Name, source and confidence of the set.
    pub info: ModelInfo,
    /// C_L0: lift coefficient at α = 0.
    pub lift_at_zero: f64,
    /// C_Lα: lift slope, per rad.
    pub lift_slope_per_rad: f64,
    /// C_D0: least drag coefficient (≥ 0).
    pub drag_min: f64,
    /// C_Dα: growth of drag with (α − α0)², per rad² (≥ 0).
    pub drag_growth_per_rad2: f64,
    /// α0: angle of attack of least drag, rad.
    pub drag_min_alpha_rad: f64,
    /// C_M0: pitching-moment coefficient at α = 0 (positive nose-up).
    pub pitch_at_zero: f64,
    /// C_Mα: pitching-moment slope, per rad.
    pub pitch_slope_per_rad: f64,
    /// Pitch damping, roll and spin terms, with their rate convention.
    pub rates: RateTerms,
}

impl LinearCoefficients {
    /// Checks every value: finite, drag terms ≥ 0, |α0| ≤ 45°, damping terms ≤ 0.
    pub fn validate(&self) -> Result<(), AeroError> {
        let any = f64::MAX;
        check_range("lift_at_zero C_L0", self.lift_at_zero, -any, any)?;
        check_range("lift_slope_per_rad C_Lα (1/rad)", self.lift_slope_per_rad, -any, any)?;
        check_range("drag_min C_D0", self.drag_min, 0.0, any)?;
        check_range("drag_growth_per_rad2 C_Dα (1/rad²)", self.drag_growth_per_rad2, 0.0, any)?;
        let quarter = std::f64::consts::FRAC_PI_4;
        check_range("drag_min_alpha_rad α0 (rad)", self.drag_min_alpha_rad, -quarter, quarter)?;
        check_range("pitch_at_zero C_M0", self.pitch_at_zero, -any, any)?;
        check_range("pitch_slope_per_rad C_Mα (1/rad)", self.pitch_slope_per_rad, -any, any)?;
        self.rates.validate()
    }

    /// `self` if [`validate`](Self::validate) passes.
    pub fn validated(self) -> Result<Self, AeroError> {
        self.validate().map(|()| self)
    }

    /// C_L at α (rad).
    pub fn lift(&self, alpha_rad: f64) -> f64 {
        self.lift_at_zero + self.lift_slope_per_rad * alpha_rad
    }

    /// C_D at α (rad).
    pub fn drag(&self, alpha_rad: f64) -> f64 {
        let offset = alpha_rad - self.drag_min_alpha_rad;
        self.drag_min + self.drag_growth_per_rad2 * offset * offset
    }

    /// Static C_M at α (rad), without the pitch-rate term.
    pub fn static_pitch(&self, alpha_rad: f64) -> f64 {
        self.pitch_at_zero + self.pitch_slope_per_rad * alpha_rad
    }

    /// The angle of attack (rad) where the static pitching moment vanishes (trim), if the slope
    /// is not zero.
    pub fn trim_alpha_rad(&self) -> Option<f64> {
        (self.pitch_slope_per_rad != 0.0).then(|| -self.pitch_at_zero / self.pitch_slope_per_rad)
    }
}

impl AeroModel for LinearCoefficients {
    fn coefficients(&self, input: &AeroInput) -> AeroCoefficients {
        let alpha = input.angle_of_attack_rad;
        let rate = self.rates.moments(input);
        AeroCoefficients {
            lift: self.lift(alpha),
            drag: self.drag(alpha),
            roll: rate.roll,
            pitch: self.static_pitch(alpha) + rate.pitch,
            spin: rate.spin,
        }
    }

    fn info(&self) -> ModelInfo {
        self.info.clone()
    }
}
