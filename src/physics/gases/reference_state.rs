//! Gas bookkeeping with the ideal-gas law: the reference state of a mass-flow controller's
//! reading, the molar flow it stands for, the actual volumetric flow at the line's absolute
//! pressure and temperature, the gas density, and gas equivalents per mole of substrate.
//!
//! Formulas (ideal gas, Z = 1 at the reference state and in the line):
//! ṅ = Q_ref P_ref / (R T_ref); Q(T, P) = ṅ R T / P, so Q = Q_ref (P_ref / P)(T / T_ref);
//! ρ_G = P M / (R T); equivalents = ṅ_gas / (c_substrate Q_L). P is absolute pressure (Pa),
//! T in K, Q in m³/s, ṅ in mol/s, M in kg/mol, R = 8.314 462 618 153 24 J mol⁻¹ K⁻¹ (N_A k, exact
//! since the 2019 SI redefinition; CODATA 2018).
//!
//! Reference states differ between instruments and regions (mass-flow-controller makers'
//! application notes): "normal" (mLn/min, DIN 1343) is 0 °C and 101.325 kPa;
//! European "standard" (mLs/min) is 20 °C and 101.325 kPa; 25 °C and 100 kPa is SATP. Between
//! them the same reading means up to 9.6 % different moles, so the state is always explicit.
//!
//! Example (hand arithmetic, derived): 10 mLn/min of N₂ is
//! 10e-6/60 × 101325 / (8.314462618 × 273.15) = 7.436e-6 mol/s, and at 25 °C and 1 atm it
//! occupies 10.915 mL/min.
//!
//! ```
//! use clearbore::physics::gases::reference_state::{ReferenceFlow, ReferenceState};
//! use clearbore::physics::units::{Temperature, VolumetricFlow, STANDARD_ATMOSPHERE};
//! let feed = ReferenceFlow { flow: VolumetricFlow::from_ml_per_min(10.0), state: ReferenceState::Normal };
//! let n = feed.molar_flow();
//! assert!((n.si() - 7.436e-6).abs() < 0.0005e-6);
//! let q = n.actual_flow(Temperature::from_celsius(25.0), STANDARD_ATMOSPHERE);
//! assert!((q.ml_per_min() - 10.915).abs() < 0.0005);
//! ```

use serde::Serialize;

use super::quantities::MolarFlow;
use crate::physics::report::ModelInfo;
use crate::physics::units::{
    Concentration, Density, MolarMass, Pressure, STANDARD_ATMOSPHERE, Temperature, VolumetricFlow,
};

/// Molar gas constant R = N_A k, J/(mol·K) (exact since the 2019 SI; CODATA 2018).
pub const GAS_CONSTANT: f64 = 8.314_462_618_153_24;

/// The state a gas-flow reading refers to.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "state", rename_all = "snake_case")]
pub enum ReferenceState {
    /// "Normal", 0 °C and 101.325 kPa (DIN 1343; mLn/min, and most US "sccm").
    Normal,
    /// European "standard", 20 °C and 101.325 kPa (mLs/min).
    Standard20C,
    /// SATP, 25 °C and 100 kPa.
    Satp,
    /// Another state, as the instrument's manual gives it.
    UserDefined {
        /// Reference temperature.
        temperature: Temperature,
        /// Reference pressure (absolute).
        pressure: Pressure,
    },
}

impl ReferenceState {
    /// The built-in states, in the order offered.
    pub const BUILT_IN: [ReferenceState; 3] = [ReferenceState::Normal, ReferenceState::Standard20C, ReferenceState::Satp];

    /// Reference temperature.
    pub fn temperature(self) -> Temperature {
        match self {
            ReferenceState::Normal => Temperature::from_celsius(0.0),
            ReferenceState::Standard20C => Temperature::from_celsius(20.0),
            ReferenceState::Satp => Temperature::from_celsius(25.0),
            ReferenceState::UserDefined { temperature, .. } => temperature,
        }
    }

    /// Reference pressure (absolute).
    pub fn pressure(self) -> Pressure {
        match self {
            ReferenceState::Normal | ReferenceState::Standard20C => STANDARD_ATMOSPHERE,
            ReferenceState::Satp => Pressure::from_bar(1.0),
            ReferenceState::UserDefined { pressure, .. } => pressure,
        }
    }

    /// Name for people.
    pub fn describe(self) -> String {
        match self {
            ReferenceState::Normal => "0 °C, 101.325 kPa (normal)".to_owned(),
            ReferenceState::Standard20C => "20 °C, 101.325 kPa (standard)".to_owned(),
            ReferenceState::Satp => "25 °C, 100 kPa (SATP)".to_owned(),
            ReferenceState::UserDefined { temperature, pressure } => {
                format!("{:.2} °C, {:.3} kPa (user-defined)", temperature.celsius(), pressure.pascals() / 1e3)
            }
        }
    }

