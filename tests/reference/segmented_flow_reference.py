#!/usr/bin/env python3
"""Reference values for Clearbore's gas data and segmented-flow groups, computed with the
general-purpose Python libraries `fluids`, `thermo` and `chemicals` (Caleb Bell et al., ChEDL).

Run by hand (not in CI):  python -m venv venv && venv/bin/pip install fluids thermo chemicals
                          venv/bin/python tests/reference/segmented_flow_reference.py
It prints the library versions and writes tests/reference/segmented_flow_reference.json, which
tests/gases.rs and tests/segmented_flow.rs read with include_str!.

What it holds:
* molar mass, critical constants and acentric factor of O2, H2, N2, CO, CO2 (chemicals);
* gas viscosity from thermo's highest-ranked method over 0-200 C, and a Sutherland fit to it
  (mu = mu_ref (T/273.15)^1.5 (273.15 + S)/(T + S)) whose two coefficients are pasted into
  src/physics/gases/gas_data.rs; air is N2/O2/Ar 0.7812/0.2096/0.0092 by thermo's mixture rule;
* second virial coefficients by Tsonopoulos (chemicals.virial) and compressibility factors by the
  Peng-Robinson equation (thermo.eos) and, for air, Lemmon et al. (2000) (chemicals.air), used to
  check the ideal-gas caveat;
* ideal-gas densities and dimensionless groups from fluids.core (Capillary, Reynolds, Weber,
  Bond, Confinement);
* Henry's-law constants of O2 and N2 in water by the IAPWS guideline of Fernandez-Prini, Alvarez
  & Harvey (2003), coefficients as coded in chemicals.air.iapws04_Henry_air (chemicals 1.5.2),
  to measure how far the one-term van't Hoff form drifts over 20-80 C;
* Wilke-Chang diffusivities written out below from the formula (marked "hand": chemicals 1.5.2
  has no Wilke-Chang function), an independent rewrite, not a library value.
"""

import json
import math
import platform
from importlib.metadata import version
from pathlib import Path

import numpy as np
from scipy.optimize import least_squares

import fluids.core as fc
from fluids.constants import R
from chemicals import MW, Pc, Tc, omega
from chemicals.air import lemmon2000_air_MW, lemmon2000_rho
from chemicals.iapws import iapws92_Psat, iapws95_Tc
from chemicals.virial import BVirial_Tsonopoulos
from thermo import Mixture, ViscosityGas
from thermo.eos import PR

OUT = Path(__file__).with_name("segmented_flow_reference.json")
VERSIONS = {name: version(name) for name in ("fluids", "thermo", "chemicals", "numpy", "scipy")}

GASES = {
    "oxygen": "7782-44-7",
    "hydrogen": "1333-74-0",
    "nitrogen": "7727-37-9",
    "carbon_monoxide": "630-08-0",
    "carbon_dioxide": "124-38-9",
}
AIR = {"nitrogen": 0.7812, "oxygen": 0.2096, "argon": 0.0092}
T_REF = 273.15
T_GRID = [273.15 + t for t in range(0, 201, 10)]
P_GRID = [1e5, 5e5, 10e5, 20e5]


def sutherland(T, mu_ref, S):
    return mu_ref * (T / T_REF) ** 1.5 * (T_REF + S) / (T + S)


def fit_sutherland(Ts, mus):
    """Least squares in relative error; returns mu_ref, S and the largest relative error."""
    Ts, mus = np.array(Ts), np.array(mus)
    res = least_squares(lambda p: sutherland(Ts, p[0], p[1]) / mus - 1.0, x0=[mus[0], 100.0])
    mu_ref, S = res.x
    return float(mu_ref), float(S), float(np.max(np.abs(sutherland(Ts, mu_ref, S) / mus - 1.0)))


def viscosities(cas):
    vg = ViscosityGas(CASRN=cas)
    return vg.method, [vg.T_dependent_property(T) for T in T_GRID]


