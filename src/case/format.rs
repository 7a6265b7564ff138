//! Reading a case document: walks the JSON, names every entry that is wrong by its place in the
//! file ("inputs.flow: expected a number with a unit, …") in plain words, refuses a newer format
//! by its version, and upgrades an older one on the way in.

use serde_json::{Map, Value};

use super::{Calculator, CaseError, CaseFile, Entries, Entry, FORMAT_VERSION, FormItem, OLDEST_FORMAT_VERSION};

/// What is wrong with one entry of a case document, at its place in the document.
#[derive(Debug, Clone, PartialEq, Eq)]
pub struct FormatProblem {
    /// Where: `inputs.flow`, `elements[2].length` (elements counted from 1, as on the page), or
    /// empty for the document as a whole.
    pub path: String,
    /// What is wrong and what is expected, in words.
    pub problem: String,
}

impl std::fmt::Display for FormatProblem {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        if self.path.is_empty() { f.write_str(&self.problem) } else { write!(f, "{}: {}", self.path, self.problem) }
    }
}

/// The document-level entries each format version has, in the order they are written.
fn known_entries(version: u64) -> &'static [&'static str] {
    const V1: &[&str] = &["clearbore_case", "title", "calculator", "inputs", "elements"];
    const V2: &[&str] = &["clearbore_case", "title", "notes", "created", "modified", "calculator", "inputs", "elements"];
    if version >= 2 { V2 } else { V1 }
}

/// Parses case text: JSON first (a syntax error is said in words with its line), then the
/// document.
pub(super) fn read_text(text: &str) -> Result<CaseFile, CaseError> {
    let value = parse_json(text).map_err(|problem| CaseError::Format(vec![FormatProblem { path: String::new(), problem }]))?;
    read_value(&value)
}

/// Parses JSON text, or says in words why it is not JSON.
pub(crate) fn parse_json(text: &str) -> Result<Value, String> {
    if text.trim().is_empty() {
        return Err("the file is empty".to_owned());
    }
    serde_json::from_str(text).map_err(|e| {
        use serde_json::error::Category;
        match e.classify() {
            Category::Eof => "the text stops before the case is complete (the file may have been cut short)".to_owned(),
            Category::Io => "the text could not be read".to_owned(),
            Category::Syntax | Category::Data => format!(
                "this is not JSON text: something is wrong near line {}, character {} (a missing or extra comma, \
                 bracket or quotation mark, or a number too large to store)",
                e.line(),
                e.column()
            ),
        }
    })
}

/// Reads a case document already parsed as JSON: checks it, upgrades an older version, and fills
/// entries added since the file was written.
pub(crate) fn read_value(value: &Value) -> Result<CaseFile, CaseError> {
    let Some(doc) = value.as_object() else {
        return Err(one("", format!("expected a case: an object {{…}} with \"clearbore_case\", \"calculator\" and \"inputs\"; found {}", describe(value))));
    };
    let version = read_version(doc)?;
    let mut problems = Problems::default();
    for key in doc.keys() {
        if !known_entries(version).contains(&key.as_str()) {
            let problem = if known_entries(FORMAT_VERSION.into()).contains(&key.as_str()) {
                format!("not part of case format {version} (it came with a later format)")
            } else {
                format!("not an entry of a case file (a case has {})", quoted_list(known_entries(version)))
            };
            problems.add(entry_name(key), problem);
        }
    }
    let calculator = read_calculator(doc.get("calculator"), &mut problems);
    let calculator = match calculator {
        Some(c) if version < u64::from(c.since_format()) => {
            problems.add("calculator", format!("the {} calculator came with case format {}; this file is format {version}", c.title().to_lowercase(), c.since_format()));
            None
        }
        other => other,
    };
    let title = read_text_entry(doc, "title", &mut problems);
    let notes = read_text_entry(doc, "notes", &mut problems);
    let created = read_timestamp(doc, "created", &mut problems);
    let modified = read_timestamp(doc, "modified", &mut problems);
    let inputs = match doc.get("inputs") {
        None => {
            problems.add("inputs", "missing; a case lists its entries as \"inputs\": { \"flow\": { \"value\": 1, \"unit\": \"mL/min\" }, … }");
            Entries::new()
        }
        Some(v) => {
            let owner = calculator.map(|c| (c.layout(), format!("the {} calculator", c.title().to_lowercase())));
            read_entries(v, "inputs", owner.as_ref().map(|(l, o)| (*l, o.as_str())), &mut problems)
        }
    };
    let elements = read_elements(doc.get("elements"), calculator, &mut problems);
    match (calculator, problems.0.is_empty()) {
        (Some(calculator), true) => {
            let mut case = CaseFile {
                clearbore_case: FORMAT_VERSION,
                title,
                notes,
                created,
                modified,
                calculator,
                inputs,
                elements,
            };
            for (key, added) in calculator.added_entries() {
                case.inputs.entry((*key).to_owned()).or_insert_with(|| added.entry());
            }
            Ok(case)
        }
        _ => Err(CaseError::Format(problems.0)),
    }
}

