//! Schematic data the page draws from a report: a line of parts in flow order (the slurry line,
//! and any multi-part setup) with each part's verdict, size and key quantities and the pressure
//! at every node; and a to-scale strip of gas bubbles and liquid slugs. Data only: no drawing.

use serde::Serialize;

use super::report::{Finite, NumericalError, Verdict};
use super::units::Dimension;

/// A drawing the page shows with the results.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(tag = "kind", rename_all = "snake_case")]
pub enum Diagram {
    /// Parts in flow order.
    Line(LineDiagram),
    /// Bubbles and slugs to scale.
    Slugs(SlugStrip),
}

/// A quantity shown for every part of a line, as a column of its table.
#[derive(Debug, Clone, Copy, PartialEq, Serialize)]
pub struct Column {
    /// Heading for people.
    pub label: &'static str,
    /// Kind of quantity (fixes the unit).
    pub dimension: Dimension,
}

/// One part of a line.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct LinePart {
    /// What it is, for people ("tubing", "back-pressure regulator seat").
    pub kind: &'static str,
    /// Bore, narrowest opening or pore size, m.
    pub bore: Finite,
    /// Flow-path length, m.
    pub length: Finite,
    /// "horizontal", "up" or "down".
    pub orientation: &'static str,
    /// The worst verdict of its checks.
    pub verdict: Verdict,
    /// Keys of its checks, so that the page can show their detail.
    pub checks: Vec<&'static str>,
    /// One value per column of the line (`None` where it does not apply), SI.
    pub values: Vec<Option<Finite>>,
}

/// Parts in flow order with the pressure at each node.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct LineDiagram {
    /// Stable key.
    pub key: &'static str,
    /// Title for people.
    pub title: &'static str,
    /// What a part is called for people: "Element" (a slurry line) or "Stage" (a setup).
    pub part_word: &'static str,
    /// The parts, first to last.
    pub parts: Vec<LinePart>,
    /// Gauge pressure before the first part, between parts and after the last (parts + 1 values), Pa.
    pub node_pressures: Vec<Finite>,
    /// Index of the narrowest passage.
    pub narrowest: Option<usize>,
    /// The quantities listed for every part.
    pub columns: Vec<Column>,
}

/// Bubbles and slugs at one place along a gas–liquid line.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SlugPlace {
    /// Where ("at the junction", "at the outlet").
    pub label: &'static str,
    /// Bubble length, m.
    pub bubble: Finite,
    /// Liquid slug length, m.
    pub slug: Finite,
}

/// A to-scale strip of the tube with its bubbles and slugs at several places.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct SlugStrip {
    /// Tube bore, m.
    pub bore: Finite,
    /// Wall film thickness, m (drawn between bubble and wall).
    pub film: Finite,
    /// The places shown.
    pub places: Vec<SlugPlace>,
}

/// Node pressures of a line from the pressure after its last part and each part's drop.
pub fn node_pressures(outlet: f64, drops: &[f64]) -> Result<Vec<Finite>, NumericalError> {
    let mut nodes = vec![Finite::new("node pressure", outlet)?];
    let mut p = outlet;
    for dp in drops.iter().rev() {
        p += dp;
        nodes.push(Finite::new("node pressure", p)?);
    }
    nodes.reverse();
    Ok(nodes)
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    #[test]
    fn node_pressures_add_the_drops_upstream_of_the_outlet() {
        let n = node_pressures(5e5, &[100.0, 20.0, 3.0]).unwrap();
        let v: Vec<f64> = n.iter().map(|f| f.get()).collect();
        assert_eq!(v, vec![500_123.0, 500_023.0, 500_003.0, 500_000.0]);
    }
}
