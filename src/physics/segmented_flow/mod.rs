//! Gas–liquid segmented (Taylor) flow in a coil: gas bookkeeping from a reference-state flow,
//! regime, film, bubble velocity, bubble and slug lengths, interfacial area and k_L a with their
//! spreads, saturation against residence time, and the pressure profile with the gas expanding
//! towards the back-pressure regulator; checks on regime, pressure rating, boiling and gas hazards.

pub mod akbar;
pub mod aussillous_quere;
pub mod bercic_pintar;
pub mod bretherton;
pub mod bubble_velocity;
pub mod cell;
pub mod checks;
pub mod confinement;
pub mod error;
pub mod flow;
pub mod garstecki;
pub mod kreutzer;
pub mod lengths;
pub mod liu;
pub mod map;
pub mod mass_transfer;
pub mod plots;
pub mod pressure_profile;
pub mod qian_lawal;
pub mod quantities;
pub mod separated_flow;
pub mod van_baten_krishna;
pub mod van_steijn;
pub mod vandu;
pub mod yue;
pub mod yue_2009;

pub use error::SegmentedFlowError;
pub use pressure_profile::{Coil, GasExpansion, PressureDropModel, Profile, Vapour};

use serde::Serialize;

use self::cell::UnitCell;
use self::flow::{CAPILLARY_BUBBLE, range_warnings};
use super::fluids::{self, Liquid, Solvent};
use super::form::{ChoiceSpec, Collector, FieldSource};
use super::gases::reference_state;
use super::gases::{Gas, HenrySolubility, MolarFlow, ReferenceFlow, ReferenceState, henry, sutherland};
use super::diagram::{Diagram, SlugPlace, SlugStrip};
use super::hazards;
use super::input::{Allowed, FieldSpec, InputError};
use super::report::{Check, Estimate, Figure, Finite, ModelInfo, RangeWarning, Report, Verdict, budget_verdict};
use super::tubing::{self, TubingChoice};
use super::units::{
    Concentration, Diffusivity, Dimension, DynamicViscosity, Length, MolarMass, Pressure, PressureDifference,
    Temperature, VolumetricFlow, format_significant,
};

use super::input::{field, lab};

const BELOW_ONE: Allowed = Allowed { low: 0.0, low_inclusive: true, high: Some(1.0), high_inclusive: false, whole: false };

