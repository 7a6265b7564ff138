#!/usr/bin/env python3
"""Estimated limiting oxygen concentrations (LOC, N2 diluent, 25 °C, 1 atm) of Clearbore's
solvents by the rule LOC ≈ LFL × z, z the moles of O2 that burn one mole of the vapour
completely (C → CO2, H → H2O, N → N2, S → SO2, Cl → HCl), for src/physics/hazards/oxygen.rs.

LFLs and stoichiometry come from the general-purpose Python package `chemicals` (CalebBell):
the IEC 60079-20-1 (2010) column where it has the solvent, else the NFPA 497 (2008) column,
and Jones' rule LFL ≈ 0.55 C_st (as in `chemicals.safety.Crowl_Louvar_LFL`, computed here with
the library's own combustion stoichiometry so that sulfur counts). The estimate kept is the lower
of the two (the tabulated LFL where there is one, Jones' rule always): the conservative side for
an oxygen limit. The rule itself is recalled from the process-safety literature (from memory);
measured LOCs replace it.

Run by hand, not in CI:

    python3 -m venv /tmp/venv-chemicals && /tmp/venv-chemicals/bin/pip install chemicals==1.5.2
    /tmp/venv-chemicals/bin/python tests/reference/loc_estimates.py
"""

import json
import pathlib
from importlib.metadata import version

from chemicals.combustion import combustion_stoichiometry
from chemicals.elements import simple_formula_parser
from chemicals.safety import LFL, LFL_methods

# key used in src/physics/fluids (Solvent::key), CAS number, formula
SOLVENTS = [
    ("methanol", "67-56-1", "CH4O"),
    ("ethanol", "64-17-5", "C2H6O"),
    ("2-propanol", "67-63-0", "C3H8O"),
    ("acetonitrile", "75-05-8", "C2H3N"),
    ("acetone", "67-64-1", "C3H6O"),
    ("thf", "109-99-9", "C4H8O"),
    ("2-methf", "96-47-9", "C5H10O"),
    ("ethyl_acetate", "141-78-6", "C4H8O2"),
    ("toluene", "108-88-3", "C7H8"),
    ("heptane", "142-82-5", "C7H16"),
    ("dmf", "68-12-2", "C3H7NO"),
    ("dmso", "67-68-5", "C2H6OS"),
    ("nmp", "872-50-4", "C5H9NO"),
    ("1,4-dioxane", "123-91-1", "C4H8O2"),
    ("dmac", "127-19-5", "C4H9NO"),
    ("mtbe", "1634-04-4", "C5H12O"),
    ("cpme", "5614-37-9", "C6H12O"),
    ("tert-butanol", "75-65-0", "C4H10O"),
    ("acetic_acid", "64-19-7", "C2H4O2"),
]

PREFERRED = ["IEC 60079-20-1 (2010)", "NFPA 497 (2008)"]


def main():
    rows = []
    for key, cas, formula in SOLVENTS:
        atoms = simple_formula_parser(formula)
        z = -combustion_stoichiometry(atoms)["O2"]
        methods = LFL_methods(CASRN=cas)
        method = next((m for m in PREFERRED if m in methods), None)
        tabulated = LFL(CASRN=cas, method=method) if method is not None else None
        jones = 0.55 / (1.0 + z / 0.20946)
        lfl, source = (tabulated, method) if tabulated is not None and tabulated <= jones else (jones, "Jones rule 0.55 C_st")
        rows.append({
            "solvent": key,
            "cas": cas,
            "formula": formula,
            "oxygen_per_mole": z,
            "lfl_tabulated": tabulated,
            "lfl_tabulated_source": method,
            "lfl_jones": jones,
            "lfl": lfl,
            "lfl_source": source,
            "loc_estimate": lfl * z,
        })
    out = {
        "generator": "tests/reference/loc_estimates.py",
        "package": f"chemicals {version('chemicals')}",
        "rule": "LOC ≈ LFL × z (vol fractions), N2 diluent, 25 °C, 1 atm",
        "rows": rows,
    }
    path = pathlib.Path(__file__).with_suffix(".json")
    path.write_text(json.dumps(out, indent=1, ensure_ascii=False) + "\n")
    for r in rows:
        print(f"{r['solvent']:14s} z={r['oxygen_per_mole']:5.2f} LFL={100*r['lfl']:5.2f} % ({r['lfl_source']}) LOC≈{100*r['loc_estimate']:5.2f} %")


if __name__ == "__main__":
    main()
