//! Whole setup: an ordered line of stages — liquid feeds with their pumps, a gas feed, junctions,
//! tubing, coils, fittings, packed cartridges and the back-pressure regulator — computed stage by
//! stage with the physics that exists for each (Hagen–Poiseuille, Ergun, the clogging criterion
//! upstream of the gas; segmented flow in tubes and the gas–liquid packed bed downstream of it),
//! with one pressure budget from the regulator upstream. A stage is one entry of the case's
//! `elements`. One liquid and one temperature hold for the whole line.

pub mod evaluate;
pub mod keys;
pub mod pump;

use serde::Serialize;

use self::keys::{ElementKey, MAX_STAGES};
use self::pump::Pump;
use super::fluids::selection::{self, LiquidSelection};
use super::fluids::{self, Liquid};
use super::form::{ChoiceSpec, Collector, FieldSource};
use super::gases::{Gas, ReferenceFlow};
use super::input::{Allowed, FieldSpec, InputError, field, lab};
use super::units::{
    Concentration, Density, Dimension, DynamicViscosity, Fraction, Length, MolarMass, Pressure, PressureDifference, Temperature, VolumetricFlow,
    format_significant,
};
use super::{ambient, gas_liquid_bed, hazards, segmented_flow, slurry, tubing, tubular};

pub use self::evaluate::evaluate;

const OPEN_FRACTION: Allowed = Allowed { low: 0.0, low_inclusive: false, high: Some(1.0), high_inclusive: false, whole: false };

/// Stage kind.
pub const KIND: ChoiceSpec = ChoiceSpec {
    key: "kind",
    label: "Stage",
    options: &[
        ("liquid_feed", "Liquid feed (pump)"),
        ("gas_feed", "Gas feed (flow controller)"),
        ("junction", "Junction or mixer"),
        ("tubing", "Tubing"),
        ("coil", "Coil"),
        ("fitting", "Fitting or union"),
        ("cartridge", "Packed cartridge"),
        ("regulator", "Back-pressure regulator"),
    ],
};
/// Pump of a feed.
pub const PUMP: ChoiceSpec = ChoiceSpec {
    key: "pump",
    label: "Pump",
    options: &[("piston", "Piston (HPLC-type)"), ("syringe", "Syringe"), ("peristaltic", "Peristaltic"), ("diaphragm", "Diaphragm")],
};
/// Feed flow.
pub const FLOW: FieldSpec = field("flow", "Feed flow", Dimension::VolumetricFlow, lab::LIQUID_FLOW, "Flow this pump delivers.");
/// Pump pressure limit.
pub const PUMP_LIMIT: FieldSpec = field(
    "pump_limit",
    "Pump pressure limit (gauge)",
    Dimension::PressureDifference,
    lab::PRESSURE,
    "From the pump's data sheet. Peristaltic pumps hold only a few bar (common practice, no source).",
);
/// Syringe drive force.
pub const DRIVE_FORCE: FieldSpec = field("drive_force", "Drive force", Dimension::Force, lab::FORCE, "Largest linear force of the syringe drive, from its data sheet.");
/// Syringe barrel bore.
pub const BARREL_BORE: FieldSpec = field("barrel_bore", "Barrel inner diameter", Dimension::Length, lab::BORE, "Inner diameter of the syringe barrel.");
/// Syringe barrel rating.
pub const BARREL_RATING: FieldSpec = field(
    "barrel_rating",
    "Barrel pressure rating (gauge)",
    Dimension::PressureDifference,
    lab::PRESSURE,
    "The syringe's own rating from its maker: glass and plastic barrels are rated far lower than steel ones.",
);
/// Solids in a feed, by volume.
pub const SOLIDS: FieldSpec = field(
    "solids_fraction",
    "Solids in this feed (by volume)",
    Dimension::Fraction,
    Allowed::non_negative_up_to(0.5),
    "Volume fraction of suspended solids in this feed; 0 for a clean liquid.",
);
/// Bore or narrowest opening; a cartridge's tube diameter.
pub const INNER_DIAMETER: FieldSpec = field("inner_diameter", "Inner diameter", Dimension::Length, lab::BORE, "Bore of tubing or coil; narrowest opening of a junction or fitting; inner diameter of a cartridge.");
/// Flow-path length; a cartridge's bed length.
pub const LENGTH: FieldSpec = field("length", "Length", Dimension::Length, lab::TUBE_LENGTH, "Flow path length; for a cartridge, the packed bed's length.");
/// The part's rating.
pub const RATING: FieldSpec = field("pressure_rating", "Pressure rating (gauge)", Dimension::PressureDifference, lab::PRESSURE, "Working-pressure rating of this part at the line's temperature.");
/// Particle diameter of a cartridge's packing.
pub const PARTICLE_DIAMETER: FieldSpec = field("particle_diameter", "Packing particle diameter", Dimension::Length, lab::PARTICLE_SIZE, "Diameter of the packed particles (φ d_v for non-spheres).");
/// Bed voidage of a cartridge.
pub const VOIDAGE: FieldSpec = field("voidage", "Bed voidage", Dimension::Fraction, OPEN_FRACTION, "Volume fraction between the particles; about 0.36–0.42 for a randomly packed bed of spheres.");
/// Gas supply pressure.
pub const SUPPLY_PRESSURE: FieldSpec = field(
    "supply_pressure",
    "Gas supply pressure (gauge)",
    Dimension::PressureDifference,
    lab::PRESSURE,
    "Pressure the cylinder's regulator delivers to the gas flow controller, above atmosphere.",
);
/// Regulator set point.
pub const SET_POINT: FieldSpec = field("set_point", "Set point (gauge)", Dimension::PressureDifference, lab::BACK_PRESSURE, "Pressure the regulator holds at its inlet, above atmosphere.");

