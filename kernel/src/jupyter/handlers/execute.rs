//! `execute_request`: run a cell, publish its input, output and result, record it in the history.
use super::{bad_request, ShellHandlers};
use crate::error_report::ErrorReport;
use crate::jupyter::cell_sink::CellSink;
use crate::jupyter::messages::ExecuteRequest;
use crate::jupyter::wire::WireMessage;
use crate::mime::bundle_to_data;
use serde_json::{json, Map, Value};
use spinfoil_lang::{CellError, CollectedOutput, MimeBundle};
use std::sync::Arc;

type Outcome = Result<Option<MimeBundle>, CellError>;

impl ShellHandlers {
    pub(super) async fn execute(&mut self, request: &WireMessage) -> WireMessage {
        let Ok(cell) = request.content_as::<ExecuteRequest>() else {
            return bad_request(request, "execute_reply", "needs code");
        };
        let counted = !cell.silent && cell.store_history;
        if counted {
            self.execution_count += 1;
        }
        let count = self.execution_count;
        if !cell.silent {
            self.iopub.publish(request, "execute_input", json!({"code": cell.code, "execution_count": count}));
        }
        let outcome = self.run_cell(request, &cell).await;
        if counted {
            let output = outcome.as_ref().ok().and_then(|r| r.as_ref()).and_then(|b| b.text_plain()).map(str::to_string);
            self.history.record(count, &cell.code, output);
        }
        self.abort_queued = outcome.is_err() && cell.stop_on_error && !cell.silent;
        let expressions = self.user_expressions(cell.user_expressions.clone()).await;
        self.reply_to_cell(request, &cell, count, outcome, expressions)
    }

    async fn run_cell(&self, request: &WireMessage, cell: &ExecuteRequest) -> Outcome {
        let sink = Arc::new(CellSink::new(self.iopub.clone(), request, cell.silent));
        let code = cell.code.clone();
        self.worker
            .run(move |session| {
                crate::jupyter::test_hooks::panic_if_asked(&code);
                crate::rust_cells::eval_cell(session, &code, sink)
            })
            .await
            .unwrap_or_else(|| Err(crashed()))
    }

    fn reply_to_cell(&self, request: &WireMessage, cell: &ExecuteRequest, count: usize, outcome: Outcome, expressions: Value) -> WireMessage {
        match outcome {
            Ok(result) => {
                if let (Some(bundle), false) = (result, cell.silent) {
                    let content = json!({"execution_count": count, "data": bundle_to_data(&bundle), "metadata": {}});
                    self.iopub.publish(request, "execute_result", content);
                }
                request.reply("execute_reply", json!({
                    "status": "ok", "execution_count": count, "user_expressions": expressions, "payload": [],
                }))
            }
            Err(error) => {
                let report = ErrorReport::from_cell(&cell.code, &error);
                if !cell.silent {
                    self.iopub.publish(request, "error", &report);
                }
                let mut content = serde_json::to_value(&report).unwrap_or_else(|_| json!({}));
                content["status"] = json!("error");
                content["execution_count"] = json!(count);
                content["user_expressions"] = expressions;
                content["payload"] = json!([]);
                request.reply("execute_reply", content)
            }
        }
    }

    /// Evaluates each user expression after the cell (no output is published for them).
    async fn user_expressions(&self, expressions: Map<String, Value>) -> Value {
        let mut answers = Map::new();
        for (name, expression) in expressions {
            let code = expression.as_str().unwrap_or_default().to_string();
            let sink = Arc::new(CollectedOutput::default());
            let outcome = self.worker.run(move |s| s.eval(&code, sink)).await.unwrap_or_else(|| Err(crashed()));
            answers.insert(name, expression_answer(expression.as_str().unwrap_or_default(), outcome));
        }
        Value::Object(answers)
    }
}

fn expression_answer(code: &str, outcome: Outcome) -> Value {
    match outcome {
        Ok(result) => {
            let data = result.map(|b| bundle_to_data(&b)).unwrap_or_default();
            json!({"status": "ok", "data": data, "metadata": {}})
        }
        Err(error) => {
            let mut content = serde_json::to_value(ErrorReport::from_cell(code, &error)).unwrap_or_else(|_| json!({}));
            content["status"] = json!("error");
            content
        }
    }
}

fn crashed() -> CellError {
    CellError {
        kind: "InternalError".into(),
        message: "the session failed while running this cell; its variables may be incomplete".into(),
        line: None,
        column: None,
    }
}
