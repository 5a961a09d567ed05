//! Ear-clipping triangulation of a simple counter-clockwise polygon.
use super::RzPoint;

/// Triangles (each counter-clockwise) covering the simple counter-clockwise polygon exactly.
pub(crate) fn triangulate(polygon: &[RzPoint]) -> Vec<[RzPoint; 3]> {
    let mut remaining: Vec<RzPoint> = polygon.to_vec();
    let mut triangles = Vec::with_capacity(polygon.len().saturating_sub(2));
    while remaining.len() > 3 {
        let Some(ear) = find_ear(&remaining) else { break };
        let n = remaining.len();
        triangles.push([remaining[(ear + n - 1) % n], remaining[ear], remaining[(ear + 1) % n]]);
        remaining.remove(ear);
    }
    if remaining.len() == 3 {
        triangles.push([remaining[0], remaining[1], remaining[2]]);
    }
    triangles
}

fn find_ear(points: &[RzPoint]) -> Option<usize> {
    let n = points.len();
    let convex = |i: usize| {
        let (a, b, c) = (points[(i + n - 1) % n], points[i], points[(i + 1) % n]);
        b.minus(a).cross(c.minus(b)) > 0.0
    };
    (0..n).find(|&i| convex(i) && no_point_inside(points, i)).or_else(|| {
        // Only collinear vertices left as candidates: drop one of them (adds no area).
        (0..n).find(|&i| {
            let (a, b, c) = (points[(i + n - 1) % n], points[i], points[(i + 1) % n]);
            b.minus(a).cross(c.minus(b)) == 0.0
        })
    })
}

fn no_point_inside(points: &[RzPoint], i: usize) -> bool {
    let n = points.len();
    let (a, b, c) = (points[(i + n - 1) % n], points[i], points[(i + 1) % n]);
    points.iter().enumerate().all(|(j, &p)| {
        j == i || j == (i + 1) % n || j == (i + n - 1) % n || p == a || p == b || p == c || !inside_triangle(a, b, c, p)
    })
}

fn inside_triangle(a: RzPoint, b: RzPoint, c: RzPoint, p: RzPoint) -> bool {
    let s1 = b.minus(a).cross(p.minus(a));
    let s2 = c.minus(b).cross(p.minus(b));
    let s3 = a.minus(c).cross(p.minus(c));
    s1 >= 0.0 && s2 >= 0.0 && s3 >= 0.0
}

#[cfg(test)]
mod tests {
    use super::*;
    use crate::geometry::signed_area_m2;

    #[test]
    fn l_shape_triangles_cover_its_area() {
        let l = [(0.0, 0.0), (2.0, 0.0), (2.0, 1.0), (1.0, 1.0), (1.0, 2.0), (0.0, 2.0)].map(|(r, z)| RzPoint::new(r, z));
        let tris = triangulate(&l);
        assert_eq!(tris.len(), 4);
        let total: f64 = tris.iter().map(|t| signed_area_m2(t)).sum();
        assert!((total - 3.0).abs() < 1e-12);
        assert!(tris.iter().all(|t| signed_area_m2(t) >= 0.0));
    }
}
