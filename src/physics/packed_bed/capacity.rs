//! Capacity of a bed of active solid (supported reagent, scavenger or catalyst): amount of active
//! groups, time until a consumed reagent is used up at the substrate feed, and the weight hourly
//! space velocity. Definitions, checked against hand calculations in the tests.

use super::quantities::{Amount, Mass, SpaceVelocity, SpecificAmount};
use crate::physics::report::ModelInfo;
use crate::physics::units::{Concentration, Density, Duration, VolumetricFlow};

/// Amount of active groups.
pub const ACTIVE_AMOUNT_INFO: ModelInfo =
    ModelInfo { name: "Active amount", formula: "n = m × loading", source: "definition", validity: &[] };
/// Time to consume the bed.
pub const CONSUMPTION_TIME_INFO: ModelInfo = ModelInfo {
    name: "Time to consume the bed",
    formula: "t = n / (Q c ν) (ν mol of active groups consumed per mol of substrate; full use of every group assumed — breakthrough comes earlier)",
    source: "definition",
    validity: &[],
};
/// Weight hourly space velocity.
pub const WHSV_INFO: ModelInfo = ModelInfo {
    name: "Weight hourly space velocity",
    formula: "WHSV = ρ Q / m (whole liquid feed per mass of solid; some authors use the substrate mass flow instead)",
    source: "definition",
    validity: &[],
};

/// n = m × loading.
pub fn active_amount(mass: Mass, loading: SpecificAmount) -> Amount {
    Amount::from_si(mass.si() * loading.si())
}

/// t = n / (Q c ν).
pub fn consumption_time(amount: Amount, flow: VolumetricFlow, concentration: Concentration, stoichiometry: f64) -> Duration {
    Duration::from_seconds(amount.si() / (flow.si() * concentration.si() * stoichiometry))
}

/// WHSV = ρ Q / m.
pub fn weight_hourly_space_velocity(flow: VolumetricFlow, density: Density, mass: Mass) -> SpaceVelocity {
    SpaceVelocity::from_si(density.si() * flow.si() / mass.si())
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn hand_calculation() {
        // 2 g at 1.5 mmol/g = 3 mmol. Feed 0.5 mL/min of 0.2 M substrate, 1.2 equiv consumed:
        // 0.5e-3 L/min × 0.2 mol/L × 1.2 = 1.2e-4 mol/min → 3e-3 / 1.2e-4 = 25 min.
        let n = active_amount(Mass::from_g(2.0), SpecificAmount::from_mmol_per_g(1.5));
        assert!((n.mmol() - 3.0).abs() < 1e-12);
        let t = consumption_time(n, VolumetricFlow::from_ml_per_min(0.5), Concentration::from_molar(0.2), 1.2);
        assert!((t.minutes() - 25.0).abs() < 1e-9);
        // 0.5 mL/min of 800 kg/m³ liquid = 24 g/h over 2 g → 12 h⁻¹.
        let w = weight_hourly_space_velocity(VolumetricFlow::from_ml_per_min(0.5), Density::from_si(800.0), Mass::from_g(2.0));
        assert!((w.per_hour() - 12.0).abs() < 1e-9);
    }
}
