"""Shared helpers for the Python reference checks.

The checks compare Spinfoil's numbers with references from outside the project (handbook
formulas, SciPy, trimesh, ambiance, CoolProp). Spinfoil's side is produced by small cargo
examples of the engine that print JSON, run through `run_example`.
"""
import json
import os
import pathlib
import subprocess

import pytest

REPO = pathlib.Path(__file__).resolve().parent.parent


def run_example(package: str, name: str, *args: str, stdin: str | None = None) -> str:
    """Runs `cargo run -q -p PACKAGE --example NAME -- ARGS` and returns its stdout.

    The debug profile's examples are the ones `scripts/test-all` has already built (our crates at
    opt-level 1, dependencies at 2: each example runs in about a second), so the checks add no
    release build to a test run.
    """
    cmd = ["cargo", "run", "-q", "-p", package, "--example", name, "--", *args]
    done = subprocess.run(cmd, cwd=REPO, input=stdin, capture_output=True, text=True, check=False)
    if done.returncode != 0:
        raise RuntimeError(f"{' '.join(cmd)} failed ({done.returncode}):\n{done.stderr}")
    return done.stdout


def run_example_json(package: str, name: str, *args: str, stdin: str | None = None):
    """Like `run_example`, parsing stdout as JSON."""
    return json.loads(run_example(package, name, *args, stdin=stdin))


@pytest.fixture
def repo() -> pathlib.Path:
    """The repository root."""
    return REPO


@pytest.fixture
def workdir(tmp_path) -> pathlib.Path:
    """A scratch folder for files a test writes."""
    os.makedirs(tmp_path, exist_ok=True)
    return tmp_path
