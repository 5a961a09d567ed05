//! Integration tests: displays. Tables are checked in their text, HTML, CSV and JSON forms;
//! charts are parsed as SVG (roxmltree) and checked for their series, axis titles, legend
//! entries, scale and fallbacks on empty or non-finite data.

use spinfoil_lang::*;

mod svg {
    //! Small helpers that read a chart's SVG.
    use roxmltree::{Document, Node};

    /// The SVG of a bundle, checked to be there.
    pub fn of(bundle: &spinfoil_lang::MimeBundle) -> String {
        bundle.data.get("image/svg+xml").expect("bundle has image/svg+xml").clone()
    }

    /// Parses SVG text (panics with the parser's message when it is not well-formed).
    pub fn parse(text: &str) -> Document<'_> {
        Document::parse(text).unwrap_or_else(|e| panic!("SVG does not parse: {e}"))
    }

    fn elements<'a>(doc: &'a Document, tag: &'a str) -> impl Iterator<Item = Node<'a, 'a>> + 'a {
        doc.descendants().filter(move |n| n.has_tag_name(tag))
    }

    /// The trimmed content of every `<text>` element.
    pub fn texts(doc: &Document) -> Vec<String> {
        elements(doc, "text").map(|n| n.text().unwrap_or("").trim().to_string()).collect()
    }

    /// True when some text element holds exactly `wanted`.
    pub fn has_text(doc: &Document, wanted: &str) -> bool {
        texts(doc).iter().any(|t| t == wanted)
    }

    /// The number of points of every `<polyline>`.
    pub fn polyline_lengths(doc: &Document) -> Vec<usize> {
        elements(doc, "polyline").map(|n| n.attribute("points").unwrap_or("").split_whitespace().count()).collect()
    }

    /// Polylines with more than `min_points` points (data series rather than grid or ticks).
    pub fn long_polylines(doc: &Document, min_points: usize) -> usize {
        polyline_lengths(doc).into_iter().filter(|n| *n > min_points).count()
    }

    /// The number of elements with this tag.
    pub fn count(doc: &Document, tag: &str) -> usize {
        elements(doc, tag).count()
    }

    /// Numeric text elements as (value, x px, y px).
    pub fn numbers(doc: &Document) -> Vec<(f64, f64, f64)> {
        let parse = |n: &Node, a: &str| n.attribute(a).and_then(|v| v.parse::<f64>().ok());
        elements(doc, "text")
            .filter_map(|n| {
                let value = n.text()?.trim().parse::<f64>().ok()?;
                Some((value, parse(&n, "x")?, parse(&n, "y")?))
            })
            .collect()
    }

    /// Checks the root: width, height and a viewBox so it scales in notebooks.
    pub fn check_root(doc: &Document) {
        let root = doc.root_element();
        assert_eq!(root.tag_name().name(), "svg");
        let width: f64 = root.attribute("width").expect("width").parse().expect("numeric width");
        assert!((700.0..=800.0).contains(&width), "readable at notebook width, got {width}");
        assert!(root.attribute("height").is_some(), "height attribute");
        let view_box = root.attribute("viewBox").expect("viewBox");
        assert!(view_box.starts_with("0 0 "), "viewBox {view_box}");
    }
}

mod tables {
    //! Tables: aligned text, escaped HTML with a units row, CSV and JSON round trips.
    use super::*;

    fn demo() -> Table {
        Table::new("Two prototypes")
            .column("design", "", 0)
            .column("carry", "m", 1)
            .column("I_z", "g·cm²", 0)
            .column("speed", "m/s", 2)
            .row(vec!["P-7 one-piece".into(), 98.24.into(), 6180.4.into(), 24.126.into()])
            .row(vec!["R-1, \"wide\" rim".into(), 101.5.into(), 6945.0.into(), 23.0.into()])
            .note("Invented demo values.")
    }

