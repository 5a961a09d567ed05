//! Statistics of 2-D scatter: means, sample covariance, confidence ellipses, shares in zones.
use serde::{Deserialize, Serialize};

/// χ² quantile with 2 degrees of freedom for 50 %: −2 ln(0.5) = 1.386 (exact for 2 dof).
pub const CHI2_2DOF_50: f64 = 1.386_294_361_119_890_6;
/// χ² quantile with 2 degrees of freedom for 95 %: −2 ln(0.05) = 5.991 (exact for 2 dof).
pub const CHI2_2DOF_95: f64 = 5.991_464_547_107_982;

/// A confidence ellipse of a 2-D normal: semi-axes in m, orientation of the major axis.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct Ellipse {
    /// Probability content (0.5 or 0.95).
    pub level: f64,
    /// Centre (x, y) in m.
    pub centre_m: [f64; 2],
    /// Semi-major axis in m: √(χ² λ_max).
    pub semi_major_m: f64,
    /// Semi-minor axis in m: √(χ² λ_min).
    pub semi_minor_m: f64,
    /// Angle of the major axis from +x toward +y, degrees (−90 … 90).
    pub angle_deg: f64,
}

/// Summary of a 2-D point scatter (sample statistics with the n − 1 denominator).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
pub struct ScatterStats {
    /// Number of points.
    pub count: usize,
    /// Mean (x, y) in m.
    pub mean_m: [f64; 2],
    /// Standard deviations (x, y) in m.
    pub sd_m: [f64; 2],
    /// Sample covariance [[xx, xy], [xy, yy]] in m².
    pub covariance_m2: [[f64; 2]; 2],
    /// Eigenvalues of the covariance, largest first, m².
    pub eigenvalues_m2: [f64; 2],
    /// 50 % ellipse (χ² = 1.386).
    pub ellipse_50: Ellipse,
    /// 95 % ellipse (χ² = 5.991).
    pub ellipse_95: Ellipse,
}

/// The statistics of `points` (None for fewer than 2 points). Summation runs in the order given,
/// so the same points in the same order give bitwise the same result.
pub fn scatter_stats(points: &[[f64; 2]]) -> Option<ScatterStats> {
    let n = points.len();
    if n < 2 {
        return None;
    }
    let nf = n as f64;
    let mean = [points.iter().map(|p| p[0]).sum::<f64>() / nf, points.iter().map(|p| p[1]).sum::<f64>() / nf];
    let (mut sxx, mut sxy, mut syy) = (0.0, 0.0, 0.0);
    for p in points {
        let (dx, dy) = (p[0] - mean[0], p[1] - mean[1]);
        sxx += dx * dx;
        sxy += dx * dy;
        syy += dy * dy;
    }
    let c = [[sxx / (nf - 1.0), sxy / (nf - 1.0)], [sxy / (nf - 1.0), syy / (nf - 1.0)]];
    let (eigenvalues, angle) = symmetric_eigen(c);
    let ellipse = |level: f64, chi2: f64| Ellipse {
        level,
        centre_m: mean,
        semi_major_m: (chi2 * eigenvalues[0]).sqrt(),
        semi_minor_m: (chi2 * eigenvalues[1].max(0.0)).sqrt(),
        angle_deg: angle.to_degrees(),
    };
    Some(ScatterStats {
        count: n,
        mean_m: mean,
        sd_m: [c[0][0].sqrt(), c[1][1].sqrt()],
        covariance_m2: c,
        eigenvalues_m2: eigenvalues,
        ellipse_50: ellipse(0.5, CHI2_2DOF_50),
        ellipse_95: ellipse(0.95, CHI2_2DOF_95),
    })
}

/// Eigenvalues (largest first) of a symmetric 2×2 matrix and the angle (rad) of the largest's
/// eigenvector from +x, in (−π/2, π/2].
pub fn symmetric_eigen(c: [[f64; 2]; 2]) -> ([f64; 2], f64) {
    let (a, b, d) = (c[0][0], c[0][1], c[1][1]);
    let half_trace = 0.5 * (a + d);
    let radius = (0.5 * (a - d)).hypot(b);
    let angle = 0.5 * (2.0 * b).atan2(a - d);
    ([half_trace + radius, half_trace - radius], angle)
}