def air_viscosities():
    mus = []
    method = None
    for T in T_GRID:
        m = Mixture(list(AIR), zs=list(AIR.values()), T=T, P=1e5)
        mus.append(m.mug)
        method = m.ViscosityGasMixture.method
    return method, mus


def gas_entries():
    gases = {}
    for name, cas in GASES.items():
        method, mus = viscosities(cas)
        mu_ref, S, err = fit_sutherland(T_GRID, mus)
        tc, pc, w = Tc(cas), Pc(cas), omega(cas)
        gases[name] = {
            "cas": cas,
            "molar_mass_g_per_mol": MW(cas),
            "Tc": tc,
            "Pc": pc,
            "omega": w,
            "viscosity_method": method,
            "viscosity": [{"T": T, "mu": mu} for T, mu in zip(T_GRID, mus)],
            "sutherland": {"mu_ref": mu_ref, "S": S, "max_rel_error": err},
            "B_tsonopoulos": [{"T": T, "B": BVirial_Tsonopoulos(T, tc, pc, w)} for T in (273.15, 298.15, 353.15, 423.15)],
            "Z_peng_robinson_25C": [
                {"P": P, "Z": PR(Tc=tc, Pc=pc, omega=w, T=298.15, P=P).Z_g} for P in P_GRID
            ],
        }
    method, mus = air_viscosities()
    mu_ref, S, err = fit_sutherland(T_GRID, mus)
    gases["air"] = {
        "composition": AIR,
        "molar_mass_g_per_mol": lemmon2000_air_MW,
        "viscosity_method": f"thermo Mixture of {', '.join(AIR)}: {method}",
        "viscosity": [{"T": T, "mu": mu} for T, mu in zip(T_GRID, mus)],
        "sutherland": {"mu_ref": mu_ref, "S": S, "max_rel_error": err},
        # Lemmon, Jacobsen, Penoncello & Friend (2000) air equation of state, as in chemicals.air.
        "Z_lemmon2000_25C": [
            {"P": P, "Z": P / (lemmon2000_rho(298.15, P) * R * 298.15)} for P in P_GRID
        ],
    }
    return gases


def ideal_gas_densities():
    rows = []
    for name, cas in GASES.items():
        for T, P in ((298.15, 1e5), (353.15, 10e5)):
            # thermo's Chemical(...).rhog is ideal-gas by default; written out here to be explicit.
            rows.append({"gas": name, "T": T, "P": P, "rho": P * MW(cas) * 1e-3 / (R * T)})
    return rows


def henry_iapws04(T, A, B, C):
    """Fernandez-Prini et al. (2003): ln(kH/p1*) = A/Tr + B tau^0.355/Tr + C Tr^-0.41 exp(tau);
    kH in Pa (mole-fraction basis), p1* water vapour pressure (IAPWS-92 as in chemicals)."""
    Tr = T / iapws95_Tc
    tau = 1.0 - Tr
    return iapws92_Psat(T) * math.exp(A / Tr + B * tau**0.355 / Tr + C * Tr**-0.41 * math.exp(tau))


# Coefficients as coded in chemicals.air.iapws04_Henry_air (chemicals 1.5.2).
IAPWS04 = {"oxygen": (-9.44833, 4.43822, 11.42005), "nitrogen": (-9.67578, 4.72162, 11.70585)}
WATER_MOLAR_CONC_25C = 997.05 / 18.01528e-3  # mol/m3, water at 25 C (IAPWS-95 density, from memory)


def henry_rows():
    rows = []
    for name, (A, B, C) in IAPWS04.items():
        for t in (20.0, 25.0, 40.0, 60.0, 80.0):
            T = 273.15 + t
            kH = henry_iapws04(T, A, B, C)
            # x = p/kH; dilute: c = x * c_water. Water's molar concentration changes 3 % over
            # 20-80 C; using 25 C for all keeps the comparison one of temperature dependence.
            rows.append({"gas": name, "T": T, "kH_Pa": kH, "Hcp_mol_m3_Pa_approx": WATER_MOLAR_CONC_25C / kH})
    return rows


