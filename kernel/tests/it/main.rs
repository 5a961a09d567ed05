//! Integration tests of the `spinfoil` binary, one module per capability.
mod atomic_save;
mod command_line;
mod robustness;
mod sandbox_options;
mod rust_cells;
mod shards;
mod support;
