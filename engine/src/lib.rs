//! # spinfoil-engine
//!
//! The simulation engine of Spinfoil: pure computation, no files, no printing, no global state.
//! Everything is SI inside (m, kg, s, rad, N, Pa, K); the scripting layer converts user units at
//! its boundary.
//!
//! Parts, one folder each:
//! - [`geometry`](crate::geometry): cross-section outlines of a disc (from points or parametric families).
//! - [`layup`](crate::layup): materials and the regions of the outline they fill.
//! - [`mass`](crate::mass): mass properties of the revolved solid (mass, centre of mass, I_z, I_x).
//! - [`standards`](crate::standards): checks against the sport's technical standard, as warnings.
//! - [`mesh`](crate::mesh): the revolved outline as a closed triangle mesh (STL).
//! - [`air`](crate::air): standard atmosphere, humidity, viscosity.
//! - [`wind`](crate::wind): wind fields (logarithmic profile, gusts).
//! - [`aero`](crate::aero): aerodynamic coefficient models behind one trait.
//! - [`throw`](crate::throw): release states and effort forms.
//! - [`dynamics`](crate::dynamics): the rigid-body equations of motion.
//! - [`flight`](crate::flight): integration, landing, trajectory and metrics.
//! - [`study`](crate::study): sweeps, dispersion, calibration, optimisation, flight signatures.
//! - [`ground`](crate::ground): surfaces, rim contact, impacts and ground play after landing.
//!
//! World frame: x downrange, y to the left, z up. The disc's symmetry axis is the unit normal
//! **n** out of the top of the flight plate; spin ω_s is signed about **n** (a right-handed
//! backhand spins clockwise seen from above, ω_s < 0).
#![deny(missing_docs)]

pub mod aero;
pub mod air;
pub mod dynamics;
#[cfg(feature = "evcxr-display")] pub mod evcxr_display;
pub mod flight;
pub mod geometry;
pub mod ground;
pub mod layup;
pub mod mass;
pub mod mesh;
pub mod standards;
pub mod study;
pub mod throw;
pub mod wind;

pub use aero::*;
pub use air::*;
pub use dynamics::*;
pub use flight::*;
pub use geometry::*;
pub use ground::*;
pub use layup::*;
pub use mass::*;
pub use mesh::*;
pub use standards::*;
pub use study::*;
pub use throw::*;
pub use wind::*;

/// Standard gravity g0 in m/s² (the conventional value adopted by the CGPM, 1901).
pub const STANDARD_GRAVITY_MPS2: f64 = 9.80665;

/// Everything a script host or notebook usually needs, in one import.
pub mod prelude {
    pub use crate::*;
}
