//! The two-phase packed-bed correlations behind one enum: each gives the local friction gradient
//! and liquid saturation, with its range warnings, and Larkins–White–Jeffrey is recommended.

use serde::Serialize;

use super::flow::{ABSOLUTE_PRESSURE, CHI, PARTICLE_DIAMETER, TwoPhaseBed};
use super::{larkins_saturation, larkins_white_jeffrey, wammes_holdup, wammes_westerterp};
use crate::physics::numeric::RootError;
use crate::physics::report::{ModelInfo, RangeWarning, range_warnings};
use crate::physics::units::Pressure;

/// A two-phase pressure-drop and holdup correlation for a packed bed.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum TwoPhaseModel {
    /// Larkins, White & Jeffrey (1961), Eqs. 22–23 — recommended.
    LarkinsWhiteJeffrey,
    /// Wammes & Westerterp (1991), Eqs. 8–9 solved together.
    WammesWesterterp,
}

/// The recommended correlation.
pub const RECOMMENDED: TwoPhaseModel = TwoPhaseModel::LarkinsWhiteJeffrey;

/// Why Larkins–White–Jeffrey is recommended, shown with the pressure-drop spread.
pub const RECOMMENDATION: &str = "Larkins–White–Jeffrey: built on the single-phase Ergun gradients of each phase, so with \
little gas it returns the liquid's own Ergun pressure drop, which dominates in a cartridge of fine \
particles. In the viscous regime χ² ≈ μ_L Q_L / (μ_G Q_G), inside its fitted 0.05–30 whenever the \
actual gas flow exceeds about a tenth of the liquid flow (derived). Wammes–Westerterp \
puts the whole gradient on the gas and was fitted where the gas dominates (Re_G 200–5000); at lab \
gas flows it is orders of magnitude outside and comes out far lower. Both were fitted on \
millimetre particles: no correlation read for this tool was fitted on beds of 50–500 µm \
particles, so read the value as an estimate, not a prediction.";

/// Why Larkins' typeset saturation is recommended, shown with the holdup spread.
pub const HOLDUP_RECOMMENDATION: &str = "Larkins–White–Jeffrey Eq. 23 as typeset (−0.774): same χ as the recommended pressure drop, \
inside its fitted χ range at most lab flows, and the lower of the two constants the paper prints \
(Fig. 7 has −0.744, 7 % more liquid). Wammes–Westerterp (dynamic plus 0.06 static) is far outside \
its Galileo and Reynolds ranges for fine particles and tends to fill the bed. Static and dynamic \
holdup are not split by Larkins et al.";

/// The local result of a correlation at one point of the bed.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Local {
    /// Friction gradient, Pa/m.
    pub gradient: f64,
    /// Liquid saturation, fraction of the voids.
    pub saturation: f64,
    /// A second saturation from the same source (Larkins' Figure 7 constant); equal to
    /// `saturation` otherwise.
    pub other_saturation: f64,
}

impl TwoPhaseModel {
    /// All models, the recommended one first.
    pub const ALL: [TwoPhaseModel; 2] = [TwoPhaseModel::LarkinsWhiteJeffrey, TwoPhaseModel::WammesWesterterp];

    /// Metadata of the pressure gradient.
    pub const fn info(self) -> ModelInfo {
        match self {
            TwoPhaseModel::LarkinsWhiteJeffrey => larkins_white_jeffrey::INFO,
            TwoPhaseModel::WammesWesterterp => wammes_westerterp::INFO,
        }
    }

    /// Metadata of the holdup.
    pub const fn holdup_info(self) -> ModelInfo {
        match self {
            TwoPhaseModel::LarkinsWhiteJeffrey => larkins_saturation::INFO,
            TwoPhaseModel::WammesWesterterp => wammes_holdup::INFO,
        }
    }

    /// Friction gradient and saturation at one point.
    pub fn local(self, bed: &TwoPhaseBed) -> Result<Local, RootError> {
        self.local_near(bed, &std::cell::Cell::new(None))
    }

    /// [`Self::local`] at a point next to the last one of a profile: `last` holds the gas share
    /// Wammes–Westerterp solved there (its start here, [`wammes_westerterp::solve_near`]) and
    /// takes this point's. Same answer to rounding, in fewer steps.
    pub fn local_near(self, bed: &TwoPhaseBed, last: &std::cell::Cell<Option<f64>>) -> Result<Local, RootError> {
        match self {
            TwoPhaseModel::LarkinsWhiteJeffrey => {
                let chi = bed.chi();
                Ok(Local {
                    gradient: larkins_white_jeffrey::friction_gradient(bed),
                    saturation: larkins_saturation::saturation(chi, larkins_saturation::EQUATION_CONSTANT),
                    other_saturation: larkins_saturation::saturation(chi, larkins_saturation::FIGURE_CONSTANT),
                })
            }
            TwoPhaseModel::WammesWesterterp => {
                let s = wammes_westerterp::solve_near(bed, last.get())?;
                last.set(Some(1.0 - s.total));
                Ok(Local { gradient: s.gradient, saturation: s.total, other_saturation: s.total })
            }
        }
    }

    /// Inputs outside this correlation's ranges (pressure drop and holdup) at one point at
    /// absolute pressure `pressure`.
    pub fn warnings(self, bed: &TwoPhaseBed, pressure: Pressure) -> Result<Vec<RangeWarning>, RootError> {
        Ok(match self {
            TwoPhaseModel::LarkinsWhiteJeffrey => range_warnings(
                &larkins_white_jeffrey::INFO,
                &[(CHI, bed.chi()), (PARTICLE_DIAMETER, bed.particle_diameter.si()), (ABSOLUTE_PRESSURE, pressure.pascals())],
            ),
            TwoPhaseModel::WammesWesterterp => {
                let state = wammes_westerterp::solve(bed)?;
                let groups = wammes_westerterp::groups(bed, &state);
                let mut w = range_warnings(&wammes_westerterp::INFO, &groups);
                w.extend(range_warnings(&wammes_holdup::INFO, &groups));
                w
            }
        })
    }
}
