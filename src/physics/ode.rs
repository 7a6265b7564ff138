//! Ordinary differential equations: an adaptive Dormand–Prince 5(4) Runge–Kutta integrator with
//! error control that reports a failure (step too small, too many steps, a non-finite derivative)
//! as a typed error, never as NaN.

use serde::Serialize;

/// Why an integration failed.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum OdeError {
    /// The interval is not finite or does not run forwards (`end` must exceed `start`).
    InvalidInterval {
        /// Start given.
        start: f64,
        /// End given.
        end: f64,
    },
    /// A tolerance or step setting is not a positive finite number.
    InvalidTolerance,
    /// The initial state holds a NaN or an infinity.
    InvalidInitialState,
    /// The derivative came out NaN or infinite (or the right-hand side refused the state).
    NotFinite {
        /// Where it was evaluated.
        t: f64,
    },
    /// The step controller asked for a step below the smallest allowed: the problem is stiff or
    /// has a singularity here.
    StepTooSmall {
        /// Where the integration stopped.
        t: f64,
        /// The step it asked for.
        step: f64,
    },
    /// The step budget ran out before the end.
    TooManySteps {
        /// Where the integration stopped.
        t: f64,
        /// Steps taken (accepted and rejected).
        steps: u32,
    },
}

impl std::fmt::Display for OdeError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            OdeError::InvalidInterval { start, end } => {
                write!(f, "integration interval from {start} to {end} is not finite and increasing")
            }
            OdeError::InvalidTolerance => f.write_str("integration tolerances must be positive finite numbers"),
            OdeError::InvalidInitialState => f.write_str("initial state is not finite"),
            OdeError::NotFinite { t } => write!(f, "derivative is not finite at {t}"),
            OdeError::StepTooSmall { t, step } => {
                write!(f, "step size fell to {step} at {t}: the equations are too stiff or singular there")
            }
            OdeError::TooManySteps { t, steps } => write!(f, "stopped at {t} after {steps} steps without reaching the end"),
        }
    }
}

impl std::error::Error for OdeError {}

/// Error control: each step keeps the local error estimate of every component below
/// `absolute + relative × max(|y_old|, |y_new|)` (the usual mixed test, Hairer, Nørsett & Wanner
/// 1993, §II.4, eq. 4.10).
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct OdeTolerance {
    /// Relative tolerance per step.
    pub relative: f64,
    /// Absolute tolerance per step, in the units of the state.
    pub absolute: f64,
    /// Largest number of steps (accepted plus rejected).
    pub max_steps: u32,
    /// Smallest step as a fraction of the interval length.
    pub min_step_fraction: f64,
}

impl OdeTolerance {
    /// Relative 1e-9, absolute 1e-12, 100 000 steps, smallest step 1e-12 of the interval.
    pub const TIGHT: OdeTolerance =
        OdeTolerance { relative: 1e-9, absolute: 1e-12, max_steps: 100_000, min_step_fraction: 1e-12 };

    fn is_valid(&self) -> bool {
        let ok = |v: f64| v.is_finite() && v > 0.0;
        ok(self.relative) && ok(self.absolute) && ok(self.min_step_fraction) && self.max_steps > 0
    }
}

/// The accepted steps of an integration: `t[i]` and the state `y[i]` there, first and last
/// points included.
#[derive(Debug, Clone, PartialEq)]
pub struct OdeSolution<const N: usize> {
    /// Independent variable at each accepted step.
    pub t: Vec<f64>,
    /// State at each accepted step.
    pub y: Vec<[f64; N]>,
    /// Steps accepted.
    pub accepted: u32,
    /// Steps rejected by the error control.
    pub rejected: u32,
}

impl<const N: usize> OdeSolution<N> {
    /// The state at the end of the interval.
    pub fn last(&self) -> Option<&[f64; N]> {
        self.y.last()
    }
}

