//! Terminal Reynolds number against the Archimedes number, tabulated once per drag law.
//!
//! For a sphere-only drag law C_D(Re) the force balance C_D v² = 4 g d |ρ_p − ρ| / (3 ρ) reads, in
//! dimensionless form, C_D(Re_t) Re_t² = 4 Ar / 3 (Ar = ρ |ρ_p − ρ| g d³ / μ²): Re_t depends on
//! Ar alone. Each law's table holds ln Re_t at log-spaced Ar over [`AR_MIN`, `AR_MAX`] (every
//! particle of 1 µm–5 mm in lab liquids), solved with Brent's method once, on first use
//! (`OnceLock`), with the slope d ln Re_t / d ln Ar that the force balance gives at each node;
//! between nodes, cubic Hermite interpolation in ln Ar. Its error against the full solve stays
//! below [`TABLE_BOUND`] (tested over the whole range, where it is also monotone). Point
//! evaluations add one Newton step on the force balance, which brings them to the precision of
//! the full solve; the full solve remains the fallback outside the table, for laws without one,
//! and whenever the polished residual is not small enough. Haider–Levenspiel's law with a
//! sphericity below one is a law of Re alone for each shape: its tables are built per sphericity
//! on first use and the last few kept ([`shaped_table`]).

use std::sync::OnceLock;

use super::drag::SettlingModel;
use crate::physics::numeric::{Tolerance, brent};

/// Smallest Archimedes number tabulated (a 1 µm silica particle in a viscous solvent is near 1e-9).
pub const AR_MIN: f64 = 1e-12;
/// Largest Archimedes number tabulated (a 5 mm dense particle in water is near 1e7).
pub const AR_MAX: f64 = 1e8;
/// Table nodes per decade of Ar.
pub const PER_DECADE: usize = 32;
/// Bound on the interpolated Re_t's relative error (before the Newton step), tested against the
/// full solve over the whole table (tests/settling.rs; 6.7e-10 at worst, Schiller–Naumann).
pub const TABLE_BOUND: f64 = 1e-9;
/// Largest relative force-balance residual accepted after the Newton step; above it the full
/// solve runs instead.
pub const POLISHED_RESIDUAL: f64 = 1e-11;

/// One law's table: ln Re_t and its slope d ln Re_t / d ln Ar at each node.
#[derive(Debug)]
pub struct Table {
    ln_re: Vec<f64>,
    slope: Vec<f64>,
}

fn ln_ar_min() -> f64 {
    AR_MIN.ln()
}

fn step() -> f64 {
    std::f64::consts::LN_10 / PER_DECADE as f64
}

fn nodes() -> usize {
    (AR_MAX / AR_MIN).log10().round() as usize * PER_DECADE + 1
}

/// Re_t for `model` at `ar` by the full solve of C_D(Re) Re² = 4 Ar / 3 (Brent between 10⁻⁹ and
/// 2 times the Stokes value Ar/18, as the velocity solve brackets it).
pub fn solve_reynolds(model: SettlingModel, ar: f64) -> Option<f64> {
    solve_reynolds_with(&|re| model.drag_coefficient(re, 1.0), ar)
}

/// As [`solve_reynolds`] for the drag law `drag` (C_D against Re).
pub fn solve_reynolds_with(drag: &dyn Fn(f64) -> Option<f64>, ar: f64) -> Option<f64> {
    let target = 4.0 * ar / 3.0;
    let re_stokes = ar / 18.0;
    let g = |re: f64| drag(re).map_or(f64::NAN, |cd| cd * re * re / target - 1.0);
    brent(g, 1e-9 * re_stokes, 2.0 * re_stokes, Tolerance::TIGHT).ok()
}

