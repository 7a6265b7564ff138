//! Every packed-bed pressure-drop correlation behind one enum, and the spread of all of them as
//! one figure with Ergun marked as the recommended estimate.

use serde::Serialize;

use super::flow::{BedFlow, range_warnings};
use super::{
    carman, erdim_akgiray_demir, ergun, harrison_brunner_hecker, kozeny_carman, kta, mehta_hawley,
    montillet_akkari_comiti, tallmadge,
};
use crate::physics::report::{Estimate, Figure, Finite, ModelInfo, NumericalError, RangeWarning};
use crate::physics::units::{Dimension, PressureDifference};

/// A packed-bed pressure-drop correlation.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize)]
#[serde(rename_all = "snake_case")]
pub enum PressureDropModel {
    /// Ergun (1952), 150 / 1.75 — recommended.
    Ergun,
    /// Kozeny–Carman, viscous only, 180.
    KozenyCarman,
    /// Carman (1937) extended, 180 + 2.871 Re_m^0.9.
    Carman,
    /// KTA 3102.3 (1981), 160 + 3.0 Re_m^0.9.
    Kta,
    /// Tallmadge (1970), 150 + 4.2 Re_m^(5/6).
    Tallmadge,
    /// Erdim, Akgiray & Demir (2015), 160 + 2.81 Re_m^0.904.
    ErdimAkgirayDemir,
    /// Harrison–Brunner–Hecker (attribution unverified), with wall factors.
    HarrisonBrunnerHecker,
    /// Montillet, Akkari & Comiti (2007), with a confinement term.
    MontilletAkkariComiti,
    /// Ergun with the Mehta–Hawley (1969) wall correction.
    MehtaHawley,
}

/// The recommended correlation.
pub const RECOMMENDED: PressureDropModel = PressureDropModel::Ergun;

/// Why Ergun is recommended, shown with the spread.
pub const RECOMMENDATION: &str = "Ergun: the most widely used and tested packed-bed equation, with a viscous and an inertial \
term. At lab flows (Re_m well below 1) only its viscous constant 150 matters and the other \
estimates bracket it (119.8 × wall factor for Harrison–Brunner–Hecker up to 180 for \
Kozeny–Carman and Carman), so the spread shows the real uncertainty of the constant. Below \
Re_m = 1 it is outside the range quoted for it and reduces to its Blake–Kozeny viscous term. It \
has no wall term: for D_t/d_p below about 20 read Harrison–Brunner–Hecker (wall terms) and the \
wall-effect check too.";

impl PressureDropModel {
    /// All models, the recommended one first.
    /// The Mehta–Hawley wall correction is not among them: its formula is from memory with no
    /// published check here, so it only annotates the wall-effect check; Harrison–Brunner–Hecker
    /// (checked against fluids) carries the wall effect in the spread.
    pub const ALL: [PressureDropModel; 8] = [
        PressureDropModel::Ergun,
        PressureDropModel::KozenyCarman,
        PressureDropModel::Carman,
        PressureDropModel::Kta,
        PressureDropModel::Tallmadge,
        PressureDropModel::ErdimAkgirayDemir,
        PressureDropModel::HarrisonBrunnerHecker,
        PressureDropModel::MontilletAkkariComiti,
    ];

    /// Metadata: name, formula, source, validity bounds.
    pub const fn info(self) -> ModelInfo {
        match self {
            PressureDropModel::Ergun => ergun::INFO,
            PressureDropModel::KozenyCarman => kozeny_carman::INFO,
            PressureDropModel::Carman => carman::INFO,
            PressureDropModel::Kta => kta::INFO,
            PressureDropModel::Tallmadge => tallmadge::INFO,
            PressureDropModel::ErdimAkgirayDemir => erdim_akgiray_demir::INFO,
            PressureDropModel::HarrisonBrunnerHecker => harrison_brunner_hecker::INFO,
            PressureDropModel::MontilletAkkariComiti => montillet_akkari_comiti::INFO,
            PressureDropModel::MehtaHawley => mehta_hawley::INFO,
        }
    }

    /// Pressure drop over the bed by this correlation.
    pub fn pressure_drop(self, bed: &BedFlow) -> PressureDifference {
        match self {
            PressureDropModel::Ergun => ergun::pressure_drop(bed),
            PressureDropModel::KozenyCarman => kozeny_carman::pressure_drop(bed),
            PressureDropModel::Carman => carman::pressure_drop(bed),
            PressureDropModel::Kta => kta::pressure_drop(bed),
            PressureDropModel::Tallmadge => tallmadge::pressure_drop(bed),
            PressureDropModel::ErdimAkgirayDemir => erdim_akgiray_demir::pressure_drop(bed),
            PressureDropModel::HarrisonBrunnerHecker => harrison_brunner_hecker::pressure_drop(bed),
            PressureDropModel::MontilletAkkariComiti => montillet_akkari_comiti::pressure_drop(bed),
            PressureDropModel::MehtaHawley => mehta_hawley::pressure_drop(bed),
        }
    }

