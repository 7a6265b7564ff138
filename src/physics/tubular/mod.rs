//! Plain tubular reactor: internal volume, residence time, productivity and space-time yield,
//! single pass or as a recirculation loop, with the laminar pressure drop checked against the
//! lowest-rated component.

mod reactor;

pub use reactor::{LOOP_INFO, PRODUCTIVITY_INFO, RESIDENCE_TIME_INFO, VOLUME_INFO, internal_volume, residence_time, single_pass};

use serde::Serialize;

use super::fluids::selection::{self, LiquidSelection};
use super::ambient;
use super::form::{ChoiceSpec, Collector, FieldSource};
use super::input::{Allowed, FieldSpec, InputError};
use super::pipe_flow::{self, hagen_poiseuille};
use super::report::{Check, Figure, NumericalError, Report, Verdict, budget_note, budget_verdict};
use super::tubing::{self, TubingChoice};
use super::units::{
    Concentration, Density, Dimension, DynamicViscosity, Fraction, Length, MolarMass, Pressure,
    PressureDifference, Volume, VolumetricFlow, format_significant,
};

use super::input::{field, lab};


/// Inner diameter of the tube.
pub const INNER_DIAMETER: FieldSpec = field("inner_diameter", "Tube inner diameter", Dimension::Length, lab::BORE, "Bore of the tubing (not the outer diameter).");
/// Tube length.
pub const LENGTH: FieldSpec = field("length", "Tube length", Dimension::Length, lab::TUBE_LENGTH, "Heated or irradiated length that counts as reactor.");
/// Total liquid flow through the tube.
pub const FLOW: FieldSpec = field("flow", "Total flow", Dimension::VolumetricFlow, lab::LIQUID_FLOW, "Sum of all pumped streams entering the tube.");
/// Concentration of the limiting substrate in the combined stream.
pub const CONCENTRATION: FieldSpec = field("concentration", "Substrate concentration", Dimension::Concentration, lab::CONCENTRATION, "Limiting substrate, in the combined stream after mixing.");
/// Product yield.
pub const YIELD: FieldSpec = field("yield", "Yield", Dimension::Fraction, Allowed::UNIT_FRACTION, "Expected or measured yield of product on the limiting substrate.");
/// Molar mass of the product.
pub const MOLAR_MASS: FieldSpec = field("molar_mass", "Product molar mass", Dimension::MolarMass, lab::MOLAR_MASS, "Molar mass of the isolated product.");
/// Liquid density.
pub const DENSITY: FieldSpec = field("density", "Liquid density", Dimension::Density, lab::LIQUID_DENSITY, "At the reaction temperature.");
/// Liquid viscosity.
pub const VISCOSITY: FieldSpec = field("viscosity", "Liquid viscosity", Dimension::DynamicViscosity, lab::VISCOSITY, "Dynamic viscosity at the reaction temperature.");
/// Back-pressure regulator set point (gauge).
pub const BACK_PRESSURE: FieldSpec = field("back_pressure", "Back-pressure (gauge)", Dimension::PressureDifference, lab::BACK_PRESSURE, "Set point of the back-pressure regulator at the outlet, above atmosphere; 0 if none.");
/// Rating of the weakest component (gauge).
pub const RATING: FieldSpec = field("pressure_rating", "Lowest component rating (gauge)", Dimension::PressureDifference, lab::PRESSURE, "Lowest working-pressure rating among pump, tubing at temperature, fittings and sensors.");
/// Reservoir volume of a recirculation loop.
pub const RESERVOIR: FieldSpec = field("reservoir_volume", "Reservoir volume", Dimension::Volume, Allowed::non_negative_up_to(0.1), "Liquid held in the reservoir outside the tube.");
/// Number of passes through the tube in a recirculation loop.
pub const PASSES: FieldSpec = field("passes", "Number of passes", Dimension::Number, lab::PASSES, "How many times the whole batch is pumped through the tube.");

/// Single pass or recirculation.
pub const OPERATION: ChoiceSpec = ChoiceSpec {
    key: "operation",
    label: "Operation",
    options: &[("single_pass", "Single pass"), ("recirculation", "Recirculation loop")],
};

/// Every quantity field, in page order.
pub const FIELDS: &[FieldSpec] = &[
    INNER_DIAMETER, LENGTH, FLOW, CONCENTRATION, YIELD, MOLAR_MASS, DENSITY, VISCOSITY,
    BACK_PRESSURE, ambient::AMBIENT_PRESSURE, RATING, RESERVOIR, PASSES,
];

