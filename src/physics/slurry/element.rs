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
use crate::physics::report::{Check, Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning, Report, Verdict, budget_verdict};
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
/// Smallest particle size searched when solving for the largest tolerable size, 0.1 µm.
pub const SMALLEST_SEARCHED: f64 = 1e-7;
/// Largest flow searched, as a multiple of the entered flow.
pub const FLOW_SEARCH_FACTOR: f64 = 1e6;

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
    formula: "the flow or particle size at which the element's criterion is just met",
    source: "this tool's thresholds (common practice, no source) on the correlations named in the check",
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

const GAS_AND_SONICATION: &str = "Gas–liquid segmentation keeps solids suspended by slug recirculation, and an ultrasound bath \
breaks bridges (common practice, no source; ultrasound against bridging is reported by \
Hartman et al., Org. Process Res. Dev. 2010, 14, 1347, abstract).";

const PLUG_CAUTION: &str = "A plug here stops the flow while a positive-displacement pump keeps pushing: the pressure \
rises to the pump limit or until the weakest part fails, spraying hot, possibly toxic liquid. \
Set a pump pressure limit or relief, watch the pressure trend, keep a flush and bypass ready, \
and follow local codes and institutional rules.";

const OVER_PRESSURE_CAUTION: &str = "Over-pressure can burst tubing or blow a fitting apart and spray hot, possibly toxic liquid. \
Stay below the lowest-rated component (tubing rating falls with temperature), use a pump \
pressure limit or relief, shield pressurised parts, and follow local codes and institutional rules.";

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

/// What the line knows before looking at an element.
struct Line<'a> {
    input: &'a SlurryInput,
    phi: f64,
    mu_s: f64,
    drift: Drift,
    classes: Vec<SizeClass>,
    largest: Length,
}

impl Line<'_> {
    /// Hindered settling speed (Richardson–Zaki on the recommended drag law) of particles of
    /// diameter `d` in a passage of bore `bore`.
    fn hindered(&self, d: Length, bore: Length) -> Result<f64, NumericalError> {
        let s = Suspension { particle: self.input.particle(d), solids_fraction: self.phi, tube_diameter: bore };
        Ok(s.hindered(HinderedModel::RichardsonZaki)?.velocity.si())
    }

    fn delta_rho(&self) -> f64 {
        self.input.particle(self.largest).density_difference()
    }
}

/// Mass fraction deposited in a horizontal element over the classes, for speeds `speeds` (one per
/// class), at mean velocity `u`.
fn deposited_mass_fraction(classes: &[SizeClass], speeds: &[f64], e: &LineElement, u: f64) -> f64 {
    classes
        .iter()
        .zip(speeds)
        .map(|(c, v)| c.weight * fuchs_thomas::deposited_fraction(fuchs_thomas::settling_number(e.length.si(), *v, e.inner_diameter.si(), u)))
        .sum::<f64>()
        .clamp(0.0, 1.0)
}

/// Fraction deposited over `passes` passes when each pass deposits `per_pass` of what reaches
/// the element: 1 − (1 − η)ⁿ (the reservoir is stirred, so every pass starts uniform).
pub fn over_passes(per_pass: f64, passes: u32) -> f64 {
    1.0 - (1.0 - per_pass).powf(f64::from(passes))
}

struct ElementResult {
    settling: Verdict,
    clogging: Verdict,
}

