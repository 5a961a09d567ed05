//! A standalone HTML report of an executed notebook: markdown, code, tables, inline SVG charts,
//! errors, and the safety caution in the footer.
use super::document::{multiline_text, Notebook};
use serde_json::Value;

/// The caution shown in every report's footer (the project's wording).
pub use spinfoil_lang::SAFETY_CAUTION;

const STYLE: &str = "body{font-family:system-ui,sans-serif;max-width:60rem;margin:2rem auto;padding:0 1rem;color:#1b2a30}\
pre{background:#f3f6f7;padding:.6rem;overflow-x:auto;border-radius:4px}\
pre.code{border-left:3px solid #2f8f9d}pre.stderr{background:#fff4e5}pre.error{background:#fdecea;color:#8a1c12}\
.count,.source{color:#6b7f86;font-size:.8rem}table{border-collapse:collapse;margin:.5rem 0}\
td,th{border:1px solid #c9d5d9;padding:.2rem .5rem}.output svg{max-width:100%;height:auto}\
footer{margin-top:3rem;border-top:1px solid #c9d5d9;padding-top:1rem;font-size:.9rem;color:#4b5f66}";

/// The report of `notebook`, read from the file `source_name`; titled by its first heading.
pub fn html_report(notebook: &Notebook, source_name: &str) -> String {
    let title = first_heading(notebook).unwrap_or_else(|| source_name.to_string());
    let mut body = String::new();
    for (index, cell) in notebook.cells().iter().enumerate() {
        body.push_str(&match cell.cell_type.as_str() {
            "markdown" => format!("<section class=\"markdown\">{}</section>\n", markdown_to_html(&cell.source)),
            "code" => code_cell(notebook, index, &cell.source),
            _ => String::new(),
        });
    }
    format!(
        "<!DOCTYPE html>\n<html lang=\"en\">\n<head>\n<meta charset=\"utf-8\">\n<title>{title}</title>\n<style>{STYLE}</style>\n</head>\n<body>\n<p class=\"source\">Spinfoil report of {source}</p>\n{body}<footer>\n<p><strong>Safety.</strong> {SAFETY_CAUTION}</p>\n<p>Report written by Spinfoil {version}.</p>\n</footer>\n</body>\n</html>\n",
        title = escape(&title),
        source = escape(source_name),
        version = env!("CARGO_PKG_VERSION"),
    )
}

fn first_heading(notebook: &Notebook) -> Option<String> {
    let cells = notebook.cells();
    let markdown = cells.iter().find(|c| c.cell_type == "markdown")?;
    let line = markdown.source.lines().find(|l| l.starts_with('#'))?;
    Some(line.trim_start_matches('#').trim().to_string())
}

fn code_cell(notebook: &Notebook, index: usize, source: &str) -> String {
    if source.trim().is_empty() {
        return String::new();
    }
    let count = notebook.json()["cells"][index]["execution_count"].as_u64().map_or(" ".to_string(), |n| n.to_string());
    let outputs: String = notebook.outputs(index).iter().map(output_html).collect();
    format!(
        "<section class=\"cell\">\n<div class=\"count\">[{count}]</div>\n<pre class=\"code\">{}</pre>\n<div class=\"output\">{outputs}</div>\n</section>\n",
        escape(source)
    )
}

fn output_html(output: &Value) -> String {
    match output["output_type"].as_str() {
        Some("stream") => {
            let class = if output["name"] == "stderr" { "stream stderr" } else { "stream" };
            format!("<pre class=\"{class}\">{}</pre>\n", escape(&multiline_text(output.get("text"))))
        }
        Some("display_data") | Some("execute_result") => rich_html(&output["data"]),
        Some("error") => {
            let lines: Vec<&str> = output["traceback"].as_array().into_iter().flatten().filter_map(Value::as_str).collect();
            format!("<pre class=\"error\">{}</pre>\n", escape(&lines.join("\n")))
        }
        _ => String::new(),
    }
}

/// The richest rendering of a MIME bundle that a browser shows without scripts.
fn rich_html(data: &Value) -> String {
    let text = |mime: &str| data.get(mime).map(|v| multiline_text(Some(v)));
    if let Some(svg) = text("image/svg+xml") {
        return format!("<figure>{svg}</figure>\n");
    }
    if let Some(html) = text("text/html") {
        return format!("<div class=\"html\">{html}</div>\n");
    }
    if let Some(png) = text("image/png") {
        return format!("<img alt=\"chart\" src=\"data:image/png;base64,{}\">\n", png.trim());
    }
    text("text/plain").map_or_else(String::new, |plain| format!("<pre>{}</pre>\n", escape(&plain)))
}

/// CommonMark to HTML (pulldown-cmark), tables allowed.
pub fn markdown_to_html(markdown: &str) -> String {
    let options = pulldown_cmark::Options::ENABLE_TABLES | pulldown_cmark::Options::ENABLE_STRIKETHROUGH;
    let parser = pulldown_cmark::Parser::new_ext(markdown, options);
    let mut html = String::new();
    pulldown_cmark::html::push_html(&mut html, parser);
    html
}

/// Escapes text for HTML content and attribute values.
pub fn escape(text: &str) -> String {
    text.replace('&', "&amp;").replace('<', "&lt;").replace('>', "&gt;").replace('"', "&quot;")
}

#[cfg(test)]
mod tests {
    use super::*;
    use serde_json::json;

    #[test]
    fn renders_markdown_code_svg_tables_errors_and_the_caution() {
        let notebook = Notebook::from_json(json!({"nbformat": 4, "nbformat_minor": 5, "metadata": {}, "cells": [
            {"cell_type": "markdown", "source": "# Wing study\nTwo *invented* prototypes.", "metadata": {}},
            {"cell_type": "code", "source": "a < b", "metadata": {}, "execution_count": 3, "outputs": [
                {"output_type": "display_data", "data": {"image/svg+xml": "<svg id=\"c\"></svg>", "text/plain": "chart"}, "metadata": {}},
                {"output_type": "execute_result", "data": {"text/html": "<table><tr><td>1</td></tr></table>"}, "metadata": {}, "execution_count": 3},
                {"output_type": "error", "ename": "E", "evalue": "v", "traceback": ["E: v", "  at line 1"]}
            ]}
        ]})).unwrap();
        let html = html_report(&notebook, "study & notes.ipynb");
        assert!(html.contains("<h1>Wing study</h1>"));
        assert!(html.contains("<em>invented</em>"));
        assert!(html.contains("<pre class=\"code\">a &lt; b</pre>"));
        assert!(html.contains("<svg id=\"c\"></svg>"));
        assert!(html.contains("<table><tr><td>1</td></tr></table>"));
        assert!(html.contains("E: v\n  at line 1"));
        assert!(html.contains("[3]"));
        assert!(html.contains("<title>Wing study</title>"));
        assert!(html.contains("report of study &amp; notes.ipynb"));
        assert!(html.contains(SAFETY_CAUTION));
    }
}
