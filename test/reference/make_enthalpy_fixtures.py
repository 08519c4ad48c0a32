"""Reference enthalpies of water's phases from python3-iapws and python3-gsw (TEOS-10).

How to regenerate (from the repository root, with Debian's python3-iapws and python3-gsw
installed; only the system interpreter /usr/bin/python3 can import them):

    /usr/bin/python3 test/reference/make_enthalpy_fixtures.py           # writes enthalpy-fixtures.json
    /usr/bin/python3 test/reference/make_enthalpy_fixtures.py --check   # exits 1 if the committed file differs

What it writes: test/reference/enthalpy-fixtures.json, read by
test/reference/enthalpy-fixtures.test.ts. The tests never run Python; they only read the JSON.

Determinism: as make_iapws_fixtures.py (whose grid and rendering helpers this script imports):
fixed grids computed in decimal arithmetic, no randomness, repr of every float, sorted keys, one
row per line. Every root below (melting and sublimation temperatures, densities) is found by
plain bisection run until the bracket cannot shrink any further, so the answer does not depend on
a solver's tolerance or starting guess.

Units: the libraries work in K, MPa, kJ/kg (iapws) and degC, dbar sea pressure, J/kg (gsw); the
file holds K, Pa and J/kg. Conversions, one rounding each: iapws pressures p/1e6 in, enthalpies
h*1e3 out; gsw temperature T - 273.15 and sea pressure (p - 101325)/1e4 (its docstrings: "In-situ
temperature (ITS-90), degrees C"; "Sea pressure (absolute pressure minus 10.1325 dbar), dbar").

Functions used (inspected in the installed modules):
    iapws.iapws97._Region1(T, P), _Region2(T, P), _Region5(T, P)
                                   IAPWS-IF97 basic equations, (T, p) explicit; no range check,
                                   so region 1 below 273.15 K (liquid down to the ice Ih melting
                                   curve) and region 2 below 273.15 K (vapour over ice) are the
                                   same extrapolations the core makes, evaluated by the library
    iapws.iapws97._Region3(rho, T)  IAPWS-IF97 region 3, (rho, T) explicit; the density at (T, p)
                                   is bisected from a bracket of +-2 % around the library's
                                   backward equation _Backward3_v_PT (IAPWS SR5-05), which only
                                   supplies the bracket
    iapws.iapws97._PSat_T, _TSat_P, _P23_T
                                   IF97 Eqs. (30), (31) and the B23 equation (5), for region choice
    iapws._iapws._Ice(T, P)        IAPWS R10-06(2009) ice Ih Gibbs function
    gsw.enthalpy_ice(t, p)         TEOS-10 (IOC, SCOR and IAPSO 2010), which uses the same
                                   R10-06 Gibbs function of ice Ih
    iapws._iapws._Melting_Pressure(T, "Ih"), _Sublimation_Pressure(T)
                                   IAPWS R14-08(2011); inverted here by bisection
    iapws.IAPWS95()._Helmholtz(rho, T)
                                   IAPWS-95 Helmholtz function (R6-95(2018)) at (rho, T): pressure in
                                   kPa and enthalpy in kJ/kg. The density at (T, p) is bisected on
                                   the stable branch; the library's own (T, p) solver is not used
                                   (it can land on the wrong root at low pressure)

Region choice for the IF97 rows follows IF97 Sec. 4 and the core's phase map (R14-08 curves
decide ice): ice Ih below the melting curve (p >= 611.657 Pa) or above the sublimation curve
(p < 611.657 Pa); else region 5 above 1073.15 K; region 1 at or below 623.15 K for p >= p_s(T),
region 2 below; region 3 between 623.15 K and 863.15 K above the B23 pressure, region 2 below.
Fluid states within 0.5 % of p_s(T) are left out of the single-state grid (on the saturation line
the phase is decided by rounding).
"""

import json
import os
import sys
import warnings

try:
    import gsw
    import iapws
    from iapws import IAPWS95
    from iapws._iapws import _Ice, _Melting_Pressure, _Sublimation_Pressure
    from iapws.iapws97 import (
        _Backward3_v_PT,
        _P23_T,
        _PSat_T,
        _Region1,
        _Region2,
        _Region3,
        _Region5,
        _TSat_P,
    )
