//! Option maps: `#{ key_unit: value }` arguments, checked in one place.
//!
//! Every domain function that takes options declares them as a list of [`OptionSpec`]; the same
//! list checks a call ([`read_options`]), documents the function (`help`) and feeds completion.
mod spec;
mod values;

pub(crate) use spec::{fmt_num, fmt_short};
pub use spec::{OptionKind, OptionSpec};
pub use values::{read_options, OptionValues};
