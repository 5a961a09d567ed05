//! Integration tests: display.
