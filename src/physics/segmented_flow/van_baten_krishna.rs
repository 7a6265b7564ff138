//! van Baten & Krishna (2004): k_L a of Taylor flow from penetration theory — the two bubble caps
//! (Higbie) and the liquid film along the bubble body (Pigford's falling-film solution, from
//! short to long contact). The tool's recommended k_L a.
//!
//! Formulas (the paper's equation numbers; D_m the gas's diffusivity in the liquid, m²/s; U_B the
//! bubble velocity, m/s; D the bore, m; L_UC the unit-cell length, m; δ the film thickness, m):
//! - caps, eqs. (2)–(3): k_cap = (2√2/π) √(D_m U_B / D), a_cap = 4 / L_UC;
//! - film contact time t_film = L_film / (U_B + U_film), with U_film the velocity of the film's
//!   surface (negative when the film runs against the bubble, as in the paper's vertical up-flow;
//!   zero for the film at rest that this tool's bubble velocity assumes), and
//!   Fo = D_m t_film / δ², eq. (8);
//! - the film's unaccomplished approach to saturation, eq. (7):
//!   Δ = 0.7857 e^(−5.121 Fo) + 0.1001 e^(−39.21 Fo) + 0.0360 e^(−105.6 Fo) + 0.0181 e^(−204.7 Fo);
//! - film coefficient, eqs. (6) and (9): short contact (Fo < 0.1)
//!   k_film = 2 √(D_m/(π t_film)) · ln(1/Δ)/(1 − Δ); long contact (Fo > 1) k_film = 3.41 D_m/δ;
//!   between them eq. (6) itself, k_film = Q_film/(π D L_film) · ln(1/Δ) = (2/3)(δ/t_film) ln(1/Δ),
//!   taking the film flux Q_film = (2/3) π D δ (U_B + U_film) of a film whose surface moves at
//!   U_B + U_film past the bubble — the flux for which eq. (6) tends to the paper's own long-contact
//!   limit, since (2/3) × 5.121 = 3.41 (derived). The paper's four-term series of Δ thus spans
//!   both limits; Vandu et al. (2005) proposed a criterion on the flows, slug length and t_film
//!   for when the film saturates, whose numbers were not read, so the paper's own thresholds
//!   (0.1 and 1) are used. The switches leave steps of 1.5 % at Fo = 0.1 and 4.6 % at Fo = 1;
//! - film area, eq. (10): a_film = 4 L_film / (D L_UC); k_L a = k_cap a_cap + k_film a_film, eq. (24).
//!
//! Film length: the paper gives L_film for its runs; here it comes from the holdup, with the
//! bubble a cylinder of radius r_b = R − δ between two hemispherical caps holding the gas volume
//! ε_G L_UC π R²: L_film = (ε_G L_UC R² − (4/3) r_b³) / r_b² (derived; it reproduces the paper's
//! L_film = 5.321, 5.966 and 6.289 mm for 3, 2 and 1.5 mm at ε_G = 0.17, L_UC = 40 mm, Fig. 4),
//! and zero for a bubble too short to have a cylindrical body. Vandu et al. (2005) approximate
//! L_film ≈ ε_G L_UC (as reported by Onea et al. 2009), 28 % longer in the paper's typical run;
//! that approximation is not used.
//!
//! Driving force. The k_film of eqs. (6)–(9) refers to the log-mean of the film's driving force
//! where it meets the bubble and where it leaves it. The calculator's k_L a refers to the slug's
//! driving force c* − c, like the paper's CFD values (its eq. 22, the cup-mixed liquid) and the
//! saturation time t₉₅ = ln 20 / k_L a; so its film term is the film's uptake on that basis,
//! k_film (1 − Δ)/ln(1/Δ) (derived). For short contact that is 2 √(D_m/(π t_film)) exactly — the
//! form behind the paper's computed lines, which it notes do not depend on δ (Section 4, Fig. 6b);
//! for long contact it tends to (2/3) δ / t_film, the film's own capacity: a saturated film adds
//! only what it can hold, as the paper remarks after eq. (9). Both are computed here.
//!
//! Validity (the paper's Table 1, CFD of vertical up-flow in circular capillaries with
//! D_m = 10⁻⁹ m²/s): D = 1.5–3 mm, L_UC = 15–50 mm, U_B = 0.15–0.55 m/s, ε_G = 0.136–0.5,
//! δ = 10–100 µm, every run at Fo < 0.1 (the long-contact side is not checked against CFD).
//! Lab coils with unit cells of a few millimetres lie outside; the warnings say so.
//!
//! Example, the paper's typical run (Figs. 1–3: D = 3 mm, U_B = 0.45 m/s, L_UC = 40 mm,
//! δ = 48 µm, ε_G = 0.17, D_m = 10⁻⁹ m²/s; t_film = L_film/U_B): L_film = 5.321 mm,
//! Fo = 0.0051, caps 0.0349 s⁻¹ and film 0.0582 s⁻¹ on the slug's driving force, 0.0931 s⁻¹ in
//! all (hand calculation); the film term with the log-mean factor 1.0685 is 0.0622 s⁻¹. The CFD
//! value read off the paper's Fig. 3b at the finest grids is about 0.088 s⁻¹.
//!
//! ```
//! use clearbore::physics::segmented_flow::van_baten_krishna::{Basis, Cell};
//! let run = Cell { diffusivity: 1e-9, bubble_velocity: 0.45, film_velocity: 0.0, diameter: 3e-3,
//!     unit_cell: 0.04, holdup: 0.17, film_thickness: 48e-6 };
//! assert!((run.film_length() * 1e3 - 5.321).abs() < 0.0005);
//! assert!((run.kla(Basis::Slug) - 0.0931).abs() < 0.00005);
//! ```
//!
//! References: J. M. van Baten, R. Krishna, CFD simulations of mass transfer from Taylor bubbles
//! rising in circular capillaries, Chem. Eng. Sci. 59 (2004) 2535–2545,
//! doi:10.1016/j.ces.2004.03.010 (full text read); C. O. Vandu, H. Liu, R. Krishna, Chem. Eng.
//! Sci. 60 (2005) 6430–6437 (not read), as reported by A. Onea, M. Wörner, D. G. Cacuci, Chem. Eng.
//! Sci. 64 (2009) 1416–1435.

