//! Progress bars in the terminal for displays that a long study keeps updating.
use indicatif::{ProgressBar, ProgressStyle};
use spinfoil_lang::MimeBundle;
use std::collections::HashMap;
use std::sync::Mutex;

/// One bar per display id; a `done/total` fraction in the text drives the bar, any other text
/// becomes a spinner's message.
#[derive(Default)]
pub struct ProgressBoard {
    bars: Mutex<HashMap<String, ProgressBar>>,
}

impl ProgressBoard {
    /// Shows or updates the bar of `display_id`.
    pub fn show(&self, bundle: &MimeBundle, display_id: &str) {
        let text = bundle.text_plain().unwrap_or_default().lines().next().unwrap_or_default().to_string();
        let mut bars = self.bars.lock().unwrap_or_else(|p| p.into_inner());
        let bar = bars.entry(display_id.to_string()).or_insert_with(new_bar);
        if let Some((done, total)) = fraction(&text) {
            bar.set_style(bar_style());
            bar.set_length(total);
            bar.set_position(done);
        }
        bar.set_message(text);
    }

    /// Ends every bar, leaving its last state on screen.
    pub fn finish_all(&self) {
        let mut bars = self.bars.lock().unwrap_or_else(|p| p.into_inner());
        for (_, bar) in bars.drain() {
            bar.finish();
        }
    }
}

fn new_bar() -> ProgressBar {
    let bar = ProgressBar::new_spinner();
    bar.enable_steady_tick(std::time::Duration::from_millis(120));
    bar
}

fn bar_style() -> ProgressStyle {
    ProgressStyle::with_template("{bar:30.cyan/blue} {pos}/{len} {msg} [{elapsed}]").unwrap_or_else(|_| ProgressStyle::default_bar())
}

/// The first `done/total` pair of whole numbers in `text`.
pub fn fraction(text: &str) -> Option<(u64, u64)> {
    text.split_whitespace().find_map(|word| {
        let (done, total) = word.trim_matches(|c: char| !c.is_ascii_digit()).split_once('/')?;
        Some((done.parse().ok()?, total.parse().ok()?)).filter(|&(_, t)| t > 0)
    })
}

/// A sink that only draws progress bars for updating displays (the headless runner's observer).
#[derive(Default)]
pub struct ProgressBoardSink {
    board: ProgressBoard,
}

impl spinfoil_lang::OutputSink for ProgressBoardSink {
    fn stdout(&self, _text: &str) {}
    fn stderr(&self, _text: &str) {}
    fn display(&self, bundle: &MimeBundle, display_id: Option<&str>) {
        if let Some(id) = display_id {
            self.board.show(bundle, id);
        }
    }
    fn update_display(&self, bundle: &MimeBundle, display_id: &str) {
        self.board.show(bundle, display_id);
    }
}

impl Drop for ProgressBoardSink {
    fn drop(&mut self) {
        self.board.finish_all();
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn finds_the_fraction_in_a_progress_message() {
        assert_eq!(fraction("sweep: 40/120 throws"), Some((40, 120)));
        assert_eq!(fraction("(3/8)"), Some((3, 8)));
        assert_eq!(fraction("integrating"), None);
        assert_eq!(fraction("0/0"), None);
    }
}
