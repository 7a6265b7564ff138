//! The slurry line's operating map: flow × tubing bore, each cell coloured by the worst of every
//! element's settling (deposition, or carrying in up-flow) and clogging verdicts and the line's
//! pressure budget, computed with the calculator's own verdict functions. The bore axis sets the
//! bore of every tubing and coil element; fittings, mixers, valves, seats and frits keep their
//! entered openings. The hindered settling speeds of the size classes depend on the bore (the
//! wall term) but not on the flow: they are computed once per row, and once per map for the
//! elements whose opening is kept. The second map, flow × particle size (d90), keeps every opening
//! and scales the sizes per row; its settling speeds are computed per row.

use super::element::{
    Line, clogging_verdict, deposition, drop_for_model, effective_orientation, horizontal_verdict, line_drop, over_passes,
    pressure_verdict, up_flow_verdict,
};
use super::fuchs_thomas::Deposition;
use super::size_distribution::ParticleSize;
use super::{D90, ElementKind, LineElement, Orientation, PARTICLE_SIZE, SlurryInput, clogging, keys, shields, vertical};
use crate::physics::map::{Map, MapAxis, MapLayer, changes, fill_falling_near};
use crate::physics::pipe_flow;
use crate::physics::report::Verdict;
use crate::physics::settling::Drift;
use crate::physics::settling::richardson_zaki;
use crate::physics::units::{Dimension, Length, Velocity, VolumetricFlow, format_significant};

/// Cells along each axis.
pub const CELLS: usize = 256;

/// Flow axis: 0.05 to 50 mL/min (the range of lab pumps), widened to take the case's flow.
fn flow_axis(input: &SlurryInput, n: usize) -> MapAxis {
    let q = input.flow.si();
    let ml: f64 = 1e-6 / 60.0;
    MapAxis::log("flow", "Flow", Dimension::VolumetricFlow, (0.05 * ml).min(q), (50.0 * ml).max(q), n)
}

/// Bore axis: 0.25 to 4 mm (lab tubing), widened to take the case's bore.
fn bore_axis(bore: f64, n: usize) -> MapAxis {
    MapAxis::log("inner_diameter", "Tubing bore (every tubing and coil element)", Dimension::Length, 0.25e-3_f64.min(bore), 4e-3_f64.max(bore), n)
}

/// Whether the map's bore axis sets this element's bore.
pub fn swept(kind: ElementKind) -> bool {
    matches!(kind, ElementKind::Tubing | ElementKind::Coil)
}

/// What a row knows about one element before the flow is chosen: its opening and the settling
/// speeds in it.
#[derive(Clone)]
struct Passage {
    element: LineElement,
    /// Hindered speed of each size class (Richardson–Zaki), `None` where the largest particles
    /// do not pass (sieving) or the particles follow the liquid.
    speeds: Option<(std::rc::Rc<[f64]>, f64)>,
    clogging: Verdict,
}

/// Terminal speeds (recommended drag law) of the size classes and of the d90 particles, with
/// their Reynolds numbers and the power of it in the Richardson–Zaki exponent: they do not depend
/// on the bore or the flow, so they are computed once per map (per row of the size map), not per
/// passage.
struct Terminal {
    classes: Vec<Settling>,
    largest: Settling,
}

/// One particle size's terminal speed, its Re_t and [`richardson_zaki::reynolds_power`] of it.
#[derive(Clone, Copy)]
struct Settling {
    speed: Velocity,
    reynolds: f64,
    power: f64,
}

fn terminal(line: &Line) -> Option<Terminal> {
    let at = |d: Length| {
        let s = line.suspension(d, d);
        let speed = s.terminal().ok()?;
        let reynolds = s.particle.reynolds(speed);
        Some(Settling { speed, reynolds, power: richardson_zaki::reynolds_power(reynolds) })
    };
    Some(Terminal { classes: line.classes.iter().map(|c| at(c.diameter)).collect::<Option<Vec<_>>>()?, largest: at(line.largest)? })
}

