//! Air: the International Standard Atmosphere, humidity and viscosity.
mod properties;
pub use properties::AirProperties;
