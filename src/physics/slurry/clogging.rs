//! Clogging and bridging at a passage: the passage-to-particle size ratio against the thresholds
//! for sieving, arching and the design margin, combined with the solids fraction.
//!
//! Criterion: r = W / d_large, W the narrowest opening of the element (bore, valve or seat
//! opening, frit pore) and d_large the largest common particle (d₉₀, or the one size entered).
//! r ≤ 1: sieving — the particle cannot pass. r < 3: random arches clog the passage (Marin,
//! Lhuissier, Rossi & Kähler 2018, single constriction, low-friction charge-stabilised particles,
//! from about φ = 0.2 down; frictional or irregular solids need larger ratios). r < 10: margin too
//! small for continuous slurry flow (common practice, no source). Above a solids volume fraction
//! of 0.1 clogging risk grows quickly (common practice, no source).
//! Agglomerates and the top of the distribution (d₉₉) are larger than d₉₀: read r as an upper value.
//!
//! Example: a 0.25 mm valve opening with d₉₀ = 100 µm gives r = 2.5: bridging likely.
//!
//! ```
//! use clearbore::physics::slurry::clogging::{ClogRisk, risk};
//! assert_eq!(risk(2.5), ClogRisk::Bridging);
//! assert_eq!(risk(12.0), ClogRisk::Clear);
//! ```
//!
//! References: A. Marin, H. Lhuissier, M. Rossi, C. J. Kähler, Clogging in constricted suspension
//! flows, Phys. Rev. E 97 (2018) 021102 (arXiv 1711.06119; journal details from memory);
//! E. Dressaire, A. Sauret, Clogging of microfluidic systems, Soft Matter 13 (2017) 37–48.

use serde::Serialize;

use crate::physics::report::ModelInfo;

/// Below this ratio arches form (Marin et al. 2018).
pub const BRIDGING_RATIO: f64 = 3.0;
/// Below this ratio the margin is too small (common practice, no source).
pub const MARGIN_RATIO: f64 = 10.0;
/// Above this solids volume fraction clogging risk grows (common practice, no source).
pub const CONCENTRATED_FRACTION: f64 = 0.1;

/// Metadata shown with the ratio.
pub const INFO: ModelInfo = ModelInfo {
    name: "Passage-to-particle ratio",
    formula: "r = W / d₉₀; sieving r ≤ 1, bridging r < 3 (Marin et al. 2018), caution r < 10 (common practice, no source)",
    source: "Marin, Lhuissier, Rossi & Kähler (2018) Phys. Rev. E 97, 021102; margin 10: common practice, no source",
    validity: &[],
};

/// Risk class of a passage.
#[derive(Debug, Clone, Copy, PartialEq, Eq, PartialOrd, Ord, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum ClogRisk {
    /// r ≥ 10.
    Clear,
    /// 3 ≤ r < 10.
    SmallMargin,
    /// 1 < r < 3.
    Bridging,
    /// r ≤ 1.
    Sieving,
}

/// Risk class for ratio `r`.
pub fn risk(r: f64) -> ClogRisk {
    if r <= 1.0 {
        ClogRisk::Sieving
    } else if r < BRIDGING_RATIO {
        ClogRisk::Bridging
    } else if r < MARGIN_RATIO {
        ClogRisk::SmallMargin
    } else {
        ClogRisk::Clear
    }
}