except ImportError as error:  # pragma: no cover - depends on the machine
    sys.stderr.write(
        "cannot import iapws or gsw (%s).\n"
        "Install Debian's python3-iapws and python3-gsw and run this script with the system "
        "interpreter (/usr/bin/python3).\n" % error
    )
    sys.exit(2)

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from make_iapws_fixtures import check_or_write, compare_tables, linear_grid, log_grid, render  # noqa: E402

HERE = os.path.dirname(os.path.abspath(__file__))
OUTPUT = os.path.join(HERE, "enthalpy-fixtures.json")
MPA = 1e6
KJ = 1e3

# IF97 Eq. (9) (also the reducing point of R14-08 and R10-06), IF97 Eqs. (2), (3).
T_TRIPLE = 273.16
P_TRIPLE = 611.657
T_CRITICAL = 647.096
P_CRITICAL = 22.064e6
# Ice Ih - ice III - liquid triple point, R14-08(2011).
T_IH_III = 251.165
P_IH_III = 208.566e6
# IF97 Sec. 4 region limits.
T_13 = 623.15
T_23_MAX = 863.15
T_25 = 1073.15

IAPWS95_WATER = IAPWS95()


def bisect(function, low, high):
    """Root of an increasing-or-decreasing function on [low, high] by plain bisection.

    Runs until the midpoint equals an end (the bracket is two adjacent doubles apart) and returns
    the end with the smaller |f|. Raises if the bracket holds no sign change.
    """
    f_low, f_high = function(low), function(high)
    if f_low == 0:
        return low
    if f_high == 0:
        return high
    if (f_low > 0) == (f_high > 0):
        raise ValueError("no sign change in [%r, %r]: f = %r, %r" % (low, high, f_low, f_high))
    for _ in range(2000):
        middle = 0.5 * (low + high)
        if middle == low or middle == high:
            break
        f_middle = function(middle)
        if f_middle == 0:
            return middle
        if (f_middle > 0) == (f_low > 0):
            low, f_low = middle, f_middle
        else:
            high, f_high = middle, f_middle
    return low if abs(f_low) <= abs(f_high) else high


def melting_pressure_ih(t):
    return _Melting_Pressure(t, "Ih") * MPA


def sublimation_pressure(t):
    return _Sublimation_Pressure(t) * MPA


def melting_temperature_ih(p):
    """R14-08 ice Ih melting curve inverted: T with p_m(T) = p, 251.165 K ... 273.16 K."""
    return bisect(lambda t: melting_pressure_ih(t) - p, T_IH_III, T_TRIPLE)


def sublimation_temperature(p):
    """R14-08 sublimation curve inverted: T with p_sub(T) = p, 50 K ... 273.16 K."""
    return bisect(lambda t: sublimation_pressure(t) - p, 50.0, T_TRIPLE)


def boiling_temperature(p):
    return _TSat_P(p / MPA)


def ice_h(t, p):
    """R10-06 ice Ih enthalpy from iapws, J/kg (its metastability warnings are irrelevant here)."""
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")
        return _Ice(t, p / MPA)["h"] * KJ


def ice_h_gsw(t, p):
    """R10-06 ice Ih enthalpy from gsw (TEOS-10), J/kg: degC and sea pressure in dbar."""
    return float(gsw.enthalpy_ice(t - 273.15, (p - 101325.0) / 1e4))


def region3_h(t, p):
    """IF97 region 3 at (T, p): density bisected around the backward-equation estimate."""
    guess = 1.0 / _Backward3_v_PT(p / MPA, t)
    rho = bisect(lambda r: _Region3(r, t)["P"] * MPA - p, 0.98 * guess, 1.02 * guess)
    return _Region3(rho, t)["h"] * KJ


