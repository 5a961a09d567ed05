//! All spinfoil-lang integration tests, compiled into one binary.
mod bad_input_page;
mod bad_scripts;
mod chart_lines;
mod display;
mod json_files;
mod language;
mod limits;
mod naming;
mod packages;
mod session;
mod sandbox;
mod studies;
mod wobble;
