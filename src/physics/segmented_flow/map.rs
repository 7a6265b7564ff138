//! The gas–liquid coil's operating map: gas flow × liquid flow, each cell the verdict of the whole
//! calculator ([`super::evaluate`]) at those two flows, everything else the case's. A cell costs
//! a full evaluation (the pressure profile integrated to its fixed point with every pressure-drop
//! model), about 0.2 ms natively, so the map is coarser than the others
//! ([`CELLS`] × [`CELLS`]) and is computed a few cells at a time ([`job`]) for the page to fill in
//! between edits. Hover values: liquid slug length at the junction, liquid residence time, inlet
//! pressure and gas equivalents; the first two are drawn as contour lines.

use super::{SegmentedFlowInput, evaluate};
use crate::physics::map::{CellValue, Contour, Map, MapAxis, MapJob, MapLayer};
use crate::physics::report::Report;
use crate::physics::units::{Dimension, VolumetricFlow};

/// Cells along each axis.
pub const CELLS: usize = 32;

/// One mL/min, m³/s.
const ML_PER_MIN: f64 = 1e-6 / 60.0;

/// Gas-flow axis (at the gas flow's reference state): 0.1 to 200 mL/min, the span of lab
/// mass-flow controllers (common practice, no source), widened to take the case's flow.
fn gas_axis(input: &SegmentedFlowInput, n: usize) -> MapAxis {
    let q = input.gas_flow.flow.si();
    MapAxis::log("gas_flow", "Gas flow (at its reference state)", Dimension::VolumetricFlow, (0.1 * ML_PER_MIN).min(q), (200.0 * ML_PER_MIN).max(q), n)
}

/// Liquid-flow axis: 0.02 to 20 mL/min, the span of lab HPLC-type and syringe pumps (common
/// practice, no source), widened to take the case's flow.
fn liquid_axis(input: &SegmentedFlowInput, n: usize) -> MapAxis {
    let q = input.liquid_flow.si();
    MapAxis::log("liquid_flow", "Liquid flow", Dimension::VolumetricFlow, (0.02 * ML_PER_MIN).min(q), (20.0 * ML_PER_MIN).max(q), n)
}

/// The case at gas flow `gas` (reference state) and liquid flow `liquid`, m³/s.
pub fn at_flows(input: &SegmentedFlowInput, gas: f64, liquid: f64) -> SegmentedFlowInput {
    let mut moved = *input;
    moved.gas_flow.flow = VolumetricFlow::from_si(gas);
    moved.liquid_flow = VolumetricFlow::from_si(liquid);
    moved
}

/// Layer order: slug length, residence time, inlet pressure (gauge), gas equivalents.
const LAYERS: [(&str, Dimension); 4] = [
    ("Liquid slug length at the junction", Dimension::Length),
    ("Liquid residence time", Dimension::Duration),
    ("Inlet pressure (gauge)", Dimension::PressureDifference),
    ("Reactive gas per mole of substrate (equivalents)", Dimension::Number),
];

/// The values of one cell from the report of the point evaluation there: the worst verdict of
/// all its checks, the first check (in the report's order) that has it when it is not fine, and
/// the layers.
pub fn cell_of(report: &Report, ambient: f64) -> CellValue {
    let worst = report.checks.iter().map(|c| c.verdict).max();
    let limit = worst
        .filter(|v| *v != crate::physics::report::Verdict::Fine)
        .and_then(|v| report.checks.iter().find(|c| c.verdict == v))
        .map(|c| c.topic.to_owned());
    let figure = |key: &str| report.figure(key).map_or(f64::NAN, |f| f.value.get());
    CellValue {
        verdict: worst,
        limit,
        values: vec![figure("slug_length"), figure("residence_time"), figure("inlet_pressure") - ambient, figure("gas_equivalents")],
    }
}

/// The map of `input` with `n` × `n` cells, to be computed with [`MapJob::step`].
pub fn job(input: &SegmentedFlowInput, n: usize) -> MapJob {
    let x = gas_axis(input, n);
    let y = liquid_axis(input, n);
    let cells = n * n;
    let layers: Vec<MapLayer> = LAYERS.iter().map(|&(label, dimension)| MapLayer { label, dimension, values: vec![f64::NAN; cells] }).collect();
    let empty = Map {
        key: "gas_liquid_map",
        title: "Where this coil works: gas flow × liquid flow",
        basis: "Colour: the worst verdict of every check of this calculator with the case moved to that gas and liquid flow (flow regime, \
                pressure budget, residence time, bubble pattern, gas expansion, mass transfer and, where they apply, tubing at \
                temperature, boiling, junction, ideal gas, and the gas hazard); the gas hazard, boiling and junction checks do not \
                depend on the flows, so where one of them is a caution or a problem it colours every cell. Grey lines: another check \
                starts to set the verdict; thin coloured lines: the liquid slug length at the junction (recommended correlation) and \
                the liquid residence time, labelled. Coarser than the other maps: each cell is a full evaluation of the coil (its \
                pressure profile with every pressure-drop model)."
            .to_owned(),
        x,
        y,
        verdicts: vec![None; cells],
        layers,
        limit_names: Vec::new(),
        limiting: vec![None; cells],
        contours: vec![Contour { layer: 0, levels: Vec::new() }, Contour { layer: 1, levels: Vec::new() }],
        current: (input.gas_flow.flow.si(), input.liquid_flow.si()),
    };
    let input = *input;
    let ambient = input.ambient.pascals();
    MapJob::new(empty, move |gas, liquid| match evaluate(&at_flows(&input, gas, liquid)) {
        Ok(report) => cell_of(&report, ambient),
        Err(_) => CellValue { verdict: None, limit: None, values: vec![f64::NAN; LAYERS.len()] },
    })
}

/// The whole map of `input`, computed at once.
pub fn gas_liquid_map(input: &SegmentedFlowInput, n: usize) -> Map {
    job(input, n).finish()
}