fn passage(line: &Line, terminal: &Terminal, element: LineElement) -> Passage {
    let ratio = element.inner_diameter.si() / line.largest.si();
    let sieving = matches!(clogging::risk(ratio), clogging::ClogRisk::Sieving);
    let speeds = if line.drift == Drift::Neutral || sieving {
        None
    } else {
        let bore = element.inner_diameter;
        // The point evaluation's Richardson–Zaki speeds (`hindered_on`), to the bit.
        let ln_voidage = line.suspension(line.largest, bore).ln_voidage();
        let hindered = |d: Length, t: &Settling| line.suspension(d, bore).richardson_zaki_on(t.speed, t.reynolds, t.power, ln_voidage);
        let classes: std::rc::Rc<[f64]> = line.classes.iter().zip(&terminal.classes).map(|(c, t)| hindered(c.diameter, t)).collect();
        Some((classes, hindered(line.largest, &terminal.largest)))
    };
    Passage { element, speeds, clogging: clogging_verdict(ratio, line.phi) }
}

/// The settling verdict of `p` at flow `q` (as the point evaluation decides it).
fn settling(line: &Line, p: &Passage, prepared: Option<&Deposition>, q: VolumetricFlow) -> Verdict {
    let e = &p.element;
    let Some((_, v90)) = &p.speeds else {
        // Neutral particles are fine; particles that cannot pass are a problem.
        return if line.drift == Drift::Neutral { Verdict::Fine } else { Verdict::Problem };
    };
    let u = pipe_flow::mean_velocity(q, e.inner_diameter).si();
    match effective_orientation(e.orientation, line.drift) {
        Orientation::Horizontal => {
            // Prepared for every horizontal passage with speeds ([`fill_row`]).
            let Some(prepared) = prepared else { return Verdict::Problem };
            let eta = over_passes(prepared.fraction(u), line.input.passes);
            let theta = shields::shields_number(line.input.viscosity.si(), u, e.inner_diameter.si(), line.input.particle(line.largest).density_difference(), line.largest.si());
            horizontal_verdict(eta, theta)
        }
        Orientation::Up => up_flow_verdict(vertical::particle_speed(u, -v90).is_some(), vertical::solids_holdup(line.phi, u, -v90), u, *v90),
        Orientation::Down => Verdict::Fine,
    }
}

/// The names of the checks a cell can be limited by, in the report's order: each element's
/// settling then clogging, then the pressure budget.
fn limit_names(count: usize) -> Vec<String> {
    let mut names: Vec<String> = Vec::with_capacity(2 * count + 1);
    for i in 0..count {
        names.push(keys::SETTLING[i].label.to_owned());
        names.push(keys::CLOGGING[i].label.to_owned());
    }
    names.push("Pressure budget".to_owned());
    names
}

/// Where one element's settling verdict changed along the last two rows of a map.
#[derive(Debug, Clone, Default)]
struct RowHint {
    changes: Vec<usize>,
    before: Vec<usize>,
}

impl RowHint {
    /// Where the next row's changes are looked for first: each change moved on by as much as it
    /// moved between the last two rows (when both had as many changes), within the row of `n`.
    fn predicted(&self, n: usize) -> Vec<usize> {
        if self.before.len() != self.changes.len() {
            return self.changes.clone();
        }
        self.changes.iter().zip(&self.before).map(|(&c, &b)| (2 * c).saturating_sub(b).min(n.saturating_sub(2))).collect()
    }

    /// Takes the changes of the row just filled.
    fn update(&mut self, changes: Vec<usize>) {
        self.before = std::mem::replace(&mut self.changes, changes);
    }
}

