//! A hidden, test-only way to make a cell panic inside the session thread, so tests can check
//! that a panic becomes an `InternalError` reply and the session goes on (`worker.rs`).
//!
//! Off unless the kernel was started with the environment variable
//! `SPINFOIL_KERNEL_TEST_HOOKS=1`; then a cell whose whole code is [`PANIC_CELL`] panics before
//! it runs. Users never see it: without the variable that code is an ordinary (undefined) name.

/// The environment variable that turns the test hooks on (value `1`).
pub const TEST_HOOKS_ENV: &str = "SPINFOIL_KERNEL_TEST_HOOKS";

/// The cell that panics when the hooks are on.
pub const PANIC_CELL: &str = "__spinfoil_test_panic__";

/// Panics if the test hooks are on and `code` is the panic cell.
pub fn panic_if_asked(code: &str) {
    if code.trim() == PANIC_CELL && hooks_on() {
        panic!("test hook: a deliberate panic inside the session ({TEST_HOOKS_ENV}=1)");
    }
}

fn hooks_on() -> bool {
    std::env::var(TEST_HOOKS_ENV).is_ok_and(|v| v == "1")
}
