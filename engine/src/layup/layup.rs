use super::{LayupError, Material, Region, RegionBounds};
use crate::geometry::RzPoint;
use serde::{Deserialize, Serialize};

/// How materials fill a disc's outline. Serialised with a `kind` tag.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Layup {
    /// One material throughout.
    Single {
        /// The material.
        material: Material,
    },
    /// Two materials ("overmold"): the rim material outboard of the split radius, the plate
    /// material inboard.
    Overmold {
        /// Material at radii below the split radius.
        plate: Material,
        /// Material at radii at or beyond the split radius.
        rim: Material,
        /// Radius where the materials meet, m (inside the outline's outer radius).
        split_radius_m: f64,
    },
    /// Any list of regions; together they must cover the outline exactly once.
    Regions {
        /// The regions.
        regions: Vec<Region>,
    },
}

impl Layup {
    /// One material throughout.
    pub fn single(material: Material) -> Self {
        Layup::Single { material }
    }

    /// A rim material outboard of `split_radius_m` (m) over a plate material inboard.
    pub fn overmold(plate: Material, rim: Material, split_radius_m: f64) -> Self {
        Layup::Overmold { plate, rim, split_radius_m }
    }

    /// A base material with a dense ring of `insert` between radii `inner_m` and `outer_m` (m),
    /// at all heights: three regions, "inner base", "insert ring", "outer base".
    pub fn insert_ring(base: Material, insert: Material, inner_m: f64, outer_m: f64) -> Self {
        Layup::Regions {
            regions: vec![
                Region::bounded("inner base", base.clone(), RegionBounds::radial(None, Some(inner_m))),
                Region::bounded("insert ring", insert, RegionBounds::radial(Some(inner_m), Some(outer_m))),
                Region::bounded("outer base", base, RegionBounds::radial(Some(outer_m), None)),
            ],
        }
    }

    /// A base material with an embedded `insert` inside the simple polygon `insert_points`
    /// (m): two regions, "insert" and "base" (the rest of the outline).
    pub fn embedded_insert(base: Material, insert: Material, insert_points: Vec<RzPoint>) -> Self {
        Layup::Regions {
            regions: vec![Region::polygon("insert", insert, insert_points), Region::rest("base", base)],
        }
    }

    /// The layup as a list of regions ("whole" for one material; "plate" and "rim" for an
    /// overmold). Checks the overmold's split radius against `outer_radius_m` (m).
    pub fn regions(&self, outer_radius_m: f64) -> Result<Vec<Region>, LayupError> {
        match self {
            Layup::Single { material } => Ok(vec![Region::bounded("whole", material.clone(), RegionBounds::everything())]),
            Layup::Overmold { plate, rim, split_radius_m } => {
                let split = *split_radius_m;
                if !(split > 0.0 && split < outer_radius_m) {
                    return Err(LayupError::SplitRadiusOutOfRange { split_radius_m: split, max_m: outer_radius_m });
                }
                Ok(vec![
                    Region::bounded("plate", plate.clone(), RegionBounds::radial(None, Some(split))),
                    Region::bounded("rim", rim.clone(), RegionBounds::radial(Some(split), None)),
                ])
            }
            Layup::Regions { regions } => Ok(regions.clone()),
        }
    }

    /// The materials, in order of appearance.
    pub fn materials(&self) -> Vec<&Material> {
        match self {
            Layup::Single { material } => vec![material],
            Layup::Overmold { plate, rim, .. } => vec![plate, rim],
            Layup::Regions { regions } => regions.iter().map(|r| &r.material).collect(),
        }
    }

    /// The same layup with every density multiplied by `factor` (keeps the distribution).
    pub fn scaled_densities(&self, factor: f64) -> Layup {
        match self {
            Layup::Single { material } => Layup::Single { material: material.scaled(factor) },
            Layup::Overmold { plate, rim, split_radius_m } => Layup::Overmold {
                plate: plate.scaled(factor),
                rim: rim.scaled(factor),
                split_radius_m: *split_radius_m,
            },
            Layup::Regions { regions } => Layup::Regions {
                regions: regions
                    .iter()
                    .map(|r| Region { material: r.material.scaled(factor), ..r.clone() })
                    .collect(),
            },
        }
    }
}
