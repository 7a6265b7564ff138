//! Choosing a calculator's liquid: a built-in solvent at the working temperature (properties
//! from the fitted models, with range warnings and a boiling check), or entered properties.

use serde::Serialize;

use super::{PropertyError, Property, Solvent};
use crate::physics::form::{ChoiceSpec, Collector, FieldSource};
use crate::physics::input::{Allowed, FieldSpec, InputError};
use crate::physics::report::{Check, Figure, ModelInfo, NumericalError, RangeWarning, Verdict};
use crate::physics::units::{Density, Dimension, DynamicViscosity, Pressure, Temperature, format_significant};

/// The built-in solvents, in the order of [`Solvent::ALL`], then "custom".
pub const LIQUID_OPTIONS: &[(&str, &str)] = &[
    ("water", "Water"),
    ("methanol", "Methanol"),
    ("ethanol", "Ethanol"),
    ("two_propanol", "2-Propanol"),
    ("acetonitrile", "Acetonitrile"),
    ("acetone", "Acetone"),
    ("thf", "THF"),
    ("me_thf", "2-MeTHF"),
    ("ethyl_acetate", "Ethyl acetate"),
    ("toluene", "Toluene"),
    ("heptane", "n-Heptane"),
    ("dichloromethane", "Dichloromethane"),
    ("dmf", "DMF"),
    ("dmso", "DMSO"),
    ("nmp", "NMP"),
    ("custom", "Other liquid (enter its properties)"),
];

/// The liquid choice.
pub const LIQUID: ChoiceSpec = ChoiceSpec { key: "liquid", label: "Liquid", options: LIQUID_OPTIONS };

/// Working temperature of a built-in solvent.
pub const TEMPERATURE: FieldSpec = FieldSpec {
    key: "temperature",
    label: "Temperature",
    dimension: Dimension::Temperature,
    allowed: Allowed::POSITIVE,
    help: "Temperature of the liquid in the line; the solvent's properties are taken at it.",
};

/// The liquid of a calculator.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum LiquidSelection {
    /// A built-in solvent at a temperature.
    Solvent {
        /// The solvent.
        solvent: Solvent,
        /// Its temperature.
        temperature: Temperature,
    },
    /// Entered properties.
    Custom {
        /// Density.
        density: Density,
        /// Viscosity.
        viscosity: DynamicViscosity,
    },
}

/// Reads the liquid choice and what it needs: the temperature for a solvent, or the entered
/// density and viscosity (fields `density` and `viscosity` of the calling calculator).
pub fn read(src: &dyn FieldSource, c: &mut Collector, density: &FieldSpec, viscosity: &FieldSpec) -> Option<LiquidSelection> {
    match c.take(src.choice(&LIQUID))? {
        i if i < Solvent::ALL.len() => {
            let t = c.take(src.quantity(&TEMPERATURE))?;
            Some(LiquidSelection::Solvent { solvent: Solvent::ALL[i], temperature: Temperature::from_kelvin(t) })
        }
        _ => {
            let rho = c.take(src.quantity(density));
            let mu = c.take(src.quantity(viscosity));
            Some(LiquidSelection::Custom { density: Density::from_si(rho?), viscosity: DynamicViscosity::from_si(mu?) })
        }
    }
}

/// As [`read`], and also the density and viscosity (SI) at the working temperature; a solvent
/// asked for far outside its models becomes an input error on the temperature field.
pub fn read_with_properties(
    src: &dyn FieldSource,
    c: &mut Collector,
    density: &FieldSpec,
    viscosity: &FieldSpec,
) -> (Option<LiquidSelection>, Option<f64>, Option<f64>) {
    let liquid = read(src, c, density, viscosity);
    let properties = match liquid.map(|l| l.properties()) {
        Some(Ok(p)) => Some(p),
        Some(Err(e)) => {
            c.take::<()>(Err(InputError {
                field: TEMPERATURE.key,
                label: TEMPERATURE.label,
                given: format!("{} K", format_significant(e.temperature_k, 4)),
                problem: e.to_string(),
            }));
            None
        }
        None => None,
    };
    (liquid, properties.as_ref().map(|p| p.0.si()), properties.as_ref().map(|p| p.1.si()))
}