/// The gas.
pub const GAS: ChoiceSpec = ChoiceSpec {
    key: "gas",
    label: "Gas",
    options: &[
        ("oxygen", "Oxygen (O₂)"),
        ("hydrogen", "Hydrogen (H₂)"),
        ("nitrogen", "Nitrogen (N₂)"),
        ("carbon_monoxide", "Carbon monoxide (CO)"),
        ("carbon_dioxide", "Carbon dioxide (CO₂)"),
        ("air", "Air (20.95 % O₂)"),
    ],
};
/// Mole fraction of the named gas in the feed, the rest nitrogen (not read for air and nitrogen).
pub const GAS_MOLE_FRACTION: FieldSpec = field("gas_mole_fraction", "Gas in the feed (rest N₂)", Dimension::Fraction, Allowed::UNIT_FRACTION, "Mole fraction of the named gas in the cylinder or mixture, the balance nitrogen (e.g. 9 % O₂ in N₂); 100 % for the pure gas.");
/// Gas flow at the reference state.
pub const GAS_FLOW: FieldSpec = field("gas_flow", "Gas flow at the reference state", Dimension::VolumetricFlow, lab::GAS_FLOW, "Reading of the mass-flow controller, in volume per time at its reference state (choose the state below).");
/// Reference state of the gas flow.
pub const REFERENCE_STATE: ChoiceSpec = ChoiceSpec {
    key: "reference_state",
    label: "Reference state of the gas flow",
    options: &[
        ("normal", "0 °C, 1 atm (normal, mLn/min; most sccm)"),
        ("standard_20c", "20 °C, 1 atm (standard, mLs/min)"),
        ("satp", "25 °C, 1 bar (SATP)"),
        ("user_defined", "Other (enter temperature and pressure)"),
    ],
};
/// User-defined reference temperature.
pub const REFERENCE_TEMPERATURE: FieldSpec = field("reference_temperature", "Reference temperature", Dimension::Temperature, lab::REFERENCE_TEMPERATURE, "Temperature the flow reading refers to (see the instrument's manual).");
/// User-defined reference pressure (absolute).
pub const REFERENCE_PRESSURE: FieldSpec = field("reference_pressure", "Reference pressure (absolute)", Dimension::Pressure, lab::ABSOLUTE_PRESSURE, "Absolute pressure the flow reading refers to.");
/// Liquid flow.
pub const LIQUID_FLOW: FieldSpec = field("liquid_flow", "Liquid flow", Dimension::VolumetricFlow, lab::LIQUID_FLOW, "Total liquid pumped into the gas–liquid junction.");
/// Substrate concentration in the liquid.
pub const CONCENTRATION: FieldSpec = field("concentration", "Substrate concentration", Dimension::Concentration, lab::CONCENTRATION, "Substrate that consumes the gas, in the liquid after mixing.");
/// Tube bore.
pub const INNER_DIAMETER: FieldSpec = field("inner_diameter", "Tube inner diameter", Dimension::Length, lab::BORE, "Bore of the coil; the junction is taken to have the same bore.");
/// Coil length.
pub const LENGTH: FieldSpec = field("length", "Coil length", Dimension::Length, lab::TUBE_LENGTH, "From the gas–liquid junction to the back-pressure regulator.");
/// Temperature.
pub const TEMPERATURE: FieldSpec = field("temperature", "Temperature", Dimension::Temperature, lab::TEMPERATURE, "Temperature of the coil (taken as uniform).");
/// Back-pressure regulator set point (gauge).
pub const BACK_PRESSURE: FieldSpec = field("back_pressure", "Back-pressure (gauge)", Dimension::PressureDifference, lab::BACK_PRESSURE, "Set point of the back-pressure regulator, above atmosphere; 0 if none.");
/// Lowest component rating (gauge).
pub const RATING: FieldSpec = field("pressure_rating", "Lowest component rating (gauge)", Dimension::PressureDifference, lab::PRESSURE, "Lowest working-pressure rating among tubing at temperature, fittings, mixer, regulator and sensors.");
/// The liquid.
pub const SOLVENT: ChoiceSpec = ChoiceSpec { key: "solvent", label: "Liquid", options: fluids::selection::SINGLE_LIQUID_OPTIONS };
/// The gas–liquid junction.
pub const JUNCTION: ChoiceSpec = ChoiceSpec {
    key: "junction",
    label: "Gas–liquid junction",
    options: &[("tee", "T-junction"), ("cross", "Cross (flow-focusing) junction")],
};
/// Main-channel width of the junction.
pub const JUNCTION_WIDTH: FieldSpec = field("junction_width", "Junction main-channel width", Dimension::Length, lab::BORE, "Bore of the junction's main (liquid) channel where the bubbles pinch off; the tube's bore if the tube forms the junction.");
/// Where the gas solubility comes from for a built-in solvent.
pub const SOLUBILITY_SOURCE: ChoiceSpec = ChoiceSpec {
    key: "solubility_source",
    label: "Gas solubility",
    options: &[("built_in", "Built-in (water: IAPWS G7-04; O₂: each solvent's own value; other gases in organics: order of magnitude)"), ("entered", "Enter a measured value")],
};
/// Entered solubility: concentration at 1 bar partial pressure of the gas.
pub const SOLUBILITY: FieldSpec = field("solubility", "Gas solubility at 1 bar of the gas", Dimension::Concentration, lab::CONCENTRATION, "Dissolved concentration at saturation under 1 bar partial pressure of the gas, at the working temperature.");
/// Entered diffusivity of the gas in a custom liquid.
pub const DIFFUSIVITY: FieldSpec = field("diffusivity", "Gas diffusivity in the liquid", Dimension::Diffusivity, lab::DIFFUSIVITY, "Diffusion coefficient of the dissolved gas (typically 1–10 × 10⁻⁵ cm²/s).");
/// Whether gas is consumed in the coil.
pub const CONSUMPTION: ChoiceSpec = ChoiceSpec {
    key: "consumption",
    label: "Gas consumption in the coil",
    options: &[("none", "None (gas passes through)"), ("consumed", "Part of the gas is consumed")],
};
/// Share of the fed reactive gas consumed in the coil.
pub const CONSUMED_FRACTION: FieldSpec = field("consumed_fraction", "Share of the gas consumed in the coil", Dimension::Fraction, BELOW_ONE, "Fraction of the fed gas taken up by reaction or dissolution between junction and regulator, spread evenly along the coil.");

pub use crate::physics::hazards::oxygen::{LIMITING_OXYGEN_FIELD, LOC_SOURCE};

/// Every quantity field, in page order.
pub const FIELDS: &[FieldSpec] = &[
    GAS_MOLE_FRACTION, GAS_FLOW, REFERENCE_TEMPERATURE, REFERENCE_PRESSURE, LIQUID_FLOW, CONCENTRATION, INNER_DIAMETER, JUNCTION_WIDTH,
    LENGTH, TEMPERATURE, BACK_PRESSURE, crate::physics::ambient::AMBIENT_PRESSURE, RATING, fluids::CUSTOM_DENSITY, fluids::CUSTOM_VISCOSITY,
    fluids::CUSTOM_SURFACE_TENSION, SOLUBILITY, DIFFUSIVITY, CONSUMED_FRACTION, LIMITING_OXYGEN_FIELD,
];

/// Every choice field, in page order.
pub const CHOICES: &[ChoiceSpec] = &[GAS, REFERENCE_STATE, SOLVENT, SOLUBILITY_SOURCE, CONSUMPTION, JUNCTION, LOC_SOURCE];

/// The liquid and where its gas data come from.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum LiquidSpec {
    /// A built-in solvent, properties at the working temperature.
    Solvent {
        /// The solvent.
        solvent: Solvent,
        /// Entered solubility at 1 bar of the gas, if not built-in.
        solubility: Option<Concentration>,
    },
    /// A liquid with entered properties.
    Custom {
        /// Density, viscosity, surface tension.
        liquid: Liquid,
        /// Gas diffusivity in it.
        diffusivity: Diffusivity,
        /// Solubility at 1 bar of the gas.
        solubility: Concentration,
    },
}