use super::flow::{BUBBLE_VELOCITY, DIAMETER, GAS_HOLDUP, UNIT_CELL};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Name of the film Fourier number in validity bounds.
pub const FILM_FOURIER: &str = "film Fourier number Fo = D_m t_film / δ²";

/// Fourier number below which the paper takes the short-contact limit.
pub const SHORT_CONTACT: f64 = 0.1;
/// Fourier number above which the paper takes the long-contact limit.
pub const LONG_CONTACT: f64 = 1.0;
/// Long-contact Sherwood number on the film thickness, k_film δ / D_m (eq. 9).
pub const LONG_CONTACT_SHERWOOD: f64 = 3.41;

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "van Baten–Krishna",
    formula: "k_L a = (2√2/π)√(D_m U_B/D)·4/L_UC + k_film·4 L_film/(D L_UC); k_film from Pigford's film solution (short to long contact), on the slug's driving force",
    source: "van Baten & Krishna (2004) Chem. Eng. Sci. 59, 2535–2545, doi:10.1016/j.ces.2004.03.010, eqs. 2–10 and 24; film length and driving-force basis derived",
    validity: &[
        ValidityBound { quantity: DIAMETER, dimension: Dimension::Length, low: Some(1.5e-3), high: Some(3e-3) },
        ValidityBound { quantity: UNIT_CELL, dimension: Dimension::Length, low: Some(0.015), high: Some(0.05) },
        ValidityBound { quantity: BUBBLE_VELOCITY, dimension: Dimension::Velocity, low: Some(0.15), high: Some(0.55) },
        ValidityBound { quantity: GAS_HOLDUP, dimension: Dimension::Fraction, low: Some(0.136), high: Some(0.5) },
        ValidityBound { quantity: FILM_FOURIER, dimension: Dimension::Number, low: None, high: Some(SHORT_CONTACT) },
    ],
};

/// Which driving force the film coefficient refers to.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Basis {
    /// The log-mean of the film's driving force at its two ends, as eqs. (6)–(9) give it.
    FilmLogMean,
    /// The slug's driving force c* − c (the film's uptake), as the calculator uses it.
    Slug,
}

/// Δ of eq. (7): the fraction of the film's approach to saturation not yet accomplished.
pub fn unaccomplished_fraction(fo: f64) -> f64 {
    0.7857 * (-5.121 * fo).exp() + 0.1001 * (-39.21 * fo).exp() + 0.0360 * (-105.6 * fo).exp() + 0.0181 * (-204.7 * fo).exp()
}

