//! The `dynamics` part of the engine (see the crate overview).
