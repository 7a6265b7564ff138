#!/usr/bin/env python3
"""Reference values for Clearbore's gas-liquid cartridge, computed with general-purpose Python
libraries:

* `fluids` (CalebBell/fluids) 1.3.1, `fluids.packed_bed.Ergun`: the single-phase gradients of each
  phase flowing alone, on which the Larkins-White-Jeffrey two-phase correlation is built. The
  packed-cartridge reference grid holds liquids only; this one adds gases at lab pressures (low
  density and viscosity, higher velocities).
* `ht` (CalebBell/ht) 1.2.0, `ht.conv_packed_bed.Nu_Wakao_Kagei`: Nu = 2 + 1.1 Pr^(1/3) Re^0.6,
  the same form as the Wakao-Funazkri Sherwood number with Sc for Pr.

Run by hand (not in CI):  python3 -m venv /tmp/venv-glb
                          /tmp/venv-glb/bin/pip install fluids==1.3.1 ht==1.2.0
                          /tmp/venv-glb/bin/python tests/reference/gas_liquid_bed_reference.py
It writes tests/reference/gas_liquid_bed_reference.json, which tests/gas_liquid_bed.rs reads.
"""

import itertools
import json
import platform
from importlib.metadata import version
from pathlib import Path

from fluids.packed_bed import Ergun
from ht.conv_packed_bed import Nu_Wakao_Kagei

OUT = Path(__file__).with_name("gas_liquid_bed_reference.json")

# Gas states near lab conditions: (name, density kg/m3, viscosity Pa s), approximate values from
# memory that only place the test points (H2 and N2 at 1-20 bar, 25-60 C).
GASES = [
    ("hydrogen-1bar", 0.081, 8.9e-6),
    ("hydrogen-11bar", 0.89, 9.0e-6),
    ("nitrogen-5bar", 5.6, 1.78e-5),
    ("nitrogen-20bar", 22.0, 1.80e-5),
]
DP = [4.5e-5, 1e-4, 3e-4, 3e-3]
VOIDAGE = [0.36, 0.42, 0.5]
VS = [1e-4, 4e-3, 0.05, 0.5]

# Wakao-Kaguei / Wakao-Funazkri form over lab and fitted ranges; (2000, 0.7) is the ht docstring case.
RE = [0.01, 0.1, 3.0, 50.0, 2000.0, 10000.0]
PR = [0.7, 50.0, 500.0, 2000.0]


def main():
    ergun = [
        {"gas": g, "dp": dp, "voidage": e, "vs": vs, "rho": rho, "mu": mu, "L": 1.0,
         "Ergun": Ergun(dp=dp, voidage=e, vs=vs, rho=rho, mu=mu, L=1.0)}
        for (g, rho, mu), dp, e, vs in itertools.product(GASES, DP, VOIDAGE, VS)
    ]
    nusselt = [{"Re": re, "Pr": pr, "Nu": Nu_Wakao_Kagei(re, pr)} for re, pr in itertools.product(RE, PR)]
    out = {
        "generator": "tests/reference/gas_liquid_bed_reference.py",
        "fluids_version": version("fluids"),
        "ht_version": version("ht"),
        "python_version": platform.python_version(),
        "units": "SI: dp, L in m; vs in m/s; rho in kg/m3; mu in Pa s; Ergun in Pa over L",
        "ergun_gas": ergun,
        "nu_wakao_kagei": nusselt,
    }
    OUT.write_text(json.dumps(out, indent=1) + "\n")
    print(f"fluids {out['fluids_version']}, ht {out['ht_version']}: {len(ergun)} Ergun points, {len(nusselt)} Nusselt points -> {OUT}")


if __name__ == "__main__":
    main()
