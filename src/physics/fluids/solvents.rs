//! The built-in solvents: identity, molar mass, normal boiling point, and their density,
//! viscosity, surface tension and vapour pressure as functions of temperature, with range warnings.
//!
//! Coefficients are this project's own fits (table in `solvent_data.rs`, made by
//! `tests/reference/solvent_properties.py`) to the values of the general-purpose property library
//! thermo 0.6.1 / chemicals 1.5.2, each naming the method thermo used; where thermo has only
//! estimation methods (NMP density and viscosity; 2-MeTHF density, viscosity, surface tension;
//! DMAc and CPME density; CPME viscosity and vapour pressure; MTBE surface tension) a named
//! literature value, an estimate checked on a measured analogue or a value from memory is used and
//! marked so in the source. Fits start at 20 °C or, for a solvent melting above about 19 °C
//! (tert-butanol, 25.2 °C), at the first whole degree 0.5 K above its melting point.
//! Forms: linear density and surface tension over 20–80 °C; Andrade, ln μ = A + B/T
//! (E. N. da C. Andrade, Nature 125 (1930) 309, citation from memory), or Vogel,
//! ln μ = A + B/(T − C) (H. Vogel, Phys. Z. 22 (1921) 645, citation from memory), over 20–80 °C;
//! Antoine, log₁₀ p = A − B/(T + C), over up to 0–200 °C. Fit errors (max over the range, over
//! the solvents fitted to thermo): density 0.22 %, viscosity 1.1 %, surface tension 0.57 %,
//! vapour pressure 0.98 %.
//!
//! ```
//! use clearbore::physics::fluids::Solvent;
//! use clearbore::physics::units::Temperature;
//! // Water at 20 °C: 998.2 kg/m³ (IAPWS-95 via thermo); the linear fit is within 0.22 %.
//! let rho = Solvent::Water.density(Temperature::from_celsius(20.0)).unwrap();
//! assert!((rho.value.kg_per_m3() - 998.2).abs() < 0.0022 * 998.2);
//! assert!(rho.warnings.is_empty());
//! ```

use serde::Serialize;

use super::models::range_warnings;
use super::solvent_data::{SOLVENTS, SolventData};
use super::{BoilingCheck, Evaluated, Liquid, PropertyError};
use crate::physics::report::ModelInfo;
use crate::physics::units::{Density, DynamicViscosity, MolarMass, Pressure, SurfaceTension, Temperature};

/// A built-in solvent.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Solvent {
    /// Water.
    Water,
    /// Methanol.
    Methanol,
    /// Ethanol.
    Ethanol,
    /// 2-Propanol (isopropanol).
    TwoPropanol,
    /// Acetonitrile.
    Acetonitrile,
    /// Acetone.
    Acetone,
    /// Tetrahydrofuran.
    Thf,
    /// 2-Methyltetrahydrofuran.
    MeThf,
    /// Ethyl acetate.
    EthylAcetate,
    /// Toluene.
    Toluene,
    /// n-Heptane.
    Heptane,
    /// Dichloromethane.
    Dichloromethane,
    /// N,N-Dimethylformamide.
    Dmf,
    /// Dimethyl sulfoxide.
    Dmso,
    /// N-Methyl-2-pyrrolidone.
    Nmp,
    /// 1,4-Dioxane.
    Dioxane,
    /// N,N-Dimethylacetamide.
    Dmac,
    /// Methyl tert-butyl ether.
    Mtbe,
    /// Cyclopentyl methyl ether.
    Cpme,
    /// tert-Butanol (2-methyl-2-propanol); solid below 25 °C.
    TertButanol,
    /// Acetic acid; solid below 17 °C.
    AceticAcid,
}

/// A temperature-dependent property of a solvent.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Property {
    /// Mass density.
    Density,
    /// Dynamic viscosity.
    Viscosity,
    /// Surface tension.
    SurfaceTension,
    /// Vapour pressure.
    VapourPressure,
}

impl Property {
    /// Every property.
    pub const ALL: [Property; 4] =
        [Property::Density, Property::Viscosity, Property::SurfaceTension, Property::VapourPressure];