    #[test]
    fn text_has_units_row_and_right_aligned_numbers() {
        let text = demo().to_text();
        let lines: Vec<&str> = text.lines().collect();
        assert_eq!(lines[0], "Two prototypes");
        assert!(lines[1].starts_with("design") && lines[1].contains("carry"), "{text}");
        assert!(lines[2].contains("[m]") && lines[2].contains("[g·cm²]") && lines[2].contains("[m/s]"), "{text}");
        assert!(lines[4].contains("98.2") && lines[4].contains("6180") && lines[4].contains("24.13"), "{text}");
        // Right alignment: the numbers of each column end in the same character position.
        let end = |line: &str, cell: &str| line.find(cell).map(|i| line[..i].chars().count() + cell.chars().count());
        assert_eq!(end(lines[4], "98.2"), end(lines[5], "101.5"), "{text}");
        assert_eq!(end(lines[4], "24.13"), end(lines[5], "23.00"), "{text}");
        assert_eq!(end(lines[2], "[m/s]"), end(lines[4], "24.13"), "units sit over their numbers:\n{text}");
        assert_eq!(lines.last(), Some(&"Note: Invented demo values."));
    }

    #[test]
    fn html_escapes_text_and_has_a_units_row() {
        let table = Table::new("<script>alert('x')</script> & co")
            .column("name <b>", "", 0)
            .column("mass", "g", 1)
            .row(vec!["a\"b<c>&d".into(), 175.0.into()])
            .note("see <here>");
        let html = table.to_html();
        assert!(!html.contains("<script>") && !html.contains("<b>") && !html.contains("<here>"), "{html}");
        assert!(html.contains("&lt;script&gt;alert(&#39;x&#39;)&lt;/script&gt; &amp; co"), "{html}");
        assert!(html.contains("a&quot;b&lt;c&gt;&amp;d"), "{html}");
        // Well-formed: parse it and look at the header rows.
        let doc = roxmltree::Document::parse(&html).expect("HTML fragment is well-formed");
        let rows: Vec<_> = doc.descendants().filter(|n| n.has_tag_name("tr")).collect();
        assert_eq!(rows.len(), 3, "names row, units row, one body row");
        let units: Vec<&str> = rows[1].children().filter(|n| n.has_tag_name("th")).map(|n| n.text().unwrap_or("")).collect();
        assert_eq!(units, vec!["", "g"]);
        let body: Vec<&str> = rows[2].children().filter(|n| n.has_tag_name("td")).map(|n| n.text().unwrap_or("")).collect();
        assert_eq!(body, vec!["a\"b<c>&d", "175.0"]);
    }

    #[test]
    fn csv_headers_are_name_unit_and_numbers_round_trip_exactly() {
        let table = demo();
        let csv = table.to_csv();
        let mut lines = csv.lines();
        assert_eq!(lines.next(), Some("design,carry_m,i_z_g_cm2,speed_m_per_s"));
        let first: Vec<&str> = lines.next().expect("first row").split(',').collect();
        assert_eq!(first[0], "P-7 one-piece");
        let numbers: Vec<f64> = first[1..].iter().map(|f| f.parse().expect("number")).collect();
        assert_eq!(numbers, vec![98.24, 6180.4, 24.126], "full precision, not the shown decimals");
        let second = lines.next().expect("second row");
        assert!(second.starts_with("\"R-1, \"\"wide\"\" rim\","), "quoted text field: {second}");
    }

    #[test]
    fn json_round_trips_and_non_finite_numbers_become_empty() {
        let table = demo();
        assert_eq!(Table::from_json(&table.to_json()).expect("reads back"), table);
        let with_gap = Table::new("gaps").column("carry", "m", 1).row(vec![f64::NAN.into()]).row(vec![Cell::Empty]);
        let json = with_gap.to_json();
        let value: serde_json::Value = serde_json::from_str(&json).expect("valid JSON");
        assert_eq!(value["rows"][0][0], serde_json::Value::Null);
        assert_eq!(value["columns"][0]["unit"], "m");
        let back = Table::from_json(&json).expect("reads back");
        assert_eq!(back.rows[0][0], Cell::Empty);
        assert_eq!(with_gap.to_csv(), "carry_m\n\n\n");
        assert!(with_gap.to_text().contains('—'), "a dash marks the missing value");
    }

    #[test]
    fn render_gives_text_html_and_json() {
        let bundle = demo().render();
        for mime in ["text/plain", "text/html", "application/json"] {
            assert!(bundle.data.contains_key(mime), "missing {mime}");
        }
        assert!(Table::from_json(&bundle.data["application/json"]).is_ok());
    }

