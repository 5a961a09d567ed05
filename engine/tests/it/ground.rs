//! Integration tests: ground.
