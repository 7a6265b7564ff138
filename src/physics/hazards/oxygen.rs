//! Oxygen with a liquid's vapour: whether a gas space can burn. The limiting oxygen concentration
//! (LOC) in use is the one the user entered for the solvent, or else an estimate from the
//! solvent's lower flammable limit; the verdict follows one ladder for every calculator.
//!
//! Estimate: LOC ≈ LFL × z, z the moles of O₂ that burn one mole of vapour completely (C → CO₂,
//! H → H₂O, N → N₂, S → SO₂, Cl → HCl), with the LFL from the IEC 60079-20-1 (2010) or NFPA 497
//! (2008) columns of the general-purpose library `chemicals` 1.5.2, or Jones' rule LFL ≈ 0.55
//! C_st, whichever is lower (`tests/reference/loc_estimates.py`). The rule is recalled from the
//! process-safety literature (from memory); tested against measured gas LOCs it falls within
//! about ±20 % and mostly low, i.e. on the safe side, but it was never tested on these solvents,
//! whose measured values (Osterberg et al., Org. Process Res. Dev., published online 2014,
//! doi:10.1021/op500328f) could not be read here. Above 25 °C the LFL, and with it the estimate,
//! is lowered by the factor 1 − 0.000721 (T − 25 °C) (Zabetakis, US Bureau of Mines Bulletin 627,
//! 1965, from memory). Pressure lowers the LOC too; that is not modelled, so a measured value at
//! the working temperature and pressure should be entered whenever one exists.
//!
//! Ladder: oxygen at or above the LOC in use → problem; above [`MARGIN`] × LOC → caution; below →
//! fine with the note. Dichloromethane, which does not burn in air under standard test conditions
//! but does in oxygen-enriched gas, takes air's oxygen content as its limit (air itself a
//! caution, enriched oxygen a problem); water gives no flammable vapour (enriched oxygen is still
//! a caution, for the parts it touches).
//!
//! ```
//! use clearbore::physics::fluids::Solvent;
//! use clearbore::physics::hazards::oxygen::{Limit, limit_for};
//! use clearbore::physics::units::Temperature;
//! // Methanol: IEC LFL 6.0 vol % × z = 1.5 → 9.0 vol % O₂ at 25 °C (chemicals 1.5.2).
//! let Limit::Flammable { loc, .. } = limit_for(&[Solvent::Methanol], Temperature::from_celsius(25.0), None) else { panic!() };
//! assert!((loc - 0.090).abs() < 1e-9);
//! ```

use serde::Serialize;

use crate::physics::fluids::Solvent;
use crate::physics::form::{ChoiceSpec, Collector, FieldSource};
use crate::physics::gases::Gas;
use crate::physics::input::{Allowed, FieldSpec, field};
use crate::physics::report::Verdict;
use crate::physics::units::{Dimension, Temperature, format_significant};

/// Where the limiting oxygen concentration comes from (asked only for a gas that feeds oxygen).
pub const LOC_SOURCE: ChoiceSpec = ChoiceSpec {
    key: "loc_source",
    label: "Limiting oxygen concentration of the liquid's vapour",
    // The key `typical` is kept so that saved cases open unchanged.
    options: &[("typical", "Estimated from the solvent's flammable limit"), ("entered", "Enter the value for your solvent")],
};

/// The LOC of the user's liquid, with N₂ as diluent.
pub const LIMITING_OXYGEN_FIELD: FieldSpec = field(
    "limiting_oxygen",
    "Limiting oxygen concentration (N₂ diluent)",
    Dimension::Fraction,
    Allowed { low: 0.005, low_inclusive: true, high: Some(0.21), high_inclusive: true, whole: false },
    "Measured for your liquid (to ASTM E2079 or EN 1839, or from its safety data), at or near the working temperature and pressure.",
);

/// Reads the entered LOC where it applies: `Some(None)` for the estimate (and for gases without
/// oxygen, where the choice is not asked), `Some(Some(loc))` for an entered value, `None` after an
/// input error (recorded in `c`) or when the gas itself is unknown.
pub fn read(src: &dyn FieldSource, c: &mut Collector, gas: Option<Gas>) -> Option<Option<f64>> {
    match gas {
        Some(g) if g.is_oxidising() => match c.take(src.choice(&LOC_SOURCE)) {
            Some(0) => Some(None),
            Some(_) => c.take(src.quantity(&LIMITING_OXYGEN_FIELD)).map(Some),
            None => None,
        },
        Some(_) => Some(None),
        None => None,
    }
}

/// Share of the LOC that a gas space may reach without continuous oxygen monitoring (NFPA 69,
/// from memory: 60 % of the LOC).
pub const MARGIN: f64 = 0.6;

/// Oxygen in dry air, mole fraction (the `gases` table's value).
pub const AIR_OXYGEN: f64 = crate::physics::gases::gas_data::AIR_OXYGEN_FRACTION;

/// Above this oxygen fraction a gas is oxygen-enriched: air's 20.95 % rounded up to 21 %, so
/// that "21 % O₂" typed for air counts as air.
pub const ENRICHED_ABOVE: f64 = 0.21;

