//! Studies in scripts: sweeps, dispersion, flight signatures and release optimisation over the
//! engine's `study` module, with tables, charts, progress displays and interrupts.
mod case;
mod calibration;
mod control;
mod dispersion;
mod optimum;
mod options;
mod result;
mod shards;
mod signature;
mod sweep;

pub(crate) use result::StudyValue;

use super::PackageContext;
use crate::help::Registrar;

/// Registers the study functions and the `Study` result type.
pub(crate) fn register(reg: &mut Registrar, context: &PackageContext) {
    reg.section(
        "studies",
        "sweeps, dispersion under throw scatter, flight signatures and release optimisation (progress shown, interrupts obeyed)",
    );
    result::register(reg);
    result::register_catalogues(reg);
    sweep::register(reg, context);
    calibration::register(reg, context);
    dispersion::register(reg, context);
    signature::register(reg, context);
    optimum::register(reg, context);
    shards::register(reg);
}

/// A study over one disc, throw and environment with an option map.
pub(crate) type CaseStudy = fn(
    &rhai::NativeCallContext,
    &PackageContext,
    &crate::packages::DiscValue,
    &crate::packages::ThrowValue,
    &crate::packages::EnvironmentValue,
    rhai::Map,
) -> crate::packages::args::Fallible<StudyValue>;

/// Registers `name(disc, throw, environment, options)` running `study`, with its doc.
pub(crate) fn register_case_study(reg: &mut Registrar, context: &PackageContext, name: &str, study: CaseStudy, doc: crate::help::FnDoc) {
    let context = context.clone();
    reg.engine.register_fn(
        name,
        move |ctx: rhai::NativeCallContext,
              d: crate::packages::DiscValue,
              t: crate::packages::ThrowValue,
              e: crate::packages::EnvironmentValue,
              map: rhai::Map| study(&ctx, &context, &d, &t, &e, map),
    );
    reg.doc(doc);
}
