use serde::{Deserialize, Serialize};

/// A family of parametric outlines; each has its own default dimensions.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
pub enum DiscFamily {
    /// Deep rim, narrow blunt nose: slow, straight flights.
    Putter,
    /// Moderate rim width and depth.
    Midrange,
    /// Wide, shallow rim with a low, sharper nose: fast flights.
    Driver,
}

/// Default dimensions of a family, m, in the order of
/// [`Dimension::ALL`](super::Dimension::ALL): diameter, rim width, rim depth, rim thickness,
/// plate thickness, dome height, leading-edge radius, parting-line height.
/// Invented values in the usual range of the sport, no published source.
pub(crate) fn family_defaults(family: DiscFamily) -> [f64; 8] {
    match family {
        DiscFamily::Putter => [0.212, 0.0100, 0.0150, 0.0100, 0.0022, 0.0010, 0.0040, 0.0065],
        DiscFamily::Midrange => [0.215, 0.0130, 0.0130, 0.0080, 0.0020, 0.0015, 0.0030, 0.0050],
        DiscFamily::Driver => [0.211, 0.0220, 0.0120, 0.0075, 0.0019, 0.0020, 0.0022, 0.0048],
    }
}
