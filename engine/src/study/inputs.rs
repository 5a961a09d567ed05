//! Inputs of a case addressable by name, in user units: (name, unit, meaning).
use crate::{AirSource, CaseDisc, Effort, GustSpec, Layup, MassTarget, OutlineSource};

use super::model::BaseModel;
use super::{StudyCase, StudyError};

/// Every input a study can set by name, with its unit and meaning.
pub const INPUTS: &[(&str, &str, &str)] = &[
    ("throw.speed_mps", "m/s", "release speed"),
    ("throw.spin_rps", "rev/s", "spin magnitude"),
    ("throw.spin_rad_s", "rad/s", "spin magnitude"),
    ("throw.launch_deg", "°", "launch angle of the velocity above horizontal"),
    ("throw.nose_deg", "°", "nose angle of the disc plane above the velocity"),
    ("throw.hyzer_deg", "°", "roll: positive hyzer, negative anhyzer"),
    ("throw.heading_deg", "°", "heading of the velocity, positive to the left"),
    ("throw.height_m", "m", "release height"),
    ("throw.wobble_rad_s", "rad/s", "off-axis angular velocity at release"),
    ("effort.work_j", "J", "work of an effort throw (linear work, or the coupled form's total work)"),
    ("effort.wrist_torque_n_m", "N·m", "wrist torque of an independent effort"),
    ("effort.rim_speed_ratio", "1", "rim speed over release speed of a coupled effort"),
    ("env.wind_mps", "m/s", "mean wind speed at the reference height"),
    ("env.wind_from_deg", "°", "direction the wind comes from, 0 headwind, 90 from the left"),
    ("env.altitude_m", "m", "altitude of the standard atmosphere"),
    ("env.temperature_offset_k", "K", "temperature offset from the standard atmosphere"),
    ("env.humidity_pct", "%", "relative humidity"),
    ("env.gust_intensity", "1", "turbulence intensity σ_u/ū (0 turns gusts off)"),
    ("env.gust_seed", "1", "seed of the gusts (an integer)"),
    ("disc.mass_g", "g", "total mass (design: densities scaled; body: inertias scaled with it)"),
    ("layup.split_radius_cm", "cm", "radius where the plate and rim materials of an overmold meet"),
    ("layup.rim_density_g_cm3", "g/cm³", "density of an overmold's rim material"),
    ("layup.plate_density_g_cm3", "g/cm³", "density of an overmold's plate material"),
    ("outline.diameter_cm", "cm", "outside diameter of a parametric outline"),
    ("outline.rim_width_cm", "cm", "rim width of a parametric outline"),
    ("outline.rim_depth_cm", "cm", "rim depth of a parametric outline"),
    ("model.lift_scale", "1", "factor on the lift coefficient"),
    ("model.drag_scale", "1", "factor on the drag coefficient"),
    ("model.pitch_scale", "1", "factor on the pitching-moment coefficient"),
    ("model.lift_at_zero", "1", "C_L0 of a linear set"),
    ("model.lift_slope_per_rad", "1/rad", "C_Lα of a linear set"),
    ("model.drag_min", "1", "C_D0 of a linear set"),
    ("model.drag_growth_per_rad2", "1/rad²", "C_Dα of a linear set"),
    ("model.drag_min_alpha_rad", "rad", "α0 of a linear set"),
    ("model.pitch_at_zero", "1", "C_M0 of a linear set"),
    ("model.pitch_slope_per_rad", "1/rad", "C_Mα of a linear set"),
    ("model.pitch_damping", "1", "pitch damping term of a linear set"),
    ("model.roll_from_spin", "1", "roll moment from spin of a linear set"),
    ("model.roll_damping", "1", "roll damping term of a linear set"),
    ("model.spin_damping", "1", "spin damping term of a linear set"),
];

/// The unit of an input, or [`StudyError::UnknownInput`] listing the known names.
pub fn input_unit(name: &str) -> Result<&'static str, StudyError> {
    INPUTS.iter().find(|(n, _, _)| *n == name).map(|(_, u, _)| *u).ok_or_else(|| unknown_input(name))
}

