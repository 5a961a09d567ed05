use super::{InterruptHandle, SessionSettings, SinkSlot};
use crate::help::{register_help, Docs, Registrar};
use crate::packages::{register_packages, PackageContext};
use rhai::packages::{
    BasicArrayPackage, BasicMapPackage, BasicMathPackage, BitFieldPackage, CorePackage, LogicPackage,
    MoreStringPackage, Package,
};
use rhai::{Dynamic, Engine};
use std::sync::{Arc, OnceLock};

/// Builds the engine of a session: `Engine::new_raw()` plus the standard packages a study needs
/// (core language, arithmetic, logic, math, strings, arrays, maps, function pointers and
/// closures; no clock, so results depend only on the script), our domain packages, the limits of
/// `settings`, output routed to the current sink, and the interrupt check.
pub(crate) fn build_engine(
    settings: &SessionSettings,
    sink: &SinkSlot,
    interrupt: &InterruptHandle,
) -> (Engine, Arc<Docs>) {
    let mut engine = Engine::new_raw();
    register_standard_packages(&mut engine);
    apply_limits(&mut engine, settings);
    route_output(&mut engine, sink);
    let flag = interrupt.clone();
    engine.on_progress(move |operations| flag.stops_at(operations).then(|| Dynamic::from("interrupted")));
    engine.set_default_tag(super::ScriptRules::of_settings(settings).to_tag());
    let mut docs = Docs::default();
    let docs_cell: Arc<OnceLock<Arc<Docs>>> = Arc::default();
    {
        let mut reg = Registrar::new(&mut engine, &mut docs);
        let context = PackageContext { sink: sink.clone(), interrupt: interrupt.clone() };
        register_packages(&mut reg, &context);
        register_help(&mut reg, docs_cell.clone());
    }
    let docs = Arc::new(docs);
    let _ = docs_cell.set(docs.clone());
    (engine, docs)
}

fn register_standard_packages(engine: &mut Engine) {
    engine.register_global_module(CorePackage::new().as_shared_module());
    engine.register_global_module(LogicPackage::new().as_shared_module());
    engine.register_global_module(BitFieldPackage::new().as_shared_module());
    engine.register_global_module(BasicMathPackage::new().as_shared_module());
    engine.register_global_module(MoreStringPackage::new().as_shared_module());
    engine.register_global_module(BasicArrayPackage::new().as_shared_module());
    engine.register_global_module(BasicMapPackage::new().as_shared_module());
}

fn apply_limits(engine: &mut Engine, settings: &SessionSettings) {
    engine.set_max_operations(settings.max_operations);
    engine.set_max_array_size(settings.max_array_size);
    engine.set_max_string_size(settings.max_string_size);
    engine.set_max_map_size(settings.max_map_size);
    engine.set_max_call_levels(settings.max_call_depth);
    engine.set_max_expr_depths(settings.max_expression_depth, settings.max_function_expression_depth);
}

fn route_output(engine: &mut Engine, sink: &SinkSlot) {
    let out = sink.clone();
    engine.on_print(move |text| out.stdout(&format!("{text}\n")));
    let err = sink.clone();
    engine.on_debug(move |text, _, pos| match (pos.line(), pos.position()) {
        (Some(l), Some(c)) => err.stderr(&format!("[line {l}, column {c}] {text}\n")),
        _ => err.stderr(&format!("{text}\n")),
    });
}