// Dormand & Prince (1980), J. Comput. Appl. Math. 6, 19–26, Table 2 (RK5(4)7M); also Hairer,
// Nørsett & Wanner, Solving Ordinary Differential Equations I, 2nd ed. (1993), Table II.5.2.
const C2: f64 = 1.0 / 5.0;
const C3: f64 = 3.0 / 10.0;
const C4: f64 = 4.0 / 5.0;
const C5: f64 = 8.0 / 9.0;
const A21: f64 = 1.0 / 5.0;
const A31: f64 = 3.0 / 40.0;
const A32: f64 = 9.0 / 40.0;
const A41: f64 = 44.0 / 45.0;
const A42: f64 = -56.0 / 15.0;
const A43: f64 = 32.0 / 9.0;
const A51: f64 = 19372.0 / 6561.0;
const A52: f64 = -25360.0 / 2187.0;
const A53: f64 = 64448.0 / 6561.0;
const A54: f64 = -212.0 / 729.0;
const A61: f64 = 9017.0 / 3168.0;
const A62: f64 = -355.0 / 33.0;
const A63: f64 = 46732.0 / 5247.0;
const A64: f64 = 49.0 / 176.0;
const A65: f64 = -5103.0 / 18656.0;
// Fifth-order weights (also the last stage row, FSAL).
const B1: f64 = 35.0 / 384.0;
const B3: f64 = 500.0 / 1113.0;
const B4: f64 = 125.0 / 192.0;
const B5: f64 = -2187.0 / 6784.0;
const B6: f64 = 11.0 / 84.0;
// Difference between fifth- and fourth-order weights: the error estimate.
const E1: f64 = 71.0 / 57600.0;
const E3: f64 = -71.0 / 16695.0;
const E4: f64 = 71.0 / 1920.0;
const E5: f64 = -17253.0 / 339200.0;
const E6: f64 = 22.0 / 525.0;
const E7: f64 = -1.0 / 40.0;

fn combine<const N: usize>(y: &[f64; N], h: f64, terms: &[(f64, &[f64; N])]) -> [f64; N] {
    let mut out = *y;
    for (i, o) in out.iter_mut().enumerate() {
        let mut s = 0.0;
        for (w, k) in terms {
            s += w * k[i];
        }
        *o += h * s;
    }
    out
}

fn eval<const N: usize, F: FnMut(f64, &[f64; N]) -> Option<[f64; N]>>(f: &mut F, t: f64, y: &[f64; N]) -> Result<[f64; N], OdeError> {
    match f(t, y) {
        Some(d) if d.iter().all(|v| v.is_finite()) => Ok(d),
        _ => Err(OdeError::NotFinite { t }),
    }
}

/// Integrates y′ = f(t, y) from `start` to `end` (> `start`) with adaptive Dormand–Prince 5(4)
/// steps, advancing with the fifth-order solution (local extrapolation) and accepting a step when
/// the scaled RMS error estimate is at most one. The right-hand side returns `None` for a state it
/// cannot evaluate (the step is rejected and tried
/// shorter; [`OdeError::NotFinite`] when even the smallest step meets such a state).
///
/// Step-size control: h_new = h · min(5, max(0.2, 0.9 · err^(−1/5))), the standard controller of
/// Hairer, Nørsett & Wanner (1993), §II.4; initial step from their starting-step algorithm
/// (h₀ = 0.01 · ‖y₀‖/‖f₀‖, then h₁ = (0.01 / max(‖f₀‖, ‖f′‖))^(1/5) with f′ estimated by one
/// explicit Euler step of h₀, and h = h₁ capped by the interval).
///
/// ```
/// use clearbore::physics::ode::{dormand_prince, OdeTolerance};
/// // y' = −y, y(0) = 1: y(2) = e⁻².
/// let sol = dormand_prince(|_, y: &[f64; 1]| Some([-y[0]]), 0.0, 2.0, [1.0], OdeTolerance::TIGHT)?;
/// let y2 = sol.last().unwrap()[0];
/// assert!((y2 - (-2.0f64).exp()).abs() < 1e-8);
/// # Ok::<(), clearbore::physics::ode::OdeError>(())
/// ```
pub fn dormand_prince<const N: usize, F>(f: F, start: f64, end: f64, y0: [f64; N], tol: OdeTolerance) -> Result<OdeSolution<N>, OdeError>
where
    F: FnMut(f64, &[f64; N]) -> Option<[f64; N]>,
{
    integrate(f, start, end, y0, tol, |_| {})
}

