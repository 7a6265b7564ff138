//! Why a segmented-flow calculation could not give a number: reported as such, never as NaN.

use serde::Serialize;

use crate::physics::fluids::PropertyError;
use crate::physics::numeric::RootError;
use crate::physics::ode::OdeError;
use crate::physics::report::NumericalError;

/// A numerical failure in the segmented-flow physics.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum SegmentedFlowError {
    /// A fixed-point iteration did not settle.
    NoConvergence {
        /// What was iterated.
        quantity: &'static str,
        /// Iterations made.
        iterations: u32,
    },
    /// The pressure profile could not be integrated.
    Profile(OdeError),
    /// A root could not be found.
    Root(RootError),
    /// A result was not a finite number.
    Numerical(NumericalError),
    /// A solvent property had no physical value at this temperature.
    Property(PropertyError),
    /// The gas is used up before the outlet: the consumption exceeds the feed.
    GasExhausted,
    /// The liquid's vapour pressure reaches the outlet pressure: it boils.
    Boils,
    /// The inlet pressure passes the largest pressure the tool takes
    /// ([`MAX_PRESSURE`](crate::physics::segmented_flow::pressure_profile::MAX_PRESSURE)).
    BeyondPressureRange,
}

impl std::fmt::Display for SegmentedFlowError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            SegmentedFlowError::NoConvergence { quantity, iterations } => {
                write!(f, "{quantity} did not converge in {iterations} iterations")
            }
            // Integration failures mean the drop approaches the pressure itself: the gas would
            // expand without bound. Said in the user's terms, the solver detail left out.
            SegmentedFlowError::Profile(_) => f.write_str(
                "The pressure along the coil cannot be followed for these entries: the coil's pressure drop comes close to \
                 the pressure itself, so the gas would expand without bound. Shorten the coil, widen its bore, lower the gas \
                 or liquid flow, or raise the back-pressure.",
            ),
            SegmentedFlowError::Root(e) => write!(f, "root finding: {e}"),
            SegmentedFlowError::Numerical(e) => e.fmt(f),
            SegmentedFlowError::Property(e) => e.fmt(f),
            SegmentedFlowError::GasExhausted => f.write_str("all gas is consumed before the outlet: segmented flow ends inside the coil"),
            SegmentedFlowError::Boils => f.write_str("the liquid boils at the outlet pressure: raise the back-pressure or lower the temperature"),
            SegmentedFlowError::BeyondPressureRange => f.write_str(
                "The coil's inlet pressure would pass 1000 bar, beyond any lab tubing and beyond what the ideal gas and the \
                 pressure-drop correlations cover. Shorten the coil, widen its bore, or lower the gas or liquid flow.",
            ),
        }
    }
}

impl std::error::Error for SegmentedFlowError {}

impl From<OdeError> for SegmentedFlowError {
    fn from(e: OdeError) -> Self {
        SegmentedFlowError::Profile(e)
    }
}

impl From<RootError> for SegmentedFlowError {
    fn from(e: RootError) -> Self {
        SegmentedFlowError::Root(e)
    }
}

impl From<NumericalError> for SegmentedFlowError {
    fn from(e: NumericalError) -> Self {
        SegmentedFlowError::Numerical(e)
    }
}

impl From<PropertyError> for SegmentedFlowError {
    fn from(e: PropertyError) -> Self {
        SegmentedFlowError::Property(e)
    }
}
