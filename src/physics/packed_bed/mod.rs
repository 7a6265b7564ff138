//! Packed cartridge: bed figures, the pressure drop by every applicable correlation, minimum
//! fluidisation in up-flow, capacity of an active solid and optional sizing for a target
//! residence time, with checks on the pressure budget, bed lifting, wall effect and plug flow.

pub mod benyahia_oneill;
pub mod capacity;
pub mod carman;
pub mod erdim_akgiray_demir;
pub mod ergun;
pub mod flow;
pub mod geometry;
pub mod harrison_brunner_hecker;
pub mod kozeny_carman;
pub mod kta;
pub mod kunii_levenspiel;
pub mod mehta_hawley;
pub mod minimum_fluidisation;
pub mod montillet_akkari_comiti;
pub mod packing;
pub mod plots;
pub mod pressure_drop;
pub mod quantities;
pub mod sizing;
pub mod tallmadge;
pub mod wen_yu;

use serde::Serialize;

use self::flow::BedFlow;
use self::minimum_fluidisation::FluidisationInput;
use self::packing::{ParticleShape, Voidage, VoidageSource};
use self::pressure_drop::RECOMMENDED;
use self::quantities::{Mass, SpecificAmount};
use self::sizing::SizingProblem;
use super::fluids::selection::{self, LiquidSelection};
use super::form::{ChoiceSpec, Collector, FieldSource};
use super::input::{Allowed, FieldSpec, InputError};
use super::numeric::RootError;
use super::solids::{self, SolidSelection};
use super::report::{Check, Estimate, Figure, Finite, ModelInfo, NumericalError, PRESSURE_MARGIN, Report, Verdict, budget_verdict};
use super::units::{
    Concentration, Density, Dimension, Duration, DynamicViscosity, Fraction, Length, PressureDifference, Velocity,
    VolumetricFlow, format_significant,
};

use super::input::field;

const NON_NEGATIVE: Allowed = Allowed { low: 0.0, low_inclusive: true, high: None, high_inclusive: false, whole: false };
const OPEN_FRACTION: Allowed = Allowed { low: 0.0, low_inclusive: false, high: Some(1.0), high_inclusive: false, whole: false };

