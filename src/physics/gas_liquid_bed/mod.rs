//! Gas–liquid cartridge: gas and liquid pumped together through a short packed bed of catalyst
//! (hydrogenations, oxidations, carbonylations) under a back-pressure regulator. Gas bookkeeping,
//! the regime's deciding numbers, the two-phase pressure drop with its spread and the gas
//! expanding through the bed, liquid holdup and residence times, gas–liquid and liquid–solid mass
//! transfer against the rate the chemistry needs, with checks on the pressure budget, bed lifting
//! in up-flow, wetting, gas supply, transfer limitation (with what would help) and hazards.

pub mod cautions;
pub mod checks;
pub mod error;
pub mod flow;
pub mod goto_smith;
pub mod larkins_saturation;
pub mod larkins_white_jeffrey;
pub mod mass_transfer;
pub mod plots;
pub mod pressure_drop;
pub mod profile;
pub mod regime;
pub mod remedies;
pub mod wakao_funazkri;
pub mod wammes_holdup;
pub mod wammes_westerterp;
pub mod wilson_geankoplis;

pub use error::GasLiquidBedError;

use serde::Serialize;

use self::mass_transfer::Capacity;
use self::pressure_drop::{RECOMMENDED, TwoPhaseModel};
use self::profile::{BedConditions, Profile};
use super::fluids::selection::{self, LiquidSelection};
use super::fluids::{self, Liquid, Solvent};
use super::form::{ChoiceSpec, Collector, FieldSource};
use super::gases::{Gas, HenrySolubility, MolarFlow, ReferenceFlow, henry, wilke_chang};
use super::input::{Allowed, FieldSpec, InputError, field, lab};
use super::packed_bed::packing::Voidage;
use super::packed_bed::{self as bed, FlowDirection, Particles};
use super::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning};
use super::segmented_flow as segmented;
use super::units::{
    Concentration, Diffusivity, Dimension, DynamicViscosity, Length, MolarMass, Pressure, PressureDifference, SurfaceTension, Temperature,
    VolumetricFlow, format_significant,
};

/// Liquid flow.
pub const LIQUID_FLOW: FieldSpec = field("liquid_flow", "Liquid flow", Dimension::VolumetricFlow, lab::LIQUID_FLOW, "Liquid pumped through the cartridge together with the gas.");
/// Substrate concentration in the liquid.
pub const CONCENTRATION: FieldSpec = field("concentration", "Substrate concentration", Dimension::Concentration, lab::CONCENTRATION, "Substrate that takes up the gas, in the liquid fed.");
/// Gas taken up per substrate.
pub const GAS_STOICHIOMETRY: FieldSpec = field(
    "gas_stoichiometry",
    "Gas used per substrate (mol/mol)",
    Dimension::Number,
    lab::RATIO,
    "Moles of the reactive gas consumed per mole of substrate converted (e.g. 3 H₂ to reduce a nitro group to an amine, 1 H₂ per C=C).",
);
/// Flow direction of both phases.
pub const FLOW_DIRECTION: ChoiceSpec = ChoiceSpec {
    key: "flow_direction",
    label: "Flow direction (gas and liquid together)",
    options: &[("down", "Co-current down-flow"), ("up", "Co-current up-flow")],
};
/// What the chemistry needs.
pub const DEMAND: ChoiceSpec = ChoiceSpec {
    key: "demand",
    label: "What the chemistry needs",
    options: &[("conversion", "A target conversion in one pass"), ("rate", "Gas taken up at a known rate (whole bed)")],
};
/// Target conversion in one pass.
pub const TARGET_CONVERSION: FieldSpec = field("target_conversion", "Target conversion", Dimension::Fraction, Allowed::UNIT_FRACTION, "Share of the substrate to convert in one pass through the bed.");
/// Gas uptake the reaction needs.
pub const REQUIRED_RATE: FieldSpec = field(
    "required_rate",
    "Gas uptake the reaction needs (whole bed)",
    Dimension::MolarFlow,
    lab::MOLAR_FLOW,
    "Rate at which the reaction on this bed would take up the gas if the gas reached the catalyst freely, e.g. from a rate per gram of catalyst measured without transfer limits times the catalyst mass.",
);

