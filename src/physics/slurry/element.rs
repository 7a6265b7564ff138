//! The line evaluated element by element: velocities and residence times, settling across the bore
//! or against the flow, deposition over the size distribution, resuspension, clogging, pressure
//! drop, and for a failing element the change that would fix it (solved with Brent's method).

use super::keys::{self, ElementKey};
use super::size_distribution::{ParticleSize, SizeClass};
use super::{
    ElementKind, LineElement, Orientation, PIPE_REYNOLDS, SlurryInput, TUBE_DIAMETER, clogging, durand, fuchs_thomas,
    krieger_dougherty, oroskar_turian, shields, vertical, viscosity,
};
use crate::physics::numeric::{RootError, Tolerance, brent};
use crate::physics::pipe_flow::{self, hagen_poiseuille};
use crate::physics::diagram::{Column, Diagram, LineDiagram, LinePart, node_pressures};
use crate::physics::practical::{FINEST_MILLED_D90, LAMINAR_REYNOLDS, SMALLEST_BORE};
use crate::physics::report::{AdviceKind, AdviceList, Check, Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning, Report, Verdict, budget_note, budget_verdict};
use crate::physics::settling::drag::terminal_velocity_spread;
use crate::physics::settling::hindered::{HinderedModel, Suspension, hindered_velocity_spread};
use crate::physics::settling::{Drift, range_warnings};
use crate::physics::units::{Dimension, DynamicViscosity, Length, VolumetricFlow, format_significant};

/// Mass fraction reaching the wall below which a horizontal element is fine (this tool's
/// threshold: common practice, no source).
pub const DEPOSIT_CAUTION: f64 = 0.01;
/// Mass fraction reaching the wall from which a horizontal element is a problem unless the layer
/// is moved along (Z ≈ 0.1, about 12 %; common practice, no source).
pub const DEPOSIT_PROBLEM: f64 = 0.1;
/// Up-flow margin: U ≥ 5 v_h keeps the wall zone slower than the particles below 10 % of the bore
/// area (this tool's margin: common practice, no source).
pub const UPFLOW_MARGIN: f64 = 5.0;

/// Metadata of definitions used for figures.
pub const SETTLE_TIME_INFO: ModelInfo =
    ModelInfo { name: "Time to settle across the bore", formula: "t = D / v_h (worst case: from the top of the bore)", source: "definition", validity: &[] };
/// Residence time of the liquid.
pub const RESIDENCE_INFO: ModelInfo = ModelInfo { name: "Liquid residence time", formula: "τ = L / U", source: "definition", validity: &[] };
/// Solids volume fraction from the loading.
pub const FRACTION_INFO: ModelInfo =
    ModelInfo { name: "Solids volume fraction", formula: "φ = (w/ρ_p) / (w/ρ_p + (1 − w)/ρ) for a mass fraction w", source: "definition", validity: &[] };
/// Fixes solved for.
pub const FIX_INFO: ModelInfo = ModelInfo {
    name: "Solved with Brent's method",
    formula: "the flow or particle size at which the element's criterion is just met, within the pump's largest flow, laminar flow (Re ≤ 2000) and the finest millable d90 (5 µm)",
    source: "this tool's thresholds and practical limits (common practice, no source) on the correlations named in the check",
    validity: &[],
};
/// Narrowest passage.
pub const NARROWEST_INFO: ModelInfo = ModelInfo { name: "Narrowest passage", formula: "min over elements of the opening W", source: "definition", validity: &[] };
/// Inlet pressure.
pub const INLET_INFO: ModelInfo = ModelInfo {
    name: "Pressure balance",
    formula: "p_in = p_back + Σ ΔP_element (gauge; Hagen–Poiseuille with the suspension viscosity; frits, entrance losses and hydrostatics not included)",
    source: "definition",
    validity: &[],
};

/// Ways of running that keep solids moving whatever the element (alternatives, with their conditions).
const SEGMENTATION: &str = "Segment the slurry with gas or an immiscible liquid: the circulation inside each slug keeps particles \
suspended, provided the slugs are shorter than a few bore diameters (size them on the gas–liquid tab; common practice, \
no source).";
const SONICATION: &str = "Immerse the line, or its narrowest part, in an ultrasound bath: it breaks bridges and loosens deposits \
(reported by Hartman et al., Org. Process Res. Dev. 2010, 14, 1347, abstract).";
const STIRRED_FEED: &str = "Keep the feed stirred and the line short and steep where you can; flush with clean solvent before \
stopping the flow, since deposits grow fastest when the flow stops (common practice, no source).";

/// The caution beside a clogging or settling problem: what a plug does with a positive-displacement pump.
pub const PLUG_CAUTION: &str = "A plug here stops the flow while a positive-displacement pump keeps pushing: the pressure \
rises to the pump limit or until the weakest part fails, spraying hot, possibly toxic liquid. \
Set a pump pressure limit or relief, watch the pressure trend, keep a flush and bypass ready, \
and follow local codes and institutional rules.";


fn um(d: f64) -> String {
    format_significant(d * 1e6, 3)
}

fn mm_s(v: f64) -> String {
    format_significant(v * 1e3, 3)
}

fn ml_min(q: f64) -> String {
    format_significant(VolumetricFlow::from_si(q).ml_per_min(), 3)
}

fn fig(k: &ElementKey, dimension: Dimension, model: ModelInfo, value: f64, warnings: Vec<RangeWarning>) -> Result<Figure, NumericalError> {
    Figure::single(k.key, k.label, dimension, model, value, warnings)
}

/// What the line knows before looking at an element (shared with the operating map).
pub(super) struct Line<'a> {
    pub(super) input: &'a SlurryInput,
    pub(super) phi: f64,
    pub(super) mu_s: f64,
    pub(super) drift: Drift,
    pub(super) classes: Vec<SizeClass>,
    pub(super) largest: Length,
}

