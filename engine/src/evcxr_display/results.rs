//! `to_html` and `evcxr_display` for the engine's main results.
use super::html::QuantityTable;
use super::path_chart::FlightPathChart;
use super::{print_evcxr_blocks, SAFETY_CAUTION};
use crate::{DesignReport, Flight, FlightMetrics, MassProperties};

const RPM_PER_RAD_S: f64 = 60.0 / std::f64::consts::TAU;

/// Prints a table as evcxr content: plain text and HTML.
fn print_table(table: &QuantityTable) {
    print_evcxr_blocks(&[("text/plain", &table.to_text()), ("text/html", &table.to_html())]);
}

impl MassProperties {
    /// The mass properties as a table in user units (g, mm, g·cm²).
    pub fn quantity_table(&self, caption: &str) -> QuantityTable {
        QuantityTable::new(caption)
            .row("mass", self.mass_kg * 1e3, 2, "g")
            .row("centre of mass height", self.cg_height_m * 1e3, 2, "mm")
            .row("spin moment of inertia I_z", self.spin_inertia_kg_m2 * 1e7, 1, "g·cm²")
            .row("transverse moment of inertia I_x", self.transverse_inertia_kg_m2 * 1e7, 1, "g·cm²")
            .row("spin radius of gyration", self.spin_radius_of_gyration_m() * 1e3, 2, "mm")
            .row("I_z / I_x", self.spin_inertia_kg_m2 / self.transverse_inertia_kg_m2, 3, "")
    }

    /// The mass properties as an HTML table.
    pub fn to_html(&self) -> String {
        self.quantity_table("Mass properties").to_html()
    }

    /// Shows the table in a Rust notebook cell (evcxr's display protocol).
    pub fn evcxr_display(&self) {
        print_table(&self.quantity_table("Mass properties"));
    }
}

impl DesignReport {
    /// The design's mass properties and region shares as a table.
    pub fn quantity_table(&self) -> QuantityTable {
        let mut table = self.properties.quantity_table(&format!("Design \"{}\"", self.name));
        for region in &self.regions {
            let quantity = format!("region {} ({}): mass, share of I_z", region.name, region.material);
            let value = format!("{:.2} g, {:.1} %", region.mass_kg * 1e3, region.spin_inertia_fraction * 100.0);
            table = table.text_row(&quantity, &value, "");
        }
        for warning in self.warnings() {
            table = table.note(format!("warning: {warning}"));
        }
        table
    }

    /// The report as an HTML table.
    pub fn to_html(&self) -> String {
        self.quantity_table().to_html()
    }

    /// Shows the report in a Rust notebook cell (evcxr's display protocol).
    pub fn evcxr_display(&self) {
        print_table(&self.quantity_table());
    }
}

impl FlightMetrics {
    /// The metrics as a table in user units (m, s, m/s, rpm, degrees).
    pub fn quantity_table(&self, caption: &str) -> QuantityTable {
        let half_time = self.wobble_half_time_s.map_or_else(|| "none".to_string(), |t| format!("{t:.2}"));
        QuantityTable::new(caption)
            .row("carry", self.carry_m, 1, "m")
            .row("landing lateral offset (+ fade side)", self.landing_lateral_m, 1, "m")
            .row("turn", self.turn_m, 1, "m")
            .row("fade", self.fade_m, 1, "m")
            .row("apex height", self.apex_m, 2, "m")
            .row("time aloft", self.time_aloft_s, 2, "s")
            .row("landing speed", self.landing_speed_mps, 1, "m/s")
            .row("landing angle below horizontal", self.landing_angle_rad.to_degrees(), 1, "°")
            .row("release spin", self.release_spin_rad_s * RPM_PER_RAD_S, 0, "rpm")
            .row("spin kept at landing", self.spin_kept_fraction * 100.0, 1, "%")
            .row("heading change (+ fade side)", self.heading_change_rad.to_degrees(), 1, "°")
            .text_row("time to halve the wobble", &half_time, "s")
    }

