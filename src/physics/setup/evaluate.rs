//! A setup evaluated stage by stage: the flow and solids each stage carries (feeds join at the
//! inlet of the next stage that carries flow), its pressure drop from the physics of its kind, the
//! pressure at every node from the regulator upstream, and the checks on ratings, pumps and
//! clogging; then the line's totals and its drawing.

use super::keys::{self, ElementKey};
use super::pump::Pump;
use super::{Feed, SetupInput, Stage, StageKind};
use crate::physics::diagram::{Column, Diagram, LineDiagram, LinePart, node_pressures};
use crate::physics::hazards::{LineContents, over_pressure_caution};
use crate::physics::packed_bed::{ergun, flow::BedFlow};
use crate::physics::pipe_flow::{self, hagen_poiseuille};
use crate::physics::report::{Check, Figure, Finite, ModelInfo, NumericalError, Report, Verdict, budget_note, budget_verdict, range_warnings};
use crate::physics::slurry::clogging::{self, ClogRisk};
use crate::physics::slurry::element::PLUG_CAUTION;
use crate::physics::slurry::viscosity::{MODELS as SUSPENSION_VISCOSITY, suspension_viscosity_spread};
use crate::physics::{practical, tubing};
use crate::physics::tubular::{self, PRODUCTIVITY_INFO, RESIDENCE_TIME_INFO, VOLUME_INFO};
use crate::physics::units::{Dimension, DynamicViscosity, Length, Pressure, PressureDifference, Velocity, Volume, VolumetricFlow, format_significant};

/// The flow joining at a stage.
pub const FLOW_INFO: ModelInfo = ModelInfo {
    name: "Flow balance",
    formula: "Q = Σ Q_feed over the feeds upstream (each joins at the inlet of the next stage that carries flow); φ = Σ φ_feed Q_feed / Q",
    source: "definition",
    validity: &[],
};
/// Volume of a packed cartridge the liquid fills.
pub const BED_VOLUME_INFO: ModelInfo = ModelInfo { name: "Liquid volume of a packed bed", formula: "V = ε π D² L / 4", source: "definition", validity: &[] };
/// Node pressures.
pub const NODE_INFO: ModelInfo = ModelInfo {
    name: "Pressure balance from the regulator upstream",
    formula: "p_in,i = p_set + Σ ΔP_k over the stages k from i to the regulator (gauge; entrance losses and hydrostatics not included)",
    source: "definition",
    validity: &[],
};
/// The regulator lets the pressure down from its set point to the outlet.
pub const REGULATOR_INFO: ModelInfo =
    ModelInfo { name: "Back-pressure regulator", formula: "ΔP = p_set (its inlet held at the set point, its outlet at atmosphere)", source: "definition", validity: &[] };
/// Narrowest passage.
pub const NARROWEST_INFO: ModelInfo =
    ModelInfo { name: "Narrowest passage", formula: "min over the stages the solids pass of the opening W (a cartridge: its particle diameter, an upper value)", source: "definition", validity: &[] };
/// Sums over the line.
pub const TOTAL_INFO: ModelInfo = ModelInfo { name: "Sum over the stages", formula: "Σ over the stages that carry flow", source: "definition", validity: &[] };

/// The quantities listed for every stage in the drawing's table, with their figure tables.
const COLUMNS: [(&[ElementKey; keys::MAX_STAGES], Column); 5] = [
    (&keys::LIQUID_FLOW, Column { label: "Liquid flow", dimension: Dimension::VolumetricFlow }),
    (&keys::RESIDENCE_TIME, Column { label: "Residence time", dimension: Dimension::Duration }),
    (&keys::PRESSURE_DROP, Column { label: "Pressure drop", dimension: Dimension::PressureDifference }),
    (&keys::INLET_PRESSURE, Column { label: "Inlet pressure", dimension: Dimension::PressureDifference }),
    (&keys::PASSAGE_RATIO, Column { label: "Passage / d90", dimension: Dimension::Number }),
];

