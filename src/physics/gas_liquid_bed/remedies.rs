//! What would lift a gas-transfer limit: each change the chemist controls (back-pressure, bed
//! length, liquid flow, particle size, gas flow) is sized to bring the need down to half the
//! largest transfer rate, then re-evaluated in full. A change is offered only if the inlet
//! pressure stays within the ratings and the tubing, and it takes no correlation outside a range
//! it was inside before; otherwise the reason is said, and when nothing works, what does.

use super::mass_transfer::{self, LiquidSolidModel};
use super::{Assessment, Demand, GasLiquidBedError, GasLiquidBedInput, assess, checks::TRANSFER_CAUTION_RATIO, transfer};
use crate::physics::gases::henry;
use crate::physics::numeric::{Tolerance, brent};
use crate::physics::report::{RangeWarning, Verdict, budget_verdict};
use crate::physics::units::{Length, PressureDifference, VolumetricFlow, format_significant};

/// Lowest liquid flow suggested, 0.01 mL/min, m³/s: about the bottom of a lab HPLC-type pump's
/// range (common practice, no source).
pub const LOWEST_PUMP_FLOW: f64 = 0.01e-6 / 60.0;
/// Longest bed suggested, 250 mm: about the longest lab cartridge or packed column (common
/// practice, no source).
pub const LONGEST_BED: f64 = 0.25;
/// Largest factor by which a remedy raises the liquid flow.
pub const LARGEST_FLOW_FACTOR: f64 = 100.0;
/// Smallest factor by which a remedy shrinks the particles.
pub const SMALLEST_SIZE_FACTOR: f64 = 1.0 / 30.0;

const SEARCH: Tolerance = Tolerance { absolute: 0.0, relative: 1e-9, max_iterations: 200 };

fn sig(v: f64) -> String {
    format_significant(v, 3)
}

fn bar(pa: f64) -> String {
    format_significant(pa / 1e5, 3)
}

/// A change tried: offered with its wording, or refused with the reason.
enum Outcome {
    Offered(String),
    Refused(String),
}

fn range_keys(a: &Assessment) -> Result<Vec<(&'static str, &'static str)>, GasLiquidBedError> {
    let outlet = a.conditions.at(a.conditions.outlet_pressure);
    let mut w: Vec<RangeWarning> = a.recommended()?.warnings.clone();
    w.extend(mass_transfer::RECOMMENDED.warnings(&outlet));
    Ok(w.iter().map(|w| (w.model, w.quantity)).collect())
}

/// Re-evaluates a changed setup: `Ok(None)` if it is admissible, else the reason it is not.
fn refusal(changed: &GasLiquidBedInput, base: &Assessment) -> Result<Option<String>, GasLiquidBedError> {
    let a = assess(changed)?;
    if a.transfer_ratio() > TRANSFER_CAUTION_RATIO * (1.0 + 1e-6) {
        return Ok(Some("it would not bring the need below half the transfer capacity".to_owned()));
    }
    let (inlet, worst) = a.inlet_gauge(changed.ambient)?;
    let rating = changed.rating.si();
    if budget_verdict(inlet / rating, worst / rating) == Verdict::Problem {
        return Ok(Some(format!("the inlet would reach {} bar(g), over the {} bar(g) of the {}", bar(inlet), bar(rating), changed.rating_part)));
    }
    if let Some(tubing) = &changed.tubing {
        let check = crate::physics::tubing::check(tubing, PressureDifference::from_si(inlet), &changed.liquid.solvents());
        if check.verdict == Verdict::Problem {
            return Ok(Some(format!("the inlet would reach {} bar(g), over what the tubing takes", bar(inlet))));
        }
    }
    let before = range_keys(base)?;
    let new: Vec<String> = range_keys(&a)?.into_iter().filter(|k| !before.contains(k)).map(|(m, q)| format!("{q} of {m}")).collect();
    if !new.is_empty() {
        return Ok(Some(format!("it would leave the fitted range ({})", new.join("; "))));
    }
    Ok(None)
}

fn judged(changed: &GasLiquidBedInput, base: &Assessment, offer: String, what: &str) -> Result<Outcome, GasLiquidBedError> {
    Ok(match refusal(changed, base)? {
        None => Outcome::Offered(offer),
        Some(why) => Outcome::Refused(format!("{what}: {why}")),
    })
}