impl<'a> Line<'a> {
    /// The line of `input`, with its suspension-viscosity figure (every model's estimate).
    pub(super) fn new(input: &'a SlurryInput) -> Result<(Self, Figure), NumericalError> {
        let phi = input.volume_fraction();
        let mu_fig = viscosity::suspension_viscosity_spread(input.viscosity, phi)?;
        let mu_s = mu_fig.value.get();
        let largest = input.size.largest();
        let drift = input.particle(largest).drift();
        Ok((Line { input, phi, mu_s, drift, classes: input.size.classes(), largest }, mu_fig))
    }

    /// Flow at which a tube of bore `d` reaches the laminar limit (Re = 2000 with the suspension
    /// viscosity): the top of the range of the laminar deposition and resuspension results.
    fn laminar_flow_limit(&self, d: f64) -> f64 {
        LAMINAR_REYNOLDS * self.mu_s * std::f64::consts::PI * d / (4.0 * self.input.density.si())
    }

    /// The largest flow a remedy may ask of bore `d`: the pump's largest flow or the laminar
    /// limit, whichever is lower, with the words that say which.
    fn flow_ceiling(&self, d: f64) -> (f64, String) {
        let laminar = self.laminar_flow_limit(d);
        let pump = self.input.pump_max_flow.si();
        if pump <= laminar {
            (pump, format!("the pump's largest flow, {} mL/min", ml_min(pump)))
        } else {
            (laminar, format!("{} mL/min, where the flow in this bore stops being laminar (Re = 2000) and the laminar results used here end", ml_min(laminar)))
        }
    }

    /// Hindered settling speed (Richardson–Zaki on the recommended drag law) of particles of
    /// diameter `d` in a passage of bore `bore`.
    pub(super) fn hindered(&self, d: Length, bore: Length) -> Result<f64, NumericalError> {
        Ok(self.suspension(d, bore).hindered(HinderedModel::RichardsonZaki)?.velocity.si())
    }

    /// Particles of diameter `d` at the line's solids fraction in a passage of bore `bore`.
    pub(super) fn suspension(&self, d: Length, bore: Length) -> Suspension {
        Suspension { particle: self.input.particle(d), solids_fraction: self.phi, tube_diameter: bore }
    }

    fn delta_rho(&self) -> f64 {
        self.input.particle(self.largest).density_difference()
    }
}

/// Mass fraction deposited in a horizontal element over the classes, for speeds `speeds` (one per
/// class), at mean velocity `u`.
pub(super) fn deposited_mass_fraction(classes: &[SizeClass], speeds: &[f64], e: &LineElement, u: f64) -> f64 {
    deposition(classes, speeds, e).fraction(u)
}

/// The deposition of `classes` settling at `speeds` in element `e`, prepared for many velocities
/// (the map's and the flow remedy's; [`deposited_mass_fraction`] is one velocity of it).
pub(super) fn deposition(classes: &[SizeClass], speeds: &[f64], e: &LineElement) -> fuchs_thomas::Deposition {
    fuchs_thomas::Deposition::new(classes.iter().map(|c| c.weight), speeds, e.length.si(), e.inner_diameter.si())
}

/// Fraction deposited over `passes` passes when each pass deposits `per_pass` of what reaches
/// the element: 1 − (1 − η)ⁿ (the reservoir is stirred, so every pass starts uniform).
pub fn over_passes(per_pass: f64, passes: u32) -> f64 {
    // One pass is the fraction itself (no power to take, and no rounding through 1 − (1 − η)).
    if passes == 1 { per_pass } else { 1.0 - (1.0 - per_pass).powf(f64::from(passes)) }
}

/// Settling verdict of a horizontal element from the mass fraction reaching the wall `eta` and
/// the d90 Shields number `theta`: fine below 1 %, caution below 10 % or while the layer is
/// pushed along, a problem otherwise.
pub(super) fn horizontal_verdict(eta: f64, theta: f64) -> Verdict {
    if eta < DEPOSIT_CAUTION {
        Verdict::Fine
    } else if theta > shields::CRITICAL_SHIELDS || eta < DEPOSIT_PROBLEM {
        Verdict::Caution
    } else {
        Verdict::Problem
    }
}

/// Settling verdict of an up-flow element: a problem when the d90 particles are not `carried`
/// or pack (`holdup` at the maximum packing), caution below the margin U ≥ 5 v_h.
pub(super) fn up_flow_verdict(carried: bool, holdup: f64, u: f64, v90: f64) -> Verdict {
    if !carried || holdup >= krieger_dougherty::MAX_PACKING {
        Verdict::Problem
    } else if u < UPFLOW_MARGIN * v90 {
        Verdict::Caution
    } else {
        Verdict::Fine
    }
}

/// Clogging verdict of a passage from its passage-to-d90 ratio and the solids fraction.
pub(super) fn clogging_verdict(ratio: f64, phi: f64) -> Verdict {
    match clogging::risk(ratio) {
        clogging::ClogRisk::Sieving | clogging::ClogRisk::Bridging => Verdict::Problem,
        clogging::ClogRisk::SmallMargin => Verdict::Caution,
        clogging::ClogRisk::Clear if phi > clogging::CONCENTRATED_FRACTION => Verdict::Caution,
        clogging::ClogRisk::Clear => Verdict::Fine,
    }
}

/// Pressure-budget verdict from the inlet pressure (recommended viscosity model), the
/// back-pressure, the highest line drop over the viscosity models and the rating (all gauge).
pub(super) fn pressure_verdict(inlet: f64, back: f64, worst_drop: f64, rating: f64) -> Verdict {
    budget_verdict(inlet / rating, (back + worst_drop) / rating)
}

/// How the particles move relative to an element of orientation `o`: particles lighter than the
/// liquid rise, so up-flow then carries them ahead (as down-flow does sinking ones) and down-flow
/// holds them back.
pub(super) fn effective_orientation(o: Orientation, drift: Drift) -> Orientation {
    match (o, drift) {
        (Orientation::Up, Drift::Rises) => Orientation::Down,
        (Orientation::Down, Drift::Rises) => Orientation::Up,
        (o, _) => o,
    }
}