    /// Inputs outside this correlation's fitted range.
    pub fn warnings(self, bed: &BedFlow) -> Vec<RangeWarning> {
        range_warnings(&self.info(), &bed.groups())
    }
}

/// The pressure drop by every correlation, Ergun first and recommended, each with its warnings.
pub fn pressure_drop_spread(bed: &BedFlow) -> Result<Figure, NumericalError> {
    let estimates = PressureDropModel::ALL
        .iter()
        .map(|&m| {
            Ok(Estimate {
                model: m.info(),
                value: Finite::new("bed pressure drop", m.pressure_drop(bed).si())?,
                recommended: m == RECOMMENDED,
                warnings: m.warnings(bed),
            })
        })
        .collect::<Result<Vec<_>, NumericalError>>()?;
    let value = Finite::new("bed pressure drop", RECOMMENDED.pressure_drop(bed).si())?;
    Ok(Figure {
        key: "bed_pressure_drop",
        label: "Bed pressure drop",
        dimension: Dimension::PressureDifference,
        value,
        recommendation: RECOMMENDATION,
        estimates,
    })
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;
    use crate::physics::packed_bed::flow::{DIAMETER_RATIO, MODIFIED_REYNOLDS, PARTICLE_REYNOLDS, VOIDAGE};
    use crate::physics::units::{Density, DynamicViscosity, Fraction, Length, Velocity};

    fn bed(d: f64, eps: f64, u: f64, dt: f64) -> BedFlow {
        BedFlow {
            particle_diameter: Length::from_si(d),
            voidage: Fraction::from_si(eps),
            superficial_velocity: Velocity::from_si(u),
            density: Density::from_si(1000.0),
            viscosity: DynamicViscosity::from_si(1e-3),
            length: Length::from_si(0.05),
            tube_diameter: Length::from_si(dt),
        }
    }

    #[test]
    fn spread_has_every_model_once_and_ergun_recommended_first() {
        let f = pressure_drop_spread(&bed(1e-4, 0.4, 1e-4, 6.6e-3)).unwrap();
        assert_eq!(f.estimates.len(), PressureDropModel::ALL.len());
        assert!(f.estimates[0].recommended);
        assert_eq!(f.estimates[0].model.name, "Ergun");
        assert_eq!(f.estimates.iter().filter(|e| e.recommended).count(), 1);
        assert_eq!(f.value, f.estimates[0].value);
        let (lo, hi) = f.spread();
        assert!(lo < f.value.get() && f.value.get() < hi);
    }

    #[test]
    fn every_bound_refers_to_a_group_the_bed_provides() {
        let known = [PARTICLE_REYNOLDS, MODIFIED_REYNOLDS, DIAMETER_RATIO, VOIDAGE];
        for m in PressureDropModel::ALL {
            for b in m.info().validity {
                assert!(known.contains(&b.quantity), "{:?}: unknown bound quantity {}", m, b.quantity);
                assert!(b.low.is_some() || b.high.is_some());
                if let (Some(lo), Some(hi)) = (b.low, b.high) {
                    assert!(lo < hi);
                }
            }
        }
    }

    #[test]
    fn warnings_switch_at_each_validity_edge() {
        // For every bound: nudge the bed so the group sits just inside, then just outside.
        for m in PressureDropModel::ALL {
            for b in m.info().validity {
                for (edge, outside_sign) in [(b.low, -1.0), (b.high, 1.0)] {
                    let Some(edge) = edge else { continue };
                    for (factor, expect_warning) in [(1.0 - outside_sign * 1e-6, false), (1.0 + outside_sign * 1e-6, true)] {
                        let target = edge * factor;
                        let base = bed(1e-3, 0.4, 1e-3, 0.02);
                        let probe = match b.quantity {
                            q if q == PARTICLE_REYNOLDS => BedFlow { superficial_velocity: Velocity::from_si(target * 1e-3 / (1000.0 * 1e-3)), ..base },
                            q if q == MODIFIED_REYNOLDS => BedFlow { superficial_velocity: Velocity::from_si(target * 0.6 * 1e-3 / (1000.0 * 1e-3)), ..base },
                            q if q == DIAMETER_RATIO => BedFlow { tube_diameter: Length::from_si(target * 1e-3), ..base },
                            q if q == VOIDAGE => BedFlow { voidage: Fraction::from_si(target), ..base },
                            other => panic!("unexpected bound {other}"),
                        };
                        let hit = m.warnings(&probe).iter().any(|w| w.quantity == b.quantity);
                        assert_eq!(hit, expect_warning, "{m:?} {} at {target}", b.quantity);
                    }
                }
            }
        }
    }
}
