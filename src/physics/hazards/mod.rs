//! Hazard rules shared by every calculator, one place each: gases (oxygen against the limiting
//! oxygen concentration of the liquid's vapour, hydrogen, carbon monoxide, inert gases),
//! over-pressure, and boiling. Each returns a [`Check`] whose verdict matches its reason and whose
//! caution sits beside it; the calculators only supply the numbers.

pub mod oxygen;

use crate::physics::fluids::Solvent;
use crate::physics::gases::Gas;
use crate::physics::report::{Check, Verdict};
use crate::physics::units::{Pressure, Temperature, format_significant};

use self::oxygen::Limit;

/// Ends every hazard caution: the page defers to the rules that govern the user's lab.
pub const DEFER: &str = "Follow local codes, your institution's rules and licensed engineering practice.";

/// What a gas hazard check needs to know.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct GasFeed<'a> {
    /// The gas fed.
    pub gas: Gas,
    /// Mole fraction of the named gas in the feed, the rest nitrogen (ignored for air and
    /// nitrogen, which have their own composition).
    pub mole_fraction: f64,
    /// The built-in solvents the liquid is made of; empty for an entered liquid.
    pub solvents: &'a [Solvent],
    /// Working temperature.
    pub temperature: Temperature,
    /// The limiting oxygen concentration the user entered for the liquid, if any.
    pub entered_loc: Option<f64>,
}

impl GasFeed<'_> {
    /// Oxygen mole fraction of the feed (0 for a gas without oxygen).
    pub fn oxygen_fraction(&self) -> f64 {
        match self.gas {
            Gas::Air => oxygen::AIR_OXYGEN,
            Gas::Oxygen => self.mole_fraction,
            _ => 0.0,
        }
    }
}

fn pct(x: f64) -> String {
    format_significant(x * 100.0, 3)
}

/// The gas hazard check: key `gas_hazard`.
pub fn gas_check(feed: &GasFeed) -> Check {
    let (verdict, reason, caution) = match feed.gas {
        Gas::Oxygen | Gas::Air => oxygen_hazard(feed),
        Gas::Hydrogen => (
            Verdict::Caution,
            "Hydrogen burns in air from 4 to 75 vol % (Zabetakis 1965, from memory) with a very low ignition energy, leaks \
             through fittings and permeates fluoropolymer tubing."
                .to_owned(),
            Some(format!(
                "Vent the separator and the regulator outlet to extraction, use hydrogen detection, purge with inert gas before \
                 and after, leak-test with inert gas at the working pressure, exclude ignition sources, and keep spent catalysts \
                 wet. {DEFER}"
            )),
        ),
        Gas::CarbonMonoxide => (
            Verdict::Caution,
            "Carbon monoxide is acutely toxic and odourless, and burns in air from 12.5 to 74 vol % (Zabetakis 1965, from \
             memory)."
                .to_owned(),
            Some(format!(
                "Work in a ventilated enclosure with a CO detector, closed handling and an exhaust for the separator and the \
                 regulator outlet; never vent to the room. {DEFER}"
            )),
        ),
        Gas::Nitrogen | Gas::CarbonDioxide => (
            Verdict::Fine,
            format!(
                "{} neither burns nor feeds a fire; released in a closed or poorly ventilated space it displaces oxygen (asphyxiant).",
                crate::physics::fluids::selection::capitalised(feed.gas.name())
            ),
            None,
        ),
    };
    Check { key: "gas_hazard", topic: "Gas hazards", verdict, reason, caution }
}