pub(crate) fn unknown_input(name: &str) -> StudyError {
    let known: Vec<&str> = INPUTS.iter().map(|(n, _, _)| *n).collect();
    StudyError::UnknownInput { name: name.to_string(), known: known.join(", ") }
}

fn not_applicable(name: &str, reason: &str) -> StudyError {
    StudyError::NotApplicable { name: name.to_string(), reason: reason.to_string() }
}

/// True when changing the input changes the disc's body (mass properties or diameter).
pub fn changes_body(name: &str) -> bool {
    ["disc.", "layup.", "outline."].iter().any(|p| name.starts_with(p))
}

impl StudyCase {
    /// Sets the input `name` (see [`INPUTS`]) to `value` in its documented unit. Values are
    /// checked when the case flies; unknown names give [`StudyError::UnknownInput`].
    pub fn set(&mut self, name: &str, value: f64) -> Result<(), StudyError> {
        input_unit(name)?;
        let (group, field) = name.split_once('.').unwrap_or((name, ""));
        match group {
            "throw" => self.set_throw(field, value),
            "effort" => self.effort_field(name, field).map(|f| *f = value),
            "env" => self.set_env(name, field, value),
            "disc" => self.set_mass(name, value),
            "layup" => self.set_layup(name, field, value),
            "outline" => self.set_outline(name, field, value),
            _ => self.set_model(name, field, value),
        }
    }

    /// The current value of the input `name` in its documented unit (a design's mass is its
    /// target mass when one is set, else an error: evaluate the design to read it).
    pub fn get(&self, name: &str) -> Result<f64, StudyError> {
        input_unit(name)?;
        let (group, field) = name.split_once('.').unwrap_or((name, ""));
        match group {
            "throw" => Ok(self.get_throw(field)),
            "effort" => self.clone().effort_field(name, field).map(|f| *f),
            "env" => self.get_env(name, field),
            "model" => self.get_model(name, field),
            _ => self.get_disc(name, field),
        }
    }

    fn get_throw(&self, field: &str) -> f64 {
        let r = &self.release;
        match field {
            "speed_mps" => r.speed_mps,
            "spin_rps" => r.spin_rad_s / std::f64::consts::TAU,
            "spin_rad_s" => r.spin_rad_s,
            "launch_deg" => r.launch_rad.to_degrees(),
            "nose_deg" => r.nose_rad.to_degrees(),
            "hyzer_deg" => r.roll_rad.to_degrees(),
            "heading_deg" => r.heading_rad.to_degrees(),
            "height_m" => r.height_m,
            _ => r.off_axis_rate_rad_s,
        }
    }

    fn get_env(&self, name: &str, field: &str) -> Result<f64, StudyError> {
        let standard = match self.air.source {
            AirSource::Standard { altitude_m, temperature_offset_k } => Some((altitude_m, temperature_offset_k)),
            AirSource::Measured { .. } => None,
        };
        let measured = || not_applicable(name, "the air is given by measured pressure and temperature");
        Ok(match field {
            "wind_mps" => self.wind.speed_mps,
            "wind_from_deg" => self.wind.from_deg,
            "altitude_m" => standard.ok_or_else(measured)?.0,
            "temperature_offset_k" => standard.ok_or_else(measured)?.1,
            "humidity_pct" => self.air.relative_humidity_pct,
            "gust_intensity" => self.wind.gusts.map_or(0.0, |g| g.intensity),
            _ => self.wind.gusts.map_or(0.0, |g| g.seed as f64),
        })
    }

    fn get_model(&self, name: &str, field: &str) -> Result<f64, StudyError> {
        let scale = &self.model.scale;
        Ok(match field {
            "lift_scale" => scale.lift,
            "drag_scale" => scale.drag,
            "pitch_scale" => scale.pitch,
            _ => {
                let BaseModel::Linear { set } = &self.model.base else {
                    return Err(not_applicable(name, "the coefficient set is tabulated; use model.*_scale"));
                };
                *linear_field(&mut set.clone(), field)
            }
        })
    }

