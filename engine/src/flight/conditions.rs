use std::sync::Arc;

use crate::air::AirProperties;
use crate::wind::{CalmAir, WindField};

use super::FlightError;

/// The surroundings of a flight: air, wind and gravity.
#[derive(Debug, Clone)]
pub struct FlightConditions {
    /// Air properties (density, viscosity), taken constant over the flight.
    /// Default: sea-level International Standard Atmosphere (1.2250 kg/m³).
    pub air: AirProperties,
    /// Wind field, world frame. Default: [`CalmAir`].
    pub wind: Arc<dyn WindField>,
    /// Gravitational acceleration g in m/s², acting along −z. Default: standard gravity
    /// 9.80665 m/s² ([`crate::STANDARD_GRAVITY_MPS2`]).
    pub gravity_mps2: f64,
}

impl Default for FlightConditions {
    fn default() -> Self {
        Self { air: AirProperties::sea_level_standard(), wind: Arc::new(CalmAir), gravity_mps2: crate::STANDARD_GRAVITY_MPS2 }
    }
}

impl FlightConditions {
    /// The same conditions in a vacuum (density 0): no aerodynamic loads at all.
    pub fn vacuum() -> Self {
        Self { air: AirProperties::vacuum(), ..Self::default() }
    }

    /// Checks density ≥ 0 and gravity ≥ 0, both finite.
    pub fn validate(&self) -> Result<(), FlightError> {
        let check = |field: &'static str, value: f64| {
            if value.is_finite() && value >= 0.0 {
                Ok(())
            } else {
                Err(FlightError::InvalidConditions { field, value, range: "finite and ≥ 0" })
            }
        };
        check("air.density_kg_m3", self.air.density_kg_m3)?;
        check("air.dynamic_viscosity_pa_s", self.air.dynamic_viscosity_pa_s)?;
        check("gravity_mps2", self.gravity_mps2)
    }
}
