//! `RangeBands`: when entries are typed as ranges (`0.36–0.42`, `150 ± 20 %`), the band of each
//! result over them, the checks whose verdict changes inside them, and the entry that moves each
//! result most. Computed a moment after the last edit (it runs the calculator a few dozen times),
//! so that typing stays as quick as without ranges.

use std::time::Duration;

use leptos::prelude::*;

use crate::case::CaseFile;
use crate::case::ranges::{self, Spread};
use super::results::VerdictBadge;

/// How long after the last edit the bands are computed.
const SETTLE: Duration = Duration::from_millis(200);

/// Keeps `spread` up to date with `case` (the entries as they stand, or `None` when invalid):
/// cleared at once when there are no ranges, recomputed shortly after the last edit otherwise.
pub fn follow_ranges(case: Memo<Option<CaseFile>>, spread: RwSignal<Option<Spread>>) {
    let later = super::Later::new();
    Effect::new(move |_| match case.get().filter(|c| !ranges::ranged_inputs(c).is_empty()) {
        None => {
            later.cancel();
            spread.set(None);
        }
        Some(case) => later.run(SETTLE, move || spread.set(ranges::spread(&case))),
    });
}

/// The bands, shown when any entry is a range.
#[component]
pub fn RangeBands(spread: RwSignal<Option<Spread>>) -> impl IntoView {
    move || {
        spread.with(|s| {
            s.as_ref().map(|s| {
                let entered = s
                    .inputs
                    .iter()
                    .map(|i| format!("{} {}–{} {}", i.label, crate::physics::units::format_significant(i.low, 4), crate::physics::units::format_significant(i.high, 4), i.unit).trim_end().to_owned())
                    .collect::<Vec<_>>()
                    .join("; ");
                let how = format!(
                    "{} runs: the entries as given, each range's two ends alone{}, and {} Latin-hypercube points from a fixed seed. {}",
                    s.points.len(),
                    if s.corners { ", every corner (exact bounds for a result that rises or falls with each entry)" } else { "" },
                    ranges::SAMPLES,
                    if s.corners { "" } else { "With more than four ranges the corners are not run: a band is an estimate from inside the ranges." },
                );
                let failures: Vec<String> = s.failures().filter_map(|p| p.failure.clone()).collect();
                let straddling: Vec<_> = s.straddling().cloned().collect();
                let rows: Vec<_> = s
                    .bands
                    .iter()
                    .filter(|b| b.moves() && !b.key.starts_with("element_"))
                    .map(|b| {
                        let driver = b.driver.map_or_else(|| "—".to_owned(), |(i, _)| s.inputs[i].label.clone());
                        (b.key, b.label, b.dimension.show(b.nominal, 3), format!("{} to {}", b.dimension.show(b.low, 3), b.dimension.show(b.high, 3)), driver)
                    })
                    .collect();
                view! {
                    <section class="ranges" data-testid="ranges" aria-labelledby="ranges-heading">
                        <h3 id="ranges-heading">"Over the ranges entered"</h3>
                        <p class="ranges-entered" data-testid="ranges-entered">{entered}</p>
                        <ul class="checks">
                            {straddling
                                .into_iter()
                                .map(|v| {
                                    let seen: Vec<&str> = v.seen.iter().map(|x| x.word()).collect();
                                    view! {
                                        <li class="check" data-testid=format!("range-verdict-{}", v.key)>
                                            <div class="check-head">
                                                <VerdictBadge verdict=v.worst() />
                                                <strong>{v.topic}</strong>
                                            </div>
                                            <p class="reason">{format!("{} inside the ranges (at the entries as given: {}): the ranges straddle a limit of this check.", capitalised(&seen.join(", then ")), v.nominal.word())}</p>
                                        </li>
                                    }
                                })
                                .collect_view()}
                        </ul>
                        <table class="results" data-testid="range-bands">
                            <thead><tr><th scope="col">"Result"</th><th scope="col">"As given"</th><th scope="col">"Over the ranges"</th><th scope="col">"Moved most by"</th></tr></thead>
                            <tbody>
                                {rows
                                    .into_iter()
                                    .map(|(key, label, nominal, band, driver)| view! {
                                        <tr data-testid=format!("band-{key}")><th scope="row">{label}</th><td>{nominal}</td><td>{band}</td><td data-testid=format!("driver-{key}")>{driver}</td></tr>
                                    })
                                    .collect_view()}
                            </tbody>
                        </table>
                        <p class="note">{how}</p>
                        {(!failures.is_empty()).then(|| view! {
                            <p class="note" data-testid="range-failures">{format!("{} of the runs could not be computed (left out of the bands); the first: {}", failures.len(), failures[0])}</p>
                        })}
                    </section>
                }
            })
        })
    }
}

/// The text with its first letter in capitals.
fn capitalised(text: &str) -> String {
    let mut chars = text.chars();
    chars.next().map(|c| c.to_uppercase().chain(chars).collect()).unwrap_or_default()
}
