//! Integration tests: study.
