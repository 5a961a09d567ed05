use super::family::family_defaults;
use super::{Dimension, DiscFamily, GeometryError};
use serde::{Deserialize, Serialize};

/// A disc outline described by named dimensions (all m), built into a polygon by
/// [`ParametricOutline::build`]. z = 0 is the bottom of the rim. The section, from the axis
/// outward along the underside and back along the top:
/// - the flight plate: `plate_thickness_m` thick (measured vertically), its underside at
///   `rim_depth_m` above the rim bottom at the inner rim wall, rising by `dome_height_m` to the
///   centre along a circular arc with a horizontal tangent on the axis;
/// - the rim, `rim_width_m` wide: a vertical inner wall from the plate underside down to a
///   rounded corner (radius 0.2·min(rim width, rim depth)) at the rim bottom, then the rim
///   underside, a smooth step (z ∝ 3t² − 2t³, horizontal at both ends) rising to the nose;
/// - the nose: `rim_thickness_m` tall at the outer edge, centred on `parting_line_height_m`,
///   its corners rounded with `leading_edge_radius_m`;
/// - the shoulder: a smooth step from the top of the nose up to the top of the plate at the
///   inner rim wall.
///
/// Each dimension is checked against the others ([`ParametricOutline::allowed_range_m`]).
/// Missing fields in a serialised outline take the family's defaults.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(from = "ParametricSpec")]
pub struct ParametricOutline {
    /// The family whose defaults fill unspecified dimensions.
    pub family: DiscFamily,
    /// Outside diameter, m.
    pub diameter_m: f64,
    /// Radial width of the rim, from the outer edge to the inner rim wall, m.
    pub rim_width_m: f64,
    /// Inner rim depth: rim bottom to plate underside at the inner rim wall, m.
    pub rim_depth_m: f64,
    /// Vertical thickness of the nose at the outer edge, m.
    pub rim_thickness_m: f64,
    /// Flight-plate thickness, m.
    pub plate_thickness_m: f64,
    /// Rise of the flight plate from the inner rim wall to the centre, m.
    pub dome_height_m: f64,
    /// Radius of the rounded leading edge (the nose's corners), m.
    pub leading_edge_radius_m: f64,
    /// Height of the middle of the nose above the rim bottom, m.
    pub parting_line_height_m: f64,
}

/// Serialised form: a family and any dimensions that differ from its defaults.
#[derive(Debug, Clone, Copy, Deserialize)]
struct ParametricSpec {
    family: DiscFamily,
    diameter_m: Option<f64>,
    rim_width_m: Option<f64>,
    rim_depth_m: Option<f64>,
    rim_thickness_m: Option<f64>,
    plate_thickness_m: Option<f64>,
    dome_height_m: Option<f64>,
    leading_edge_radius_m: Option<f64>,
    parting_line_height_m: Option<f64>,
}

impl From<ParametricSpec> for ParametricOutline {
    fn from(s: ParametricSpec) -> Self {
        let d = ParametricOutline::new(s.family);
        ParametricOutline {
            family: s.family,
            diameter_m: s.diameter_m.unwrap_or(d.diameter_m),
            rim_width_m: s.rim_width_m.unwrap_or(d.rim_width_m),
            rim_depth_m: s.rim_depth_m.unwrap_or(d.rim_depth_m),
            rim_thickness_m: s.rim_thickness_m.unwrap_or(d.rim_thickness_m),
            plate_thickness_m: s.plate_thickness_m.unwrap_or(d.plate_thickness_m),
            dome_height_m: s.dome_height_m.unwrap_or(d.dome_height_m),
            leading_edge_radius_m: s.leading_edge_radius_m.unwrap_or(d.leading_edge_radius_m),
            parting_line_height_m: s.parting_line_height_m.unwrap_or(d.parting_line_height_m),
        }
    }
}

/// Smallest radius of the flight plate (axis to inner rim wall), m.
const MIN_PLATE_RADIUS_M: f64 = 1e-3;
/// Smallest material left between plate underside and the plate's top, and between the nose
/// and the inner rim wall, m.
const MIN_WALL_M: f64 = 2e-4;
/// Smallest nose thickness, m.
const MIN_RIM_THICKNESS_M: f64 = 1e-3;
/// Largest diameter accepted, m.
const MAX_DIAMETER_M: f64 = 2.0;
/// The order in which [`ParametricOutline::validate`] checks ranges.
const VALIDATION_ORDER: [Dimension; 8] = [
    Dimension::RimWidth,
    Dimension::PlateThickness,
    Dimension::LeadingEdgeRadius,
    Dimension::DomeHeight,
    Dimension::PartingLineHeight,
    Dimension::RimThickness,
    Dimension::RimDepth,
    Dimension::Diameter,
];
/// Fraction of min(rim width, rim depth) used as the radius of the rim's inner bottom corner.
pub(crate) const CORNER_FRACTION: f64 = 0.2;

