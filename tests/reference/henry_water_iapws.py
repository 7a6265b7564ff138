#!/usr/bin/env python3
"""Reference values for the Henry's-law constants of O2, H2, N2, CO and CO2 in water from the
IAPWS guideline G7-04 (Fernández-Prini, Alvarez & Harvey, J. Phys. Chem. Ref. Data 32 (2003) 903),
as implemented in the Python package `iapws` (pinned: iapws==1.5.5).

Run by hand (not in CI):  python3 -m venv /tmp/v && /tmp/v/bin/pip install iapws==1.5.5
                          /tmp/v/bin/python tests/reference/henry_water_iapws.py
Writes tests/reference/henry_water_iapws.json. For each gas and temperature it records
k_H (MPa, p_gas = k_H x_gas, `iapws._iapws._Henry`), the saturated-liquid density of water
(kg/m3, IAPWS 1992 auxiliary equation, `iapws.IAPWS95._Liquid_Density`) and the molar solubility
H_cp = rho_w / (M_w k_H) in mol/(m3 Pa) that Clearbore computes (dilute solution).
"""

import json
import warnings
from importlib.metadata import version
from pathlib import Path

from iapws import IAPWS95
from iapws._iapws import M, _Henry

assert version("iapws") == "1.5.5", "pin: iapws==1.5.5"

GASES = ["O2", "H2", "N2", "CO", "CO2"]
CELSIUS = [5, 10, 25, 40, 60, 80, 100, 120, 150, 200, 250]

rows = []
for gas in GASES:
    for c in CELSIUS:
        t = 273.15 + c
        with warnings.catch_warnings(record=True) as w:
            warnings.simplefilter("always")
            kh_mpa = _Henry(t, gas)
            outside = any("out of data" in str(x.message) for x in w)
        rho = IAPWS95._Liquid_Density(t)
        h_cp = rho / (M * 1e-3) / (kh_mpa * 1e6)
        rows.append({"gas": gas, "t_k": t, "k_h_mpa": kh_mpa, "water_density_kg_m3": rho,
                     "h_cp_mol_m3_pa": h_cp, "outside_guideline_range": outside})

out = {
    "generated_by": "tests/reference/henry_water_iapws.py",
    "package_versions": {"iapws": version("iapws")},
    "source": "IAPWS G7-04 (2004), Guideline on the Henry's constant and vapor-liquid distribution constant "
              "for gases in H2O and D2O at high temperatures; Fernandez-Prini, Alvarez & Harvey (2003)",
    "water_molar_mass_g_mol": M,
    "rows": rows,
}
path = Path(__file__).with_suffix(".json")
path.write_text(json.dumps(out, indent=1) + "\n")
print(f"wrote {path}: {len(rows)} rows")
