"""Reference values for water's coexistence curves from the python3-iapws library.

How to regenerate (from the repository root, with Debian's python3-iapws installed; only the
system interpreter /usr/bin/python3 can import it):

    npm run fixtures                                   # writes test/reference/iapws-fixtures.json
    /usr/bin/python3 test/reference/make_iapws_fixtures.py --check
                                                       # exits 1 if the committed file differs

What it writes: test/reference/iapws-fixtures.json, read by test/reference/iapws-fixtures.test.ts.
The tests never run Python; they only read the committed JSON.

Determinism: every grid is fixed (no randomness). Grid temperatures and pressures are computed in
decimal arithmetic (the decimal module's exp and ln are correctly rounded) and converted to binary
floating point once, so the inputs are identical on every platform. Numbers are written with
Python's repr (shortest text that reads back to the same double), keys sorted, one row per line.
The library's own arithmetic uses the platform's libm; a different libm may move a value by an
ulp or so, which --check reports as a difference together with its size.

Units: the library works in MPa and K; the file holds SI (Pa, K). A pressure from the library is
multiplied by 1e6 here (one rounding, at most 1.1e-16 relative); a pressure passed to the library
is divided by 1e6, as the TypeScript core does inside Eq. (31).

Functions used (inspected in the installed module):
    iapws.iapws97._PSat_T(T)            IAPWS-IF97 Eq. (30), p_s(T); 273.15 K <= T <= 647.096 K
    iapws.iapws97._TSat_P(P)            IAPWS-IF97 Eq. (31), T_s(p); 611.212677 Pa <= p <= 22.064 MPa
    iapws._iapws._Sublimation_Pressure  IAPWS R14-08(2011) sublimation of ice Ih; 50 K <= T <= 273.16 K
    iapws._iapws._Melting_Pressure      IAPWS R14-08(2011) melting of ices Ih, III, V, VI, VII.
        Its domains: Ih 251.165 <= T <= 273.16; III 251.165 < T <= 256.164; V 256.164 < T <= 273.31;
        VI 273.31 < T <= 355; VII 355 < T <= 715. The lower end of III, V, VI and VII is excluded by
        the library, so those grids start one step above it.
"""

import argparse
import json
import os
import sys
from decimal import Decimal, getcontext

try:
    import iapws
    from iapws._iapws import _Melting_Pressure, _Sublimation_Pressure
    from iapws.iapws97 import _PSat_T, _TSat_P
except ImportError as error:  # pragma: no cover - depends on the machine
    sys.stderr.write(
        "cannot import the iapws module (%s).\n"
        "Install Debian's python3-iapws and run this script with the system interpreter "
        "(/usr/bin/python3), e.g. `npm run fixtures`.\n" % error
    )
    sys.exit(2)

getcontext().prec = 40

HERE = os.path.dirname(os.path.abspath(__file__))
OUTPUT = os.path.join(HERE, "iapws-fixtures.json")
MPA = 1e6


def linear_grid(low, high, intervals, first=0):
    """Temperatures low + (high - low) * i / intervals for i = first .. intervals, in decimal."""
    lo, hi = Decimal(low), Decimal(high)
    return [float(lo + (hi - lo) * i / intervals) for i in range(first, intervals + 1)]


def log_grid(low, high, intervals):
    """Pressures spaced evenly in ln p from low to high (both exact), in decimal."""
    lo, hi = Decimal(low), Decimal(high)
    ln_lo, ln_hi = lo.ln(), hi.ln()
    values = [float((ln_lo + (ln_hi - ln_lo) * i / intervals).exp()) for i in range(intervals + 1)]
    values[0], values[-1] = float(lo), float(hi)
    return values


def grid(description, function, source, x_name, y_name, rows):
    return {
        "description": description,
        "function": function,
        "source": source,
        "columns": [x_name, y_name],
        "count": len(rows),
        "rows": rows,
    }


def build():
    saturation_t = linear_grid("273.16", "647.096", 400)
    saturation_p = log_grid("611.657", "22064000", 400)
    sublimation_t = linear_grid("50", "273.16", 400)

    grids = {
        "saturation_pressure": grid(
            "boiling curve p_s(T), triple point to critical point",
            "iapws.iapws97._PSat_T(T) * 1e6",
            "IAPWS R7-97(2012) (IF97) Eq. (30)",
            "T_K",
            "p_Pa",
            [[t, _PSat_T(t) * MPA] for t in saturation_t],
        ),
        "saturation_temperature": grid(
            "boiling curve T_s(p), triple-point pressure to critical pressure",
            "iapws.iapws97._TSat_P(p / 1e6)",
            "IAPWS R7-97(2012) (IF97) Eq. (31)",
            "p_Pa",
            "T_K",
            [[p, _TSat_P(p / MPA)] for p in saturation_p],
        ),
        "sublimation_pressure": grid(
            "sublimation curve of ice Ih, 50 K to the triple point",
            "iapws._iapws._Sublimation_Pressure(T) * 1e6",
            "IAPWS R14-08(2011) sublimation equation",
            "T_K",
            "p_Pa",
            [[t, _Sublimation_Pressure(t) * MPA] for t in sublimation_t],
        ),
    }
    melting = [
        # (ice, low, high, intervals, first index): first = 1 where the library excludes the low end.
        ("Ih", "251.165", "273.16", 200, 0),
        ("III", "251.165", "256.164", 100, 1),
        ("V", "256.164", "273.31", 200, 1),
        ("VI", "273.31", "355", 200, 1),
        ("VII", "355", "715", 400, 1),
    ]
    for ice, low, high, intervals, first in melting:
        temperatures = linear_grid(low, high, intervals, first)
        grids["melting_pressure_ice_" + ice] = grid(
            "melting curve of ice %s, %s K to %s K%s"
            % (ice, low, high, "" if first == 0 else " (low end excluded by the library)"),
            "iapws._iapws._Melting_Pressure(T, %r) * 1e6" % ice,
            "IAPWS R14-08(2011) melting equation of ice %s" % ice,
            "T_K",
            "p_Pa",
            [[t, _Melting_Pressure(t, ice) * MPA] for t in temperatures],
        )

    return {
        "generator": "test/reference/make_iapws_fixtures.py",
        "regenerate": "npm run fixtures (check: /usr/bin/python3 test/reference/make_iapws_fixtures.py --check)",
        "reference_implementation": {
            "name": "iapws (python3-iapws)",
            "module_version": iapws.__version__,
        },
        "units": {"pressure": "Pa", "temperature": "K"},
        "grids": grids,
    }


