"""Checks of the README tour and the docs pages.

- Every image and relative link in README.md, DEVELOPERS.md and docs/*.md resolves to a file.
- Every notebook in notebooks/ is linked from the README.
- The tour's SVG charts and table are what `scripts/render-readme` makes now (it reruns the tour
  script with the debug binary into a scratch folder, which is cheap), and each PNG was rendered
  from the committed SVG (hashes in docs/images/rendered.json; the PNG conversion itself does not
  run here).
- The README keeps its required shape: the job paragraph, then the two set-up commands, the
  second of which `.ci/run` calls; the safety caution stands in the README and docs/limits.md.
"""
import re
import subprocess
import sys

import pytest

from kernel_support import BINARY, REPO

LINK = re.compile(r"!?\[[^\]]*\]\(([^)\s]+)\)")
PAGES = ["README.md", "DEVELOPERS.md", "docs/physics.md", "docs/limits.md"]
FIRST_COMMAND = "cargo run --release -p spinfoil-kernel -- report notebooks/kestrel_layups.ipynb --out spinfoil-out"
TEST_COMMAND = "bash scripts/test-all"
CAUTION = "Keep clear of the throwing lane"


def relative_links(page: str) -> list[str]:
    """Targets of the Markdown links and images of `page` that point into the repository."""
    text = (REPO / page).read_text()
    targets = [m.group(1) for m in LINK.finditer(text)]
    return [t.split("#")[0] for t in targets if not re.match(r"^[a-z]+:", t) and not t.startswith("#")]


@pytest.mark.parametrize("page", PAGES)
def test_every_link_and_image_resolves(page):
    links = relative_links(page)
    assert links, f"{page} links nothing"
    base = (REPO / page).parent
    missing = [t for t in links if not (base / t).exists()]
    assert not missing, f"{page} links files that do not exist: {missing}"


def test_readme_shows_images_that_exist():
    images = [t for t in relative_links("README.md") if t.endswith(".png")]
    assert len(images) >= 2, f"the tour should show two or three chart images, found {images}"
    for image in images:
        data = (REPO / image).read_bytes()
        assert data[:8] == b"\x89PNG\r\n\x1a\n", f"{image} is not a PNG"


def test_every_notebook_is_linked_from_the_readme():
    linked = set(relative_links("README.md"))
    notebooks = sorted(p.relative_to(REPO).as_posix() for p in (REPO / "notebooks").glob("*.ipynb"))
    assert notebooks, "no notebooks found"
    unlinked = [nb for nb in notebooks if nb not in linked]
    assert not unlinked, f"README.md does not link these notebooks (add them under 'Example studies'): {unlinked}"


def test_docs_are_linked_from_readme_and_developers():
    for page in ["README.md", "DEVELOPERS.md"]:
        linked = set(relative_links(page))
        for doc in ["docs/reference.md", "docs/physics.md", "docs/limits.md"]:
            assert doc in linked, f"{page} does not link {doc}"


def test_readme_starts_with_the_job_then_the_two_commands():
    text = (REPO / "README.md").read_text()
    blocks = [b.strip() for b in text.split("\n\n") if b.strip()]
    assert blocks[0].startswith("# "), "the README starts with its title"
    assert not blocks[1].startswith(("#", "```", "-")), "then one paragraph stating the job"
    assert blocks[2].startswith("## "), "the job is one paragraph, followed by the set-up section"
    first_code = text[text.index("```sh"):]
    first_code = first_code[: first_code.index("```", 3)]
    commands = [line.split("#")[0].strip() for line in first_code.splitlines()[1:] if line.strip()]
    assert commands == [FIRST_COMMAND, TEST_COMMAND]
    ci = (REPO / ".ci" / "run").read_text()
    assert TEST_COMMAND in ci, ".ci/run must call exactly the README's test command"


def test_the_first_command_runs_as_written_but_on_the_debug_build(tmp_path):
    # The README's first command, with the debug profile the test run has already built (the
    # release build would take minutes): it must pick the `spinfoil` binary by itself and write
    # the executed notebook and the HTML report.
    args = FIRST_COMMAND.split()
    assert args[:3] == ["cargo", "run", "--release"]
    args = ["cargo", "run", "-q", *args[3:]]
    args[args.index("--out") + 1] = str(tmp_path)
    done = subprocess.run(args, cwd=REPO, capture_output=True, text=True, check=False)
    assert done.returncode == 0, done.stderr
    html = (tmp_path / "kestrel_layups.html").read_text()
    assert "<svg" in html and CAUTION in html
    assert (tmp_path / "kestrel_layups.ipynb").is_file()


@pytest.mark.parametrize("page", ["README.md", "docs/limits.md"])
def test_safety_caution_is_shown(page):
    assert CAUTION in (REPO / page).read_text()


def test_physics_page_names_the_sources_the_code_cites():
    text = (REPO / "docs" / "physics.md").read_text()
    for source in ["Hummel", "ISO 2533", "Buck", "Sutherland", "Stronge", "Steger", "Helmbold",
                   "Wieringa", "Farkas", "Goldstein", "Dormand", "from memory, unverified",
                   "invented for demos"]:
        assert source in text, f"docs/physics.md does not mention {source}"


def test_readme_script_excerpt_is_from_the_tour_script():
    text = (REPO / "README.md").read_text()
    excerpt = text[text.index("```rhai") + len("```rhai"):]
    excerpt = excerpt[: excerpt.index("```")]
    tour = (REPO / "docs" / "images" / "tour.rhai").read_text().splitlines()
    lines = [line for line in excerpt.splitlines() if line.strip()]
    assert lines, "the README shows no script excerpt"
    missing = [line for line in lines if line not in tour]
    assert not missing, f"README script lines not in docs/images/tour.rhai: {missing}"


def test_tour_images_and_table_are_up_to_date():
    if not BINARY.exists():
        subprocess.run(["cargo", "build", "-q", "-p", "spinfoil-kernel"], cwd=REPO, check=True)
    done = subprocess.run(
        [sys.executable, str(REPO / "scripts" / "render-readme"), "--check", "--spinfoil", str(BINARY)],
        cwd=REPO, capture_output=True, text=True, check=False,
    )
    assert done.returncode == 0, done.stdout + done.stderr
