//! The command line: subcommands, files written, exit codes.
use crate::support::{scratch, spinfoil, text};

const STUDY: &str = r#"
let outline = driver_outline(#{});
let one = disc("Kestrel one-piece", outline, single_layup(material("Harbor blend", 0.95)), #{ mass_g: 170.0 });
show(compare_mass([one]));
print("done");
"#;

#[test]
fn help_documents_the_exit_codes_and_the_caution() {
    let output = spinfoil(&["--help"], "");
    let (stdout, _) = text(&output);
    assert_eq!(output.status.code(), Some(0));
    for needle in ["run", "report", "install-kernel", "kernel", "shell", "Exit codes", "1  the study failed", "throwing lane"] {
        assert!(stdout.contains(needle), "--help lacks {needle:?}");
    }
}

#[test]
fn a_script_prints_tables_and_saves_csv_copies() {
    let folder = scratch("run");
    std::fs::write(folder.join("study.rhai"), STUDY).unwrap();
    let out = folder.join("out");
    let output = spinfoil(&["run", folder.join("study.rhai").to_str().unwrap(), "--out", out.to_str().unwrap(), "--tables", "csv"], "");
    let (stdout, stderr) = text(&output);
    assert_eq!(output.status.code(), Some(0), "{stderr}");
    assert!(stdout.contains("Kestrel one-piece") && stdout.contains("[g]"), "{stdout}");
    assert!(stdout.ends_with("done\n"));
    let csv = std::fs::read_to_string(out.join("table-001.csv")).unwrap();
    assert!(csv.lines().nth(1).unwrap().starts_with("Kestrel one-piece,"), "{csv}");
}

#[test]
fn a_study_shown_in_a_script_saves_its_chart_beside_its_table() {
    let folder = scratch("study-chart");
    let script = r#"
let d = disc("Heron", midrange_outline(#{}), single_layup(material("Lantern blend", 0.96)), #{ mass_g: 176 });
let t = throw_release(#{ speed_mps: 20, spin_rpm: 850, launch_deg: 9 });
show(sweep(d, t, environment(), #{ input: "throw.speed_mps", from: 16, to: 24, count: 3 }));
"#;
    std::fs::write(folder.join("sweep.rhai"), script).unwrap();
    let out = folder.join("out");
    let output = spinfoil(&["run", folder.join("sweep.rhai").to_str().unwrap(), "--out", out.to_str().unwrap(), "--tables", "csv"], "");
    let (stdout, stderr) = text(&output);
    assert_eq!(output.status.code(), Some(0), "{stderr}");
    let chart = std::fs::read_to_string(out.join("chart-001.svg")).expect("the sweep's chart is saved");
    assert!(chart.starts_with("<svg") && chart.trim_end().ends_with("</svg>"), "{chart}");
    assert!(out.join("table-001.csv").exists(), "the sweep's table is still exported");
    assert!(stdout.contains("(chart saved to "), "{stdout}");
}

#[test]
fn a_failing_script_exits_with_1_and_shows_the_position() {
    let folder = scratch("fail");
    std::fs::write(folder.join("bad.rhai"), "let a = 1;\nlet b = a + nothing_here;\n").unwrap();
    let output = spinfoil(&["run", folder.join("bad.rhai").to_str().unwrap(), "--out", folder.to_str().unwrap()], "");
    let (_, stderr) = text(&output);
    assert_eq!(output.status.code(), Some(1));
    assert!(stderr.contains("at line 2"), "{stderr}");
    assert!(stderr.contains("let b = a + nothing_here;"), "{stderr}");
}

#[test]
fn a_missing_file_exits_with_3_and_a_bad_option_with_2() {
    let missing = spinfoil(&["run", "no/such/study.rhai"], "");
    assert_eq!(missing.status.code(), Some(3));
    assert!(text(&missing).1.contains("cannot read script"));
    assert_eq!(spinfoil(&["run", "x.rhai", "--tables", "xml"], "").status.code(), Some(2));
    assert_eq!(spinfoil(&["fly-away"], "").status.code(), Some(2));
}

#[test]
fn wrong_files_get_one_clear_line_and_exit_code_3() {
    let folder = scratch("wrong-files");
    std::fs::write(folder.join("study.rhai"), STUDY).unwrap();
    let script = folder.join("study.rhai");
    let report = spinfoil(&["report", script.to_str().unwrap(), "--out", folder.join("out").to_str().unwrap()], "");
    assert_eq!(report.status.code(), Some(3));
    assert!(text(&report).1.contains("is a study script, not a notebook: run it with `spinfoil run"), "{}", text(&report).1);
    let folder_as_script = spinfoil(&["run", folder.to_str().unwrap(), "--out", folder.join("out").to_str().unwrap()], "");
    let stderr = text(&folder_as_script).1;
    assert_eq!(folder_as_script.status.code(), Some(3));
    assert_eq!(stderr.matches("os error").count(), 1, "the cause once: {stderr}");
    let merge = spinfoil(&["merge", folder.join("no-such-parts").to_str().unwrap(), "--out", folder.join("merged").to_str().unwrap()], "");
    let stderr = text(&merge).1;
    assert_eq!(merge.status.code(), Some(3), "{stderr}");
    assert!(stderr.contains("cannot read the shard folder") && !stderr.contains("merge.rhai"), "{stderr}");
    let empty = spinfoil(&["merge", folder.to_str().unwrap(), "--out", folder.join("merged").to_str().unwrap()], "");
    let stderr = text(&empty).1;
    assert_eq!(empty.status.code(), Some(3), "{stderr}");
    assert!(stderr.contains("no partial-*.json files in") && !stderr.contains("merge.rhai"), "{stderr}");
}

#[test]
fn report_writes_the_executed_notebook_and_html() {
    let folder = scratch("report");
    let notebook = serde_json::json!({"nbformat": 4, "nbformat_minor": 5, "metadata": {}, "cells": [
        {"cell_type": "markdown", "metadata": {}, "source": "# Quick check"},
        {"cell_type": "code", "metadata": {}, "execution_count": null, "outputs": [], "source": STUDY}
    ]});
    std::fs::write(folder.join("quick.ipynb"), notebook.to_string()).unwrap();
    let out = folder.join("out");
    let output = spinfoil(&["report", folder.join("quick.ipynb").to_str().unwrap(), "--out", out.to_str().unwrap()], "");
    assert_eq!(output.status.code(), Some(0), "{}", text(&output).1);
    let executed: serde_json::Value = serde_json::from_str(&std::fs::read_to_string(out.join("quick.ipynb")).unwrap()).unwrap();
    let outputs = &executed["cells"][1]["outputs"];
    assert_eq!(outputs[0]["output_type"], "display_data");
    assert!(outputs[0]["data"]["text/html"].as_str().unwrap().contains("<table"));
    assert_eq!(outputs[1], serde_json::json!({"output_type": "stream", "name": "stdout", "text": "done\n"}));
    let html = std::fs::read_to_string(out.join("quick.html")).unwrap();
    assert!(html.contains("<title>Quick check</title>") && html.contains("<table") && html.contains("throwing lane"));
}

#[test]
fn install_kernel_points_at_this_binary() {
    let prefix = scratch("prefix");
    let output = spinfoil(&["install-kernel", "--prefix", prefix.to_str().unwrap()], "");
    assert_eq!(output.status.code(), Some(0), "{}", text(&output).1);
    let spec_file = prefix.join("share/jupyter/kernels/spinfoil/kernel.json");
    let spec: serde_json::Value = serde_json::from_str(&std::fs::read_to_string(spec_file).unwrap()).unwrap();
    let program = std::path::PathBuf::from(spec["argv"][0].as_str().unwrap());
    assert!(program.is_absolute() && program.exists(), "{program:?}");
    assert_eq!(spec["argv"][1], "kernel");
    assert_eq!(spinfoil(&["install-kernel", "--user", "--sys-prefix"], "").status.code(), Some(2));
}

#[test]
fn the_prompt_reads_multi_line_cells_until_they_are_complete() {
    let output = spinfoil(&["shell", "--out", scratch("shell").to_str().unwrap()], "let speeds = [20,\n 22, 24];\nspeeds.len()\nlet bad = ;\n40 + 2\n");
    let (stdout, stderr) = text(&output);
    assert_eq!(output.status.code(), Some(0), "{stderr}");
    assert!(stdout.contains("3\n"), "{stdout}");
    assert!(stdout.contains("42\n"), "{stdout}");
    assert!(stderr.contains("SyntaxError"), "{stderr}");
}