/// Cartridge inner diameter.
pub const TUBE_DIAMETER: FieldSpec = field("tube_diameter", "Cartridge inner diameter", Dimension::Length, Allowed::POSITIVE, "Bore of the packed section.");
/// Length of the packed bed.
pub const BED_LENGTH: FieldSpec = field("bed_length", "Bed length", Dimension::Length, Allowed::POSITIVE, "Length of the packed section between the frits.");
/// Volume-equivalent particle diameter.
pub const PARTICLE_DIAMETER: FieldSpec = field("particle_diameter", "Particle diameter", Dimension::Length, Allowed::POSITIVE, "Volume-equivalent diameter of the particles as packed; fines and a wide size distribution raise the pressure drop.");
/// Particle shape.
/// Whether the bed length is entered or follows from the mass packed.
pub const BED_LENGTH_SOURCE: ChoiceSpec = ChoiceSpec {
    key: "bed_length_source",
    label: "Bed length",
    options: &[("entered", "Enter the bed length"), ("from_mass", "From the mass packed: L = m / (ρ_p (1 − ε) π D_t²/4)")],
};
/// One particle size, or a size distribution by d10/d50/d90.
pub const SIZE_MODE: ChoiceSpec = ChoiceSpec {
    key: "size_mode",
    label: "Particle size",
    options: &[("single", "One size"), ("distribution", "d10 / d50 / d90 (fines set the pressure drop: d10 is used)")],
};
/// d10 of a size distribution.
pub const D10: FieldSpec = field("d10", "d10", Dimension::Length, Allowed::POSITIVE, "10 % of the solid volume is in smaller particles; used for the pressure drop, lifting and sizing.");
/// d50 of a size distribution.
pub const D50: FieldSpec = field("d50", "d50", Dimension::Length, Allowed::POSITIVE, "Median size by volume.");
/// d90 of a size distribution.
pub const D90: FieldSpec = field("d90", "d90", Dimension::Length, Allowed::POSITIVE, "90 % of the solid volume is in smaller particles.");
/// Particle shape.
pub const PARTICLE_SHAPE: ChoiceSpec = ChoiceSpec {
    key: "particle_shape",
    label: "Particle shape",
    options: &[("sphere", "Spheres (beads)"), ("irregular", "Irregular (crushed solid, powder)"), ("cylinder", "Cylinders (extrudates)")],
};
/// Sphericity of non-spherical particles.
pub const SPHERICITY: FieldSpec = field("sphericity", "Sphericity", Dimension::Number, Allowed::UNIT_FRACTION, "Surface of the volume-equivalent sphere over the particle's surface (1 for spheres; crushed solids about 0.6–0.8).");
/// Where the voidage comes from.
pub const VOIDAGE_SOURCE: ChoiceSpec = ChoiceSpec {
    key: "voidage_source",
    label: "Bed voidage",
    options: &[("entered", "Enter the voidage"), ("estimated", "Estimate from D_t/d_p (Benyahia–O'Neill)")],
};
/// Interparticle voidage.
pub const VOIDAGE: FieldSpec = field("voidage", "Bed voidage (between particles)", Dimension::Fraction, OPEN_FRACTION, "Volume fraction between the particles; random close-packed spheres about 0.36–0.40, dry-packed fine powders looser.");
/// Particle (envelope) density.
pub const PARTICLE_DENSITY: FieldSpec = field("particle_density", "Particle density", Dimension::Density, Allowed::POSITIVE, "Mass over envelope volume of one particle, pores included (lower than the skeletal density of porous solids).");
/// Liquid flow.
pub const FLOW: FieldSpec = field("flow", "Flow", Dimension::VolumetricFlow, Allowed::POSITIVE, "Total liquid flow through the cartridge.");
/// Flow direction.
pub const FLOW_DIRECTION: ChoiceSpec = ChoiceSpec {
    key: "flow_direction",
    label: "Flow direction",
    options: &[("down", "Down-flow (or horizontal)"), ("up", "Up-flow")],
};
/// Whether an up-flow bed is held in place.
pub const CONFINEMENT: ChoiceSpec = ChoiceSpec {
    key: "confinement",
    label: "Bed held in place",
    options: &[("free", "Free to move (headspace above the bed)"), ("confined", "Held between frits or spacers, no headspace")],
};
/// Liquid density.
pub const DENSITY: FieldSpec = field("density", "Liquid density", Dimension::Density, Allowed::POSITIVE, "At the operating temperature.");
/// Liquid viscosity.
pub const VISCOSITY: FieldSpec = field("viscosity", "Liquid viscosity", Dimension::DynamicViscosity, Allowed::POSITIVE, "Dynamic viscosity at the operating temperature.");
/// Back-pressure regulator set point (gauge).
pub const BACK_PRESSURE: FieldSpec = field("back_pressure", "Back-pressure (gauge)", Dimension::PressureDifference, NON_NEGATIVE, "Set point of the back-pressure regulator after the cartridge, above atmosphere; 0 if none.");
/// Rating of the weakest component (gauge).
pub const RATING: FieldSpec = field("pressure_rating", "Cartridge rating (gauge)", Dimension::PressureDifference, Allowed::POSITIVE, "Working-pressure rating of the cartridge body with its frits and end fittings.");
/// Pump pressure limit (gauge).
pub const PUMP_LIMIT: FieldSpec = field("pump_limit", "Pump pressure limit (gauge)", Dimension::PressureDifference, Allowed::POSITIVE, "Highest pressure the pump delivers, or its pressure-limit setting.");
/// Rating of the weakest fitting, tubing at temperature or sensor (gauge).
pub const FITTING_RATING: FieldSpec = field("fitting_rating", "Fittings and tubing rating (gauge)", Dimension::PressureDifference, Allowed::POSITIVE, "Lowest rating among fittings, valves, sensors and the tubing at its temperature.");
/// Mass of solid in the bed.
pub const SOLID_MASS: FieldSpec = field("solid_mass", "Mass of solid packed", Dimension::Mass, Allowed::POSITIVE, "Catalyst, supported reagent or scavenger weighed into the cartridge.");
/// Role of the solid.
pub const BED_ROLE: ChoiceSpec = ChoiceSpec {
    key: "bed_role",
    label: "Solid is",
    options: &[("catalyst", "A catalyst (not consumed)"), ("reagent", "A supported reagent or scavenger (consumed)")],
};
/// Loading of active groups, mmol per gram of solid.
pub const LOADING: FieldSpec = field("loading", "Loading", Dimension::SpecificAmount, Allowed::POSITIVE, "Active groups per mass of solid, as supplied or titrated.");
/// Substrate concentration in the feed.
pub const CONCENTRATION: FieldSpec = field("concentration", "Substrate concentration", Dimension::Concentration, Allowed::POSITIVE, "Substrate that consumes the active groups, in the feed.");
/// Active groups consumed per substrate.
pub const STOICHIOMETRY: FieldSpec = field("stoichiometry", "Active groups used per substrate (mol/mol)", Dimension::Number, Allowed::POSITIVE, "Moles of active groups consumed per mole of substrate converted.");
/// Whether to size a bed.
pub const SIZING: ChoiceSpec = ChoiceSpec {
    key: "sizing",
    label: "Sizing",
    options: &[("check", "Check this bed only"), ("size", "Also size the bed for a target residence time")],
};
/// Target residence time between particles.
pub const TARGET_RESIDENCE_TIME: FieldSpec = field("target_residence_time", "Target residence time", Dimension::Duration, Allowed::POSITIVE, "Mean time the liquid should spend between the particles.");
/// Largest acceptable bed pressure drop.
pub const MAX_PRESSURE_DROP: FieldSpec = field("max_pressure_drop", "Largest bed pressure drop", Dimension::PressureDifference, Allowed::POSITIVE, "Pressure drop over the bed the sized design may not exceed.");

/// Every quantity field, in page order.
pub const FIELDS: &[FieldSpec] = &[
    selection::TEMPERATURE, TUBE_DIAMETER, BED_LENGTH, PARTICLE_DIAMETER, D10, D50, D90, SPHERICITY, VOIDAGE, PARTICLE_DENSITY, solids::PARTICLE_POROSITY, FLOW, crate::physics::fluids::FIRST_VOLUME_FRACTION, DENSITY, VISCOSITY,
    BACK_PRESSURE, crate::physics::ambient::AMBIENT_PRESSURE, PUMP_LIMIT, RATING, FITTING_RATING, SOLID_MASS, LOADING, CONCENTRATION, STOICHIOMETRY, TARGET_RESIDENCE_TIME, MAX_PRESSURE_DROP,
];

/// Every choice field, in page order.
pub const CHOICES: &[ChoiceSpec] = &[BED_LENGTH_SOURCE, solids::SOLID, selection::LIQUID, selection::MIXTURE_FIRST, selection::MIXTURE_SECOND, crate::physics::tubing::MATERIAL, crate::physics::tubing::SIZE, SIZE_MODE, PARTICLE_SHAPE, VOIDAGE_SOURCE, FLOW_DIRECTION, CONFINEMENT, BED_ROLE, SIZING];