def fluid(t, p):
    """(IF97 region, h in J/kg) of the fluid at (T, p) by the rules in the module docstring."""
    if t > T_25:
        return "region5", _Region5(t, p / MPA)["h"] * KJ
    if t <= T_13:
        if t < 273.15:
            # Outside IF97: liquid only at p >= p_t, vapour only below the sublimation curve.
            region = "region1" if p >= P_TRIPLE else "region2"
        else:
            region = "region1" if p >= _PSat_T(t) * MPA else "region2"
        equation = _Region1 if region == "region1" else _Region2
        return region, equation(t, p / MPA)["h"] * KJ
    if t <= T_23_MAX and p > _P23_T(t) * MPA:
        return "region3", region3_h(t, p)
    return "region2", _Region2(t, p / MPA)["h"] * KJ


def is_ice(t, p):
    """Ice Ih at (T, p) by the R14-08 curves (strictly inside, never on a curve)."""
    if t >= T_TRIPLE or p > P_IH_III:
        return False
    if p < P_TRIPLE:
        return p > sublimation_pressure(t)
    return t <= T_IH_III or p < melting_pressure_ih(t)


def state(t, p):
    """(model, h in J/kg) at (T, p): "ice Ih" or the IF97 region."""
    if is_ice(t, p):
        return "ice Ih", ice_h(t, p)
    return fluid(t, p)


# --- IAPWS-95 -------------------------------------------------------------------------------


def iapws95(rho, t):
    return IAPWS95_WATER._Helmholtz(rho, t)


def iapws95_density(t, p, low, high):
    """Density on the branch bracketed by [low, high] with p(rho, T) = p (p in Pa)."""
    rho = bisect(lambda r: iapws95(r, t)["P"] * KJ - p, low, high)
    if iapws95(rho, t)["betap"] <= 0:
        raise ValueError("IAPWS-95 root at %r K, %r Pa is not mechanically stable" % (t, p))
    return rho


def iapws95_liquid(t, p):
    rho = iapws95_density(t, p, 950.0, 1150.0)
    return rho, iapws95(rho, t)["h"] * KJ


def iapws95_vapour(t, p):
    ideal = p / (461.51805 * t)
    rho = iapws95_density(t, p, 0.5 * ideal, 2.0 * ideal)
    return rho, iapws95(rho, t)["h"] * KJ


# --- grids --------------------------------------------------------------------------------


ISOBARS = [
    # (name, pressure Pa (decimal text), T low, T high, intervals)
    ("101325Pa", "101325", "250", "500", 50),
    ("1MPa", "1000000", "250", "500", 50),
    ("10kPa", "10000", "250", "500", 50),
    ("10MPa", "10000000", "250", "700", 45),
    ("30MPa", "30000000", "250", "900", 65),
    ("100MPa", "100000000", "250", "1070", 82),
    ("100Pa", "100", "200", "300", 50),
    ("10Pa", "10", "200", "300", 50),
    ("1Pa", "1", "205", "305", 50),
]


def crossings_on_isobar(p):
    """[boundary, T_K, latent heat J/kg] met on the isobar, rising in T (library equations)."""
    found = []
    if p < P_TRIPLE:
        t = sublimation_temperature(p)
        found.append(["sublimation", t, fluid(t, p)[1] - ice_h(t, p)])
        return found
    t = melting_temperature_ih(p)
    found.append(["melting", t, _Region1(t, p / MPA)["h"] * KJ - ice_h(t, p)])
    if p < P_CRITICAL:
        t = boiling_temperature(p)
        found.append(["boiling", t, _Region2(t, p / MPA)["h"] * KJ - _Region1(t, p / MPA)["h"] * KJ])
    return found


def isobar(name, pressure, low, high, intervals):
    p = float(pressure)
    rows = []
    for t in linear_grid(low, high, intervals):
        model, h = state(t, p)
        rows.append([t, model, h, ice_h_gsw(t, p) if model == "ice Ih" else None])
    return {
        "description": "isobar %s Pa, %s K to %s K: enthalpy of the phase present at each T" % (pressure, low, high),
        "pressure_Pa": p,
        "columns": ["T_K", "model", "h_J_per_kg", "h_gsw_J_per_kg"],
        "count": len(rows),
        "rows": rows,
        "crossings": crossings_on_isobar(p),
    }


