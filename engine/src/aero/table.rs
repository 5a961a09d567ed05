//! Tabulated coefficients against angle of attack, optionally also against advance ratio, with
//! linear (bilinear) interpolation.
use serde::{Deserialize, Serialize};

use super::error::{check_range, AeroError};
use super::model::{AeroCoefficients, AeroInput, AeroModel, ModelInfo};
use super::rates::RateTerms;

/// Columns of coefficient values, each with one value per grid point.
///
/// With an advance-ratio axis the values run over α fastest: index = j·n_α + i for advance
/// ratio j and angle i. `roll` and `spin` are given for counter-clockwise spin seen from above
/// (ω_s > 0) and change sign with the spin (zero at ω_s = 0), so mirrored throws mirror.
#[derive(Debug, Clone, PartialEq, Default, Serialize, Deserialize)]
pub struct CoefficientColumns {
    /// C_L values.
    pub lift: Vec<f64>,
    /// C_D values (≥ 0).
    pub drag: Vec<f64>,
    /// C_M values (positive nose-up).
    pub pitch: Vec<f64>,
    /// Rolling-moment coefficients for ω_s > 0, if tabulated.
    pub roll: Option<Vec<f64>>,
    /// Spin-moment coefficients for ω_s > 0, if tabulated (negative = spin-down).
    pub spin: Option<Vec<f64>>,
}

/// Coefficients tabulated on a grid of α (rad, strictly increasing, at least 2 values) and
/// optionally advance ratio (strictly increasing, ≥ 0, at least 2 values), interpolated
/// linearly (bilinearly with advance ratio).
///
/// Beyond the table the values are **clamped**: outside the α range the first or last row is
/// used, outside the advance-ratio range the first or last block. Rate terms ([`RateTerms`],
/// none by default) are added to the tabulated moments.
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
#[serde(try_from = "TableParts", into = "TableParts")]
pub struct TabulatedCoefficients {
    info: ModelInfo,
    alpha_rad: Vec<f64>,
    advance_ratio: Vec<f64>,
    columns: CoefficientColumns,
    rates: RateTerms,
}

/// The serialised form of a table; deserialising validates it like the constructors do.
#[derive(Debug, Clone, Serialize, Deserialize)]
struct TableParts {
    info: ModelInfo,
    alpha_rad: Vec<f64>,
    #[serde(default)]
    advance_ratio: Vec<f64>,
    columns: CoefficientColumns,
    #[serde(default)]
    rates: RateTerms,
}

impl TryFrom<TableParts> for TabulatedCoefficients {
    type Error = AeroError;

    fn try_from(parts: TableParts) -> Result<Self, AeroError> {
        Self::with_advance_ratio(parts.info, parts.alpha_rad, parts.advance_ratio, parts.columns)?.with_rate_terms(parts.rates)
    }
}

impl From<TabulatedCoefficients> for TableParts {
    fn from(table: TabulatedCoefficients) -> Self {
        let TabulatedCoefficients { info, alpha_rad, advance_ratio, columns, rates } = table;
        Self { info, alpha_rad, advance_ratio, columns, rates }
    }
}

/// Where a value falls on one grid axis: lower index and fraction toward the next node.
#[derive(Debug, Clone, Copy, PartialEq)]
struct Bracket {
    index: usize,
    fraction: f64,
}

impl Bracket {
    /// Clamped bracket of `x` on a strictly increasing `grid` (NaN maps to the first node).
    fn find(grid: &[f64], x: f64) -> Self {
        let last = grid.len() - 1;
        if last == 0 || x.is_nan() || x <= grid[0] {
            return Self { index: 0, fraction: 0.0 };
        }
        if x >= grid[last] {
            return Self { index: last - 1, fraction: 1.0 };
        }
        let index = grid.partition_point(|&g| g <= x) - 1;
        Self { index, fraction: (x - grid[index]) / (grid[index + 1] - grid[index]) }
    }

    /// Next node index (the same when the axis has one node).
    fn next(&self, len: usize) -> usize {
        (self.index + 1).min(len - 1)
    }
}

impl TabulatedCoefficients {
    /// A table against α only. `alpha_rad` strictly increasing (at least 2 values, within ±π);
    /// every column as long as `alpha_rad`.
    pub fn new(info: ModelInfo, alpha_rad: Vec<f64>, columns: CoefficientColumns) -> Result<Self, AeroError> {
        Self::with_advance_ratio(info, alpha_rad, Vec::new(), columns)
    }

    /// A table against α and advance ratio (empty `advance_ratio` = α only); columns hold
    /// n_α·n_J values, α fastest.
    pub fn with_advance_ratio(
        info: ModelInfo,
        alpha_rad: Vec<f64>,
        advance_ratio: Vec<f64>,
        columns: CoefficientColumns,
    ) -> Result<Self, AeroError> {
        let pi = std::f64::consts::PI;
        check_grid("angle of attack", "alpha_rad", &alpha_rad, -pi, pi)?;
        if !advance_ratio.is_empty() {
            check_grid("advance ratio", "advance_ratio", &advance_ratio, 0.0, 100.0)?;
        }
        let expected = alpha_rad.len() * advance_ratio.len().max(1);
        check_columns(&columns, expected)?;
        Ok(Self { info, alpha_rad, advance_ratio, columns, rates: RateTerms::none() })
    }

