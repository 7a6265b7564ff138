//! Checks on what the segmented pattern means for the chemistry: the liquid's real residence
//! time, slugs and gas fractions outside the correlations' fitted ranges, how the bubbles change
//! along the coil, and whether the gas supply and mass transfer keep up.

use super::cell::UnitCell;
use super::pressure_profile::Profile;
use super::{mass_transfer, van_baten_krishna};
use crate::physics::report::{Check, Figure, Verdict};
use crate::physics::units::format_significant;

/// Share of the liquid-only residence time below which the real one is flagged (a threshold of
/// this tool: common practice, no source).
pub const SHORT_RESIDENCE: f64 = 0.8;

/// Gas-holdup range of van Baten & Krishna's simulations (their Table 1).
pub const HOLDUP_RANGE: (f64, f64) = (0.136, 0.5);

/// Feed gas-fraction range of the Qian–Lawal length fit (from memory).
pub const GAS_FRACTION_RANGE: (f64, f64) = (0.09, 0.91);

/// Relative pressure drop above which the profile matters (common practice, no source).
pub const MARKED_EXPANSION: f64 = 0.1;

fn sig(v: f64) -> String {
    format_significant(v, 3)
}

/// A duration in seconds or minutes, whichever reads better.
pub fn duration(seconds: f64) -> String {
    if seconds < 120.0 { format!("{} s", sig(seconds)) } else { format!("{} min", sig(seconds / 60.0)) }
}

/// "a", "a and b", "a, b and c".
fn joined(items: &[String]) -> String {
    match items.split_last() {
        None => String::new(),
        Some((last, [])) => last.clone(),
        Some((last, rest)) => format!("{} and {last}", rest.join(", ")),
    }
}

/// Upper-cases the first letter and ends with a full stop.
fn sentence(text: &str) -> String {
    let mut chars = text.chars();
    match chars.next() {
        Some(first) => format!("{}{}.", first.to_uppercase(), chars.as_str()),
        None => String::new(),
    }
}

/// The liquid's segmented residence time `tau` against the liquid-only one `tau0` (both s) in a
/// coil of `length` m, with `equivalents` mol of reactive gas fed per mol of substrate.
pub fn residence_check(tau: f64, tau0: f64, length: f64, equivalents: f64) -> Check {
    let ratio = tau / tau0;
    let short = ratio < SHORT_RESIDENCE;
    let reason = if short {
        let lower_gas = if equivalents > 1.0 {
            format!(", lower the gas flow towards what the reaction needs ({} equivalents are fed),", sig(equivalents))
        } else {
            String::new()
        };
        format!(
            "The liquid spends {} in the coil, only {} % of the {} that the coil's volume over the liquid flow suggests: \
             the gas slugs take up {} of the tube, and the liquid between them moves at the bubble velocity. \
             Base reaction times on {}. For a longer time, lengthen the coil (about {} m of it would give the {}, with the \
             pressure drop growing in proportion){lower_gas} or raise the back-pressure, which compresses the gas (within \
             the pressure rating).",
            duration(tau),
            format_significant(ratio * 100.0, 2),
            duration(tau0),
            if ratio < 0.5 { "most" } else { "a good part" },
            duration(tau),
            sig(length / ratio),
            duration(tau0)
        )
    } else {
        format!(
            "The liquid spends {} in the coil, {} % of the {} that the coil's volume over the liquid flow suggests.",
            duration(tau),
            format_significant(ratio * 100.0, 2),
            duration(tau0)
        )
    };
    Check {
        key: "residence_time",
        topic: "Residence time of the liquid",
        verdict: if short { Verdict::Caution } else { Verdict::Fine },
        reason,
        caution: None,
    }
}

/// Slugs shorter than the bore and gas fractions outside the fitted ranges, from the profile and
/// the cells at the junction and the outlet.
pub fn pattern_check(profile: &Profile, junction: &UnitCell, outlet: &UnitCell) -> Check {
    let d = outlet.flow.diameter.si();
    let mm = |m: f64| sig(m * 1e3);
    let shortest = profile.slug_length.iter().copied().fold(junction.slug_length, f64::min);
    let mut problems = Vec::new();
    if shortest < d {
        problems.push(format!(
            "liquid slugs come out {} mm long, shorter than the {} mm bore: slugs under about one bore (common practice, no source) \
             hardly hold the recirculating liquid of Taylor flow and may merge or break up, and the shortest slugs the correlations \
             here were fitted on are about one bore long (Yue et al. 2009: L_S/D ≥ 1)",
            mm(shortest),
            mm(d)
        ));
    }
    let (lo, hi) = HOLDUP_RANGE;
    let (h_in, h_out) = (junction.holdup, outlet.holdup);
    if h_in.min(h_out) < lo || h_in.max(h_out) > hi {
        problems.push(format!(
            "the gas holdup runs from {} % at the inlet to {} % at the outlet, beyond the {}–{} % that van Baten & Krishna's \
             k_L a was simulated for",
            format_significant(h_in * 100.0, 3),
            format_significant(h_out * 100.0, 3),
            format_significant(lo * 100.0, 3),
            format_significant(hi * 100.0, 3)
        ));
    }
    let (b_lo, b_hi) = GAS_FRACTION_RANGE;
    let beta = junction.flow.gas_fraction();
    if !(b_lo..=b_hi).contains(&beta) {
        problems.push(format!(
            "the gas makes up {} % of the flow at the junction, outside the {}–{} % of the Qian–Lawal length fit (from memory)",
            format_significant(beta * 100.0, 3),
            format_significant(b_lo * 100.0, 2),
            format_significant(b_hi * 100.0, 2)
        ));
    }
    let verdict = if problems.is_empty() { Verdict::Fine } else { Verdict::Caution };
    let reason = if problems.is_empty() {
        format!(
            "Liquid slugs of {} mm (at least one bore) and a gas holdup of {}–{} % lie within the ranges the length and k_L a \
             correlations were fitted on.",
            mm(shortest),
            format_significant(h_in.min(h_out) * 100.0, 3),
            format_significant(h_in.max(h_out) * 100.0, 3)
        )
    } else {
        format!(
            "{} The segmented pattern and its length, pressure-drop and k_L a correlations are extrapolated here: read those \
             figures as rough, and measure the slug lengths if they matter. Longer slugs come with a lower gas-to-liquid flow \
             ratio or a junction as wide as the tube.",
            sentence(&problems.join("; "))
        )
    };
    Check { key: "slug_pattern", topic: "Slug lengths and fitted ranges", verdict, reason, caution: None }
}

