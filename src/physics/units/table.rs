//! The lab units each kind of quantity accepts, with factors to SI, and the parser for typed
//! numbers. Factors: NIST Special Publication 811 (2008 ed.), Appendix B.8/B.9; the litre, minute,
//! hour and bar are exact SI-accepted units.

use serde::Serialize;

/// A unit of entry or display: `value_si = value * factor + offset`.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Unit {
    /// Symbol as shown and as written in case files, e.g. `mL/min`.
    pub symbol: &'static str,
    /// SI value of one unit (multiplicative part).
    pub factor: f64,
    /// Additive part of the conversion to SI (non-zero only for temperature scales).
    pub offset: f64,
}

impl Unit {
    const fn scale(symbol: &'static str, factor: f64) -> Self {
        Self { symbol, factor, offset: 0.0 }
    }

    /// Converts a value in this unit to SI.
    pub fn to_si(&self, value: f64) -> f64 {
        value * self.factor + self.offset
    }

    /// Converts an SI value to this unit.
    pub fn from_si(&self, si: f64) -> f64 {
        (si - self.offset) / self.factor
    }
}

/// The kind of a quantity, which fixes the units it may be entered and shown in.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum Dimension {
    /// Lengths and diameters (SI: m).
    Length,
    /// Volumes (SI: m³).
    Volume,
    /// Liquid volumetric flow (SI: m³/s).
    VolumetricFlow,
    /// Time spans (SI: s).
    Duration,
    /// Pressure differences and gauge pressures (SI: Pa).
    PressureDifference,
    /// Absolute pressure (SI: Pa).
    Pressure,
    /// Temperature (SI: K).
    Temperature,
    /// Surface tension (SI: N/m).
    SurfaceTension,
    /// Molecular diffusivity (SI: m²/s).
    Diffusivity,
    /// Dynamic viscosity (SI: Pa·s).
    DynamicViscosity,
    /// Mass density (SI: kg/m³).
    Density,
    /// Amount concentration (SI: mol/m³).
    Concentration,
    /// Molar mass (SI: kg/mol).
    MolarMass,
    /// Mass (SI: kg).
    Mass,
    /// Amount of substance (SI: mol).
    Amount,
    /// Amount per mass of solid, a loading (SI: mol/kg, numerically mmol/g).
    SpecificAmount,
    /// Rates per time such as space velocities (SI: 1/s).
    Frequency,
    /// Mass flow (SI: kg/s).
    MassFlow,
    /// Amount-of-substance flow, e.g. gas fed or taken up (SI: mol/s).
    MolarFlow,
    /// Mass produced per time per reactor volume (SI: kg s⁻¹ m⁻³).
    SpaceTimeYield,
    /// Velocity (SI: m/s).
    Velocity,
    /// Fractions such as yields (SI: 1).
    Fraction,
    /// Pure numbers: counts, Reynolds numbers (SI: 1).
    Number,
    /// Force, e.g. a syringe drive's thrust (SI: N).
    Force,
}

const MINUTE: f64 = 60.0;
const HOUR: f64 = 3600.0;
const LITRE: f64 = 1e-3;
// NIST SP 811 B.8: inch = 2.54 E-02 m (exact); pound-force per square inch = 6.894 757 E+03 Pa;
// standard atmosphere = 1.013 25 E+05 Pa (exact); centipoise = 1.0 E-03 Pa·s (exact).
const INCH: f64 = 2.54e-2;
const PSI: f64 = 6.894_757e3;
// NIST SP 811 B.8: pound-force = 4.448 222 E+00 N.
const POUND_FORCE: f64 = 4.448_222;
const ATM: f64 = 1.013_25e5;

