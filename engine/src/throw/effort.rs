//! Effort forms: a player's work, which a disc's mass properties turn into release speed and
//! spin by the work–energy theorem (so constructions can be compared "from the same throw").

use std::f64::consts::TAU;

use serde::{Deserialize, Serialize};

use super::{ReleasePose, ReleaseState, ThrowError};
use crate::{InputRangeError, MassProperties};

/// Default effective arm mass of the independent form: 0.4 kg, about the mass of a hand
/// (roughly 0.6 % of a 70 kg adult's body mass; value from memory, unverified). It stands for
/// the part of the arm's kinetic energy that the linear work must also supply.
pub const DEFAULT_ARM_MASS_KG: f64 = 0.4;
/// Allowed work: 0 … 1 000 J.
pub const WORK_RANGE_J: (f64, f64) = (0.0, 1_000.0);
/// Allowed wrist torque: 0 … 30 N·m.
pub const WRIST_TORQUE_RANGE_N_M: (f64, f64) = (0.0, 30.0);
/// Allowed wrist turn: 0 … 2π rad (one revolution).
pub const WRIST_TURN_RANGE_RAD: (f64, f64) = (0.0, TAU);
/// Allowed effective arm mass: 0 … 5 kg.
pub const ARM_MASS_RANGE_KG: (f64, f64) = (0.0, 5.0);
/// Allowed rim-speed ratio k = ωR/V: 0 … 2.
pub const RIM_SPEED_RATIO_RANGE: (f64, f64) = (0.0, 2.0);
/// Allowed disc mass: 0.01 … 1 kg.
pub const DISC_MASS_RANGE_KG: (f64, f64) = (0.01, 1.0);
/// Allowed spin moment of inertia I_z: 10⁻⁶ … 0.1 kg·m².
pub const SPIN_INERTIA_RANGE_KG_M2: (f64, f64) = (1e-6, 0.1);
/// Allowed disc (rim) radius: 0.05 … 0.2 m.
pub const DISC_RADIUS_RANGE_M: (f64, f64) = (0.05, 0.2);

/// Linear work and wrist work given separately.
///
/// Speed V = √(2W / (m + m_arm)); spin ω = √(2τθ / I_z) (work–energy theorem), so from the same
/// effort spin ∝ 1/√I_z and angular momentum I_z ω ∝ √I_z.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct IndependentEffort {
    /// Work W done on the disc's (and arm's) translation, J.
    pub linear_work_j: f64,
    /// Mean wrist torque τ about the spin axis, N·m.
    pub wrist_torque_n_m: f64,
    /// Wrist turn θ over which the torque acts, rad.
    pub wrist_turn_rad: f64,
    /// Effective arm mass m_arm moving with the disc, kg (default [`DEFAULT_ARM_MASS_KG`]).
    #[serde(default = "default_arm_mass_kg")]
    pub arm_mass_kg: f64,
}

/// One work shared between speed and spin, with spin tied to hand speed by a rim-speed ratio
/// k = ωR/V.
///
/// ½(m + m_arm)V² + ½I_z ω² = W with ω = kV/R gives V = √(2W / (m + m_arm + I_z k²/R²)).
/// PHYSICS.md writes it without arm mass; `arm_mass_kg` defaults to 0 to match.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct CoupledEffort {
    /// Total work W, J.
    pub work_j: f64,
    /// Rim-speed ratio k = ωR/V, dimensionless.
    pub rim_speed_ratio: f64,
    /// Effective arm mass m_arm moving with the disc, kg (default 0).
    #[serde(default)]
    pub arm_mass_kg: f64,
}

fn default_arm_mass_kg() -> f64 {
    DEFAULT_ARM_MASS_KG
}

/// A player's effort, in one of the two forms.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(tag = "form", rename_all = "snake_case")]
pub enum Effort {
    /// Linear work and wrist torque-angle work given separately.
    Independent(IndependentEffort),
    /// One work shared by a rim-speed ratio.
    Coupled(CoupledEffort),
}

/// The disc an effort is applied to: mass, spin inertia and rim radius, validated.
#[derive(Debug, Clone, Copy, PartialEq)]
struct DiscLoad {
    mass_kg: f64,
    spin_inertia_kg_m2: f64,
    radius_m: f64,
}

impl DiscLoad {
    fn new(mass: &MassProperties, radius_m: f64) -> Result<Self, ThrowError> {
        let check = InputRangeError::check_within;
        Ok(Self {
            mass_kg: check("mass_kg", mass.mass_kg, DISC_MASS_RANGE_KG, "kg")?,
            spin_inertia_kg_m2: check(
                "spin_inertia_kg_m2",
                mass.spin_inertia_kg_m2,
                SPIN_INERTIA_RANGE_KG_M2,
                "kg·m²",
            )?,
            radius_m: check("radius_m", radius_m, DISC_RADIUS_RANGE_M, "m")?,
        })
    }
}

