//! Unit conversions against NIST Special Publication 811 (2008), Appendix B, number parsing and
//! significant-figure formatting.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use clearbore::physics::units::*;

fn si(dimension: Dimension, symbol: &str, value: f64) -> f64 {
    unit_by_symbol(dimension, symbol).unwrap_or_else(|| panic!("{symbol}")).to_si(value)
}

#[test]
fn factors_match_nist_sp_811() {
    // NIST SP 811 B.8: inch = 2.54 E-02 m (exact)
    assert_eq!(si(Dimension::Length, "in", 1.0), 0.0254);
    // pound-force per square inch = 6.894 757 E+03 Pa
    assert_eq!(si(Dimension::PressureDifference, "psi", 1.0), 6894.757);
    // standard atmosphere = 1.013 25 E+05 Pa (exact)
    assert_eq!(si(Dimension::Pressure, "atm", 1.0), 101_325.0);
    // bar = 1.0 E+05 Pa (exact); centipoise = 1.0 E-03 Pa·s (exact)
    assert_eq!(si(Dimension::PressureDifference, "bar", 1.0), 1e5);
    assert_eq!(si(Dimension::DynamicViscosity, "cP", 1.0), 1e-3);
    // litre = 1.0 E-03 m³ (exact), minute = 60 s, hour = 3600 s
    assert!((si(Dimension::VolumetricFlow, "mL/min", 1.0) - 1e-6 / 60.0).abs() < 1e-22);
    assert!((si(Dimension::VolumetricFlow, "L/h", 3.6) - 1e-6).abs() < 1e-20);
    // degree Celsius: T/K = t/°C + 273.15 (exact)
    assert!((si(Dimension::Temperature, "°C", 25.0) - 298.15).abs() < 1e-12);
    assert!((si(Dimension::Concentration, "mol/L", 1.0) - 1000.0).abs() < 1e-12);
}

#[test]
fn every_unit_round_trips() {
    let all = [
        Dimension::Length, Dimension::Volume, Dimension::VolumetricFlow, Dimension::Duration,
        Dimension::PressureDifference, Dimension::Pressure, Dimension::Temperature,
        Dimension::SurfaceTension, Dimension::Diffusivity, Dimension::DynamicViscosity,
        Dimension::Density, Dimension::Concentration, Dimension::MolarMass, Dimension::Mass,
        Dimension::Amount, Dimension::SpecificAmount, Dimension::Frequency,
        Dimension::MassFlow, Dimension::MolarFlow, Dimension::SpaceTimeYield, Dimension::Velocity, Dimension::Fraction,
        Dimension::Number, Dimension::Force,
    ];
    for d in all {
        for u in d.units() {
            for x in [1e-7, 0.37, 1.0, 42.5, 3.3e5] {
                let back = u.from_si(u.to_si(x));
                // Relative to the larger of the value and the scale offset (273.15 for °C): a
                // value near zero on an offset scale carries the offset's rounding.
                let scale = x.abs().max((u.offset / u.factor).abs());
                assert!((back - x).abs() < 1e-12 * scale, "{d:?} {}: {x} → {back}", u.symbol);
            }
            assert_eq!(unit_by_symbol(d, u.symbol), Some(*u));
        }
    }
    // "u" is accepted for "µ"
    assert_eq!(unit_by_symbol(Dimension::VolumetricFlow, "uL/min").map(|u| u.symbol), Some("µL/min"));
}

#[test]
fn typed_numbers() {
    assert_eq!(parse_number(" 2.5 "), Ok(2.5));
    assert_eq!(parse_number("1e-3"), Ok(1e-3));
    assert_eq!(parse_number("-4"), Ok(-4.0));
    assert_eq!(parse_number(""), Err(NumberError::Empty));
    assert_eq!(parse_number("abc"), Err(NumberError::NotANumber));
    assert_eq!(parse_number("inf"), Err(NumberError::NotANumber));
    assert_eq!(parse_number("NaN"), Err(NumberError::NotANumber));
    assert_eq!(parse_number("1,5"), Err(NumberError::Comma));
    assert_eq!(parse_number("1e400"), Err(NumberError::NotFinite));
    assert_eq!(parse_number("1.2.3"), Err(NumberError::NotANumber));
}