    /// Lower-case name, as in messages.
    pub const fn word(self) -> &'static str {
        match self {
            Property::Density => "density",
            Property::Viscosity => "viscosity",
            Property::SurfaceTension => "surface tension",
            Property::VapourPressure => "vapour pressure",
        }
    }
}

impl Solvent {
    /// Every built-in solvent, in table order.
    pub const ALL: [Solvent; 21] = [
        Solvent::Water,
        Solvent::Methanol,
        Solvent::Ethanol,
        Solvent::TwoPropanol,
        Solvent::Acetonitrile,
        Solvent::Acetone,
        Solvent::Thf,
        Solvent::MeThf,
        Solvent::EthylAcetate,
        Solvent::Toluene,
        Solvent::Heptane,
        Solvent::Dichloromethane,
        Solvent::Dmf,
        Solvent::Dmso,
        Solvent::Nmp,
        Solvent::Dioxane,
        Solvent::Dmac,
        Solvent::Mtbe,
        Solvent::Cpme,
        Solvent::TertButanol,
        Solvent::AceticAcid,
    ];

    /// The stored data: coefficients, ranges, sources.
    pub fn data(self) -> &'static SolventData {
        // The table is in the order of the variants (a test checks each entry's CAS number).
        &SOLVENTS[self as usize]
    }

    /// Name for people, e.g. "dichloromethane (DCM)".
    pub fn name(self) -> &'static str {
        self.data().name
    }

    /// CAS registry number.
    pub fn cas(self) -> &'static str {
        self.data().cas
    }

    /// Molar mass.
    pub fn molar_mass(self) -> MolarMass {
        MolarMass::from_g_per_mol(self.data().molar_mass_g_per_mol)
    }

    /// Normal boiling point (at 101.325 kPa).
    pub fn normal_boiling_point(self) -> Temperature {
        Temperature::from_kelvin(self.data().normal_boiling_point_k)
    }

    /// Melting point (chemicals 1.5.2).
    pub fn melting_point(self) -> Temperature {
        Temperature::from_kelvin(self.data().melting_point_k)
    }

    /// Whether the solvent is solid at `t` (at or below its melting point): a line of it freezes
    /// and blocks. The property models are not evaluated there (their ranges start above it).
    pub fn freezes_at(self, t: Temperature) -> bool {
        t.kelvin() <= self.data().melting_point_k
    }

    /// Name, formula, source and fitted range of the model for `property`.
    pub fn info(self, property: Property) -> &'static ModelInfo {
        let d = self.data();
        match property {
            Property::Density => &d.density.info,
            Property::Viscosity => &d.viscosity.info,
            Property::SurfaceTension => &d.surface_tension.info,
            Property::VapourPressure => &d.vapour_pressure.info,
        }
    }

    /// Says so when a fitted range reaches above the normal boiling point: values there are for
    /// the liquid kept under pressure (for example behind a back-pressure regulator).
    pub fn above_boiling_note(self) -> Option<String> {
        let tb = self.data().normal_boiling_point_k;
        let top = [Property::Density, Property::Viscosity, Property::SurfaceTension]
            .iter()
            .filter_map(|p| self.info(*p).validity.iter().filter_map(|b| b.high).reduce(f64::max))
            .reduce(f64::max)?;
        (top > tb).then(|| {
            format!(
                "{} boils at {:.1} °C at 1 atm; its property fits run to {:.1} °C, and values above the \
                 boiling point are for the liquid kept under pressure",
                self.name(),
                Temperature::from_kelvin(tb).celsius(),
                Temperature::from_kelvin(top).celsius()
            )
        })
    }

    fn evaluate(self, property: Property, t: Temperature, value: Option<f64>) -> Result<Evaluated<f64>, PropertyError> {
        match value {
            Some(v) => Ok(Evaluated { value: v, warnings: range_warnings(self.info(property), t) }),
            None => Err(PropertyError {
                quantity: property.word(),
                fluid: self.name(),
                temperature_k: t.kelvin(),
                fitted_k: self.info(property).validity.first().and_then(|b| b.low.zip(b.high)),
            }),
        }
    }

    /// Density at `t`, with a warning outside the fitted range.
    pub fn density(self, t: Temperature) -> Result<Evaluated<Density>, PropertyError> {
        let e = self.evaluate(Property::Density, t, self.data().density.value(t))?;
        Ok(Evaluated { value: Density::from_si(e.value), warnings: e.warnings })
    }

    /// Dynamic viscosity at `t`, with a warning outside the fitted range.
    pub fn viscosity(self, t: Temperature) -> Result<Evaluated<DynamicViscosity>, PropertyError> {
        let e = self.evaluate(Property::Viscosity, t, self.data().viscosity.value(t))?;
        Ok(Evaluated { value: DynamicViscosity::from_si(e.value), warnings: e.warnings })
    }

    /// Surface tension at `t`, with a warning outside the fitted range.
    pub fn surface_tension(self, t: Temperature) -> Result<Evaluated<SurfaceTension>, PropertyError> {
        let e = self.evaluate(Property::SurfaceTension, t, self.data().surface_tension.value(t))?;
        Ok(Evaluated { value: SurfaceTension::from_si(e.value), warnings: e.warnings })
    }

    /// Vapour pressure at `t`, with a warning outside the fitted range.
    pub fn vapour_pressure(self, t: Temperature) -> Result<Evaluated<Pressure>, PropertyError> {
        let e = self.evaluate(Property::VapourPressure, t, self.data().vapour_pressure.value(t))?;
        Ok(Evaluated { value: Pressure::from_si(e.value), warnings: e.warnings })
    }

    /// All four properties at `t`, with every range warning raised.
    pub fn liquid(self, t: Temperature) -> Result<Evaluated<Liquid>, PropertyError> {
        let rho = self.density(t)?;
        let mu = self.viscosity(t)?;
        let sigma = self.surface_tension(t)?;
        let p_sat = self.vapour_pressure(t)?;
        let warnings = [rho.warnings, mu.warnings, sigma.warnings, p_sat.warnings].concat();
        Ok(Evaluated {
            value: Liquid {
                density: rho.value,
                viscosity: mu.value,
                surface_tension: sigma.value,
                vapour_pressure: Some(p_sat.value),
            },
            warnings,
        })
    }

    /// Whether the solvent boils at temperature `t` under absolute `pressure` (vapour pressure
    /// at or above the pressure), with a warning if `t` is outside the vapour-pressure fit.
    pub fn boiling_check(self, t: Temperature, pressure: Pressure) -> Result<Evaluated<BoilingCheck>, PropertyError> {
        let p_sat = self.vapour_pressure(t)?;
        Ok(Evaluated { value: BoilingCheck::new(p_sat.value, pressure), warnings: p_sat.warnings })
    }
}