/// Direction of flow through the bed.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum FlowDirection {
    /// Down-flow or horizontal: the flow presses the bed onto the outlet frit.
    Down,
    /// Up-flow with the bed free to rise.
    UpFree,
    /// Up-flow with the bed held between frits or spacers.
    UpConfined,
}

/// What the solid does.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "role", rename_all = "snake_case")]
pub enum BedRole {
    /// A catalyst, not consumed.
    Catalyst,
    /// A supported reagent or scavenger, consumed by the substrate.
    Reagent {
        /// Active groups per mass of solid.
        loading: SpecificAmount,
        /// Substrate concentration in the feed.
        concentration: Concentration,
        /// Active groups consumed per substrate, mol/mol.
        stoichiometry: f64,
    },
}

/// A sizing target.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct SizingTarget {
    /// Residence time between the particles.
    pub residence_time: Duration,
    /// Largest acceptable bed pressure drop.
    pub max_pressure_drop: PressureDifference,
}

/// The particles of a bed and how they pack, as entered on a cartridge form (one size or a
/// d10/d50/d90 distribution, shape, voidage, solid). Shared by every calculator with a packed bed.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Particles {
    /// Volume-equivalent particle diameter d_v used in every correlation (d10 of a distribution).
    pub particle_diameter: Length,
    /// d10, d50, d90 when a distribution was entered.
    pub distribution: Option<[Length; 3]>,
    /// Particle shape.
    pub shape: ParticleShape,
    /// Bed voidage source.
    pub voidage: VoidageSource,
    /// The solid: from the solids table (with its internal porosity) or an entered density.
    pub solid: SolidSelection,
}

impl Particles {
    /// An input error on the voidage choice when the estimate is impossible (outside (0, 1)) for
    /// these particles in a tube of bore `tube_diameter`; nothing when the voidage is entered.
    pub fn check_estimated_voidage(&self, tube_diameter: Length) -> Result<(), InputError> {
        if self.voidage != VoidageSource::Estimated {
            return Ok(());
        }
        let (estimate, info, _) = packing::estimated_voidage(self.shape, self.particle_diameter, tube_diameter);
        if estimate.si() > 0.0 && estimate.si() < 1.0 {
            return Ok(());
        }
        Err(InputError {
            field: VOIDAGE_SOURCE.key,
            label: VOIDAGE_SOURCE.label,
            given: "\"estimated\"".to_owned(),
            problem: format!(
                "{} gives ε = {} for these particles and this tube, which is impossible; enter a measured voidage",
                info.name,
                format_significant(estimate.si(), 3)
            ),
        })
    }

    /// Says which size the correlations used when a distribution was entered (empty otherwise).
    pub fn size_note(&self) -> String {
        match self.distribution {
            Some([d10, ..]) => format!(
                ", with d10 = {} µm: the fines fill the gaps between larger particles and set the pressure drop, so d10 is used (a conservative choice)",
                format_significant(d10.si() * 1e6, 3)
            ),
            None => String::new(),
        }
    }
}

/// Reads the particle fields (size or distribution, shape, voidage, solid) that the choices make
/// apply, reporting bad fields to `c`.
pub fn read_particles(src: &dyn FieldSource, c: &mut Collector) -> Option<Particles> {
    let sizes = match c.take(src.choice(&SIZE_MODE)) {
        Some(0) => c.take(src.quantity(&PARTICLE_DIAMETER)).map(|d| (d, None)),
        Some(_) => {
            let d10 = c.take(src.quantity(&D10));
            let d50 = c.take(src.quantity(&D50));
            let d90 = c.take(src.quantity(&D90));
            match (d10, d50, d90) {
                (Some(a), Some(b), Some(g)) if a < b && b < g => {
                    Some((a, Some([Length::from_si(a), Length::from_si(b), Length::from_si(g)])))
                }
                (Some(a), Some(b), Some(g)) => {
                    let um = |v: f64| format_significant(v * 1e6, 4);
                    c.take::<()>(Err(InputError {
                        field: D50.key,
                        label: D50.label,
                        given: format!("d10 {} µm, d50 {} µm, d90 {} µm", um(a), um(b), um(g)),
                        problem: "allowed: 0 < d10 < d50 < d90".to_owned(),
                    }));
                    None
                }
                _ => None,
            }
        }
        None => None,
    };
    let shape = match c.take(src.choice(&PARTICLE_SHAPE)) {
        Some(0) => Some(ParticleShape::Sphere),
        Some(1) => c.take(src.quantity(&SPHERICITY)).map(|sphericity| ParticleShape::Irregular { sphericity }),
        Some(_) => c.take(src.quantity(&SPHERICITY)).map(|sphericity| ParticleShape::Cylinder { sphericity }),
        None => None,
    };
    let voidage = match c.take(src.choice(&VOIDAGE_SOURCE)) {
        Some(0) => c.take(src.quantity(&VOIDAGE)).map(|v| VoidageSource::Entered(Fraction::from_si(v))),
        Some(_) => Some(VoidageSource::Estimated),
        None => None,
    };
    let solid = solids::read(src, c, &PARTICLE_DENSITY);
    let ((d, distribution), shape, voidage, solid) = (sizes?, shape?, voidage?, solid?);
    Some(Particles { particle_diameter: Length::from_si(d), distribution, shape, voidage, solid })
}

