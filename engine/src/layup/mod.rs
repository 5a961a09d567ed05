//! The `layup` part of the engine (see the crate overview).
