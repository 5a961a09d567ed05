//! The five ZeroMQ sockets of a kernel (pure-Rust `zeromq` on tokio) and frame conversion.
use super::connection::ConnectionInfo;
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

/// Receives the next message that parses and verifies; bad ones are logged to stderr and dropped.
pub async fn receive(socket: &mut impl SocketRecv, signer: &Signer) -> ZmqResult<WireMessage> {
    loop {
        let frames: Vec<Vec<u8>> = socket.recv().await?.into_vec().into_iter().map(|b| b.to_vec()).collect();
        match WireMessage::parse(frames, signer) {
            Ok(message) => return Ok(message),
            Err(error) => log_dropped(&error),
        }
    }
}

fn log_dropped(error: &WireError) {
    eprintln!("spinfoil kernel: message dropped: {error}");
}

/// Signs and sends `message`.
pub async fn send(socket: &mut impl SocketSend, message: &WireMessage, signer: &Signer) {
    let frames: Vec<Bytes> = message.to_frames(signer).into_iter().map(Bytes::from).collect();
    let Ok(zmq_message) = ZmqMessage::try_from(frames) else { return };
    if let Err(error) = socket.send(zmq_message).await {
        eprintln!("spinfoil kernel: could not send {}: {error}", message.header.msg_type);
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