/// Every quantity field, in page order.
pub const FIELDS: &[FieldSpec] = &[
    bed::TUBE_DIAMETER, bed::BED_LENGTH, bed::PARTICLE_DIAMETER, bed::D10, bed::D50, bed::D90, bed::SPHERICITY, bed::PARTICLE_DENSITY,
    super::solids::PARTICLE_POROSITY, bed::VOIDAGE, fluids::FIRST_VOLUME_FRACTION, selection::TEMPERATURE, bed::DENSITY, bed::VISCOSITY,
    fluids::CUSTOM_SURFACE_TENSION, LIQUID_FLOW, CONCENTRATION, segmented::GAS_MOLE_FRACTION, segmented::GAS_FLOW,
    segmented::REFERENCE_TEMPERATURE, segmented::REFERENCE_PRESSURE, GAS_STOICHIOMETRY, segmented::SOLUBILITY, segmented::DIFFUSIVITY,
    bed::BACK_PRESSURE, super::ambient::AMBIENT_PRESSURE, bed::PUMP_LIMIT, bed::RATING, bed::FITTING_RATING, TARGET_CONVERSION, REQUIRED_RATE,
    segmented::LIMITING_OXYGEN_FIELD,
];

/// Every choice field, in page order.
pub const CHOICES: &[ChoiceSpec] = &[
    bed::SIZE_MODE, bed::PARTICLE_SHAPE, super::solids::SOLID, bed::VOIDAGE_SOURCE, selection::LIQUID, selection::MIXTURE_FIRST,
    selection::MIXTURE_SECOND, segmented::GAS, segmented::REFERENCE_STATE, segmented::SOLUBILITY_SOURCE, FLOW_DIRECTION, bed::CONFINEMENT,
    super::tubing::MATERIAL, super::tubing::SIZE, DEMAND, segmented::LOC_SOURCE,
];

/// What the chemistry needs from the bed.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "demand", rename_all = "snake_case")]
pub enum Demand {
    /// Convert this share of the substrate in one pass.
    Conversion {
        /// Target conversion, 0 < X ≤ 1.
        conversion: f64,
    },
    /// Take up the gas at this rate over the whole bed.
    Rate {
        /// Gas uptake.
        rate: MolarFlow,
    },
}

/// Validated inputs of the gas–liquid cartridge calculator.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct GasLiquidBedInput {
    /// Cartridge bore D_t.
    pub tube_diameter: Length,
    /// Bed length L.
    pub bed_length: Length,
    /// Particles, packing and solid.
    pub particles: Particles,
    /// The liquid as chosen.
    pub liquid: LiquidSelection,
    /// Temperature of the bed.
    pub temperature: Temperature,
    /// Liquid properties at that temperature (vapour pressure unknown for an entered liquid).
    pub properties: Liquid,
    /// Liquid flow.
    pub liquid_flow: VolumetricFlow,
    /// Substrate concentration.
    pub concentration: Concentration,
    /// The gas.
    pub gas: Gas,
    /// Mole fraction of the gas in the feed, the rest nitrogen (air: its own oxygen fraction).
    pub gas_mole_fraction: f64,
    /// Gas flow with its reference state.
    pub gas_flow: ReferenceFlow,
    /// Reactive gas consumed per substrate, mol/mol.
    pub gas_stoichiometry: f64,
    /// Entered solubility at 1 bar of the gas; `None` takes the built-in data.
    pub solubility: Option<Concentration>,
    /// Entered diffusivity of the gas in the liquid; `None` takes Wilke–Chang for a solvent.
    pub diffusivity: Option<Diffusivity>,
    /// Flow direction and, in up-flow, whether the bed is held.
    pub direction: FlowDirection,
    /// Back-pressure set point, gauge.
    pub back_pressure: PressureDifference,
    /// Atmospheric pressure.
    pub ambient: Pressure,
    /// The feed tubing from the table, for its rating at temperature.
    pub tubing: Option<super::tubing::TubingChoice>,
    /// Lowest of pump, cartridge and fittings ratings, gauge.
    pub rating: PressureDifference,
    /// Which part sets `rating`.
    pub rating_part: &'static str,
    /// What the chemistry needs.
    pub demand: Demand,
    /// The limiting oxygen concentration entered for the liquid, if any (oxidising gases only).
    pub limiting_oxygen: Option<f64>,
}

/// The shared gas entries ([`segmented::read_gas`]).
pub use super::segmented_flow::read_gas;

/// Density, viscosity, surface tension and vapour pressure of the chosen liquid at its
/// temperature (an entered liquid: its entries, `surface_tension` entered, no vapour pressure).
pub fn liquid_properties(liquid: &LiquidSelection, surface_tension: Option<f64>) -> Result<Liquid, fluids::PropertyError> {
    match *liquid {
        LiquidSelection::Solvent { solvent, temperature } => Ok(solvent.liquid(temperature)?.value),
        LiquidSelection::Mixture { mixture, temperature } => Ok(mixture.properties(temperature)?.liquid),
        LiquidSelection::Custom { density, viscosity } => Ok(Liquid {
            density,
            viscosity,
            surface_tension: SurfaceTension::from_si(surface_tension.unwrap_or(f64::NAN)),
            vapour_pressure: None,
        }),
    }
}

