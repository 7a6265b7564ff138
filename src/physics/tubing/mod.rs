//! Lab tubing: common OD × ID sizes, materials, working pressure at room temperature and its
//! derating with temperature, and the chemical-compatibility flags that matter. Every number
//! says where it comes from; the user can always enter the rating of their own part instead.
//!
//! Polymers: Lamé thick-wall burst pressure P_b = S_u (D_o² − D_i²)/(D_o² + D_i²) with the
//! ambient tensile strengths S_u of a supplier burst chart (PTFE 2 500, FEP 3 000, PFA 4 000,
//! PEEK 13 300 psi), working pressure = P_b / 4 (the 4:1 factor customary for tubing; both from
//! a supplier technical page). 316 stainless: allowable working pressures of seamless ASTM A269
//! tube at −28…37 °C per ASME B31.3, from a fitting maker's table reproduced on a supplier page;
//! a wall between the tabulated ones is rated as the next thinner tabulated wall (conservative:
//! the allowable pressure rises with the wall). Temperature factors per material: [`derating`].

pub mod derating;

use serde::Serialize;

use super::form::ChoiceSpec;
use super::report::{ModelInfo, RangeWarning, ValidityBound};
use super::units::{Dimension, PressureDifference, Temperature};

/// psi to Pa (NIST SP 811: 6.894 757 E+03).
const PSI: f64 = 6_894.757;

/// Tubing material.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Material {
    /// Perfluoroalkoxy.
    Pfa,
    /// Fluorinated ethylene propylene.
    Fep,
    /// Polytetrafluoroethylene.
    Ptfe,
    /// Polyether ether ketone.
    Peek,
    /// 316 stainless steel, seamless.
    Ss316,
}

/// One standard size: outer and inner diameter in inches.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Size {
    /// Key used in case files.
    pub key: &'static str,
    /// Outer diameter, in.
    pub od_in: f64,
    /// Inner diameter, in.
    pub id_in: f64,
}

/// The sizes offered (common catalogue ladder, from memory; SS sizes from the ASME B31.3 wall
/// ladder on a supplier page).
pub const SIZES: &[Size] = &[
    Size { key: "1_16x0_010", od_in: 0.0625, id_in: 0.010 },
    Size { key: "1_16x0_020", od_in: 0.0625, id_in: 0.020 },
    Size { key: "1_16x0_030", od_in: 0.0625, id_in: 0.030 },
    Size { key: "1_16x0_040", od_in: 0.0625, id_in: 0.040 },
    Size { key: "1_16x0_0425", od_in: 0.0625, id_in: 0.0425 },
    Size { key: "1_8x0_055", od_in: 0.125, id_in: 0.055 },
    Size { key: "1_8x1_16", od_in: 0.125, id_in: 0.0625 },
    Size { key: "1_8x0_069", od_in: 0.125, id_in: 0.069 },
    Size { key: "1_8x0_080", od_in: 0.125, id_in: 0.080 },
    Size { key: "1_4x0_120", od_in: 0.25, id_in: 0.120 },
    Size { key: "1_4x1_8", od_in: 0.25, id_in: 0.125 },
    Size { key: "1_4x0_152", od_in: 0.25, id_in: 0.152 },
    Size { key: "1_4x0_156", od_in: 0.25, id_in: 0.156 },
    Size { key: "1_4x0_180", od_in: 0.25, id_in: 0.180 },
];

/// Choice of the tubing material; "none" leaves the rating to the entered value.
pub const MATERIAL: ChoiceSpec = ChoiceSpec {
    key: "tubing_material",
    label: "Tubing (for its rating at temperature)",
    options: &[
        ("none", "Not from the table: use the entered rating only"),
        ("pfa", "PFA"),
        ("fep", "FEP"),
        ("ptfe", "PTFE"),
        ("peek", "PEEK"),
        ("ss316", "316 stainless steel (seamless)"),
    ],
};

