//! The checks of the gas–liquid cartridge: regime, pressure budget, tubing, boiling, ideal gas,
//! bed lifting, wall and plug flow, wetting, gas supply, transfer limitation and hazards.

use super::cautions;
use super::remedies;
use super::{Assessment, Demand, GasLiquidBedError, GasLiquidBedInput, regime};
use crate::physics::packed_bed::minimum_fluidisation::FluidisationInput;
use crate::physics::packed_bed::{self as bed, FlowDirection};
use crate::physics::report::{Check, PRESSURE_MARGIN, Verdict, budget_verdict};
use crate::physics::units::{Pressure, PressureDifference, format_significant};

/// Above this share of the largest transfer rate, transfer slows the reaction noticeably: the
/// dissolved gas falls below half its saturation value, C_L/C* = 1 − r/R_max (derived; the
/// threshold is this tool's choice, no source).
pub const TRANSFER_CAUTION_RATIO: f64 = 0.5;

const GAS_PRESSURE_CAUTION: &str = "A line holding gas stores far more energy than one full of liquid at the same pressure and \
fails violently; a cartridge that bursts also throws out catalyst. Stay below the lowest-rated part (polymer parts lose \
strength when hot), set the pump's pressure limit, fit a relief device on the gas supply, shield the cartridge, and follow \
local codes and institutional rules.";

fn bar(pa: f64) -> String {
    format_significant(pa / 1e5, 3)
}

fn sig(v: f64) -> String {
    format_significant(v, 3)
}

fn mmol_min(mol_s: f64) -> String {
    format_significant(mol_s * 6e4, 3)
}

/// Every check, in display order.
pub fn all(input: &GasLiquidBedInput, a: &Assessment) -> Result<Vec<Check>, GasLiquidBedError> {
    let cond = &a.conditions;
    let outlet = cond.at(cond.outlet_pressure);
    let (inlet_gauge, _) = a.inlet_gauge(input.ambient)?;
    let mut checks = vec![regime::regime_check(&outlet, input.upward()), pressure_check(input, a)?];
    if let Some(tubing) = &input.tubing {
        checks.push(crate::physics::tubing::check(tubing, PressureDifference::from_si(inlet_gauge), &input.liquid.solvents()));
    }
    checks.extend(input.liquid.checks(cond.outlet_pressure));
    let inlet = a.recommended()?.inlet_pressure;
    if let Some(note) = input.gas.compressibility_caveat(input.temperature, inlet) {
        checks.push(Check { key: "compressibility", topic: "Ideal-gas assumption", verdict: Verdict::Caution, reason: note, caution: None });
    }
    checks.push(lifting_check(input, a)?);
    let d_v = input.particles.particle_diameter.si();
    checks.push(bed::wall_check(input.tube_diameter.si() / d_v, &outlet.liquid_alone().with_length(input.bed_length)));
    checks.push(bed::plug_flow_check(input.bed_length.si() / d_v));
    checks.push(wetting_check(input));
    checks.push(gas_supply_check(input));
    checks.push(transfer_check(input, a)?);
    checks.push(cautions::catalyst_ignition_check(input));
    checks.push(cautions::gas_hazard_check(input));
    Ok(checks)
}

fn pressure_check(input: &GasLiquidBedInput, a: &Assessment) -> Result<Check, GasLiquidBedError> {
    let (inlet, worst) = a.inlet_gauge(input.ambient)?;
    let rating = input.rating.si();
    let ratio = inlet / rating;
    let verdict = budget_verdict(ratio, worst / rating);
    let rec = a.recommended()?;
    let (lo, hi) = a.profiles.iter().fold((f64::INFINITY, f64::NEG_INFINITY), |(lo, hi), p| (lo.min(p.friction_drop), hi.max(p.friction_drop)));
    let head = rec.inlet_pressure.si() - a.conditions.outlet_pressure.si() - rec.friction_drop;
    let note = match verdict {
        Verdict::Problem => ": over the rating".to_owned(),
        Verdict::Caution if ratio > PRESSURE_MARGIN => ": less than 20 % margin (common practice, no source)".to_owned(),
        Verdict::Caution => format!("; the highest correlation ({} bar(g) at the inlet) leaves less than 20 % margin (common practice, no source)", bar(worst)),
        Verdict::Fine => String::new(),
    };
    Ok(Check {
        key: "pressure_budget",
        topic: "Pressure budget",
        verdict,
        reason: format!(
            "Inlet pressure {} bar(g) = back-pressure {} bar + {} bar two-phase friction (Larkins–White–Jeffrey; correlations {}–{} bar) {} {} bar static head, {:.0} % of the {} bar(g) limit of the {}, the lowest of pump, cartridge and fittings{note}. Friction is computed{}. Frits, fittings, fines and a swelling or compacting bed add to it.",
            bar(inlet),
            bar(input.back_pressure.si()),
            bar(rec.friction_drop),
            bar(lo),
            bar(hi),
            if head < 0.0 { "−" } else { "+" },
            bar(head.abs()),
            ratio * 100.0,
            bar(rating),
            input.rating_part,
            if input.particles.distribution.is_some() { input.particles.size_note() } else { " for the entered particle size".to_owned() },
        ),
        caution: (verdict != Verdict::Fine).then(|| GAS_PRESSURE_CAUTION.to_owned()),
    })
}

