//! Clipping a polygon by half-planes and convex polygons (Sutherland–Hodgman). The subject may
//! be non-convex: where the result falls apart into pieces, they stay joined by zero-width
//! bridges along the clip line, which add nothing to areas or to any Green's-theorem integral.
use super::RzPoint;

/// The half-plane of points p with `normal · p ≤ offset` (normal in (r, z), offset in m²·m⁻¹).
#[derive(Debug, Clone, Copy, PartialEq)]
pub(crate) struct HalfPlane {
    normal: RzPoint,
    offset: f64,
}

impl HalfPlane {
    /// Points with r ≥ `r_m`.
    pub fn r_at_least(r_m: f64) -> Self {
        Self { normal: RzPoint::new(-1.0, 0.0), offset: -r_m }
    }
    /// Points with r ≤ `r_m`.
    pub fn r_at_most(r_m: f64) -> Self {
        Self { normal: RzPoint::new(1.0, 0.0), offset: r_m }
    }
    /// Points with z ≥ `z_m`.
    pub fn z_at_least(z_m: f64) -> Self {
        Self { normal: RzPoint::new(0.0, -1.0), offset: -z_m }
    }
    /// Points with z ≤ `z_m`.
    pub fn z_at_most(z_m: f64) -> Self {
        Self { normal: RzPoint::new(0.0, 1.0), offset: z_m }
    }
    /// Points on the left of the directed line a → b (the inside of a counter-clockwise edge).
    pub fn left_of(a: RzPoint, b: RzPoint) -> Self {
        let normal = RzPoint::new(b.z_m - a.z_m, a.r_m - b.r_m);
        Self { normal, offset: normal.dot(a) }
    }

    fn excess(&self, p: RzPoint) -> f64 {
        self.normal.dot(p) - self.offset
    }

    /// The part of `polygon` inside this half-plane (possibly empty).
    pub fn clip(&self, polygon: &[RzPoint]) -> Vec<RzPoint> {
        let n = polygon.len();
        let mut out = Vec::with_capacity(n + 4);
        for i in 0..n {
            let (a, b) = (polygon[i], polygon[(i + 1) % n]);
            let (ea, eb) = (self.excess(a), self.excess(b));
            if ea <= 0.0 {
                out.push(a);
            }
            if (ea < 0.0 && eb > 0.0) || (ea > 0.0 && eb < 0.0) {
                let t = ea / (ea - eb);
                out.push(RzPoint::new(a.r_m + t * (b.r_m - a.r_m), a.z_m + t * (b.z_m - a.z_m)));
            }
        }
        if out.len() < 3 {
            out.clear();
        }
        out
    }
}

/// The part of `polygon` inside all the half-planes (a convex set).
pub(crate) fn clip_all(polygon: &[RzPoint], planes: &[HalfPlane]) -> Vec<RzPoint> {
    let mut current = polygon.to_vec();
    for plane in planes {
        if current.is_empty() {
            break;
        }
        current = plane.clip(&current);
    }
    current
}

/// The half-planes whose intersection is the counter-clockwise convex polygon `convex`.
pub(crate) fn convex_planes(convex: &[RzPoint]) -> Vec<HalfPlane> {
    let n = convex.len();
    (0..n).map(|i| HalfPlane::left_of(convex[i], convex[(i + 1) % n])).collect()
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::geometry::signed_area_m2;

    #[test]
    fn u_shape_clipped_keeps_both_arms() {
        // A U: two 1×3 arms joined by a 3×1 base; cutting at z = 2 leaves two 1×1 pieces.
        let u = [(0.0, 0.0), (3.0, 0.0), (3.0, 3.0), (2.0, 3.0), (2.0, 1.0), (1.0, 1.0), (1.0, 3.0), (0.0, 3.0)]
            .map(|(r, z)| RzPoint::new(r, z));
        let top = HalfPlane::z_at_least(2.0).clip(&u);
        assert!((signed_area_m2(&top) - 2.0).abs() < 1e-12);
    }
}
