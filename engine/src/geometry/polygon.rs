//! Plain polygon algorithms on (r, z) points: area, simplicity, convexity, point location.
use super::RzPoint;

/// Signed area of a closed polygon (shoelace formula), m²; positive when counter-clockwise in
/// the (r, z) plane with r to the right and z up.
pub fn signed_area_m2(points: &[RzPoint]) -> f64 {
    edges(points).map(|(a, b)| a.cross(b)).sum::<f64>() / 2.0
}

/// The closed polygon's edges as (start, end) pairs, the last edge returning to the first point.
pub(crate) fn edges(points: &[RzPoint]) -> impl Iterator<Item = (RzPoint, RzPoint)> + '_ {
    let n = points.len();
    (0..n).map(move |i| (points[i], points[(i + 1) % n]))
}

/// Drops consecutive repeated points and a final point that repeats the first.
pub(crate) fn without_repeats(points: &[RzPoint]) -> Vec<RzPoint> {
    let mut kept: Vec<RzPoint> = Vec::with_capacity(points.len());
    for &p in points {
        if kept.last() != Some(&p) {
            kept.push(p);
        }
    }
    while kept.len() > 1 && kept.first() == kept.last() {
        kept.pop();
    }
    kept
}

/// The first pair of edges found (edge i runs from point i to point i+1) that cross, touch,
/// overlap or fold back onto each other; `None` for a simple polygon. Sweeps the edges in
/// order of their smallest r so only edges whose bounding boxes overlap are compared.
pub(crate) fn first_self_intersection(points: &[RzPoint]) -> Option<(usize, usize)> {
    let boxes: Vec<[f64; 4]> = edges(points).map(|(a, b)| bounding_box(a, b)).collect();
    let mut order: Vec<usize> = (0..points.len()).collect();
    order.sort_by(|&a, &b| boxes[a][0].total_cmp(&boxes[b][0]));
    for (k, &i) in order.iter().enumerate() {
        for &j in &order[k + 1..] {
            if boxes[j][0] > boxes[i][1] {
                break;
            }
            if boxes_overlap(&boxes[i], &boxes[j]) && edges_conflict(points, i.min(j), i.max(j)) {
                return Some((i.min(j), i.max(j)));
            }
        }
    }
    None
}

fn edges_conflict(points: &[RzPoint], i: usize, j: usize) -> bool {
    let n = points.len();
    let (a0, a1) = (points[i], points[(i + 1) % n]);
    let (b0, b1) = (points[j], points[(j + 1) % n]);
    if j == i + 1 {
        return folds_back(a0, a1, b1);
    }
    if i == 0 && j == n - 1 {
        return folds_back(b0, b1, a1);
    }
    segments_touch(a0, a1, b0, b1)
}

/// Whether the path a → b → c turns back on itself (collinear, reversing direction).
fn folds_back(a: RzPoint, b: RzPoint, c: RzPoint) -> bool {
    let (u, v) = (b.minus(a), c.minus(b));
    u.cross(v) == 0.0 && u.dot(v) < 0.0
}

fn bounding_box(a: RzPoint, b: RzPoint) -> [f64; 4] {
    [a.r_m.min(b.r_m), a.r_m.max(b.r_m), a.z_m.min(b.z_m), a.z_m.max(b.z_m)]
}

fn boxes_overlap(a: &[f64; 4], b: &[f64; 4]) -> bool {
    a[0] <= b[1] && b[0] <= a[1] && a[2] <= b[3] && b[2] <= a[3]
}

/// Whether closed segments [a0, a1] and [b0, b1] share at least one point.
fn segments_touch(a0: RzPoint, a1: RzPoint, b0: RzPoint, b1: RzPoint) -> bool {
    let d1 = orientation(b0, b1, a0);
    let d2 = orientation(b0, b1, a1);
    let d3 = orientation(a0, a1, b0);
    let d4 = orientation(a0, a1, b1);
    if d1 * d2 < 0.0 && d3 * d4 < 0.0 {
        return true;
    }
    (d1 == 0.0 && on_segment(b0, b1, a0))
        || (d2 == 0.0 && on_segment(b0, b1, a1))
        || (d3 == 0.0 && on_segment(a0, a1, b0))
        || (d4 == 0.0 && on_segment(a0, a1, b1))
}

fn orientation(a: RzPoint, b: RzPoint, p: RzPoint) -> f64 {
    b.minus(a).cross(p.minus(a))
}

fn on_segment(a: RzPoint, b: RzPoint, p: RzPoint) -> bool {
    p.r_m >= a.r_m.min(b.r_m)
        && p.r_m <= a.r_m.max(b.r_m)
        && p.z_m >= a.z_m.min(b.z_m)
        && p.z_m <= a.z_m.max(b.z_m)
}

/// Heights (m) at which the vertical line r = `r_m` crosses the polygon's edges, sorted upward.
pub(crate) fn vertical_crossings(points: &[RzPoint], r_m: f64) -> Vec<f64> {
    let mut heights: Vec<f64> = edges(points)
        .filter(|(a, b)| (a.r_m <= r_m) != (b.r_m <= r_m))
        .map(|(a, b)| a.z_m + (r_m - a.r_m) / (b.r_m - a.r_m) * (b.z_m - a.z_m))
        .collect();
    heights.sort_by(f64::total_cmp);
    heights
}

#[cfg(test)]
mod tests {
    use super::*;

    fn square() -> Vec<RzPoint> {
        [(0.0, 0.0), (1.0, 0.0), (1.0, 1.0), (0.0, 1.0)].map(|(r, z)| RzPoint::new(r, z)).to_vec()
    }

    #[test]
    fn unit_square_area_is_one() {
        assert_eq!(signed_area_m2(&square()), 1.0);
    }

    #[test]
    fn bow_tie_is_found() {
        let pts = [(0.0, 0.0), (1.0, 1.0), (1.0, 0.0), (0.0, 1.0)].map(|(r, z)| RzPoint::new(r, z));
        assert!(first_self_intersection(&pts).is_some());
        assert!(first_self_intersection(&square()).is_none());
    }

    #[test]
    fn spike_folding_back_is_found() {
        let pts = [(0.0, 0.0), (2.0, 0.0), (1.0, 0.0), (1.0, 1.0)].map(|(r, z)| RzPoint::new(r, z));
        assert!(first_self_intersection(&pts).is_some());
    }

    #[test]
    fn crossings_of_square() {
        assert_eq!(vertical_crossings(&square(), 0.5), vec![0.0, 1.0]);
    }
}
