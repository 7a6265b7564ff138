//! A setup evaluated stage by stage: the flow and solids each stage carries (feeds join at the
//! inlet of the next stage that carries flow), its pressure drop from the physics of its kind
//! integrated from the regulator upstream (the gas expands as the pressure falls: downstream of
//! the gas feed, tubes in a row are one run of segmented flow sharing one bubble frequency, and a
//! cartridge is the gas–liquid packed bed in down-flow), the pressure at every node, and the checks
//! on ratings, pumps, gas supply, gas hazards and clogging; then the line's totals and drawing.

use super::keys::{self, ElementKey};
use super::pump::Pump;
use super::{Feed, GasSupply, SetupInput, Stage, StageKind};
use crate::physics::fluids::Liquid;
use crate::physics::fluids::selection::LiquidSelection;
use crate::physics::gas_liquid_bed::profile::{self as bed_profile, BedConditions};
use crate::physics::gas_liquid_bed::{GasLiquidBedError, pressure_drop as bed_models};
use crate::physics::gases::{MolarFlow, reference_state};
use crate::physics::hazards::{self, GasFeed};
use crate::physics::report::RangeWarning;
use crate::physics::segmented_flow::pressure_profile::{self, Coil, GasExpansion, Vapour};
use crate::physics::segmented_flow::{self as segmented, SegmentedFlowError, lengths};
use crate::physics::units::{MolarMass, Temperature};
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
/// Liquid a two-phase stage holds.
pub const GAS_STAGE_VOLUME_INFO: ModelInfo = ModelInfo {
    name: "Liquid held in a two-phase stage",
    formula: "V_L = Q_L τ_L (the liquid the stage holds, from its liquid residence time)",
    source: "definition",
    validity: &[],
};
/// Gas residence time in a tube of segmented flow.
pub const TUBE_GAS_TIME_INFO: ModelInfo = ModelInfo {
    name: "Gas residence time in segmented flow",
    formula: "τ_G = ∫ dz / U_B (the bubbles travel at the bubble velocity)",
    source: "derived, integrated along the pressure profile",
    validity: &[],
};
/// Actual gas flow of the gas feed where it joins.
pub const JOINING_FLOW_INFO: ModelInfo = ModelInfo {
    name: "Gas flow where it joins",
    formula: "Q_G = ṅ R T / P_join (P_join absolute, dry ideal gas)",
    source: "ideal gas (definition)",
    validity: &[],
};
/// Gas supply pressure needed.
pub const SUPPLY_MARGIN_INFO: &str = "A mass-flow controller needs a pressure difference across it to hold its flow; about 1 bar is a usual minimum (common practice, no source): see its data sheet.";
/// Smallest supply margin above the joining pressure without a caution, Pa (common practice, no source).
pub const SUPPLY_MARGIN: f64 = 1e5;

/// A setup that could not be computed.
#[derive(Debug, Clone, PartialEq)]
pub enum SetupError {
    /// A number came out infinite or undefined.
    Numerical(NumericalError),
    /// A stage's own calculation gave no result (no convergence, the gas boils, …), in words.
    Stage {
        /// Index of the stage (the first of a run of gas tubes).
        stage: usize,
        /// Its kind.
        kind: &'static str,
        /// What went wrong.
        problem: String,
    },
}

impl std::fmt::Display for SetupError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            SetupError::Numerical(e) => e.fmt(f),
            SetupError::Stage { stage, kind, problem } => write!(f, "stage {} ({kind}): {problem}", stage + 1),
        }
    }
}

impl std::error::Error for SetupError {}

impl From<NumericalError> for SetupError {
    fn from(e: NumericalError) -> Self {
        SetupError::Numerical(e)
    }
}

/// Sums over the line.
pub const TOTAL_INFO: ModelInfo = ModelInfo { name: "Sum over the stages", formula: "Σ over the stages that carry flow", source: "definition", validity: &[] };

/// The quantities listed for every stage in the drawing's table, with their figure tables.
const COLUMNS: [(&[ElementKey; keys::MAX_STAGES], Column); 6] = [
    (&keys::LIQUID_FLOW, Column { label: "Liquid flow", dimension: Dimension::VolumetricFlow }),
    (&keys::GAS_FLOW_OUTLET, Column { label: "Gas flow (outlet)", dimension: Dimension::VolumetricFlow }),
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
    /// Downstream of the gas feed.
    gas: bool,
}

