"""Spinfoil's Jupyter kernel through real Jupyter clients.

`jupyter_kernel_test` (Jupyter's own conformance suite, PyPI) drives the protocol and validates
every message against the messaging-protocol schema; the other tests check robustness: bad
signatures, malformed messages, interrupts, restarts, memory over many executes.
"""
import time
import unittest

import jupyter_kernel_test
import pytest

from kernel_support import RawShell, install_kernelspec, kernel_pid, rss_mb, start_kernel, wait_for_reply

install_kernelspec()

PROTOTYPES = """
let rim = material("Quarry rim blend", 1.30);
let core = material("Tidewater foam core", 0.80);
let outline = driver_outline(#{});
let one = disc("Kestrel one-piece", outline, single_layup(material("Harbor blend", 0.95)), #{ mass_g: 170.0 });
let over = disc("Kestrel overmold", outline, rim_layup(rim, core, #{ split_radius_cm: 9.0 }), #{ mass_g: 170.0 });
"""


class SpinfoilKernelTests(jupyter_kernel_test.KernelTests):
    """Jupyter's kernel conformance tests, every applicable sample filled in."""

    kernel_name = "spinfoil"
    language_name = "spinfoil"
    file_extension = ".rhai"

    code_hello_world = 'print("hello, world")'
    code_stderr = 'debug("a note for stderr")'
    code_generate_error = "let broken = ;"
    code_execute_result = [
        {"code": "6 * 7", "result": "42"},
        {"code": "let spin_rpm = 900; spin_rpm / 60.0", "result": "15.0"},
        {"code": '"Kestrel " + "driver"', "result": "Kestrel driver"},
    ]
    code_display_data = [
        {"code": PROTOTYPES + "show(compare_mass([one, over]));", "mime": "text/html"},
        {"code": PROTOTYPES + "show(compare_mass([one, over]));", "mime": "application/json"},
    ]
    completion_samples = [
        {"text": "throw_rel", "matches": {"throw_release"}},
        {"text": "throw_release(#{ spin_r", "matches": {"spin_rpm", "spin_rps"}},
        {"text": "driver_out", "matches": {"driver_outline"}},
    ]
    complete_code_samples = ["1 + 1", "let carry_m = 95.0;", "fn double(x) { x * 2 }"]
    incomplete_code_samples = ["fn double(x) {", "let speeds = [20, 22,", "let t = throw_release(#{ speed_mps: 24,"]
    invalid_code_samples = ["let broken = ;", "1 + )"]
    code_inspect_sample = "fly"
    code_history_pattern = "6 ?*"
    supported_history_operations = ("tail", "range", "search")

    def test_kernel_info_names_the_highlighting_and_protocol(self):
        self.flush_channels()
        self.kc.kernel_info()
        reply = self.kc.get_shell_msg(timeout=10)
        info = reply["content"]
        self.assertEqual(info["protocol_version"], "5.3")
        self.assertEqual(info["language_info"]["codemirror_mode"], "rust")
        self.assertEqual(info["implementation"], "spinfoil")

    def test_error_points_into_the_cell(self):
        self.flush_channels()
        reply, outputs = self.execute_helper("let a = 1;\nlet b = a + missing_name;")
        self.assertEqual(reply["content"]["status"], "error")
        traceback = "\n".join(outputs[0]["content"]["traceback"])
        self.assertIn("at line 2", traceback)
        self.assertIn("let b = a + missing_name;", traceback)

    def test_user_expressions_are_an_object_with_answers(self):
        self.flush_channels()
        msg_id = self.kc.execute("let d = 3;", user_expressions={"double": "d * 2", "bad": "nope("})
        reply = wait_for_reply(self.kc, msg_id)
        answers = reply["content"]["user_expressions"]
        self.assertEqual(answers["double"]["status"], "ok")
        self.assertEqual(answers["double"]["data"]["text/plain"], "6")
        self.assertEqual(answers["bad"]["status"], "error")

    def test_completion_offers_variables_in_scope(self):
        self.flush_channels()
        self.execute_helper("let release_speed_mps = 24;")
        msg_id = self.kc.complete("release_sp")
        reply = wait_for_reply(self.kc, msg_id)
        self.assertEqual(reply["content"]["matches"], ["release_speed_mps"])
        self.assertEqual((reply["content"]["cursor_start"], reply["content"]["cursor_end"]), (0, 10))

    def test_comm_info_lists_no_comms(self):
        self.flush_channels()
        msg_id = self.kc.comm_info()
        reply = wait_for_reply(self.kc, msg_id)
        self.assertEqual(reply["content"], {"status": "ok", "comms": {}})

    def test_variables_persist_and_counts_grow(self):
        self.flush_channels()
        first, _ = self.execute_helper("let carry_m = 80.5;")
        second, outputs = self.execute_helper("carry_m + 1.0")
        self.assertEqual(second["content"]["execution_count"], first["content"]["execution_count"] + 1)
        result = [m for m in outputs if m["msg_type"] == "execute_result"][0]
        self.assertEqual(result["content"]["data"]["text/plain"], "81.5")


