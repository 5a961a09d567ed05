//! Writes one of each chart (and a table) with invented demo data as SVG files into the folder
//! given on the command line, for a look: `cargo run -p spinfoil-lang --example gallery -- out/gallery`.
//! The curves are made-up shapes for an invented workshop's prototypes, not simulation results.

use spinfoil_lang::*;
use std::path::Path;

fn main() -> std::io::Result<()> {
    let folder = std::env::args().nth(1).unwrap_or_else(|| "gallery".to_string());
    let folder = Path::new(&folder);
    std::fs::create_dir_all(folder)?;
    for (name, bundle) in gallery() {
        if let Some(svg) = bundle.data.get("image/svg+xml") {
            std::fs::write(folder.join(format!("{name}.svg")), svg)?;
        }
        if let Some(html) = bundle.data.get("text/html") {
            std::fs::write(folder.join(format!("{name}.html")), html)?;
        }
        println!("{name}:\n{}\n", bundle.text_plain().unwrap_or(""));
    }
    Ok(())
}

fn gallery() -> Vec<(&'static str, MimeBundle)> {
    vec![
        ("plan_view", plan_view().render()),
        ("side_view", side_view().render()),
        ("line_chart", line_chart().render()),
        ("time_series", time_series().render()),
        ("cross_section", cross_section().render()),
        ("mass_bars", mass_bars().render()),
        ("coefficients", coefficients().render()),
        ("heat_map", heat_map().render()),
        ("scatter", scatter().render()),
        ("empty_chart", PlanView::new("A plan view with nothing to show").render()),
        ("table", table().render()),
        ("stress_bars", stress_bars().render()),
        ("stress_plan", stress_plan().render()),
    ]
}

/// One sample of an invented flight: (time s, downrange m, lateral m, height m).
type Sample = (f64, f64, f64, f64);

/// An invented flight path.
fn demo_flight(carry_m: f64, turn_m: f64, fade_m: f64) -> Vec<Sample> {
    (0..=120)
        .map(|step| {
            let s = step as f64 / 120.0;
            let x = carry_m * (1.0 - (1.0 - s).powf(1.6));
            let y = -turn_m * (std::f64::consts::PI * s).sin() * (1.0 - s) + fade_m * s.powi(3);
            let z = 1.5 + 14.0 * (std::f64::consts::PI * s).sin() * (1.0 - 0.4 * s) - 1.5 * s;
            (4.2 * s, x, y, z)
        })
        .collect()
}

fn flights() -> Vec<(&'static str, Vec<Sample>)> {
    vec![
        ("P-7 one-piece", demo_flight(96.0, 9.0, 14.0)),
        ("P-7 rim-heavy", demo_flight(101.0, 4.0, 11.0)),
        ("Q-2 midrange", demo_flight(72.0, 2.0, 6.0)),
    ]
}

fn plan_view() -> PlanView {
    flights().into_iter().fold(PlanView::new("Ground tracks of three prototypes"), |chart, (label, path)| {
        let points: Vec<(f64, f64)> = path.iter().map(|p| (p.1, p.2)).collect();
        let landing = *points.last().unwrap_or(&(0.0, 0.0));
        chart.track(Track::new(label, points).landing(landing).rest((landing.0 + 4.0, landing.1 + 1.5)))
    })
}

fn side_view() -> SideView {
    flights().into_iter().fold(SideView::new("Height along the flight"), |chart, (label, path)| {
        let points: Vec<(f64, f64)> = path.iter().map(|p| (p.1, p.3)).collect();
        let landing = *points.last().unwrap_or(&(0.0, 0.0));
        chart.track(Track::new(label, points).landing(landing))
    })
}

fn line_chart() -> LineChart {
    let chart = LineChart::new("Speed along the flight", Axis::new("time", "s"), Axis::new("speed", "m/s"));
    flights().into_iter().enumerate().fold(chart, |chart, (k, (label, path))| {
        // Invented decays, one time constant per design, so the series are told apart.
        let tau_s = 5.0 + 1.5 * k as f64;
        let points = path.iter().map(|p| (p.0, 24.0 * (-p.0 / tau_s).exp() + 2.0)).collect();
        chart.series(Series::new(label, points))
    })
}

fn table() -> Table {
    Table::new("Carry of three prototypes")
        .column("design", "", 0)
        .column("carry", "m", 1)
        .column("I_z", "g·cm²", 0)
        .row(vec!["P-7 one-piece".into(), 96.04.into(), 6180.0.into()])
        .row(vec!["P-7 rim-heavy".into(), 101.2.into(), 6945.0.into()])
        .row(vec!["Q-2 <midrange> & co".into(), f64::NAN.into(), 5120.0.into()])
        .note("Invented demo values.")
}

fn time_series() -> TimeSeries {
    let mut speed = Panel::new(Axis::new("speed", "m/s"));
    let mut spin = Panel::new(Axis::new("spin", "rpm"));
    let mut roll = Panel::new(Axis::new("roll", "deg"));
    let mut alpha = Panel::new(Axis::new("angle of attack", "deg"));
    for (index, (label, path)) in flights().into_iter().enumerate() {
        let keep = 1.0 + 0.12 * index as f64;
        let times: Vec<f64> = path.iter().map(|p| p.0).collect();
        let curve = |f: &dyn Fn(f64) -> f64| times.iter().map(|t| (*t, f(*t))).collect::<Vec<_>>();
        speed = speed.series(Series::new(label, curve(&|t| 24.0 * (-t / 6.0).exp() + 2.0 * keep)));
        spin = spin.series(Series::new(label, curve(&|t| 1150.0 * keep * (-t / (18.0 * keep)).exp())));
        roll = roll.series(Series::new(label, curve(&|t| 6.0 - 8.0 * (t / 1.4).sin() / keep + 4.0 * t * t / keep)));
        alpha = alpha.series(Series::new(label, curve(&|t| 2.0 + 4.0 * t + index as f64)));
    }
    TimeSeries::new("How the three prototypes fly over time").panel(speed).panel(spin).panel(roll).panel(alpha)
}

