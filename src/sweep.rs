//! The speed benchmark's sweep: terminal velocity and the Ergun pressure gradient over a grid of
//! particle size × particle density in water at 25 °C, the same work `./task.sh bench` times
//! natively, in wasm inside the page (`window.__clearboreSweep`) and in the Python `fluids`
//! library (tests/reference/sweep_fluids.py).

use crate::physics::fluids::solvents::Solvent;
use crate::physics::packed_bed::ergun;
use crate::physics::packed_bed::flow::BedFlow;
use crate::physics::report::NumericalError;
use crate::physics::settling::Particle;
use crate::physics::settling::drag::{SOLVE_FAILURE, SettlingModel};
use crate::physics::settling::table;
use crate::physics::units::{Density, DynamicViscosity, Fraction, Length, STANDARD_GRAVITY, Temperature, Velocity};

/// Particle sizes on the grid, log-spaced from [`SMALLEST`] to [`LARGEST`].
pub const SIZES: usize = 256;
/// Particle densities on the grid, evenly spaced from [`LIGHTEST`] to [`HEAVIEST`].
pub const DENSITIES: usize = 256;
/// Smallest particle, 1 µm.
pub const SMALLEST: f64 = 1e-6;
/// Largest particle, 500 µm.
pub const LARGEST: f64 = 500e-6;
/// Lightest particle, kg/m³.
pub const LIGHTEST: f64 = 1500.0;
/// Heaviest particle, kg/m³.
pub const HEAVIEST: f64 = 5000.0;
/// Bed voidage for the Ergun gradient.
pub const VOIDAGE: f64 = 0.4;
/// Superficial velocity for the Ergun gradient, 1 mm/s.
pub const SUPERFICIAL_VELOCITY: f64 = 1e-3;
/// The settling law: Haider–Levenspiel's sphere form (`Method="Haider_Levenspiel"` in `fluids`).
pub const MODEL: SettlingModel = SettlingModel::HaiderLevenspielSphere;

/// Particle diameter of row `i`, m.
pub fn diameter(i: usize) -> f64 {
    SMALLEST * (LARGEST / SMALLEST).powf(i as f64 / (SIZES - 1) as f64)
}

/// Particle density of column `j`, kg/m³.
pub fn particle_density(j: usize) -> f64 {
    LIGHTEST + (HEAVIEST - LIGHTEST) * j as f64 / (DENSITIES - 1) as f64
}

/// Water at 25 °C from the solvent table: (density, viscosity).
pub fn water() -> Option<(Density, DynamicViscosity)> {
    let t = Temperature::from_celsius(25.0);
    Some((Solvent::Water.density(t).ok()?.value, Solvent::Water.viscosity(t).ok()?.value))
}

/// The sweep's results, row by row (size-major): terminal velocity, m/s, and Ergun gradient, Pa/m.
#[derive(Debug, Clone, PartialEq)]
pub struct Sweep {
    /// Terminal settling velocity at each cell.
    pub terminal_velocity: Vec<f64>,
    /// Ergun pressure gradient at each cell.
    pub ergun_gradient: Vec<f64>,
}

impl Sweep {
    /// Sum of every value, to compare runs on different machines without moving the arrays.
    pub fn checksum(&self) -> f64 {
        self.terminal_velocity.iter().sum::<f64>() + self.ergun_gradient.iter().sum::<f64>()
    }
}

/// One cell: terminal velocity (m/s) and Ergun gradient (Pa/m) of particles of diameter `d` (m)
/// and density `rho_p` (kg/m³) in a liquid of density `rho` and viscosity `mu`. The velocity is
/// read from the drag law's Re_t(Ar) table, within [`table::TABLE_BOUND`] of the full solve (tested),
/// and solved in full outside it.
pub fn cell(d: f64, rho_p: f64, rho: Density, mu: DynamicViscosity) -> Result<(f64, f64), NumericalError> {
    let diameter = Length::from_si(d);
    let p = Particle { diameter, particle_density: Density::from_si(rho_p), density: rho, viscosity: mu, sphericity: 1.0 };
    let v = match table::table(MODEL).and_then(|t| t.reynolds(p.archimedes())) {
        Some(re) => re * mu.si() / (rho.si() * d),
        None => MODEL.terminal_velocity(&p).map_err(|_| SOLVE_FAILURE)?.si(),
    };
    Ok((v, ergun_gradient(d, rho, mu)))
}

/// Ergun pressure gradient, Pa/m, of a bed of particles of diameter `d` (m) at the sweep's
/// voidage and superficial velocity.
pub fn ergun_gradient(d: f64, rho: Density, mu: DynamicViscosity) -> f64 {
    let bed = BedFlow {
        particle_diameter: Length::from_si(d),
        voidage: Fraction::from_si(VOIDAGE),
        superficial_velocity: Velocity::from_si(SUPERFICIAL_VELOCITY),
        density: rho,
        viscosity: mu,
        length: Length::from_si(1.0),
        tube_diameter: Length::from_si(1.0),
    };
    ergun::pressure_drop(&bed).si()
}

/// Runs the sweep in a liquid of density `rho` and viscosity `mu`: every cell as [`cell`]
/// computes it, with ln Ar = ln(ρ g / μ²) + 3 ln d + ln |ρ_p − ρ| summed from a row's and a
/// column's logarithms instead of taken per cell (the same Ar to rounding; tested).
pub fn run(rho: Density, mu: DynamicViscosity) -> Result<Sweep, NumericalError> {
    let mut sweep = Sweep { terminal_velocity: Vec::with_capacity(SIZES * DENSITIES), ergun_gradient: Vec::with_capacity(SIZES * DENSITIES) };
    let tab = table::table(MODEL);
    let ln_k = (rho.si() * STANDARD_GRAVITY / (mu.si() * mu.si())).ln();
    let ln_drho: Vec<f64> = (0..DENSITIES).map(|j| (particle_density(j) - rho.si()).abs().ln()).collect();
    for i in 0..SIZES {
        let d = diameter(i);
        let ln_row = ln_k + 3.0 * d.ln();
        let scale = mu.si() / (rho.si() * d);
        for (j, ln_c) in ln_drho.iter().enumerate() {
            let (v, dpdz) = match tab.and_then(|t| t.reynolds_at_ln(ln_row + ln_c)) {
                Some(re) => (re * scale, ergun_gradient(d, rho, mu)),
                None => cell(d, particle_density(j), rho, mu)?,
            };
            sweep.terminal_velocity.push(v);
            sweep.ergun_gradient.push(dpdz);
        }
    }
    Ok(sweep)
}
