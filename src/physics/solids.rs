//! Solids that go into flow lines: insoluble bases, salts, drying agents, catalyst supports and
//! metals, with their skeletal (true) densities. A calculator's particle density comes either
//! from this table or from the user's entry.
//!
//! Sources. Crystalline and metallic solids: the CRC Handbook of Chemistry and Physics table of
//! inorganic solid densities as shipped in the `chemicals` package 1.5.2 (molar volumes; the
//! density is the molar mass over that volume), checked value by value in tests/solids.rs against
//! `tests/reference/solid_densities.json`, written by `tests/reference/solid_densities.py`.
//! Porous supports take the skeletal density of the solid their walls are made of (vitreous
//! silica for silica gel and diatomaceous earth, graphite for activated carbon), which is the
//! usual approximation (common practice, no source). Alumina comes twice: at the CRC entry's
//! density, which is corundum's (α-Al₂O₃, 3 970 kg/m³) though labelled γ, and at the γ form's own
//! crystal density, derived from its defect-spinel cell: 32 O and 21⅓ Al per cubic cell of
//! a = 7.90 Å (lattice constant from memory, powder-diffraction card JCPDS 10-0425), so
//! ρ = (32/3) M(Al₂O₃) / (N_A a³) = 3 660 kg/m³; porous γ-alumina supports measure lower still,
//! 3 000–3 600 (from memory). A cross-linked polystyrene resin is 1 050 kg/m³ (from memory:
//! polystyrene 1 040–1 065).
//!
//! Porous particles. Their pores fill with liquid in the line, so what settles is a particle of
//! envelope density ρ_env = ρ_s (1 − ε_p) carrying liquid of density ρ_l in its pores:
//! ρ_wet = ρ_s (1 − ε_p) + ρ_l ε_p (mass balance of one particle, by definition). The internal
//! porosity ε_p is the user's entry; typical ranges (from memory) are in the field's help.

use serde::Serialize;

use super::form::{ChoiceSpec, Collector, FieldSource};
use super::input::{Allowed, FieldSpec};
use super::report::{Figure, ModelInfo, NumericalError};
use super::units::{Density, Dimension};

/// What a solid is for a flow line: dense crystals or metal, or a porous support.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Texture {
    /// No internal pores: the particle density is the skeletal density.
    Dense,
    /// Internal pores that fill with liquid; the particle density depends on the porosity.
    Porous,
}

/// One solid of the table.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Solid {
    /// Key used in case files.
    pub key: &'static str,
    /// Name for people, with the formula.
    pub name: &'static str,
    /// CAS number of the entry the density is taken from.
    pub cas: &'static str,
    /// Skeletal density, kg/m³.
    pub skeletal: f64,
    /// Dense or porous.
    pub texture: Texture,
    /// Where the density comes from.
    pub source: &'static str,
}

const CRC: &str = "CRC Handbook of Chemistry and Physics, inorganic solids, via chemicals 1.5.2";
const CRC_SILICA: &str = "vitreous SiO₂, CRC Handbook via chemicals 1.5.2; silica gel walls taken as vitreous silica (common practice, no source)";
const CRC_ALUMINA: &str = "CRC Handbook entry labelled γ-Al₂O₃, via chemicals 1.5.2, equal to corundum's (α-Al₂O₃) density; the γ form is about 8 % lighter (see γ-alumina)";
const GAMMA_ALUMINA: &str = "derived: crystal density of the γ-Al₂O₃ defect-spinel cell, (32/3) M(Al₂O₃)/(N_A a³) with a = 7.90 Å (lattice constant from memory, JCPDS 10-0425); porous supports measure 3 000–3 600 (from memory)";
const CRC_CARBON: &str = "graphite, CRC Handbook via chemicals 1.5.2; activated-carbon walls taken as graphite (common practice, no source; measured 1 800–2 200, from memory)";
const CRC_CELITE: &str = "vitreous SiO₂, CRC Handbook via chemicals 1.5.2; diatomite walls taken as amorphous silica (common practice, no source)";
const MEMORY_RESIN: &str = "polystyrene 1 040–1 065 kg/m³ (from memory); cross-linking and functional groups raise it";

