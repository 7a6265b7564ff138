//! Charts along the coil, from the gas–liquid junction to the back-pressure regulator: pressure,
//! bubble and slug length, gas fraction and holdup. Data only; the page draws them.

use super::flow::TwoPhaseFlow;
use super::lengths::{LengthModel, RECOMMENDED};
use super::pressure_profile::Profile;
use crate::physics::plot::{Axis, Marker, Plot};
use crate::physics::units::{Dimension, Pressure, PressureDifference, VolumetricFlow};

fn along(key: &'static str, title: &'static str, label: &'static str, dimension: Dimension) -> Plot {
    Plot::new(
        key,
        title,
        Axis { label: "Distance from the junction", dimension: Dimension::Length, log: false, unit: "m" },
        Axis { label, dimension, log: false, unit: "" },
    )
}

/// The three profiles. `rating` is the lowest component rating (gauge), drawn as an absolute
/// limit on the pressure chart with the atmospheric pressure `ambient`, as in the calculation.
pub fn profiles(profile: &Profile, rating: PressureDifference, ambient: Pressure) -> Vec<Plot> {
    let z = &profile.position;
    let pairs = |v: &[f64]| z.iter().copied().zip(v.iter().copied()).collect::<Vec<_>>();

    let mut pressure = along("pressure_profile", "Pressure along the coil", "Pressure (absolute)", Dimension::Pressure);
    pressure.line("Pressure (recommended model)", pairs(&profile.pressure), true);
    pressure.mark(Marker::Horizontal {
        label: "Lowest component rating (as absolute)".to_owned(),
        y: rating.si() + ambient.pascals(),
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

/// Gas fractions β on the grid of the length charts.
const FRACTIONS: usize = 37;

/// Bubble and slug length at the junction against the feed gas fraction β, for every length
/// correlation, at the entered liquid flow (the gas flow varies), with the operating point.
pub fn lengths_vs_gas_fraction(junction: &TwoPhaseFlow) -> Vec<Plot> {
    let axis_x = Axis { label: "Gas fraction β at the junction", dimension: Dimension::Fraction, log: false, unit: "" };
    let axis_y = Axis { label: "Length", dimension: Dimension::Length, log: false, unit: "" };
    let mut bubble = Plot::new("bubble_length_vs_gas_fraction", "Bubble length against gas fraction", axis_x, axis_y);
    let mut slug = Plot::new("slug_length_vs_gas_fraction", "Liquid-slug length against gas fraction", axis_x, axis_y);
    let q_l = junction.liquid_flow.si();
    let grid: Vec<f64> = (0..FRACTIONS).map(|i| 0.05 + 0.9 * i as f64 / (FRACTIONS - 1) as f64).collect();
    for model in LengthModel::ALL {
        let at = |beta: f64| {
            let flow = TwoPhaseFlow { gas_flow: VolumetricFlow::from_si(q_l * beta / (1.0 - beta)), ..*junction };
            model.lengths(&flow)
        };
        let name = model.info().name;
        let emphasis = model == RECOMMENDED;
        bubble.line(name, grid.iter().map(|&b| (b, at(b).0)), emphasis);
        slug.line(name, grid.iter().map(|&b| (b, at(b).1)), emphasis);
    }
    let beta0 = junction.gas_fraction();
    let (lb, ls) = RECOMMENDED.lengths(junction);
    bubble.mark(Marker::Point { label: "This flow".to_owned(), x: beta0, y: lb });
    slug.mark(Marker::Point { label: "This flow".to_owned(), x: beta0, y: ls });
    vec![bubble, slug]
}
