use rand::{Rng, SeedableRng};
use rand_chacha::ChaCha8Rng;
use serde::{Deserialize, Serialize};

/// Number of sinusoids in each gust component.
pub const GUST_COMPONENTS: usize = 12;
/// Lowest and highest gust frequencies in Hz (periods 50 s down to 2 s).
pub const GUST_FREQUENCY_RANGE_HZ: (f64, f64) = (0.02, 0.5);

/// Seeded gusts on top of the mean wind.
///
/// Each of two components, along the mean wind and across it, is a sum of
/// [`GUST_COMPONENTS`] sinusoids with frequencies spread log-uniformly over
/// [`GUST_FREQUENCY_RANGE_HZ`], random phases and random weights, all drawn from `seed`
/// (ChaCha8), then scaled to unit root-mean-square over a long time. The along-wind component is
/// multiplied by `intensity` × the local mean speed (the turbulence intensity σ_u/ū), the cross
/// component by `lateral_ratio` × `intensity` × the local mean speed. Gusts vary with time only,
/// uniformly over the few hundred metres of a flight. The same seed gives the same gusts.
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(deny_unknown_fields)]
pub struct GustSpec {
    /// Turbulence intensity σ_u/ū, dimensionless (0 … 0.5; default 0.15, a moderately gusty day
    /// over open ground, common practice, no published source).
    #[serde(default = "default_intensity")]
    pub intensity: f64,
    /// Ratio of cross-wind to along-wind fluctuation σ_v/σ_u (0 … 1.5; default 0.75, typical of
    /// the neutral surface layer, value from memory, unverified).
    #[serde(default = "default_lateral_ratio")]
    pub lateral_ratio: f64,
    /// Seed of the random phases, frequencies and weights.
    #[serde(default)]
    pub seed: u64,
}

fn default_intensity() -> f64 {
    0.15
}

fn default_lateral_ratio() -> f64 {
    0.75
}

impl GustSpec {
    /// Gusts of the default intensity and lateral ratio from `seed`.
    pub fn seeded(seed: u64) -> Self {
        Self { intensity: default_intensity(), lateral_ratio: default_lateral_ratio(), seed }
    }
}

/// A zero-mean, unit-RMS time series: a sum of seeded sinusoids.
#[derive(Debug, Clone, PartialEq)]
pub struct GustSeries {
    /// (amplitude, angular frequency in rad/s, phase in rad) of each sinusoid.
    terms: Vec<(f64, f64, f64)>,
}

impl GustSeries {
    /// Draws a series from `rng`.
    fn draw(rng: &mut ChaCha8Rng) -> Self {
        let (low, high) = (GUST_FREQUENCY_RANGE_HZ.0.ln(), GUST_FREQUENCY_RANGE_HZ.1.ln());
        let mut terms: Vec<(f64, f64, f64)> = (0..GUST_COMPONENTS)
            .map(|_| {
                let frequency_hz = rng.gen_range(low..high).exp();
                let phase_rad = rng.gen_range(0.0..std::f64::consts::TAU);
                (rng.gen_range(0.5..1.5), std::f64::consts::TAU * frequency_hz, phase_rad)
            })
            .collect();
        let mean_square: f64 = terms.iter().map(|(a, _, _)| a * a / 2.0).sum();
        terms.iter_mut().for_each(|term| term.0 /= mean_square.sqrt());
        Self { terms }
    }

    /// Two independent series (along, across) from `seed`.
    pub fn pair(seed: u64) -> (Self, Self) {
        let mut rng = ChaCha8Rng::seed_from_u64(seed);
        (Self::draw(&mut rng), Self::draw(&mut rng))
    }

    /// Value at `time_s` (s), dimensionless.
    pub fn value(&self, time_s: f64) -> f64 {
        self.terms.iter().map(|(a, w, phase)| a * (w * time_s + phase).sin()).sum()
    }

    /// Largest possible |value|, the sum of the amplitudes.
    pub fn bound(&self) -> f64 {
        self.terms.iter().map(|(a, _, _)| a).sum()
    }
}
