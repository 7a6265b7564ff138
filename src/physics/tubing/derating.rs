//! Temperature derating of a tubing material's working pressure: the published short-term
//! tensile strength against temperature for each fluoropolymer, the fitting makers' factors for
//! 316 stainless steel, and a remembered set for PEEK, each capped at the hottest temperature it
//! covers.
//!
//! Polymers: the working pressure scales with the wall material's strength (Lamé burst ÷ 4), so
//! the factor at a temperature T is S(T) / S(23 °C) read from one published table: the lower end
//! of the range printed at T over the middle of the range printed at 23 °C (conservative for a
//! range). Between the published temperatures the factor is interpolated exponentially (a
//! straight line in ln factor), which lies below the straight line, as strength falls fastest
//! just above room temperature (interpolation rule: common practice, no source). Below 23 °C the
//! factor is 1.
//!
//! Example (fluoroplastics table of finemech.com/ft005.html, DIN 53455 tensile strength at break):
//! FEP 19–25 N/mm² at 23 °C and 4–6 N/mm² at 150 °C gives 4 / 22 = 0.182; PFA (27–32 and
//! 15–21 N/mm²) gives 15 / 29.5 = 0.508, so hot FEP keeps about a third of PFA's share.
//!
//! ```
//! use clearbore::physics::tubing::Material;
//! use clearbore::physics::units::Temperature;
//! let fep = Material::Fep.temperature_factor(Temperature::from_celsius(150.0)).unwrap();
//! let pfa = Material::Pfa.temperature_factor(Temperature::from_celsius(150.0)).unwrap();
//! assert!((fep - 4.0 / 22.0).abs() < 1e-12 && (pfa - 15.0 / 29.5).abs() < 1e-12);
//! ```
//!
//! References: "Mechanical properties of fluoroplastic materials", finemech.com/ft005.html
//! (tensile strength at 23 °C and 150 °C, service temperatures); Valqua gasket technical
//! handbook, Table 1.1.13 "High-temperature properties of PFA compared with PTFE and FEP"
//! (ASTM D1708 tensile strength at 23 °C and 250 °C), seal.valqua.co.jp/seal/gasket_detail_tech/155;
//! temperature de-rating factors for seamless ASTM A269 316 tubing, DK-Lok tubing data TS-04-S
//! (2011), Table 2 (the same factors in Wading-Lok's tubing table), based on ASME B31.3
//! allowable stresses.

use super::Material;
use crate::physics::units::Temperature;

/// A tensile strength printed for one temperature, as a range (equal ends for one value), MPa.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct PrintedStrength {
    /// Temperature, °C.
    pub celsius: f64,
    /// Lower end of the printed range, MPa.
    pub low_mpa: f64,
    /// Upper end of the printed range, MPa.
    pub high_mpa: f64,
}

/// Tensile strengths of one material from one published table: at room temperature and hot.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct StrengthTable {
    /// Where the numbers are printed.
    pub source: &'static str,
    /// The room-temperature entry (23 °C).
    pub room: PrintedStrength,
    /// The hot entries.
    pub hot: &'static [PrintedStrength],
}

impl StrengthTable {
    /// Factors (°C, S_low(T) / S_mid(23 °C)) for the hot entries.
    fn factors(&self) -> impl Iterator<Item = (f64, f64)> + '_ {
        let room = (self.room.low_mpa + self.room.high_mpa) / 2.0;
        self.hot.iter().map(move |p| (p.celsius, p.low_mpa / room))
    }
}

const FINEMECH: &str = "finemech.com/ft005.html, fluoroplastics table (DIN 53455)";
const VALQUA: &str = "Valqua gasket handbook, Table 1.1.13 (ASTM D1708)";

const fn printed(celsius: f64, low_mpa: f64, high_mpa: f64) -> PrintedStrength {
    PrintedStrength { celsius, low_mpa, high_mpa }
}