/// Line pressure drop at `flow` with the suspension viscosity `mu_s`: Hagen–Poiseuille summed over
/// the elements in flow order, frits left out.
pub(super) fn line_drop(elements: &[LineElement], mu_s: f64, flow: VolumetricFlow) -> f64 {
    elements
        .iter()
        .filter(|e| e.kind != ElementKind::Frit)
        .map(|e| hagen_poiseuille::pressure_drop(DynamicViscosity::from_si(mu_s), e.length, e.inner_diameter, flow).si())
        .sum::<f64>()
}

/// The line drop `total` (recommended viscosity `mu_s`) for the viscosity model of estimate `m`:
/// Hagen–Poiseuille is linear in μ, so the total scales (the recommended one is `total` itself).
pub(super) fn drop_for_model(total: f64, m: &Estimate, mu_s: f64) -> f64 {
    if m.recommended { total } else { total * m.value.get() / mu_s }
}

struct ElementResult {
    settling: Verdict,
    clogging: Verdict,
}

/// The quantities listed for every element in the line's table, with the per-element figure
/// tables they come from.
const LINE_COLUMNS: [(&[keys::ElementKey; keys::MAX_ELEMENTS], Column); 6] = [
    (&keys::MEAN_VELOCITY, Column { label: "Velocity", dimension: Dimension::Velocity }),
    (&keys::RESIDENCE_TIME, Column { label: "Residence time", dimension: Dimension::Duration }),
    (&keys::DEPOSITED_FRACTION, Column { label: "Reaching the wall", dimension: Dimension::Fraction }),
    (&keys::SHIELDS_NUMBER, Column { label: "Shields number", dimension: Dimension::Number }),
    (&keys::PASSAGE_RATIO, Column { label: "Passage / d90", dimension: Dimension::Number }),
    (&keys::PRESSURE_DROP, Column { label: "Pressure drop", dimension: Dimension::PressureDifference }),
];

/// The line drawn: each element with its verdict, size and key quantities, and the gauge pressure
/// at every node from the back-pressure upstream.
fn line_diagram(input: &SlurryInput, results: &[ElementResult], figures: &[Figure], outlet: f64) -> Result<LineDiagram, NumericalError> {
    let value = |key: &str| figures.iter().find(|f| f.key == key).map(|f| f.value);
    let mut parts = Vec::with_capacity(results.len());
    let mut drops = Vec::with_capacity(results.len());
    for (i, (e, r)) in input.elements.iter().zip(results).enumerate() {
        drops.push(value(keys::PRESSURE_DROP[i].key).map_or(0.0, Finite::get));
        parts.push(LinePart {
            kind: e.kind.word(),
            bore: Finite::new("bore", e.inner_diameter.si())?,
            length: Finite::new("length", e.length.si())?,
            orientation: match e.orientation {
                Orientation::Horizontal => "horizontal",
                Orientation::Up => "up",
                Orientation::Down => "down",
            },
            verdict: r.settling.max(r.clogging),
            checks: vec![keys::SETTLING[i].key, keys::CLOGGING[i].key],
            values: LINE_COLUMNS.iter().map(|(table, _)| value(table[i].key)).collect(),
        });
    }
    let narrowest = input.elements.iter().enumerate().min_by(|a, b| a.1.inner_diameter.si().total_cmp(&b.1.inner_diameter.si())).map(|(i, _)| i);
    Ok(LineDiagram {
        key: "line",
        title: "The line, in flow order",
        part_word: "Element",
        parts,
        node_pressures: node_pressures(outlet, &drops)?,
        narrowest,
        columns: LINE_COLUMNS.iter().map(|(_, c)| *c).collect(),
    })
}

fn horizontal(line: &Line, i: usize, e: &LineElement, u: f64, figures: &mut Vec<Figure>, advice: &mut AdviceList) -> Result<(Verdict, String), NumericalError> {
    let d = e.inner_diameter.si();
    let v90 = line.hindered(line.largest, e.inner_diameter)?;
    let z90 = fuchs_thomas::settling_number(e.length.si(), v90, d, u);
    let speeds = line.classes.iter().map(|c| line.hindered(c.diameter, e.inner_diameter)).collect::<Result<Vec<_>, _>>()?;
    let passes = line.input.passes;
    let eta = over_passes(deposited_mass_fraction(&line.classes, &speeds, e, u), passes);
    let dr = line.delta_rho();
    let mu = line.input.viscosity.si();
    let theta = shields::shields_number(mu, u, d, dr, line.largest.si());
    figures.push(fig(&keys::TIME_TO_SETTLE[i], Dimension::Duration, SETTLE_TIME_INFO, d / v90, Vec::new())?);
    figures.push(fig(&keys::SETTLING_NUMBER[i], Dimension::Number, fuchs_thomas::INFO, z90, Vec::new())?);
    figures.push(fig(&keys::DEPOSITED_FRACTION[i], Dimension::Fraction, fuchs_thomas::INFO, eta, Vec::new())?);
    figures.push(fig(&keys::SHIELDS_NUMBER[i], Dimension::Number, shields::INFO, theta, Vec::new())?);

    let moving = theta > shields::CRITICAL_SHIELDS;
    let verdict = horizontal_verdict(eta, theta);
    let tau = e.length.si() / u;
    let mut reason = format!(
        "Horizontal {}: d90 particles fall across the {} mm bore in {} s (v_h = {} mm/s, Richardson–Zaki on the recommended drag law) against a liquid residence time of {} s (Z = {}); {} % of the solids reach the wall{} (Thomas/Fuchs laminar formula, integrated over the size distribution). Laminar Shields number {} for d90: {} (θ_c ≈ 0.12, Ouriemi et al. 2009, from memory).",
        e.kind.word(),
        format_significant(d * 1e3, 3),
        format_significant(d / v90, 3),
        mm_s(v90),
        format_significant(tau, 3),
        format_significant(z90, 3),
        format_significant(eta * 100.0, 3),
        if passes > 1 { format!(" over the {passes} passes of the loop") } else { String::new() },
        format_significant(theta, 3),
        if moving { "a settled layer is pushed along as bed load but can still grow" } else { "a settled layer stays put and grows" },
    );
    if e.kind == ElementKind::Coil {
        reason.push_str(&format!(
            " The coil is treated as a straight horizontal tube: its Dean vortices add cross-stream mixing that can only help keep particles up, and at Re = {} they are weak, so this errs on the safe side (common practice, no source).",
            format_significant(line.input.density.si() * u * d / line.mu_s, 3)
        ));
    }
    if verdict == Verdict::Fine {
        return Ok((verdict, reason));
    }
    horizontal_advice(line, i, e, u, &speeds, figures, advice)?;
    Ok((verdict, reason))
}

