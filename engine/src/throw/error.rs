use crate::InputRangeError;

/// Invalid throw inputs: a release state, an effort, or the disc it is applied to.
#[derive(Debug, Clone, PartialEq, thiserror::Error)]
#[non_exhaustive]
pub enum ThrowError {
    /// A number is not finite or out of its allowed range.
    #[error("throw: {0}")]
    OutOfRange(#[from] InputRangeError),
}

impl ThrowError {
    /// The offending field's name, e.g. `"speed_mps"`.
    pub fn field(&self) -> &'static str {
        match self {
            ThrowError::OutOfRange(error) => error.field,
        }
    }
}
