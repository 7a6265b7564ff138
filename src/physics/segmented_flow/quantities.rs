//! Quantity types segmented flow needs and `units` does not have yet (a volumetric mass-transfer
//! coefficient, a specific interfacial area). Same pattern as `units`: SI inside.

use serde::Serialize;

macro_rules! local_quantity {
    ($(#[$doc:meta])* $name:ident, $si:literal) => {
        $(#[$doc])*
        #[derive(Debug, Clone, Copy, PartialEq, PartialOrd, Serialize)]
        #[serde(transparent)]
        pub struct $name(f64);

        impl $name {
            #[doc = concat!("From a value in ", $si, " (SI).")]
            pub const fn from_si(value: f64) -> Self {
                Self(value)
            }
            #[doc = concat!("The value in ", $si, " (SI).")]
            pub const fn si(self) -> f64 {
                self.0
            }
        }
    };
}

local_quantity!(
    /// A volumetric mass-transfer coefficient k_L a.
    MassTransferRate, "1/s"
);
local_quantity!(
    /// Interfacial area per unit volume of the two-phase mixture.
    SpecificArea, "m²/m³"
);