fn fig(k: &ElementKey, dimension: Dimension, model: ModelInfo, value: f64) -> Result<Figure, NumericalError> {
    Figure::definition(k.key, k.label, dimension, model, value)
}

/// A gauge pressure in bar to 4 significant figures: a part just over its rating reads so.
fn bar(p: f64) -> String {
    format_significant(p / 1e5, 4)
}

/// A share in per cent to 4 significant figures (100.1 %, not a rounded 100 %).
fn percent(ratio: f64) -> String {
    format_significant(ratio * 100.0, 4)
}

/// What flows through a stage that carries flow.
#[derive(Debug, Clone, Copy)]
struct Carried {
    flow: f64,
    solids: f64,
}

/// Flow and solids fraction of every stage (`None` for feeds).
fn carried(stages: &[Stage]) -> Vec<Option<Carried>> {
    let (mut q, mut qs) = (0.0, 0.0);
    stages
        .iter()
        .map(|s| match s {
            Stage::Feed(f) => {
                q += f.flow.si();
                qs += f.flow.si() * f.solids.si();
                None
            }
            _ => Some(Carried { flow: q, solids: if q > 0.0 { qs / q } else { 0.0 } }),
        })
        .collect()
}

/// A stage's pressure drop (Pa), its model and warnings, and the liquid volume it holds (m³).
fn stage_drop(input: &SetupInput, stage: &Stage, c: Carried) -> (f64, ModelInfo, Vec<crate::physics::report::RangeWarning>, Option<f64>) {
    match stage {
        Stage::Passage { bore, length, packing, .. } => {
            let relative = SUSPENSION_VISCOSITY[0].1(c.solids);
            let mu = DynamicViscosity::from_si(input.viscosity.si() * relative);
            let tube = tubular::internal_volume(*bore, *length).si();
            match packing {
                None => {
                    let flow = VolumetricFlow::from_si(c.flow);
                    let u = pipe_flow::mean_velocity(flow, *bore);
                    let re = pipe_flow::reynolds(input.density, u, *bore, mu);
                    let dp = hagen_poiseuille::pressure_drop(mu, *length, *bore, flow).si();
                    (dp, hagen_poiseuille::INFO, range_warnings(&hagen_poiseuille::INFO, &[("pipe Reynolds number", re)]), Some(tube))
                }
                Some(p) => {
                    let bed = BedFlow {
                        particle_diameter: p.particle_diameter,
                        voidage: p.voidage,
                        superficial_velocity: Velocity::from_si(c.flow / pipe_flow::bore_area(*bore)),
                        density: input.density,
                        viscosity: mu,
                        length: *length,
                        tube_diameter: *bore,
                    };
                    let dp = ergun::pressure_drop(&bed).si();
                    (dp, ergun::INFO, range_warnings(&ergun::INFO, &bed.groups()), Some(p.voidage.si() * tube))
                }
            }
        }
        Stage::Regulator { set_point, .. } => (set_point.si(), REGULATOR_INFO, Vec::new(), None),
        Stage::Feed(_) => (0.0, NODE_INFO, Vec::new(), None),
    }
}

/// The opening the solids pass at a stage (m): the bore, or a cartridge's particle diameter.
fn passage(stage: &Stage) -> Option<f64> {
    match stage {
        Stage::Passage { bore, packing: None, .. } => Some(bore.si()),
        Stage::Passage { packing: Some(p), .. } => Some(p.particle_diameter.si()),
        _ => None,
    }
}

fn rating(stage: &Stage) -> Option<f64> {
    match stage {
        Stage::Passage { rating, .. } | Stage::Regulator { rating, .. } => Some(rating.si()),
        Stage::Feed(_) => None,
    }
}

fn contents(input: &SetupInput) -> LineContents {
    if input.stages.iter().any(|s| s.kind() == StageKind::Cartridge) { LineContents::Cartridge } else { LineContents::Liquid }
}

