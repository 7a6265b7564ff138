//! Bookkeeping of a packed cartridge: bed and void volume, residence time, superficial and
//! interstitial velocity, packed mass, and the D_t/d_p and L/d_p ratios with their rules of thumb.
//! Definitions, checked against hand calculations in the tests.

use super::flow::DIAMETER_RATIO;
use super::quantities::Mass;
use crate::physics::pipe_flow::bore_area;
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Density, Dimension, Duration, Fraction, Length, Velocity, Volume, VolumetricFlow};

/// D_t/d_p below which wall channelling is expected (common practice, no source).
pub const MIN_DIAMETER_RATIO: f64 = 10.0;
/// D_t/d_p above which the wall effect on ΔP is small (a few per cent; common practice, no source;
/// Mehta–Hawley gives +11 % at 20 and ε = 0.4).
pub const NEGLIGIBLE_WALL_RATIO: f64 = 20.0;
/// L/d_p above which the bed behaves close to plug flow (common practice, no source; Mears'
/// axial-dispersion criterion is the rigorous check, from memory).
pub const MIN_LENGTH_RATIO: f64 = 50.0;

/// Name of the bed-length-to-particle ratio in validity bounds.
pub const LENGTH_RATIO: &str = "bed-length-to-particle ratio L / d_p";

/// Bed volume.
pub const BED_VOLUME_INFO: ModelInfo =
    ModelInfo { name: "Bed volume", formula: "V_bed = π D_t² L / 4", source: "definition", validity: &[] };
/// Void volume.
pub const VOID_VOLUME_INFO: ModelInfo = ModelInfo {
    name: "Void volume",
    formula: "V_void = ε V_bed (between particles; pores of porous particles and frit or fitting volumes not included)",
    source: "definition",
    validity: &[],
};
/// Residence time of the liquid between the particles.
pub const RESIDENCE_TIME_INFO: ModelInfo = ModelInfo {
    name: "Mean residence time between particles",
    formula: "τ = ε V_bed / Q",
    source: "definition",
    validity: &[],
};
/// Superficial velocity.
pub const SUPERFICIAL_VELOCITY_INFO: ModelInfo =
    ModelInfo { name: "Superficial velocity", formula: "u_s = Q / (π D_t² / 4)", source: "definition", validity: &[] };
/// Interstitial velocity.
pub const INTERSTITIAL_VELOCITY_INFO: ModelInfo =
    ModelInfo { name: "Interstitial velocity", formula: "u_i = u_s / ε", source: "definition", validity: &[] };
/// Particle Reynolds number.
pub const PARTICLE_REYNOLDS_INFO: ModelInfo = ModelInfo {
    name: "Particle Reynolds number",
    formula: "Re_p = ρ u_s d_p / μ (d_p = φ d_v)",
    source: "definition",
    validity: &[],
};
/// Mass of solid a full bed holds.
pub const PACKED_MASS_INFO: ModelInfo = ModelInfo {
    name: "Packed mass",
    formula: "m = ρ_p (1 − ε) V_bed",
    source: "definition (ρ_p the envelope density of a particle)",
    validity: &[],
};
/// Tube-to-particle diameter ratio, with its rule of thumb as a bound.
pub const DIAMETER_RATIO_INFO: ModelInfo = ModelInfo {
    name: "Tube-to-particle diameter ratio",
    formula: "D_t / d_p (≥ 10 to avoid wall channelling, ≥ 20 for a small wall effect on ΔP)",
    source: "definition; limits are common practice, no source",
    validity: &[ValidityBound { quantity: DIAMETER_RATIO, dimension: Dimension::Number, low: Some(MIN_DIAMETER_RATIO), high: None }],
};
/// Bed-length-to-particle ratio, with its rule of thumb as a bound.
pub const LENGTH_RATIO_INFO: ModelInfo = ModelInfo {
    name: "Bed-length-to-particle ratio",
    formula: "L / d_p (≥ 50 for near-plug flow)",
    source: "definition; limit is common practice, no source",
    validity: &[ValidityBound { quantity: LENGTH_RATIO, dimension: Dimension::Number, low: Some(MIN_LENGTH_RATIO), high: None }],
};

/// V_bed = π D_t² L / 4.
pub fn bed_volume(tube_diameter: Length, length: Length) -> Volume {
    Volume::from_si(bore_area(tube_diameter) * length.si())
}

/// V_void = ε V_bed.
pub fn void_volume(bed: Volume, voidage: Fraction) -> Volume {
    Volume::from_si(voidage.si() * bed.si())
}

/// τ = V_void / Q.
pub fn residence_time(void: Volume, flow: VolumetricFlow) -> Duration {
    Duration::from_seconds(void.si() / flow.si())
}

/// u_s = Q / A.
pub fn superficial_velocity(flow: VolumetricFlow, tube_diameter: Length) -> Velocity {
    Velocity::from_si(flow.si() / bore_area(tube_diameter))
}

/// u_i = u_s / ε.
pub fn interstitial_velocity(superficial: Velocity, voidage: Fraction) -> Velocity {
    Velocity::from_si(superficial.si() / voidage.si())
}

/// m = ρ_p (1 − ε) V_bed.
pub fn packed_mass(bed: Volume, voidage: Fraction, particle_density: Density) -> Mass {
    Mass::from_si(particle_density.si() * (1.0 - voidage.si()) * bed.si())
}

/// L = τ Q / (ε A): the bed length that gives residence time `tau` between the particles.
pub fn length_for_residence_time(tau: Duration, flow: VolumetricFlow, tube_diameter: Length, voidage: Fraction) -> Length {
    Length::from_si(tau.si() * flow.si() / (voidage.si() * bore_area(tube_diameter)))
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn hand_calculation_6_6_mm_cartridge() {
        // D = 6.6 mm, L = 50 mm: A = π × 3.3e-3² = 3.42119e-5 m², V = 1.710597e-6 m³ (1.7106 mL).
        let v = bed_volume(Length::from_mm(6.6), Length::from_mm(50.0));
        assert!((v.ml() - 1.710_597).abs() < 1e-6);
        let void = void_volume(v, Fraction::from_si(0.4));
        assert!((void.ml() - 0.684_239).abs() < 1e-6);
        // 1 mL/min → τ = 0.684239 min.
        let tau = residence_time(void, VolumetricFlow::from_ml_per_min(1.0));
        assert!((tau.minutes() - 0.684_239).abs() < 1e-6);
        let u = superficial_velocity(VolumetricFlow::from_ml_per_min(1.0), Length::from_mm(6.6));
        let exact = (1e-6 / 60.0) / (std::f64::consts::PI * 3.3e-3 * 3.3e-3);
        assert!((u.si() / exact - 1.0).abs() < 1e-14);
        assert!((interstitial_velocity(u, Fraction::from_si(0.4)).si() - u.si() / 0.4).abs() < 1e-18);
        // 2500 kg/m³ × 0.6 × 1.710597e-6 m³ = 2.5659 g.
        assert!((packed_mass(v, Fraction::from_si(0.4), Density::from_si(2500.0)).grams() - 2.565_896).abs() < 1e-5);
    }

    #[test]
    fn length_for_residence_time_inverts_residence_time() {
        let (d, q, eps) = (Length::from_mm(4.6), VolumetricFlow::from_ml_per_min(0.3), Fraction::from_si(0.38));
        let l = length_for_residence_time(Duration::from_seconds(90.0), q, d, eps);
        let tau = residence_time(void_volume(bed_volume(d, l), eps), q);
        assert!((tau.seconds() - 90.0).abs() < 1e-9);
    }
}