/// How the pressure drop and the bubble length change from inlet to outlet, in words that follow
/// the sign.
pub fn expansion_check(profile: &Profile) -> Check {
    let ratio = profile.pressure_drop() / profile.outlet_pressure;
    let change = profile.bubble_length.last().zip(profile.bubble_length.first()).map_or(1.0, |(o, i)| o / i) - 1.0;
    let big = ratio > MARKED_EXPANSION;
    let bubbles = if change >= 0.0005 {
        format!("the bubbles grow by {} % from inlet to outlet as the gas expands", format_significant(change * 100.0, 2))
    } else if change <= -0.0005 {
        format!(
            "the bubbles shrink by {} % from inlet to outlet: the gas consumed outweighs its expansion",
            format_significant(-change * 100.0, 2)
        )
    } else {
        "the bubbles keep their length to within 0.05 % from inlet to outlet".to_owned()
    };
    Check {
        key: "gas_expansion",
        topic: "Gas expansion along the coil",
        verdict: if big { Verdict::Caution } else { Verdict::Fine },
        reason: format!(
            "The coil's pressure drop is {} % of the outlet pressure, and {bubbles} (integrated, isothermal ideal gas).{}",
            format_significant(ratio * 100.0, 2),
            if big {
                " Above about 10 % the gas flow, velocity and residence time change markedly along the coil (common practice, no source): read the profile, not single values."
            } else {
                ""
            }
        ),
        caution: None,
    }
}

/// Saturation against residence time `tau` (s) from the k_L a figure, the share of the fed gas
/// the liquid could dissolve and the gas equivalents.
pub fn mass_transfer_check(kla: &Figure, tau: f64, share: f64, equivalents: f64) -> Check {
    let mut notes = Vec::new();
    let mut verdict = Verdict::Fine;
    let t95 = mass_transfer::saturation_time(kla.value.get());
    let name = van_baten_krishna::INFO.name;
    if t95 > tau {
        verdict = Verdict::Caution;
        notes.push(format!(
            "the liquid needs about {} to reach 95 % saturation ({name} k_L a) but stays only {}: it leaves unsaturated, and a gas-consuming reaction may be limited by mass transfer",
            duration(t95),
            duration(tau)
        ));
    } else {
        notes.push(format!("the liquid reaches 95 % saturation in about {} ({name} k_L a) of its {} in the coil", duration(t95), duration(tau)));
    }
    let recommended = kla.estimates.iter().find(|e| e.recommended);
    let slowest = kla.estimates.iter().min_by(|a, b| a.value.get().total_cmp(&b.value.get()));
    if let (Some(rec), Some(slow)) = (recommended, slowest)
        && !rec.warnings.is_empty()
    {
        let quantities: Vec<String> = rec
            .warnings
            .iter()
            .map(|w| format!("the {}", w.quantity.split(" = ").next().unwrap_or(w.quantity)))
            .collect();
        let t_slow = mass_transfer::saturation_time(slow.value.get());
        let late = t_slow > tau;
        if late {
            verdict = Verdict::Caution;
        }
        notes.push(format!(
            "this k_L a is extrapolated ({} outside the ranges the model was checked on), and the slowest correlation in the spread, {}, needs about {}{}",
            joined(&quantities),
            slow.model.name,
            duration(t_slow),
            if late { ", longer than the liquid stays" } else { "" }
        ));
    }
    if share >= 1.0 {
        verdict = Verdict::Caution;
        notes.push(format!("the liquid could dissolve {} times the gas fed: bubbles may shrink or vanish, and the segmented-flow figures assume they persist", sig(share)));
    } else {
        notes.push(format!("the liquid can hold {} % of the gas fed at saturation", sig(share * 100.0)));
    }
    if equivalents < 1.0 {
        verdict = Verdict::Caution;
        notes.push(format!("only {} mol of gas per mol of substrate is fed: a reaction taking one gas molecule per substrate cannot go to completion", sig(equivalents)));
    }
    Check { key: "gas_supply", topic: "Gas supply and mass transfer", verdict, reason: sentence(&notes.join("; ")), caution: None }
}
