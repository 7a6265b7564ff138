//! Separated-flow (Lockhart–Martinelli type) frictional pressure gradients fitted to
//! mini-channel data, as a second opinion beside the slug models: they know nothing of bubbles
//! and slugs, only of the two phases' flows.
//!
//! Common form: each phase alone in the tube gives (dP/dz)_k = f_k ρ_k j_k² / (2 D) with its
//! superficial velocity j_k, Re_k = ρ_k j_k D / μ_k and a Darcy friction factor f_k;
//! X² = (dP/dz)_L / (dP/dz)_G; dP/dz = (dP/dz)_L (1 + C/X + 1/X²). The models differ in C:
//! - Mishima & Hibiki (1996): C = 21 [1 − exp(−319 D)], D in m (air–water, 1–4 mm tubes).
//! - Zhang, Hibiki & Mishima (2010), adiabatic gas–liquid: C = 21 [1 − exp(−0.674/Co)],
//!   Co = √(σ / (g (ρ_L − ρ_G))) / D the confinement number.
//! - Kim & Mudawar (2012): C from the liquid-only Reynolds number Re_LO = G D/μ_L (G the total
//!   mass flux), the gas Suratman number Su = ρ_G σ D / μ_G² and ρ_L/ρ_G, one expression per
//!   laminar/turbulent pair with transition at 2000; its own friction factors (64/Re,
//!   0.316 Re^−0.25 below 20 000, 0.184 Re^−0.2 above). Fitted to 7 115 points, D 0.0695–6.22 mm.
//!
//! Friction factor of the first two: 64/Re below Re = 2040, else the smooth-tube Colebrook
//! equation solved exactly, as in `fluids` 1.3.1's `friction_factor`.
//!
//! Checks: tests/segmented_flow.rs compares all three with `fluids` 1.3.1 (`Mishima_Hibiki`,
//! `Zhang_Hibiki_Mishima` with flowtype "adiabatic gas", `Kim_Mudawar`) over a grid of lab
//! conditions written by tests/reference/two_phase_fluids.py, and with the library's own
//! docstring examples.
//!
//! References: K. Mishima, T. Hibiki, Int. J. Multiphase Flow 22 (1996) 703–712; W. Zhang,
//! T. Hibiki, K. Mishima, Int. J. Heat Mass Transfer 53 (2010) 453–465; S.-M. Kim, I. Mudawar,
//! Int. J. Heat Mass Transfer 55 (2012) 3246–3261 (citations as given in `fluids` 1.3.1).

use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::{Dimension, STANDARD_GRAVITY};

/// Laminar-to-turbulent switch of the pipe friction factor used by `fluids` 1.3.1.
const LAMINAR_LIMIT: f64 = 2040.0;

/// One phase's properties and superficial velocity.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Phase {
    /// Density, kg/m³.
    pub density: f64,
    /// Viscosity, Pa·s.
    pub viscosity: f64,
    /// Superficial velocity (volumetric flow over the whole cross-section), m/s.
    pub superficial: f64,
}

impl Phase {
    fn reynolds(&self, d: f64) -> f64 {
        self.density * self.superficial * d / self.viscosity
    }
    fn gradient(&self, d: f64, friction: f64) -> f64 {
        friction * self.density * self.superficial * self.superficial / (2.0 * d)
    }
}

/// Darcy friction factor of a smooth tube: 64/Re (laminar), else the Colebrook equation
/// 1/√f = −2 log₁₀(2.51 / (Re √f)) solved by fixed-point iteration to machine precision.
pub fn smooth_friction(re: f64) -> f64 {
    if re < LAMINAR_LIMIT {
        return 64.0 / re;
    }
    let mut inv_sqrt = 7.0; // 1/√f, a turbulent starting value
    for _ in 0..100 {
        let next = -2.0 * (2.51 * inv_sqrt / re).log10();
        if (next - inv_sqrt).abs() <= 1e-15 * next.abs() {
            inv_sqrt = next;
            break;
        }
        inv_sqrt = next;
    }
    1.0 / (inv_sqrt * inv_sqrt)
}

fn kim_mudawar_friction(re: f64) -> f64 {
    if re < 2000.0 {
        64.0 / re
    } else if re < 20_000.0 {
        0.316 / re.sqrt().sqrt()
    } else {
        0.184 * re.powf(-0.2)
    }
}

fn multiplied(liquid_gradient: f64, x: f64, c: f64) -> f64 {
    liquid_gradient * (1.0 + c / x + 1.0 / (x * x))
}