/// The table, in the order of the choice's options after "entered".
pub const SOLIDS: &[Solid] = &[
    Solid { key: "k2co3", name: "Potassium carbonate, K₂CO₃", cas: "584-08-7", skeletal: 2290.0, texture: Texture::Dense, source: CRC },
    Solid { key: "cs2co3", name: "Caesium carbonate, Cs₂CO₃", cas: "534-17-8", skeletal: 4240.0, texture: Texture::Dense, source: CRC },
    Solid { key: "na2co3", name: "Sodium carbonate, Na₂CO₃", cas: "497-19-8", skeletal: 2540.0, texture: Texture::Dense, source: CRC },
    Solid { key: "li2co3", name: "Lithium carbonate, Li₂CO₃", cas: "554-13-2", skeletal: 2110.0, texture: Texture::Dense, source: CRC },
    Solid { key: "caco3", name: "Calcium carbonate (calcite), CaCO₃", cas: "471-34-1", skeletal: 2710.0, texture: Texture::Dense, source: CRC },
    Solid { key: "nahco3", name: "Sodium hydrogen carbonate, NaHCO₃", cas: "144-55-8", skeletal: 2200.0, texture: Texture::Dense, source: CRC },
    Solid { key: "khco3", name: "Potassium hydrogen carbonate, KHCO₃", cas: "298-14-6", skeletal: 2170.0, texture: Texture::Dense, source: CRC },
    Solid { key: "k3po4", name: "Potassium phosphate, K₃PO₄", cas: "7778-53-2", skeletal: 2564.0, texture: Texture::Dense, source: CRC },
    Solid { key: "na3po4", name: "Sodium phosphate, Na₃PO₄", cas: "7601-54-9", skeletal: 2540.0, texture: Texture::Dense, source: CRC },
    Solid { key: "na2hpo4", name: "Sodium hydrogen phosphate, Na₂HPO₄", cas: "7558-79-4", skeletal: 1700.0, texture: Texture::Dense, source: CRC },
    Solid { key: "kf", name: "Potassium fluoride, KF", cas: "7789-23-3", skeletal: 2480.0, texture: Texture::Dense, source: CRC },
    Solid { key: "csf", name: "Caesium fluoride, CsF", cas: "13400-13-0", skeletal: 4640.0, texture: Texture::Dense, source: CRC },
    Solid { key: "naoac", name: "Sodium acetate, NaOAc", cas: "127-09-3", skeletal: 1528.0, texture: Texture::Dense, source: CRC },
    Solid { key: "koac", name: "Potassium acetate, KOAc", cas: "127-08-2", skeletal: 1570.0, texture: Texture::Dense, source: CRC },
    Solid { key: "naoh", name: "Sodium hydroxide, NaOH", cas: "1310-73-2", skeletal: 2130.0, texture: Texture::Dense, source: CRC },
    Solid { key: "koh", name: "Potassium hydroxide, KOH", cas: "1310-58-3", skeletal: 2044.0, texture: Texture::Dense, source: CRC },
    Solid { key: "mgso4", name: "Magnesium sulfate, MgSO₄", cas: "7487-88-9", skeletal: 2660.0, texture: Texture::Dense, source: CRC },
    Solid { key: "na2so4", name: "Sodium sulfate, Na₂SO₄", cas: "7757-82-6", skeletal: 2700.0, texture: Texture::Dense, source: CRC },
    Solid { key: "nacl", name: "Sodium chloride, NaCl", cas: "7647-14-5", skeletal: 2170.0, texture: Texture::Dense, source: CRC },
    Solid { key: "kcl", name: "Potassium chloride, KCl", cas: "7447-40-7", skeletal: 1988.0, texture: Texture::Dense, source: CRC },
    Solid { key: "cacl2", name: "Calcium chloride, CaCl₂", cas: "10043-52-4", skeletal: 2150.0, texture: Texture::Dense, source: CRC },
    Solid { key: "cui", name: "Copper(I) iodide, CuI", cas: "7681-65-4", skeletal: 5670.0, texture: Texture::Dense, source: CRC },
    Solid { key: "fe3o4", name: "Magnetite, Fe₃O₄", cas: "1317-61-9", skeletal: 5350.0, texture: Texture::Dense, source: CRC },
    Solid { key: "tio2", name: "Titanium dioxide (anatase), TiO₂", cas: "1317-70-0", skeletal: 3900.0, texture: Texture::Dense, source: CRC },
    Solid { key: "zn", name: "Zinc (dust), Zn", cas: "7440-66-6", skeletal: 7134.0, texture: Texture::Dense, source: CRC },
    Solid { key: "cu", name: "Copper (powder), Cu", cas: "7440-50-8", skeletal: 8960.0, texture: Texture::Dense, source: CRC },
    Solid { key: "ni", name: "Nickel (powder), Ni", cas: "7440-02-0", skeletal: 8900.0, texture: Texture::Dense, source: CRC },
    Solid { key: "pd", name: "Palladium (black), Pd", cas: "7440-05-3", skeletal: 12000.0, texture: Texture::Dense, source: CRC },
    Solid { key: "silica_gel", name: "Silica gel (porous SiO₂)", cas: "60676-86-0", skeletal: 2196.0, texture: Texture::Porous, source: CRC_SILICA },
    Solid { key: "celite", name: "Diatomaceous earth (filter aid)", cas: "60676-86-0", skeletal: 2196.0, texture: Texture::Porous, source: CRC_CELITE },
    Solid { key: "alumina", name: "Alumina at corundum's density (porous Al₂O₃, 3 970 kg/m³)", cas: "1344-28-1", skeletal: 3970.0, texture: Texture::Porous, source: CRC_ALUMINA },
    Solid { key: "gamma_alumina", name: "γ-Alumina (porous, γ-form density 3 660 kg/m³)", cas: "1344-28-1", skeletal: 3660.0, texture: Texture::Porous, source: GAMMA_ALUMINA },
    Solid { key: "carbon", name: "Activated carbon, also Pd/C and Pt/C supports", cas: "7782-42-5", skeletal: 2200.0, texture: Texture::Porous, source: CRC_CARBON },
    Solid { key: "ps_resin", name: "Polystyrene resin (scavenger, supported reagent)", cas: "9003-53-6", skeletal: 1050.0, texture: Texture::Porous, source: MEMORY_RESIN },
];