fn pressure_check(i: usize, stage: &Stage, inlet: f64, rating: f64, what: LineContents) -> Check {
    let ratio = inlet / rating;
    let verdict = budget_verdict(ratio, ratio);
    Check {
        key: keys::PRESSURE[i].key,
        topic: keys::PRESSURE[i].label,
        verdict,
        reason: format!(
            "The {} at stage {} sees {} bar(g) at its inlet, {} % of its {} bar(g) rating{}.",
            stage.kind().word(),
            i + 1,
            bar(inlet),
            percent(ratio),
            bar(rating),
            budget_note(verdict, ": over the rating")
        ),
        caution: over_pressure_caution(verdict, what),
    }
}

/// The weakest part a blockage downstream of stage `i` would expose to the pump: (stage index, rating).
fn weakest_downstream(stages: &[Stage], i: usize) -> Option<(usize, f64)> {
    stages.iter().enumerate().skip(i + 1).filter_map(|(j, s)| rating(s).map(|r| (j, r))).min_by(|a, b| a.1.total_cmp(&b.1))
}

fn pump_check(i: usize, feed: &Feed, joining: f64, stages: &[Stage], what: LineContents) -> Check {
    let pump = feed.pump;
    let largest = pump.largest_pressure();
    let ratio = joining / largest;
    let mut verdict = budget_verdict(ratio, ratio);
    let mut reason = format!(
        "The {} of stage {} must deliver {} bar(g) where its feed joins, {} % of the {} bar(g) it can give{}.",
        pump.word(),
        i + 1,
        bar(joining),
        percent(ratio),
        bar(largest),
        budget_note(verdict, ": it cannot deliver the set flow against this pressure")
    );
    if let Pump::Syringe { barrel_rating, .. } = pump
        && barrel_rating.si() < largest
    {
        verdict = verdict.max(Verdict::Caution);
        reason.push_str(&format!(
            " The drive can push {} bar(g), more than the barrel's {} bar(g) rating: a blockage can break the barrel before the drive stalls. Set the pump's force or pressure limit below the barrel's rating.",
            bar(largest),
            bar(barrel_rating.si())
        ));
    }
    if let Some((j, weakest)) = weakest_downstream(stages, i)
        && largest > weakest
    {
        verdict = verdict.max(Verdict::Caution);
        reason.push_str(&format!(
            " A blockage downstream would let the pump push up to {} bar(g) onto the {} at stage {}, rated {} bar(g): set the pump's pressure limit below that rating.",
            bar(largest),
            stages[j].kind().word(),
            j + 1,
            bar(weakest)
        ));
    }
    let caution = over_pressure_caution(verdict, what);
    let flow = practical::pump_flow_check(feed.flow, feed.max_flow);
    reason.push(' ');
    reason.push_str(&flow.reason);
    Check { key: keys::PUMP_CHECK[i].key, topic: keys::PUMP_CHECK[i].label, verdict: verdict.max(flow.verdict), reason, caution }
}

fn clogging_check(i: usize, stage: &Stage, ratio: f64, phi: f64, narrowest: bool) -> Check {
    let risk = clogging::risk(ratio);
    let mut verdict = match risk {
        ClogRisk::Clear => Verdict::Fine,
        ClogRisk::SmallMargin => Verdict::Caution,
        ClogRisk::Bridging | ClogRisk::Sieving => Verdict::Problem,
    };
    let mut reason = format!(
        "The {} at stage {}{}: passage / d90 = {} ({}).",
        stage.kind().word(),
        i + 1,
        if narrowest { " is the narrowest passage the solids meet" } else { "" },
        format_significant(ratio, 3),
        match risk {
            ClogRisk::Clear => "clear, at least 10",
            ClogRisk::SmallMargin => "below the margin of 10 for continuous slurry flow (common practice, no source)",
            ClogRisk::Bridging => "below 3: particles arch across the passage and clog it (Marin et al. 2018)",
            ClogRisk::Sieving => "at most 1: the largest particles cannot pass",
        }
    );
    if phi > clogging::CONCENTRATED_FRACTION {
        verdict = verdict.max(Verdict::Caution);
        reason.push_str(&format!(
            " Solids volume fraction {} is above 0.1, where clogging risk grows quickly (common practice, no source).",
            format_significant(phi, 2)
        ));
    }
    if matches!(stage, Stage::Passage { packing: Some(_), .. }) {
        reason.push_str(" A packed bed filters suspended solids: the gaps between its particles are smaller than the particles.");
        verdict = verdict.max(Verdict::Caution);
    }
    Check { key: keys::CLOGGING[i].key, topic: keys::CLOGGING[i].label, verdict, reason, caution: (verdict == Verdict::Problem).then(|| PLUG_CAUTION.to_owned()) }
}