/// Validated inputs of the segmented-flow calculator.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct SegmentedFlowInput {
    /// The gas.
    pub gas: Gas,
    /// Mole fraction of the gas in the feed, the rest nitrogen (air: its O₂ fraction is built in).
    pub gas_mole_fraction: f64,
    /// Gas flow with its reference state.
    pub gas_flow: ReferenceFlow,
    /// Liquid flow.
    pub liquid_flow: VolumetricFlow,
    /// Substrate concentration in the liquid.
    pub concentration: Concentration,
    /// Tube bore.
    pub inner_diameter: Length,
    /// Junction kind: true for a cross (flow-focusing) junction, false for a T-junction.
    pub cross_junction: bool,
    /// Main-channel width of the junction.
    pub junction_width: Length,
    /// Coil length.
    pub length: Length,
    /// Temperature.
    pub temperature: Temperature,
    /// Back-pressure set point, gauge.
    pub back_pressure: PressureDifference,
    /// Atmospheric pressure the gauge pressures are measured against.
    pub ambient: crate::physics::units::Pressure,
    /// Lowest component rating, gauge.
    pub rating: PressureDifference,
    /// The liquid.
    pub liquid: LiquidSpec,
    /// Share of the fed reactive gas consumed in the coil, in [0, 1).
    pub consumed_fraction: f64,
    /// The limiting oxygen concentration entered for the liquid, if any (oxidising gases only);
    /// `None` takes the estimate of [`crate::physics::hazards::oxygen::limit_for`].
    pub limiting_oxygen: Option<f64>,
    /// The coil's tubing from the table, for its rating at temperature.
    pub tubing: Option<TubingChoice>,
}

fn gas_of(index: usize) -> Gas {
    Gas::ALL.get(index).copied().unwrap_or(Gas::Air)
}

/// Reads the gas, its mole fraction in the feed (not asked for air and nitrogen) and its flow
/// with the reference state: the gas entries every gas–liquid calculator and the setup's gas
/// feed share.
pub fn read_gas(src: &dyn FieldSource, c: &mut Collector) -> Option<(Gas, f64, ReferenceFlow)> {
    let gas = c.take(src.choice(&GAS)).map(gas_of);
    let y = match gas {
        Some(Gas::Air | Gas::Nitrogen) => Some(1.0),
        Some(_) => c.take(src.quantity(&GAS_MOLE_FRACTION)),
        None => None,
    };
    let flow = c.take(src.quantity(&GAS_FLOW));
    let state = match c.take(src.choice(&REFERENCE_STATE)) {
        Some(3) => {
            let t = c.take(src.quantity(&REFERENCE_TEMPERATURE));
            let p = c.take(src.quantity(&REFERENCE_PRESSURE));
            Some(ReferenceState::UserDefined { temperature: Temperature::from_si(t?), pressure: Pressure::from_si(p?) })
        }
        Some(i) => ReferenceState::BUILT_IN.get(i).copied(),
        None => None,
    };
    Some((gas?, y?, ReferenceFlow { flow: VolumetricFlow::from_si(flow?), state: state? }))
}

impl SegmentedFlowInput {
    /// Builds validated inputs from a source, reporting every bad field at once. Fields that the
    /// choices make irrelevant are not read.
    pub fn from_source(src: &dyn FieldSource) -> Result<Self, Vec<InputError>> {
        let mut c = Collector::default();
        let gas_feed = read_gas(src, &mut c);
        let gas = gas_feed.map(|g| g.0);
        let liquid_flow = c.take(src.quantity(&LIQUID_FLOW));
        let concentration = c.take(src.quantity(&CONCENTRATION));
        let inner_diameter = c.take(src.quantity(&INNER_DIAMETER));
        let cross_junction = c.take(src.choice(&JUNCTION)).map(|i| i == 1);
        let junction_width = c.take(src.quantity(&JUNCTION_WIDTH));
        let length = c.take(src.quantity(&LENGTH));
        let temperature = c.take(src.quantity(&TEMPERATURE));
        let back_pressure = c.take(src.quantity(&BACK_PRESSURE));
        let ambient = crate::physics::ambient::read(src, &mut c);
        let rating = c.take(src.quantity(&RATING));
        let liquid = match c.take(src.choice(&SOLVENT)) {
            Some(i) if i < Solvent::ALL.len() => {
                let solubility = match c.take(src.choice(&SOLUBILITY_SOURCE)) {
                    Some(0) => Some(None),
                    Some(_) => c.take(src.quantity(&SOLUBILITY)).map(|s| Some(Concentration::from_si(s))),
                    None => None,
                };
                solubility.map(|solubility| LiquidSpec::Solvent { solvent: Solvent::ALL[i], solubility })
            }
            Some(_) => {
                let rho = c.take(src.quantity(&fluids::CUSTOM_DENSITY));
                let mu = c.take(src.quantity(&fluids::CUSTOM_VISCOSITY));
                let sigma = c.take(src.quantity(&fluids::CUSTOM_SURFACE_TENSION));
                let dm = c.take(src.quantity(&DIFFUSIVITY));
                let s = c.take(src.quantity(&SOLUBILITY));
                match (rho, mu, sigma, dm, s) {
                    (Some(rho), Some(mu), Some(sigma), Some(dm), Some(s)) => c
                        .take(Liquid::custom(
                            super::units::Density::from_si(rho),
                            DynamicViscosity::from_si(mu),
                            super::units::SurfaceTension::from_si(sigma),
                            None,
                        ))
                        .map(|liquid| LiquidSpec::Custom { liquid, diffusivity: Diffusivity::from_si(dm), solubility: Concentration::from_si(s) }),
                    _ => None,
                }
            }
            None => None,
        };
        // Asked only where it matters: an oxidising gas.
        let limiting_oxygen = hazards::oxygen::read(src, &mut c, gas);
        let consumed_fraction = match c.take(src.choice(&CONSUMPTION)) {
            Some(0) => Some(0.0),
            Some(_) => c.take(src.quantity(&CONSUMED_FRACTION)),
            None => None,
        };
        let tubing = tubing::read(src, &mut c, &TEMPERATURE);
        let (Some((gas, y, gas_flow)), Some(ql), Some(cn), Some(d), Some(l), Some(t), Some(bp), Some(rating), Some(liquid), Some(consumed), Some(cross), Some(w), Some(ambient), Some(limiting_oxygen), Some(tubing)) = (
            gas_feed, liquid_flow, concentration, inner_diameter, length, temperature, back_pressure, rating,
            liquid, consumed_fraction, cross_junction, junction_width, ambient, limiting_oxygen, tubing,
        ) else {
            return Err(c.into_errors());
        };
        Ok(Self {
            gas,
            gas_mole_fraction: y,
            gas_flow,
            liquid_flow: VolumetricFlow::from_si(ql),
            concentration: Concentration::from_si(cn),
            inner_diameter: Length::from_si(d),
            cross_junction: cross,
            junction_width: Length::from_si(w),
            length: Length::from_si(l),
            temperature: Temperature::from_si(t),
            back_pressure: PressureDifference::from_si(bp),
            ambient,
            rating: PressureDifference::from_si(rating),
            liquid,
            consumed_fraction: consumed,
            limiting_oxygen,
            tubing,
        })
    }

