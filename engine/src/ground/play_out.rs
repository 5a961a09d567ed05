//! The ground phase from first rim contact to rest: impacts, skips, then a slide or a roll.
use super::airborne::fly_to_contact;
use super::body::ContactBody;
use super::error::{finite, positive, GroundError};
use super::impact::{resolve_impact, ImpactOutcome};
use super::play::{GroundEnding, GroundPhase, GroundPlay, PhaseContext, Recorder, Settled};
use super::rim::lowest_rim_point;
use super::roll::roll_to_rest;
use super::settings::GroundSettings;
use super::slide::slide_to_rest;
use super::state::ContactState;
use super::terrain::Ground;

/// Plays a landing out on the ground until the disc rests.
///
/// `landing` is the disc's state at first rim contact (the end of the flight); if the rim is
/// still above the ground the disc first falls freely to it. Sequence: a rigid-body impact at
/// the lowest rim point ([`resolve_impact`]); if the centre of mass then leaves the ground
/// faster than [`GroundSettings::skip_min_speed_mps`] the disc skips (ballistic, torque-free)
/// to the next contact and impacts again; otherwise it settles: nearly upright discs (tilt ≥
/// [`GroundSettings::roll_min_tilt_rad`]) roll on the rim, the rest lie flat and slide (see the
/// model notes in [`crate::ground`]).
pub fn play_out_landing(
    body: &ContactBody,
    ground: &Ground,
    landing: &ContactState,
    settings: &GroundSettings,
) -> Result<GroundPlay, GroundError> {
    let body = body.validated()?;
    let landing = landing.validated()?;
    validate_settings(settings)?;
    let mut recorder = Recorder::new(settings.sample_interval_s);
    recorder.mark(0.0, &landing, GroundPhase::Airborne);
    let bounce = bounce_until_settled(&body, ground, landing, settings, &mut recorder)?;
    let context = PhaseContext { body: &body, ground, settings };
    let Settled { ending, elapsed_s: settle_s, state: rest } = match bounce.settled {
        Some(state) => settle(&context, &state, bounce.time_s, &mut recorder),
        None => Settled { ending: GroundEnding::Unsettled, elapsed_s: 0.0, state: bounce.last },
    };
    let time_to_rest_s = bounce.time_s + settle_s;
    guard_finite(&rest, time_to_rest_s)?;
    recorder.mark(time_to_rest_s, &rest, GroundPhase::Rest);
    let ending = if ending == GroundEnding::Slid && settle_s == 0.0 { GroundEnding::Stopped } else { ending };
    Ok(summarise(&body, landing, rest, recorder, ending, time_to_rest_s, bounce))
}

/// Where the impacts and skips left the disc.
struct Bounces {
    /// The state after the last impact if the disc stays on the ground (`None`: time ran out).
    settled: Option<ContactState>,
    /// The last state reached.
    last: ContactState,
    time_s: f64,
    impacts: usize,
    skips: usize,
}

fn bounce_until_settled(
    body: &ContactBody,
    ground: &Ground,
    landing: ContactState,
    settings: &GroundSettings,
    recorder: &mut Recorder,
) -> Result<Bounces, GroundError> {
    let mut tally = Bounces { settled: None, last: landing, time_s: 0.0, impacts: 0, skips: 0 };
    if !fall_to_contact(body, ground, settings, recorder, &mut tally) {
        return Ok(tally);
    }
    loop {
        let outcome = impact(body, ground, &tally.last, tally.time_s)?;
        tally.impacts += 1;
        tally.last = outcome.state;
        guard_finite(&tally.last, tally.time_s)?;
        recorder.mark(tally.time_s, &tally.last, GroundPhase::Impact);
        if !leaves_ground(ground, &outcome, settings) || tally.impacts >= settings.max_impacts {
            tally.settled = Some(tally.last);
            return Ok(tally);
        }
        let took_off_s = tally.time_s;
        if !fall_to_contact(body, ground, settings, recorder, &mut tally) {
            return Ok(tally);
        }
        if tally.time_s - took_off_s < settings.min_flight_s {
            // Impacts crowding together mean sustained contact, which impacts cannot represent.
            tally.settled = Some(tally.last);
            return Ok(tally);
        }
        tally.skips += usize::from(rebounds(ground, &outcome, settings));
    }
}