fn oxygen_hazard(feed: &GasFeed) -> (Verdict, String, Option<String>) {
    let y = feed.oxygen_fraction();
    let limit = oxygen::limit_for(feed.solvents, feed.temperature, feed.entered_loc);
    let (verdict, safe_below) = oxygen::verdict(y, &limit);
    let what = if feed.gas == Gas::Air { format!("Air ({} % O₂)", pct(y)) } else { format!("The feed ({} % O₂)", pct(y)) };
    let parts = "Gas slugs, the regulator outlet, the separator and the receiver hold the liquid's vapour with the oxygen";
    let clean = if y > oxygen::ENRICHED_ABOVE {
        " With oxygen-enriched gas use oxygen-compatible, oxygen-clean parts and open valves slowly (heating by adiabatic compression)."
    } else {
        ""
    };
    let fall = "Limiting oxygen concentrations fall with temperature and pressure (measured for nine solvents at process \
                conditions by Osterberg et al., Org. Process Res. Dev., doi:10.1021/op500328f).";
    match (&limit, verdict) {
        (Limit::Flammable { loc, subject, basis, .. }, v) => {
            let margin = safe_below.unwrap_or(0.0);
            let loc_words = format!("the limiting oxygen concentration of {} vol % {subject}", pct(*loc));
            let share = format!("{} %", format_significant(oxygen::MARGIN * 100.0, 2));
            let kept = "the share kept without continuous oxygen monitoring (NFPA 69, from memory)";
            let verdict_words = match v {
                Verdict::Problem => {
                    let rel = if y > *loc { "above" } else { "at" };
                    format!("{what} is {rel} {loc_words}: the vapour space can burn.")
                }
                Verdict::Caution => format!("{what} is below {loc_words} but above {} vol %, {share} of it, {kept}.", pct(margin)),
                Verdict::Fine => format!("{what} stays below {} vol %, {share} of {loc_words}, {kept}.", pct(margin)),
            };
            let basis = if basis.is_empty() { String::new() } else { format!(" {basis}") };
            let reason = format!("{verdict_words}{basis} {fall}");
            let action = match v {
                Verdict::Problem => format!(
                    "Do not run as set: feed at most {} % O₂ in N₂, or enter a measured LOC for this liquid at your temperature and pressure. {parts}: dilute the outlet with N₂ and exclude ignition sources.",
                    pct(margin)
                ),
                Verdict::Caution => format!(
                    "Feed at most {} % O₂ in N₂, or monitor the oxygen continuously and keep every vapour space below the LOC. {parts}: dilute the outlet with N₂ and exclude ignition sources.",
                    pct(margin)
                ),
                Verdict::Fine => format!("{parts}: keep the outlet diluted and free of ignition sources; flammable reagents and products count too."),
            };
            (v, reason, Some(format!("{action}{clean} {DEFER}")))
        }
        (Limit::EnrichedOnly, v) => {
            let reason = format!(
                "{what} over dichloromethane, which passes as non-flammable in air in standard tests but burns in oxygen-enriched gas, \
                 and in air when hot or pressurised (flammable limits 13–23 vol % are listed in air). {}",
                match v {
                    Verdict::Problem => "Oxygen-enriched: the vapour space can burn.",
                    Verdict::Caution => "At air's oxygen content the margin is gone when the line is hot or under pressure.",
                    Verdict::Fine => "Diluted well below air's oxygen content.",
                }
            );
            let action = match v {
                Verdict::Fine => format!("{parts}; reagents and products may burn where the solvent does not."),
                _ => format!(
                    "Feed at most {} % O₂ in N₂, or use a solvent with a measured LOC. {parts}: dilute the outlet with N₂ and exclude ignition sources.",
                    pct(safe_below.unwrap_or(0.0))
                ),
            };
            (v, reason, Some(format!("{action}{clean} {DEFER}")))
        }
        (Limit::NonFlammable, v) => {
            let reason = if v == Verdict::Caution {
                format!("{what} over water: the liquid gives no flammable vapour, but oxygen-enriched gas makes polymers, seals and lubricants burn readily.")
            } else {
                format!("{what} over water: the liquid gives no flammable vapour.")
            };
            (
                v,
                reason,
                Some(format!("Flammable reagents or products can still make the gas space flammable; keep the outlet diluted.{clean} {DEFER}")),
            )
        }
    }
}

/// What a pressurised line holds, for the words of its over-pressure caution.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum LineContents {
    /// Liquid (or slurry) only.
    Liquid,
    /// A packed cartridge in a liquid line.
    Cartridge,
    /// Gas and liquid.
    GasAndLiquid,
}

/// The caution beside an over-pressure verdict (`None` when the verdict is fine).
pub fn over_pressure_caution(verdict: Verdict, contents: LineContents) -> Option<String> {
    if verdict == Verdict::Fine {
        return None;
    }
    let what = match contents {
        LineContents::Liquid => "Over-pressure can burst tubing or blow a fitting apart and spray hot, possibly toxic liquid.",
        LineContents::Cartridge => "Over-pressure can burst a cartridge or tubing or blow a fitting apart and spray hot, possibly toxic liquid.",
        LineContents::GasAndLiquid => {
            "A gas-filled line stores far more energy than a liquid-filled one at the same pressure and fails violently."
        }
    };
    Some(format!(
        "{what} Stay below the lowest-rated component (polymer tubing loses strength when hot), fit a pressure limit or relief \
         device, and shield pressurised parts. {DEFER}"
    ))
}

/// Margin on the vapour pressure below which a liquid kept under pressure is a caution: the
/// absolute pressure should be at least 1.5 × p_sat (common practice, no source).
pub const BOILING_MARGIN: f64 = 1.5;

/// The boiling rule: boils (p_sat ≥ p) → problem; p < [`BOILING_MARGIN`] × p_sat → caution;
/// else fine. Pressures absolute.
pub fn boiling_verdict(vapour_pressure: Pressure, pressure: Pressure) -> Verdict {
    if vapour_pressure.pascals() >= pressure.pascals() {
        Verdict::Problem
    } else if pressure.pascals() < BOILING_MARGIN * vapour_pressure.pascals() {
        Verdict::Caution
    } else {
        Verdict::Fine
    }
}

/// The boiling check: `what` names the liquid ("Methanol at 80 °C", capitalised), `model` the
/// vapour-pressure model; `where_` says where the pressure applies ("at the outlet").
pub fn boiling_check(what: &str, model: &str, vapour_pressure: Pressure, pressure: Pressure, where_: &str) -> Check {
    let verdict = boiling_verdict(vapour_pressure, pressure);
    let bar = |p: Pressure| format_significant(p.pascals() / 1e5, 3);
    let outcome = match verdict {
        Verdict::Problem => "it boils",
        Verdict::Caution => "it stays liquid, but with less than the 1.5 × margin on the vapour pressure (common practice, no source)",
        Verdict::Fine => "it stays liquid",
    };
    let needed = Pressure::from_si(BOILING_MARGIN * vapour_pressure.pascals());
    Check {
        key: "boiling",
        topic: "Solvent boiling",
        verdict,
        reason: format!(
            "{what} has a vapour pressure of {} bar(a) ({model}) against {} bar(a) {where_}: {outcome}.",
            bar(vapour_pressure),
            bar(pressure)
        ),
        caution: (verdict != Verdict::Fine).then(|| {
            format!(
                "Keep at least {} bar(a) {where_} (raise the back-pressure) or lower the temperature. A liquid above its boiling \
                 point flashes to vapour where the pressure drops: erratic flow, pressure surges in a closed line, and a burn and \
                 fire hazard from a leak. {DEFER}",
                bar(needed)
            )
        }),
    }
}