const LENGTH: &[Unit] = &[
    Unit::scale("mm", 1e-3),
    Unit::scale("µm", 1e-6),
    Unit::scale("cm", 1e-2),
    Unit::scale("m", 1.0),
    Unit::scale("in", INCH),
];
const VOLUME: &[Unit] = &[
    Unit::scale("mL", 1e-3 * LITRE),
    Unit::scale("µL", 1e-6 * LITRE),
    Unit::scale("L", LITRE),
    Unit::scale("m³", 1.0),
];
const FLOW: &[Unit] = &[
    Unit::scale("mL/min", 1e-3 * LITRE / MINUTE),
    Unit::scale("µL/min", 1e-6 * LITRE / MINUTE),
    Unit::scale("mL/h", 1e-3 * LITRE / HOUR),
    Unit::scale("L/h", LITRE / HOUR),
    Unit::scale("m³/s", 1.0),
];
const DURATION: &[Unit] = &[
    Unit::scale("min", MINUTE),
    Unit::scale("s", 1.0),
    Unit::scale("h", HOUR),
    Unit::scale("ms", 1e-3),
];
const PRESSURE: &[Unit] = &[
    Unit::scale("bar", 1e5),
    Unit::scale("mbar", 1e2),
    Unit::scale("kPa", 1e3),
    Unit::scale("MPa", 1e6),
    Unit::scale("psi", PSI),
    Unit::scale("atm", ATM),
    Unit::scale("Pa", 1.0),
];
const ABSOLUTE_PRESSURE: &[Unit] = &[
    Unit::scale("bar", 1e5),
    Unit::scale("kPa", 1e3),
    Unit::scale("MPa", 1e6),
    Unit::scale("psi", PSI),
    Unit::scale("atm", ATM),
    Unit::scale("Pa", 1.0),
];
const TEMPERATURE: &[Unit] = &[Unit { symbol: "°C", factor: 1.0, offset: 273.15 }, Unit::scale("K", 1.0)];
const SURFACE_TENSION: &[Unit] = &[Unit::scale("mN/m", 1e-3), Unit::scale("N/m", 1.0)];
const DIFFUSIVITY: &[Unit] = &[Unit::scale("cm²/s", 1e-4), Unit::scale("m²/s", 1.0)];
const VISCOSITY: &[Unit] = &[
    Unit::scale("mPa·s", 1e-3),
    Unit::scale("cP", 1e-3),
    Unit::scale("Pa·s", 1.0),
];
const DENSITY: &[Unit] = &[Unit::scale("g/mL", 1e3), Unit::scale("kg/m³", 1.0)];
const CONCENTRATION: &[Unit] = &[
    Unit::scale("mol/L", 1e3),
    Unit::scale("mmol/L", 1.0),
    Unit::scale("mol/m³", 1.0),
];
const MOLAR_MASS: &[Unit] = &[Unit::scale("g/mol", 1e-3), Unit::scale("kg/mol", 1.0)];
const MASS: &[Unit] = &[Unit::scale("g", 1e-3), Unit::scale("mg", 1e-6), Unit::scale("kg", 1.0)];
const AMOUNT: &[Unit] = &[Unit::scale("mmol", 1e-3), Unit::scale("µmol", 1e-6), Unit::scale("mol", 1.0)];
const SPECIFIC_AMOUNT: &[Unit] = &[Unit::scale("mmol/g", 1.0), Unit::scale("µmol/g", 1e-3), Unit::scale("mol/kg", 1.0)];
const FREQUENCY: &[Unit] = &[Unit::scale("1/h", 1.0 / HOUR), Unit::scale("1/min", 1.0 / MINUTE), Unit::scale("1/s", 1.0)];
const MASS_FLOW: &[Unit] = &[
    Unit::scale("g/h", 1e-3 / HOUR),
    Unit::scale("mg/min", 1e-6 / MINUTE),
    Unit::scale("kg/h", 1.0 / HOUR),
    Unit::scale("kg/s", 1.0),
];
const MOLAR_FLOW: &[Unit] = &[
    Unit::scale("mmol/min", 1e-3 / MINUTE),
    Unit::scale("µmol/min", 1e-6 / MINUTE),
    Unit::scale("mmol/h", 1e-3 / HOUR),
    Unit::scale("mol/s", 1.0),
];
const SPACE_TIME_YIELD: &[Unit] = &[
    Unit::scale("g/(h·L)", 1e-3 / HOUR / LITRE),
    Unit::scale("kg/(h·L)", 1.0 / HOUR / LITRE),
    Unit::scale("kg/(s·m³)", 1.0),
];
const VELOCITY: &[Unit] = &[
    Unit::scale("mm/s", 1e-3),
    Unit::scale("µm/s", 1e-6),
    Unit::scale("cm/s", 1e-2),
    Unit::scale("m/s", 1.0),
];
const FRACTION: &[Unit] = &[Unit::scale("%", 1e-2), Unit::scale("fraction", 1.0)];
const NUMBER: &[Unit] = &[Unit::scale("", 1.0)];
const FORCE: &[Unit] = &[Unit::scale("N", 1.0), Unit::scale("kN", 1e3), Unit::scale("lbf", POUND_FORCE)];

