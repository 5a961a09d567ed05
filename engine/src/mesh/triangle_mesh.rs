use super::MeshError;
use crate::geometry::{Outline, RzPoint};
use crate::layup::FilledRegion;
use std::f64::consts::TAU;

/// A triangle mesh in 3-D (m), triangles counter-clockwise seen from outside (outward normals).
/// The disc's symmetry axis is z.
#[derive(Debug, Clone, PartialEq, Default)]
pub struct TriangleMesh {
    /// Vertex positions [x, y, z], m.
    pub vertices: Vec<[f64; 3]>,
    /// Triangles as indices into `vertices`.
    pub triangles: Vec<[u32; 3]>,
}

/// Fewest segments around the axis.
pub const MIN_SEGMENTS: usize = 3;
/// Most segments around the axis.
pub const MAX_SEGMENTS: usize = 100_000;
/// Most triangles in one mesh.
const MAX_TRIANGLES: u64 = u32::MAX as u64;

impl TriangleMesh {
    /// The closed polygon `section` ((r, z) in m, counter-clockwise) revolved about the z axis
    /// in `segments` equal steps. Points on the axis become one vertex; edges along the axis
    /// add no faces, so a section touching the axis gives a closed, watertight mesh.
    pub fn revolve(section: &[RzPoint], segments: usize) -> Result<Self, MeshError> {
        check_segments(section.len(), segments)?;
        let mut mesh = TriangleMesh::default();
        let rings: Vec<u32> = section.iter().map(|&p| mesh.add_ring(p, segments)).collect();
        let n = section.len();
        for i in 0..n {
            let j = (i + 1) % n;
            mesh.add_band(rings[i], section[i].r_m == 0.0, rings[j], section[j].r_m == 0.0, segments);
        }
        Ok(mesh)
    }

    /// The outline revolved (see [`TriangleMesh::revolve`]).
    pub fn of_outline(outline: &Outline, segments: usize) -> Result<Self, MeshError> {
        Self::revolve(outline.points(), segments)
    }

    /// One region of a layup revolved: all its pieces in one mesh.
    pub fn of_region(region: &FilledRegion, segments: usize) -> Result<Self, MeshError> {
        let mut mesh = TriangleMesh::default();
        for piece in &region.pieces {
            mesh.append(&Self::revolve(piece, segments)?);
        }
        Ok(mesh)
    }

    /// One mesh per material (regions of the same material name merged), in order of first
    /// appearance: what a two-material print or mould needs.
    pub fn by_material(regions: &[FilledRegion], segments: usize) -> Result<Vec<(String, TriangleMesh)>, MeshError> {
        let mut meshes: Vec<(String, TriangleMesh)> = Vec::new();
        for region in regions {
            let mesh = Self::of_region(region, segments)?;
            match meshes.iter_mut().find(|(name, _)| *name == region.material.name) {
                Some((_, existing)) => existing.append(&mesh),
                None => meshes.push((region.material.name.clone(), mesh)),
            }
        }
        Ok(meshes)
    }

    /// Adds another mesh's vertices and triangles to this one.
    pub fn append(&mut self, other: &TriangleMesh) {
        let offset = self.vertices.len() as u32;
        self.vertices.extend_from_slice(&other.vertices);
        self.triangles.extend(other.triangles.iter().map(|t| t.map(|i| i + offset)));
    }

    /// Enclosed volume from the divergence theorem (Σ v0 · (v1 × v2) / 6), m³. Positive for a
    /// closed mesh with outward normals.
    pub fn signed_volume_m3(&self) -> f64 {
        self.triangles.iter().map(|t| {
            let [a, b, c] = t.map(|i| self.vertices[i as usize]);
            dot(a, cross(b, c)) / 6.0
        }).sum()
    }

    /// The three corners of triangle `index`, m.
    pub fn corners(&self, index: usize) -> [[f64; 3]; 3] {
        self.triangles[index].map(|i| self.vertices[i as usize])
    }

    /// Adds the ring of vertices for one section point; returns the first vertex's index.
    fn add_ring(&mut self, p: RzPoint, segments: usize) -> u32 {
        let first = self.vertices.len() as u32;
        if p.r_m == 0.0 {
            self.vertices.push([0.0, 0.0, p.z_m]);
            return first;
        }
        for k in 0..segments {
            let angle = TAU * k as f64 / segments as f64;
            self.vertices.push([p.r_m * angle.cos(), p.r_m * angle.sin(), p.z_m]);
        }
        first
    }

    /// Faces swept by the section edge from ring `a` to ring `b`.
    fn add_band(&mut self, a: u32, a_on_axis: bool, b: u32, b_on_axis: bool, segments: usize) {
        let at = |ring: u32, on_axis: bool, k: usize| if on_axis { ring } else { ring + (k % segments) as u32 };
        for k in 0..segments {
            let (a0, a1) = (at(a, a_on_axis, k), at(a, a_on_axis, k + 1));
            let (b0, b1) = (at(b, b_on_axis, k), at(b, b_on_axis, k + 1));
            if !b_on_axis {
                self.triangles.push([a0, b1, b0]);
            }
            if !a_on_axis {
                self.triangles.push([a0, a1, b1]);
            }
        }
    }
}

fn check_segments(points: usize, segments: usize) -> Result<(), MeshError> {
    if !(MIN_SEGMENTS..=MAX_SEGMENTS).contains(&segments) {
        return Err(MeshError::SegmentsOutOfRange { segments, min: MIN_SEGMENTS, max: MAX_SEGMENTS });
    }
    let triangles = 2 * points as u64 * segments as u64;
    if triangles > MAX_TRIANGLES {
        return Err(MeshError::TooManyTriangles { triangles, max: MAX_TRIANGLES });
    }
    Ok(())
}

pub(crate) fn cross(a: [f64; 3], b: [f64; 3]) -> [f64; 3] {
    [a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]]
}

fn dot(a: [f64; 3], b: [f64; 3]) -> f64 {
    a[0] * b[0] + a[1] * b[1] + a[2] * b[2]
}

#[cfg(test)]
mod tests {
    use super::*;

    /// A rectangle section [0, R] × [0, h] revolves into a cylinder of volume πR²h (less the
    /// polygonal inscribed loss, (n/2π)·sin(2π/n)).
    #[test]
    fn cylinder_volume_and_orientation() {
        let (r, h, n) = (0.1, 0.02, 64);
        let section = [(0.0, 0.0), (r, 0.0), (r, h), (0.0, h)].map(|(r, z)| RzPoint::new(r, z));
        let mesh = TriangleMesh::revolve(&section, n).unwrap_or_default();
        let polygon_area = 0.5 * n as f64 * r * r * (TAU / n as f64).sin();
        let expected = polygon_area * h;
        assert!((mesh.signed_volume_m3() - expected).abs() < 1e-12 * expected);
        assert_eq!(mesh.vertices.len(), 2 + 2 * n);
    }
}