    /// The same table with rate terms (pitch damping, roll from spin, roll damping, spin-down).
    pub fn with_rate_terms(mut self, rates: RateTerms) -> Result<Self, AeroError> {
        rates.validate()?;
        self.rates = rates;
        Ok(self)
    }

    /// The α grid in rad.
    pub fn alpha_rad(&self) -> &[f64] {
        &self.alpha_rad
    }

    /// The advance-ratio grid (empty when the table is against α only).
    pub fn advance_ratio(&self) -> &[f64] {
        &self.advance_ratio
    }

    /// The tabulated columns.
    pub fn columns(&self) -> &CoefficientColumns {
        &self.columns
    }

    /// The rate terms added to the tabulated moments.
    pub fn rate_terms(&self) -> &RateTerms {
        &self.rates
    }

    /// Interpolates one column at (α, advance ratio), clamped beyond the grid.
    fn interpolate(&self, values: &[f64], alpha: Bracket, advance: Bracket) -> f64 {
        let n_alpha = self.alpha_rad.len();
        let at = |j: usize, i: usize| values[j * n_alpha + i];
        let along_alpha = |j: usize| {
            let i = alpha.index;
            at(j, i) + alpha.fraction * (at(j, alpha.next(n_alpha)) - at(j, i))
        };
        let low = along_alpha(advance.index);
        let high = along_alpha(advance.next(self.advance_ratio.len().max(1)));
        low + advance.fraction * (high - low)
    }
}

impl AeroModel for TabulatedCoefficients {
    fn coefficients(&self, input: &AeroInput) -> AeroCoefficients {
        let alpha = Bracket::find(&self.alpha_rad, input.angle_of_attack_rad);
        let advance = if self.advance_ratio.is_empty() {
            Bracket { index: 0, fraction: 0.0 }
        } else {
            Bracket::find(&self.advance_ratio, input.advance_ratio)
        };
        let value = |column: &[f64]| self.interpolate(column, alpha, advance);
        let spin_sign = spin_direction(input.spin_rad_s);
        let signed = |column: &Option<Vec<f64>>| column.as_deref().map_or(0.0, |c| spin_sign * value(c));
        let rate = self.rates.moments(input);
        AeroCoefficients {
            lift: value(&self.columns.lift),
            drag: value(&self.columns.drag).max(0.0),
            roll: signed(&self.columns.roll) + rate.roll,
            pitch: value(&self.columns.pitch) + rate.pitch,
            spin: signed(&self.columns.spin) + rate.spin,
        }
    }

    fn info(&self) -> ModelInfo {
        self.info.clone()
    }
}

/// +1 for counter-clockwise spin seen from above, −1 for clockwise, 0 without spin.
fn spin_direction(spin_rad_s: f64) -> f64 {
    if spin_rad_s > 0.0 {
        1.0
    } else if spin_rad_s < 0.0 {
        -1.0
    } else {
        0.0
    }
}

/// A grid axis: at least 2 finite values in `min..=max`, strictly increasing.
fn check_grid(axis: &str, column: &str, grid: &[f64], min: f64, max: f64) -> Result<(), AeroError> {
    if grid.len() < 2 {
        return Err(AeroError::TooFewRows { axis: axis.to_string(), found: grid.len(), min: 2 });
    }
    for value in grid {
        check_range(column, *value, min, max)?;
    }
    match grid.windows(2).find(|pair| pair[1] <= pair[0]) {
        Some(pair) => Err(AeroError::NotIncreasing { line: 0, column: column.to_string(), value: pair[1], previous: pair[0] }),
        None => Ok(()),
    }
}

/// Every column has `expected` finite values; drag is never negative.
fn check_columns(columns: &CoefficientColumns, expected: usize) -> Result<(), AeroError> {
    let named = [("lift", Some(&columns.lift)), ("drag", Some(&columns.drag)), ("pitch", Some(&columns.pitch))];
    let optional = [("roll", columns.roll.as_ref()), ("spin", columns.spin.as_ref())];
    for (name, values) in named.into_iter().chain(optional) {
        let Some(values) = values else { continue };
        if values.len() != expected {
            return Err(AeroError::ColumnLength { column: name.to_string(), found: values.len(), expected });
        }
        let min = if name == "drag" { 0.0 } else { f64::MIN };
        for value in values {
            check_range(name, *value, min, f64::MAX)?;
        }
    }
    Ok(())
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn bracket_clamps_and_finds_segments() {
        let grid = [0.0, 1.0, 3.0];
        assert_eq!(Bracket::find(&grid, -5.0), Bracket { index: 0, fraction: 0.0 });
        assert_eq!(Bracket::find(&grid, 9.0), Bracket { index: 1, fraction: 1.0 });
        assert_eq!(Bracket::find(&grid, 2.0), Bracket { index: 1, fraction: 0.5 });
        assert_eq!(Bracket::find(&grid, 1.0), Bracket { index: 1, fraction: 0.0 });
        assert_eq!(Bracket::find(&grid, f64::NAN), Bracket { index: 0, fraction: 0.0 });
    }
}