const LIFTING_CAUTION: &str = "A bed lifted by the gas and liquid carries fines to the upper frit and can block it: the pressure \
then climbs towards the pump limit, and gas and liquid bypass a channelled bed. Hold the bed between frits or spacers \
with no headspace, or run in down-flow, and keep a pump pressure limit set.";

fn lifting_check(input: &GasLiquidBedInput, a: &Assessment) -> Result<Check, GasLiquidBedError> {
    let key = "bed_lifting";
    let topic = "Bed lifting in up-flow";
    if input.direction == FlowDirection::Down {
        return Ok(Check { key, topic, verdict: Verdict::Fine, reason: "Down-flow presses the bed onto the outlet frit; lifting does not arise.".to_owned(), caution: None });
    }
    let rec = a.recommended()?;
    let cond = &a.conditions;
    let mean_p = Pressure::from_si(0.5 * (rec.inlet_pressure.si() + cond.outlet_pressure.si()));
    let r = rec.mean_saturation.clamp(0.0, 1.0);
    let rho_m = r * cond.liquid_density.si() + (1.0 - r) * cond.at(mean_p).gas_density.si();
    let particles = &input.particles;
    let weight = FluidisationInput {
        particle_diameter: particles.particle_diameter,
        particle_density: particles.solid.wet_density(cond.liquid_density),
        density: crate::physics::units::Density::from_si(rho_m),
        viscosity: cond.liquid_viscosity,
        voidage: cond.voidage,
        sphericity: particles.shape.sphericity(),
    }
    .supported_weight_gradient();
    let friction = rec.friction_drop / input.bed_length.si();
    let confined = input.direction == FlowDirection::UpConfined;
    let held = if confined {
        " The bed is held between frits, so it cannot rise, but fines can migrate to the upper frit."
    } else {
        " The bed is free to rise: a free bed must be held in place in gas–liquid up-flow."
    };
    let (verdict, what) = if weight <= 0.0 {
        (if confined { Verdict::Caution } else { Verdict::Problem }, format!("the particles, pores full of liquid, are not denser than the gas–liquid mixture in the voids ({} kg/m³): they float at any flow", sig(rho_m)))
    } else if friction >= weight {
        (
            if confined { Verdict::Caution } else { Verdict::Problem },
            format!("the mean two-phase friction gradient {} bar/m (Larkins–White–Jeffrey) is {} times the bed's buoyant weight per height, {} bar/m: the flow lifts the bed", bar(friction), sig(friction / weight), bar(weight)),
        )
    } else {
        (
            if confined { Verdict::Fine } else { Verdict::Caution },
            format!("the mean two-phase friction gradient {} bar/m (Larkins–White–Jeffrey) is {} % of the bed's buoyant weight per height, {} bar/m; rising bubbles can still stir the top of a free bed (common practice, no source)", bar(friction), format_significant(friction / weight * 100.0, 2), bar(weight)),
        )
    };
    Ok(Check {
        key,
        topic,
        verdict,
        reason: format!("In up-flow {what}. The weight is (1 − ε)(ρ_p,wet − ρ_m) g with ρ_m from the liquid holdup, the force balance behind minimum fluidisation.{held}"),
        caution: (verdict != Verdict::Fine).then(|| LIFTING_CAUTION.to_owned()),
    })
}

fn wetting_check(input: &GasLiquidBedInput) -> Check {
    let (verdict, reason) = if input.upward() {
        (Verdict::Fine, "In up-flow the liquid fills the bed around the rising gas and keeps the particles wetted (common practice, no source).".to_owned())
    } else {
        (
            Verdict::Caution,
            "Not computed. The published correlations for catalyst wetting efficiency in trickle flow (Mills & Duduković 1981; Al-Dahhan & Duduković 1995) could not be read, and the one Herskowitz & Smith (1983) print holds only for their worked example. In down-flow part of the catalyst may stay dry or poorly irrigated, more so in small beds; the liquid–solid coefficient and capacity here assume full wetting and are upper bounds. Up-flow, or a liquid flow well above the minimum, helps.".to_owned(),
        )
    };
    Check { key: "wetting", topic: "Catalyst wetting", verdict, reason, caution: None }
}