/// The same integration as [`dormand_prince`] (the same steps, the same end state), plus the state
/// at each of `points` (ascending, within [`start`, `end`]) from the method's continuous extension
/// instead of restarting the integrator at each point: the fourth-order dense output of
/// Dormand–Prince 5(4) (Hairer, Nørsett & Wanner 1993, §II.6, the `CONTD5` interpolant of their
/// DOPRI5 code). A point on a step's end gets that step's state exactly.
///
/// ```
/// use clearbore::physics::ode::{dormand_prince_dense, OdeTolerance};
/// // y' = −y, y(0) = 1, read at t = 0.5, 1, 1.5 from one integration to 2.
/// let (_, ys) = dormand_prince_dense(|_, y: &[f64; 1]| Some([-y[0]]), 0.0, 2.0, [1.0], OdeTolerance::TIGHT, &[0.5, 1.0, 1.5])?;
/// for (y, t) in ys.iter().zip([0.5f64, 1.0, 1.5]) {
///     assert!((y[0] - (-t).exp()).abs() < 1e-8);
/// }
/// # Ok::<(), clearbore::physics::ode::OdeError>(())
/// ```
pub fn dormand_prince_dense<const N: usize, F>(
    f: F,
    start: f64,
    end: f64,
    y0: [f64; N],
    tol: OdeTolerance,
    points: &[f64],
) -> Result<(OdeSolution<N>, Vec<[f64; N]>), OdeError>
where
    F: FnMut(f64, &[f64; N]) -> Option<[f64; N]>,
{
    if !points.windows(2).all(|w| w[0] <= w[1]) {
        return Err(OdeError::InvalidInterval { start, end });
    }
    if let (Some(&first), Some(&last)) = (points.first(), points.last())
        && !(first >= start && last <= end)
    {
        return Err(OdeError::InvalidInterval { start: first, end: last });
    }
    let mut out = Vec::with_capacity(points.len());
    let mut next = 0;
    while next < points.len() && points[next] == start {
        out.push(y0);
        next += 1;
    }
    let sol = integrate(f, start, end, y0, tol, |step: &Step<'_, N>| {
        while next < points.len() && points[next] <= step.t_new {
            out.push(step.interpolate(points[next]));
            next += 1;
        }
    })?;
    Ok((sol, out))
}

/// One accepted step, as the dense output needs it.
struct Step<'a, const N: usize> {
    t_old: f64,
    t_new: f64,
    h: f64,
    y_old: &'a [f64; N],
    y_new: &'a [f64; N],
    k: [&'a [f64; N]; 7],
}

// Dense-output weights of Dormand–Prince 5(4): Hairer, Nørsett & Wanner (1993), §II.6, as in the
// CONTD5 interpolant of their DOPRI5 code (Shampine's 1986 continuous extension).
const D1: f64 = -12715105075.0 / 11282082432.0;
const D3: f64 = 87487479700.0 / 32700410799.0;
const D4: f64 = -10690763975.0 / 1880347072.0;
const D5: f64 = 701980252875.0 / 199316789632.0;
const D6: f64 = -1453857185.0 / 822651844.0;
const D7: f64 = 69997945.0 / 29380423.0;

impl<const N: usize> Step<'_, N> {
    /// The state at `t` in [t_old, t_new].
    fn interpolate(&self, t: f64) -> [f64; N] {
        if t == self.t_new {
            return *self.y_new;
        }
        if t == self.t_old {
            return *self.y_old;
        }
        let theta = (t - self.t_old) / self.h;
        let theta1 = 1.0 - theta;
        let [k1, _, k3, k4, k5, k6, k7] = self.k;
        let mut y = [0.0; N];
        for (i, out) in y.iter_mut().enumerate() {
            let diff = self.y_new[i] - self.y_old[i];
            let bspl = self.h * k1[i] - diff;
            let r4 = diff - self.h * k7[i] - bspl;
            let r5 = self.h * (D1 * k1[i] + D3 * k3[i] + D4 * k4[i] + D5 * k5[i] + D6 * k6[i] + D7 * k7[i]);
            *out = self.y_old[i] + theta * (diff + theta1 * (bspl + theta * (r4 + theta1 * r5)));
        }
        y
    }
}

