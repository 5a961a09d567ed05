use super::Dimension;
use thiserror::Error;

/// Why an outline or its parameters are not acceptable. Every variant names the offending value
/// and, where there is one, the allowed range (lengths in m).
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum GeometryError {
    /// Fewer than three distinct points.
    #[error("an outline needs at least 3 distinct points, got {count}")]
    TooFewPoints {
        /// Number of distinct points given.
        count: usize,
    },
    /// A polygon has more points than this use of it accepts.
    #[error("the polygon has {count} points; at most {max} are accepted here")]
    TooManyPoints {
        /// Points given.
        count: usize,
        /// Most accepted.
        max: usize,
    },
    /// A coordinate is NaN or infinite.
    #[error("point {index} of the outline is not finite (r = {r_m} m, z = {z_m} m); coordinates must be finite numbers")]
    NotFinite {
        /// Index of the point (0-based).
        index: usize,
        /// Its radius, m.
        r_m: f64,
        /// Its height, m.
        z_m: f64,
    },
    /// A coordinate is beyond any disc's size.
    #[error("point {index} of the outline (r = {r_m} m, z = {z_m} m) lies outside the allowed range: |r| and |z| at most {limit_m} m")]
    CoordinateOutOfRange {
        /// Index of the point (0-based).
        index: usize,
        /// Its radius, m.
        r_m: f64,
        /// Its height, m.
        z_m: f64,
        /// Largest allowed |r| and |z|, m.
        limit_m: f64,
    },
    /// A point lies on the far side of the symmetry axis.
    #[error("point {index} of the outline has r = {r_m} m; radii must be ≥ 0 (the outline lies in the half-plane r ≥ 0)")]
    NegativeRadius {
        /// Index of the point (0-based).
        index: usize,
        /// Its radius, m.
        r_m: f64,
    },
    /// Two edges of the outline cross or touch.
    #[error("the outline intersects itself: edge {first} (from point {first}) meets edge {second} (from point {second}); an outline must be a simple polygon")]
    SelfIntersecting {
        /// Index of the first edge (it starts at this point).
        first: usize,
        /// Index of the second edge.
        second: usize,
    },
    /// The enclosed area is zero (all points on a line) or too small to be a disc section.
    #[error("the outline encloses {area_m2:e} m², it must enclose a positive area (at least {min_area_m2:e} m²)")]
    ZeroArea {
        /// Enclosed area, m².
        area_m2: f64,
        /// Smallest accepted area, m².
        min_area_m2: f64,
    },
    /// A named dimension of a parametric outline is outside the range the other dimensions allow.
    #[error("{} = {value_m} m is outside its allowed range [{min_m}, {max_m}] m given the other dimensions{}", .dimension.name(), empty_hint(*.min_m, *.max_m))]
    DimensionOutOfRange {
        /// The dimension.
        dimension: Dimension,
        /// Its value, m.
        value_m: f64,
        /// Smallest allowed value given the others, m.
        min_m: f64,
        /// Largest allowed value given the others, m.
        max_m: f64,
    },
    /// A named dimension is NaN or infinite.
    #[error("{} = {value_m} is not a finite number", .dimension.name())]
    DimensionNotFinite {
        /// The dimension.
        dimension: Dimension,
        /// Its value.
        value_m: f64,
    },
    /// The chord tolerance used to sample curves is outside its range.
    #[error("chord tolerance {value_m} m is outside its allowed range [{min_m}, {max_m}] m")]
    ToleranceOutOfRange {
        /// Given tolerance, m.
        value_m: f64,
        /// Smallest allowed, m.
        min_m: f64,
        /// Largest allowed, m.
        max_m: f64,
    },
    /// A declared dimension of an outline from points is not a positive finite number.
    #[error("declared {name} = {value_m} m must be a finite number ≥ 0")]
    BadDeclaredDimension {
        /// Which declared dimension.
        name: &'static str,
        /// Its value, m.
        value_m: f64,
    },
}

fn empty_hint(min_m: f64, max_m: f64) -> &'static str {
    if min_m > max_m {
        " (the range is empty: change the other dimensions first)"
    } else {
        ""
    }
}
