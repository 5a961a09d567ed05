//! The revolved outline as a closed triangle mesh with outward normals ([`TriangleMesh`]), per
//! region too, and STL encoders to bytes or text ([`encode_stl_binary`], [`encode_stl_ascii`]).
mod error;
mod stl;
mod triangle_mesh;

pub use error::MeshError;
pub use stl::{encode_stl_ascii, encode_stl_binary, StlUnit};
pub use triangle_mesh::{TriangleMesh, MAX_SEGMENTS, MIN_SEGMENTS};
