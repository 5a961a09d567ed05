//! A sequential colour scale for heat maps: perceptually ordered dark blue-violet → teal →
//! yellow, readable with the common colour-vision deficiencies. Anchors approximate the
//! viridis map of van der Walt & Smith (2015), matplotlib's default colour map (value from
//! memory, unverified); interpolation between anchors is linear in RGB.

use plotters::style::RGBColor;

const ANCHORS: [(f64, [f64; 3]); 5] = [
    (0.00, [68.0, 1.0, 84.0]),
    (0.25, [59.0, 82.0, 139.0]),
    (0.50, [33.0, 145.0, 140.0]),
    (0.75, [94.0, 201.0, 98.0]),
    (1.00, [253.0, 231.0, 37.0]),
];

/// The colour of `fraction` ∈ [0, 1] along the scale (clamped; NaN gives the low end).
pub(crate) fn scale_colour(fraction: f64) -> RGBColor {
    let t = if fraction.is_nan() { 0.0 } else { fraction.clamp(0.0, 1.0) };
    let upper = ANCHORS.iter().position(|(at, _)| *at >= t).unwrap_or(ANCHORS.len() - 1).max(1);
    let (t0, c0) = ANCHORS[upper - 1];
    let (t1, c1) = ANCHORS[upper];
    let w = (t - t0) / (t1 - t0);
    let mix = |i: usize| (c0[i] + w * (c1[i] - c0[i])).round() as u8;
    RGBColor(mix(0), mix(1), mix(2))
}

/// True when dark text reads better than white text on `colour` (relative luminance > 0.4).
pub(crate) fn wants_dark_text(colour: RGBColor) -> bool {
    let luminance = 0.2126 * colour.0 as f64 + 0.7152 * colour.1 as f64 + 0.0722 * colour.2 as f64;
    luminance / 255.0 > 0.4
}
