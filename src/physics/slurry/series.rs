//! Plot series for the page: single-particle and hindered settling velocity and the time to settle
//! across a bore, against particle size on a logarithmic grid (data only; drawing is the UI's).

use serde::Serialize;

use crate::physics::report::NumericalError;
use crate::physics::settling::Particle;
use crate::physics::settling::drag::{SOLVE_FAILURE, SettlingModel};
use crate::physics::settling::hindered::{HinderedModel, Suspension};
use crate::physics::units::{Duration, Length, Velocity};

/// One point of the settling series.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct SettlingPoint {
    /// Particle (volume-equivalent) diameter.
    pub diameter: Length,
    /// Single-particle terminal velocity, recommended drag law.
    pub terminal_velocity: Velocity,
    /// Hindered settling velocity (Richardson–Zaki) at the series' solids fraction and bore.
    pub hindered_velocity: Velocity,
    /// Time to fall across the bore at the hindered velocity, D / v_h (infinite for a neutrally
    /// buoyant particle is not representable: such particles give no series).
    pub time_to_settle: Duration,
}

/// The inputs of a settling series.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct SeriesInput {
    /// The particle; its diameter is replaced by each grid size.
    pub particle: Particle,
    /// Solids volume fraction for hindered settling.
    pub solids_fraction: f64,
    /// Bore the time to settle refers to.
    pub bore: Length,
    /// Smallest size plotted.
    pub smallest: Length,
    /// Largest size plotted.
    pub largest: Length,
    /// Number of points (at least 2).
    pub points: usize,
}

/// Settling velocity and time to settle against size, log-spaced from `smallest` to `largest`.
/// Empty for a neutrally buoyant particle or fewer than two points.
pub fn settling_series(s: &SeriesInput) -> Result<Vec<SettlingPoint>, NumericalError> {
    if s.points < 2 || s.particle.density_difference() == 0.0 {
        return Ok(Vec::new());
    }
    let (lo, hi) = (s.smallest.si().ln(), s.largest.si().ln());
    let model = SettlingModel::recommended(s.particle.sphericity);
    (0..s.points)
        .map(|k| {
            let d = Length::from_si((lo + (hi - lo) * k as f64 / (s.points - 1) as f64).exp());
            let particle = s.particle.with_diameter(d);
            let terminal = model.terminal_velocity(&particle).map_err(|_| SOLVE_FAILURE)?;
            let hindered = Suspension { particle, solids_fraction: s.solids_fraction, tube_diameter: s.bore }.hindered(HinderedModel::RichardsonZaki)?.velocity;
            let t = s.bore.si() / hindered.si();
            if !t.is_finite() {
                return Err(NumericalError::NotFinite { quantity: "time to settle" });
            }
            Ok(SettlingPoint { diameter: d, terminal_velocity: terminal, hindered_velocity: hindered, time_to_settle: Duration::from_seconds(t) })
        })
        .collect()
}
