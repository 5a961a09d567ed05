//! A fast arctangent for the angle of attack, evaluated once per derivative evaluation.
//!
//! For |x| ≤ 0.66 (|α| up to about 33°, where flights spend nearly all their time) the rational
//! approximation atan x = x + x·z·P(z)/Q(z), z = x², of Moshier (1989), Methods and Programs for
//! Mathematical Functions (the Cephes library, `atan.c`, its innermost range) is used; it is
//! accurate to about one unit in the last place (checked against the standard library below).
//! Outside that range the standard library's `atan` is called.

/// Numerator coefficients P (highest power first).
#[allow(clippy::excessive_precision)] // digits as published in Cephes `atan.c`; they round to the same f64
const P: [f64; 5] = [
    -8.750_608_600_031_904_122_785e-1,
    -1.615_753_718_733_365_076_637e1,
    -7.500_855_792_314_704_667_340e1,
    -1.228_866_684_490_136_173_410e2,
    -6.485_021_904_942_025_371_773e1,
];

/// Denominator coefficients Q (highest power first; the leading 1 is implied).
#[allow(clippy::excessive_precision)] // digits as published in Cephes `atan.c`; they round to the same f64
const Q: [f64; 5] = [
    2.485_846_490_142_306_297_962e1,
    1.650_270_098_316_988_542_046e2,
    4.328_810_604_912_902_668_951e2,
    4.853_903_996_359_136_964_868e2,
    1.945_506_571_482_613_964_425e2,
];

/// Largest |x| handled by the rational approximation.
const RATIONAL_LIMIT: f64 = 0.66;

/// atan(x) in rad, in (−π/2, π/2); within about 2.2e-16 relative of `f64::atan`.
#[inline]
#[allow(clippy::neg_cmp_op_on_partial_ord)] // the negation sends NaN to the standard library
pub(crate) fn atan(x: f64) -> f64 {
    if !(x.abs() <= RATIONAL_LIMIT) {
        return x.atan();
    }
    let z = x * x;
    let p = P.iter().fold(0.0, |acc, &c| acc * z + c);
    let q = Q.iter().fold(1.0, |acc, &c| acc * z + c);
    x + x * (z * p / q)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn agrees_with_the_standard_library() {
        // source: the Rust standard library's f64::atan (the platform's libm), as reference
        let mut worst: f64 = 0.0;
        for k in -100_000..=100_000 {
            let x = k as f64 * 1e-5;
            let exact = x.atan();
            worst = worst.max((atan(x) - exact).abs() / exact.abs().max(f64::MIN_POSITIVE));
        }
        assert!(worst < 4.5e-16, "worst relative error {worst:e}");
        for &x in &[0.0, -0.0, 0.66, -0.66, 0.6600001, 5.0, -1e9, f64::INFINITY, f64::NEG_INFINITY] {
            assert!((atan(x) - x.atan()).abs() <= 2.3e-16 * x.atan().abs(), "{x}");
        }
        assert!(atan(f64::NAN).is_nan());
    }
}
