//! Chart of settling velocity against particle size for the slurry line: which sizes settle out
//! in which element. Data only; the page draws it.

use super::series::{SeriesInput, settling_series};
use super::size_distribution::ParticleSize;
use super::{ElementKind, Orientation, SlurryInput};
use super::element::UPFLOW_MARGIN;
use crate::physics::pipe_flow::bore_area;
use crate::physics::plot::{Axis, Marker, Plot};
use crate::physics::report::NumericalError;
use crate::physics::units::{Dimension, Length};

/// Points on the size grid.
const POINTS: usize = 49;

/// Hindered and single-particle settling velocity against size, from a third of the smallest to
/// three times the largest size entered (0.5 µm to 2 mm at most), with the sizes entered marked
/// and, per element, the velocity above which particles settle out: D/τ for a horizontal
/// element (they fall across the bore within its residence time) and U/5 for up-flow (the
/// carrying margin, common practice, no source).
pub fn settling_vs_size(input: &SlurryInput, solids_fraction: f64) -> Result<Plot, NumericalError> {
    let mut plot = Plot::new(
        "settling_vs_size",
        "Settling velocity against particle size",
        Axis { label: "Particle size", dimension: Dimension::Length, log: true, unit: "µm" },
        Axis { label: "Settling velocity", dimension: Dimension::Velocity, log: true, unit: "" },
    );
    let (small, large) = match input.size {
        ParticleSize::Single { diameter } => (diameter.si(), diameter.si()),
        ParticleSize::Distribution { d10, d90, .. } => (d10.si(), d90.si()),
    };
    // The bore of the first horizontal run sets the (weak) wall term of hindered settling.
    let bore = input
        .elements
        .iter()
        .find(|e| e.orientation == Orientation::Horizontal && matches!(e.kind, ElementKind::Tubing | ElementKind::Coil))
        .or(input.elements.first())
        .map_or(Length::from_si(1e-3), |e| e.inner_diameter);
    // Sizes that fit through the bore: across a narrower passage there is no time to settle.
    let smallest = (small / 3.0).max(0.5e-6);
    let largest = (large * 3.0).min(2e-3).min(bore.si() * 0.99);
    let series = settling_series(&SeriesInput {
        particle: input.particle(input.size.median()),
        solids_fraction,
        bore,
        smallest: Length::from_si(smallest),
        largest: Length::from_si(largest),
        points: if largest > smallest { POINTS } else { 0 },
    })?;
    plot.line("Single particle (recommended drag law)", series.iter().map(|p| (p.diameter.si(), p.terminal_velocity.si())), false);
    plot.line("Hindered (Richardson–Zaki)", series.iter().map(|p| (p.diameter.si(), p.hindered_velocity.si())), true);
    match input.size {
        ParticleSize::Single { diameter } => plot.mark(Marker::Vertical { label: "Particle size".to_owned(), x: diameter.si(), limit: false }),
        ParticleSize::Distribution { d10, d50, d90 } => {
            for (name, d) in [("d10", d10), ("d50", d50), ("d90", d90)] {
                plot.mark(Marker::Vertical { label: name.to_owned(), x: d.si(), limit: false });
            }
        }
    }
    let q = input.flow.si();
    for (i, e) in input.elements.iter().enumerate() {
        let u = q / bore_area(e.inner_diameter);
        match e.orientation {
            Orientation::Horizontal if matches!(e.kind, ElementKind::Tubing | ElementKind::Coil) => {
                let tau = e.length.si() / u;
                plot.mark(Marker::Horizontal {
                    label: format!("Element {}: settles out above D/τ", i + 1),
                    y: e.inner_diameter.si() / tau,
                    limit: true,
                });
            }
            Orientation::Up => plot.mark(Marker::Horizontal {
                label: format!("Element {}: carried up below U/{UPFLOW_MARGIN}", i + 1),
                y: u / UPFLOW_MARGIN,
                limit: true,
            }),
            _ => {}
        }
    }
    Ok(plot)
}