/// PTFE: 29–39 → 14–20 N/mm² at 150 °C; 27–34 → 10 MPa at 250 °C.
pub const PTFE_TABLES: [StrengthTable; 2] = [
    StrengthTable { source: FINEMECH, room: printed(23.0, 29.0, 39.0), hot: &[printed(150.0, 14.0, 20.0)] },
    StrengthTable { source: VALQUA, room: printed(23.0, 27.0, 34.0), hot: &[printed(250.0, 10.0, 10.0)] },
];
/// PFA: 27–32 → 15–21 N/mm² at 150 °C; grades 340-J and 350-J 27 and 31 → 12 and 14 MPa at 250 °C.
pub const PFA_TABLES: [StrengthTable; 2] = [
    StrengthTable { source: FINEMECH, room: printed(23.0, 27.0, 32.0), hot: &[printed(150.0, 15.0, 21.0)] },
    StrengthTable { source: VALQUA, room: printed(23.0, 27.0, 31.0), hot: &[printed(250.0, 12.0, 14.0)] },
];
/// FEP: 19–25 → 4–6 N/mm² at 150 °C; 31 → 2 MPa at 250 °C (beyond its service temperature; used
/// only to interpolate up to it).
pub const FEP_TABLES: [StrengthTable; 2] = [
    StrengthTable { source: FINEMECH, room: printed(23.0, 19.0, 25.0), hot: &[printed(150.0, 4.0, 6.0)] },
    StrengthTable { source: VALQUA, room: printed(23.0, 31.0, 31.0), hot: &[printed(250.0, 2.0, 2.0)] },
];

/// Temperature of the room-temperature entries, °C.
pub const ROOM_C: f64 = 23.0;

/// 316 seamless tube: (°C, factor) from the fitting makers' table (100–600 °F), interpolated
/// linearly as the tables are used.
pub const SS316_FACTORS: [(f64, f64); 6] = [(38.0, 1.0), (93.0, 1.0), (149.0, 1.0), (204.0, 0.97), (260.0, 0.90), (316.0, 0.85)];

/// PEEK (from memory, no published table read): strength falls by about a quarter from room
/// temperature to 100 °C; 0.70 at 100 °C is taken to stay on the safe side.
pub const PEEK_FACTORS: [(f64, f64); 2] = [(ROOM_C, 1.0), (100.0, 0.70)];

/// Hottest temperature with a rating, °C, and why it stops there.
pub const fn limit(material: Material) -> (f64, &'static str) {
    match material {
        Material::Ptfe | Material::Pfa => (250.0, "the hottest published strength read here (service limit 260 °C, finemech.com/ft005.html)"),
        Material::Fep => (205.0, "its service temperature (finemech.com/ft005.html; strength at 150 °C is already under a fifth of that at 23 °C)"),
        Material::Peek => (100.0, "the common practical limit for PEEK in solvent service (from memory; glass transition 143 °C)"),
        Material::Ss316 => (316.0, "the hottest factor used from the fitting makers' table (600 °F)"),
    }
}

/// The (°C, factor) points of `material`, coolest first; polymers start at (23 °C, 1).
pub fn points(material: Material) -> Vec<(f64, f64)> {
    let tables: &[StrengthTable] = match material {
        Material::Ptfe => &PTFE_TABLES,
        Material::Pfa => &PFA_TABLES,
        Material::Fep => &FEP_TABLES,
        Material::Peek => return PEEK_FACTORS.to_vec(),
        Material::Ss316 => return SS316_FACTORS.to_vec(),
    };
    let mut out = vec![(ROOM_C, 1.0)];
    out.extend(tables.iter().flat_map(StrengthTable::factors));
    out.sort_by(|a, b| a.0.total_cmp(&b.0));
    out
}

/// The factor at `t` by interpolation between `points`: exponential for polymers, linear for
/// 316 (as its table is used); 1 below the first point; `None` above `limit`.
pub fn factor(material: Material, t: Temperature) -> Option<f64> {
    let c = t.celsius();
    if !c.is_finite() || c > limit(material).0 {
        return None;
    }
    let pts = points(material);
    let first = pts.first()?;
    if c <= first.0 {
        return Some(first.1);
    }
    let exponential = !matches!(material, Material::Ss316);
    pts.windows(2).find(|w| c <= w[1].0).map(|w| {
        let s = (c - w[0].0) / (w[1].0 - w[0].0);
        if exponential { w[0].1 * (w[1].1 / w[0].1).powf(s) } else { w[0].1 + (w[1].1 - w[0].1) * s }
    })
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn every_limit_is_covered_by_the_points() {
        for m in Material::ALL {
            let top = points(m).last().unwrap().0;
            assert!(top >= limit(m).0, "{m:?}");
            assert!(factor(m, Temperature::from_celsius(limit(m).0)).is_some());
            assert!(factor(m, Temperature::from_celsius(limit(m).0 + 0.1)).is_none());
        }
    }

    #[test]
    fn factors_never_rise_with_temperature() {
        for m in Material::ALL {
            let mut last = 1.0;
            for c in 0..=320 {
                if let Some(f) = factor(m, Temperature::from_celsius(f64::from(c))) {
                    assert!(f <= last + 1e-12, "{m:?} at {c} °C");
                    last = f;
                }
            }
        }
    }
}