/// Reads the pump limit and the cartridge and fittings ratings (gauge) and returns the lowest with
/// the part that sets it: "pump", "cartridge" or "fittings and tubing".
pub fn read_ratings(src: &dyn FieldSource, c: &mut Collector) -> Option<(f64, &'static str)> {
    let ratings = [
        (c.take(src.quantity(&PUMP_LIMIT)), "pump"),
        (c.take(src.quantity(&RATING)), "cartridge"),
        (c.take(src.quantity(&FITTING_RATING)), "fittings and tubing"),
    ];
    // The weakest part sets the limit.
    ratings.iter().try_fold((f64::INFINITY, ""), |acc, (r, part)| r.map(|r| if r < acc.0 { (r, *part) } else { acc }))
}

/// Validated inputs of the packed-cartridge calculator.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct PackedBedInput {
    /// Cartridge inner diameter D_t.
    pub tube_diameter: Length,
    /// Bed length L.
    pub bed_length: Length,
    /// Volume-equivalent particle diameter d_v used in every correlation (d10 of a distribution).
    pub particle_diameter: Length,
    /// d10, d50, d90 when a distribution was entered.
    pub distribution: Option<[Length; 3]>,
    /// Particle shape.
    pub shape: ParticleShape,
    /// Bed voidage source.
    pub voidage: VoidageSource,
    /// The solid: from the solids table (with its internal porosity) or an entered density.
    pub solid: SolidSelection,
    /// Particle envelope density, pores included (from `solid`).
    pub particle_density: Density,
    /// Liquid flow.
    pub flow: VolumetricFlow,
    /// Flow direction and confinement.
    pub direction: FlowDirection,
    /// The liquid: a built-in solvent at a temperature, or entered properties.
    pub liquid: LiquidSelection,
    /// Liquid density at the working temperature (from `liquid`).
    pub density: Density,
    /// Liquid viscosity.
    pub viscosity: DynamicViscosity,
    /// Back-pressure set point, gauge.
    pub back_pressure: PressureDifference,
    /// Atmospheric pressure the gauge pressures are measured against.
    pub ambient: crate::physics::units::Pressure,
    /// The feed tubing from the table, for its rating at temperature.
    pub tubing: Option<crate::physics::tubing::TubingChoice>,
    /// Lowest component rating, gauge.
    pub rating: PressureDifference,
    /// Which part sets `rating`: "pump", "cartridge" or "fittings and tubing".
    pub rating_part: &'static str,
    /// Mass of solid packed.
    pub solid_mass: Mass,
    /// Catalyst or consumed reagent.
    pub role: BedRole,
    /// Sizing target, if sizing was asked for.
    pub sizing: Option<SizingTarget>,
}

impl PackedBedInput {
    /// The particles as entered.
    pub fn particles(&self) -> Particles {
        Particles { particle_diameter: self.particle_diameter, distribution: self.distribution, shape: self.shape, voidage: self.voidage, solid: self.solid }
    }

    /// Builds validated inputs from a source, reporting every bad field at once. Fields that the
    /// choices make irrelevant (sphericity of spheres, voidage when estimated, confinement in
    /// down-flow, capacity of a catalyst, sizing targets) are not read.
    pub fn from_source(src: &dyn FieldSource) -> Result<Self, Vec<InputError>> {
        let mut c = Collector::default();
        let tube_diameter = c.take(src.quantity(&TUBE_DIAMETER));
        // From the mass packed, the length is computed once the voidage is known (below); the
        // placeholder 1 m never reaches a result.
        let bed_length = match c.take(src.choice(&BED_LENGTH_SOURCE)) {
            Some(0) => c.take(src.quantity(&BED_LENGTH)),
            Some(_) => Some(1.0),
            None => None,
        };
        let length_from_mass = matches!(src.choice(&BED_LENGTH_SOURCE), Ok(1));
        let particles = read_particles(src, &mut c);
        let flow = c.take(src.quantity(&FLOW));
        let direction = match c.take(src.choice(&FLOW_DIRECTION)) {
            Some(0) => Some(FlowDirection::Down),
            Some(_) => match c.take(src.choice(&CONFINEMENT)) {
                Some(0) => Some(FlowDirection::UpFree),
                Some(_) => Some(FlowDirection::UpConfined),
                None => None,
            },
            None => None,
        };
        let (liquid, density, viscosity) = selection::read_with_properties(src, &mut c, &DENSITY, &VISCOSITY);
        let back_pressure = c.take(src.quantity(&BACK_PRESSURE));
        let ambient = crate::physics::ambient::read(src, &mut c);
        let tubing = crate::physics::tubing::read(src, &mut c, &selection::TEMPERATURE);
        let ratings = read_ratings(src, &mut c);
        let rating = ratings.map(|r| r.0);
        let rating_part = ratings.map_or("", |r| r.1);
        let solid_mass = c.take(src.quantity(&SOLID_MASS));
        let role = match c.take(src.choice(&BED_ROLE)) {
            Some(0) => Some(BedRole::Catalyst),
            Some(_) => {
                let loading = c.take(src.quantity(&LOADING));
                let concentration = c.take(src.quantity(&CONCENTRATION));
                let stoichiometry = c.take(src.quantity(&STOICHIOMETRY));
                match (loading, concentration, stoichiometry) {
                    (Some(l), Some(cn), Some(s)) => Some(BedRole::Reagent {
                        loading: SpecificAmount::from_si(l),
                        concentration: Concentration::from_si(cn),
                        stoichiometry: s,
                    }),
                    _ => None,
                }
            }
            None => None,
        };
        let sizing = match c.take(src.choice(&SIZING)) {
            Some(0) => Some(None),
            Some(_) => {
                let tau = c.take(src.quantity(&TARGET_RESIDENCE_TIME));
                let max = c.take(src.quantity(&MAX_PRESSURE_DROP));
                match (tau, max) {
                    (Some(t), Some(m)) => Some(Some(SizingTarget {
                        residence_time: Duration::from_seconds(t),
                        max_pressure_drop: PressureDifference::from_si(m),
                    })),
                    _ => None,
                }
            }
            None => None,
        };
        let (
            Some(dt), Some(l), Some(particles), Some(q), Some(direction), Some(rho),
            Some(mu), Some(bp), Some(rating), Some(mass), Some(role), Some(sizing), Some(ambient), Some(tubing),
        ) = (
            tube_diameter, bed_length, particles, flow, direction, density,
            viscosity, back_pressure, rating, solid_mass, role, sizing, ambient, tubing,
        )
        else {
            return Err(c.into_errors());
        };
        let Particles { particle_diameter, distribution, shape, voidage, solid } = particles;
        let input = Self {
            tube_diameter: Length::from_si(dt),
            bed_length: Length::from_si(l),
            particle_diameter,
            distribution,
            shape,
            voidage,
            solid,
            particle_density: solid.envelope_density(),
            flow: VolumetricFlow::from_si(q),
            direction,
            liquid: liquid.unwrap_or(LiquidSelection::Custom { density: Density::from_si(rho), viscosity: DynamicViscosity::from_si(mu) }),
            density: Density::from_si(rho),
            viscosity: DynamicViscosity::from_si(mu),
            back_pressure: PressureDifference::from_si(bp),
            ambient,
            tubing,
            rating: PressureDifference::from_si(rating),
            rating_part,
            solid_mass: Mass::from_si(mass),
            role,
            sizing,
        };
        let mut input = input;
        if length_from_mass {
            let eps = match input.voidage {
                VoidageSource::Entered(f) => f.si(),
                VoidageSource::Estimated => packing::estimated_voidage(input.shape, input.particle_diameter, input.tube_diameter).0.si(),
            };
            let area = crate::physics::pipe_flow::bore_area(input.tube_diameter);
            input.bed_length = Length::from_si(input.solid_mass.si() / (input.particle_density.si() * (1.0 - eps) * area));
        }
        particles.check_estimated_voidage(input.tube_diameter).map_err(|e| vec![e])?;
        Ok(input)
    }
}

