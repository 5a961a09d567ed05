//! Mass properties against handbook formulas.
//! source: Meriam & Kraige, Engineering Mechanics: Dynamics, Appendix D (table of mass moments
//! of inertia); Beer & Johnston, Vector Mechanics for Engineers: Dynamics (same table).
use super::support::*;
use spinfoil_engine::*;
use std::f64::consts::PI;

const RHO: f64 = 1150.0;

#[test]
fn solid_cylinder_matches_handbook() {
    // source: Meriam & Kraige, Dynamics, Appendix D: I_z = mR²/2, I_x = m(3R² + h²)/12.
    let (r, h) = (0.1055, 0.014);
    let p = single(&rectangle(0.0, r, 0.0, h), RHO);
    let m = RHO * PI * r * r * h;
    assert_rel(p.mass_kg, m, 1e-12, "mass");
    assert_rel(p.cg_height_m, h / 2.0, 1e-12, "cg");
    assert_rel(p.spin_inertia_kg_m2, m * r * r / 2.0, 1e-9, "I_z");
    assert_rel(p.transverse_inertia_kg_m2, m * (3.0 * r * r + h * h) / 12.0, 1e-9, "I_x");
    assert_rel(p.spin_radius_of_gyration_m(), r / 2f64.sqrt(), 1e-9, "k_z");
}

#[test]
fn hollow_cylinder_matches_handbook() {
    // source: Meriam & Kraige, Dynamics, Appendix D: I_z = m(R1² + R2²)/2,
    // I_x = m[3(R1² + R2²) + h²]/12.
    let (r1, r2, h) = (0.08, 0.1055, 0.012);
    let p = single(&rectangle(r1, r2, -0.003, h - 0.003), RHO);
    let m = RHO * PI * (r2 * r2 - r1 * r1) * h;
    let s = r1 * r1 + r2 * r2;
    assert_rel(p.mass_kg, m, 1e-12, "mass");
    assert_rel(p.spin_inertia_kg_m2, m * s / 2.0, 1e-9, "I_z");
    assert_rel(p.transverse_inertia_kg_m2, m * (3.0 * s + h * h) / 12.0, 1e-9, "I_x");
}

#[test]
fn flat_annulus_is_the_thin_limit_of_a_hollow_cylinder() {
    // source: Beer & Johnston, Dynamics, table of mass moments of inertia: thin annular plate
    // I_z = m(R1² + R2²)/2, I_x = m(R1² + R2²)/4. With h/R = 1e-6 the h²/12 term is < 1e-11.
    let (r1, r2) = (0.05, 0.1);
    let h = 1e-7;
    let p = single(&rectangle(r1, r2, 0.0, h), RHO);
    let s = r1 * r1 + r2 * r2;
    assert_rel(p.spin_inertia_kg_m2, p.mass_kg * s / 2.0, 1e-9, "I_z");
    assert_rel(p.transverse_inertia_kg_m2, p.mass_kg * s / 4.0, 1e-9, "I_x");
}

#[test]
fn thin_ring_is_the_limit_of_a_narrow_annulus() {
    // source: Meriam & Kraige, Dynamics, Appendix D: thin ring I_z = mR², I_x = mR²/2.
    // A ring of radial width t and height h differs by exactly t²/(4R²) (I_z) and
    // t²/(4R²) + h²/(6R²) (I_x): the expected second-order terms of the hollow cylinder.
    let r = 0.1;
    for ratio in [1e-2, 1e-3] {
        let (t, h) = (ratio * r, ratio * r);
        let p = single(&rectangle(r - t / 2.0, r + t / 2.0, 0.0, h), RHO);
        let mr2 = p.mass_kg * r * r;
        let iz_excess = p.spin_inertia_kg_m2 / mr2 - 1.0;
        let ix_excess = p.transverse_inertia_kg_m2 / (mr2 / 2.0) - 1.0;
        assert_rel(iz_excess, ratio * ratio / 4.0, 1e-6, "I_z excess over mR²");
        assert_rel(ix_excess, ratio * ratio / 4.0 + ratio * ratio / 6.0, 1e-6, "I_x excess over mR²/2");
        assert!(iz_excess.abs() < ratio, "thin ring within O(t/R)");
    }
}

#[test]
fn shifting_the_outline_up_moves_the_centre_but_not_the_central_inertia() {
    // Parallel-axis theorem: I_x about the centre of mass does not depend on where the body is.
    // source: Meriam & Kraige, Dynamics, Appendix D (parallel-axis theorem).
    let (r, h, z0) = (0.1, 0.02, 0.35);
    let base = single(&rectangle(0.0, r, 0.0, h), RHO);
    let moved = single(&rectangle(0.0, r, z0, z0 + h), RHO);
    assert_rel(moved.cg_height_m, base.cg_height_m + z0, 1e-12, "cg moves with the body");
    assert_rel(moved.transverse_inertia_kg_m2, base.transverse_inertia_kg_m2, 1e-9, "I_x about cg");
    assert_rel(moved.spin_inertia_kg_m2, base.spin_inertia_kg_m2, 1e-12, "I_z");
}

