"""Rust cells (`%%rust`) through the Jupyter kernel built with the `rust-cells` feature: the
custom coefficient model notebook runs in Jupyter (nbclient, PyPI) and in the headless runner,
its demo-set carry from the Rust cell equals the script cell's, results render as HTML and SVG,
and a compile error's reply names the cell's line.

Skipped unless SPINFOIL_RUST_CELLS_BIN names a `spinfoil` binary built with
`--features rust-cells`: `scripts/test-all` sets it in its own "rust-cells feature" step.
"""
import os
import pathlib
import re
import subprocess

import nbformat
import pytest
from jupyter_client.manager import start_new_kernel
from nbclient import NotebookClient

REPO = pathlib.Path(__file__).resolve().parent.parent
NOTEBOOK = REPO / "notebooks" / "rust_cells_custom_model.ipynb"
BINARY = os.environ.get("SPINFOIL_RUST_CELLS_BIN", "")
CELL_TIMEOUT_S = 900  # the first Rust cell compiles the engine when the build cache is cold

pytestmark = pytest.mark.skipif(
    not BINARY,
    reason="needs a spinfoil binary built with --features rust-cells (scripts/test-all's rust-cells step sets SPINFOIL_RUST_CELLS_BIN)",
)


@pytest.fixture(scope="module")
def feature_kernel(tmp_path_factory):
    """Installs the feature binary's kernelspec in a private prefix and puts it first on
    JUPYTER_PATH, so the kernel named `spinfoil` is the one with Rust cells."""
    prefix = tmp_path_factory.mktemp("rust-cells-prefix")
    subprocess.run([BINARY, "install-kernel", "--prefix", str(prefix)], check=True, capture_output=True)
    saved = os.environ.get("JUPYTER_PATH")
    os.environ["JUPYTER_PATH"] = str(prefix / "share" / "jupyter")
    yield "spinfoil"
    if saved is None:
        os.environ.pop("JUPYTER_PATH", None)
    else:
        os.environ["JUPYTER_PATH"] = saved


def stream_text(cell, name="stdout"):
    return "".join(o.get("text", "") for o in cell.outputs if o.output_type == "stream" and o.name == name)


def demo_carry(text, who):
    match = re.search(who + r", demo set: carry (-?[0-9.]+) m", text)
    assert match, f"no demo-set carry from the {who} in {text!r}"
    return float(match.group(1))


@pytest.fixture(scope="module")
def executed(feature_kernel, tmp_path_factory):
    notebook = nbformat.read(NOTEBOOK, as_version=4)
    folder = tmp_path_factory.mktemp("rust-cells-run")
    NotebookClient(notebook, kernel_name=feature_kernel, timeout=CELL_TIMEOUT_S, allow_errors=False,
                   resources={"metadata": {"path": str(folder)}}).execute()
    return notebook


def test_the_custom_model_notebook_runs_in_jupyter(executed):
    code = [c for c in executed.cells if c.cell_type == "code"]
    assert not [o for c in code for o in c.outputs if o.output_type == "error"]
    rust = [c for c in code if c.source.lstrip().startswith("%%rust")]
    assert rust and any("impl AeroModel for" in c.source for c in rust), "a Rust cell implements the engine's trait"


def test_rust_and_script_cells_agree_on_the_demo_set(executed):
    """Same engine, same design and release: the carries printed by both worlds match to the
    printed centimetre (common practice, no published source)."""
    text = "".join(stream_text(c) for c in executed.cells if c.cell_type == "code")
    script, rust = demo_carry(text, "script cell"), demo_carry(text, "Rust cell")
    assert abs(script - rust) <= 0.011, (script, rust)
    stall = float(re.search(r"Rust cell, stall-aware: carry (-?[0-9.]+) m", text).group(1))
    assert 10.0 < stall < 150.0 and stall != rust


def test_engine_results_render_as_svg_and_html(executed):
    outputs = [o for c in executed.cells if c.cell_type == "code" for o in c.outputs]
    displays = [o for o in outputs if o.output_type == "display_data"]
    charts = [o["data"]["image/svg+xml"] for o in displays if "image/svg+xml" in o["data"]]
    assert charts and charts[0].count("<polyline") == 4, "two flights, side and top view each"
    assert "Keep clear of the throwing lane" in charts[0]
    html = [o["data"]["text/html"] for o in displays if "text/html" in o["data"]]
    assert any("<table" in h and "carry" in h and "<svg" in h for h in html), "a flight shows its table and path"


def test_the_sweep_streams_its_table(executed):
    sweep = next(c for c in executed.cells if c.cell_type == "code" and "for step in 0..=60" in c.source)
    assert re.search(r"122 flights in [0-9.]+ s", stream_text(sweep))


def test_the_headless_runner_runs_rust_cells(tmp_path):
    done = subprocess.run([BINARY, "report", str(NOTEBOOK), "--out", str(tmp_path)], capture_output=True, text=True)
    assert done.returncode == 0, done.stderr
    notebook = nbformat.read(tmp_path / NOTEBOOK.name, as_version=4)
    text = "".join(stream_text(c) for c in notebook.cells if c.cell_type == "code")
    assert abs(demo_carry(text, "script cell") - demo_carry(text, "Rust cell")) <= 0.011


def test_a_compile_error_reply_names_the_line_and_output_streams(feature_kernel):
    manager, client = start_new_kernel(kernel_name=feature_kernel, startup_timeout=60)
    try:
        client.execute_interactive('%%rust\nprintln!("hello from Rust");\neprintln!("and its stderr");',
                                   timeout=CELL_TIMEOUT_S, output_hook=collect(streams := []))
        assert "hello from Rust\n" in [t for name, t in streams if name == "stdout"]
        assert any("and its stderr" in t for name, t in streams if name == "stderr")
        reply = client.execute_interactive('%%rust\nlet a: f64 = 1.0;\nlet b: f64 = "two";\na + b',
                                           timeout=CELL_TIMEOUT_S, output_hook=lambda m: None)
        content = reply["content"]
        assert content["status"] == "error" and content["ename"] == "CompileError"
        assert "line 3" in content["evalue"], content["evalue"]
        assert any('let b: f64 = "two";' in line for line in content["traceback"])
        ok = client.execute_interactive("%%rust\n40 + 2", timeout=CELL_TIMEOUT_S, output_hook=lambda m: None)
        assert ok["content"]["status"] == "ok"
    finally:
        client.stop_channels()
        manager.shutdown_kernel(now=True)


def collect(into):
    def hook(message):
        if message["msg_type"] == "stream":
            into.append((message["content"]["name"], message["content"]["text"]))
    return hook