/// Computes every figure and check of a setup.
pub fn evaluate(input: &SetupInput) -> Result<Report, NumericalError> {
    let stages = &input.stages;
    let flows = carried(stages);
    let what = contents(input);
    let mut figures = input.liquid.figures()?;
    let mut stage_figures = Vec::new();
    let mut checks = Vec::new();
    let mut drops = Vec::with_capacity(stages.len());
    let mut volumes = Vec::with_capacity(stages.len());
    let mut models = Vec::with_capacity(stages.len());
    for (s, c) in stages.iter().zip(&flows) {
        let (dp, info, warnings, volume) = match c {
            Some(c) => stage_drop(input, s, *c),
            None => (0.0, NODE_INFO, Vec::new(), None),
        };
        drops.push(dp);
        models.push((info, warnings));
        volumes.push(volume);
    }
    let nodes = node_pressures(0.0, &drops)?;
    let inlet = |i: usize| nodes.get(i).map_or(0.0, |p| p.get());
    let solids = input.d90.map(Length::si);
    let passing: Vec<(usize, f64)> = stages
        .iter()
        .zip(&flows)
        .enumerate()
        .filter_map(|(i, (s, c))| c.filter(|c| c.solids > 0.0).and_then(|_| passage(s)).map(|w| (i, w)))
        .collect();
    let narrowest = passing.iter().min_by(|a, b| a.1.total_cmp(&b.1)).map(|(i, _)| *i);

    let mut verdicts = vec![Verdict::Fine; stages.len()];
    let mut stage_checks: Vec<Vec<&'static str>> = vec![Vec::new(); stages.len()];
    for (i, (stage, c)) in stages.iter().zip(&flows).enumerate().take(keys::MAX_STAGES) {
        let mut add = |check: Check, verdicts: &mut Vec<Verdict>, stage_checks: &mut Vec<Vec<&'static str>>| {
            verdicts[i] = verdicts[i].max(check.verdict);
            stage_checks[i].push(check.key);
            checks.push(check);
        };
        match (stage, c) {
            (Stage::Feed(f), _) => {
                stage_figures.push(fig(&keys::LIQUID_FLOW[i], Dimension::VolumetricFlow, FLOW_INFO, f.flow.si())?);
                stage_figures.push(fig(&keys::PUMP_PRESSURE[i], Dimension::PressureDifference, f.pump.info(), f.pump.largest_pressure())?);
                stage_figures.push(fig(&keys::INLET_PRESSURE[i], Dimension::PressureDifference, NODE_INFO, inlet(i))?);
                add(pump_check(i, f, inlet(i), stages, what), &mut verdicts, &mut stage_checks);
            }
            (_, Some(c)) => {
                stage_figures.push(fig(&keys::LIQUID_FLOW[i], Dimension::VolumetricFlow, FLOW_INFO, c.flow)?);
                if let Some(v) = volumes[i] {
                    let info = if matches!(stage, Stage::Passage { packing: Some(_), .. }) { BED_VOLUME_INFO } else { VOLUME_INFO };
                    stage_figures.push(fig(&keys::VOLUME[i], Dimension::Volume, info, v)?);
                    stage_figures.push(fig(&keys::RESIDENCE_TIME[i], Dimension::Duration, RESIDENCE_TIME_INFO, v / c.flow)?);
                }
                let (info, warnings) = models[i].clone();
                stage_figures.push(Figure::single(keys::PRESSURE_DROP[i].key, keys::PRESSURE_DROP[i].label, Dimension::PressureDifference, info, drops[i], warnings)?);
                stage_figures.push(fig(&keys::INLET_PRESSURE[i], Dimension::PressureDifference, NODE_INFO, inlet(i))?);
                if let Some(r) = rating(stage) {
                    add(pressure_check(i, stage, inlet(i), r, what), &mut verdicts, &mut stage_checks);
                }
                if c.solids > 0.0 {
                    stage_figures.push(fig(&keys::SOLIDS_FRACTION[i], Dimension::Fraction, FLOW_INFO, c.solids)?);
                    // The viscosity the stage's drop was computed with, every model beside it.
                    let mu_s = suspension_viscosity_spread(input.viscosity, c.solids)?;
                    stage_figures.push(Figure { key: keys::SUSPENSION_VISCOSITY[i].key, label: keys::SUSPENSION_VISCOSITY[i].label, ..mu_s });
                    if let (Some(w), Some(d90)) = (passage(stage), solids) {
                        let ratio = w / d90;
                        stage_figures.push(fig(&keys::PASSAGE_RATIO[i], Dimension::Number, clogging::INFO, ratio)?);
                        add(clogging_check(i, stage, ratio, c.solids, narrowest == Some(i)), &mut verdicts, &mut stage_checks);
                    }
                }
            }
            (_, None) => {}
        }
    }

    // Line level.
    let carrying: Vec<(usize, Carried)> = flows.iter().enumerate().filter_map(|(i, c)| c.map(|c| (i, c))).collect();
    let outlet_flow = carrying.last().map_or(0.0, |(_, c)| c.flow);
    let line_volume: f64 = volumes.iter().flatten().sum();
    let residence: f64 = carrying.iter().filter_map(|(i, c)| volumes[*i].map(|v| v / c.flow)).sum();
    let total_drop: f64 = stages.iter().zip(&drops).filter(|(s, _)| !matches!(s, Stage::Regulator { .. })).map(|(_, d)| d).sum();
    figures.push(Figure::definition("inlet_pressure", "Pressure at the first pump (gauge)", Dimension::PressureDifference, NODE_INFO, inlet(0))?);
    figures.push(Figure::definition("total_pressure_drop", "Pressure drop of the line", Dimension::PressureDifference, TOTAL_INFO, total_drop)?);
    figures.push(Figure::definition("residence_time", "Liquid residence time of the line", Dimension::Duration, TOTAL_INFO, residence)?);
    figures.push(Figure::definition("line_volume", "Liquid volume of the line", Dimension::Volume, TOTAL_INFO, line_volume)?);
    figures.push(Figure::definition("outlet_flow", "Liquid flow at the outlet", Dimension::VolumetricFlow, FLOW_INFO, outlet_flow)?);
    if let Some(i) = narrowest
        && let Some(w) = passage(&stages[i])
    {
        figures.push(Figure::definition("narrowest_passage", "Narrowest passage the solids meet", Dimension::Length, NARROWEST_INFO, w)?);
    }
    if line_volume > 0.0 && outlet_flow > 0.0 {
        let p = &input.production;
        let (rate, sty) = tubular::single_pass(p.concentration, VolumetricFlow::from_si(outlet_flow), p.yield_fraction, p.molar_mass, Volume::from_si(line_volume));
        figures.push(Figure::definition("productivity", "Productivity", Dimension::MassFlow, PRODUCTIVITY_INFO, rate.si())?);
        figures.push(Figure::definition("space_time_yield", "Space-time yield over the line volume", Dimension::SpaceTimeYield, PRODUCTIVITY_INFO, sty)?);
    }
    figures.extend(stage_figures);

    let mut line_checks = vec![budget_check(stages, &nodes, what)];
    // The tubing from the table is the line's tubing and coils: checked at the highest inlet
    // pressure among them.
    let highest = stages
        .iter()
        .enumerate()
        .filter(|(_, s)| matches!(s.kind(), StageKind::Tubing | StageKind::Coil))
        .map(|(i, _)| inlet(i))
        .reduce(f64::max);
    if let (Some(choice), Some(highest)) = (&input.tubing, highest) {
        line_checks.push(tubing::check(choice, PressureDifference::from_si(highest), &input.liquid.solvents()));
    }
    // One temperature for the whole line: the lowest pressure inside it, the regulator's inlet
    // (its set point), is where boiling starts, so this check stands for every node.
    let set_point = match stages.last() {
        Some(Stage::Regulator { set_point, .. }) => set_point.si(),
        _ => 0.0,
    };
    line_checks.extend(input.liquid.checks(Pressure::from_gauge(PressureDifference::from_si(set_point), input.ambient)));
    line_checks.extend(checks);

    let diagram = line_diagram(input, &figures, &verdicts, stage_checks, &nodes, narrowest)?;
    Ok(Report { figures, checks: line_checks, plots: Vec::new(), advice: Vec::new(), diagrams: vec![Diagram::Line(diagram)] })
}

