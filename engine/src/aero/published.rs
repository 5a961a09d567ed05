//! Published coefficient sets, converted to our axes once, here.
//!
//! Source of both: Hummel, S. A. (2003), Frisbee Flight Simulation and Throw Biomechanics,
//! MS thesis, University of California, Davis. Values from memory, unverified (CHECKS.md).
//!
//! ## Conversion of Hummel's axes to ours
//! Hummel writes his moments in a disc frame with x along the in-plane part of the air-relative
//! velocity, z along the disc's axis and y completing a right-handed set, and reads rates in
//! rad/s. We take his frame to be (x, y, z) = (**e_r**, **e_p**, −**n**): it is right-handed
//! (**e_r** × **e_p** = −**n**), and it is the one in which his positive C_Mα means "nose-up as
//! α grows", as a forward centre of pressure requires (a flat plate's lift acts ahead of its
//! centre). The frame choice is from memory, unverified. Then:
//! - his pitch rate q = ω·**e_p** is ours, and his pitching moment is ours: C_M0, C_Mα, C_Mq
//!   unchanged;
//! - his roll rate p = ω·**e_r** is ours and his roll moment acts about **e_r**: C_Rp unchanged;
//! - his spin rate r = ω·(−**n**) = −ω_s, so his roll term C_Rr·r becomes (−C_Rr)·ω_s:
//!   our `roll_from_spin` = −C_Rr;
//! - his spin moment acts about −**n**: N·(−**n**) = C_Nr·(−ω_s)·(−**n**) = C_Nr·ω_s·**n**:
//!   our `spin_damping` = C_Nr unchanged (it opposes the spin either way).
//!
//! Because every term is linear in the signed rates, a mirrored throw (spin reversed) gives
//! mirrored roll and spin moments.
use super::linear::LinearCoefficients;
use super::model::ModelInfo;
use super::rates::{RateConvention, RateTerms};

const HUMMEL_SOURCE: &str =
    "Hummel, S. A. (2003), Frisbee Flight Simulation and Throw Biomechanics, MS thesis, University of California, Davis";
const MEMORY: &str = "values from memory, unverified";

/// Hummel's C_Rr in his axes (per rad/s of his spin rate r), value from memory, unverified.
const HUMMEL_ROLL_FROM_SPIN_HIS_AXES: f64 = 0.00171;

/// Hummel's (2003) linear model for a 175 g, 0.269 m ultimate-style disc (values from
/// memory, unverified): C_L0 0.3331, C_Lα 1.9124 /rad, C_D0 0.1769, C_Dα 0.685 /rad²,
/// C_M0 −0.0821, C_Mα 0.4338 /rad, C_Mq −0.005, C_Rr 0.00171, C_Rp −0.0144, C_Nr ≈ −7×10⁻⁶
/// (rates in rad/s; damping terms low confidence). α0 of the drag term: 0 (his 6-DOF set is
/// quadratic about α = 0 as we remember it). Converted to our axes as the module docs say.
///
/// Review (2026): the thesis text could not be reached through the project's search tools
/// (only its title pages), so neither the values nor the frame choice above are verified.
/// Measured in our flights for a flat right-hand backhand, 20 m/s, launch 10°, nose 5°,
/// 15 rev/s, 1 m high, sea level, calm:
/// - as defined here: the roll-from-spin moment (C_Rr·|ω_s| ≈ 0.16, twice |C_M0|) pitches the
///   nose up to α ≈ 19° while C_M0 rolls the disc over toward the turn side (roll to −98°):
///   apex 10.9 m, 3.2 s aloft, carry 7.1 m, turn 3.9 m, no fade, heading change 179°;
/// - with the opposite sign of C_Rr: the nose drops and it lands after 0.6 s, 9.4 m out;
/// - with C_Rr = 0: still rolls to −74° (C_M at α = 5° is −0.044, trim α = 10.8°) and carries
///   22 m in 1.9 s (turn 4.3 m, no fade);
/// - with every rate read non-dimensionally (ω·d/2V): carry 23.5 m, turn 7.1 m, no fade.
///
/// None of these readings gives a plausible 20 m/s flight, so the doubt is not only the sign of
/// C_Rr: the magnitude of C_Rr per rad/s, and the size of C_M0 relative to C_Mα, are as
/// uncertain. Prefer the tabulated or invented sets for distances until the thesis is checked.
///
/// Caution (measured in our flights, `hummel_sets_fly_a_typical_ultimate_throw_without_failing`):
/// at 8 rev/s the roll-from-spin term C_Rr·r ≈ 0.086 outweighs C_M0, pitches the disc up and
/// shortens a 14 m/s throw to about 12 m, which is implausible. The remembered value of C_Rr
/// or its rate convention is probably wrong; verify against the thesis before trusting
/// distances from this set.
pub fn hummel_2003() -> LinearCoefficients {
    LinearCoefficients {
        info: ModelInfo { name: "Hummel (2003) linear model".into(), source: HUMMEL_SOURCE.into(), confidence: MEMORY.into() },
        lift_at_zero: 0.3331,
        lift_slope_per_rad: 1.9124,
        drag_min: 0.1769,
        drag_growth_per_rad2: 0.685,
        drag_min_alpha_rad: 0.0,
        pitch_at_zero: -0.0821,
        pitch_slope_per_rad: 0.4338,
        rates: RateTerms {
            convention: RateConvention::RadPerSecond,
            pitch_damping: -0.005,
            roll_from_spin: -HUMMEL_ROLL_FROM_SPIN_HIS_AXES,
            roll_damping: -0.0144,
            spin_damping: -7e-6,
        },
    }
}

/// The simpler lift-and-drag set often quoted from the same work (values from memory,
/// unverified): C_L0 0.1, C_Lα 1.4 /rad, C_D0 0.08, C_Dα 2.72 /rad², α0 = −4°; no moments
/// (the disc keeps its attitude: a point-mass model with lift).
pub fn hummel_2003_lift_drag() -> LinearCoefficients {
    LinearCoefficients {
        info: ModelInfo {
            name: "Hummel (2003) lift-and-drag model".into(),
            source: HUMMEL_SOURCE.into(),
            confidence: MEMORY.into(),
        },
        lift_at_zero: 0.1,
        lift_slope_per_rad: 1.4,
        drag_min: 0.08,
        drag_growth_per_rad2: 2.72,
        drag_min_alpha_rad: (-4.0f64).to_radians(),
        pitch_at_zero: 0.0,
        pitch_slope_per_rad: 0.0,
        rates: RateTerms::none(),
    }
}