fn cross_section() -> CrossSection {
    // An invented two-material driver section, half-section in (r mm, z mm).
    let plate = vec![(0.0, 12.5), (84.0, 11.0), (84.0, 8.6), (0.0, 10.5)];
    let rim = vec![
        (84.0, 11.0), (96.0, 10.2), (102.5, 8.6), (105.5, 5.6), (105.0, 2.6), (102.0, 0.4),
        (96.0, 0.0), (89.0, 0.8), (85.2, 3.2), (84.0, 8.6),
    ];
    CrossSection::new("P-7 rim-heavy: section and layup")
        .region("soft base blend", 0.95, plate)
        .region("dense rim blend", 1.24, rim)
}

fn mass_bars() -> MassBars {
    let quantities = vec!["I_z (about the spin axis)".to_string(), "I_x (about a diameter)".to_string()];
    MassBars::new("Moments of inertia of three prototypes", Axis::new("moment of inertia", "g·cm²"), quantities)
        .group("P-7 one-piece", vec![6180.0, 3150.0])
        .group("P-7 rim-heavy", vec![6945.0, 3520.0])
        .group("Q-2 midrange", vec![5120.0, f64::NAN])
}

fn coefficients() -> CoefficientCurves {
    let alphas: Vec<f64> = (-10..=30).map(|a| a as f64).collect();
    let curve = |f: &dyn Fn(f64) -> f64| alphas.iter().map(|a| (*a, f(a.to_radians()))).collect::<Vec<_>>();
    CoefficientCurves::new("Invented coefficients of the P-7 outline", "Linear model, invented demo constants")
        .curve("C_L lift", curve(&|a| 0.15 + 2.8 * a))
        .curve("C_D drag", curve(&|a| 0.08 + 2.6 * (a + 0.05).powi(2)))
        .curve("C_M pitching moment", curve(&|a| -0.01 + 0.45 * a))
}

fn heat_map() -> HeatMap {
    let speeds: Vec<f64> = (0..7).map(|i| 18.0 + 2.0 * i as f64).collect();
    let hyzers: Vec<f64> = (0..6).map(|j| -10.0 + 4.0 * j as f64).collect();
    let carry = |v: f64, h: f64| if v > 28.0 && h > 8.0 { f64::NAN } else { 3.2 * v + 0.6 * h - 0.05 * h * h };
    let values = hyzers.iter().map(|h| speeds.iter().map(|v| carry(*v, *h)).collect()).collect();
    HeatMap::new("Carry over release speed and hyzer", Axis::new("release speed", "m/s"), Axis::new("hyzer", "deg"), Axis::new("carry", "m"))
        .grid(speeds, hyzers, values)
}

fn scatter() -> ScatterEllipses {
    let mut state = 12345_u64;
    let mut uniform = move || {
        state = state.wrapping_mul(6364136223846793005).wrapping_add(1442695040888963407);
        ((state >> 11) as f64 + 0.5) / (1u64 << 53) as f64
    };
    let mut normal = move || (-2.0 * uniform().ln()).sqrt() * (std::f64::consts::TAU * uniform()).cos();
    let mut cloud = |label: &str, (mx, my): (f64, f64), (sx, sy): (f64, f64)| {
        let points = (0..150).map(|_| (mx + sx * normal(), my + sy * normal() + 0.3 * sx * normal())).collect();
        Series::new(label, points)
    };
    let one = cloud("P-7 one-piece", (96.0, 12.0), (5.0, 3.0));
    let two = cloud("P-7 rim-heavy", (101.0, 9.0), (4.0, 2.5));
    ScatterEllipses::new("Landing points under throw scatter", Axis::new("downrange x", "m"), Axis::new("lateral y", "m"))
        .cloud(one)
        .cloud(two)
}

/// Many designs with long names and a long title: labels must not collide.
fn stress_bars() -> MassBars {
    let quantities = vec!["I_z".to_string(), "I_x".to_string(), "I_x at the rim only".to_string()];
    let title = "Moments of inertia of eight prototypes from the invented workshop's autumn series of test moulds";
    (0..8).fold(MassBars::new(title, Axis::new("moment of inertia", "g·cm²"), quantities), |chart, i| {
        let base = 9000.0 + 650.0 * i as f64;
        chart.group(format!("Prototype {} long name", i + 1), vec![base * 1.52, base * 0.77, base * 0.31])
    })
}

/// Nine flights, more than the palette has colours, fanning left and right.
fn stress_plan() -> PlanView {
    (0..9).fold(PlanView::new("Nine release angles"), |chart, i| {
        let fade = -20.0 + 5.0 * i as f64;
        let points: Vec<(f64, f64)> = demo_flight(80.0 + 2.0 * i as f64, 3.0, fade).iter().map(|p| (p.1, p.2)).collect();
        chart.track(Track::new(format!("hyzer {} deg", -8 + 2 * i), points))
    })
}
