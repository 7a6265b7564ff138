//! The packed cartridge's operating map: flow × particle size, each cell coloured by the worst of
//! the pressure-budget, lifting, wall-effect and plug-flow verdicts, computed with the
//! calculator's own functions (every pressure-drop correlation for the budget's spread, Wen–Yu
//! and the lowest minimum fluidisation correlation for lifting, D_t/d_p and L/d_p). Hover values: bed pressure drop (Ergun), inlet
//! pressure and residence time between the particles.

use super::flow::BedFlow;
use super::minimum_fluidisation::{FluidisationInput, minimum_fluidisation_spread};
use super::pressure_drop::{PressureDropModel, RECOMMENDED};
use super::{PackedBedInput, geometry, lifting_verdict, plug_flow_check, pressure_verdict, wall_check};
use crate::physics::map::{Map, MapAxis, MapLayer};
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
/// widened to take the case's own size.
fn size_axis(input: &PackedBedInput, n: usize) -> MapAxis {
    let d = input.particle_diameter.si();
    let low = d.min(5e-6);
    let high = (input.tube_diameter.si() / 5.0).max(d * 1.5);
    MapAxis::log("particle_diameter", "Particle size (the size that sets the pressure drop)", Dimension::Length, low, high, n)
}

/// The map of `input` with `n` × `n` cells.
pub fn cartridge_map(input: &PackedBedInput, n: usize) -> Map {
    let x = flow_axis(input, n);
    let y = size_axis(input, n);
    let cells = n * n;
    let mut verdicts = vec![None; cells];
    let mut dp = vec![f64::NAN; cells];
    let mut inlet = vec![f64::NAN; cells];
    let mut tau = vec![f64::NAN; cells];
    let back = input.back_pressure.si();
    let rating = input.rating.si();
    let v_bed = geometry::bed_volume(input.tube_diameter, input.bed_length);
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
        let void = geometry::void_volume(v_bed, eps);
        // The checks that depend on the size alone: wall effect (D_t/d_p) and plug flow (L/d_p).
        let at_case_flow = BedFlow {
            particle_diameter: input.shape.effective_diameter(particle),
            voidage: eps,
            superficial_velocity: geometry::superficial_velocity(input.flow, input.tube_diameter),
            density: input.density,
            viscosity: input.viscosity,
            length: input.bed_length,
            tube_diameter: input.tube_diameter,
        };
        let by_size = wall_check(input.tube_diameter.si() / d, &at_case_flow).verdict.max(plug_flow_check(input.bed_length.si() / d).verdict);
        for (ix, &q) in x.values.iter().enumerate() {
            let flow = VolumetricFlow::from_si(q);
            let u = geometry::superficial_velocity(flow, input.tube_diameter);
            let bed = BedFlow { superficial_velocity: u, ..at_case_flow };
            let recommended = RECOMMENDED.pressure_drop(&bed).si();
            let worst = PressureDropModel::ALL.iter().map(|m| m.pressure_drop(&bed).si()).fold(recommended, f64::max);
            let i = iy * n + ix;
            let pressure = pressure_verdict(back + recommended, back, worst, rating);
            let lifting = lifting_verdict(input.direction, u.si(), umf);
            if recommended.is_finite() && worst.is_finite() {
                verdicts[i] = Some(pressure.max(lifting).max(by_size));
                dp[i] = recommended;
                inlet[i] = back + recommended;
                tau[i] = geometry::residence_time(void, flow).si();
            }
        }
    }
    let basis = format!(
        "Colour: the worst of the pressure budget (inlet pressure by Ergun, and back-pressure plus the highest of {} correlations, \
         against the {} bar(g) limit; caution within 20 %, common practice, no source), bed lifting in up-flow (Wen–Yu and the \
         lowest minimum-fluidisation correlation), the wall effect (D_t/d_p below 10) and plug flow (L/d_p below 50). The bed ({} mm × {} mm), liquid and back-pressure are the case's; the voidage is \
         re-estimated for each size when it is estimated.",
        PressureDropModel::ALL.len(),
        crate::physics::units::format_significant(rating / 1e5, 3),
        crate::physics::units::format_significant(input.tube_diameter.si() * 1e3, 3),
        crate::physics::units::format_significant(input.bed_length.si() * 1e3, 3),
    );
    Map {
        key: "cartridge_map",
        title: "Where this cartridge works: flow × particle size",
        basis,
        x,
        y,
        verdicts,
        layers: vec![
            MapLayer { label: "Bed pressure drop (Ergun)", dimension: Dimension::PressureDifference, values: dp },
            MapLayer { label: "Inlet pressure (gauge)", dimension: Dimension::PressureDifference, values: inlet },
            MapLayer { label: "Residence time between particles", dimension: Dimension::Duration, values: tau },
        ],
        limit_names: Vec::new(),
        limiting: Vec::new(),
        current: (input.flow.si(), input.particle_diameter.si()),
    }
}