#[cfg(test)]
mod tests {
    #![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

    use super::*;

    #[test]
    fn table_order_matches_variants() {
        // CAS numbers: chemicals 1.5.2 identifiers (as used by the fitting script).
        let cas = [
            "7732-18-5",
            "67-56-1",
            "64-17-5",
            "67-63-0",
            "75-05-8",
            "67-64-1",
            "109-99-9",
            "96-47-9",
            "141-78-6",
            "108-88-3",
            "142-82-5",
            "75-09-2",
            "68-12-2",
            "67-68-5",
            "872-50-4",
            "123-91-1",
            "127-19-5",
            "1634-04-4",
            "5614-37-9",
            "75-65-0",
            "64-19-7",
        ];
        for (s, c) in Solvent::ALL.iter().zip(cas) {
            assert_eq!(s.cas(), c, "{}", s.name());
        }
    }

    #[test]
    fn each_model_names_its_property_and_a_source() {
        for s in Solvent::ALL {
            for p in Property::ALL {
                let info = s.info(p);
                assert!(info.name.contains(p.word()), "{}: {}", s.name(), info.name);
                assert!(!info.source.is_empty());
                assert_eq!(info.validity.len(), 1);
            }
        }
    }

    #[test]
    fn dcm_and_acetone_note_the_range_above_boiling() {
        // Normal boiling points: DCM 39.8 °C, acetone 56.1 °C (chemicals 1.5.2), below the 80 °C fit top.
        assert!(Solvent::Dichloromethane.above_boiling_note().is_some());
        assert!(Solvent::Acetone.above_boiling_note().is_some());
        // Water boils at 100 °C, above the 80 °C top of its fits.
        assert!(Solvent::Water.above_boiling_note().is_none());
    }
}
