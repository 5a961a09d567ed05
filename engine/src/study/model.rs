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