def render(value, indent=0):
    """JSON text with sorted keys, one grid row per line, floats written with repr."""
    pad = "  " * indent
    if isinstance(value, dict):
        items = [
            "%s  %s: %s" % (pad, json.dumps(key), render(value[key], indent + 1))
            for key in sorted(value)
        ]
        return "{\n" + ",\n".join(items) + "\n" + pad + "}"
    if isinstance(value, list):
        if all(isinstance(item, list) for item in value) and value:
            rows = ["%s  %s" % (pad, render(item, indent + 1)) for item in value]
            return "[\n" + ",\n".join(rows) + "\n" + pad + "]"
        return "[" + ", ".join(render(item, indent + 1) for item in value) + "]"
    if isinstance(value, bool) or value is None:
        return json.dumps(value)
    if isinstance(value, float):
        if value != value or value in (float("inf"), float("-inf")):
            raise ValueError("non-finite value in fixtures")
        return repr(value)
    if isinstance(value, int):
        return str(value)
    return json.dumps(value, ensure_ascii=False)


def compare_tables(old_tables, new_tables, kind):
    """Lines saying which row tables (name -> rows) differ and by how much."""
    lines = []
    for name in sorted(set(old_tables) | set(new_tables)):
        if name not in old_tables or name not in new_tables:
            lines.append("%s %s: present in only one of the two files" % (kind, name))
            continue
        old_rows, new_rows = old_tables[name], new_tables[name]
        if len(old_rows) != len(new_rows):
            lines.append("%s %s: %d rows committed, %d now" % (kind, name, len(old_rows), len(new_rows)))
            continue
        worst, changed = 0.0, 0
        for old, new in zip(old_rows, new_rows):
            if old != new:
                changed += 1
                for a, b in zip(old, new):
                    if isinstance(a, float) and isinstance(b, float) and a != b:
                        worst = max(worst, abs(a - b) / max(abs(a), abs(b)))
        if changed:
            lines.append("%s %s: %d rows differ, worst relative difference %.3g" % (kind, name, changed, worst))
    return lines


def check_or_write(output, text, describe, versions, counts):
    """Writes the fixture file, or with --check compares it with a fresh run; returns the exit code."""
    script_doc = sys.modules["__main__"].__doc__ or ""
    parser = argparse.ArgumentParser(description=script_doc.split("\n")[0])
    parser.add_argument(
        "--check",
        action="store_true",
        help="regenerate in memory and exit 1 if the committed file differs",
    )
    args = parser.parse_args()
    name = os.path.basename(output)
    if args.check:
        try:
            with open(output, encoding="utf-8") as handle:
                committed_text = handle.read()
        except OSError as error:
            sys.stderr.write("fixtures check failed: cannot read %s (%s)\n" % (output, error))
            return 1
        if committed_text == text:
            print("%s is up to date (%s)" % (name, versions))
            return 0
        sys.stderr.write("fixtures check failed: test/reference/%s differs from a fresh run.\n" % name)
        for line in describe(committed_text):
            sys.stderr.write("  " + line + "\n")
        sys.stderr.write("Regenerate with `npm run fixtures` and review the change before committing.\n")
        return 1
    with open(output, "w", encoding="utf-8", newline="\n") as handle:
        handle.write(text)
    print("wrote test/reference/%s (%s): %s" % (name, versions, counts))
    return 0


def describe_difference(committed_text, fresh):
    """A short account of how the committed file differs from a fresh run."""
    try:
        committed = json.loads(committed_text)
    except ValueError as error:
        return ["committed file is not valid JSON: %s" % error]
    lines = []
    old_version = committed.get("reference_implementation", {}).get("module_version")
    if old_version != fresh["reference_implementation"]["module_version"]:
        lines.append(
            "iapws module version: committed %s, installed %s" % (old_version, fresh["reference_implementation"]["module_version"])
        )
    old_grids = {name: grid["rows"] for name, grid in committed.get("grids", {}).items()}
    new_grids = {name: grid["rows"] for name, grid in fresh["grids"].items()}
    lines += compare_tables(old_grids, new_grids, "grid")
    return lines or ["texts differ outside the grids (metadata or formatting)"]


def main():
    fresh = build()
    counts = ", ".join("%s %d" % (name, g["count"]) for name, g in sorted(fresh["grids"].items()))
    return check_or_write(
        OUTPUT,
        render(fresh) + "\n",
        lambda committed_text: describe_difference(committed_text, fresh),
        "iapws %s" % fresh["reference_implementation"]["module_version"],
        counts,
    )


if __name__ == "__main__":
    sys.exit(main())
