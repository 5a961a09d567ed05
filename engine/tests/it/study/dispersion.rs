//! Dispersion statistics against analytic values, on a synthetic "flight" linear in normal
//! inputs (the Monte Carlo machinery is generic over the function evaluated).
use rand_distr::{Distribution, StandardNormal};

use super::*;

/// Landing = A z + b for z ~ N(0, I₂): covariance A Aᵀ exactly.
const A: [[f64; 2]; 2] = [[6.0, 1.5], [-2.0, 3.0]];
const B: [f64; 2] = [80.0, -4.0];

fn linear_draws(n: usize, seed: u64, shard: Shard) -> Vec<DrawRow> {
    monte_carlo(n, seed, shard, StudyControl::none(), |rng| {
        let z: [f64; 2] = [StandardNormal.sample(rng), StandardNormal.sample(rng)];
        let landing_m = [A[0][0] * z[0] + A[0][1] * z[1] + B[0], A[1][0] * z[0] + A[1][1] * z[1] + B[1]];
        Ok(DrawOutcome { landing_m, rest_m: None, carry_m: landing_m[0].hypot(landing_m[1]), time_aloft_s: 0.0 })
    })
    .unwrap()
}

fn analytic_covariance() -> [[f64; 2]; 2] {
    let c = |i: usize, j: usize| A[i][0] * A[j][0] + A[i][1] * A[j][1];
    [[c(0, 0), c(0, 1)], [c(1, 0), c(1, 1)]]
}

#[test]
fn ellipse_axes_match_the_analytic_covariance_within_sampling_error() {
    let n = 20_000;
    let rows = linear_draws(n, 11, Shard::whole());
    let points: Vec<[f64; 2]> = rows.iter().map(|r| r.outcome.unwrap().landing_m).collect();
    let stats = scatter_stats(&points).unwrap();
    let (eig, angle) = symmetric_eigen(analytic_covariance());
    // Sampling error of a variance from n normal draws: relative sd √(2/(n − 1)) (source: Cramér
    // (1946), Mathematical Methods of Statistics, the variance of the sample variance); allow 4 sd.
    let tolerance = 4.0 * (2.0 / (n as f64 - 1.0)).sqrt();
    for k in 0..2 {
        assert!((stats.eigenvalues_m2[k] / eig[k] - 1.0).abs() < tolerance, "{:?} vs {eig:?}", stats.eigenvalues_m2);
    }
    // Semi-axes √(χ²₂(p) λ) with χ²₂(0.5) = 2 ln 2 and χ²₂(0.95) = −2 ln 0.05 (source: the χ²
    // distribution with 2 degrees of freedom is exponential with mean 2; exact).
    assert!((CHI2_2DOF_50 - 2.0 * 2f64.ln()).abs() < 1e-15 && (CHI2_2DOF_95 + 2.0 * 0.05f64.ln()).abs() < 1e-15);
    let expected_95 = (CHI2_2DOF_95 * eig[0]).sqrt();
    assert!((stats.ellipse_95.semi_major_m / expected_95 - 1.0).abs() < tolerance);
    assert!((stats.ellipse_50.semi_minor_m / (CHI2_2DOF_50 * eig[1]).sqrt() - 1.0).abs() < tolerance);
    assert!((stats.ellipse_95.angle_deg - angle.to_degrees()).abs() < 2.0, "{} vs {}", stats.ellipse_95.angle_deg, angle.to_degrees());
    for (ellipse, level) in [(stats.ellipse_50, 0.5), (stats.ellipse_95, 0.95)] {
        let share = share_inside(&points, &stats, ellipse.level) ;
        // Binomial sampling error √(p(1 − p)/n); allow 4 sd (source: common practice).
        assert!((share - level).abs() < 4.0 * (level * (1.0 - level) / n as f64).sqrt(), "{share} inside the {level} ellipse");
    }
}

fn share_inside(points: &[[f64; 2]], s: &ScatterStats, level: f64) -> f64 {
    let chi2 = if level == 0.5 { CHI2_2DOF_50 } else { CHI2_2DOF_95 };
    let c = s.covariance_m2;
    let det = c[0][0] * c[1][1] - c[0][1] * c[1][0];
    let inside = points
        .iter()
        .filter(|p| {
            let (dx, dy) = (p[0] - s.mean_m[0], p[1] - s.mean_m[1]);
            (c[1][1] * dx * dx - 2.0 * c[0][1] * dx * dy + c[0][0] * dy * dy) / det <= chi2
        })
        .count();
    inside as f64 / points.len() as f64
}

