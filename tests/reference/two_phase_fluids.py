#!/usr/bin/env python3
"""Reference frictional pressure gradients for Clearbore's separated-flow models
(src/physics/segmented_flow/separated_flow.rs), computed with the general-purpose Python
library `fluids` (CalebBell/fluids) 1.3.1: `Mishima_Hibiki`, `Zhang_Hibiki_Mishima`
(flowtype "adiabatic gas") and `Kim_Mudawar`, per metre of tube.

Run by hand, not in CI:

    python3 -m venv /tmp/venv-fluids && /tmp/venv-fluids/bin/pip install fluids==1.3.1
    /tmp/venv-fluids/bin/python tests/reference/two_phase_fluids.py

Grid: lab tubing bores, three liquids, three gases at several pressures, liquid and actual gas
flows over the lab range, plus a few large flows that reach the turbulent branches. The
library takes the total mass flow m and the quality x: m = rho_l Q_l + rho_g Q_g,
x = rho_g Q_g / m. Also the library's own docstring examples.
"""

import json
import pathlib
from importlib.metadata import version

from fluids.two_phase import Kim_Mudawar, Mishima_Hibiki, Zhang_Hibiki_Mishima

LIQUIDS = {  # rho kg/m3, mu Pa s, sigma N/m (rounded lab values; inputs only)
    "water": (998.0, 1.0e-3, 0.072),
    "acetonitrile": (777.0, 0.34e-3, 0.029),
    "toluene": (862.0, 0.55e-3, 0.028),
}
GASES = {  # density at 1 bar(a) and 25 C, kg/m3 (ideal gas), viscosity Pa s
    "N2": (1.130, 1.78e-5),
    "O2": (1.291, 2.06e-5),
    "H2": (0.0813, 0.89e-5),
}
ML_MIN = 1e-6 / 60.0

rows = []
for d_mm in (0.5, 1.0, 1.6, 3.0):
    d = d_mm * 1e-3
    area = 3.141592653589793 * d * d / 4.0
    for lname, (rhol, mul, sigma) in LIQUIDS.items():
        for gname, (rhog1, mug) in GASES.items():
            for p_bar in (1.0, 5.0, 20.0):
                rhog = rhog1 * p_bar
                for ql, qg in ((0.1, 0.1), (1.0, 1.0), (1.0, 3.0), (5.0, 2.0), (10.0, 20.0), (200.0, 100.0), (20.0, 5000.0)):
                    QL, QG = ql * ML_MIN, qg * ML_MIN
                    m = rhol * QL + rhog * QG
                    x = rhog * QG / m
                    args = dict(m=m, x=x, rhol=rhol, rhog=rhog, mul=mul, mug=mug, sigma=sigma, D=d, L=1.0)
                    rows.append({
                        "d": d, "liquid": lname, "gas": gname, "rhol": rhol, "mul": mul, "sigma": sigma,
                        "rhog": rhog, "mug": mug, "jl": QL / area, "jg": QG / area,
                        "mishima_hibiki": Mishima_Hibiki(**args),
                        "zhang_hibiki_mishima": Zhang_Hibiki_Mishima(**args, flowtype="adiabatic gas"),
                        "kim_mudawar": Kim_Mudawar(**args),
                    })

examples = {
    "zhang_hibiki_mishima_vapor": Zhang_Hibiki_Mishima(m=0.0005, x=0.1, rhol=915., rhog=2.67, mul=180E-6, mug=14E-6, sigma=0.0487, D=0.003),
    "mishima_hibiki": Mishima_Hibiki(m=0.6, x=0.1, rhol=915., rhog=2.67, mul=180E-6, mug=14E-6, sigma=0.0487, D=0.05),
    "kim_mudawar": Kim_Mudawar(m=0.6, x=0.1, rhol=915., rhog=2.67, mul=180E-6, mug=14E-6, sigma=0.0487, D=0.05),
}

out = {"package": "fluids", "version": version("fluids"), "rows": rows, "docstring_examples": examples}
path = pathlib.Path(__file__).with_name("two_phase_fluids.json")
path.write_text(json.dumps(out, indent=1) + "\n")
print(f"fluids {out['version']}: {len(rows)} rows written to {path}")
