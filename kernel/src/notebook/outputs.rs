//! A cell's output events turned into nbformat outputs, as Jupyter stores them.
use crate::error_report::ErrorReport;
use crate::mime::bundle_to_data;
use serde_json::{json, Value};
use spinfoil_lang::{MimeBundle, OutputEvent};
use std::collections::HashMap;

/// Where each display id's outputs sit: (cell index, output index), across the notebook.
#[derive(Debug, Default)]
pub struct DisplayIndex {
    places: HashMap<String, Vec<(usize, usize)>>,
}

/// Builds the outputs of code cell `cell` from its events; updates of displays in earlier cells
/// are returned as `(cell, output, new output)` for the caller to apply.
pub fn outputs_from_events(
    cell: usize,
    events: Vec<OutputEvent>,
    displays: &mut DisplayIndex,
) -> (Vec<Value>, Vec<(usize, usize, Value)>) {
    let mut outputs = Vec::new();
    let mut earlier = Vec::new();
    for event in events {
        match event {
            OutputEvent::Stdout(text) => outputs.push(stream("stdout", &text)),
            OutputEvent::Stderr(text) => outputs.push(stream("stderr", &text)),
            OutputEvent::Display(bundle, id) => {
                if let Some(id) = id {
                    displays.places.entry(id).or_default().push((cell, outputs.len()));
                }
                outputs.push(display_data(&bundle));
            }
            OutputEvent::Update(bundle, id) => {
                for &(at_cell, at_output) in displays.places.get(&id).into_iter().flatten() {
                    if at_cell == cell {
                        outputs[at_output] = display_data(&bundle);
                    } else {
                        earlier.push((at_cell, at_output, display_data(&bundle)));
                    }
                }
            }
        }
    }
    (outputs, earlier)
}

/// A `stream` output.
pub fn stream(name: &str, text: &str) -> Value {
    json!({"output_type": "stream", "name": name, "text": text})
}

/// A `display_data` output.
pub fn display_data(bundle: &MimeBundle) -> Value {
    json!({"output_type": "display_data", "data": bundle_to_data(bundle), "metadata": {}})
}

/// An `execute_result` output.
pub fn execute_result(bundle: &MimeBundle, execution_count: usize) -> Value {
    json!({"output_type": "execute_result", "data": bundle_to_data(bundle), "metadata": {}, "execution_count": execution_count})
}

/// An `error` output.
pub fn error(report: &ErrorReport) -> Value {
    json!({"output_type": "error", "ename": report.ename, "evalue": report.evalue, "traceback": report.traceback})
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn an_update_replaces_the_display_with_its_id() {
        let mut displays = DisplayIndex::default();
        let events = vec![
            OutputEvent::Stdout("a\n".into()),
            OutputEvent::Display(MimeBundle::plain("0 %"), Some("p".into())),
            OutputEvent::Update(MimeBundle::plain("100 %"), "p".into()),
        ];
        let (outputs, earlier) = outputs_from_events(0, events, &mut displays);
        assert_eq!(outputs.len(), 2);
        assert_eq!(outputs[1]["data"]["text/plain"], "100 %");
        assert!(earlier.is_empty());
        let (_, earlier) = outputs_from_events(1, vec![OutputEvent::Update(MimeBundle::plain("x"), "p".into())], &mut displays);
        assert_eq!(earlier[0].0, 0);
    }
}
