use super::StandardRule;
use crate::geometry::Outline;
use crate::mass::MassProperties;
use serde::{Deserialize, Serialize};

/// The result of checking one rule: the value, the limit it was held against and the margin,
/// in the unit designers use for it (`unit`: "g", "cm", "mm" or "% of diameter").
#[derive(Debug, Clone, PartialEq, Serialize, Deserialize)]
pub struct StandardCheck {
    /// The rule.
    pub rule: StandardRule,
    /// The rule in words.
    pub title: String,
    /// Where the rule comes from.
    pub source: String,
    /// The disc's value, in `unit`.
    pub value: f64,
    /// The limit the value was compared with, in `unit`.
    pub limit: f64,
    /// The unit of `value`, `limit` and `margin`.
    pub unit: String,
    /// Distance inside the limit, in `unit`: positive passes, negative fails by that much.
    pub margin: f64,
    /// Whether the disc meets the rule.
    pub passed: bool,
}

impl std::fmt::Display for StandardCheck {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        let verdict = if self.passed { "passes" } else { "FAILS" };
        write!(
            f,
            "{} {}: {:.2} {} against limit {:.2} {} (margin {:+.2} {}; source: {})",
            verdict, self.title, self.value, self.unit, self.limit, self.unit, self.margin, self.unit, self.source
        )
    }
}

fn at_most(rule: StandardRule, value: f64, limit: f64, unit: &str) -> StandardCheck {
    finish(rule, value, limit, unit, limit - value)
}

fn at_least(rule: StandardRule, value: f64, limit: f64, unit: &str) -> StandardCheck {
    finish(rule, value, limit, unit, value - limit)
}

fn finish(rule: StandardRule, value: f64, limit: f64, unit: &str, margin: f64) -> StandardCheck {
    StandardCheck {
        rule,
        title: rule.title().to_string(),
        source: rule.source().to_string(),
        value,
        limit,
        unit: unit.to_string(),
        margin,
        passed: margin >= 0.0,
    }
}

/// Greatest mass per cm of diameter, g/cm.
pub const MAX_MASS_PER_DIAMETER_G_CM: f64 = 8.3;

/// Checks a disc against every rule that its outline and mass allow (the plate rule only when
/// the plate thickness is declared or the outline reaches the axis; the gauge only when the
/// leading-edge radius is declared). Passing rules are included (`passed`).
pub fn check_standard(outline: &Outline, properties: &MassProperties) -> Vec<StandardCheck> {
    let diameter_cm = outline.diameter_m() * 100.0;
    let mass_g = properties.mass_kg * 1000.0;
    let mut checks = vec![diameter_check(diameter_cm)];
    let depth_pct = outline.rim_depth_m() / outline.diameter_m() * 100.0;
    checks.push(at_least(StandardRule::RimDepthRatio, depth_pct, 5.0, "% of diameter"));
    checks.push(at_most(StandardRule::RimWidthLimit, outline.rim_width_m() * 100.0, 2.6, "cm"));
    if let Some(plate_m) = known_plate_m(outline) {
        checks.push(at_most(StandardRule::PlateThickness, plate_m * 100.0, 0.5, "cm"));
    }
    if let Some(edge_m) = outline.leading_edge_radius_m() {
        checks.push(at_least(StandardRule::LeadingEdgeGauge, edge_m * 1000.0, 1.6, "mm"));
    }
    let per_diameter_limit = MAX_MASS_PER_DIAMETER_G_CM * diameter_cm;
    checks.push(at_most(StandardRule::MassPerDiameter, mass_g, per_diameter_limit, "g"));
    checks.push(at_most(StandardRule::MassLimit, mass_g, 200.0, "g"));
    checks
}

/// Only the rules the disc fails: the standard's warnings.
pub fn standard_warnings(outline: &Outline, properties: &MassProperties) -> Vec<StandardCheck> {
    check_standard(outline, properties).into_iter().filter(|c| !c.passed).collect()
}

fn diameter_check(diameter_cm: f64) -> StandardCheck {
    let low = at_least(StandardRule::DiameterRange, diameter_cm, 21.0, "cm");
    let high = at_most(StandardRule::DiameterRange, diameter_cm, 30.0, "cm");
    if low.margin <= high.margin { low } else { high }
}

fn known_plate_m(outline: &Outline) -> Option<f64> {
    let touches_axis = outline.points().iter().any(|p| p.r_m == 0.0);
    match outline.declared().plate_thickness_m {
        Some(t) => Some(t),
        None if touches_axis => Some(outline.plate_thickness_m()),
        None => None,
    }
}