    #[test]
    fn bad_json_is_an_error_not_a_panic() {
        assert!(Table::from_json("{\"title\": 3}").is_err());
        assert!(Table::from_json("not json").is_err());
    }
}

/// An invented curved path of `n` points: (downrange m, lateral m, height m).
fn path(n: usize, carry_m: f64, fade_m: f64) -> Vec<(f64, f64, f64)> {
    (0..n)
        .map(|i| {
            let s = i as f64 / (n - 1) as f64;
            (carry_m * s, -3.0 * (std::f64::consts::PI * s).sin() + fade_m * s * s * s, 1.5 + 12.0 * (std::f64::consts::PI * s).sin() - 1.5 * s)
        })
        .collect()
}

fn plan(tracks: &[(&str, usize, f64)]) -> PlanView {
    tracks.iter().fold(PlanView::new("Ground tracks"), |chart, (label, n, carry)| {
        let points: Vec<(f64, f64)> = path(*n, *carry, 8.0).iter().map(|p| (p.0, p.1)).collect();
        let end = *points.last().expect("points");
        chart.track(Track::new(*label, points).landing(end).rest((end.0 + 3.0, end.1)))
    })
}

mod charts {
    //! Every chart kind: parsed SVG with its series, axis titles, legend entries and style.
    use super::*;

    #[test]
    fn plan_view_has_tracks_titles_legend_sides_and_caution() {
        let chart = plan(&[("P-7 one-piece", 80, 95.0), ("P-7 rim-heavy", 60, 101.0)]);
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        svg::check_root(&doc);
        for wanted in ["Ground tracks", "downrange x (m)", "lateral y (m)", "P-7 one-piece", "P-7 rim-heavy",
                       "release point", "first ground contact", "at rest", "▲ LEFT of thrower", "▼ RIGHT of thrower"] {
            assert!(svg::has_text(&doc, wanted), "missing text {wanted:?} in {:?}", svg::texts(&doc));
        }
        assert!(svg::texts(&doc).iter().any(|t| t.contains("Predictions are estimates.")), "safety caution under a landing-zone chart");
        let mut series: Vec<usize> = svg::polyline_lengths(&doc).into_iter().filter(|n| *n > 10).collect();
        series.sort();
        assert_eq!(series, vec![60, 80], "one polyline per track with all its points");
        assert!(svg::count(&doc, "circle") >= 2, "landing markers");
    }

    /// Pixels per data unit along one axis, from the tick labels that share a row or column.
    fn pixels_per_unit(ticks: &[(f64, f64, f64)], along_x: bool) -> f64 {
        let key = |t: &(f64, f64, f64)| if along_x { t.2 } else { t.1 };
        let mut groups: std::collections::BTreeMap<i64, Vec<(f64, f64, f64)>> = Default::default();
        for tick in ticks {
            groups.entry(key(tick).round() as i64).or_default().push(*tick);
        }
        let row = groups.into_values().max_by_key(|g| g.len()).expect("tick labels");
        let (first, last) = (row[0], row[row.len() - 1]);
        let pixels = if along_x { last.1 - first.1 } else { last.2 - first.2 };
        (pixels / (last.0 - first.0)).abs()
    }

    #[test]
    fn plan_view_draws_both_axes_at_the_same_scale() {
        // A wide, nearly straight flight and a strongly curving one: both must keep 1 m = 1 m.
        for fade in [2.0, 40.0] {
            let points: Vec<(f64, f64)> = path(50, 110.0, fade).iter().map(|p| (p.0, p.1)).collect();
            let text = svg::of(&PlanView::new("scale").track(Track::new("one", points)).render());
            let ticks = svg::numbers(&svg::parse(&text));
            let (x_scale, y_scale) = (pixels_per_unit(&ticks, true), pixels_per_unit(&ticks, false));
            assert!((x_scale / y_scale - 1.0).abs() < 0.04, "x {x_scale} px/m, y {y_scale} px/m (fade {fade} m)");
        }
    }

