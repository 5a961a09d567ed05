//! Integration tests: packages.