def ice_grid():
    temperatures = linear_grid("50", "273.16", 30)
    pressures = log_grid("0.001", "208000000", 24)
    rows = []
    for t in temperatures:
        for p in pressures:
            # Keep clear of the curves by 1e-6 relative in p, so rounding cannot change the phase.
            if is_ice(t, p * (1 - 1e-6)) and is_ice(t, p * (1 + 1e-6)):
                rows.append([t, p, ice_h(t, p), ice_h_gsw(t, p)])
    return {
        "description": "ice Ih, 50 K to 273.16 K, 1 mPa to 208 MPa, stable states only (R14-08 curves)",
        "function": "iapws._iapws._Ice(T, p / 1e6)['h'] * 1e3; gsw.enthalpy_ice(T - 273.15, (p - 101325) / 1e4)",
        "source": "IAPWS R10-06(2009) Gibbs function of ice Ih (TEOS-10 for gsw)",
        "columns": ["T_K", "p_Pa", "h_J_per_kg", "h_gsw_J_per_kg"],
        "count": len(rows),
        "rows": rows,
    }


def fluid_grid():
    temperatures = linear_grid("273.16", "1073.15", 40) + linear_grid("1073.15", "2273.15", 12, 1)
    pressures = log_grid("1", "100000000", 24)
    rows = []
    for t in temperatures:
        for p in pressures:
            if t > T_25 and p > 50e6:
                continue
            if t < T_CRITICAL and abs(p / (_PSat_T(t) * MPA) - 1) < 0.005:
                continue
            if T_13 < t <= T_23_MAX and abs(p / (_P23_T(t) * MPA) - 1) < 1e-9:
                continue
            region, h = fluid(t, p)
            rows.append([t, p, region, h])
    return {
        "description": "fluid over IF97's range: 273.16 K to 1073.15 K up to 100 MPa, to 2273.15 K up to 50 MPa; "
        "states within 0.5 % of p_s(T) left out",
        "function": "iapws.iapws97._Region1/_Region2/_Region5(T, p / 1e6)['h'] * 1e3; _Region3 at the bisected density",
        "source": "IAPWS R7-97(2012) (IF97) basic equations of regions 1, 2, 3, 5",
        "columns": ["T_K", "p_Pa", "region", "h_J_per_kg"],
        "count": len(rows),
        "rows": rows,
    }


def liquid_on_melting_curve():
    rows = []
    # 0.1 MPa to 1 MPa evenly in ln p, then every 2 MPa to 100 MPa (the deviation peaks near 70 MPa).
    for p in log_grid("100000", "1000000", 10) + linear_grid("2000000", "100000000", 49):
        t = melting_temperature_ih(p)
        rho, h95 = iapws95_liquid(t, p)
        rows.append([p, t, h95, rho, _Region1(t, p / MPA)["h"] * KJ])
    return {
        "description": "liquid on the ice Ih melting curve, 0.1 MPa to 100 MPa: IAPWS-95 against IF97 region 1 "
        "(extrapolated below 273.15 K)",
        "function": "T = R14-08 Ih melting curve inverted; IAPWS95()._Helmholtz(rho, T) with rho bisected on "
        "[950, 1150] kg/m3; iapws.iapws97._Region1(T, p / 1e6)",
        "source": "IAPWS R6-95(2018) (IAPWS-95); IAPWS R14-08(2011); IAPWS R7-97(2012) region 1",
        "columns": ["p_Pa", "T_K", "h_iapws95_J_per_kg", "rho_iapws95_kg_per_m3", "h_if97_region1_J_per_kg"],
        "count": len(rows),
        "rows": rows,
    }


def vapour_on_sublimation_curve():
    rows = []
    for t in linear_grid("200", "273", 73) + [T_TRIPLE]:
        p = sublimation_pressure(t)
        rho, h95 = iapws95_vapour(t, p)
        rows.append([t, p, h95, rho, _Region2(t, p / MPA)["h"] * KJ])
    return {
        "description": "vapour on the ice Ih sublimation curve, 200 K to 273.16 K: IAPWS-95 against IF97 region 2 "
        "(extrapolated below 273.15 K)",
        "function": "p = iapws._iapws._Sublimation_Pressure(T) * 1e6; IAPWS95()._Helmholtz(rho, T) with rho "
        "bisected on [0.5, 2] x p/(R T); iapws.iapws97._Region2(T, p / 1e6)",
        "source": "IAPWS R6-95(2018) (IAPWS-95); IAPWS R14-08(2011); IAPWS R7-97(2012) region 2",
        "columns": ["T_K", "p_Pa", "h_iapws95_J_per_kg", "rho_iapws95_kg_per_m3", "h_if97_region2_J_per_kg"],
        "count": len(rows),
        "rows": rows,
    }


