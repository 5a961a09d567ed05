//! The aerodynamic coefficient sets a disc can carry, by name.
use spinfoil_engine::{
    demo_driver, demo_midrange, demo_putter, hummel_2003, DiscFamily, LinearCoefficients, OutlineSource,
};

/// Names accepted by the `aero` option of `disc`.
pub(crate) const AERO_NAMES: &[&str] = &["demo_putter", "demo_midrange", "demo_driver", "hummel_2003"];

/// The coefficient set named `name` (one of [`AERO_NAMES`]).
pub(crate) fn aero_by_name(name: &str) -> Option<LinearCoefficients> {
    match name {
        "demo_putter" => Some(demo_putter()),
        "demo_midrange" => Some(demo_midrange()),
        "demo_driver" => Some(demo_driver()),
        "hummel_2003" => Some(hummel_2003()),
        _ => None,
    }
}

/// The default set for an outline: the invented demo set of its family.
pub(crate) fn default_aero_name(outline: &OutlineSource) -> &'static str {
    match outline {
        OutlineSource::Parametric(p) => match p.family {
            DiscFamily::Putter => "demo_putter",
            DiscFamily::Midrange => "demo_midrange",
            DiscFamily::Driver => "demo_driver",
        },
        OutlineSource::Points(_) => "demo_driver",
    }
}
