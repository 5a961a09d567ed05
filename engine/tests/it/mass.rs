//! Integration tests: mass.
