//! Integration tests: how charts draw their data lines — at sub-pixel precision (no stair
//! steps), clipped to the plot, ground play dashed in each flight's colour, and grouped lines
//! coloured by group and dashed by measure.

use roxmltree::{Document, Node};
use spinfoil_lang::*;

fn svg_of(chart: &impl Render) -> String {
    chart.render().data.get("image/svg+xml").expect("bundle has image/svg+xml").clone()
}

fn parse(text: &str) -> Document<'_> {
    Document::parse(text).unwrap_or_else(|e| panic!("SVG does not parse: {e}"))
}

fn polylines<'a>(doc: &'a Document) -> Vec<Node<'a, 'a>> {
    doc.descendants().filter(|n| n.has_tag_name("polyline")).collect()
}

/// The (x, y) pixel pairs of a polyline's `points`.
fn points_of(line: &Node) -> Vec<(f64, f64)> {
    let pair = |p: &str| p.split_once(',').and_then(|(x, y)| Some((x.parse().ok()?, y.parse().ok()?)));
    line.attribute("points").unwrap_or("").split_whitespace().filter_map(pair).collect()
}

fn attribute(node: &Node, name: &str) -> String {
    node.attribute(name).unwrap_or("").to_string()
}

/// A gentle fade: y = 0.002 x² m over 80 m, 200 points (a rise of 12.8 m).
fn gentle_curve() -> Vec<(f64, f64)> {
    (0..200).map(|i| f64::from(i) * 0.4).map(|x| (x, 0.002 * x * x)).collect()
}

#[test]
fn stair_steps_a_gentle_curve_is_drawn_with_fractional_pixels_and_no_flat_runs() {
    // Regression: plotters' SVG backend rounded every point to whole pixels, so a gently
    // curving ground track came out as horizontal steps.
    let text = svg_of(&PlanView::new("Gentle fade").track(Track::new("P-7", gentle_curve())));
    let doc = parse(&text);
    let line = polylines(&doc).into_iter().find(|l| points_of(l).len() == 200).expect("the track as one polyline");
    let points = points_of(&line);
    let fractional = points.iter().filter(|(x, y)| x.fract() != 0.0 || y.fract() != 0.0).count();
    assert!(fractional > 150, "only {fractional} of 200 points have fractional pixels");
    // y rises monotonically (screen y falls) at every step of the curve: no flat stair treads.
    let flat = points.windows(2).skip(20).filter(|w| (w[1].1 - w[0].1).abs() < 1e-9).count();
    assert_eq!(flat, 0, "flat runs in a strictly rising curve: {flat}");
}

#[test]
fn data_lines_are_clipped_to_the_plotting_area_and_keep_the_axes_mapping() {
    let text = svg_of(&PlanView::new("Clip").track(Track::new("P-7", gentle_curve()).landing((79.6, 12.67))));
    let doc = parse(&text);
    let line = polylines(&doc).into_iter().find(|l| points_of(l).len() == 200).expect("track");
    let viewport = line.parent().expect("parent");
    assert!(viewport.has_tag_name("svg") && viewport.attribute("viewBox").is_some(), "a nested viewport clips the line");
    let number = |name: &str| attribute(&viewport, name).parse::<f64>().expect(name);
    let (x, y, w, h) = (number("x"), number("y"), number("width"), number("height"));
    for (px, py) in points_of(&line) {
        assert!((x..=x + w).contains(&px) && (y..=y + h).contains(&py), "({px}, {py}) outside the plot");
    }
    // The line ends where plotters draws the landing marker (a whole-pixel circle): within half
    // a pixel along each axis.
    let end = *points_of(&line).last().expect("points");
    let dots: Vec<(f64, f64)> = doc.descendants().filter(|n| n.has_tag_name("circle"))
        .filter_map(|n| Some((n.attribute("cx")?.parse().ok()?, n.attribute("cy")?.parse().ok()?))).collect();
    let nearest = dots.iter().map(|(cx, cy)| (cx - end.0).hypot(cy - end.1)).fold(f64::INFINITY, f64::min);
    assert!(nearest <= 0.75, "landing marker {nearest} px from the line's end");
}