#[test]
fn zones_count_landings_inside_circles_corridors_and_polygons() {
    let points = [[10.0, 0.0], [20.0, 3.0], [30.0, -9.0], [40.0, 0.5]];
    let circle = Zone::Circle { centre_m: [20.0, 0.0], radius_m: 10.5 };
    assert_eq!(circle.share_inside(&points), 0.5);
    let corridor = Zone::Corridor { centre_line_m: vec![[0.0, 0.0], [50.0, 0.0]], half_width_m: 4.0 };
    assert_eq!(corridor.share_inside(&points), 0.75);
    let polygon = Zone::Polygon { points_m: vec![[15.0, -10.0], [35.0, -10.0], [35.0, 10.0], [15.0, 10.0]] };
    assert_eq!(polygon.share_inside(&points), 0.5);
}

#[test]
fn flight_dispersion_summary_reports_scatter_zone_shares_and_the_caution() {
    let spec = DispersionSpec {
        throws: 16,
        seed: 5,
        scatter: vec![Scatter { input: "throw.hyzer_deg".into(), spread: Spread::Normal { sd: 6.0 } }],
        gust_intensity: None,
        zones: vec![Zone::Corridor { centre_line_m: vec![[0.0, 0.0], [150.0, 0.0]], half_width_m: 1e3 }],
    };
    let mut case = demo_case();
    case.ground = Some(Ground::level(SurfacePreset::ShortGrass));
    let result = run_dispersion(&case, &spec, Shard::whole(), StudyControl::none()).unwrap();
    let summary = result.summary.unwrap();
    assert_eq!(summary.flown, 16);
    assert!(summary.rest.is_some() && summary.zones[0].rest_share == Some(1.0));
    assert_eq!(summary.zones[0].landing_share, 1.0);
    assert!(summary.caution.contains("Keep clear of the throwing lane"));
    assert!(summary.landing.unwrap().sd_m[1] > 1.0, "roll scatter spreads landings sideways");
}

/// A dispersion of the invented overmold design thrown by an independent effort, with normal
/// scatter of `sd_j` on the effort's linear work.
fn effort_dispersion(sd_j: f64) -> DispersionResult {
    let mut case = design_case();
    case.effort = Some(Effort::Independent(IndependentEffort { linear_work_j: 45.0, wrist_torque_n_m: 2.0, wrist_turn_rad: 1.5, arm_mass_kg: 0.4 }));
    let spec = DispersionSpec {
        throws: 24,
        seed: 3,
        scatter: vec![Scatter { input: "effort.work_j".into(), spread: Spread::Normal { sd: sd_j } }],
        gust_intensity: None,
        zones: Vec::new(),
    };
    run_dispersion(&case, &spec, Shard::whole(), StudyControl::none()).unwrap()
}

#[test]
fn scatter_on_an_effort_spreads_the_landings_and_none_gives_none() {
    let sd_x = |r: &DispersionResult| r.summary.as_ref().unwrap().landing.unwrap().sd_m[0];
    let (none, some, more) = (effort_dispersion(0.0), effort_dispersion(2.0), effort_dispersion(6.0));
    assert_eq!(none.summary.as_ref().unwrap().failed, 0);
    // No scatter: every throw is the same flight (deterministic integrator; definition).
    assert!(sd_x(&none) < 1e-9, "{}", sd_x(&none));
    // More work scatter, more carry scatter: speed ∝ √W, so carry spreads roughly in proportion
    // to the work's sd for small scatter (source: work–energy theorem; common practice).
    assert!(sd_x(&some) > 0.5, "{}", sd_x(&some));
    assert!(sd_x(&more) > 2.0 * sd_x(&some), "{} vs {}", sd_x(&more), sd_x(&some));
    eprintln!("effort work sd 0/2/6 J → landing sd x {:.3}/{:.3}/{:.3} m", sd_x(&none), sd_x(&some), sd_x(&more));
}

#[test]
fn scatter_on_release_speed_of_an_effort_throw_is_refused_by_name() {
    let mut case = design_case();
    case.effort = Some(Effort::Independent(IndependentEffort { linear_work_j: 45.0, wrist_torque_n_m: 2.0, wrist_turn_rad: 1.5, arm_mass_kg: 0.4 }));
    let spec = DispersionSpec {
        throws: 4,
        seed: 1,
        scatter: vec![Scatter { input: "throw.speed_mps".into(), spread: Spread::Normal { sd: 1.0 } }],
        gust_intensity: None,
        zones: Vec::new(),
    };
    let err = run_dispersion(&case, &spec, Shard::whole(), StudyControl::none()).unwrap_err();
    assert!(matches!(&err, StudyError::NotApplicable { name, reason } if name == "throw.speed_mps" && reason.contains("effort.work_j")), "{err}");
    assert!(demo_case().set("throw.speed_mps", 20.0).is_ok());
}