def triple_point():
    t, p = T_TRIPLE, P_TRIPLE
    rho_liquid, h_liquid = iapws95_liquid(t, p)
    rho_vapour, h_vapour = iapws95_vapour(t, p)
    h_ice = ice_h(t, p)
    return {
        "description": "phases at the triple point (273.16 K, 611.657 Pa): IAPWS-95 liquid and vapour, R10-06 ice Ih",
        "T_K": t,
        "p_Pa": p,
        "h_liquid_iapws95_J_per_kg": h_liquid,
        "h_vapour_iapws95_J_per_kg": h_vapour,
        "rho_liquid_iapws95_kg_per_m3": rho_liquid,
        "rho_vapour_iapws95_kg_per_m3": rho_vapour,
        "h_ice_J_per_kg": h_ice,
        "h_ice_gsw_J_per_kg": ice_h_gsw(t, p),
        "fusion_J_per_kg": h_liquid - h_ice,
        "vaporization_J_per_kg": h_vapour - h_liquid,
        "sublimation_J_per_kg": h_vapour - h_ice,
    }


def build():
    return {
        "generator": "test/reference/make_enthalpy_fixtures.py",
        "regenerate": "/usr/bin/python3 test/reference/make_enthalpy_fixtures.py (check: add --check)",
        "libraries": {
            "iapws": {"name": "iapws (python3-iapws)", "module_version": iapws.__version__},
            "gsw": {"name": "gsw (python3-gsw, TEOS-10)", "module_version": gsw.__version__},
        },
        "units": {"pressure": "Pa", "temperature": "K", "specific enthalpy": "J/kg", "density": "kg/m3"},
        "isobars": {name: isobar(name, *rest) for name, *rest in ISOBARS},
        "ice": ice_grid(),
        "fluid": fluid_grid(),
        "liquid_on_melting_curve": liquid_on_melting_curve(),
        "vapour_on_sublimation_curve": vapour_on_sublimation_curve(),
        "triple_point": triple_point(),
    }


def tables(document):
    """Every row table of the document by a dotted name: isobars.<name>, ice, fluid, …"""
    found = {}
    for name, value in document.items():
        if isinstance(value, dict) and "rows" in value:
            found[name] = value["rows"]
        elif name == "isobars" and isinstance(value, dict):
            for isobar_name, entry in value.items():
                found["isobars." + isobar_name] = entry.get("rows", [])
                found["isobars." + isobar_name + ".crossings"] = entry.get("crossings", [])
    return found


def describe_difference(committed_text, fresh):
    """A short account of how the committed file differs from a fresh run."""
    try:
        committed = json.loads(committed_text)
    except ValueError as error:
        return ["committed file is not valid JSON: %s" % error]
    lines = []
    for library in ("iapws", "gsw"):
        old = committed.get("libraries", {}).get(library, {}).get("module_version")
        new = fresh["libraries"][library]["module_version"]
        if old != new:
            lines.append("%s module version: committed %s, installed %s" % (library, old, new))
    lines += compare_tables(tables(committed), tables(fresh), "table")
    return lines or ["texts differ outside the tables (metadata, triple point or formatting)"]


def main():
    fresh = build()
    versions = "iapws %s, gsw %s" % (fresh["libraries"]["iapws"]["module_version"], fresh["libraries"]["gsw"]["module_version"])
    counts = ", ".join("%s %d" % (name, len(rows)) for name, rows in sorted(tables(fresh).items()))
    return check_or_write(
        OUTPUT,
        render(fresh) + "\n",
        lambda committed_text: describe_difference(committed_text, fresh),
        versions,
        counts,
    )


if __name__ == "__main__":
    sys.exit(main())
