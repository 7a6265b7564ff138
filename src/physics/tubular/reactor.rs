//! Bookkeeping of a plain tubular reactor: volume, residence time, productivity, and the
//! recirculation loop. Definitions, checked against hand calculations in the tests.

use super::{Operation, TubularInput};
use crate::physics::report::ModelInfo;
use crate::physics::units::{Concentration, Duration, Fraction, Length, MassFlow, MolarMass, Volume, VolumetricFlow};

/// Internal volume of a round tube.
pub const VOLUME_INFO: ModelInfo =
    ModelInfo { name: "Cylinder volume", formula: "V = π D² L / 4", source: "definition", validity: &[] };

/// Mean residence time of the liquid (plug flow: every element; laminar flow: the mean).
pub const RESIDENCE_TIME_INFO: ModelInfo = ModelInfo {
    name: "Mean residence time",
    formula: "τ = V / Q (mean; in laminar flow the centreline moves at twice the mean velocity)",
    source: "definition",
    validity: &[],
};

/// Productivity and space-time yield.
pub const PRODUCTIVITY_INFO: ModelInfo = ModelInfo {
    name: "Product balance",
    formula: "P = c Q Y M (single pass); P = c V_batch Y M / t_total (loop); STY = P / V",
    source: "definition",
    validity: &[],
};

/// Recirculation loop bookkeeping.
pub const LOOP_INFO: ModelInfo = ModelInfo {
    name: "Recirculation loop",
    formula: "V_batch = V_res + V; t_pass = V_batch / Q; t_total = N t_pass; t_tube = N τ; Q_single = Q / N",
    source: "definition (batch in a well-mixed reservoir, tube full)",
    validity: &[],
};

/// V = π D² L / 4.
pub fn internal_volume(inner_diameter: Length, length: Length) -> Volume {
    Volume::from_si(std::f64::consts::PI * inner_diameter.si().powi(2) * length.si() / 4.0)
}

/// τ = V / Q.
pub fn residence_time(volume: Volume, flow: VolumetricFlow) -> Duration {
    Duration::from_seconds(volume.si() / flow.si())
}

/// Figures of a recirculation loop.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct LoopFigures {
    /// Liquid circulating: reservoir plus the full tube.
    pub batch: Volume,
    /// Time to pump the whole batch through the tube once.
    pub turnover: Duration,
    /// Time for all passes.
    pub total: Duration,
    /// Mean cumulative time a liquid element spends in the tube.
    pub contact: Duration,
    /// Product made per batch, kg.
    pub product_mass_kg: f64,
    /// Flow at which one pass would give the same mean time in the tube.
    pub equivalent_flow: VolumetricFlow,
}

/// Production figures.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Production {
    /// Product mass per time.
    pub rate: MassFlow,
    /// Product mass per time per tube volume, kg s⁻¹ m⁻³.
    pub space_time_yield: f64,
    /// Loop figures when recirculating.
    pub recirculation: Option<LoopFigures>,
}

/// Productivity P = c Q Y M of one pass and the space-time yield P / V (kg s⁻¹ m⁻³) over the
/// volume `volume` (the tube, or a whole setup's line).
pub fn single_pass(concentration: Concentration, flow: VolumetricFlow, yield_fraction: Fraction, molar_mass: MolarMass, volume: Volume) -> (MassFlow, f64) {
    let rate = concentration.si() * flow.si() * yield_fraction.si() * molar_mass.si();
    (MassFlow::from_si(rate), rate / volume.si())
}

/// Productivity and space-time yield, and the loop figures when recirculating.
pub fn production(input: &TubularInput, volume: Volume) -> Production {
    let c = input.concentration.si();
    let y = input.yield_fraction.si();
    let m = input.molar_mass.si();
    let q = input.flow.si();
    match input.operation {
        Operation::SinglePass => {
            let (rate, space_time_yield) = single_pass(input.concentration, input.flow, input.yield_fraction, input.molar_mass, volume);
            Production { rate, space_time_yield, recirculation: None }
        }
        Operation::Recirculation { reservoir, passes } => {
            let n = f64::from(passes);
            let batch = reservoir.si() + volume.si();
            let turnover = batch / q;
            let total = n * turnover;
            let product = c * batch * y * m;
            let rate = product / total;
            Production {
                rate: MassFlow::from_si(rate),
                space_time_yield: rate / volume.si(),
                recirculation: Some(LoopFigures {
                    batch: Volume::from_si(batch),
                    turnover: Duration::from_seconds(turnover),
                    total: Duration::from_seconds(total),
                    contact: Duration::from_seconds(n * volume.si() / q),
                    product_mass_kg: product,
                    equivalent_flow: VolumetricFlow::from_si(q / n),
                }),
            }
        }
    }
}