/// The narrowest cartridge for a target residence time and pressure-drop limit.
pub const NARROWEST_TUBE_INFO: ModelInfo = ModelInfo {
    name: "Sizing (Ergun)",
    formula: "narrowest D_t with ΔP_Ergun(L = τ Q / (ε π D_t²/4)) = ΔP_max, solved by Brent's method",
    source: "Ergun (1952) with the bed-volume definition",
    validity: &[],
};


const OVER_PRESSURE_CAUTION: &str = "Over-pressure can burst a cartridge or tubing or blow a fitting apart and spray hot, possibly \
toxic liquid and catalyst. Stay below the lowest-rated component (polymer and glass parts lose \
strength with temperature), use a pump pressure limit or relief, shield pressurised parts, and \
follow local codes and institutional rules.";

const LIFTING_CAUTION: &str = "A lifting bed carries fines to the upper frit, where they can block it: the pressure then \
rises quickly towards the pump limit, and a bed that channels or escapes gives wrong contact \
times and contaminates the product. Hold the bed between frits or spacers with no headspace, or \
run below the minimum fluidisation velocity or in down-flow, and keep a pump pressure limit set.";

/// Metadata of the inlet pressure.
pub const INLET_PRESSURE_INFO: ModelInfo = ModelInfo {
    name: "Pressure balance",
    formula: "p_in = p_back + ΔP_bed (gauge; frits, fittings and lines not included)",
    source: "definition",
    validity: &[],
};

/// Metadata of an entered voidage.
pub const ENTERED_VOIDAGE_INFO: ModelInfo =
    ModelInfo { name: "Entered voidage", formula: "ε as entered", source: "user input", validity: &[] };

/// Why an entered voidage is preferred to the estimate.
pub const VOIDAGE_RECOMMENDATION: &str = "The entered value: a measured voidage beats any correlation, and the Benyahia–O'Neill \
estimate is for non-cohesive particles (fine powders pack looser).";

/// Metadata of the bed length that gives a residence time.
pub const LENGTH_FOR_TIME_INFO: ModelInfo = ModelInfo {
    name: "Bed length for a residence time",
    formula: "L = τ Q / (ε π D_t² / 4)",
    source: "definition",
    validity: &[],
};

fn bar(p: f64) -> String {
    format_significant(p / 1e5, 3)
}

/// The bed-voidage figure: the estimate with its correlation, or the entered value with the
/// Benyahia–O'Neill estimate beside it for comparison.
pub fn voidage_figure(voidage: &Voidage, shape: ParticleShape, particle_diameter: Length, tube_diameter: Length) -> Result<Figure, NumericalError> {
    match voidage.model {
        Some(model) => Figure::single("bed_voidage", "Bed voidage", Dimension::Fraction, model, voidage.value.si(), voidage.warnings.clone()),
        None => {
            let (estimate, info, warnings) = packing::estimated_voidage(shape, particle_diameter, tube_diameter);
            let value = Finite::new("bed voidage", voidage.value.si())?;
            let mut estimates = vec![Estimate { model: ENTERED_VOIDAGE_INFO, value, recommended: true, warnings: Vec::new() }];
            if estimate.si() > 0.0 && estimate.si() < 1.0 {
                estimates.push(Estimate { model: info, value: Finite::new("bed voidage estimate", estimate.si())?, recommended: false, warnings });
            }
            Ok(Figure {
                key: "bed_voidage",
                label: "Bed voidage",
                dimension: Dimension::Fraction,
                value,
                recommendation: VOIDAGE_RECOMMENDATION,
                estimates,
            })
        }
    }
}

