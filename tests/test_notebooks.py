"""Every notebook in notebooks/ runs in Jupyter (nbclient, PyPI) with the Spinfoil kernel, and
the headless runner (`spinfoil report`, no Jupyter) produces the same outputs and an HTML report.
The notebooks are stored with their outputs (`scripts/refresh-notebooks`), tell their study in
markdown (question, method, result, caveats) and show the safety caution.
Notebooks named rust_cells_*.ipynb need the optional Rust-cell feature and are tested elsewhere.
"""
import copy
import functools

import nbformat
import pytest
from nbclient import NotebookClient

from kernel_support import NOTEBOOKS, install_kernelspec, run_spinfoil

SAFETY = "Keep clear of the throwing lane"
CHART_FUNCTIONS = ("plan_view(", "side_view(", "time_series(", "mass_bars(", "cross_section(", "coefficient_curves(")


@pytest.fixture(scope="module", autouse=True)
def kernelspec():
    install_kernelspec()


def run_with_nbclient(path):
    """The notebook at `path` executed by nbclient with the Spinfoil kernel. Each notebook runs
    once per test session; later calls get the same notebook (callers only read it) or the same
    failure, so a broken or slow notebook costs its time once."""
    notebook, failure = executed_once(path)
    if failure is not None:
        raise failure
    return notebook


@functools.lru_cache(maxsize=None)
def executed_once(path):
    notebook = nbformat.read(path, as_version=4)
    try:
        # The kernel starts in the notebook's folder, as in Jupyter: its study folder, where the
        # notebooks' generated files go (ignored by notebooks/.gitignore).
        client = NotebookClient(notebook, kernel_name="spinfoil", timeout=120, allow_errors=False,
                                resources={"metadata": {"path": str(path.parent)}})
        client.execute()
    except Exception as failure:  # noqa: BLE001 - handed on to every caller
        return notebook, failure
    return notebook, None


def run_headless(path, out_dir):
    done = run_spinfoil("report", str(path), "--out", str(out_dir))
    assert done.returncode == 0, done.stderr
    return nbformat.read(out_dir / f"{path.stem}.ipynb", as_version=4), (out_dir / f"{path.stem}.html").read_text()


def comparable(notebook):
    """Cells with their outputs, without ids, timing and execution metadata; streams merged."""
    cells = []
    for cell in notebook.cells:
        entry = {"cell_type": cell.cell_type, "source": cell.source}
        if cell.cell_type == "code":
            entry["execution_count"] = cell.execution_count
            entry["outputs"] = merge_streams([strip(o) for o in cell.outputs])
        cells.append(entry)
    return cells


def strip(output):
    output = copy.deepcopy(dict(output))
    output.pop("metadata", None)
    output.pop("transient", None)
    return output


def merge_streams(outputs):
    merged = []
    for output in outputs:
        previous = merged[-1] if merged else None
        if previous and output["output_type"] == "stream" and previous["output_type"] == "stream" and previous["name"] == output["name"]:
            previous["text"] += output["text"]
        else:
            merged.append(output)
    return merged


def all_outputs(notebook):
    return [o for c in notebook.cells if c.cell_type == "code" for o in c.outputs]


def test_there_are_demo_notebooks():
    assert NOTEBOOKS, "notebooks/ holds no .ipynb"


def test_notebooks_that_need_rust_cells_are_left_to_their_own_step():
    assert not [p for p in NOTEBOOKS if p.name.startswith("rust_cells_")]


def output_shape(cell):
    """What a code cell shows, without the values: each output's type and MIME types."""
    return [(o["output_type"], tuple(sorted(o.get("data", {})))) for o in merge_streams([strip(o) for o in cell.outputs])]