/// How the tube is operated.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "mode", rename_all = "snake_case")]
pub enum Operation {
    /// The feed passes the tube once.
    SinglePass,
    /// A batch in a reservoir is pumped round through the tube.
    Recirculation {
        /// Liquid in the reservoir outside the tube.
        reservoir: Volume,
        /// Times the whole batch passes the tube.
        passes: u32,
    },
}

/// Validated inputs of the tubular reactor.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct TubularInput {
    /// Tube bore.
    pub inner_diameter: Length,
    /// Tube length.
    pub length: Length,
    /// Total liquid flow.
    pub flow: VolumetricFlow,
    /// Limiting substrate in the combined stream.
    pub concentration: Concentration,
    /// Product yield on the limiting substrate.
    pub yield_fraction: Fraction,
    /// Product molar mass.
    pub molar_mass: MolarMass,
    /// The liquid: a built-in solvent at a temperature, or entered properties.
    pub liquid: LiquidSelection,
    /// Liquid density at the working temperature (from `liquid`).
    pub density: Density,
    /// Liquid viscosity at the working temperature (from `liquid`).
    pub viscosity: DynamicViscosity,
    /// The tubing from the table, for its rating at temperature.
    pub tubing: Option<TubingChoice>,
    /// Back-pressure regulator set point, gauge.
    pub back_pressure: PressureDifference,
    /// Atmospheric pressure the gauge pressures are measured against.
    pub ambient: Pressure,
    /// Lowest component rating, gauge.
    pub rating: PressureDifference,
    /// Single pass or loop.
    pub operation: Operation,
}

impl TubularInput {
    /// Builds validated inputs from a source, reporting every bad field at once.
    pub fn from_source(src: &dyn FieldSource) -> Result<Self, Vec<InputError>> {
        let mut c = Collector::default();
        let mut q = |spec: &FieldSpec| c.take(src.quantity(spec));
        let inner_diameter = q(&INNER_DIAMETER);
        let length = q(&LENGTH);
        let flow = q(&FLOW);
        let concentration = q(&CONCENTRATION);
        let yield_fraction = q(&YIELD);
        let molar_mass = q(&MOLAR_MASS);
        let back_pressure = q(&BACK_PRESSURE);
        let rating = q(&RATING);
        let (liquid, density, viscosity) = selection::read_with_properties(src, &mut c, &DENSITY, &VISCOSITY);
        let tubing = tubing::read(src, &mut c, &selection::TEMPERATURE);
        let ambient = ambient::read(src, &mut c);
        let operation = match c.take(src.choice(&OPERATION)) {
            Some(1) => {
                let reservoir = c.take(src.quantity(&RESERVOIR));
                let passes = c.take(src.quantity(&PASSES));
                match (reservoir, passes) {
                    (Some(r), Some(n)) => Some(Operation::Recirculation {
                        reservoir: Volume::from_si(r),
                        // Validated as a whole number ≥ 1; saturates only beyond u32::MAX.
                        passes: n.min(f64::from(u32::MAX)) as u32,
                    }),
                    _ => None,
                }
            }
            Some(_) => Some(Operation::SinglePass),
            None => None,
        };
        match (
            inner_diameter, length, flow, concentration, yield_fraction, molar_mass, density,
            viscosity, back_pressure, rating, operation, tubing, ambient,
        ) {
            (Some(d), Some(l), Some(f), Some(cn), Some(y), Some(m), Some(rho), Some(mu), Some(bp), Some(r), Some(op), Some(tubing), Some(ambient)) => {
                Ok(Self {
                    inner_diameter: Length::from_si(d),
                    length: Length::from_si(l),
                    flow: VolumetricFlow::from_si(f),
                    concentration: Concentration::from_si(cn),
                    yield_fraction: Fraction::from_si(y),
                    molar_mass: MolarMass::from_si(m),
                    liquid: liquid.unwrap_or(LiquidSelection::Custom { density: Density::from_si(rho), viscosity: DynamicViscosity::from_si(mu) }),
                    density: Density::from_si(rho),
                    viscosity: DynamicViscosity::from_si(mu),
                    tubing,
                    ambient,
                    back_pressure: PressureDifference::from_si(bp),
                    rating: PressureDifference::from_si(r),
                    operation: op,
                })
            }
            _ => Err(c.into_errors()),
        }
    }
}



fn pressure_check(inlet: PressureDifference, dp: PressureDifference, rating: PressureDifference) -> Check {
    let bar = |p: PressureDifference| format_significant(p.bar(), 3);
    let ratio = inlet.si() / rating.si();
    let verdict = budget_verdict(ratio, ratio);
    let caution = crate::physics::hazards::over_pressure_caution(verdict, crate::physics::hazards::LineContents::Liquid);
    let reason = format!(
        "Inlet pressure {} bar(g) (back-pressure + {} line drop) is {:.0} % of the {} bar(g) rating{}.",
        bar(inlet),
        Dimension::PressureDifference.show(dp.si(), 3),
        ratio * 100.0,
        bar(rating),
        budget_note(verdict, ": over the rating")
    );
    Check { key: "pressure_budget", topic: "Pressure budget", verdict, reason, caution }
}

