//! Why a gas–liquid cartridge calculation could not give a number: reported as such, never as NaN.

use serde::Serialize;

use crate::physics::fluids::PropertyError;
use crate::physics::numeric::RootError;
use crate::physics::ode::OdeError;
use crate::physics::report::NumericalError;

/// A numerical failure in the gas–liquid cartridge physics.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum GasLiquidBedError {
    /// A result was not a finite number.
    Numerical(NumericalError),
    /// The pressure profile through the bed could not be integrated.
    Profile(OdeError),
    /// A root (the coupled holdup, a remedy) could not be found.
    Root(RootError),
    /// A solvent property had no physical value at this temperature.
    Property(PropertyError),
}

impl std::fmt::Display for GasLiquidBedError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            GasLiquidBedError::Numerical(e) => e.fmt(f),
            // As for the coil: the drop approaches the pressure and the gas would expand without
            // bound; said in the user's terms, the solver detail left out.
            GasLiquidBedError::Profile(_) => f.write_str(
                "The pressure through the bed cannot be followed for these entries: the bed's pressure drop comes close to \
                 the pressure itself, so the gas would expand without bound. Use coarser particles, a shorter or wider bed, \
                 lower flows, or a higher back-pressure.",
            ),
            GasLiquidBedError::Root(e) => write!(f, "root finding: {e}"),
            GasLiquidBedError::Property(e) => e.fmt(f),
        }
    }
}

impl std::error::Error for GasLiquidBedError {}

impl From<NumericalError> for GasLiquidBedError {
    fn from(e: NumericalError) -> Self {
        GasLiquidBedError::Numerical(e)
    }
}

impl From<OdeError> for GasLiquidBedError {
    fn from(e: OdeError) -> Self {
        GasLiquidBedError::Profile(e)
    }
}

impl From<RootError> for GasLiquidBedError {
    fn from(e: RootError) -> Self {
        GasLiquidBedError::Root(e)
    }
}

impl From<PropertyError> for GasLiquidBedError {
    fn from(e: PropertyError) -> Self {
        GasLiquidBedError::Property(e)
    }
}
