//! The spread of a cloud of points: mean, covariance, and the ellipses that hold a chosen
//! share of a bivariate normal distribution with that mean and covariance.

/// Mean and sample covariance of a cloud of 2-D points.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Spread {
    /// Mean (x, y), in the points' units.
    pub mean: (f64, f64),
    /// Sample covariance `[[var x, cov xy], [cov xy, var y]]` (divisor n − 1), units².
    pub covariance: [[f64; 2]; 2],
    /// Number of finite points used.
    pub count: usize,
}

/// The scale factor k of the ellipse that holds `probability` of a bivariate normal
/// distribution: k² is the chi-square quantile with 2 degrees of freedom, k = √(−2 ln(1 − p)).
/// (Source: the chi-square distribution with 2 degrees of freedom has CDF 1 − exp(−x/2).)
pub fn ellipse_scale(probability: f64) -> f64 {
    (-2.0 * (1.0 - probability.clamp(0.0, 1.0 - 1e-12)).ln()).sqrt()
}

impl Spread {
    /// The spread of the finite points; `None` for fewer than 2 of them.
    pub fn of(points: &[(f64, f64)]) -> Option<Self> {
        let finite: Vec<(f64, f64)> = points.iter().copied().filter(|(x, y)| x.is_finite() && y.is_finite()).collect();
        let n = finite.len();
        if n < 2 {
            return None;
        }
        let mean = (finite.iter().map(|p| p.0).sum::<f64>() / n as f64, finite.iter().map(|p| p.1).sum::<f64>() / n as f64);
        let moment = |f: &dyn Fn((f64, f64)) -> f64| finite.iter().map(|p| f(*p)).sum::<f64>() / (n - 1) as f64;
        let xx = moment(&|p| (p.0 - mean.0).powi(2));
        let yy = moment(&|p| (p.1 - mean.1).powi(2));
        let xy = moment(&|p| (p.0 - mean.0) * (p.1 - mean.1));
        Some(Self { mean, covariance: [[xx, xy], [xy, yy]], count: n })
    }

    /// Semi-axes (major, minor, in the points' units) and the major axis's angle from +x
    /// (rad) of the ellipse holding `probability` of the distribution.
    pub fn semi_axes(&self, probability: f64) -> (f64, f64, f64) {
        let [[a, b], [_, c]] = self.covariance;
        let centre = 0.5 * (a + c);
        let radius = (0.25 * (a - c).powi(2) + b * b).sqrt();
        let k = ellipse_scale(probability);
        let angle = 0.5 * (2.0 * b).atan2(a - c);
        (k * (centre + radius).max(0.0).sqrt(), k * (centre - radius).max(0.0).sqrt(), angle)
    }

    /// `vertices` points around that ellipse, closed (the first point repeated at the end).
    pub fn ellipse(&self, probability: f64, vertices: usize) -> Vec<(f64, f64)> {
        let (major, minor, angle) = self.semi_axes(probability);
        let (sin, cos) = angle.sin_cos();
        (0..=vertices.max(3))
            .map(|i| {
                let t = std::f64::consts::TAU * i as f64 / vertices.max(3) as f64;
                let (u, v) = (major * t.cos(), minor * t.sin());
                (self.mean.0 + u * cos - v * sin, self.mean.1 + u * sin + v * cos)
            })
            .collect()
    }
}