#[derive(Default)]
struct Problems(Vec<FormatProblem>);

impl Problems {
    fn add(&mut self, path: impl Into<String>, problem: impl Into<String>) {
        self.0.push(FormatProblem { path: path.into(), problem: problem.into() });
    }
}

/// A key as it is named in a place: as written, or in quotes when that would be invisible (empty
/// or blank), so that every problem says where it is.
fn entry_name(key: &str) -> String {
    if key.trim().is_empty() { format!("{key:?}") } else { key.to_owned() }
}

fn one(path: &str, problem: String) -> CaseError {
    CaseError::Format(vec![FormatProblem { path: path.to_owned(), problem }])
}

fn read_version(doc: &Map<String, Value>) -> Result<u64, CaseError> {
    let expected = format!("the case format version, a whole number from {OLDEST_FORMAT_VERSION} to {FORMAT_VERSION}");
    match doc.get("clearbore_case") {
        None => Err(one("clearbore_case", format!("missing: this is not a Clearbore case file (a case file starts with {{\"clearbore_case\": {FORMAT_VERSION}, …}})"))),
        Some(v) => match v.as_u64() {
            Some(n) if n > u64::from(FORMAT_VERSION) => Err(CaseError::NewerVersion { found: n }),
            Some(n) if n >= u64::from(OLDEST_FORMAT_VERSION) => Ok(n),
            _ => Err(one("clearbore_case", format!("expected {expected}; found {}", describe(v)))),
        },
    }
}

fn read_calculator(value: Option<&Value>, problems: &mut Problems) -> Option<Calculator> {
    let keys: Vec<&str> = Calculator::ALL.iter().map(|c| c.key()).collect();
    match value {
        None => problems.add("calculator", format!("missing; one of {}", quoted_list(&keys))),
        Some(Value::String(s)) => match Calculator::ALL.iter().find(|c| c.key() == s) {
            Some(c) => return Some(*c),
            None => problems.add("calculator", format!("unknown calculator \"{s}\"; use one of {}", quoted_list(&keys))),
        },
        Some(v) => problems.add("calculator", format!("expected the calculator's name in quotes, one of {}; found {}", quoted_list(&keys), describe(v))),
    }
    None
}

fn read_text_entry(doc: &Map<String, Value>, key: &str, problems: &mut Problems) -> String {
    match doc.get(key) {
        None => String::new(),
        Some(Value::String(s)) => s.clone(),
        Some(v) => {
            problems.add(key, format!("expected text in quotes; found {}", describe(v)));
            String::new()
        }
    }
}

fn read_timestamp(doc: &Map<String, Value>, key: &str, problems: &mut Problems) -> Option<String> {
    let wrong = |found: String| format!("expected a date and time in ISO 8601 form, like \"2026-12-03T14:05:00Z\"; found {found}");
    match doc.get(key) {
        None | Some(Value::Null) => None,
        Some(Value::String(s)) if is_iso_8601(s) => Some(s.clone()),
        Some(v) => {
            problems.add(key, wrong(describe(v)));
            None
        }
    }
}

fn read_elements(value: Option<&Value>, calculator: Option<Calculator>, problems: &mut Problems) -> Vec<Entries> {
    let Some(value) = value else { return Vec::new() };
    let Some(list) = value.as_array() else {
        problems.add("elements", format!("expected a list [ … ] of line elements; found {}", describe(value)));
        return Vec::new();
    };
    let layout = match calculator.map(|c| (c, c.element_layout())) {
        Some((c, None)) if !list.is_empty() => {
            problems.add("elements", format!("a {} case has no line elements", c.title().to_lowercase()));
            return Vec::new();
        }
        Some((_, layout)) => layout.map(|l| (l, "a line element")),
        None => None,
    };
    list.iter().enumerate().map(|(i, e)| read_entries(e, &format!("elements[{}]", i + 1), layout, problems)).collect()
}

