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
