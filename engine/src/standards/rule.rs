use serde::{Deserialize, Serialize};

/// A rule of the sport's technical standard for discs that Spinfoil checks.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
pub enum StandardRule {
    /// Inner rim depth at least 5 % of the outside diameter.
    RimDepthRatio,
    /// Mass at most 8.3 g per cm of outside diameter.
    MassPerDiameter,
    /// Mass at most 200 g.
    MassLimit,
    /// Outside diameter from 21.0 cm to 30.0 cm.
    DiameterRange,
    /// Rim thickness (the rim's radial width) at most 2.6 cm.
    RimWidthLimit,
    /// Flight plate at most 0.5 cm thick.
    PlateThickness,
    /// Leading edge passes a 1.6 mm radius gauge.
    LeadingEdgeGauge,
}

const STANDARD_2002: &str = "PDGA Technical Standards (2002 revision, as reprinted in the rules); value from memory, unverified";
const STANDARD_2014: &str = "PDGA Technical Standards, 2014 amendments; value from memory, unverified";
const STANDARD_CURRENT: &str = "PDGA Technical Standards (current limits); value from memory, unverified";

impl StandardRule {
    /// Every rule, in report order.
    pub const ALL: [StandardRule; 7] = [
        StandardRule::DiameterRange,
        StandardRule::RimDepthRatio,
        StandardRule::RimWidthLimit,
        StandardRule::PlateThickness,
        StandardRule::LeadingEdgeGauge,
        StandardRule::MassPerDiameter,
        StandardRule::MassLimit,
    ];

    /// The rule in words.
    pub fn title(self) -> &'static str {
        match self {
            StandardRule::RimDepthRatio => "inner rim depth at least 5 % of diameter",
            StandardRule::MassPerDiameter => "mass at most 8.3 g per cm of diameter",
            StandardRule::MassLimit => "mass at most 200 g",
            StandardRule::DiameterRange => "diameter 21.0 to 30.0 cm",
            StandardRule::RimWidthLimit => "rim thickness (radial rim width) at most 2.6 cm",
            StandardRule::PlateThickness => "flight plate at most 0.5 cm thick",
            StandardRule::LeadingEdgeGauge => "leading edge passes the 1.6 mm radius gauge",
        }
    }

    /// Where the rule comes from, and how sure we are of its value.
    pub fn source(self) -> &'static str {
        match self {
            StandardRule::RimDepthRatio | StandardRule::MassPerDiameter => STANDARD_2002,
            StandardRule::MassLimit | StandardRule::LeadingEdgeGauge => STANDARD_2002,
            StandardRule::PlateThickness => STANDARD_2014,
            StandardRule::DiameterRange | StandardRule::RimWidthLimit => STANDARD_CURRENT,
        }
    }
}

impl std::fmt::Display for StandardRule {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.write_str(self.title())
    }
}
