//! The five ZeroMQ sockets of a kernel (pure-Rust `zeromq` on tokio) and frame conversion.
use super::connection::ConnectionInfo;
use super::incident_log::{log_incident, Incident};
use super::limits::KernelLimits;
use super::signer::Signer;
use super::wire::{WireError, WireMessage};
use bytes::Bytes;
use tokio::sync::mpsc::UnboundedReceiver;
use zeromq::{PubSocket, RepSocket, RouterSocket, Socket, SocketRecv, SocketSend, ZmqMessage, ZmqResult};

/// The bound sockets: shell, control and stdin (ROUTER), IOPub (PUB), heartbeat (REP).
pub struct Sockets {
    /// Requests from clients.
    pub shell: RouterSocket,
    /// Interrupt, shutdown and other urgent requests.
    pub control: RouterSocket,
    /// Input requests to the client (kept bound; cells never ask for input).
    pub stdin: RouterSocket,
    /// Broadcast of status, inputs and outputs.
    pub iopub: PubSocket,
    /// Echo socket for liveness checks.
    pub heartbeat: RepSocket,
}

impl Sockets {
    /// Binds every socket to the ports of `info`.
    pub async fn bind(info: &ConnectionInfo) -> ZmqResult<Self> {
        let mut sockets = Self {
            shell: RouterSocket::new(),
            control: RouterSocket::new(),
            stdin: RouterSocket::new(),
            iopub: PubSocket::new(),
            heartbeat: RepSocket::new(),
        };
        sockets.shell.bind(&info.endpoint(info.shell_port)).await?;
        sockets.control.bind(&info.endpoint(info.control_port)).await?;
        sockets.stdin.bind(&info.endpoint(info.stdin_port)).await?;
        sockets.iopub.bind(&info.endpoint(info.iopub_port)).await?;
        sockets.heartbeat.bind(&info.endpoint(info.hb_port)).await?;
        Ok(sockets)
    }
}

/// What a request socket accepts: its channel's name (for the log), the signing key and the
/// size cap.
#[derive(Clone)]
pub struct Intake {
    /// `shell` or `control`.
    pub channel: &'static str,
    /// Verifies signatures.
    pub signer: Signer,
    /// The size cap.
    pub limits: KernelLimits,
}

/// Receives the next message that fits the size cap, parses and verifies; bad ones are logged
/// to stderr by case (rate-limited) and dropped without a reply.
pub async fn receive(socket: &mut impl SocketRecv, intake: &Intake) -> ZmqResult<WireMessage> {
    loop {
        let frames = socket.recv().await?.into_vec();
        match accept(frames, intake) {
            Ok(message) => return Ok(message),
            Err(error) => log_incident(intake.channel, Incident::of_wire(&error), &error),
        }
    }
}

/// Checks the size of `frames` before copying them, then parses and verifies them.
pub fn accept(frames: Vec<Bytes>, intake: &Intake) -> Result<WireMessage, WireError> {
    let bytes = frames.iter().map(Bytes::len).fold(0_usize, usize::saturating_add);
    let limit = intake.limits.max_message_bytes;
    if bytes > limit {
        return Err(WireError::TooLarge { bytes, limit });
    }
    WireMessage::parse_within(frames.into_iter().map(|b| b.to_vec()).collect(), &intake.signer, limit)
}

/// Signs and sends `message`; a failure (e.g. the client has gone) is logged and otherwise
/// ignored, so the kernel serves the next request.
pub async fn send(socket: &mut impl SocketSend, message: &WireMessage, signer: &Signer) {
    let frames: Vec<Bytes> = message.to_frames(signer).into_iter().map(Bytes::from).collect();
    let Ok(zmq_message) = ZmqMessage::try_from(frames) else { return };
    if let Err(error) = socket.send(zmq_message).await {
        let detail = format!("could not send {}: {error}", message.header.msg_type);
        log_incident("send", Incident::Undeliverable, detail);
    }
}

/// Publishes every queued IOPub message, in order, until the queue closes.
pub async fn publish_all(mut socket: PubSocket, mut queue: UnboundedReceiver<WireMessage>, signer: Signer) {
    while let Some(message) = queue.recv().await {
        send(&mut socket, &message, &signer).await;
    }
}

/// Echoes every heartbeat back.
pub async fn echo_heartbeats(mut socket: RepSocket) {
    while let Ok(ping) = socket.recv().await {
        if socket.send(ping).await.is_err() {
            eprintln!("spinfoil kernel: heartbeat reply failed");
        }
    }
}
