#!/usr/bin/env python3
"""Writes a corpus of fuzzed inputs for veer: each mutant is a case file (mutant_NNNN.toml) and,
for the coordinate-file family, the section table it names (mutant_NNNN.dat).

    make_mutants.py --seed 17 --count 240 --out DIR [--family coordinates|cases]

The same seed and count give the same corpus byte for byte. A family is a function
family(rng, index) -> (case_text, {file name: bytes}); add one to FAMILIES to fuzz more inputs
(case files, restart folders, ...). Sections come from the NACA 4-digit formula (Abbott & von
Doenhoff 1959, Theory of Wing Sections, section 6.4) in the layouts veer reads, then get one to
three mutations each: typing errors, damaged lines, odd separators and line ends, wrong counts,
missing or repeated points, degenerate and extreme values.
"""
import argparse
import math
import os
import random

# A small grid so that every accepted mutant is also meshed quickly (even under sanitizers).
GRID = "[mesh]\naround = 32\nnormal = 8\nwake = 6\nfar_field = 10\nfirst_cell = 0.01\n"
FLOW = "[flow]\nreynolds = 1000\nalpha = 2\nmodel = \"laminar\"\n"


def naca_point(m, p, t, x, upper, last=-0.1015):
    yt = 5 * t * (0.2969 * math.sqrt(x) - 0.1260 * x - 0.3516 * x * x + 0.2843 * x ** 3 + last * x ** 4)
    if m == 0:
        yc = slope = 0.0
    elif x < p:
        yc, slope = m / p ** 2 * (2 * p * x - x * x), 2 * m / p ** 2 * (p - x)
    else:
        yc, slope = (m / (1 - p) ** 2 * (1 - 2 * p + 2 * p * x - x * x), 2 * m / (1 - p) ** 2 * (p - x))
    th, s = math.atan(slope), (1 if upper else -1)
    return x - s * yt * math.sin(th), yc + s * yt * math.cos(th)


def stations(rng):
    kind = rng.choice(["cosine", "cosine", "report", "even"])
    if kind == "report":
        return [0, 0.0125, 0.025, 0.05, 0.075, 0.1, 0.15, 0.2, 0.25, 0.3, 0.4, 0.5, 0.6, 0.7,
                0.8, 0.9, 0.95, 1.0]
    n = rng.choice([12, 25, 35, 61, 121])
    if kind == "even":
        return [k / (n - 1) for k in range(n)]
    return [0.5 * (1 - math.cos(math.pi * k / (n - 1))) for k in range(n)]


def base_table(rng):
    """A clean table: (lines of text, layout name)."""
    m, p, t = rng.choice([(0, 0.4, 0.12), (0.04, 0.4, 0.12), (0.02, 0.4, 0.10), (0.06, 0.4, 0.09),
                          (0, 0.4, 0.21), (0.02, 0.3, 0.15)])
    gap = rng.choice([0, 0, 0, 0.005, 0.0125, 0.025, 0.049])
    last = -0.1036 if gap else rng.choice([-0.1015, -0.1036])  # gaps up to 4.9 % in all
    xs = stations(rng)
    up = [naca_point(m, p, t, x, True, last) for x in xs]
    lo = [naca_point(m, p, t, x, False, last) for x in xs]
    up = [(x, y + 0.5 * gap * x) for x, y in up]
    lo = [(x, y - 0.5 * gap * x) for x, y in lo]
    dec = rng.choice([4, 5, 6, 8])
    row = lambda q: "%.*f %.*f" % (dec, q[0], dec, q[1])
    title = ["small wind-turbine blade section"] if rng.random() < 0.7 else []
    layout = rng.choice(["loop", "loop", "loop_lower_first", "two", "two_counts", "two_counts_tight"])
    if layout == "loop":
        lines = title + [row(q) for q in list(reversed(up)) + lo[1:]]
    elif layout == "loop_lower_first":
        lines = title + [row(q) for q in list(reversed(lo)) + up[1:]]
    elif layout == "two":
        lines = title + [row(q) for q in up] + [""] + [row(q) for q in lo]
    else:
        counts = ["%d. %d." % (len(up), len(lo))]
        blank = [""] if layout == "two_counts" else []
        lines = title + counts + blank + [row(q) for q in up] + blank + [row(q) for q in lo]
    return lines, layout


GARBAGE = ["abc", "1 2 3", "nan 0", "0 inf", "1e400 0", "--", "0x1p3 0", "1,,2", ";",
           "\u00e9\u00e8 0.5", "0.5", "+ -", "1e-400 0", "9" * 400 + " 1", "\x00\x01 2", "#"]