/// Zabetakis' temperature coefficient of the lower flammable limit, per °C above 25 °C (US
/// Bureau of Mines Bulletin 627, 1965, from memory).
pub const LFL_TEMPERATURE_COEFFICIENT: f64 = 0.000721;

/// How an estimated LOC was obtained for one solvent.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct LocEstimate {
    /// CAS number of the solvent.
    pub cas: &'static str,
    /// Moles of O₂ to burn one mole of vapour, z.
    pub oxygen_per_mole: f64,
    /// Lower flammable limit in air at 25 °C, volume fraction.
    pub lfl: f64,
    /// Where the LFL comes from.
    pub lfl_source: &'static str,
}

impl LocEstimate {
    /// LOC at 25 °C, volume fraction O₂ (LFL × z).
    pub fn at_25c(&self) -> f64 {
        self.lfl * self.oxygen_per_mole
    }
}

const IEC: &str = "IEC 60079-20-1 (2010) via chemicals 1.5.2";
const JONES: &str = "Jones' rule 0.55 C_st (as chemicals 1.5.2 Crowl_Louvar_LFL, sulfur to SO₂)";

/// Estimates for the flammable built-in solvents (and the ones practitioners asked for), from
/// `tests/reference/loc_estimates.json`; a test compares every entry.
pub const ESTIMATES: &[LocEstimate] = &[
    LocEstimate { cas: "67-56-1", oxygen_per_mole: 1.5, lfl: 0.06, lfl_source: IEC },
    LocEstimate { cas: "64-17-5", oxygen_per_mole: 3.0, lfl: 0.031, lfl_source: IEC },
    LocEstimate { cas: "67-63-0", oxygen_per_mole: 4.5, lfl: 0.02, lfl_source: IEC },
    LocEstimate { cas: "75-05-8", oxygen_per_mole: 2.75, lfl: 0.03, lfl_source: IEC },
    LocEstimate { cas: "67-64-1", oxygen_per_mole: 4.0, lfl: 0.025, lfl_source: IEC },
    LocEstimate { cas: "109-99-9", oxygen_per_mole: 5.5, lfl: 0.015, lfl_source: IEC },
    LocEstimate { cas: "96-47-9", oxygen_per_mole: 7.0, lfl: 0.015979421482330163, lfl_source: JONES },
    LocEstimate { cas: "141-78-6", oxygen_per_mole: 5.0, lfl: 0.02, lfl_source: IEC },
    LocEstimate { cas: "108-88-3", oxygen_per_mole: 9.0, lfl: 0.01, lfl_source: IEC },
    LocEstimate { cas: "142-82-5", oxygen_per_mole: 11.0, lfl: 0.0085, lfl_source: IEC },
    LocEstimate { cas: "68-12-2", oxygen_per_mole: 4.25, lfl: 0.018, lfl_source: IEC },
    LocEstimate { cas: "67-68-5", oxygen_per_mole: 4.0, lfl: 0.02736764335567983, lfl_source: JONES },
    LocEstimate { cas: "872-50-4", oxygen_per_mole: 6.75, lfl: 0.01655343949099499, lfl_source: JONES },
    LocEstimate { cas: "123-91-1", oxygen_per_mole: 5.0, lfl: 0.014, lfl_source: IEC },
    LocEstimate { cas: "127-19-5", oxygen_per_mole: 5.75, lfl: 0.01933111389286949, lfl_source: JONES },
    LocEstimate { cas: "1634-04-4", oxygen_per_mole: 7.5, lfl: 0.014943069942641898, lfl_source: JONES },
    LocEstimate { cas: "5614-37-9", oxygen_per_mole: 8.5, lfl: 0.0132273413047422, lfl_source: JONES },
    LocEstimate { cas: "75-65-0", oxygen_per_mole: 6.0, lfl: 0.018552821018252796, lfl_source: JONES },
    LocEstimate { cas: "64-19-7", oxygen_per_mole: 2.0, lfl: 0.04, lfl_source: IEC },
];

/// CAS number of water, which gives no flammable vapour.
const WATER: &str = "7732-18-5";
/// CAS number of dichloromethane, flammable only in oxygen-enriched gas (or at high
/// temperature and strong ignition): flammable limits of 13–23 vol % in air are listed
/// (Wikidata via chemicals 1.5.2), yet it passes as non-flammable in standard tests (from memory).
const DICHLOROMETHANE: &str = "75-09-2";
const NO_SOLVENT_NOTE: &str = "the lowest estimate among the built-in solvents";

/// The oxygen limit that applies to a liquid's vapour.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Limit {
    /// A flammable vapour: the LOC in use and where it comes from.
    Flammable {
        /// Limiting oxygen concentration in use, volume fraction.
        loc: f64,
        /// Whose limit it is, as a phrase ("estimated for toluene at 80 °C").
        subject: String,
        /// How it was obtained, as a sentence (empty for an entered value).
        basis: String,
        /// Whether the user entered it (otherwise it is an estimate).
        entered: bool,
    },
    /// Burns only with more oxygen than air has (dichloromethane).
    EnrichedOnly,
    /// No flammable vapour from the liquid (water).
    NonFlammable,
}