/// Flow and solids fraction of every stage (`None` for feeds).
fn carried(stages: &[Stage]) -> Vec<Option<Carried>> {
    let (mut q, mut qs, mut gas) = (0.0, 0.0, false);
    stages
        .iter()
        .map(|s| match s {
            Stage::Feed(f) => {
                q += f.flow.si();
                qs += f.flow.si() * f.solids.si();
                None
            }
            Stage::Gas(_) => {
                gas = true;
                None
            }
            _ => Some(Carried { flow: q, solids: if q > 0.0 { qs / q } else { 0.0 }, gas }),
        })
        .collect()
}

/// The gas of a line with a gas feed, the same along it.
struct GasLine {
    /// Index of the gas feed.
    index: usize,
    supply: GasSupply,
    feed: MolarFlow,
    molar_mass: MolarMass,
    viscosity: DynamicViscosity,
    liquid: Liquid,
    temperature: Temperature,
    /// The solvent's vapour in the gas, as the coil calculator counts it: a built-in solvent
    /// whose vapour pressure is below the lowest pressure in the line (the regulator's inlet).
    vapour: Option<Vapour>,
}

/// Set point of the regulator (gauge, Pa; 0 without one).
fn set_point(stages: &[Stage]) -> f64 {
    match stages.last() {
        Some(Stage::Regulator { set_point, .. }) => set_point.si(),
        _ => 0.0,
    }
}

fn gas_line(input: &SetupInput) -> Option<GasLine> {
    let (index, supply) = input.stages.iter().enumerate().find_map(|(i, s)| match s {
        Stage::Gas(g) => Some((i, *g)),
        _ => None,
    })?;
    let gl = input.gas_liquid?;
    let (molar_mass, viscosity, _) = supply.gas.feed_properties(supply.mole_fraction, gl.temperature);
    let lowest = input.ambient.pascals() + set_point(&input.stages);
    let vapour = match input.liquid {
        LiquidSelection::Solvent { solvent, .. } => {
            gl.liquid.vapour_pressure.filter(|p| p.pascals() < lowest).map(|pressure| Vapour { pressure, molar_mass: solvent.molar_mass() })
        }
        _ => None,
    };
    Some(GasLine { index, supply, feed: supply.flow.molar_flow(), molar_mass, viscosity, liquid: gl.liquid, temperature: gl.temperature, vapour })
}

/// The gas in a stage downstream of the gas feed.
#[derive(Debug, Clone, Copy)]
struct GasResult {
    /// Actual gas flow at the stage's outlet, m³/s.
    outlet_flow: f64,
    flow_info: ModelInfo,
    /// Gas residence time, s.
    time: f64,
    time_info: ModelInfo,
    /// Gas fraction, bubble and slug length at the outlet (segmented flow in a tube).
    cell: Option<(f64, f64, f64)>,
}

/// A stage's pressure drop, the liquid it holds and, downstream of the gas feed, its gas.
struct StageResult {
    /// Pressure drop, Pa.
    drop: f64,
    info: ModelInfo,
    warnings: Vec<RangeWarning>,
    /// Liquid volume it holds (m³), and how it was found.
    volume: Option<(f64, ModelInfo)>,
    /// Liquid residence time (s), and how it was found.
    time: Option<(f64, ModelInfo)>,
    gas: Option<GasResult>,
    /// The flow regime of the run of gas tubes this stage starts.
    regime: Option<Check>,
}

fn liquid_result(input: &SetupInput, stage: &Stage, c: Carried) -> StageResult {
    let (drop, info, warnings, volume) = stage_drop(input, stage, c);
    let volume_info = if matches!(stage, Stage::Passage { packing: Some(_), .. }) { BED_VOLUME_INFO } else { VOLUME_INFO };
    StageResult { drop, info, warnings, volume: volume.map(|v| (v, volume_info)), time: volume.map(|v| (v / c.flow, RESIDENCE_TIME_INFO)), gas: None, regime: None }
}

/// A tube-like stage (junction, tubing, coil, fitting): segmented flow when gas is present.
fn is_tube(stage: &Stage) -> bool {
    matches!(stage, Stage::Passage { packing: None, .. })
}

