//! `QuantityField`: a labelled number entry with its unit selector and, when the entry is
//! impossible, unreadable or disagrees with another entry, the message right at the field (tied
//! to the input for screen readers).

use leptos::prelude::*;

use crate::physics::input::{FieldSpec, InputError};
use crate::physics::units::{format_significant, parse_entry, unit_by_symbol};

/// The editable state of one quantity field: the text as typed and the chosen unit symbol.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct FieldState {
    /// Text as typed.
    pub text: RwSignal<String>,
    /// Unit symbol, one of the field's units.
    pub unit: RwSignal<String>,
}

impl FieldState {
    /// A field holding `text` in the unit `unit`.
    pub fn new(text: &str, unit: &str) -> Self {
        Self { text: RwSignal::new(text.to_owned()), unit: RwSignal::new(unit.to_owned()) }
    }

    /// Validates the current entry (tracking both signals) and returns SI or the field's error.
    pub fn read(&self, spec: &FieldSpec) -> Result<f64, InputError> {
        let unit = spec.unit(&self.unit.get())?;
        self.text.with(|t| spec.read(t, unit))
    }
}

/// The errors of the current entries that involve several fields (d50 below d10, a solids
/// fraction above the packing limit), by field name, so that each shows at its field.
#[derive(Debug, Clone, Copy)]
pub struct FieldErrors(pub Memo<Vec<InputError>>);

/// A number shown without trailing zeros, for writing a converted value back into a field.
fn plain(value: f64) -> String {
    let s = format_significant(value, 6);
    if s.contains('.') && !s.contains('e') { s.trim_end_matches('0').trim_end_matches('.').to_owned() } else { s }
}

/// One input row. `spec` fixes label, units and allowed range; `state` holds text and unit;
/// `name` (default: the field's key) names the element ids and test ids, so that repeated
/// fields (line elements) stay distinct. Changing the unit converts a valid entry so the
/// physical value stays the same.
#[component]
pub fn QuantityField(spec: FieldSpec, state: FieldState, #[prop(optional, into)] name: Option<String>) -> impl IntoView {
    let name = name.unwrap_or_else(|| spec.key.to_owned());
    let others = use_context::<FieldErrors>();
    let error = {
        let name = name.clone();
        Memo::new(move |_| {
            state.read(&spec).err().or_else(|| others.and_then(|o| o.0.with(|errors| errors.iter().find(|e| e.field == name).cloned())))
        })
    };
    let id = format!("in-{name}");
    let error_id = format!("error-{name}");
    let help_id = format!("help-{name}");
    let units = spec.dimension.units();
    let on_unit = move |new_symbol: String| {
        let old = unit_by_symbol(spec.dimension, &state.unit.get_untracked());
        let new = unit_by_symbol(spec.dimension, &new_symbol);
        if let (Some(old), Some(new), Ok((v, range))) = (old, new, parse_entry(&state.text.get_untracked())) {
            let convert = |v: f64| plain(new.from_si(old.to_si(v)));
            state.text.set(match range {
                Some([low, high]) => format!("{}–{}", convert(low), convert(high)),
                None => convert(v),
            });
        }
        state.unit.set(new_symbol);
    };
    let unit_picker = (units.len() > 1).then(|| {
        view! {
            <select
                data-testid=format!("unit-{name}")
                aria-label=format!("{} unit", spec.label)
                prop:value=move || state.unit.get()
                on:change:target=move |ev| on_unit(ev.target().value())
            >
                {units
                    .iter()
                    .map(|u| view! { <option value=u.symbol>{u.symbol}</option> })
                    .collect_view()}
            </select>
        }
    });
    let described = {
        let (error_id, help_id) = (error_id.clone(), help_id.clone());
        move || if error.with(Option::is_some) { format!("{error_id} {help_id}") } else { help_id.clone() }
    };
    view! {
        <div class="field" class:invalid=move || error.with(Option::is_some) data-testid=format!("field-{name}")>
            <label for=id.clone()>{spec.label}</label>
            <div class="entry">
                <input
                    id=id
                    type="text"
                    inputmode="decimal"
                    autocomplete="off"
                    data-testid=format!("input-{name}")
                    aria-invalid=move || if error.with(Option::is_some) { "true" } else { "false" }
                    aria-describedby=described
                    prop:value=move || state.text.get()
                    on:input:target=move |ev| state.text.set(ev.target().value())
                />
                {unit_picker}
            </div>
            <p class="help" id=help_id>{spec.help}</p>
            {move || {
                error
                    .get()
                    .map(|e| {
                        view! {
                            <p class="field-error" role="alert" id=error_id.clone() data-testid=error_id.clone()>
                                {format!("{}: {}", e.given, e.problem)}
                            </p>
                        }
                    })
            }}
        </div>
    }
}