    #[test]
    fn side_view_has_height_axis_ground_and_stretch_note() {
        let chart = [("low", 40, 60.0), ("high", 50, 90.0)].iter().fold(SideView::new("Height"), |c, (label, n, carry)| {
            let points: Vec<(f64, f64)> = path(*n, *carry, 0.0).iter().map(|p| (p.0, p.2)).collect();
            c.track(Track::new(*label, points))
        });
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        svg::check_root(&doc);
        for wanted in ["downrange x (m)", "height z (m)", "low", "high"] {
            assert!(svg::has_text(&doc, wanted), "missing {wanted:?}");
        }
        assert!(svg::texts(&doc).iter().any(|t| t.contains("taller than downrange")), "says the vertical stretch");
        assert_eq!(svg::long_polylines(&doc, 30), 2);
    }

    #[test]
    fn time_series_has_one_panel_per_quantity_and_shared_colours() {
        let times: Vec<f64> = (0..40).map(|i| i as f64 * 0.1).collect();
        let series = |label: &str, k: f64| Series::new(label, times.iter().map(|t| (*t, k * t)).collect());
        let chart = TimeSeries::new("Over time")
            .panel(Panel::new(Axis::new("speed", "m/s")).series(series("a", 1.0)).series(series("b", 2.0)))
            .panel(Panel::new(Axis::new("spin", "rpm")).series(series("b", 3.0)).series(series("a", 4.0)))
            .panel(Panel::new(Axis::new("wobble", "deg")).series(series("a", 5.0)));
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        for wanted in ["speed (m/s)", "spin (rpm)", "wobble (deg)", "time since release (s)", "a", "b"] {
            assert!(svg::has_text(&doc, wanted), "missing {wanted:?}");
        }
        assert_eq!(svg::long_polylines(&doc, 30), 5, "five series over three panels");
        // Series "a" has one colour in every panel, whatever its position there.
        let doc_lines: Vec<String> = doc.descendants().filter(|n| n.has_tag_name("polyline"))
            .filter(|n| n.attribute("points").map_or(0, |p| p.split_whitespace().count()) > 30)
            .map(|n| n.attribute("stroke").unwrap_or("").to_string()).collect();
        assert_eq!(doc_lines[0], doc_lines[3]);
        assert_eq!(doc_lines[0], doc_lines[4]);
        assert_eq!(doc_lines[1], doc_lines[2]);
    }

    #[test]
    fn cross_section_mirrors_regions_and_names_materials() {
        let plate = vec![(0.0, 12.0), (82.0, 10.5), (84.0, 8.5), (0.0, 10.0)];
        let rim = vec![(82.0, 10.5), (105.5, 6.0), (104.0, -0.5), (96.0, -2.5), (86.0, -1.0), (84.0, 8.5)];
        let chart = CrossSection::new("Section").region("base blend", 0.95, plate).region("rim blend", 1.24, rim);
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        for wanted in ["radius r (mm)", "height z (mm)", "base blend · 0.95 g/cm³", "rim blend · 1.24 g/cm³", "Ø 211.0 mm", "14.5 mm"] {
            assert!(svg::has_text(&doc, wanted), "missing {wanted:?} in {:?}", svg::texts(&doc));
        }
        assert_eq!(svg::count(&doc, "polygon"), 4, "two regions, each mirrored");
        assert!(chart.render().text_plain().unwrap_or("").contains("diameter 211.0 mm"));
    }

    #[test]
    fn mass_bars_label_every_bar_and_design() {
        let chart = MassBars::new("Inertia", Axis::new("moment of inertia", "g·cm²"), vec!["I_z".into(), "I_x".into()])
            .group("one-piece", vec![6180.0, 3150.0])
            .group("rim-heavy", vec![6945.0, 3520.0]);
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        for wanted in ["moment of inertia (g·cm²)", "I_z", "I_x", "one-piece", "rim-heavy", "6180", "3150", "6945", "3520", "+12.4 %", "+11.7 %"] {
            assert!(svg::has_text(&doc, wanted), "missing {wanted:?}");
        }
        let bars = doc.descendants().filter(|n| n.has_tag_name("rect"))
            .filter(|n| n.attribute("fill") == Some("#0072B2") || n.attribute("fill") == Some("#D55E00")).count();
        assert_eq!(bars, 4 + 2 + 1, "four bars, two legend swatches, and the title accent");
    }

