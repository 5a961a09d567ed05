//! Revolved meshes and their STL encodings.
use super::support::*;
use spinfoil_engine::*;
use std::collections::HashMap;

/// Every directed edge appears once and its reverse once: closed and consistently oriented.
fn assert_closed_and_oriented(mesh: &TriangleMesh) {
    let mut directed: HashMap<(u32, u32), usize> = HashMap::new();
    for t in &mesh.triangles {
        for k in 0..3 {
            *directed.entry((t[k], t[(k + 1) % 3])).or_default() += 1;
        }
    }
    for (&(a, b), &count) in &directed {
        assert_eq!(count, 1, "edge {a}->{b} used {count} times");
        assert_eq!(directed.get(&(b, a)), Some(&1), "edge {a}->{b} has no partner");
    }
}

#[test]
fn driver_mesh_is_closed_and_its_volume_converges() {
    // Revolving in n steps inscribes each circle in a regular n-gon: the volume is
    // V·sin(2π/n)/(2π/n) for a section that is revolved as a whole. source: common practice,
    // no published source (area of a regular polygon).
    let outline = family_outline(DiscFamily::Driver);
    let exact = mass_breakdown(&outline, &Layup::single(material("m", 1000.0))).expect("fits").volume_m3;
    for n in [90, 720] {
        let mesh = TriangleMesh::of_outline(&outline, n).expect("mesh");
        assert_closed_and_oriented(&mesh);
        let step = std::f64::consts::TAU / n as f64;
        assert_rel(mesh.signed_volume_m3(), exact * step.sin() / step, 1e-9, "mesh volume");
    }
}

#[test]
fn region_meshes_add_up_to_the_whole() {
    let outline = family_outline(DiscFamily::Midrange);
    let regions = fill_outline(&outline, &Layup::overmold(material("a", 900.0), material("b", 1300.0), 0.095)).expect("fits");
    let total: f64 = regions.iter().map(|r| TriangleMesh::of_region(r, 180).expect("mesh").signed_volume_m3()).sum();
    let whole = TriangleMesh::of_outline(&outline, 180).expect("mesh").signed_volume_m3();
    assert_rel(total, whole, 1e-12, "region volumes");
    for region in &regions {
        assert_closed_and_oriented(&TriangleMesh::of_region(region, 180).expect("mesh"));
    }
}

#[test]
fn binary_stl_has_header_count_and_records() {
    let mesh = TriangleMesh::of_outline(&rectangle(0.0, 0.1, 0.0, 0.01), 8).expect("mesh");
    let bytes = encode_stl_binary(&mesh, "Fernbrook test puck", StlUnit::Millimetre);
    let n = mesh.triangles.len();
    assert_eq!(bytes.len(), 84 + 50 * n);
    assert_eq!(u32::from_le_bytes([bytes[80], bytes[81], bytes[82], bytes[83]]) as usize, n);
    assert!(bytes.starts_with(b"Fernbrook test puck"));
    // The first record's first vertex, in mm.
    let f = |at: usize| f32::from_le_bytes([bytes[at], bytes[at + 1], bytes[at + 2], bytes[at + 3]]);
    let v = mesh.corners(0)[0];
    for (k, coordinate) in v.iter().enumerate() {
        assert!((f64::from(f(84 + 12 + 4 * k)) - coordinate * 1000.0).abs() < 1e-4);
    }
}

#[test]
fn ascii_stl_lists_every_facet() {
    let mesh = TriangleMesh::of_outline(&rectangle(0.0, 0.1, 0.0, 0.01), 6).expect("mesh");
    let text = encode_stl_ascii(&mesh, "test puck", StlUnit::Metre);
    assert!(text.starts_with("solid test_puck\n") && text.trim_end().ends_with("endsolid test_puck"));
    assert_eq!(text.matches("facet normal").count(), mesh.triangles.len());
    assert_eq!(text.matches("vertex").count(), 3 * mesh.triangles.len());
}

#[test]
fn rest_region_around_an_insert_meshes_as_a_solid_with_a_cavity() {
    let insert = vec![RzPoint::new(0.09, 0.003), RzPoint::new(0.095, 0.003), RzPoint::new(0.095, 0.007), RzPoint::new(0.09, 0.007)];
    let layup = Layup::embedded_insert(material("base", 950.0), material("insert", 2700.0), insert);
    let outline = rectangle(0.0, 0.1, 0.0, 0.01);
    let regions = fill_outline(&outline, &layup).expect("fits");
    let meshes: Vec<TriangleMesh> = regions.iter().map(|r| TriangleMesh::of_region(r, 64).expect("mesh")).collect();
    for mesh in &meshes {
        assert_closed_and_oriented(mesh);
    }
    let whole = TriangleMesh::of_outline(&outline, 64).expect("mesh").signed_volume_m3();
    assert_rel(meshes[0].signed_volume_m3() + meshes[1].signed_volume_m3(), whole, 1e-12, "insert + rest");
}

#[test]
fn insert_ring_meshes_by_material_merge_the_two_base_regions() {
    let outline = family_outline(DiscFamily::Driver);
    let layup = Layup::insert_ring(material("base blend", 950.0), material("insert", 2700.0), 0.09, 0.095);
    let regions = fill_outline(&outline, &layup).expect("fits");
    let meshes = TriangleMesh::by_material(&regions, 90).expect("meshes");
    let names: Vec<&str> = meshes.iter().map(|(name, _)| name.as_str()).collect();
    assert_eq!(names, ["base blend", "insert"]);
    let total: f64 = meshes.iter().map(|(_, m)| m.signed_volume_m3()).sum();
    let whole = TriangleMesh::of_outline(&outline, 90).expect("mesh").signed_volume_m3();
    assert_rel(total, whole, 1e-12, "material volumes");
}
