//! Water vapour in the air: Buck's (1981) saturation vapour pressure over water, his optional
//! enhancement factor, and the density of the ideal-gas mixture of dry air and water vapour.

use super::atmosphere::DRY_AIR_GAS_CONSTANT_J_KG_K;

/// Specific gas constant of water vapour, 461.5 J/(kg·K) (R* / M_w = 8.314 / 0.018015;
/// common practice in meteorology, e.g. the WMO guide, value from memory, unverified).
pub const WATER_VAPOUR_GAS_CONSTANT_J_KG_K: f64 = 461.5;

/// Saturation vapour pressure over liquid water in Pa at `temperature_c` (°C), Buck (1981):
/// e_s = 6.1121 exp(17.502 t / (240.97 + t)) hPa.
///
/// Source: Buck, A. L. (1981), New equations for computing vapor pressure and enhancement factor,
/// J. Appl. Meteor. 20, 1527–1532. Best between −20 and +50 °C; below 0 °C it is the pressure over
/// supercooled water, which is how relative humidity is reported by weather services.
pub fn buck_saturation_vapour_pressure_pa(temperature_c: f64) -> f64 {
    611.21 * (17.502 * temperature_c / (240.97 + temperature_c)).exp()
}

/// Buck's (1981) enhancement factor f = 1.0007 + 3.46×10⁻⁶ P (P in hPa) for `pressure_pa` (Pa):
/// saturated moist air holds slightly more vapour than pure vapour would (about 0.4 % at sea
/// level). The coefficients are quoted from memory, unverified. Dimensionless.
pub fn buck_enhancement_factor(pressure_pa: f64) -> f64 {
    1.0007 + 3.46e-6 * (pressure_pa / 100.0)
}

/// Density in kg/m³ of humid air at total `pressure_pa` (Pa) and `temperature_k` (K) holding
/// water vapour at partial pressure `vapour_pressure_pa` (Pa): the ideal-gas mixture
/// ρ = (p − e)/(R_d T) + e/(R_v T).
pub fn humid_air_density_kg_m3(pressure_pa: f64, temperature_k: f64, vapour_pressure_pa: f64) -> f64 {
    let dry_pa = pressure_pa - vapour_pressure_pa;
    dry_pa / (DRY_AIR_GAS_CONSTANT_J_KG_K * temperature_k)
        + vapour_pressure_pa / (WATER_VAPOUR_GAS_CONSTANT_J_KG_K * temperature_k)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn vapour_makes_air_lighter() {
        // Water vapour (18 g/mol) is lighter than dry air (29 g/mol): physics law (Avogadro).
        let dry = humid_air_density_kg_m3(101_325.0, 293.15, 0.0);
        let humid = humid_air_density_kg_m3(101_325.0, 293.15, 2_337.0);
        assert!(humid < dry);
    }

    #[test]
    fn buck_at_zero_celsius_is_its_constant() {
        // source: Buck (1981), J. Appl. Meteor. 20, 1527–1532: e_s(0 °C) = 6.1121 hPa
        assert_eq!(buck_saturation_vapour_pressure_pa(0.0), 611.21);
    }
}
