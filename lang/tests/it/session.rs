//! Integration tests: session.