    #[test]
    fn coefficient_curves_name_alpha_and_each_coefficient() {
        let alphas: Vec<f64> = (-10..=30).map(f64::from).collect();
        let curve = |k: f64| alphas.iter().map(|a| (*a, k * a.to_radians())).collect::<Vec<_>>();
        let chart = CoefficientCurves::new("Coefficients", "linear model").curve("C_L", curve(2.8)).curve("C_D", curve(0.5)).curve("C_M", curve(0.4));
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        for wanted in ["angle of attack α (deg)", "coefficient (dimensionless)", "C_L", "C_D", "C_M", "linear model"] {
            assert!(svg::has_text(&doc, wanted), "missing {wanted:?}");
        }
        assert_eq!(svg::long_polylines(&doc, 30), 3);
    }

    #[test]
    fn heat_map_fills_every_cell_and_labels_its_colour_bar() {
        let xs = vec![18.0, 20.0, 22.0];
        let ys = vec![-5.0, 0.0, 5.0, 10.0];
        let values = ys.iter().map(|y| xs.iter().map(|x| x * 3.0 + y).collect()).collect();
        let chart = HeatMap::new("Carry", Axis::new("speed", "m/s"), Axis::new("hyzer", "deg"), Axis::new("carry", "m")).grid(xs, ys, values);
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        for wanted in ["speed (m/s)", "hyzer (deg)", "carry (m)", "49.0", "76.0"] {
            assert!(svg::has_text(&doc, wanted), "missing {wanted:?} in {:?}", svg::texts(&doc));
        }
        assert!(svg::count(&doc, "rect") >= 12 * 2 + 64, "12 cells with outlines and a 64-step colour bar");
    }

    #[test]
    fn heat_map_ticks_sit_at_the_grid_values() {
        let xs = vec![14.0, 17.0, 20.0, 23.0, 26.0];
        let ys = vec![-10.0, 2.5, 15.0];
        let values = ys.iter().map(|y| xs.iter().map(|x| x * 3.0 + y).collect()).collect();
        let chart = HeatMap::new("Carry", Axis::new("speed", "m/s"), Axis::new("hyzer", "deg"), Axis::new("carry", "m")).grid(xs, ys, values);
        let doc_text = svg::of(&chart.render());
        let texts = svg::texts(&svg::parse(&doc_text));
        for wanted in ["14", "17", "23", "26", "-10", "2.5", "15"] {
            assert!(texts.iter().any(|t| t == wanted), "no tick {wanted:?} in {texts:?}");
        }
        for between in ["16", "18", "22", "24", "-5", "0", "5"] {
            assert!(!texts.iter().any(|t| t == between), "a tick {between:?} between cells in {texts:?}");
        }
        // A grid too fine to label cell by cell keeps round-number ticks.
        let fine: Vec<f64> = (0..30).map(|k| f64::from(k) * 20.0 / 29.0).collect();
        let values = fine.iter().map(|y| fine.iter().map(|x| x + y).collect()).collect();
        let chart = HeatMap::new("Fine", Axis::new("a", "m"), Axis::new("b", "m"), Axis::new("c", "m")).grid(fine.clone(), fine, values);
        let texts = svg::texts(&svg::parse(&svg::of(&chart.render())));
        assert!(texts.iter().any(|t| t == "10") && !texts.iter().any(|t| t == "0.69"), "{texts:?}");
    }

    #[test]
    fn scatter_draws_points_means_ellipses_and_caution() {
        let cloud: Vec<(f64, f64)> = (0..60).map(|i| { let t = i as f64; (90.0 + 5.0 * (t * 0.7).sin(), 10.0 + 3.0 * (t * 1.3).cos()) }).collect();
        let chart = ScatterEllipses::new("Landings", Axis::new("downrange x", "m"), Axis::new("lateral y", "m")).cloud(Series::new("P-7", cloud));
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        for wanted in ["downrange x (m)", "lateral y (m)", "P-7", "mean", "50 % ellipse", "95 % ellipse"] {
            assert!(svg::has_text(&doc, wanted), "missing {wanted:?}");
        }
        assert!(svg::count(&doc, "circle") >= 60, "every point drawn");
        assert_eq!(svg::long_polylines(&doc, 90), 2, "the 50 % and 95 % ellipses, each one closed polyline");
        let dashed = doc.descendants().filter(|n| n.has_tag_name("polyline") && n.attribute("stroke-dasharray").is_some()).count();
        assert_eq!(dashed, 1, "the 95 % ellipse dashed");
        assert!(svg::texts(&doc).iter().any(|t| t.contains("Predictions are estimates.")));
    }