    fn get_disc(&self, name: &str, field: &str) -> Result<f64, StudyError> {
        let design = match &self.disc {
            CaseDisc::Body { body } if name == "disc.mass_g" => return Ok(body.mass_kg * 1000.0),
            CaseDisc::Body { .. } => return Err(not_applicable(name, "the disc is a bare body, not a design")),
            CaseDisc::Design { design } => design,
        };
        if name == "disc.mass_g" {
            return match design.target {
                MassTarget::ScaleDensities { mass_kg } | MassTarget::SolveDimension { mass_kg, .. } => Ok(mass_kg * 1000.0),
                _ => Err(not_applicable(name, "the design has no target mass; evaluate it to read its mass")),
            };
        }
        if let (Layup::Overmold { plate, rim, split_radius_m }, true) = (&design.layup, name.starts_with("layup.")) {
            return Ok(match field {
                "split_radius_cm" => split_radius_m * 100.0,
                "rim_density_g_cm3" => rim.density_g_cm3(),
                _ => plate.density_g_cm3(),
            });
        }
        match (&design.outline, name.starts_with("outline.")) {
            (OutlineSource::Parametric(o), true) => Ok(100.0
                * match field {
                    "diameter_cm" => o.diameter_m,
                    "rim_width_cm" => o.rim_width_m,
                    _ => o.rim_depth_m,
                }),
            _ => Err(not_applicable(name, "the design's layup or outline has no such field")),
        }
    }

    fn effort_field(&mut self, name: &str, field: &str) -> Result<&mut f64, StudyError> {
        let missing = |reason: &str| Err(not_applicable(name, reason));
        match (&mut self.effort, field) {
            (None, _) => missing("the case has no effort; it flies its release state"),
            (Some(Effort::Independent(e)), "work_j") => Ok(&mut e.linear_work_j),
            (Some(Effort::Independent(e)), "wrist_torque_n_m") => Ok(&mut e.wrist_torque_n_m),
            (Some(Effort::Coupled(e)), "work_j") => Ok(&mut e.work_j),
            (Some(Effort::Coupled(e)), "rim_speed_ratio") => Ok(&mut e.rim_speed_ratio),
            (Some(_), _) => missing("the case's effort form has no such field"),
        }
    }

    fn set_throw(&mut self, field: &str, value: f64) -> Result<(), StudyError> {
        if self.effort.is_some() && matches!(field, "speed_mps" | "spin_rps" | "spin_rad_s") {
            let reason = "the case flies an effort throw, whose speed and spin come from the effort and the disc; vary effort.work_j, effort.wrist_torque_n_m or effort.rim_speed_ratio instead";
            return Err(not_applicable(&format!("throw.{field}"), reason));
        }
        let r = &mut self.release;
        match field {
            "speed_mps" => r.speed_mps = value,
            "spin_rps" => r.spin_rad_s = value * std::f64::consts::TAU,
            "spin_rad_s" => r.spin_rad_s = value,
            "launch_deg" => r.launch_rad = value.to_radians(),
            "nose_deg" => r.nose_rad = value.to_radians(),
            "hyzer_deg" => r.roll_rad = value.to_radians(),
            "heading_deg" => r.heading_rad = value.to_radians(),
            "height_m" => r.height_m = value,
            _ => r.off_axis_rate_rad_s = value,
        }
        Ok(())
    }

    fn set_env(&mut self, name: &str, field: &str, value: f64) -> Result<(), StudyError> {
        match field {
            "wind_mps" => self.wind.speed_mps = value,
            "wind_from_deg" => self.wind.from_deg = value,
            "altitude_m" | "temperature_offset_k" => self.set_standard_air(field, value),
            "humidity_pct" => self.air.relative_humidity_pct = value,
            "gust_intensity" if value == 0.0 => self.wind.gusts = None,
            "gust_intensity" => self.wind.gusts.get_or_insert(GustSpec::seeded(0)).intensity = value,
            _ => {
                if !(value >= 0.0 && value.fract() == 0.0 && value <= 2f64.powi(53)) {
                    return Err(not_applicable(name, "the gust seed must be a whole number ≥ 0"));
                }
                self.wind.gusts.get_or_insert(GustSpec::seeded(0)).seed = value as u64;
            }
        }
        Ok(())
    }

