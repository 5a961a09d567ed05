//! Property-based tests (proptest) of the engine's invariants: mass properties positive and
//! additive over regions, energy never gained in flight or on the ground, mirror symmetry of
//! left- and right-hand throws. Case counts are modest (48–64) so the debug test profile runs
//! them in seconds; `PROPTEST_CASES=1000 cargo test -p spinfoil-engine --test it properties`
//! runs a longer search.
mod energy;
mod mass;
mod mirror;

/// `cases` cases, unless the environment variable `PROPTEST_CASES` asks for another number.
fn config(cases: u32) -> proptest::test_runner::Config {
    let default = proptest::test_runner::Config::default();
    if std::env::var_os("PROPTEST_CASES").is_some() {
        default
    } else {
        proptest::test_runner::Config { cases, ..default }
    }
}