#[test]
fn every_line_chart_kind_draws_fractional_pixels() {
    let curve = gentle_curve();
    let charts: Vec<(&str, String)> = vec![
        ("side view", svg_of(&SideView::new("s").track(Track::new("P-7", curve.clone())))),
        ("line chart", svg_of(&LineChart::new("l", Axis::new("x", "m"), Axis::new("y", "m")).series(Series::new("P-7", curve.clone())))),
        ("time series", svg_of(&TimeSeries::new("t").panel(Panel::new(Axis::new("roll", "°")).series(Series::new("P-7", curve.clone()))))),
        ("coefficients", svg_of(&CoefficientCurves::new("c", "demo").curve("C_L", curve.clone()))),
        ("grouped lines", svg_of(&GroupedLines::new("g", Axis::new("x", "m"), Axis::new("y", "m")).line("P-7", "turn", curve.clone()))),
    ];
    for (kind, text) in charts {
        let doc = parse(&text);
        let line = polylines(&doc).into_iter().find(|l| points_of(l).len() == 200).unwrap_or_else(|| panic!("{kind}: no data line"));
        let fractional = points_of(&line).iter().filter(|(x, y)| x.fract() != 0.0 || y.fract() != 0.0).count();
        assert!(fractional > 150, "{kind}: {fractional} of 200 points fractional");
    }
}

/// Two flights, each with landing and rest; the first with a curved ground path.
fn flights_with_ground_play() -> PlanView {
    let track = |label: &str, shift: f64| Track::new(label, gentle_curve().iter().map(|(x, y)| (*x, y + shift)).collect());
    // The path starts 0.5 m past the landing point: the chart joins it to the landing dot.
    let ground: Vec<(f64, f64)> = (1..=10).map(|i| f64::from(i) * 0.5).map(|s| (79.6 + s, 12.67 + shift_arc(s))).collect();
    PlanView::new("Ground play")
        .track(track("P-7 one-piece", 0.0).landing((79.6, 12.67)).rest(*ground.last().expect("ground")).ground(ground))
        .track(track("P-7 rim-heavy", -3.0).landing((79.6, 9.67)).rest((84.0, 11.0)))
}

fn shift_arc(s: f64) -> f64 {
    0.3 * s * s
}

#[test]
fn plan_view_draws_each_ground_play_dashed_in_its_flight_colour_and_names_it() {
    let text = svg_of(&flights_with_ground_play());
    let doc = parse(&text);
    let lines = polylines(&doc);
    let flight_colours: Vec<String> = lines.iter().filter(|l| points_of(l).len() == 200).map(|l| attribute(l, "stroke")).collect();
    let dashed: Vec<&Node> = lines.iter().filter(|l| l.attribute("stroke-dasharray").is_some()).collect();
    assert_eq!(dashed.len(), 2, "one dashed ground-play line per flight");
    let colour_of = |points: usize| dashed.iter().find(|l| points_of(l).len() == points).map(|l| attribute(l, "stroke")).expect("line");
    assert_eq!(colour_of(11), flight_colours[0], "the given ground path, in the first flight's colour");
    assert_eq!(colour_of(2), flight_colours[1], "landing to rest, straight, in the second flight's colour");
    let texts: Vec<String> = doc.descendants().filter(|n| n.has_tag_name("text")).map(|n| n.text().unwrap_or("").trim().to_string()).collect();
    assert!(texts.iter().any(|t| t == "ground play (contact to rest)"), "legend names the ground play: {texts:?}");
}

#[test]
fn plan_view_without_rest_points_draws_no_ground_play() {
    let text = svg_of(&PlanView::new("No rest").track(Track::new("P-7", gentle_curve()).landing((79.6, 12.67))));
    let doc = parse(&text);
    assert!(polylines(&doc).iter().all(|l| l.attribute("stroke-dasharray").is_none()), "no dashed line");
    assert!(!text.contains("ground play"), "no legend entry for ground play");
}

#[test]
fn track_legend_marks_are_neutral_and_shaped_as_drawn() {
    let text = svg_of(&flights_with_ground_play());
    let doc = parse(&text);
    // The legend's first-ground-contact dot is grey, unlike every flight colour.
    let flight_colours: Vec<String> = polylines(&doc).iter().filter(|l| points_of(l).len() == 200).map(|l| attribute(l, "stroke")).collect();
    let legend_dots: Vec<String> = doc.descendants().filter(|n| n.has_tag_name("circle")).map(|n| attribute(&n, "fill")).collect();
    assert!(legend_dots.iter().any(|fill| !flight_colours.contains(fill) && fill != "#FCFBF8"), "a neutral legend dot: {legend_dots:?}");
    // The release point's key is the triangle drawn at the thrower: pointing right.
    let triangles: Vec<Vec<(f64, f64)>> = doc.descendants().filter(|n| n.has_tag_name("polygon")).map(|n| points_of(&n)).filter(|p| p.len() == 3).collect();
    assert!(triangles.len() >= 2, "thrower and its legend key");
    for corners in triangles {
        let right = corners.iter().map(|p| p.0).fold(f64::MIN, f64::max);
        let tips = corners.iter().filter(|p| p.0 == right).count();
        assert_eq!(tips, 1, "a right-pointing triangle has one rightmost corner: {corners:?}");
    }
}

