//! Packed cartridge: bed figures, the pressure drop by every applicable correlation, minimum
//! fluidisation in up-flow, capacity of an active solid and optional sizing for a target
//! residence time, with checks on the pressure budget, bed lifting, wall effect and plug flow.

pub mod advice;
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
pub mod map;
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
use super::report::{AdviceKind, AdviceList, Check, Estimate, Figure, Finite, ModelInfo, NumericalError, PRESSURE_MARGIN, Report, Verdict, budget_verdict};
use super::units::{
    Concentration, Density, Dimension, Duration, DynamicViscosity, Fraction, Length, PressureDifference, Velocity,
    VolumetricFlow, format_significant,
};

use super::input::{field, lab};

const OPEN_FRACTION: Allowed = Allowed { low: 0.0, low_inclusive: false, high: Some(1.0), high_inclusive: false, whole: false };

/// Cartridge inner diameter.
pub const TUBE_DIAMETER: FieldSpec = field("tube_diameter", "Cartridge inner diameter", Dimension::Length, lab::BORE, "Bore of the packed section.");
/// Length of the packed bed.
pub const BED_LENGTH: FieldSpec = field("bed_length", "Bed length", Dimension::Length, lab::BED_LENGTH, "Length of the packed section between the frits.");
/// Volume-equivalent particle diameter.
pub const PARTICLE_DIAMETER: FieldSpec = field("particle_diameter", "Particle diameter", Dimension::Length, lab::PARTICLE_SIZE, "Volume-equivalent diameter of the particles as packed; fines and a wide size distribution raise the pressure drop.");
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
pub const D10: FieldSpec = field("d10", "d10", Dimension::Length, lab::PARTICLE_SIZE, "10 % of the solid volume is in smaller particles; used for the pressure drop, lifting and sizing.");
/// d50 of a size distribution.
pub const D50: FieldSpec = field("d50", "d50", Dimension::Length, lab::PARTICLE_SIZE, "Median size by volume.");
/// d90 of a size distribution.
pub const D90: FieldSpec = field("d90", "d90", Dimension::Length, lab::PARTICLE_SIZE, "90 % of the solid volume is in smaller particles.");
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
pub const PARTICLE_DENSITY: FieldSpec = field("particle_density", "Particle density", Dimension::Density, lab::SOLID_DENSITY, "Mass over envelope volume of one particle, pores included (lower than the skeletal density of porous solids).");
/// Liquid flow.
pub const FLOW: FieldSpec = field("flow", "Flow", Dimension::VolumetricFlow, lab::LIQUID_FLOW, "Total liquid flow through the cartridge.");
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
pub const DENSITY: FieldSpec = field("density", "Liquid density", Dimension::Density, lab::LIQUID_DENSITY, "At the operating temperature.");
/// Liquid viscosity.
pub const VISCOSITY: FieldSpec = field("viscosity", "Liquid viscosity", Dimension::DynamicViscosity, lab::VISCOSITY, "Dynamic viscosity at the operating temperature.");
/// Back-pressure regulator set point (gauge).
pub const BACK_PRESSURE: FieldSpec = field("back_pressure", "Back-pressure (gauge)", Dimension::PressureDifference, lab::BACK_PRESSURE, "Set point of the back-pressure regulator after the cartridge, above atmosphere; 0 if none.");
/// Rating of the weakest component (gauge).
pub const RATING: FieldSpec = field("pressure_rating", "Cartridge rating (gauge)", Dimension::PressureDifference, lab::PRESSURE, "Working-pressure rating of the cartridge body with its frits and end fittings.");
/// Pump pressure limit (gauge).
pub const PUMP_LIMIT: FieldSpec = field("pump_limit", "Pump pressure limit (gauge)", Dimension::PressureDifference, lab::PRESSURE, "Highest pressure the pump delivers, or its pressure-limit setting.");
/// Rating of the weakest fitting, tubing at temperature or sensor (gauge).
pub const FITTING_RATING: FieldSpec = field("fitting_rating", "Fittings and tubing rating (gauge)", Dimension::PressureDifference, lab::PRESSURE, "Lowest rating among fittings, valves, sensors and the tubing at its temperature.");
/// Mass of solid in the bed.
pub const SOLID_MASS: FieldSpec = field("solid_mass", "Mass of solid packed", Dimension::Mass, lab::MASS, "Catalyst, supported reagent or scavenger weighed into the cartridge.");
/// Role of the solid.
pub const BED_ROLE: ChoiceSpec = ChoiceSpec {
    key: "bed_role",
    label: "Solid is",
    options: &[("catalyst", "A catalyst (not consumed)"), ("reagent", "A supported reagent or scavenger (consumed)")],
};
/// Loading of active groups, mmol per gram of solid.
pub const LOADING: FieldSpec = field("loading", "Loading", Dimension::SpecificAmount, lab::LOADING, "Active groups per mass of solid, as supplied or titrated.");
/// Substrate concentration in the feed.
pub const CONCENTRATION: FieldSpec = field("concentration", "Substrate concentration", Dimension::Concentration, lab::CONCENTRATION, "Substrate that consumes the active groups, in the feed.");
/// Active groups consumed per substrate.
pub const STOICHIOMETRY: FieldSpec = field("stoichiometry", "Active groups used per substrate (mol/mol)", Dimension::Number, lab::RATIO, "Moles of active groups consumed per mole of substrate converted.");
/// Whether to size a bed.
pub const SIZING: ChoiceSpec = ChoiceSpec {
    key: "sizing",
    label: "Sizing",
    options: &[("check", "Check this bed only"), ("size", "Also size the bed for a target residence time")],
};
/// Target residence time between particles.
pub const TARGET_RESIDENCE_TIME: FieldSpec = field("target_residence_time", "Target residence time", Dimension::Duration, lab::DURATION, "Mean time the liquid should spend between the particles.");
/// Largest acceptable bed pressure drop.
pub const MAX_PRESSURE_DROP: FieldSpec = field("max_pressure_drop", "Largest bed pressure drop", Dimension::PressureDifference, lab::PRESSURE, "Pressure drop over the bed the sized design may not exceed.");