fn estimate_for(cas: &str) -> Option<&'static LocEstimate> {
    ESTIMATES.iter().find(|e| e.cas == cas)
}

/// The temperature factor on an estimated LOC: 1 at and below 25 °C, then Zabetakis' fall.
pub fn temperature_factor(t: Temperature) -> f64 {
    (1.0 - LFL_TEMPERATURE_COEFFICIENT * (t.celsius() - 25.0).max(0.0)).max(0.0)
}

/// The limit for the liquid made of `solvents` (empty: an entered liquid of unknown
/// flammability) at `t`; `entered` is the user's own LOC for the solvent, which always wins.
/// A mixture takes the lowest limit of its components.
pub fn limit_for(solvents: &[Solvent], t: Temperature, entered: Option<f64>) -> Limit {
    if let Some(loc) = entered {
        return Limit::Flammable { loc, subject: "as entered for this liquid".to_owned(), basis: String::new(), entered: true };
    }
    let pct = |x: f64| format_significant(x * 100.0, 3);
    let factor = temperature_factor(t);
    let celsius = format_significant(t.celsius(), 3);
    let at_t = if factor < 1.0 {
        format!(" It is lowered by {} % for {celsius} °C (Zabetakis 1965, from memory).", pct(1.0 - factor))
    } else {
        String::new()
    };
    let measure = " Enter a measured LOC at your temperature and pressure.";
    let flammable: Vec<(Solvent, &LocEstimate)> = solvents.iter().filter_map(|s| estimate_for(s.cas()).map(|e| (*s, e))).collect();
    let unknown = solvents.iter().any(|s| s.cas() != WATER && s.cas() != DICHLOROMETHANE && estimate_for(s.cas()).is_none());
    if solvents.is_empty() || unknown {
        let lowest = ESTIMATES.iter().map(LocEstimate::at_25c).fold(f64::INFINITY, f64::min);
        return Limit::Flammable {
            loc: lowest * factor,
            subject: format!("taken for a liquid of unknown flammability at {celsius} °C"),
            basis: format!("The value is {}.{at_t}{measure}", NO_SOLVENT_NOTE),
            entered: false,
        };
    }
    if let Some((solvent, e)) = flammable.iter().min_by(|a, b| a.1.at_25c().total_cmp(&b.1.at_25c())) {
        return Limit::Flammable {
            loc: e.at_25c() * factor,
            subject: format!("estimated for {} at {celsius} °C", solvent.name()),
            basis: format!(
                "The estimate is its lower flammable limit, {} vol % ({}), times the {} mol of O₂ that burn one mole, a rule from memory good to about ±20 %.{at_t}{measure}",
                pct(e.lfl),
                e.lfl_source,
                format_significant(e.oxygen_per_mole, 3)
            ),
            entered: false,
        };
    }
    if solvents.iter().any(|s| s.cas() == DICHLOROMETHANE) { Limit::EnrichedOnly } else { Limit::NonFlammable }
}

/// The verdict for a gas space holding oxygen at mole fraction `oxygen` over a liquid with
/// `limit`, and the oxygen fraction below which it would be fine (`None` if no limit applies).
pub fn verdict(oxygen: f64, limit: &Limit) -> (Verdict, Option<f64>) {
    match limit {
        Limit::Flammable { loc, .. } => {
            let v = if oxygen >= *loc {
                Verdict::Problem
            } else if oxygen > MARGIN * loc {
                Verdict::Caution
            } else {
                Verdict::Fine
            };
            (v, Some(MARGIN * loc))
        }
        Limit::EnrichedOnly => {
            let v = if oxygen > ENRICHED_ABOVE {
                Verdict::Problem
            } else if oxygen > MARGIN * AIR_OXYGEN {
                Verdict::Caution
            } else {
                Verdict::Fine
            };
            (v, Some(MARGIN * AIR_OXYGEN))
        }
        Limit::NonFlammable => (if oxygen > ENRICHED_ABOVE { Verdict::Caution } else { Verdict::Fine }, None),
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn entered_value_wins_and_is_not_lowered() {
        let l = limit_for(&[Solvent::Toluene], Temperature::from_celsius(80.0), Some(0.105));
        assert_eq!(l, Limit::Flammable { loc: 0.105, subject: "as entered for this liquid".to_owned(), basis: String::new(), entered: true });
    }

    #[test]
    fn mixture_takes_the_lowest_limit() {
        let t = Temperature::from_celsius(25.0);
        let Limit::Flammable { loc, .. } = limit_for(&[Solvent::Acetone, Solvent::Dmf], t, None) else { panic!() };
        assert!((loc - 0.018 * 4.25).abs() < 1e-12);
        // Water with a flammable partner is flammable.
        assert!(matches!(limit_for(&[Solvent::Water, Solvent::Methanol], t, None), Limit::Flammable { .. }));
    }
}