    /// The dissolving, reacting species and its mole fraction in the feed.
    pub fn reactive(&self) -> (Gas, f64) {
        self.gas.reactive_in_feed(self.gas_mole_fraction)
    }

    /// Molar mass and viscosity of the feed ([`Gas::feed_properties`]).
    fn feed_properties(&self) -> (MolarMass, DynamicViscosity, Vec<RangeWarning>) {
        self.gas.feed_properties(self.gas_mole_fraction, self.temperature)
    }
}


/// Metadata of the true liquid residence time.
pub const RESIDENCE_TIME_INFO: ModelInfo = ModelInfo {
    name: "Residence time in segmented flow",
    formula: "τ = ∫ dz / U_B (liquid rides in the slugs at the bubble velocity)",
    source: "derived, integrated along the pressure profile",
    validity: &[],
};

/// Metadata of the liquid-only residence time, for comparison.
pub const NOMINAL_RESIDENCE_INFO: ModelInfo = ModelInfo {
    name: "Liquid-only residence time",
    formula: "τ₀ = (π D²/4) L / Q_L (as if the liquid filled the tube)",
    source: "definition",
    validity: &[],
};

/// Metadata of the inlet pressure.
pub const INLET_PRESSURE_INFO: ModelInfo = ModelInfo {
    name: "Pressure profile",
    formula: "P_in = P_out + ∫ (dP/dz) dz, integrated upstream with the gas expanding (isothermal ideal gas)",
    source: "derived; gradient by Kreutzer et al. (2005), a = 0.17",
    validity: &[],
};

/// Metadata of the outlet pressure.
pub const OUTLET_PRESSURE_INFO: ModelInfo = ModelInfo {
    name: "Outlet pressure",
    formula: "P_out = p_back (gauge) + P_atm",
    source: "definition (P_atm the entered atmospheric pressure)",
    validity: &[],
};

fn estimate(quantity: &'static str, model: ModelInfo, value: f64, recommended: bool, warnings: Vec<RangeWarning>) -> Result<Estimate, SegmentedFlowError> {
    Ok(Estimate { model, value: Finite::new(quantity, value)?, recommended, warnings })
}

fn spread(key: &'static str, label: &'static str, dimension: Dimension, recommendation: &'static str, estimates: Vec<Estimate>) -> Result<Figure, SegmentedFlowError> {
    let value = estimates
        .iter()
        .find(|e| e.recommended)
        .map(|e| e.value)
        .ok_or(SegmentedFlowError::Numerical(super::report::NumericalError::NotFinite { quantity: label }))?;
    Ok(Figure { key, label, dimension, value, recommendation, estimates })
}

fn bar(pa: f64) -> String {
    format_significant(pa / 1e5, 3)
}

/// Everything the calculator computes: the report and the profiles for plotting.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SegmentedFlowResult {
    /// Figures and checks.
    pub report: Report,
    /// Pressure, bubble length and gas fraction along the coil (recommended models).
    pub profile: Profile,
}

/// Computes every figure and check for segmented flow.
pub fn evaluate(input: &SegmentedFlowInput) -> Result<Report, SegmentedFlowError> {
    Ok(evaluate_with_profile(input)?.report)
}

