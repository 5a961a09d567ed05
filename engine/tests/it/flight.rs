//! Integration tests: flight.