/// One row of a map at the flows `flows`: each element's settling verdict (by bisection along the
/// row, or at every cell with `every_cell`), its clogging verdict and the pressure budget's
/// (`budget[ix]`, `None` where the drop is not finite; `budget_cuts` where it changes, as
/// [`changes`] gives them) give each cell's worst verdict and the first check, in the report's
/// order, that has it.
/// `hints` holds, per element, where its settling verdict changed along the rows before (looked
/// at first, moved on by as much as they moved the row before: the changes drift steadily from
/// row to row), and is updated.
#[allow(clippy::too_many_arguments)]
fn fill_row(
    line: &Line,
    passages: &[Passage],
    flows: &[f64],
    budget: &[Option<Verdict>],
    budget_cuts: &[usize],
    every_cell: bool,
    hints: &mut Vec<RowHint>,
    verdicts: &mut [Option<Verdict>],
    limiting: &mut [Option<usize>],
) {
    let n = flows.len();
    hints.resize(passages.len(), RowHint::default());
    // Each element's settling verdict along the row: it only improves as the flow rises, so it
    // is found at the ends and wherever it changes (bisection, starting where the row before
    // changed), not at every cell; an end is not evaluated where the nearest change already has
    // the worst (left) or the best (right) verdict.
    let settling_rows: Vec<Vec<Verdict>> = passages
        .iter()
        .zip(hints.iter_mut())
        .map(|(p, hint)| {
            // The deposition sum prepared once for the row's flows (as the point evaluation
            // prepares it for its one flow).
            let horizontal = effective_orientation(p.element.orientation, line.drift) == Orientation::Horizontal;
            let prepared = p.speeds.as_ref().filter(|_| horizontal).map(|(speeds, _)| deposition(&line.classes, speeds, &p.element));
            let at = |ix: usize| settling(line, p, prepared.as_ref(), VolumetricFlow::from_si(flows[ix]));
            let mut out = vec![Verdict::Fine; n];
            if every_cell {
                out.iter_mut().enumerate().for_each(|(ix, v)| *v = at(ix));
            } else {
                fill_falling_near(&mut out, 0, n - 1, &at, &hint.predicted(n), Verdict::Problem, Verdict::Fine);
            }
            hint.update(changes(&out));
            out
        })
        .collect();
    // Every input of a cell's worst is constant between the cells where a settling row or the
    // budget changes: the worst is found once per such stretch, not once per cell.
    // (Each settling row's changes are its hint for the next row.)
    let mut cuts: Vec<usize> = hints.iter().flat_map(|h| h.changes.iter()).copied().chain(budget_cuts.iter().copied()).collect();
    cuts.sort_unstable();
    cuts.dedup();
    let mut list = vec![Verdict::Fine; 2 * passages.len() + 1];
    let mut start = 0;
    for end in cuts.into_iter().chain(std::iter::once(n - 1)) {
        let ix = start;
        let stretch = start..=end;
        start = end + 1;
        let Some(pressure) = budget[ix] else { continue };
        for (j, p) in passages.iter().enumerate() {
            list[2 * j] = settling_rows[j][ix];
            list[2 * j + 1] = p.clogging;
        }
        list[2 * passages.len()] = pressure;
        // The first of the worst, in the report's order.
        let (at, worse) = list.iter().enumerate().fold((0, Verdict::Fine), |(a, w), (k, &v)| if v > w { (k, v) } else { (a, w) });
        verdicts[stretch.clone()].fill(Some(worse));
        limiting[stretch].fill((worse != Verdict::Fine).then_some(at));
    }
}

/// The line's pressure drop at `flow` with the recommended suspension viscosity, and its budget
/// verdict (against the worst viscosity model), `None` where the drop is not finite.
fn budget(input: &SlurryInput, elements: &[LineElement], mu_s: f64, mu_fig: &crate::physics::report::Figure, flow: VolumetricFlow) -> (f64, Option<Verdict>) {
    let total = line_drop(elements, mu_s, flow);
    let worst = mu_fig.estimates.iter().map(|m| drop_for_model(total, m, mu_s)).fold(f64::NEG_INFINITY, f64::max);
    let back = input.back_pressure.si();
    let verdict = (total.is_finite() && worst.is_finite()).then(|| pressure_verdict(back + total, back, worst, input.rating.si()));
    (total, verdict)
}

