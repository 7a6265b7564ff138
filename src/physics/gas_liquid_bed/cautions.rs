//! Hazards of gas over a catalyst bed: supported metal catalysts igniting when an opened bed
//! meets air (this calculator's own check), and the one place where the project's shared
//! gas-hazard rule (oxygen against the limiting oxygen concentration, hydrogen, carbon monoxide)
//! enters this report.

use serde::Serialize;

use super::GasLiquidBedInput;
use crate::physics::fluids::selection::LiquidSelection;
use crate::physics::gases::Gas;
use crate::physics::report::{Check, Verdict};
use crate::physics::units::{Pressure, Temperature};

/// What a gas-hazard rule needs to know about this setup.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct GasHazardInputs {
    /// The gas fed.
    pub gas: Gas,
    /// Mole fraction of oxygen in the dry gas fed (0 for gases without oxygen; air 0.2095).
    pub oxygen_fraction: f64,
    /// The liquid (solvent, mixture or entered), whose vapour shares the gas space.
    pub liquid: LiquidSelection,
    /// Temperature of the bed.
    pub temperature: Temperature,
    /// Highest absolute pressure in the cartridge (at its inlet).
    pub highest_pressure: Pressure,
}

impl GasHazardInputs {
    /// The hazard inputs of a setup whose inlet is at absolute pressure `inlet`.
    pub fn of(input: &GasLiquidBedInput, inlet: Pressure) -> Self {
        let (reactive, y) = input.reactive();
        Self {
            gas: input.gas,
            oxygen_fraction: if reactive == Gas::Oxygen { y } else { 0.0 },
            liquid: input.liquid,
            temperature: input.temperature,
            highest_pressure: inlet,
        }
    }
}

/// The single place where the shared gas-hazard check enters this calculator. The shared rule
/// (oxygen against the limiting oxygen concentration, hydrogen, carbon monoxide) is kept in one
/// module for every calculator and is not wired in yet: until it is, this check says so plainly,
/// as a caution, rather than leave the hazard unmentioned.
pub fn gas_hazard_check(h: &GasHazardInputs) -> Check {
    Check {
        key: "gas_hazard",
        topic: "Gas hazards",
        verdict: Verdict::Caution,
        reason: format!(
            "Not assessed here yet: the project's shared gas-hazard rule (oxygen against the solvent's limiting oxygen concentration, hydrogen, carbon monoxide) is not wired into this calculator. The feed is {}{}.",
            h.gas.name(),
            if h.oxygen_fraction > 0.0 { format!(" with {:.1} % oxygen", h.oxygen_fraction * 100.0) } else { String::new() }
        ),
        caution: Some("Treat flammable, oxidising and toxic gases as hazards in their own right: follow local codes, institutional rules and licensed practice for this gas.".to_owned()),
    }
}

/// Opened catalyst beds: dry or solvent-wet supported metal catalysts can ignite in air.
pub fn catalyst_ignition_check(input: &GasLiquidBedInput) -> Check {
    let loaded = match input.gas {
        Gas::Hydrogen => " After a hydrogenation the metal holds adsorbed hydrogen, which makes ignition on contact with air more likely.",
        Gas::Oxygen | Gas::Air => " In oxidations the bed already meets oxygen: keep it wet with the liquid while running and flush with solvent, then water, before opening.",
        _ => "",
    };
    Check {
        key: "catalyst_ignition",
        topic: "Opening the cartridge",
        verdict: Verdict::Caution,
        reason: format!(
            "Supported precious-metal and nickel catalysts (Pd/C, Pt/C, skeletal nickel) can glow and ignite solvent vapour when air reaches them, dry or wet with a flammable solvent.{loaded}"
        ),
        caution: Some(
            "Before opening: flush the solvent out with water or purge with inert gas, keep the catalyst wet, open away from solvent vapour and ignition sources, and put spent catalyst under water in a labelled waste container. Follow local codes and institutional rules."
                .to_owned(),
        ),
    }
}