def mutate(rng, lines):
    """One mutation of the table's lines (a list of str), in place."""
    numeric = [k for k, l in enumerate(lines) if len(l.split()) == 2 and l[:1] not in "#"]
    op = rng.randrange(18)
    if not numeric:
        op = 6
    k = rng.choice(numeric) if numeric else 0
    parts = lines[k].split() if numeric else ["0", "0"]
    try:
        x, y = float(parts[0].rstrip(",")), float(parts[1])
    except ValueError:
        x, y = 0.0, 0.0
    if op == 0:  # a typing error in an ordinate
        lines[k] = "%.6f %.6f" % (x, y * rng.choice([-1, 0, 0.5, 0.9, 1.1, 2, 2.5, 10, 1e6]))
    elif op == 1:  # a typing error in a station
        lines[k] = "%.6f %.6f" % (x * rng.choice([0, 0.5, 1.1, 2, 10]) + rng.choice([0, 0.1]), y)
    elif op == 2:  # a repeated line, next to itself or elsewhere
        lines.insert(rng.choice([k, rng.randrange(len(lines) + 1)]), lines[k])
    elif op == 3:  # lost lines
        del lines[k:k + rng.choice([1, 1, 2, 5, 30])]
    elif op == 4 and k + 1 < len(lines):  # two lines swapped
        lines[k], lines[k + 1] = lines[k + 1], lines[k]
    elif op == 5:  # a run reversed
        j = min(len(lines), k + rng.choice([3, 10, 40]))
        lines[k:j] = reversed(lines[k:j])
    elif op == 6:  # a garbage line
        lines.insert(rng.randrange(len(lines) + 1), rng.choice(GARBAGE))
    elif op == 7:  # a blank line anywhere
        lines.insert(rng.randrange(len(lines) + 1), "")
    elif op == 8:  # other separators
        sep = rng.choice([",", ", ", "\t", ";", "  ", " , "])
        for q in numeric:
            if q < len(lines):
                lines[q] = sep.join(lines[q].split())
    elif op == 9:  # the first point repeated at the end, or the base drawn across the gap
        if numeric:
            lines.append(lines[numeric[0]] if rng.random() < 0.5 else "1.0 0.0")
    elif op == 10:  # columns swapped
        for q in numeric:
            if q < len(lines) and len(lines[q].split()) == 2:
                a, b = lines[q].split()
                lines[q] = b + " " + a
    elif op == 11:  # everything scaled, rotated and moved (a file in other units)
        a, s = math.radians(rng.uniform(-90, 90)), rng.choice([1e-6, 0.3, 250, 1e7])
        for q in numeric:
            if q < len(lines):
                try:
                    u, v = (float(w.rstrip(",")) for w in lines[q].split())
                except ValueError:
                    continue
                lines[q] = "%.9g %.9g" % (s * (math.cos(a) * u - math.sin(a) * v) + 3,
                                          s * (math.sin(a) * u + math.cos(a) * v) - 1)
    elif op == 12:  # a count line, right or wrong
        lines.insert(0, "%d. %d." % (rng.randrange(2, 80), rng.randrange(2, 80)))
    elif op == 13:  # a third block of points
        lines += [""] + lines[:rng.randrange(1, len(lines) + 1)]
    elif op == 14:  # the file cut short
        del lines[rng.randrange(len(lines) + 1):]
    elif op == 15:  # all points on one spot or one line
        for q in numeric:
            if q < len(lines):
                lines[q] = "0.5 0" if rng.random() < 0.5 else "%s 0" % (lines[q].split() or ["0"])[0]
    elif op == 16:  # a point moved far away
        lines[k] = "%.6f %.6f" % (x + rng.choice([-3, 0.3, 5]), y + rng.choice([-2, 0.2, 4]))
    else:  # a long run of the same point, or of points on a tiny circle
        lines[k:k] = ["%.9f %.9f" % (x + 1e-9 * math.cos(j), y + 1e-9 * math.sin(j))
                      for j in range(rng.choice([2, 50]))]


