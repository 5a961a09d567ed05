//! Limits with documented defaults: each one, when hit, is a `LimitError` naming the limit and
//! the setting that raises it, and the next cell of the same session runs normally.
use spinfoil_lang::{CellError, CollectedOutput, Session, SessionSettings};
use std::sync::Arc;
use std::time::{Duration, Instant};

const PRELUDE: &str = r#"
let d = disc("Q-3", driver_outline(#{ diameter_cm: 21.1 }), single_layup(material("base blend", 0.95)), #{ mass_g: 172 });
let t = throw_release(#{ speed_mps: 22, spin_rpm: 850, launch_deg: 10 });
"#;

fn session(settings: SessionSettings) -> Session {
    let mut s = Session::new(settings);
    s.eval(PRELUDE, Arc::new(CollectedOutput::default())).expect("prelude runs");
    s
}

fn limit_hit(s: &mut Session, code: &str) -> CellError {
    let e = s.eval(code, Arc::new(CollectedOutput::default())).expect_err(code);
    assert_eq!(e.kind, "LimitError", "{code}: {e}");
    e
}

/// The session is usable after a limit: a flight and arithmetic in the next cell.
fn still_usable(s: &mut Session) {
    let out = s.eval("fly(d, t).carry_m > 10.0", Arc::new(CollectedOutput::default())).expect("next cell runs");
    assert_eq!(out.and_then(|b| b.text_plain().map(str::to_string)).as_deref(), Some("true"));
}

#[test]
fn the_defaults_are_the_documented_ones() {
    // docs/bad-input.md lists these defaults; change both together.
    let s = SessionSettings::default();
    assert_eq!(s.max_operations, 500_000_000);
    assert_eq!(s.max_array_size, 1_000_000);
    assert_eq!(s.max_string_size, 16_000_000);
    assert_eq!(s.max_map_size, 100_000);
    assert_eq!(s.max_call_depth, 64);
    assert_eq!(s.max_expression_depth, 64);
    assert_eq!(s.max_function_expression_depth, 32);
    assert_eq!(s.max_cell_time, Duration::from_secs(600));
    assert_eq!(s.max_study_flights, 100_000);
    assert_eq!(s.max_trajectory_samples, 10_000);
    assert_eq!(s.study_dir, None);
    assert!(s.extra_dirs.is_empty());
}

#[test]
fn a_runaway_loop_stops_at_the_wall_time_limit() {
    let settings = SessionSettings { max_cell_time: Duration::from_millis(300), ..Default::default() };
    let mut s = session(settings);
    let started = Instant::now();
    let e = limit_hit(&mut s, "let n = 0; loop { n += 1; }");
    let took = started.elapsed();
    eprintln!("loop: {e} after {took:?}");
    assert!(e.message.contains("ran longer than 0.3 s (limit max_cell_time)"), "{}", e.message);
    assert!(e.line.is_some());
    assert!(took < Duration::from_secs(5), "{took:?}");
    still_usable(&mut s);
    // A pause is cut short too.
    let e = limit_hit(&mut s, "sleep(30)");
    assert!(e.message.contains("limit max_cell_time"), "{}", e.message);
    still_usable(&mut s);
}

#[test]
fn the_wall_time_limit_stops_a_running_dispersion_study() {
    let settings = SessionSettings { max_cell_time: Duration::from_millis(500), ..Default::default() };
    let mut s = session(settings);
    let started = Instant::now();
    let e = limit_hit(&mut s, "dispersion(d, t, environment(), #{ count: 100000, seed: 3, scatter: #{ speed_mps: normal(0, 0.8) } })");
    let took = started.elapsed();
    eprintln!("dispersion: {e} after {took:?}");
    assert!(e.message.contains("limit max_cell_time"), "{}", e.message);
    assert!(took < Duration::from_secs(20), "stopped between flights, not after 100 000: {took:?}");
    still_usable(&mut s);
}

#[test]
fn a_user_interrupt_is_still_an_interrupt() {
    let mut s = session(SessionSettings::default());
    let handle = s.interrupt_handle();
    let stopper = std::thread::spawn(move || {
        std::thread::sleep(Duration::from_millis(200));
        handle.interrupt();
    });
    let e = s.eval("loop { }", Arc::new(CollectedOutput::default())).unwrap_err();
    stopper.join().unwrap();
    assert_eq!(e.kind, "Interrupted", "{e}");
    still_usable(&mut s);
}

#[test]
fn studies_beyond_the_flight_limit_are_refused_before_they_start() {
    let settings = SessionSettings { max_study_flights: 50, ..Default::default() };
    let mut s = session(settings);
    let started = Instant::now();
    let e = limit_hit(&mut s, "dispersion(d, t, environment(), #{ count: 51, scatter: #{ speed_mps: normal(0, 0.8) } })");
    assert!(
        e.message.contains("a dispersion of 51 flights is more than 50 flights in one study (limit max_study_flights)"),
        "{}",
        e.message
    );
    let e = limit_hit(&mut s, "sweep(d, t, environment(), #{ input: \"throw.speed_mps\", from: 16, to: 28, count: 10, input2: \"throw.launch_deg\", from2: 0, to2: 15, count2: 6 })");
    assert!(e.message.contains("a sweep of 60 flights is more than 50"), "{}", e.message);
    assert!(started.elapsed() < Duration::from_secs(2), "refused before flying");
    still_usable(&mut s);
    // At the limit, the study runs.
    let out = s.eval(
        "dispersion(d, t, environment(), #{ count: 50, scatter: #{ speed_mps: normal(0, 0.8) } })",
        Arc::new(CollectedOutput::default()),
    );
    assert!(out.is_ok(), "{out:?}");
}

#[test]
fn flights_beyond_the_sample_limit_are_refused() {
    let settings = SessionSettings { max_trajectory_samples: 1000, ..Default::default() };
    let mut s = session(settings);
    let e = limit_hit(&mut s, "fly(d, t)");
    assert!(
        e.message.contains("a flight records up to 3001 trajectory samples (10 ms apart for up to 30 s), more than 1000 (limit max_trajectory_samples)"),
        "{}",
        e.message
    );
    let mut fine = session(SessionSettings::default());
    still_usable(&mut fine);
}

#[test]
fn every_rhai_limit_names_its_setting_and_the_session_survives() {
    let settings = SessionSettings {
        max_operations: 200_000,
        max_array_size: 1000,
        max_string_size: 1000,
        max_map_size: 100,
        max_call_depth: 16,
        ..Default::default()
    };
    let mut s = session(settings);
    for (code, fragment) in [
        ("loop { }", "more than 200000 operations (limit max_operations)"),
        ("fn f(x) { f(x + 1) } f(0)", "deeper than 16 levels (limit max_call_depth)"),
        ("let a = []; a.pad(5000, 0);", "arrays hold at most 1000 elements"),
        ("let s = \"ab\"; loop { s += s; }", "strings 1000 bytes"),
        ("let m = #{}; for i in 0..200 { let one = #{}; one[`k${i}`] = i; m.mixin(one); } m", "maps 100 entries"),
    ] {
        let e = s.eval(code, Arc::new(CollectedOutput::default())).expect_err(code);
        eprintln!("{code} -> {e}");
        assert_eq!(e.kind, "LimitError", "{code}: {e}");
        assert!(e.message.contains(fragment), "{code}: {}", e.message);
        still_usable(&mut s);
    }
}
