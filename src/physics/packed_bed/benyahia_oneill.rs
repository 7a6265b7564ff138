//! Benyahia & O'Neill (2005): voidage of a randomly packed bed of uniform particles in a tube, from
//! the tube-to-particle diameter ratio — for spheres, for cylinders, and for any shape through the
//! sphericity.
//!
//! Formulas, with D_t the tube diameter (m), d_p the sphere diameter or d_v the volume-equivalent
//! diameter (m) and φ the sphericity (–):
//! * spheres: ε = 0.390 + 1.740 / (D_t/d_p + 1.140)²
//! * cylinders: ε = 0.373 + 1.703 / (D_t/d_v + 0.611)²
//! * any shape: ε = 0.1504 + 0.2024/φ + 1.0814 / (D_t/d_v + 0.1226)²
//!
//! Validity (from the paper via `fluids` 1.3.1): spheres 1.5 < D_t/d_p < 50, mean error 1.5 %;
//! cylinders 1.7 < D_t/d_v < 26.3, 1.6 %; any shape 1.5 < D_t/d_v < 50 and 0.42 < φ < 1, 5.2 %.
//! Fitted on measured non-cohesive particles. Dry-packed fine powders (below about 50 µm) and
//! irregular catalyst fragments pack looser (0.45–0.6; general knowledge, from memory), so a
//! measured voidage is better where there is one. Near the edges of the any-shape fit the formula
//! can exceed 1 (φ = 0.42, D_t/d_v = 1.5 gives 1.04); callers must reject such values.
//!
//! Example (`fluids` 1.3.1 docstring of `voidage_Benyahia_Oneil_spherical`): d_p = 1 mm, D_t = 50 mm gives ε = 0.3906653157443224 (checked to 1e-12 relative).
//!
//! ```
//! use clearbore::physics::packed_bed::benyahia_oneill;
//! use clearbore::physics::units::Length;
//! let eps = benyahia_oneill::voidage_spheres(Length::from_mm(1.0), Length::from_mm(50.0));
//! assert!((eps.value() / 0.3906653157443224 - 1.0).abs() < 1e-12);
//! ```
//!
//! References: F. Benyahia, K. E. O'Neill, Enhanced voidage correlations for packed beds of
//! various particle shapes and sizes, Part. Sci. Technol. 23 (2005) 169–177,
//! doi:10.1080/02726350590922242; `fluids` 1.3.1, `packed_bed.voidage_Benyahia_Oneil*`.

use super::flow::{DIAMETER_RATIO, SPHERICITY};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, Fraction, Length};

/// Metadata of the sphere correlation.
pub const SPHERES_INFO: ModelInfo = ModelInfo {
    name: "Benyahia–O'Neill (spheres)",
    formula: "ε = 0.390 + 1.740/(D_t/d_p + 1.140)²",
    source: "Benyahia & O'Neill (2005) Part. Sci. Technol. 23, 169–177",
    validity: &[ValidityBound { quantity: DIAMETER_RATIO, dimension: Dimension::Number, low: Some(1.5), high: Some(50.0) }],
};

/// Metadata of the cylinder correlation.
pub const CYLINDERS_INFO: ModelInfo = ModelInfo {
    name: "Benyahia–O'Neill (cylinders)",
    formula: "ε = 0.373 + 1.703/(D_t/d_v + 0.611)²",
    source: "Benyahia & O'Neill (2005) Part. Sci. Technol. 23, 169–177",
    validity: &[ValidityBound { quantity: DIAMETER_RATIO, dimension: Dimension::Number, low: Some(1.7), high: Some(26.3) }],
};

/// Metadata of the any-shape correlation.
pub const ANY_SHAPE_INFO: ModelInfo = ModelInfo {
    name: "Benyahia–O'Neill (any shape)",
    formula: "ε = 0.1504 + 0.2024/φ + 1.0814/(D_t/d_v + 0.1226)²",
    source: "Benyahia & O'Neill (2005) Part. Sci. Technol. 23, 169–177",
    validity: &[
        ValidityBound { quantity: DIAMETER_RATIO, dimension: Dimension::Number, low: Some(1.5), high: Some(50.0) },
        ValidityBound { quantity: SPHERICITY, dimension: Dimension::Number, low: Some(0.42), high: Some(1.0) },
    ],
};

/// Voidage of a bed of spheres of diameter `particle` in a tube of diameter `tube`.
pub fn voidage_spheres(particle: Length, tube: Length) -> Fraction {
    let x = tube.si() / particle.si() + 1.140;
    Fraction::from_si(0.390 + 1.740 / (x * x))
}

/// Voidage of a bed of solid cylinders of volume-equivalent diameter `particle`.
pub fn voidage_cylinders(particle: Length, tube: Length) -> Fraction {
    let x = tube.si() / particle.si() + 0.611;
    Fraction::from_si(0.373 + 1.703 / (x * x))
}

/// Voidage of a bed of particles of any shape, volume-equivalent diameter `particle`, sphericity
/// `sphericity` (0 < φ ≤ 1).
pub fn voidage_any_shape(particle: Length, tube: Length, sphericity: f64) -> Fraction {
    let x = tube.si() / particle.si() + 0.1226;
    Fraction::from_si(0.1504 + 0.2024 / sphericity + 1.0814 / (x * x))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn fluids_docstring_examples() {
        // fluids 1.3.1 docstrings: any shape (1 mm, 10 mm, φ 0.8) 0.41395363849210065;
        // cylinders (10 mm, 100 mm) 0.38812523109607894.
        let a = voidage_any_shape(Length::from_si(1e-3), Length::from_si(1e-2), 0.8);
        assert!((a.value() / 0.41395363849210065 - 1.0).abs() < 1e-12);
        let c = voidage_cylinders(Length::from_si(1e-2), Length::from_si(0.1));
        assert!((c.value() / 0.38812523109607894 - 1.0).abs() < 1e-12);
    }

    #[test]
    fn large_ratio_limits() {
        let big = Length::from_si(1.0);
        let small = Length::from_si(1e-9);
        assert!((voidage_spheres(small, big).value() - 0.390).abs() < 1e-12);
        assert!((voidage_cylinders(small, big).value() - 0.373).abs() < 1e-12);
        assert!((voidage_any_shape(small, big, 1.0).value() - (0.1504 + 0.2024)).abs() < 1e-12);
    }
}
