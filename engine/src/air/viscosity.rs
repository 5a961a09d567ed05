/// Sutherland's constant β = 1.458×10⁻⁶ kg/(m·s·K^½) (U.S. Standard Atmosphere 1976).
pub const SUTHERLAND_BETA_KG_M_S_SQRT_K: f64 = 1.458e-6;
/// Sutherland's temperature S = 110.4 K (U.S. Standard Atmosphere 1976).
pub const SUTHERLAND_TEMPERATURE_K: f64 = 110.4;

/// Dynamic viscosity of dry air in Pa·s at `temperature_k` (K), Sutherland's law as used by the
/// U.S. Standard Atmosphere 1976: μ = β T^{3/2} / (T + S).
///
/// Humidity changes air's viscosity by well under 1 % at ordinary temperatures; it is ignored
/// (the viscosity only enters the Reynolds number).
pub fn sutherland_viscosity_pa_s(temperature_k: f64) -> f64 {
    SUTHERLAND_BETA_KG_M_S_SQRT_K * temperature_k.powf(1.5) / (temperature_k + SUTHERLAND_TEMPERATURE_K)
}