/// Mishima–Hibiki gradient, Pa/m, in a tube of bore `d` m.
pub fn mishima_hibiki(liquid: &Phase, gas: &Phase, d: f64) -> f64 {
    let l = liquid.gradient(d, smooth_friction(liquid.reynolds(d)));
    let g = gas.gradient(d, smooth_friction(gas.reynolds(d)));
    multiplied(l, (l / g).sqrt(), 21.0 * (1.0 - (-319.0 * d).exp()))
}

/// Zhang–Hibiki–Mishima (adiabatic gas–liquid) gradient, Pa/m, with surface tension `sigma`.
pub fn zhang_hibiki_mishima(liquid: &Phase, gas: &Phase, d: f64, sigma: f64) -> f64 {
    let l = liquid.gradient(d, smooth_friction(liquid.reynolds(d)));
    let g = gas.gradient(d, smooth_friction(gas.reynolds(d)));
    let confinement = (sigma / (STANDARD_GRAVITY * (liquid.density - gas.density))).sqrt() / d;
    multiplied(l, (l / g).sqrt(), 21.0 * (1.0 - (-0.674 / confinement).exp()))
}

/// Kim–Mudawar gradient, Pa/m.
pub fn kim_mudawar(liquid: &Phase, gas: &Phase, d: f64, sigma: f64) -> f64 {
    let (re_l, re_g) = (liquid.reynolds(d), gas.reynolds(d));
    let l = liquid.gradient(d, kim_mudawar_friction(re_l));
    let g = gas.gradient(d, kim_mudawar_friction(re_g));
    let mass_flux = liquid.density * liquid.superficial + gas.density * gas.superficial;
    let re_lo = mass_flux * d / liquid.viscosity;
    let su = gas.density * sigma * d / (gas.viscosity * gas.viscosity);
    let ratio = liquid.density / gas.density;
    let c = match (re_l < 2000.0, re_g < 2000.0) {
        (true, true) => 3.5e-5 * re_lo.powf(0.44) * su.sqrt() * ratio.powf(0.48),
        (true, false) => 0.0015 * re_lo.powf(0.59) * su.powf(0.19) * ratio.powf(0.36),
        (false, true) => 8.7e-4 * re_lo.powf(0.17) * su.sqrt() * ratio.powf(0.14),
        (false, false) => 0.39 * re_lo.powf(0.03) * su.powf(0.10) * ratio.powf(0.35),
    };
    multiplied(l, (l / g).sqrt(), c)
}

/// Name of the bounded tube diameter.
pub const TUBE_DIAMETER: &str = "tube diameter";

/// Metadata of Mishima–Hibiki.
pub const MISHIMA_HIBIKI_INFO: ModelInfo = ModelInfo {
    name: "Mishima–Hibiki (separated flow)",
    formula: "dP/dz = (dP/dz)_L (1 + C/X + 1/X²), C = 21[1 − exp(−319 D)]",
    source: "Mishima & Hibiki (1996) Int. J. Multiphase Flow 22, 703–712; as coded in fluids 1.3.1",
    // Air–water in 1–4 mm tubes (range from memory).
    validity: &[ValidityBound { quantity: TUBE_DIAMETER, dimension: Dimension::Length, low: Some(1.0e-3), high: Some(4.1e-3) }],
};

/// Metadata of Zhang–Hibiki–Mishima.
pub const ZHANG_HIBIKI_MISHIMA_INFO: ModelInfo = ModelInfo {
    name: "Zhang–Hibiki–Mishima (separated flow)",
    formula: "dP/dz = (dP/dz)_L (1 + C/X + 1/X²), C = 21[1 − exp(−0.674/Co)], adiabatic gas–liquid",
    source: "Zhang, Hibiki & Mishima (2010) Int. J. Heat Mass Transfer 53, 453–465; as coded in fluids 1.3.1",
    validity: &[],
};

/// Metadata of Kim–Mudawar.
pub const KIM_MUDAWAR_INFO: ModelInfo = ModelInfo {
    name: "Kim–Mudawar (separated flow)",
    formula: "dP/dz = (dP/dz)_L (1 + C/X + 1/X²), C(Re_LO, Su_GO, ρ_L/ρ_G) per flow-regime pair",
    source: "Kim & Mudawar (2012) Int. J. Heat Mass Transfer 55, 3246–3261; as coded in fluids 1.3.1",
    validity: &[ValidityBound { quantity: TUBE_DIAMETER, dimension: Dimension::Length, low: Some(0.0695e-3), high: Some(6.22e-3) }],
};
