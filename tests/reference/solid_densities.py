#!/usr/bin/env python3
"""Reference skeletal densities for Clearbore's solids table (src/physics/solids.rs), from the
CRC Handbook table of inorganic solid densities as shipped in the general-purpose Python package
`chemicals` (CalebBell/chemicals), which stores molar volumes Vm; density = MW / Vm.

Run by hand, not in CI:

    python3 -m venv /tmp/venv-chemicals && /tmp/venv-chemicals/bin/pip install chemicals==1.5.2
    /tmp/venv-chemicals/bin/python tests/reference/solid_densities.py

Molar masses come from chemicals.MW where its database has the CAS number; graphite and
vitreous silica are not there, so C = 12.011 g/mol (IUPAC conventional atomic weight) and the
molar mass of SiO2 (from α-quartz's entry) are used.
"""

import json
import pathlib
from importlib.metadata import version

import chemicals
from chemicals.volume import rho_data_CRC_inorg_s_const as crc

CAS = [
    "584-08-7", "534-17-8", "497-19-8", "554-13-2", "471-34-1", "144-55-8", "298-14-6",
    "7778-53-2", "7601-54-9", "7558-79-4", "7789-23-3", "13400-13-0", "127-09-3", "127-08-2",
    "1310-73-2", "1310-58-3", "7487-88-9", "7757-82-6", "7647-14-5", "7447-40-7", "10043-52-4",
    "7681-65-4", "1317-61-9", "1317-70-0", "7440-66-6", "7440-50-8", "7440-02-0", "7440-05-3",
    "60676-86-0", "1344-28-1", "7782-42-5",
]
MW_FALLBACK = {"7782-42-5": 12.011, "60676-86-0": chemicals.MW("14808-60-7")}

rows = []
for cas in CAS:
    entry = crc.loc[cas]
    mw = MW_FALLBACK.get(cas) or chemicals.MW(cas)
    rows.append({"cas": cas, "name": entry.Chemical, "mw_g_per_mol": mw, "vm_m3_per_mol": float(entry.Vm),
                 "density_kg_per_m3": mw / 1000.0 / float(entry.Vm)})

out = {"package": "chemicals", "version": version("chemicals"), "table": "CRC Solid Inorganic Constant Densities", "rows": rows}
path = pathlib.Path(__file__).with_name("solid_densities.json")
path.write_text(json.dumps(out, indent=1, ensure_ascii=False) + "\n")
print(f"chemicals {out['version']}: {len(rows)} densities written to {path}")