/// Number of options of [`SOLID`]: "entered" and one per table entry.
const OPTION_COUNT: usize = 35;

const fn options() -> [(&'static str, &'static str); OPTION_COUNT] {
    let mut out = [("entered", "Other solid (enter its particle density)"); OPTION_COUNT];
    let mut i = 0;
    while i < SOLIDS.len() {
        out[i + 1] = (SOLIDS[i].key, SOLIDS[i].name);
        i += 1;
    }
    out
}

const SOLID_OPTIONS: [(&str, &str); OPTION_COUNT] = options();

/// The solid choice; "entered" leaves the particle density to the calculator's own field.
pub const SOLID: ChoiceSpec = ChoiceSpec { key: "solid", label: "Solid", options: &SOLID_OPTIONS };

/// Internal porosity of a porous solid from the table.
pub const PARTICLE_POROSITY: FieldSpec = FieldSpec {
    key: "particle_porosity",
    label: "Internal porosity of the particles",
    dimension: Dimension::Fraction,
    allowed: Allowed { low: 0.0, low_inclusive: true, high: Some(0.95), high_inclusive: true, whole: false },
    help: "Pore volume over particle volume, from the supplier's pore volume V_p as ρ_s V_p / (1 + ρ_s V_p). \
           Typical (from memory): silica gel 0.5–0.7, γ-alumina 0.5–0.7, activated carbon 0.5–0.8, \
           diatomite 0.8–0.9, macroporous resin 0.3–0.6.",
};

