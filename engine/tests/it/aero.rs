//! Integration tests: aero.