/// The line's pressure budget: the stage whose inlet pressure uses the largest share of its own
/// rating, named.
fn budget_check(stages: &[Stage], nodes: &[Finite], what: LineContents) -> Check {
    let worst = stages
        .iter()
        .enumerate()
        .filter_map(|(i, s)| rating(s).map(|r| (i, nodes.get(i).map_or(0.0, |p| p.get()), r)))
        .max_by(|a, b| (a.1 / a.2).total_cmp(&(b.1 / b.2)));
    let Some((i, p, r)) = worst else {
        return Check { key: "pressure_budget", topic: "Pressure budget", verdict: Verdict::Caution, reason: "No stage carries a pressure rating.".to_owned(), caution: None };
    };
    let ratio = p / r;
    let verdict = budget_verdict(ratio, ratio);
    let lowest = stages.iter().enumerate().filter_map(|(j, s)| rating(s).map(|r| (j, r))).min_by(|a, b| a.1.total_cmp(&b.1));
    let lowest_words = lowest.map_or(String::new(), |(j, lr)| format!(" The lowest-rated part is the {} at stage {} ({} bar(g)).", stages[j].kind().word(), j + 1, bar(lr)));
    Check {
        key: "pressure_budget",
        topic: "Pressure budget",
        verdict,
        reason: format!(
            "The closest part to its rating is the {} at stage {}: {} bar(g) at its inlet, {} % of {} bar(g).{lowest_words}",
            stages[i].kind().word(),
            i + 1,
            bar(p),
            percent(ratio),
            bar(r)
        ),
        caution: over_pressure_caution(verdict, what),
    }
}

