//! Integration tests: throw.