fn pressure_check(inlet: f64, dp: &Figure, back: f64, rating: f64, rating_part: &str, size_note: &str) -> Check {
    let ratio = inlet / rating;
    let (_, worst_dp) = dp.spread();
    let worst_ratio = (back + worst_dp) / rating;
    let verdict = budget_verdict(ratio, worst_ratio);
    let note = match verdict {
        Verdict::Problem => ": over the rating".to_owned(),
        Verdict::Caution if ratio > PRESSURE_MARGIN => ": less than 20 % margin (common practice, no source)".to_owned(),
        Verdict::Caution => format!(
            "; the highest correlation ({} bar bed drop) leaves less than 20 % margin (common practice, no source)",
            bar(worst_dp)
        ),
        Verdict::Fine => String::new(),
    };
    let caution = (verdict != Verdict::Fine).then(|| OVER_PRESSURE_CAUTION.to_owned());
    Check {
        key: "pressure_budget",
        topic: "Pressure budget",
        verdict,
        reason: format!(
            "Inlet pressure {} bar(g) (back-pressure + {} bar bed drop by Ergun{size_note}; correlations span {}–{} bar) is {:.0} % of the {} bar(g) limit of the {rating_part}, the lowest of pump, cartridge and fittings{note}. A fresh bed of fines, compaction and swelling raise it further.",
            bar(inlet),
            bar(dp.value.get()),
            bar(dp.spread().0),
            bar(worst_dp),
            ratio * 100.0,
            bar(rating),
        ),
        caution,
    }
}

fn lifting_check(input: &PackedBedInput, u_s: Velocity, umf: Option<&Figure>) -> Check {
    let topic = "Bed lifting in up-flow";
    let key = "bed_lifting";
    if input.direction == FlowDirection::Down {
        return Check {
            key,
            topic,
            verdict: Verdict::Fine,
            reason: "Down-flow presses the bed onto the outlet frit; lifting does not arise.".to_owned(),
            caution: None,
        };
    }
    let confined = input.direction == FlowDirection::UpConfined;
    let lifted = if confined { Verdict::Caution } else { Verdict::Problem };
    let held = if confined {
        " The bed is held between frits, so it cannot rise, but fines can migrate to the upper frit."
    } else {
        " The bed is free to rise."
    };
    let Some(umf) = umf else {
        return Check {
            key,
            topic,
            verdict: lifted,
            reason: format!(
                "The particles ({} kg/m³ with their pores full of liquid) are not denser than the liquid ({} kg/m³): in up-flow they float or hover at any flow.{held}",
                format_significant(input.solid.wet_density(input.density).si(), 4),
                format_significant(input.density.si(), 4)
            ),
            caution: Some(LIFTING_CAUTION.to_owned()),
        };
    };
    let u = u_s.si();
    let recommended = umf.value.get();
    let (lowest, _) = umf.spread();
    let mm_s = |v: f64| format_significant(v * 1e3, 3);
    let (verdict, what) = if u > recommended {
        (lifted, "above the minimum fluidisation velocity (Wen–Yu)")
    } else if u > lowest {
        (Verdict::Caution, "below the Wen–Yu minimum fluidisation velocity but above the lowest correlation")
    } else {
        (Verdict::Fine, "below the minimum fluidisation velocity by every correlation")
    };
    Check {
        key,
        topic,
        verdict,
        reason: format!(
            "Upward superficial velocity {} mm/s is {} times u_mf = {} mm/s (Wen–Yu; correlations from {} mm/s): {what}.{held}",
            mm_s(u),
            format_significant(u / recommended, 2),
            mm_s(recommended),
            mm_s(lowest)
        ),
        caution: (verdict != Verdict::Fine).then(|| LIFTING_CAUTION.to_owned()),
    }
}

/// The wall-effect check for D_t/d_p = `ratio`, with the Mehta–Hawley correction to Ergun for `bed`.
pub fn wall_check(ratio: f64, bed: &BedFlow) -> Check {
    let extra = (mehta_hawley::pressure_drop(bed).si() / ergun::pressure_drop(bed).si() - 1.0) * 100.0;
    let (verdict, text) = if ratio < geometry::MIN_DIAMETER_RATIO {
        (Verdict::Caution, "below 10: liquid bypasses along the wall (channelling), widening the residence-time distribution")
    } else if ratio < geometry::NEGLIGIBLE_WALL_RATIO {
        (Verdict::Fine, "between 10 and 20: some wall effect on the pressure drop")
    } else {
        (Verdict::Fine, "above 20: the wall effect is small")
    };
    Check {
        key: "wall_effect",
        topic: "Wall effect",
        verdict,
        reason: format!(
            "D_t/d_p = {} is {text} (limits: common practice, no source). The Mehta–Hawley wall correction adds {:.1} % to the Ergun pressure drop.",
            format_significant(ratio, 3),
            extra
        ),
        caution: None,
    }
}