#[test]
fn significant_figures() {
    assert_eq!(format_significant(9.073_32, 4), "9.073");
    assert_eq!(format_significant(9.999_6, 4), "10.00");
    assert_eq!(format_significant(0.000_123_46, 4), "1.235e-4");
    assert_eq!(format_significant(0.001_234_6, 3), "0.00123");
    assert_eq!(format_significant(123_456.0, 3), "123000");
    assert_eq!(format_significant(2.5e7, 3), "2.50e7");
    assert_eq!(format_significant(-0.5, 2), "-0.50");
    assert_eq!(format_significant(0.0, 3), "0.00");
    assert_eq!(format_significant(f64::NAN, 3), "—");
}

#[test]
fn gauge_and_absolute_pressure() {
    let p = Pressure::from_gauge(PressureDifference::from_bar(5.0), STANDARD_ATMOSPHERE);
    assert!((p.pascals() - 601_325.0).abs() < 1e-9);
    assert!((p.gauge(STANDARD_ATMOSPHERE).bar() - 5.0).abs() < 1e-12);
    assert!((Temperature::from_celsius(80.0).kelvin() - 353.15).abs() < 1e-12);
}

#[test]
fn display_units_follow_the_size_of_the_value() {
    use clearbore::physics::units::Dimension;
    // The examples of the page's worst readings: 1.694e-4 mm, 0.002798 min, 5.13e-4 bar.
    assert_eq!(Dimension::Length.show(1.694e-7, 4), "0.1694 µm");
    assert_eq!(Dimension::Duration.show(0.002798 * 60.0, 4), "0.1679 s");
    assert_eq!(Dimension::PressureDifference.show(51.3, 3), "0.513 mbar");
    // Values that read well in the lab default keep it.
    assert_eq!(Dimension::Length.show(0.76e-3, 3), "0.760 mm");
    assert_eq!(Dimension::Duration.show(544.4, 4), "9.073 min");
    assert_eq!(Dimension::PressureDifference.show(5.03e5, 3), "5.03 bar");
    assert_eq!(Dimension::VolumetricFlow.show(0.05e-6 / 60.0, 3), "50.0 µL/min");
    assert_eq!(Dimension::Fraction.show(0.25, 3), "25.0 %");
    // Far outside every unit's band: the closest one.
    assert_eq!(Dimension::Length.display_unit(1e-12).symbol, "µm");
    assert_eq!(Dimension::Number.show(41.0, 3), "41.0");
}

#[test]
fn ranges_are_read_in_every_written_form() {
    use clearbore::physics::units::{TypedRange, parse_range};
    let r = |t: &str| parse_range(t).unwrap().unwrap();
    assert_eq!(r("0.36–0.42"), TypedRange { nominal: 0.39, low: 0.36, high: 0.42 });
    assert_eq!(r("0.36 to 0.42").low, 0.36);
    assert_eq!(r("0.36-0.42").high, 0.42);
    assert_eq!(r("1e-3-2e-3"), TypedRange { nominal: 1.5e-3, low: 1e-3, high: 2e-3 });
    assert_eq!(r("25 ± 20 %"), TypedRange { nominal: 25.0, low: 20.0, high: 30.0 });
    assert_eq!(r("25 +- 5"), TypedRange { nominal: 25.0, low: 20.0, high: 30.0 });
    // Plain numbers, negative numbers and exponents are not ranges.
    for plain in ["25", "-3", "1e-3", "-1e-3", "abc"] {
        assert!(parse_range(plain).is_none(), "{plain}");
    }
    // A reversed range or a bad part is an error.
    assert!(parse_range("0.42–0.36").unwrap().is_err());
    assert!(parse_range("0.36–x").unwrap().is_err());
}