/// The solid of a calculator.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum SolidSelection {
    /// A solid from the table; `porosity` is zero for a dense solid.
    Table {
        /// The solid.
        solid: Solid,
        /// Internal porosity ε_p.
        porosity: f64,
    },
    /// A particle density entered by the user, taken as it is.
    Entered {
        /// The density.
        density: Density,
    },
}

/// Reads the solid choice and what it needs: the internal porosity of a porous solid, or the
/// entered particle density (the calling calculator's own field).
pub fn read(src: &dyn FieldSource, c: &mut Collector, entered: &FieldSpec) -> Option<SolidSelection> {
    match c.take(src.choice(&SOLID))? {
        0 => c.take(src.quantity(entered)).map(|d| SolidSelection::Entered { density: Density::from_si(d) }),
        i => {
            let solid = *SOLIDS.get(i - 1)?;
            let porosity = match solid.texture {
                Texture::Dense => 0.0,
                Texture::Porous => c.take(src.quantity(&PARTICLE_POROSITY))?,
            };
            Some(SolidSelection::Table { solid, porosity })
        }
    }
}

const ENVELOPE_INFO: ModelInfo = ModelInfo {
    name: "Envelope density",
    formula: "ρ_env = ρ_s (1 − ε_p), ρ_s from the solids table",
    source: "definition; ρ_s as named in the solid's source note",
    validity: &[],
};

const WET_INFO: ModelInfo = ModelInfo {
    name: "Liquid-filled density",
    formula: "ρ_wet = ρ_s (1 − ε_p) + ρ_l ε_p",
    source: "definition (pores full of liquid); ρ_s from the solids table",
    validity: &[],
};

const ENTERED_INFO: ModelInfo = ModelInfo { name: "Entered", formula: "ρ_p as entered", source: "user input", validity: &[] };

impl SolidSelection {
    /// Mass of solid over particle volume, pores included (what a bed of a given mass fills).
    pub fn envelope_density(&self) -> Density {
        match *self {
            SolidSelection::Table { solid, porosity } => Density::from_si(solid.skeletal * (1.0 - porosity)),
            SolidSelection::Entered { density } => density,
        }
    }

    /// Density of one particle with its pores full of the liquid (what settles).
    pub fn wet_density(&self, liquid: Density) -> Density {
        match *self {
            SolidSelection::Table { solid, porosity } => Density::from_si(solid.skeletal * (1.0 - porosity) + liquid.si() * porosity),
            SolidSelection::Entered { density } => density,
        }
    }

    /// The particle density a calculator uses, as a figure naming the solid and its source:
    /// the liquid-filled density when `wet` (settling), else the envelope density.
    pub fn figure(&self, wet: bool, liquid: Density) -> Result<Figure, NumericalError> {
        match *self {
            SolidSelection::Table { solid, .. } => {
                let dense = solid.texture == Texture::Dense;
                let model = ModelInfo {
                    name: solid.name,
                    formula: if dense { "ρ_p = ρ_s (dense solid)" } else if wet { WET_INFO.formula } else { ENVELOPE_INFO.formula },
                    source: solid.source,
                    validity: &[],
                };
                let value = if wet { self.wet_density(liquid) } else { self.envelope_density() };
                let label = match (dense, wet) {
                    (true, _) => "Particle density (solids table)",
                    (false, true) => "Particle density, pores full of liquid",
                    (false, false) => "Particle density, pores included",
                };
                Figure::definition("particle_density_used", label, Dimension::Density, model, value.si())
            }
            SolidSelection::Entered { density } => Figure::definition("particle_density_used", "Particle density (entered)", Dimension::Density, ENTERED_INFO, density.si()),
        }
    }
}

// The option list is built at compile time; its length must follow the table.
const _: () = assert!(OPTION_COUNT == SOLIDS.len() + 1);
