//! `spinfoil run --shard i/N` and `spinfoil merge`: the merged tables equal a single run's.
use super::support::{scratch, spinfoil, text};

const STUDY: &str = r#"
let plate = material("soft base blend", 0.95);
let outline = driver_outline(#{ diameter_cm: 21.1, rim_width_cm: 2.2 });
let d = disc("P-7 one-piece", outline, single_layup(plate), #{ mass_g: 174 });
let t = throw_release(#{ speed_mps: 22, spin_rpm: 900, launch_deg: 10 });
show(sweep(d, t, environment(), #{ input: "speed_mps", from: 16, to: 28, count: 3 }));
show(dispersion(d, t, environment(), #{ count: 6, seed: 7, scatter: #{ speed_mps: normal(0, 0.8) } }));
"#;

fn run_ok(args: &[&str]) -> String {
    let output = spinfoil(args, "");
    let (out, err) = text(&output);
    assert!(output.status.success(), "spinfoil {args:?} failed:\n{out}\n{err}");
    out
}

#[test]
fn shards_merge_into_the_single_run_tables() {
    let folder = scratch("shards");
    let script = folder.join("study.rhai");
    std::fs::write(&script, STUDY).unwrap();
    let path = |name: &str| folder.join(name).display().to_string();
    let script = script.display().to_string();
    run_ok(&["run", &script, "--out", &path("whole"), "--tables", "csv"]);
    for shard in ["0/2", "1/2"] {
        run_ok(&["run", &script, "--shard", shard, "--out", &path("parts")]);
    }
    let partials = std::fs::read_dir(folder.join("parts")).unwrap().filter(|e| {
        e.as_ref().is_ok_and(|e| e.file_name().to_string_lossy().starts_with("partial-"))
    });
    assert_eq!(partials.count(), 4, "two studies × two shards");
    let merged = run_ok(&["merge", &path("parts"), "--out", &path("merged"), "--tables", "csv"]);
    assert!(merged.contains("throws flown"), "{merged}");
    for table in ["table-001.csv", "table-002.csv"] {
        let whole = std::fs::read_to_string(folder.join("whole").join(table)).unwrap();
        let joined = std::fs::read_to_string(folder.join("merged").join(table)).unwrap();
        assert_eq!(whole, joined, "{table}: merged shards differ from the single run");
    }
    let bad = spinfoil(&["run", &script, "--shard", "2/2"], "");
    assert_eq!(bad.status.code(), Some(2), "an impossible shard is a command-line error");
}
