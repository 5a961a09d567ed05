use serde::{Deserialize, Serialize};

use super::atmosphere::{dry_air_density_kg_m3, isa_pressure_pa, isa_temperature_k, ISA_TOP_ALTITUDE_M};
use super::humidity::{buck_enhancement_factor, buck_saturation_vapour_pressure_pa, humid_air_density_kg_m3};
use super::range::InputRangeError;
use super::viscosity::sutherland_viscosity_pa_s;
use super::AirProperties;

/// Allowed altitude: −500 … 20 000 m geopotential (the ISA troposphere and isothermal layer).
pub const ALTITUDE_RANGE_M: (f64, f64) = (-500.0, ISA_TOP_ALTITUDE_M);
/// Allowed temperature offset from the standard atmosphere: −40 … +40 K.
pub const TEMPERATURE_OFFSET_RANGE_K: (f64, f64) = (-40.0, 40.0);
/// Allowed measured temperature: −40 … +60 °C, i.e. 233.15 … 333.15 K.
pub const MEASURED_TEMPERATURE_RANGE_K: (f64, f64) = (233.15, 333.15);
/// Allowed measured static pressure: 50 … 110 kPa.
pub const MEASURED_PRESSURE_RANGE_PA: (f64, f64) = (50_000.0, 110_000.0);
/// Allowed relative humidity: 0 … 100 %.
pub const RELATIVE_HUMIDITY_RANGE_PCT: (f64, f64) = (0.0, 100.0);

/// Where the air's pressure and temperature come from.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case", deny_unknown_fields)]
pub enum AirSource {
    /// The International Standard Atmosphere at a geopotential altitude, optionally warmer or
    /// colder than standard. The altitude is taken as a pressure altitude: the offset changes the
    /// temperature only, the pressure stays the standard value (the aviation "ISA deviation").
    Standard {
        /// Geopotential altitude in m (−500 … 20 000).
        altitude_m: f64,
        /// Temperature offset from the standard value in K (−40 … +40; default 0).
        #[serde(default)]
        temperature_offset_k: f64,
    },
    /// Measured static pressure and temperature (a weather station or a hand-held meter).
    Measured {
        /// Static pressure in Pa (50 000 … 110 000); station pressure, not reduced to sea level.
        pressure_pa: f64,
        /// Temperature in K (233.15 … 333.15, i.e. −40 … +60 °C).
        temperature_k: f64,
    },
}

/// Settings that describe the air of a flight; [`AirSpec::build`] validates them and produces
/// [`AirProperties`].
///
/// ```
/// use spinfoil_engine::AirSpec;
/// let air = AirSpec::standard(1_000.0).with_relative_humidity_pct(60.0).build().unwrap();
/// assert!((air.density_kg_m3 - 1.105).abs() < 0.005);
/// ```
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct AirSpec {
    /// Pressure and temperature: standard atmosphere or measured.
    pub source: AirSource,
    /// Relative humidity over liquid water in % (0 … 100; default 0, dry air).
    #[serde(default)]
    pub relative_humidity_pct: f64,
    /// Apply Buck's (1981) enhancement factor to the saturation vapour pressure (default false).
    #[serde(default)]
    pub enhancement_factor: bool,
}

/// The air produced by an [`AirSpec`], with the humidity terms that went into its density.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct HumidAir {
    /// Density, viscosity, temperature and pressure for the flight.
    pub properties: AirProperties,
    /// Saturation vapour pressure at the air's temperature in Pa (Buck 1981, with the
    /// enhancement factor when asked).
    pub saturation_vapour_pressure_pa: f64,
    /// Partial pressure of water vapour in Pa.
    pub vapour_pressure_pa: f64,
    /// Density the same air would have dry, in kg/m³.
    pub dry_density_kg_m3: f64,
}

/// Invalid air settings.
#[derive(Debug, Clone, PartialEq, thiserror::Error)]
#[non_exhaustive]
pub enum AirError {
    /// A number is not finite or out of its allowed range.
    #[error("air: {0}")]
    OutOfRange(#[from] InputRangeError),
}

impl AirSpec {
    /// Dry standard air at geopotential altitude `altitude_m` (m).
    pub fn standard(altitude_m: f64) -> Self {
        Self::from_source(AirSource::Standard { altitude_m, temperature_offset_k: 0.0 })
    }