    #[test]
    fn crowded_bars_turn_their_labels_upright_and_shorten_long_names() {
        let quantities = vec!["I_z".to_string(), "I_x".to_string(), "I_rim".to_string()];
        let chart = (0..8).fold(MassBars::new("Many", Axis::new("moment of inertia", "g·cm²"), quantities), |c, i| {
            c.group(format!("Prototype {i} with a very long workshop name"), vec![13000.0 + 100.0 * i as f64, 6500.0, 2800.0])
        });
        let upright = |text: &str| svg::parse(text).descendants().filter(|n| n.has_tag_name("text"))
            .filter(|n| n.attribute("transform").is_some_and(|t| t.starts_with("rotate(270"))).count();
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        assert_eq!(upright(&text), 24 + 1, "every bar label upright, and the y-axis title");
        assert!(svg::has_text(&doc, "13100  +0.8 %"), "value and change in one upright label");
        assert!(svg::texts(&doc).iter().any(|t| t.ends_with('…')), "long names cut");
        // Few bars keep their labels across.
        let few = MassBars::new("Few", Axis::new("I", "g·cm²"), vec!["I_z".into()]).group("a", vec![1.0]).group("b", vec![2.0]);
        assert_eq!(upright(&svg::of(&few.render())), 1, "only the y-axis title upright when labels fit");
    }

    #[test]
    fn long_titles_wrap_instead_of_running_off_the_chart() {
        let title = "A very long title that describes a study of eight prototypes from an invented workshop in detail";
        let text = svg::of(&LineChart::new(title, Axis::new("x", "m"), Axis::new("y", "m")).series(Series::new("s", vec![(0.0, 0.0), (1.0, 1.0)])).render());
        let doc = svg::parse(&text);
        let title_lines: Vec<String> = doc.descendants().filter(|n| n.has_tag_name("text") && n.attribute("font-weight") == Some("bold"))
            .map(|n| n.text().unwrap_or("").trim().to_string()).collect();
        assert!(title_lines.len() >= 2, "{title_lines:?}");
        assert_eq!(title_lines.join(" "), title, "nothing lost");
        assert!(title_lines.iter().all(|l| l.chars().count() * 10 < 760), "each line fits: {title_lines:?}");
    }

    #[test]
    fn series_past_the_palette_are_dashed_not_confused() {
        let chart = (0..9).fold(LineChart::new("Nine", Axis::new("x", "m"), Axis::new("y", "m")), |c, i| {
            c.series(Series::new(format!("s{i}"), (0..40).map(|k| (k as f64, (k * i) as f64)).collect()))
        });
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        assert_eq!(svg::long_polylines(&doc, 30), 9, "every series one polyline");
        let dashed = doc.descendants().filter(|n| n.has_tag_name("polyline") && n.attribute("stroke-dasharray").is_some()).count();
        assert_eq!(dashed, 2, "the eighth and ninth dashed, the first seven solid");
        for i in 0..9 {
            assert!(svg::has_text(&doc, &format!("s{i}")), "legend entry s{i}");
        }
    }

    #[test]
    fn every_chart_uses_our_palette_and_fonts() {
        let text = svg::of(&plan(&[("a", 20, 50.0), ("b", 20, 60.0)]).render());
        assert!(text.contains("#0072B2") && text.contains("#D55E00"), "Okabe–Ito colours for the first two series");
        assert!(text.contains("font-family=\"DejaVu Sans"), "our font list");
        assert!(text.contains("<title>Ground tracks</title>"), "accessible title");
    }
}

mod fallbacks {
    //! Empty and non-finite data: a clear "no data" chart or the finite part, never a panic.
    use super::*;

