//! The packed cartridge's operating map: flow × particle size, each cell coloured by the worst of
//! the pressure-budget, lifting, wall-effect and plug-flow verdicts, computed with the
//! calculator's own functions (every pressure-drop correlation for the budget's spread, Wen–Yu
//! and the lowest minimum fluidisation correlation for lifting, D_t/d_p and L/d_p). Hover values: bed pressure drop (Ergun), inlet
//! pressure and residence time between the particles.

use super::flow::BedFlow;
use super::minimum_fluidisation::{FluidisationInput, minimum_fluidisation_spread};
use super::pressure_drop::{PressureDropModel, RECOMMENDED};
use super::{PackedBedInput, geometry, lifting_verdict, plug_flow_check, pressure_verdict, wall_check};
use crate::physics::map::{CONTOUR_LEVELS, Contour, Map, MapAxis, MapLayer, fill_monotone};
use crate::physics::report::Verdict;
use crate::physics::units::{Dimension, Length, VolumetricFlow};

/// Cells along each axis.
pub const CELLS: usize = 256;

/// Flow axis: from 1/100 of the case's flow (at most 0.01 mL/min) to the pump's largest flow.
fn flow_axis(input: &PackedBedInput, n: usize) -> MapAxis {
    let top = input.pump_max_flow.si().max(input.flow.si());
    let low = (input.flow.si() / 100.0).min(0.01e-6 / 60.0);
    MapAxis::log("flow", "Flow", Dimension::VolumetricFlow, low, top, n)
}

/// Particle-size axis: 5 µm to a fifth of the cartridge bore (about the coarsest that packs),
/// widened to take the case's own size; the entry it sweeps is d10 when a distribution is entered
/// (the size every correlation uses).
fn size_axis(input: &PackedBedInput, n: usize) -> MapAxis {
    let d = input.particle_diameter.si();
    let low = d.min(5e-6);
    let high = (input.tube_diameter.si() / 5.0).max(d * 1.5);
    match input.distribution {
        // d10 sets every correlation; a chosen cell scales d50 and d90 with it.
        Some(_) => MapAxis::log("d10", "Particle size d10 (sets the pressure drop; d50 and d90 scaled with it)", Dimension::Length, low, high, n),
        None => MapAxis::log("particle_diameter", "Particle size (the size that sets the pressure drop)", Dimension::Length, low, high, n),
    }
}

/// The map of `input` with `n` × `n` cells.
pub fn cartridge_map(input: &PackedBedInput, n: usize) -> Map {
    build(input, n, false)
}

