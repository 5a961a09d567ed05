//! The `geometry` part of the engine (see the crate overview).
