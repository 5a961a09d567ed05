//! `complete_request`, `inspect_request` and `is_complete_request`, answered by the session.
use super::{bad_request, ShellHandlers};
use crate::jupyter::messages::{CodeAtCursor, IsCompleteRequest};
use crate::jupyter::wire::WireMessage;
use crate::mime::bundle_to_data;
use serde_json::{json, Value};
use spinfoil_lang::Completeness;

impl ShellHandlers {
    pub(super) async fn complete(&mut self, request: &WireMessage) -> WireMessage {
        let Ok(query) = request.content_as::<CodeAtCursor>() else {
            return bad_request(request, "complete_reply", "needs code and cursor_pos");
        };
        let found = self.worker.run(move |s| s.complete(&query.code, query.cursor_pos)).await.unwrap_or_default();
        request.reply("complete_reply", json!({
            "status": "ok", "matches": found.matches, "cursor_start": found.cursor_start,
            "cursor_end": found.cursor_end, "metadata": {},
        }))
    }

    pub(super) async fn inspect(&mut self, request: &WireMessage) -> WireMessage {
        let Ok(query) = request.content_as::<CodeAtCursor>() else {
            return bad_request(request, "inspect_reply", "needs code and cursor_pos");
        };
        let found = self.worker.run(move |s| s.inspect(&query.code, query.cursor_pos)).await.flatten();
        let data = found.as_ref().map_or_else(|| json!({}), |bundle| Value::Object(bundle_to_data(bundle)));
        request.reply("inspect_reply", json!({
            "status": "ok", "found": found.is_some(), "data": data, "metadata": {},
        }))
    }

    pub(super) async fn is_complete(&mut self, request: &WireMessage) -> WireMessage {
        let Ok(query) = request.content_as::<IsCompleteRequest>() else {
            return bad_request(request, "is_complete_reply", "needs code");
        };
        let answer = self.worker.run(move |s| s.is_complete(&query.code)).await;
        let content = match answer {
            Some(Completeness::Complete) => json!({"status": "complete"}),
            Some(Completeness::Incomplete { indent }) => json!({"status": "incomplete", "indent": indent}),
            Some(Completeness::Invalid) => json!({"status": "invalid"}),
            None => json!({"status": "unknown"}),
        };
        request.reply("is_complete_reply", content)
    }
}
