//! The `flight` part of the engine (see the crate overview).
