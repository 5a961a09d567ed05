"""Load figures for the release kernel (run by `bash scripts/bench-kernel load`).

1. RSS of one kernel before and after N executes in a row (each defines a variable, prints a
   line and returns a value), read from /proc after a warm-up of 20 executes.
2. Peak RSS (getrusage of the finished child) and wall time of `spinfoil run` on a script with
   one dispersion study of THROWS throws, and of the same script with 1,000 throws for scale.
"""
import os
import pathlib
import resource
import subprocess
import sys
import time

scratch, executes, throws = pathlib.Path(sys.argv[1]), int(sys.argv[2]), int(sys.argv[3])
REPO = pathlib.Path(__file__).resolve().parent.parent
BINARY = REPO / "target" / "release" / "spinfoil"


def rss_mb(pid):
    for line in pathlib.Path(f"/proc/{pid}/status").read_text().splitlines():
        if line.startswith("VmRSS:"):
            return int(line.split()[1]) / 1024.0
    raise RuntimeError("no VmRSS")


def executes_in_a_row():
    os.environ["JUPYTER_PATH"] = str(scratch / "release" / "share" / "jupyter")
    from jupyter_client.manager import KernelManager
    manager = KernelManager(kernel_name="spinfoil")
    manager.start_kernel()
    client = manager.client()
    client.start_channels()
    client.wait_for_ready(timeout=30)
    pid = manager.provisioner.process.pid
    quiet = {"output_hook": lambda msg: None}
    for k in range(20):
        client.execute_interactive(f"let warm = {k}; warm * 2", timeout=30, **quiet)
    before = rss_mb(pid)
    began = time.perf_counter()
    for k in range(executes):
        reply = client.execute_interactive(f'let v_{k % 50} = [1, 2, 3, {k}]; print("cell {k}"); v_{k % 50}.len()', timeout=30, **quiet)
        assert reply["content"]["status"] == "ok", reply["content"]
    elapsed = time.perf_counter() - began
    after = rss_mb(pid)
    client.stop_channels()
    manager.shutdown_kernel(now=True)
    print(f"{executes} executes on one kernel: RSS {before:.1f} MB before, {after:.1f} MB after "
          f"({after - before:+.1f} MB), {elapsed:.1f} s ({elapsed / executes * 1e3:.2f} ms each)")


DISPERSION = """
let plate = material("soft base blend", 0.95);
let rim = material("dense rim blend", 1.24);
let d = disc("P-7 rim-heavy", driver_outline(#{ diameter_cm: 21.1 }),
             rim_layup(rim, plate, #{ split_radius_cm: 8.4 }), #{ mass_g: 174 });
let t = throw_release(#{ speed_mps: 24, spin_rpm: 1100, launch_deg: 10, nose_deg: 1, hyzer_deg: 5 });
let s = dispersion(d, t, environment(#{}), #{ count: COUNT, seed: 7,
    scatter: #{ speed_mps: normal(0.0, 0.8), hyzer_deg: normal(0.0, 3.0), launch_deg: uniform(-1.0, 1.0) },
    target: #{ x_m: 90, y_m: 0, radius_m: 10 } });
print(`rows: ${s.rows.len()}`);
"""


def dispersion_peak(count):
    script = scratch / f"dispersion_{count}.rhai"
    script.write_text(DISPERSION.replace("COUNT", str(count)))
    began = time.perf_counter()
    child = subprocess.Popen([str(BINARY), "run", str(script), "--out", str(scratch / f"out_{count}")],
                             stdout=subprocess.PIPE, stderr=subprocess.PIPE, text=True)
    _, _, usage = os.wait4(child.pid, 0)
    elapsed = time.perf_counter() - began
    out = child.stdout.read()
    rows = [line for line in out.splitlines() if line.startswith("rows:")]
    print(f"dispersion of {count} throws: peak RSS {usage.ru_maxrss / 1024:.1f} MB, {elapsed:.1f} s, summary "
          f"{rows[-1] if rows else 'no rows line: ' + child.stderr.read()[-500:]}")


executes_in_a_row()
dispersion_peak(1000)
dispersion_peak(throws)