/// What would keep a horizontal element below 1 % deposition, within practical limits: a higher
/// flow, finer particles, a narrower bore, vertical routing, or the ways of running that work
/// when none of these does.
fn horizontal_advice(line: &Line, i: usize, e: &LineElement, u: f64, speeds: &[f64], figures: &mut Vec<Figure>, advice: &mut AdviceList) -> Result<(), NumericalError> {
    let key = keys::SETTLING[i].key;
    let d = e.inner_diameter.si();
    let area = pipe_flow::bore_area(e.inner_diameter);
    let passes = line.input.passes;
    let q = line.input.flow.si();
    let n = i + 1;
    let what = format!("element {n} ({})", e.kind.word());
    let (ceiling, ceiling_words) = line.flow_ceiling(d);
    // Flow: η falls as the flow rises (Z ∝ 1/U); solved in ln Q up to the ceiling.
    let prepared = deposition(&line.classes, speeds, e);
    let deposit_at = |ln_q: f64| over_passes(prepared.fraction(ln_q.exp() / area), passes) - DEPOSIT_CAUTION;
    let flow_fix = if ceiling > q { brent(deposit_at, q.ln(), ceiling.ln(), Tolerance::TIGHT).ok().map(f64::exp) } else { None };
    match flow_fix {
        Some(q_min) => {
            figures.push(fig(&keys::MINIMUM_FLOW[i], Dimension::VolumetricFlow, FIX_INFO, q_min, Vec::new())?);
            advice.add(key, AdviceKind::Remedy, format!(
                "Raise the flow through {what} to at least {} mL/min: deposition then stays below 1 % (laminar Thomas/Fuchs result, Re = {}).",
                ml_min(q_min),
                format_significant(line.input.density.si() * q_min / area * d / line.mu_s, 3)
            ));
        }
        None => advice.add(key, AdviceKind::NoneExists, format!(
            "No flow keeps {what} below 1 % deposition: it would take more than {ceiling_words}."
        )),
    }
    // Largest particles (d90) with η ≤ 1 % at this flow, not finer than a mill makes.
    let size_at = |ln_d: f64| match line.hindered(Length::from_si(ln_d.exp()), e.inner_diameter) {
        Ok(v) => over_passes(fuchs_thomas::deposited_fraction(fuchs_thomas::settling_number(e.length.si(), v, d, u)), passes) - DEPOSIT_CAUTION,
        Err(_) => f64::NAN,
    };
    millable_size(line, i, size_at, figures, advice, &format!("at this flow such particles stay below 1 % deposition in {what}."), &format!(
        "No millable size helps {what}: even particles of {} µm, about the finest d90 a mill makes (common practice, no source), deposit more than 1 % at this flow.",
        um(FINEST_MILLED_D90)
    ))?;
    // A narrower bore: at a fixed flow Z ∝ D, so deposition falls as the bore narrows, down to the
    // smallest bore that is laminar, clear of clogging (10 × d90) and made (0.25 mm).
    let narrowest = SMALLEST_BORE.max(clogging::MARGIN_RATIO * line.largest.si()).max(4.0 * line.input.density.si() * q / (std::f64::consts::PI * LAMINAR_REYNOLDS * line.mu_s));
    if narrowest < d {
        let bore_at = |ln_b: f64| {
            let b = ln_b.exp();
            let narrower = LineElement { inner_diameter: Length::from_si(b), ..*e };
            let u_b = q / (std::f64::consts::PI * b * b / 4.0);
            line.classes
                .iter()
                .map(|c| line.hindered(c.diameter, narrower.inner_diameter))
                .collect::<Result<Vec<_>, _>>()
                .map_or(f64::NAN, |v| over_passes(deposited_mass_fraction(&line.classes, &v, &narrower, u_b), passes) - DEPOSIT_CAUTION)
        };
        match brent(bore_at, narrowest.ln(), d.ln(), Tolerance::TIGHT) {
            Ok(ln_b) => advice.add(key, AdviceKind::Remedy, format!(
                "Use a bore of {} mm or less for {what} at this flow: deposition stays below 1 %, with the passage at least 10 × d90; the pressure drop rises as 1/D⁴, so check the budget.",
                format_significant(ln_b.exp() * 1e3, 3)
            )),
            Err(RootError::NoBracket { f_low, .. }) if f_low > 0.0 => advice.add(key, AdviceKind::NoneExists, format!(
                "No practical bore helps {what} at this flow: even {} mm (laminar, at least 10 × d90 and 0.25 mm) deposits more than 1 %.",
                format_significant(narrowest * 1e3, 3)
            )),
            Err(_) => {}
        }
    }
    // Vertical up-flow carries the particles when U ≥ 5 v_h in that bore (a coil cannot be
    // re-routed; its tubing can be replaced by a vertical run).
    let v90 = line.hindered(line.largest, e.inner_diameter)?;
    let q_up = UPFLOW_MARGIN * v90 * area;
    let pump = line.input.pump_max_flow.si();
    if e.kind != ElementKind::Coil {
        if q_up <= q {
            advice.add(key, AdviceKind::Alternative, format!(
                "Route {what} vertically with the flow upwards: at this flow the liquid rises at {} × the d90 particles' settling speed and carries them (margin 5: common practice, no source).",
                format_significant(u / v90, 3)
            ));
        } else if q_up <= pump {
            advice.add(key, AdviceKind::Alternative, format!(
                "Route {what} vertically with the flow upwards at {} mL/min or more (U ≥ 5 × the d90 settling speed of {} mm/s; margin: common practice, no source).",
                ml_min(q_up),
                mm_s(v90)
            ));
        }
    }
    advice.add(key, AdviceKind::Alternative, SEGMENTATION);
    advice.add(key, AdviceKind::Alternative, SONICATION);
    advice.add(key, AdviceKind::Alternative, STIRRED_FEED);
    Ok(())
}

