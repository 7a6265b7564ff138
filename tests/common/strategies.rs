//! Pieces of the property tests' case strategies shared by `case_keeping.rs`, `domain.rs` and
//! `fuzz.rs`: a form's entries from a quantity strategy, choices, and the places in a JSON case.

use clearbore::case::{Entries, Entry, FormItem};
use clearbore::physics::form::ChoiceSpec;
use clearbore::physics::input::FieldSpec;
use proptest::prelude::*;
use serde_json::Value;

/// Any option of a choice.
pub fn choice(spec: ChoiceSpec) -> BoxedStrategy<Entry> {
    (0..spec.options.len()).prop_map(move |i| Entry::Choice(spec.options[i].0.to_owned())).boxed()
}

/// Every field (each from `quantity`) and choice of a layout.
pub fn entries(layout: &'static [FormItem], quantity: fn(FieldSpec) -> BoxedStrategy<Entry>) -> BoxedStrategy<Entries> {
    let parts: Vec<BoxedStrategy<(String, Entry)>> = layout
        .iter()
        .filter_map(|item| {
            let (key, entry) = match item {
                FormItem::Field(f) => (f.key, quantity(*f)),
                FormItem::Choice(c) => (c.key, choice(*c)),
                FormItem::Heading(_) => return None,
            };
            Some(entry.prop_map(move |e| (key.to_owned(), e)).boxed())
        })
        .collect();
    parts.prop_map(|v| v.into_iter().collect()).boxed()
}

/// JSON pointers to every member of every object and array under `v`.
pub fn member_paths(v: &Value, at: &str) -> Vec<String> {
    let children: Vec<(String, &Value)> = match v {
        Value::Object(m) => m.iter().map(|(k, c)| (format!("{at}/{}", k.replace('~', "~0").replace('/', "~1")), c)).collect(),
        Value::Array(a) => a.iter().enumerate().map(|(i, c)| (format!("{at}/{i}"), c)).collect(),
        _ => Vec::new(),
    };
    children.into_iter().flat_map(|(p, c)| std::iter::once(p.clone()).chain(member_paths(c, &p))).collect()
}
