//! Integration tests: studies (sweeps, dispersion, calibration, optimisation, signatures,
//! shards). Every numerical check names its source.
mod calibration;
mod case;
mod determinism;
mod dispersion;
mod optimise;
mod signature;

use spinfoil_engine::*;

/// The invented demo driver body (0.211 m, 0.172 kg; invented for demos).
pub fn demo_body() -> DiscBody {
    DiscBody { mass_kg: 0.172, spin_inertia_kg_m2: 0.00142, transverse_inertia_kg_m2: 0.00075, diameter_m: 0.211 }
}

/// The disc of Hummel's set (175 g, 0.269 m; value from memory, unverified; CHECKS.md).
pub fn hummel_body() -> DiscBody {
    DiscBody { mass_kg: 0.175, spin_inertia_kg_m2: 0.00235, transverse_inertia_kg_m2: 0.00122, diameter_m: 0.269 }
}

/// A right-hand backhand at `speed` m/s, 95 rad/s, launch 10°, nose 1°, flat, from 1 m.
pub fn release(speed_mps: f64) -> ReleaseState {
    ReleasePose { launch_rad: 10f64.to_radians(), nose_rad: 1f64.to_radians(), ..ReleasePose::default() }.with_speed_and_spin(speed_mps, 95.0)
}

/// The demo driver thrown at 22 m/s in calm sea-level air.
pub fn demo_case() -> StudyCase {
    StudyCase::new(CaseDisc::Body { body: demo_body() }, CaseModel::linear(demo_driver()), release(22.0))
}

/// An invented overmold driver design (invented for demos).
pub fn design_case() -> StudyCase {
    let layup = Layup::overmold(
        Material::from_g_cm3("invented base blend", 0.95).unwrap(),
        Material::from_g_cm3("invented dense rim blend", 1.25).unwrap(),
        0.0975,
    );
    let design = DiscDesign::new("invented driver", ParametricOutline::new(DiscFamily::Driver), layup);
    StudyCase::new(CaseDisc::Design { design }, CaseModel::linear(demo_driver()), release(22.0))
}