/// Choice of the tubing size (OD × ID, inches).
pub const SIZE: ChoiceSpec = ChoiceSpec {
    key: "tubing_size",
    label: "Tubing OD × ID",
    options: &[
        ("1_16x0_010", "1/16″ × 0.010″ (0.25 mm)"),
        ("1_16x0_020", "1/16″ × 0.020″ (0.51 mm)"),
        ("1_16x0_030", "1/16″ × 0.030″ (0.76 mm)"),
        ("1_16x0_040", "1/16″ × 0.040″ (1.02 mm)"),
        ("1_16x0_0425", "1/16″ × 0.0425″ (1.08 mm)"),
        ("1_8x0_055", "1/8″ × 0.055″ (1.40 mm)"),
        ("1_8x1_16", "1/8″ × 1/16″ (1.59 mm)"),
        ("1_8x0_069", "1/8″ × 0.069″ (1.75 mm)"),
        ("1_8x0_080", "1/8″ × 0.080″ (2.03 mm)"),
        ("1_4x0_120", "1/4″ × 0.120″ (3.05 mm)"),
        ("1_4x1_8", "1/4″ × 1/8″ (3.18 mm)"),
        ("1_4x0_152", "1/4″ × 0.152″ (3.86 mm)"),
        ("1_4x0_156", "1/4″ × 0.156″ (3.96 mm)"),
        ("1_4x0_180", "1/4″ × 0.180″ (4.57 mm)"),
    ],
};

impl Material {
    /// In the order of [`MATERIAL`]'s options after "none".
    pub const ALL: [Material; 5] = [Material::Pfa, Material::Fep, Material::Ptfe, Material::Peek, Material::Ss316];

    /// Name for people.
    pub const fn name(self) -> &'static str {
        match self {
            Material::Pfa => "PFA",
            Material::Fep => "FEP",
            Material::Ptfe => "PTFE",
            Material::Peek => "PEEK",
            Material::Ss316 => "316 stainless steel",
        }
    }

    /// What light does in the tubing wall, for photochemistry (from memory: FEP and PFA are the
    /// usual photoreactor tubing; check the supplier's transmission data for your wavelength).
    pub const fn light_note(self) -> &'static str {
        match self {
            Material::Pfa | Material::Fep => "Light: transmits visible and near-UV (the usual photoreactor tubing; transmission data from the supplier, values from memory).",
            Material::Ptfe => "Light: translucent, scatters; a poor window for photochemistry (from memory).",
            Material::Peek | Material::Ss316 => "Light: opaque.",
        }
    }

    /// Working-pressure factor at `t` against room temperature (see [`derating`]); `None`
    /// above the hottest temperature with a rating.
    pub fn temperature_factor(self, t: Temperature) -> Option<f64> {
        derating::factor(self, t)
    }

    /// Model information: formula, the sources of the room-temperature rating and of the
    /// temperature factor, and the temperature range covered.
    pub fn info(self) -> ModelInfo {
        const fn to(high_c: f64) -> ValidityBound {
            ValidityBound { quantity: "temperature", dimension: Dimension::Temperature, low: Some(293.15), high: Some(high_c + 273.15) }
        }
        const TO_250_C: &[ValidityBound] = &[to(250.0)];
        const TO_205_C: &[ValidityBound] = &[to(205.0)];
        const TO_100_C: &[ValidityBound] = &[to(100.0)];
        const TO_316_C: &[ValidityBound] = &[to(316.0)];
        const LAME: &str = "P = S_u (D_o² − D_i²)/(D_o² + D_i²) / 4 × temperature factor";
        match self {
            Material::Ss316 => ModelInfo {
                name: "ASME B31.3 allowable working pressure",
                formula: "tabulated by OD and wall (a wall between entries: the next thinner one) × temperature factor",
                source: "fitting maker's table (seamless ASTM A269, ASME B31.3) on a supplier technical page; temperature factors 1.00 to 149 °C, 0.97 at 204 °C, 0.90 at 260 °C, 0.85 at 316 °C from fitting makers' tubing data (DK-Lok TS-04-S (2011) Table 2; Wading-Lok tubing table)",
                validity: TO_316_C,
            },
            Material::Ptfe => ModelInfo {
                name: "Lamé burst ÷ 4",
                formula: LAME,
                source: "tensile strengths of a supplier burst chart, 4:1 factor customary (supplier technical page); temperature factor = published tensile strength hot / at 23 °C: 0.41 at 150 °C (finemech.com/ft005.html), 0.33 at 250 °C (Valqua gasket handbook Table 1.1.13), exponential between",
                validity: TO_250_C,
            },
            Material::Pfa => ModelInfo {
                name: "Lamé burst ÷ 4",
                formula: LAME,
                source: "tensile strengths of a supplier burst chart, 4:1 factor customary (supplier technical page); temperature factor = published tensile strength hot / at 23 °C: 0.51 at 150 °C (finemech.com/ft005.html), 0.41 at 250 °C (Valqua gasket handbook Table 1.1.13), exponential between",
                validity: TO_250_C,
            },
            Material::Fep => ModelInfo {
                name: "Lamé burst ÷ 4",
                formula: LAME,
                source: "tensile strengths of a supplier burst chart, 4:1 factor customary (supplier technical page); temperature factor = published tensile strength hot / at 23 °C: 0.18 at 150 °C (finemech.com/ft005.html), 0.065 at 250 °C (Valqua gasket handbook Table 1.1.13), exponential between; no rating above the 205 °C service temperature",
                validity: TO_205_C,
            },
            Material::Peek => ModelInfo {
                name: "Lamé burst ÷ 4",
                formula: LAME,
                source: "tensile strength of a supplier burst chart, 4:1 factor customary (supplier technical page); temperature factor 0.70 at 100 °C from memory (no published table read), exponential between; no rating above 100 °C",
                validity: TO_100_C,
            },
        }
    }
}

