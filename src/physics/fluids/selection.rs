//! Choosing a calculator's liquid: a built-in solvent at the working temperature (properties
//! from the fitted models, with range warnings and a boiling check), or entered properties.

use serde::Serialize;

use super::mixtures::{DENSITY_RULE, FIRST_VOLUME_FRACTION, SURFACE_TENSION_RULE, VAPOUR_PRESSURE_RULE, VISCOSITY_RULE};
use super::{BinaryMixture, PropertyError, Property, Solvent};
use crate::physics::form::{ChoiceSpec, Collector, FieldSource};
use crate::physics::input::{FieldSpec, InputError};
use crate::physics::report::{Check, Figure, ModelInfo, NumericalError, RangeWarning, Verdict};
use crate::physics::units::{Density, Dimension, DynamicViscosity, Fraction, Pressure, Temperature, format_significant};

/// The built-in solvents, in the order of [`Solvent::ALL`], then "mixture" and "custom".
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
    ("dioxane", "1,4-Dioxane"),
    ("dmac", "DMAc (N,N-dimethylacetamide)"),
    ("mtbe", "MTBE"),
    ("cpme", "CPME (cyclopentyl methyl ether)"),
    ("tert_butanol", "tert-Butanol (melts at 25 °C)"),
    ("acetic_acid", "Acetic acid (melts at 17 °C)"),
    ("mixture", "Mixture of two of these solvents"),
    ("custom", "Other liquid (enter its properties)"),
];

/// Index of the "mixture" option of [`LIQUID`].
const MIXTURE_OPTION: usize = Solvent::ALL.len();

/// The built-in solvents alone, for the components of a mixture.
const SOLVENT_OPTIONS: &[(&str, &str)] = LIQUID_OPTIONS.split_at(MIXTURE_OPTION).0;

const fn without_mixture() -> [(&'static str, &'static str); MIXTURE_OPTION + 1] {
    let mut out = [("", ""); MIXTURE_OPTION + 1];
    let mut i = 0;
    while i < MIXTURE_OPTION {
        out[i] = LIQUID_OPTIONS[i];
        i += 1;
    }
    out[MIXTURE_OPTION] = LIQUID_OPTIONS[MIXTURE_OPTION + 1];
    out
}

const SINGLE_LIQUID_ARRAY: [(&str, &str); MIXTURE_OPTION + 1] = without_mixture();

/// The built-in solvents and "custom", without mixtures: for calculators that need per-solvent
/// gas data a mixture does not have.
pub const SINGLE_LIQUID_OPTIONS: &[(&str, &str)] = &SINGLE_LIQUID_ARRAY;

/// First solvent of a mixture.
pub const MIXTURE_FIRST: ChoiceSpec = ChoiceSpec { key: "mixture_first", label: "First solvent of the mixture", options: SOLVENT_OPTIONS };

/// Second solvent of a mixture.
pub const MIXTURE_SECOND: ChoiceSpec = ChoiceSpec { key: "mixture_second", label: "Second solvent of the mixture", options: SOLVENT_OPTIONS };

/// The liquid choice.
pub const LIQUID: ChoiceSpec = ChoiceSpec { key: "liquid", label: "Liquid", options: LIQUID_OPTIONS };

