//! Binary mixtures of built-in solvents by volume fraction, with simple ideal mixing rules. They
//! are approximations: real mixtures (above all water with alcohols and other polar organics)
//! deviate strongly, and the cautions say so.
//!
//! Rules, with x the mole fraction and φ the volume fraction of the pure liquids before mixing:
//! - density: ρ = φ₁ρ₁ + φ₂ρ₂ (no volume change on mixing; definition of ideal mixing);
//! - viscosity: ln μ = x₁ ln μ₁ + x₂ ln μ₂ (Arrhenius log-mixing, i.e. the Grunberg–Nissan
//!   equation without its interaction term; L. Grunberg & A. H. Nissan, Nature 164 (1949) 799,
//!   citation from memory);
//! - surface tension: σ = x₁σ₁ + x₂σ₂ (ideal; overestimates when the σ differ, because the
//!   surface enriches in the lower-σ component; common practice, no source);
//! - vapour pressure: p = x₁p₁ + x₂p₂ (Raoult's law bubble pressure of an ideal solution).
//!
//! ```
//! use clearbore::physics::fluids::{BinaryMixture, Solvent};
//! use clearbore::physics::units::{Fraction, Temperature};
//! // 30 % THF in toluene by volume at 25 °C: density between the two pure liquids.
//! let mix = BinaryMixture::new(Solvent::Thf, Solvent::Toluene, Fraction::from_percent(30.0)).unwrap();
//! let m = mix.properties(Temperature::from_celsius(25.0)).unwrap();
//! let rho = m.liquid.density.kg_per_m3();
//! assert!(rho > 860.0 && rho < 885.0);
//! ```

use serde::Serialize;

use super::{Evaluated, Liquid, PropertyError, Solvent};
use crate::physics::input::{Allowed, FieldSpec, InputError};
use crate::physics::report::{ModelInfo, RangeWarning};
use crate::physics::units::{
    Density, Dimension, DynamicViscosity, Fraction, Pressure, SurfaceTension, Temperature, Unit,
};

/// Density mixing rule.
pub const DENSITY_RULE: ModelInfo = ModelInfo {
    name: "Ideal mixing (volume-fraction average)",
    formula: "ρ = φ₁ρ₁ + φ₂ρ₂",
    source: "definition of ideal mixing (no excess volume); water–alcohol mixtures contract by a few per cent (from memory)",
    validity: &[],
};
/// Viscosity mixing rule.
pub const VISCOSITY_RULE: ModelInfo = ModelInfo {
    name: "Arrhenius log-mixing (Grunberg–Nissan, no interaction term)",
    formula: "ln μ = x₁ ln μ₁ + x₂ ln μ₂",
    source: "Grunberg & Nissan, Nature 164 (1949) 799 with G₁₂ = 0 (citation from memory)",
    validity: &[],
};
/// Surface-tension mixing rule.
pub const SURFACE_TENSION_RULE: ModelInfo = ModelInfo {
    name: "Mole-fraction average",
    formula: "σ = x₁σ₁ + x₂σ₂",
    source: "common practice, no source; overestimates when the pure-component values differ",
    validity: &[],
};
/// Vapour-pressure mixing rule.
pub const VAPOUR_PRESSURE_RULE: ModelInfo = ModelInfo {
    name: "Raoult's law (ideal solution)",
    formula: "p = x₁p₁ + x₂p₂",
    source: "Raoult's law (definition of an ideal solution)",
    validity: &[],
};

/// Field of the first component's volume fraction.
pub const FIRST_VOLUME_FRACTION: FieldSpec = FieldSpec {
    key: "first_volume_fraction",
    label: "Volume fraction of the first solvent",
    dimension: Dimension::Fraction,
    allowed: Allowed { low: 0.0, low_inclusive: true, high: Some(1.0), high_inclusive: true, whole: false },
    help: "Volume of the first solvent over the sum of both volumes, measured before mixing.",
};

/// Why the ideal mixing rules may be far off for this pair.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum MixtureCaution {
    /// Water with a miscible polar organic: strong deviations from every ideal rule.
    AqueousNonIdeal {
        /// The organic component.
        other: Solvent,
    },
    /// The two liquids are not miscible in all proportions at room temperature: the mixture may
    /// be two phases and no single-liquid property applies.
    NotFullyMiscible {
        /// First component.
        first: Solvent,
        /// Second component.
        second: Solvent,
    },
}

impl MixtureCaution {
    /// The caution in words.
    pub fn message(&self) -> String {
        match self {
            MixtureCaution::AqueousNonIdeal { other } => format!(
                "Water with {} deviates strongly from the ideal mixing rules: viscosity can be more than twice \
                 the log-mixing value (water–ethanol peaks near 2.4 mPa·s at 25 °C, from memory), the volume \
                 contracts by a few per cent, surface tension falls steeply with the first few per cent of \
                 organic, and the real vapour pressure lies above Raoult's law. Use measured mixture data if \
                 the result matters.",
                other.name()
            ),
            MixtureCaution::NotFullyMiscible { first, second } => format!(
                "{} and {} are not miscible in all proportions at room temperature (from memory): the mixture \
                 may separate into two liquid phases, and these single-liquid properties would not apply.",
                first.name(),
                second.name()
            ),
        }
    }
}