    fn set_standard_air(&mut self, field: &str, value: f64) {
        let (mut altitude_m, mut temperature_offset_k) = match self.air.source {
            AirSource::Standard { altitude_m, temperature_offset_k } => (altitude_m, temperature_offset_k),
            AirSource::Measured { .. } => (0.0, 0.0),
        };
        if field == "altitude_m" {
            altitude_m = value;
        } else {
            temperature_offset_k = value;
        }
        self.air.source = AirSource::Standard { altitude_m, temperature_offset_k };
    }

    fn set_mass(&mut self, name: &str, value: f64) -> Result<(), StudyError> {
        let mass_kg = value / 1000.0;
        match &mut self.disc {
            CaseDisc::Design { design } => design.target = MassTarget::ScaleDensities { mass_kg },
            CaseDisc::Body { body } => {
                if !(mass_kg > 0.0 && mass_kg.is_finite()) {
                    return Err(not_applicable(name, "the mass must be finite and > 0 g"));
                }
                let factor = mass_kg / body.mass_kg;
                body.mass_kg = mass_kg;
                body.spin_inertia_kg_m2 *= factor;
                body.transverse_inertia_kg_m2 *= factor;
            }
        }
        Ok(())
    }

    fn set_layup(&mut self, name: &str, field: &str, value: f64) -> Result<(), StudyError> {
        let CaseDisc::Design { design } = &mut self.disc else {
            return Err(not_applicable(name, "the disc is a bare body, not a design with a layup"));
        };
        let Layup::Overmold { plate, rim, split_radius_m } = &mut design.layup else {
            return Err(not_applicable(name, "the layup is not a two-material overmold"));
        };
        match field {
            "split_radius_cm" => *split_radius_m = value / 100.0,
            "rim_density_g_cm3" => rim.density_kg_m3 = value * 1000.0,
            _ => plate.density_kg_m3 = value * 1000.0,
        }
        Ok(())
    }

    fn set_outline(&mut self, name: &str, field: &str, value: f64) -> Result<(), StudyError> {
        let CaseDisc::Design { design } = &mut self.disc else {
            return Err(not_applicable(name, "the disc is a bare body, not a design with an outline"));
        };
        let OutlineSource::Parametric(outline) = &mut design.outline else {
            return Err(not_applicable(name, "the outline is given by points, not a parametric family"));
        };
        let metres = value / 100.0;
        match field {
            "diameter_cm" => outline.diameter_m = metres,
            "rim_width_cm" => outline.rim_width_m = metres,
            _ => outline.rim_depth_m = metres,
        }
        Ok(())
    }

    fn set_model(&mut self, name: &str, field: &str, value: f64) -> Result<(), StudyError> {
        let scale = &mut self.model.scale;
        match field {
            "lift_scale" => scale.lift = value,
            "drag_scale" => scale.drag = value,
            "pitch_scale" => scale.pitch = value,
            _ => {
                let BaseModel::Linear { set } = &mut self.model.base else {
                    return Err(not_applicable(name, "the coefficient set is tabulated; use model.*_scale"));
                };
                *linear_field(set, field) = value;
            }
        }
        Ok(())
    }
}

/// The linear coefficient called `field` (one of the `model.` names of [`INPUTS`]).
pub(crate) fn linear_field<'a>(set: &'a mut crate::LinearCoefficients, field: &str) -> &'a mut f64 {
    match field {
        "lift_at_zero" => &mut set.lift_at_zero,
        "lift_slope_per_rad" => &mut set.lift_slope_per_rad,
        "drag_min" => &mut set.drag_min,
        "drag_growth_per_rad2" => &mut set.drag_growth_per_rad2,
        "drag_min_alpha_rad" => &mut set.drag_min_alpha_rad,
        "pitch_at_zero" => &mut set.pitch_at_zero,
        "pitch_slope_per_rad" => &mut set.pitch_slope_per_rad,
        "pitch_damping" => &mut set.rates.pitch_damping,
        "roll_from_spin" => &mut set.rates.roll_from_spin,
        "roll_damping" => &mut set.rates.roll_damping,
        _ => &mut set.rates.spin_damping,
    }
}
