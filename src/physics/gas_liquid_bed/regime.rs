//! Flow regime of gas and liquid in a cartridge of fine particles: not predicted, because no
//! regime boundary with numbers could be read for such beds. The numbers that decide it are
//! reported, and a caution says what is and is not known.
//!
//! Known (abstracts and reviews read for this tool): trickle-to-pulse maps of conventional beds
//! (Charpentier & Favier 1975; the Larachi et al. 1993 boundary, which Attou & Boyer 1999 found the
//! most accurate over a wide pressure range) were built on millimetre particles, where gravity
//! and inertia compete with surface tension. In micro packed beds (Faridkhou, Hamidipour &
//! Larachi 2013, Chem. Eng. J. 223, 425–435, abstract) smaller particles bring the
//! high-interaction regime on earlier, the wetting pattern depends on how the bed was first
//! filled, and liquid holdup rises with gas density at the same gas mass flux. Not known: where
//! the boundaries lie for these beds, and anything for co-current up-flow through them.

use super::flow::TwoPhaseBed;
use super::larkins_white_jeffrey::FITTED_PARTICLE_DIAMETER;
use crate::physics::report::{Check, ModelInfo, Verdict};
use crate::physics::units::format_significant;

/// Metadata of the particle Eötvös number.
pub const EOTVOS_INFO: ModelInfo = ModelInfo {
    name: "Particle Eötvös (Bond) number",
    formula: "Eö = (ρ_L − ρ_G) g d_p² / σ (gravity against surface tension over one particle)",
    source: "definition",
    validity: &[],
};

/// Metadata of the phase Reynolds numbers.
pub const REYNOLDS_INFO: ModelInfo = ModelInfo {
    name: "Particle Reynolds number of one phase",
    formula: "Re = ρ u d_p / μ, u the phase's superficial velocity, d_p = φ d_v",
    source: "definition",
    validity: &[],
};

/// Metadata of the Lockhart–Martinelli parameter.
pub const CHI_INFO: ModelInfo = ModelInfo {
    name: "Lockhart–Martinelli parameter of the bed",
    formula: "χ = √(δ_L/δ_G), δ the Ergun friction gradient of each phase flowing alone",
    source: "definition (as in Larkins, White & Jeffrey 1961)",
    validity: &[],
};

/// The regime check: always a caution, with the groups and what they mean.
pub fn regime_check(bed: &TwoPhaseBed, upward: bool) -> Check {
    let eo = bed.eotvos();
    let s = |v: f64| format_significant(v, 3);
    let gravity = if eo < 1.0 {
        format!("Eö = {} is below 1: surface tension outweighs gravity over a particle, so capillary forces hold liquid in the narrow gaps and along the wall and decide where the gas goes", s(eo))
    } else {
        format!("Eö = {} is above 1: gravity competes with surface tension over a particle, as in the large beds the regime maps were drawn for", s(eo))
    };
    let size = bed.particle_diameter.si() / FITTED_PARTICLE_DIAMETER;
    let direction = if upward {
        "In up-flow the gas rises as bubbles or finds channels; no up-flow regime study of such beds was read either."
    } else {
        "Micro packed-bed studies report that smaller particles bring the high-interaction (pulsing-like) regime on at lower flows and that the wetting pattern depends on how the bed was first filled (Faridkhou, Hamidipour & Larachi 2013, abstract only)."
    };
    Check {
        key: "flow_regime",
        topic: "Flow regime",
        verdict: Verdict::Caution,
        reason: format!(
            "Not predicted: no regime boundary with numbers was found for beds of fine particles. {gravity}. Re_L = {}, Re_G = {}. The trickle/pulse maps of conventional beds (Charpentier & Favier 1975; Larachi et al. 1993) were drawn for millimetre particles (the ⅜-in. packings behind the pressure drop here are {} times these) and would be extrapolated. {direction} The pressure drop, holdup and mass transfer here assume the phases share the bed evenly; channelling or gas bypass makes them optimistic.",
            s(bed.liquid_reynolds()),
            s(bed.gas_reynolds()),
            format_significant(1.0 / size, 2),
        ),
        caution: None,
    }
}
