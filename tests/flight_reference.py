"""An independent reference model of a spinning disc's flight, written from PHYSICS.md.

Written from the equations, not from the Rust code, and deliberately in a different form:

* State: position r, velocity v, unit axis n, and the angular momentum H about the centre of
  mass (12 numbers), instead of n, dn/dt and the spin. The rotation follows Euler's law
  dH/dt = M directly (Goldstein, Poole & Safko (2002), Classical Mechanics 3rd ed., §5.5),
  with H = I_z w_s n + I_x w_perp for an axisymmetric body, hence
  w_s = H.n / I_z, w_perp = (H - (H.n) n) / I_x, dn/dt = w_perp x n.
* Translation: m dv/dt = F_aero + m g, g = (0, 0, -g).
* Aerodynamics (PHYSICS.md "Aerodynamics"; axes of the shared AeroInput docs): v_rel = v - w;
  alpha = atan2(-v^.n, |v^ - (v^.n) n|); q = rho V^2 / 2; A = pi d^2 / 4;
  lift q A C_L along the unit part of n perpendicular to v_rel; drag q A C_D along -v^;
  moments q A d (C_roll e_r + C_pitch e_p + C_spin n), with e_r the unit in-plane part of v^
  and e_p = v^ x n normalised (nose-up positive).
* Hummel-style linear coefficients (Hummel, S. A. (2003), Frisbee Flight Simulation and Throw
  Biomechanics, MS thesis, UC Davis; the form, with the values passed in):
  C_L = C_L0 + C_La a; C_D = C_D0 + C_Da (a - a0)^2; C_M = C_M0 + C_Ma a + C_Mq q_rate;
  C_roll = C_Rr w_s + C_Rp p_rate; C_spin = C_Nr w_s; rates read in rad/s or as rate d/(2V).
* Landing: first time the lowest rim point z - R sqrt(n_x^2 + n_y^2) reaches 0 (terminal event).
* Release (the shared ReleaseState docs): velocity at launch angle and heading; the disc plane
  pitched up by the nose angle in the vertical plane of the velocity, then rolled about the
  velocity by the roll angle, hyzer (positive) lowering the fade-side edge; the wobble is a
  transverse angular velocity in the disc plane at an angle from the in-plane forward direction
  toward the left.
"""
from __future__ import annotations

import math

import numpy as np
from scipy.integrate import solve_ivp


def _unit(x):
    return x / np.linalg.norm(x)


def _rotate(vector, axis, angle):
    """Rodrigues' rotation of `vector` about the unit `axis` by `angle` (rad)."""
    axis = _unit(axis)
    return (vector * math.cos(angle) + np.cross(axis, vector) * math.sin(angle)
            + axis * np.dot(axis, vector) * (1.0 - math.cos(angle)))


class LinearModel:
    """Hummel-style linear coefficients, read from the serialised set (our axes)."""

    def __init__(self, c: dict):
        self.c = c
        conv = c["rates"]["convention"]
        self.reference_diameter = conv.get("reference_diameter_m") if conv["kind"] == "non_dimensional" else None

    def _rate(self, rate, speed):
        if self.reference_diameter is None:
            return rate
        return rate * self.reference_diameter / (2.0 * speed) if speed > 0 else 0.0

    def __call__(self, alpha, speed, spin, pitch_rate, roll_rate):
        c, r = self.c, self.c["rates"]
        cl = c["lift_at_zero"] + c["lift_slope_per_rad"] * alpha
        cd = c["drag_min"] + c["drag_growth_per_rad2"] * (alpha - c["drag_min_alpha_rad"]) ** 2
        cm = (c["pitch_at_zero"] + c["pitch_slope_per_rad"] * alpha
              + r["pitch_damping"] * self._rate(pitch_rate, speed))
        croll = r["roll_from_spin"] * self._rate(spin, speed) + r["roll_damping"] * self._rate(roll_rate, speed)
        cspin = r["spin_damping"] * self._rate(spin, speed)
        return cl, cd, cm, croll, cspin