impl Dimension {
    /// The units this kind of quantity can be entered or shown in; the first is the lab default.
    pub fn units(self) -> &'static [Unit] {
        match self {
            Dimension::Length => LENGTH,
            Dimension::Volume => VOLUME,
            Dimension::VolumetricFlow => FLOW,
            Dimension::Duration => DURATION,
            Dimension::PressureDifference => PRESSURE,
            Dimension::Pressure => ABSOLUTE_PRESSURE,
            Dimension::Temperature => TEMPERATURE,
            Dimension::SurfaceTension => SURFACE_TENSION,
            Dimension::Diffusivity => DIFFUSIVITY,
            Dimension::DynamicViscosity => VISCOSITY,
            Dimension::Density => DENSITY,
            Dimension::Concentration => CONCENTRATION,
            Dimension::MolarMass => MOLAR_MASS,
            Dimension::Mass => MASS,
            Dimension::Amount => AMOUNT,
            Dimension::SpecificAmount => SPECIFIC_AMOUNT,
            Dimension::Frequency => FREQUENCY,
            Dimension::MassFlow => MASS_FLOW,
            Dimension::MolarFlow => MOLAR_FLOW,
            Dimension::SpaceTimeYield => SPACE_TIME_YIELD,
            Dimension::Velocity => VELOCITY,
            Dimension::Fraction => FRACTION,
            Dimension::Number => NUMBER,
            Dimension::Force => FORCE,
        }
    }

    /// The lab default unit (first of [`Dimension::units`]).
    pub fn default_unit(self) -> Unit {
        self.units()[0]
    }

    /// The units a value of this kind is shown in when its size decides, in order of preference
    /// (metric lab units only; psi, atm, inches and the like stay available to pick by hand).
    fn display_ladder(self) -> &'static [&'static str] {
        match self {
            Dimension::Length => &["mm", "µm", "m"],
            Dimension::Volume => &["mL", "µL", "L"],
            Dimension::VolumetricFlow => &["mL/min", "µL/min", "L/h"],
            Dimension::Duration => &["min", "s", "h", "ms"],
            Dimension::PressureDifference => &["bar", "mbar", "Pa", "MPa"],
            Dimension::Pressure => &["bar", "kPa", "MPa"],
            Dimension::Concentration => &["mol/L", "mmol/L"],
            Dimension::Mass => &["g", "mg", "kg"],
            Dimension::Amount => &["mmol", "µmol", "mol"],
            Dimension::SpecificAmount => &["mmol/g", "µmol/g"],
            Dimension::Frequency => &["1/h", "1/min", "1/s"],
            Dimension::MassFlow => &["g/h", "mg/min", "kg/h"],
            Dimension::Velocity => &["mm/s", "µm/s", "m/s"],
            Dimension::DynamicViscosity => &["mPa·s", "Pa·s"],
            _ => &[],
        }
    }

    /// The unit a value of `si` reads best in: the first unit of the display ladder in which it
    /// lies between 0.1 and 10 000 (µm for 0.17 µm, not "1.7e-4 mm"; s for 0.17 s, not
    /// "0.0028 min"), else the one that brings it closest to that band; the lab default for kinds
    /// with one useful unit and for zero.
    pub fn display_unit(self, si: f64) -> Unit {
        let ladder: Vec<Unit> = self.display_ladder().iter().filter_map(|s| unit_by_symbol(self, s)).collect();
        let magnitude = si.abs();
        if ladder.is_empty() || magnitude == 0.0 || !magnitude.is_finite() {
            return self.default_unit();
        }
        let distance = |u: &Unit| {
            let v = u.from_si(magnitude).abs();
            if v < 0.1 { (0.1 / v).log10() } else if v >= 1e4 { (v / 1e4).log10() } else { 0.0 }
        };
        ladder
            .iter()
            .find(|u| distance(u) == 0.0)
            .copied()
            .unwrap_or_else(|| ladder.iter().copied().min_by(|a, b| distance(a).total_cmp(&distance(b))).unwrap_or(self.default_unit()))
    }

    /// `si` shown in the unit its size calls for, to `sig` significant figures, with the symbol.
    pub fn show(self, si: f64, sig: usize) -> String {
        let unit = self.display_unit(si);
        let number = super::format_significant(unit.from_si(si), sig);
        if unit.symbol.is_empty() { number } else { format!("{number} {}", unit.symbol) }
    }

    /// The SI unit symbol, for machine-readable output.
    pub fn si_symbol(self) -> &'static str {
        match self {
            Dimension::Length => "m",
            Dimension::Volume => "m³",
            Dimension::VolumetricFlow => "m³/s",
            Dimension::Duration => "s",
            Dimension::PressureDifference => "Pa",
            Dimension::Pressure => "Pa",
            Dimension::Temperature => "K",
            Dimension::SurfaceTension => "N/m",
            Dimension::Diffusivity => "m²/s",
            Dimension::DynamicViscosity => "Pa·s",
            Dimension::Density => "kg/m³",
            Dimension::Concentration => "mol/m³",
            Dimension::MolarMass => "kg/mol",
            Dimension::Mass => "kg",
            Dimension::Amount => "mol",
            Dimension::SpecificAmount => "mol/kg",
            Dimension::Frequency => "1/s",
            Dimension::MassFlow => "kg/s",
            Dimension::MolarFlow => "mol/s",
            Dimension::SpaceTimeYield => "kg/(s·m³)",
            Dimension::Velocity => "m/s",
            Dimension::Fraction | Dimension::Number => "1",
            Dimension::Force => "N",
        }
    }
}

