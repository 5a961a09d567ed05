//! From release to rest: the flight to first rim contact, then the ground play after it.
use serde::{Deserialize, Serialize};

use super::body::ContactBody;
use super::error::GroundError;
use super::play::GroundPlay;
use super::play_out::play_out_landing;
use super::rim::lowest_rim_point;
use super::settings::GroundSettings;
use super::state::ContactState;
use super::terrain::Ground;
use crate::aero::AeroModel;
use crate::dynamics::{DiscBody, DiscState};
use crate::flight::{fly, Flight, FlightConditions, FlightSettings};
use crate::throw::ReleaseState;

/// Below this depth (m) of the rim under the ground plane at the flight's landing, the ground
/// was met before the flight ended (the flight's landing event uses level ground at z = 0).
const BELOW_GROUND_TOLERANCE_M: f64 = 1e-6;

/// A throw from release to rest.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct FlightToRest {
    /// The flight from release to the first rim contact.
    pub flight: Flight,
    /// Everything after the first contact, to rest.
    pub ground: GroundPlay,
}

impl FlightToRest {
    /// Horizontal distance from the release point to the rest point, m.
    pub fn rest_distance_m(&self) -> f64 {
        let shift = self.ground.rest_position_m - self.flight.release_state.position_m;
        shift.x.hypot(shift.y)
    }
}

impl From<DiscBody> for ContactBody {
    /// The flight body as the ground sees it (not validated here; [`play_out_landing`] checks).
    fn from(body: DiscBody) -> Self {
        ContactBody {
            mass_kg: body.mass_kg,
            spin_inertia_kg_m2: body.spin_inertia_kg_m2,
            transverse_inertia_kg_m2: body.transverse_inertia_kg_m2,
            radius_m: body.radius_m(),
        }
    }
}

impl ContactState {
    /// The flight integrator's state as a contact state (ω = ω_s **n** + **n** × ṅ).
    pub fn from_disc_state(state: &DiscState) -> Result<Self, GroundError> {
        ContactState::from_axis_rate(state.position_m, state.velocity_mps, state.normal, state.normal_rate_per_s, state.spin_rad_s)
    }
}

/// Flies a throw with [`fly`] and plays its landing out on `ground` with [`play_out_landing`].
///
/// The flight ends at first rim contact with level ground at z = 0. A ground plane that lies
/// lower there (below z = 0, or sloping away) is reached by a short fall without air loads; a
/// plane above the rim at that moment would have been hit earlier and is a typed error
/// ([`GroundError::GroundAboveLanding`]). Gravity comes from `conditions`.
pub fn fly_to_rest(
    body: &DiscBody,
    model: &dyn AeroModel,
    release: &ReleaseState,
    conditions: &FlightConditions,
    flight_settings: &FlightSettings,
    ground: &Ground,
    ground_settings: &GroundSettings,
) -> Result<FlightToRest, GroundError> {
    let flight = fly(body, model, release, conditions, flight_settings)?;
    if !flight.landed {
        return Err(GroundError::FlightDidNotLand { time_s: flight.metrics.time_aloft_s });
    }
    let contact_body = ContactBody::from(*body);
    let landing = ContactState::from_disc_state(&flight.landing_state)?;
    let rim = lowest_rim_point(&ground.plane, &landing.position_m, &landing.normal, contact_body.radius_m);
    if rim.gap_m < -BELOW_GROUND_TOLERANCE_M {
        return Err(GroundError::GroundAboveLanding { depth_m: -rim.gap_m });
    }
    let settings = GroundSettings { gravity_mps2: conditions.gravity_mps2, ..*ground_settings };
    let ground_play = play_out_landing(&contact_body, ground, &landing, &settings)?;
    Ok(FlightToRest { flight, ground: ground_play })
}
