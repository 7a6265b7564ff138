//! Hazards of gas over a catalyst bed: supported metal catalysts igniting when an opened bed
//! meets air (this calculator's own check), and the project's shared gas-hazard rule applied to
//! this setup.

use super::GasLiquidBedInput;
use crate::physics::gases::Gas;
use crate::physics::hazards;
use crate::physics::report::{Check, Verdict};

/// The shared gas-hazard rule (oxygen against the limiting oxygen concentration of the liquid's
/// vapour, hydrogen, carbon monoxide), applied to this setup's feed, liquid and temperature.
pub fn gas_hazard_check(input: &GasLiquidBedInput) -> Check {
    hazards::gas_check(&hazards::GasFeed {
        gas: input.gas,
        mole_fraction: input.gas_mole_fraction,
        solvents: &input.liquid.solvents(),
        temperature: input.temperature,
        entered_loc: input.limiting_oxygen,
    })
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