impl GasLiquidBedInput {
    /// Builds validated inputs from a source, reporting every bad field at once; fields the choices
    /// make irrelevant are not read.
    pub fn from_source(src: &dyn FieldSource) -> Result<Self, Vec<InputError>> {
        let mut c = Collector::default();
        let tube_diameter = c.take(src.quantity(&bed::TUBE_DIAMETER));
        let bed_length = c.take(src.quantity(&bed::BED_LENGTH));
        let particles = bed::read_particles(src, &mut c);
        let liquid = selection::read(src, &mut c, &bed::DENSITY, &bed::VISCOSITY);
        // A solvent or mixture carries its temperature; an entered liquid still needs one for the gas.
        let (temperature, surface_tension) = match liquid {
            Some(LiquidSelection::Solvent { temperature, .. } | LiquidSelection::Mixture { temperature, .. }) => (Some(temperature.si()), None),
            Some(LiquidSelection::Custom { .. }) => {
                (c.take(src.quantity(&selection::TEMPERATURE)), c.take(src.quantity(&fluids::CUSTOM_SURFACE_TENSION)))
            }
            None => (None, None),
        };
        let properties = match liquid.map(|l| liquid_properties(&l, surface_tension)) {
            Some(Ok(p)) if p.surface_tension.si().is_finite() => Some(p),
            Some(Err(e)) => {
                c.take::<()>(Err(InputError {
                    field: selection::TEMPERATURE.key,
                    label: selection::TEMPERATURE.label,
                    given: format!("{} K", format_significant(e.temperature_k, 4)),
                    problem: e.to_string(),
                }));
                None
            }
            _ => None,
        };
        let liquid_flow = c.take(src.quantity(&LIQUID_FLOW));
        let concentration = c.take(src.quantity(&CONCENTRATION));
        let gas = read_gas(src, &mut c);
        let gas_stoichiometry = c.take(src.quantity(&GAS_STOICHIOMETRY));
        let built_in = matches!(liquid, Some(LiquidSelection::Solvent { .. }));
        let solubility = match (built_in, liquid.is_some()) {
            (true, _) => match c.take(src.choice(&segmented::SOLUBILITY_SOURCE)) {
                Some(0) => Some(None),
                Some(_) => c.take(src.quantity(&segmented::SOLUBILITY)).map(|s| Some(Concentration::from_si(s))),
                None => None,
            },
            (false, true) => c.take(src.quantity(&segmented::SOLUBILITY)).map(|s| Some(Concentration::from_si(s))),
            (false, false) => None,
        };
        let diffusivity = match (built_in, liquid.is_some()) {
            (true, _) => Some(None),
            (false, true) => c.take(src.quantity(&segmented::DIFFUSIVITY)).map(|d| Some(Diffusivity::from_si(d))),
            (false, false) => None,
        };
        let direction = match c.take(src.choice(&FLOW_DIRECTION)) {
            Some(0) => Some(FlowDirection::Down),
            Some(_) => match c.take(src.choice(&bed::CONFINEMENT)) {
                Some(0) => Some(FlowDirection::UpFree),
                Some(_) => Some(FlowDirection::UpConfined),
                None => None,
            },
            None => None,
        };
        let back_pressure = c.take(src.quantity(&bed::BACK_PRESSURE));
        let ambient = super::ambient::read(src, &mut c);
        let tubing = super::tubing::read(src, &mut c, &selection::TEMPERATURE);
        let ratings = bed::read_ratings(src, &mut c);
        let demand = match c.take(src.choice(&DEMAND)) {
            Some(0) => c.take(src.quantity(&TARGET_CONVERSION)).map(|conversion| Demand::Conversion { conversion }),
            Some(_) => c.take(src.quantity(&REQUIRED_RATE)).map(|r| Demand::Rate { rate: MolarFlow::from_si(r) }),
            None => None,
        };
        let limiting_oxygen = super::hazards::oxygen::read(src, &mut c, gas.map(|g| g.0));
        let (
            Some(dt), Some(l), Some(particles), Some(liquid), Some(t), Some(properties), Some(ql), Some(cn), Some((gas, y, gas_flow)),
            Some(nu), Some(solubility), Some(diffusivity), Some(direction), Some(bp), Some(ambient), Some(tubing), Some((rating, rating_part)),
            Some(demand), Some(limiting_oxygen),
        ) = (
            tube_diameter, bed_length, particles, liquid, temperature, properties, liquid_flow, concentration, gas, gas_stoichiometry,
            solubility, diffusivity, direction, back_pressure, ambient, tubing, ratings, demand, limiting_oxygen,
        )
        else {
            return Err(c.into_errors());
        };
        let tube_diameter = Length::from_si(dt);
        particles.check_estimated_voidage(tube_diameter).map_err(|e| vec![e])?;
        Ok(Self {
            tube_diameter,
            bed_length: Length::from_si(l),
            particles,
            liquid,
            temperature: Temperature::from_si(t),
            properties,
            liquid_flow: VolumetricFlow::from_si(ql),
            concentration: Concentration::from_si(cn),
            gas,
            gas_mole_fraction: y,
            gas_flow,
            gas_stoichiometry: nu,
            solubility,
            diffusivity,
            direction,
            back_pressure: PressureDifference::from_si(bp),
            ambient,
            tubing,
            rating: PressureDifference::from_si(rating),
            rating_part,
            demand,
            limiting_oxygen,
        })
    }