/// Reads an object of entries; with a layout, each key must be one of its entries and each entry
/// the kind the layout says.
fn read_entries(value: &Value, path: &str, layout: Option<(&[FormItem], &str)>, problems: &mut Problems) -> Entries {
    let Some(map) = value.as_object() else {
        problems.add(path, format!("expected an object {{ … }} of entries by field name; found {}", describe(value)));
        return Entries::new();
    };
    let mut entries = Entries::new();
    for (key, v) in map {
        let at = format!("{path}.{}", entry_name(key));
        let item = match layout {
            Some((items, owner)) => match items.iter().find(|item| item.key() == Some(key.as_str())) {
                Some(item) => Some(item),
                None => {
                    problems.add(&at, format!("not a field of {owner}"));
                    continue;
                }
            },
            None => None,
        };
        if let Some(entry) = read_entry(v, &at, item, problems) {
            entries.insert(key.clone(), entry);
        }
    }
    entries
}

/// One entry: a quantity `{"value": number, "unit": "symbol"}` or an option name. Without a
/// layout item (the calculator itself is unknown) either shape is taken.
fn read_entry(v: &Value, at: &str, item: Option<&FormItem>, problems: &mut Problems) -> Option<Entry> {
    match (item, v) {
        (Some(FormItem::Choice(_)) | None, Value::String(s)) => Some(Entry::Choice(s.clone())),
        (Some(FormItem::Choice(spec)), other) => {
            let options: Vec<&str> = spec.options.iter().map(|(k, _)| *k).collect();
            problems.add(at, format!("expected an option name in quotes, one of {}; found {}", quoted_list(&options), describe(other)));
            None
        }
        (Some(FormItem::Field(spec)), v) => read_quantity(v, at, Some(spec.dimension.default_unit().symbol), problems),
        (None, v) => read_quantity(v, at, None, problems),
        (Some(FormItem::Heading(_)), _) => None,
    }
}

fn read_quantity(v: &Value, at: &str, unit: Option<&str>, problems: &mut Problems) -> Option<Entry> {
    let like = format!("{{\"value\": 1, \"unit\": \"{}\"}}", unit.unwrap_or("mm"));
    let Some(map) = v.as_object() else {
        problems.add(at, format!("expected a number with a unit, like {like}; found {}", describe(v)));
        return None;
    };
    let mut ok = true;
    for key in map.keys().filter(|k| !["value", "unit", "range"].contains(&k.as_str())) {
        problems.add(format!("{at}.{}", entry_name(key)), "not part of a quantity, which has only \"value\", \"unit\" and an optional \"range\"");
        ok = false;
    }
    let mut part = |name: &str, what: &str, expected: &str, is: fn(&Value) -> bool| match map.get(name) {
        Some(v) if is(v) => Some(v),
        Some(v) => {
            problems.add(format!("{at}.{name}"), format!("expected {expected}; found {}", describe(v)));
            None
        }
        None => {
            problems.add(at, format!("the {what} is missing; a quantity is written like {like}"));
            None
        }
    };
    let value = part("value", "number", "a number (without quotes)", Value::is_number).and_then(Value::as_f64);
    let symbol = part("unit", "unit", "a unit symbol in quotes", Value::is_string).and_then(Value::as_str).map(str::to_owned);
    let range = match map.get("range") {
        None => Ok(None),
        Some(r) => read_range(r, value).map(Some).map_err(|problem| problems.add(format!("{at}.range"), problem)),
    };
    match (value, symbol, range) {
        (Some(value), Some(unit), Ok(range)) if ok => Some(Entry::Quantity { value, unit, range }),
        _ => None,
    }
}

/// A quantity's range: two numbers, low end first, around the value.
fn read_range(r: &Value, value: Option<f64>) -> Result<[f64; 2], String> {
    let ends = r.as_array().filter(|a| a.len() == 2).and_then(|a| Some([a[0].as_f64()?, a[1].as_f64()?]));
    let Some([low, high]) = ends else {
        return Err(format!("expected the range's two ends as numbers, low end first, like [0.36, 0.42]; found {}", describe(r)));
    };
    if low >= high {
        return Err(format!("the low end ({low}) must be below the high end ({high})"));
    }
    match value {
        Some(v) if !(low..=high).contains(&v) => Err(format!("the value {v} must lie within the range [{low}, {high}]")),
        _ => Ok([low, high]),
    }
}

