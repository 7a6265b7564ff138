"""Reference minimum-fluidisation velocities from the `chemics` package (PyPI), for
tests/packed_bed.rs. Run by hand, not in CI:

    python3 -m venv /tmp/venv-chemics && /tmp/venv-chemics/bin/pip install chemics==20.4
    /tmp/venv-chemics/bin/python tests/reference/fluidisation_chemics.py

chemics implements the two-constant fits tabulated in Kunii & Levenspiel (1991), Fluidization
Engineering, 2nd ed., Table 4 of chapter 3 (`umf_coeff`), and the Ergun-based quadratic
(`umf_ergun`), with g = 9.81 m/s² (Clearbore uses 9.80665). Grid: lab particles and liquids.
"""

import json
import pathlib
from importlib.metadata import version

import chemics

FITS = ["wenyu", "rich", "sax", "babu", "grace", "chit"]
LIQUIDS = {"water-like": (998.0, 1.0e-3), "acetonitrile-like": (777.0, 3.4e-4)}
rows = []
for name, (rho, mu) in LIQUIDS.items():
    for dp in (20e-6, 50e-6, 100e-6, 200e-6, 500e-6):
        for rhos in (1200.0, 2500.0, 4000.0):
            row = {"liquid": name, "rho": rho, "mu": mu, "dp": dp, "rhos": rhos}
            for fit in FITS:
                row[fit] = chemics.umf_coeff(dp, mu, rho, rhos, fit)
            for ep in (0.40, 0.45):
                for phi in (1.0, 0.8):
                    row[f"ergun_{ep}_{phi}"] = chemics.umf_ergun(dp, ep, mu, phi, rho, rhos)
            rows.append(row)

out = {"package": "chemics", "version": version("chemics"), "g": 9.81, "fits": FITS, "rows": rows}
path = pathlib.Path(__file__).with_name("fluidisation_chemics.json")
path.write_text(json.dumps(out, indent=1) + "\n")
print(f"chemics {out['version']}: {len(rows)} rows written to {path}")