fn back_pressure(input: &GasLiquidBedInput, base: &Assessment, factor: f64) -> Result<Outcome, GasLiquidBedError> {
    let (_, y) = input.reactive();
    let p_sat = input.properties.vapour_pressure;
    let partial = henry::partial_pressure(y, input.outlet_pressure(), p_sat).si();
    if partial <= 0.0 {
        return Ok(Outcome::Refused("a higher back-pressure: the liquid's vapour fills the gas at this pressure".to_owned()));
    }
    // C* is proportional to the partial pressure and nothing else in the capacity depends on it.
    let outlet = partial * factor / y + p_sat.map_or(0.0, |p| p.si());
    let mut changed = *input;
    changed.back_pressure = PressureDifference::from_si(outlet - input.ambient.si());
    let offer = format!(
        "raise the back-pressure to {} bar(g) (the solubility rises in proportion to the gas's partial pressure, Henry's law)",
        bar(changed.back_pressure.si())
    );
    judged(&changed, base, offer, &format!("a back-pressure of {} bar(g)", bar(changed.back_pressure.si())))
}

fn bed_length(input: &GasLiquidBedInput, base: &Assessment, factor: f64) -> Result<Outcome, GasLiquidBedError> {
    if let Demand::Rate { .. } = input.demand {
        return Ok(Outcome::Refused("a longer bed: with the uptake entered for the whole bed, more catalyst needs more gas too".to_owned()));
    }
    let mut changed = *input;
    changed.bed_length = Length::from_si(input.bed_length.si() * factor);
    let l = format_significant(changed.bed_length.mm(), 3);
    if changed.bed_length.si() > LONGEST_BED {
        return Ok(Outcome::Refused(format!(
            "a {l} mm bed: longer than a lab cartridge or column ({} mm, common practice, no source)",
            format_significant(LONGEST_BED * 1e3, 3)
        )));
    }
    judged(&changed, base, format!("lengthen the bed to {l} mm (the transfer capacity grows with the bed volume; two cartridges in series count as one longer bed)"), &format!("a {l} mm bed"))
}

fn ratio_at(base: &Assessment, changed: &GasLiquidBedInput) -> Result<f64, GasLiquidBedError> {
    let p = &changed.particles;
    let voidage = p.voidage.resolve(p.shape, p.particle_diameter, changed.tube_diameter)?;
    let (_, _, capacity, need) = transfer(changed, &voidage, base.diffusivity.value.get(), base.solubility.value.get());
    Ok(need / capacity.overall)
}

/// Solves `ratio(x) = TRANSFER_CAUTION_RATIO` for x in [low, high] (log scale); `None` without a
/// sign change or if the search fails.
fn solve_for<F: Fn(f64) -> Result<f64, GasLiquidBedError>>(ratio: F, low: f64, high: f64) -> Result<Option<f64>, GasLiquidBedError> {
    let g = |x: f64| ratio(x).map(|r| r / TRANSFER_CAUTION_RATIO - 1.0);
    let (g_low, g_high) = (g(low)?, g(high)?);
    if g_low.signum() == g_high.signum() {
        return Ok(None);
    }
    // A failed search leaves the change unsized (and so not offered), never a wrong number.
    Ok(brent(|lx| g(lx.exp()).unwrap_or(f64::NAN), low.ln(), high.ln(), SEARCH).ok().map(f64::exp))
}

