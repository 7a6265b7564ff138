//! Slurry line: particles carried through an ordered list of tubing, coils, fittings, mixers,
//! valves, a back-pressure seat and frits. Per element: settling or carrying, deposition,
//! resuspension, clogging, pressure drop and the change that would fix it; then the line verdict.

pub mod clogging;
pub mod durand;
pub mod einstein;
pub mod element;
pub mod fuchs_thomas;
pub mod keys;
pub mod krieger_dougherty;
pub mod map;
pub mod oroskar_turian;
pub mod plots;
pub mod series;
pub mod shields;
pub mod size_distribution;
pub mod vertical;
pub mod viscosity;

use serde::Serialize;

use self::keys::MAX_ELEMENTS;
use self::size_distribution::ParticleSize;
use super::fluids::selection::{self, LiquidSelection};
use super::form::{ChoiceSpec, Collector, FieldSource};
use super::input::{Allowed, FieldSpec, InputError};
use super::settling::Particle;
use super::solids::{self, SolidSelection};
use super::units::{Density, Dimension, DynamicViscosity, Fraction, Length, PressureDifference, VolumetricFlow, format_significant};

pub use self::element::evaluate;

/// Name of the solids volume fraction in validity bounds.
pub const SOLIDS_FRACTION: &str = "solids volume fraction φ";
/// Name of the tube bore in validity bounds.
pub const TUBE_DIAMETER: &str = "tube inner diameter D";
/// Name of the pipe Reynolds number in validity bounds.
pub const PIPE_REYNOLDS: &str = "pipe Reynolds number Re = ρ U D / μ_s";
/// Pipe Reynolds number above which flow is taken as turbulent (common practice, no source).
pub const TURBULENT_REYNOLDS: f64 = 4000.0;

use super::input::{field, lab};

const OPEN_FRACTION: Allowed = Allowed { low: 0.0, low_inclusive: false, high: Some(1.0), high_inclusive: false, whole: false };

/// Total flow through the line.
pub const FLOW: FieldSpec = field("flow", "Total flow", Dimension::VolumetricFlow, lab::LIQUID_FLOW, "Slurry flow through the line (liquid plus solids).");
/// Liquid density.
pub const DENSITY: FieldSpec = field("density", "Liquid density", Dimension::Density, lab::LIQUID_DENSITY, "At the operating temperature.");
/// Liquid viscosity.
pub const VISCOSITY: FieldSpec = field("viscosity", "Liquid viscosity", Dimension::DynamicViscosity, lab::VISCOSITY, "Dynamic viscosity of the liquid alone at the operating temperature.");
/// Particle density.
pub const PARTICLE_DENSITY: FieldSpec = field("particle_density", "Particle density", Dimension::Density, lab::SOLID_DENSITY, "Skeletal density of a dense solid; for porous solids the liquid-filled density.");
/// One particle size.
pub const PARTICLE_SIZE: FieldSpec = field("particle_size", "Particle size", Dimension::Length, lab::PARTICLE_SIZE, "Volume-equivalent diameter when all particles are about one size.");
/// d₁₀ of the size distribution.
pub const D10: FieldSpec = field("d10", "d10", Dimension::Length, lab::PARTICLE_SIZE, "10 % of the solid volume is in smaller particles.");
/// d₅₀ of the size distribution.
pub const D50: FieldSpec = field("d50", "d50", Dimension::Length, lab::PARTICLE_SIZE, "Median size by volume.");
/// d₉₀ of the size distribution.
pub const D90: FieldSpec = field("d90", "d90", Dimension::Length, lab::PARTICLE_SIZE, "90 % of the solid volume is in smaller particles; agglomerates count.");
/// Sphericity.
pub const SPHERICITY: FieldSpec = field("sphericity", "Sphericity", Dimension::Number, Allowed::UNIT_FRACTION, "1 for spheres; crushed or crystalline solids about 0.6–0.8.");
/// Solids loading.
pub const LOADING: FieldSpec = field("loading", "Solids loading", Dimension::Fraction, OPEN_FRACTION, "Solids in the slurry, by mass or by volume as chosen.");
/// Back-pressure set point (gauge).
pub const BACK_PRESSURE: FieldSpec = field("back_pressure", "Back-pressure (gauge)", Dimension::PressureDifference, lab::BACK_PRESSURE, "Set point of the back-pressure regulator at the outlet, above atmosphere; 0 if none.");
/// Lowest component rating (gauge).
pub const RATING: FieldSpec = field("pressure_rating", "Lowest component rating (gauge)", Dimension::PressureDifference, lab::PRESSURE, "Lowest working-pressure rating among pump, tubing at temperature, fittings, valves and sensors.");
/// Element inner diameter (the per-element key replaces `inner_diameter` in errors).
pub const ELEMENT_INNER_DIAMETER: FieldSpec = field("inner_diameter", "Inner diameter", Dimension::Length, lab::BORE, "Bore of tubing; narrowest opening of a fitting, valve, mixer or seat; pore size of a frit.");
/// Element length.
pub const ELEMENT_LENGTH: FieldSpec = field("length", "Length", Dimension::Length, lab::TUBE_LENGTH, "Flow path length through the element.");

