//! What would fix a cartridge that fails its pressure budget, lifts in up-flow or misses a sizing
//! target, solved with the recommended pressure-drop model and kept within what lab hardware
//! does: the pump's largest flow, packings of 10 µm and up, cartridges of 2–50 mm ID and 10–300 mm
//! of bed ([`crate::physics::practical`]). Where no practical value exists, the advice says so
//! and names what works.

use super::flow::BedFlow;
use super::pressure_drop::RECOMMENDED;
use super::{FlowDirection, PackedBedInput, geometry};
use crate::physics::numeric::{Tolerance, brent};
use crate::physics::practical::{CARTRIDGE_DIAMETER, CARTRIDGE_LENGTH, FINEST_PACKING};
use crate::physics::report::{AdviceKind, AdviceList, PRESSURE_MARGIN};
use crate::physics::units::{Length, VolumetricFlow, format_significant};

fn ml_min(q: f64) -> String {
    format_significant(VolumetricFlow::from_si(q).ml_per_min(), 3)
}

fn mm(l: f64) -> String {
    format_significant(l * 1e3, 3)
}

fn um(l: f64) -> String {
    format_significant(l * 1e6, 3)
}

/// The bed with another flow, particle size (volume-equivalent, voidage re-resolved when it is
/// estimated) or bore; `None` where the voidage estimate fails.
fn variant(input: &PackedBedInput, bed: &BedFlow, flow: Option<f64>, particle: Option<f64>, bore: Option<f64>) -> Option<BedFlow> {
    let d_t = bore.map_or(input.tube_diameter, Length::from_si);
    let d_v = particle.map_or(input.particle_diameter, Length::from_si);
    let q = flow.unwrap_or(input.flow.si());
    let voidage = input.voidage.resolve(input.shape, d_v, d_t).ok()?.value;
    Some(BedFlow {
        particle_diameter: input.shape.effective_diameter(d_v),
        voidage,
        superficial_velocity: geometry::superficial_velocity(VolumetricFlow::from_si(q), d_t),
        tube_diameter: d_t,
        ..*bed
    })
}

fn dp(bed: Option<BedFlow>) -> f64 {
    bed.map_or(f64::NAN, |b| RECOMMENDED.pressure_drop(&b).si())
}

/// Changes that bring the inlet pressure within 80 % of the rating: a lower flow, coarser
/// particles (d10), a shorter bed or a wider cartridge; `key` is the pressure check's key.
pub fn pressure(input: &PackedBedInput, bed: &BedFlow, rating: f64, advice: &mut AdviceList, key: &'static str) {
    let allowed = PRESSURE_MARGIN * rating - input.back_pressure.si();
    let now = dp(Some(*bed));
    if allowed <= 0.0 {
        advice.add(key, AdviceKind::NoneExists, format!(
            "No change to the bed helps: the back-pressure alone takes {} % of the {} bar(g) limit. Lower the back-pressure or use parts rated higher.",
            format_significant(input.back_pressure.si() / rating * 100.0, 3),
            format_significant(rating / 1e5, 3)
        ));
        return;
    }
    if now <= allowed {
        return;
    }
    let log_residual = |value: f64| (value / allowed).ln();
    // Flow: ΔP rises with Q; any flow a pump gives down to the root works.
    let q = input.flow.si();
    if let Ok(ln_q) = brent(|x| log_residual(dp(variant(input, bed, Some(x.exp()), None, None))), (q * 1e-6).ln(), q.ln(), Tolerance::TIGHT) {
        advice.add(key, AdviceKind::Remedy, format!(
            "Lower the flow to {} mL/min or less: the bed drop then leaves a 20 % margin (Ergun); the residence time rises in proportion.",
            ml_min(ln_q.exp())
        ));
    }
    // Coarser particles, up to a tenth of the bore (beyond, the wall channels the flow).
    let d = input.particle_diameter.si();
    let coarsest = input.tube_diameter.si() / 10.0;
    if coarsest > d {
        match brent(|x| log_residual(dp(variant(input, bed, None, Some(x.exp()), None))), d.ln(), coarsest.ln(), Tolerance::TIGHT) {
            Ok(ln_d) => advice.add(key, AdviceKind::Remedy, format!(
                "Use particles of {} µm or more{} (sieve off the fines): the bed drop then leaves a 20 % margin.",
                um(ln_d.exp()),
                if input.distribution.is_some() { " at d10" } else { "" }
            )),
            Err(_) => advice.add(key, AdviceKind::NoneExists, format!(
                "No particle size up to a tenth of the {} mm bore keeps the bed drop within the margin at this flow.",
                mm(input.tube_diameter.si())
            )),
        }
    }
    // ΔP ∝ L.
    let shorter = input.bed_length.si() * allowed / now;
    if shorter >= CARTRIDGE_LENGTH.0 {
        advice.add(key, AdviceKind::Remedy, format!(
            "Shorten the bed to {} mm or less (the drop is proportional to its length); the residence time and capacity fall with it.",
            mm(shorter)
        ));
    }
    // Wider cartridge within the lab range.
    let d_t = input.tube_diameter.si();
    if d_t < CARTRIDGE_DIAMETER.1
        && let Ok(ln_b) = brent(|x| log_residual(dp(variant(input, bed, None, None, Some(x.exp())))), d_t.ln(), CARTRIDGE_DIAMETER.1.ln(), Tolerance::TIGHT)
    {
        advice.add(key, AdviceKind::Remedy, format!(
            "Use a cartridge of {} mm ID or wider with the same bed length: the slower flow through it leaves a 20 % margin.",
            mm(ln_b.exp())
        ));
    }
}