fn up_flow(line: &Line, i: usize, e: &LineElement, u: f64, figures: &mut Vec<Figure>, advice: &mut AdviceList) -> Result<(Verdict, String), NumericalError> {
    let v90 = line.hindered(line.largest, e.inner_diameter)?;
    let recirculating = vertical::recirculating_area_fraction(u, v90);
    let holdup = vertical::solids_holdup(line.phi, u, -v90);
    let tau = e.length.si() / u;
    let carried = vertical::particle_speed(u, -v90);
    if let Some(s) = carried {
        figures.push(fig(&keys::PARTICLE_RESIDENCE_TIME[i], Dimension::Duration, vertical::INFO, e.length.si() / s, Vec::new())?);
    }
    if holdup <= 1.0 {
        figures.push(fig(&keys::SOLIDS_HOLDUP[i], Dimension::Fraction, vertical::INFO, holdup, Vec::new())?);
    }
    let verdict = up_flow_verdict(carried.is_some(), holdup, u, v90);
    let reason = match carried {
        Some(s) => format!(
            "Up-flow {}: U = {} mm/s against v_h = {} mm/s for d90 (Richardson–Zaki); the particles travel at {} mm/s and stay {} s against the liquid's {} s; the solids fraction rises from {} to {} %; the liquid near the wall is slower than v_h over {} % of the bore, where particles slide back (margin U ≥ 5 v_h: common practice, no source).",
            e.kind.word(),
            mm_s(u),
            mm_s(v90),
            mm_s(s),
            format_significant(e.length.si() / s, 3),
            format_significant(tau, 3),
            format_significant(line.phi * 100.0, 3),
            format_significant(holdup.min(1.0) * 100.0, 3),
            format_significant(recirculating * 100.0, 3),
        ),
        None => format!(
            "Up-flow {}: U = {} mm/s does not exceed v_h = {} mm/s for d90 (Richardson–Zaki): these particles are not carried and accumulate at the bottom of the element.",
            e.kind.word(),
            mm_s(u),
            mm_s(v90)
        ),
    };
    if verdict == Verdict::Fine {
        return Ok((verdict, reason));
    }
    up_flow_advice(line, i, e, v90, figures, advice)?;
    Ok((verdict, reason))
}

/// What would carry the particles up a vertical element with margin: a higher flow, finer
/// particles or a narrower bore, within practical limits, and the ways of running that work.
fn up_flow_advice(line: &Line, i: usize, e: &LineElement, v90: f64, figures: &mut Vec<Figure>, advice: &mut AdviceList) -> Result<(), NumericalError> {
    let key = keys::SETTLING[i].key;
    let what = format!("element {} ({})", i + 1, e.kind.word());
    let d = e.inner_diameter.si();
    let q = line.input.flow.si();
    let u = q / pipe_flow::bore_area(e.inner_diameter);
    let q_min = UPFLOW_MARGIN * v90 * pipe_flow::bore_area(e.inner_diameter);
    // Carrying up a vertical tube only gets easier if the flow turns turbulent, so the pump alone
    // bounds this flow.
    let pump = line.input.pump_max_flow.si();
    if q_min <= pump {
        figures.push(fig(&keys::MINIMUM_FLOW[i], Dimension::VolumetricFlow, FIX_INFO, q_min, Vec::new())?);
        advice.add(key, AdviceKind::Remedy, format!(
            "Raise the flow through {what} to at least {} mL/min, so that the liquid rises at 5 × the d90 settling speed of {} mm/s (margin: common practice, no source).",
            ml_min(q_min),
            mm_s(v90)
        ));
    } else {
        advice.add(key, AdviceKind::NoneExists, format!(
            "No flow carries the particles up {what} with margin: it would take {} mL/min, more than the pump's largest flow, {} mL/min.",
            ml_min(q_min),
            ml_min(pump)
        ));
    }
    let size_at = |ln_d: f64| match line.hindered(Length::from_si(ln_d.exp()), e.inner_diameter) {
        Ok(v) => UPFLOW_MARGIN * v - u,
        Err(_) => f64::NAN,
    };
    millable_size(line, i, size_at, figures, advice, &format!("the flow then carries it up {what} with margin."), &format!(
        "No millable size is carried up {what} with margin at this flow: even {} µm particles (about the finest d90 a mill makes) settle too fast.",
        um(FINEST_MILLED_D90)
    ))?;
    // At a fixed flow U ∝ 1/D²: the bore at which U = 5 v_h, if it is practical.
    let bore = (4.0 * q / (std::f64::consts::PI * UPFLOW_MARGIN * v90)).sqrt();
    let narrowest = SMALLEST_BORE.max(clogging::MARGIN_RATIO * line.largest.si());
    if bore >= narrowest && bore < d {
        advice.add(key, AdviceKind::Remedy, format!(
            "Use a bore of {} mm or less for {what} at this flow: the liquid then rises at 5 × the d90 settling speed; the pressure drop rises as 1/D⁴, so check the budget.",
            format_significant(bore * 1e3, 3)
        ));
    } else if bore < narrowest {
        advice.add(key, AdviceKind::NoneExists, format!(
            "No practical bore carries the particles up {what} at this flow: it would take {} mm, narrower than {} mm (10 × d90, and at least 0.25 mm).",
            format_significant(bore * 1e3, 3),
            format_significant(narrowest * 1e3, 3)
        ));
    }
    advice.add(key, AdviceKind::Alternative, "Keep the solids loading low where the flow rises slowly: particles held back in an up-flow section concentrate there (common practice, no source).");
    advice.add(key, AdviceKind::Alternative, SEGMENTATION);
    advice.add(key, AdviceKind::Alternative, SONICATION);
    Ok(())
}