/// Working temperature of a built-in solvent.
pub const TEMPERATURE: FieldSpec = FieldSpec {
    key: "temperature",
    label: "Temperature",
    dimension: Dimension::Temperature,
    allowed: crate::physics::input::lab::TEMPERATURE,
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
    /// Two built-in solvents mixed by volume, at a temperature (ideal mixing rules).
    Mixture {
        /// The mixture.
        mixture: BinaryMixture,
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
        MIXTURE_OPTION => {
            let first = c.take(src.choice(&MIXTURE_FIRST));
            let second = c.take(src.choice(&MIXTURE_SECOND));
            let phi = c.take(src.quantity(&FIRST_VOLUME_FRACTION));
            let t = c.take(src.quantity(&TEMPERATURE));
            let (first, second, phi, t) = (first?, second?, phi?, t?);
            let mixture = c.take(BinaryMixture::new(*Solvent::ALL.get(first)?, *Solvent::ALL.get(second)?, Fraction::from_si(phi)))?;
            Some(LiquidSelection::Mixture { mixture, temperature: Temperature::from_kelvin(t) })
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

/// Within this many kelvin above the melting point a cold spot (an unheated fitting, a pump head,
/// a winter lab) can freeze the line (common practice, no source).
pub const FREEZING_MARGIN_K: f64 = 5.0;

/// The freezing check of a built-in solvent at `t`: a problem at or below its melting point, a
/// caution within [`FREEZING_MARGIN_K`] above it, `None` further above (most solvents, always).
pub fn freezing_check(solvent: Solvent, t: Temperature) -> Option<Check> {
    let melt = solvent.melting_point();
    let above = t.kelvin() - melt.kelvin();
    if above > FREEZING_MARGIN_K {
        return None;
    }
    let frozen = solvent.freezes_at(t);
    Some(Check {
        key: "freezing",
        topic: "Solvent freezing",
        verdict: if frozen { Verdict::Problem } else { Verdict::Caution },
        reason: format!(
            "{} melts at {} °C (chemicals 1.5.2); at {} °C it is {}. Its property fits start above the melting point.",
            capitalised(solvent.name()),
            format_significant(melt.celsius(), 3),
            format_significant(t.celsius(), 3),
            if frozen {
                "solid and blocks the line"
            } else {
                "liquid, but within 5 K of freezing: a cold fitting, pump head or tubing run can freeze it (margin: common practice, no source)"
            }
        ),
        caution: Some(
            "A solvent that freezes in a pressurised line blocks it: pressure builds behind the plug and can burst tubing or \
             fittings. Keep the whole line, pump and reservoir above the melting point, or add a co-solvent, and fit a pump \
             pressure limit."
                .to_owned(),
        ),
    })
}

/// `name` with its first letter in upper case, to open a sentence.
pub fn capitalised(name: &str) -> String {
    let mut chars = name.chars();
    chars.next().map(|c| c.to_uppercase().chain(chars).collect()).unwrap_or_default()
}

const ENTERED_DENSITY: ModelInfo = ModelInfo { name: "Entered", formula: "ρ as entered", source: "user input", validity: &[] };
const ENTERED_VISCOSITY: ModelInfo = ModelInfo { name: "Entered", formula: "μ as entered", source: "user input", validity: &[] };

fn not_finite(e: PropertyError) -> NumericalError {
    NumericalError::NotFinite { quantity: e.quantity }
}

impl LiquidSelection {
    /// Density and viscosity at the working temperature, with any range warnings; an error when any
    /// of the liquid's four properties has no physical value there.
    pub fn properties(&self) -> Result<(Density, DynamicViscosity, Vec<RangeWarning>), PropertyError> {
        match *self {
            LiquidSelection::Solvent { solvent, temperature } => {
                let rho = solvent.density(temperature)?;
                let mu = solvent.viscosity(temperature)?;
                // The report shows all four properties: one the models cannot give (surface tension
                // vanishing near the critical point) is refused here, at the temperature, as for a
                // mixture, not later as a failed figure.
                solvent.surface_tension(temperature)?;
                solvent.vapour_pressure(temperature)?;
                let mut warnings = rho.warnings;
                warnings.extend(mu.warnings);
                Ok((rho.value, mu.value, warnings))
            }
            LiquidSelection::Mixture { mixture, temperature } => {
                let m = mixture.properties(temperature)?;
                Ok((m.liquid.density, m.liquid.viscosity, m.warnings))
            }
            LiquidSelection::Custom { density, viscosity } => Ok((density, viscosity, Vec::new())),
        }
    }

    /// The built-in solvents in the liquid (for compatibility flags): one, two for a mixture,
    /// none for an entered liquid.
    pub fn solvents(&self) -> Vec<Solvent> {
        match *self {
            LiquidSelection::Solvent { solvent, .. } => vec![solvent],
            LiquidSelection::Mixture { mixture, .. } => vec![mixture.first(), mixture.second()],
            LiquidSelection::Custom { .. } => Vec::new(),
        }
    }

    /// The checks on the liquid itself at the outlet's absolute pressure: boiling (solvents and
    /// mixtures), freezing (a solvent near or below its melting point) and, for a mixture, its
    /// mixing rules.
    pub fn checks(&self, outlet: Pressure) -> Vec<Check> {
        let freezing = match *self {
            LiquidSelection::Solvent { solvent, temperature } => freezing_check(solvent, temperature),
            _ => None,
        };
        self.boiling_check(outlet).into_iter().chain(freezing).chain(self.mixture_check()).collect()
    }

    /// For a mixture, the check that names its mixing rules and any reason they may be far off
    /// (pairs not fully miscible, water with polar organics); `None` for a single liquid.
    pub fn mixture_check(&self) -> Option<Check> {
        let LiquidSelection::Mixture { mixture, .. } = *self else { return None };
        let cautions = mixture.cautions();
        let mut reason = format!(
            "{} % {} (by volume, before mixing) in {}: density by volume-fraction average, viscosity by log-mixing, \
             surface tension and vapour pressure (Raoult) by mole fraction — ideal rules.",
            format_significant(mixture.first_volume_fraction().si() * 100.0, 3),
            mixture.first().name(),
            mixture.second().name()
        );
        for c in &cautions {
            reason.push(' ');
            reason.push_str(&c.message());
        }
        Some(Check {
            key: "liquid_mixture",
            topic: "Liquid mixture",
            verdict: if cautions.is_empty() { Verdict::Fine } else { Verdict::Caution },
            reason,
            caution: None,
        })
    }

    /// The density and viscosity used, as figures naming their model and source; a built-in
    /// solvent's figures carry the warnings of a temperature outside the fitted range.
    pub fn figures(&self) -> Result<Vec<Figure>, NumericalError> {
        match *self {
            LiquidSelection::Solvent { solvent, temperature } => {
                let rho = solvent.density(temperature).map_err(not_finite)?;
                let mu = solvent.viscosity(temperature).map_err(not_finite)?;
                let sigma = solvent.surface_tension(temperature).map_err(not_finite)?;
                let p_sat = solvent.vapour_pressure(temperature).map_err(not_finite)?;
                Ok(vec![
                    Figure::single("liquid_density", "Liquid density (at the temperature)", Dimension::Density, *solvent.info(Property::Density), rho.value.si(), rho.warnings)?,
                    Figure::single("liquid_viscosity", "Liquid viscosity (at the temperature)", Dimension::DynamicViscosity, *solvent.info(Property::Viscosity), mu.value.si(), mu.warnings)?,
                    Figure::single("liquid_surface_tension", "Liquid surface tension (at the temperature)", Dimension::SurfaceTension, *solvent.info(Property::SurfaceTension), sigma.value.si(), sigma.warnings)?,
                    Figure::single("liquid_vapour_pressure", "Vapour pressure (at the temperature)", Dimension::Pressure, *solvent.info(Property::VapourPressure), p_sat.value.pascals(), p_sat.warnings)?,
                ])
            }
            LiquidSelection::Mixture { mixture, temperature } => {
                let m = mixture.properties(temperature).map_err(not_finite)?;
                let mut out = vec![
                    Figure::single("liquid_density", "Mixture density (at the temperature)", Dimension::Density, DENSITY_RULE, m.liquid.density.si(), m.warnings.clone())?,
                    Figure::single("liquid_viscosity", "Mixture viscosity (at the temperature)", Dimension::DynamicViscosity, VISCOSITY_RULE, m.liquid.viscosity.si(), m.warnings.clone())?,
                    Figure::single("liquid_surface_tension", "Mixture surface tension (at the temperature)", Dimension::SurfaceTension, SURFACE_TENSION_RULE, m.liquid.surface_tension.si(), m.warnings.clone())?,
                ];
                if let Some(p) = m.liquid.vapour_pressure {
                    out.push(Figure::single("liquid_vapour_pressure", "Mixture vapour pressure (at the temperature)", Dimension::Pressure, VAPOUR_PRESSURE_RULE, p.pascals(), m.warnings)?);
                }
                Ok(out)
            }
            LiquidSelection::Custom { density, viscosity } => Ok(vec![
                Figure::single("liquid_density", "Liquid density (entered)", Dimension::Density, ENTERED_DENSITY, density.si(), Vec::new())?,
                Figure::single("liquid_viscosity", "Liquid viscosity (entered)", Dimension::DynamicViscosity, ENTERED_VISCOSITY, viscosity.si(), Vec::new())?,
            ]),
        }
    }

    /// Whether a built-in solvent or a mixture of two boils at the lowest absolute pressure in
    /// the line (at the outlet); `None` for an entered liquid, whose vapour pressure is unknown.
    pub fn boiling_check(&self, outlet: Pressure) -> Option<Check> {
        let (what, model, temperature, vapour) = match *self {
            LiquidSelection::Solvent { solvent, temperature } => {
                (capitalised(solvent.name()), "Antoine fit", temperature, solvent.vapour_pressure(temperature).map(|p| p.value))
            }
            LiquidSelection::Mixture { mixture, temperature } => (
                format!("The {}–{} mixture", mixture.first().name(), mixture.second().name()),
                "Raoult's law on the Antoine fits; real mixtures of unlike liquids boil earlier",
                temperature,
                mixture.properties(temperature).map(|m| m.liquid.vapour_pressure.unwrap_or(Pressure::from_si(f64::INFINITY))),
            ),
            LiquidSelection::Custom { .. } => return None,
        };
        Some(match vapour {
            Ok(p_sat) => crate::physics::hazards::boiling_check(
                &format!("{what} at {} °C", format_significant(temperature.celsius(), 3)),
                model,
                p_sat,
                outlet,
                "at the outlet",
            ),
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