fn gas_supply_check(input: &GasLiquidBedInput) -> Check {
    let (_, y) = input.reactive();
    let fed = input.gas_flow.molar_flow().si() * y;
    let need = input.need();
    let nu = input.gas_stoichiometry;
    let equivalents = fed / (input.concentration.si() * input.liquid_flow.si());
    let (verdict, mut reason) = if fed < need {
        let text = match input.demand {
            Demand::Conversion { .. } => format!(
                "Only {} mol of reactive gas per mol of substrate is fed against {} needed ({} per mol converted × target): at most {} % of the substrate can react. Raise the gas flow to at least {} times its setting.",
                sig(equivalents),
                sig(need / (input.concentration.si() * input.liquid_flow.si())),
                sig(nu),
                format_significant((fed / (nu * input.concentration.si() * input.liquid_flow.si()) * 100.0).min(100.0), 3),
                sig(need / fed)
            ),
            Demand::Rate { .. } => format!("The reactive gas fed, {} mmol/min, is below the {} mmol/min the reaction takes up: the gas runs out in the bed.", mmol_min(fed), mmol_min(need)),
        };
        (Verdict::Problem, text)
    } else {
        (
            Verdict::Fine,
            format!(
                "{} mol of reactive gas fed per mol of substrate; the chemistry takes {} mmol/min of the {} mmol/min fed ({} %), the rest leaves at the outlet.",
                sig(equivalents),
                mmol_min(need),
                mmol_min(fed),
                format_significant(need / fed * 100.0, 3)
            ),
        )
    };
    if y < 1.0 && input.gas != crate::physics::gases::Gas::Air {
        reason.push_str(" The gas is diluted in nitrogen: as it is consumed its partial pressure, and with it the solubility, falls along the bed; the solubility here is at the feed composition.");
    }
    Check { key: "gas_supply", topic: "Gas supply", verdict, reason, caution: None }
}

fn transfer_check(input: &GasLiquidBedInput, a: &Assessment) -> Result<Check, GasLiquidBedError> {
    let key = "gas_transfer";
    let topic = "Gas transfer to the catalyst";
    if a.capacity.overall <= 0.0 {
        return Ok(Check {
            key,
            topic,
            verdict: Verdict::Problem,
            reason: "No gas dissolves at the outlet: the liquid's vapour pressure reaches the pressure there, so the gas space holds only vapour (see the boiling check). Raise the back-pressure or lower the temperature.".to_owned(),
            caution: None,
        });
    }
    let ratio = a.transfer_ratio();
    let c = &a.capacity;
    let gl_share = (1.0 / a.kla) / (1.0 / a.kla + 1.0 / (a.ks * a.conditions.at(a.conditions.outlet_pressure).specific_surface()));
    let step = if gl_share >= 0.5 {
        format!("the gas–liquid step takes {} % of the resistance", format_significant(gl_share * 100.0, 2))
    } else {
        format!("the liquid–solid step takes {} % of the resistance", format_significant((1.0 - gl_share) * 100.0, 2))
    };
    // A transfer limit costs conversion, not safety, and the coefficients are uncertain by an
    // order of magnitude or more: a caution, however large the shortfall.
    let (verdict, what) = if ratio > 1.0 {
        (Verdict::Caution, "On these estimates the reaction will be limited by gas transfer: the bed cannot bring the gas to the catalyst as fast as the chemistry needs it.")
    } else if ratio > TRANSFER_CAUTION_RATIO {
        (Verdict::Caution, "On these estimates gas transfer will slow the reaction: the dissolved gas stays below half of saturation.")
    } else {
        (Verdict::Fine, "Gas transfer is not expected to limit the reaction.")
    };
    let mut reason = format!(
        "{what} The chemistry needs {} mmol/min, {} % of the most the bed can transfer to the catalyst, {} mmol/min (gas–liquid {} mmol/min with k_L a = {} 1/s by Goto–Smith; liquid–solid {} mmol/min with k_s by Wilson–Geankoplis, fully wetted); {step}. C* = {} mmol/L at the outlet. Low confidence: both coefficients come from beds of millimetre particles, and k_L a measured in micro packed beds has been reported one to two orders of magnitude above such correlations (from memory, not checked); read this as a flag, not a prediction.",
        mmol_min(a.need),
        format_significant(ratio * 100.0, 3),
        mmol_min(c.overall),
        mmol_min(c.gas_liquid),
        sig(a.kla),
        mmol_min(c.liquid_solid),
        sig(a.solubility.value.get()),
    );
    if ratio > TRANSFER_CAUTION_RATIO {
        reason.push(' ');
        reason.push_str(&remedies::suggest(input, a)?);
    }
    Ok(Check { key, topic, verdict, reason, caution: None })
}
