//! Dispersion: Monte Carlo over throw scatter (and gusts), with landing and rest statistics and
//! the share landing inside zones.
use rand::Rng;
use rand_chacha::ChaCha8Rng;
use rand_distr::{Distribution as _, Normal};
use serde::{Deserialize, Serialize};

use super::inputs::changes_body;
use super::montecarlo::{monte_carlo, DrawOutcome, DrawRow};
use super::{input_unit, merge_rows, scatter_stats, ScatterStats, Shard, StudyCase, StudyControl, StudyError, Zone, SAFETY_CAUTION};

/// A distribution of the offset added to an input's base value (in the input's unit).
#[derive(Debug, Clone, Copy, PartialEq, Serialize, Deserialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Spread {
    /// Normal with mean 0 and standard deviation `sd`.
    Normal {
        /// Standard deviation (≥ 0), in the input's unit.
        sd: f64,
    },
    /// Uniform on [−half_width, +half_width].
    Uniform {
        /// Half width (≥ 0), in the input's unit.
        half_width: f64,
    },
}

impl Spread {
    /// One draw of the offset.
    pub fn sample(&self, rng: &mut ChaCha8Rng) -> f64 {
        match *self {
            Spread::Normal { sd } => Normal::new(0.0, sd).map_or(0.0, |n| n.sample(rng)),
            Spread::Uniform { half_width } => half_width * (2.0 * rng.gen::<f64>() - 1.0),
        }
    }

    fn width(&self) -> f64 {
        match *self {
            Spread::Normal { sd } => sd,
            Spread::Uniform { half_width } => half_width,
        }
    }
}

/// Scatter on one named input.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct Scatter {
    /// Input name (see [`super::INPUTS`]), e.g. `throw.speed_mps`.
    pub input: String,
    /// Its spread around the case's value.
    pub spread: Spread,
}

/// A dispersion study.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct DispersionSpec {
    /// Number of throws.
    pub throws: usize,
    /// Seed of every draw.
    pub seed: u64,
    /// Scatter on named inputs, drawn in this order.
    pub scatter: Vec<Scatter>,
    /// Turbulence intensity σ_u/ū of seeded gusts, a new gust seed for each throw (None: the
    /// case's wind as it is).
    pub gust_intensity: Option<f64>,
    /// Zones whose share of landings (and rests) is reported.
    pub zones: Vec<Zone>,
}

/// Share of landings and rests inside one zone.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct ZoneShare {
    /// The zone.
    pub zone: Zone,
    /// Share of landing points inside, 0 … 1.
    pub landing_share: f64,
    /// Share of rest points inside, 0 … 1 (None without ground play).
    pub rest_share: Option<f64>,
}

/// Summary of a dispersion: statistics of landing and rest points, zone shares, the caution.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct DispersionSummary {
    /// Throws that flew.
    pub flown: usize,
    /// Throws that failed (see the rows' errors).
    pub failed: usize,
    /// Landing scatter (None for fewer than 2 flights).
    pub landing: Option<ScatterStats>,
    /// Rest scatter (None without ground play).
    pub rest: Option<ScatterStats>,
    /// Mean carry, m.
    pub mean_carry_m: f64,
    /// Shares inside the spec's zones (shares of the throws that flew).
    pub zones: Vec<ZoneShare>,
    /// The safety caution to show beside this output.
    pub caution: String,
}

/// A dispersion's (partial, when sharded) result.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct DispersionResult {
    /// The study.
    pub spec: DispersionSpec,
    /// Which shard (whole after merging).
    pub shard: Shard,
    /// One row per throw of this shard, by index.
    pub rows: Vec<DrawRow>,
    /// Summary, only for a whole study (after merging for shards).
    pub summary: Option<DispersionSummary>,
}

impl DispersionSpec {
    fn validate(&self) -> Result<(), StudyError> {
        for s in &self.scatter {
            input_unit(&s.input)?;
            let w = s.spread.width();
            if !(w.is_finite() && w >= 0.0) {
                return Err(StudyError::InvalidSpec { field: s.input.clone(), reason: format!("spread {w} must be finite and ≥ 0") });
            }
        }
        if let Some(g) = self.gust_intensity.filter(|g| !(g.is_finite() && (0.0..=0.5).contains(g))) {
            return Err(StudyError::InvalidSpec { field: "gust_intensity".into(), reason: format!("{g} is outside 0 … 0.5") });
        }
        Ok(())
    }

