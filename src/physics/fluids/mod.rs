//! Liquid properties the calculators consume: built-in solvents with compact temperature models,
//! user-entered custom liquids, and binary mixtures by volume fraction. SI inside.

pub mod mixtures;
pub mod models;
pub mod selection;
pub mod solvent_data;
pub mod solvents;

pub use mixtures::{BinaryMixture, FIRST_VOLUME_FRACTION, MixtureCaution, MixtureProperties};
pub use solvents::{Property, Solvent};

use serde::Serialize;

use crate::physics::input::{Allowed, FieldSpec, InputError, lab};
use crate::physics::report::RangeWarning;
use crate::physics::units::{Density, Dimension, DynamicViscosity, Pressure, SurfaceTension, Unit};

/// A value with the warnings raised while computing it (temperature outside a fitted range).
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Evaluated<Q> {
    /// The value.
    pub value: Q,
    /// Inputs outside the fitted range of a model used; empty when all were inside.
    pub warnings: Vec<RangeWarning>,
}

/// A property model gave no physical value (far outside its range); reported instead of a number.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct PropertyError {
    /// The property, e.g. "viscosity".
    pub quantity: &'static str,
    /// The liquid.
    pub fluid: &'static str,
    /// The temperature asked for, K.
    pub temperature_k: f64,
    /// The temperatures the model was fitted over, K, if known.
    pub fitted_k: Option<(f64, f64)>,
}

impl std::fmt::Display for PropertyError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        let c = |k: f64| crate::physics::units::format_significant(k - 273.15, 3);
        write!(f, "The {} model of {} gives no physical value at {} °C", self.quantity, self.fluid, c(self.temperature_k))?;
        match self.fitted_k {
            Some((low, high)) => write!(f, "; it covers {} to {} °C. Change the temperature, or enter the liquid's own properties.", c(low), c(high)),
            None => f.write_str(". Change the temperature, or enter the liquid's own properties."),
        }
    }
}

impl std::error::Error for PropertyError {}

/// Properties of a liquid at one temperature: what a calculator needs.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Liquid {
    /// Mass density.
    pub density: Density,
    /// Dynamic viscosity.
    pub viscosity: DynamicViscosity,
    /// Surface tension against air or its own vapour.
    pub surface_tension: SurfaceTension,
    /// Vapour pressure, if known (a custom liquid may leave it out).
    pub vapour_pressure: Option<Pressure>,
}

/// Whether a liquid boils at a given absolute pressure, with the two pressures compared.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct BoilingCheck {
    /// Vapour pressure of the liquid at its temperature.
    pub vapour_pressure: Pressure,
    /// Absolute pressure the liquid is held at.
    pub pressure: Pressure,
    /// True when the vapour pressure reaches the pressure: the liquid boils (or flashes).
    pub boils: bool,
}

impl BoilingCheck {
    /// Compares a vapour pressure with the absolute pressure on the liquid (boils if p_sat ≥ p).
    pub fn new(vapour_pressure: Pressure, pressure: Pressure) -> Self {
        Self { vapour_pressure, pressure, boils: vapour_pressure.pascals() >= pressure.pascals() }
    }
}

const fn positive_field(key: &'static str, label: &'static str, dimension: Dimension, allowed: Allowed, help: &'static str) -> FieldSpec {
    FieldSpec { key, label, dimension, allowed, help }
}

/// Field of a custom liquid's density.
pub const CUSTOM_DENSITY: FieldSpec =
    positive_field("liquid_density", "Liquid density", Dimension::Density, lab::LIQUID_DENSITY, "density at the working temperature");
/// Field of a custom liquid's viscosity.
pub const CUSTOM_VISCOSITY: FieldSpec = positive_field(
    "liquid_viscosity",
    "Liquid viscosity",
    Dimension::DynamicViscosity,
    lab::VISCOSITY,
    "dynamic viscosity at the working temperature",
);
/// Field of a custom liquid's surface tension.
pub const CUSTOM_SURFACE_TENSION: FieldSpec = positive_field(
    "liquid_surface_tension",
    "Liquid surface tension",
    Dimension::SurfaceTension,
    lab::SURFACE_TENSION,
    "surface tension against air at the working temperature",
);
/// Field of a custom liquid's vapour pressure (optional; zero allowed for involatile liquids).
pub const CUSTOM_VAPOUR_PRESSURE: FieldSpec = FieldSpec {
    key: "liquid_vapour_pressure",
    label: "Liquid vapour pressure",
    dimension: Dimension::Pressure,
    allowed: Allowed::non_negative_up_to(1e8),
    help: "vapour pressure at the working temperature; leave empty if unknown",
};

fn si_unit(dimension: Dimension) -> Unit {
    Unit { symbol: dimension.si_symbol(), factor: 1.0, offset: 0.0 }
}

impl Liquid {
    /// A liquid with user-entered properties, valid at the one temperature they were entered for
    /// (no temperature model). Rejects non-positive or non-finite values, naming the field.
    pub fn custom(
        density: Density,
        viscosity: DynamicViscosity,
        surface_tension: SurfaceTension,
        vapour_pressure: Option<Pressure>,
    ) -> Result<Self, InputError> {
        let check = |spec: &FieldSpec, si: f64| spec.accept(si, si_unit(spec.dimension));
        Ok(Self {
            density: Density::from_si(check(&CUSTOM_DENSITY, density.si())?),
            viscosity: DynamicViscosity::from_si(check(&CUSTOM_VISCOSITY, viscosity.si())?),
            surface_tension: SurfaceTension::from_si(check(&CUSTOM_SURFACE_TENSION, surface_tension.si())?),
            vapour_pressure: match vapour_pressure {
                Some(p) => Some(Pressure::from_si(check(&CUSTOM_VAPOUR_PRESSURE, p.si())?)),
                None => None,
            },
        })
    }

    /// Whether this liquid boils at absolute `pressure`; `None` if its vapour pressure is unknown.
    pub fn boiling_check(&self, pressure: Pressure) -> Option<BoilingCheck> {
        self.vapour_pressure.map(|p_sat| BoilingCheck::new(p_sat, pressure))
    }
}
