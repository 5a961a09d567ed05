use serde::{Deserialize, Serialize};

use super::error::{finite, GroundError};

/// The contact properties of a ground surface against a plastic disc rim. Dimensionless.
///
/// Built with [`Surface::new`] (validated) or from a [`SurfacePreset`]. Deserialising also
/// validates, so a configuration file cannot smuggle in a negative friction.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(try_from = "SurfaceSpec", into = "SurfaceSpec")]
pub struct Surface {
    name: String,
    friction: f64,
    restitution: f64,
    rolling_resistance: f64,
}

/// The unvalidated serialised form of a [`Surface`].
#[derive(Debug, Clone, Serialize, Deserialize)]
struct SurfaceSpec {
    #[serde(default = "custom_name")]
    name: String,
    friction: f64,
    restitution: f64,
    #[serde(default)]
    rolling_resistance: f64,
}

fn custom_name() -> String {
    "custom".to_string()
}

impl TryFrom<SurfaceSpec> for Surface {
    type Error = GroundError;
    fn try_from(spec: SurfaceSpec) -> Result<Self, GroundError> {
        Surface::new(spec.friction, spec.restitution, spec.rolling_resistance)
            .map(|surface| surface.named(spec.name))
    }
}

impl From<Surface> for SurfaceSpec {
    fn from(surface: Surface) -> Self {
        SurfaceSpec {
            name: surface.name,
            friction: surface.friction,
            restitution: surface.restitution,
            rolling_resistance: surface.rolling_resistance,
        }
    }
}

impl Surface {
    /// A user-defined surface named "custom".
    ///
    /// - `friction`: Coulomb coefficient μ between rim and ground, ≥ 0.
    /// - `restitution`: coefficient of restitution e in [0, 1] (energetic definition, see
    ///   [`resolve_impact`](crate::ground::resolve_impact)).
    /// - `rolling_resistance`: rolling (ploughing) resistance coefficient c_rr ≥ 0 for a disc
    ///   rolling on its rim: a resisting force c_rr·N at the contact.
    pub fn new(friction: f64, restitution: f64, rolling_resistance: f64) -> Result<Self, GroundError> {
        let friction = finite("friction coefficient", friction)?;
        if friction < 0.0 {
            return Err(GroundError::FrictionOutOfRange { value: friction });
        }
        let restitution = finite("coefficient of restitution", restitution)?;
        if !(0.0..=1.0).contains(&restitution) {
            return Err(GroundError::RestitutionOutOfRange { value: restitution });
        }
        let rolling_resistance = finite("rolling resistance coefficient", rolling_resistance)?;
        if rolling_resistance < 0.0 {
            return Err(GroundError::RollingResistanceOutOfRange { value: rolling_resistance });
        }
        Ok(Surface { name: custom_name(), friction, restitution, rolling_resistance })
    }

    /// The same surface under another display name.
    pub fn named(mut self, name: impl Into<String>) -> Self {
        self.name = name.into();
        self
    }

    /// Display name of the surface.
    pub fn name(&self) -> &str {
        &self.name
    }

    /// Coulomb friction coefficient μ (dimensionless, ≥ 0).
    pub fn friction(&self) -> f64 {
        self.friction
    }

    /// Coefficient of restitution e (dimensionless, in [0, 1]).
    pub fn restitution(&self) -> f64 {
        self.restitution
    }

    /// Rolling (ploughing) resistance coefficient c_rr (dimensionless, ≥ 0).
    pub fn rolling_resistance(&self) -> f64 {
        self.rolling_resistance
    }
}

/// Built-in ground surfaces. Every value is **approximate**: a plausible middle of the range a
/// plastic rim meets on that ground, not a measurement; see [`SurfacePreset::source`].
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
#[non_exhaustive]
pub enum SurfacePreset {
    /// Mown fairway grass, dry.
    ShortGrass,
    /// Uncut rough.
    LongGrass,
    /// Bare, packed earth path.
    PackedDirt,
    /// Asphalt or concrete court.
    HardCourt,
    /// Loose dry sand.
    Sand,
}

impl SurfacePreset {
    /// All presets, in display order.
    pub const ALL: [SurfacePreset; 5] = [
        SurfacePreset::ShortGrass,
        SurfacePreset::LongGrass,
        SurfacePreset::PackedDirt,
        SurfacePreset::HardCourt,
        SurfacePreset::Sand,
    ];

    /// Snake-case name used in scripts and files (`short_grass`, ...).
    pub fn name(self) -> &'static str {
        match self {
            SurfacePreset::ShortGrass => "short_grass",
            SurfacePreset::LongGrass => "long_grass",
            SurfacePreset::PackedDirt => "packed_dirt",
            SurfacePreset::HardCourt => "hard_court",
            SurfacePreset::Sand => "sand",
        }
    }

    /// Looks a preset up by its [`name`](SurfacePreset::name).
    pub fn from_name(name: &str) -> Result<SurfacePreset, GroundError> {
        SurfacePreset::ALL.into_iter().find(|preset| preset.name() == name).ok_or_else(|| {
            let known: Vec<&str> = SurfacePreset::ALL.iter().map(|p| p.name()).collect();
            GroundError::UnknownSurface { name: name.to_string(), known: known.join(", ") }
        })
    }

    /// (friction μ, restitution e, rolling resistance c_rr), all approximate.
    fn values(self) -> (f64, f64, f64) {
        match self {
            SurfacePreset::ShortGrass => (0.50, 0.35, 0.15),
            SurfacePreset::LongGrass => (0.80, 0.20, 0.35),
            SurfacePreset::PackedDirt => (0.60, 0.45, 0.08),
            SurfacePreset::HardCourt => (0.55, 0.60, 0.05),
            SurfacePreset::Sand => (0.90, 0.10, 0.60),
        }
    }

    /// Where the values come from, for display beside them.
    pub fn source(self) -> &'static str {
        match self {
            SurfacePreset::HardCourt => {
                "approximate: friction of plastic on asphalt/concrete is a handbook range of about \
                 0.5–0.7 (value from memory, unverified); restitution and rolling resistance: \
                 common practice, no published source"
            }
            _ => {
                "approximate: common practice, no published source (plausible middle values for \
                 a plastic rim on this ground; calibrate against observed ground play)"
            }
        }
    }

    /// The preset as a validated [`Surface`].
    pub fn surface(self) -> Surface {
        let (friction, restitution, rolling_resistance) = self.values();
        Surface { name: self.name().to_string(), friction, restitution, rolling_resistance }
    }
}

impl From<SurfacePreset> for Surface {
    fn from(preset: SurfacePreset) -> Surface {
        preset.surface()
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn every_preset_is_valid_and_found_by_its_name() {
        for preset in SurfacePreset::ALL {
            let surface = preset.surface();
            let checked = Surface::new(surface.friction(), surface.restitution(), surface.rolling_resistance());
            assert!(checked.is_ok(), "{preset:?}");
            assert_eq!(SurfacePreset::from_name(preset.name()), Ok(preset));
            assert!(preset.source().starts_with("approximate"));
        }
        let unknown = SurfacePreset::from_name("ice").expect_err("unknown");
        assert!(unknown.to_string().contains("short_grass"));
    }
}
