#!/usr/bin/env python3
"""Mutation check of the default test suite: plant one small bug at a time in a core path, rebuild,
run the default suite (ctest -LE validation) and print which tests caught it.

Every mutation is applied to a scratch copy of the committed tree (git archive HEAD, under /tmp),
never to the repository; the copy is built once with ccache, then each mutation rebuilds what it
touches. Not in CI (tens of minutes on two cores). Usage, from the repository root:

    python3 tests/mutation/run_mutations.py [--keep] [--only NAME[,NAME...]] [--jobs N]
                                            [--first-failure] [--scratch DIR]

--first-failure stops each mutated suite at its first failing test (ctest --stop-on-failure), so
a run takes about half the time and the table names the first catcher only. --scratch DIR builds
in DIR (emptied first) instead of a new temporary folder: ccache keys on absolute paths outside
its base_dir, so a second run in the same folder reuses the first one's objects.

Exit status 0 when every mutation is caught, 1 when some are missed, 2 when the unmutated suite
itself fails (then no table means anything).
"""
import argparse
import os
import re
import shutil
import subprocess
import sys
import tempfile
import time
from dataclasses import dataclass
from typing import Optional


@dataclass
class Mutation:
    name: str
    path: str               # file in the repository
    old: Optional[str]      # text replaced (must occur exactly once); None: the file is deleted
    new: Optional[str]
    what: str               # the bug, in words


MUTATIONS = [
    Mutation("reference-missing", "tests/reference/ghia1982_cavity.csv", None, None,
             "the cavity's published table is missing (a clone without the data)"),
    Mutation("friction-sign", "postprocess/surface_forces.cpp",
             "const Vec2 dff = (f.shear * f.length) * f.tangent;",
             "const Vec2 dff = (-f.shear * f.length) * f.tangent;",
             "wall-shear force integrated with the wrong sign"),
    Mutation("sa-cb1", "solver/spalart_allmaras_terms.hpp",
             "static constexpr double cb1 = 0.1355;",
             "static constexpr double cb1 = 0.12;",
             "Spalart-Allmaras c_b1 0.1355 -> 0.12"),
    Mutation("sa-cw1", "solver/spalart_allmaras_terms.hpp",
             "static constexpr double cw1 = cb1 / (kappa * kappa) + (1.0 + cb2) / sigma;",
             "static constexpr double cw1 = cb1 / kappa + (1.0 + cb2) / sigma;",
             "Spalart-Allmaras c_w1 with kappa instead of kappa^2"),
    Mutation("rhie-chow-i", "solver/face_flux.cpp",
             "flux -= rc_i[k] * fi.ortho[k] * third;",
             "flux -= 0.0 * rc_i[k] * fi.ortho[k] * third;",
             "Rhie-Chow term dropped on i-faces"),
    Mutation("rhie-chow-j", "solver/face_flux.cpp",
             "flux -= rc_j[k] * fj.ortho[k] * third;",
             "flux -= 0.0 * rc_j[k] * fj.ortho[k] * third;",
             "Rhie-Chow term dropped on j-faces"),
    Mutation("far-field-vortex", "solver/far_field_vortex.cpp",
             "return {s * r.y, -s * r.x};",
             "return {-s * r.y, s * r.x};",
             "far-field point vortex turning the wrong way"),
    Mutation("wake-cut-mirror", "solver/connectivity.cpp",
             "f(i, -1 - g) = f(ni - 1 - i, g);",
             "f(i, -1 - g) = f(ni - 2 - i, g);",
             "wake-cut ghost copied from the partner's neighbour (off by one)"),
    Mutation("bdf2-first-order", "solver/time_steps.cpp",
             "if (!second_order) return {};",
             "if (!second_order || dt > 0.0) return {};",
             "time-accurate steps always BDF1"),
    Mutation("bdf2-variable-step", "solver/time_steps.cpp",
             "c.alpha2 = w * w / (1.0 + w);",
             "c.alpha2 = w / (1.0 + w);",
             "BDF2 coefficient wrong when the step changes (right for fixed steps)"),
    Mutation("wall-shear-first-order", "postprocess/wall_faces.cpp",
             "return (f0 * d1 * d1 - f1 * d0 * d0) / (d0 * d1 * (d1 - d0));",
             "return f0 / d0 + 0.0 * f1 * d1;",
             "wall shear from the first cell alone (first order)"),
    Mutation("wall-pressure-extrapolation", "postprocess/wall_faces.cpp",
             "return f0 - d0 * (f1 - f0) / (d1 - d0);",
             "return f0 + d0 * (f1 - f0) / (d1 - d0);",
             "wall pressure extrapolated the wrong way"),
    Mutation("first-cell-y-plus", "mesh/wall_spacing.cpp",
             "return y_plus / (reynolds * u_tau);",
             "return 0.5 * y_plus / (reynolds * u_tau);",
             "first cell sized for the centroid's y+, not the cell's"),
    Mutation("input-any-file", "io/input_file.cpp",
             "    if (!S_ISREG(info.st_mode))",
             "    if ((false))",
             "input files read from devices, FIFOs and folders (issue 19)"),
    Mutation("checkpoint-checksum", "io/hdf5_support.cpp",
             "    if (read_int_attribute(dataset, checksum_attribute) != computed)",
             "    if ((false))",
             "checkpoint datasets read without comparing their checksum"),
    Mutation("history-gap", "io/history_file.cpp",
             "    if (values[0] != static_cast<double>(previous + 1))",
             "    if ((false))",
             "a restart keeps a history with missing or reordered steps"),
    Mutation("folder-lock", "io/folder_lock.cpp",
             "        if (::flock(fd, LOCK_EX | LOCK_NB) != 0) {",
             "        if ((false)) {",
             "two runs write into one output folder at once"),
    Mutation("hdf5-exit-handler", "io/hdf5_support.cpp",
             "    H5dont_atexit();",
             "",
             "HDF5's exit handler loops or crashes after a damaged read or a full disk"),
    Mutation("error-line-length", "app/error_line.cpp",
             "    if (line.size() <= limit) return line;",
             "    return line;",
             "error messages printed whole (a 2 MB value, 5000-character paths)"),
    Mutation("force-old-frames", "io/field_series.cpp",
             "    if (start == SeriesStart::fresh) remove_earlier_frames(m_dir, pvd_path());",
             "    if ((false)) remove_earlier_frames(m_dir, pvd_path());",
             "a fresh run leaves the previous run's frames beside its own"),
]