    /// The dissolving, reacting species and its mole fraction in the feed.
    pub fn reactive(&self) -> (Gas, f64) {
        self.gas.reactive_in_feed(self.gas_mole_fraction)
    }

    /// Molar mass and viscosity of the feed ([`Gas::feed_properties`]).
    pub fn feed_properties(&self) -> (MolarMass, DynamicViscosity, Vec<RangeWarning>) {
        self.gas.feed_properties(self.gas_mole_fraction, self.temperature)
    }

    /// Outlet pressure, absolute.
    pub fn outlet_pressure(&self) -> Pressure {
        Pressure::from_gauge(self.back_pressure, self.ambient)
    }

    /// Whether the flow goes upwards.
    pub fn upward(&self) -> bool {
        self.direction != FlowDirection::Down
    }

    /// The rate at which the chemistry needs the gas, mol/s.
    pub fn need(&self) -> f64 {
        match self.demand {
            Demand::Conversion { conversion } => conversion * self.gas_stoichiometry * self.concentration.si() * self.liquid_flow.si(),
            Demand::Rate { rate } => rate.si(),
        }
    }
}

/// Metadata of the rate the chemistry needs.
pub const NEED_INFO: ModelInfo = ModelInfo {
    name: "Gas the chemistry needs",
    formula: "r = X ν c Q_L (target conversion X, ν mol of gas per mol of substrate), or as entered",
    source: "definition",
    validity: &[],
};

/// Metadata of the outlet pressure.
pub const OUTLET_PRESSURE_INFO: ModelInfo = ModelInfo {
    name: "Outlet pressure",
    formula: "P_out = p_back (gauge) + P_atm",
    source: "definition",
    validity: &[],
};

/// The physics of one setup, before it is turned into figures and checks: what the remedies and
/// the chart re-evaluate for changed inputs.
#[derive(Debug, Clone, PartialEq)]
pub struct Assessment {
    /// The voidage used, with its source.
    pub voidage: Voidage,
    /// Everything fixed along the bed.
    pub conditions: BedConditions,
    /// One integrated profile per two-phase correlation, in [`TwoPhaseModel::ALL`] order.
    pub profiles: Vec<Profile>,
    /// Gas diffusivity in the liquid, with its source.
    pub diffusivity: Figure,
    /// Saturation concentration at the outlet, every estimate.
    pub solubility: Figure,
    /// k_L a (recommended), 1/s.
    pub kla: f64,
    /// k_s by the recommended correlation, m/s.
    pub ks: f64,
    /// Largest transfer rates.
    pub capacity: Capacity,
    /// What the chemistry needs, mol/s.
    pub need: f64,
}

impl Assessment {
    /// The profile of the recommended correlation.
    pub fn recommended(&self) -> Result<&Profile, GasLiquidBedError> {
        self.profiles
            .iter()
            .find(|p| p.model == RECOMMENDED)
            .ok_or(GasLiquidBedError::Numerical(NumericalError::NotFinite { quantity: "recommended pressure profile" }))
    }

    /// Inlet pressure (gauge) by the recommended correlation and the highest of all, Pa.
    pub fn inlet_gauge(&self, ambient: Pressure) -> Result<(f64, f64), GasLiquidBedError> {
        let rec = self.recommended()?.inlet_pressure.si() - ambient.si();
        let worst = self.profiles.iter().map(|p| p.inlet_pressure.si() - ambient.si()).fold(rec, f64::max);
        Ok((rec, worst))
    }

    /// Need over the largest overall transfer rate.
    pub fn transfer_ratio(&self) -> f64 {
        self.need / self.capacity.overall
    }
}

