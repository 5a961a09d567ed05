use serde::{Deserialize, Serialize};

/// A named dimension of a parametric outline (see [`ParametricOutline`](super::ParametricOutline)
/// for what each measures). All are lengths in m.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
pub enum Dimension {
    /// Outside diameter.
    Diameter,
    /// Radial width of the rim.
    RimWidth,
    /// Inner rim depth.
    RimDepth,
    /// Vertical thickness of the rim's outer edge (the nose).
    RimThickness,
    /// Flight-plate thickness.
    PlateThickness,
    /// Rise of the flight plate from the inner rim wall to the centre.
    DomeHeight,
    /// Radius of the rounded leading edge.
    LeadingEdgeRadius,
    /// Height of the middle of the nose above the bottom of the rim.
    PartingLineHeight,
}

impl Dimension {
    /// Every dimension.
    pub const ALL: [Dimension; 8] = [
        Dimension::Diameter,
        Dimension::RimWidth,
        Dimension::RimDepth,
        Dimension::RimThickness,
        Dimension::PlateThickness,
        Dimension::DomeHeight,
        Dimension::LeadingEdgeRadius,
        Dimension::PartingLineHeight,
    ];

    /// Human-readable name ("plate thickness").
    pub fn name(self) -> &'static str {
        match self {
            Dimension::Diameter => "diameter",
            Dimension::RimWidth => "rim width",
            Dimension::RimDepth => "rim depth",
            Dimension::RimThickness => "rim thickness",
            Dimension::PlateThickness => "plate thickness",
            Dimension::DomeHeight => "dome height",
            Dimension::LeadingEdgeRadius => "leading-edge radius",
            Dimension::PartingLineHeight => "parting-line height",
        }
    }
}

impl std::fmt::Display for Dimension {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.write_str(self.name())
    }
}
