/// The mean wind speed against height above the ground in the neutral surface layer: the
/// logarithmic profile u(z) = u_ref ln(z / z0) / ln(z_ref / z0), zero at and below z0.
///
/// Source: the logarithmic wind law of the neutral atmospheric surface layer (e.g. Stull (1988),
/// An Introduction to Boundary Layer Meteorology, §9.7; value from memory, unverified section).
/// Inputs are validated by [`WindSpec`](crate::WindSpec).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LogProfile {
    /// Mean speed at the reference height, m/s.
    pub reference_speed_mps: f64,
    /// Reference height z_ref, m (above z0).
    pub reference_height_m: f64,
    /// Roughness length z0, m (> 0).
    pub roughness_length_m: f64,
}

impl LogProfile {
    /// Mean speed in m/s at `height_m` (m above the ground); 0 at and below z0.
    pub fn speed_mps(&self, height_m: f64) -> f64 {
        if height_m.is_nan() || height_m <= self.roughness_length_m {
            return 0.0;
        }
        self.reference_speed_mps * self.shape(height_m)
    }

    /// Ratio u(z)/u_ref (dimensionless) at `height_m` (m), for z > z0.
    fn shape(&self, height_m: f64) -> f64 {
        let z0 = self.roughness_length_m;
        (height_m / z0).ln() / (self.reference_height_m / z0).ln()
    }
}