fn regime_check(re: f64) -> Check {
    let laminar = re <= hagen_poiseuille::LAMINAR_REYNOLDS_LIMIT;
    Check {
        key: "flow_regime",
        topic: "Flow regime",
        verdict: if laminar { Verdict::Fine } else { Verdict::Caution },
        reason: if laminar {
            format!("Laminar (Re = {}).", format_significant(re, 3))
        } else {
            format!(
                "Re = {} is above the laminar limit of about 2100: the laminar pressure drop underestimates the real one.",
                format_significant(re, 3)
            )
        },
        caution: None,
    }
}

/// Computes every figure and check for the tubular reactor.
pub fn evaluate(input: &TubularInput) -> Result<Report, NumericalError> {
    let volume = reactor::internal_volume(input.inner_diameter, input.length);
    let tau = reactor::residence_time(volume, input.flow);
    let u = pipe_flow::mean_velocity(input.flow, input.inner_diameter);
    let re = pipe_flow::reynolds(input.density, u, input.inner_diameter, input.viscosity);
    let dp = hagen_poiseuille::pressure_drop(input.viscosity, input.length, input.inner_diameter, input.flow);
    let inlet = PressureDifference::from_si(input.back_pressure.si() + dp.si());
    let dp_warnings = hagen_poiseuille::INFO
        .validity
        .iter()
        .filter_map(|b| b.check(re, &hagen_poiseuille::INFO))
        .collect();

    let mut figures = input.liquid.figures()?;
    figures.extend([
        Figure::definition("internal_volume", "Internal volume", Dimension::Volume, VOLUME_INFO, volume.si())?,
        Figure::definition("residence_time", "Residence time", Dimension::Duration, RESIDENCE_TIME_INFO, tau.si())?,
        Figure::definition("mean_velocity", "Mean velocity", Dimension::Velocity, pipe_flow::VELOCITY_INFO, u.si())?,
        Figure::definition("reynolds", "Reynolds number", Dimension::Number, pipe_flow::REYNOLDS_INFO, re)?,
        Figure::single("pressure_drop", "Line pressure drop", Dimension::PressureDifference, hagen_poiseuille::INFO, dp.si(), dp_warnings)?,
        Figure::definition("inlet_pressure", "Inlet pressure (gauge)", Dimension::PressureDifference, pipe_flow::INLET_PRESSURE_INFO, inlet.si())?,
    ]);

    let production = reactor::production(input, volume);
    figures.push(Figure::definition("productivity", "Productivity", Dimension::MassFlow, PRODUCTIVITY_INFO, production.rate.si())?);
    figures.push(Figure::definition("space_time_yield", "Space-time yield", Dimension::SpaceTimeYield, PRODUCTIVITY_INFO, production.space_time_yield)?);
    if let Some(lp) = production.recirculation {
        figures.push(Figure::definition("batch_volume", "Circulating batch", Dimension::Volume, LOOP_INFO, lp.batch.si())?);
        figures.push(Figure::definition("turnover_time", "Time per pass of the batch", Dimension::Duration, LOOP_INFO, lp.turnover.si())?);
        figures.push(Figure::definition("total_time", "Total run time", Dimension::Duration, LOOP_INFO, lp.total.si())?);
        figures.push(Figure::definition("contact_time", "Mean time in the tube per element", Dimension::Duration, LOOP_INFO, lp.contact.si())?);
        figures.push(Figure::definition("batch_product", "Product per batch", Dimension::Mass, LOOP_INFO, lp.product_mass_kg)?);
        figures.push(Figure::definition("single_pass_flow", "Single-pass flow for the same contact time", Dimension::VolumetricFlow, LOOP_INFO, lp.equivalent_flow.si())?);
    }

    let mut checks = vec![pressure_check(inlet, dp, input.rating), regime_check(re)];
    if let Some(tubing) = &input.tubing {
        let mut check = tubing::check(tubing, inlet, &input.liquid.solvents());
        tubing::note_bore_mismatch(tubing, input.inner_diameter, &mut check);
        checks.push(check);
    }
    checks.extend(input.liquid.checks(Pressure::from_gauge(input.back_pressure, input.ambient)));
    Ok(Report { figures, checks, plots: Vec::new(), advice: Vec::new(), diagrams: Vec::new() })
}