    /// Moles per cubic metre of ideal gas at this state, P / (R T).
    pub fn molar_density(self) -> f64 {
        self.pressure().pascals() / (GAS_CONSTANT * self.temperature().kelvin())
    }
}

/// A gas-flow reading together with the reference state it refers to.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct ReferenceFlow {
    /// Volumetric flow at the reference state.
    pub flow: VolumetricFlow,
    /// The reference state.
    pub state: ReferenceState,
}

impl ReferenceFlow {
    /// ṅ = Q_ref P_ref / (R T_ref).
    pub fn molar_flow(&self) -> MolarFlow {
        MolarFlow::from_si(self.flow.si() * self.state.molar_density())
    }
}

impl MolarFlow {
    /// Actual volumetric flow of ideal gas at absolute pressure `p` and temperature `t`.
    pub fn actual_flow(self, t: Temperature, p: Pressure) -> VolumetricFlow {
        VolumetricFlow::from_si(self.si() * GAS_CONSTANT * t.kelvin() / p.pascals())
    }

    /// Moles of this gas per mole of substrate fed at `concentration` in liquid flow `liquid`.
    pub fn equivalents(self, concentration: Concentration, liquid: VolumetricFlow) -> f64 {
        self.si() / (concentration.si() * liquid.si())
    }
}

/// Ideal-gas density ρ = P M / (R T).
pub fn ideal_gas_density(molar_mass: MolarMass, t: Temperature, p: Pressure) -> Density {
    Density::from_si(p.pascals() * molar_mass.si() / (GAS_CONSTANT * t.kelvin()))
}

/// Metadata of the reference-state conversion.
pub const MOLAR_FLOW_INFO: ModelInfo = ModelInfo {
    name: "Ideal gas at the reference state",
    formula: "ṅ = Q_ref P_ref / (R T_ref)",
    source: "definition (ideal-gas law; reference states as in DIN 1343 and mass-flow-controller makers' notes)",
    validity: &[],
};

/// Metadata of the actual gas flow.
pub const ACTUAL_FLOW_INFO: ModelInfo = ModelInfo {
    name: "Ideal gas in the line",
    formula: "Q = ṅ R T / P (P absolute)",
    source: "definition (ideal-gas law, Z = 1; see the compressibility check)",
    validity: &[],
};

/// Metadata of the ideal-gas density.
pub const DENSITY_INFO: ModelInfo = ModelInfo {
    name: "Ideal-gas density",
    formula: "ρ_G = P M / (R T)",
    source: "definition (ideal-gas law, Z = 1)",
    validity: &[],
};

/// Metadata of gas equivalents.
pub const EQUIVALENTS_INFO: ModelInfo = ModelInfo {
    name: "Gas equivalents",
    formula: "eq = ṅ_gas / (c_substrate Q_L)",
    source: "definition",
    validity: &[],
};

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn reference_states_differ_as_tabulated() {
        // Derived (ideal gas, by hand): µmol per cm³ 44.615 (0 °C, 1 atm), 41.571 (20 °C, 1 atm),
        // 40.340 (25 °C, 100 kPa), printed to 5 digits.
        let per_cm3 = |s: ReferenceState| s.molar_density() * 1e-6 * 1e6;
        assert!((per_cm3(ReferenceState::Normal) - 44.615).abs() < 0.0005);
        assert!((per_cm3(ReferenceState::Standard20C) - 41.571).abs() < 0.0005);
        assert!((per_cm3(ReferenceState::Satp) - 40.340).abs() < 0.0005);
    }

    #[test]
    fn user_defined_state_equal_to_normal_gives_the_same_moles() {
        let user = ReferenceState::UserDefined { temperature: Temperature::from_celsius(0.0), pressure: STANDARD_ATMOSPHERE };
        assert_eq!(user.molar_density(), ReferenceState::Normal.molar_density());
    }

    #[test]
    fn actual_flow_at_the_reference_state_round_trips() {
        for state in ReferenceState::BUILT_IN {
            let feed = ReferenceFlow { flow: VolumetricFlow::from_ml_per_min(7.0), state };
            let back = feed.molar_flow().actual_flow(state.temperature(), state.pressure());
            assert!((back.ml_per_min() / 7.0 - 1.0).abs() < 1e-14);
        }
    }

    #[test]
    fn equivalents_by_hand() {
        // 1 mmol/min gas against 0.5 mol/L × 1 mL/min = 0.5 mmol/min substrate: 2 equivalents.
        let n = MolarFlow::from_mmol_per_min(1.0);
        let eq = n.equivalents(Concentration::from_molar(0.5), VolumetricFlow::from_ml_per_min(1.0));
        assert!((eq - 2.0).abs() < 1e-12);
    }
}