/// Changes that keep a bed from lifting in up-flow: a flow below the lowest correlation's
/// minimum fluidisation velocity, confinement, or down-flow.
pub fn lifting(input: &PackedBedInput, lowest_umf: Option<f64>, advice: &mut AdviceList, key: &'static str) {
    if input.direction == FlowDirection::Down {
        return;
    }
    if let Some(u) = lowest_umf {
        let q = u * crate::physics::pipe_flow::bore_area(input.tube_diameter);
        advice.add(key, AdviceKind::Remedy, format!(
            "Keep the upward flow below {} mL/min, the minimum fluidisation flow by the lowest correlation.",
            ml_min(q)
        ));
    }
    if input.direction == FlowDirection::UpFree {
        advice.add(key, AdviceKind::Alternative, "Hold the bed between frits or spacers with no headspace, so that it cannot rise.");
    }
    advice.add(key, AdviceKind::Alternative, "Run the cartridge in down-flow: the flow then presses the bed onto the outlet frit.");
}

/// A lab cartridge for a target residence time within a pressure-drop limit, for these
/// particles: the narrowest bore whose bed drop is within the limit and whose bed length lies in
/// the practical range. Returns the bore, the bed length and its drop, or `None` with the
/// reason in words.
pub fn practical_cartridge(input: &PackedBedInput, bed: &BedFlow, residence_time: f64, limit: f64) -> Result<(f64, f64, f64), String> {
    let q = input.flow.si();
    let at = |d_t: f64| -> Option<(f64, f64)> {
        let b = variant(input, bed, None, None, Some(d_t))?;
        let length = residence_time * q / (b.voidage.si() * std::f64::consts::PI * d_t * d_t / 4.0);
        let sized = BedFlow { length: Length::from_si(length), ..b };
        Some((length, RECOMMENDED.pressure_drop(&sized).si()))
    };
    let (low, high) = CARTRIDGE_DIAMETER;
    // The drop and the length both fall as the bore widens: the narrowest practical bore is the
    // larger of the bores where each just meets its limit.
    let length_root = |target: f64| brent(|x| at(x.exp()).map_or(f64::NAN, |(l, _)| (l / target).ln()), low.ln(), high.ln(), Tolerance::TIGHT).map(f64::exp);
    let dp_root = brent(|x| at(x.exp()).map_or(f64::NAN, |(_, p)| (p / limit).ln()), low.ln(), high.ln(), Tolerance::TIGHT).map(f64::exp);
    let mut narrowest = low;
    for bound in [length_root(CARTRIDGE_LENGTH.1), dp_root] {
        match bound {
            Ok(d) => narrowest = narrowest.max(d),
            Err(crate::physics::numeric::RootError::NoBracket { f_low, .. }) if f_low < 0.0 => {}
            Err(_) => {
                return Err(format!(
                    "no lab cartridge up to {} mm ID holds the bed within {} mm of length and the drop limit",
                    mm(high),
                    mm(CARTRIDGE_LENGTH.1)
                ));
            }
        }
    }
    // Walls channel the flow below ten particle diameters.
    narrowest = narrowest.max(10.0 * input.particle_diameter.si());
    let (length, drop) = at(narrowest).ok_or_else(|| "the voidage estimate fails for these particles".to_owned())?;
    if narrowest > high {
        return Err(format!("it would need more than {} mm ID", mm(high)));
    }
    if length < CARTRIDGE_LENGTH.0 {
        return Err(format!(
            "at the narrowest bore the limits allow ({} mm) the bed is only {} mm long, shorter than a lab cartridge's {} mm",
            mm(narrowest),
            mm(length),
            mm(CARTRIDGE_LENGTH.0)
        ));
    }
    Ok((narrowest, length, drop))
}

/// Whether particles of the size found by sizing are practical to pack; the finest ones that keep
/// the limit are a floor, not a target.
pub fn finest_packing_note(smallest: f64) -> Option<String> {
    (smallest < FINEST_PACKING).then(|| {
        format!(
            "Every practical packing from {} µm up stays within the limit (finer particles pass or blind the usual frits; common practice, no source).",
            um(FINEST_PACKING)
        )
    })
}
