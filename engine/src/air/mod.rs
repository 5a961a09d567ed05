//! Air: the International Standard Atmosphere, humidity and viscosity.
//!
//! [`AirSpec`] describes the air of a flight (standard atmosphere at an altitude with an optional
//! temperature offset, or measured pressure and temperature; relative humidity) and builds the
//! [`AirProperties`] the integrator uses. The pieces are public for tables and checks:
//! [`isa_temperature_k`], [`isa_pressure_pa`] (ISO 2533:1975), [`buck_saturation_vapour_pressure_pa`]
//! (Buck 1981), [`humid_air_density_kg_m3`] (ideal-gas mixture), [`sutherland_viscosity_pa_s`]
//! (U.S. Standard Atmosphere 1976), and the flight's [`reynolds_number`] and [`advance_ratio`].
mod atmosphere;
mod humidity;
mod properties;
mod range;
mod similarity;
mod spec;
mod viscosity;

pub use atmosphere::*;
pub use humidity::*;
pub use properties::AirProperties;
pub use range::InputRangeError;
pub use similarity::{advance_ratio, reynolds_number};
pub use spec::*;
pub use viscosity::*;