/// Two designs with identical numbers, each with a turn and a fade line.
fn twin_designs() -> GroupedLines {
    let turn = vec![(16.0, -1.0), (20.0, -4.0), (24.0, -11.0), (28.0, -20.0)];
    let fade = vec![(16.0, 28.0), (20.0, 42.0), (24.0, 25.0), (28.0, -38.0)];
    let mut chart = GroupedLines::new("Turn and fade", Axis::new("release speed", "m/s"), Axis::new("angle", "°"));
    for design in ["P-7 one-piece", "P-7 rim-heavy"] {
        chart = chart.line(design, "greatest turn bank", turn.clone()).line(design, "fade hook after apex", fade.clone());
    }
    chart
}

#[test]
fn grouped_lines_colour_by_group_and_dash_by_measure() {
    let text = svg_of(&twin_designs());
    let doc = parse(&text);
    let lines: Vec<Node> = polylines(&doc).into_iter().filter(|l| points_of(l).len() == 4).collect();
    assert_eq!(lines.len(), 4, "two measures for two designs");
    // Drawn design by design: [design 0 turn, design 0 fade, design 1 turn, design 1 fade].
    let stroke = |i: usize| attribute(&lines[i], "stroke");
    let dash = |i: usize| attribute(&lines[i], "stroke-dasharray");
    assert_eq!(stroke(0), stroke(1), "both measures of a design share its colour");
    assert_eq!(stroke(2), stroke(3));
    assert_ne!(stroke(0), stroke(2), "designs differ in colour");
    assert_ne!(dash(0), dash(1), "measures differ in dash");
    assert_eq!(dash(0), dash(2), "a measure keeps its dash across designs");
    assert_eq!(dash(1), dash(3));
}

#[test]
fn grouped_lines_of_equal_numbers_stay_apart() {
    let text = svg_of(&twin_designs());
    let doc = parse(&text);
    let lines: Vec<Node> = polylines(&doc).into_iter().filter(|l| points_of(l).len() == 4).collect();
    let width = |i: usize| attribute(&lines[i], "stroke-width").parse::<f64>().expect("width");
    assert!(width(0) > width(2) + 1.0, "the first design drawn wider, under the second: {} vs {}", width(0), width(2));
    // Markers: circles for the first design, squares (4-corner polygons) for the second.
    let squares = doc.descendants().filter(|n| n.has_tag_name("polygon") && points_of(n).len() == 4).count();
    let circles = doc.descendants().filter(|n| n.has_tag_name("circle")).count();
    assert!(squares >= 8 && circles >= 8, "markers at every point of both designs: {squares} squares, {circles} circles");
}

#[test]
fn grouped_lines_legend_names_each_group_and_measure_once() {
    let text = svg_of(&twin_designs());
    let doc = parse(&text);
    let texts: Vec<String> = doc.descendants().filter(|n| n.has_tag_name("text")).map(|n| n.text().unwrap_or("").trim().to_string()).collect();
    for wanted in ["P-7 one-piece", "P-7 rim-heavy", "greatest turn bank", "fade hook after apex"] {
        assert_eq!(texts.iter().filter(|t| *t == wanted).count(), 1, "{wanted:?} once in {texts:?}");
    }
    assert!(!texts.iter().any(|t| t.contains(':')), "no design-measure combinations in the legend: {texts:?}");
}

#[test]
fn plan_view_side_labels_sit_at_the_throwers_end_away_from_the_landings() {
    let text = svg_of(&flights_with_ground_play());
    let doc = parse(&text);
    for label in ["▲ LEFT of thrower", "▼ RIGHT of thrower"] {
        let node = doc.descendants().find(|n| n.has_tag_name("text") && n.text().map(str::trim) == Some(label)).expect(label);
        let x: f64 = attribute(&node, "x").parse().expect("x");
        assert!(x < 200.0, "{label} at x = {x} px, not by the landings on the right");
    }
}

#[test]
fn grouped_lines_legend_gives_measures_a_row_of_their_own_when_it_wraps() {
    let mut chart = GroupedLines::new("Turn and fade", Axis::new("release speed", "m/s"), Axis::new("angle", "°"));
    for design in ["Kestrel one-piece", "Kestrel overmold", "Heron midrange"] {
        chart = chart.line(design, "greatest turn bank", vec![(16.0, -1.0), (28.0, -9.0)]).line(design, "fade hook after apex", vec![(16.0, 30.0), (28.0, 50.0)]);
    }
    let text = svg_of(&chart);
    let doc = parse(&text);
    let y_of = |label: &str| {
        let node = doc.descendants().find(|n| n.has_tag_name("text") && n.text().map(str::trim) == Some(label)).expect(label);
        attribute(&node, "y").parse::<f64>().expect("y")
    };
    assert!(y_of("greatest turn bank") > y_of("Heron midrange"), "measures start a new row");
    assert_eq!(y_of("greatest turn bank"), y_of("fade hook after apex"), "measures share their row");
}