impl ParametricOutline {
    /// The family's default outline.
    pub fn new(family: DiscFamily) -> Self {
        let [d, w, depth, t, tp, h, le, pl] = family_defaults(family);
        ParametricOutline {
            family,
            diameter_m: d,
            rim_width_m: w,
            rim_depth_m: depth,
            rim_thickness_m: t,
            plate_thickness_m: tp,
            dome_height_m: h,
            leading_edge_radius_m: le,
            parting_line_height_m: pl,
        }
    }

    /// The value of a named dimension, m.
    pub fn get(&self, dimension: Dimension) -> f64 {
        match dimension {
            Dimension::Diameter => self.diameter_m,
            Dimension::RimWidth => self.rim_width_m,
            Dimension::RimDepth => self.rim_depth_m,
            Dimension::RimThickness => self.rim_thickness_m,
            Dimension::PlateThickness => self.plate_thickness_m,
            Dimension::DomeHeight => self.dome_height_m,
            Dimension::LeadingEdgeRadius => self.leading_edge_radius_m,
            Dimension::PartingLineHeight => self.parting_line_height_m,
        }
    }

    /// A copy with one dimension changed (m); not validated until built or validated.
    pub fn with(mut self, dimension: Dimension, value_m: f64) -> Self {
        *self.slot(dimension) = value_m;
        self
    }

    fn slot(&mut self, dimension: Dimension) -> &mut f64 {
        match dimension {
            Dimension::Diameter => &mut self.diameter_m,
            Dimension::RimWidth => &mut self.rim_width_m,
            Dimension::RimDepth => &mut self.rim_depth_m,
            Dimension::RimThickness => &mut self.rim_thickness_m,
            Dimension::PlateThickness => &mut self.plate_thickness_m,
            Dimension::DomeHeight => &mut self.dome_height_m,
            Dimension::LeadingEdgeRadius => &mut self.leading_edge_radius_m,
            Dimension::PartingLineHeight => &mut self.parting_line_height_m,
        }
    }

    /// The closed range (min, max) in m that `dimension` may take given the other dimensions.
    /// The rules: plate radius (diameter/2 − rim width) ≥ max(4 × dome height, 1 mm); plate
    /// thickness ≥ 0.3 mm and ≤ rim depth − 0.5 mm; leading-edge radius ≤ rim thickness / 2;
    /// the nose lies between the rim bottom and the plate top (parting line ≥ rim thickness / 2,
    /// parting line + rim thickness / 2 ≤ rim depth + plate thickness); rim width ≥
    /// leading-edge radius + 0.2 × rim depth + 0.2 mm; rim thickness ≥ 1 mm; dome height ≥ 0.
    /// An empty range (min > max) means the other dimensions must change first.
    pub fn allowed_range_m(&self, dimension: Dimension) -> (f64, f64) {
        let (r, w, d) = (self.diameter_m / 2.0, self.rim_width_m, self.rim_depth_m);
        let (t, tp, h) = (self.rim_thickness_m, self.plate_thickness_m, self.dome_height_m);
        let (le, pl) = (self.leading_edge_radius_m, self.parting_line_height_m);
        let plate_radius_min = (4.0 * h).max(MIN_PLATE_RADIUS_M);
        match dimension {
            Dimension::Diameter => (2.0 * (w + plate_radius_min), MAX_DIAMETER_M),
            Dimension::RimWidth => (le + CORNER_FRACTION * d + MIN_WALL_M, r - plate_radius_min),
            Dimension::RimDepth => (
                (tp + 0.5e-3).max(pl + t / 2.0 - tp),
                (w - le - MIN_WALL_M) / CORNER_FRACTION,
            ),
            Dimension::RimThickness => ((2.0 * le).max(MIN_RIM_THICKNESS_M), 2.0 * pl.min(d + tp - pl)),
            Dimension::PlateThickness => (0.3e-3_f64.max(pl + t / 2.0 - d), d - 0.5e-3),
            Dimension::DomeHeight => (0.0, (r - w) / 4.0),
            Dimension::LeadingEdgeRadius => (0.0, (t / 2.0).min(w - CORNER_FRACTION * d - MIN_WALL_M)),
            Dimension::PartingLineHeight => (t / 2.0, d + tp - t / 2.0),
        }
    }

    /// Checks every dimension: finite, then within its allowed range given the others; the
    /// first failure is returned. Dimensions that are usually the culprit of a conflict are
    /// checked first (rim width, plate thickness, leading-edge radius, dome height, parting
    /// line, then rim thickness, rim depth, diameter), so a rim wider than the radius is
    /// reported as a rim-width error, not as a diameter error.
    pub fn validate(&self) -> Result<(), GeometryError> {
        for dimension in Dimension::ALL {
            let value_m = self.get(dimension);
            if !value_m.is_finite() {
                return Err(GeometryError::DimensionNotFinite { dimension, value_m });
            }
        }
        for dimension in VALIDATION_ORDER {
            let value_m = self.get(dimension);
            let (min_m, max_m) = self.allowed_range_m(dimension);
            if !(min_m..=max_m).contains(&value_m) {
                return Err(GeometryError::DimensionOutOfRange { dimension, value_m, min_m, max_m });
            }
        }
        Ok(())
    }
}
