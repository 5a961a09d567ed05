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
    /// Polygons (m) whose union is the region's part of the outline. A piece may contain
    /// zero-width bridges where a clip line cut the outline in several places; they add
    /// nothing to areas or integrals. The rest region is the whole outline (counter-clockwise)
    /// plus every other region's pieces reversed (clockwise, so they subtract): revolved, it is
    /// a closed solid with cavities.
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
/// errors naming the regions and the area (mm²). A rest region takes what the others leave
/// (so there is no gap), and is an empty-region error when they leave nothing.
pub fn fill_outline(outline: &Outline, layup: &Layup) -> Result<Vec<FilledRegion>, LayupError> {
    let regions = layup.regions(outline.outer_radius_m())?;
    check_names(&regions)?;
    let tolerance_m2 = COVER_TOLERANCE * outline.area_m2();
    let cells: Vec<Vec<Vec<HalfPlane>>> = regions.iter().map(Region::convex_cells).collect::<Result<_, _>>()?;
    let mut filled: Vec<FilledRegion> = regions
        .iter()
        .zip(&cells)
        .map(|(region, cells)| fill_region(outline, region, cells))
        .collect();
    fill_rest(outline, &regions, &mut filled)?;
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

/// Fills the rest region, if any, with the outline less every other region.
fn fill_rest(outline: &Outline, regions: &[Region], filled: &mut [FilledRegion]) -> Result<(), LayupError> {
    let rests: Vec<usize> = (0..regions.len()).filter(|&i| regions[i].is_rest()).collect();
    let Some(&rest) = rests.first() else { return Ok(()) };
    if let Some(&second) = rests.get(1) {
        return Err(LayupError::SeveralRests { first: regions[rest].name.clone(), second: regions[second].name.clone() });
    }
    let mut pieces = vec![outline.points().to_vec()];
    for other in filled.iter().filter(|f| f.name != regions[rest].name) {
        pieces.extend(other.pieces.iter().map(|p| p.iter().rev().copied().collect::<Vec<_>>()));
    }
    filled[rest].pieces = pieces;
    Ok(())
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
