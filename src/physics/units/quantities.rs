//! SI quantity newtypes. Constructors and accessors name their unit; the stored value is SI.

use serde::Serialize;

/// Defines an SI newtype with `from_si` and `si`, serialised as a plain number.
macro_rules! si_quantity {
    ($(#[$doc:meta])* $name:ident, $si:literal) => {
        $(#[$doc])*
        #[derive(Debug, Clone, Copy, PartialEq, PartialOrd, Serialize)]
        #[serde(transparent)]
        pub struct $name(f64);

        impl $name {
            #[doc = concat!("From a value in ", $si, " (SI).")]
            pub const fn from_si(value: f64) -> Self {
                Self(value)
            }
            #[doc = concat!("The value in ", $si, " (SI).")]
            pub const fn si(self) -> f64 {
                self.0
            }
        }
    };
}

/// The newtype pattern of this module, for quantity types defined next to the physics that
/// needs them.
pub(crate) use si_quantity;

si_quantity!(
    /// A length or diameter.
    Length, "m"
);
si_quantity!(
    /// A volume.
    Volume, "m³"
);
si_quantity!(
    /// A volumetric flow rate of liquid at the conditions in the line.
    VolumetricFlow, "m³/s"
);
si_quantity!(
    /// A time span.
    Duration, "s"
);
si_quantity!(
    /// A pressure difference: a pressure drop, or a gauge pressure such as a component rating
    /// (pressure above the surrounding atmosphere).
    PressureDifference, "Pa"
);
si_quantity!(
    /// An absolute pressure (above vacuum).
    Pressure, "Pa"
);
si_quantity!(
    /// A thermodynamic temperature. Enter Celsius through [`Temperature::from_celsius`].
    Temperature, "K"
);
si_quantity!(
    /// A surface or interfacial tension.
    SurfaceTension, "N/m"
);
si_quantity!(
    /// A molecular diffusion coefficient.
    Diffusivity, "m²/s"
);
si_quantity!(
    /// A dynamic viscosity.
    DynamicViscosity, "Pa·s"
);
si_quantity!(
    /// A mass density.
    Density, "kg/m³"
);
si_quantity!(
    /// An amount concentration.
    Concentration, "mol/m³"
);
si_quantity!(
    /// A molar mass.
    MolarMass, "kg/mol"
);
si_quantity!(
    /// A mass flow rate.
    MassFlow, "kg/s"
);
si_quantity!(
    /// A velocity.
    Velocity, "m/s"
);
si_quantity!(
    /// A fraction between 0 and 1 (a yield, a voidage).
    Fraction, "1"
);

impl Length {
    /// From millimetres.
    pub const fn from_mm(mm: f64) -> Self {
        Self(mm * 1e-3)
    }
    /// From metres.
    pub const fn from_m(m: f64) -> Self {
        Self(m)
    }
    /// In metres.
    pub const fn metres(self) -> f64 {
        self.0
    }
    /// In millimetres.
    pub fn mm(self) -> f64 {
        self.0 * 1e3
    }
}

impl Volume {
    /// From millilitres.
    pub fn from_ml(ml: f64) -> Self {
        Self(ml * 1e-6)
    }
    /// In millilitres.
    pub fn ml(self) -> f64 {
        self.0 * 1e6
    }
    /// In litres.
    pub fn litres(self) -> f64 {
        self.0 * 1e3
    }
}

impl VolumetricFlow {
    /// From millilitres per minute.
    pub fn from_ml_per_min(q: f64) -> Self {
        Self(q * 1e-6 / 60.0)
    }
    /// In millilitres per minute.
    pub fn ml_per_min(self) -> f64 {
        self.0 * 60.0e6
    }
}

impl Duration {
    /// From seconds.
    pub const fn from_seconds(s: f64) -> Self {
        Self(s)
    }
    /// In seconds.
    pub const fn seconds(self) -> f64 {
        self.0
    }
    /// In minutes.
    pub fn minutes(self) -> f64 {
        self.0 / 60.0
    }
}

impl PressureDifference {
    /// From bar (1 bar = 10⁵ Pa exactly).
    pub fn from_bar(bar: f64) -> Self {
        Self(bar * 1e5)
    }
    /// In pascals.
    pub const fn pascals(self) -> f64 {
        self.0
    }
    /// In bar.
    pub fn bar(self) -> f64 {
        self.0 / 1e5
    }
}

impl DynamicViscosity {
    /// From millipascal-seconds (= centipoise).
    pub fn from_mpa_s(mpa_s: f64) -> Self {
        Self(mpa_s * 1e-3)
    }
    /// In pascal-seconds.
    pub const fn pa_s(self) -> f64 {
        self.0
    }
}

impl Density {
    /// From kilograms per cubic metre.
    pub const fn from_kg_per_m3(rho: f64) -> Self {
        Self(rho)
    }
    /// In kilograms per cubic metre.
    pub const fn kg_per_m3(self) -> f64 {
        self.0
    }
}

impl Concentration {
    /// From mol/L (1 mol/L = 1000 mol/m³).
    pub fn from_molar(mol_per_l: f64) -> Self {
        Self(mol_per_l * 1e3)
    }
    /// In mol/m³.
    pub const fn mol_per_m3(self) -> f64 {
        self.0
    }
}

impl MolarMass {
    /// From g/mol.
    pub fn from_g_per_mol(m: f64) -> Self {
        Self(m * 1e-3)
    }
    /// In kg/mol.
    pub const fn kg_per_mol(self) -> f64 {
        self.0
    }
}

impl MassFlow {
    /// In grams per hour.
    pub fn g_per_h(self) -> f64 {
        self.0 * 1e3 * 3600.0
    }
}

impl Fraction {
    /// From a percentage.
    pub fn from_percent(p: f64) -> Self {
        Self(p / 100.0)
    }
    /// As a number between 0 and 1.
    pub const fn value(self) -> f64 {
        self.0
    }
}

/// 0 °C in kelvin (exact, by definition of the Celsius scale).
pub const ZERO_CELSIUS_K: f64 = 273.15;

impl Temperature {
    /// From degrees Celsius.
    pub fn from_celsius(c: f64) -> Self {
        Self(c + ZERO_CELSIUS_K)
    }
    /// From kelvin.
    pub const fn from_kelvin(k: f64) -> Self {
        Self(k)
    }
    /// In kelvin.
    pub const fn kelvin(self) -> f64 {
        self.0
    }
    /// In degrees Celsius.
    pub fn celsius(self) -> f64 {
        self.0 - ZERO_CELSIUS_K
    }
}

impl Pressure {
    /// From bar absolute.
    pub fn from_bar(bar: f64) -> Self {
        Self(bar * 1e5)
    }
    /// From a gauge pressure and the ambient (absolute) pressure.
    pub fn from_gauge(gauge: PressureDifference, ambient: Pressure) -> Self {
        Self(gauge.si() + ambient.si())
    }
    /// In pascals.
    pub const fn pascals(self) -> f64 {
        self.0
    }
    /// In bar.
    pub fn bar(self) -> f64 {
        self.0 / 1e5
    }
    /// Gauge pressure relative to `ambient`.
    pub fn gauge(self, ambient: Pressure) -> PressureDifference {
        PressureDifference::from_si(self.0 - ambient.si())
    }
}

/// Standard atmosphere, 101 325 Pa (exact; NIST SP 811 B.8).
pub const STANDARD_ATMOSPHERE: Pressure = Pressure::from_si(101_325.0);

/// Standard acceleration of gravity, 9.80665 m/s² (exact by definition, 3rd CGPM 1901; the value
/// `fluids` uses).
pub const STANDARD_GRAVITY: f64 = 9.80665;

impl SurfaceTension {
    /// From millinewtons per metre (= dyn/cm).
    pub fn from_mn_per_m(v: f64) -> Self {
        Self(v * 1e-3)
    }
    /// In newtons per metre.
    pub const fn n_per_m(self) -> f64 {
        self.0
    }
}