/// The plug-flow check for L/d_p = `ratio` (rule of thumb, marked as such).
pub fn plug_flow_check(ratio: f64) -> Check {
    let ok = ratio >= geometry::MIN_LENGTH_RATIO;
    Check {
        key: "plug_flow",
        topic: "Plug flow",
        verdict: if ok { Verdict::Fine } else { Verdict::Caution },
        reason: format!(
            "L/d_p = {} is {} 50, the usual minimum for near-plug flow (common practice, no source; Mears' axial-dispersion criterion is the rigorous check).{}",
            format_significant(ratio, 3),
            if ok { "at or above" } else { "below" },
            if ok { "" } else { " Expect axial dispersion: conversion below the plug-flow value." }
        ),
        caution: None,
    }
}

fn sizing_figures_and_check(input: &PackedBedInput, target: &SizingTarget, voidage: Fraction, figures: &mut Vec<Figure>) -> Result<Check, NumericalError> {
    let problem = SizingProblem {
        tube_diameter: input.tube_diameter,
        flow: input.flow,
        residence_time: target.residence_time,
        max_pressure_drop: target.max_pressure_drop,
        density: input.density,
        viscosity: input.viscosity,
        shape: input.shape,
        voidage: input.voidage,
        model: RECOMMENDED,
    };
    let length = geometry::length_for_residence_time(target.residence_time, input.flow, input.tube_diameter, voidage);
    let bed = BedFlow {
        particle_diameter: input.shape.effective_diameter(input.particle_diameter),
        voidage,
        superficial_velocity: geometry::superficial_velocity(input.flow, input.tube_diameter),
        density: input.density,
        viscosity: input.viscosity,
        length,
        tube_diameter: input.tube_diameter,
    };
    let dp = RECOMMENDED.pressure_drop(&bed).si();
    figures.push(Figure::definition("sized_bed_length", "Bed length for the target residence time", Dimension::Length, LENGTH_FOR_TIME_INFO, length.si())?);
    figures.push(Figure::single(
        "sized_bed_pressure_drop",
        "Pressure drop of that bed (these particles)",
        Dimension::PressureDifference,
        RECOMMENDED.info(),
        dp,
        RECOMMENDED.warnings(&bed),
    )?);
    let fits = dp <= target.max_pressure_drop.si();
    let mm = |l: Length| format_significant(l.mm(), 3);
    let head = format!(
        "For {} s between the particles this cartridge needs a {} mm bed; with the entered particles its pressure drop is {} bar ({} the {} bar limit).",
        format_significant(target.residence_time.si(), 3),
        mm(length),
        bar(dp),
        if fits { "within" } else { "over" },
        bar(target.max_pressure_drop.si())
    );
    let pair = match problem.narrowest_tube(input.particle_diameter) {
        Ok((d, sized)) => {
            figures.push(Figure::definition("narrowest_tube_diameter", "Narrowest cartridge ID within the limit (these particles)", Dimension::Length, NARROWEST_TUBE_INFO, d.si())?);
            figures.push(Figure::definition("narrowest_tube_length", "Bed length in that cartridge", Dimension::Length, NARROWEST_TUBE_INFO, sized.length.si())?);
            format!(" With these particles the narrowest cartridge within the limit is {} mm ID × {} mm.", mm(d), mm(sized.length))
        }
        Err(RootError::NoBracket { f_low, .. }) if f_low < 0.0 => {
            " With these particles even a 0.2 mm ID cartridge stays within the limit.".to_owned()
        }
        Err(_) => " No cartridge from 0.2 to 200 mm ID keeps these particles within the limit.".to_owned(),
    };
    let head = head + &pair;
    let (search_low, search_high) = problem.search_interval();
    let tail = match problem.smallest_particle_diameter() {
        Ok(sized) => {
            let (_, sized_bed) = problem.bed(sized.particle_diameter).ok_or(NumericalError::NotFinite { quantity: "sized bed" })?;
            figures.push(Figure::single(
                "smallest_particle_diameter",
                "Smallest particles within the pressure-drop limit",
                Dimension::Length,
                RECOMMENDED.info(),
                sized.particle_diameter.si(),
                RECOMMENDED.warnings(&sized_bed),
            )?);
            format!(
                " The smallest particles that keep it within the limit are {} µm (bed {} mm, ε = {}; Ergun).",
                format_significant(sized.particle_diameter.si() * 1e6, 3),
                mm(sized.length),
                format_significant(sized.voidage.si(), 3)
            )
        }
        Err(RootError::NoBracket { f_low, .. }) if f_low < 0.0 => format!(
            " Any particle size down to {} µm stays within the limit.",
            format_significant(search_low.si() * 1e6, 3)
        ),
        Err(RootError::NoBracket { .. }) => format!(
            " No particle size up to {} mm keeps the bed within the limit at this flow: use a wider cartridge, a lower flow or a shorter residence time.",
            format_significant(search_high.mm(), 3)
        ),
        Err(e) => format!(" The smallest particle size could not be found ({e})."),
    };
    Ok(Check {
        key: "sizing",
        topic: "Sizing for the target residence time",
        verdict: if fits { Verdict::Fine } else { Verdict::Caution },
        reason: head + &tail,
        caution: None,
    })
}

/// The D_t/d_p and L/d_p figures, each with the warning of its rule of thumb.
pub fn ratio_figures(diameter_ratio: f64, length_ratio: f64) -> Result<[Figure; 2], NumericalError> {
    Ok([
        Figure::single(
            "diameter_ratio",
            "Tube-to-particle diameter ratio",
            Dimension::Number,
            geometry::DIAMETER_RATIO_INFO,
            diameter_ratio,
            flow::range_warnings(&geometry::DIAMETER_RATIO_INFO, &[(flow::DIAMETER_RATIO, diameter_ratio)]),
        )?,
        Figure::single(
            "length_ratio",
            "Bed-length-to-particle ratio",
            Dimension::Number,
            geometry::LENGTH_RATIO_INFO,
            length_ratio,
            flow::range_warnings(&geometry::LENGTH_RATIO_INFO, &[(geometry::LENGTH_RATIO, length_ratio)]),
        )?,
    ])
}