/// One size or a distribution.
pub const SIZE_MODE: ChoiceSpec = ChoiceSpec { key: "size_mode", label: "Particle size", options: &[("single", "One size"), ("distribution", "d10 / d50 / d90")] };
/// Single pass or a recirculation loop through a stirred reservoir.
pub const OPERATION: ChoiceSpec = ChoiceSpec {
    key: "operation",
    label: "Operation",
    options: &[("single_pass", "Single pass"), ("recirculation", "Recirculation loop (stirred reservoir)")],
};
/// Passes of the slurry through the line in a recirculation loop.
pub const PASSES: FieldSpec = field("passes", "Number of passes", Dimension::Number, lab::PASSES, "How many times the slurry goes round the loop; deposition adds up over the passes.");
/// Loading by mass or by volume.
pub const LOADING_BASIS: ChoiceSpec = ChoiceSpec { key: "loading_basis", label: "Loading basis", options: &[("mass", "wt %"), ("volume", "vol %")] };
/// Element kind.
pub const ELEMENT_KIND: ChoiceSpec = ChoiceSpec {
    key: "kind",
    label: "Element",
    options: &[
        ("tubing", "Tubing"),
        ("coil", "Coil"),
        ("fitting", "Fitting, union or tee"),
        ("mixer", "Mixer"),
        ("valve", "Valve"),
        ("bpr_seat", "Back-pressure regulator seat"),
        ("frit", "Frit or in-line filter"),
    ],
};
/// Element orientation.
pub const ELEMENT_ORIENTATION: ChoiceSpec = ChoiceSpec {
    key: "orientation",
    label: "Orientation",
    options: &[("horizontal", "Horizontal"), ("up", "Vertical, flow upwards"), ("down", "Vertical, flow downwards")],
};

/// What an element is.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum ElementKind {
    /// Straight tubing.
    Tubing,
    /// Coiled tubing (Dean secondary flow is not credited: conservative).
    Coil,
    /// Fitting, union or tee.
    Fitting,
    /// Static mixer or mixing tee.
    Mixer,
    /// Valve.
    Valve,
    /// Back-pressure regulator seat.
    BprSeat,
    /// Frit or in-line filter (the diameter is its pore size).
    Frit,
}

impl ElementKind {
    /// In the order of [`ELEMENT_KIND`]'s options.
    pub const ALL: [ElementKind; 7] = [
        ElementKind::Tubing,
        ElementKind::Coil,
        ElementKind::Fitting,
        ElementKind::Mixer,
        ElementKind::Valve,
        ElementKind::BprSeat,
        ElementKind::Frit,
    ];

    /// Lower-case name for messages.
    pub const fn word(self) -> &'static str {
        match self {
            ElementKind::Tubing => "tubing",
            ElementKind::Coil => "coil",
            ElementKind::Fitting => "fitting",
            ElementKind::Mixer => "mixer",
            ElementKind::Valve => "valve",
            ElementKind::BprSeat => "back-pressure regulator seat",
            ElementKind::Frit => "frit",
        }
    }
}

/// Direction of the flow in an element.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Orientation {
    /// Horizontal: particles fall across the bore.
    Horizontal,
    /// Vertical, flowing upwards: sinking particles lag the liquid.
    Up,
    /// Vertical, flowing downwards: sinking particles lead the liquid.
    Down,
}

impl Orientation {
    /// In the order of [`ELEMENT_ORIENTATION`]'s options.
    pub const ALL: [Orientation; 3] = [Orientation::Horizontal, Orientation::Up, Orientation::Down];
}

