//! Quantity types the gas bookkeeping needs and `units` does not have yet (molar flow, Henry's-law
//! solubility). Same pattern as `units`: SI inside, named constructors and accessors.

use serde::Serialize;

use crate::physics::units::si_quantity;

si_quantity!(
    /// An amount-of-substance flow, e.g. of gas from a mass-flow controller.
    MolarFlow, "mol/s"
);
si_quantity!(
    /// A Henry's-law solubility H^cp = c / p: dissolved concentration per partial pressure.
    HenrySolubility, "mol/(m³·Pa)"
);

impl MolarFlow {
    /// From millimoles per minute.
    pub fn from_mmol_per_min(v: f64) -> Self {
        Self(v * 1e-3 / 60.0)
    }
    /// In millimoles per minute.
    pub fn mmol_per_min(self) -> f64 {
        self.0 * 1e3 * 60.0
    }
}

impl HenrySolubility {
    /// From millimoles per litre per bar (mM/bar); 1 mM/bar = 1e-5 mol/(m³·Pa).
    pub fn from_mm_per_bar(v: f64) -> Self {
        Self(v * 1e-5)
    }
    /// In millimoles per litre per bar.
    pub fn mm_per_bar(self) -> f64 {
        self.0 * 1e5
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn conversions_round_trip() {
        assert!((MolarFlow::from_mmol_per_min(6.0).si() - 1e-4).abs() < 1e-18);
        assert!((MolarFlow::from_si(1e-4).mmol_per_min() - 6.0).abs() < 1e-12);
        assert!((HenrySolubility::from_mm_per_bar(1.3).si() - 1.3e-5).abs() < 1e-20);
        assert!((HenrySolubility::from_si(1.3e-5).mm_per_bar() - 1.3).abs() < 1e-12);
    }
}
