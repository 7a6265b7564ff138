//! Formatting of numbers to a chosen count of significant figures for display.

/// Formats `value` with `sig` significant figures (1 to 15). Plain notation for magnitudes in
/// [1e-3, 1e6), scientific notation (`1.23e-5`) outside; trailing zeros are kept, because they
/// carry the precision.
pub fn format_significant(value: f64, sig: usize) -> String {
    if !value.is_finite() {
        return "—".to_owned();
    }
    let sig = sig.clamp(1, 15);
    if value == 0.0 {
        return if sig > 1 { format!("0.{}", "0".repeat(sig - 1)) } else { "0".to_owned() };
    }
    // Round once in scientific form, then read the exponent of the rounded number.
    let sci = format!("{:.*e}", sig - 1, value);
    let exponent: i32 = sci.rsplit('e').next().and_then(|e| e.parse().ok()).unwrap_or(0);
    if !(-3..6).contains(&exponent) {
        return sci;
    }
    let decimals = sig as i32 - 1 - exponent;
    if decimals >= 0 {
        let decimals = decimals as usize;
        format!("{value:.decimals$}")
    } else {
        // More integer digits than significant figures: round the surplus digits to zero.
        let step = 10f64.powi(-decimals);
        format!("{:.0}", (value / step).round() * step)
    }
}
