//! A study case: one disc, one coefficient set, one throw, one set of conditions → one flight.
use std::sync::Arc;

use serde::{Deserialize, Serialize};

use crate::{
    fly, fly_to_rest, AeroModel, AirSpec, DiscBody, DiscDesign, FlightConditions, FlightSettings, Ground, GroundSettings,
    Effort, EffortThrow, MassProperties, ReleasePose, ReleaseState, WindSpec,
};

use super::model::CaseModel;
use super::outcome::CaseOutcome;
use super::StudyError;

/// The disc of a case: a bare rigid body, or a design whose mass properties are rebuilt from its
/// outline and layup whenever a disc, layup or outline input changes.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum CaseDisc {
    /// Mass, inertias and diameter given directly.
    Body {
        /// The rigid body (SI).
        body: DiscBody,
    },
    /// A design (outline + layup + mass target), evaluated by [`DiscDesign::evaluate`].
    Design {
        /// The design.
        design: DiscDesign,
    },
}

impl CaseDisc {
    /// The rigid body the integrator moves (evaluates a design; diameter from its outline).
    pub fn body(&self) -> Result<DiscBody, StudyError> {
        match self {
            CaseDisc::Body { body } => Ok(*body),
            CaseDisc::Design { design } => {
                let report = design.evaluate()?;
                Ok(DiscBody::from_mass_properties(&report.properties, report.outline.diameter_m()))
            }
        }
    }
}

/// One flight of a study: disc, coefficient set, release, air, wind, optional ground, settings.
/// Inputs are addressable by name ([`StudyCase::set`], [`super::INPUTS`]).
#[derive(Debug, Clone, Serialize, Deserialize)]
pub struct StudyCase {
    /// The disc.
    pub disc: CaseDisc,
    /// The coefficient set, with scale factors.
    pub model: CaseModel,
    /// The release state. With an [`effort`](Self::effort), only its pose (angles, height,
    /// wobble, style, hand) is used: the effort and the disc give speed and spin.
    pub release: ReleaseState,
    /// A player's effort (work and wrist torque, or coupled work): when set, the release speed
    /// and spin come from it and the disc's mass properties (work–energy theorem), so designs
    /// compare "from the same throw".
    #[serde(default)]
    pub effort: Option<Effort>,
    /// The air.
    pub air: AirSpec,
    /// The wind.
    pub wind: WindSpec,
    /// The ground: `None` ends at first contact; `Some` plays the landing out to rest.
    pub ground: Option<Ground>,
    /// Integrator settings (samples off by default in studies).
    pub flight_settings: FlightSettings,
    /// Ground-play settings.
    pub ground_settings: GroundSettings,
}

impl StudyCase {
    /// A case in calm sea-level standard air without ground play; flight samples off.
    pub fn new(disc: CaseDisc, model: CaseModel, release: ReleaseState) -> Self {
        Self {
            disc,
            model,
            release,
            effort: None,
            air: AirSpec::standard(0.0),
            wind: WindSpec::calm(),
            ground: None,
            flight_settings: FlightSettings { record_samples: false, ..FlightSettings::default() },
            ground_settings: GroundSettings::default(),
        }
    }

    /// The flight conditions (air and wind built from their specifications).
    pub fn conditions(&self) -> Result<FlightConditions, StudyError> {
        let air = self.air.build()?;
        let wind = self.wind.build()?;
        Ok(FlightConditions { air, wind: Arc::new(wind), ..FlightConditions::default() })
    }

    /// Flies the case (rebuilding the body from the disc).
    pub fn run(&self) -> Result<CaseOutcome, StudyError> {
        self.run_with_body(&self.disc.body()?)
    }

    /// Flies the case with a body computed beforehand (studies that do not change the disc
    /// evaluate it once).
    pub fn run_with_body(&self, body: &DiscBody) -> Result<CaseOutcome, StudyError> {
        let conditions = self.conditions()?;
        let model = self.model.scaled();
        let model: &dyn AeroModel = &model;
        let release = self.release_for(body)?;
        match &self.ground {
            None => {
                let flight = fly(body, model, &release, &conditions, &self.flight_settings)?;
                Ok(CaseOutcome::from_flight(&flight))
            }
            Some(ground) => {
                let settings = &self.flight_settings;
                let to_rest = fly_to_rest(body, model, &release, &conditions, settings, ground, &self.ground_settings)?;
                Ok(CaseOutcome::from_rest(&to_rest))
            }
        }
    }

    /// The release state this case flies with `body`: the stored release, or, with an effort,
    /// its pose with the speed and spin the effort gives this disc.
    pub fn release_for(&self, body: &DiscBody) -> Result<ReleaseState, StudyError> {
        let Some(effort) = self.effort else { return Ok(self.release) };
        let r = &self.release;
        let pose = ReleasePose {
            launch_rad: r.launch_rad,
            nose_rad: r.nose_rad,
            roll_rad: r.roll_rad,
            heading_rad: r.heading_rad,
            height_m: r.height_m,
            off_axis_rate_rad_s: r.off_axis_rate_rad_s,
            off_axis_direction_rad: r.off_axis_direction_rad,
            style: r.style,
            hand: r.hand,
        };
        let mass = MassProperties {
            mass_kg: body.mass_kg,
            cg_height_m: 0.0,
            spin_inertia_kg_m2: body.spin_inertia_kg_m2,
            transverse_inertia_kg_m2: body.transverse_inertia_kg_m2,
        };
        Ok(EffortThrow { effort, pose }.release(&mass, body.radius_m())?)
    }
}