/// Computes every figure, check and profile for segmented flow.
pub fn evaluate_with_profile(input: &SegmentedFlowInput) -> Result<SegmentedFlowResult, SegmentedFlowError> {
    let t = input.temperature;
    let (liquid, liquid_range_warnings, diffusivity_figure) = liquid_state(input)?;
    let (reactive, y) = input.reactive();
    let feed = input.gas_flow.molar_flow();
    let reactive_feed = MolarFlow::from_si(feed.si() * y);
    let consumed = MolarFlow::from_si(reactive_feed.si() * input.consumed_fraction);
    let (molar_mass, gas_viscosity, gas_warnings) = input.feed_properties();
    let p_out = Pressure::from_gauge(input.back_pressure, input.ambient);
    // The gas slugs carry the solvent's vapour, unless the liquid boils at the outlet (reported by
    // the boiling check) or its vapour pressure is unknown (an entered liquid).
    let vapour = match input.liquid {
        LiquidSpec::Solvent { solvent, .. } => liquid
            .vapour_pressure
            .filter(|p_sat| p_sat.pascals() < p_out.pascals())
            .map(|pressure| Vapour { pressure, molar_mass: solvent.molar_mass() }),
        LiquidSpec::Custom { .. } => None,
    };
    let coil = Coil {
        diameter: input.inner_diameter,
        junction_width: input.junction_width,
        length: input.length,
        temperature: t,
        liquid,
        liquid_flow: input.liquid_flow,
        gas_feed: feed,
        gas_molar_mass: molar_mass,
        gas_viscosity,
        consumption: consumed,
        outlet_pressure: p_out,
        vapour,
        length_model: lengths::RECOMMENDED,
        pressure_model: pressure_profile::RECOMMENDED,
        expansion: GasExpansion::Isothermal,
    };
    let profile = coil.profile()?;
    let mut dp_estimates = Vec::new();
    let outlet_gas = feed.si() - consumed.si();
    let outlet = UnitCell::with_frequency(coil.flow_at(p_out.pascals(), outlet_gas), profile.frequency)?;
    let junction = coil.junction_cell(profile.inlet_pressure)?;
    for model in PressureDropModel::ALL {
        let dp = if model == pressure_profile::RECOMMENDED {
            profile.pressure_drop()
        } else {
            Coil { pressure_model: model, ..coil }.pressure_drop(Some(profile.inlet_pressure))?
        };
        let mut warnings = model.warnings(&outlet);
        for w in model.warnings(&junction) {
            if !warnings.contains(&w) {
                warnings.push(w);
            }
        }
        dp_estimates.push(estimate("pressure drop", model.info(), dp, model == pressure_profile::RECOMMENDED, warnings)?);
    }
    let dp_figure = spread("pressure_drop", "Coil pressure drop", Dimension::PressureDifference, pressure_profile::RECOMMENDATION, dp_estimates)?;
    let f = &outlet.flow;
    let d = f.diameter.si();
    let u_tp = f.two_phase_velocity();
    let bond = f.bond();

    let (flow_info, density_info) = match vapour {
        Some(_) => (pressure_profile::SATURATED_FLOW_INFO, pressure_profile::SATURATED_DENSITY_INFO),
        None => (pressure_profile::DRY_FLOW_INFO, reference_state::DENSITY_INFO),
    };
    let mut figures = vec![
        Figure::definition("gas_molar_flow_mmol_per_min", "Gas fed (mmol/min, all species)", Dimension::Number, reference_state::MOLAR_FLOW_INFO, feed.mmol_per_min())?,
        Figure::definition("gas_equivalents", "Reactive gas per mole of substrate (equivalents)", Dimension::Number, reference_state::EQUIVALENTS_INFO, reactive_feed.equivalents(input.concentration, input.liquid_flow))?,
        Figure::definition("gas_flow_inlet", "Actual gas flow at the inlet", Dimension::VolumetricFlow, flow_info, junction.flow.gas_flow.si())?,
        Figure::definition("gas_flow_outlet", "Actual gas flow at the outlet", Dimension::VolumetricFlow, flow_info, f.gas_flow.si())?,
    ];
    if let Some(v) = vapour {
        let p_sat = v.pressure.pascals();
        figures.push(Figure::definition("vapour_volume_added", "Gas volume added by the solvent's vapour (outlet)", Dimension::Fraction, pressure_profile::VAPOUR_SHARE_INFO, p_sat / (p_out.pascals() - p_sat))?);
    }
    figures.extend([
        Figure::definition("gas_density_outlet", "Gas density at the outlet", Dimension::Density, density_info, f.gas_density.si())?,
        Figure::single("gas_viscosity", "Gas viscosity", Dimension::DynamicViscosity, sutherland::INFO, gas_viscosity.si(), gas_warnings)?,
        Figure::definition("gas_fraction_outlet", "Gas fraction β at the outlet", Dimension::Fraction, flow::BOOKKEEPING_INFO, f.gas_fraction())?,
        Figure::definition("two_phase_velocity_outlet", "Two-phase velocity U_TP at the outlet", Dimension::Velocity, flow::BOOKKEEPING_INFO, u_tp.si())?,
        Figure::single("bond", "Bond number", Dimension::Number, confinement::INFO, bond, range_warnings(&confinement::INFO, &[(confinement::BOND, bond)]))?,
        Figure::definition("capillary_outlet", "Capillary number Ca (U_TP, outlet)", Dimension::Number, flow::GROUPS_INFO, f.capillary(u_tp))?,
        Figure::definition("reynolds_outlet", "Reynolds number Re (U_TP, outlet)", Dimension::Number, flow::GROUPS_INFO, f.reynolds(u_tp))?,
        Figure::definition("weber_outlet", "Weber number We (U_TP, outlet)", Dimension::Number, flow::GROUPS_INFO, f.weber(u_tp))?,
    ]);
    let ca_b = outlet.bubble.capillary;
    let ca_star = aussillous_quere::inertial_threshold(f.liquid.viscosity.si(), f.liquid.surface_tension.si(), f.liquid.density.si(), d / 2.0);
    let ca_warn = |info: &ModelInfo| {
        range_warnings(info, &[(CAPILLARY_BUBBLE, ca_b), (flow::DIAMETER, d), (aussillous_quere::INERTIAL_RATIO, ca_b / ca_star)])
    };
    figures.push(spread(
        "film_thickness",
        "Wall film thickness at the outlet",
        Dimension::Length,
        "Aussillous–Quéré: fitted to Taylor's data up to Ca ≈ 1; Bretherton's asymptote holds only for Ca_B below about 0.003.",
        vec![
            estimate("film thickness", aussillous_quere::INFO, outlet.film_thickness(), true, ca_warn(&aussillous_quere::INFO))?,
            estimate("film thickness", bretherton::FILM_INFO, bretherton::relative_film_thickness(ca_b) * d / 2.0, false, ca_warn(&bretherton::FILM_INFO))?,
        ],
    )?);
    let mut ub = vec![estimate("bubble velocity", bubble_velocity::INFO, outlet.bubble.velocity, true, ca_warn(&bubble_velocity::INFO))?];
    if let Some(u) = liu::bubble_velocity(u_tp.si(), f.liquid.viscosity.si(), f.liquid.surface_tension.si()) {
        ub.push(estimate("bubble velocity", liu::INFO, u, false, range_warnings(&liu::INFO, &[(flow::DIAMETER, d)]))?);
    }
    figures.push(spread("bubble_velocity", "Bubble velocity at the outlet", Dimension::Velocity, "Continuity with a stationary film: a mass balance, with the best-tested film correlation; Liu et al. is an empirical fit shown for the spread.", ub)?);
    figures.push(Figure::definition("gas_holdup_outlet", "Gas holdup ε_G at the outlet", Dimension::Fraction, cell::INFO, outlet.holdup)?);
    let (bubble_fig, slug_fig) = lengths::length_spread(&junction.flow)?;
    figures.push(bubble_fig);
    figures.push(slug_fig);
    figures.push(Figure::definition("bubble_length_outlet", "Bubble length at the outlet", Dimension::Length, cell::INFO, outlet.bubble_length)?);
    figures.push(Figure::definition("unit_cell_outlet", "Unit-cell length at the outlet", Dimension::Length, cell::INFO, outlet.unit_cell_length())?);
    figures.push(Figure::definition("bubble_frequency_per_s", "Bubble frequency (1/s)", Dimension::Number, cell::INFO, profile.frequency)?);
    figures.push(Figure::definition("interfacial_area_m2_per_m3", "Specific interfacial area (m²/m³), outlet", Dimension::Number, cell::AREA_INFO, outlet.specific_area())?);
    let dm = diffusivity_figure.value.get();
    figures.push(diffusivity_figure);
    let kla = mass_transfer::kla_spread(&outlet, dm)?;
    let t95 = mass_transfer::saturation_time(kla.value.get());
    let supply_kla = kla.clone();
    figures.push(kla);
    figures.push(Figure::definition("saturation_time", "Time to 95 % saturation of the liquid", Dimension::Duration, mass_transfer::SATURATION_INFO, t95)?);
    let tau = profile.residence_time;
    let tau0 = std::f64::consts::PI * d * d / 4.0 * input.length.si() / input.liquid_flow.si();
    figures.push(Figure::definition("residence_time", "Liquid residence time (segmented)", Dimension::Duration, RESIDENCE_TIME_INFO, tau)?);
    figures.push(Figure::definition("residence_time_liquid_only", "Residence time if the liquid filled the tube", Dimension::Duration, NOMINAL_RESIDENCE_INFO, tau0)?);

    let p_sat = liquid.vapour_pressure;
    let partial = henry::partial_pressure(y, p_out, p_sat);
    let solubility = solubility_figure(input, reactive, t, partial)?;
    let c_sat = Concentration::from_si(solubility.value.get());
    let share = henry::dissolvable_share(c_sat, input.liquid_flow, reactive_feed);
    figures.push(solubility);
    figures.push(Figure::definition("dissolvable_share", "Share of the fed gas the liquid could dissolve", Dimension::Number, henry::UPTAKE_INFO, share)?);
    let dp = dp_figure.value.get();
    figures.push(dp_figure);
    figures.push(Figure::definition("outlet_pressure", "Outlet pressure (absolute)", Dimension::Pressure, OUTLET_PRESSURE_INFO, p_out.pascals())?);
    figures.push(Figure::definition("inlet_pressure", "Inlet pressure (absolute)", Dimension::Pressure, INLET_PRESSURE_INFO, profile.inlet_pressure)?);
    // Liquid-property range warnings (temperature outside a solvent fit) go with the figures
    // that use density, viscosity and surface tension most directly.
    for fig in figures.iter_mut().filter(|fg| fg.key == "bond" || fg.key == "pressure_drop") {
        for e in fig.estimates.iter_mut().filter(|e| e.recommended) {
            for w in &liquid_range_warnings {
                if !e.warnings.contains(w) {
                    e.warnings.push(w.clone());
                }
            }
        }
    }

    let inlet_gauge = profile.inlet_pressure - input.ambient.pascals();
    let mut checks = vec![
        regime_check(&outlet, &junction),
        pressure_check(inlet_gauge, dp, &figures, input.rating.si()),
        checks::residence_check(tau, tau0, input.length.si(), reactive_feed.equivalents(input.concentration, input.liquid_flow)),
        checks::pattern_check(&profile, &junction, &outlet),
        checks::expansion_check(&profile),
    ];
    if let LiquidSpec::Solvent { solvent, .. } = input.liquid {
        checks.push(boiling_check(solvent, t, p_out)?);
    }
    if input.cross_junction {
        checks.push(Check {
            key: "junction",
            topic: "Junction",
            verdict: Verdict::Caution,
            reason: "The bubble- and slug-length correlations were fitted on T-junctions; a cross (flow-focusing) junction pinches bubbles off differently, so the lengths, the unit cell, the interfacial area and kLa here are indicative only. Measure the slug lengths in your own mixer.".to_owned(),
            caution: None,
        });
    }
    checks.push(gas_hazard_check(input));
    if let Some(note) = input.gas.compressibility_caveat(t, Pressure::from_si(profile.inlet_pressure)) {
        checks.push(Check { key: "compressibility", topic: "Ideal-gas assumption", verdict: Verdict::Caution, reason: note, caution: None });
    }
    checks.push(checks::mass_transfer_check(&supply_kla, tau, share, reactive_feed.equivalents(input.concentration, input.liquid_flow)));
    if let Some(choice) = &input.tubing {
        let solvents: &[Solvent] = match &input.liquid {
            LiquidSpec::Solvent { solvent, .. } => std::slice::from_ref(solvent),
            LiquidSpec::Custom { .. } => &[],
        };
        let mut check = tubing::check(choice, PressureDifference::from_si(inlet_gauge), solvents);
        tubing::note_bore_mismatch(choice, input.inner_diameter, &mut check);
        checks.push(check);
    }
    let mut plots = plots::profiles(&profile, input.rating, input.ambient);
    plots.extend(plots::lengths_vs_gas_fraction(&junction.flow));
    let recommended = |key: &str| figures.iter().find(|f| f.key == key).map(|f| f.value);
    let diagrams = match (recommended("bubble_length"), recommended("slug_length")) {
        (Some(bubble), Some(slug)) => vec![Diagram::Slugs(SlugStrip {
            bore: Finite::new("tube bore", d)?,
            film: Finite::new("film thickness", outlet.film_thickness())?,
            places: vec![
                SlugPlace { label: "at the junction", bubble, slug },
                SlugPlace {
                    label: "at the outlet",
                    bubble: Finite::new("bubble length", outlet.bubble_length)?,
                    slug: Finite::new("slug length", outlet.slug_length)?,
                },
            ],
        })],
        _ => Vec::new(),
    };
    Ok(SegmentedFlowResult { report: Report { figures, checks, plots, advice: Vec::new(), diagrams }, profile })
}

