//! Displays: tables and charts that render themselves as MIME bundles.