impl Table {
    /// The table of the drag law `drag` (C_D against Re; `None` if a node could not be solved).
    fn build(drag: &dyn Fn(f64) -> Option<f64>) -> Option<Table> {
        let n = nodes();
        let x0 = ln_ar_min();
        let h = step();
        let ln_re = (0..n).map(|i| solve_reynolds_with(drag, (x0 + h * i as f64).exp()).map(f64::ln)).collect::<Option<Vec<_>>>()?;
        // Slopes from the force balance itself: ln(C_D Re²) = ln(4 Ar / 3) gives
        // d ln Re / d ln Ar = 1 / (2 + d ln C_D / d ln Re), the drag law's own slope taken by a
        // central difference. Every law here has C_D Re² rising with Re, so the slopes are
        // positive and the interpolant is monotone.
        let slope = ln_re
            .iter()
            .map(|&x| {
                let dx = 1e-5;
                let cd = |x: f64| drag(x.exp()).map(f64::ln);
                Some(1.0 / (2.0 + (cd(x + dx)? - cd(x - dx)?) / (2.0 * dx)))
            })
            .collect::<Option<Vec<_>>>()?;
        if !slope.iter().all(|s| s.is_finite() && *s > 0.0) {
            return None;
        }
        Some(Table { ln_re, slope })
    }

    /// Interpolated Re_t at `ar`; `None` outside the table.
    pub fn reynolds(&self, ar: f64) -> Option<f64> {
        if !(AR_MIN..=AR_MAX).contains(&ar) {
            return None;
        }
        self.reynolds_at_ln(ar.ln())
    }

    /// Interpolated Re_t at ln Ar = `ln_ar` (for grids, where ln Ar is a sum of a row's and a
    /// column's logarithms); `None` outside the table.
    pub fn reynolds_at_ln(&self, ln_ar: f64) -> Option<f64> {
        self.ln_reynolds_and_slope(ln_ar).map(|(y, _)| y.exp())
    }

    /// Interpolated ln Re_t at ln Ar = `ln_ar`, and the interpolant's slope d ln Re_t / d ln Ar
    /// there; `None` outside the table.
    fn ln_reynolds_and_slope(&self, ln_ar: f64) -> Option<(f64, f64)> {
        if !(ln_ar >= ln_ar_min() && ln_ar <= AR_MAX.ln()) {
            return None;
        }
        let h = step();
        let s = (ln_ar - ln_ar_min()) / h;
        let i = (s.floor() as usize).min(self.ln_re.len() - 2);
        let t = s - i as f64;
        let (y0, y1, d0, d1) = (self.ln_re[i], self.ln_re[i + 1], self.slope[i] * h, self.slope[i + 1] * h);
        let t2 = t * t;
        let t3 = t2 * t;
        let y = (2.0 * t3 - 3.0 * t2 + 1.0) * y0 + (t3 - 2.0 * t2 + t) * d0 + (-2.0 * t3 + 3.0 * t2) * y1 + (t3 - t2) * d1;
        let dy = (6.0 * t2 - 6.0 * t) * (y0 - y1) + (3.0 * t2 - 4.0 * t + 1.0) * d0 + (3.0 * t2 - 2.0 * t) * d1;
        Some((y, dy / h))
    }
}

/// The table of `model`, built on first use; `None` for laws that depend on more than Re (the
/// sphericity forms), the closed forms, the piecewise Clift–Grace–Weber and the saturating Barati law, or if a node could
/// not be solved.
pub fn table(model: SettlingModel) -> Option<&'static Table> {
    static TABLES: [OnceLock<Option<Table>>; 2] = [OnceLock::new(), OnceLock::new()];
    let slot = match model {
        SettlingModel::SchillerNaumann => 0,
        SettlingModel::HaiderLevenspielSphere => 1,
        // Clift–Grace–Weber is piecewise with steps between its branches, where no interpolant
        // keeps the bound (0.4 % measured), and Barati's fit has no root in the bracket at some
        // nodes of this range (its fit saturates): always the full solve.
        SettlingModel::CliftGraceWeber
        | SettlingModel::Barati
        | SettlingModel::Stokes
        | SettlingModel::HaiderLevenspiel
        | SettlingModel::HaiderLevenspielExplicit => return None,
    };
    TABLES[slot].get_or_init(|| Table::build(&|re| model.drag_coefficient(re, 1.0))).as_ref()
}