/// [`line_map`] with each element's settling verdict evaluated at every cell rather than by
/// bisection along the rows: the same map, many times slower; for the tests that say so.
#[doc(hidden)]
pub fn line_map_every_cell(input: &SlurryInput, n: usize) -> Option<Map> {
    build(input, n, true)
}

/// [`size_map`] evaluated at every cell, as [`line_map_every_cell`].
#[doc(hidden)]
pub fn size_map_every_cell(input: &SlurryInput, n: usize) -> Option<Map> {
    build_size(input, n, true)
}

/// The map of `input` with `n` × `n` cells, or `None` when the line has no tubing or coil (the
/// bore axis would change nothing) or its settling speeds cannot be computed.
pub fn line_map(input: &SlurryInput, n: usize) -> Option<Map> {
    build(input, n, false)
}

/// The map; `every_cell` evaluates each element's settling verdict at every cell instead of by
/// bisection along the rows (for the test that the two agree).
fn build(input: &SlurryInput, n: usize, every_cell: bool) -> Option<Map> {
    let (line, mu_fig) = Line::new(input).ok()?;
    // The case's tubing bore: the narrowest tubing or coil.
    let bore = input.elements.iter().filter(|e| swept(e.kind)).map(|e| e.inner_diameter.si()).reduce(f64::min)?;
    let x = flow_axis(input, n);
    let y = bore_axis(bore, n);
    let cells = n * n;
    let mut verdicts = vec![None; cells];
    let mut limiting = vec![None; cells];
    let mut velocity = vec![f64::NAN; cells];
    let mut drop = vec![f64::NAN; cells];
    let mut inlet = vec![f64::NAN; cells];
    let back = input.back_pressure.si();
    let mu_s = line.mu_s;
    // The terminal speeds once (the point evaluation fails where they cannot be found), and the
    // passages whose opening is kept.
    let terminal = terminal(&line)?;
    let kept: Vec<Option<Passage>> = input.elements.iter().map(|e| (!swept(e.kind)).then(|| passage(&line, &terminal, *e))).collect();
    let count = input.elements.len().min(keys::MAX_ELEMENTS);
    let mut row_budget = vec![None; n];
    let mut hints = Vec::new();
    for (iy, &b) in y.values.iter().enumerate() {
        let tubing = Length::from_si(b);
        let elements: Vec<LineElement> =
            input.elements.iter().map(|e| if swept(e.kind) { LineElement { inner_diameter: tubing, ..*e } } else { *e }).collect();
        // Every swept element shares the row's bore, so their speeds are computed once per row.
        let row = passage(&line, &terminal, LineElement { inner_diameter: tubing, ..elements[0] });
        let passages: Vec<Passage> = elements
            .iter()
            .zip(&kept)
            .take(count)
            .filter_map(|(e, k)| if swept(e.kind) { Some(Passage { element: *e, ..row.clone() }) } else { k.clone() })
            .collect();
        let probe = elements.iter().find(|e| swept(e.kind)).map_or(tubing, |e| e.inner_diameter);
        for (ix, &q) in x.values.iter().enumerate() {
            let flow = VolumetricFlow::from_si(q);
            let (total, verdict) = budget(input, &elements, mu_s, &mu_fig, flow);
            row_budget[ix] = verdict;
            if verdict.is_some() {
                let i = iy * n + ix;
                velocity[i] = pipe_flow::mean_velocity(flow, probe).si();
                drop[i] = total;
                inlet[i] = back + total;
            }
        }
        let span = iy * n..(iy + 1) * n;
        fill_row(&line, &passages, &x.values, &row_budget, &changes(&row_budget), every_cell, &mut hints, &mut verdicts[span.clone()], &mut limiting[span]);
    }
    let kept_words = if input.elements.iter().any(|e| !swept(e.kind)) { "; fittings, mixers, valves, seats and frits keep their entered openings" } else { "" };
    let basis = format!(
        "Each row sets every tubing and coil element to its bore{kept_words}; the mark is at the narrowest tubing or coil bore of the case ({} mm). {}",
        format_significant(bore * 1e3, 3),
        colour_words(input),
    );
    Some(Map {
        key: "slurry_map",
        title: "Where this line works: flow × tubing bore",
        basis,
        x,
        y,
        verdicts,
        layers: vec![
            MapLayer { label: "Mean velocity in the tubing", dimension: Dimension::Velocity, values: velocity },
            MapLayer { label: "Line pressure drop", dimension: Dimension::PressureDifference, values: drop },
            MapLayer { label: "Inlet pressure (gauge)", dimension: Dimension::PressureDifference, values: inlet },
        ],
        limit_names: limit_names(count),
        limiting,
        contours: Vec::new(),
        current: (input.flow.si(), bore),
    })
}