/// k_film in m/s on the film's log-mean driving force (eqs. 6–9), for diffusivity `dm` (m²/s),
/// contact time `t_film` (s) and film thickness `delta` (m).
pub fn film_coefficient(dm: f64, t_film: f64, delta: f64) -> f64 {
    let fo = dm * t_film / (delta * delta);
    let d = unaccomplished_fraction(fo);
    if fo < SHORT_CONTACT {
        2.0 * (dm / (std::f64::consts::PI * t_film)).sqrt() * (1.0 / d).ln() / (1.0 - d)
    } else if fo <= LONG_CONTACT {
        2.0 / 3.0 * delta / t_film * (1.0 / d).ln()
    } else {
        LONG_CONTACT_SHERWOOD * dm / delta
    }
}

/// k_film in m/s on the slug's driving force: the film's uptake, k_film (1 − Δ)/ln(1/Δ).
pub fn film_uptake_coefficient(dm: f64, t_film: f64, delta: f64) -> f64 {
    let d = unaccomplished_fraction(dm * t_film / (delta * delta));
    film_coefficient(dm, t_film, delta) * (1.0 - d) / (1.0 / d).ln()
}

/// A unit cell as the model sees it, SI units.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Cell {
    /// Diffusivity of the gas in the liquid D_m, m²/s.
    pub diffusivity: f64,
    /// Bubble velocity U_B, m/s.
    pub bubble_velocity: f64,
    /// Velocity of the film's surface U_film, m/s (negative against the bubble; 0 at rest).
    pub film_velocity: f64,
    /// Bore D, m.
    pub diameter: f64,
    /// Unit-cell length L_UC, m.
    pub unit_cell: f64,
    /// Gas holdup ε_G (bubble volume over unit-cell volume).
    pub holdup: f64,
    /// Film thickness δ, m.
    pub film_thickness: f64,
}

impl Cell {
    /// Length of the bubble's cylindrical body L_film, m (hemispherical caps; zero if none).
    pub fn film_length(&self) -> f64 {
        let r = self.diameter / 2.0;
        let r_b = r - self.film_thickness;
        ((self.holdup * self.unit_cell * r * r - 4.0 / 3.0 * r_b.powi(3)) / (r_b * r_b)).max(0.0)
    }

    /// Contact time of the film with the bubble t_film = L_film / (U_B + U_film), s.
    pub fn contact_time(&self) -> f64 {
        self.film_length() / (self.bubble_velocity + self.film_velocity)
    }

    /// Film Fourier number Fo = D_m t_film / δ².
    pub fn fourier(&self) -> f64 {
        self.diffusivity * self.contact_time() / (self.film_thickness * self.film_thickness)
    }

    /// Fo where the film term applies (a film body, a finite positive contact time, a film
    /// thickness that does not vanish); `None` where it does not, so no bound is held against it.
    pub fn film_fourier(&self) -> Option<f64> {
        let t = self.contact_time();
        let fo = self.fourier();
        (self.film_length() > 0.0 && t > 0.0 && t.is_finite() && fo.is_finite()).then_some(fo)
    }

    /// Cap contribution k_cap a_cap, 1/s.
    pub fn cap_term(&self) -> f64 {
        2.0 * std::f64::consts::SQRT_2 / std::f64::consts::PI * (self.diffusivity * self.bubble_velocity / self.diameter).sqrt() * 4.0
            / self.unit_cell
    }

    /// Film contribution k_film a_film on `basis`, 1/s; zero without a film body or contact.
    pub fn film_term(&self, basis: Basis) -> f64 {
        let l_film = self.film_length();
        let t = self.contact_time();
        if !(l_film > 0.0 && t > 0.0 && t.is_finite()) {
            return 0.0;
        }
        let k = match basis {
            Basis::FilmLogMean => film_coefficient(self.diffusivity, t, self.film_thickness),
            Basis::Slug => film_uptake_coefficient(self.diffusivity, t, self.film_thickness),
        };
        k * 4.0 * l_film / (self.diameter * self.unit_cell)
    }

    /// k_L a = cap term + film term on `basis`, 1/s.
    pub fn kla(&self, basis: Basis) -> f64 {
        self.cap_term() + self.film_term(basis)
    }
}
