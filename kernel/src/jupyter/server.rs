//! The kernel's event loops: shell and control requests, IOPub publishing, heartbeat, SIGINT.
use super::connection::ConnectionInfo;
use super::handlers::{ControlHandlers, ControlOutcome, ShellHandlers};
use super::iopub::Iopub;
use super::signer::Signer;
use super::limits::KernelLimits;
use super::sockets::{echo_heartbeats, publish_all, receive, send, Intake, Sockets};
use super::wire::WireMessage;
use super::worker::Worker;
use spinfoil_lang::SessionSettings;
use std::time::Duration;
use zeromq::{RouterSocket, ZmqResult};

/// How long the shell waits for more queued requests when aborting after an error, ms.
const QUEUE_DRAIN_MS: u64 = 2;

/// Serves Jupyter clients on the ports of `info` until a `shutdown_request` arrives; messages
/// over the cap of [`KernelLimits::from_env`] are dropped.
pub async fn serve(info: ConnectionInfo, settings: SessionSettings) -> ZmqResult<()> {
    let signer = Signer::new(&info.key);
    let limits = KernelLimits::from_env();
    limits.apply_to_transport();
    let intake = |channel| Intake { channel, signer: signer.clone(), limits };
    let sockets = Sockets::bind(&info).await?;
    let (queue, queued) = tokio::sync::mpsc::unbounded_channel();
    let iopub = Iopub::new(queue);
    let session_id = uuid::Uuid::new_v4().to_string();
    iopub.send(WireMessage::orphan("status", &session_id, serde_json::json!({"execution_state": "starting"})));
    tokio::spawn(publish_all(sockets.iopub, queued, signer.clone()));
    tokio::spawn(echo_heartbeats(sockets.heartbeat));
    let worker = Worker::start(settings);
    tokio::spawn(interrupt_on_sigint(worker.clone()));
    let shell = ShellHandlers::new(worker.clone(), iopub.clone());
    tokio::spawn(shell_loop(sockets.shell, shell, iopub.clone(), intake("shell")));
    let _stdin = sockets.stdin;
    control_loop(sockets.control, ControlHandlers::new(worker), iopub, intake("control")).await;
    tokio::time::sleep(Duration::from_millis(100)).await;
    Ok(())
}

async fn shell_loop(mut socket: RouterSocket, mut handlers: ShellHandlers, iopub: Iopub, intake: Intake) {
    while let Ok(request) = receive(&mut socket, &intake).await {
        serve_one(&mut socket, &mut handlers, &iopub, &intake, &request).await;
    }
}

async fn serve_one(socket: &mut RouterSocket, handlers: &mut ShellHandlers, iopub: &Iopub, intake: &Intake, request: &WireMessage) {
    iopub.status(request, "busy");
    let reply = handlers.handle(request).await;
    if handlers.take_abort() {
        Box::pin(abort_queued(socket, handlers, iopub, intake)).await;
    }
    if let Some(reply) = reply {
        send(socket, &reply, &intake.signer).await;
    }
    iopub.status(request, "idle");
}

/// After a failed cell with `stop_on_error`, the executes already waiting (sent before the
/// failed cell's reply) are answered `aborted`, as Jupyter expects when "run all" meets an
/// error; other waiting requests are served.
async fn abort_queued(socket: &mut RouterSocket, handlers: &mut ShellHandlers, iopub: &Iopub, intake: &Intake) {
    let waiting = Duration::from_millis(QUEUE_DRAIN_MS);
    while let Ok(Ok(request)) = tokio::time::timeout(waiting, receive(socket, intake)).await {
        if request.header.msg_type != "execute_request" {
            serve_one(socket, handlers, iopub, intake, &request).await;
            continue;
        }
        iopub.status(&request, "busy");
        send(socket, &handlers.aborted(&request), &intake.signer).await;
        iopub.status(&request, "idle");
    }
}

async fn control_loop(mut socket: RouterSocket, handlers: ControlHandlers, iopub: Iopub, intake: Intake) {
    while let Ok(request) = receive(&mut socket, &intake).await {
        iopub.status(&request, "busy");
        let (reply, outcome) = handlers.handle(&request);
        if let Some(reply) = reply {
            send(&mut socket, &reply, &intake.signer).await;
        }
        iopub.status(&request, "idle");
        if outcome == ControlOutcome::Shutdown {
            return;
        }
    }
}

async fn interrupt_on_sigint(worker: Worker) {
    while tokio::signal::ctrl_c().await.is_ok() {
        worker.interrupt();
    }
}
