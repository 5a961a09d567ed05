use super::{Layup, LayupError, Material, Region};
use crate::geometry::clip::{clip_all, HalfPlane};
use crate::geometry::{signed_area_m2, Outline, RzPoint};
use std::collections::HashSet;

/// A region of a layup clipped to the outline: the pieces of the cross-section it fills.
#[derive(Debug, Clone, PartialEq)]
pub struct FilledRegion {
    /// Region name.
    pub name: String,
    /// Its material.
    pub material: Material,
    /// Counter-clockwise polygons (m) whose union is the region's part of the outline. A piece
    /// may contain zero-width bridges where a clip line cut the outline in several places;
    /// they add nothing to areas or integrals.
    pub pieces: Vec<Vec<RzPoint>>,
}

impl FilledRegion {
    /// Cross-section area, m².
    pub fn area_m2(&self) -> f64 {
        self.pieces.iter().map(|p| signed_area_m2(p)).sum()
    }
}

/// Relative tolerance (of the outline's area) for gaps, overlaps and empty regions.
const COVER_TOLERANCE: f64 = 1e-9;
const M2_TO_MM2: f64 = 1e6;

/// Clips every region of `layup` to `outline` and checks that the regions cover the outline
/// exactly once: overlaps, gaps and empty regions larger than 1e-9 of the outline's area are
/// errors naming the regions and the area (mm²).
pub fn fill_outline(outline: &Outline, layup: &Layup) -> Result<Vec<FilledRegion>, LayupError> {
    let regions = layup.regions(outline.outer_radius_m())?;
    check_names(&regions)?;
    let tolerance_m2 = COVER_TOLERANCE * outline.area_m2();
    let cells: Vec<Vec<Vec<HalfPlane>>> = regions.iter().map(Region::convex_cells).collect::<Result<_, _>>()?;
    let filled: Vec<FilledRegion> = regions
        .iter()
        .zip(&cells)
        .map(|(region, cells)| fill_region(outline, region, cells))
        .collect();
    for region in &filled {
        let area = region.area_m2();
        if area <= tolerance_m2 {
            return Err(LayupError::EmptyRegion { region: region.name.clone(), area_mm2: area * M2_TO_MM2 });
        }
    }
    check_overlaps(&filled, &cells, tolerance_m2)?;
    check_gap(outline, &filled, tolerance_m2)?;
    Ok(filled)
}

fn check_names(regions: &[Region]) -> Result<(), LayupError> {
    if regions.is_empty() {
        return Err(LayupError::NoRegions);
    }
    let mut seen = HashSet::new();
    match regions.iter().find(|r| !seen.insert(r.name.as_str())) {
        Some(r) => Err(LayupError::DuplicateRegion { region: r.name.clone() }),
        None => Ok(()),
    }
}

fn fill_region(outline: &Outline, region: &Region, cells: &[Vec<HalfPlane>]) -> FilledRegion {
    let pieces = cells
        .iter()
        .map(|cell| clip_all(outline.points(), cell))
        .filter(|piece| !piece.is_empty())
        .collect();
    FilledRegion { name: region.name.clone(), material: region.material.clone(), pieces }
}

fn check_overlaps(filled: &[FilledRegion], cells: &[Vec<Vec<HalfPlane>>], tolerance_m2: f64) -> Result<(), LayupError> {
    for i in 0..filled.len() {
        for j in (i + 1)..filled.len() {
            let overlap = overlap_m2(&filled[i], &cells[j]);
            if overlap > tolerance_m2 {
                return Err(LayupError::Overlap {
                    first: filled[i].name.clone(),
                    second: filled[j].name.clone(),
                    overlap_mm2: overlap * M2_TO_MM2,
                });
            }
        }
    }
    Ok(())
}

fn overlap_m2(region: &FilledRegion, other_cells: &[Vec<HalfPlane>]) -> f64 {
    region
        .pieces
        .iter()
        .flat_map(|piece| other_cells.iter().map(move |cell| signed_area_m2(&clip_all(piece, cell))))
        .sum()
}

fn check_gap(outline: &Outline, filled: &[FilledRegion], tolerance_m2: f64) -> Result<(), LayupError> {
    let covered: f64 = filled.iter().map(FilledRegion::area_m2).sum();
    let uncovered = outline.area_m2() - covered;
    if uncovered > tolerance_m2 {
        return Err(LayupError::Gap { uncovered_mm2: uncovered * M2_TO_MM2, outline_mm2: outline.area_m2() * M2_TO_MM2 });
    }
    Ok(())
}
