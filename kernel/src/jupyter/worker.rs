//! The thread that owns the [`Session`]: cells run here, so the control socket stays free to
//! interrupt them.
use super::incident_log::{log_incident, Incident};
use spinfoil_lang::{InterruptHandle, Session, SessionSettings};
use std::panic::{catch_unwind, AssertUnwindSafe};
use std::sync::mpsc;
use tokio::sync::oneshot;

type Job = Box<dyn FnOnce(&mut Session) + Send>;

/// A handle to the session thread; cheap to clone.
#[derive(Clone)]
pub struct Worker {
    jobs: mpsc::Sender<Job>,
    interrupt: InterruptHandle,
}

impl Worker {
    /// Starts the session thread with `settings`.
    pub fn start(settings: SessionSettings) -> Self {
        let (jobs, queue) = mpsc::channel::<Job>();
        let (handle_tx, handle_rx) = mpsc::sync_channel(1);
        std::thread::Builder::new()
            .name("spinfoil-session".into())
            .spawn(move || serve(settings, queue, handle_tx))
            .expect("the operating system starts a thread");
        let interrupt = handle_rx.recv().expect("the session thread sends its interrupt handle");
        Self { jobs, interrupt }
    }

    /// Runs `job` on the session thread and waits for its result (None if the job panicked).
    pub async fn run<R, F>(&self, job: F) -> Option<R>
    where
        R: Send + 'static,
        F: FnOnce(&mut Session) -> R + Send + 'static,
    {
        let (tx, rx) = oneshot::channel();
        let boxed: Job = Box::new(move |session| {
            let _ = tx.send(job(session));
        });
        self.jobs.send(boxed).ok()?;
        rx.await.ok()
    }

    /// Stops the running cell (it ends with an `Interrupted` error within a second; a Rust cell's
    /// process is ended, see [`crate::rust_cells::interrupt`]).
    pub fn interrupt(&self) {
        self.interrupt.interrupt();
        crate::rust_cells::interrupt();
    }
}

fn serve(settings: SessionSettings, queue: mpsc::Receiver<Job>, handle_tx: mpsc::SyncSender<InterruptHandle>) {
    let mut session = Session::new(settings);
    let _ = handle_tx.send(session.interrupt_handle());
    for job in queue {
        if catch_unwind(AssertUnwindSafe(|| job(&mut session))).is_err() {
            log_incident("session", Incident::Panic, "the request was answered with an InternalError; the session continues");
        }
    }
}