/// Every quantity field, in page order.
pub const FIELDS: &[FieldSpec] = &[
    selection::TEMPERATURE, TUBE_DIAMETER, BED_LENGTH, PARTICLE_DIAMETER, D10, D50, D90, SPHERICITY, VOIDAGE, PARTICLE_DENSITY, solids::PARTICLE_POROSITY, FLOW, crate::physics::practical::PUMP_MAX_FLOW, crate::physics::fluids::FIRST_VOLUME_FRACTION, DENSITY, VISCOSITY,
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
                (Some(a), Some(b), Some(g)) => {
                    let micro = crate::physics::units::unit_by_symbol(Dimension::Length, "µm").unwrap_or(Dimension::Length.default_unit());
                    let order = crate::physics::input::increasing(&[(&D10, a), (&D50, b), (&D90, g)], micro);
                    if order.is_empty() {
                        Some((a, Some([Length::from_si(a), Length::from_si(b), Length::from_si(g)])))
                    } else {
                        order.into_iter().for_each(|e| {
                            c.take::<()>(Err(e));
                        });
                        None
                    }
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
    /// Whether the bed length comes from the mass packed (it then changes with the voidage:
    /// [`PackedBedInput::bed_length_with`]).
    pub bed_length_from_mass: bool,
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
    /// The pump's largest flow.
    pub pump_max_flow: VolumetricFlow,
}

impl PackedBedInput {
    /// The particles as entered.
    pub fn particles(&self) -> Particles {
        Particles { particle_diameter: self.particle_diameter, distribution: self.distribution, shape: self.shape, voidage: self.voidage, solid: self.solid }
    }

    /// The bed length with voidage `eps`: the entered one, or from the mass packed when it is
    /// given that way (L = m / (ρ_p (1 − ε) π D_t²/4)).
    pub fn bed_length_with(&self, eps: f64) -> Length {
        if self.bed_length_from_mass {
            let area = crate::physics::pipe_flow::bore_area(self.tube_diameter);
            Length::from_si(self.solid_mass.si() / (self.particle_density.si() * (1.0 - eps) * area))
        } else {
            self.bed_length
        }
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
        let pump_max_flow = crate::physics::practical::read_pump_max_flow(src, &mut c);
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
            Some(mu), Some(bp), Some(rating), Some(mass), Some(role), Some(sizing), Some(ambient), Some(tubing), Some(pump),
        ) = (
            tube_diameter, bed_length, particles, flow, direction, density,
            viscosity, back_pressure, rating, solid_mass, role, sizing, ambient, tubing, pump_max_flow,
        )
        else {
            return Err(c.into_errors());
        };
        let Particles { particle_diameter, distribution, shape, voidage, solid } = particles;
        let input = Self {
            tube_diameter: Length::from_si(dt),
            bed_length: Length::from_si(l),
            bed_length_from_mass: length_from_mass,
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
            pump_max_flow: VolumetricFlow::from_si(pump),
        };
        let mut input = input;
        if length_from_mass {
            let eps = match input.voidage {
                VoidageSource::Entered(f) => f.si(),
                VoidageSource::Estimated => packing::estimated_voidage(input.shape, input.particle_diameter, input.tube_diameter).0.si(),
            };
            input.bed_length = input.bed_length_with(eps);
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

/// The pressure budget's verdict: the inlet pressure by the recommended correlation, and the
/// back-pressure plus the highest correlation's drop, against the rating (SI, gauge).
pub fn pressure_verdict(inlet: f64, back: f64, worst_dp: f64, rating: f64) -> Verdict {
    budget_verdict(inlet / rating, (back + worst_dp) / rating)
}

fn pressure_check(inlet: f64, dp: &Figure, back: f64, rating: f64, rating_part: &str, size_note: &str) -> Check {
    let ratio = inlet / rating;
    let (_, worst_dp) = dp.spread();
    let verdict = pressure_verdict(inlet, back, worst_dp, rating);
    let note = match verdict {
        Verdict::Problem => ": over the rating".to_owned(),
        Verdict::Caution if ratio > PRESSURE_MARGIN => ": less than 20 % margin (common practice, no source)".to_owned(),
        Verdict::Caution => format!(
            "; the highest correlation ({} bed drop) leaves less than 20 % margin (common practice, no source)",
            Dimension::PressureDifference.show(worst_dp, 3)
        ),
        Verdict::Fine => String::new(),
    };
    let caution = crate::physics::hazards::over_pressure_caution(verdict, crate::physics::hazards::LineContents::Cartridge);
    Check {
        key: "pressure_budget",
        topic: "Pressure budget",
        verdict,
        reason: format!(
            "Inlet pressure {} bar(g) (back-pressure + {} bed drop by Ergun{size_note}; correlations span {} to {}) is {:.0} % of the {} bar(g) limit of the {rating_part}, the lowest of pump, cartridge and fittings{note}. A fresh bed of fines, compaction and swelling raise it further.",
            bar(inlet),
            Dimension::PressureDifference.show(dp.value.get(), 3),
            Dimension::PressureDifference.show(dp.spread().0, 3),
            Dimension::PressureDifference.show(worst_dp, 3),
            ratio * 100.0,
            bar(rating),
        ),
        caution,
    }
}

/// The lifting verdict for an upward superficial velocity `u` (SI) and the minimum fluidisation
/// velocity by the recommended and the lowest correlation (`None`: particles not denser than the
/// liquid). Down-flow is fine; a bed held between frits is at most a caution.
pub fn lifting_verdict(direction: FlowDirection, u: f64, umf: Option<(f64, f64)>) -> Verdict {
    let lifted = match direction {
        FlowDirection::Down => return Verdict::Fine,
        FlowDirection::UpConfined => Verdict::Caution,
        FlowDirection::UpFree => Verdict::Problem,
    };
    match umf {
        None => lifted,
        Some((recommended, _)) if u > recommended => lifted,
        Some((_, lowest)) if u > lowest => Verdict::Caution,
        Some(_) => Verdict::Fine,
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
    let verdict = lifting_verdict(input.direction, u, Some((recommended, lowest)));
    let what = if u > recommended {
        "above the minimum fluidisation velocity (Wen–Yu)"
    } else if u > lowest {
        "below the Wen–Yu minimum fluidisation velocity but above the lowest correlation"
    } else {
        "below the minimum fluidisation velocity by every correlation"
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

/// Share of a full bed within which the mass packed and the bed agree (±5 %: weighing, voidage
/// and tapping differ by that much; common practice, no source).
pub const FILL_TOLERANCE: f64 = 0.05;

/// Whether the mass packed fills the entered bed: much less leaves an empty head (or filler),
/// much more does not fit at this voidage.
fn fill_check(mass: Mass, full: Mass, length: Length, voidage: Fraction) -> Check {
    let ratio = mass.si() / full.si();
    let g = |m: f64| format_significant(m * 1e3, 3);
    let mm = format_significant(length.mm(), 3);
    let eps = format_significant(voidage.si(), 3);
    let (verdict, reason) = if ratio < 1.0 - FILL_TOLERANCE {
        (
            Verdict::Caution,
            format!(
                "{} g packed fill {} % of the {} g that the {mm} mm bed holds at ε = {eps}: the solid occupies about {} mm, and the rest is empty volume or filler. Space velocity and capacity use the mass in the bed; the pressure drop and residence time are for a full {mm} mm bed. Enter the bed length from the mass, or fill the rest with an inert (glass beads, sand).",
                g(mass.si()),
                format_significant(ratio * 100.0, 3),
                g(full.si()),
                format_significant(length.mm() * ratio, 3)
            ),
        )
    } else if ratio > 1.0 + FILL_TOLERANCE {
        (
            Verdict::Caution,
            format!(
                "{} g packed is {} % of the {} g that the {mm} mm bed holds at ε = {eps}: it does not fit unless the bed is denser (lower voidage) or longer. Space velocity and capacity use the {} g that fit; check the voidage, or enter the bed length from the mass.",
                g(mass.si()),
                format_significant(ratio * 100.0, 3),
                g(full.si()),
                g(full.si())
            ),
        )
    } else {
        (Verdict::Fine, format!("{} g packed fill the {mm} mm bed at ε = {eps} (it holds {} g).", g(mass.si()), g(full.si())))
    };
    Check { key: "bed_fill", topic: "Mass packed and bed", verdict, reason, caution: None }
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

/// Topic of the sizing check.
const SIZING_TOPIC: &str = "Sizing for the target residence time";

fn sizing_figures_and_check(
    input: &PackedBedInput,
    target: &SizingTarget,
    bed: &BedFlow,
    voidage: Fraction,
    figures: &mut Vec<Figure>,
    advice: &mut AdviceList,
) -> Result<Check, NumericalError> {
    let key = "sizing";
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
    let sized = BedFlow { length, ..*bed };
    let dp = RECOMMENDED.pressure_drop(&sized).si();
    if !(length.si().is_finite() && dp.is_finite()) {
        // Found by the long run of map_cells_equal_point_evaluations_over_the_domain: a target
        // whose bed is beyond any number (nanometre bores and particles) failed the whole report,
        // the entered bed's own results with it. The target is said to be out of reach instead.
        return Ok(Check {
            key,
            topic: SIZING_TOPIC,
            verdict: Verdict::Caution,
            reason: format!(
                "For {} s between the particles this cartridge would need a bed whose length or pressure drop is beyond any number: no bed of these particles in this cartridge meets the target. Use a wider cartridge or coarser particles, or ask for less time.",
                format_significant(target.residence_time.si(), 3)
            ),
            caution: None,
        });
    }
    figures.push(Figure::definition("sized_bed_length", "Bed length for the target residence time", Dimension::Length, LENGTH_FOR_TIME_INFO, length.si())?);
    figures.push(Figure::single(
        "sized_bed_pressure_drop",
        "Pressure drop of that bed (these particles)",
        Dimension::PressureDifference,
        RECOMMENDED.info(),
        dp,
        RECOMMENDED.warnings(&sized),
    )?);
    let (l_low, l_high) = crate::physics::practical::CARTRIDGE_LENGTH;
    let fits = dp <= target.max_pressure_drop.si() && (l_low..=l_high).contains(&length.si());
    let mm = |l: f64| format_significant(l * 1e3, 3);
    let mut text = format!(
        "For {} s between the particles this cartridge needs a {} mm bed; with the entered particles its pressure drop is {} bar ({} the {} bar limit).",
        format_significant(target.residence_time.si(), 3),
        mm(length.si()),
        bar(dp),
        if dp <= target.max_pressure_drop.si() { "within" } else { "over" },
        bar(target.max_pressure_drop.si())
    );
    if length.si() > l_high {
        text.push_str(&format!(" That is longer than a lab cartridge ({} mm; common practice, no source).", mm(l_high)));
    } else if length.si() < l_low {
        text.push_str(&format!(" That is shorter than a lab cartridge ({} mm; common practice, no source).", mm(l_low)));
    }
    match advice::practical_cartridge(input, bed, target.residence_time.si(), target.max_pressure_drop.si()) {
        Ok((d, l, p)) => {
            figures.push(Figure::definition("narrowest_tube_diameter", "Narrowest lab cartridge ID for the target (these particles)", Dimension::Length, NARROWEST_TUBE_INFO, d)?);
            figures.push(Figure::definition("narrowest_tube_length", "Bed length in that cartridge", Dimension::Length, NARROWEST_TUBE_INFO, l)?);
            text.push_str(&format!(
                " With these particles the narrowest lab cartridge that meets the target is {} mm ID × {} mm ({} bar).",
                mm(d),
                mm(l),
                bar(p)
            ));
            if !fits {
                advice.add(key, AdviceKind::Remedy, format!(
                    "Use a cartridge of {} mm ID with a {} mm bed: {} s between the particles at {} bar, within the limit (lab range 2–50 mm ID, 10–300 mm; common practice, no source).",
                    mm(d),
                    mm(l),
                    format_significant(target.residence_time.si(), 3),
                    bar(p)
                ));
            }
        }
        Err(why) => {
            text.push_str(&format!(" No lab cartridge (2–50 mm ID, 10–300 mm of bed) meets the target with these particles: {why}."));
            advice.add(key, AdviceKind::NoneExists, format!("No lab cartridge meets the target with these particles: {why}."));
            advice.add(key, AdviceKind::Alternative, "Lower the flow, accept a shorter residence time, or use coarser particles; two cartridges in series share the length.");
        }
    }
    match problem.smallest_particle_diameter() {
        Ok(s) => match advice::finest_packing_note(s.particle_diameter.si()) {
            Some(note) => {
                text.push(' ');
                text.push_str(&note);
            }
            None => {
                let (_, sized_bed) = problem.bed(s.particle_diameter).ok_or(NumericalError::NotFinite { quantity: "sized bed" })?;
                figures.push(Figure::single(
                    "smallest_particle_diameter",
                    "Smallest particles within the pressure-drop limit",
                    Dimension::Length,
                    RECOMMENDED.info(),
                    s.particle_diameter.si(),
                    RECOMMENDED.warnings(&sized_bed),
                )?);
                text.push_str(&format!(
                    " Particles of {} µm or more keep this cartridge within the limit (bed {} mm, ε = {}; Ergun).",
                    format_significant(s.particle_diameter.si() * 1e6, 3),
                    mm(s.length.si()),
                    format_significant(s.voidage.si(), 3)
                ));
                if s.length.si() > l_high {
                    text.push_str(&format!(" That bed is longer than a lab cartridge ({} mm).", mm(l_high)));
                } else if s.particle_diameter.si() > input.particle_diameter.si() {
                    advice.add(key, AdviceKind::Remedy, format!(
                        "Use particles of {} µm or more in this cartridge (sieve off the fines): its {} mm bed then stays within the limit.",
                        format_significant(s.particle_diameter.si() * 1e6, 3),
                        mm(s.length.si())
                    ));
                }
            }
        },
        Err(RootError::NoBracket { f_low, .. }) if f_low < 0.0 => {
            text.push(' ');
            text.push_str(&advice::finest_packing_note(0.0).unwrap_or_default());
        }
        Err(RootError::NoBracket { .. }) => text.push_str(" No particle size keeps this cartridge within the limit at this flow."),
        Err(e) => text.push_str(&format!(" The smallest particle size could not be found ({e}).")),
    }
    Ok(Check { key, topic: SIZING_TOPIC, verdict: if fits { Verdict::Fine } else { Verdict::Caution }, reason: text, caution: None })
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
    let full_mass = geometry::packed_mass(v_bed, eps, input.particle_density);
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
        Figure::definition("packed_mass", "Mass a full bed holds", Dimension::Mass, geometry::PACKED_MASS_INFO, full_mass.si())?,
    ]);
    if let Some(f) = &umf {
        figures.push(f.clone());
    }
    // What is not in the bed does not work: space velocity and capacity use the mass in it.
    let in_bed = Mass::from_si(input.solid_mass.si().min(full_mass.si()));
    let whsv = capacity::weight_hourly_space_velocity(input.flow, input.density, in_bed);
    figures.push(Figure::definition("whsv", "Weight hourly space velocity", Dimension::Frequency, capacity::WHSV_INFO, whsv.si())?);
    if let BedRole::Reagent { loading, concentration, stoichiometry } = input.role {
        let n = capacity::active_amount(in_bed, loading);
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
    let mut advice = AdviceList::default();
    let pressure = pressure_check(inlet, &dp, input.back_pressure.si(), input.rating.si(), input.rating_part, &input.particles().size_note());
    if pressure.verdict != Verdict::Fine {
        advice::pressure(input, &bed, input.rating.si(), &mut advice, pressure.key);
    }
    let lifting = lifting_check(input, u_s, umf.as_ref());
    if lifting.verdict != Verdict::Fine {
        advice::lifting(input, umf.as_ref().map(|f| f.spread().0), &mut advice, lifting.key);
    }
    let mut checks = vec![
        pressure,
        lifting,
        crate::physics::practical::pump_flow_check(input.flow, input.pump_max_flow),
        wall_check(diameter_ratio, &bed),
        plug_flow_check(length_ratio),
        fill_check(input.solid_mass, full_mass, input.bed_length, eps),
    ];
    if let Some(tubing) = &input.tubing {
        checks.push(crate::physics::tubing::check(tubing, PressureDifference::from_si(inlet), &input.liquid.solvents()));
    }
    if let Some(target) = &input.sizing {
        checks.push(sizing_figures_and_check(input, target, &bed, eps, &mut figures, &mut advice)?);
    }
    checks.extend(input.liquid.checks(crate::physics::units::Pressure::from_gauge(input.back_pressure, input.ambient)));
    let lifting_flow = umf.as_ref().map(|f| f.value.get() * crate::physics::pipe_flow::bore_area(input.tube_diameter));
    let plots = vec![plots::pressure_drop_vs_flow(input, &bed, lifting_flow)?];
    Ok(Report { figures, checks, plots, advice: advice.into_vec(), diagrams: Vec::new() })
}
