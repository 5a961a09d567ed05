//! The coefficient set of a case, with scale factors on lift, drag and pitching moment.
use serde::{Deserialize, Serialize};

use crate::{AeroCoefficients, AeroInput, AeroModel, LinearCoefficients, ModelInfo, TabulatedCoefficients};

/// A coefficient set a study can change by name.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum BaseModel {
    /// The linear model (every coefficient addressable as `model.<field>`).
    Linear {
        /// The set.
        set: LinearCoefficients,
    },
    /// A tabulated set (addressable through the scale factors only).
    Tabulated {
        /// The set.
        set: TabulatedCoefficients,
    },
}

/// Factors multiplying the lift, drag and pitching-moment coefficients of a set (1 = unchanged).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct ModelScale {
    /// Factor on C_L.
    pub lift: f64,
    /// Factor on C_D.
    pub drag: f64,
    /// Factor on C_M (pitching moment, including its rate term).
    pub pitch: f64,
}

impl Default for ModelScale {
    fn default() -> Self {
        Self { lift: 1.0, drag: 1.0, pitch: 1.0 }
    }
}

/// The coefficient set of a case and its scale factors.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct CaseModel {
    /// The set.
    pub base: BaseModel,
    /// Scale factors (default 1).
    #[serde(default)]
    pub scale: ModelScale,
}

impl CaseModel {
    /// A linear set, unscaled.
    pub fn linear(set: LinearCoefficients) -> Self {
        Self { base: BaseModel::Linear { set }, scale: ModelScale::default() }
    }

    /// A tabulated set, unscaled.
    pub fn tabulated(set: TabulatedCoefficients) -> Self {
        Self { base: BaseModel::Tabulated { set }, scale: ModelScale::default() }
    }

    /// A linear set equal to this model with its scale factors folded in (lift factor on C_L0
    /// and C_Lα, drag factor on C_D0 and C_Dα, pitch factor on C_M0, C_Mα and C_Mq); `None`
    /// for a tabulated set. Flights with it equal flights with [`scaled`](Self::scaled).
    pub fn folded_linear(&self) -> Option<LinearCoefficients> {
        let BaseModel::Linear { set } = &self.base else { return None };
        let s = self.scale;
        let mut folded = set.clone();
        folded.lift_at_zero *= s.lift;
        folded.lift_slope_per_rad *= s.lift;
        folded.drag_min *= s.drag;
        folded.drag_growth_per_rad2 *= s.drag;
        folded.pitch_at_zero *= s.pitch;
        folded.pitch_slope_per_rad *= s.pitch;
        folded.rates.pitch_damping *= s.pitch;
        folded.info = self.scaled().info();
        Some(folded)
    }

    /// The model the integrator uses (the base set with the scale factors applied).
    pub fn scaled(&self) -> ScaledModel<'_> {
        let base: &dyn AeroModel = match &self.base {
            BaseModel::Linear { set } => set,
            BaseModel::Tabulated { set } => set,
        };
        ScaledModel { base, scale: self.scale }
    }
}

/// A borrowed set with scale factors on lift, drag and pitch.
#[derive(Debug, Clone, Copy)]
pub struct ScaledModel<'a> {
    base: &'a dyn AeroModel,
    scale: ModelScale,
}

impl AeroModel for ScaledModel<'_> {
    fn coefficients(&self, input: &AeroInput) -> AeroCoefficients {
        let c = self.base.coefficients(input);
        AeroCoefficients { lift: c.lift * self.scale.lift, drag: c.drag * self.scale.drag, pitch: c.pitch * self.scale.pitch, ..c }
    }

    fn info(&self) -> ModelInfo {
        let mut info = self.base.info();
        if self.scale != ModelScale::default() {
            let s = self.scale;
            info.name = format!("{} (scaled: lift ×{}, drag ×{}, pitch ×{})", info.name, s.lift, s.drag, s.pitch);
        }
        info
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn folding_the_scales_gives_the_same_coefficients() {
        let set = crate::demo_driver();
        let model = CaseModel { base: BaseModel::Linear { set }, scale: ModelScale { lift: 0.9, drag: 1.2, pitch: 0.7 } };
        let folded = model.folded_linear().expect("a linear set folds");
        for (alpha_deg, q) in [(-10.0, 0.0), (0.0, 3.0), (8.0, -5.0), (25.0, 1.0)] {
            let input = AeroInput {
                angle_of_attack_rad: f64::to_radians(alpha_deg),
                airspeed_mps: 20.0,
                spin_rad_s: -90.0,
                pitch_rate_rad_s: q,
                roll_rate_rad_s: 0.5 * q,
                advance_ratio: 0.5,
                reynolds_number: 3.0e5,
            };
            let (a, b) = (model.scaled().coefficients(&input), folded.coefficients(&input));
            for (x, y) in [(a.lift, b.lift), (a.drag, b.drag), (a.pitch, b.pitch), (a.roll, b.roll), (a.spin, b.spin)] {
                assert!((x - y).abs() <= 1e-12 * x.abs().max(1.0), "{x} vs {y} at {alpha_deg} deg, q {q}");
            }
        }
    }
}