/// Flies the disc (if its rim is above the ground) to the next contact; false if time ran out.
fn fall_to_contact(body: &ContactBody, ground: &Ground, settings: &GroundSettings, recorder: &mut Recorder, tally: &mut Bounces) -> bool {
    let rim = lowest_rim_point(&ground.plane, &tally.last.position_m, &tally.last.normal, body.radius_m);
    if rim.gap_m <= 0.0 && tally.skips == 0 && tally.impacts == 0 {
        return true;
    }
    let limit = settings.max_time_s - tally.time_s;
    match fly_to_contact(body, &ground.plane, tally.last, settings, tally.time_s, limit, recorder) {
        Some((elapsed, state)) => {
            tally.time_s += elapsed;
            tally.last = state;
            true
        }
        None => false,
    }
}

fn impact(body: &ContactBody, ground: &Ground, state: &ContactState, time_s: f64) -> Result<ImpactOutcome, GroundError> {
    let rim = lowest_rim_point(&ground.plane, &state.position_m, &state.normal, body.radius_m);
    resolve_impact(body, state, &rim.arm_m, &ground.plane.normal(), &ground.surface, time_s)
}

/// The disc leaves the ground again if its centre of mass rebounds faster than the skip
/// threshold, or if it is still clearly tilted and the contact point separates faster than the
/// threshold (the rim lifts off and the far edge will slap down). A nearly flat disc whose
/// centre does not rebound settles, which ends the rattling of a spinning, slightly tilted disc.
fn leaves_ground(ground: &Ground, outcome: &ImpactOutcome, settings: &GroundSettings) -> bool {
    let k = ground.plane.normal();
    let tilt = outcome.state.normal.dot(&k).abs().min(1.0).acos();
    let lifts = outcome.contact_velocity_mps.dot(&k) > settings.skip_min_speed_mps;
    rebounds(ground, outcome, settings) || (lifts && tilt > settings.settle_max_tilt_rad)
}

/// Whether the centre of mass moves away from the ground faster than the skip threshold.
fn rebounds(ground: &Ground, outcome: &ImpactOutcome, settings: &GroundSettings) -> bool {
    outcome.state.velocity_mps.dot(&ground.plane.normal()) > settings.skip_min_speed_mps
}

fn settle(context: &PhaseContext, state: &ContactState, t0_s: f64, recorder: &mut Recorder) -> Settled {
    let tilt_cosine = state.normal.dot(&context.ground.plane.normal()).abs().min(1.0);
    if tilt_cosine.acos() >= context.settings.roll_min_tilt_rad {
        roll_to_rest(context, state, t0_s, recorder)
    } else {
        slide_to_rest(context, state, t0_s, recorder)
    }
}

fn summarise(
    body: &ContactBody,
    landing: ContactState,
    rest: ContactState,
    recorder: Recorder,
    ending: GroundEnding,
    time_to_rest_s: f64,
    bounce: Bounces,
) -> GroundPlay {
    let shift = rest.position_m - landing.position_m;
    GroundPlay {
        samples: recorder.samples,
        landing_position_m: landing.position_m,
        rest_position_m: rest.position_m,
        ground_play_m: shift.x.hypot(shift.y),
        time_to_rest_s,
        ending,
        impacts: bounce.impacts,
        skips: bounce.skips,
        landing_energy_j: landing.kinetic_energy_j(body),
        rest_state: rest,
    }
}

fn guard_finite(state: &ContactState, time_s: f64) -> Result<(), GroundError> {
    match state.non_finite_quantity() {
        Some(quantity) => Err(GroundError::NonFiniteState { quantity, time_s }),
        None => Ok(()),
    }
}

fn validate_settings(settings: &GroundSettings) -> Result<(), GroundError> {
    positive("gravity (m/s²)", settings.gravity_mps2)?;
    positive("ground time step (s)", settings.step_s)?;
    positive("ground sample interval (s)", settings.sample_interval_s)?;
    positive("ground time limit (s)", settings.max_time_s)?;
    finite("skip threshold speed (m/s)", settings.skip_min_speed_mps)?;
    finite("rolling tilt threshold (rad)", settings.roll_min_tilt_rad)?;
    finite("rest speed (m/s)", settings.rest_speed_mps)?;
    finite("settling tilt threshold (rad)", settings.settle_max_tilt_rad)?;
    finite("minimum skip flight time (s)", settings.min_flight_s)?;
    Ok(())
}
