//! Input fields: what each accepts, and the one place where typed text becomes a validated SI
//! value or an error naming the field, the value and the allowed range.

use serde::Serialize;

use super::units::{Dimension, NumberError, Unit, format_significant, parse_entry, unit_by_symbol};

/// The physically possible values of a field, in SI.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Allowed {
    /// Lower limit, SI.
    pub low: f64,
    /// Whether the lower limit itself is allowed.
    pub low_inclusive: bool,
    /// Upper limit, SI, if any.
    pub high: Option<f64>,
    /// Whether the upper limit itself is allowed.
    pub high_inclusive: bool,
    /// Whether only whole numbers make sense (counts).
    pub whole: bool,
}

impl Allowed {
    /// Strictly positive.
    pub const POSITIVE: Allowed =
        Allowed { low: 0.0, low_inclusive: false, high: None, high_inclusive: false, whole: false };
    /// Above zero, up to and including one (yields).
    pub const UNIT_FRACTION: Allowed =
        Allowed { low: 0.0, low_inclusive: false, high: Some(1.0), high_inclusive: true, whole: false };
    /// Whole numbers from one.
    pub const COUNT: Allowed =
        Allowed { low: 1.0, low_inclusive: true, high: None, high_inclusive: false, whole: true };

    /// Strictly positive, up to and including `high` (SI).
    pub const fn positive_up_to(high: f64) -> Allowed {
        Allowed { low: 0.0, low_inclusive: false, high: Some(high), high_inclusive: true, whole: false }
    }

    /// Zero or more, up to and including `high` (SI).
    pub const fn non_negative_up_to(high: f64) -> Allowed {
        Allowed { low: 0.0, low_inclusive: true, high: Some(high), high_inclusive: true, whole: false }
    }

    /// From `low` to `high`, both included (SI).
    pub const fn between(low: f64, high: f64) -> Allowed {
        Allowed { low, low_inclusive: true, high: Some(high), high_inclusive: true, whole: false }
    }

    fn admits(&self, v: f64) -> bool {
        let above = if self.low_inclusive { v >= self.low } else { v > self.low };
        let below = match self.high {
            Some(h) if self.high_inclusive => v <= h,
            Some(h) => v < h,
            None => true,
        };
        above && below && (!self.whole || v.fract() == 0.0)
    }

    /// The range in words, in the unit the user typed.
    pub fn describe(&self, unit: Unit) -> String {
        let show = |si: f64| {
            let v = format_significant(unit.from_si(si), 6);
            // Trailing zeros dropped, of the mantissa in exponent form (1e-8, not 1.00000e-8).
            let (mantissa, exponent) = v.split_once('e').map_or((v.as_str(), None), |(m, e)| (m, Some(e)));
            let mantissa = if mantissa.contains('.') { mantissa.trim_end_matches('0').trim_end_matches('.') } else { mantissa };
            let v = exponent.map_or_else(|| mantissa.to_owned(), |e| format!("{mantissa}e{e}"));
            if unit.symbol.is_empty() { v } else { format!("{v} {}", unit.symbol) }
        };
        let low = format!("{} {}", if self.low_inclusive { "≥" } else { ">" }, show(self.low));
        let mut text = match self.high {
            Some(h) => format!("{low} and {} {}", if self.high_inclusive { "≤" } else { "<" }, show(h)),
            None => low,
        };
        if self.whole {
            text.push_str(", whole number");
        }
        text
    }
}

/// The largest and smallest entries a laboratory flow setup can have, SI. They are sanity bounds,
/// far beyond ordinary use, so that a slip of a finger (1e30, 1e-300, a unit mixed up by 10⁶) gets a
/// message at its field instead of a result: common practice, no source. The smallest ends keep
/// what follows from an entry finite (a share of a rating of 10⁻²⁷⁷ bar overflowed to "inf %");
/// each lies below anything measured in a laboratory and no higher than 10⁻⁹ of the largest,
/// except where a physical floor is higher (a molar mass of 1 g/mol).
pub mod lab {
    use super::Allowed;

