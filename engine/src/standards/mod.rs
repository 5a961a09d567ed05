//! The `standards` part of the engine (see the crate overview).
