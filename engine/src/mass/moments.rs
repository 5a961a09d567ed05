//! Exact area integrals ∬ r^p z^q dA over polygons by Green's theorem.
use crate::geometry::polygon::edges;
use crate::geometry::RzPoint;

/// The area integrals of a polygon that the revolved solid's mass properties need (m^k).
#[derive(Debug, Clone, Copy, PartialEq, Default)]
pub struct SectionMoments {
    /// ∬ dA, m².
    pub area_m2: f64,
    /// ∬ r dA, m³ (volume of the revolved solid / 2π).
    pub r_m3: f64,
    /// ∬ r z dA, m⁴ (first moment about z = 0 / 2π).
    pub rz_m4: f64,
    /// ∬ r³ dA, m⁵ (I_z / (2πρ)).
    pub r3_m5: f64,
    /// ∬ r z² dA, m⁵.
    pub rz2_m5: f64,
}

impl SectionMoments {
    /// The integrals of a closed polygon (counter-clockwise gives positive area), m.
    pub fn of_polygon(points: &[RzPoint]) -> Self {
        edges(points).fold(Self::default(), |sum, (a, b)| sum.plus(Self::of_edge(a, b)))
    }

    /// Sum of two sets of integrals.
    pub fn plus(self, o: Self) -> Self {
        Self {
            area_m2: self.area_m2 + o.area_m2,
            r_m3: self.r_m3 + o.r_m3,
            rz_m4: self.rz_m4 + o.rz_m4,
            r3_m5: self.r3_m5 + o.r3_m5,
            rz2_m5: self.rz2_m5 + o.rz2_m5,
        }
    }

    /// One edge's contribution. With c = r0 z1 − r1 z0, the general rule is
    /// ∬ r^p z^q dA = p! q! / (p+q+2)! Σ c Σ_{k≤p, l≤q} C(k+l, l) C(p−k+q−l, q−l) r0^k r1^(p−k) z0^l z1^(q−l),
    /// expanded here for the five integrals (Steger 1996, On the calculation of arbitrary
    /// moments of polygons).
    fn of_edge(a: RzPoint, b: RzPoint) -> Self {
        let (r0, z0, r1, z1) = (a.r_m, a.z_m, b.r_m, b.z_m);
        let c = r0 * z1 - r1 * z0;
        let r0r0 = r0 * r0;
        let r1r1 = r1 * r1;
        Self {
            area_m2: c / 2.0,
            r_m3: c * (r0 + r1) / 6.0,
            rz_m4: c * (r0 * (2.0 * z0 + z1) + r1 * (z0 + 2.0 * z1)) / 24.0,
            r3_m5: c * (r0r0 * r0 + r0r0 * r1 + r0 * r1r1 + r1r1 * r1) / 20.0,
            rz2_m5: c * (r0 * (3.0 * z0 * z0 + 2.0 * z0 * z1 + z1 * z1) + r1 * (z0 * z0 + 2.0 * z0 * z1 + 3.0 * z1 * z1)) / 60.0,
        }
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    /// Rectangle [r_a, r_b] × [z_a, z_b]: each integral factorises into 1-D integrals.
    #[test]
    fn rectangle_integrals_factorise() {
        let (ra, rb, za, zb) = (0.3, 1.7, -0.4, 0.9);
        let rect = [(ra, za), (rb, za), (rb, zb), (ra, zb)].map(|(r, z)| RzPoint::new(r, z));
        let m = SectionMoments::of_polygon(&rect);
        let int = |p: i32, lo: f64, hi: f64| (hi.powi(p + 1) - lo.powi(p + 1)) / (p + 1) as f64;
        let close = |x: f64, y: f64| assert!((x - y).abs() <= 1e-13 * y.abs(), "{x} vs {y}");
        close(m.area_m2, int(0, ra, rb) * int(0, za, zb));
        close(m.r_m3, int(1, ra, rb) * int(0, za, zb));
        close(m.rz_m4, int(1, ra, rb) * int(1, za, zb));
        close(m.r3_m5, int(3, ra, rb) * int(0, za, zb));
        close(m.rz2_m5, int(1, ra, rb) * int(2, za, zb));
    }
}
