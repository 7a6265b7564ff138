//! Charts along the coil, from the gas–liquid junction to the back-pressure regulator: pressure,
//! bubble and slug length, gas fraction and holdup. Data only; the page draws them.

use super::pressure_profile::Profile;
use crate::physics::plot::{Axis, Marker, Plot};
use crate::physics::units::{Dimension, PressureDifference, STANDARD_ATMOSPHERE};

fn along(key: &'static str, title: &'static str, label: &'static str, dimension: Dimension) -> Plot {
    Plot::new(
        key,
        title,
        Axis { label: "Distance from the junction", dimension: Dimension::Length, log: false, unit: "m" },
        Axis { label, dimension, log: false, unit: "" },
    )
}

/// The three profiles. `rating` is the lowest component rating (gauge), drawn as an absolute
/// limit on the pressure chart (ambient taken as 1 atm, as in the calculation).
pub fn profiles(profile: &Profile, rating: PressureDifference) -> Vec<Plot> {
    let z = &profile.position;
    let pairs = |v: &[f64]| z.iter().copied().zip(v.iter().copied()).collect::<Vec<_>>();

    let mut pressure = along("pressure_profile", "Pressure along the coil", "Pressure (absolute)", Dimension::Pressure);
    pressure.line("Pressure (recommended model)", pairs(&profile.pressure), true);
    pressure.mark(Marker::Horizontal {
        label: "Lowest component rating (as absolute)".to_owned(),
        y: rating.si() + STANDARD_ATMOSPHERE.pascals(),
        limit: true,
    });

    let mut lengths = along("length_profile", "Bubble and slug length along the coil", "Length", Dimension::Length);
    lengths.line("Bubble", pairs(&profile.bubble_length), true);
    lengths.line("Liquid slug", pairs(&profile.slug_length), false);

    let mut fractions = along("fraction_profile", "Gas fraction along the coil", "Fraction", Dimension::Fraction);
    fractions.line("Gas holdup ε_G", pairs(&profile.holdup), true);
    fractions.line("Feed gas fraction β", pairs(&profile.gas_fraction), false);

    vec![pressure, lengths, fractions]
}