/// The diffusivity figure: Wilke–Chang for a built-in solvent, else the entered value.
fn diffusivity_figure(input: &GasLiquidBedInput) -> Result<Figure, GasLiquidBedError> {
    let (reactive, _) = input.reactive();
    match (input.diffusivity, input.liquid) {
        (Some(d), _) => {
            let info = ModelInfo { name: "Entered diffusivity", formula: "D_L as entered", source: "user input", validity: &[] };
            Ok(Figure::single("diffusivity", "Gas diffusivity in the liquid", Dimension::Diffusivity, info, d.si(), Vec::new())?)
        }
        (None, LiquidSelection::Solvent { solvent, temperature }) => {
            let d = reactive.diffusivity_in(solvent, temperature)?;
            Ok(Figure::single("diffusivity", "Gas diffusivity in the liquid (estimate, ±30 %)", Dimension::Diffusivity, wilke_chang::INFO, d.value.si(), d.warnings)?)
        }
        (None, _) => Err(GasLiquidBedError::Numerical(NumericalError::NotFinite { quantity: "gas diffusivity (enter it for this liquid)" })),
    }
}

fn estimate(model: ModelInfo, value: f64, recommended: bool, warnings: Vec<RangeWarning>) -> Result<Estimate, NumericalError> {
    Ok(Estimate { model, value: Finite::new("saturation concentration", value)?, recommended, warnings })
}

/// The saturation-concentration figure at the outlet partial pressure of the reactive gas.
fn solubility_figure(input: &GasLiquidBedInput) -> Result<Figure, GasLiquidBedError> {
    let (reactive, y) = input.reactive();
    let t = input.temperature;
    let partial = henry::partial_pressure(y, input.outlet_pressure(), input.properties.vapour_pressure);
    let c = |h: HenrySolubility| henry::saturation_concentration(h, partial).si();
    let t_warn = |info: &ModelInfo| info.validity.iter().filter_map(|b| b.check(t.kelvin(), info)).collect::<Vec<_>>();
    let missing = || GasLiquidBedError::Numerical(NumericalError::NotFinite { quantity: "gas solubility (enter it for this gas and liquid)" });
    let estimates = match (input.solubility, input.liquid) {
        (Some(s), _) => vec![estimate(henry::ENTERED_INFO, c(HenrySolubility::from_si(s.si() / 1e5)), true, Vec::new())?],
        (None, LiquidSelection::Solvent { solvent: Solvent::Water, .. }) => {
            let h = reactive.henry_water(t).ok_or_else(missing)?;
            vec![estimate(henry::WATER_INFO, c(h.value), true, h.warnings)?]
        }
        (None, LiquidSelection::Solvent { .. }) => {
            let r = reactive.henry_organic().ok_or_else(missing)?;
            vec![
                estimate(henry::ORGANIC_INFO, c(HenrySolubility::from_si(r.low)), true, t_warn(&henry::ORGANIC_INFO))?,
                estimate(henry::ORGANIC_INFO, c(HenrySolubility::from_si(r.high)), false, t_warn(&henry::ORGANIC_INFO))?,
            ]
        }
        (None, _) => return Err(missing()),
    };
    let recommendation = if estimates.len() > 1 {
        "Low end of an order-of-magnitude range for common organic solvents (not this solvent's own value): the conservative side for a transfer limit. Enter a measured solubility if you have one."
    } else {
        ""
    };
    let value = estimates[0].value;
    Ok(Figure {
        key: "saturation_concentration",
        label: "Saturation concentration at the outlet partial pressure",
        dimension: Dimension::Concentration,
        value,
        recommendation,
        estimates,
    })
}

/// The fixed conditions along the bed for `input` and voidage `voidage`.
fn conditions(input: &GasLiquidBedInput, voidage: &Voidage) -> BedConditions {
    let (molar_mass, gas_viscosity, _) = input.feed_properties();
    BedConditions {
        particle_diameter: input.particles.shape.effective_diameter(input.particles.particle_diameter),
        voidage: voidage.value,
        tube_diameter: input.tube_diameter,
        length: input.bed_length,
        liquid_flow: input.liquid_flow,
        liquid_density: input.properties.density,
        liquid_viscosity: input.properties.viscosity,
        surface_tension: input.properties.surface_tension,
        gas_feed: input.gas_flow.molar_flow(),
        gas_molar_mass: molar_mass,
        gas_viscosity,
        temperature: input.temperature,
        outlet_pressure: input.outlet_pressure(),
        upward: input.upward(),
    }
}

