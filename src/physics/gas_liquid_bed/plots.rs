//! Chart of the two-phase bed pressure drop against the gas flow: the recommended correlation,
//! the spread of all of them, the liquid's own Ergun pressure drop, the pressure the weakest part
//! leaves for the bed, and this gas flow.

use super::pressure_drop::{RECOMMENDED, TwoPhaseModel};
use super::{Assessment, GasLiquidBedError, GasLiquidBedInput, profile};
use crate::physics::gases::ReferenceFlow;
use crate::physics::packed_bed::ergun;
use crate::physics::plot::{Axis, Marker, Plot};
use crate::physics::units::{Dimension, VolumetricFlow};

/// Points over the two decades of gas flow: eight per decade, an odd number so that the middle
/// one is this case. The curves are smooth power-law-like arcs on log–log axes; 31 points
/// cost every correlation's integration 30 times per edit (over a third of an edit on this tab)
/// for no line a reader could tell apart.
const POINTS: usize = 17;

/// Bed friction pressure drop from a tenth to ten times the entered gas flow (at its reference
/// state), log–log.
pub fn pressure_drop_vs_gas_flow(input: &GasLiquidBedInput, a: &Assessment) -> Result<Plot, GasLiquidBedError> {
    let mut plot = Plot::new(
        "bed_pressure_drop_vs_gas_flow",
        "Two-phase bed pressure drop against gas flow",
        Axis { label: "Gas flow at its reference state", dimension: Dimension::VolumetricFlow, log: true, unit: "" },
        Axis { label: "Bed pressure drop (friction)", dimension: Dimension::PressureDifference, log: true, unit: "" },
    );
    let q0 = input.gas_flow.flow.si();
    let mut recommended = Vec::with_capacity(POINTS);
    let mut band = Vec::with_capacity(POINTS);
    for i in 0..POINTS {
        let q = q0 * 10f64.powf(-1.0 + 2.0 * i as f64 / (POINTS - 1) as f64);
        let mut cond = a.conditions;
        cond.gas_feed = ReferenceFlow { flow: VolumetricFlow::from_si(q), state: input.gas_flow.state }.molar_flow();
        let mut lo = f64::INFINITY;
        let mut hi = f64::NEG_INFINITY;
        for (model, integrated) in TwoPhaseModel::ALL.into_iter().zip(&a.profiles) {
            // The middle point is this case: its profiles are already integrated.
            let dp = if cond == a.conditions { integrated.friction_drop } else { profile::chart_friction_drop(&cond, model)? };
            lo = lo.min(dp);
            hi = hi.max(dp);
            if model == RECOMMENDED {
                recommended.push((q, dp));
            }
        }
        band.push((q, lo, hi));
    }
    plot.band("Spread of the correlations", band);
    plot.line("Larkins–White–Jeffrey (recommended)", recommended, true);
    let cond = &a.conditions;
    let alone = cond.at(cond.outlet_pressure).liquid_alone().with_length(input.bed_length);
    plot.mark(Marker::Horizontal { label: "Liquid alone (Ergun)".to_owned(), y: ergun::pressure_drop(&alone).si(), limit: false });
    plot.mark(Marker::Horizontal {
        label: "Allowed bed drop (rating − back-pressure)".to_owned(),
        y: input.rating.si() - input.back_pressure.si(),
        limit: true,
    });
    plot.mark(Marker::Point { label: "This gas flow".to_owned(), x: q0, y: a.recommended()?.friction_drop });
    Ok(plot)
}
