//! Fuzzes the aerodynamic coefficient table parser (`TabulatedCoefficients::from_csv`): any text
//! either is refused with a typed error or gives a table whose coefficients are finite at every
//! finite angle of attack and advance ratio (the engine's rule: no NaN results).
#![no_main]
use libfuzzer_sys::fuzz_target;
use spinfoil_engine::{AeroInput, AeroModel, ModelInfo, TabulatedCoefficients};

fuzz_target!(|data: &[u8]| {
    let Ok(text) = std::str::from_utf8(data) else { return };
    let info = ModelInfo { name: "fuzz".into(), source: "fuzz input".into(), confidence: "none".into() };
    let Ok(table) = TabulatedCoefficients::from_csv(text, info) else { return };
    for alpha_deg in [-90.0_f64, -12.5, -1.0, 0.0, 0.3, 7.0, 45.0, 90.0] {
        for advance_ratio in [0.0, 0.4, 1.7, 50.0] {
            let input = AeroInput {
                angle_of_attack_rad: alpha_deg.to_radians(),
                airspeed_mps: 20.0,
                spin_rad_s: -60.0,
                pitch_rate_rad_s: 0.1,
                roll_rate_rad_s: -0.2,
                advance_ratio,
                reynolds_number: 3.0e5,
            };
            let c = table.coefficients(&input);
            let all = [c.lift, c.drag, c.pitch, c.roll, c.spin];
            assert!(all.iter().all(|v| v.is_finite()), "non-finite coefficients {c:?} at {input:?}");
        }
    }
});