fn horizontal(line: &Line, i: usize, e: &LineElement, u: f64, figures: &mut Vec<Figure>) -> Result<(Verdict, String), NumericalError> {
    let d = e.inner_diameter.si();
    let area = pipe_flow::bore_area(e.inner_diameter);
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
    let verdict = if eta < DEPOSIT_CAUTION {
        Verdict::Fine
    } else if moving || eta < DEPOSIT_PROBLEM {
        Verdict::Caution
    } else {
        Verdict::Problem
    };
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
    if verdict == Verdict::Fine {
        return Ok((verdict, reason));
    }
    reason.push_str(" To fix:");
    // Minimum flow for η ≤ 1 %: Z ∝ 1/U, so η falls with flow; solved in ln Q.
    let q = line.input.flow.si();
    let at = |ln_q: f64| over_passes(deposited_mass_fraction(&line.classes, &speeds, e, ln_q.exp() / area), passes) - DEPOSIT_CAUTION;
    match brent(at, q.ln(), (q * FLOW_SEARCH_FACTOR).ln(), Tolerance::TIGHT) {
        Ok(ln_q) => {
            let q_min = ln_q.exp();
            figures.push(fig(&keys::MINIMUM_FLOW[i], Dimension::VolumetricFlow, FIX_INFO, q_min, Vec::new())?);
            reason.push_str(&format!(" a flow of at least {} mL/min keeps deposition below 1 % here;", ml_min(q_min)));
        }
        Err(_) => reason.push_str(" no flow within a factor 10⁶ keeps deposition below 1 %;"),
    }
    let q_c = shields::critical_velocity(mu, d, dr, line.largest.si()) * area;
    reason.push_str(&format!(" {} mL/min would move a settled d90 layer (θ = θ_c);", ml_min(q_c)));
    // Largest single size with η ≤ 1 % at this flow: v_h rises with d; solved in ln d.
    let size_at = |ln_d: f64| match line.hindered(Length::from_si(ln_d.exp()), e.inner_diameter) {
        Ok(v) => over_passes(fuchs_thomas::deposited_fraction(fuchs_thomas::settling_number(e.length.si(), v, d, u)), passes) - DEPOSIT_CAUTION,
        Err(_) => f64::NAN,
    };
    match brent(size_at, SMALLEST_SEARCHED.ln(), line.largest.si().ln(), Tolerance::TIGHT) {
        Ok(ln_d) => {
            let d_max = ln_d.exp();
            figures.push(fig(&keys::MAXIMUM_PARTICLE_SIZE[i], Dimension::Length, FIX_INFO, d_max, Vec::new())?);
            reason.push_str(&format!(" particles up to {} µm stay below 1 % deposition at this flow;", um(d_max)));
        }
        Err(RootError::NoBracket { f_low, .. }) if f_low > 0.0 => reason.push_str(" no particle size from 0.1 µm up stays below 1 % at this flow;"),
        Err(_) => {}
    }
    let d_c = shields::critical_bore(mu, q, dr, line.largest.si());
    let ratio_c = d_c / line.largest.si();
    // A narrower bore only helps if it is narrower than the one there.
    if d_c < e.inner_diameter.si() {
        reason.push_str(&format!(
            " a bore of {} mm or less at this flow moves a settled layer (passage ratio {} for d90{});",
            format_significant(d_c * 1e3, 3),
            format_significant(ratio_c, 3),
            if ratio_c < clogging::MARGIN_RATIO { ", too small against clogging" } else { "" }
        ));
    }
    reason.push_str(&if u > UPFLOW_MARGIN * v90 {
        format!(" routed vertically with up-flow the particles would be carried (U = {} × v_h);", format_significant(u / v90, 3))
    } else {
        format!(" routed vertically with up-flow, d90 particles are carried reliably only from U = {} mm/s;", mm_s(UPFLOW_MARGIN * v90))
    });
    reason.push(' ');
    reason.push_str(GAS_AND_SONICATION);
    Ok((verdict, reason))
}

