//! The International Standard Atmosphere (ISO 2533:1975, identical to the U.S. Standard
//! Atmosphere 1976 below 32 km): temperature and pressure against geopotential altitude, for the
//! troposphere (0–11 km, lapse rate −6.5 K/km) and the lower stratosphere (11–20 km, isothermal).

use crate::STANDARD_GRAVITY_MPS2;

/// Sea-level standard temperature T0 = 288.15 K (ISO 2533:1975).
pub const ISA_SEA_LEVEL_TEMPERATURE_K: f64 = 288.15;
/// Sea-level standard pressure p0 = 101 325 Pa (ISO 2533:1975).
pub const ISA_SEA_LEVEL_PRESSURE_PA: f64 = 101_325.0;
/// Temperature lapse rate of the troposphere, −0.0065 K/m (ISO 2533:1975).
pub const ISA_TROPOSPHERE_LAPSE_K_PER_M: f64 = -0.0065;
/// Geopotential altitude of the tropopause, 11 000 m (ISO 2533:1975).
pub const ISA_TROPOPAUSE_ALTITUDE_M: f64 = 11_000.0;
/// Top of the layers modelled here, 20 000 m geopotential (end of the isothermal layer).
pub const ISA_TOP_ALTITUDE_M: f64 = 20_000.0;
/// Specific gas constant of dry air, 287.05287 J/(kg·K) (ISO 2533:1975; U.S. Standard
/// Atmosphere 1976 gives R* / M0 = 8314.32 / 28.9644).
pub const DRY_AIR_GAS_CONSTANT_J_KG_K: f64 = 287.05287;
/// Effective Earth radius r0 = 6 356 766 m used to convert geometric to geopotential altitude
/// (U.S. Standard Atmosphere 1976).
pub const EARTH_RADIUS_FOR_GEOPOTENTIAL_M: f64 = 6_356_766.0;

/// Standard temperature in K at geopotential altitude `altitude_m` (m), for −500 … 20 000 m.
pub fn isa_temperature_k(altitude_m: f64) -> f64 {
    let troposphere_m = altitude_m.min(ISA_TROPOPAUSE_ALTITUDE_M);
    ISA_SEA_LEVEL_TEMPERATURE_K + ISA_TROPOSPHERE_LAPSE_K_PER_M * troposphere_m
}

/// Standard static pressure in Pa at geopotential altitude `altitude_m` (m), for −500 … 20 000 m.
///
/// Troposphere: p = p0 (T/T0)^(−g0/(L R)); above the tropopause: p = p11 exp(−g0 (H − 11 km)/(R T11)).
pub fn isa_pressure_pa(altitude_m: f64) -> f64 {
    if altitude_m <= ISA_TROPOPAUSE_ALTITUDE_M {
        return troposphere_pressure_pa(altitude_m);
    }
    let tropopause_temperature_k = isa_temperature_k(ISA_TROPOPAUSE_ALTITUDE_M);
    let scale_height_m = DRY_AIR_GAS_CONSTANT_J_KG_K * tropopause_temperature_k / STANDARD_GRAVITY_MPS2;
    troposphere_pressure_pa(ISA_TROPOPAUSE_ALTITUDE_M)
        * (-(altitude_m - ISA_TROPOPAUSE_ALTITUDE_M) / scale_height_m).exp()
}

fn troposphere_pressure_pa(altitude_m: f64) -> f64 {
    let ratio = isa_temperature_k(altitude_m) / ISA_SEA_LEVEL_TEMPERATURE_K;
    let exponent = -STANDARD_GRAVITY_MPS2 / (ISA_TROPOSPHERE_LAPSE_K_PER_M * DRY_AIR_GAS_CONSTANT_J_KG_K);
    ISA_SEA_LEVEL_PRESSURE_PA * ratio.powf(exponent)
}

/// Geopotential altitude in m of a point `geometric_altitude_m` (m) above mean sea level:
/// H = r0 z / (r0 + z). Below 3 km the two differ by less than 1.5 m.
pub fn geopotential_altitude_m(geometric_altitude_m: f64) -> f64 {
    let r0 = EARTH_RADIUS_FOR_GEOPOTENTIAL_M;
    r0 * geometric_altitude_m / (r0 + geometric_altitude_m)
}

/// Density of dry air in kg/m³ from the ideal-gas law ρ = p / (R T), with `pressure_pa` (Pa)
/// and `temperature_k` (K).
pub fn dry_air_density_kg_m3(pressure_pa: f64, temperature_k: f64) -> f64 {
    pressure_pa / (DRY_AIR_GAS_CONSTANT_J_KG_K * temperature_k)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn sea_level_is_the_defining_state() {
        // source: ISO 2533:1975 Standard Atmosphere, defining constants
        assert_eq!(isa_temperature_k(0.0), 288.15);
        assert_eq!(isa_pressure_pa(0.0), 101_325.0);
        assert!((dry_air_density_kg_m3(101_325.0, 288.15) - 1.2250).abs() < 1e-4);
    }

    #[test]
    fn pressure_is_continuous_at_the_tropopause() {
        let below = isa_pressure_pa(ISA_TROPOPAUSE_ALTITUDE_M - 1e-6);
        let above = isa_pressure_pa(ISA_TROPOPAUSE_ALTITUDE_M + 1e-6);
        assert!((below - above).abs() / below < 1e-9);
    }
}