/// What colours a cell of either slurry map, with the sources.
fn colour_words(input: &SlurryInput) -> String {
    format!(
        "Colour: the worst over the elements of settling (deposition in horizontal runs by the Thomas/Fuchs laminar formula with the Shields number; carrying in up-flow, margin U ≥ 5 v_h; \
         Richardson–Zaki hindered settling) and clogging (passage over d90: bridging below 3, Marin et al. 2018; margin below 10, common practice, no source), \
         and the pressure budget (Hagen–Poiseuille with the suspension viscosity against the {} bar(g) rating; caution within 20 %, common practice, no source). \
         The tubing rating at temperature and the liquid's checks are in the report, not on the map.",
        format_significant(input.rating.si() / 1e5, 3),
    )
}

/// Particle-size axis: 1 µm to 1 mm, widened to take the case's d90 (or its one size).
fn size_axis(input: &SlurryInput, largest: f64, n: usize) -> MapAxis {
    let (field, label) = match input.size {
        ParticleSize::Single { .. } => (PARTICLE_SIZE.key, "Particle size (one size)"),
        ParticleSize::Distribution { .. } => (D90.key, "Particle size d90 (d10 and d50 scaled with it)"),
    };
    MapAxis::log(field, label, Dimension::Length, 1e-6_f64.min(largest), 1e-3_f64.max(largest), n)
}

/// The line's second map: flow × particle size, with `n` × `n` cells, or `None` when the
/// suspension viscosity cannot be computed. Each row scales the sizes by one factor
/// ([`ParticleSize::with_largest`]) so that the d90 (or the one size) is the row's value; every
/// element keeps its entered opening. The terminal and hindered speeds depend on the size, so they
/// are computed per row (once per distinct opening); the pressure budget does not (the suspension
/// viscosity depends on the solids fraction alone), so it is computed once per column. A row
/// whose settling speeds cannot be computed is left uncomputed, as the point evaluation fails there.
pub fn size_map(input: &SlurryInput, n: usize) -> Option<Map> {
    build_size(input, n, false)
}

