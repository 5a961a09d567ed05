//! The `mesh` part of the engine (see the crate overview).