fn liquid_flow(input: &GasLiquidBedInput, base: &Assessment) -> Result<Outcome, GasLiquidBedError> {
    let q = input.liquid_flow.si();
    let with = |x: f64| {
        let mut c = *input;
        c.liquid_flow = VolumetricFlow::from_si(x);
        c
    };
    let ml = |x: f64| format_significant(VolumetricFlow::from_si(x).ml_per_min(), 3);
    let (low, high, direction) = match input.demand {
        Demand::Conversion { .. } => (LOWEST_PUMP_FLOW.max(q / 1e4).min(q), q, "lower"),
        Demand::Rate { .. } => (q, q * LARGEST_FLOW_FACTOR, "higher"),
    };
    if low >= high {
        return Ok(Outcome::Refused(format!("a {direction} liquid flow: already at the lowest practical flow")));
    }
    let Some(x) = solve_for(|x| ratio_at(base, &with(x)), low, high)? else {
        let limit = if direction == "lower" { low } else { high };
        return Ok(Outcome::Refused(format!("a {direction} liquid flow: not enough even at {} mL/min", ml(limit))));
    };
    let why = if direction == "lower" { "the liquid then needs less gas per minute, while k_L a falls more slowly" } else { "k_L a and k_s rise with the liquid flux" };
    judged(&with(x), base, format!("{direction} the liquid flow to {} mL/min ({why})", ml(x)), &format!("{} mL/min of liquid", ml(x)))
}

fn particle_size(input: &GasLiquidBedInput, base: &Assessment) -> Result<Outcome, GasLiquidBedError> {
    if base.capacity.gas_liquid * TRANSFER_CAUTION_RATIO < base.need {
        return Ok(Outcome::Refused(
            "smaller particles: the gas–liquid step alone falls short, and its correlation (Goto–Smith) has no particle-size term".to_owned(),
        ));
    }
    let scaled = |s: f64| {
        let mut c = *input;
        c.particles.particle_diameter = Length::from_si(input.particles.particle_diameter.si() * s);
        c.particles.distribution = input.particles.distribution.map(|d| d.map(|l| Length::from_si(l.si() * s)));
        c
    };
    let Some(s) = solve_for(|s| ratio_at(base, &scaled(s)), SMALLEST_SIZE_FACTOR, 1.0)? else {
        return Ok(Outcome::Refused(format!("smaller particles: not enough even at {} of the present size", sig(SMALLEST_SIZE_FACTOR))));
    };
    let changed = scaled(s);
    let um = format_significant(changed.particles.particle_diameter.si() * 1e6, 3);
    let which = if input.particles.distribution.is_some() { " (d10)" } else { "" };
    judged(
        &changed,
        base,
        format!("use particles of {um} µm{which} (more outer surface per bed volume and a higher k_s by {})", LiquidSolidModel::WilsonGeankoplis.info().name),
        &format!("{um} µm particles"),
    )
}

/// The sentences on what would help, sized for this setup.
pub fn suggest(input: &GasLiquidBedInput, base: &Assessment) -> Result<String, GasLiquidBedError> {
    let factor = base.transfer_ratio() / TRANSFER_CAUTION_RATIO;
    let tried = [back_pressure(input, base, factor)?, bed_length(input, base, factor)?, liquid_flow(input, base)?, particle_size(input, base)?];
    let (mut offered, mut refused) = (Vec::new(), Vec::new());
    for t in tried {
        match t {
            Outcome::Offered(s) => offered.push(s),
            Outcome::Refused(s) => refused.push(s),
        }
    }
    let gas = "A higher gas flow does not help on these correlations: k_L a depends on the liquid flux only.";
    let mut text = if offered.is_empty() {
        let works = match input.demand {
            Demand::Conversion { conversion } => format!(
                "What does work: a lower substrate concentration, about {} mol/L (the bed then needs proportionally less gas); or accepting at most about {} % conversion per pass at this concentration; or a reactor with far more gas–liquid area per volume of liquid (segmented flow in a coil, on the gas–liquid tab).",
                sig(input.concentration.si() / 1e3 / factor),
                format_significant((conversion / base.transfer_ratio() * 100.0).min(100.0), 2)
            ),
            Demand::Rate { .. } => "What does work: less catalyst activity per bed volume (catalyst diluted with inert particles over a longer bed), or a reactor with far more gas–liquid area per volume of liquid (segmented flow in a coil, on the gas–liquid tab).".to_owned(),
        };
        format!("No change tried brings the need below half the capacity within the ratings, the practical limits and the correlations' ranges — {}. {works}", refused.join("; "))
    } else {
        let mut t = format!("Any one of these would bring the need below half the capacity: {}.", offered.join("; or "));
        if !refused.is_empty() {
            t.push_str(&format!(" Not offered: {}.", refused.join("; ")));
        }
        t
    };
    text.push(' ');
    text.push_str(gas);
    Ok(text)
}
