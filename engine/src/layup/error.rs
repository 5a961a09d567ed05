use crate::geometry::GeometryError;
use thiserror::Error;

/// Why a layup does not fit its outline. Variants name the material or region, the value and
/// the allowed range. Areas are in mm² (cross-section), densities in kg/m³ with g/cm³ beside.
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum LayupError {
    /// A density is zero, negative, NaN or beyond any solid.
    #[error("material '{material}' has density {density_kg_m3} kg/m³ ({} g/cm³); allowed range is [{min_kg_m3}, {max_kg_m3}] kg/m³", .density_kg_m3 / 1000.0)]
    DensityOutOfRange {
        /// Material name.
        material: String,
        /// Given density, kg/m³.
        density_kg_m3: f64,
        /// Lower bound, kg/m³.
        min_kg_m3: f64,
        /// Upper bound (inclusive), kg/m³.
        max_kg_m3: f64,
    },
    /// The overmold split radius is not inside the disc.
    #[error("split radius {split_radius_m} m is outside the allowed range (0, {max_m}) m (the outline's outer radius)")]
    SplitRadiusOutOfRange {
        /// Given split radius, m.
        split_radius_m: f64,
        /// The outline's outer radius, m.
        max_m: f64,
    },
    /// A region bound is NaN, or its lower bound is not below its upper bound.
    #[error("region '{region}': {bound} bounds [{low}, {high}] m are not finite and increasing")]
    BadBounds {
        /// Region name.
        region: String,
        /// "radial" or "height".
        bound: &'static str,
        /// Lower bound, m (NaN or ±∞ when missing/invalid).
        low: f64,
        /// Upper bound, m.
        high: f64,
    },
    /// A region's polygon is not a valid simple polygon.
    #[error("region '{region}': {source}")]
    BadRegionPolygon {
        /// Region name.
        region: String,
        /// What is wrong with the polygon.
        source: GeometryError,
    },
    /// Two regions claim the same part of the outline.
    #[error("regions '{first}' and '{second}' overlap by {overlap_mm2:.6} mm² of the cross-section; regions must cover the outline exactly once")]
    Overlap {
        /// First region.
        first: String,
        /// Second region.
        second: String,
        /// Overlapping cross-section area, mm².
        overlap_mm2: f64,
    },
    /// Part of the outline belongs to no region.
    #[error("{uncovered_mm2:.6} mm² of the {outline_mm2:.3} mm² cross-section is in no region; regions must cover the outline exactly once")]
    Gap {
        /// Uncovered cross-section area, mm².
        uncovered_mm2: f64,
        /// The outline's area, mm².
        outline_mm2: f64,
    },
    /// A region covers no part of the outline.
    #[error("region '{region}' covers none of the outline (area {area_mm2:e} mm²)")]
    EmptyRegion {
        /// Region name.
        region: String,
        /// Covered area, mm².
        area_mm2: f64,
    },
    /// The layup lists no regions.
    #[error("a layup needs at least one region")]
    NoRegions,
    /// More than one region claims the rest of the outline.
    #[error("regions '{first}' and '{second}' both take the rest of the outline; at most one region may")]
    SeveralRests {
        /// First rest region.
        first: String,
        /// Second rest region.
        second: String,
    },
    /// Two regions share a name.
    #[error("two regions are named '{region}'; region names must be unique")]
    DuplicateRegion {
        /// The repeated name.
        region: String,
    },
}
