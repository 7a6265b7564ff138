//! Quantity types segmented flow needs and `units` does not have yet (a volumetric mass-transfer
//! coefficient, a specific interfacial area). Same pattern as `units`: SI inside.

use serde::Serialize;

use crate::physics::units::si_quantity;

si_quantity!(
    /// A volumetric mass-transfer coefficient k_L a.
    MassTransferRate, "1/s"
);
si_quantity!(
    /// Interfacial area per unit volume of the two-phase mixture.
    SpecificArea, "m²/m³"
);