/// The largest d90, not finer than a mill makes, at which `residual` (of ln d; negative where the
/// element's criterion is met) crosses zero: its figure and a remedy ending in `fixed`, or the
/// statement `none` when even the milling floor fails.
fn millable_size(
    line: &Line,
    i: usize,
    residual: impl Fn(f64) -> f64,
    figures: &mut Vec<Figure>,
    advice: &mut AdviceList,
    fixed: &str,
    none: &str,
) -> Result<(), NumericalError> {
    if line.largest.si() <= FINEST_MILLED_D90 {
        return Ok(());
    }
    let key = keys::SETTLING[i].key;
    match brent(residual, FINEST_MILLED_D90.ln(), line.largest.si().ln(), Tolerance::TIGHT) {
        Ok(ln_d) => {
            let d_max = ln_d.exp();
            figures.push(fig(&keys::MAXIMUM_PARTICLE_SIZE[i], Dimension::Length, FIX_INFO, d_max, Vec::new())?);
            advice.add(key, AdviceKind::Remedy, format!("Mill or sieve the solid to a d90 of {} µm or less: {fixed}", um(d_max)));
        }
        Err(RootError::NoBracket { f_low, .. }) if f_low > 0.0 => advice.add(key, AdviceKind::NoneExists, none),
        Err(_) => {}
    }
    Ok(())
}

fn down_flow(line: &Line, i: usize, e: &LineElement, u: f64, figures: &mut Vec<Figure>) -> Result<(Verdict, String), NumericalError> {
    let v90 = line.hindered(line.largest, e.inner_diameter)?;
    let s = u + v90;
    let holdup = vertical::solids_holdup(line.phi, u, v90);
    figures.push(fig(&keys::PARTICLE_RESIDENCE_TIME[i], Dimension::Duration, vertical::INFO, e.length.si() / s, Vec::new())?);
    figures.push(fig(&keys::SOLIDS_HOLDUP[i], Dimension::Fraction, vertical::INFO, holdup, Vec::new())?);
    Ok((
        Verdict::Fine,
        format!(
            "Down-flow {}: d90 particles lead the liquid (v_h = {} mm/s on U = {} mm/s, Richardson–Zaki; flux balance), stay {} s against the liquid's {} s and do not accumulate; deposits form at the next bend or horizontal run instead.",
            e.kind.word(),
            mm_s(v90),
            mm_s(u),
            format_significant(e.length.si() / s, 3),
            format_significant(e.length.si() / u, 3)
        ),
    ))
}

fn clogging_check(line: &Line, i: usize, e: &LineElement, figures: &mut Vec<Figure>, checks: &mut Vec<Check>, advice: &mut AdviceList) -> Result<Verdict, NumericalError> {
    let w = e.inner_diameter.si();
    let d = line.largest.si();
    let ratio = w / d;
    figures.push(fig(&keys::PASSAGE_RATIO[i], Dimension::Number, clogging::INFO, ratio, Vec::new())?);
    let risk = clogging::risk(ratio);
    let concentrated = line.phi > clogging::CONCENTRATED_FRACTION;
    let verdict = clogging_verdict(ratio, line.phi);
    let what = match risk {
        clogging::ClogRisk::Sieving if e.kind == ElementKind::Frit => "the frit retains these particles: it works as a filter and will block",
        clogging::ClogRisk::Sieving => "particles larger than the opening cannot pass (sieving)",
        clogging::ClogRisk::Bridging => "below 3: arches of a few particles clog the opening (Marin et al. 2018)",
        clogging::ClogRisk::SmallMargin => "between 3 and 10: arches are unlikely but the margin for agglomerates and d99 is small (10: common practice, no source)",
        clogging::ClogRisk::Clear => "10 or more: clear for single particles (common practice, no source)",
    };
    let reason = format!(
        "{} opening {} µm over d90 {} µm: ratio {} — {what}.{}",
        crate::physics::fluids::selection::capitalised(e.kind.word()),
        um(w),
        um(d),
        format_significant(ratio, 3),
        if concentrated {
            format!(
                " The solids fraction {} % is above 10 %, where clogging risk rises quickly (common practice, no source).",
                format_significant(line.phi * 100.0, 3)
            )
        } else {
            String::new()
        }
    );
    if verdict != Verdict::Fine {
        let key = keys::CLOGGING[i].key;
        let what = format!("element {} ({})", i + 1, e.kind.word());
        if ratio < clogging::MARGIN_RATIO {
            let fine_enough = w / clogging::MARGIN_RATIO;
            if fine_enough >= FINEST_MILLED_D90 {
                advice.add(key, AdviceKind::Remedy, format!(
                    "Mill or sieve the solid to a d90 of {} µm or less (a tenth of the {} µm opening of {what}); below {} µm (a third) at the very least.",
                    um(fine_enough),
                    um(w),
                    um(w / clogging::BRIDGING_RATIO)
                ));
            } else {
                advice.add(key, AdviceKind::NoneExists, format!(
                    "No millable size clears the {} µm opening of {what} with margin: it would need a d90 below {} µm, finer than a mill makes (about {} µm).",
                    um(w),
                    um(fine_enough),
                    um(FINEST_MILLED_D90)
                ));
            }
            advice.add(key, AdviceKind::Remedy, format!(
                "Give {what} an opening of {} mm or more (10 × d90; common practice, no source).",
                format_significant(d * clogging::MARGIN_RATIO * 1e3, 3)
            ));
        }
        if concentrated {
            advice.add(key, AdviceKind::Remedy, "Lower the solids loading below 10 vol %.");
        }
        if e.kind != ElementKind::Frit {
            advice.add(key, AdviceKind::Alternative, SONICATION);
        }
    }
    checks.push(Check {
        key: keys::CLOGGING[i].key,
        topic: keys::CLOGGING[i].label,
        verdict,
        reason,
        caution: (verdict == Verdict::Problem).then(|| PLUG_CAUTION.to_owned()),
    });
    Ok(verdict)
}