/// Finds the unit with this symbol among the units of `dimension`. `u` is accepted for `µ`.
pub fn unit_by_symbol(dimension: Dimension, symbol: &str) -> Option<Unit> {
    let wanted = symbol.trim().replace(['u', 'μ'], "µ");
    dimension
        .units()
        .iter()
        .copied()
        .find(|u| u.symbol == symbol.trim() || u.symbol == wanted)
}

/// Why typed text is not a number.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum NumberError {
    /// Nothing was typed.
    Empty,
    /// The text is not a decimal number.
    NotANumber,
    /// A decimal comma: refused rather than guessed, since `1,000` could mean one or a thousand.
    Comma,
    /// The number overflows a double (for example `1e400`).
    NotFinite,
    /// A range written high end first (`0.42–0.36`).
    Reversed,
}

impl std::fmt::Display for NumberError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        f.write_str(match self {
            NumberError::Empty => "enter a number",
            NumberError::NotANumber => "not a number",
            NumberError::Comma => "use a decimal point, not a comma",
            NumberError::NotFinite => "number too large to use",
            NumberError::Reversed => "a range is written low end first, e.g. 0.36–0.42",
        })
    }
}

/// Parses a typed decimal number (`12`, `0.8`, `1e-3`). Never substitutes a default.
pub fn parse_number(text: &str) -> Result<f64, NumberError> {
    let t = text.trim();
    if t.is_empty() {
        return Err(NumberError::Empty);
    }
    if t.contains(',') {
        return Err(NumberError::Comma);
    }
    // Rust also accepts "inf" and "NaN"; those are not numbers a user means.
    if !t.bytes().all(|b| b.is_ascii_digit() || b"+-.eE".contains(&b)) {
        return Err(NumberError::NotANumber);
    }
    let v: f64 = t.parse().map_err(|_| NumberError::NotANumber)?;
    if v.is_finite() { Ok(v) } else { Err(NumberError::NotFinite) }
}

/// A range typed for an entry (in the entry's unit): `0.36–0.42`, `0.36 to 0.42`, `0.36..0.42`,
/// `25 ± 20 %` (relative), `25 ± 5` (absolute). The nominal value is the midpoint of a from–to
/// range and the centre of a ± range.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TypedRange {
    /// The value the main results use.
    pub nominal: f64,
    /// Lowest value.
    pub low: f64,
    /// Highest value.
    pub high: f64,
}


/// Reads `text` as a range: `None` when it is not written as one (a plain number, or anything
/// else, is for [`parse_number`]); `Some(Err)` when it is a range with a bad part or its ends
/// reversed.
pub fn parse_range(text: &str) -> Option<Result<TypedRange, NumberError>> {
    let t = text.trim();
    for sep in ["±", "+/-", "+-"] {
        if let Some((centre, spread)) = t.split_once(sep) {
            let relative = spread.trim_end().ends_with('%');
            let spread = spread.trim().trim_end_matches('%');
            return Some((|| {
                let c = parse_number(centre)?;
                let d = parse_number(spread)?;
                let half = if relative { (c * d / 100.0).abs() } else { d.abs() };
                if !half.is_finite() {
                    return Err(NumberError::NotFinite);
                }
                Ok(TypedRange { nominal: c, low: c - half, high: c + half })
            })());
        }
    }
    let split = ["–", "—", " to ", ".."].iter().find_map(|sep| t.split_once(sep)).or_else(|| {
        // A hyphen between two numbers: not a leading sign, not an exponent's sign.
        let bytes = t.as_bytes();
        (1..bytes.len())
            .find(|&i| bytes[i] == b'-' && !matches!(bytes[i - 1], b'e' | b'E') && bytes[..i].iter().any(u8::is_ascii_digit))
            .map(|i| (&t[..i], &t[i + 1..]))
    })?;
    Some((|| {
        let low = parse_number(split.0)?;
        let high = parse_number(split.1)?;
        if high < low {
            return Err(NumberError::Reversed);
        }
        Ok(TypedRange { nominal: 0.5 * (low + high), low, high })
    })())
}

/// Reads an entry as typed: a plain number, or a range (see [`parse_range`]). Returns the nominal
/// value and, for a range of some width, its ends `[low, high]`.
pub fn parse_entry(text: &str) -> Result<(f64, Option<[f64; 2]>), NumberError> {
    match parse_range(text) {
        Some(r) => r.map(|r| (r.nominal, (r.high > r.low).then_some([r.low, r.high]))),
        None => parse_number(text).map(|v| (v, None)),
    }
}
