//! Turning a [`ParametricOutline`] into a polygon.
use super::parametric::CORNER_FRACTION;
use super::{DeclaredDimensions, GeometryError, Outline, ParametricOutline, RzPoint, SamplingSettings};
use std::f64::consts::{FRAC_PI_2, PI};

impl ParametricOutline {
    /// Validates the dimensions and samples the section into an [`Outline`] whose curves
    /// deviate from their chords by at most `settings.chord_tolerance_m`. The outline declares
    /// its rim width, rim depth, rim thickness, plate thickness and leading-edge radius.
    pub fn build(&self, settings: &SamplingSettings) -> Result<Outline, GeometryError> {
        settings.validate()?;
        self.validate()?;
        let mut points = self.underside(settings);
        points.extend(self.nose(settings));
        points.extend(self.top(settings));
        Outline::from_points(merge_close(points))?.with_declared(self.declared())
    }

    /// The dimensions an outline built from these parameters declares.
    pub fn declared(&self) -> DeclaredDimensions {
        DeclaredDimensions {
            rim_width_m: Some(self.rim_width_m),
            rim_depth_m: Some(self.rim_depth_m),
            rim_thickness_m: Some(self.rim_thickness_m),
            plate_thickness_m: Some(self.plate_thickness_m),
            leading_edge_radius_m: Some(self.leading_edge_radius_m),
        }
    }

    fn plate_radius_m(&self) -> f64 {
        self.diameter_m / 2.0 - self.rim_width_m
    }

    fn corner_radius_m(&self) -> f64 {
        CORNER_FRACTION * self.rim_width_m.min(self.rim_depth_m)
    }

    fn nose_bottom_m(&self) -> f64 {
        self.parting_line_height_m - self.rim_thickness_m / 2.0
    }

    fn nose_top_m(&self) -> f64 {
        self.parting_line_height_m + self.rim_thickness_m / 2.0
    }

    /// Axis → plate underside → inner rim wall → corner → rim underside, up to the nose bottom.
    fn underside(&self, s: &SamplingSettings) -> Vec<RzPoint> {
        let (ri, d, k) = (self.plate_radius_m(), self.rim_depth_m, self.corner_radius_m());
        let mut pts = s.dome(ri, d + self.dome_height_m, self.dome_height_m);
        pts.extend(s.elliptic_arc(RzPoint::new(ri + k, k), k, k, PI, 1.5 * PI));
        let nose_inner_r = self.diameter_m / 2.0 - self.leading_edge_radius_m;
        pts.extend(s.smooth_step(RzPoint::new(ri + k, 0.0), RzPoint::new(nose_inner_r, self.nose_bottom_m())));
        pts
    }

    /// The nose: rounded lower corner, vertical outer edge, rounded upper corner.
    fn nose(&self, s: &SamplingSettings) -> Vec<RzPoint> {
        let le = self.leading_edge_radius_m;
        let centre_r = self.diameter_m / 2.0 - le;
        let low = RzPoint::new(centre_r, self.nose_bottom_m() + le);
        let high = RzPoint::new(centre_r, self.nose_top_m() - le);
        let mut pts = s.elliptic_arc(low, le, le, -FRAC_PI_2, 0.0);
        pts.extend(s.elliptic_arc(high, le, le, 0.0, FRAC_PI_2));
        pts
    }

    /// Shoulder from the nose top up to the plate top at the inner rim wall, then the plate top
    /// back to the axis.
    fn top(&self, s: &SamplingSettings) -> Vec<RzPoint> {
        let ri = self.plate_radius_m();
        let plate_top = self.rim_depth_m + self.plate_thickness_m;
        let nose_inner_r = self.diameter_m / 2.0 - self.leading_edge_radius_m;
        let mut pts = s.smooth_step(RzPoint::new(nose_inner_r, self.nose_top_m()), RzPoint::new(ri, plate_top));
        let mut dome = s.dome(ri, plate_top + self.dome_height_m, self.dome_height_m);
        dome.reverse();
        pts.extend(dome);
        pts
    }
}

/// Points closer than this to the previous kept point are dropped (curve ends computed twice), m.
const MERGE_DISTANCE_M: f64 = 1e-9;

/// Drops points within [`MERGE_DISTANCE_M`] of the previous kept point, and a last point that
/// is that close to the first.
fn merge_close(points: Vec<RzPoint>) -> Vec<RzPoint> {
    let close = |a: RzPoint, b: RzPoint| (a.r_m - b.r_m).hypot(a.z_m - b.z_m) < MERGE_DISTANCE_M;
    let mut kept: Vec<RzPoint> = Vec::with_capacity(points.len());
    for p in points {
        if kept.last().is_none_or(|&last| !close(last, p)) {
            kept.push(p);
        }
    }
    while kept.len() > 3 && close(kept[0], kept[kept.len() - 1]) {
        kept.pop();
    }
    kept
}
