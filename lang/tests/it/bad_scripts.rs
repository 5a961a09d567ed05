//! Integration tests: bad_scripts.
