use serde::{Deserialize, Serialize};

use super::plane::GroundPlane;
use super::surface::{Surface, SurfacePreset};

/// The ground a disc lands on: a plane and its surface. Serde validates both parts.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Ground {
    /// The (possibly sloped) plane.
    #[serde(default)]
    pub plane: GroundPlane,
    /// Contact properties of the surface.
    pub surface: Surface,
}

impl Ground {
    /// Ground of `surface` on `plane`.
    pub fn new(plane: GroundPlane, surface: impl Into<Surface>) -> Self {
        Ground { plane, surface: surface.into() }
    }

    /// Level ground at z = 0 with a preset surface.
    pub fn level(preset: SurfacePreset) -> Self {
        Ground::new(GroundPlane::default(), preset)
    }
}