fn liquid_state(input: &SegmentedFlowInput) -> Result<(Liquid, Vec<RangeWarning>, Figure), SegmentedFlowError> {
    let (reactive, _) = input.reactive();
    let t = input.temperature;
    match input.liquid {
        LiquidSpec::Solvent { solvent, .. } => {
            let l = solvent.liquid(t)?;
            let dm = reactive.diffusivity(solvent, t)?;
            let fig = Figure::single("diffusivity", dm.label, Dimension::Diffusivity, dm.model, dm.value.value.si(), dm.value.warnings)?;
            Ok((l.value, l.warnings, fig))
        }
        LiquidSpec::Custom { liquid, diffusivity, .. } => {
            let info = ModelInfo { name: "Entered diffusivity", formula: "D_m as entered", source: "user input", validity: &[] };
            Ok((liquid, Vec::new(), Figure::single("diffusivity", "Gas diffusivity in the liquid", Dimension::Diffusivity, info, diffusivity.si(), Vec::new())?))
        }
    }
}

fn solubility_figure(input: &SegmentedFlowInput, reactive: Gas, t: Temperature, partial: Pressure) -> Result<Figure, SegmentedFlowError> {
    let key = "saturation_concentration";
    let label = "Saturation concentration at the outlet partial pressure";
    let c = |h: HenrySolubility| henry::saturation_concentration(h, partial).si();
    let entered = |s: Concentration| HenrySolubility::from_si(s.si() / 1e5);
    let (estimates, recommendation) = match input.liquid {
        LiquidSpec::Custom { solubility, .. } | LiquidSpec::Solvent { solubility: Some(solubility), .. } => {
            (vec![estimate("saturation concentration", henry::ENTERED_INFO, c(entered(solubility)), true, Vec::new())?], "")
        }
        LiquidSpec::Solvent { solvent, solubility: None } => match reactive.solubility_in(solvent, t) {
            Some(s) => (
                s.estimates.into_iter().map(|e| estimate("saturation concentration", e.model, c(e.value), e.recommended, e.warnings)).collect::<Result<Vec<_>, _>>()?,
                s.recommendation,
            ),
            None => return Err(SegmentedFlowError::Numerical(super::report::NumericalError::NotFinite { quantity: "solubility" })),
        },
    };
    spread(key, label, Dimension::Concentration, recommendation, estimates)
}