/// The pump's largest flow (the shared field of the other calculators).
pub const PUMP_MAX_FLOW: FieldSpec = super::practical::PUMP_MAX_FLOW;

/// Largest solids size (d90), read when a feed carries solids.
pub const D90: FieldSpec = slurry::D90;

/// What a stage is.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum StageKind {
    /// A pumped liquid (clean or with suspended solids).
    LiquidFeed,
    /// A gas from a cylinder through a flow controller.
    GasFeed,
    /// A junction or mixer where streams meet.
    Junction,
    /// Straight tubing.
    Tubing,
    /// Coiled tubing (Dean flow not credited: the straight-tube drop, a lower value).
    Coil,
    /// A fitting or union.
    Fitting,
    /// A packed cartridge.
    Cartridge,
    /// The back-pressure regulator, last.
    Regulator,
}

impl StageKind {
    /// In the order of [`KIND`]'s options.
    pub const ALL: [StageKind; 8] =
        [StageKind::LiquidFeed, StageKind::GasFeed, StageKind::Junction, StageKind::Tubing, StageKind::Coil, StageKind::Fitting, StageKind::Cartridge, StageKind::Regulator];

    /// Lower-case name for messages.
    pub const fn word(self) -> &'static str {
        match self {
            StageKind::LiquidFeed => "liquid feed",
            StageKind::GasFeed => "gas feed",
            StageKind::Junction => "junction",
            StageKind::Tubing => "tubing",
            StageKind::Coil => "coil",
            StageKind::Fitting => "fitting",
            StageKind::Cartridge => "packed cartridge",
            StageKind::Regulator => "back-pressure regulator",
        }
    }
}

/// A pumped feed.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Feed {
    /// Flow delivered.
    pub flow: VolumetricFlow,
    /// The pump's largest flow.
    pub max_flow: VolumetricFlow,
    /// The pump.
    pub pump: Pump,
    /// Solids volume fraction in the feed (0 for a clean liquid).
    pub solids: Fraction,
}

/// A gas feed: the gas entries of the gas–liquid calculators and the supply pressure.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct GasSupply {
    /// The gas.
    pub gas: Gas,
    /// Mole fraction of the named gas, the rest nitrogen (air: its own composition).
    pub mole_fraction: f64,
    /// Flow at its reference state (the flow controller's reading).
    pub flow: ReferenceFlow,
    /// Supply pressure (gauge) upstream of the flow controller.
    pub supply: PressureDifference,
    /// The limiting oxygen concentration entered for the liquid, if any (oxidising gases only).
    pub limiting_oxygen: Option<f64>,
}

/// A packed bed.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Packing {
    /// Particle diameter.
    pub particle_diameter: Length,
    /// Voidage between the particles.
    pub voidage: Fraction,
}

