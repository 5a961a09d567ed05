//! Integration tests: wind.