/// The flow-regime check (key `flow_regime`): whether Taylor flow is expected, from the cells at
/// the junction and the outlet.
pub fn regime_check(outlet: &UnitCell, junction: &UnitCell) -> Check {
    let f = &outlet.flow;
    let bond = f.bond();
    let mut problems = Vec::new();
    if !confinement::is_confined(bond) {
        problems.push(format!(
            "Bo = {} is above 3.37 (Bretherton 1961; number from memory): gravity can move bubbles relative to the liquid (largest confined bore here {} mm), so slugs may not stay regular in vertical or horizontal runs",
            format_significant(bond, 3),
            format_significant(confinement::largest_confined_diameter(f.liquid.density.si(), f.gas_density.si(), f.liquid.surface_tension.si()) * 1e3, 3)
        ));
    }
    for (place, c) in [("inlet", junction), ("outlet", outlet)] {
        let we_gs = c.flow.gas_weber();
        let we_ls = c.flow.weber(c.flow.liquid_superficial());
        if !akbar::is_surface_tension_dominated(we_gs, we_ls) {
            problems.push(format!(
                "at the {place} We_GS = {} exceeds {} for We_LS = {}: outside the surface-tension-dominated (Taylor) region of the Akbar et al. (2003) map (from memory) — expect transition or annular flow",
                format_significant(we_gs, 3),
                format_significant(akbar::gas_weber_limit(we_ls), 3),
                format_significant(we_ls, 3)
            ));
        }
    }
    let ca = f.capillary(f.two_phase_velocity());
    if ca > 0.01 {
        problems.push(format!(
            "Ca = {} at the outlet is above 0.01, the upper end of the Qian–Lawal length fit and about where the squeezing regime behind Garstecki's scaling ends (both from memory)",
            format_significant(ca, 3)
        ));
    }
    let verdict = if problems.is_empty() { Verdict::Fine } else { Verdict::Caution };
    let reason = if problems.is_empty() {
        format!(
            "Segmented (Taylor) flow expected: Bo = {} < 3.37 (Bretherton 1961), inside the surface-tension-dominated region of Akbar et al. (2003), Ca = {}. A wetting liquid is assumed.",
            format_significant(bond, 3),
            format_significant(ca, 3)
        )
    } else {
        format!("{}. The segmented-flow figures assume Taylor flow and are less reliable here.", problems.join("; "))
    };
    Check { key: "flow_regime", topic: "Flow regime", verdict, reason, caution: None }
}

