use serde::{Deserialize, Serialize};

/// Presets of the surface under the flight, each with an approximate aerodynamic roughness
/// length z0.
///
/// Values follow the Davenport roughness classification as revised by Wieringa (Wieringa, J.,
/// Davenport, A. G., Grimmond, C. S. B., Oke, T. R. (2001), New revision of Davenport roughness
/// classification, 3rd European & African Conference on Wind Engineering; reprinted in the WMO
/// Guide to Meteorological Instruments and Methods of Observation, WMO-No. 8, and in Stull,
/// Meteorology for Scientists and Engineers, table of Davenport–Wieringa roughness lengths).
/// Class names and values checked against that table and the WMO code list "Surface roughness
/// (Davenport roughness classification)"; all are approximate by nature.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
pub enum Terrain {
    /// Open, flat, short grass with few obstacles (class "open"): z0 ≈ 0.03 m.
    OpenShortGrass,
    /// A field with tall grass or low crops and scattered obstacles (class "roughly open"):
    /// z0 ≈ 0.10 m.
    RoughField,
    /// A fairway along a tree line, parkland with bushes and numerous obstacles (class
    /// "very rough"): z0 ≈ 0.5 m.
    WoodedEdge,
}

impl Terrain {
    /// Approximate roughness length z0 in m.
    pub fn roughness_length_m(self) -> f64 {
        match self {
            Terrain::OpenShortGrass => 0.03,
            Terrain::RoughField => 0.10,
            Terrain::WoodedEdge => 0.5,
        }
    }

    /// Where the value comes from and how far to trust it.
    pub fn source(self) -> &'static str {
        "approximate: Davenport roughness classification revised by Wieringa et al. (2001), \
         as reprinted in WMO-No. 8 and Stull, Meteorology for Scientists and Engineers"
    }

    /// Every preset, for listings.
    pub fn all() -> [Terrain; 3] {
        [Terrain::OpenShortGrass, Terrain::RoughField, Terrain::WoodedEdge]
    }
}
