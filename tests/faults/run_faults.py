#!/usr/bin/env python3
"""Faults a user's machine produces, through the `veer` command line (issue 19's trial):

    run_faults.py --veer build/app/veer --work DIR CHECK

CHECK is one of:
  bad-paths   a device, a FIFO, a folder and a symlink to a device as the case file or as the
              case's coordinates: exit 2 with one line, within a second of veer's own start
              (no read, no wait; the start is measured with --version, as load varies)
  arguments   mistakes in the arguments (a missing case, an unknown option, a 5000-character
              path): exit 2 with one line, never the parser's own codes or "internal error"
  two-runs    two identical runs started at once into one folder: exactly one runs, the other is
              refused naming the first (pid, host, start time); the first's history is whole
  damaged-checkpoint  restarts from a checkpoint with one flipped byte at 40 offsets: each is
              refused (exit 2, one line) or, for a byte no reader uses, restarts; never a crash
  full-disk   a run whose file system fills up after its first checkpoint (a 2 MB tmpfs, mounted
              directly as root or in a user namespace): exit 2 with one line, no crash, and the
              last good checkpoint still restarts. Exits 77 (skipped) where no tmpfs can be made.
Each prints what it measured and exits 1 on the first failure.
"""
import argparse
import os
import signal
import subprocess
import sys
import time

ENV = dict(os.environ, OMP_WAIT_POLICY="PASSIVE", OMP_NUM_THREADS="1")
SKIPPED = 77

# A survey drone's wing section on a tiny grid: fast enough for a few hundred steps a second.
CASE = """[geometry]
naca = "2412"
name = "survey drone wing"
[mesh]
around = 32
normal = 8
wake = 6
far_field = 10
first_cell = 0.01
[flow]
reynolds = 1000
alpha = 2
[run]
mode = "steady"
steps = {steps}
checkpoint_every = {every}
cfl = 2
steady_scheme = "classic"
residual_drop = 1e-14
force_tolerance = 1e-12
"""


def veer(args, work, timeout=60, **kw):
    start = time.monotonic()
    r = subprocess.run(args, capture_output=True, timeout=timeout, env=ENV, cwd=work, **kw)
    return r, time.monotonic() - start


def fail(message):
    print("FAILED: " + message)
    sys.exit(1)


def expect_one_line_refusal(r, took, what, limit_s=None, words=None):
    err = r.stderr.decode("utf-8", "replace").splitlines()
    if r.returncode != 2 or len(err) != 1 or not err[0].startswith("veer: error: "):
        fail("%s: exit %d, stderr %r" % (what, r.returncode, err[:3]))
    if len(err[0].encode()) > 300:
        fail("%s: a line of %d bytes" % (what, len(err[0].encode())))
    if limit_s is not None and took > limit_s:
        fail("%s: refused after %.2f s (limit %.1f s)" % (what, took, limit_s))
    if words and words not in err[0]:
        fail("%s: %r does not say %r" % (what, err[0], words))
    print("  %-44s exit 2 in %.2f s: %s" % (what, took, err[0][:110]))


def write(path, text):
    with open(path, "w") as f:
        f.write(text)


def bad_paths(veer_bin, work):
    fifo = os.path.join(work, "pipe")
    if not os.path.exists(fifo):
        os.mkfifo(fifo)
    link = os.path.join(work, "random_link")
    if not os.path.lexists(link):
        os.symlink("/dev/urandom", link)
    places = [("/dev/zero", "a device"), (fifo, "a pipe"), (work, "a folder"),
              (link, "a device")]
    # "Within a second" of veer's own start: the start itself (loading its libraries, measured
    # with --version just before) can take longer than that on a loaded machine.
    _, start_s = veer([veer_bin, "--version"], work, timeout=30)
    limit = 1.0 + start_s
    print("  veer --version took %.2f s here; refusals must come within %.2f s" % (start_s, limit))
    for path, kind in places:
        r, took = veer([veer_bin, "check", path], work, timeout=10)
        expect_one_line_refusal(r, took, "case file " + os.path.basename(path), limit, kind)
        case = os.path.join(work, "uses_%s.toml" % os.path.basename(path).replace(".", "_"))
        write(case, CASE.format(steps=5, every=500).replace('naca = "2412"',
                                                           'coordinates = "%s"' % path))
        r, took = veer([veer_bin, "check", case], work, timeout=10)
        expect_one_line_refusal(r, took, "coordinates " + os.path.basename(path), limit, kind)


