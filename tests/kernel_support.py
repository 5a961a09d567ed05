"""Shared helpers for the tests of Spinfoil's Jupyter kernel and notebook runner.

The kernel under test is the debug binary `target/debug/spinfoil` that `scripts/test-all` builds;
its kernelspec is installed into this Python environment (`sys.prefix`) so that Jupyter clients
find it by the name `spinfoil`.
"""
import json
import pathlib
import subprocess
import sys
import time
import uuid

import zmq
from jupyter_client.manager import start_new_kernel
from jupyter_client.session import Session

REPO = pathlib.Path(__file__).resolve().parent.parent
BINARY = REPO / "target" / "debug" / ("spinfoil.exe" if sys.platform == "win32" else "spinfoil")
KERNEL_NAME = "spinfoil"
# Example notebooks run by the tests; rust_cells_*.ipynb need the optional Rust-cell feature and
# are tested by their own step.
NOTEBOOKS = sorted(p for p in (REPO / "notebooks").glob("*.ipynb") if not p.name.startswith("rust_cells_"))


def install_kernelspec() -> None:
    """Installs the kernelspec of the debug binary into this Python environment (idempotent)."""
    if not BINARY.exists():
        subprocess.run(["cargo", "build", "-q", "-p", "spinfoil-kernel"], cwd=REPO, check=True)
    subprocess.run([str(BINARY), "install-kernel", "--prefix", sys.prefix], check=True, capture_output=True)


def start_kernel():
    """Starts a Spinfoil kernel; returns (manager, blocking client) with channels running."""
    install_kernelspec()
    return start_new_kernel(kernel_name=KERNEL_NAME, startup_timeout=30)


def run_spinfoil(*args: str, cwd=None) -> subprocess.CompletedProcess:
    """Runs the `spinfoil` binary with `args`; returns the finished process (output as text)."""
    return subprocess.run([str(BINARY), *args], cwd=cwd, capture_output=True, text=True, check=False)


def kernel_pid(manager) -> int:
    """The process id of the kernel started by `manager` (local provisioner)."""
    return manager.provisioner.process.pid


def rss_mb(pid: int) -> float:
    """Resident set size of process `pid`, in MB (Linux /proc)."""
    for line in pathlib.Path(f"/proc/{pid}/status").read_text().splitlines():
        if line.startswith("VmRSS:"):
            return int(line.split()[1]) / 1024.0
    raise RuntimeError(f"no VmRSS for process {pid}")


class RawShell:
    """A bare DEALER socket on the kernel's shell port, to send hand-made (bad) messages."""

    def __init__(self, manager):
        info = manager.get_connection_info()
        self.key = info["key"] if isinstance(info["key"], bytes) else info["key"].encode()
        self.context = zmq.Context()
        self.socket = self.context.socket(zmq.DEALER)
        self.socket.setsockopt(zmq.LINGER, 0)
        self.socket.connect(f"{info['transport']}://{info['ip']}:{info['shell_port']}")
        self.session = Session(key=self.key)

    def frames(self, msg_type: str, content: dict, signature: bytes | None = None) -> list[bytes]:
        """The frames of a message; its true signature unless `signature` is given."""
        header = json.dumps({"msg_id": uuid.uuid4().hex, "session": uuid.uuid4().hex, "username": "test",
                             "date": "", "msg_type": msg_type, "version": "5.3"}).encode()
        parts = [header, b"{}", b"{}", json.dumps(content).encode()]
        true_signature = self.session.sign(parts)
        return [b"<IDS|MSG>", signature if signature is not None else true_signature, *parts]

    def send(self, frames: list[bytes]) -> None:
        """Sends raw frames."""
        self.socket.send_multipart(frames)

    def reply(self, timeout_s: float) -> dict | None:
        """The next reply's content and type, or None if nothing arrives in `timeout_s`."""
        if not self.socket.poll(int(timeout_s * 1000)):
            return None
        frames = self.socket.recv_multipart()
        at = frames.index(b"<IDS|MSG>")
        header = json.loads(frames[at + 2])
        return {"msg_type": header["msg_type"], "content": json.loads(frames[at + 5])}

    def close(self) -> None:
        """Closes the socket."""
        self.socket.close()
        self.context.term()


def wait_for_reply(client, msg_id: str, timeout_s: float = 15.0) -> dict:
    """The shell reply whose parent is `msg_id` (other replies are skipped)."""
    deadline = time.monotonic() + timeout_s
    while True:
        reply = client.get_shell_msg(timeout=max(0.01, deadline - time.monotonic()))
        if reply["parent_header"].get("msg_id") == msg_id:
            return reply