/// Ambient tensile strength S_u, psi (supplier burst chart).
fn tensile_psi(m: Material) -> Option<f64> {
    match m {
        Material::Ptfe => Some(2_500.0),
        Material::Fep => Some(3_000.0),
        Material::Pfa => Some(4_000.0),
        Material::Peek => Some(13_300.0),
        Material::Ss316 => None,
    }
}

/// ASME B31.3 allowable working pressure of seamless 316 tube at −28…37 °C by OD and wall
/// (inches), psi, as tabulated on a supplier technical page.
const SS316_TABLE: &[(f64, f64, f64)] = &[
    (0.0625, 0.010, 5_600.0),
    (0.0625, 0.012, 6_800.0),
    (0.0625, 0.014, 8_100.0),
    (0.0625, 0.016, 9_400.0),
    (0.0625, 0.020, 12_000.0),
    (0.125, 0.028, 8_500.0),
    (0.125, 0.035, 10_900.0),
    (0.25, 0.028, 4_000.0),
    (0.25, 0.035, 5_100.0),
    (0.25, 0.049, 7_500.0),
    (0.25, 0.065, 10_200.0),
];

/// Why no rating can be given.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub enum TubingError {
    /// 316 tube of this OD is thinner than every tabulated wall.
    NotTabulated {
        /// The size asked for.
        size: &'static str,
    },
    /// Above the hottest temperature with a rating.
    TooHot {
        /// The material.
        material: &'static str,
        /// Highest temperature with a rating, °C.
        limit_c: f64,
        /// Why the rating stops there.
        why: &'static str,
    },
}

impl std::fmt::Display for TubingError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            TubingError::NotTabulated { size } => {
                write!(f, "no rating: the wall of {size} is thinner than every tabulated 316 wall of its OD; enter the rating of your tube")
            }
            TubingError::TooHot { material, limit_c, why } => write!(
                f,
                "no rating: {material} tubing is not rated above {limit_c} °C here ({why}); use another material or enter a supplier rating for this temperature"
            ),
        }
    }
}

