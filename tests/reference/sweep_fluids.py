#!/usr/bin/env python3
"""The speed benchmark's sweep in the general-purpose Python library `fluids` (CalebBell/fluids):
terminal velocity (fluids.drag.v_terminal, Method "Haider_Levenspiel") and the Ergun pressure
gradient (fluids.packed_bed.Ergun, L = 1 m) over 256 particle sizes (1-500 um, log-spaced) x 256
particle densities (1500-5000 kg/m3), the grid of src/sweep.rs.

Run by `./task.sh bench` (through tests/sweep_bench.rs), which installs fluids 1.3.1 into a virtual
environment under target/ and passes the liquid's density and viscosity (water at 25 C from
Clearbore's solvent table, so that both sides use the same liquid):

    python sweep_fluids.py RHO MU OUT.json

It writes the fluids version, the time of the loop alone (time.perf_counter, best of REPEATS) and
every value, size-major, to OUT.json.
"""

import json
import platform
import sys
import time
from importlib.metadata import version

from fluids.drag import v_terminal
from fluids.packed_bed import Ergun

SIZES, DENSITIES = 256, 256
SMALLEST, LARGEST = 1e-6, 500e-6
LIGHTEST, HEAVIEST = 1500.0, 5000.0
VOIDAGE, VS = 0.4, 1e-3
REPEATS = 2


def sweep(rho, mu):
    v, dpdz = [], []
    for i in range(SIZES):
        d = SMALLEST * (LARGEST / SMALLEST) ** (i / (SIZES - 1))
        for j in range(DENSITIES):
            rhop = LIGHTEST + (HEAVIEST - LIGHTEST) * j / (DENSITIES - 1)
            v.append(v_terminal(D=d, rhop=rhop, rho=rho, mu=mu, Method="Haider_Levenspiel"))
            dpdz.append(Ergun(dp=d, voidage=VOIDAGE, vs=VS, rho=rho, mu=mu, L=1.0))
    return v, dpdz


def main():
    rho, mu, out = float(sys.argv[1]), float(sys.argv[2]), sys.argv[3]
    best = float("inf")
    for _ in range(REPEATS):
        t0 = time.perf_counter()
        v, dpdz = sweep(rho, mu)
        best = min(best, time.perf_counter() - t0)
    with open(out, "w") as f:
        json.dump({
            "fluids_version": version("fluids"),
            "python_version": platform.python_version(),
            "seconds": best,
            "repeats": REPEATS,
            "terminal_velocity": v,
            "ergun_gradient": dpdz,
        }, f)


if __name__ == "__main__":
    main()