impl IndependentEffort {
    /// Linear work `linear_work_j` (J) and wrist torque `wrist_torque_n_m` (N·m) over
    /// `wrist_turn_rad` (rad), with the default arm mass.
    pub fn new(linear_work_j: f64, wrist_torque_n_m: f64, wrist_turn_rad: f64) -> Self {
        Self { linear_work_j, wrist_torque_n_m, wrist_turn_rad, arm_mass_kg: DEFAULT_ARM_MASS_KG }
    }

    fn speed_and_spin(&self, disc: &DiscLoad) -> Result<(f64, f64), ThrowError> {
        let check = InputRangeError::check_within;
        let work_j = check("linear_work_j", self.linear_work_j, WORK_RANGE_J, "J")?;
        let torque_n_m = check("wrist_torque_n_m", self.wrist_torque_n_m, WRIST_TORQUE_RANGE_N_M, "N·m")?;
        let turn_rad = check("wrist_turn_rad", self.wrist_turn_rad, WRIST_TURN_RANGE_RAD, "rad")?;
        let arm_mass_kg = check("arm_mass_kg", self.arm_mass_kg, ARM_MASS_RANGE_KG, "kg")?;
        let speed_mps = (2.0 * work_j / (disc.mass_kg + arm_mass_kg)).sqrt();
        Ok((speed_mps, (2.0 * torque_n_m * turn_rad / disc.spin_inertia_kg_m2).sqrt()))
    }
}

impl CoupledEffort {
    /// Work `work_j` (J) shared with rim-speed ratio `rim_speed_ratio`, without arm mass.
    pub fn new(work_j: f64, rim_speed_ratio: f64) -> Self {
        Self { work_j, rim_speed_ratio, arm_mass_kg: 0.0 }
    }

    fn speed_and_spin(&self, disc: &DiscLoad) -> Result<(f64, f64), ThrowError> {
        let check = InputRangeError::check_within;
        let work_j = check("work_j", self.work_j, WORK_RANGE_J, "J")?;
        let k = check("rim_speed_ratio", self.rim_speed_ratio, RIM_SPEED_RATIO_RANGE, "")?;
        let arm_mass_kg = check("arm_mass_kg", self.arm_mass_kg, ARM_MASS_RANGE_KG, "kg")?;
        let spin_equivalent_kg = disc.spin_inertia_kg_m2 * (k / disc.radius_m).powi(2);
        let speed_mps = (2.0 * work_j / (disc.mass_kg + arm_mass_kg + spin_equivalent_kg)).sqrt();
        Ok((speed_mps, k * speed_mps / disc.radius_m))
    }
}

impl Effort {
    /// Release speed (m/s) and spin magnitude (rad/s) this effort gives a disc with mass
    /// properties `mass` and rim radius `radius_m` (m). Only mass and I_z enter.
    pub fn speed_and_spin(&self, mass: &MassProperties, radius_m: f64) -> Result<(f64, f64), ThrowError> {
        let disc = DiscLoad::new(mass, radius_m)?;
        match self {
            Effort::Independent(effort) => effort.speed_and_spin(&disc),
            Effort::Coupled(effort) => effort.speed_and_spin(&disc),
        }
    }
}

/// A throw described as a player makes it: an effort and a pose. The same `EffortThrow` applied
/// to two constructions gives each the release state physics says it gets.
///
/// ```
/// use spinfoil_engine::{Effort, EffortThrow, IndependentEffort, MassProperties, ReleasePose};
/// let throw = EffortThrow {
///     effort: Effort::Independent(IndependentEffort::new(120.0, 4.0, 1.2)),
///     pose: ReleasePose::default(),
/// };
/// let one_piece = MassProperties {
///     mass_kg: 0.172,
///     cg_height_m: 0.01,
///     spin_inertia_kg_m2: 0.0012,
///     transverse_inertia_kg_m2: 0.0006,
/// };
/// let rim_heavy = MassProperties { spin_inertia_kg_m2: 0.0048, ..one_piece };
/// let a = throw.release(&one_piece, 0.106).unwrap();
/// let b = throw.release(&rim_heavy, 0.106).unwrap();
/// assert!((b.spin_rad_s - a.spin_rad_s / 2.0).abs() < 1e-9); // 4× I_z: half the spin
/// ```
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct EffortThrow {
    /// The player's work.
    pub effort: Effort,
    /// Angles, height, wobble, style and hand (default: a flat right-hand backhand at 1 m).
    #[serde(default)]
    pub pose: ReleasePose,
}

impl EffortThrow {
    /// The validated release state of a disc with mass properties `mass` and rim radius
    /// `radius_m` (m).
    pub fn release(&self, mass: &MassProperties, radius_m: f64) -> Result<ReleaseState, ThrowError> {
        let (speed_mps, spin_rad_s) = self.effort.speed_and_spin(mass, radius_m)?;
        self.pose.with_speed_and_spin(speed_mps, spin_rad_s).validated()
    }
}