/// The size map; `every_cell` as for [`build`].
fn build_size(input: &SlurryInput, n: usize, every_cell: bool) -> Option<Map> {
    let (line, mu_fig) = Line::new(input).ok()?;
    let largest = input.size.largest().si();
    let x = flow_axis(input, n);
    let y = size_axis(input, largest, n);
    let count = input.elements.len().min(keys::MAX_ELEMENTS);
    let elements = &input.elements[..count];
    let cells = n * n;
    let mut verdicts = vec![None; cells];
    let mut limiting = vec![None; cells];
    let mut velocity = vec![f64::NAN; cells];
    let mut drop = vec![f64::NAN; cells];
    let mut inlet = vec![f64::NAN; cells];
    let mut opening = vec![f64::NAN; cells];
    let back = input.back_pressure.si();
    // The velocity shown: in the narrowest tubing or coil, or else in the first element.
    let tubing = elements.iter().filter(|e| swept(e.kind)).map(|e| e.inner_diameter).reduce(|a, b| if b.si() < a.si() { b } else { a });
    let (probe, velocity_label) = match tubing {
        Some(d) => (d, "Mean velocity in the tubing"),
        None => (elements.first()?.inner_diameter, "Mean velocity in the first element"),
    };
    let narrowest = elements.iter().map(|e| e.inner_diameter.si()).fold(f64::INFINITY, f64::min);
    // The budget per column (the same in every row).
    let columns: Vec<(f64, Option<Verdict>)> = x.values.iter().map(|&q| budget(input, elements, line.mu_s, &mu_fig, VolumetricFlow::from_si(q))).collect();
    let column_budget: Vec<Option<Verdict>> = columns.iter().map(|c| c.1).collect();
    let budget_cuts = changes(&column_budget);
    // The distinct openings: elements of one bore share their settling speeds.
    let mut bores: Vec<Length> = Vec::new();
    for e in elements {
        if !bores.iter().any(|b| b.si() == e.inner_diameter.si()) {
            bores.push(e.inner_diameter);
        }
    }
    let mut row_input = input.clone();
    let mut hints = Vec::new();
    for (iy, &d) in y.values.iter().enumerate() {
        row_input.size = input.size.with_largest(Length::from_si(d));
        let Ok((row_line, _)) = Line::new(&row_input) else { continue };
        let Some(terminal) = terminal(&row_line) else { continue };
        let by_bore: Vec<Passage> = bores.iter().map(|&b| passage(&row_line, &terminal, LineElement { inner_diameter: b, ..elements[0] })).collect();
        let passages: Vec<Passage> = elements
            .iter()
            .filter_map(|e| by_bore.iter().find(|p| p.element.inner_diameter.si() == e.inner_diameter.si()).map(|p| Passage { element: *e, ..p.clone() }))
            .collect();
        for (ix, (&q, &(total, verdict))) in x.values.iter().zip(&columns).enumerate() {
            if verdict.is_some() {
                let i = iy * n + ix;
                velocity[i] = pipe_flow::mean_velocity(VolumetricFlow::from_si(q), probe).si();
                drop[i] = total;
                inlet[i] = back + total;
                opening[i] = narrowest / d;
            }
        }
        let span = iy * n..(iy + 1) * n;
        fill_row(&row_line, &passages, &x.values, &column_budget, &budget_cuts, every_cell, &mut hints, &mut verdicts[span.clone()], &mut limiting[span]);
    }
    let rows = match input.size {
        ParticleSize::Single { .. } => "Each row sets the one particle size".to_owned(),
        ParticleSize::Distribution { d10, d50, d90 } => format!(
            "Each row sets d90 and scales d10 and d50 by the same factor, keeping the shape of the distribution (d10/d90 {}, d50/d90 {})",
            format_significant(d10.si() / d90.si(), 3),
            format_significant(d50.si() / d90.si(), 3)
        ),
    };
    let basis = format!(
        "{rows}; every element keeps its entered opening, and the pressure drop does not depend on the size (the suspension viscosity depends on the solids fraction alone). \
         The mark is at the case's size ({} µm). {}",
        format_significant(largest * 1e6, 3),
        colour_words(input),
    );
    Some(Map {
        key: "slurry_size_map",
        title: "Where this line works: flow × particle size",
        basis,
        x,
        y,
        verdicts,
        layers: vec![
            MapLayer { label: velocity_label, dimension: Dimension::Velocity, values: velocity },
            MapLayer { label: "Line pressure drop", dimension: Dimension::PressureDifference, values: drop },
            MapLayer { label: "Inlet pressure (gauge)", dimension: Dimension::PressureDifference, values: inlet },
            MapLayer { label: "Narrowest opening over d90", dimension: Dimension::Number, values: opening },
        ],
        limit_names: limit_names(count),
        limiting,
        contours: Vec::new(),
        current: (input.flow.si(), largest),
    })
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::*;

    /// The demo line, and with `changes` to its line-level entries.
    fn demo(changes: &[(&str, serde_json::Value)]) -> SlurryInput {
        use crate::case::{Calculator, CaseFile, EntrySource};
        use crate::physics::form::FieldSource;
        let mut doc: serde_json::Value = serde_json::from_str(Calculator::SlurryLine.demo_json()).unwrap();
        for (k, v) in changes {
            doc["inputs"][*k] = v.clone();
        }
        let c = CaseFile::from_json(&doc.to_string()).unwrap();
        let sources: Vec<EntrySource<'_>> = c.elements.iter().map(EntrySource).collect();
        let refs: Vec<&dyn FieldSource> = sources.iter().map(|s| s as _).collect();
        SlurryInput::from_source(&EntrySource(&c.inputs), &refs).unwrap()
    }

    #[test]
    fn row_hints_move_on_by_the_last_shift_within_the_row() {
        let mut h = RowHint::default();
        assert!(h.predicted(256).is_empty());
        h.update(vec![40, 200]);
        // One row seen: its changes as they are.
        assert_eq!(h.predicted(256), vec![40, 200]);
        h.update(vec![42, 199]);
        assert_eq!(h.predicted(256), vec![44, 198]);
        // Never past the last pair of cells, nor before the first.
        h.update(vec![1, 254]);
        assert_eq!(h.predicted(256), vec![0, 254]);
        // A change that appeared or vanished: no shift to carry.
        h.update(vec![5]);
        assert_eq!(h.predicted(256), vec![5]);
    }

    #[test]
    fn bisection_along_the_rows_gives_every_cell_as_evaluating_each_does() {
        // Both maps, for the demo (horizontal and up-flow elements, d10/d50/d90), one 40 µm size,
        // and 8 passes of a loop.
        let single = [("size_mode", serde_json::json!("single")), ("particle_size", serde_json::json!({"value": 40, "unit": "µm"}))];
        let looped = [("operation", serde_json::json!("recirculation")), ("passes", serde_json::json!({"value": 8, "unit": ""}))];
        type Builder = fn(&SlurryInput, usize, bool) -> Option<Map>;
        let maps: [Builder; 2] = [build, build_size];
        for input in [demo(&[]), demo(&single), demo(&looped)] {
            for map in maps {
                let fast = map(&input, CELLS, false).unwrap();
                let slow = map(&input, CELLS, true).unwrap();
                assert_eq!(fast.verdicts, slow.verdicts, "{}", fast.key);
                assert_eq!(fast.limiting, slow.limiting, "{}", fast.key);
                let kinds: std::collections::BTreeSet<_> = fast.verdicts.iter().collect();
                assert!(kinds.len() >= 2, "{}: {kinds:?}", fast.key);
            }
        }
    }

    #[test]
    fn the_suspension_viscosity_and_so_the_budget_do_not_depend_on_the_particle_size() {
        // The size map computes the budget once per column on this.
        let mut input = demo(&[]);
        let (line, figure) = Line::new(&input).unwrap();
        let (mu_s, estimates) = (line.mu_s, figure.estimates.iter().map(|e| e.value.get()).collect::<Vec<_>>());
        for d in [1e-6, 3e-5, 1e-3] {
            input.size = input.size.with_largest(Length::from_si(d));
            let (line, figure) = Line::new(&input).unwrap();
            assert_eq!(line.mu_s, mu_s);
            assert_eq!(figure.estimates.iter().map(|e| e.value.get()).collect::<Vec<_>>(), estimates);
        }
    }

    #[test]
    fn fill_monotone_gives_every_cell_of_a_step_function_either_way() {
        // Steps at 37 and 200 (rising), and a falling one with a single-cell middle step.
        let cases: [&dyn Fn(usize) -> Verdict; 3] = [
            &|i| if i < 37 { Verdict::Fine } else if i < 200 { Verdict::Caution } else { Verdict::Problem },
            &|i| if i < 128 { Verdict::Problem } else if i == 128 { Verdict::Caution } else { Verdict::Fine },
            &|_| Verdict::Caution,
        ];
        for at in cases {
            let mut out = vec![Verdict::Fine; 256];
            crate::physics::map::fill_monotone(&mut out, 0, 255, at);
            assert!((0..256).all(|i| out[i] == at(i)));
        }
    }

    #[test]
    fn fill_falling_near_gives_every_cell_whatever_the_hints_and_skips_the_ends_at_good_ones() {
        use crate::physics::map::fill_falling_near;
        use std::cell::Cell;
        // Falling steps: problem, caution from 37, fine from 200; one with a caution plateau at
        // the right end; one flat.
        let steps: [&dyn Fn(usize) -> Verdict; 3] = [
            &|i| if i < 37 { Verdict::Problem } else if i < 200 { Verdict::Caution } else { Verdict::Fine },
            &|i| if i < 90 { Verdict::Problem } else { Verdict::Caution },
            &|_| Verdict::Fine,
        ];
        for step in steps {
            let exact: Vec<Verdict> = (0..256).map(step).collect();
            let count = |hints: &[usize]| {
                let calls = Cell::new(0);
                let at = |i: usize| {
                    calls.set(calls.get() + 1);
                    step(i)
                };
                let mut out = vec![Verdict::Caution; 256];
                fill_falling_near(&mut out, 0, 255, &at, hints, Verdict::Problem, Verdict::Fine);
                assert_eq!(out, exact, "hints {hints:?}");
                calls.get()
            };
            let right = changes(&exact);
            for hints in [&right[..], &[35, 200], &[3, 250], &[0, 255, 254], &[], &[255]] {
                count(hints);
            }
            // Right hints: both sides of each change, and an end only where its side is not
            // already at the bound.
            let ends = usize::from(step(0) != Verdict::Problem) + usize::from(step(255) != Verdict::Fine);
            if !right.is_empty() {
                assert_eq!(count(&right), 2 * right.len() + ends);
            }
        }
    }

    #[test]
    fn fill_monotone_near_gives_every_cell_whatever_the_hints_and_fewer_evaluations_at_good_ones() {
        use crate::physics::map::{changes, fill_monotone_near};
        use std::cell::Cell;
        let step = |i: usize| if i < 37 { Verdict::Fine } else if i < 200 { Verdict::Caution } else { Verdict::Problem };
        let exact: Vec<usize> = (0..256).map(step).collect::<Vec<_>>().windows(2).enumerate().filter(|(_, w)| w[0] != w[1]).map(|(i, _)| i).collect();
        assert_eq!(exact, vec![36, 199]);
        let count = |hints: &[usize]| {
            let calls = Cell::new(0);
            let at = |i: usize| {
                calls.set(calls.get() + 1);
                step(i)
            };
            let mut out = vec![Verdict::Fine; 256];
            fill_monotone_near(&mut out, 0, 255, &at, hints);
            assert!((0..256).all(|i| out[i] == step(i)), "hints {hints:?}");
            assert_eq!(changes(&out), exact);
            calls.get()
        };
        // Right hints: the two ends and both sides of each change, nothing more.
        assert_eq!(count(&[36, 199]), 6);
        // Hints one cell off, wrong, out of range, none: the same cells, more evaluations.
        for hints in [&[35, 200][..], &[3, 250], &[0, 255, 254], &[]] {
            assert!(count(hints) > 6, "{hints:?}");
        }
    }
}
