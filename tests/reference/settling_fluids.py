#!/usr/bin/env python3
"""Reference values for Clearbore's settling correlations, computed with the general-purpose Python
library `fluids` (CalebBell/fluids), over the lab range of particles in liquids.

Run by hand (not in CI):  python -m venv venv && venv/bin/pip install fluids
                          venv/bin/python tests/reference/settling_fluids.py
It prints the fluids version and writes tests/reference/settling_fluids.json, which
tests/settling.rs reads with include_str!.

Grid: particle diameter 1-500 um, particle density 1500-5000 kg/m3, water and four organic-solvent
property sets. For each point: fluids.drag.v_terminal with Method "Stokes", "Barati", "Clift" and
"Haider_Levenspiel", and the Stokes Reynolds number fluids uses to decide between its closed-form
Stokes value (Re < 0.01) and a numerical solve. Drag coefficients of every ported law are also
tabulated on a Reynolds grid covering every Clift branch. Schiller-Naumann is not in fluids 1.3.1;
it is written out below (key ending in _hand): an independent rewrite, not a library value.
"""

import itertools
import json
import platform
from importlib.metadata import version
from pathlib import Path

from fluids import drag
from fluids.constants import g

FLUIDS_VERSION = version("fluids")
OUT = Path(__file__).with_name("settling_fluids.json")

# Liquid properties near 20-25 C, approximate values from memory; they only place the test points.
LIQUIDS = {
    "water-like": (998.2, 1.002e-3),
    "acetonitrile-like": (776.0, 0.34e-3),
    "toluene-like": (862.0, 0.56e-3),
    "dmf-like": (944.0, 0.80e-3),
    "dichloromethane-like": (1326.0, 0.41e-3),
}
DIAMETERS = [1e-6, 2e-6, 5e-6, 10e-6, 20e-6, 50e-6, 70e-6, 100e-6, 200e-6, 300e-6, 500e-6]
PARTICLE_DENSITIES = [1500.0, 2600.0, 5000.0]
METHODS = ["Stokes", "Barati", "Clift", "Haider_Levenspiel"]
REYNOLDS = [1e-4, 3e-3, 0.01, 0.05, 0.2, 1.0, 5.0, 19.9, 20.0, 100.0, 200.0, 259.0, 260.0, 800.0, 1499.0,
            1500.0, 5e3, 1.2e4, 3e4, 4.4e4, 1e5, 3.38e5, 3.5e5, 4e5, 8e5]


def schiller_naumann(re):
    """24/Re (1 + 0.15 Re^0.687) - not in fluids 1.3.1."""
    return 24.0 / re * (1.0 + 0.15 * re**0.687)


def dumps_one_point_per_line(data):
    """JSON with one grid point per line: compact, yet readable in a diff."""
    lines = ["{"]
    items = list(data.items())
    for i, (key, value) in enumerate(items):
        comma = "," if i + 1 < len(items) else ""
        if isinstance(value, list):
            rows = ",\n".join("  " + json.dumps(row, separators=(",", ":")) for row in value)
            lines.append(f" {json.dumps(key)}: [\n{rows}\n ]{comma}")
        else:
            lines.append(f" {json.dumps(key)}: {json.dumps(value)}{comma}")
    lines.append("}")
    return "\n".join(lines) + "\n"


def main():
    points = []
    for (liquid, (rho, mu)), d, rhop in itertools.product(LIQUIDS.items(), DIAMETERS, PARTICLE_DENSITIES):
        v_stokes = g * d * d * (rhop - rho) / (18.0 * mu)
        point = dict(liquid=liquid, d=d, rhop=rhop, rho=rho, mu=mu, Re_stokes=rho * v_stokes * d / mu)
        for m in METHODS:
            point["v_" + m] = drag.v_terminal(D=d, rhop=rhop, rho=rho, mu=mu, Method=m)
        points.append(point)

    drag_points = []
    for re in REYNOLDS:
        drag_points.append(dict(
            Re=re,
            Stokes=drag.Stokes(re),
            Barati=drag.Barati(re),
            Clift=drag.Clift(re),
            Haider_Levenspiel=drag.Haider_Levenspiel(re),
            Schiller_Naumann_hand=schiller_naumann(re),
        ))

    data = {
        "generator": "tests/reference/settling_fluids.py",
        "fluids_version": FLUIDS_VERSION,
        "python_version": platform.python_version(),
        "g": g,
        "units": "SI: d in m; rhop, rho in kg/m3; mu in Pa s; velocities in m/s",
        "note": "v_<Method> = fluids.drag.v_terminal(Method=...), which returns the Stokes value whenever Re_stokes < 0.01 and otherwise solves with secant, xtol 1e-12 m/s. Keys ending in _hand are written out in this script.",
        "terminal_velocity": points,
        "drag_coefficient": drag_points,
    }
    OUT.write_text(dumps_one_point_per_line(data))
    print(f"fluids {FLUIDS_VERSION} (Python {platform.python_version()})")
    print(f"wrote {len(points)} terminal-velocity points and {len(drag_points)} drag points to {OUT}")


if __name__ == "__main__":
    main()