/// One stage of the line with the entries of its kind.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "stage", rename_all = "snake_case")]
pub enum Stage {
    /// A feed joins at the inlet of the next stage that carries flow.
    Feed(Feed),
    /// The gas feed joins at the inlet of the next stage that carries flow.
    Gas(GasSupply),
    /// A passage the liquid flows through (junction, tubing, coil, fitting or cartridge).
    Passage {
        /// Which.
        kind: StageKind,
        /// Bore, narrowest opening, or the cartridge's inner diameter.
        bore: Length,
        /// Flow-path length (bed length of a cartridge).
        length: Length,
        /// Its pressure rating (gauge).
        rating: PressureDifference,
        /// The packing, for a cartridge.
        packing: Option<Packing>,
    },
    /// The back-pressure regulator.
    Regulator {
        /// Set point (gauge).
        set_point: PressureDifference,
        /// Its pressure rating (gauge).
        rating: PressureDifference,
    },
}

impl Stage {
    /// Whether it is a feed (liquid or gas): it carries no flow of its own.
    pub fn is_feed(&self) -> bool {
        matches!(self, Stage::Feed(_) | Stage::Gas(_))
    }

    /// Its kind.
    pub fn kind(&self) -> StageKind {
        match self {
            Stage::Feed(_) => StageKind::LiquidFeed,
            Stage::Gas(_) => StageKind::GasFeed,
            Stage::Passage { kind, .. } => *kind,
            Stage::Regulator { .. } => StageKind::Regulator,
        }
    }
}

/// What the product balance needs (the tubular reactor's fields).
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Production {
    /// Limiting substrate in the combined stream.
    pub concentration: Concentration,
    /// Yield on it.
    pub yield_fraction: Fraction,
    /// Product molar mass.
    pub molar_mass: MolarMass,
}

/// What the gas stages need of the liquid: its properties at the line's temperature.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct GasLiquid {
    /// Density, viscosity, surface tension and vapour pressure (none for an entered liquid).
    pub liquid: Liquid,
    /// The line's temperature.
    pub temperature: Temperature,
}

/// Validated inputs of a setup.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SetupInput {
    /// The stages in flow order.
    pub stages: Vec<Stage>,
    /// The liquid (one liquid and one temperature for the whole line).
    pub liquid: LiquidSelection,
    /// Liquid density.
    pub density: Density,
    /// Liquid viscosity.
    pub viscosity: DynamicViscosity,
    /// Atmospheric pressure.
    pub ambient: Pressure,
    /// The line's tubing from the table, for its rating at temperature.
    pub tubing: Option<tubing::TubingChoice>,
    /// d90 of the solids, when a feed carries solids.
    pub d90: Option<Length>,
    /// The liquid's properties for the gas stages, when the line has a gas feed.
    pub gas_liquid: Option<GasLiquid>,
    /// The product balance.
    pub production: Production,
}

/// Field name of errors about the list of stages as a whole.
pub const STAGES_KEY: &str = "elements";

fn at(k: &ElementKey, e: InputError) -> InputError {
    InputError { field: k.key, label: k.label, ..e }
}

