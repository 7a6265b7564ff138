#!/usr/bin/env python3
"""Reference values for Clearbore's packed-bed correlations, computed with the general-purpose
Python library `fluids` (CalebBell/fluids), over a grid of lab-cartridge conditions.

Run by hand (not in CI):  pip install fluids
                          python tests/reference/packed_bed_fluids.py
It prints the fluids version and writes tests/reference/packed_bed_fluids.json, which
tests/packed_bed.rs reads with include_str!.

Grid: particle diameter 5-500 um, voidage 0.35-0.5 (0.4 included: the Montillet-Akkari-Comiti
constant switches there), tube diameter 2-10 mm, superficial velocity 1e-5 to 1e-2 m/s, a water-like
and two organic-like liquids; plus a few larger particles and velocities so that the inertial terms
matter. Kozeny-Carman and the Mehta-Hawley wall correction are not in fluids 1.3.1; they are
written out below from their formulas (marked "hand" in the JSON): an independent rewrite,
not a library value.
"""

import itertools
import json
import platform
from importlib.metadata import version
from pathlib import Path

from fluids import packed_bed as pb

FLUIDS_VERSION = version("fluids")
OUT = Path(__file__).with_name("packed_bed_fluids.json")

# Liquid properties near 20 C, approximate values from memory; they only place the test points.
LIQUIDS = {
    "water-like": (998.2, 1.002e-3),
    "toluene-like": (866.9, 0.59e-3),
    "viscous-organic": (1100.0, 2.0e-3),
}
BED_LENGTH = 0.05  # m: a 50 mm cartridge, so the tests also check the length scaling

LAB_DP = [5e-6, 20e-6, 100e-6, 500e-6]
LAB_VOIDAGE = [0.35, 0.4, 0.45, 0.5]
LAB_DT = [2e-3, 4.6e-3, 10e-3]
LAB_VS = [1e-5, 1e-3, 1e-2]

# Larger particles and faster flows (Re_m up to a few thousand) for the inertial terms.
HIGH_RE = [
    (1e-3, 0.38, 0.02, 0.05),
    (2e-3, 0.42, 0.025, 0.1),
    (5e-3, 0.40, 0.05, 0.3),
    (8e-4, 0.45, 0.01, 0.02),
]


def kozeny_carman(dp, voidage, vs, mu, L):
    """180 mu u L (1-e)^2 / (e^3 dp^2) - not in fluids 1.3.1."""
    return 180.0 * mu * vs * L * (1.0 - voidage) ** 2 / (voidage**3 * dp**2)


def mehta_hawley(dp, voidage, vs, rho, mu, L, Dt):
    """Ergun with M = 1 + 2 dp / (3 Dt (1-e)) - not in fluids 1.3.1."""
    M = 1.0 + 2.0 * dp / (3.0 * Dt * (1.0 - voidage))
    viscous = 150.0 * M**2 * mu * vs * (1.0 - voidage) ** 2 / (voidage**3 * dp**2)
    inertial = 1.75 * M * rho * vs**2 * (1.0 - voidage) / (voidage**3 * dp)
    return (viscous + inertial) * L


def pressure_drops(dp, voidage, vs, rho, mu, L, Dt):
    kw = dict(dp=dp, voidage=voidage, vs=vs, rho=rho, mu=mu, L=L)
    return {
        "Ergun": pb.Ergun(**kw),
        "Carman": pb.Carman(**kw),
        "KTA": pb.KTA(**kw),
        "Tallmadge": pb.Tallmadge(**kw),
        "Erdim_Akgiray_Demir": pb.Erdim_Akgiray_Demir(**kw),
        "Harrison_Brunner_Hecker": pb.Harrison_Brunner_Hecker(Dt=Dt, **kw),
        "Montillet_Akkari_Comiti": pb.Montillet_Akkari_Comiti(Dt=Dt, **kw),
        "Kozeny_Carman_hand": kozeny_carman(dp, voidage, vs, mu, L),
        "Mehta_Hawley_hand": mehta_hawley(dp, voidage, vs, rho, mu, L, Dt),
    }


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
    for (liquid, (rho, mu)), dp, voidage, Dt, vs in itertools.product(
        LIQUIDS.items(), LAB_DP, LAB_VOIDAGE, LAB_DT, LAB_VS
    ):
        point = dict(liquid=liquid, dp=dp, voidage=voidage, vs=vs, rho=rho, mu=mu, L=BED_LENGTH, Dt=Dt)
        point.update(pressure_drops(dp, voidage, vs, rho, mu, BED_LENGTH, Dt))
        points.append(point)
    rho, mu = LIQUIDS["water-like"]
    for dp, voidage, Dt, vs in HIGH_RE:
        point = dict(liquid="water-like", dp=dp, voidage=voidage, vs=vs, rho=rho, mu=mu, L=BED_LENGTH, Dt=Dt)
        point.update(pressure_drops(dp, voidage, vs, rho, mu, BED_LENGTH, Dt))
        points.append(point)

    # Sphericity enters as dp -> sphericity * dp (what dP_packed_bed does).
    sphericity_points = []
    for dp, phi, vs in itertools.product([20e-6, 100e-6], [0.6, 0.8], [1e-4, 1e-2]):
        value = pb.dP_packed_bed(
            dp=dp, voidage=0.42, vs=vs, rho=998.2, mu=1.002e-3, L=BED_LENGTH, sphericity=phi, Method="Ergun"
        )
        sphericity_points.append(
            dict(dp=dp, sphericity=phi, voidage=0.42, vs=vs, rho=998.2, mu=1.002e-3, L=BED_LENGTH, Ergun=value)
        )

    voidages = []
    for dp, Dt, phi in itertools.product([5e-6, 50e-6, 200e-6, 500e-6, 1e-3], [2e-3, 4.6e-3, 10e-3], [0.5, 0.7, 0.9]):
        voidages.append(
            dict(
                dp=dp,
                Dt=Dt,
                sphericity=phi,
                spheres=pb.voidage_Benyahia_Oneil_spherical(Dp=dp, Dt=Dt),
                cylinders=pb.voidage_Benyahia_Oneil_cylindrical(Dpe=dp, Dt=Dt, sphericity=phi),
                any_shape=pb.voidage_Benyahia_Oneil(Dpe=dp, Dt=Dt, sphericity=phi),
            )
        )

    data = {
        "generator": "tests/reference/packed_bed_fluids.py",
        "fluids_version": FLUIDS_VERSION,
        "python_version": platform.python_version(),
        "units": "SI: dp, Dt, L in m; vs in m/s; rho in kg/m3; mu in Pa s; pressure drops in Pa over L",
        "note": "Keys ending in _hand are written out in this script (not in fluids); the rest are fluids.packed_bed functions.",
        "pressure_drop": points,
        "pressure_drop_sphericity": sphericity_points,
        "voidage": voidages,
    }
    OUT.write_text(dumps_one_point_per_line(data))
    print(f"fluids {FLUIDS_VERSION} (Python {platform.python_version()})")
    print(f"wrote {len(points)} pressure-drop points, {len(sphericity_points)} sphericity points, "
          f"{len(voidages)} voidage points to {OUT}")


if __name__ == "__main__":
    main()
