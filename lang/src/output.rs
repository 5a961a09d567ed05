use std::collections::BTreeMap;
use std::sync::Mutex;

/// One rendering of a value, keyed by MIME type (`text/plain`, `text/html`, `image/svg+xml`,
/// `application/json`), as Jupyter's `display_data` carries it.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct MimeBundle {
    /// MIME type → content (text; JSON as its serialised text).
    pub data: BTreeMap<String, String>,
}

impl MimeBundle {
    /// A bundle with only `text/plain`.
    pub fn plain(text: impl Into<String>) -> Self {
        let mut data = BTreeMap::new();
        data.insert("text/plain".to_string(), text.into());
        Self { data }
    }

    /// Adds (or replaces) one MIME type's content.
    pub fn with(mut self, mime: &str, content: impl Into<String>) -> Self {
        self.data.insert(mime.to_string(), content.into());
        self
    }

    /// The `text/plain` content, if any.
    pub fn text_plain(&self) -> Option<&str> {
        self.data.get("text/plain").map(String::as_str)
    }

    /// The chart SVG a display carries inside its HTML (a study shows its table and chart as one
    /// display, the chart after the table in `<div class="spinfoil-chart">`), so that sinks which
    /// save charts as files (a terminal) save it too; `None` when there is none.
    pub fn inline_chart_svg(&self) -> Option<&str> {
        let html = self.data.get("text/html")?;
        let start = html.find(INLINE_CHART_OPEN)? + INLINE_CHART_OPEN.len();
        let svg = html[start..].strip_suffix(INLINE_CHART_CLOSE)?;
        svg.trim_start().starts_with("<svg").then_some(svg)
    }
}

/// Opens the chart of a study's HTML display (see [`MimeBundle::inline_chart_svg`]).
pub(crate) const INLINE_CHART_OPEN: &str = "<div class=\"spinfoil-chart\">";
/// Closes it; the chart is the last element of the HTML.
pub(crate) const INLINE_CHART_CLOSE: &str = "</div>";

/// Where a running cell sends what it produces, as it produces it (a terminal, a Jupyter iopub
/// socket, a notebook writer). Methods take `&self` so a sink can be shared with Rhai callbacks.
pub trait OutputSink: Send + Sync {
    /// Text printed by `print` (standard output).
    fn stdout(&self, text: &str);
    /// Text printed by `debug` and warnings (standard error).
    fn stderr(&self, text: &str);
    /// A rich display (`show(x)`), optionally with an id so it can be updated later.
    fn display(&self, bundle: &MimeBundle, display_id: Option<&str>);
    /// Replaces the content of an earlier display with the same id (progress of long studies).
    fn update_display(&self, bundle: &MimeBundle, display_id: &str);
}

/// One thing a cell produced, in order.
#[derive(Debug, Clone, PartialEq)]
pub enum OutputEvent {
    /// Standard output text.
    Stdout(String),
    /// Standard error text.
    Stderr(String),
    /// A display, with its optional id.
    Display(MimeBundle, Option<String>),
    /// An update of the display with this id.
    Update(MimeBundle, String),
}

/// A sink that keeps every event in memory, in order (tests, the headless notebook runner).
#[derive(Debug, Default)]
pub struct CollectedOutput {
    events: Mutex<Vec<OutputEvent>>,
}

impl CollectedOutput {
    /// Takes the events collected so far, leaving the sink empty.
    pub fn take(&self) -> Vec<OutputEvent> {
        std::mem::take(&mut *self.lock())
    }

    fn lock(&self) -> std::sync::MutexGuard<'_, Vec<OutputEvent>> {
        self.events.lock().unwrap_or_else(|poisoned| poisoned.into_inner())
    }
}

impl OutputSink for CollectedOutput {
    fn stdout(&self, text: &str) {
        self.lock().push(OutputEvent::Stdout(text.to_string()));
    }
    fn stderr(&self, text: &str) {
        self.lock().push(OutputEvent::Stderr(text.to_string()));
    }
    fn display(&self, bundle: &MimeBundle, display_id: Option<&str>) {
        self.lock().push(OutputEvent::Display(bundle.clone(), display_id.map(str::to_string)));
    }
    fn update_display(&self, bundle: &MimeBundle, display_id: &str) {
        self.lock().push(OutputEvent::Update(bundle.clone(), display_id.to_string()));
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_inline_chart_is_the_svg_after_the_table() {
        let html = format!("<table></table>\n{INLINE_CHART_OPEN}<svg width=\"1\"></svg>{INLINE_CHART_CLOSE}");
        let study = MimeBundle::plain("t").with("text/html", html);
        assert_eq!(study.inline_chart_svg(), Some("<svg width=\"1\"></svg>"));
        let empty = MimeBundle::plain("t").with("text/html", format!("<p>x</p>{INLINE_CHART_OPEN}{INLINE_CHART_CLOSE}"));
        assert_eq!(empty.inline_chart_svg(), None);
        assert_eq!(MimeBundle::plain("t").with("text/html", "<table></table>").inline_chart_svg(), None);
    }
}
