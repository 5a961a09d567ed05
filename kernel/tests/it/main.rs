//! Integration tests of the `spinfoil` binary, one module per capability.
mod command_line;
mod shards;
mod support;