/// The mass-transfer side alone (no pressure profile): k_L a, k_s, capacity and need.
pub fn transfer(input: &GasLiquidBedInput, voidage: &Voidage, dm: f64, c_star: f64) -> (f64, f64, Capacity, f64) {
    let cond = conditions(input, voidage);
    let outlet = cond.at(cond.outlet_pressure);
    let kla = mass_transfer::kla(&outlet, dm);
    let ks = mass_transfer::RECOMMENDED.coefficient(&outlet, dm);
    let volume = cond.area() * cond.length.si();
    let capacity = mass_transfer::capacity(kla, ks, outlet.specific_surface(), c_star, volume);
    (kla, ks, capacity, input.need())
}

/// Evaluates the physics of `input` (profiles by every correlation, transfer, need).
pub fn assess(input: &GasLiquidBedInput) -> Result<Assessment, GasLiquidBedError> {
    let p = &input.particles;
    let voidage = p.voidage.resolve(p.shape, p.particle_diameter, input.tube_diameter)?;
    let cond = conditions(input, &voidage);
    let profiles = TwoPhaseModel::ALL.iter().map(|&m| profile::integrate(&cond, m)).collect::<Result<Vec<_>, _>>()?;
    let diffusivity = diffusivity_figure(input)?;
    let solubility = solubility_figure(input)?;
    let (kla, ks, capacity, need) = transfer(input, &voidage, diffusivity.value.get(), solubility.value.get());
    Ok(Assessment { voidage, conditions: cond, profiles, diffusivity, solubility, kla, ks, capacity, need })
}

/// Computes every figure, check and chart of the gas–liquid cartridge.
pub fn evaluate(input: &GasLiquidBedInput) -> Result<super::report::Report, GasLiquidBedError> {
    let a = assess(input)?;
    let figures = figures(input, &a)?;
    let checks = checks::all(input, &a)?;
    let plots = vec![plots::pressure_drop_vs_gas_flow(input, &a)?];
    Ok(super::report::Report { figures, checks, plots, advice: Vec::new(), diagrams: Vec::new() })
}

fn spread(key: &'static str, label: &'static str, dimension: Dimension, recommendation: &'static str, estimates: Vec<Estimate>) -> Result<Figure, NumericalError> {
    let value = estimates.iter().find(|e| e.recommended).map(|e| e.value).ok_or(NumericalError::NotFinite { quantity: label })?;
    Ok(Figure { key, label, dimension, value, recommendation, estimates })
}

