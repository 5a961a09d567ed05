use super::{GeometryError, Outline, ParametricOutline, SamplingSettings};
use serde::{Deserialize, Serialize};

/// Where a design's outline comes from: explicit points, or a parametric family.
/// Serialised with a `kind` tag: `"points"` or `"parametric"`.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum OutlineSource {
    /// An outline given point by point.
    Points(Outline),
    /// A parametric outline, sampled when the design is evaluated.
    Parametric(ParametricOutline),
}

impl OutlineSource {
    /// The outline as a polygon (parametric outlines are validated and sampled).
    pub fn build(&self, settings: &SamplingSettings) -> Result<Outline, GeometryError> {
        match self {
            OutlineSource::Points(outline) => Ok(outline.clone()),
            OutlineSource::Parametric(parametric) => parametric.build(settings),
        }
    }
}

impl From<ParametricOutline> for OutlineSource {
    fn from(parametric: ParametricOutline) -> Self {
        OutlineSource::Parametric(parametric)
    }
}

impl From<Outline> for OutlineSource {
    fn from(outline: Outline) -> Self {
        OutlineSource::Points(outline)
    }
}
