//! Invented coefficient sets for the invented demo putter, midrange and driver: invented for
//! demos, not measurements of any disc.
//!
//! They were tuned (by hand, against the flight integrator) to meet plausibility targets that
//! are common practice, no published source: from a typical amateur right-hand backhand
//! (about 22 m/s, 15 rev/s, launch 10°, nose 0–2°, flat, sea level) the driver carries
//! 80–110 m, first drifting right (turn) and then hooking left (fade); the midrange and putter,
//! more stable, fade earlier and carry less.
//!
//! Measured with the tuned values (I_z 0.0022/0.0021/0.0019 kg·m², masses 175/177/173 g,
//! 1.5 m release height; tests `demo_*` in `engine/tests/it/aero.rs`), nose 0° / 2°:
//! driver carries 89.1 / 84.7 m, turns 3.3 / 1.9 m right until 4.9 / 4.2 s, then fades
//! 5.5 / 9.6 m left; midrange 68.3 / 65.6 m, fade from 2.4 / 1.8 s; putter 57.0 / 55.2 m,
//! fading from the start.
//!
//! The damping terms (C_Mq, C_Rp) were retuned so that an off-axis release's wobble dies
//! away over a plausible time: a 5° wobble on the demo driver at 22 m/s and 15 rev/s halves
//! after about 0.51 s (test `demo_driver_wobble_halves_in_a_plausible_time` in
//! `engine/tests/it/flight/wobble.rs`; target a few hundred ms, value from memory, unverified:
//! wobble on real discs visibly persists for a good part of a second); on the lighter
//! 170 g driver of the example notebooks (I_x about 6.4e-4 kg·m², 900 rpm) about 0.28 s. The first
//! values, about twelve times larger, halved it in 36 ms; the retune changed carry, turn and
//! fade by under 0.6 m.
//!
//! The physics behind the tuning: at the low angle of attack of the fast early flight a
//! nose-down (negative) pitching moment rolls a right-hand backhand to its right (turn); at the
//! higher α of the slow end of flight a nose-up moment rolls it left (fade). The trim angle
//! −C_M0/C_Mα sets where one becomes the other: high for the driver, near zero for the putter.
use super::linear::LinearCoefficients;
use super::model::ModelInfo;
use super::rates::{RateConvention, RateTerms};

/// Damping shared by the demo sets (rates in rad/s; invented for demos).
fn demo_rates() -> RateTerms {
    RateTerms {
        convention: RateConvention::RadPerSecond,
        pitch_damping: -0.0004,
        roll_from_spin: 0.0,
        roll_damping: -0.0012,
        spin_damping: -2.0e-5,
    }
}

fn demo_info(name: &str) -> ModelInfo {
    ModelInfo {
        name: name.into(),
        source: "invented for demos".into(),
        confidence: "invented for demos; tuned to plausibility targets (common practice, no published source)".into(),
    }
}

/// The invented demo driver (about 0.211 m, 0.175 kg): low drag, trim at about 6°, so it
/// turns while fast and fades as it slows. Invented for demos.
pub fn demo_driver() -> LinearCoefficients {
    LinearCoefficients {
        info: demo_info("demo driver (invented)"),
        lift_at_zero: 0.15,
        lift_slope_per_rad: 1.9,
        drag_min: 0.05,
        drag_growth_per_rad2: 0.8,
        drag_min_alpha_rad: -0.08,
        pitch_at_zero: -0.011,
        pitch_slope_per_rad: 0.18,
        rates: demo_rates(),
    }
}

/// The invented demo midrange (about 0.215 m): more drag, trim near 2°, little turn, earlier
/// fade. Invented for demos.
pub fn demo_midrange() -> LinearCoefficients {
    LinearCoefficients {
        info: demo_info("demo midrange (invented)"),
        lift_at_zero: 0.18,
        lift_slope_per_rad: 1.9,
        drag_min: 0.075,
        drag_growth_per_rad2: 0.9,
        drag_min_alpha_rad: -0.09,
        pitch_at_zero: -0.004,
        pitch_slope_per_rad: 0.18,
        rates: demo_rates(),
    }
}

/// The invented demo putter (about 0.212 m): the most drag, trim at α = 0, so any nose-up
/// attitude fades it from the start. Invented for demos.
pub fn demo_putter() -> LinearCoefficients {
    LinearCoefficients {
        info: demo_info("demo putter (invented)"),
        lift_at_zero: 0.20,
        lift_slope_per_rad: 1.9,
        drag_min: 0.10,
        drag_growth_per_rad2: 1.0,
        drag_min_alpha_rad: -0.1,
        pitch_at_zero: 0.0,
        pitch_slope_per_rad: 0.18,
        rates: demo_rates(),
    }
}