fn element(line: &Line, i: usize, e: &LineElement, figures: &mut Vec<Figure>, checks: &mut Vec<Check>, advice: &mut AdviceList) -> Result<ElementResult, NumericalError> {
    let input = line.input;
    let u = pipe_flow::mean_velocity(input.flow, e.inner_diameter).si();
    figures.push(fig(&keys::MEAN_VELOCITY[i], Dimension::Velocity, pipe_flow::VELOCITY_INFO, u, Vec::new())?);
    figures.push(fig(&keys::RESIDENCE_TIME[i], Dimension::Duration, RESIDENCE_INFO, e.length.si() / u, Vec::new())?);
    let re_pipe = input.density.si() * u * e.inner_diameter.si() / line.mu_s;
    if e.kind != ElementKind::Frit {
        let dp = hagen_poiseuille::pressure_drop(DynamicViscosity::from_si(line.mu_s), e.length, e.inner_diameter, input.flow);
        let warnings = hagen_poiseuille::INFO.validity.iter().filter_map(|b| b.check(re_pipe, &hagen_poiseuille::INFO)).collect();
        figures.push(fig(&keys::PRESSURE_DROP[i], Dimension::PressureDifference, hagen_poiseuille::INFO, dp.si(), warnings)?);
    }
    let (settling, reason) = if line.drift == Drift::Neutral {
        (Verdict::Fine, "Neutrally buoyant particles follow the liquid: no settling.".to_owned())
    } else if matches!(clogging::risk(e.inner_diameter.si() / line.largest.si()), clogging::ClogRisk::Sieving) {
        // Hindered settling across a passage narrower than the particles has no meaning (the
        // Richardson–Zaki wall term would drive the speed to zero and the time to settle to
        // infinity): the element is judged by its clogging check.
        (
            Verdict::Problem,
            format!(
                "Not assessed: the largest particles ({} µm) are as wide as the passage ({} µm) or wider and cannot pass it; see the clogging check.",
                um(line.largest.si()),
                um(e.inner_diameter.si())
            ),
        )
    } else {
        let suspension = Suspension { particle: input.particle(line.largest), solids_fraction: line.phi, tube_diameter: e.inner_diameter };
        figures.push(hindered_velocity_spread(&suspension, keys::HINDERED_VELOCITY[i].key, keys::HINDERED_VELOCITY[i].label)?);
        // Particles lighter than the liquid rise: up-flow then carries them ahead, down-flow holds them back.
        let effective = effective_orientation(e.orientation, line.drift);
        let (v, mut r) = match effective {
            Orientation::Horizontal => horizontal(line, i, e, u, figures, advice)?,
            Orientation::Up => up_flow(line, i, e, u, figures, advice)?,
            Orientation::Down => down_flow(line, i, e, u, figures)?,
        };
        if line.drift == Drift::Rises {
            r.insert_str(0, "The particles are lighter than the liquid and rise (read 'settle' as 'rise' and the bottom wall as the top). ");
        }
        (v, r)
    };
    if matches!(e.kind, ElementKind::Tubing | ElementKind::Coil) && line.drift != Drift::Neutral {
        figures.push(deposition_reference(line, i, e, re_pipe)?);
    }
    // Deposits grow into plugs: a settling problem carries the same caution as a clogging one.
    let caution = (settling == Verdict::Problem).then(|| PLUG_CAUTION.to_owned());
    checks.push(Check { key: keys::SETTLING[i].key, topic: keys::SETTLING[i].label, verdict: settling, reason, caution });
    let clogging = clogging_check(line, i, e, figures, checks, advice)?;
    Ok(ElementResult { settling, clogging })
}

/// Turbulent limit-deposit velocities (Durand, Oroskar–Turian) for a tube element, always with
/// the warnings of their turbulent, wide-pipe fitting range.
fn deposition_reference(line: &Line, i: usize, e: &LineElement, re_pipe: f64) -> Result<Figure, NumericalError> {
    let input = line.input;
    let s = input.particle_density.si() / input.density.si();
    let d = e.inner_diameter.si();
    let groups = [(TUBE_DIAMETER, d), (PIPE_REYNOLDS, re_pipe)];
    let k = &keys::DEPOSITION_VELOCITY[i];
    let values = [
        (durand::INFO, durand::limit_deposit_velocity(d, s)),
        (oroskar_turian::INFO, oroskar_turian::critical_velocity(line.largest.si(), d, s, line.phi, input.density.si(), input.viscosity.si())),
    ];
    let estimates = values
        .iter()
        .enumerate()
        .map(|(j, (info, v))| Ok(Estimate { model: *info, value: Finite::new(k.label, *v)?, recommended: j == 0, warnings: range_warnings(info, &groups) }))
        .collect::<Result<Vec<_>, NumericalError>>()?;
    Ok(Figure {
        key: k.key,
        label: k.label,
        dimension: Dimension::Velocity,
        value: estimates[0].value,
        recommendation: "Reference only: both were fitted on turbulent flow in pipes of 12 mm and more; in laminar lab tubing use the deposition and Shields checks. Durand is listed first as the older, simpler form.",
        estimates,
    })
}

fn pressure_check(inlet: f64, total: &Figure, back: f64, rating: f64) -> Check {
    let bar = |p: f64| format_significant(p / 1e5, 3);
    let ratio = inlet / rating;
    let (_, worst) = total.spread();
    let verdict = pressure_verdict(inlet, back, worst, rating);
    let note = budget_note(verdict, ": over the rating");
    Check {
        key: "pressure_budget",
        topic: "Pressure budget",
        verdict,
        reason: format!(
            "Inlet pressure {} bar(g) (back-pressure + {} line drop, Hagen–Poiseuille with the Krieger–Dougherty suspension viscosity; viscosity models span {} to {}) is {:.0} % of the {} bar(g) rating{note}. Frits, entrance losses and a growing deposit add to it.",
            bar(inlet),
            Dimension::PressureDifference.show(total.value.get(), 3),
            Dimension::PressureDifference.show(total.spread().0, 3),
            Dimension::PressureDifference.show(worst, 3),
            ratio * 100.0,
            bar(rating)
        ),
        caution: crate::physics::hazards::over_pressure_caution(verdict, crate::physics::hazards::LineContents::Liquid),
    }
}

