//! Flight signatures.
use super::*;

#[test]
fn signature_compares_two_designs_on_our_scales() {
    let base = flight_signature(&demo_case(), StudyControl::none()).unwrap();
    assert_eq!(base.throws.len(), 4);
    assert_eq!(base.scales.iter().map(|s| s.name.as_str()).collect::<Vec<_>>(), SIGNATURE_SCALES.map(|s| s.0));
    // Faster throws carry further until the high-speed turn takes over, and bank further toward
    // the turn side (source: common practice, no published source).
    assert!(base.throws[1].carry_m > base.throws[0].carry_m && base.throws[2].carry_m > base.throws[1].carry_m, "{:?}", base.throws);
    assert!(base.throws[3].turn_bank_deg > base.throws[0].turn_bank_deg + 1.0, "{:?}", base.throws);
    // Spin from the battery's energy share: ½ I_z ω² = 0.2 · ½ m V² (definition).
    let b = demo_body();
    let t = &base.throws[1];
    let omega = t.spin_rps * std::f64::consts::TAU;
    let share = b.spin_inertia_kg_m2 * omega * omega / (b.mass_kg * t.speed_mps * t.speed_mps);
    assert!((share - SIGNATURE_SPIN_ENERGY_SHARE).abs() < 1e-12, "{share}");
    // A disc with a stronger nose-up pitching moment turns less at high speed and fades more at
    // low speed (source: common practice, no published source: the roll from C_M is what makes
    // a disc turn and fade).
    let mut stable = demo_case();
    stable.set("model.pitch_at_zero", demo_driver().pitch_at_zero + 0.02).unwrap();
    let stable = flight_signature(&stable, StudyControl::none()).unwrap();
    let turn = |s: &FlightSignature| s.scales[0].value;
    let fade = |s: &FlightSignature| s.scales[1].value;
    assert!(turn(&stable) < turn(&base) && fade(&stable) > fade(&base), "{:?} vs {:?}", stable.scales, base.scales);
    // L/D at 5° from the set's own formulas (definition).
    let d = demo_driver();
    let a = 5f64.to_radians();
    assert!((base.scales[4].value - d.lift(a) / d.drag(a)).abs() < 1e-12);
}

/// A design of the demo driver's outline at 172 g: one material, or an overmold whose rim
/// material is `rim_to_plate` times as dense as its plate (invented for demos).
fn design(name: &str, rim_to_plate: f64) -> StudyCase {
    let plate = Material::from_g_cm3("invented plate blend", 1.0).unwrap();
    let rim = Material::from_g_cm3("invented rim blend", rim_to_plate).unwrap();
    let layup = if rim_to_plate == 1.0 { Layup::single(plate) } else { Layup::overmold(plate, rim, 0.0975) };
    let design = DiscDesign::new(name, ParametricOutline::new(DiscFamily::Driver), layup).with_target(MassTarget::ScaleDensities { mass_kg: 0.172 });
    StudyCase::new(CaseDisc::Design { design }, CaseModel::linear(demo_driver()), release(22.0))
}

#[test]
fn rim_heavy_overmold_turns_less_than_one_piece_from_the_same_effort() {
    let one_piece = design("one-piece", 1.0);
    let rim_heavy = design("rim-heavy", 1.6);
    let (a, b) = (one_piece.disc.body().unwrap(), rim_heavy.disc.body().unwrap());
    assert!((a.mass_kg - b.mass_kg).abs() < 1e-9 && a.diameter_m == b.diameter_m);
    assert!(b.spin_inertia_kg_m2 > 1.01 * a.spin_inertia_kg_m2, "{a:?} vs {b:?}");
    let sa = flight_signature(&one_piece, StudyControl::none()).unwrap();
    let sb = flight_signature(&rim_heavy, StudyControl::none()).unwrap();
    let (fast_a, fast_b) = (&sa.throws[3], &sb.throws[3]);
    // Same effort (same spin energy at the same speed): the rim-heavy disc spins slower but
    // carries more angular momentum, |H| = √(2 E I_z) (source: rigid-body kinetic energy
    // E = ½ I_z ω² and H = I_z ω, common practice, no published source).
    assert!(fast_b.spin_rps < fast_a.spin_rps, "{fast_a:?} vs {fast_b:?}");
    let h_ratio = fast_b.angular_momentum_kg_m2_s / fast_a.angular_momentum_kg_m2_s;
    assert!((h_ratio - (b.spin_inertia_kg_m2 / a.spin_inertia_kg_m2).sqrt()).abs() < 1e-3, "{h_ratio}");
    // The pitching moment rolls the disc at the precession rate M/(I_z ω) = M/|H| (Euler's
    // equations for a symmetric top; gyroscopic precession, common practice): with more |H|
    // the rim-heavy disc banks less toward the turn side at high speed.
    eprintln!("turn bank one-piece {:.3}°, rim-heavy {:.3}°; |H| ratio {h_ratio:.4}", sa.scales[0].value, sb.scales[0].value);
    eprintln!("fade hook one-piece {:.3}°, rim-heavy {:.3}°", sa.scales[1].value, sb.scales[1].value);
    assert!(sa.scales[0].value > 0.5, "the one-piece driver should turn at 28 m/s: {:?}", sa.scales);
    assert!(sb.scales[0].value < sa.scales[0].value, "{:?} vs {:?}", sb.scales, sa.scales);
    // The turn scale is an angle: it does not reward carry. The lateral metre measure does.
    assert!(fast_b.turn_bank_deg < fast_a.turn_bank_deg);
}
