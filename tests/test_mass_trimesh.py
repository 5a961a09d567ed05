"""Spinfoil's mass properties of a revolved driver outline against trimesh.

source: trimesh (PyPI) mass properties of a closed triangle mesh (volume, centre of mass and
inertia tensor about the centre of mass, by the divergence theorem). The meshes are Spinfoil's
own STL export of the same outline with 720 segments; the polygonal revolution loses about
(2π/720)²/6 ≈ 1.3e-5 of the volume, far inside the 0.5 % tolerance.
"""
import numpy as np
import pytest
import trimesh

from conftest import run_example_json

TOLERANCE = 0.005


@pytest.fixture(scope="module")
def meshes(tmp_path_factory):
    """Runs the mesh_reference example once; returns (folder, its JSON report)."""
    folder = tmp_path_factory.mktemp("meshes")
    return folder, run_example_json("spinfoil-engine", "mesh_reference", str(folder))


def combined(folder, parts):
    """Mass, centre of mass and inertia tensor about it of several meshes (kg, m, kg·m²)."""
    masses, centres, tensors = [], [], []
    for part in parts:
        mesh = trimesh.load(folder / part["file"], force="mesh")
        mesh.apply_scale(1e-3)  # the STL is in millimetres
        assert mesh.is_watertight, part["file"]
        mesh.density = part["density_kg_m3"]
        masses.append(mesh.mass)
        centres.append(mesh.center_mass)
        tensors.append(mesh.moment_inertia)
    total = sum(masses)
    centre = sum(m * c for m, c in zip(masses, centres)) / total
    inertia = np.zeros((3, 3))
    for m, c, tensor in zip(masses, centres, tensors):
        d = c - centre
        inertia += tensor + m * (np.dot(d, d) * np.eye(3) - np.outer(d, d))  # parallel axis
    volume = sum(m / p["density_kg_m3"] for m, p in zip(masses, parts))
    return total, volume, centre, inertia


@pytest.mark.parametrize("design", ["single", "overmold"])
def test_driver_mass_properties_match_trimesh(design, meshes):
    folder, report = meshes
    ours = report[design]
    mass, volume, centre, inertia = combined(folder, ours["parts"])
    assert volume == pytest.approx(ours["volume_m3"], rel=TOLERANCE)
    assert mass == pytest.approx(ours["mass_kg"], rel=TOLERANCE)
    assert centre[2] == pytest.approx(ours["cg_height_m"], rel=TOLERANCE)
    assert abs(centre[0]) < 1e-6 and abs(centre[1]) < 1e-6
    assert inertia[2, 2] == pytest.approx(ours["spin_inertia_kg_m2"], rel=TOLERANCE)
    transverse = 0.5 * (inertia[0, 0] + inertia[1, 1])
    assert transverse == pytest.approx(ours["transverse_inertia_kg_m2"], rel=TOLERANCE)
    print(
        f"{design}: I_z trimesh/ours − 1 = {inertia[2, 2] / ours['spin_inertia_kg_m2'] - 1:.2e}, "
        f"I_x {transverse / ours['transverse_inertia_kg_m2'] - 1:.2e}"
    )


def test_ascii_stl_encloses_the_same_volume(meshes):
    # A revolution in n steps inscribes every circle in a regular n-gon, keeping the fraction
    # sin(2π/n)/(2π/n) of the volume (common practice, no published source); trimesh reads the
    # ASCII file (source: trimesh (PyPI) mesh volume by the divergence theorem).
    folder, report = meshes
    ascii_part = report["ascii"]
    mesh = trimesh.load(folder / ascii_part["file"], force="mesh")
    mesh.apply_scale(1e-3)
    assert mesh.is_watertight
    step = 2 * np.pi / ascii_part["segments"]
    expected = report["single"]["volume_m3"] * np.sin(step) / step
    assert mesh.volume == pytest.approx(expected, rel=1e-5)
    assert mesh.volume == pytest.approx(report["single"]["volume_m3"], rel=TOLERANCE)