    /// The metrics as an HTML table.
    pub fn to_html(&self) -> String {
        self.quantity_table("Flight metrics").to_html()
    }

    /// Shows the table in a Rust notebook cell (evcxr's display protocol).
    pub fn evcxr_display(&self) {
        print_table(&self.quantity_table("Flight metrics"));
    }
}

impl Flight {
    fn quantity_table(&self) -> QuantityTable {
        let ended = if self.landed { "landed (rim touched the ground)" } else { "stopped at the time limit" };
        self.metrics
            .quantity_table(&format!("Flight with \"{}\": {ended}", self.model.name))
            .note(format!("coefficients: {}; {}", self.model.source, self.model.confidence))
            .note(SAFETY_CAUTION)
    }

    /// The flight's path chart (SVG), labelled with its coefficient set.
    pub fn path_chart(&self) -> FlightPathChart {
        FlightPathChart::new().with_flight(self, &self.model.name)
    }

    /// The flight as HTML: the metrics table beside its path chart, with the safety caution.
    pub fn to_html(&self) -> String {
        format!(
            "<div style=\"display:flex;flex-wrap:wrap;gap:16px;align-items:flex-start\"><div>{}</div><div>{}</div></div>",
            self.quantity_table().to_html(),
            self.path_chart().to_svg()
        )
    }

    /// Shows the flight in a Rust notebook cell (evcxr's display protocol).
    pub fn evcxr_display(&self) {
        print_evcxr_blocks(&[("text/plain", &self.quantity_table().to_text()), ("text/html", &self.to_html())]);
    }
}

impl FlightPathChart {
    /// Shows the chart in a Rust notebook cell as SVG (evcxr's display protocol).
    pub fn evcxr_display(&self) {
        print_evcxr_blocks(&[("text/plain", "flight path chart (SVG)"), ("image/svg+xml", &self.to_svg())]);
    }
}

#[cfg(test)]
mod tests {
    use crate::*;

    fn demo_flight() -> Flight {
        let body = DiscBody { mass_kg: 0.172, spin_inertia_kg_m2: 0.00142, transverse_inertia_kg_m2: 0.00075, diameter_m: 0.211 };
        let release = ReleasePose { launch_rad: 10f64.to_radians(), nose_rad: 1f64.to_radians(), ..ReleasePose::default() }
            .with_speed_and_spin(24.0, 120.0);
        fly(&body, &demo_driver(), &release, &FlightConditions::default(), &FlightSettings::default()).expect("the demo flight flies")
    }

    #[test]
    fn a_flight_shows_its_metrics_with_units_its_path_and_the_caution() {
        let flight = demo_flight();
        let html = flight.to_html();
        assert!(html.contains(&format!("{:.1}</td><td style=\"text-align:left\">m</td>", flight.metrics.carry_m)));
        assert!(html.contains("<svg") && html.contains("<polyline"));
        assert!(html.contains("Keep clear of the throwing lane"));
        let svg = flight.path_chart().to_svg();
        let doc = svg.trim();
        assert!(doc.starts_with("<svg") && doc.ends_with("</svg>"));
        assert_eq!(doc.matches("<polyline").count(), 2, "side and top view of one flight");
    }

    #[test]
    fn evcxr_blocks_frame_each_mime_type() {
        let block = super::super::evcxr_block("text/html", "<b>x</b>\n");
        assert_eq!(block, "EVCXR_BEGIN_CONTENT text/html\n<b>x</b>\nEVCXR_END_CONTENT\n");
    }

    #[test]
    fn mass_properties_in_user_units() {
        let p = MassProperties { mass_kg: 0.172, cg_height_m: 0.012, spin_inertia_kg_m2: 0.00142, transverse_inertia_kg_m2: 0.00075 };
        let text = p.quantity_table("m").to_text();
        assert!(text.contains(" 172.00 g\n"), "{text}");
        assert!(text.contains("14200.0 g·cm²"), "{text}");
    }
}
