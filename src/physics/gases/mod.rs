//! Gases for segmented flow — O₂, H₂, N₂, CO, CO₂ and air: molar mass, viscosity against
//! temperature, ideal-gas density with a compressibility caveat, solubility (Henry's law),
//! liquid-phase diffusivity (Wilke–Chang), hazards, and the bookkeeping of reference-state flows.

pub mod gas_data;
pub mod henry;
pub mod quantities;
pub mod reference_state;
pub mod sutherland;
pub mod tsonopoulos;
pub mod wilke_chang;

pub use quantities::{HenrySolubility, MolarFlow};
pub use reference_state::{ReferenceFlow, ReferenceState};

use serde::Serialize;

use self::gas_data::{AIR_OXYGEN_FRACTION, GASES, GasData};
use crate::physics::fluids::{Evaluated, Solvent};
use crate::physics::units::{Density, Diffusivity, DynamicViscosity, MolarMass, Pressure, Temperature, format_significant};

/// A built-in gas.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Gas {
    /// Oxygen.
    Oxygen,
    /// Hydrogen.
    Hydrogen,
    /// Nitrogen.
    Nitrogen,
    /// Carbon monoxide.
    CarbonMonoxide,
    /// Carbon dioxide.
    CarbonDioxide,
    /// Dry air (20.95 % O₂ in N₂).
    Air,
}

use crate::physics::fluids::models::range_warnings;

impl Gas {
    /// Every built-in gas, in table order.
    pub const ALL: [Gas; 6] = [Gas::Oxygen, Gas::Hydrogen, Gas::Nitrogen, Gas::CarbonMonoxide, Gas::CarbonDioxide, Gas::Air];

    /// The stored data.
    pub fn data(self) -> &'static GasData {
        // The table is in the order of the variants (a test checks each entry's name).
        &GASES[self as usize]
    }

    /// Name for people.
    pub fn name(self) -> &'static str {
        self.data().name
    }

    /// Molar mass.
    pub fn molar_mass(self) -> MolarMass {
        MolarMass::from_g_per_mol(self.data().molar_mass_g_per_mol)
    }

    /// The species that dissolves and reacts, and its mole fraction in this gas: O₂ at 20.95 %
    /// for air, the gas itself at 100 % otherwise.
    pub fn reactive_component(self) -> (Gas, f64) {
        match self {
            Gas::Air => (Gas::Oxygen, AIR_OXYGEN_FRACTION),
            g => (g, 1.0),
        }
    }

    /// Dynamic viscosity at `t` (Sutherland fit), with a warning outside 0–200 °C.
    pub fn viscosity(self, t: Temperature) -> Evaluated<DynamicViscosity> {
        Evaluated { value: self.data().viscosity.viscosity(t), warnings: range_warnings(&sutherland::INFO, t) }
    }

    /// Ideal-gas density at absolute pressure `p` and temperature `t`.
    pub fn ideal_density(self, t: Temperature, p: Pressure) -> Density {
        reference_state::ideal_gas_density(self.molar_mass(), t, p)
    }

    /// Second virial coefficient B, m³/mol (Tsonopoulos).
    pub fn second_virial(self, t: Temperature) -> f64 {
        tsonopoulos::second_virial(&self.data().critical, t)
    }

    /// Compressibility factor Z by the truncated virial equation (Tsonopoulos).
    pub fn compressibility(self, t: Temperature, p: Pressure) -> f64 {
        tsonopoulos::compressibility(&self.data().critical, t, p)
    }

    /// A sentence when the ideal-gas law used for flows and densities is off by more than 2 %
    /// (common practice, no source) at `t` and `p`; CO₂ reaches this near 4 bar at 25 °C.
    pub fn compressibility_caveat(self, t: Temperature, p: Pressure) -> Option<String> {
        let z = self.compressibility(t, p);
        ((z - 1.0).abs() > tsonopoulos::IDEAL_GAS_TOLERANCE).then(|| {
            format!(
                "{} at {} bar(a) and {} °C has Z ≈ {} (Tsonopoulos second virial coefficient): the ideal-gas flows and densities here are {:.0} % off; the real gas occupies {} the volume shown.",
                self.name(),
                format_significant(p.bar(), 3),
                format_significant(t.celsius(), 3),
                format_significant(z, 3),
                (z - 1.0).abs() * 100.0,
                if z < 1.0 { "less than" } else { "more than" }
            )
        })
    }

    /// Henry's-law solubility in water at `t` (Sander 2023, van't Hoff), with a warning outside
    /// 0–40 °C; `None` for air (use its oxygen through [`Gas::reactive_component`]).
    pub fn henry_water(self, t: Temperature) -> Option<Evaluated<HenrySolubility>> {
        self.data().henry_water.map(|v| Evaluated { value: v.at(t), warnings: range_warnings(&henry::WATER_INFO, t) })
    }

    /// Order-of-magnitude solubility range in common organic solvents at 25 °C, if known.
    pub fn henry_organic(self) -> Option<henry::OrganicRange> {
        self.data().henry_organic
    }

    /// Liquid-phase diffusivity of this gas in `solvent` at `t` by Wilke–Chang, with the
    /// solvent-viscosity range warnings; an estimate, ±30 %.
    pub fn diffusivity_in(self, solvent: Solvent, t: Temperature) -> Result<Evaluated<Diffusivity>, crate::physics::fluids::PropertyError> {
        let mu = solvent.viscosity(t)?;
        Ok(Evaluated {
            value: wilke_chang::diffusivity(
                wilke_chang::association_factor(solvent),
                solvent.molar_mass(),
                t,
                mu.value,
                self.data().boiling_volume_cm3_per_mol,
            ),
            warnings: mu.warnings,
        })
    }

    /// Whether the gas feeds oxygen (an oxidiser with flammable solvents).
    pub fn is_oxidising(self) -> bool {
        matches!(self, Gas::Oxygen | Gas::Air)
    }

    /// Flammable limits in air, volume fractions (from memory: `practice.md` §4.2).
    pub fn flammable_limits(self) -> Option<(f64, f64)> {
        match self {
            Gas::Hydrogen => Some((0.04, 0.75)),
            Gas::CarbonMonoxide => Some((0.125, 0.74)),
            _ => None,
        }
    }

    /// Whether the gas is acutely toxic at lab concentrations.
    pub fn is_toxic(self) -> bool {
        self == Gas::CarbonMonoxide
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn table_order_matches_variants() {
        let names = ["oxygen", "hydrogen", "nitrogen", "carbon monoxide", "carbon dioxide", "air"];
        for (g, n) in Gas::ALL.iter().zip(names) {
            assert_eq!(g.name(), n);
        }
    }

    #[test]
    fn air_dissolves_as_its_oxygen() {
        assert_eq!(Gas::Air.reactive_component(), (Gas::Oxygen, AIR_OXYGEN_FRACTION));
        assert_eq!(Gas::Hydrogen.reactive_component(), (Gas::Hydrogen, 1.0));
        assert!(Gas::Air.henry_water(Temperature::from_celsius(25.0)).is_none());
    }

    #[test]
    fn hazards_as_documented() {
        assert!(Gas::Oxygen.is_oxidising() && Gas::Air.is_oxidising() && !Gas::Nitrogen.is_oxidising());
        assert_eq!(Gas::Hydrogen.flammable_limits(), Some((0.04, 0.75)));
        assert!(Gas::CarbonMonoxide.is_toxic() && Gas::CarbonMonoxide.flammable_limits().is_some());
        assert!(Gas::CarbonDioxide.flammable_limits().is_none());
    }
}
