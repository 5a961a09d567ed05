//! The domain packages: one module per object, each registering its functions with their docs.
mod aero_choice;
mod args;
mod charts;
mod compare;
mod discs;
mod environments;
mod flight_name;
mod flights;
mod layups;
mod materials;
mod numbers;
mod outlines;
mod pause;
mod show;
mod studies;
mod tables;
mod throws;

pub(crate) use discs::DiscValue;
pub(crate) use environments::EnvironmentValue;
pub(crate) use flights::{trajectory_table, FlightValue};
pub(crate) use throws::ThrowValue;

use crate::help::Registrar;
use crate::output::MimeBundle;
use crate::session::{InterruptHandle, SinkSlot};
use rhai::Dynamic;

/// What packages may use besides the engine: the current output sink and the interrupt flag
/// (the study's folders and limits are in the session's `ScriptRules`).
#[derive(Clone)]
pub(crate) struct PackageContext {
    /// Where `show` sends displays.
    pub sink: SinkSlot,
    /// Checked by calls that wait (`sleep`).
    pub interrupt: InterruptHandle,
}

/// Registers every domain package, in reference-page order.
pub(crate) fn register_packages(reg: &mut Registrar, context: &PackageContext) {
    materials::register(reg);
    outlines::register(reg);
    layups::register(reg);
    discs::register(reg);
    throws::register(reg);
    environments::register(reg);
    flights::register(reg);
    tables::register(reg);
    numbers::register(reg);
    charts::register(reg);
    studies::register(reg, context);
    show::register(reg, context);
    pause::register(reg, context);
    crate::files::register(reg);
}

/// The rendering of a domain value, when `value` is one.
pub(crate) fn render_domain(value: &Dynamic) -> Option<MimeBundle> {
    use crate::Render;
    if let Some(table) = value.read_lock::<crate::Table>() {
        return Some(table.render());
    }
    if let Some(disc) = value.read_lock::<discs::DiscValue>() {
        return Some(compare::mass_table(std::slice::from_ref(&*disc)).render());
    }
    if let Some(chart) = value.read_lock::<charts::ChartValue>() {
        return Some(chart.bundle.clone());
    }
    if let Some(study) = value.read_lock::<studies::StudyValue>() {
        return Some(study.render());
    }
    if let Some(flight) = value.read_lock::<flights::FlightValue>() {
        return Some(compare::flight_table(std::slice::from_ref(&*flight)).render());
    }
    None
}