def arguments(veer_bin, work):
    write(os.path.join(work, "wing.toml"), CASE.format(steps=5, every=500))
    tries = [(["check"], "no case"), (["check", "missing.toml"], "missing case"),
             (["check", "a" * 5000 + ".toml"], "5000-character path"),
             (["run", "wing.toml"], "run without -o"), (["run", "wing.toml", "--bogus"], "unknown option"),
             (["sweep", "wing.toml", "-o", "s", "--alpha", "0:4:2", "--steady-steps", "-3"],
              "negative option value"),
             (["report", "nowhere"], "missing report folder"), (["fly"], "unknown subcommand")]
    for args, what in tries:
        r, took = veer([veer_bin] + args, work, timeout=20)
        expect_one_line_refusal(r, took, what)
    r, _ = veer([veer_bin, "--help"], work)
    if r.returncode != 0:
        fail("--help: exit %d" % r.returncode)


def two_runs(veer_bin, work):
    case = os.path.join(work, "wing.toml")
    write(case, CASE.format(steps=400, every=100))
    out = os.path.join(work, "together")
    args = [veer_bin, "run", case, "-o", out, "--quiet"]
    runs = [subprocess.Popen(args, stdout=subprocess.PIPE, stderr=subprocess.PIPE, env=ENV, cwd=work)
            for _ in range(2)]
    results = [(p.wait(timeout=300), p.stderr.read().decode("utf-8", "replace")) for p in runs]
    refused = [err for code, err in results if code == 2 and "another veer run" in err]
    finished = [code for code, err in results if code in (0, 1)]
    print("  exit statuses %s" % [code for code, _ in results])
    if len(refused) != 1 or len(finished) != 1:
        fail("expected one run and one refusal, got %s" % results)
    line = refused[0].strip()
    for words in ("pid ", "started "):
        if words not in line:
            fail("the refusal %r does not name the first run (%r)" % (line, words))
    print("  refused: %s" % line[:160])
    with open(os.path.join(out, "history.csv"), "rb") as f:
        history = f.read()
    if b"\0" in history:
        fail("history.csv holds NUL bytes")
    steps = [int(l.split(b",")[0]) for l in history.splitlines()[1:] if l]
    if steps != list(range(1, len(steps) + 1)) or len(steps) < 2:
        fail("history.csv steps are not 1..n: %s" % steps[:10])
    print("  the run's history: %d rows, steps 1..%d without a gap" % (len(steps), steps[-1]))


def mount_tmpfs(where):
    """The command prefix that runs a command with a 2 MB tmpfs at `where`, or None."""
    if os.geteuid() == 0:
        ok = subprocess.run(["mount", "-t", "tmpfs", "-o", "size=2m", "tmpfs", where],
                            capture_output=True).returncode == 0
        return [] if ok else None
    probe = subprocess.run(["unshare", "-rm", "sh", "-c",
                            "mount -t tmpfs -o size=2m tmpfs '%s'" % where], capture_output=True)
    return None if probe.returncode else ["unshare", "-rm"]


