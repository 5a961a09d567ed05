//! The rigid-body equations of motion of a spinning disc (6 degrees of freedom).
//!
//! # State
//! Position **r** and velocity **v** of the centre of mass, the unit symmetry axis **n**, its
//! rate **ṅ**, and the spin ω_s about **n**: 13 numbers ([`StateVector`]). For an axisymmetric
//! body this is complete: the angle of the body about **n** does not enter the equations, and the
//! angular velocity is **ω** = ω_s **n** + **n** × **ṅ** (the transverse part **ω**⊥ satisfies
//! **ṅ** = **ω**⊥ × **n**, hence **n** × **ṅ** = **ω**⊥).
//!
//! # Equations
//! Translation: m **v̇** = **F**_aero + m **g**, with **g** = (0, 0, −g).
//!
//! Rotation, about the centre of mass, from dH/dt = **M** (Euler's law; Goldstein, Poole & Safko
//! (2002), §5.5), with the principal moments I_z (symmetry axis) and I_x (any diameter):
//!
//! **H** = I_z ω_s **n** + I_x **n** × **ṅ**, so
//! d**H**/dt = I_z ω̇_s **n** + I_z ω_s **ṅ** + I_x **n** × **n̈** = **M**  (because **ṅ** × **ṅ** = 0).
//!
//! - Dotting with **n** (**n**·**ṅ** = 0, **n**·(**n** × **n̈**) = 0): **I_z ω̇_s = M·n**.
//! - Crossing **n** from the left, with **n** × (**n** × **n̈**) = **n**(**n**·**n̈**) − **n̈**:
//!   **n** × **M** = I_z ω_s **n** × **ṅ** + I_x(**n**(**n**·**n̈**) − **n̈**).
//!   Differentiating **n**·**ṅ** = 0 gives **n**·**n̈** = −|**ṅ**|², hence
//!   **n̈ = −|ṅ|² n + (I_z ω_s n × ṅ − n × M) / I_x**.
//!
//! Sign check of the moment term: on a body at rest (ω_s = 0, **ṅ** = 0) the equation reads
//! I_x **n̈** = **M** × **n**, a rotation of **n** about the moment's axis, as it must be. For a
//! fast spinner the gyroscopic term dominates and **n** precesses with **H** ≈ I_z ω_s **n** at
//! the rate |**M**⊥| / (I_z |ω_s|) (steady gyroscopic precession; Kleppner & Kolenkow (2014),
//! ch. 7).
//!
//! # Constraints
//! |**n**| = 1 and **n**·**ṅ** = 0 are kept by projection: every derivative is evaluated on
//! [`DiscState::projected`] (unit **n**, **ṅ** with its component along **n** removed), and every
//! state the flight integrator reports is projected the same way.
mod body;
mod equations;
mod error;
mod state;

pub use body::DiscBody;
pub use equations::{normal_acceleration, state_derivative, Loads};
pub use error::BodyError;
pub use state::{DiscState, StateVector, STATE_LEN};
