//! STL encoders (binary and ASCII). Pure: they return bytes or text; writing files is the
//! caller's business.
use super::triangle_mesh::cross;
use super::TriangleMesh;
use serde::{Deserialize, Serialize};
use std::fmt::Write as _;

/// The length unit written into an STL file (STL itself carries no unit).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Default, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
pub enum StlUnit {
    /// Millimetres, what most CAD and slicing tools assume (default).
    #[default]
    Millimetre,
    /// Metres.
    Metre,
}

impl StlUnit {
    /// Multiplier from m to this unit.
    pub fn per_metre(self) -> f64 {
        match self {
            StlUnit::Millimetre => 1000.0,
            StlUnit::Metre => 1.0,
        }
    }
}

fn facet(mesh: &TriangleMesh, index: usize, scale: f64) -> ([f32; 3], [[f32; 3]; 3]) {
    let corners = mesh.corners(index).map(|v| v.map(|x| x * scale));
    let [a, b, c] = corners;
    let n = cross([b[0] - a[0], b[1] - a[1], b[2] - a[2]], [c[0] - a[0], c[1] - a[1], c[2] - a[2]]);
    let len = (n[0] * n[0] + n[1] * n[1] + n[2] * n[2]).sqrt();
    let normal = if len > 0.0 { n.map(|x| (x / len) as f32) } else { [0.0; 3] };
    (normal, corners.map(|v| v.map(|x| x as f32)))
}

/// Binary STL: an 80-byte header (`header`, truncated or padded with spaces), the triangle count
/// and one 50-byte record per triangle (normal, three vertices as little-endian f32, a zero
/// attribute word).
pub fn encode_stl_binary(mesh: &TriangleMesh, header: &str, unit: StlUnit) -> Vec<u8> {
    let mut bytes = Vec::with_capacity(84 + 50 * mesh.triangles.len());
    let mut head = [b' '; 80];
    for (slot, byte) in head.iter_mut().zip(header.bytes()) {
        *slot = byte;
    }
    bytes.extend_from_slice(&head);
    bytes.extend_from_slice(&(mesh.triangles.len() as u32).to_le_bytes());
    for index in 0..mesh.triangles.len() {
        let (normal, corners) = facet(mesh, index, unit.per_metre());
        for value in normal.iter().chain(corners.iter().flatten()) {
            bytes.extend_from_slice(&value.to_le_bytes());
        }
        bytes.extend_from_slice(&0u16.to_le_bytes());
    }
    bytes
}

/// ASCII STL with the solid named `name` (spaces replaced by underscores).
pub fn encode_stl_ascii(mesh: &TriangleMesh, name: &str, unit: StlUnit) -> String {
    let name = name.replace(char::is_whitespace, "_");
    let mut text = format!("solid {name}\n");
    for index in 0..mesh.triangles.len() {
        let (n, corners) = facet(mesh, index, unit.per_metre());
        // Writing into a String cannot fail.
        let _ = writeln!(text, "  facet normal {:e} {:e} {:e}\n    outer loop", n[0], n[1], n[2]);
        for v in corners {
            let _ = writeln!(text, "      vertex {:e} {:e} {:e}", v[0], v[1], v[2]);
        }
        text.push_str("    endloop\n  endfacet\n");
    }
    let _ = writeln!(text, "endsolid {name}");
    text
}
