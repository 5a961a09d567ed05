//! `spinfoil-rust-runtime`: the helper process of Rust cells (feature `rust-cells`). evcxr
//! starts it to load and run each compiled cell, and as a wrapper around rustc; it is never
//! run by hand.
fn main() {
    evcxr::runtime_hook();
    eprintln!("spinfoil-rust-runtime runs Rust notebook cells for the spinfoil kernel; it is not meant to be started by hand.");
    std::process::exit(2);
}
