//! The Jupyter kernel, in the protocol's layers: connection file → wire format and signing →
//! sockets → handlers → a `spinfoil_lang::Session` on its own thread.
mod cell_sink;
pub mod connection;
pub mod handlers;
pub mod header;
pub mod history;
pub mod incident_log;
pub mod iopub;
pub mod limits;
pub mod messages;
mod server;
pub mod signer;
pub mod sockets;
pub mod test_hooks;
pub mod wire;
pub mod worker;

pub use connection::{ConnectionError, ConnectionInfo};
pub use limits::KernelLimits;
pub use signer::Signer;
pub use wire::{WireError, WireMessage};

use std::path::Path;

/// Why the kernel stopped with an error.
#[derive(Debug, thiserror::Error)]
#[non_exhaustive]
pub enum KernelError {
    /// The connection file could not be used.
    #[error(transparent)]
    Connection(#[from] ConnectionError),
    /// A socket could not be bound or failed.
    #[error("ZeroMQ socket error: {0}")]
    Socket(#[from] zeromq::ZmqError),
    /// The async runtime could not start.
    #[error("cannot start the async runtime: {0}")]
    Runtime(#[from] std::io::Error),
}

/// Runs the kernel for the connection file at `path` until Jupyter shuts it down, with the
/// session's defaults and the current folder (where Jupyter starts a kernel: the notebook's
/// folder) as the study folder.
pub fn run_kernel(path: &Path) -> Result<(), KernelError> {
    run_kernel_with(path, spinfoil_lang::SessionSettings::in_folder("."))
}

/// Runs the kernel for the connection file at `path` with a session of `settings` (study
/// folder, read-only folders, limits) until Jupyter shuts it down.
pub fn run_kernel_with(path: &Path, settings: spinfoil_lang::SessionSettings) -> Result<(), KernelError> {
    let info = ConnectionInfo::load(path)?;
    let runtime = tokio::runtime::Builder::new_multi_thread().worker_threads(2).enable_all().build()?;
    runtime.block_on(server::serve(info, settings))?;
    runtime.shutdown_timeout(std::time::Duration::from_millis(200));
    Ok(())
}