/// The liquid with the suspension's viscosity when it carries solids (the viscosity the liquid
/// stages use).
fn liquid_with_solids(liquid: Liquid, solids: f64) -> Liquid {
    if solids > 0.0 { Liquid { viscosity: DynamicViscosity::from_si(liquid.viscosity.si() * SUSPENSION_VISCOSITY[0].1(solids)), ..liquid } } else { liquid }
}

/// A run of gas tubes (stage indices in flow order) ending at absolute pressure `p_out`: the
/// coil calculator's segmented flow over the run, bubbles formed at the first tube's inlet.
fn gas_run(input: &SetupInput, g: &GasLine, members: &[usize], flows: &[Option<Carried>], p_out: f64) -> Result<Vec<StageResult>, SegmentedFlowError> {
    let tubes: Vec<Coil> = members
        .iter()
        .filter_map(|&j| match (&input.stages[j], flows[j]) {
            (Stage::Passage { bore, length, .. }, Some(c)) => Some((*bore, *length, c)),
            _ => None,
        })
        .scan(None, |junction, (bore, length, c)| {
            let width = *junction.get_or_insert(bore);
            Some(Coil {
                diameter: bore,
                junction_width: width,
                length,
                temperature: g.temperature,
                liquid: liquid_with_solids(g.liquid, c.solids),
                liquid_flow: VolumetricFlow::from_si(c.flow),
                gas_feed: g.feed,
                gas_molar_mass: g.molar_mass,
                gas_viscosity: g.viscosity,
                consumption: MolarFlow::from_si(0.0),
                outlet_pressure: Pressure::from_si(p_out),
                vapour: g.vapour,
                length_model: lengths::RECOMMENDED,
                pressure_model: pressure_profile::RECOMMENDED,
                expansion: GasExpansion::Isothermal,
            })
        })
        .collect();
    let (_, states) = pressure_profile::settled_states(&tubes)?;
    let flow_info = if g.vapour.is_some() { pressure_profile::SATURATED_FLOW_INFO } else { pressure_profile::DRY_FLOW_INFO };
    // The coil calculator's regime check, between the cells where the bubbles form and where the
    // run ends.
    let mut regime = match (tubes.first(), states.first(), states.last()) {
        (Some(first), Some(inlet), Some(outlet)) => Some(segmented::regime_check(&outlet.outlet, &first.junction_cell(inlet.inlet_pressure)?)),
        _ => None,
    };
    Ok(states
        .iter()
        .zip(&tubes)
        .map(|(s, tube)| StageResult {
            regime: regime.take(),
            drop: s.drop,
            info: pressure_profile::RECOMMENDED.info(),
            warnings: pressure_profile::RECOMMENDED.warnings(&s.outlet),
            volume: Some((tube.liquid_flow.si() * s.residence_time, GAS_STAGE_VOLUME_INFO)),
            time: Some((s.residence_time, segmented::RESIDENCE_TIME_INFO)),
            gas: Some(GasResult {
                outlet_flow: s.outlet.flow.gas_flow.si(),
                flow_info,
                time: s.residence_time,
                time_info: TUBE_GAS_TIME_INFO,
                cell: Some((s.outlet.flow.gas_fraction(), s.outlet.bubble_length, s.outlet.slug_length)),
            }),
        })
        .collect())
}

/// A cartridge downstream of the gas feed ending at absolute pressure `p_out`: the gas–liquid
/// packed bed in co-current down-flow, by its recommended correlation.
fn gas_bed(g: &GasLine, stage: &Stage, c: Carried, p_out: f64) -> Result<Option<StageResult>, GasLiquidBedError> {
    let Stage::Passage { bore, length, packing: Some(packing), .. } = stage else { return Ok(None) };
    let liquid = liquid_with_solids(g.liquid, c.solids);
    let cond = BedConditions {
        particle_diameter: packing.particle_diameter,
        voidage: packing.voidage,
        tube_diameter: *bore,
        length: *length,
        liquid_flow: VolumetricFlow::from_si(c.flow),
        liquid_density: liquid.density,
        liquid_viscosity: liquid.viscosity,
        surface_tension: liquid.surface_tension,
        gas_feed: g.feed,
        gas_molar_mass: g.molar_mass,
        gas_viscosity: g.viscosity,
        temperature: g.temperature,
        outlet_pressure: Pressure::from_si(p_out),
        upward: false,
    };
    let profile = bed_profile::integrate(&cond, bed_models::RECOMMENDED)?;
    Ok(Some(StageResult {
        drop: profile.inlet_pressure.si() - p_out,
        info: bed_profile::INLET_PRESSURE_INFO,
        warnings: profile.warnings.clone(),
        volume: Some((c.flow * profile.liquid_time, GAS_STAGE_VOLUME_INFO)),
        time: Some((profile.liquid_time, bed_profile::LIQUID_TIME_INFO)),
        gas: Some(GasResult {
            outlet_flow: cond.gas_flow(cond.outlet_pressure).si(),
            flow_info: reference_state::ACTUAL_FLOW_INFO,
            time: profile.gas_time,
            time_info: bed_profile::GAS_TIME_INFO,
            cell: None,
        }),
        regime: None,
    }))
}