    /// Liquid flow: 1 nL/min (nanofluidics) to 1 L/min (beyond preparative pumps).
    pub const LIQUID_FLOW: Allowed = Allowed::between(1e-12 / 60.0, 1e-3 / 60.0);
    /// Gas flow at a reference state: 0.1 nL/min (next to no gas) to 100 L/min.
    pub const GAS_FLOW: Allowed = Allowed::between(1e-13 / 60.0, 0.1 / 60.0);
    /// Bore of a tube, cartridge, fitting or frit: 10 nm (about where continuum flow ends) to 100 mm.
    pub const BORE: Allowed = Allowed::between(1e-8, 0.1);
    /// Length of tubing or a coil: 1 µm to 1 km.
    pub const TUBE_LENGTH: Allowed = Allowed::between(1e-6, 1000.0);
    /// Length of a packed bed: 1 µm to 2 m.
    pub const BED_LENGTH: Allowed = Allowed::between(1e-6, 2.0);
    /// Particle size: 1 nm (a cluster of a few molecules) to 20 mm.
    pub const PARTICLE_SIZE: Allowed = Allowed::between(1e-9, 0.02);
    /// Gauge pressure, rating or pressure limit: 1 Pa (0.01 mbar) to 1000 bar.
    pub const PRESSURE: Allowed = Allowed::between(1.0, 1e8);
    /// Back-pressure (may be zero): 1000 bar.
    pub const BACK_PRESSURE: Allowed = Allowed::non_negative_up_to(1e8);
    /// Absolute pressure of a reference state: 0.1–1000 bar.
    pub const ABSOLUTE_PRESSURE: Allowed = Allowed::between(1e4, 1e8);
    /// Working temperature: −100 to 350 °C.
    pub const TEMPERATURE: Allowed = Allowed::between(173.15, 623.15);
    /// Reference temperature of a gas-flow reading: −50 to 100 °C.
    pub const REFERENCE_TEMPERATURE: Allowed = Allowed::between(223.15, 373.15);
    /// Amount concentration: 1 µmol/L to 30 mol/L (above any neat liquid's own).
    pub const CONCENTRATION: Allowed = Allowed::between(1e-3, 3e4);
    /// Density of a liquid: 300–3000 kg/m³.
    pub const LIQUID_DENSITY: Allowed = Allowed::between(300.0, 3000.0);
    /// Density of a solid: 0.1 kg/m³ (below the lightest aerogels) to 25 000 kg/m³ (osmium is 22 600).
    pub const SOLID_DENSITY: Allowed = Allowed::between(0.1, 25_000.0);
    /// Dynamic viscosity of a liquid: 10⁻⁷ Pa·s (a hundredth of a gas's; no fluid is thinner) to
    /// 10 Pa·s (ten times glycerol at 20 °C).
    pub const VISCOSITY: Allowed = Allowed::between(1e-7, 10.0);
    /// Surface tension: 1 µN/m (an interface near its critical point) to 1 N/m (above mercury's 0.49).
    pub const SURFACE_TENSION: Allowed = Allowed::between(1e-6, 1.0);
    /// Molar mass: 1 g/mol (a hydrogen atom) to 10⁶ g/mol.
    pub const MOLAR_MASS: Allowed = Allowed::between(1e-3, 1000.0);
    /// Mass of solid in a cartridge: 1 µg to 10 kg.
    pub const MASS: Allowed = Allowed::between(1e-9, 10.0);
    /// A target time: 1 ms to 100 h.
    pub const DURATION: Allowed = Allowed::between(1e-3, 3.6e5);
    /// Volume of a reservoir: 1 nL to 100 L.
    pub const RESERVOIR: Allowed = Allowed::between(1e-12, 0.1);
    /// Loading of a supported reagent: 1 nmol/g to 50 mmol/g.
    pub const LOADING: Allowed = Allowed::between(1e-6, 50.0);
    /// Moles of one species per mole of another: 10⁻⁶ to 1000.
    pub const RATIO: Allowed = Allowed::between(1e-6, 1000.0);
    /// Diffusivity in a liquid: 10⁻¹⁵ m²/s (far below a large molecule's in a viscous liquid) to
    /// 10⁻⁶ m²/s (a gas's own is about 10⁻⁵).
    pub const DIFFUSIVITY: Allowed = Allowed::between(1e-15, 1e-6);
    /// Molar flow (a rate the chemistry needs): 1 nmol/min to 1 mol/min.
    pub const MOLAR_FLOW: Allowed = Allowed::between(1e-9 / 60.0, 1.0 / 60.0);
    /// Drive force of a syringe pump: 1 N to 100 kN.
    pub const FORCE: Allowed = Allowed::between(1.0, 1e5);
    /// Passes round a loop: 10 000.
    pub const PASSES: Allowed = Allowed { low: 1.0, low_inclusive: true, high: Some(1e4), high_inclusive: true, whole: true };
}

/// An input field of a calculator.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct FieldSpec {
    /// Stable key used in case files, the page (`data-testid`) and error messages.
    pub key: &'static str,
    /// Label for people.
    pub label: &'static str,
    /// Kind of quantity (fixes the accepted units).
    pub dimension: Dimension,
    /// Physically possible values.
    pub allowed: Allowed,
    /// One-line explanation shown with the field.
    pub help: &'static str,
}

/// An impossible or unreadable input, naming the field, what was given and what is allowed.
#[derive(Debug, Clone, PartialEq, Eq, Serialize)]
pub struct InputError {
    /// The field's key.
    pub field: &'static str,
    /// The field's label.
    pub label: &'static str,
    /// What was given, as typed, with its unit.
    pub given: String,
    /// What is wrong and what is allowed.
    pub problem: String,
}