    fn all_charts(points: Vec<(f64, f64)>) -> Vec<MimeBundle> {
        let series = Series::new("s", points.clone());
        let values: Vec<f64> = points.iter().map(|p| p.1).collect();
        vec![
            PlanView::new("plan").track(Track::new("t", points.clone())).render(),
            SideView::new("side").track(Track::new("t", points.clone())).render(),
            LineChart::new("line", Axis::new("x", "m"), Axis::new("y", "m")).series(series.clone()).render(),
            TimeSeries::new("time").panel(Panel::new(Axis::new("speed", "m/s")).series(series.clone())).render(),
            CrossSection::new("section").region("m", 1.0, points.clone()).render(),
            MassBars::new("bars", Axis::new("I", "g·cm²"), vec!["I_z".into()]).group("d", values.clone()).render(),
            CoefficientCurves::new("coefficients", "").curve("C_L", points.clone()).render(),
            HeatMap::new("heat", Axis::new("a", ""), Axis::new("b", ""), Axis::new("c", ""))
                .grid(vec![1.0], vec![2.0], vec![values.clone()]).render(),
            ScatterEllipses::new("scatter", Axis::new("x", "m"), Axis::new("y", "m")).cloud(series).render(),
        ]
    }

    #[test]
    fn empty_data_gives_a_no_data_chart_for_every_kind() {
        for bundle in all_charts(Vec::new()) {
            let text = svg::of(&bundle);
            let doc = svg::parse(&text);
            svg::check_root(&doc);
            assert!(svg::texts(&doc).iter().any(|t| t.starts_with("No data to draw")), "{text}");
            assert!(bundle.text_plain().is_some());
        }
    }

    #[test]
    fn all_non_finite_data_gives_a_no_data_chart_for_every_kind() {
        let points = vec![(f64::NAN, f64::NAN), (2.0, f64::INFINITY), (f64::NEG_INFINITY, f64::NAN)];
        for bundle in all_charts(points) {
            let text = svg::of(&bundle);
            assert!(svg::texts(&svg::parse(&text)).iter().any(|t| t.starts_with("No data to draw")), "{text}");
            assert!(!text.contains("NaN") && !text.contains("inf"), "no non-finite coordinates in {text}");
        }
    }

    #[test]
    fn non_finite_points_are_skipped_and_the_rest_is_drawn() {
        let mut points: Vec<(f64, f64)> = (0..40).map(|i| (i as f64, (i as f64 * 0.2).sin())).collect();
        points[5].1 = f64::NAN;
        points[17].0 = f64::INFINITY;
        let chart = LineChart::new("gappy", Axis::new("x", "m"), Axis::new("y", "m")).series(Series::new("s", points));
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        assert_eq!(svg::polyline_lengths(&doc).into_iter().max(), Some(38), "the 38 finite points");
        assert!(!text.contains("NaN"));
    }

    #[test]
    fn single_points_and_degenerate_ranges_do_not_panic() {
        for bundle in all_charts(vec![(3.0, 3.0)]) {
            svg::check_root(&svg::parse(&svg::of(&bundle)));
        }
        for bundle in all_charts(vec![(0.0, 0.0), (0.0, 0.0), (0.0, 0.0)]) {
            svg::check_root(&svg::parse(&svg::of(&bundle)));
        }
    }

    #[test]
    fn text_that_looks_like_markup_is_escaped_in_charts() {
        let chart = LineChart::new("<b>bold</b> & \"quoted\"", Axis::new("x <1>", "m"), Axis::new("y", "m"))
            .series(Series::new("a<b", vec![(0.0, 0.0), (1.0, 1.0)]))
            .series(Series::new("c&d", vec![(0.0, 1.0), (1.0, 0.0)]));
        let text = svg::of(&chart.render());
        let doc = svg::parse(&text);
        assert!(svg::has_text(&doc, "<b>bold</b> & \"quoted\""));
        assert!(svg::has_text(&doc, "a<b") && svg::has_text(&doc, "c&d") && svg::has_text(&doc, "x <1> (m)"));
    }
}

mod spread {
    //! Means, covariances and probability ellipses against textbook values.
    use super::*;

    #[test]
    fn ellipse_scale_matches_chi_square_quantiles_with_two_degrees_of_freedom() {
        // source: NIST/SEMATECH (2012), e-Handbook of Statistical Methods, section 1.3.6.7.4,
        // "Critical values of the chi-square distribution": ν = 2, upper tail 0.05 → 5.991.
        assert!((ellipse_scale(0.95).powi(2) - 5.991).abs() < 1e-3);
        // source: same table, ν = 2, upper tail 0.50 → 1.386.
        assert!((ellipse_scale(0.5).powi(2) - 1.386).abs() < 1e-3);
        // source: same table, ν = 2, upper tail 0.10 → 4.605.
        assert!((ellipse_scale(0.9).powi(2) - 4.605).abs() < 1e-3);
    }

