//! The atmospheric pressure of the lab, which turns the gauge pressures people set and read
//! (back-pressure regulators, pump displays) into the absolute pressures that boiling and gas
//! volumes depend on. 1 atm at sea level; about 0.9 bar at 1 000 m (barometric formula, from
//! memory), so a hot solvent boils earlier and a gas bubble is larger in a lab up a mountain.

use super::form::{Collector, FieldSource};
use super::input::{Allowed, FieldSpec};
use super::units::{Dimension, Pressure};

/// Atmospheric pressure at the lab.
pub const AMBIENT_PRESSURE: FieldSpec = FieldSpec {
    key: "ambient_pressure",
    label: "Atmospheric pressure (absolute)",
    dimension: Dimension::Pressure,
    // Lowest to highest barometric pressures where people run labs, with room to spare.
    allowed: Allowed { low: 0.3e5, low_inclusive: true, high: Some(1.2e5), high_inclusive: true, whole: false },
    help: "What gauge pressures are measured against: 1.013 bar (1 atm) at sea level, about 0.9 bar at 1000 m.",
};

/// Reads the ambient pressure.
pub fn read(src: &dyn FieldSource, c: &mut Collector) -> Option<Pressure> {
    c.take(src.quantity(&AMBIENT_PRESSURE)).map(Pressure::from_si)
}