/// `name` with its first letter in upper case, to open a sentence.
fn capitalised(name: &str) -> String {
    let mut chars = name.chars();
    chars.next().map(|c| c.to_uppercase().chain(chars).collect()).unwrap_or_default()
}

const ENTERED_DENSITY: ModelInfo = ModelInfo { name: "Entered", formula: "ρ as entered", source: "user input", validity: &[] };
const ENTERED_VISCOSITY: ModelInfo = ModelInfo { name: "Entered", formula: "μ as entered", source: "user input", validity: &[] };

fn not_finite(e: PropertyError) -> NumericalError {
    NumericalError::NotFinite { quantity: e.quantity }
}

impl LiquidSelection {
    /// Density and viscosity at the working temperature, with any range warnings.
    pub fn properties(&self) -> Result<(Density, DynamicViscosity, Vec<RangeWarning>), PropertyError> {
        match *self {
            LiquidSelection::Solvent { solvent, temperature } => {
                let rho = solvent.density(temperature)?;
                let mu = solvent.viscosity(temperature)?;
                let mut warnings = rho.warnings;
                warnings.extend(mu.warnings);
                Ok((rho.value, mu.value, warnings))
            }
            LiquidSelection::Custom { density, viscosity } => Ok((density, viscosity, Vec::new())),
        }
    }

    /// The density and viscosity used, as figures naming their model and source; a built-in
    /// solvent's figures carry the warnings of a temperature outside the fitted range.
    pub fn figures(&self) -> Result<Vec<Figure>, NumericalError> {
        match *self {
            LiquidSelection::Solvent { solvent, temperature } => {
                let rho = solvent.density(temperature).map_err(not_finite)?;
                let mu = solvent.viscosity(temperature).map_err(not_finite)?;
                Ok(vec![
                    Figure::single("liquid_density", "Liquid density (at the temperature)", Dimension::Density, *solvent.info(Property::Density), rho.value.si(), rho.warnings)?,
                    Figure::single("liquid_viscosity", "Liquid viscosity (at the temperature)", Dimension::DynamicViscosity, *solvent.info(Property::Viscosity), mu.value.si(), mu.warnings)?,
                ])
            }
            LiquidSelection::Custom { density, viscosity } => Ok(vec![
                Figure::single("liquid_density", "Liquid density (entered)", Dimension::Density, ENTERED_DENSITY, density.si(), Vec::new())?,
                Figure::single("liquid_viscosity", "Liquid viscosity (entered)", Dimension::DynamicViscosity, ENTERED_VISCOSITY, viscosity.si(), Vec::new())?,
            ]),
        }
    }

    /// Whether a built-in solvent boils at the lowest absolute pressure in the line (at the
    /// outlet); `None` for an entered liquid, whose vapour pressure is unknown.
    pub fn boiling_check(&self, outlet: Pressure) -> Option<Check> {
        let LiquidSelection::Solvent { solvent, temperature } = *self else { return None };
        let bar = |p: f64| format_significant(p / 1e5, 3);
        Some(match solvent.boiling_check(temperature, outlet) {
            Ok(b) => {
                let boils = b.value.boils;
                Check {
                    key: "boiling",
                    topic: "Solvent boiling",
                    verdict: if boils { Verdict::Problem } else { Verdict::Fine },
                    reason: format!(
                        "{} at {} °C has a vapour pressure of {} bar(a) (Antoine fit) against {} bar(a) at the outlet: it {}.",
                        capitalised(solvent.name()),
                        format_significant(temperature.celsius(), 3),
                        bar(b.value.vapour_pressure.pascals()),
                        bar(outlet.pascals()),
                        if boils { "boils" } else { "stays liquid" }
                    ),
                    caution: boils.then(|| {
                        "A solvent above its boiling point flashes to vapour where the pressure drops: bubbles, \
                         erratic flow and, in a closed line, pressure surges; hot vapour from a leak is a burn and \
                         fire hazard. Raise the back-pressure or lower the temperature, and follow local codes and \
                         institutional rules."
                            .to_owned()
                    }),
                }
            }
            Err(e) => Check {
                key: "boiling",
                topic: "Solvent boiling",
                verdict: Verdict::Caution,
                reason: format!("Boiling not checked: {e}."),
                caution: None,
            },
        })
    }
}
