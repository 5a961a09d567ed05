//! Integration tests: a catalogue of bad scripts. Each must fail with the given error kind and
//! a message containing the given fragment, at a script position; none may panic or hang, and
//! the session stays usable after each.
use spinfoil_lang::{CollectedOutput, Session, SessionSettings};
use std::panic::{catch_unwind, AssertUnwindSafe};
use std::sync::Arc;
use std::time::{Duration, Instant};

/// Definitions the bad scripts can use (run first, in the same session).
const PRELUDE: &str = r#"
let plate = material("soft base blend", 0.95);
let rim = material("dense rim blend", 1.24);
let d = disc("P-7", driver_outline(#{ diameter_cm: 21.1 }), single_layup(plate), #{ mass_g: 174 });
let t = throw_release(#{ speed_mps: 22, spin_rpm: 850 });
"#;

/// (script, error kind, message fragment)
const CATALOGUE: &[(&str, &str, &str)] = &[
    // Typos and wrong units in option keys.
    ("driver_outline(#{ diamter_cm: 21.1 })", "OptionError", "unknown option 'diamter_cm'; did you mean 'diameter_cm'?"),
    ("driver_outline(#{ diameter_mm: 211 })", "OptionError", "unknown option 'diameter_mm'; did you mean 'diameter_cm'?"),
    ("throw_release(#{ speed_mph: 50, spin_rpm: 900 })", "OptionError", "unknown option 'speed_mph'; did you mean"),
    ("throw_release(#{ speed_mps: 24, spin_rad_s: 90 })", "OptionError", "unknown option 'spin_rad_s'"),
    ("environment(#{ temp_c: 20 })", "OptionError", "unknown option 'temp_c'; did you mean 'temperature_c'?"),
    ("disc(\"x\", driver_outline(), single_layup(plate), #{ weight_g: 175 })", "OptionError", "unknown option 'weight_g'"),
    ("throw_release(#{ speed: 24, spin_rpm: 900 })", "OptionError", "unknown option 'speed'; did you mean 'speed_mps'?"),
    // Out-of-range, non-finite and wrongly typed values (the expected range names its unit).
    ("throw_release(#{ speed_mps: 90, spin_rpm: 900 })", "OptionError", "'speed_mps' = 90 is out of range; expected a number from 0 to 45 m/s"),
    ("throw_release(#{ speed_mps: 20, spin_rpm: 5000 })", "OptionError", "'spin_rpm' = 5000 is out of range"),
    ("throw_release(#{ speed_mps: 20, spin_rpm: 900, hyzer_deg: 120 })", "OptionError", "'hyzer_deg' = 120 is out of range; expected a number from -90 to 90"),
    ("throw_release(#{ speed_mps: 0.0 / 0.0, spin_rpm: 900 })", "OptionError", "is not a finite number"),
    ("throw_release(#{ speed_mps: \"fast\", spin_rpm: 900 })", "OptionError", "'speed_mps' = \"fast\" (a string) is not a number"),
    ("throw_release(#{ speed_mps: 20, spin_rpm: 900, style: \"overhand\" })", "OptionError", "\"overhand\" is not allowed; expected one of \"backhand\", \"forehand\""),
    ("environment(#{ wind_mps: 80 })", "OptionError", "'wind_mps' = 80 is out of range"),
    ("disc(\"x\", driver_outline(), single_layup(plate), #{ mass_g: 20000 })", "OptionError", "'mass_g' = 20000 is out of range; expected a number from 1 to 10000 g"),
    ("disc(\"x\", driver_outline(), single_layup(plate), #{ aero: \"fast\" })", "OptionError", "\"fast\" is not allowed"),
    ("material(\"x\", \"heavy\")", "ValueError", "density_g_cm3 must be a number"),
    // Missing or conflicting options.
    ("throw_release(#{ spin_rpm: 900 })", "OptionError", "give one of the options speed_mps, speed_kmh"),
    ("throw_release(#{ speed_mps: 20, speed_kmh: 72, spin_rpm: 900 })", "OptionError", "give only one of the options speed_mps, speed_kmh"),
    ("rim_layup(rim, plate, #{})", "OptionError", "missing option 'split_radius_cm'"),
    ("effort(#{ work_j: 100 })", "OptionError", "give torque_nm and wrist_deg together, or rim_speed_ratio alone"),
    ("effort(#{ torque_nm: 2, wrist_deg: 120 })", "OptionError", "missing option 'work_j'"),
    ("environment(#{ altitude_m: 300, pressure_hpa: 950, temperature_c: 10 })", "OptionError", "give altitude_m or pressure_hpa, not both"),
    ("disc(\"x\", driver_outline(), single_layup(plate), #{ meet_mass_by: \"plate_mm\" })", "OptionError", "meet_mass_by needs mass_g"),
    ("ring_layup(plate, rim, #{ inner_radius_cm: 9.6, outer_radius_cm: 9 })", "OptionError", "must be larger than inner_radius_cm"),
    // Impossible discs.
    ("material(\"void\", -0.5)", "DesignError", "has density -500 kg/m³"),
    ("material(\"void\", 0)", "DesignError", "allowed range"),
    ("material(\"base\", 950)", "DesignError", "material() takes g/cm³: for 950 kg/m³ write 0.95"),
    ("driver_outline(#{ rim_width_cm: 12 })", "DesignError", "rim_width_cm = 12 is outside its allowed range"),
    ("driver_outline(#{ plate_mm: 30 })", "DesignError", "plate_mm = 30 is outside its allowed range"),
    ("disc(\"x\", driver_outline(), rim_layup(rim, plate, #{ split_radius_cm: 15 }))", "DesignError", "split radius"),
    ("disc(\"x\", driver_outline(), single_layup(plate), #{ mass_g: 900, meet_mass_by: \"plate_mm\" })", "DesignError", "900"),
    // Syntax errors.
    ("let x = ;", "SyntaxError", ""),
    ("let x = (1 + 2;", "SyntaxError", "Expecting ')'"),
    ("fn broken( { }", "SyntaxError", ""),
    ("let s = \"open;", "SyntaxError", "not terminated"),
    // Unknown names and wrong argument types.
    ("fyl(d, t)", "NameError", "did you mean 'fly'?"),
    ("fly(1, 2, 3)", "NameError", "'fly' exists but takes other arguments: see help(\"fly\")"),
    ("driver_outline(21.1)", "NameError", "'driver_outline' exists but takes other arguments"),
    ("carry + 1", "NameError", "Variable not found: carry"),
    ("release(#{ speed_mps: 24 })", "NameError", "no function release (map); did you mean 'best_release', 'release_for' or 'throw_release'?"),
    ("layup(plate)", "NameError", "no function layup (Material); did you mean 'rim_layup', 'ring_layup' or 'single_layup'?"),
    ("d.I_z", "NameError", "Disc has no field 'I_z'; I_z is the field 'spin_inertia_g_cm2'"),
    ("d.spin_inertia_kg_m2", "NameError", "Disc has no field 'spin_inertia_kg_m2'; did you mean 'spin_inertia_g_cm2'?"),
    ("compare_mass([1, 2])", "ValueError", "item 0 is a int, not a Disc"),
    ("sweep(d, t, environment(), #{ input: \"throw.sped_mps\", from: 16, to: 28 })", "ValueError", "unknown input \"throw.sped_mps\"; did you mean \"throw.speed_mps\"? known inputs: throw.speed_mps"),
    ("sweep(d, t, environment(), #{ input: \"speed_mps\", from: 16, to: 28, metrics: [\"carry\"] })", "ValueError", "unknown metric \"carry\"; did you mean \"carry_m\"?"),
    ("compare([])", "ValueError", "give at least one Flight"),
    ("round(1.5, 20)", "ValueError", "round: decimals = 20 is out of range; expected a whole number from 0 to 12"),
    // Runaway work and huge data.
    ("loop { }", "LimitError", "operations (limit max_operations)"),
    ("let n = 0; while true { n += 1; }", "LimitError", "operations"),
    ("fn down(x) { down(x + 1) } down(0)", "LimitError", "levels (limit max_call_depth)"),
    ("let a = []; a.pad(10000000, 0);", "LimitError", "at most 1000000 elements"),
    ("let s = \"spin\"; loop { s += s; }", "LimitError", "too large"),
    ("let deep = ((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((1))))))))))))))))))))))))))))))))))))))))))))))))))))))))))))))))))));", "LimitError", "nested deeper than 64 levels"),
    // Arithmetic, indexing, files.
    ("let zero = 0; 1 / zero", "ArithmeticError", "Division by zero"),
    ("9223372036854775807 + 1", "ArithmeticError", "Addition overflow"),
    ("[1, 2][5]", "IndexError", "out of bounds"),
    ("save(d, \"p7.json\")", "FileError", "file access is off"),
    ("load_disc(\"p7.json\")", "FileError", "file access is off"),
    ("throw \"stopped by the study\"", "RuntimeError", "stopped by the study"),
];

fn catalogue_session() -> Session {
    // A tighter operation limit than the default keeps runaway scripts short in tests.
    let settings = SessionSettings { max_operations: 3_000_000, ..Default::default() };
    let mut session = Session::new(settings);
    session.eval(PRELUDE, Arc::new(CollectedOutput::default())).expect("prelude runs");
    session
}

#[test]
fn the_catalogue_has_at_least_thirty_scripts() {
    assert!(CATALOGUE.len() >= 30, "{}", CATALOGUE.len());
}

#[test]
fn every_bad_script_gives_its_message_at_a_position_without_panic_or_hang() {
    let mut session = catalogue_session();
    let mut failures = Vec::new();
    for (script, kind, fragment) in CATALOGUE {
        let started = Instant::now();
        let outcome = catch_unwind(AssertUnwindSafe(|| session.eval(script, Arc::new(CollectedOutput::default()))));
        let took = started.elapsed();
        match outcome {
            Err(_) => failures.push(format!("PANIC: {script}")),
            Ok(Ok(value)) => failures.push(format!("no error from {script}: {value:?}")),
            Ok(Err(e)) => {
                if e.kind != *kind || !e.message.contains(fragment) || e.line.is_none() {
                    failures.push(format!(
                        "{script}\n  expected {kind} containing {fragment:?}\n  got {} {:?} at {:?}:{:?}",
                        e.kind, e.message, e.line, e.column
                    ));
                }
            }
        }
        // Behavioural bound, not a performance check: nothing may hang.
        if took > Duration::from_secs(20) {
            failures.push(format!("took {took:?}: {script}"));
        }
        let alive = session.eval("1 + 1", Arc::new(CollectedOutput::default()));
        assert_eq!(alive.unwrap().unwrap().text_plain(), Some("2"), "session unusable after {script}");
    }
    assert!(
        failures.is_empty(),
        "{} of {} bad scripts misbehaved:\n{}",
        failures.len(),
        CATALOGUE.len(),
        failures.join("\n")
    );
}