def mild(rng, lines, layout):
    """A change a valid table survives: dress (separators, comments, blank lines), a drawn base,
    other units, a small spike. Such mutants should mesh; they keep the mesher in the corpus."""
    numeric = [k for k, l in enumerate(lines) if len(l.split()) == 2 and not l.endswith(".")]
    op = rng.randrange(6)
    if op in (3, 5) and not layout.startswith("loop"):
        op = 1
    if op == 0 and numeric:
        sep = rng.choice([",", "\t", " , ", "   "])
        for q in numeric:
            lines[q] = sep.join(lines[q].split())
    elif op == 1:
        lines.insert(rng.randrange(len(lines) + 1), "# " + rng.choice(["x y", "slow indoor flyer", ""]))
    elif op == 2:
        lines[:0] = [""] * rng.randrange(3)
        lines += [""] * rng.randrange(3)
    elif op == 3 and numeric:
        lines.append(lines[numeric[0]])
    elif op == 4 and numeric:
        k = rng.choice(numeric[3:-3] or numeric)
        x, y = (float(v) for v in lines[k].split())
        lines[k] = "%.6f %.6f" % (x, y * rng.choice([1.01, 0.99]))
    elif numeric:
        s = rng.choice([0.25, 1000.0])
        for q in numeric:
            x, y = (float(v) for v in lines[q].split())
            lines[q] = "%.9g %.9g" % (s * x, s * y)


def coordinates_family(rng, index):
    lines, layout = base_table(rng)
    if rng.random() < 0.35:
        mild(rng, lines, layout)
    else:
        for _ in range(rng.choice([1, 1, 2, 3])):
            mutate(rng, lines)
    ending = rng.choice(["\n", "\n", "\r\n", "\r"])
    text = ending.join(lines) + (ending if rng.random() < 0.9 else "")
    if rng.random() < 0.05:
        text = text[: rng.randrange(len(text) + 1)]  # cut mid-line
    name = "mutant_%04d.dat" % index
    extra = rng.choice(["", "", "", "chord_line = \"file-axes\"\n", "chord_line = \"nose-to-tail\"\n"])
    case = "[geometry]\ncoordinates = \"%s\"\n%s%s%s" % (name, extra, GRID, FLOW)
    return case, {name: text.encode("utf-8", "surrogateescape")}


# The case-file family: a valid case of the survey drone's wing section (small grid), then one to
# three damages: values out of range or of the wrong type, extreme numbers, huge strings, unknown
# keys and tables, repeated keys, broken TOML, other line ends, NUL bytes, a byte-order mark, and
# `coordinates` pointing at things that are not a section file (a device, a folder, a FIFO).
CASE_KEYS = {
    "geometry": {"naca": ['"2412"', '"0012"', '"23012"'], "trailing_edge": ['"open"', '"closed"'],
                 "name": ['"survey drone wing"']},
    "mesh": {"around": ["32", "48"], "normal": ["8", "12"], "wake": ["6", "8"],
             "far_field": ["10", "12.5"], "first_cell": ["0.01", "5e-3"], "max_growth": ["1.2"]},
    "flow": {"reynolds": ["1000", "2.5e5"], "alpha": ["2", "-4.5"],
             "model": ['"laminar"', '"spalart-allmaras"']},
    "run": {"mode": ['"steady"', '"unsteady"'], "steps": ["5", "200"], "end_time": ["1", "20"],
            "cfl": ["0", "2", "14"], "residual_drop": ["1e-6"], "force_tolerance": ["1e-5"],
            "output_every": ["0", "10"], "checkpoint_every": ["500"],
            "pressure_solver": ['"multigrid"', '"eigen-cg"'],
            "steady_scheme": ['"fast"', '"classic"'], "start_spin": ["0"]},
    "post": {"contours": ["[0.5, 1, 2]"], "wake_stations": ["[0.25, 1]"]},
}
BAD_VALUES = ["0", "-1", "1e308", "-1e308", "1e-308", "5e-324", "nan", "inf", "-inf", "+nan",
              "9223372036854775807", "-9223372036854775808", "99999999999999999999", "1e-3",
              "0.0", "-0.0", "3.5", "65536", "8193", "true", "false", '""', '"x"',
              '"' + "a" * 5000 + '"', "[]", "[1, 2, 3]", "[[1]]", "{}", "{a = 1}",
              "1979-05-27T07:32:00Z", '"\\u0000"', '"two\\nlines"', "0x10", "1_000", "'lit'",
              '"""multi\nline"""', "[" * 60 + "]" * 60, "[" * 3000 + "]" * 3000]
SPECIAL_PATHS = ["/dev/zero", "/dev/urandom", "/dev/null", ".", "..", "/", "missing.dat",
                 "fifo_NNNN", "", "a" * 5000, "/proc/self/mem", "\\u0000"]