/// A working pressure and how it was reached.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct Rating {
    /// Working pressure at the temperature (gauge).
    pub working_pressure: PressureDifference,
    /// Working pressure at room temperature (gauge).
    pub room_temperature: PressureDifference,
    /// Temperature factor applied.
    pub temperature_factor: f64,
    /// For 316 between tabulated walls: the thinner tabulated wall used, in.
    pub rated_wall_in: Option<f64>,
    /// The temperature below the lowest one covered, if it is.
    pub warnings: Vec<RangeWarning>,
}

/// Room-temperature working pressure (psi) and, for 316 between tabulated walls, the wall used.
fn room_rating(material: Material, size: &Size) -> Result<(f64, Option<f64>), TubingError> {
    if let Some(s_u) = tensile_psi(material) {
        let (o2, i2) = (size.od_in.powi(2), size.id_in.powi(2));
        return Ok((s_u * (o2 - i2) / (o2 + i2) / 4.0, None));
    }
    let wall = (size.od_in - size.id_in) / 2.0;
    // The thickest tabulated wall not thicker than this one (same OD); 1e-4 in absorbs rounding.
    SS316_TABLE
        .iter()
        .filter(|(od, w, _)| (od - size.od_in).abs() < 1e-6 && *w <= wall + 1e-4)
        .max_by(|a, b| a.1.total_cmp(&b.1))
        .map(|&(_, w, psi)| (psi, ((w - wall).abs() > 1e-4).then_some(w)))
        .ok_or(TubingError::NotTabulated { size: size.key })
}

/// The rating of `material` tubing of `size` at `t`, with how it was reached.
pub fn rating(material: Material, size: &Size, t: Temperature) -> Result<Rating, TubingError> {
    let (room_psi, rated_wall_in) = room_rating(material, size)?;
    let factor = material.temperature_factor(t).ok_or_else(|| {
        let (limit_c, why) = derating::limit(material);
        TubingError::TooHot { material: material.name(), limit_c, why }
    })?;
    let info = material.info();
    let warnings = info.validity.iter().filter_map(|b| b.check(t.kelvin(), &info)).collect();
    Ok(Rating {
        working_pressure: PressureDifference::from_si(room_psi * factor * PSI),
        room_temperature: PressureDifference::from_si(room_psi * PSI),
        temperature_factor: factor,
        rated_wall_in,
        warnings,
    })
}

/// Working pressure (gauge) of `material` tubing of `size` at `t`, with a warning below the
/// lowest temperature covered.
pub fn working_pressure(material: Material, size: &Size, t: Temperature) -> Result<(PressureDifference, Vec<RangeWarning>), TubingError> {
    rating(material, size, t).map(|r| (r.working_pressure, r.warnings))
}

/// Chemical-compatibility flag for a material with a named solvent, if one is known (PEEK
/// swells or weakens in THF, DCM and DMSO, supplier technical pages).
pub fn compatibility(material: Material, solvent: Option<super::fluids::Solvent>) -> Option<&'static str> {
    use super::fluids::Solvent;
    match (material, solvent?) {
        (Material::Peek, Solvent::Thf | Solvent::Dichloromethane | Solvent::Dmso) => {
            Some("PEEK swells and weakens in THF, dichloromethane and DMSO (supplier compatibility tables): its rating does not hold; use fluoropolymer or stainless tubing.")
        }
        _ => None,
    }
}

/// The tubing of a line chosen from the table, at its temperature.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct TubingChoice {
    /// Material.
    pub material: Material,
    /// Size.
    pub size: Size,
    /// Temperature of the tubing.
    pub temperature: Temperature,
}

/// Reads the tubing choice: `Some(None)` when the table is not used, `None` on an input error.
pub fn read(src: &dyn super::form::FieldSource, c: &mut super::form::Collector, temperature: &super::input::FieldSpec) -> Option<Option<TubingChoice>> {
    match c.take(src.choice(&MATERIAL))? {
        0 => Some(None),
        i => {
            let size = c.take(src.choice(&SIZE));
            let t = c.take(src.quantity(temperature));
            let (size, t) = (size?, t?);
            Some(Some(TubingChoice {
                material: *Material::ALL.get(i - 1)?,
                size: *SIZES.get(size)?,
                temperature: Temperature::from_kelvin(t),
            }))
        }
    }
}

