//! Quantity types the packed-bed calculator needs and `units` does not have yet (mass, amount of
//! substance, loading, space velocity). Same pattern as `units`: SI inside, named accessors.

use serde::Serialize;

use crate::physics::units::si_quantity;

si_quantity!(
    /// A mass, e.g. of solid packed in a cartridge.
    Mass, "kg"
);
si_quantity!(
    /// An amount of substance.
    Amount, "mol"
);
si_quantity!(
    /// Amount of active groups per mass of solid (a loading).
    SpecificAmount, "mol/kg"
);
si_quantity!(
    /// A space velocity: feed mass flow per mass of solid.
    SpaceVelocity, "1/s"
);

impl Mass {
    /// From grams.
    pub fn from_g(g: f64) -> Self {
        Self(g * 1e-3)
    }
    /// In grams.
    pub fn grams(self) -> f64 {
        self.0 * 1e3
    }
}

impl Amount {
    /// In millimoles.
    pub fn mmol(self) -> f64 {
        self.0 * 1e3
    }
}

impl SpecificAmount {
    /// From mmol/g (numerically equal to mol/kg).
    pub const fn from_mmol_per_g(v: f64) -> Self {
        Self(v)
    }
    /// In mmol/g.
    pub const fn mmol_per_g(self) -> f64 {
        self.0
    }
}

impl SpaceVelocity {
    /// In h⁻¹ (the unit WHSV is usually quoted in).
    pub fn per_hour(self) -> f64 {
        self.0 * 3600.0
    }
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn conversions_round_trip() {
        assert!((Mass::from_g(2.5).si() - 2.5e-3).abs() < 1e-18);
        assert!((Mass::from_g(2.5).grams() - 2.5).abs() < 1e-12);
        assert!((Amount::from_si(0.0025).mmol() - 2.5).abs() < 1e-12);
        assert_eq!(SpecificAmount::from_mmol_per_g(1.2).si(), 1.2);
        assert!((SpaceVelocity::from_si(1.0 / 3600.0).per_hour() - 1.0).abs() < 1e-12);
    }
}
