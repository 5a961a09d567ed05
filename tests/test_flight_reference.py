"""Spinfoil's flights against an independent reference written in Python from PHYSICS.md and
integrated with SciPy's solve_ivp (DOP853), on 20 seeded throws (both styles and hands, two
coefficient sets, light steady winds). source: SciPy solve_ivp (Dormand & Prince (1980) 8(5,3)
method, Hairer, Nørsett & Wanner (1993), Solving ODEs I, §II.10) as the reference integrator."""
import numpy as np
import pytest

from conftest import run_example_json
from flight_reference import fly


@pytest.fixture(scope="module")
def throws():
    return run_example_json("spinfoil-engine", "reference_flights")["throws"]


def test_twenty_seeded_throws_land_where_the_reference_lands(throws):
    assert len(throws) == 20
    worst_position, worst_time = 0.0, 0.0
    for i, record in enumerate(throws):
        ours = record["spinfoil"]
        assert "error" not in ours, f"throw {i}: {ours}"
        t_ref, p_ref, _ = fly(record, rtol=1e-9, atol=1e-11)
        dp = float(np.linalg.norm(np.array(ours["landing_position_m"]) - p_ref))
        dt = abs(ours["landing_time_s"] - t_ref)
        worst_position, worst_time = max(worst_position, dp), max(worst_time, dt)
        assert dp < 5e-3, f"throw {i}: landing {dp * 1e3:.3f} mm from the reference"
        assert dt < 1e-3, f"throw {i}: landing time {dt * 1e3:.3f} ms from the reference"
    print(f"worst landing difference {worst_position:.2e} m, {worst_time:.2e} s")


def test_the_throws_cover_both_styles_and_hands_and_real_flights(throws):
    kinds = {(t["release"]["style"], t["release"]["hand"]) for t in throws}
    assert kinds == {("backhand", "right"), ("backhand", "left"), ("forehand", "right"), ("forehand", "left")}
    assert all(t["spinfoil"]["landing_time_s"] > 1.0 for t in throws)
    assert any(abs(t["wind_mps"][0]) > 1.0 for t in throws)
