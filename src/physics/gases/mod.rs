//! Gases for segmented flow — O₂, H₂, N₂, CO, CO₂ and air: molar mass, viscosity against
//! temperature, ideal-gas density with a compressibility caveat, solubility (Henry's law),
//! liquid-phase diffusivity (Wilke–Chang), hazards, and the bookkeeping of reference-state flows.

pub mod gas_data;
pub mod henry;
pub mod iapws_henry;
pub mod measured_diffusivity;
pub mod oxygen_solvents;
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

/// A diffusivity with the model it comes from and the label that says how sure it is.
#[derive(Debug, Clone, PartialEq)]
pub struct DiffusivityEstimate {
    /// The value and any range warnings.
    pub value: Evaluated<Diffusivity>,
    /// Measured table or correlation.
    pub model: crate::physics::report::ModelInfo,
    /// Label for the figure, with the uncertainty.
    pub label: &'static str,
}

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

    /// The species that dissolves and reacts in a feed of this gas at mole fraction `y` (the rest
    /// nitrogen), and its mole fraction: air's own oxygen for air, `y` of the gas otherwise.
    pub fn reactive_in_feed(self, y: f64) -> (Gas, f64) {
        match self {
            Gas::Air => self.reactive_component(),
            g => (g, y),
        }
    }

    /// Molar mass and viscosity of a feed of this gas at mole fraction `y`, the rest nitrogen, at
    /// `t`: the gas's own for air and a pure gas; for a mixture with nitrogen, mole-fraction
    /// averages (a simple rule; both enter only weakly, through the gas density and the gas's own
    /// Reynolds number), with the gas's viscosity range warnings.
    pub fn feed_properties(self, y: f64, t: Temperature) -> (MolarMass, DynamicViscosity, Vec<crate::physics::report::RangeWarning>) {
        let own = self.viscosity(t);
        if self == Gas::Air || y >= 1.0 {
            return (self.molar_mass(), own.value, own.warnings);
        }
        let n2 = Gas::Nitrogen;
        let m = MolarMass::from_si(y * self.molar_mass().si() + (1.0 - y) * n2.molar_mass().si());
        let mu = DynamicViscosity::from_si(y * own.value.si() + (1.0 - y) * n2.viscosity(t).value.si());
        (m, mu, own.warnings)
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
    /// (common practice, no source) at `t` and `p`, or when `p` is above the 20 bar the
    /// compressibility estimate is used for (then Z itself is uncertain); CO₂ reaches the 2 %
    /// near 4 bar at 25 °C.
    pub fn compressibility_caveat(self, t: Temperature, p: Pressure) -> Option<String> {
        let z = self.compressibility(t, p);
        let beyond = !tsonopoulos::range_warnings(p).is_empty();
        ((z - 1.0).abs() > tsonopoulos::IDEAL_GAS_TOLERANCE || beyond).then(|| {
            let mut s = format!(
                "{} at {} bar(a) and {} °C has Z ≈ {} (Tsonopoulos second virial coefficient): the ideal-gas flows and densities here are {:.0} % off; the real gas occupies {} the volume shown.",
                self.name(),
                format_significant(p.bar(), 3),
                format_significant(t.celsius(), 3),
                format_significant(z, 3),
                (z - 1.0).abs() * 100.0,
                if z < 1.0 { "less than" } else { "more than" }
            );
            if beyond {
                s.push_str(" Above 20 bar the truncated virial form is outside the range it is used for here (Tsonopoulos 1974; CO₂ at 50 bar and 25 °C comes out about 11 % high), so Z itself is uncertain: use a real-gas equation of state for this pressure.");
            }
            s
        })
    }

    /// Henry's-law solubility in water at `t` (IAPWS G7-04), with a warning outside the
    /// guideline's fitted range for this gas; `None` for air (use its oxygen through
    /// [`Gas::reactive_component`]).
    pub fn henry_water(self, t: Temperature) -> Option<Evaluated<HenrySolubility>> {
        self.data().henry_water.map(|g| {
            let (value, warnings) = g.solubility(t);
            Evaluated { value, warnings }
        })
    }

    /// Order-of-magnitude solubility range in common organic solvents at 25 °C, if known.
    pub fn henry_organic(self) -> Option<henry::OrganicRange> {
        self.data().henry_organic
    }

    /// Every value known for this gas's solubility in `solvent` at `t`, recommended first: water by
    /// the IAPWS guideline; O₂ in an organic solvent by that solvent's own value (measured or from
    /// memory, as marked); other gases in organic solvents by an order-of-magnitude range. `None`
    /// for air (use its oxygen through [`Gas::reactive_component`]).
    pub fn solubility_in(self, solvent: Solvent, t: Temperature) -> Option<henry::Solubility> {
        if solvent == Solvent::Water {
            let h = self.henry_water(t)?;
            let estimate = henry::SolubilityEstimate { value: h.value, model: henry::WATER_INFO, recommended: true, warnings: h.warnings };
            return Some(henry::Solubility { estimates: vec![estimate], recommendation: "" });
        }
        match self {
            Gas::Oxygen => oxygen_solvents::solubility(solvent, t),
            _ => self.henry_organic().map(|r| henry::range_solubility(&r, t)),
        }
    }

    /// Liquid-phase diffusivity of this gas in `solvent` at `t`: by Wilke–Chang, with the
    /// solvent-viscosity range warnings (an estimate; see [`Gas::diffusivity`] for measured
    /// values where tabulated).
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

    /// Liquid-phase diffusivity of this gas in `solvent` at `t`, with its model: the measured value
    /// where tabulated (H₂ and CO₂ in water), the Wilke–Chang estimate otherwise.
    pub fn diffusivity(self, solvent: Solvent, t: Temperature) -> Result<DiffusivityEstimate, crate::physics::fluids::PropertyError> {
        if solvent == Solvent::Water {
            let mobility = |tk: f64| {
                let t = Temperature::from_kelvin(tk);
                solvent.viscosity(t).ok().map(|mu| tk / mu.value.si())
            };
            if let Some((d, mut warnings)) = measured_diffusivity::in_water(self, t, mobility) {
                if !warnings.is_empty() {
                    warnings.extend(solvent.viscosity(t)?.warnings);
                }
                return Ok(DiffusivityEstimate {
                    value: Evaluated { value: Diffusivity::from_si(d), warnings },
                    model: measured_diffusivity::INFO,
                    label: "Gas diffusivity in the liquid (measured)",
                });
            }
        }
        Ok(DiffusivityEstimate { value: self.diffusivity_in(solvent, t)?, model: wilke_chang::INFO, label: wilke_chang::LABEL })
    }

    /// Whether the gas feeds oxygen (an oxidiser with flammable solvents).
    pub fn is_oxidising(self) -> bool {
        matches!(self, Gas::Oxygen | Gas::Air)
    }

    /// Flammable limits in air, volume fractions (from memory).
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
