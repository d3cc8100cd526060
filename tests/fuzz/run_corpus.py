#!/usr/bin/env python3
"""Runs `veer check` on every case of a fuzz corpus and fails unless each one ends cleanly.

    run_corpus.py --veer build/app/veer --work DIR [--seed 17 --count 240] [--family cases]
                  [--jobs 2] [--timeout 5] [--memory-mb 500]

With --seed and --count the corpus is first written into DIR by make_mutants.py. A mutant ends
cleanly when veer exits 0 having built the grid ("valid case"), or exits 2 with one line
"veer: error: ..." of at most 300 characters on stderr; anything else (a crash, a sanitizer
report, an internal error, more lines on stderr, a line on stderr longer than 300 characters, a
run longer than the timeout, memory above the limit) is a failure, listed with its case file.
Each run gets an address-space limit of --memory-mb (0: none; sanitizer builds reserve terabytes
of shadow memory and cannot run under one).
"""
import argparse
import concurrent.futures
import glob
import os
import resource
import subprocess
import sys
import time

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
import make_mutants  # noqa: E402

# Passive OpenMP waits set here spare veer its restart to set them (app/wait_policy.hpp); one
# thread each, since the runner already runs two at a time.
ENV = dict(os.environ, OMP_WAIT_POLICY=os.environ.get("OMP_WAIT_POLICY", "PASSIVE"),
           OMP_NUM_THREADS=os.environ.get("OMP_NUM_THREADS", "1"))


# Longest line veer may print (app/error_line.hpp); counted in bytes, which bounds characters.
LINE_LIMIT = 300


def memory_limit(megabytes):
    """A preexec function giving the child an address-space limit (None: no limit)."""
    if not megabytes:
        return None
    limit = megabytes << 20
    return lambda: resource.setrlimit(resource.RLIMIT_AS, (limit, limit))


def check_one(veer, case, timeout, megabytes):
    """(case, verdict or None when clean, exit code, seconds)"""
    start = time.monotonic()
    try:
        # Run from the corpus folder, as a user would; cwd also keeps stray relative paths there.
        r = subprocess.run([veer, "check", case], capture_output=True, timeout=timeout, env=ENV,
                           preexec_fn=memory_limit(megabytes), cwd=os.path.dirname(case))
    except subprocess.TimeoutExpired:
        return case, "no answer within %g s" % timeout, None, timeout
    took = time.monotonic() - start
    out = r.stdout.decode("utf-8", "replace")
    err = r.stderr.decode("utf-8", "replace")
    err_lines = err.splitlines()
    # The line limit is for what goes wrong (stderr); a valid case's summary on stdout is the
    # report the user asked for (its wording is the command's, not an error's).
    longest = max([len(l) for l in r.stderr.splitlines()] or [0])
    if longest > LINE_LIMIT:
        return case, "a line of %d characters (limit %d): %s" % (
            longest, LINE_LIMIT, (err_lines or [""])[0][:200]), r.returncode, took
    if r.returncode == 0 and "valid case" in out and not err:
        return case, None, 0, took
    if r.returncode == 2 and len(err_lines) == 1 and err_lines[0].startswith("veer: error: "):
        return case, None, 2, took
    what = "exit %d" % r.returncode
    return case, "%s; stderr: %s" % (what, " | ".join(err_lines[:3])[:400]), r.returncode, took


def main():
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("--veer", required=True)
    ap.add_argument("--work", required=True)
    ap.add_argument("--seed", type=int)
    ap.add_argument("--count", type=int)
    ap.add_argument("--family", default="coordinates")
    ap.add_argument("--jobs", type=int, default=2)
    ap.add_argument("--timeout", type=float, default=5.0)
    ap.add_argument("--memory-mb", type=int, default=500)
    a = ap.parse_args()
    a.veer = os.path.abspath(a.veer)  # each mutant runs from its own folder
    if a.seed is not None and a.count is not None:
        for old in glob.glob(os.path.join(a.work, "mutant_*")) + glob.glob(
                os.path.join(a.work, "fifo_*")):
            os.remove(old)
        sys.argv = [sys.argv[0], "--seed", str(a.seed), "--count", str(a.count), "--out", a.work,
                    "--family", a.family]
        make_mutants.main()
    cases = sorted(glob.glob(os.path.join(a.work, "mutant_*.toml")))
    if not cases or (a.count is not None and len(cases) != a.count):
        print("fuzz: expected %s cases in %s, found %d" % (a.count, a.work, len(cases)))
        return 1
    start = time.monotonic()
    with concurrent.futures.ThreadPoolExecutor(max_workers=a.jobs) as pool:
        results = list(pool.map(lambda c: check_one(a.veer, c, a.timeout, a.memory_mb), cases))
    bad = [r for r in results if r[1] is not None]
    accepted = sum(1 for r in results if r[1] is None and r[2] == 0)
    refused = sum(1 for r in results if r[1] is None and r[2] == 2)
    slowest = max(results, key=lambda r: r[3])
    print("fuzz (%s): %d mutants, %d meshed, %d refused cleanly, %d failed; %.1f s in all, slowest "
          "%.2f s (%s)" % (a.family, len(results), accepted, refused, len(bad), time.monotonic() - start,
                           slowest[3], os.path.basename(slowest[0])))
    for case, verdict, _, _ in bad[:20]:
        print("  %s: %s" % (case, verdict))
    return 1 if bad else 0


if __name__ == "__main__":
    sys.exit(main())