/// Computes every figure and check for the packed cartridge.
pub fn evaluate(input: &PackedBedInput) -> Result<Report, NumericalError> {
    let voidage = input.voidage.resolve(input.shape, input.particle_diameter, input.tube_diameter)?;
    let eps = voidage.value;
    let u_s = geometry::superficial_velocity(input.flow, input.tube_diameter);
    let bed = BedFlow {
        particle_diameter: input.shape.effective_diameter(input.particle_diameter),
        voidage: eps,
        superficial_velocity: u_s,
        density: input.density,
        viscosity: input.viscosity,
        length: input.bed_length,
        tube_diameter: input.tube_diameter,
    };
    let v_bed = geometry::bed_volume(input.tube_diameter, input.bed_length);
    let v_void = geometry::void_volume(v_bed, eps);
    let diameter_ratio = input.tube_diameter.si() / input.particle_diameter.si();
    let length_ratio = input.bed_length.si() / input.particle_diameter.si();
    let dp = pressure_drop::pressure_drop_spread(&bed)?;
    let inlet = input.back_pressure.si() + dp.value.get();
    let umf = minimum_fluidisation::minimum_fluidisation_spread(&FluidisationInput {
        particle_diameter: input.particle_diameter,
        // Buoyant weight of a particle with its pores full of liquid.
        particle_density: input.solid.wet_density(input.density),
        density: input.density,
        viscosity: input.viscosity,
        voidage: eps,
        sphericity: input.shape.sphericity(),
    })?;

    let mut figures = vec![
        voidage_figure(&voidage, input.shape, input.particle_diameter, input.tube_diameter)?,
        Figure::definition("bed_volume", "Bed volume", Dimension::Volume, geometry::BED_VOLUME_INFO, v_bed.si())?,
        Figure::definition("void_volume", "Void volume between particles", Dimension::Volume, geometry::VOID_VOLUME_INFO, v_void.si())?,
        Figure::definition("residence_time", "Residence time between particles", Dimension::Duration, geometry::RESIDENCE_TIME_INFO, geometry::residence_time(v_void, input.flow).si())?,
        Figure::definition("superficial_velocity", "Superficial velocity", Dimension::Velocity, geometry::SUPERFICIAL_VELOCITY_INFO, u_s.si())?,
        Figure::definition("interstitial_velocity", "Interstitial velocity", Dimension::Velocity, geometry::INTERSTITIAL_VELOCITY_INFO, geometry::interstitial_velocity(u_s, eps).si())?,
        Figure::definition("particle_reynolds", "Particle Reynolds number", Dimension::Number, geometry::PARTICLE_REYNOLDS_INFO, bed.particle_reynolds())?,
    ];
    figures.extend(ratio_figures(diameter_ratio, length_ratio)?);
    figures.extend([
        dp.clone(),
        Figure::definition("inlet_pressure", "Inlet pressure (gauge)", Dimension::PressureDifference, INLET_PRESSURE_INFO, inlet)?,
        Figure::definition("packed_mass", "Mass a full bed holds", Dimension::Mass, geometry::PACKED_MASS_INFO, geometry::packed_mass(v_bed, eps, input.particle_density).si())?,
    ]);
    if let Some(f) = &umf {
        figures.push(f.clone());
    }
    let whsv = capacity::weight_hourly_space_velocity(input.flow, input.density, input.solid_mass);
    figures.push(Figure::definition("whsv", "Weight hourly space velocity", Dimension::Frequency, capacity::WHSV_INFO, whsv.si())?);
    if let BedRole::Reagent { loading, concentration, stoichiometry } = input.role {
        let n = capacity::active_amount(input.solid_mass, loading);
        figures.push(Figure::definition("active_amount", "Active groups on the bed", Dimension::Amount, capacity::ACTIVE_AMOUNT_INFO, n.si())?);
        figures.push(Figure::definition(
            "consumption_time",
            "Time to consume the bed at this feed",
            Dimension::Duration,
            capacity::CONSUMPTION_TIME_INFO,
            capacity::consumption_time(n, input.flow, concentration, stoichiometry).si(),
        )?);
    }

    figures.insert(0, input.solid.figure(false, input.density)?);
    figures.splice(0..0, input.liquid.figures()?);
    let mut checks = vec![
        pressure_check(inlet, &dp, input.back_pressure.si(), input.rating.si(), input.rating_part, &input.particles().size_note()),
        lifting_check(input, u_s, umf.as_ref()),
        wall_check(diameter_ratio, &bed),
        plug_flow_check(length_ratio),
    ];
    if let Some(tubing) = &input.tubing {
        checks.push(crate::physics::tubing::check(tubing, PressureDifference::from_si(inlet), &input.liquid.solvents()));
    }
    if let Some(target) = &input.sizing {
        checks.push(sizing_figures_and_check(input, target, eps, &mut figures)?);
    }
    checks.extend(input.liquid.checks(crate::physics::units::Pressure::from_gauge(input.back_pressure, input.ambient)));
    let lifting_flow = umf.as_ref().map(|f| f.value.get() * crate::physics::pipe_flow::bore_area(input.tube_diameter));
    let plots = vec![plots::pressure_drop_vs_flow(input, &bed, lifting_flow)?];
    Ok(Report { figures, checks, plots })
}
