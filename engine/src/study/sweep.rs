//! Sweeps: one or two named inputs over lists of values; one row per point, failures recorded in
//! the row.
use serde::{Deserialize, Serialize};

use super::inputs::changes_body;
use super::runner::run_indexed;
use super::{input_unit, merge_rows, metric_unit, Indexed, Shard, StudyCase, StudyControl, StudyError};

/// One swept input and its values (in the input's unit, see [`super::INPUTS`]).
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct SweepAxis {
    /// Input name, e.g. `throw.launch_deg`.
    pub input: String,
    /// Values, in the input's unit.
    pub values: Vec<f64>,
}

impl SweepAxis {
    /// Explicit values.
    pub fn values(input: impl Into<String>, values: Vec<f64>) -> Self {
        Self { input: input.into(), values }
    }

    /// `count` evenly spaced values from `start` to `stop` inclusive (`count` ≥ 1; one value is
    /// `start`).
    pub fn range(input: impl Into<String>, start: f64, stop: f64, count: usize) -> Result<Self, StudyError> {
        if count == 0 || !start.is_finite() || !stop.is_finite() {
            return Err(StudyError::InvalidSpec { field: "range".into(), reason: "needs finite ends and count ≥ 1".into() });
        }
        let step = if count > 1 { (stop - start) / (count - 1) as f64 } else { 0.0 };
        let values = (0..count).map(|k| if k + 1 == count && count > 1 { stop } else { start + step * k as f64 }).collect();
        Ok(Self { input: input.into(), values })
    }
}

/// A sweep: one or two axes (the second varies fastest) and the metrics to report.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct SweepSpec {
    /// One or two axes.
    pub axes: Vec<SweepAxis>,
    /// Metric names (see [`super::METRICS`]).
    pub metrics: Vec<String>,
}

/// One point of a sweep.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct SweepRow {
    /// Index of the point (row-major over the axes).
    pub index: usize,
    /// Input values, one per axis, in their units.
    pub inputs: Vec<f64>,
    /// Metric values in their units (empty when the point failed).
    pub values: Vec<f64>,
    /// Why the point failed, if it did.
    pub error: Option<String>,
}

impl Indexed for SweepRow {
    fn index(&self) -> usize {
        self.index
    }
}

/// A sweep's (partial, when sharded) result: the spec, units and rows sorted by index.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct SweepResult {
    /// The sweep.
    pub spec: SweepSpec,
    /// Units of the axes' inputs.
    pub input_units: Vec<String>,
    /// Units of the metrics.
    pub metric_units: Vec<String>,
    /// Which shard these rows are (whole after merging).
    pub shard: Shard,
    /// Number of points of the whole sweep.
    pub total: usize,
    /// Rows, sorted by index.
    pub rows: Vec<SweepRow>,
}

impl SweepSpec {
    fn validate(&self) -> Result<(Vec<String>, Vec<String>), StudyError> {
        if self.axes.is_empty() || self.axes.len() > 2 {
            let reason = format!("{} axes given; a sweep has one or two", self.axes.len());
            return Err(StudyError::InvalidSpec { field: "axes".into(), reason });
        }
        if let Some(axis) = self.axes.iter().find(|a| a.values.is_empty()) {
            return Err(StudyError::InvalidSpec { field: axis.input.clone(), reason: "no values to sweep".into() });
        }
        let inputs = self.axes.iter().map(|a| input_unit(&a.input).map(String::from)).collect::<Result<_, _>>()?;
        let metrics = self.metrics.iter().map(|m| metric_unit(m).map(String::from)).collect::<Result<_, _>>()?;
        Ok((inputs, metrics))
    }

    /// Number of points.
    pub fn total(&self) -> usize {
        self.axes.iter().map(|a| a.values.len()).product()
    }

    /// The input values of point `index` (row-major, the last axis fastest).
    pub fn point(&self, index: usize) -> Vec<f64> {
        let mut rest = index;
        let mut values: Vec<f64> = self
            .axes
            .iter()
            .rev()
            .map(|a| {
                let v = a.values[rest % a.values.len()];
                rest /= a.values.len();
                v
            })
            .collect();
        values.reverse();
        values
    }
}

/// Runs shard `shard` of a sweep of `case` (use [`Shard::whole`] for all of it).
pub fn run_sweep(case: &StudyCase, spec: &SweepSpec, shard: Shard, control: StudyControl<'_>) -> Result<SweepResult, StudyError> {
    shard.validate()?;
    let (input_units, metric_units) = spec.validate()?;
    let total = spec.total();
    let fixed_body = if spec.axes.iter().any(|a| changes_body(&a.input)) { None } else { Some(case.disc.body()) };
    let rows = run_indexed(&shard.indices(total), control, |index| {
        let inputs = spec.point(index);
        let outcome = sweep_point(case, spec, &inputs, fixed_body.as_ref());
        match outcome {
            Ok(values) => SweepRow { index, inputs, values, error: None },
            Err(e) => SweepRow { index, inputs, values: Vec::new(), error: Some(e.to_string()) },
        }
    })?;
    Ok(SweepResult { spec: spec.clone(), input_units, metric_units, shard, total, rows })
}

fn sweep_point(
    case: &StudyCase,
    spec: &SweepSpec,
    inputs: &[f64],
    fixed_body: Option<&Result<crate::DiscBody, StudyError>>,
) -> Result<Vec<f64>, StudyError> {
    let mut point = case.clone();
    for (axis, value) in spec.axes.iter().zip(inputs) {
        point.set(&axis.input, *value)?;
    }
    let outcome = match fixed_body {
        Some(body) => point.run_with_body(body.as_ref().map_err(Clone::clone)?)?,
        None => point.run()?,
    };
    spec.metrics.iter().map(|m| outcome.metric(m)).collect()
}

/// Merges the shards of one sweep into the single-run result (bitwise equal).
pub fn merge_sweeps(parts: &[SweepResult]) -> Result<SweepResult, StudyError> {
    let first = parts.first().ok_or_else(|| StudyError::Shards { reason: "no shards given".into() })?;
    if parts.iter().any(|p| p.spec != first.spec || p.total != first.total) {
        return Err(StudyError::Shards { reason: "the shards come from different sweeps".into() });
    }
    let slices: Vec<&[SweepRow]> = parts.iter().map(|p| p.rows.as_slice()).collect();
    let rows = merge_rows(&slices, first.total)?;
    Ok(SweepResult { rows, shard: Shard::whole(), ..first.clone() })
}