def run(cmd, cwd, log, env=None):
    """Runs cmd, appends its output to log; returns (exit status, output)."""
    p = subprocess.run(cmd, cwd=cwd, env=env, stdout=subprocess.PIPE, stderr=subprocess.STDOUT,
                       text=True)
    with open(log, "a") as f:
        f.write("$ " + " ".join(cmd) + "\n" + p.stdout + "\n")
    return p.returncode, p.stdout


def failed_tests(ctest_output):
    """Names of the tests ctest lists as failed (or not run)."""
    names = re.findall(r"^\s*\d+ - (\S+) \(", ctest_output, flags=re.M)
    return sorted(set(names))


def suite(build, jobs, log, first_failure=False):
    stop = ["--stop-on-failure"] if first_failure else []
    code, out = run(["ctest", "--test-dir", build, "-LE", "validation", "-j", str(jobs)] + stop,
                    cwd=build, log=log)
    return code, failed_tests(out)


def main():
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("--keep", action="store_true", help="keep the scratch copy and build")
    ap.add_argument("--only", default="", help="comma-separated mutation names")
    ap.add_argument("--jobs", type=int, default=2)
    ap.add_argument("--first-failure", action="store_true",
                    help="stop each mutated suite at its first failing test")
    ap.add_argument("--scratch", default="", help="build in this folder (emptied first)")
    args = ap.parse_args()
    repo = subprocess.run(["git", "rev-parse", "--show-toplevel"], text=True,
                          stdout=subprocess.PIPE, check=True).stdout.strip()
    chosen = [m for m in MUTATIONS if not args.only or m.name in args.only.split(",")]
    if not chosen:
        sys.exit("no mutation named " + args.only)
    if subprocess.run(["git", "status", "--porcelain"], cwd=repo, text=True,
                      stdout=subprocess.PIPE).stdout.strip():
        print("note: uncommitted changes are not in the scratch copy (it is HEAD)")

    if args.scratch:
        scratch = os.path.abspath(args.scratch)
        if os.path.commonpath([scratch, repo]) == repo and not scratch.startswith(
                os.path.join(repo, "build")):
            sys.exit("--scratch must lie outside the source tree (or under its build/)")
        shutil.rmtree(scratch, ignore_errors=True)
        os.makedirs(scratch)
    else:
        scratch = tempfile.mkdtemp(prefix="veer-mutation-")
    src, build, log = os.path.join(scratch, "src"), os.path.join(scratch, "build"), \
        os.path.join(scratch, "log.txt")
    os.makedirs(src)
    archive = subprocess.run(["git", "archive", "HEAD"], cwd=repo, stdout=subprocess.PIPE,
                             check=True).stdout
    subprocess.run(["tar", "-x", "-C", src], input=archive, check=True)
    print(f"scratch copy of HEAD in {src}; log in {log}")

    launcher = ["-DCMAKE_CXX_COMPILER_LAUNCHER=ccache"] if shutil.which("ccache") else []
    start = time.time()
    code, _ = run(["cmake", "-S", src, "-B", build, "-DCMAKE_BUILD_TYPE=Release",
                   "-DVEER_WERROR=ON", "-DVEER_BUILD_BENCH=OFF"] + launcher, cwd=scratch,
                  log=log)
    code = code or run(["cmake", "--build", build, "-j", str(args.jobs)], cwd=scratch,
                       log=log)[0]
    if code:
        print("the unmutated copy does not build; see the log")
        return 2
    code, failed = suite(build, args.jobs, log)
    print(f"unmutated: built and ran the default suite in {time.time() - start:.0f} s")
    if code or failed:
        print("the unmutated default suite fails: " + ", ".join(failed))
        return 2

    rows = []
    for m in chosen:
        path = os.path.join(src, m.path)
        with open(path) as f:
            original = f.read()
        if m.old is not None and original.count(m.old) != 1:
            rows.append((m, "NOT APPLIED", f"'{m.old}' occurs {original.count(m.old)} times"))
            continue
        t0 = time.time()
        try:
            if m.old is None:
                os.remove(path)
            else:
                with open(path, "w") as f:
                    f.write(original.replace(m.old, m.new))
            code, _ = run(["cmake", "--build", build, "-j", str(args.jobs)], cwd=scratch, log=log)
            if code:
                rows.append((m, "NO BUILD", "does not compile (warnings are errors): fix the entry"))
            else:
                _, failed = suite(build, args.jobs, log, args.first_failure)
                rows.append((m, "CAUGHT" if failed else "MISSED", ", ".join(failed) or "-"))
        finally:
            with open(path, "w") as f:  # put it back before the next one
                f.write(original)
        print(f"{m.name}: {rows[-1][1]} ({time.time() - t0:.0f} s)", flush=True)
    run(["cmake", "--build", build, "-j", str(args.jobs)], cwd=scratch, log=log)

    by_what = "first failing test" if args.first_failure else "default suite"
    print(f"\n| mutation | file | bug | result | caught by ({by_what}) |")
    print("|---|---|---|---|---|")
    for m, result, by in rows:
        print(f"| {m.name} | {m.path} | {m.what} | {result} | {by} |")
    missed = [m.name for m, result, _ in rows if result != "CAUGHT"]
    print(f"\n{len(rows) - len(missed)} of {len(rows)} caught; total {time.time() - start:.0f} s")
    if args.keep:
        print(f"kept {scratch}")
    else:
        shutil.rmtree(scratch, ignore_errors=True)
    return 1 if missed else 0


if __name__ == "__main__":
    sys.exit(main())
