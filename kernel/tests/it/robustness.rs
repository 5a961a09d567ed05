//! The Jupyter kernel process under bad transport input: raw bytes that are not ZeroMQ, and a
//! frame header announcing a terabyte (which aborted the unpatched transport, see
//! third_party/zeromq/SPINFOIL.md). The kernel must log each, stay up and answer `kernel_info`.
//! Message-level cases (bad JSON, signatures, sizes, a panic in a cell) are in
//! tests/test_kernel_robustness.py; the fuzz targets' regressions are at the end.
use crate::support::scratch;
use serde_json::json;
use spinfoil_kernel::jupyter::{Signer, WireMessage};
use std::io::{Read, Write};
use std::net::{TcpListener, TcpStream};
use std::process::{Child, Command, Stdio};
use std::time::Duration;
use zeromq::{DealerSocket, Socket, SocketRecv, SocketSend, ZmqMessage};

const KEY: &str = "robustness-key";

/// A kernel process on free loopback ports, its stderr in a file; killed on drop.
struct Kernel {
    child: Child,
    ports: Vec<u16>,
    log: std::path::PathBuf,
}

impl Drop for Kernel {
    fn drop(&mut self) {
        let _ = self.child.kill();
        let _ = self.child.wait();
    }
}

fn free_port() -> u16 {
    TcpListener::bind("127.0.0.1:0").and_then(|l| l.local_addr()).expect("a free port").port()
}

fn start_kernel(label: &str) -> Kernel {
    let folder = scratch(label);
    let ports: Vec<u16> = (0..5).map(|_| free_port()).collect();
    let connection = json!({"transport": "tcp", "ip": "127.0.0.1", "shell_port": ports[0], "control_port": ports[1],
        "iopub_port": ports[2], "hb_port": ports[3], "stdin_port": ports[4], "key": KEY,
        "signature_scheme": "hmac-sha256"});
    let file = folder.join("connection.json");
    std::fs::write(&file, connection.to_string()).unwrap();
    let log = folder.join("kernel.log");
    let child = Command::new(env!("CARGO_BIN_EXE_spinfoil"))
        .args(["kernel", file.to_str().unwrap()])
        .stdout(Stdio::null())
        .stderr(std::fs::File::create(&log).unwrap())
        .spawn()
        .expect("the kernel starts");
    let kernel = Kernel { child, ports, log };
    for _ in 0..200 {
        if TcpStream::connect(("127.0.0.1", kernel.ports[0])).is_ok() {
            return kernel;
        }
        std::thread::sleep(Duration::from_millis(25));
    }
    panic!("the kernel did not open its shell port");
}

/// A ZMTP 3.0 greeting with the NULL mechanism, as a peer sends it first.
fn greeting() -> Vec<u8> {
    let mut bytes = vec![0xff, 0, 0, 0, 0, 0, 0, 0, 0, 0x7f, 3, 0];
    bytes.extend_from_slice(b"NULL");
    bytes.resize(64, 0);
    bytes
}

/// Sends the greeting and a long-frame header announcing `length` bytes, then hangs up.
fn announce_frame(port: u16, length: u64) {
    let mut peer = TcpStream::connect(("127.0.0.1", port)).unwrap();
    peer.set_read_timeout(Some(Duration::from_secs(5))).unwrap();
    peer.write_all(&greeting()).unwrap();
    let mut theirs = [0_u8; 64];
    let _ = peer.read(&mut theirs);
    let mut header = vec![0x02];
    header.extend_from_slice(&length.to_be_bytes());
    let _ = peer.write_all(&header);
    std::thread::sleep(Duration::from_millis(100));
}

/// Sends raw bytes that are not ZeroMQ at all, then hangs up.
fn send_garbage(port: u16, seed: u64) {
    let mut state = seed;
    let bytes: Vec<u8> = (0..4096)
        .map(|_| {
            state = state.wrapping_mul(6364136223846793005).wrapping_add(1442695040888963407);
            (state >> 56) as u8
        })
        .collect();
    if let Ok(mut peer) = TcpStream::connect(("127.0.0.1", port)) {
        let _ = peer.write_all(&bytes);
    }
}

/// The `kernel_info_reply` to a request sent on the shell port, through a real ZeroMQ peer.
fn kernel_info(port: u16) -> WireMessage {
    let runtime = tokio::runtime::Builder::new_current_thread().enable_all().build().unwrap();
    runtime.block_on(async {
        let signer = Signer::new(KEY);
        let mut dealer = DealerSocket::new();
        dealer.connect(&format!("tcp://127.0.0.1:{port}")).await.expect("the shell port accepts");
        let request = WireMessage::orphan("kernel_info_request", "robustness", json!({}));
        let frames: Vec<bytes::Bytes> = request.to_frames(&signer).into_iter().map(Into::into).collect();
        dealer.send(ZmqMessage::try_from(frames).unwrap()).await.unwrap();
        let reply = tokio::time::timeout(Duration::from_secs(20), dealer.recv()).await.expect("a reply in time").unwrap();
        let frames = reply.into_vec().into_iter().map(|b| b.to_vec()).collect();
        WireMessage::parse(frames, &signer).expect("the reply is signed")
    })
}

#[test]
fn a_frame_announcing_a_terabyte_and_raw_garbage_leave_the_kernel_serving() {
    let mut kernel = start_kernel("robustness-transport");
    for (k, &port) in kernel.ports.clone().iter().enumerate() {
        announce_frame(port, 1 << 40);
        announce_frame(port, u64::MAX);
        send_garbage(port, k as u64 + 1);
    }
    let reply = kernel_info(kernel.ports[0]);
    assert_eq!(reply.header.msg_type, "kernel_info_reply");
    assert_eq!(reply.content["status"], "ok");
    assert!(kernel.child.try_wait().unwrap().is_none(), "the kernel is still running");
    let log = std::fs::read_to_string(&kernel.log).unwrap();
    assert!(log.contains("spinfoil kernel: transport: oversized message: a peer announced a frame of 1099511627776 bytes"), "{log}");
}
