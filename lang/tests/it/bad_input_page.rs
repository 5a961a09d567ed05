//! The bad-input catalogue of `docs/bad-input.md`: every row of its generated tables is a bad
//! input run here, with the message the user gets back. The test fails when a message changes;
//! `SPINFOIL_BLESS=1 cargo test -p spinfoil-lang --test it bad_input_page` rewrites the tables.
use spinfoil_lang::{CollectedOutput, Session, SessionSettings};
use std::path::{Path, PathBuf};
use std::sync::Arc;
use std::time::Duration;

const PRELUDE: &str = r#"
let plate = material("base blend", 0.95);
let d = disc("Q-3", driver_outline(#{ diameter_cm: 21.1 }), single_layup(plate), #{ mass_g: 172 });
let t = throw_release(#{ speed_mps: 22, spin_rpm: 850, launch_deg: 10 });
"#;

/// Settings of one row: the catalogue's defaults, or a tighter limit to show it quickly.
type Tweak = fn(&mut SessionSettings);

fn same(_: &mut SessionSettings) {}
fn short_cell(s: &mut SessionSettings) {
    s.max_cell_time = Duration::from_secs(1);
}
fn few_flights(s: &mut SessionSettings) {
    s.max_study_flights = 1000;
}
fn few_samples(s: &mut SessionSettings) {
    s.max_trajectory_samples = 1000;
}
fn small_data(s: &mut SessionSettings) {
    s.max_array_size = 10_000;
    s.max_string_size = 10_000;
    s.max_map_size = 1000;
}
fn no_folder(s: &mut SessionSettings) {
    s.study_dir = None;
}

/// (table, script, settings)
const ROWS: &[(&str, &str, Tweak)] = &[
    ("scripts", "let x = (1 + 2;", same),
    ("scripts", "let s = \"open;", same),
    ("scripts", "for throw in [t] { fly(d, throw) }", same),
    ("scripts", "fyl(d, t)", same),
    ("scripts", "fly(1, 2, 3)", same),
    ("scripts", "carry + 1", same),
    ("scripts", "d.spin_inertia_kg_m2", same),
    ("scripts", "let zero = 0; 1 / zero", same),
    ("scripts", "[1, 2][5]", same),
    ("scripts", "throw \"stopped by the study\"", same),
    ("scripts", "import \"/etc/passwd\" as m;", same),
    ("scripts", "system(\"ls\")", same),
    ("limits", "loop { }", same),
    ("limits", "fn down(x) { down(x + 1) } down(0)", same),
    ("limits", "let a = []; a.pad(20000, 0);", small_data),
    ("limits", "let s = \"spin\"; loop { s += s; }", small_data),
    ("limits", "let m = #{}; for i in 0..2000 { let one = #{}; one[`k${i}`] = i; m.mixin(one); } m", small_data),
    ("limits", "let v = ((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((((1))))))))))))))))))))))))))))))))))))))))))))))))))))))))))))))))));", same),
    ("limits", "sleep(5)", short_cell),
    ("limits", "dispersion(d, t, environment(), #{ count: 5000, scatter: #{ speed_mps: normal(0, 1) } })", few_flights),
    ("limits", "sweep(d, t, environment(), #{ input: \"throw.speed_mps\", from: 16, to: 28, count: 100, input2: \"throw.launch_deg\", from2: 0, to2: 15, count2: 20 })", few_flights),
    ("limits", "fly(d, t)", few_samples),
    ("options", "driver_outline(#{ diamter_cm: 21.1 })", same),
    ("options", "throw_release(#{ speed_mph: 50, spin_rpm: 900 })", same),
    ("options", "throw_release(#{ speed_mps: \"fast\", spin_rpm: 900 })", same),
    ("options", "throw_release(#{ speed_mps: 90, spin_rpm: 900 })", same),
    ("options", "throw_release(#{ speed_mps: 0.0 / 0.0, spin_rpm: 900 })", same),
    ("options", "throw_release(#{ speed_mps: 20, spin_rpm: 900, style: \"overhand\" })", same),
    ("options", "throw_release(#{ spin_rpm: 900 })", same),
    ("options", "environment(#{ altitude_m: 300, pressure_hpa: 950 })", same),
    ("options", "dispersion(d, t, environment(), #{ count: 10, scatter: #{ speed_mps: normal(0, -1) } })", same),
    ("options", "material(\"void\", -0.5)", same),
    ("options", "disc(\"x\", driver_outline(), rim_layup(plate, plate, #{ split_radius_cm: 15 }))", same),
    ("files", "save(d, \"../escape.json\")", same),
    ("files", "save(d, \"/etc/escape.json\")", same),
    ("files", "load_disc(\"link.json\")", same),
    ("files", "save(d, \"linked_folder/escape.json\")", same),
    ("files", "save(d, \"design.exe\")", same),
    ("files", "load_disc(\"missing.json\")", same),
    ("files", "load_disc(\"broken.json\")", same),
    ("files", "load_disc(\"broken.toml\")", same),
    ("files", "load_disc(\"throw.json\")", same),
    ("files", "load_disc(\"impossible.json\")", same),
    ("files", "load_json(\"field.json\")", same),
    ("files", "load_json(\"big_list.json\")", small_data),
    ("files", "load_measured(\"bad_number.csv\")", same),
    ("files", "load_measured(\"missing_column.csv\")", same),
    ("files", "measured_from_csv(\"flight,speed_mps\\nA,22\")", same),
    ("files", "save(d, \"p7.json\")", no_folder),
];

/// A study folder holding the broken files the rows load, and a link and a linked folder
/// leading out of it.
fn prepared_folder() -> (PathBuf, PathBuf) {
    let base = std::env::temp_dir().join(format!("spinfoil-bad-input-{}", std::process::id()));
    let _ = std::fs::remove_dir_all(&base);
    let (study, outside) = (base.join("study"), base.join("outside"));
    std::fs::create_dir_all(&study).unwrap();
    std::fs::create_dir_all(&outside).unwrap();
    let write = |name: &str, text: &str| std::fs::write(study.join(name), text).unwrap();
    write("broken.json", "{ \"kind\": \"disc\", \"design\": ");
    write("broken.toml", "kind = \"disc\"\ndesign = [\n");
    write("throw.json", "");
    write("field.json", "{\n  \"name\": \"North meadow\",\n  \"tee_m\": [0, 0]\n  \"holes\": []\n}\n");
    write("big_list.json", &format!("[{}]", vec!["0.5"; 5000].join(", ")));
    write("bad_number.csv", "flight,speed_mps,spin_rps,launch_deg,nose_deg,hyzer_deg,t_s,x_m,y_m,z_m\nA,22,15,10,0,0,3.9,71.2,-2.1,\nB,fast,15,10,0,0,3.9,70.0,-1.0,\n");
    write("missing_column.csv", "flight,speed_mps,spin_rps,t_s,x_m,y_m,z_m\nA,22,15,3.9,71.2,-2.1,\n");
    std::fs::write(outside.join("secret.json"), "{}").unwrap();
    std::os::unix::fs::symlink(outside.join("secret.json"), study.join("link.json")).unwrap();
    std::os::unix::fs::symlink(&outside, study.join("linked_folder")).unwrap();
    let mut s = Session::new(SessionSettings::in_folder(&study));
    s.eval(&format!("{PRELUDE} save(t, \"throw.json\"); save(d, \"impossible.json\");"), Arc::new(CollectedOutput::default()))
        .expect("the prelude saves");
    let text = std::fs::read_to_string(study.join("impossible.json")).unwrap();
    write("impossible.json", &text.replacen("950.0", "-950.0", 1));
    (base, study)
}

/// `text` as inline code in a table cell (double backticks around text that holds one).
fn markdown_cell(text: &str) -> String {
    let text = text.replace('|', "\\|").replace('\n', " ⏎ ");
    if text.contains('`') {
        format!("`` {text} ``")
    } else {
        format!("`{text}`")
    }
}

/// The generated tables: one per section, each row script | kind | message.
fn generated(study: &Path) -> String {
    let mut out = String::new();
    let mut section = "";
    for (table, script, tweak) in ROWS {
        if *table != section {
            section = table;
            out.push_str(&format!("\n<!-- table: {table} -->\n| input | kind | message (line, column of the cell) |\n|---|---|---|\n"));
        }
        let mut settings = SessionSettings { max_operations: 3_000_000, ..SessionSettings::in_folder(study) };
        tweak(&mut settings);
        let mut session = Session::new(settings);
        session.eval(PRELUDE, Arc::new(CollectedOutput::default())).expect("prelude runs");
        let error = match session.eval(script, Arc::new(CollectedOutput::default())) {
            Err(e) => e,
            Ok(v) => panic!("no error from {script}: {v:?}"),
        };
        let at = match (error.line, error.column) {
            (Some(l), Some(c)) => format!(" ({l}, {c})"),
            _ => String::new(),
        };
        out.push_str(&format!("| {} | {} | {}{at} |\n", markdown_cell(script), error.kind, markdown_cell(&error.message)));
        session.eval("1 + 1", Arc::new(CollectedOutput::default())).expect("the session stays usable");
    }
    out
}

const BEGIN: &str = "<!-- generated by lang/tests/it/bad_input_page.rs: begin -->";
const END: &str = "<!-- generated: end -->";

#[test]
fn the_bad_input_page_quotes_the_current_messages() {
    let page_path = Path::new(env!("CARGO_MANIFEST_DIR")).join("../docs/bad-input.md");
    let page = std::fs::read_to_string(&page_path).expect("docs/bad-input.md exists");
    let (base, study) = prepared_folder();
    let tables = generated(&study);
    let _ = std::fs::remove_dir_all(&base);
    let start = page.find(BEGIN).expect("the page has the begin marker") + BEGIN.len();
    let end = page.find(END).expect("the page has the end marker");
    let current = &page[start..end];
    if std::env::var_os("SPINFOIL_BLESS").is_some() {
        let updated = format!("{}{tables}\n{}", &page[..start], &page[end..]);
        std::fs::write(&page_path, updated).unwrap();
        return;
    }
    assert!(
        current.trim() == tables.trim(),
        "docs/bad-input.md quotes stale messages: rerun with SPINFOIL_BLESS=1\n{tables}"
    );
}
