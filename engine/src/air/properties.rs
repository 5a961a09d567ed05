use serde::{Deserialize, Serialize};

/// The state of the air a disc flies through, as the flight integrator needs it.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct AirProperties {
    /// Density in kg/m³.
    pub density_kg_m3: f64,
    /// Dynamic viscosity in Pa·s.
    pub dynamic_viscosity_pa_s: f64,
    /// Temperature in K.
    pub temperature_k: f64,
    /// Static pressure in Pa.
    pub pressure_pa: f64,
}

impl AirProperties {
    /// Air with no density at all: a vacuum, for checks against point-mass ballistics.
    pub fn vacuum() -> Self {
        Self { density_kg_m3: 0.0, dynamic_viscosity_pa_s: 0.0, temperature_k: 288.15, pressure_pa: 0.0 }
    }

    /// Dry air at sea level in the International Standard Atmosphere (ISO 2533:1975):
    /// 1.2250 kg/m³, 1.7894×10⁻⁵ Pa·s, 288.15 K, 101 325 Pa.
    pub fn sea_level_standard() -> Self {
        Self {
            density_kg_m3: 1.2250,
            dynamic_viscosity_pa_s: 1.7894e-5,
            temperature_k: 288.15,
            pressure_pa: 101_325.0,
        }
    }
}

impl AirProperties {
    /// Kinematic viscosity μ/ρ in m²/s (infinite in a vacuum).
    pub fn kinematic_viscosity_m2_s(&self) -> f64 {
        self.dynamic_viscosity_pa_s / self.density_kg_m3
    }

    /// Reynolds number ρ V d / μ of a disc of diameter `diameter_m` (m) at airspeed `speed_mps`
    /// (m/s) in this air (dimensionless; 0 in a vacuum).
    pub fn reynolds_number(&self, speed_mps: f64, diameter_m: f64) -> f64 {
        super::reynolds_number(self.density_kg_m3, speed_mps, diameter_m, self.dynamic_viscosity_pa_s)
    }
}