/// Reads one stage's entries (only those of its kind), naming errors by the stage's keys.
fn read_stage(src: &dyn FieldSource, i: usize, c: &mut Collector) -> Option<Stage> {
    let mut q = |spec: &FieldSpec, table: &[ElementKey; MAX_STAGES]| c.take(src.quantity(spec).map_err(|e| at(&table[i], e)));
    let kind = src.choice(&KIND).map_err(|e| at(&keys::KIND[i], e));
    let kind = match kind {
        Ok(k) => *StageKind::ALL.get(k)?,
        Err(e) => {
            c.take::<()>(Err(e));
            return None;
        }
    };
    match kind {
        StageKind::LiquidFeed => {
            let flow = q(&FLOW, &keys::FLOW);
            let max_flow = q(&PUMP_MAX_FLOW, &keys::PUMP_MAX_FLOW);
            let solids = q(&SOLIDS, &keys::SOLIDS);
            let pump = match c.take(src.choice(&PUMP).map_err(|e| at(&keys::PUMP[i], e))) {
                Some(1) => {
                    let mut q = |spec: &FieldSpec, table: &[ElementKey; MAX_STAGES]| c.take(src.quantity(spec).map_err(|e| at(&table[i], e)));
                    let force = q(&DRIVE_FORCE, &keys::DRIVE_FORCE);
                    let bore = q(&BARREL_BORE, &keys::BARREL_BORE);
                    let rating = q(&BARREL_RATING, &keys::BARREL_RATING);
                    Some(Pump::Syringe { force: force?, bore: bore?, barrel_rating: PressureDifference::from_si(rating?) })
                }
                Some(k) => {
                    let limit = PressureDifference::from_si(c.take(src.quantity(&PUMP_LIMIT).map_err(|e| at(&keys::PUMP_LIMIT[i], e)))?);
                    Some(match k {
                        2 => Pump::Peristaltic { limit },
                        3 => Pump::Diaphragm { limit },
                        _ => Pump::Piston { limit },
                    })
                }
                None => None,
            };
            Some(Stage::Feed(Feed {
                flow: VolumetricFlow::from_si(flow?),
                max_flow: VolumetricFlow::from_si(max_flow?),
                pump: pump?,
                solids: Fraction::from_si(solids?),
            }))
        }
        StageKind::GasFeed => {
            // The gas entries are those of the gas–liquid calculators, read by their own reader
            // and named at this stage.
            let mut inner = Collector::default();
            let gas = segmented_flow::read_gas(src, &mut inner);
            let limiting_oxygen = hazards::oxygen::read(src, &mut inner, gas.map(|g| g.0));
            let supply = inner.take(src.quantity(&SUPPLY_PRESSURE));
            for e in inner.into_errors() {
                c.take::<()>(Err(keys::named(i, e)));
            }
            let (gas, y, flow) = gas?;
            Some(Stage::Gas(GasSupply { gas, mole_fraction: y, flow, supply: PressureDifference::from_si(supply?), limiting_oxygen: limiting_oxygen? }))
        }
        StageKind::Regulator => {
            let set_point = q(&SET_POINT, &keys::SET_POINT);
            let rating = q(&RATING, &keys::RATING);
            Some(Stage::Regulator { set_point: PressureDifference::from_si(set_point?), rating: PressureDifference::from_si(rating?) })
        }
        passage => {
            let bore = q(&INNER_DIAMETER, &keys::INNER_DIAMETER);
            let length = q(&LENGTH, &keys::LENGTH);
            let rating = q(&RATING, &keys::RATING);
            let packing = if passage == StageKind::Cartridge {
                let d = q(&PARTICLE_DIAMETER, &keys::PARTICLE_DIAMETER);
                let e = q(&VOIDAGE, &keys::VOIDAGE);
                Some(Packing { particle_diameter: Length::from_si(d?), voidage: Fraction::from_si(e?) })
            } else {
                None
            };
            Some(Stage::Passage {
                kind: passage,
                bore: Length::from_si(bore?),
                length: Length::from_si(length?),
                rating: PressureDifference::from_si(rating?),
                packing,
            })
        }
    }
}

/// The order rules, each broken one named at the stage's kind: the line starts with a feed, every
/// feed has a stage after it that carries its flow, and a regulator is last.
pub fn order_errors(stages: &[Stage]) -> Vec<InputError> {
    let mut errors = Vec::new();
    let n = stages.len();
    if !(2..=MAX_STAGES).contains(&n) {
        errors.push(InputError { field: STAGES_KEY, label: "Stages", given: format!("{n} stages"), problem: format!("allowed: 2 to {MAX_STAGES} stages") });
    }
    let error = |i: usize, problem: &str| InputError { field: keys::KIND[i].key, label: keys::KIND[i].label, given: stages[i].kind().word().to_owned(), problem: problem.to_owned() };
    if let Some(first) = stages.first()
        && first.kind() != StageKind::LiquidFeed
    {
        errors.push(error(0, "the line starts with a feed: put a liquid feed first"));
    }
    for (i, _) in stages.iter().enumerate().filter(|(_, s)| matches!(s, Stage::Gas(_))).skip(1).take(MAX_STAGES) {
        errors.push(error(i, "one gas feed per line: mix the gases before the flow controller and enter the mixture as one feed"));
    }
    for (i, s) in stages.iter().enumerate().take(MAX_STAGES) {
        match s {
            Stage::Regulator { .. } if i + 1 != n => errors.push(error(i, "the back-pressure regulator is the last stage: move it to the end")),
            s if s.is_feed() && !stages[i + 1..].iter().any(|s| !s.is_feed()) => {
                errors.push(error(i, "a feed joins the next stage that carries flow: add a junction, tubing or other stage after it"));
            }
            _ => {}
        }
    }
    errors
}