    #[test]
    fn sample_covariance_matches_the_hand_computed_value() {
        // common practice, no published source: sample covariance with divisor n − 1.
        let points = [(1.0, 2.0), (2.0, 4.0), (3.0, 5.0), (4.0, 9.0)];
        let spread = Spread::of(&points).expect("four points");
        assert_eq!(spread.mean, (2.5, 5.0));
        // Σ(x−x̄)² = 5, Σ(y−ȳ)² = 26, Σ(x−x̄)(y−ȳ) = 11; divided by 3.
        assert!((spread.covariance[0][0] - 5.0 / 3.0).abs() < 1e-12);
        assert!((spread.covariance[1][1] - 26.0 / 3.0).abs() < 1e-12);
        assert!((spread.covariance[0][1] - 11.0 / 3.0).abs() < 1e-12);
        assert!(Spread::of(&[(1.0, 1.0), (f64::NAN, 2.0)]).is_none(), "one finite point has no spread");
    }

    #[test]
    fn ellipse_axes_follow_the_covariance() {
        // common practice, no published source: for covariance diag(σx², σy²) the p-ellipse has
        // semi-axes k σx and k σy along x and y; rotated data rotate the ellipse.
        let spread = Spread { mean: (10.0, -2.0), covariance: [[9.0, 0.0], [0.0, 4.0]], count: 100 };
        let (major, minor, angle) = spread.semi_axes(0.95);
        let k = ellipse_scale(0.95);
        assert!((major - 3.0 * k).abs() < 1e-12 && (minor - 2.0 * k).abs() < 1e-12 && angle.abs() < 1e-12);
        let ring = spread.ellipse(0.95, 64);
        assert_eq!(ring.len(), 65, "closed");
        for (x, y) in ring {
            let r = ((x - 10.0) / (3.0 * k)).powi(2) + ((y + 2.0) / (2.0 * k)).powi(2);
            assert!((r - 1.0).abs() < 1e-9, "on the ellipse: {r}");
        }
        let tilted = Spread { mean: (0.0, 0.0), covariance: [[5.0, 4.0], [4.0, 5.0]], count: 10 };
        let (major, minor, angle) = tilted.semi_axes(0.5);
        let k = ellipse_scale(0.5);
        assert!((angle - std::f64::consts::FRAC_PI_4).abs() < 1e-12, "major axis along the diagonal");
        assert!((major - 3.0 * k).abs() < 1e-12 && (minor - k).abs() < 1e-12, "eigenvalues 9 and 1");
    }

    #[test]
    fn the_95_percent_ellipse_holds_about_95_percent_of_normal_points() {
        // common practice, no published source: a deterministic Box–Muller sample of a
        // correlated bivariate normal; the share inside the 95 % ellipse is 0.95 ± sampling error.
        let mut state = 7_u64;
        let mut uniform = move || {
            state = state.wrapping_mul(6364136223846793005).wrapping_add(1442695040888963407);
            ((state >> 11) as f64 + 0.5) / (1u64 << 53) as f64
        };
        let mut normal = move || (-2.0 * uniform().ln()).sqrt() * (std::f64::consts::TAU * uniform()).cos();
        let points: Vec<(f64, f64)> = (0..4000).map(|_| { let (a, b) = (normal(), normal()); (2.0 * a, 0.8 * a + 0.6 * b) }).collect();
        let spread = Spread::of(&points).expect("points");
        let [[a, b], [_, c]] = spread.covariance;
        let det = a * c - b * b;
        let inside = points.iter().filter(|(x, y)| {
            let (dx, dy) = (x - spread.mean.0, y - spread.mean.1);
            (c * dx * dx - 2.0 * b * dx * dy + a * dy * dy) / det <= ellipse_scale(0.95).powi(2)
        }).count() as f64 / points.len() as f64;
        assert!((inside - 0.95).abs() < 0.015, "share inside {inside}");
    }
}