fn up_flow(line: &Line, i: usize, e: &LineElement, u: f64, figures: &mut Vec<Figure>) -> Result<(Verdict, String), NumericalError> {
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
    let verdict = if carried.is_none() || holdup >= krieger_dougherty::MAX_PACKING {
        Verdict::Problem
    } else if u < UPFLOW_MARGIN * v90 {
        Verdict::Caution
    } else {
        Verdict::Fine
    };
    let mut reason = match carried {
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
    let q_min = UPFLOW_MARGIN * v90 * pipe_flow::bore_area(e.inner_diameter);
    figures.push(fig(&keys::MINIMUM_FLOW[i], Dimension::VolumetricFlow, FIX_INFO, q_min, Vec::new())?);
    reason.push_str(&format!(" To fix: a flow of at least {} mL/min (U = 5 v_h);", ml_min(q_min)));
    let size_at = |ln_d: f64| match line.hindered(Length::from_si(ln_d.exp()), e.inner_diameter) {
        Ok(v) => UPFLOW_MARGIN * v - u,
        Err(_) => f64::NAN,
    };
    if let Ok(ln_d) = brent(size_at, SMALLEST_SEARCHED.ln(), line.largest.si().ln(), Tolerance::TIGHT) {
        let d_max = ln_d.exp();
        figures.push(fig(&keys::MAXIMUM_PARTICLE_SIZE[i], Dimension::Length, FIX_INFO, d_max, Vec::new())?);
        reason.push_str(&format!(" or particles no larger than {} µm at this flow;", um(d_max)));
    }
    reason.push_str(" a smaller bore raises U as 1/D²; a lower loading keeps the accumulated solids fluid. ");
    reason.push_str(GAS_AND_SONICATION);
    Ok((verdict, reason))
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

fn clogging_check(line: &Line, i: usize, e: &LineElement, figures: &mut Vec<Figure>, checks: &mut Vec<Check>) -> Result<Verdict, NumericalError> {
    let w = e.inner_diameter.si();
    let d = line.largest.si();
    let ratio = w / d;
    figures.push(fig(&keys::PASSAGE_RATIO[i], Dimension::Number, clogging::INFO, ratio, Vec::new())?);
    let risk = clogging::risk(ratio);
    let concentrated = line.phi > clogging::CONCENTRATED_FRACTION;
    let verdict = match risk {
        clogging::ClogRisk::Sieving | clogging::ClogRisk::Bridging => Verdict::Problem,
        clogging::ClogRisk::SmallMargin => Verdict::Caution,
        clogging::ClogRisk::Clear if concentrated => Verdict::Caution,
        clogging::ClogRisk::Clear => Verdict::Fine,
    };
    let what = match risk {
        clogging::ClogRisk::Sieving if e.kind == ElementKind::Frit => "the frit retains these particles: it works as a filter and will block",
        clogging::ClogRisk::Sieving => "particles larger than the opening cannot pass (sieving)",
        clogging::ClogRisk::Bridging => "below 3: arches of a few particles clog the opening (Marin et al. 2018)",
        clogging::ClogRisk::SmallMargin => "between 3 and 10: arches are unlikely but the margin for agglomerates and d99 is small (10: common practice, no source)",
        clogging::ClogRisk::Clear => "10 or more: clear for single particles (common practice, no source)",
    };
    let mut reason = format!(
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
        reason.push_str(&format!(
            " To fix: particles below {} µm (W/10) for continuous flow, at least below {} µm (W/3); a wider opening of {} mm or more for this d90{}. {GAS_AND_SONICATION}",
            um(w / clogging::MARGIN_RATIO),
            um(w / clogging::BRIDGING_RATIO),
            format_significant(d * clogging::MARGIN_RATIO * 1e3, 3),
            if concentrated { "; a loading below 10 vol %" } else { "" }
        ));
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

fn element(line: &Line, i: usize, e: &LineElement, figures: &mut Vec<Figure>, checks: &mut Vec<Check>) -> Result<ElementResult, NumericalError> {
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
    } else {
        let suspension = Suspension { particle: input.particle(line.largest), solids_fraction: line.phi, tube_diameter: e.inner_diameter };
        figures.push(hindered_velocity_spread(&suspension, keys::HINDERED_VELOCITY[i].key, keys::HINDERED_VELOCITY[i].label)?);
        // Particles lighter than the liquid rise: up-flow then carries them ahead, down-flow holds them back.
        let effective = match (e.orientation, line.drift) {
            (Orientation::Up, Drift::Rises) => Orientation::Down,
            (Orientation::Down, Drift::Rises) => Orientation::Up,
            (o, _) => o,
        };
        let (v, mut r) = match effective {
            Orientation::Horizontal => horizontal(line, i, e, u, figures)?,
            Orientation::Up => up_flow(line, i, e, u, figures)?,
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
    let clogging = clogging_check(line, i, e, figures, checks)?;
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
    let verdict = budget_verdict(ratio, (back + worst) / rating);
    let note = match verdict {
        Verdict::Problem => ": over the rating",
        Verdict::Caution => ": less than 20 % margin (common practice, no source)",
        Verdict::Fine => "",
    };
    Check {
        key: "pressure_budget",
        topic: "Pressure budget",
        verdict,
        reason: format!(
            "Inlet pressure {} bar(g) (back-pressure + {} bar line drop, Hagen–Poiseuille with the Krieger–Dougherty suspension viscosity; viscosity models span {}–{} bar) is {:.0} % of the {} bar(g) rating{note}. Frits, entrance losses and a growing deposit add to it.",
            bar(inlet),
            bar(total.value.get()),
            bar(total.spread().0),
            bar(worst),
            ratio * 100.0,
            bar(rating)
        ),
        caution: (verdict != Verdict::Fine).then(|| OVER_PRESSURE_CAUTION.to_owned()),
    }
}

/// Computes every figure and check for the slurry line.
pub fn evaluate(input: &SlurryInput) -> Result<Report, NumericalError> {
    let phi = input.volume_fraction();
    let mu_fig = viscosity::suspension_viscosity_spread(input.viscosity, phi)?;
    let mu_s = mu_fig.value.get();
    let largest = input.size.largest();
    let drift = input.particle(largest).drift();
    let line = Line { input, phi, mu_s, drift, classes: input.size.classes(), largest };

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

    let mut results = Vec::with_capacity(input.elements.len());
    for (i, e) in input.elements.iter().enumerate().take(keys::MAX_ELEMENTS) {
        results.push(element(&line, i, e, &mut figures, &mut checks)?);
    }

    // Hagen–Poiseuille is linear in μ: the total for each viscosity model scales the recommended one.
    let total = input
        .elements
        .iter()
        .filter(|e| e.kind != ElementKind::Frit)
        .map(|e| hagen_poiseuille::pressure_drop(DynamicViscosity::from_si(mu_s), e.length, e.inner_diameter, input.flow).si())
        .sum::<f64>();
    let estimates = mu_fig
        .estimates
        .iter()
        .map(|m| {
            Ok(Estimate {
                model: m.model,
                value: Finite::new("line pressure drop", total * m.value.get() / mu_s)?,
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
    Ok(Report { figures, checks, plots })
}

/// Metadata of the fitted log-normal spread.
pub const SIZE_FIT_INFO: ModelInfo = ModelInfo {
    name: "Log-normal fit",
    formula: "σ = ln(d90/d10) / (2 × 1.2815516), median d50",
    source: "definition (normal quantile Φ⁻¹(0.9) = 1.2815516)",
    validity: &[],
};
