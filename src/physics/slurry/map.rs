//! The slurry line's operating map: flow × tubing bore, each cell coloured by the worst of every
//! element's settling (deposition, or carrying in up-flow) and clogging verdicts and the line's
//! pressure budget, computed with the calculator's own verdict functions. The bore axis sets the
//! bore of every tubing and coil element; fittings, mixers, valves, seats and frits keep their
//! entered openings. The hindered settling speeds of the size classes depend on the bore (the
//! wall term) but not on the flow: they are computed once per row, and once per map for the
//! elements whose opening is kept.

use super::element::{
    Line, clogging_verdict, deposited_mass_fraction, drop_for_model, effective_orientation, horizontal_verdict, line_drop, over_passes,
    pressure_verdict, up_flow_verdict,
};
use super::{ElementKind, LineElement, Orientation, SlurryInput, clogging, keys, shields, vertical};
use crate::physics::map::{Map, MapAxis, MapLayer, fill_monotone};
use crate::physics::pipe_flow;
use crate::physics::report::Verdict;
use crate::physics::settling::Drift;
use crate::physics::settling::hindered::HinderedModel;
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
    speeds: Option<(Vec<f64>, f64)>,
    clogging: Verdict,
}

/// Terminal speeds (recommended drag law) of the size classes and of the d90 particles: they do
/// not depend on the bore or the flow, so they are computed once per map.
struct Terminal {
    classes: Vec<Velocity>,
    largest: Velocity,
}

fn terminal(line: &Line) -> Option<Terminal> {
    let at = |d: Length| line.suspension(d, d).terminal().ok();
    Some(Terminal { classes: line.classes.iter().map(|c| at(c.diameter)).collect::<Option<Vec<_>>>()?, largest: at(line.largest)? })
}

fn passage(line: &Line, terminal: &Terminal, element: LineElement) -> Passage {
    let ratio = element.inner_diameter.si() / line.largest.si();
    let sieving = matches!(clogging::risk(ratio), clogging::ClogRisk::Sieving);
    let speeds = if line.drift == Drift::Neutral || sieving {
        None
    } else {
        let bore = element.inner_diameter;
        let hindered = |d: Length, t: Velocity| line.suspension(d, bore).hindered_on(t, HinderedModel::RichardsonZaki).velocity.si();
        let classes = line.classes.iter().zip(&terminal.classes).map(|(c, &t)| hindered(c.diameter, t)).collect();
        Some((classes, hindered(line.largest, terminal.largest)))
    };
    Passage { element, speeds, clogging: clogging_verdict(ratio, line.phi) }
}