fn pressure_check(inlet_gauge: f64, dp: f64, figures: &[Figure], rating: f64) -> Check {
    let worst_dp = figures.iter().find(|f| f.key == "pressure_drop").map_or(dp, |f| f.spread().1);
    let ratio = inlet_gauge / rating;
    let worst_ratio = (inlet_gauge - dp + worst_dp) / rating;
    let verdict = budget_verdict(ratio, worst_ratio);
    let note = match verdict {
        Verdict::Problem => ": over the rating",
        Verdict::Caution => ": less than 20 % margin by the recommended or the highest model (common practice, no source)",
        Verdict::Fine => "",
    };
    Check {
        key: "pressure_budget",
        topic: "Pressure budget",
        verdict,
        reason: format!(
            "Inlet pressure {} bar(g) (back-pressure + {} coil drop by Kreutzer a = 0.17; models up to {}) is {:.0} % of the {} bar(g) rating{note}. Fittings, mixer and regulator add to it.",
            bar(inlet_gauge),
            Dimension::PressureDifference.show(dp, 3),
            Dimension::PressureDifference.show(worst_dp, 3),
            ratio * 100.0,
            bar(rating)
        ),
        caution: hazards::over_pressure_caution(verdict, hazards::LineContents::GasAndLiquid),
    }
}

fn boiling_check(solvent: Solvent, t: Temperature, p_out: Pressure) -> Result<Check, SegmentedFlowError> {
    let b = solvent.boiling_check(t, p_out)?;
    let mut check = hazards::boiling_check(
        &format!("{} at {} °C", fluids::selection::capitalised(solvent.name()), format_significant(t.celsius(), 3)),
        "Antoine fit",
        b.value.vapour_pressure,
        p_out,
        "at the regulator",
    );
    check.reason.push_str(" The gas partial pressure in the slugs is the total minus the vapour pressure.");
    Ok(check)
}

fn gas_hazard_check(input: &SegmentedFlowInput) -> Check {
    let solvents = match input.liquid {
        LiquidSpec::Solvent { solvent, .. } => vec![solvent],
        LiquidSpec::Custom { .. } => Vec::new(),
    };
    hazards::gas_check(&hazards::GasFeed {
        gas: input.gas,
        mole_fraction: input.gas_mole_fraction,
        solvents: &solvents,
        temperature: input.temperature,
        entered_loc: input.limiting_oxygen,
    })
}