impl SetupInput {
    /// Builds validated inputs from the setup's source and one source per stage, reporting every
    /// bad entry at once. Each stage reads only the entries of its kind.
    pub fn from_source(src: &dyn FieldSource, stages: &[&dyn FieldSource]) -> Result<Self, Vec<InputError>> {
        let mut c = Collector::default();
        let read: Vec<Option<Stage>> = stages.iter().take(MAX_STAGES).enumerate().map(|(i, s)| read_stage(*s, i, &mut c)).collect();
        let (liquid, density, viscosity) = selection::read_with_properties(src, &mut c, &tubular::DENSITY, &tubular::VISCOSITY);
        let ambient = ambient::read(src, &mut c);
        let tubing = tubing::read(src, &mut c, &selection::TEMPERATURE);
        let solids = read.iter().flatten().any(|s| matches!(s, Stage::Feed(f) if f.solids.si() > 0.0));
        let d90 = if solids { c.take(src.quantity(&D90)).map(|d| Some(Length::from_si(d))) } else { Some(None) };
        let gassed = read.iter().flatten().any(|s| matches!(s, Stage::Gas(_)));
        let gas_liquid = match (gassed, liquid) {
            (false, _) => Some(None),
            (true, Some(l)) => read_gas_liquid(src, &mut c, &l).map(Some),
            (true, None) => None,
        };
        let concentration = c.take(src.quantity(&tubular::CONCENTRATION));
        let yield_fraction = c.take(src.quantity(&tubular::YIELD));
        let molar_mass = c.take(src.quantity(&tubular::MOLAR_MASS));
        let mut errors = c.into_errors();
        let all_read: Option<Vec<Stage>> = read.into_iter().collect();
        if let Some(list) = &all_read {
            errors.extend(order_errors(list));
        } else if stages.len() > MAX_STAGES || stages.len() < 2 {
            errors.push(InputError { field: STAGES_KEY, label: "Stages", given: format!("{} stages", stages.len()), problem: format!("allowed: 2 to {MAX_STAGES} stages") });
        }
        let (Some(stages), Some(liquid), Some(rho), Some(mu), Some(ambient), Some(tubing), Some(d90), Some(gas_liquid), Some(cn), Some(y), Some(m), true) =
            (all_read, liquid, density, viscosity, ambient, tubing, d90, gas_liquid, concentration, yield_fraction, molar_mass, errors.is_empty())
        else {
            return Err(errors);
        };
        Ok(Self {
            stages,
            liquid,
            density: Density::from_si(rho),
            viscosity: DynamicViscosity::from_si(mu),
            ambient,
            tubing,
            d90,
            gas_liquid,
            production: Production {
                concentration: Concentration::from_si(cn),
                yield_fraction: Fraction::from_si(y),
                molar_mass: MolarMass::from_si(m),
            },
        })
    }
}

/// The liquid's properties for the gas stages: those of the gas–liquid cartridge
/// ([`gas_liquid_bed::liquid_properties`]) at the line's temperature; an entered liquid also needs
/// its surface tension and a temperature for the gas.
fn read_gas_liquid(src: &dyn FieldSource, c: &mut Collector, liquid: &LiquidSelection) -> Option<GasLiquid> {
    let (temperature, surface_tension) = match *liquid {
        LiquidSelection::Solvent { temperature, .. } | LiquidSelection::Mixture { temperature, .. } => (temperature, None),
        LiquidSelection::Custom { .. } => {
            let t = c.take(src.quantity(&selection::TEMPERATURE));
            let sigma = c.take(src.quantity(&fluids::CUSTOM_SURFACE_TENSION));
            (Temperature::from_si(t?), Some(sigma?))
        }
    };
    match gas_liquid_bed::liquid_properties(liquid, surface_tension) {
        Ok(liquid) => Some(GasLiquid { liquid, temperature }),
        Err(e) => c.take(Err(InputError {
            field: selection::TEMPERATURE.key,
            label: selection::TEMPERATURE.label,
            given: format!("{} K", format_significant(e.temperature_k, 4)),
            problem: e.to_string(),
        })),
    }
}