/// Every stage's result (`None` for feeds), integrated from the regulator upstream with the
/// absolute pressure at each stage's outlet known: liquid stages by their own drop, gas tubes
/// run by run, gas cartridges one by one.
fn stage_results(input: &SetupInput, flows: &[Option<Carried>], gas: Option<&GasLine>) -> Result<Vec<Option<StageResult>>, SetupError> {
    let stages = &input.stages;
    let mut out: Vec<Option<StageResult>> = stages.iter().map(|_| None).collect();
    let mut p = input.ambient.pascals();
    let mut i = stages.len();
    let failed = |stage: usize, problem: String| SetupError::Stage { stage, kind: stages[stage].kind().word(), problem };
    while i > 0 {
        i -= 1;
        let Some(c) = flows[i] else { continue };
        let stage = &stages[i];
        if let (Some(g), true) = (gas, c.gas) {
            if is_tube(stage) {
                // The run: tubes back to the gas feed or a cartridge, liquid feeds joining between.
                let mut start = i;
                while start > 0 && (matches!(stages[start - 1], Stage::Feed(_)) || is_tube(&stages[start - 1])) {
                    start -= 1;
                }
                let members: Vec<usize> = (start..=i).filter(|&j| is_tube(&stages[j])).collect();
                let first = members.first().copied().unwrap_or(i);
                let run = gas_run(input, g, &members, flows, p).map_err(|e| failed(first, e.to_string()))?;
                for (j, r) in members.iter().zip(run) {
                    p += r.drop;
                    out[*j] = Some(r);
                }
                i = start;
                continue;
            }
            if let Some(r) = gas_bed(g, stage, c, p).map_err(|e| failed(i, e.to_string()))? {
                p += r.drop;
                out[i] = Some(r);
                continue;
            }
        }
        let r = liquid_result(input, stage, c);
        p += r.drop;
        out[i] = Some(r);
    }
    Ok(out)
}

/// A liquid stage's pressure drop (Pa), its model and warnings, and the liquid volume it holds (m³).
fn stage_drop(input: &SetupInput, stage: &Stage, c: Carried) -> (f64, ModelInfo, Vec<RangeWarning>, Option<f64>) {
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
        Stage::Feed(_) | Stage::Gas(_) => (0.0, NODE_INFO, Vec::new(), None),
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
        Stage::Feed(_) | Stage::Gas(_) => None,
    }
}

fn contents(input: &SetupInput) -> LineContents {
    if input.stages.iter().any(|s| s.kind() == StageKind::GasFeed) {
        LineContents::GasAndLiquid
    } else if input.stages.iter().any(|s| s.kind() == StageKind::Cartridge) {
        LineContents::Cartridge
    } else {
        LineContents::Liquid
    }
}

