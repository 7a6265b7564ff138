//! The page at the widths people use and with every hand: no control under another element, no
//! sideways scrolling at 390 px, a keyboard path through every control, the ARIA tab pattern,
//! the axe-core checker (pinned in tests/browser-tools, injected here only), choice groups that
//! keep their choice, and the printed record. Needs dist/clearbore.html (`./task.sh build`).
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod support;

use clearbore::case::Calculator;
use fantoccini::Locator;
use fantoccini::wd::PrintConfiguration;
use serde_json::Value;
use support::Browser;

async fn show(b: &Browser, c: Calculator) {
    b.click(&format!("[data-testid=tab-{}]", c.key())).await;
    b.wait_for(&format!("[data-testid=panel-{}] [data-testid=summary]", c.key())).await;
}

/// Every visible control of the shown panel whose centre is not on the control itself: the
/// element found there instead, by test id or tag.
const HIT_TEST: &str = r#"
const panel = document.querySelector('[role=tabpanel]');
const controls = [...document.querySelectorAll('[role=tab]'), ...panel.querySelectorAll('input, select, button, textarea, summary, a[href]')];
const bad = [];
for (const c of controls) {
  const box = c.getBoundingClientRect();
  const folded = c.tagName !== 'SUMMARY' && c.closest('details:not([open])');
  if (box.width === 0 || box.height === 0 || c.closest('.visually-hidden') || folded) continue;
  c.scrollIntoView({ block: 'center', inline: 'center' });
  const r = c.getBoundingClientRect();
  const x = r.left + r.width / 2, y = r.top + r.height / 2;
  const hit = document.elementFromPoint(x, y);
  if (!(hit === c || c.contains(hit) || (c.labels && [...c.labels].some(l => l.contains(hit))))) {
    const name = e => e ? (e.getAttribute('data-testid') || e.tagName + '.' + e.className) : 'nothing';
    bad.push(name(c) + ' is under ' + name(hit));
  }
}
return bad;
"#;

#[tokio::test]
async fn no_control_lies_under_another_element_at_any_width() {
    let b = Browser::start().await;
    b.open_page().await;
    for width in [390, 1024, 1920] {
        b.resize(width, 1000).await;
        for c in Calculator::ALL {
            show(&b, c).await;
            let bad = b.js(HIT_TEST).await;
            assert_eq!(bad, Value::Array(vec![]), "{} at {width} px", c.key());
        }
    }
    b.assert_clean().await;
    b.close().await;
}

#[tokio::test]
async fn nothing_scrolls_sideways_on_a_phone() {
    let b = Browser::start().await;
    b.open_page().await;
    b.resize(390, 900).await;
    for c in Calculator::ALL {
        show(&b, c).await;
        let widths = b.js("return [document.documentElement.scrollWidth, window.innerWidth];").await;
        let (doc, view) = (widths[0].as_f64().unwrap(), widths[1].as_f64().unwrap());
        assert!(doc <= view, "{}: the page is {doc} px wide in a {view} px window", c.key());
        b.screenshot(&format!("{}-390", c.key())).await;
    }
    b.resize(1400, 2400).await;
    for c in Calculator::ALL {
        show(&b, c).await;
        b.screenshot(&format!("{}-1400", c.key())).await;
    }
    b.assert_clean().await;
    b.close().await;
}