def full_disk(veer_bin, work):
    disk = os.path.join(work, "small_disk")
    os.makedirs(disk, exist_ok=True)
    prefix = mount_tmpfs(disk)
    if prefix is None:
        print("SKIPPED: no tmpfs can be mounted here (not root, no user namespaces)")
        sys.exit(SKIPPED)
    case = os.path.join(work, "wing.toml")
    # A checkpoint every 5 steps: the disk fills between two of them, and the next checkpoint
    # (new pages) fails before the history's partly filled last page does.
    write(case, CASE.format(steps=2000000, every=5))
    out = os.path.join(disk, "run")
    # Inside one shell (the mount of a user namespace lives only there): start the run, wait for
    # its first checkpoint, fill the disk, wait for the run and print its exit status.
    script = """
set -u
if [ -n "${NEEDS_MOUNT:-}" ]; then mount -t tmpfs -o size=2m tmpfs "$DISK"; fi
"$VEER" run "$CASE" -o "$OUT" --quiet 2>"$DISK/../stderr.txt" &
pid=$!
for k in $(seq 600); do
  [ "$(wc -l < "$OUT/history.csv" 2>/dev/null || echo 0)" -gt 12 ] && break; sleep 0.05
done
dd if=/dev/zero of="$DISK/filler" bs=64k 2>/dev/null
wait $pid; echo "exit=$?"
cp "$OUT/checkpoint.h5" "$DISK/../kept.h5"; cp "$OUT/.veer-case.toml" "$DISK/../kept.toml"
ls "$OUT" > "$DISK/../listing.txt"
umount "$DISK" 2>/dev/null || true
"""
    env = dict(ENV, VEER=veer_bin, CASE=case, OUT=out, DISK=disk,
               NEEDS_MOUNT="1" if prefix else "")
    r = subprocess.run(prefix + ["sh", "-c", script], capture_output=True, timeout=300, env=env)
    if not prefix:
        subprocess.run(["umount", disk], capture_output=True)
    text = r.stdout.decode()
    status = [l for l in text.splitlines() if l.startswith("exit=")]
    with open(os.path.join(work, "stderr.txt"), "rb") as f:
        err = f.read().decode("utf-8", "replace").splitlines()
    print("  run on a full disk: %s, stderr %r" % (status, err))
    if status != ["exit=2"] or len(err) != 1 or not err[0].startswith("veer: error: "):
        fail("expected exit 2 with one line")
    if len(err[0].encode()) > 300:
        fail("a line of %d bytes" % len(err[0].encode()))
    if "checkpoint" not in err[0]:
        print("  (the history filled the disk before a checkpoint did; still exit 2, one line)")
    # The last good checkpoint restarts: resumed into a folder on the normal disk, then stopped
    # with Ctrl-C after a moment (exit 130 says it ran; a refused checkpoint exits 2 at once).
    restart = subprocess.Popen([veer_bin, "run", "--restart", os.path.join(work, "kept.h5"),
                                "-o", os.path.join(work, "after_full_disk"), "--quiet"],
                               stdout=subprocess.PIPE, stderr=subprocess.PIPE, env=ENV, cwd=work)
    history = os.path.join(work, "after_full_disk", "history.csv")
    for _ in range(1200):  # until the restarted run has taken a step (a loaded machine is slow)
        if restart.poll() is not None:
            break
        if os.path.exists(history) and open(history, "rb").read().count(b"\n") >= 2:
            break
        time.sleep(0.05)
    if restart.poll() is None:
        restart.send_signal(signal.SIGINT)
    code = restart.wait(timeout=120)
    if code not in (0, 1, 130):
        fail("the kept checkpoint does not restart: exit %d %r" % (code, restart.stderr.read()))
    print("  the kept checkpoint restarted (exit %d: 130 stopped by Ctrl-C, 0/1 finished)" % code)


def damaged_checkpoint(veer_bin, work):
    case = os.path.join(work, "wing.toml")
    write(case, CASE.format(steps=20, every=10))
    r, _ = veer([veer_bin, "run", case, "-o", os.path.join(work, "first"), "--quiet"], work)
    good = os.path.join(work, "first", "checkpoint.h5")
    if r.returncode not in (0, 1) or not os.path.isfile(good):
        fail("the first run wrote no checkpoint: exit %d" % r.returncode)
    with open(good, "rb") as f:
        data = f.read()
    refused = 0
    offsets = list(range(0, len(data), max(1, len(data) // 40)))
    for k, at in enumerate(offsets):
        bad = os.path.join(work, "bad_%d.h5" % k)
        with open(bad, "wb") as f:
            f.write(data[:at] + bytes([data[at] ^ 0x04]) + data[at + 1:])
        r, _ = veer([veer_bin, "run", "--restart", bad, "-o", os.path.join(work, "r%d" % k),
                     "--quiet", "--set", "run.steps=21"], work)
        err = r.stderr.decode("utf-8", "replace").splitlines()
        if r.returncode == 2:
            if len(err) != 1 or len(err[0].encode()) > 300:
                fail("byte %d: exit 2 but stderr %r" % (at, err[:4]))
            refused += 1
        elif r.returncode not in (0, 1):  # 0/1: a byte no reader uses (free space, padding)
            fail("byte %d: exit %d, stderr %r" % (at, r.returncode, err[:4]))
    print("  %d single-byte flips over %d bytes: %d refused with one line, %d harmless" %
          (len(offsets), len(data), refused, len(offsets) - refused))
    if refused < len(offsets) // 2:
        fail("fewer than half of the damaged checkpoints were refused")


CHECKS = {"damaged-checkpoint": damaged_checkpoint, "bad-paths": bad_paths, "arguments": arguments, "two-runs": two_runs,
          "full-disk": full_disk}


def main():
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("--veer", required=True)
    ap.add_argument("--work", required=True)
    ap.add_argument("check", choices=sorted(CHECKS))
    a = ap.parse_args()
    work = os.path.join(os.path.abspath(a.work), a.check)
    subprocess.run(["rm", "-rf", work])
    os.makedirs(work)
    CHECKS[a.check](os.path.abspath(a.veer), work)
    print("%s: passed" % a.check)
    return 0


if __name__ == "__main__":
    sys.exit(main())
