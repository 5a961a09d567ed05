use thiserror::Error;

/// A numeric input that is not finite or lies outside its allowed range.
///
/// Shared by the air, wind and throw inputs so that every such error reads the same way:
/// the field's name, the offending value and the allowed range, with units.
#[derive(Debug, Clone, PartialEq, Error)]
#[error("{field} = {value} {unit} is {problem}; allowed range {min} … {max} {unit}", problem = self.problem())]
pub struct InputRangeError {
    /// Name of the offending input field, e.g. `"relative_humidity_pct"`.
    pub field: &'static str,
    /// The value given (may be NaN or infinite).
    pub value: f64,
    /// Smallest allowed value, in `unit`.
    pub min: f64,
    /// Largest allowed value, in `unit`.
    pub max: f64,
    /// Unit of `value`, `min` and `max`, e.g. `"m/s"`.
    pub unit: &'static str,
}

impl InputRangeError {
    /// Returns `value` when it is finite and within `min ..= max`; otherwise the error.
    pub fn check(
        field: &'static str,
        value: f64,
        min: f64,
        max: f64,
        unit: &'static str,
    ) -> Result<f64, Self> {
        if value.is_finite() && (min..=max).contains(&value) {
            Ok(value)
        } else {
            Err(Self { field, value, min, max, unit })
        }
    }

    /// Like [`InputRangeError::check`], with the range as a `(min, max)` pair.
    pub fn check_within(
        field: &'static str,
        value: f64,
        range: (f64, f64),
        unit: &'static str,
    ) -> Result<f64, Self> {
        Self::check(field, value, range.0, range.1, unit)
    }

    fn problem(&self) -> &'static str {
        if self.value.is_finite() {
            "out of range"
        } else {
            "not a finite number"
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn accepts_the_bounds_and_names_field_value_and_range() {
        assert_eq!(InputRangeError::check("x_m", 1.0, 1.0, 2.0, "m"), Ok(1.0));
        let message = InputRangeError::check("x_m", 3.0, 1.0, 2.0, "m").unwrap_err().to_string();
        assert_eq!(message, "x_m = 3 m is out of range; allowed range 1 … 2 m");
    }

    #[test]
    fn rejects_non_finite_values() {
        for bad in [f64::NAN, f64::INFINITY, f64::NEG_INFINITY] {
            let error = InputRangeError::check("x_m", bad, f64::MIN, f64::MAX, "m").unwrap_err();
            assert!(error.to_string().contains("not a finite number"), "{error}");
        }
    }
}