    /// Dry standard air at `altitude_m` (m), `temperature_offset_k` (K) warmer than standard.
    pub fn standard_with_offset(altitude_m: f64, temperature_offset_k: f64) -> Self {
        Self::from_source(AirSource::Standard { altitude_m, temperature_offset_k })
    }

    /// Dry air at measured `pressure_pa` (Pa) and `temperature_k` (K).
    pub fn measured(pressure_pa: f64, temperature_k: f64) -> Self {
        Self::from_source(AirSource::Measured { pressure_pa, temperature_k })
    }

    fn from_source(source: AirSource) -> Self {
        Self { source, relative_humidity_pct: 0.0, enhancement_factor: false }
    }

    /// The same air with relative humidity `relative_humidity_pct` (%).
    pub fn with_relative_humidity_pct(mut self, relative_humidity_pct: f64) -> Self {
        self.relative_humidity_pct = relative_humidity_pct;
        self
    }

    /// The same air, with or without Buck's enhancement factor.
    pub fn with_enhancement_factor(mut self, enabled: bool) -> Self {
        self.enhancement_factor = enabled;
        self
    }

    /// Validates the settings and computes the air's properties.
    pub fn build(&self) -> Result<AirProperties, AirError> {
        Ok(self.build_detailed()?.properties)
    }

    /// Like [`AirSpec::build`], also returning the humidity terms.
    pub fn build_detailed(&self) -> Result<HumidAir, AirError> {
        let check = InputRangeError::check_within;
        let (pressure_pa, temperature_k) = self.source.pressure_and_temperature()?;
        let relative_humidity_pct =
            check("relative_humidity_pct", self.relative_humidity_pct, RELATIVE_HUMIDITY_RANGE_PCT, "%")?;
        let saturation_vapour_pressure_pa = self.saturation_vapour_pressure_pa(pressure_pa, temperature_k);
        let vapour_pressure_pa = relative_humidity_pct / 100.0 * saturation_vapour_pressure_pa;
        let properties = AirProperties {
            density_kg_m3: humid_air_density_kg_m3(pressure_pa, temperature_k, vapour_pressure_pa),
            dynamic_viscosity_pa_s: sutherland_viscosity_pa_s(temperature_k),
            temperature_k,
            pressure_pa,
        };
        let dry_density_kg_m3 = dry_air_density_kg_m3(pressure_pa, temperature_k);
        Ok(HumidAir { properties, saturation_vapour_pressure_pa, vapour_pressure_pa, dry_density_kg_m3 })
    }

    fn saturation_vapour_pressure_pa(&self, pressure_pa: f64, temperature_k: f64) -> f64 {
        let pure_pa = buck_saturation_vapour_pressure_pa(temperature_k - 273.15);
        let factor = if self.enhancement_factor { buck_enhancement_factor(pressure_pa) } else { 1.0 };
        // Saturated vapour can never exceed the total pressure (only reachable far outside the
        // validated ranges, kept as a guard).
        (pure_pa * factor).min(pressure_pa)
    }
}

impl AirSource {
    /// Validated static pressure (Pa) and temperature (K).
    pub fn pressure_and_temperature(&self) -> Result<(f64, f64), AirError> {
        let check = InputRangeError::check_within;
        match *self {
            AirSource::Standard { altitude_m, temperature_offset_k } => {
                let altitude_m = check("altitude_m", altitude_m, ALTITUDE_RANGE_M, "m")?;
                let offset_k =
                    check("temperature_offset_k", temperature_offset_k, TEMPERATURE_OFFSET_RANGE_K, "K")?;
                Ok((isa_pressure_pa(altitude_m), isa_temperature_k(altitude_m) + offset_k))
            }
            AirSource::Measured { pressure_pa, temperature_k } => Ok((
                check("pressure_pa", pressure_pa, MEASURED_PRESSURE_RANGE_PA, "Pa")?,
                check("temperature_k", temperature_k, MEASURED_TEMPERATURE_RANGE_K, "K")?,
            )),
        }
    }
}

impl Default for AirSpec {
    /// Dry standard air at sea level.
    fn default() -> Self {
        Self::standard(0.0)
    }
}