/// Pairs only partly miscible near room temperature (from memory; check solubility data).
const PARTLY_MISCIBLE: &[(Solvent, Solvent)] = &[
    (Solvent::Water, Solvent::Toluene),
    (Solvent::Water, Solvent::Heptane),
    (Solvent::Water, Solvent::Dichloromethane),
    (Solvent::Water, Solvent::EthylAcetate),
    (Solvent::Water, Solvent::MeThf),
    (Solvent::Heptane, Solvent::Methanol),
    (Solvent::Heptane, Solvent::Acetonitrile),
    (Solvent::Heptane, Solvent::Dmf),
    (Solvent::Heptane, Solvent::Dmso),
    (Solvent::Heptane, Solvent::Nmp),
    (Solvent::Water, Solvent::Mtbe),
    (Solvent::Water, Solvent::Cpme),
    (Solvent::Heptane, Solvent::Dmac),
];

/// A binary mixture of two built-in solvents, by volume fraction.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct BinaryMixture {
    first: Solvent,
    second: Solvent,
    first_volume_fraction: f64,
}

/// Properties of a mixture at one temperature.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct MixtureProperties {
    /// The mixed liquid.
    pub liquid: Liquid,
    /// Mole fraction of the first solvent (from the volume fraction and the pure densities).
    pub first_mole_fraction: f64,
    /// Range warnings of the pure-component models.
    pub warnings: Vec<RangeWarning>,
    /// Why the mixing rules may be far off for this pair.
    pub cautions: Vec<MixtureCaution>,
}

impl BinaryMixture {
    /// A mixture with `first_volume_fraction` of `first` (0 to 1) and the rest `second`.
    pub fn new(first: Solvent, second: Solvent, first_volume_fraction: Fraction) -> Result<Self, InputError> {
        let unit = Unit { symbol: "fraction", factor: 1.0, offset: 0.0 };
        let phi = FIRST_VOLUME_FRACTION.accept(first_volume_fraction.value(), unit)?;
        Ok(Self { first, second, first_volume_fraction: phi })
    }

    /// The first solvent.
    pub fn first(&self) -> Solvent {
        self.first
    }

    /// The second solvent.
    pub fn second(&self) -> Solvent {
        self.second
    }

    /// Volume fraction of the first solvent.
    pub fn first_volume_fraction(&self) -> Fraction {
        Fraction::from_si(self.first_volume_fraction)
    }

    /// Cautions that apply to this pair at this composition (none for a pure liquid).
    pub fn cautions(&self) -> Vec<MixtureCaution> {
        let phi = self.first_volume_fraction;
        if self.first == self.second || phi <= 0.0 || phi >= 1.0 {
            return Vec::new();
        }
        let mut cautions = Vec::new();
        let pair =
            |a: Solvent, b: Solvent| (self.first == a && self.second == b) || (self.first == b && self.second == a);
        if PARTLY_MISCIBLE.iter().any(|&(a, b)| pair(a, b)) {
            cautions.push(MixtureCaution::NotFullyMiscible { first: self.first, second: self.second });
        } else if self.first == Solvent::Water {
            cautions.push(MixtureCaution::AqueousNonIdeal { other: self.second });
        } else if self.second == Solvent::Water {
            cautions.push(MixtureCaution::AqueousNonIdeal { other: self.first });
        }
        cautions
    }

    /// Mixture properties at `t` by the ideal rules in the module documentation.
    pub fn properties(&self, t: Temperature) -> Result<MixtureProperties, PropertyError> {
        let Evaluated { value: one, warnings: w1 } = self.first.liquid(t)?;
        let Evaluated { value: two, warnings: w2 } = self.second.liquid(t)?;
        let phi1 = self.first_volume_fraction;
        let phi2 = 1.0 - phi1;
        // Moles per unit mixture volume of each component: φ ρ / M.
        let n1 = phi1 * one.density.si() / self.first.molar_mass().si();
        let n2 = phi2 * two.density.si() / self.second.molar_mass().si();
        let x1 = n1 / (n1 + n2);
        let x2 = 1.0 - x1;
        let density = phi1 * one.density.si() + phi2 * two.density.si();
        let viscosity = (x1 * one.viscosity.si().ln() + x2 * two.viscosity.si().ln()).exp();
        let surface_tension = x1 * one.surface_tension.si() + x2 * two.surface_tension.si();
        let vapour_pressure = match (one.vapour_pressure, two.vapour_pressure) {
            (Some(p1), Some(p2)) => Some(Pressure::from_si(x1 * p1.si() + x2 * p2.si())),
            _ => None,
        };
        Ok(MixtureProperties {
            liquid: Liquid {
                density: Density::from_si(density),
                viscosity: DynamicViscosity::from_si(viscosity),
                surface_tension: SurfaceTension::from_si(surface_tension),
                vapour_pressure,
            },
            first_mole_fraction: x1,
            warnings: [w1, w2].concat(),
            cautions: self.cautions(),
        })
    }
}