class Disc:
    """A disc with its coefficient set, in given air, wind and gravity."""

    def __init__(self, body: dict, model: dict, density: float, wind, gravity: float):
        self.m = body["mass_kg"]
        self.iz = body["spin_inertia_kg_m2"]
        self.ix = body["transverse_inertia_kg_m2"]
        self.d = body["diameter_m"]
        self.model = LinearModel(model)
        self.rho = density
        self.wind = np.asarray(wind, dtype=float)
        self.g = gravity

    def spin_and_transverse(self, n, h):
        spin = np.dot(h, n) / self.iz
        return spin, (h - np.dot(h, n) * n) / self.ix

    def aero(self, v, n, omega, spin):
        """Aerodynamic force (N) and moment (N m), world frame."""
        v_rel = v - self.wind
        speed = np.linalg.norm(v_rel)
        zero = np.zeros(3)
        if speed == 0.0 or self.rho == 0.0:
            return zero, zero
        vh = v_rel / speed
        along = np.dot(vh, n)
        in_plane = vh - along * n
        alpha = math.atan2(-along, np.linalg.norm(in_plane))
        e_r = _unit(in_plane)
        e_p = _unit(np.cross(vh, n))
        cl, cd, cm, croll, cspin = self.model(alpha, speed, spin, np.dot(omega, e_p), np.dot(omega, e_r))
        lift_dir = _unit(n - np.dot(n, vh) * vh)
        qa = 0.5 * self.rho * speed * speed * math.pi * self.d ** 2 / 4.0
        force = qa * (cl * lift_dir - cd * vh)
        moment = qa * self.d * (croll * e_r + cm * e_p + cspin * n)
        return force, moment

    def rhs(self, _t, y):
        r, v, n, h = y[0:3], y[3:6], _unit(y[6:9]), y[9:12]
        spin, w_perp = self.spin_and_transverse(n, h)
        omega = spin * n + w_perp
        force, moment = self.aero(v, n, omega, spin)
        acc = force / self.m - np.array([0.0, 0.0, self.g])
        return np.concatenate([v, acc, np.cross(w_perp, n), moment])

    def rim_height(self, _t, y):
        n = y[6:9]
        return y[2] - 0.5 * self.d * math.hypot(n[0], n[1]) / np.linalg.norm(n)


def release_state(disc: Disc, release: dict, fade_side: float):
    """The initial 12-vector from a release record (see the module docs)."""
    speed, launch, heading = release["speed_mps"], release["launch_rad"], release["heading_rad"]
    forward = np.array([math.cos(launch) * math.cos(heading), math.cos(launch) * math.sin(heading), math.sin(launch)])
    left = np.array([-math.sin(heading), math.cos(heading), 0.0])
    # nose: the disc's axis starts vertical-to-the-velocity and pitches back by the nose angle
    # (a rotation about the left axis turning the top away from the direction of travel)
    up = np.cross(forward, left)
    n = _rotate(up, left, -release["nose_rad"])
    # roll about the velocity: hyzer lowers the fade-side edge, i.e. tips n toward the fade side
    n = _rotate(n, forward, -fade_side * release["roll_rad"])
    spin_sign = -fade_side  # clockwise from above (w_s < 0) fades left (+y)
    spin = spin_sign * release["spin_rad_s"]
    e_f = _unit(forward - np.dot(forward, n) * n)
    e_l = np.cross(n, e_f)
    beta = release["off_axis_direction_rad"]
    w_perp = release["off_axis_rate_rad_s"] * (math.cos(beta) * e_f + math.sin(beta) * e_l)
    h = disc.iz * spin * n + disc.ix * w_perp
    position = np.array([0.0, 0.0, release["height_m"]])
    return np.concatenate([position, speed * forward, n, h])


def fly(record: dict, rtol: float = 1e-10, atol: float = 1e-12, method: str = "DOP853", max_time: float = 30.0):
    """Flies one throw record (as printed by the reference_flights example).

    Returns (landing time s, landing position m as a 3-array, number of right-hand-side calls).
    """
    disc = Disc(record["body"], record["model"], record["air"]["density_kg_m3"], record["wind_mps"], record["gravity_mps2"])
    y0 = release_state(disc, record["release"], record["fade_side"])
    def event(t, y):
        return disc.rim_height(t, y)

    event.terminal = True
    event.direction = -1
    sol = solve_ivp(disc.rhs, (0.0, max_time), y0, method=method, rtol=rtol, atol=atol, events=event)
    if not sol.t_events[0].size:
        raise RuntimeError("the reference disc did not land")
    return float(sol.t_events[0][0]), np.array(sol.y_events[0][0][0:3]), int(sol.nfev)
