use super::target::{check_target, solve_dimension};
use super::{mass_breakdown, MassError, MassProperties, MassTarget, RegionShare, TargetOutcome};
use crate::geometry::{Outline, OutlineSource, SamplingSettings};
use crate::layup::Layup;
use crate::standards::{check_standard, StandardCheck};
use serde::{Deserialize, Serialize};

/// A disc design: an outline, a layup and how to meet a target mass. Serialisable (JSON, TOML).
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct DiscDesign {
    /// Name shown in reports.
    pub name: String,
    /// The cross-section.
    pub outline: OutlineSource,
    /// The materials and where they are.
    pub layup: Layup,
    /// How to meet a target mass (default: as designed).
    #[serde(default)]
    pub target: MassTarget,
    /// How curves are sampled (default chord tolerance 0.01 mm).
    #[serde(default)]
    pub sampling: SamplingSettings,
}

/// What a design evaluates to: mass properties, region shares, how the target was met, and
/// the standard's checks.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct DesignReport {
    /// The design's name.
    pub name: String,
    /// Mass properties of the finished disc.
    pub properties: MassProperties,
    /// Total volume, m³.
    pub volume_m3: f64,
    /// Each region's share of mass and of I_z.
    pub regions: Vec<RegionShare>,
    /// How the target mass was met.
    pub target: TargetOutcome,
    /// Every rule of the standard that could be checked (see [`DesignReport::warnings`]).
    pub standard: Vec<StandardCheck>,
    /// The outline as evaluated (after any solved dimension).
    pub outline: Outline,
    /// The layup as evaluated (after any density scaling).
    pub layup: Layup,
}

impl DesignReport {
    /// The rules the disc fails.
    pub fn warnings(&self) -> Vec<&StandardCheck> {
        self.standard.iter().filter(|c| !c.passed).collect()
    }
}

impl DiscDesign {
    /// A design with the default sampling and no target.
    pub fn new(name: impl Into<String>, outline: impl Into<OutlineSource>, layup: Layup) -> Self {
        Self {
            name: name.into(),
            outline: outline.into(),
            layup,
            target: MassTarget::AsDesigned,
            sampling: SamplingSettings::default(),
        }
    }

    /// The same design with a target.
    pub fn with_target(mut self, target: MassTarget) -> Self {
        self.target = target;
        self
    }

    /// Meets the target, computes the mass properties and checks the standard.
    pub fn evaluate(&self) -> Result<DesignReport, MassError> {
        self.sampling.validate()?;
        let (outline, layup, target) = self.meet_target()?;
        let breakdown = mass_breakdown(&outline, &layup)?;
        Ok(DesignReport {
            name: self.name.clone(),
            standard: check_standard(&outline, &breakdown.properties),
            properties: breakdown.properties,
            volume_m3: breakdown.volume_m3,
            regions: breakdown.regions,
            target,
            outline,
            layup,
        })
    }

    fn meet_target(&self) -> Result<(Outline, Layup, TargetOutcome), MassError> {
        let outline = self.outline.build(&self.sampling)?;
        match self.target {
            MassTarget::AsDesigned => Ok((outline, self.layup.clone(), TargetOutcome::AsDesigned)),
            MassTarget::ScaleDensities { mass_kg } => {
                check_target(mass_kg)?;
                let designed_mass_kg = mass_breakdown(&outline, &self.layup)?.properties.mass_kg;
                let factor = mass_kg / designed_mass_kg;
                let outcome = TargetOutcome::DensitiesScaled { designed_mass_kg, factor };
                Ok((outline, self.layup.scaled_densities(factor), outcome))
            }
            MassTarget::SolveDimension { mass_kg, dimension } => {
                let OutlineSource::Parametric(parametric) = &self.outline else {
                    return Err(MassError::NotParametric { dimension });
                };
                let designed_mass_kg = mass_breakdown(&outline, &self.layup)?.properties.mass_kg;
                let solved = solve_dimension(parametric, &self.layup, dimension, mass_kg, &self.sampling)?;
                let outcome = TargetOutcome::DimensionSolved {
                    dimension,
                    designed_m: parametric.get(dimension),
                    solved_m: solved.get(dimension),
                    designed_mass_kg,
                };
                Ok((solved.build(&self.sampling)?, self.layup.clone(), outcome))
            }
        }
    }
}