@pytest.fixture
def kernel():
    manager, client = start_kernel()
    yield manager, client
    client.stop_channels()
    manager.shutdown_kernel(now=True)


def test_a_bad_signature_is_dropped_and_the_kernel_still_answers(kernel):
    manager, client = kernel
    raw = RawShell(manager)
    try:
        raw.send(raw.frames("execute_request", {"code": "1"}, signature=b"0" * 64))
        assert raw.reply(0.5) is None, "a message with a bad signature must get no reply"
        raw.send(raw.frames("kernel_info_request", {}))
        answer = raw.reply(10)
        assert answer["msg_type"] == "kernel_info_reply"
    finally:
        raw.close()
    assert manager.is_alive()


def test_malformed_messages_do_not_kill_the_kernel(kernel):
    manager, client = kernel
    raw = RawShell(manager)
    try:
        raw.send([b"no delimiter here"])
        raw.send([b"<IDS|MSG>", b"sig"])
        raw.send([b"<IDS|MSG>", b"sig", b"{not json", b"{}", b"{}", b"{}"])
        raw.send(raw.frames("execute_request", {"no_code": True}))
        answer = raw.reply(10)
        assert answer["msg_type"] == "execute_reply"
        assert answer["content"]["status"] == "error"
        raw.send(raw.frames("no_such_request", {}))
    finally:
        raw.close()
    reply = client.execute_interactive("21 * 2", timeout=10)
    assert reply["content"]["status"] == "ok"
    assert manager.is_alive()


def test_an_interrupt_stops_a_long_cell_within_one_second(kernel):
    manager, client = kernel
    msg_id = client.execute("let n = 0; loop { n += 1; }")
    time.sleep(0.5)
    started = time.monotonic()
    manager.interrupt_kernel()
    reply = wait_for_reply(client, msg_id, timeout_s=10)
    elapsed = time.monotonic() - started
    assert reply["content"]["status"] == "error"
    assert reply["content"]["ename"] == "Interrupted"
    assert elapsed < 1.0, f"the cell stopped {elapsed:.2f} s after the interrupt"
    assert client.execute_interactive("1 + 1", timeout=10)["content"]["status"] == "ok"


def test_executes_queued_behind_a_failing_cell_are_aborted(kernel):
    manager, client = kernel
    failing = client.execute('let n = 0; while n < 200000 { n += 1; } throw "stop here";')
    queued = [client.execute("1 + 1"), client.execute("2 + 2")]
    statuses = replies_by_id(client, [failing, *queued])
    assert [statuses[m] for m in (failing, *queued)] == ["error", "aborted", "aborted"]
    assert client.execute_interactive("3 + 3", timeout=10)["content"]["status"] == "ok"
    quiet = client.execute("throw 1;", stop_on_error=False)
    after = client.execute("4 + 4")
    statuses = replies_by_id(client, [quiet, after])
    assert [statuses[quiet], statuses[after]] == ["error", "ok"]


def replies_by_id(client, msg_ids):
    """The status of the shell reply to each of `msg_ids`, in whatever order they arrive."""
    statuses = {}
    while len(statuses) < len(msg_ids):
        reply = client.get_shell_msg(timeout=15)
        statuses[reply["parent_header"].get("msg_id")] = reply["content"]["status"]
    return statuses


def test_a_restart_gives_a_fresh_kernel(kernel):
    manager, client = kernel
    client.execute_interactive("let kept = 5;", timeout=10)
    manager.restart_kernel(now=False)
    client.wait_for_ready(timeout=30)
    reply = client.execute_interactive("kept", timeout=10)
    assert reply["content"]["status"] == "error"


def test_five_hundred_executes_grow_memory_by_less_than_20_mb(kernel):
    manager, client = kernel
    pid = kernel_pid(manager)
    for _ in range(20):
        client.execute_interactive("let v = [1, 2, 3]; v.len()", timeout=10)
    before = rss_mb(pid)
    for k in range(500):
        reply = client.execute_interactive(f'let v = [1, 2, 3, {k}]; print("cell {k}"); v.len()', timeout=10)
        assert reply["content"]["status"] == "ok"
    growth = rss_mb(pid) - before
    assert growth < 20.0, f"RSS grew by {growth:.1f} MB over 500 executes"


if __name__ == "__main__":
    unittest.main()
