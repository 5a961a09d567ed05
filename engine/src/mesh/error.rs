use thiserror::Error;

/// Why a mesh could not be made.
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum MeshError {
    /// The number of segments around the axis is outside its range.
    #[error("{segments} segments around the axis is outside the allowed range [{min}, {max}]")]
    SegmentsOutOfRange {
        /// Requested segments.
        segments: usize,
        /// Fewest allowed.
        min: usize,
        /// Most allowed.
        max: usize,
    },
    /// The mesh would have more triangles than an STL file can count.
    #[error("the mesh would have {triangles} triangles; at most {max} fit in one mesh")]
    TooManyTriangles {
        /// Triangles the mesh would have.
        triangles: u64,
        /// Most allowed.
        max: u64,
    },
}
