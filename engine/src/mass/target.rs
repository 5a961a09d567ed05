use super::{mass_breakdown, MassError};
use crate::geometry::{Dimension, ParametricOutline, SamplingSettings};
use crate::layup::Layup;
use serde::{Deserialize, Serialize};

/// How a design is brought to a target mass. Serialised with a `kind` tag.
#[derive(Debug, Clone, Copy, PartialEq, Default, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum MassTarget {
    /// Keep the mass the outline and densities give.
    #[default]
    AsDesigned,
    /// Multiply every density by one factor (keeps the distribution of mass).
    ScaleDensities {
        /// Target mass, kg.
        mass_kg: f64,
    },
    /// Change one dimension of a parametric outline (bracketed bisection over its allowed range).
    SolveDimension {
        /// Target mass, kg.
        mass_kg: f64,
        /// The dimension to change.
        dimension: Dimension,
    },
}

/// How the target mass was met. Serialised with a `kind` tag.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum TargetOutcome {
    /// No target: the mass is what the design gives.
    AsDesigned,
    /// Every density was multiplied by `factor`.
    DensitiesScaled {
        /// Mass before scaling, kg.
        designed_mass_kg: f64,
        /// The factor applied to every density.
        factor: f64,
    },
    /// One dimension was changed.
    DimensionSolved {
        /// The dimension.
        dimension: Dimension,
        /// Its value in the design, m.
        designed_m: f64,
        /// The value that gives the target mass, m.
        solved_m: f64,
        /// Mass with the designed value, kg.
        designed_mass_kg: f64,
    },
}

/// Largest target mass accepted, kg.
pub const MAX_TARGET_MASS_KG: f64 = 10.0;
/// Fraction of a dimension's allowed range kept clear at each end when bracketing.
const BRACKET_INSET: f64 = 1e-7;

/// Checks a target mass (kg) against (0, 10] kg.
pub(crate) fn check_target(target_kg: f64) -> Result<(), MassError> {
    if target_kg > 0.0 && target_kg <= MAX_TARGET_MASS_KG {
        Ok(())
    } else {
        Err(MassError::TargetOutOfRange { target_kg, min_kg: 0.0, max_kg: MAX_TARGET_MASS_KG })
    }
}

/// Finds the value of `dimension` that gives `target_kg` with `layup`, by bisection between
/// the ends of the dimension's allowed range (given the other dimensions). The result is the
/// parametric outline with that value. Unreachable targets are errors naming the masses at the
/// ends of the range.
pub fn solve_dimension(
    outline: &ParametricOutline,
    layup: &Layup,
    dimension: Dimension,
    target_kg: f64,
    settings: &SamplingSettings,
) -> Result<ParametricOutline, MassError> {
    check_target(target_kg)?;
    outline.validate()?;
    let mass_at = |value_m: f64| -> Result<f64, MassError> {
        let built = outline.with(dimension, value_m).build(settings)?;
        Ok(mass_breakdown(&built, layup)?.properties.mass_kg)
    };
    let (min_m, max_m) = outline.allowed_range_m(dimension);
    let inset = BRACKET_INSET * (max_m - min_m);
    let (mut lo, mut hi) = (min_m + inset, max_m - inset);
    let (m_lo, m_hi) = (mass_at(lo)?, mass_at(hi)?);
    if !(target_kg >= m_lo.min(m_hi) && target_kg <= m_lo.max(m_hi)) {
        return Err(MassError::UnreachableTarget {
            target_kg,
            dimension,
            reachable_min_kg: m_lo.min(m_hi),
            reachable_max_kg: m_lo.max(m_hi),
            dimension_min_m: lo,
            dimension_max_m: hi,
        });
    }
    let rising = m_hi >= m_lo;
    for _ in 0..200 {
        let mid = 0.5 * (lo + hi);
        let m = mass_at(mid)?;
        if (m - target_kg).abs() <= 1e-12 * target_kg || hi - lo <= 1e-15 {
            return Ok(outline.with(dimension, mid));
        }
        if (m < target_kg) == rising {
            lo = mid;
        } else {
            hi = mid;
        }
    }
    Ok(outline.with(dimension, 0.5 * (lo + hi)))
}