/// The settling verdict of `p` at flow `q` (as the point evaluation decides it).
fn settling(line: &Line, p: &Passage, q: VolumetricFlow) -> Verdict {
    let e = &p.element;
    let Some((speeds, v90)) = &p.speeds else {
        // Neutral particles are fine; particles that cannot pass are a problem.
        return if line.drift == Drift::Neutral { Verdict::Fine } else { Verdict::Problem };
    };
    let u = pipe_flow::mean_velocity(q, e.inner_diameter).si();
    match effective_orientation(e.orientation, line.drift) {
        Orientation::Horizontal => {
            let eta = over_passes(deposited_mass_fraction(&line.classes, speeds, e, u), line.input.passes);
            let theta = shields::shields_number(line.input.viscosity.si(), u, e.inner_diameter.si(), line.input.particle(line.largest).density_difference(), line.largest.si());
            horizontal_verdict(eta, theta)
        }
        Orientation::Up => up_flow_verdict(vertical::particle_speed(u, -v90).is_some(), vertical::solids_holdup(line.phi, u, -v90), u, *v90),
        Orientation::Down => Verdict::Fine,
    }
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
    let rating = input.rating.si();
    let mu_s = line.mu_s;
    // The passages whose opening is kept, once.
    // The terminal speeds once (the point evaluation fails where they cannot be found).
    let terminal = terminal(&line)?;
    let kept: Vec<Option<Passage>> = input.elements.iter().map(|e| (!swept(e.kind)).then(|| passage(&line, &terminal, *e))).collect();
    // The checks in the report's order: each element's settling then clogging, then the budget.
    let count = input.elements.len().min(keys::MAX_ELEMENTS);
    let mut limit_names: Vec<String> = Vec::with_capacity(2 * count + 1);
    for i in 0..count {
        limit_names.push(keys::SETTLING[i].label.to_owned());
        limit_names.push(keys::CLOGGING[i].label.to_owned());
    }
    limit_names.push("Pressure budget".to_owned());
    let mut verdict_list = vec![Verdict::Fine; 2 * count + 1];
    let mut settling_rows = vec![vec![Verdict::Fine; n]; count];
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
        // Each element's settling verdict along the row: it only improves as the flow rises, so
        // it is found at the ends and wherever it changes (bisection), not at every cell.
        for (p, out) in passages.iter().zip(settling_rows.iter_mut()) {
            let at = |ix: usize| settling(&line, p, VolumetricFlow::from_si(x.values[ix]));
            if every_cell {
                out.iter_mut().enumerate().for_each(|(ix, v)| *v = at(ix));
            } else {
                fill_monotone(out, 0, n - 1, &at);
            }
        }
        for (ix, &q) in x.values.iter().enumerate() {
            let flow = VolumetricFlow::from_si(q);
            for (j, p) in passages.iter().enumerate() {
                verdict_list[2 * j] = settling_rows[j][ix];
                verdict_list[2 * j + 1] = p.clogging;
            }
            let total = line_drop(&elements, mu_s, flow);
            let worst = mu_fig.estimates.iter().map(|m| drop_for_model(total, m, mu_s)).fold(f64::NEG_INFINITY, f64::max);
            verdict_list[2 * count] = pressure_verdict(back + total, back, worst, rating);
            let i = iy * n + ix;
            if total.is_finite() && worst.is_finite() {
                // The first of the worst, in the report's order.
                let (at, worse) = verdict_list.iter().enumerate().fold((0, Verdict::Fine), |(a, w), (k, &v)| if v > w { (k, v) } else { (a, w) });
                verdicts[i] = Some(worse);
                limiting[i] = (worse != Verdict::Fine).then_some(at);
                velocity[i] = pipe_flow::mean_velocity(flow, probe).si();
                drop[i] = total;
                inlet[i] = back + total;
            }
        }
    }
    let kept_words = if input.elements.iter().any(|e| !swept(e.kind)) { "; fittings, mixers, valves, seats and frits keep their entered openings" } else { "" };
    let basis = format!(
        "Each row sets every tubing and coil element to its bore{kept_words}; the mark is at the narrowest tubing or coil bore of the case ({} mm). \
         Colour: the worst over the elements of settling (deposition in horizontal runs by the Thomas/Fuchs laminar formula with the Shields number; carrying in up-flow, margin U ≥ 5 v_h; \
         Richardson–Zaki hindered settling) and clogging (passage over d90: bridging below 3, Marin et al. 2018; margin below 10, common practice, no source), \
         and the pressure budget (Hagen–Poiseuille with the suspension viscosity against the {} bar(g) rating; caution within 20 %, common practice, no source). \
         The tubing rating at temperature and the liquid's checks are in the report, not on the map.",
        format_significant(bore * 1e3, 3),
        format_significant(rating / 1e5, 3),
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
        limit_names,
        limiting,
        current: (input.flow.si(), bore),
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
    fn bisection_along_the_rows_gives_every_cell_as_evaluating_each_does() {
        // The demo (horizontal and up-flow elements, d10/d50/d90), one 40 µm size, and 8 passes of a loop.
        let single = [("size_mode", serde_json::json!("single")), ("particle_size", serde_json::json!({"value": 40, "unit": "µm"}))];
        let looped = [("operation", serde_json::json!("recirculation")), ("passes", serde_json::json!({"value": 8, "unit": ""}))];
        for input in [demo(&[]), demo(&single), demo(&looped)] {
            let fast = line_map(&input, CELLS).unwrap();
            let slow = build(&input, CELLS, true).unwrap();
            assert_eq!(fast.verdicts, slow.verdicts);
            assert_eq!(fast.limiting, slow.limiting);
            let kinds: std::collections::BTreeSet<_> = fast.verdicts.iter().collect();
            assert!(kinds.len() >= 2, "{kinds:?}");
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
            fill_monotone(&mut out, 0, 255, at);
            assert!((0..256).all(|i| out[i] == at(i)));
        }
    }
}