fn figures(input: &GasLiquidBedInput, a: &Assessment) -> Result<Vec<Figure>, GasLiquidBedError> {
    use super::gases::{reference_state, sutherland};
    use super::packed_bed::{ergun, geometry};
    let cond = &a.conditions;
    let rec = a.recommended()?;
    let outlet = cond.at(cond.outlet_pressure);
    let eps = a.voidage.value.si();
    let (_, y) = input.reactive();
    let feed = input.gas_flow.molar_flow();
    let reactive_feed = MolarFlow::from_si(feed.si() * y);
    let (_, gas_viscosity, gas_warnings) = input.feed_properties();
    let v_bed = geometry::bed_volume(input.tube_diameter, input.bed_length);
    let v_void = geometry::void_volume(v_bed, a.voidage.value);
    let (q_in, q_out) = profile::gas_flows(cond, rec);
    let d_v = input.particles.particle_diameter;
    let diameter_ratio = input.tube_diameter.si() / d_v.si();
    let length_ratio = input.bed_length.si() / d_v.si();
    let (inlet_gauge, _) = a.inlet_gauge(input.ambient)?;

    let mut figures = input.liquid.figures()?;
    figures.push(input.particles.solid.figure(false, input.properties.density)?);
    figures.push(bed::voidage_figure(&a.voidage, input.particles.shape, d_v, input.tube_diameter)?);
    figures.push(Figure::definition("bed_volume", "Bed volume", Dimension::Volume, geometry::BED_VOLUME_INFO, v_bed.si())?);
    figures.push(Figure::definition("void_volume", "Void volume between particles", Dimension::Volume, geometry::VOID_VOLUME_INFO, v_void.si())?);
    figures.push(Figure::definition("gas_molar_flow", "Gas fed (all species)", Dimension::MolarFlow, reference_state::MOLAR_FLOW_INFO, feed.si())?);
    figures.push(Figure::definition(
        "gas_equivalents",
        "Reactive gas fed per mole of substrate (equivalents)",
        Dimension::Number,
        reference_state::EQUIVALENTS_INFO,
        reactive_feed.equivalents(input.concentration, input.liquid_flow),
    )?);
    figures.push(Figure::definition("gas_flow_outlet", "Actual gas flow at the outlet", Dimension::VolumetricFlow, reference_state::ACTUAL_FLOW_INFO, q_out.si())?);
    figures.push(Figure::definition("gas_flow_inlet", "Actual gas flow at the inlet", Dimension::VolumetricFlow, reference_state::ACTUAL_FLOW_INFO, q_in.si())?);
    figures.push(Figure::definition("gas_density_outlet", "Gas density at the outlet", Dimension::Density, reference_state::DENSITY_INFO, outlet.gas_density.si())?);
    figures.push(Figure::single("gas_viscosity", "Gas viscosity", Dimension::DynamicViscosity, sutherland::INFO, gas_viscosity.si(), gas_warnings)?);
    figures.push(Figure::definition("liquid_superficial_velocity", "Liquid superficial velocity", Dimension::Velocity, geometry::SUPERFICIAL_VELOCITY_INFO, outlet.liquid_velocity.si())?);
    figures.push(Figure::definition("gas_superficial_velocity", "Gas superficial velocity at the outlet", Dimension::Velocity, geometry::SUPERFICIAL_VELOCITY_INFO, outlet.gas_velocity.si())?);
    figures.push(Figure::definition("particle_eotvos", "Particle Eötvös number Eö", Dimension::Number, regime::EOTVOS_INFO, outlet.eotvos())?);
    figures.push(Figure::definition("liquid_reynolds", "Liquid particle Reynolds number Re_L", Dimension::Number, regime::REYNOLDS_INFO, outlet.liquid_reynolds())?);
    figures.push(Figure::definition("gas_reynolds", "Gas particle Reynolds number Re_G (outlet)", Dimension::Number, regime::REYNOLDS_INFO, outlet.gas_reynolds())?);
    figures.push(Figure::definition("lockhart_martinelli", "Lockhart–Martinelli parameter χ (outlet)", Dimension::Number, regime::CHI_INFO, outlet.chi())?);
    figures.extend(bed::ratio_figures(diameter_ratio, length_ratio)?);
    let alone = outlet.liquid_alone().with_length(input.bed_length);
    figures.push(Figure::single(
        "liquid_alone_pressure_drop",
        "Bed pressure drop of the liquid alone",
        Dimension::PressureDifference,
        ergun::INFO,
        ergun::pressure_drop(&alone).si(),
        super::packed_bed::pressure_drop::PressureDropModel::Ergun.warnings(&alone),
    )?);
    let dp = a
        .profiles
        .iter()
        .map(|p| Ok(Estimate { model: p.model.info(), value: Finite::new("bed pressure drop", p.friction_drop)?, recommended: p.model == RECOMMENDED, warnings: p.warnings.clone() }))
        .collect::<Result<Vec<_>, NumericalError>>()?;
    figures.push(spread("bed_pressure_drop", "Two-phase bed pressure drop (friction)", Dimension::PressureDifference, pressure_drop::RECOMMENDATION, dp)?);
    figures.push(Figure::definition("outlet_pressure", "Outlet pressure (absolute)", Dimension::Pressure, OUTLET_PRESSURE_INFO, cond.outlet_pressure.si())?);
    figures.push(Figure::definition("inlet_pressure", "Inlet pressure (gauge)", Dimension::PressureDifference, profile::INLET_PRESSURE_INFO, inlet_gauge)?);
    figures.push(holdup_figure(a, eps)?);
    figures.push(Figure::definition("static_holdup", "Static liquid holdup (fraction of the bed)", Dimension::Fraction, wammes_holdup::STATIC_INFO, wammes_holdup::STATIC_HOLDUP)?);
    figures.push(dynamic_holdup_figure(a, eps)?);
    figures.push(residence_figure(a)?);
    figures.push(Figure::definition(
        "residence_time_liquid_filled",
        "Residence time if the liquid filled the voids",
        Dimension::Duration,
        geometry::RESIDENCE_TIME_INFO,
        geometry::residence_time(v_void, input.liquid_flow).si(),
    )?);
    figures.push(Figure::definition("gas_residence_time", "Gas residence time in the bed", Dimension::Duration, profile::GAS_TIME_INFO, rec.gas_time)?);
    figures.push(a.diffusivity.clone());
    figures.push(a.solubility.clone());
    figures.push(mass_transfer::kla_figure(&outlet, a.diffusivity.value.get())?);
    figures.push(mass_transfer::liquid_solid_spread(&outlet, a.diffusivity.value.get())?);
    figures.push(Figure::definition("capacity_gas_liquid", "Largest gas–liquid transfer rate", Dimension::MolarFlow, mass_transfer::GAS_LIQUID_CAPACITY_INFO, a.capacity.gas_liquid)?);
    figures.push(Figure::definition("capacity_liquid_solid", "Largest liquid–solid transfer rate", Dimension::MolarFlow, mass_transfer::LIQUID_SOLID_CAPACITY_INFO, a.capacity.liquid_solid)?);
    figures.push(Figure::definition("capacity", "Largest gas transfer to the catalyst", Dimension::MolarFlow, mass_transfer::OVERALL_CAPACITY_INFO, a.capacity.overall)?);
    figures.push(Figure::definition("required_rate", "Gas uptake the chemistry needs", Dimension::MolarFlow, NEED_INFO, a.need)?);
    Ok(figures)
}

