//! Flight: integration of the equations of motion ([`crate::dynamics`]) from a release to the
//! first ground contact, the sampled trajectory, and the flight metrics.
//!
//! - Integrator: adaptive Dormand–Prince 5(4) (`ode_solvers::Dopri5`) with its continuous
//!   (dense) output; tolerances and limits in [`FlightSettings`].
//! - Loads: [`crate::aero::aero_loads`] with the air-relative velocity **v** − **w**(**r**, t),
//!   plus gravity along −z ([`FlightConditions`]).
//! - Landing: the lowest rim point z_low = z − R·√(1 − n_z²) (ground at z = 0; see
//!   [`crate::DiscState::lowest_rim_height_m`]). The solver stops after the first step that ends
//!   with z_low < 0; the crossing is then found by bisection on that step's dense output to
//!   [`FlightSettings::landing_time_tolerance_s`], so the reported landing has |z_low| far below
//!   1 mm. A release with z_low < 0 is rejected; a release with z_low = 0 (e.g. a flat disc at
//!   height 0) counts as airborne until the rim comes back down to the ground.
//! - Failures: non-finite loads or states, divergence guards, step-size collapse and step
//!   limits end the flight with a [`FlightError`] naming the time and the quantity; no NaN is
//!   ever returned.
//! - Initial state from a [`crate::ReleaseState`]: [`initial_state`] documents how the velocity,
//!   **n**, **ṅ** and ω_s are constructed.
//! - Wobble: the angle between **n** and the angular momentum's line; the helpers that turn a
//!   wobble angle into a release's transverse rate, and the derivation, are in the `wobble`
//!   module ([`wobble_rate_for_angle`]).
mod conditions;
mod error;
mod fly;
mod metrics;
mod release;
mod sample;
mod settings;
mod system;
mod trajectory;
mod wobble;

pub use conditions::FlightConditions;
pub use error::FlightError;
pub use fly::{fly, Flight};
pub use metrics::FlightMetrics;
pub use release::initial_state;
pub use sample::{angle_of_attack_rad, wobble_rad, FlightSample};
pub use settings::FlightSettings;
pub use wobble::{release_with_wobble, wobble_angle_for_rate, wobble_rate_for_angle, MAX_WOBBLE_RAD};
