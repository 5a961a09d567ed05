//! Dimensionless groups of a flight: Reynolds number and advance ratio.

/// Reynolds number ρ V L / μ (dimensionless) of a body of reference length `length_m` (m; a
/// disc's diameter) moving at `speed_mps` (m/s) through air of `density_kg_m3` (kg/m³) and
/// `viscosity_pa_s` (Pa·s). Zero when the air has no density or viscosity (a vacuum).
pub fn reynolds_number(density_kg_m3: f64, speed_mps: f64, length_m: f64, viscosity_pa_s: f64) -> f64 {
    if viscosity_pa_s <= 0.0 {
        return 0.0;
    }
    density_kg_m3 * speed_mps.abs() * length_m / viscosity_pa_s
}

/// Advance ratio |ω| R / V (dimensionless): rim speed over airspeed, for spin `spin_rad_s`
/// (rad/s, either sign), rim radius `radius_m` (m) and airspeed `speed_mps` (m/s).
///
/// Returns 0 without spin and `f64::INFINITY` for a spinning disc at zero airspeed, never NaN.
pub fn advance_ratio(spin_rad_s: f64, radius_m: f64, speed_mps: f64) -> f64 {
    let rim_speed_mps = spin_rad_s.abs() * radius_m;
    if rim_speed_mps == 0.0 {
        return 0.0;
    }
    rim_speed_mps / speed_mps.abs()
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn advance_ratio_edges_are_not_nan() {
        assert_eq!(advance_ratio(0.0, 0.1, 0.0), 0.0);
        assert_eq!(advance_ratio(10.0, 0.1, 0.0), f64::INFINITY);
        assert!((advance_ratio(-100.0, 0.1, 20.0) - 0.5).abs() < 1e-15);
    }

    #[test]
    fn reynolds_of_a_vacuum_is_zero() {
        assert_eq!(reynolds_number(0.0, 20.0, 0.21, 0.0), 0.0);
    }
}
