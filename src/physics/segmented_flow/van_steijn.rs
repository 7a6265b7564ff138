//! van Steijn, Kleijn & Kreutzer (2010): bubble volume at a T-junction in the squeezing regime
//! predicted from the junction geometry alone (no fitted constant): a filling stage, then a
//! squeezing stage whose length grows with the gas-to-liquid flow ratio.
//!
//! Formula, all lengths over the main-channel width w (h channel height, w_in gas-inlet width,
//! q = Q_G/Q_L):
//! V / (h w²) = V_fill/(h w²) + α q, with
//! V_fill/(h w²) = 3π/8 − (π/2)(1 − π/4) h/w for w_in ≤ w, and for w_in > w
//! (π/4 − ½ asin(1 − w/w_in))(w_in/w)² − ½(w_in/w − 1)(2 w_in/w − 1)^½ + π/8
//! − ½(1 − π/4)[(π/2 − asin(1 − w/w_in)) w_in/w + π/2] h/w;
//! α = (1 − π/4)/(1 − q_gutter/q_c) · [(R_pinch/w)² − (R_fill/w)² + (π/4)(R_pinch − R_fill)/w · h/w],
//! R_fill = max(w, w_in), R_pinch = w + w_in − p + √(2 (w_in − p)(w − p)), p = h w/(h + w) − ε.
//! The paper's constants: q_gutter/q_c = 0.1 and ε = 0.1 w for gas bubbles.
//!
//! Here: the junction is taken square with equal inlets (h = w_in = w, the usual tee drilled to
//! one bore), which gives V_fill/(h w²) = 0.8410 and α = 1.4624; the bubble of volume V fills
//! L_B = V/(h w) of the main channel, and L_S = L_B Q_L/Q_G (no slip), as for Garstecki.
//!
//! Validity: squeezing regime, Ca_L below ~0.01 (from memory); rectangular microchannels. A tee
//! in round tubing is not the geometry the model was built for; it is shown in the spread.
//! When w_in < p the square root has no real value: the model does not apply ([`alpha`] → None).
//!
//! Checks (tests/segmented_flow.rs): the values of a published replication of the paper (which
//! reproduces its Figs. 2b and 3 and corrects a misprinted parenthesis of its Fig. 2a equation):
//! α = 0.808977 (h/w = 0.5, w_in/w = 2/3, ε = 0), α = 3.369487 (w_in/w = 2), and
//! V/(h w²) = 5.2997388 (h/w = 0.33, w_in = w, ε = 0.1 w, q = 2).
//!
//! ```
//! use clearbore::physics::segmented_flow::van_steijn::{alpha, fill_volume};
//! assert!((fill_volume(1.0, 1.0) - 0.841001).abs() < 1e-6);
//! assert!((alpha(1.0, 1.0, 0.1, 0.1).unwrap() - 1.462383).abs() < 1e-6);
//! ```
//!
//! Reference: V. van Steijn, C. R. Kleijn, M. T. Kreutzer, Predictive model for the size of
//! bubbles and droplets created in microfluidic T-junctions, Lab Chip 10 (2010) 2513–2518
//! (doi 10.1039/c002625e).

use std::f64::consts::{FRAC_PI_2, FRAC_PI_4, FRAC_PI_8, PI};

use super::garstecki::SQUEEZING_VALIDITY;
use crate::physics::report::ModelInfo;

/// ε/w for gas bubbles (the paper's value).
pub const GAS_EPSILON: f64 = 0.1;
/// Liquid bypassing the growing bubble through the corners, q_gutter/q_c (the paper's value).
pub const GUTTER: f64 = 0.1;

/// Filling volume V_fill/(h w²) at height `h` = h/w and inlet width `w_in` = w_in/w.
pub fn fill_volume(h: f64, w_in: f64) -> f64 {
    if w_in <= 1.0 {
        3.0 * PI / 8.0 - FRAC_PI_2 * (1.0 - FRAC_PI_4) * h
    } else {
        let a = (1.0 - 1.0 / w_in).asin();
        (FRAC_PI_4 - 0.5 * a) * w_in * w_in - 0.5 * (w_in - 1.0) * (2.0 * w_in - 1.0).sqrt() + FRAC_PI_8
            - 0.5 * (1.0 - FRAC_PI_4) * ((FRAC_PI_2 - a) * w_in + FRAC_PI_2) * h
    }
}

/// Squeezing coefficient α at `h` = h/w, `w_in` = w_in/w, `epsilon` = ε/w and `gutter` =
/// q_gutter/q_c; `None` where the pinch radius has no real value (w_in < p).
pub fn alpha(h: f64, w_in: f64, epsilon: f64, gutter: f64) -> Option<f64> {
    let p = h / (h + 1.0) - epsilon;
    let under = 2.0 * (w_in - p) * (1.0 - p);
    if w_in < p || under < 0.0 {
        return None;
    }
    let pinch = 1.0 + w_in - p + under.sqrt();
    let fill = w_in.max(1.0);
    Some((1.0 - FRAC_PI_4) / (1.0 - gutter) * (pinch * pinch - fill * fill + FRAC_PI_4 * (pinch - fill) * h))
}

/// (bubble length, slug length) in m in a square junction channel of width `width` with equal
/// inlets, for gas and liquid flows `gas`, `liquid` (any one unit).
pub fn lengths(width: f64, gas: f64, liquid: f64) -> (f64, f64) {
    // Square, equal inlets: w_in = w = h, so p = 0.4 w and the root is real.
    let a = alpha(1.0, 1.0, GAS_EPSILON, GUTTER).unwrap_or(f64::NAN);
    let bubble = width * (fill_volume(1.0, 1.0) + a * gas / liquid);
    (bubble, bubble * liquid / gas)
}

/// Metadata shown with the result.
pub const INFO: ModelInfo = ModelInfo {
    name: "van Steijn et al. (2010)",
    formula: "L_B/W = V_fill/(hW²) + α Q_G/Q_L from the junction geometry; square tee: 0.841 + 1.462 Q_G/Q_L; L_S = L_B Q_L/Q_G",
    source: "van Steijn, Kleijn & Kreutzer (2010) Lab Chip 10, 2513–2518; checked against a published replication's values",
    validity: SQUEEZING_VALIDITY,
};