/// A JSON value in words, for "found …".
fn describe(v: &Value) -> String {
    match v {
        Value::Null => "nothing (null)".to_owned(),
        Value::Bool(b) => format!("{b}"),
        Value::Number(n) => format!("the number {n}"),
        Value::String(s) => {
            let short: String = s.chars().take(40).collect();
            let more = if s.chars().count() > 40 { "…" } else { "" };
            format!("the text \"{short}{more}\"")
        }
        Value::Array(_) => "a list [ … ]".to_owned(),
        Value::Object(_) => "an object { … }".to_owned(),
    }
}

fn quoted_list(items: &[&str]) -> String {
    items.iter().map(|s| format!("\"{s}\"")).collect::<Vec<_>>().join(", ")
}

/// Whether `s` is an ISO 8601 calendar date, optionally with a time of day (`T` or a space,
/// hours and minutes, optional seconds and fraction) and a zone (`Z` or `±hh:mm`), as
/// JavaScript's `Date.toISOString` writes it.
pub fn is_iso_8601(s: &str) -> bool {
    let b = s.as_bytes();
    let digits = |from: usize, n: usize| -> Option<u32> {
        let part = b.get(from..from + n)?;
        if part.iter().all(u8::is_ascii_digit) { std::str::from_utf8(part).ok()?.parse().ok() } else { None }
    };
    let (Some(year), Some(month), Some(day)) = (digits(0, 4), digits(5, 2), digits(8, 2)) else { return false };
    if b.get(4) != Some(&b'-') || b.get(7) != Some(&b'-') || !(1..=12).contains(&month) {
        return false;
    }
    let leap = (year % 4 == 0 && year % 100 != 0) || year % 400 == 0;
    let days = [31, if leap { 29 } else { 28 }, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
    if day < 1 || day > days[(month - 1) as usize] {
        return false;
    }
    if b.len() == 10 {
        return true;
    }
    if !matches!(b.get(10), Some(b'T' | b' ')) {
        return false;
    }
    let (Some(hour), Some(minute)) = (digits(11, 2), digits(14, 2)) else { return false };
    if b.get(13) != Some(&b':') || hour > 23 || minute > 59 {
        return false;
    }
    let mut i = 16;
    if b.get(i) == Some(&b':') {
        match digits(i + 1, 2) {
            Some(second) if second <= 60 => i += 3,
            _ => return false,
        }
        if b.get(i) == Some(&b'.') {
            let n = b[i + 1..].iter().take_while(|c| c.is_ascii_digit()).count();
            if n == 0 {
                return false;
            }
            i += 1 + n;
        }
    }
    match b.get(i) {
        None => true,
        Some(b'Z') => i + 1 == b.len(),
        Some(b'+' | b'-') => {
            matches!((digits(i + 1, 2), b.get(i + 3), digits(i + 4, 2)), (Some(h), Some(b':'), Some(m)) if h <= 23 && m <= 59)
                && i + 6 == b.len()
        }
        Some(_) => false,
    }
}

#[cfg(test)]
#[allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]
mod tests {
    use super::is_iso_8601;

    #[test]
    fn iso_8601_dates_and_times() {
        for ok in [
            "2026-12-03",
            "2026-12-03T14:05",
            "2026-12-03T14:05:00Z",
            "2026-12-03T14:05:00.123Z",
            "2026-12-03 14:05:09+01:00",
            "2024-02-29T00:00:00-05:30",
        ] {
            assert!(is_iso_8601(ok), "{ok}");
        }
        for bad in [
            "",
            "yesterday",
            "2026-13-01",
            "2026-02-29",
            "2026-12-03T24:00",
            "2026-12-03T14:5",
            "2026-12-03T14:05:00.Z",
            "2026-12-03T14:05:00+1",
            "2026-12-03T14:05:00Zjunk",
            "03/12/2026",
            "２０２６-12-03",
        ] {
            assert!(!is_iso_8601(bad), "{bad}");
        }
    }
}
