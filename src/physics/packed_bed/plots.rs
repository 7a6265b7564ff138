//! Chart of the bed pressure drop against flow: the recommended correlation, the spread of all
//! of them, the pressure the weakest component leaves for the bed, and the lifting flow.

use super::PackedBedInput;
use super::flow::BedFlow;
use super::pressure_drop::pressure_drop_spread;
use crate::physics::pipe_flow::bore_area;
use crate::physics::plot::{Axis, Marker, Plot};
use crate::physics::report::NumericalError;
use crate::physics::units::Dimension;

/// Points per decade of flow.
const POINTS: usize = 41;

/// Bed pressure drop from a tenth to ten times the entered flow (log–log: the viscous regime is
/// a straight line of slope one), with the allowed drop (rating minus back-pressure), the
/// lifting flow of an unconfined bed when known (`lifting_flow`, m³/s) and the operating point.
pub fn pressure_drop_vs_flow(input: &PackedBedInput, bed: &BedFlow, lifting_flow: Option<f64>) -> Result<Plot, NumericalError> {
    let mut plot = Plot::new(
        "bed_pressure_drop_vs_flow",
        "Bed pressure drop against flow",
        Axis { label: "Flow", dimension: Dimension::VolumetricFlow, log: true, unit: "" },
        Axis { label: "Bed pressure drop", dimension: Dimension::PressureDifference, log: true, unit: "" },
    );
    let q0 = input.flow.si();
    let area = bore_area(input.tube_diameter);
    let mut recommended = Vec::with_capacity(POINTS);
    let mut band = Vec::with_capacity(POINTS);
    for i in 0..POINTS {
        let q = q0 * 10f64.powf(-1.0 + 2.0 * i as f64 / (POINTS - 1) as f64);
        let at_q = BedFlow { superficial_velocity: crate::physics::units::Velocity::from_si(q / area), ..*bed };
        let spread = pressure_drop_spread(&at_q)?;
        let (lo, hi) = spread.spread();
        recommended.push((q, spread.value.get()));
        band.push((q, lo, hi));
    }
    plot.band("Spread of the correlations", band);
    plot.line("Ergun (recommended)", recommended, true);
    plot.mark(Marker::Horizontal {
        label: "Allowed bed drop (rating − back-pressure)".to_owned(),
        y: input.rating.si() - input.back_pressure.si(),
        limit: true,
    });
    if let Some(q) = lifting_flow {
        plot.mark(Marker::Vertical { label: "Lifting flow of a free bed in up-flow (Wen–Yu)".to_owned(), x: q, limit: true });
    }
    let at_q0 = pressure_drop_spread(bed)?;
    plot.mark(Marker::Point { label: "This flow".to_owned(), x: q0, y: at_q0.value.get() });
    Ok(plot)
}