/// The map; `every_cell` evaluates the verdict at every cell instead of by bisection along the
/// rows (for the test that the two agree).
fn build(input: &PackedBedInput, n: usize, every_cell: bool) -> Map {
    let x = flow_axis(input, n);
    let y = size_axis(input, n);
    let cells = n * n;
    let mut verdicts = vec![None; cells];
    let mut dp = vec![f64::NAN; cells];
    let mut inlet = vec![f64::NAN; cells];
    let mut tau = vec![f64::NAN; cells];
    let back = input.back_pressure.si();
    let rating = input.rating.si();
    for (iy, &d) in y.values.iter().enumerate() {
        let particle = Length::from_si(d);
        let Ok(voidage) = input.voidage.resolve(input.shape, particle, input.tube_diameter) else { continue };
        let eps = voidage.value;
        let umf = minimum_fluidisation_spread(&FluidisationInput {
            particle_diameter: particle,
            particle_density: input.solid.wet_density(input.density),
            density: input.density,
            viscosity: input.viscosity,
            voidage: eps,
            sphericity: input.shape.sphericity(),
        })
        .ok()
        .map(|f| f.map(|f| (f.value.get(), f.spread().0)));
        let Some(umf) = umf else { continue };
        // A bed given by its mass is as long as that mass packs at this size's voidage.
        let bed_length = input.bed_length_with(eps.si());
        let void = geometry::void_volume(geometry::bed_volume(input.tube_diameter, bed_length), eps);
        // The checks that depend on the size alone: wall effect (D_t/d_p) and plug flow (L/d_p).
        let at_case_flow = BedFlow {
            particle_diameter: input.shape.effective_diameter(particle),
            voidage: eps,
            superficial_velocity: geometry::superficial_velocity(input.flow, input.tube_diameter),
            density: input.density,
            viscosity: input.viscosity,
            length: bed_length,
            tube_diameter: input.tube_diameter,
        };
        let by_size = wall_check(input.tube_diameter.si() / d, &at_case_flow).verdict.max(plug_flow_check(bed_length.si() / d).verdict);
        // The verdict along the row: every pressure-drop correlation and the lifting margin rise
        // with the flow, so it only worsens as the flow rises and is found at the ends and
        // wherever it changes (bisection); the hover values need Ergun alone at every cell.
        let bed_at = |q: f64| BedFlow { superficial_velocity: geometry::superficial_velocity(VolumetricFlow::from_si(q), input.tube_diameter), ..at_case_flow };
        let verdict_at = |ix: usize| -> Option<Verdict> {
            let bed = bed_at(x.values[ix]);
            let recommended = RECOMMENDED.pressure_drop(&bed).si();
            let worst = PressureDropModel::ALL.iter().map(|m| m.pressure_drop(&bed).si()).fold(recommended, f64::max);
            let pressure = pressure_verdict(back + recommended, back, worst, rating);
            let lifting = lifting_verdict(input.direction, bed.superficial_velocity.si(), umf);
            (recommended.is_finite() && worst.is_finite()).then(|| pressure.max(lifting).max(by_size))
        };
        let row = &mut verdicts[iy * n..(iy + 1) * n];
        if every_cell {
            row.iter_mut().enumerate().for_each(|(ix, v)| *v = verdict_at(ix));
        } else {
            fill_monotone(row, 0, n - 1, &verdict_at);
        }
        for (ix, &q) in x.values.iter().enumerate() {
            let i = iy * n + ix;
            if verdicts[i].is_some() {
                let recommended = RECOMMENDED.pressure_drop(&bed_at(q)).si();
                dp[i] = recommended;
                inlet[i] = back + recommended;
                tau[i] = geometry::residence_time(void, VolumetricFlow::from_si(q)).si();
            }
        }
    }
    let basis = format!(
        "Colour: the worst of the pressure budget (inlet pressure by Ergun, and back-pressure plus the highest of {} correlations, \
         against the {} bar(g) limit; caution within 20 %, common practice, no source), bed lifting in up-flow (Wen–Yu and the \
         lowest minimum-fluidisation correlation), the wall effect (D_t/d_p below 10) and plug flow (L/d_p below 50). The bed ({} mm × {} mm), liquid and back-pressure are the case's; the voidage is \
         re-estimated for each size when it is estimated. Lines: residence time between the particles.",
        PressureDropModel::ALL.len(),
        crate::physics::units::format_significant(rating / 1e5, 3),
        crate::physics::units::format_significant(input.tube_diameter.si() * 1e3, 3),
        crate::physics::units::format_significant(input.bed_length.si() * 1e3, 3),
    );
    let layers = vec![
        MapLayer { label: "Bed pressure drop (Ergun)", dimension: Dimension::PressureDifference, values: dp },
        MapLayer { label: "Inlet pressure (gauge)", dimension: Dimension::PressureDifference, values: inlet },
        MapLayer { label: "Residence time between particles", dimension: Dimension::Duration, values: tau },
    ];
    let contours = vec![Contour::round(&layers, 2, CONTOUR_LEVELS)];
    Map {
        key: "cartridge_map",
        title: "Where this cartridge works: flow × particle size",
        basis,
        x,
        y,
        verdicts,
        layers,
        limit_names: Vec::new(),
        limiting: Vec::new(),
        contours,
        current: (input.flow.si(), input.particle_diameter.si()),
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    /// The demo cartridge, with `changes` to its entries.
    fn demo(changes: &[(&str, serde_json::Value)]) -> PackedBedInput {
        use crate::case::{Calculator, CaseFile, EntrySource};
        let mut doc: serde_json::Value = serde_json::from_str(Calculator::PackedBed.demo_json()).unwrap();
        for (k, v) in changes {
            doc["inputs"][*k] = v.clone();
        }
        let c = CaseFile::from_json(&doc.to_string()).unwrap();
        PackedBedInput::from_source(&EntrySource(&c.inputs)).unwrap()
    }

    #[test]
    fn bisection_along_the_rows_gives_every_cell_as_evaluating_each_does() {
        // The demo (down-flow), up-flow (lifting), and a lower rating (8 bar instead of 20).
        let up = [("flow_direction", serde_json::json!("up"))];
        let low = [("pressure_rating", serde_json::json!({"value": 8, "unit": "bar"}))];
        for input in [demo(&[]), demo(&up), demo(&low)] {
            let fast = cartridge_map(&input, CELLS);
            let slow = build(&input, CELLS, true);
            assert_eq!(fast.verdicts, slow.verdicts);
            for (a, b) in fast.layers.iter().zip(&slow.layers) {
                assert!(a.values.iter().zip(&b.values).all(|(u, v)| u == v || (u.is_nan() && v.is_nan())));
            }
            let kinds: std::collections::BTreeSet<_> = fast.verdicts.iter().collect();
            assert!(kinds.len() >= 2, "{kinds:?}");
        }
    }
}