fn line_diagram(
    input: &SetupInput,
    figures: &[Figure],
    verdicts: &[Verdict],
    checks: Vec<Vec<&'static str>>,
    nodes: &[Finite],
    narrowest: Option<usize>,
) -> Result<LineDiagram, NumericalError> {
    let value = |key: &str| figures.iter().find(|f| f.key == key).map(|f| f.value);
    let parts = input
        .stages
        .iter()
        .zip(verdicts)
        .zip(checks)
        .enumerate()
        .map(|(i, ((s, v), checks))| {
            let (bore, length) = match s {
                Stage::Passage { bore, length, .. } => (bore.si(), length.si()),
                _ => (0.0, 0.0),
            };
            Ok(LinePart {
                kind: s.kind().word(),
                bore: Finite::new("bore", bore)?,
                length: Finite::new("length", length)?,
                orientation: "horizontal",
                verdict: *v,
                checks,
                values: COLUMNS.iter().map(|(table, _)| value(table[i].key)).collect(),
            })
        })
        .collect::<Result<Vec<_>, NumericalError>>()?;
    Ok(LineDiagram {
        key: "setup",
        title: "The setup, in flow order",
        part_word: "Stage",
        parts,
        node_pressures: nodes.to_vec(),
        narrowest,
        columns: COLUMNS.iter().map(|(_, c)| *c).collect(),
    })
}
