//! Studies: sweeps, dispersion, calibration, optimisation and flight signatures (parallel, seeded, deterministic).