def case_lines(rng):
    lines = []
    for table, keys in CASE_KEYS.items():
        lines.append("[%s]" % table)
        for key, values in keys.items():
            if table == "flow" and key == "reynolds" or rng.random() < 0.6:
                lines.append("%s = %s" % (key, rng.choice(values)))
    return lines


def damage_case(rng, lines, index, files):
    keyed = [k for k, l in enumerate(lines) if " = " in l]
    k = rng.choice(keyed)
    key = lines[k].split(" = ")[0]
    op = rng.randrange(14)
    if op <= 3:  # a value out of range or of another type
        lines[k] = "%s = %s" % (key, rng.choice(BAD_VALUES))
    elif op == 4:  # a line lost
        del lines[k]
    elif op == 5:  # a key given twice
        lines.insert(k + 1, lines[k])
    elif op == 6:  # an unknown key or table
        lines.insert(rng.randrange(len(lines) + 1),
                     rng.choice(["colour = 3", "[solver]", "[flow.extra]", "alpha = 4", "x.y = 1"]))
    elif op == 7:  # broken TOML
        lines[k] = rng.choice([lines[k][:-1], lines[k] + '"', "[" + lines[k], key + " =",
                               "= " + key, lines[k].replace("=", ":"), lines[k] + " # ok",
                               lines[k] + " 2"])
    elif op == 8:  # the table header lost or garbled
        heads = [q for q, l in enumerate(lines) if l.startswith("[")]
        q = rng.choice(heads)
        lines[q] = rng.choice(["", "[" + lines[q], lines[q].upper(), "[[%s]]" % lines[q][1:-1]])
    elif op == 9:  # coordinates that are not a section file
        path = rng.choice(SPECIAL_PATHS).replace("NNNN", "%04d" % index)
        if path.startswith("fifo_"):
            files[path] = None  # made as a FIFO by the writer
        lines[:] = [l for l in lines if not l.startswith("naca")]
        lines.insert(1, 'coordinates = "%s"' % path)
    elif op == 10:  # a huge line
        lines.insert(rng.randrange(len(lines) + 1), "# " + "x" * rng.choice([300, 100000]))
    elif op == 11:  # a NUL or other control byte inside a line
        at = rng.randrange(len(lines[k]) + 1)
        lines[k] = lines[k][:at] + rng.choice(["\x00", "\x01", "\x1b[2J", "\x7f"]) + lines[k][at:]
    elif op == 12:  # a key of another table
        other = rng.choice([t for t in CASE_KEYS])
        lines.insert(k, "%s = %s" % (rng.choice(list(CASE_KEYS[other])), rng.choice(BAD_VALUES)))
    else:  # two sections at once, or none
        lines[:] = [l for l in lines if not l.startswith("naca")]
        if rng.random() < 0.5:
            lines[1:1] = ['naca = "0012"', "circle = true"]


def case_family(rng, index):
    lines = case_lines(rng)
    files = {}
    for _ in range(rng.choice([1, 1, 2, 3])):
        damage_case(rng, lines, index, files)
    ending = rng.choice(["\n", "\n", "\r\n", "\r"])
    text = ending.join(lines) + ending
    if rng.random() < 0.05:
        text = "\ufeff" + text  # a byte-order mark
    if rng.random() < 0.05:
        text = text[: rng.randrange(len(text) + 1)]
    return text, files


FAMILIES = {"coordinates": coordinates_family, "cases": case_family}


def main():
    ap = argparse.ArgumentParser(description=__doc__.split("\n")[0])
    ap.add_argument("--seed", type=int, required=True)
    ap.add_argument("--count", type=int, required=True)
    ap.add_argument("--out", required=True)
    ap.add_argument("--family", choices=sorted(FAMILIES), default="coordinates")
    a = ap.parse_args()
    os.makedirs(a.out, exist_ok=True)
    rng = random.Random(a.seed)
    for i in range(a.count):
        case, files = FAMILIES[a.family](rng, i)
        for name, data in files.items():
            target = os.path.join(a.out, name)
            if data is None:  # a FIFO with no writer: a reader that opens it blindly hangs
                os.mkfifo(target)
                continue
            with open(target, "wb") as f:
                f.write(data)
        with open(os.path.join(a.out, "mutant_%04d.toml" % i), "w", encoding="utf-8",
                  errors="surrogateescape", newline="") as f:
            f.write(case)
    print("wrote %d %s mutants (seed %d) into %s" % (a.count, a.family, a.seed, a.out))


if __name__ == "__main__":
    main()