const HOT_TUBING_CAUTION: &str = "Pressurised tubing near its rating can burst and spray hot, possibly toxic liquid; polymer \
tubing loses strength quickly when hot. Stay below the rating at temperature, shield hot pressurised lines, set a pump \
pressure limit, and follow local codes and institutional rules.";

/// The check of the line's inlet pressure (gauge) against the tubing's working pressure at its
/// temperature, with a compatibility flag for the liquid.
pub fn check(choice: &TubingChoice, inlet: PressureDifference, solvents: &[super::fluids::Solvent]) -> super::report::Check {
    use super::report::{Check, Verdict};
    use super::units::format_significant;
    let size = SIZE.options.iter().find(|o| o.0 == choice.size.key).map_or(choice.size.key, |o| o.1);
    let what = format!("{} {size}", choice.material.name());
    let t = format_significant(choice.temperature.celsius(), 3);
    let (verdict, mut reason, mut caution) = match rating(choice.material, &choice.size, choice.temperature) {
        Ok(r) => {
            let ratio = inlet.si() / r.working_pressure.si();
            let verdict = super::report::budget_verdict(ratio, ratio);
            let wall = r.rated_wall_in.map_or(String::new(), |w| {
                format!(
                    "; rated as the next thinner tabulated wall, {}″ (conservative: this wall is not in the ASME B31.3 table)",
                    format_significant(w, 2)
                )
            });
            let info = choice.material.info();
            (
                verdict,
                format!(
                    "{what} at {t} °C: working pressure {} bar(g) = {} bar(g) at room temperature ({}{wall}) × temperature factor {} (source: {}); the inlet pressure {} bar(g) is {:.0} % of it{}.",
                    format_significant(r.working_pressure.bar(), 3),
                    format_significant(r.room_temperature.bar(), 3),
                    info.name,
                    format_significant(r.temperature_factor, 2),
                    info.source,
                    format_significant(inlet.bar(), 3),
                    ratio * 100.0,
                    if verdict == Verdict::Caution { " (less than 20 % margin: common practice, no source)" } else { "" }
                ),
                (verdict != Verdict::Fine).then(|| HOT_TUBING_CAUTION.to_owned()),
            )
        }
        Err(e) => (Verdict::Problem, format!("{what} at {t} °C: {e}."), Some(HOT_TUBING_CAUTION.to_owned())),
    };
    let mut verdict = verdict;
    for &solvent in solvents {
        if let Some(note) = compatibility(choice.material, Some(solvent)) {
            reason.push(' ');
            reason.push_str(note);
            verdict = verdict.max(Verdict::Problem);
            caution.get_or_insert_with(|| HOT_TUBING_CAUTION.to_owned());
        }
    }
    reason.push(' ');
    reason.push_str(choice.material.light_note());
    Check { key: "tubing_rating", topic: "Tubing at temperature", verdict, reason, caution }
}

/// Says so in the tubing check when the entered bore is not the chosen tubing's bore (more than
/// 2 % apart, a tolerance of this tool, no source): the calculation follows the entered bore, the
/// rating the chosen tubing.
pub fn note_bore_mismatch(choice: &TubingChoice, bore: super::units::Length, check: &mut super::report::Check) {
    use super::units::format_significant;
    let table = choice.size.id_in * 0.0254;
    if (bore.si() / table - 1.0).abs() > 0.02 {
        check.reason.push_str(&format!(
            " The entered bore ({} mm) is not this tubing's bore ({} mm): volume and pressure drop use the entered one.",
            format_significant(bore.si() * 1e3, 3),
            format_significant(table * 1e3, 3)
        ));
        if check.verdict == super::report::Verdict::Fine {
            check.verdict = super::report::Verdict::Caution;
        }
    }
}