fn integrate<const N: usize, F, S>(
    mut f: F,
    start: f64,
    end: f64,
    y0: [f64; N],
    tol: OdeTolerance,
    mut on_step: S,
) -> Result<OdeSolution<N>, OdeError>
where
    F: FnMut(f64, &[f64; N]) -> Option<[f64; N]>,
    S: FnMut(&Step<'_, N>),
{
    if !(start.is_finite() && end.is_finite() && end > start) {
        return Err(OdeError::InvalidInterval { start, end });
    }
    if !tol.is_valid() {
        return Err(OdeError::InvalidTolerance);
    }
    if !y0.iter().all(|v| v.is_finite()) {
        return Err(OdeError::InvalidInitialState);
    }
    let span = end - start;
    let min_step = span * tol.min_step_fraction;
    let mut t = start;
    let mut y = y0;
    let mut k1 = eval(&mut f, t, &y)?;
    let scale = |y: &[f64; N], i: usize| tol.absolute + tol.relative * y[i].abs();
    let norm = |v: &[f64; N], y: &[f64; N]| {
        (v.iter().enumerate().map(|(i, x)| (x / scale(y, i)).powi(2)).sum::<f64>() / N.max(1) as f64).sqrt()
    };
    // Starting step (Hairer, Nørsett & Wanner 1993, §II.4, "Starting Step Size"): a first guess
    // from ‖y₀‖/‖f₀‖, then one explicit Euler step to estimate the second derivative, and h₁ from
    // both. Their min(100 h₀, h₁) is not applied: a state starting at zero (an integral
    // accumulating from nothing) makes h₀ tiny, and the cap then costs a ramp-up of a dozen steps
    // growing fivefold each; a first step too long is rejected by the error control instead.
    let d0 = norm(&y, &y);
    let d1 = norm(&k1, &y);
    let h0 = (if d0 > 1e-5 && d1 > 1e-5 { 0.01 * d0 / d1 } else { 1e-6 * span }).clamp(min_step, span);
    let mut h = match f(t + h0, &combine(&y, h0, &[(1.0, &k1)])) {
        Some(f1) if f1.iter().all(|v| v.is_finite()) => {
            let mut diff = f1;
            for (d, k) in diff.iter_mut().zip(&k1) {
                *d -= k;
            }
            let d2 = norm(&diff, &y) / h0;
            if d1.max(d2) <= 1e-15 { (h0 * 1e-3).max(1e-6 * span) } else { (0.01 / d1.max(d2)).powf(0.2) }
        }
        // The Euler trial left the states the right-hand side accepts: keep the first guess.
        _ => h0,
    };
    h = h.clamp(min_step, span);
    let mut sol = OdeSolution { t: vec![t], y: vec![y], accepted: 0, rejected: 0 };
    let mut steps = 0u32;
    while t < end {
        if steps >= tol.max_steps {
            return Err(OdeError::TooManySteps { t, steps });
        }
        steps += 1;
        let last = t + h >= end;
        let h_try = if last { end - t } else { h };
        // A trial state the right-hand side cannot evaluate (a stage's extrapolation past where
        // the state makes sense, such as a negative pressure while the pressure only rises), or
        // a step whose result is not finite, is rejected like a step too long: tried again
        // shorter, an error only at the smallest step. Found by the long run of
        // `gas_liquid_bed_over_its_domain`: one stage of a step in a bed whose pressure rose to
        // 10¹⁸ Pa reached −3×10¹⁶ Pa, and the integration failed in one unit and not in another.
        let stages = (|| -> Result<_, OdeError> {
            let k2 = eval(&mut f, t + C2 * h_try, &combine(&y, h_try, &[(A21, &k1)]))?;
            let k3 = eval(&mut f, t + C3 * h_try, &combine(&y, h_try, &[(A31, &k1), (A32, &k2)]))?;
            let k4 = eval(&mut f, t + C4 * h_try, &combine(&y, h_try, &[(A41, &k1), (A42, &k2), (A43, &k3)]))?;
            let k5 = eval(&mut f, t + C5 * h_try, &combine(&y, h_try, &[(A51, &k1), (A52, &k2), (A53, &k3), (A54, &k4)]))?;
            let k6 = eval(
                &mut f,
                t + h_try,
                &combine(&y, h_try, &[(A61, &k1), (A62, &k2), (A63, &k3), (A64, &k4), (A65, &k5)]),
            )?;
            let y_new = combine(&y, h_try, &[(B1, &k1), (B3, &k3), (B4, &k4), (B5, &k5), (B6, &k6)]);
            if !y_new.iter().all(|v| v.is_finite()) {
                return Err(OdeError::NotFinite { t: t + h_try });
            }
            let k7 = eval(&mut f, if last { end } else { t + h_try }, &y_new)?;
            Ok((k2, k3, k4, k5, k6, y_new, k7))
        })();
        let (k2, k3, k4, k5, k6, y_new, k7) = match stages {
            Ok(k) => k,
            Err(e) => {
                sol.rejected += 1;
                let next = h_try * 0.2;
                if next < min_step {
                    return Err(e);
                }
                h = next;
                continue;
            }
        };
        let t_new = if last { end } else { t + h_try };
        let mut err_sq = 0.0;
        for i in 0..N {
            let e = h_try * (E1 * k1[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
            let sc = tol.absolute + tol.relative * y[i].abs().max(y_new[i].abs());
            err_sq += (e / sc).powi(2);
        }
        let err = (err_sq / N.max(1) as f64).sqrt();
        let factor = if err == 0.0 { 5.0 } else { (0.9 * err.powf(-0.2)).clamp(0.2, 5.0) };
        if err <= 1.0 {
            on_step(&Step { t_old: t, t_new, h: h_try, y_old: &y, y_new: &y_new, k: [&k1, &k2, &k3, &k4, &k5, &k6, &k7] });
            t = t_new;
            y = y_new;
            k1 = k7;
            sol.t.push(t);
            sol.y.push(y);
            sol.accepted += 1;
            h = (h_try * factor).max(min_step);
        } else {
            sol.rejected += 1;
            let next = h_try * factor.min(1.0);
            if next < min_step {
                return Err(OdeError::StepTooSmall { t, step: next });
            }
            h = next;
        }
    }
    Ok(sol)
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    fn tol(rel: f64) -> OdeTolerance {
        OdeTolerance { relative: rel, absolute: rel * 1e-3, max_steps: 1_000_000, min_step_fraction: 1e-14 }
    }

    #[test]
    fn exponential_decay_matches_closed_form() {
        let sol = dormand_prince(|_, y: &[f64; 1]| Some([-3.0 * y[0]]), 0.0, 1.0, [2.0], OdeTolerance::TIGHT).unwrap();
        let exact = 2.0 * (-3.0f64).exp();
        assert!((sol.last().unwrap()[0] / exact - 1.0).abs() < 1e-8);
        assert_eq!(*sol.t.last().unwrap(), 1.0);
        assert_eq!(sol.t.len(), sol.y.len());
        assert!(sol.t.windows(2).all(|w| w[1] > w[0]));
    }

    #[test]
    fn harmonic_oscillator_keeps_amplitude_and_phase() {
        // y'' = −y as a system: (y, v)(t) = (cos t, −sin t).
        let end = 10.0;
        let sol = dormand_prince(|_, y: &[f64; 2]| Some([y[1], -y[0]]), 0.0, end, [1.0, 0.0], OdeTolerance::TIGHT).unwrap();
        let y = sol.last().unwrap();
        assert!((y[0] - end.cos()).abs() < 1e-7);
        assert!((y[1] + end.sin()).abs() < 1e-7);
    }

    #[test]
    fn time_dependent_right_hand_side_matches_quadrature() {
        // y' = t², y(1) = 0: y(3) = (27 − 1)/3. A fifth-order method integrates a quadratic exactly.
        let sol = dormand_prince(|t, _: &[f64; 1]| Some([t * t]), 1.0, 3.0, [0.0], OdeTolerance::TIGHT).unwrap();
        assert!((sol.last().unwrap()[0] - 26.0 / 3.0).abs() < 1e-12);
    }

    #[test]
    fn global_error_falls_with_tolerance_and_stays_near_it() {
        // Logistic growth y' = y (1 − y), y(0) = 0.1: y(t) = 1 / (1 + 9 e^{−t}).
        let exact = 1.0 / (1.0 + 9.0 * (-8.0f64).exp());
        let mut previous = f64::INFINITY;
        for rel in [1e-4, 1e-6, 1e-8, 1e-10] {
            let sol = dormand_prince(|_, y: &[f64; 1]| Some([y[0] * (1.0 - y[0])]), 0.0, 8.0, [0.1], tol(rel)).unwrap();
            let err = (sol.last().unwrap()[0] - exact).abs();
            // The local error per step is controlled; over this non-stiff, contracting problem
            // the global error stays within a small multiple of the tolerance.
            assert!(err < 10.0 * rel, "rel {rel}: error {err}");
            assert!(err < previous, "error must fall as the tolerance tightens");
            previous = err;
        }
    }

    #[test]
    fn tighter_tolerance_takes_more_steps() {
        let run = |rel| dormand_prince(|_, y: &[f64; 1]| Some([-y[0]]), 0.0, 5.0, [1.0], tol(rel)).unwrap().accepted;
        assert!(run(1e-10) > run(1e-4));
    }

    #[test]
    fn stiff_blow_up_is_a_typed_error_not_nan() {
        // y' = y², y(0) = 1 blows up at t = 1.
        let e = dormand_prince(|_, y: &[f64; 1]| Some([y[0] * y[0]]), 0.0, 2.0, [1.0], OdeTolerance::TIGHT).unwrap_err();
        assert!(matches!(e, OdeError::StepTooSmall { .. } | OdeError::NotFinite { .. } | OdeError::TooManySteps { .. }), "{e:?}");
    }

    #[test]
    fn refused_state_and_bad_inputs_are_errors() {
        let e = dormand_prince(|t, y: &[f64; 1]| (t < 0.5).then_some([y[0]]), 0.0, 1.0, [1.0], OdeTolerance::TIGHT).unwrap_err();
        assert!(matches!(e, OdeError::NotFinite { .. }));
        let f = |_: f64, y: &[f64; 1]| Some([y[0]]);
        assert_eq!(dormand_prince(f, 1.0, 0.0, [1.0], OdeTolerance::TIGHT).unwrap_err(), OdeError::InvalidInterval { start: 1.0, end: 0.0 });
        assert_eq!(dormand_prince(f, 0.0, 1.0, [f64::NAN], OdeTolerance::TIGHT).unwrap_err(), OdeError::InvalidInitialState);
        let bad = OdeTolerance { relative: 0.0, ..OdeTolerance::TIGHT };
        assert_eq!(dormand_prince(f, 0.0, 1.0, [1.0], bad).unwrap_err(), OdeError::InvalidTolerance);
        let few = OdeTolerance { max_steps: 2, ..OdeTolerance::TIGHT };
        assert!(matches!(dormand_prince(f, 0.0, 100.0, [1.0], few).unwrap_err(), OdeError::TooManySteps { steps: 2, .. }));
    }

    #[test]
    fn dense_output_keeps_the_steps_and_matches_the_closed_form_between_them() {
        // (y, v)(t) = (cos t, −sin t), read at 101 points from one integration.
        let f = |_: f64, y: &[f64; 2]| Some([y[1], -y[0]]);
        let points: Vec<f64> = (0..=100).map(|i| 0.1 * f64::from(i)).collect();
        let (sol, ys) = dormand_prince_dense(f, 0.0, 10.0, [1.0, 0.0], OdeTolerance::TIGHT, &points).unwrap();
        assert_eq!(sol, dormand_prince(f, 0.0, 10.0, [1.0, 0.0], OdeTolerance::TIGHT).unwrap());
        assert_eq!(ys.len(), points.len());
        assert_eq!(ys[0], [1.0, 0.0]);
        assert_eq!(ys[100], *sol.last().unwrap());
        for (y, t) in ys.iter().zip(&points) {
            assert!((y[0] - t.cos()).abs() < 1e-7 && (y[1] + t.sin()).abs() < 1e-7, "t {t}: {y:?}");
        }
    }

    #[test]
    fn dense_output_is_fourth_order_between_coarse_steps() {
        // Few long steps (tolerance 1e-5) on y' = −y: halfway through each step the interpolant
        // must stay within a small multiple of the tolerance (one dense weight off by 1 % fails
        // this test by a factor of 17).
        let f = |_: f64, y: &[f64; 1]| Some([-y[0]]);
        let coarse = tol(1e-5);
        let sol = dormand_prince(f, 0.0, 8.0, [1.0], coarse).unwrap();
        let mids: Vec<f64> = sol.t.windows(2).map(|w| 0.5 * (w[0] + w[1])).collect();
        let (_, ys) = dormand_prince_dense(f, 0.0, 8.0, [1.0], coarse, &mids).unwrap();
        for (y, t) in ys.iter().zip(&mids) {
            assert!((y[0] - (-t).exp()).abs() < 1e-5 * 10.0, "t {t}: {} vs {}", y[0], (-t).exp());
        }
    }

    #[test]
    fn dense_output_refuses_points_outside_or_out_of_order() {
        let f = |_: f64, y: &[f64; 1]| Some([-y[0]]);
        assert!(dormand_prince_dense(f, 0.0, 1.0, [1.0], OdeTolerance::TIGHT, &[0.5, 1.5]).is_err());
        assert!(dormand_prince_dense(f, 0.0, 1.0, [1.0], OdeTolerance::TIGHT, &[0.5, 0.2]).is_err());
    }

    #[test]
    fn errors_read_as_sentences() {
        assert_eq!(OdeError::NotFinite { t: 0.5 }.to_string(), "derivative is not finite at 0.5");
    }
}
