//! Rate-dependent moment terms (pitch damping, roll from spin, roll damping, spin-down), with
//! their rate convention explicit.
use serde::{Deserialize, Serialize};

use super::error::{check_range, AeroError};
use super::model::AeroInput;

/// How a coefficient set's rate terms read the angular rates.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum RateConvention {
    /// Rates enter in rad/s as they are (coefficients per rad/s), as in Hummel (2003).
    RadPerSecond,
    /// Rates enter non-dimensionally as rate·d/(2V) (zero at zero airspeed), with the
    /// reference diameter d of the set in m.
    NonDimensional {
        /// Reference diameter d in m.
        reference_diameter_m: f64,
    },
}

impl RateConvention {
    /// The rate (rad/s) as this convention reads it at airspeed `airspeed_mps` (m/s).
    pub fn scale(&self, rate_rad_s: f64, airspeed_mps: f64) -> f64 {
        match self {
            Self::RadPerSecond => rate_rad_s,
            Self::NonDimensional { reference_diameter_m } if airspeed_mps > 0.0 => {
                rate_rad_s * reference_diameter_m / (2.0 * airspeed_mps)
            }
            Self::NonDimensional { .. } => 0.0,
        }
    }
}

/// Moment terms linear in the rates, in our axes (see [`AeroInput`]), with the rates read by
/// `convention`. Every rate is signed, so a mirrored state (spin and roll rate reversed) gives
/// mirrored roll and spin moments.
///
/// - pitch: `pitch_damping` · q (C_Mq; q = pitch rate, positive nose-up);
/// - roll: `roll_from_spin` · ω_s + `roll_damping` · p (C_Rr, C_Rp; p = roll rate about **e_r**);
/// - spin: `spin_damping` · ω_s (C_Nr; negative, so it opposes the spin).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct RateTerms {
    /// How the rates are read.
    pub convention: RateConvention,
    /// C_Mq: pitching moment per unit pitch rate (≤ 0: damping).
    pub pitch_damping: f64,
    /// C_Rr: rolling moment about **e_r** per unit signed spin ω_s.
    pub roll_from_spin: f64,
    /// C_Rp: rolling moment per unit roll rate (≤ 0: damping).
    pub roll_damping: f64,
    /// C_Nr: moment about **n** per unit signed spin ω_s (≤ 0: spin-down).
    pub spin_damping: f64,
}

/// Contributions of the rate terms to the pitch, roll and spin moment coefficients.
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub struct RateMoments {
    /// Added to the pitching-moment coefficient.
    pub pitch: f64,
    /// Added to the rolling-moment coefficient.
    pub roll: f64,
    /// Added to the spin-moment coefficient.
    pub spin: f64,
}

impl RateTerms {
    /// No rate terms at all (rates in rad/s, all zero).
    pub fn none() -> Self {
        Self { convention: RateConvention::RadPerSecond, pitch_damping: 0.0, roll_from_spin: 0.0, roll_damping: 0.0, spin_damping: 0.0 }
    }

    /// The moment-coefficient contributions at one instant.
    pub fn moments(&self, input: &AeroInput) -> RateMoments {
        let read = |rate: f64| self.convention.scale(rate, input.airspeed_mps);
        let spin = read(input.spin_rad_s);
        RateMoments {
            pitch: self.pitch_damping * read(input.pitch_rate_rad_s),
            roll: self.roll_from_spin * spin + self.roll_damping * read(input.roll_rate_rad_s),
            spin: self.spin_damping * spin,
        }
    }

    /// Checks finiteness and that the damping terms damp (are ≤ 0), and a positive diameter.
    pub fn validate(&self) -> Result<(), AeroError> {
        if let RateConvention::NonDimensional { reference_diameter_m } = self.convention {
            check_range("reference_diameter_m (m)", reference_diameter_m, 1e-3, 10.0)?;
        }
        check_range("pitch_damping C_Mq", self.pitch_damping, f64::MIN, 0.0)?;
        check_range("roll_from_spin C_Rr", self.roll_from_spin, f64::MIN, f64::MAX)?;
        check_range("roll_damping C_Rp", self.roll_damping, f64::MIN, 0.0)?;
        check_range("spin_damping C_Nr", self.spin_damping, f64::MIN, 0.0)
    }
}

impl Default for RateTerms {
    fn default() -> Self {
        Self::none()
    }
}