impl std::fmt::Display for InputError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        write!(f, "{} ({}): {} — {}", self.label, self.field, self.given, self.problem)
    }
}

impl std::error::Error for InputError {}

/// A field spec, for the calculators' field tables.
pub const fn field(key: &'static str, label: &'static str, dimension: Dimension, allowed: Allowed, help: &'static str) -> FieldSpec {
    FieldSpec { key, label, dimension, allowed, help }
}

impl FieldSpec {
    fn error(&self, given: String, problem: String) -> InputError {
        InputError { field: self.key, label: self.label, given, problem }
    }

    /// Looks up a unit symbol among this field's units.
    pub fn unit(&self, symbol: &str) -> Result<Unit, InputError> {
        unit_by_symbol(self.dimension, symbol).ok_or_else(|| {
            let known: Vec<&str> = self.dimension.units().iter().map(|u| u.symbol).collect();
            self.error(format!("unit \"{symbol}\""), format!("unknown unit; use one of {}", known.join(", ")))
        })
    }

    /// Validates a number given in `unit`; returns the SI value.
    pub fn accept(&self, value: f64, unit: Unit) -> Result<f64, InputError> {
        // Very large or small numbers as written in exponent form (1e30, not thirty-one digits).
        let number = if value != 0.0 && !(1e-4..1e7).contains(&value.abs()) { format!("{value:e}") } else { value.to_string() };
        let given = || format!("{number} {}", unit.symbol).trim_end().to_owned();
        if !value.is_finite() {
            return Err(self.error(given(), NumberError::NotFinite.to_string()));
        }
        let si = unit.to_si(value);
        if !si.is_finite() {
            return Err(self.error(given(), NumberError::NotFinite.to_string()));
        }
        if !self.allowed.admits(si) {
            return Err(self.error(given(), format!("allowed: {}", self.allowed.describe(unit))));
        }
        Ok(si)
    }

    /// Reads typed text in `unit`; returns the SI value (of the nominal value, for a range).
    pub fn read(&self, text: &str, unit: Unit) -> Result<f64, InputError> {
        self.read_typed(text, unit).map(|t| t.si)
    }

    /// Reads typed text in `unit`: a number, or a range (`0.36–0.42`, `50 ± 20 %`) whose ends
    /// must both be allowed.
    pub fn read_typed(&self, text: &str, unit: Unit) -> Result<Typed, InputError> {
        match parse_entry(text) {
            Ok((value, range)) => Ok(Typed { value, range, si: self.accept_range(value, range, unit)? }),
            Err(e) => {
                let shown = if text.trim().is_empty() { "(empty)".to_owned() } else { format!("\"{}\"", text.trim()) };
                Err(self.error(shown, e.to_string()))
            }
        }
    }

    /// Validates a value with an optional range `[low, high]` around it, all in `unit`: each end
    /// must be allowed and the value must lie between them. Returns the value in SI.
    pub fn accept_range(&self, value: f64, range: Option<[f64; 2]>, unit: Unit) -> Result<f64, InputError> {
        if let Some([low, high]) = range {
            for (end, v) in [("low", low), ("high", high)] {
                self.accept(v, unit).map_err(|e| InputError { problem: format!("the range's {end} end: {}", e.problem), ..e })?;
            }
            if !(low <= value && value <= high) {
                let show = |v: f64| format!("{} {}", format_significant(v, 4), unit.symbol).trim_end().to_owned();
                return Err(self.error(show(value), format!("must lie within its range, {}–{}", show(low), show(high))));
            }
        }
        self.accept(value, unit)
    }
}

/// A typed entry read in its unit: the value used for the main results, and the range around it
/// when one was given.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Typed {
    /// The nominal value, in the entry's unit.
    pub value: f64,
    /// Lowest and highest value, in the entry's unit, when a range was typed.
    pub range: Option<[f64; 2]>,
    /// The nominal value in SI.
    pub si: f64,
}

/// Entries that must rise in the order given (d10 < d50 < d90): an error at each entry that is
/// not above the one before it, naming that one, in `unit` (already-validated SI values).
pub fn increasing(entries: &[(&FieldSpec, f64)], unit: Unit) -> Vec<InputError> {
    entries
        .windows(2)
        .filter(|w| w[1].1 <= w[0].1)
        .map(|w| {
            let (before, low) = w[0];
            let (spec, value) = w[1];
            let show = |si: f64| format!("{} {}", format_significant(unit.from_si(si), 4), unit.symbol).trim_end().to_owned();
            spec.error(show(value), format!("must be above {} ({})", before.label, show(low)))
        })
        .collect()
}

