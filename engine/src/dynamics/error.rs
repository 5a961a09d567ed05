use thiserror::Error;

/// Invalid rigid-body data.
#[derive(Debug, Clone, PartialEq, Error)]
#[non_exhaustive]
pub enum BodyError {
    /// A field is non-finite or outside its allowed range.
    #[error("disc body: {field} = {value} is out of range ({range})")]
    OutOfRange {
        /// Name of the field.
        field: &'static str,
        /// The offending value.
        value: f64,
        /// The allowed range, in words.
        range: &'static str,
    },
}
