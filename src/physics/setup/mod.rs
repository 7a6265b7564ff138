//! Whole setup: an ordered line of stages — liquid feeds with their pumps, junctions, tubing,
//! coils, fittings, packed cartridges and the back-pressure regulator — computed stage by stage
//! with the physics that exists for each (Hagen–Poiseuille, Ergun, the clogging criterion), with
//! one pressure budget from the regulator upstream. A stage is one entry of the case's `elements`.

pub mod evaluate;
pub mod keys;
pub mod pump;

use serde::Serialize;

use self::keys::{ElementKey, MAX_STAGES};
use self::pump::Pump;
use super::fluids::selection::{self, LiquidSelection};
use super::form::{ChoiceSpec, Collector, FieldSource};
use super::input::{Allowed, FieldSpec, InputError, field, lab};
use super::units::{Concentration, Density, Dimension, DynamicViscosity, Fraction, Length, MolarMass, Pressure, PressureDifference, VolumetricFlow};
use super::{ambient, slurry, tubing, tubular};

pub use self::evaluate::evaluate;

const OPEN_FRACTION: Allowed = Allowed { low: 0.0, low_inclusive: false, high: Some(1.0), high_inclusive: false, whole: false };

/// Stage kind.
pub const KIND: ChoiceSpec = ChoiceSpec {
    key: "kind",
    label: "Stage",
    options: &[
        ("liquid_feed", "Liquid feed (pump)"),
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
    pub const ALL: [StageKind; 7] =
        [StageKind::LiquidFeed, StageKind::Junction, StageKind::Tubing, StageKind::Coil, StageKind::Fitting, StageKind::Cartridge, StageKind::Regulator];

    /// Lower-case name for messages.
    pub const fn word(self) -> &'static str {
        match self {
            StageKind::LiquidFeed => "liquid feed",
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
    /// Its kind.
    pub fn kind(&self) -> StageKind {
        match self {
            Stage::Feed(_) => StageKind::LiquidFeed,
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
    for (i, s) in stages.iter().enumerate().take(MAX_STAGES) {
        match s {
            Stage::Regulator { .. } if i + 1 != n => errors.push(error(i, "the back-pressure regulator is the last stage: move it to the end")),
            Stage::Feed(_) if !stages[i + 1..].iter().any(|s| !matches!(s, Stage::Feed(_))) => {
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
        let (Some(stages), Some(liquid), Some(rho), Some(mu), Some(ambient), Some(tubing), Some(d90), Some(cn), Some(y), Some(m), true) =
            (all_read, liquid, density, viscosity, ambient, tubing, d90, concentration, yield_fraction, molar_mass, errors.is_empty())
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
            production: Production {
                concentration: Concentration::from_si(cn),
                yield_fraction: Fraction::from_si(y),
                molar_mass: MolarMass::from_si(m),
            },
        })
    }
}
