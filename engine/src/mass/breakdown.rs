use super::{MassError, MassProperties, SectionMoments};
use crate::geometry::Outline;
use crate::layup::{fill_outline, FilledRegion, Layup};
use serde::{Deserialize, Serialize};
use std::f64::consts::TAU;

/// One region's part of a disc's mass properties.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct RegionShare {
    /// Region name.
    pub name: String,
    /// Material name.
    pub material: String,
    /// Density, kg/m³.
    pub density_kg_m3: f64,
    /// Volume of the region's revolved solid, m³.
    pub volume_m3: f64,
    /// Mass, kg.
    pub mass_kg: f64,
    /// Fraction of the disc's mass (0–1).
    pub mass_fraction: f64,
    /// Moment of inertia about the spin axis, kg·m².
    pub spin_inertia_kg_m2: f64,
    /// Fraction of the disc's I_z (0–1).
    pub spin_inertia_fraction: f64,
}

/// Mass properties of a disc and how its regions share them.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct MassBreakdown {
    /// The whole disc's mass properties.
    pub properties: MassProperties,
    /// Total volume, m³.
    pub volume_m3: f64,
    /// The regions, in the layup's order.
    pub regions: Vec<RegionShare>,
}

/// One region's integrals scaled into physical quantities (SI).
struct RegionSums {
    volume_m3: f64,
    mass_kg: f64,
    first_moment_kg_m: f64,
    spin_inertia_kg_m2: f64,
    /// ∫ρ(r²/2 + z²)dV about the origin, kg·m².
    transverse_at_origin_kg_m2: f64,
}

fn region_sums(region: &FilledRegion) -> RegionSums {
    let m = region.pieces.iter().fold(SectionMoments::default(), |s, p| s.plus(SectionMoments::of_polygon(p)));
    let rho = region.material.density_kg_m3;
    RegionSums {
        volume_m3: TAU * m.r_m3,
        mass_kg: rho * TAU * m.r_m3,
        first_moment_kg_m: rho * TAU * m.rz_m4,
        spin_inertia_kg_m2: rho * TAU * m.r3_m5,
        transverse_at_origin_kg_m2: rho * TAU * (m.r3_m5 / 2.0 + m.rz2_m5),
    }
}

/// Mass properties of regions already clipped to an outline (exact polygon integrals of the
/// revolved solid: V = 2π∬r dA, first moment 2π∬rz dA, I_z = 2πρ∬r³ dA, transverse
/// ∫ρ(r²/2 + z²)dV shifted to the centre of mass by the parallel-axis theorem).
pub fn breakdown_of_regions(regions: &[FilledRegion]) -> MassBreakdown {
    let sums: Vec<RegionSums> = regions.iter().map(region_sums).collect();
    let total = |f: fn(&RegionSums) -> f64| sums.iter().map(f).sum::<f64>();
    let mass_kg = total(|s| s.mass_kg);
    let cg_height_m = total(|s| s.first_moment_kg_m) / mass_kg;
    let spin = total(|s| s.spin_inertia_kg_m2);
    let transverse = total(|s| s.transverse_at_origin_kg_m2) - mass_kg * cg_height_m * cg_height_m;
    let properties = MassProperties {
        mass_kg,
        cg_height_m,
        spin_inertia_kg_m2: spin,
        transverse_inertia_kg_m2: transverse,
    };
    let shares = regions.iter().zip(&sums).map(|(r, s)| share(r, s, mass_kg, spin)).collect();
    MassBreakdown { properties, volume_m3: total(|s| s.volume_m3), regions: shares }
}

fn share(region: &FilledRegion, s: &RegionSums, mass_kg: f64, spin: f64) -> RegionShare {
    RegionShare {
        name: region.name.clone(),
        material: region.material.name.clone(),
        density_kg_m3: region.material.density_kg_m3,
        volume_m3: s.volume_m3,
        mass_kg: s.mass_kg,
        mass_fraction: s.mass_kg / mass_kg,
        spin_inertia_kg_m2: s.spin_inertia_kg_m2,
        spin_inertia_fraction: s.spin_inertia_kg_m2 / spin,
    }
}

/// Mass properties of `outline` filled by `layup` (the layup is checked to cover the outline
/// exactly once).
pub fn mass_breakdown(outline: &Outline, layup: &Layup) -> Result<MassBreakdown, MassError> {
    let regions = fill_outline(outline, layup)?;
    Ok(breakdown_of_regions(&regions))
}
