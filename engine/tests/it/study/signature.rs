//! Flight signatures.
use super::*;

#[test]
fn signature_compares_two_designs_on_our_scales() {
    let base = flight_signature(&demo_case(), StudyControl::none()).unwrap();
    assert_eq!(base.throws.len(), 4);
    assert_eq!(base.scales.iter().map(|s| s.name.as_str()).collect::<Vec<_>>(), SIGNATURE_SCALES.map(|s| s.0));
    // Faster throws carry further until the high-speed turn takes over, and turn more (source:
    // common practice, no published source).
    assert!(base.throws[1].carry_m > base.throws[0].carry_m && base.throws[2].carry_m > base.throws[1].carry_m, "{:?}", base.throws);
    assert!(base.throws[3].turn_m > base.throws[0].turn_m + 1.0, "{:?}", base.throws);
    // Spin tied to speed by the advance ratio ωR/V = 0.5 (definition).
    let r = demo_body().radius_m();
    assert!((base.throws[1].spin_rps * std::f64::consts::TAU * r / 20.0 - SIGNATURE_ADVANCE_RATIO).abs() < 1e-12);
    // A disc with a stronger nose-up pitching moment turns less at high speed (source: common
    // practice, no published source: the roll from C_M is what makes a disc turn).
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