#[test]
fn stacked_cylinders_of_two_densities_follow_the_parallel_axis_theorem() {
    // Two solid cylinders (regions split at z = h1) of densities ρ1, ρ2: I_x about the combined
    // centre of mass = Σ [m_i(3R² + h_i²)/12 + m_i (z_i − z_cg)²].
    // source: Meriam & Kraige, Dynamics, Appendix D (cylinder and parallel-axis theorem).
    let (r, h1, h2, rho1, rho2) = (0.1, 0.004, 0.01, 2700.0, 950.0);
    let outline = rectangle(0.0, r, 0.0, h1 + h2);
    let lower = Region::bounded("lower", material("dense", rho1), RegionBounds { z_max_m: Some(h1), ..Default::default() });
    let upper = Region::bounded("upper", material("light", rho2), RegionBounds { z_min_m: Some(h1), ..Default::default() });
    let b = mass_breakdown(&outline, &Layup::Regions { regions: vec![lower, upper] }).expect("regions cover");
    let (m1, m2) = (rho1 * PI * r * r * h1, rho2 * PI * r * r * h2);
    let (z1, z2) = (h1 / 2.0, h1 + h2 / 2.0);
    let zc = (m1 * z1 + m2 * z2) / (m1 + m2);
    let ix = m1 * (3.0 * r * r + h1 * h1) / 12.0 + m1 * (z1 - zc).powi(2)
        + m2 * (3.0 * r * r + h2 * h2) / 12.0 + m2 * (z2 - zc).powi(2);
    assert_rel(b.properties.mass_kg, m1 + m2, 1e-12, "mass");
    assert_rel(b.properties.cg_height_m, zc, 1e-12, "cg");
    assert_rel(b.properties.transverse_inertia_kg_m2, ix, 1e-9, "I_x");
    assert_rel(b.regions[0].mass_fraction, m1 / (m1 + m2), 1e-12, "mass share");
}

#[test]
fn polygon_section_matches_pappus_for_a_triangle() {
    // Pappus's centroid theorem: V = 2π r̄ A for a triangle with vertices (a,0), (b,0), (a,c):
    // r̄ = (2a + b)/3, A = (b − a)c/2. source: common practice, no published source (Pappus).
    let (a, b, c) = (0.02, 0.1, 0.01);
    let pts = vec![RzPoint::new(a, 0.0), RzPoint::new(b, 0.0), RzPoint::new(a, c)];
    let outline = Outline::from_points(pts).expect("triangle");
    let v = mass_breakdown(&outline, &Layup::single(material("m", 1000.0))).expect("fits").volume_m3;
    assert_rel(v, 2.0 * PI * (2.0 * a + b) / 3.0 * (b - a) * c / 2.0, 1e-12, "volume");
}

#[test]
fn embedded_insert_ring_adds_a_hollow_cylinder_of_the_density_difference() {
    // A solid cylinder of base density with a rectangular-section insert ring (R1..R2,
    // z1..z2) of denser material: the same as the cylinder plus a hollow cylinder of density
    // ρ_insert − ρ_base. source: Meriam & Kraige, Dynamics, Appendix D (solid and hollow
    // cylinder, parallel-axis theorem).
    let (r, h) = (0.1, 0.01);
    let (r1, r2, z1, z2) = (0.09, 0.095, 0.003, 0.007);
    let (rho_base, rho_insert) = (950.0, 2700.0);
    let insert = vec![RzPoint::new(r1, z1), RzPoint::new(r2, z1), RzPoint::new(r2, z2), RzPoint::new(r1, z2)];
    let layup = Layup::embedded_insert(material("base", rho_base), material("insert", rho_insert), insert);
    let b = mass_breakdown(&rectangle(0.0, r, 0.0, h), &layup).expect("insert inside the outline");
    let hi = z2 - z1;
    let parts = [
        (rho_base * PI * r * r * h, r * r, h, h / 2.0, r * r / 2.0),
        ((rho_insert - rho_base) * PI * (r2 * r2 - r1 * r1) * hi, r1 * r1 + r2 * r2, hi, (z1 + z2) / 2.0, (r1 * r1 + r2 * r2) / 2.0),
    ];
    let mass: f64 = parts.iter().map(|p| p.0).sum();
    let zc = parts.iter().map(|p| p.0 * p.3).sum::<f64>() / mass;
    let iz: f64 = parts.iter().map(|p| p.0 * p.4).sum();
    let ix: f64 = parts.iter().map(|p| p.0 * (3.0 * p.1 + p.2 * p.2) / 12.0 + p.0 * (p.3 - zc).powi(2)).sum();
    assert_rel(b.properties.mass_kg, mass, 1e-12, "mass");
    assert_rel(b.properties.cg_height_m, zc, 1e-12, "cg");
    assert_rel(b.properties.spin_inertia_kg_m2, iz, 1e-9, "I_z");
    assert_rel(b.properties.transverse_inertia_kg_m2, ix, 1e-9, "I_x");
    let insert_mass = rho_insert * PI * (r2 * r2 - r1 * r1) * hi;
    assert_rel(b.regions[0].mass_kg, insert_mass, 1e-12, "insert region mass");
    assert_rel(b.regions[1].mass_kg, mass - insert_mass, 1e-12, "base (rest) region mass");
}