    /// The case of throw `rng`'s draw: each scatter offset added in order, then a gust seed.
    pub fn draw_case(&self, case: &StudyCase, rng: &mut ChaCha8Rng) -> Result<StudyCase, StudyError> {
        let mut drawn = case.clone();
        for s in &self.scatter {
            let base = drawn.get(&s.input)?;
            drawn.set(&s.input, base + s.spread.sample(rng))?;
        }
        if let Some(intensity) = self.gust_intensity {
            drawn.set("env.gust_intensity", intensity)?;
            drawn.set("env.gust_seed", (rng.gen::<u64>() >> 12) as f64)?;
        }
        Ok(drawn)
    }

    /// Summary of merged rows (all throws, in index order).
    pub fn summarise(&self, rows: &[DrawRow]) -> DispersionSummary {
        let outcomes: Vec<&DrawOutcome> = rows.iter().filter_map(|r| r.outcome.as_ref()).collect();
        let landings: Vec<[f64; 2]> = outcomes.iter().map(|o| o.landing_m).collect();
        let rests: Vec<[f64; 2]> = outcomes.iter().filter_map(|o| o.rest_m).collect();
        let has_rest = !rests.is_empty();
        let zones = self
            .zones
            .iter()
            .map(|z| ZoneShare { zone: z.clone(), landing_share: z.share_inside(&landings), rest_share: has_rest.then(|| z.share_inside(&rests)) })
            .collect();
        let flown = outcomes.len();
        DispersionSummary {
            flown,
            failed: rows.len() - flown,
            landing: scatter_stats(&landings),
            rest: scatter_stats(&rests),
            mean_carry_m: if flown > 0 { outcomes.iter().map(|o| o.carry_m).sum::<f64>() / flown as f64 } else { 0.0 },
            zones,
            caution: SAFETY_CAUTION.to_string(),
        }
    }
}

/// Runs shard `shard` of a dispersion of `case`.
pub fn run_dispersion(case: &StudyCase, spec: &DispersionSpec, shard: Shard, control: StudyControl<'_>) -> Result<DispersionResult, StudyError> {
    spec.validate()?;
    // An input that does not apply to this case (an effort field of a release throw, the
    // release speed of an effort throw, ...) is refused once, by name, not in every draw.
    for s in &spec.scatter {
        let mut probe = case.clone();
        let value = probe.get(&s.input)?;
        probe.set(&s.input, value)?;
    }
    let fixed_body = if spec.scatter.iter().any(|s| changes_body(&s.input)) { None } else { Some(case.disc.body()?) };
    let rows = monte_carlo(spec.throws, spec.seed, shard, control, |rng| {
        let drawn = spec.draw_case(case, rng)?;
        let outcome = match &fixed_body {
            Some(body) => drawn.run_with_body(body)?,
            None => drawn.run()?,
        };
        let m = &outcome.metrics;
        Ok(DrawOutcome { landing_m: outcome.landing_m(), rest_m: outcome.rest_m, carry_m: m.carry_m, time_aloft_s: m.time_aloft_s })
    })?;
    Ok(finish(spec.clone(), shard, rows))
}

fn finish(spec: DispersionSpec, shard: Shard, rows: Vec<DrawRow>) -> DispersionResult {
    let summary = (shard.count == 1).then(|| spec.summarise(&rows));
    DispersionResult { spec, shard, rows, summary }
}

/// Merges the shards of one dispersion into the single-run result (bitwise equal).
pub fn merge_dispersions(parts: &[DispersionResult]) -> Result<DispersionResult, StudyError> {
    let first = parts.first().ok_or_else(|| StudyError::Shards { reason: "no shards given".into() })?;
    if parts.iter().any(|p| p.spec != first.spec) {
        return Err(StudyError::Shards { reason: "the shards come from different dispersion studies".into() });
    }
    let slices: Vec<&[DrawRow]> = parts.iter().map(|p| p.rows.as_slice()).collect();
    let rows = merge_rows(&slices, first.spec.throws)?;
    Ok(finish(first.spec.clone(), Shard::whole(), rows))
}
