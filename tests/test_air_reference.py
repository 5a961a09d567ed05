"""Spinfoil's air against reference libraries from PyPI.

Spinfoil's side: `engine/examples/air_table.rs` (JSON over a grid of altitude, temperature
offset, measured pressure and temperature, and relative humidity).

References:
- `ambiance` (PyPI): the U.S. Standard Atmosphere 1976 / ISO 2533:1975, dry air, by geometric
  altitude (converted here from our geopotential altitude).
- `fluids` (PyPI): `ATMOSPHERE_1976(Z, dT)`, the same standard with a temperature offset at
  unchanged pressure, and Sutherland viscosity.
- `CoolProp` (PyPI): `HAPropsSI`, real humid-air properties (Hyland & Wexler saturation
  pressures, virial equation of state); density of humid air = 1 / Vha, with Vha the volume
  per kilogram of humid air.
Tolerance 0.2 % (the brief's target): ideal-gas mixing and Buck's formula against CoolProp's
real-gas model differ by a few hundredths of a percent.
"""
import pytest
from ambiance import Atmosphere
from CoolProp.HumidAirProp import HAPropsSI
from fluids import ATMOSPHERE_1976

from conftest import run_example_json

TOLERANCE = 2e-3
R0_M = 6_356_766.0  # U.S. Standard Atmosphere 1976, radius for geopotential altitude


@pytest.fixture(scope="module")
def table():
    return run_example_json("spinfoil-engine", "air_table")


def geometric_altitude_m(geopotential_m: float) -> float:
    return R0_M * geopotential_m / (R0_M - geopotential_m)


def rel(a: float, b: float) -> float:
    return abs(a - b) / abs(b)


def standard_rows(table, offset_k=None, humidity_pct=None):
    for row in table["standard"]:
        source = row["source"]
        if offset_k is not None and source["temperature_offset_k"] != offset_k:
            continue
        if humidity_pct is not None and row["relative_humidity_pct"] != humidity_pct:
            continue
        yield source["altitude_m"], source["temperature_offset_k"], row


def test_dry_standard_atmosphere_matches_ambiance(table):
    # source: ambiance (PyPI), U.S. Standard Atmosphere 1976
    rows = list(standard_rows(table, offset_k=0.0, humidity_pct=0.0))
    assert len(rows) == 8
    for altitude_m, _, row in rows:
        reference = Atmosphere(geometric_altitude_m(altitude_m))
        assert rel(row["temperature_k"], reference.temperature[0]) < 1e-6, altitude_m
        assert rel(row["pressure_pa"], reference.pressure[0]) < 1e-5, altitude_m
        assert rel(row["density_kg_m3"], reference.density[0]) < 1e-5, altitude_m
        assert rel(row["viscosity_pa_s"], reference.dynamic_viscosity[0]) < 1e-6, altitude_m


def test_offset_atmosphere_matches_fluids(table):
    # source: fluids (PyPI), ATMOSPHERE_1976 with dT (pressure unchanged, temperature offset)
    rows = list(standard_rows(table, humidity_pct=0.0))
    assert len(rows) == 40
    for altitude_m, offset_k, row in rows:
        reference = ATMOSPHERE_1976(geometric_altitude_m(altitude_m), dT=offset_k)
        assert rel(row["temperature_k"], reference.T) < 1e-6, (altitude_m, offset_k)
        assert rel(row["pressure_pa"], reference.P) < 1e-5, (altitude_m, offset_k)
        assert rel(row["density_kg_m3"], reference.rho) < TOLERANCE, (altitude_m, offset_k)
        assert rel(row["viscosity_pa_s"], reference.mu) < TOLERANCE, (altitude_m, offset_k)


def coolprop_density(row) -> float:
    """Humid-air density from CoolProp for the row's state. Above 0 °C by relative humidity (over
    water, as ours); below 0 °C CoolProp's relative humidity is over ice, so there we hand it our
    vapour amount as a humidity ratio and compare only the mixture."""
    t_k, p_pa, e_pa = row["temperature_k"], row["pressure_pa"], row["vapour_pressure_pa"]
    if t_k >= 273.16:
        return 1.0 / HAPropsSI("Vha", "T", t_k, "P", p_pa, "R", row["relative_humidity_pct"] / 100.0)
    humidity_ratio = 0.621945 * e_pa / (p_pa - e_pa)
    return 1.0 / HAPropsSI("Vha", "T", t_k, "P", p_pa, "W", humidity_ratio)


def test_humid_standard_air_matches_coolprop(table):
    # source: CoolProp (PyPI) HAPropsSI, density = 1 / Vha; within 0.2 %
    rows = [r for a, _, r in standard_rows(table) if a <= 3000.0]
    assert len(rows) == 7 * 5 * 5
    worst = max(rel(r["density_kg_m3"], coolprop_density(r)) for r in rows)
    assert worst < TOLERANCE, worst


def test_humid_measured_air_matches_coolprop(table):
    # source: CoolProp (PyPI) HAPropsSI, density = 1 / Vha; within 0.2 %
    rows = table["measured"]
    assert len(rows) == 3 * 6 * 5 * 2
    worst = max(rel(r["density_kg_m3"], coolprop_density(r)) for r in rows)
    assert worst < TOLERANCE, worst


def test_humidity_lowers_density_by_the_expected_amount(table):
    # source: CoolProp (PyPI) HAPropsSI: the humid-minus-dry density difference itself agrees
    # within 5 % of its size at 35 °C, sea level (a sharper test of the vapour term).
    for row in table["measured"]:
        source = row["source"]
        if source["pressure_pa"] != 101_325.0 or row["temperature_k"] != 308.15 or row["enhancement_factor"]:
            continue
        if row["relative_humidity_pct"] != 100.0:
            continue
        dry = dict(row, relative_humidity_pct=0.0, vapour_pressure_pa=0.0)
        ours = row["density_kg_m3"] - dry_density(row)
        theirs = coolprop_density(row) - coolprop_density(dry)
        assert rel(ours, theirs) < 0.05, (ours, theirs)
        return
    pytest.fail("grid point 35 °C, 101 325 Pa, 100 % missing")


def dry_density(row) -> float:
    return row["pressure_pa"] / (287.05287 * row["temperature_k"])


def test_enhanced_saturation_pressure_matches_coolprop(table):
    # source: CoolProp (PyPI) HAPropsSI("P_w", ..., "R", 1) = f · e_s (Hyland & Wexler 1983)
    # against Buck (1981) with his enhancement factor, 10 … 45 °C; within 0.2 %
    checked = 0
    for row in table["measured"]:
        if not row["enhancement_factor"] or row["temperature_k"] < 280.0 or row["relative_humidity_pct"] != 100.0:
            continue
        reference = HAPropsSI("P_w", "T", row["temperature_k"], "P", row["pressure_pa"], "R", 1.0)
        assert rel(row["saturation_vapour_pressure_pa"], reference) < TOLERANCE, row
        checked += 1
    assert checked == 3 * 4