#[tokio::test]
async fn tabs_follow_the_aria_pattern_and_arrow_keys_move_between_them() {
    let b = Browser::start().await;
    b.open_page().await;
    let ok = b
        .js(r#"
        const list = document.querySelector('[role=tablist]');
        const tabs = [...list.querySelectorAll('[role=tab]')];
        const panel = document.querySelector('[role=tabpanel]');
        const selected = tabs.filter(t => t.getAttribute('aria-selected') === 'true');
        return list.getAttribute('aria-label') && selected.length === 1
          && selected[0].getAttribute('aria-controls') === panel.id
          && panel.getAttribute('aria-labelledby') === selected[0].id
          && selected[0].tabIndex === 0 && tabs.filter(t => t.tabIndex === -1).length === tabs.length - 1;"#)
        .await;
    assert_eq!(ok, Value::Bool(true));
    // ArrowRight from the first tab selects and focuses the second; End the last; Home the first.
    let first = b.client.find(Locator::Css("[data-testid=tab-tubular_reactor]")).await.unwrap();
    first.send_keys("\u{E014}").await.unwrap();
    b.wait_for("[data-testid=panel-packed_bed]").await;
    let focused = b.js("return document.activeElement.getAttribute('data-testid');").await;
    assert_eq!(focused, "tab-packed_bed");
    let second = b.client.find(Locator::Css("[data-testid=tab-packed_bed]")).await.unwrap();
    second.send_keys("\u{E010}").await.unwrap();
    b.wait_for("[data-testid=panel-setup]").await;
    let last = b.client.find(Locator::Css("[data-testid=tab-setup]")).await.unwrap();
    last.send_keys("\u{E011}").await.unwrap();
    b.wait_for("[data-testid=panel-tubular_reactor]").await;
    b.close().await;
}

#[tokio::test]
async fn tab_reaches_every_control_in_page_order_including_opening_a_case() {
    let b = Browser::start().await;
    b.open_page().await;
    for c in Calculator::ALL {
        show(&b, c).await;
        // No positive tabindex (which would break the page order), and every visible control of
        // the panel is focusable.
        let unreachable = b
            .js(r#"
            const panel = document.querySelector('[role=tabpanel]');
            const all = [...document.querySelectorAll('[tabindex]')].filter(e => e.tabIndex > 0).map(e => e.outerHTML.slice(0, 60));
            const controls = [...panel.querySelectorAll('input, select, button, textarea, summary, a[href]')]
              .filter(e => e.getBoundingClientRect().width > 0 && !e.closest('.visually-hidden') && !e.disabled);
            return all.concat(controls.filter(e => e.tabIndex < 0).map(e => e.getAttribute('data-testid') || e.tagName));"#)
            .await;
        assert_eq!(unreachable, Value::Array(vec![]), "{}", c.key());
    }
    // Real Tab presses from the active tab reach the open-case button, then the first field.
    show(&b, Calculator::TubularReactor).await;
    b.js("document.querySelector('[data-testid=tab-tubular_reactor]').focus();").await;
    let mut seen = Vec::new();
    for _ in 0..25 {
        let active = b.client.active_element().await.unwrap();
        active.send_keys("\u{E004}").await.unwrap();
        let id = b.js("return document.activeElement.getAttribute('data-testid') || document.activeElement.tagName;").await;
        seen.push(id.as_str().unwrap_or("").to_owned());
    }
    let open = seen.iter().position(|s| s == "open-case-button").unwrap_or_else(|| panic!("{seen:?}"));
    let first_input = seen.iter().position(|s| s.starts_with("input-") || s.starts_with("option-")).unwrap_or_else(|| panic!("{seen:?}"));
    assert!(open < first_input, "{seen:?}");
    b.close().await;
}

#[tokio::test]
async fn every_select_and_field_error_is_tied_to_its_words() {
    let b = Browser::start().await;
    b.open_page().await;
    for c in Calculator::ALL {
        show(&b, c).await;
        let unlabelled = b
            .js(r#"return [...document.querySelectorAll('[role=tabpanel] select')]
                .filter(s => !s.getAttribute('aria-label') && !(s.labels && s.labels.length))
                .map(s => s.getAttribute('data-testid'));"#)
            .await;
        assert_eq!(unlabelled, Value::Array(vec![]), "{}", c.key());
    }
    show(&b, Calculator::TubularReactor).await;
    b.type_into("flow", "abc").await;
    b.wait_for("[data-testid=error-flow]").await;
    let described = b.js("return document.querySelector('[data-testid=input-flow]').getAttribute('aria-describedby');").await;
    assert!(described.as_str().unwrap().split(' ').any(|id| id == "error-flow"), "{described}");
    assert_eq!(b.js("return document.querySelector('[data-testid=input-flow]').getAttribute('aria-invalid');").await, "true");
    b.close().await;
}

#[tokio::test]
async fn axe_finds_no_serious_or_critical_violation_on_any_tab() {
    let axe = std::fs::read_to_string(concat!(env!("CARGO_MANIFEST_DIR"), "/tests/browser-tools/node_modules/axe-core/axe.min.js"))
        .expect("axe-core missing: npm ci --prefix tests/browser-tools (./task.sh test does)");
    let b = Browser::start().await;
    b.open_page().await;
    b.client.execute(&axe, vec![]).await.unwrap();
    for c in Calculator::ALL {
        show(&b, c).await;
        let found = b
            .client
            .execute_async(
                r#"const done = arguments[arguments.length - 1];
                axe.run(document, { resultTypes: ['violations'] }).then(r => done(
                  r.violations.filter(v => v.impact === 'serious' || v.impact === 'critical')
                    .map(v => v.id + ': ' + v.help + ' — ' + v.nodes.slice(0, 3).map(n => n.target.join(' ')).join(' | '))
                ), e => done(['axe failed: ' + e]));"#,
                vec![],
            )
            .await
            .unwrap();
        assert_eq!(found, Value::Array(vec![]), "{}", c.key());
    }
    b.close().await;
}

/// On every tab, for every radio group and each of its options: pick it, then set every other
/// radio choice of the form to each of its options and every drop-down choice to another option
/// and back; the group must still show exactly its choice.
const CHOICE_GROUPS: &str = r#"
const done = arguments[arguments.length - 1];
const panel = () => document.querySelector('[role=tabpanel]');
const tick = () => new Promise(r => setTimeout(r, 5));
const groups = () => [...panel().querySelectorAll('fieldset.choice')].map(f => f.getAttribute('data-testid'));
const shows = g => { const m = panel().querySelector(`[data-testid="${g}"]`); return m ? [...m.querySelectorAll('input[type=radio]')].filter(x => x.checked).map(x => x.value) : null; };
(async () => {
  const bad = [];
  const check = (g, want, after) => { const c = shows(g); if (c && (c.length !== 1 || c[0] !== want)) bad.push(`${g}=${want} shows [${c}] after ${after}`); };
  for (const g of groups()) {
    const values = [...panel().querySelector(`[data-testid="${g}"]`).querySelectorAll('input[type=radio]')].map(r => r.value);
    for (const want of values) {
      const mine = panel().querySelector(`[data-testid="${g}"] input[value="${want}"]`);
      if (!mine) continue;
      mine.click(); await tick();
      for (const other of groups().filter(o => o !== g)) {
        const os = panel().querySelector(`[data-testid="${other}"]`);
        if (!os) continue;
        for (const v of [...os.querySelectorAll('input[type=radio]')].map(r => r.value)) {
          const now = panel().querySelector(`[data-testid="${other}"] input[value="${v}"]`);
          if (now) { now.click(); await tick(); check(g, want, `${other}=${v}`); }
        }
      }
      for (const sel of [...panel().querySelectorAll('form.inputs select[data-testid^="choice-"]')]) {
        const was = sel.value;
        const to = [...sel.options].map(o => o.value).find(v => v !== was);
        for (const v of [to, was]) {
          if (v === undefined || !sel.isConnected) continue;
          sel.value = v; sel.dispatchEvent(new Event('change', { bubbles: true })); await tick();
          check(g, want, `${sel.getAttribute('data-testid')}=${v}`);
        }
      }
    }
  }
  done(bad);
})();
"#;

#[tokio::test]
async fn a_choice_never_shows_unselected_after_other_choices_change() {
    let b = Browser::start().await;
    b.open_page().await;
    for c in Calculator::ALL {
        show(&b, c).await;
        let bad = b.client.execute_async(CHOICE_GROUPS, vec![]).await.unwrap();
        assert_eq!(bad, Value::Array(vec![]), "{}", c.key());
        b.assert_clean().await;
        b.click(&format!("[data-testid=panel-{}] [data-testid=load-demo]", c.key())).await;
    }
    // The case reported: a catalyst, then up-flow.
    show(&b, Calculator::PackedBed).await;
    b.click("[data-testid=option-bed_role-catalyst]").await;
    b.click("[data-testid=option-flow_direction-up]").await;
    let checked = b.js("return document.querySelector('[data-testid=option-bed_role-catalyst]').checked;").await;
    assert_eq!(checked, Value::Bool(true));
    b.assert_clean().await;
    b.close().await;
}

/// Pages of a PDF: the page objects in it.
fn pdf_pages(pdf: &[u8]) -> usize {
    let text = String::from_utf8_lossy(pdf);
    text.matches("/Type /Page").count() - text.matches("/Type /Pages").count()
}

#[tokio::test]
async fn each_demo_prints_as_a_one_column_record_of_at_most_two_a4_pages() {
    let b = Browser::start().await;
    b.open_page().await;
    let dir = std::path::PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("target/screenshots");
    std::fs::create_dir_all(&dir).unwrap();
    for c in Calculator::ALL {
        show(&b, c).await;
        b.js("window.dispatchEvent(new Event('beforeprint'));").await;
        b.wait_for("[data-testid=print-record]").await;
        let record = b.js("const r = document.querySelector('[data-testid=print-record]'); return [r.querySelectorAll('input, select, button').length, r.querySelectorAll('svg').length, r.textContent];").await;
        assert_eq!(record[0], 0, "{}: form controls in the record", c.key());
        let text = record[2].as_str().unwrap();
        assert!(text.contains("Clearbore record") && text.contains("Printed ") && text.contains("Inputs") && text.contains("Sources"), "{}", c.key());
        let pdf = b.client.print(PrintConfiguration::builder().build().unwrap()).await.unwrap();
        std::fs::write(dir.join(format!("record-{}.pdf", c.key())), &pdf).unwrap();
        let pages = pdf_pages(&pdf);
        assert!((1..=2).contains(&pages), "{}: {pages} pages", c.key());
        b.js("window.dispatchEvent(new Event('afterprint'));").await;
    }
    b.close().await;
}

/// Random text typed into random fields of the shown tab, from a fixed seed: letters, signs,
/// exponents, a Unicode minus, commas, huge and tiny numbers, nothing. After each entry: no panic
/// banner; an entry refused shows its message at its own field (marked invalid) and leaves the
/// results as they were; the field is then put back.
const RANDOM_TYPING: &str = r#"
const done = arguments[arguments.length - 1];
let seed = arguments[0];
const rand = () => { seed = (seed * 1103515245 + 12345) % 2147483648; return seed / 2147483648; };
const pick = a => a[Math.floor(rand() * a.length)];
const texts = ['', ' ', 'abc', '1,5', '−3', '-0', '+2', '1e400', '1e-400', '1e30', '-1e30', '0', '0.000001', '7e-12',
  '123456789', '2.5e', 'e5', '..1', '1..', 'NaN', 'inf', '٣', '1 000', '5 mL', '0x10', '3.', '.5', '1e3', '12', '0.3'];
const tick = () => new Promise(r => setTimeout(r, 15));
(async () => {
  const bad = [];
  const panel = () => document.querySelector('[role=tabpanel]');
  const results = () => (panel().querySelector('[data-testid=results]') || {}).textContent;
  for (let i = 0; i < 60; i++) {
    const inputs = [...panel().querySelectorAll('input[data-testid^="input-"]')];
    if (!inputs.length) break;
    const input = pick(inputs);
    const name = input.getAttribute('data-testid').slice('input-'.length);
    const original = input.value;
    const before = results();
    const text = pick(texts);
    input.value = text; input.dispatchEvent(new Event('input', { bubbles: true }));
    await tick();
    if (document.querySelector('[data-testid=panic-banner]')) { bad.push(`panic after ${name}="${text}"`); break; }
    const err = panel().querySelector(`[data-testid="error-${name}"]`);
    if (err) {
      if (input.getAttribute('aria-invalid') !== 'true') bad.push(`${name}="${text}": message but not marked invalid`);
      if (results() !== before) bad.push(`${name}="${text}": results changed on a refused entry`);
      if (!panel().querySelector('[data-testid=stale-notice]')) bad.push(`${name}="${text}": no notice`);
    }
    const now = panel().querySelector(`[data-testid="input-${name}"]`);
    if (now) { now.value = original; now.dispatchEvent(new Event('input', { bubbles: true })); await tick(); }
  }
  done(bad);
})();
"#;

#[tokio::test]
async fn random_typing_never_breaks_the_page_and_every_refusal_is_at_its_field() {
    let b = Browser::start().await;
    b.open_page().await;
    for (k, c) in Calculator::ALL.into_iter().enumerate() {
        show(&b, c).await;
        let bad = b.client.execute_async(RANDOM_TYPING, vec![Value::from(20_261_202 + k as u64)]).await.unwrap();
        assert_eq!(bad, Value::Array(vec![]), "{}", c.key());
    }
    b.assert_clean().await;
    b.close().await;
}