/// Computes every figure and check for the slurry line.
pub fn evaluate(input: &SlurryInput) -> Result<Report, NumericalError> {
    let (line, mu_fig) = Line::new(input)?;
    let (phi, mu_s, largest, drift) = (line.phi, line.mu_s, line.largest, line.drift);

    let mut figures = input.liquid.figures()?;
    figures.push(input.solid.figure(true, input.density)?);
    figures.extend([Figure::single("solids_volume_fraction", "Solids volume fraction", Dimension::Fraction, FRACTION_INFO, phi, Vec::new())?, mu_fig.clone()]);
    let mut checks = Vec::new();
    if drift != Drift::Neutral {
        figures.push(terminal_velocity_spread(&input.particle(input.size.median()), "terminal_velocity", "Terminal settling velocity (d50, single particle)")?);
        if let ParticleSize::Distribution { .. } = input.size {
            figures.push(terminal_velocity_spread(&input.particle(largest), "terminal_velocity_d90", "Terminal settling velocity (d90, single particle)")?);
        }
    }
    if let ParticleSize::Distribution { .. } = input.size {
        figures.push(Figure::single("size_sigma", "Log-normal spread σ of ln d", Dimension::Number, SIZE_FIT_INFO, input.size.sigma(), Vec::new())?);
        let c = input.size.log_normal_consistency();
        let fine = (0.8..=1.25).contains(&c);
        checks.push(Check {
            key: "size_distribution",
            topic: "Size distribution",
            verdict: if fine { Verdict::Fine } else { Verdict::Caution },
            reason: format!(
                "d50 is {} × √(d10 d90){}",
                format_significant(c, 3),
                if fine {
                    ": consistent with a log-normal distribution.".to_owned()
                } else {
                    ": far from log-normal (bimodal or agglomerated?); the deposited fractions use a rough fit (tolerance ±25 %: common practice, no source).".to_owned()
                }
            ),
            caution: None,
        });
    }

    let mut advice = AdviceList::default();
    let mut results = Vec::with_capacity(input.elements.len());
    for (i, e) in input.elements.iter().enumerate().take(keys::MAX_ELEMENTS) {
        results.push(element(&line, i, e, &mut figures, &mut checks, &mut advice)?);
    }

    // Hagen–Poiseuille is linear in μ: the total for each viscosity model scales the recommended one.
    let total = line_drop(&input.elements, mu_s, input.flow);
    let estimates = mu_fig
        .estimates
        .iter()
        .map(|m| {
            Ok(Estimate {
                model: m.model,
                // The recommended estimate is the figure's value itself, not the same to the last bit.
                value: Finite::new("line pressure drop", drop_for_model(total, m, mu_s))?,
                recommended: m.recommended,
                warnings: m.warnings.clone(),
            })
        })
        .collect::<Result<Vec<_>, NumericalError>>()?;
    let total_fig = Figure {
        key: "total_pressure_drop",
        label: "Line pressure drop (Hagen–Poiseuille, suspension viscosity)",
        dimension: Dimension::PressureDifference,
        value: Finite::new("line pressure drop", total)?,
        recommendation: viscosity::RECOMMENDATION,
        estimates,
    };
    let inlet = input.back_pressure.si() + total;
    checks.push(pressure_check(inlet, &total_fig, input.back_pressure.si(), input.rating.si()));
    if let Some(tubing) = &input.tubing {
        checks.push(crate::physics::tubing::check(tubing, crate::physics::units::PressureDifference::from_si(inlet), &input.liquid.solvents()));
    }
    figures.push(total_fig);
    figures.push(Figure::single("inlet_pressure", "Inlet pressure (gauge)", Dimension::PressureDifference, INLET_INFO, inlet, Vec::new())?);

    if let Some((n, narrow)) = input.elements.iter().enumerate().min_by(|a, b| a.1.inner_diameter.si().total_cmp(&b.1.inner_diameter.si())) {
        figures.push(Figure::single("narrowest_passage", "Narrowest passage", Dimension::Length, NARROWEST_INFO, narrow.inner_diameter.si(), Vec::new())?);
        let verdict = results.get(n).map_or(Verdict::Fine, |r| r.clogging);
        checks.push(Check {
            key: "narrowest_passage",
            topic: "Narrowest passage",
            verdict,
            reason: format!(
                "Element {} ({}, {} µm) is the narrowest passage: clogs start there first. Passage-to-d90 ratio {}.",
                n + 1,
                narrow.kind.word(),
                um(narrow.inner_diameter.si()),
                format_significant(narrow.inner_diameter.si() / largest.si(), 3)
            ),
            caution: (verdict == Verdict::Problem).then(|| PLUG_CAUTION.to_owned()),
        });
    }

    let worst: Vec<String> = results
        .iter()
        .enumerate()
        .filter(|(_, r)| r.settling.max(r.clogging) != Verdict::Fine)
        .map(|(i, r)| format!("element {} ({}, {})", i + 1, input.elements[i].kind.word(), r.settling.max(r.clogging).word()))
        .collect();
    checks.extend(input.liquid.checks(crate::physics::units::Pressure::from_gauge(input.back_pressure, input.ambient)));
    let verdict = checks.iter().map(|c| c.verdict).max().unwrap_or(Verdict::Fine);
    // The line verdict first: it is what the user reads before the per-element detail.
    checks.insert(0, Check {
        key: "line_verdict",
        topic: "Line verdict",
        verdict,
        reason: if worst.is_empty() {
            format!("Every element carries the solids without deposition or clogging concerns; overall {}.", verdict.word())
        } else {
            format!("Look at {}; overall {}.", worst.join(", "), verdict.word())
        },
        caution: (verdict == Verdict::Problem).then(|| PLUG_CAUTION.to_owned()),
    });
    let plots = if drift == Drift::Neutral { Vec::new() } else { vec![super::plots::settling_vs_size(input, phi)?] };
    let diagrams = vec![Diagram::Line(line_diagram(input, &results, &figures, inlet - total)?)];
    Ok(Report { figures, checks, plots, advice: advice.into_vec(), diagrams })
}

/// Metadata of the fitted log-normal spread.
pub const SIZE_FIT_INFO: ModelInfo = ModelInfo {
    name: "Log-normal fit",
    formula: "σ = ln(d90/d10) / (2 × 1.2815516), median d50",
    source: "definition (normal quantile Φ⁻¹(0.9) = 1.2815516)",
    validity: &[],
};
