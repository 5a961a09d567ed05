//! Integration tests: wobble in scripts (a release wobbling by an angle, the flight's wobble
//! fields, the wobble chart), with values equal to the engine's.
use super::session::{error, number, value};
use spinfoil_engine::{
    fly, release_with_wobble, wobble_rate_for_angle, DiscBody, FlightConditions, FlightSettings, Hand, ReleasePose, Style,
};
use spinfoil_lang::{Session, SessionSettings};

/// Two invented prototypes of one outline and mass, and a clean release.
const SETUP: &str = r#"
let plate = material("soft base blend", 0.95);
let rim = material("dense rim blend", 1.24);
let outline = driver_outline(#{ diameter_cm: 21.1, rim_width_cm: 2.2 });
let one_piece = disc("W-1 one-piece", outline, single_layup(plate), #{ mass_g: 174 });
let rim_heavy = disc("W-1 rim-heavy", outline, rim_layup(rim, plate, #{ split_radius_cm: 8.4 }), #{ mass_g: 174 });
let t = throw_release(#{ speed_mps: 22, spin_rpm: 900, launch_deg: 10, height_m: 1.5 });
"#;

fn session() -> Session {
    let mut s = Session::new(SessionSettings::default());
    value(&mut s, SETUP);
    s
}

/// The body of a disc named in the session, from its script fields (SI).
fn body(s: &mut Session, disc: &str) -> DiscBody {
    DiscBody {
        mass_kg: number(s, &format!("{disc}.mass_g")) / 1000.0,
        spin_inertia_kg_m2: number(s, &format!("{disc}.spin_inertia_g_cm2")) * 1e-7,
        transverse_inertia_kg_m2: number(s, &format!("{disc}.transverse_inertia_g_cm2")) * 1e-7,
        diameter_m: number(s, &format!("{disc}.diameter_cm")) / 100.0,
    }
}

fn rel(a: f64, b: f64) -> f64 {
    (a - b).abs() / b.abs().max(1e-300)
}

#[test]
fn a_release_wobbling_by_an_angle_gets_the_engines_off_axis_rate() {
    // source: H = I_z ω_s n + I_x ω⊥, tan θ = I_x |ω⊥| / (I_z |ω_s|) (Goldstein, Poole & Safko
    // (2002), Classical Mechanics 3rd ed., §5.6), as the engine's wobble_rate_for_angle
    let mut s = session();
    for disc in ["one_piece", "rim_heavy"] {
        let b = body(&mut s, disc);
        let spin_rad_s = 900.0 / 60.0 * std::f64::consts::TAU;
        let engine = wobble_rate_for_angle(&b, spin_rad_s, 5f64.to_radians()).unwrap();
        let script = number(&mut s, &format!("t.release_for({disc}, #{{ wobble_deg: 5 }}).wobble_rad_s"));
        assert!(rel(script, engine) < 1e-6, "{disc}: {script} vs {engine} rad/s");
        let angle = number(&mut s, &format!("fly({disc}, t.release_for({disc}, #{{ wobble_deg: 5 }})).initial_wobble_deg"));
        assert!((angle - 5.0).abs() < 1e-6, "{disc}: {angle}°");
    }
    // the same angle is a larger off-axis rate on the disc with the larger I_z / I_x
    let ratio = |s: &mut Session, d: &str| number(s, &format!("{d}.spin_inertia_g_cm2 / {d}.transverse_inertia_g_cm2"));
    let (r1, r2) = (ratio(&mut s, "one_piece"), ratio(&mut s, "rim_heavy"));
    let (w1, w2) = (
        number(&mut s, "t.release_for(one_piece, #{ wobble_deg: 5 }).wobble_rad_s"),
        number(&mut s, "t.release_for(rim_heavy, #{ wobble_deg: 5 }).wobble_rad_s"),
    );
    assert!(rel(w2 / w1, r2 / r1) < 1e-6, "rates {w1} {w2}, ratios {r1} {r2}");
    // an effort throw wobbles too, with the spin this disc's inertia gives it
    let effort = "effort(#{ work_j: 60, torque_nm: 2.5, wrist_deg: 140, launch_deg: 10 })";
    let angle = number(&mut s, &format!("fly(rim_heavy, {effort}.release_for(rim_heavy, #{{ wobble_deg: 3 }})).initial_wobble_deg"));
    assert!((angle - 3.0).abs() < 1e-6, "{angle}°");
}

#[test]
fn wobble_fields_equal_the_engines_metrics() {
    let mut s = session();
    let b = body(&mut s, "rim_heavy");
    value(&mut s, "let f = fly(rim_heavy, t.release_for(rim_heavy, #{ wobble_deg: 5, wobble_direction_deg: 30 }));");
    // the same flight, flown by the engine directly with the demo driver set
    let pose = ReleasePose { launch_rad: 10f64.to_radians(), height_m: 1.5, ..ReleasePose::thrown(Style::Backhand, Hand::Right) };
    let clean = pose.with_speed_and_spin(22.0, 900.0 / 60.0 * std::f64::consts::TAU);
    let r = release_with_wobble(&clean, &b, 5f64.to_radians(), 30f64.to_radians()).unwrap();
    let engine = fly(&b, &spinfoil_engine::demo_driver(), &r, &FlightConditions::default(), &FlightSettings::default()).unwrap();
    let half = engine.metrics.wobble_half_time_s.expect("halves in air");
    assert!(rel(number(&mut s, "f.wobble_half_time_s"), half) < 1e-6, "half time vs engine {half} s");
    assert!(rel(number(&mut s, "f.initial_wobble_deg"), 5.0) < 1e-9);
    // cone rate at release: I_z ω_s / (I_x cos θ) (Goldstein, Poole & Safko (2002), §5.6)
    let expected_hz = b.spin_inertia_kg_m2 * 15.0 * std::f64::consts::TAU / (b.transverse_inertia_kg_m2 * 5f64.to_radians().cos()) / std::f64::consts::TAU;
    assert!(rel(number(&mut s, "f.wobble_frequency_hz"), expected_hz) < 1e-9);
    // a clean release: no wobble, nothing to halve
    assert_eq!(number(&mut s, "fly(rim_heavy, t).initial_wobble_deg"), 0.0);
    assert_eq!(value(&mut s, "type_of(fly(rim_heavy, t).wobble_half_time_s)"), "()");
}

#[test]
fn the_wobble_chart_draws_one_line_per_flight_in_degrees() {
    let mut s = session();
    value(&mut s, "let a = fly(one_piece, t.release_for(one_piece, #{ wobble_deg: 5 })); let b = fly(rim_heavy, t.release_for(rim_heavy, #{ wobble_deg: 5 }));");
    let svg = value(&mut s, "wobble_view([a, b]).to_svg()");
    for label in ["Wobble after release", "W-1 one-piece", "W-1 rim-heavy", "wobble", "°", "time"] {
        assert!(svg.contains(label), "wobble chart lacks {label}");
    }
    assert!(value(&mut s, "wobble_view(a).to_svg()").contains("<svg"));
}

#[test]
fn bad_wobble_options_name_the_key_and_range() {
    let mut s = session();
    let e = error(&mut s, "t.release_for(one_piece, #{ wobble_deg: 95 })");
    assert!(e.message.contains("wobble_deg"), "{}", e.message);
    let e = error(&mut s, "t.release_for(one_piece, #{ wobble_deg: 5, wobble_dir: 10 })");
    assert!(e.message.contains("wobble_dir"), "{}", e.message);
    // a clean throw stated with zero spin cannot wobble by an angle
    let e = error(&mut s, "throw_release(#{ speed_mps: 20, spin_rpm: 0 }).release_for(one_piece, #{ wobble_deg: 5 })");
    assert!(e.message.contains("spin"), "{}", e.message);
}