def groups():
    rows = []
    for rho_l, rho_g, mu, sigma, D, U in (
        (998.2, 1.2, 1.0e-3, 0.0728, 1.0e-3, 0.05),
        (786.0, 11.5, 0.34e-3, 0.0288, 0.8e-3, 0.2),
        (866.9, 14.0, 0.59e-3, 0.0285, 2.0e-3, 0.01),
    ):
        rows.append({
            "rho_l": rho_l, "rho_g": rho_g, "mu": mu, "sigma": sigma, "D": D, "U": U,
            "Capillary": fc.Capillary(V=U, mu=mu, sigma=sigma),
            "Reynolds": fc.Reynolds(V=U, D=D, rho=rho_l, mu=mu),
            "Weber": fc.Weber(V=U, L=D, rho=rho_l, sigma=sigma),
            "Bond": fc.Bond(rhol=rho_l, rhog=rho_g, sigma=sigma, L=D),
            "Confinement": fc.Confinement(D=D, rhol=rho_l, rhog=rho_g, sigma=sigma),
        })
    return rows


WILKE_CHANG_VB = {"hydrogen": 14.3, "oxygen": 25.6, "nitrogen": 31.2, "carbon_monoxide": 30.7, "carbon_dioxide": 34.0}


def wilke_chang_hand(T, M_solvent, mu_solvent, phi, Vb_cm3):
    """D [m2/s] = 1e-4 * 7.4e-8 (phi M)^0.5 T / (mu[cP] Vb^0.6)."""
    return 1e-4 * 7.4e-8 * math.sqrt(phi * M_solvent) * T / (mu_solvent * 1e3 * Vb_cm3**0.6)


def wilke_chang_rows():
    rows = []
    for solvent, M, mu, phi in (("water", 18.01528, 0.890e-3, 2.6), ("methanol", 32.04186, 0.544e-3, 1.9), ("toluene", 92.13842, 0.552e-3, 1.0)):
        for gas, vb in WILKE_CHANG_VB.items():
            rows.append({"solvent": solvent, "gas": gas, "T": 298.15, "M": M, "mu": mu, "phi": phi, "Vb_cm3": vb,
                         "D_hand": wilke_chang_hand(298.15, M, mu, phi, vb)})
    return rows


def dumps(data):
    """JSON with one record per line: compact, yet readable in a diff."""
    def block(v, indent):
        pad = " " * indent
        if isinstance(v, dict) and any(isinstance(x, (dict, list)) for x in v.values()):
            inner = ",\n".join(f'{pad} {json.dumps(k)}: {block(x, indent + 1)}' for k, x in v.items())
            return "{\n" + inner + "\n" + pad + "}"
        if isinstance(v, list) and v and isinstance(v[0], dict):
            inner = ",\n".join(pad + "  " + json.dumps(x, separators=(",", ":")) for x in v)
            return "[\n" + inner + "\n" + pad + " ]"
        return json.dumps(v, separators=(",", ":"))
    return block(data, 0) + "\n"


def main():
    data = {
        "generator": "tests/reference/segmented_flow_reference.py",
        "versions": VERSIONS,
        "python_version": platform.python_version(),
        "units": "SI: T in K, P in Pa, mu in Pa s, rho in kg/m3, sigma in N/m, D in m, U in m/s, B in m3/mol, D_hand in m2/s",
        "R": R,
        "gases": gas_entries(),
        "ideal_gas_density": ideal_gas_densities(),
        "henry_iapws04": henry_rows(),
        "groups": groups(),
        "wilke_chang": wilke_chang_rows(),
    }
    OUT.write_text(dumps(data), encoding="utf-8")
    for k, v in VERSIONS.items():
        print(f"{k} {v}")
    for name, g in data["gases"].items():
        s = g["sutherland"]
        print(f"{name}: Sutherland mu_ref = {s['mu_ref']!r} Pa s, S = {s['S']!r} K, max error {100 * s['max_rel_error']:.3f} % ({g['viscosity_method']})")
    print(f"wrote {OUT}")


if __name__ == "__main__":
    main()