@pytest.mark.parametrize("path", NOTEBOOKS, ids=lambda p: p.name)
def test_notebook_is_stored_with_its_outputs(path):
    """The stored notebook was refreshed after its last change: every code cell has run, in order,
    without error, and shows the same kinds of output a fresh run shows (numbers may differ after
    an engine change; `scripts/refresh-notebooks` brings them up to date)."""
    stored = nbformat.read(path, as_version=4)
    fresh = run_with_nbclient(path)
    code = [c for c in stored.cells if c.cell_type == "code"]
    assert [c.execution_count for c in code] == list(range(1, len(code) + 1)), "run scripts/refresh-notebooks"
    assert not [o for c in code for o in c.outputs if o.output_type == "error"]
    fresh_code = [c for c in fresh.cells if c.cell_type == "code"]
    assert [output_shape(c) for c in code] == [output_shape(c) for c in fresh_code], "run scripts/refresh-notebooks"


@pytest.mark.parametrize("path", NOTEBOOKS, ids=lambda p: p.name)
def test_stored_notebook_exports_to_html_with_nbconvert(path):
    """What a user gets from `jupyter nbconvert --to html` on the stored notebook: its tables and
    charts, and the caution."""
    from nbconvert import HTMLExporter

    html, _ = HTMLExporter().from_notebook_node(nbformat.read(path, as_version=4))
    assert "<table" in html and SAFETY in html


@pytest.mark.parametrize("path", NOTEBOOKS, ids=lambda p: p.name)
def test_notebook_tells_its_study_with_the_caution(path):
    notebook = nbformat.read(path, as_version=4)
    markdown = "\n".join(c.source for c in notebook.cells if c.cell_type == "markdown")
    assert notebook.cells[0].cell_type == "markdown" and notebook.cells[0].source.startswith("# ")
    assert SAFETY in markdown
    assert "invented" in markdown, "say that the scenario and demo coefficients are invented"
    limits = ("caveat", "does not capture", "not modelled", "limits of")
    assert any(word in markdown.lower() for word in limits), "a notebook says what the model does not capture"


@pytest.mark.parametrize("path", NOTEBOOKS, ids=lambda p: p.name)
def test_notebook_runs_in_jupyter_with_tables(path):
    notebook = run_with_nbclient(path)
    outputs = all_outputs(notebook)
    assert not [o for o in outputs if o.output_type == "error"]
    assert any("<table" in o.get("data", {}).get("text/html", "") for o in outputs), "no HTML table"
    code = "".join(c.source for c in notebook.cells if c.cell_type == "code")
    if any(name in code for name in CHART_FUNCTIONS):
        assert any("image/svg+xml" in o.get("data", {}) for o in outputs), "no SVG chart"


@pytest.mark.parametrize("path", NOTEBOOKS, ids=lambda p: p.name)
def test_headless_runner_matches_jupyter(path, tmp_path):
    in_jupyter = run_with_nbclient(path)
    headless, html = run_headless(path, tmp_path)
    assert comparable(headless) == comparable(in_jupyter)
    nbformat.validate(headless)
    assert "<table" in html and SAFETY in html
    assert html.count("<svg") >= sum("image/svg+xml" in o.get("data", {}) for o in all_outputs(headless))


def test_a_failing_notebook_stops_with_exit_code_1_and_keeps_the_error(tmp_path):
    notebook = nbformat.v4.new_notebook()
    notebook.cells = [
        nbformat.v4.new_code_cell('print("before")'),
        nbformat.v4.new_code_cell("let d = disc();"),
        nbformat.v4.new_code_cell('print("never")'),
    ]
    path = tmp_path / "broken.ipynb"
    nbformat.write(notebook, path)
    done = run_spinfoil("report", str(path), "--out", str(tmp_path / "out"))
    assert done.returncode == 1
    executed = nbformat.read(tmp_path / "out" / "broken.ipynb", as_version=4)
    error = executed.cells[1].outputs[-1]
    assert error.output_type == "error"
    assert any("at line 1" in line for line in error.traceback)
    assert executed.cells[2].outputs == []
    assert "cell 2 failed" in done.stderr