/// Re_t at `ar` from the table plus one Newton step on g = ln(C_D Re²) − ln(4 Ar / 3) in ln Re_t
/// (its derivative, d ln(C_D Re²) / d ln Re = d ln Ar / d ln Re_t along the solution, taken from
/// the interpolant's slope), accepted only if the relative force-balance residual is then at most
/// [`POLISHED_RESIDUAL`]; `None` otherwise (the caller runs the full solve).
pub fn reynolds(model: SettlingModel, ar: f64) -> Option<f64> {
    polished(table(model)?, &|re, _| model.drag_coefficient(re, 1.0), ar)
}

/// As [`reynolds`] with the table `t` of the drag law `drag` (C_D from Re and ln Re, the logarithm
/// being at hand).
fn polished(t: &Table, drag: &dyn Fn(f64, f64) -> Option<f64>, ar: f64) -> Option<f64> {
    if !(AR_MIN..=AR_MAX).contains(&ar) {
        return None;
    }
    let (x0, slope) = t.ln_reynolds_and_slope(ar.ln())?;
    let re0 = x0.exp();
    let target = 4.0 * ar / 3.0;
    let g0 = (drag(re0, x0)? * re0 * re0 / target).ln();
    let x = x0 - g0 * slope;
    let re = x.exp();
    let residual = drag(re, x)? * re * re / target - 1.0;
    (residual.abs() <= POLISHED_RESIDUAL).then_some(re)
}

/// Bound on a Haider–Levenspiel (sphericity) table's relative error before the Newton step, tested
/// at sphericities 0.05–1 (tests/settling.rs; the law bends most near its lowest sphericities).
/// The polished value meets the full solve's precision all the same.
pub const SHAPED_TABLE_BOUND: f64 = 1e-8;

/// Sphericities whose Haider–Levenspiel table each thread keeps (the most recently used).
pub const SHAPED_TABLES_KEPT: usize = 4;

thread_local! {
    /// The Haider–Levenspiel tables by sphericity (its bits), each with the shape coefficients it
    /// was built with, most recently used last.
    static SHAPED: std::cell::RefCell<Vec<(u64, Shaped)>> = const { std::cell::RefCell::new(Vec::new()) };
}

/// A Haider–Levenspiel table and the shape coefficients (A, B, C, D) of its sphericity.
#[derive(Clone)]
struct Shaped {
    table: std::rc::Rc<Option<Table>>,
    coefficients: (f64, f64, f64, f64),
}

/// The Haider–Levenspiel (sphericity) law's table at sphericity `phi`: for one shape C_D depends
/// on Re alone, so Re_t depends on Ar alone as for the sphere laws. Built on first use of that
/// sphericity (the same nodes and solve as the sphere laws' tables, about 640 full solves) and
/// kept for the [`SHAPED_TABLES_KEPT`] sphericities used last; a table is a function of the
/// sphericity alone, so whether it was kept changes the time taken, never a value.
pub fn shaped_table(phi: f64) -> std::rc::Rc<Option<Table>> {
    shaped(phi).table
}

fn shaped(phi: f64) -> Shaped {
    let key = phi.to_bits();
    SHAPED.with(|cell| {
        let mut kept = cell.borrow_mut();
        if let Some(i) = kept.iter().position(|(k, _)| *k == key) {
            let entry = kept.remove(i);
            let found = entry.1.clone();
            kept.push(entry);
            return found;
        }
        let coefficients = super::haider_levenspiel::coefficients(phi);
        let table = std::rc::Rc::new(Table::build(&|re| Some(super::haider_levenspiel::drag_with(re, coefficients))));
        if kept.len() >= SHAPED_TABLES_KEPT {
            kept.remove(0);
        }
        let found = Shaped { table, coefficients };
        kept.push((key, found.clone()));
        found
    })
}

/// Re_t of the Haider–Levenspiel (sphericity) law at sphericity `phi` and `ar`, from its table
/// polished as [`reynolds`] does (with the coefficients the table was built with); `None` where
/// that does not meet its residual (the caller runs the full solve).
pub fn reynolds_shaped(phi: f64, ar: f64) -> Option<f64> {
    let Shaped { table, coefficients } = shaped(phi);
    polished(table.as_ref().as_ref()?, &|re, ln_re| Some(super::haider_levenspiel::drag_with_ln(re, ln_re, coefficients)), ar)
}
