//! Checks of a disc against the sport's technical standard ([`check_standard`]). They are
//! warnings naming the rule, its source, the value and the margin; never errors.
mod check;
mod rule;

pub use check::{check_standard, standard_warnings, StandardCheck, MAX_MASS_PER_DIAMETER_G_CM};
pub use rule::StandardRule;