/// One element of the line.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct LineElement {
    /// What it is.
    pub kind: ElementKind,
    /// Bore, narrowest opening, or pore size of a frit.
    pub inner_diameter: Length,
    /// Flow path length.
    pub length: Length,
    /// Flow direction.
    pub orientation: Orientation,
}

/// How the solids loading is given.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "basis", content = "value", rename_all = "snake_case")]
pub enum Loading {
    /// Mass fraction of solids in the slurry.
    Mass(Fraction),
    /// Volume fraction of solids in the slurry.
    Volume(Fraction),
}

/// Validated inputs of the slurry line.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SlurryInput {
    /// The elements in flow order (1 to [`MAX_ELEMENTS`]).
    pub elements: Vec<LineElement>,
    /// Total flow.
    pub flow: VolumetricFlow,
    /// The liquid: a built-in solvent at a temperature, or entered properties.
    pub liquid: LiquidSelection,
    /// Liquid density at the working temperature (from `liquid`).
    pub density: Density,
    /// Liquid viscosity.
    pub viscosity: DynamicViscosity,
    /// The solid: from the solids table (with its internal porosity) or an entered density.
    pub solid: SolidSelection,
    /// Density of a particle as it settles: pores full of liquid (from `solid`; an entered
    /// density is taken as this).
    pub particle_density: Density,
    /// Particle size(s).
    pub size: ParticleSize,
    /// Sphericity, 0 < φ ≤ 1.
    pub sphericity: f64,
    /// Solids loading.
    pub loading: Loading,
    /// Back-pressure set point, gauge.
    pub back_pressure: PressureDifference,
    /// Atmospheric pressure the gauge pressures are measured against.
    pub ambient: crate::physics::units::Pressure,
    /// Lowest component rating, gauge.
    pub rating: PressureDifference,
    /// Passes through the line: 1 for a single pass, more in a recirculation loop.
    pub passes: u32,
    /// The line's tubing from the table, for its rating at temperature.
    pub tubing: Option<crate::physics::tubing::TubingChoice>,
    /// The pump's largest flow: no remedy asks for more.
    pub pump_max_flow: VolumetricFlow,
}

/// Field name used for errors about the list of elements as a whole.
pub const ELEMENTS_KEY: &str = "elements";

impl SlurryInput {
    /// Solids volume fraction φ (particles, pores included) from the loading: a mass fraction
    /// w of dry solid converts as φ = (w/ρ_env) / (w/ρ_env + (1 − w)/ρ), ρ_env the envelope
    /// density (the entered density, or the table's skeletal density times 1 − ε_p).
    pub fn volume_fraction(&self) -> f64 {
        match self.loading {
            Loading::Volume(f) => f.si(),
            Loading::Mass(f) => {
                let w = f.si();
                let vs = w / self.solid.envelope_density().si();
                vs / (vs + (1.0 - w) / self.density.si())
            }
        }
    }

    /// A particle of diameter `d` with the entered densities, viscosity and sphericity.
    pub fn particle(&self, d: Length) -> Particle {
        Particle { diameter: d, particle_density: self.particle_density, density: self.density, viscosity: self.viscosity, sphericity: self.sphericity }
    }