fn holdup_figure(a: &Assessment, eps: f64) -> Result<Figure, NumericalError> {
    let mut estimates = Vec::new();
    for p in &a.profiles {
        let info = p.model.holdup_info();
        estimates.push(Estimate { model: info, value: Finite::new("liquid holdup", eps * p.mean_saturation)?, recommended: p.model == RECOMMENDED, warnings: p.warnings.clone() });
        if p.model == TwoPhaseModel::LarkinsWhiteJeffrey {
            estimates.push(Estimate {
                model: larkins_saturation::FIGURE_INFO,
                value: Finite::new("liquid holdup", eps * p.other_mean_saturation)?,
                recommended: false,
                warnings: p.warnings.clone(),
            });
        }
    }
    spread("liquid_holdup", "Total liquid holdup (fraction of the bed)", Dimension::Fraction, pressure_drop::HOLDUP_RECOMMENDATION, estimates)
}

/// Metadata of the dynamic holdup from the recommended total.
pub const DYNAMIC_FROM_TOTAL_INFO: ModelInfo = ModelInfo {
    name: "Total (Larkins–White–Jeffrey) minus static (Wammes–Westerterp)",
    formula: "ε_dyn = max(0, ε R_L − 0.06)",
    source: "derived: Larkins et al. (1961) do not split their saturation; the static 0.06 is Wammes & Westerterp's (1991)",
    validity: &[],
};

/// Metadata of Wammes and Westerterp's own dynamic holdup.
pub const DYNAMIC_WAMMES_INFO: ModelInfo = ModelInfo {
    name: "Wammes–Westerterp dynamic holdup",
    formula: "ε_dyn = ε β_dyn (their Eq. 9, solved with Eq. 8)",
    source: wammes_holdup::INFO.source,
    validity: wammes_holdup::INFO.validity,
};

fn dynamic_holdup_figure(a: &Assessment, eps: f64) -> Result<Figure, NumericalError> {
    let mut estimates = Vec::new();
    for p in &a.profiles {
        // Wammes–Westerterp's total is their dynamic plus the same static holdup, so one expression
        // serves both.
        let value = (eps * p.mean_saturation - wammes_holdup::STATIC_HOLDUP).max(0.0);
        let info = match p.model {
            TwoPhaseModel::LarkinsWhiteJeffrey => DYNAMIC_FROM_TOTAL_INFO,
            TwoPhaseModel::WammesWesterterp => DYNAMIC_WAMMES_INFO,
        };
        estimates.push(Estimate { model: info, value: Finite::new("dynamic holdup", value)?, recommended: p.model == RECOMMENDED, warnings: p.warnings.clone() });
    }
    spread("dynamic_holdup", "Dynamic (flowing) liquid holdup (fraction of the bed)", Dimension::Fraction, pressure_drop::HOLDUP_RECOMMENDATION, estimates)
}

/// The liquid residence time by one holdup correlation: its name and source, the integral's formula.
fn residence_info(holdup: ModelInfo) -> ModelInfo {
    ModelInfo { formula: profile::LIQUID_TIME_INFO.formula, ..holdup }
}

fn residence_figure(a: &Assessment) -> Result<Figure, NumericalError> {
    let mut estimates = Vec::new();
    for p in &a.profiles {
        let model = residence_info(p.model.holdup_info());
        estimates.push(Estimate { model, value: Finite::new("liquid residence time", p.liquid_time)?, recommended: p.model == RECOMMENDED, warnings: p.warnings.clone() });
        if p.model == TwoPhaseModel::LarkinsWhiteJeffrey {
            let model = residence_info(larkins_saturation::FIGURE_INFO);
            estimates.push(Estimate { model, value: Finite::new("liquid residence time", p.other_liquid_time)?, recommended: false, warnings: p.warnings.clone() });
        }
    }
    spread("liquid_residence_time", "Liquid residence time in the bed", Dimension::Duration, pressure_drop::HOLDUP_RECOMMENDATION, estimates)
}
