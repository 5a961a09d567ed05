//! Ground: surfaces, contact with the rim, impacts and ground play after landing.
//!
//! - [`Ground`]: a [`GroundPlane`] (flat or sloped, at most [`MAX_GROUND_SLOPE_DEG`]) with a
//!   [`Surface`] (Coulomb friction μ, restitution e, rolling resistance c_rr), from a
//!   [`SurfacePreset`] (approximate values, each with its source) or user values (validated).
//! - [`ContactBody`] and [`ContactState`]: the disc as a rigid thin disc of rim radius R, and
//!   its state at first contact.
//! - [`lowest_rim_point`]: the rim's lowest point against a (sloped) plane.
//! - [`resolve_impact`]: the rigid-body impact with friction and restitution at the contact
//!   point (spin included through ω × r); energy never increases.
//! - [`play_out_landing`]: impacts and skips, then a flat slide (ring friction couples slide and
//!   spin) or a roll on the rim, until rest, as a [`GroundPlay`].
//! - [`fly_to_rest`]: a throw from release to rest ([`crate::fly`], then the ground play).
//!
//! ## Model, in order
//! 1. **Contact point**: the disc is a thin rigid disc of rim radius R; its lowest rim point
//!    against a plane of unit normal k̂ is c − R k̂⊥/|k̂⊥| with k̂⊥ = k̂ − (k̂·n)n
//!    ([`lowest_rim_point`]); a disc lying flat touches with its whole rim (contact at the centre).
//! 2. **Impact** ([`resolve_impact`]): impulse-space integration with Coulomb friction (stick or
//!    slip at every increment) and Stronge's energetic coefficient of restitution, using the
//!    full inertia tensor of the axisymmetric disc in world axes and the contact point's
//!    velocity v + ω × r. Energy never increases; angular momentum about the contact point is
//!    kept; without friction the result equals Newton's rule.
//! 3. **Skip or settle**: the disc leaves the ground again when its centre rebounds faster than
//!    [`GroundSettings::skip_min_speed_mps`] (a skip) or, while still tilted more than
//!    [`GroundSettings::settle_max_tilt_rad`], its rim lifts off that fast (the far edge then
//!    slaps down). In the air it moves ballistically (no air loads) with exact torque-free
//!    rotation. Contacts that follow each other within [`GroundSettings::min_flight_s`] count as
//!    sustained contact and the disc settles.
//! 4. **Slide** (tilt below [`GroundSettings::roll_min_tilt_rad`]): the disc is laid flat at once,
//!    keeping its velocity along the ground and its angular momentum about the ground normal;
//!    then its rim, a ring carrying the normal load uniformly, slides with Coulomb friction on
//!    every element, which couples sliding and spinning (a spinning disc slides further; both
//!    stop together). Without spin the stopping distance is v²/(2μg cos α) on level or sloped
//!    ground (with the slope's pull added).
//! 5. **Roll** (nearly upright discs): a wheel rolling straight along the rim tangent at the
//!    contact with rolling resistance c_rr; the rolling speed comes from the angular momentum
//!    about the contact point. Lean-driven curving and the final fall are not modelled.
//!
//! Every value is SI. Predictions are estimates: keep clear of the throwing lane and check
//! landing zones for people and property.
mod airborne;
mod body;
mod error;
mod impact;
mod plane;
mod play;
mod play_out;
mod rim;
mod roll;
mod settings;
mod slide;
mod state;
mod surface;
mod terrain;
mod to_rest;

pub use body::ContactBody;
pub use error::GroundError;
pub use impact::{resolve_impact, ImpactOutcome};
pub use plane::{GroundPlane, MAX_GROUND_SLOPE_DEG};
pub use play::{GroundEnding, GroundPhase, GroundPlay, GroundSample};
pub use play_out::play_out_landing;
pub use rim::{lowest_rim_point, RimContact, FLAT_TILT_SINE};
pub use settings::GroundSettings;
pub use state::ContactState;
pub use surface::{Surface, SurfacePreset};
pub use terrain::Ground;
pub use to_rest::{fly_to_rest, FlightToRest};
