//! Pumps of a setup's feeds and the largest pressure each can give: the limit entered for piston,
//! peristaltic and diaphragm pumps, and for a syringe pump the drive's force over the plunger area.
//!
//! Syringe: p_max = F / A with A = π d² / 4, F the drive's largest linear force (N, from the
//! pump's data sheet) and d the barrel's inner diameter (m): the force balance on the plunger,
//! friction of the plunger seal neglected (it lowers the pressure reached, so p_max is an upper
//! value). The barrel's own rating is entered beside it: when it is lower than F / A a blockage
//! can break the barrel before the drive stalls.
//!
//! Example (hand calculation): F = 200 N on a 14.5 mm bore: A = π × 0.0145² / 4 = 1.6513e-4 m²,
//! p_max = 200 / 1.6513e-4 = 1.2111e6 Pa = 12.11 bar.
//!
//! ```
//! use clearbore::physics::setup::pump::syringe_pressure;
//! let p = syringe_pressure(200.0, 0.0145);
//! assert!((p / 1e5 - 12.11).abs() < 0.005);
//! ```
//!
//! Peristaltic pumps hold only a few bar before the tubing balloons or slips, and diaphragm pumps'
//! limits depend on the head; both are entered from the pump's data sheet (common practice, no
//! source).

use serde::Serialize;

use crate::physics::report::ModelInfo;
use crate::physics::units::PressureDifference;

/// The force balance on a syringe plunger.
pub const SYRINGE_INFO: ModelInfo = ModelInfo {
    name: "Force on the plunger",
    formula: "p_max = F / (π d² / 4) (plunger seal friction neglected: an upper value)",
    source: "definition (force balance)",
    validity: &[],
};

/// The pump limit as entered.
pub const ENTERED_INFO: ModelInfo =
    ModelInfo { name: "Pump pressure limit", formula: "as entered from the pump's data sheet", source: "entered", validity: &[] };

/// A feed's pump.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Pump {
    /// Piston (HPLC-type) pump with its entered pressure limit.
    Piston {
        /// Largest pressure (gauge).
        limit: PressureDifference,
    },
    /// Syringe pump: drive force and barrel.
    Syringe {
        /// Largest linear force of the drive, N.
        force: f64,
        /// Barrel inner diameter, m.
        bore: f64,
        /// The barrel's own pressure rating (gauge).
        barrel_rating: PressureDifference,
    },
    /// Peristaltic pump with its entered pressure limit.
    Peristaltic {
        /// Largest pressure (gauge).
        limit: PressureDifference,
    },
    /// Diaphragm pump with its entered pressure limit.
    Diaphragm {
        /// Largest pressure (gauge).
        limit: PressureDifference,
    },
}

impl Pump {
    /// Name for people.
    pub const fn word(self) -> &'static str {
        match self {
            Pump::Piston { .. } => "piston pump",
            Pump::Syringe { .. } => "syringe pump",
            Pump::Peristaltic { .. } => "peristaltic pump",
            Pump::Diaphragm { .. } => "diaphragm pump",
        }
    }

    /// The largest pressure the pump itself can give (gauge, Pa): F / A for a syringe.
    pub fn largest_pressure(self) -> f64 {
        match self {
            Pump::Syringe { force, bore, .. } => syringe_pressure(force, bore),
            Pump::Piston { limit } | Pump::Peristaltic { limit } | Pump::Diaphragm { limit } => limit.si(),
        }
    }

    /// How the largest pressure was found.
    pub const fn info(self) -> ModelInfo {
        match self {
            Pump::Syringe { .. } => SYRINGE_INFO,
            _ => ENTERED_INFO,
        }
    }
}

/// Largest pressure of a syringe pump (Pa): drive force `force` (N) over the plunger area of a
/// barrel of inner diameter `bore` (m).
pub fn syringe_pressure(force: f64, bore: f64) -> f64 {
    force / (std::f64::consts::PI * bore * bore / 4.0)
}
