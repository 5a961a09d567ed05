//! Integration tests: air.