    /// Checks that need several fields: element count, d₁₀ < d₅₀ < d₉₀, a finite positive
    /// geometry, and a solids fraction below the maximum packing used for the viscosity. Every
    /// problem is reported at once. The struct can also be filled directly and passed here.
    pub fn validated(self) -> Result<Self, Vec<InputError>> {
        let mut errors = Vec::new();
        let n = self.elements.len();
        if n == 0 || n > MAX_ELEMENTS {
            errors.push(InputError {
                field: ELEMENTS_KEY,
                label: "Line elements",
                given: format!("{n} elements"),
                problem: format!("allowed: 1 to {MAX_ELEMENTS} elements"),
            });
        }
        for (i, e) in self.elements.iter().enumerate().take(MAX_ELEMENTS) {
            for (value, keys) in [(e.inner_diameter.si(), &keys::INNER_DIAMETER), (e.length.si(), &keys::LENGTH)] {
                if !(value.is_finite() && value > 0.0) {
                    errors.push(InputError { field: keys[i].key, label: keys[i].label, given: format!("{value} m"), problem: "allowed: > 0".to_owned() });
                }
            }
        }
        let positive = [
            (FLOW, self.flow.si()),
            (DENSITY, self.density.si()),
            (VISCOSITY, self.viscosity.si()),
            (PARTICLE_DENSITY, self.particle_density.si()),
            (RATING, self.rating.si()),
        ];
        for (spec, v) in positive {
            if !(v.is_finite() && v > 0.0) {
                errors.push(InputError { field: spec.key, label: spec.label, given: format!("{v} (SI)"), problem: "allowed: > 0".to_owned() });
            }
        }
        if !(self.back_pressure.si().is_finite() && self.back_pressure.si() >= 0.0) {
            errors.push(InputError { field: BACK_PRESSURE.key, label: BACK_PRESSURE.label, given: format!("{} Pa", self.back_pressure.si()), problem: "allowed: ≥ 0".to_owned() });
        }
        if self.passes == 0 {
            errors.push(InputError { field: PASSES.key, label: PASSES.label, given: "0".to_owned(), problem: "allowed: ≥ 1, whole number".to_owned() });
        }
        if !(self.sphericity > 0.0 && self.sphericity <= 1.0) {
            errors.push(InputError { field: SPHERICITY.key, label: SPHERICITY.label, given: format!("{}", self.sphericity), problem: "allowed: > 0 and ≤ 1".to_owned() });
        }
        let um = |l: Length| format_significant(l.si() * 1e6, 4);
        match self.size {
            ParticleSize::Single { diameter } => {
                if !(diameter.si().is_finite() && diameter.si() > 0.0) {
                    errors.push(InputError { field: PARTICLE_SIZE.key, label: PARTICLE_SIZE.label, given: format!("{} µm", um(diameter)), problem: "allowed: > 0".to_owned() });
                }
            }
            ParticleSize::Distribution { d10, d50, d90 } => {
                if [d10, d50, d90].iter().all(|d| d.si().is_finite() && d.si() > 0.0) {
                    let micro = super::units::unit_by_symbol(Dimension::Length, "µm").unwrap_or(Dimension::Length.default_unit());
                    errors.extend(super::input::increasing(&[(&D10, d10.si()), (&D50, d50.si()), (&D90, d90.si())], micro));
                } else {
                    errors.push(InputError {
                        field: D50.key,
                        label: D50.label,
                        given: format!("d10 {} µm, d50 {} µm, d90 {} µm", um(d10), um(d50), um(d90)),
                        problem: "allowed: 0 < d10 < d50 < d90".to_owned(),
                    });
                }
            }
        }
        let loading = match self.loading {
            Loading::Mass(f) | Loading::Volume(f) => f.si(),
        };
        if !(loading > 0.0 && loading < 1.0) {
            errors.push(InputError { field: LOADING.key, label: LOADING.label, given: format!("{}", loading), problem: "allowed: > 0 and < 1".to_owned() });
        } else if errors.is_empty() {
            let phi = self.volume_fraction();
            if phi >= krieger_dougherty::MAX_PACKING {
                errors.push(InputError {
                    field: LOADING.key,
                    label: LOADING.label,
                    given: format!("{} % ({} vol %)", format_significant(loading * 100.0, 3), format_significant(phi * 100.0, 3)),
                    problem: format!(
                        "at or above the maximum packing φ_max = {} used for the viscosity (Krieger–Dougherty): a paste, not a flowing slurry; allowed: below {} vol %",
                        krieger_dougherty::MAX_PACKING,
                        krieger_dougherty::MAX_PACKING * 100.0
                    ),
                });
            }
        }
        if errors.is_empty() { Ok(self) } else { Err(errors) }
    }

