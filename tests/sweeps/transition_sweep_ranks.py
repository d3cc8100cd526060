#!/usr/bin/env python3
"""A free-transition sweep (model = "sa-aft") run three ways through the `veer` command line:

    transition_sweep_ranks.py --veer build/app/veer --mpirun /usr/bin/mpirun --work DIR ranks
    transition_sweep_ranks.py --veer build/app/veer --work DIR resume

("ranks" runs 1 and 2 below, "resume" runs 1 and 3; each in its own DIR.)

1. serially, all points in one process, each point starting from the previous one's fields;
2. on two MPI ranks: the polar (Cl, Cd and the transition columns) must be the same as the
   serial one. The second rank's first point starts from the free stream instead of the previous
   point, so the two converge to the same steady state from different starts: equal to within the
   convergence tolerance, not to the bit (the tolerances are below, with their reasons);
3. point 0 alone (--point-index 0), then the whole command again, which resumes: point 1 starts
   from point 0's checkpoint instead of its fields in memory. Its summary, and the next point's,
   must equal the serial sweep's bit for bit (the checkpoint keeps the model's variables exactly).

NACA 0012 at Re 1e6, N_crit 9, alpha -2:4:2 on 128 x 48 cells (y+ 1, far field 30): a grid too
coarse for accurate figures, chosen for speed (four points of a few hundred steps each).
Prints what it compared and exits 1 on any difference.
"""
import argparse
import csv
import json
import os
import shutil
import subprocess
import sys

ENV = dict(os.environ, OMP_WAIT_POLICY="PASSIVE", OMP_NUM_THREADS="1")

CASE = """[geometry]
naca = "0012"
[mesh]
around = 128
normal = 48
far_field = 30
y_plus = 1.0
[flow]
reynolds = 1e6
alpha = 0
model = "sa-aft"
critical_amplification = 9
[run]
mode = "steady"
steps = 3000
"""
ALPHA = "-2:4:2"  # 6 degrees stalls the steady iteration on this coarse grid
COLUMNS = ("cl", "cd", "transition_upper", "transition_lower")

# Two steady solutions reached from different starts differ by what the convergence criterion
# leaves. Cl: the project's sweep check's tolerance (1e-4 + 1e-3 |Cl|). Cd: 1 % (the drag
# converges more slowly than the lift and is small). Transition x/c: 0.005 chords, under half the
# face pitch of this grid (about 0.018 chords at mid-chord), so that a position one face off fails.
TOLERANCE = {
    "cl": lambda a: 1e-4 + 1e-3 * abs(a),
    "cd": lambda a: 1e-2 * abs(a),
    "transition_upper": lambda a: 5e-3,
    "transition_lower": lambda a: 5e-3,
}


def run(args, work, log):
    with open(os.path.join(work, log), "w") as out:
        r = subprocess.run(args, stdout=out, stderr=subprocess.STDOUT, env=ENV, cwd=work,
                           timeout=1800)
    if r.returncode != 0:
        with open(os.path.join(work, log)) as f:
            tail = f.read().strip().splitlines()[-3:]
        sys.exit(f"{' '.join(args)} ended with {r.returncode}: {' | '.join(tail)}")


def polar(path):
    with open(path) as f:
        rows = list(csv.DictReader(f))
    if len(rows) != 4:
        sys.exit(f"{path}: {len(rows)} rows, expected 4 (alpha {ALPHA})")
    for c in COLUMNS:
        if c not in rows[0]:
            sys.exit(f"{path}: no column {c}")
    return rows


def number(row, column, where):
    try:
        return float(row[column])
    except ValueError:
        sys.exit(f"{where}: {column} is '{row[column]}', not a number (a free-transition point "
                 "must have a transition position on each surface)")


def same_polar(serial, ranks):
    bad = []
    for a, b in zip(serial, ranks):
        for c in COLUMNS:
            x = number(a, c, "serial alpha " + a["alpha"])
            y = number(b, c, "two-rank alpha " + b["alpha"])
            print(f"alpha {a['alpha']:>5} {c:>16}: serial {x:.6f}, two ranks {y:.6f}")
            if abs(x - y) > TOLERANCE[c](x):
                bad.append(f"alpha {a['alpha']} {c}: {x} against {y}")
    return bad


def same_summary(point, a_path, b_path):
    with open(a_path) as f:
        a = json.load(f)
    with open(b_path) as f:
        b = json.load(f)
    keys = ["cl", "cd", "cm", "iterations", "transition_upper", "transition_lower",
            "laminar_bubbles_upper", "laminar_bubbles_lower"]
    if any(k not in a for k in keys):
        return [f"{a_path} lacks one of {keys}"]
    bad = [f"{point} {k}: {a[k]} against {b.get(k)}" for k in keys if a[k] != b.get(k)]
    print(f"resumed sweep, {point}: Cl {b.get('cl')}, Cd {b.get('cd')}, {b.get('iterations')} steps, "
          f"transition {b.get('transition_upper')} / {b.get('transition_lower')}"
          f" ({'bit for bit' if not bad else 'differs'})")
    return bad


def ranks_check(o, sweep):
    if not o.mpirun:
        sys.exit("ranks: give --mpirun")
    run([o.mpirun, "--allow-run-as-root", "--oversubscribe", "-n", "2"] + sweep + ["-o", "ranks"],
        o.work, "ranks.log")
    bad = same_polar(polar(os.path.join(o.work, "serial", "polar.csv")),
                     polar(os.path.join(o.work, "ranks", "polar.csv")))
    return bad, "the two-rank polar matches the serial one"


def resume_check(o, sweep):
    run(sweep + ["-o", "resumed", "--point-index", "0"], o.work, "resumed0.log")
    run(sweep + ["-o", "resumed"], o.work, "resumed.log")  # finds point 0 finished, resumes
    bad = []
    for point in ("alpha_+00.00", "alpha_+02.00"):  # points 1 and 2
        bad += same_summary(point, os.path.join(o.work, "serial", point, "summary.json"),
                            os.path.join(o.work, "resumed", point, "summary.json"))
    return bad, "the resumed points match the serial sweep bit for bit"


def main():
    p = argparse.ArgumentParser()
    p.add_argument("--veer", required=True)
    p.add_argument("--mpirun")
    p.add_argument("--work", required=True)
    p.add_argument("check", choices=["ranks", "resume"])
    o = p.parse_args()
    o.veer = os.path.abspath(o.veer)  # the sweeps run inside the work folder
    shutil.rmtree(o.work, ignore_errors=True)  # a sweep reuses the finished points it finds
    os.makedirs(o.work)
    with open(os.path.join(o.work, "case.toml"), "w") as f:
        f.write(CASE)
    sweep = [o.veer, "sweep", "case.toml", "--alpha", ALPHA, "--stability-time", "0"]
    run(sweep + ["-o", "serial"], o.work, "serial.log")
    bad, verdict = (ranks_check if o.check == "ranks" else resume_check)(o, sweep)
    if bad:
        print("differs: " + "; ".join(str(x) for x in bad))
        return 1
    print(verdict)
    return 0


if __name__ == "__main__":
    sys.exit(main())