/// The gas supply against the pressure where the gas joins (both gauge), and against the parts
/// downstream a blockage would expose to it.
fn supply_check(i: usize, supply: &GasSupply, joining: f64, stages: &[Stage]) -> Check {
    let p = supply.supply.si();
    let margin = p - joining;
    let (mut verdict, mut reason) = if margin <= 0.0 {
        (
            Verdict::Problem,
            format!(
                "The gas feed of stage {} is supplied at {} bar(g), not above the {} bar(g) where it joins: the gas cannot enter (the liquid may push back into the gas line). Raise the supply pressure above {} bar(g), or lower the back-pressure or the line's drop.",
                i + 1,
                bar(p),
                bar(joining),
                bar(joining + SUPPLY_MARGIN)
            ),
        )
    } else if margin < SUPPLY_MARGIN {
        (
            Verdict::Caution,
            format!(
                "The gas feed of stage {} is supplied at {} bar(g), only {} bar above the {} bar(g) where it joins. {SUPPLY_MARGIN_INFO}",
                i + 1,
                bar(p),
                bar(margin),
                bar(joining)
            ),
        )
    } else {
        (Verdict::Fine, format!("The gas feed of stage {} is supplied at {} bar(g), {} bar above the {} bar(g) where it joins.", i + 1, bar(p), bar(margin), bar(joining)))
    };
    let exposed = blockage_note(stages, i, p, "gas supply", "set the cylinder's regulator below that rating or fit a relief valve on the gas line");
    if let Some(note) = &exposed {
        verdict = verdict.max(Verdict::Caution);
        reason.push_str(note);
    }
    // The over-pressure caution goes with an exposed part; a supply too low to enter is not a
    // pressure hazard.
    let caution = exposed.and_then(|_| hazards::over_pressure_caution(Verdict::Caution, LineContents::GasAndLiquid));
    Check { key: keys::GAS_SUPPLY[i].key, topic: keys::GAS_SUPPLY[i].label, verdict, reason, caution }
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

/// The sentence for a source at stage `i` (`what`: "pump", "gas supply") that can push `largest`
/// (gauge, Pa) onto a part downstream rated lower, with the `remedy`; `None` when every part
/// downstream is rated for it.
fn blockage_note(stages: &[Stage], i: usize, largest: f64, what: &str, remedy: &str) -> Option<String> {
    let (j, weakest) = weakest_downstream(stages, i).filter(|(_, weakest)| largest > *weakest)?;
    Some(format!(
        " A blockage downstream would let the {what} push up to {} bar(g) onto the {} at stage {}, rated {} bar(g): {remedy}.",
        bar(largest),
        stages[j].kind().word(),
        j + 1,
        bar(weakest)
    ))
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
    if let Some(note) = blockage_note(stages, i, largest, "pump", "set the pump's pressure limit below that rating") {
        verdict = verdict.max(Verdict::Caution);
        reason.push_str(&note);
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
pub fn evaluate(input: &SetupInput) -> Result<Report, SetupError> {
    let stages = &input.stages;
    let flows = carried(stages);
    let what = contents(input);
    let gas = gas_line(input);
    let mut figures = input.liquid.figures()?;
    let mut stage_figures = Vec::new();
    let mut checks = Vec::new();
    let results = stage_results(input, &flows, gas.as_ref())?;
    let drops: Vec<f64> = results.iter().map(|r| r.as_ref().map_or(0.0, |r| r.drop)).collect();
    let volumes: Vec<Option<f64>> = results.iter().map(|r| r.as_ref().and_then(|r| r.volume.map(|v| v.0))).collect();
    let times: Vec<Option<f64>> = results.iter().map(|r| r.as_ref().and_then(|r| r.time.map(|t| t.0))).collect();
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
            (Stage::Gas(g), _) => {
                let joining = inlet(i);
                stage_figures.push(fig(&keys::GAS_MOLAR_FLOW[i], Dimension::MolarFlow, reference_state::MOLAR_FLOW_INFO, g.flow.molar_flow().si())?);
                let gas_temperature = input.gas_liquid.map(|l| l.temperature);
                if let Some(t) = gas_temperature {
                    let p_join = Pressure::from_si(joining + input.ambient.pascals());
                    stage_figures.push(fig(&keys::GAS_FLOW_OUTLET[i], Dimension::VolumetricFlow, JOINING_FLOW_INFO, g.flow.molar_flow().actual_flow(t, p_join).si())?);
                }
                stage_figures.push(fig(&keys::INLET_PRESSURE[i], Dimension::PressureDifference, NODE_INFO, joining)?);
                add(supply_check(i, g, joining, stages), &mut verdicts, &mut stage_checks);
            }
            (Stage::Feed(f), _) => {
                stage_figures.push(fig(&keys::LIQUID_FLOW[i], Dimension::VolumetricFlow, FLOW_INFO, f.flow.si())?);
                stage_figures.push(fig(&keys::PUMP_PRESSURE[i], Dimension::PressureDifference, f.pump.info(), f.pump.largest_pressure())?);
                stage_figures.push(fig(&keys::INLET_PRESSURE[i], Dimension::PressureDifference, NODE_INFO, inlet(i))?);
                add(pump_check(i, f, inlet(i), stages, what), &mut verdicts, &mut stage_checks);
            }
            (_, Some(c)) => {
                let Some(r) = &results[i] else { continue };
                stage_figures.push(fig(&keys::LIQUID_FLOW[i], Dimension::VolumetricFlow, FLOW_INFO, c.flow)?);
                if let (Some((v, volume_info)), Some((t, time_info))) = (r.volume, r.time) {
                    stage_figures.push(fig(&keys::VOLUME[i], Dimension::Volume, volume_info, v)?);
                    stage_figures.push(fig(&keys::RESIDENCE_TIME[i], Dimension::Duration, time_info, t)?);
                }
                if let Some(g) = &r.gas {
                    stage_figures.push(fig(&keys::GAS_FLOW_OUTLET[i], Dimension::VolumetricFlow, g.flow_info, g.outlet_flow)?);
                    stage_figures.push(fig(&keys::GAS_RESIDENCE_TIME[i], Dimension::Duration, g.time_info, g.time)?);
                    if let Some((beta, bubble, slug)) = g.cell {
                        stage_figures.push(fig(&keys::GAS_FRACTION[i], Dimension::Fraction, segmented::flow::BOOKKEEPING_INFO, beta)?);
                        stage_figures.push(fig(&keys::BUBBLE_LENGTH[i], Dimension::Length, segmented::cell::INFO, bubble)?);
                        stage_figures.push(fig(&keys::SLUG_LENGTH[i], Dimension::Length, segmented::cell::INFO, slug)?);
                    }
                }
                stage_figures.push(Figure::single(keys::PRESSURE_DROP[i].key, keys::PRESSURE_DROP[i].label, Dimension::PressureDifference, r.info, drops[i], r.warnings.clone())?);
                if let Some(check) = &r.regime {
                    add(Check { key: keys::FLOW_REGIME[i].key, topic: keys::FLOW_REGIME[i].label, ..check.clone() }, &mut verdicts, &mut stage_checks);
                }
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
    let residence: f64 = carrying.iter().filter_map(|(i, _)| times[*i]).sum();
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
    if let Some(g) = &gas {
        let (_, y) = g.supply.gas.reactive_in_feed(g.supply.mole_fraction);
        let reactive = MolarFlow::from_si(g.feed.si() * y);
        let gas_time: f64 = results.iter().flatten().filter_map(|r| r.gas.map(|g| g.time)).sum();
        figures.push(Figure::definition("gas_molar_flow", "Gas fed (all species)", Dimension::MolarFlow, reference_state::MOLAR_FLOW_INFO, g.feed.si())?);
        figures.push(Figure::definition(
            "gas_equivalents",
            "Reactive gas fed per mole of substrate (equivalents)",
            Dimension::Number,
            reference_state::EQUIVALENTS_INFO,
            reactive.equivalents(input.production.concentration, VolumetricFlow::from_si(outlet_flow)),
        )?);
        figures.push(Figure::definition("gas_residence_time", "Gas residence time of the line", Dimension::Duration, TOTAL_INFO, gas_time)?);
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
    line_checks.extend(input.liquid.checks(Pressure::from_gauge(PressureDifference::from_si(set_point(stages)), input.ambient)));
    if let Some(g) = &gas {
        let solvents = input.liquid.solvents();
        line_checks.push(hazards::gas_check(&GasFeed {
            gas: g.supply.gas,
            mole_fraction: g.supply.mole_fraction,
            solvents: &solvents,
            temperature: g.temperature,
            entered_loc: g.supply.limiting_oxygen,
        }));
        let highest = Pressure::from_si(inlet(g.index) + input.ambient.pascals());
        if let Some(note) = g.supply.gas.compressibility_caveat(g.temperature, highest) {
            line_checks.push(Check { key: "compressibility", topic: "Ideal-gas assumption", verdict: Verdict::Caution, reason: note, caution: None });
        }
    }
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