    /// Builds validated inputs from a source for the line-level fields and one source per element,
    /// reporting every bad field at once. Element errors carry per-element keys
    /// (`element_3_inner_diameter`).
    pub fn from_source(src: &dyn FieldSource, elements: &[&dyn FieldSource]) -> Result<Self, Vec<InputError>> {
        let mut c = Collector::default();
        if elements.is_empty() || elements.len() > MAX_ELEMENTS {
            c.take::<()>(Err(InputError {
                field: ELEMENTS_KEY,
                label: "Line elements",
                given: format!("{} elements", elements.len()),
                problem: format!("allowed: 1 to {MAX_ELEMENTS} elements"),
            }));
        }
        let mut line = Vec::with_capacity(elements.len());
        for (i, e) in elements.iter().enumerate().take(MAX_ELEMENTS) {
            let rename = |r: Result<f64, InputError>, k: &keys::ElementKey| r.map_err(|err| InputError { field: k.key, label: k.label, ..err });
            let rename_choice = |r: Result<usize, InputError>, k: &keys::ElementKey| r.map_err(|err| InputError { field: k.key, label: k.label, ..err });
            let kind = c.take(rename_choice(e.choice(&ELEMENT_KIND), &keys::KIND[i]));
            let orientation = c.take(rename_choice(e.choice(&ELEMENT_ORIENTATION), &keys::ORIENTATION[i]));
            let d = c.take(rename(e.quantity(&ELEMENT_INNER_DIAMETER), &keys::INNER_DIAMETER[i]));
            let l = c.take(rename(e.quantity(&ELEMENT_LENGTH), &keys::LENGTH[i]));
            if let (Some(k), Some(o), Some(d), Some(l)) = (kind, orientation, d, l)
                && let (Some(&kind), Some(&orientation)) = (ElementKind::ALL.get(k), Orientation::ALL.get(o))
            {
                line.push(LineElement { kind, inner_diameter: Length::from_si(d), length: Length::from_si(l), orientation });
            }
        }
        let flow = c.take(src.quantity(&FLOW));
        let pump_max_flow = super::practical::read_pump_max_flow(src, &mut c);
        let (liquid, density, viscosity) = selection::read_with_properties(src, &mut c, &DENSITY, &VISCOSITY);
        let solid = solids::read(src, &mut c, &PARTICLE_DENSITY);
        let size = match c.take(src.choice(&SIZE_MODE)) {
            Some(0) => c.take(src.quantity(&PARTICLE_SIZE)).map(|d| ParticleSize::Single { diameter: Length::from_si(d) }),
            Some(_) => {
                let d10 = c.take(src.quantity(&D10));
                let d50 = c.take(src.quantity(&D50));
                let d90 = c.take(src.quantity(&D90));
                match (d10, d50, d90) {
                    (Some(a), Some(b), Some(g)) => Some(ParticleSize::Distribution { d10: Length::from_si(a), d50: Length::from_si(b), d90: Length::from_si(g) }),
                    _ => None,
                }
            }
            None => None,
        };
        let sphericity = c.take(src.quantity(&SPHERICITY));
        let basis = c.take(src.choice(&LOADING_BASIS));
        let loading_value = c.take(src.quantity(&LOADING));
        let back_pressure = c.take(src.quantity(&BACK_PRESSURE));
        let ambient = crate::physics::ambient::read(src, &mut c);
        let rating = c.take(src.quantity(&RATING));
        let tubing = crate::physics::tubing::read(src, &mut c, &selection::TEMPERATURE);
        let passes = match c.take(src.choice(&OPERATION)) {
            // Validated as a whole number ≥ 1; saturates only beyond u32::MAX.
            Some(1) => c.take(src.quantity(&PASSES)).map(|n| n.min(f64::from(u32::MAX)) as u32),
            Some(_) => Some(1),
            None => None,
        };
        let errors = c.into_errors();
        let (Some(flow), Some(rho), Some(mu), Some(solid), Some(size), Some(phi), Some(basis), Some(w), Some(bp), Some(rating), Some(passes), Some(tubing), Some(ambient), Some(pump), true) =
            (flow, density, viscosity, solid, size, sphericity, basis, loading_value, back_pressure, rating, passes, tubing, ambient, pump_max_flow, errors.is_empty())
        else {
            return Err(errors);
        };
        Self {
            elements: line,
            flow: VolumetricFlow::from_si(flow),
            liquid: liquid.unwrap_or(LiquidSelection::Custom { density: Density::from_si(rho), viscosity: DynamicViscosity::from_si(mu) }),
            density: Density::from_si(rho),
            viscosity: DynamicViscosity::from_si(mu),
            solid,
            particle_density: solid.wet_density(Density::from_si(rho)),
            size,
            sphericity: phi,
            loading: if basis == 0 { Loading::Mass(Fraction::from_si(w)) } else { Loading::Volume(Fraction::from_si(w)) },
            back_pressure: PressureDifference::from_si(bp),
            ambient,
            rating: PressureDifference::from_si(rating),
            passes,
            tubing,
            pump_max_flow: VolumetricFlow::from_si(pump),
        }
        .validated()
    }
}
