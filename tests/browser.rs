//! End-to-end tests in headless Chromium: the built single file (`dist/clearbore.html`) opened
//! from `file://` with the network cut off, driven like a user through stable `data-testid`s.
//! Run by `./task.sh test` after the build; needs the `e2e` feature.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

mod support;

use clearbore::case::{Calculator, CaseFile};
use clearbore::physics::units::format_significant;
use serde_json::{Value, json};
use support::Browser;

/// Label, value and unit of every result row of the table with this test id.
async fn result_rows(b: &Browser, table: &str) -> Vec<(String, String, String)> {
    let rows = b
        .js(&format!(r#"return Array.from(document.querySelectorAll('[data-testid={table}] > tbody > tr')).map(tr => [
            tr.querySelector('th').textContent.trim(),
            tr.querySelector('td.value').textContent.trim(),
            (tr.querySelector('select.unit') || tr.querySelector('span.unit')).value
                ?? tr.querySelector('span.unit').textContent.trim()
        ]);"#))
        .await;
    rows.as_array()
        .unwrap()
        .iter()
        .map(|r| {
            let r = r.as_array().unwrap();
            let s = |i: usize| r[i].as_str().unwrap_or("").to_owned();
            (s(0), s(1), s(2))
        })
        .collect()
}

/// What a clean page reports about itself (see [`Browser::assert_clean`]).
async fn assert_clean(b: &Browser) {
    b.assert_clean().await;
}

/// The rows of `table` equal the command line's `figures`, each formatted with the page's default
/// of 4 significant figures in the unit its size calls for.
async fn assert_rows_match(b: &Browser, table: &str, figures: &[&Value], library: &clearbore::physics::report::Report) {
    let rows = result_rows(b, table).await;
    assert_eq!(rows.len(), figures.len(), "{table}: one row per figure: {rows:?}");
    for (f, (label, value, unit)) in figures.iter().zip(&rows) {
        let si = f["value"].as_f64().unwrap();
        let u = library.figure(f["key"].as_str().unwrap()).unwrap().dimension.display_unit(si);
        assert_eq!(label, f["label"].as_str().unwrap());
        assert_eq!(unit, u.symbol, "{label}");
        assert_eq!(value, &format_significant(u.from_si(si), 4), "{label}");
    }
}

/// Every figure and verdict on the page equals the command line's output for the calculator's
/// demo case file: the main results table, and for a line each element's detail in turn.
async fn assert_page_matches_cli(b: &Browser, calculator: Calculator) {
    let file = format!("{}/public/cases/{}", env!("CARGO_MANIFEST_DIR"), calculator.demo_file());
    let out = std::process::Command::new(env!("CARGO_BIN_EXE_clearbore")).arg(&file).output().unwrap();
    assert!(out.status.success(), "{file}: {}", String::from_utf8_lossy(&out.stderr));
    let cli: Value = serde_json::from_slice(&out.stdout).unwrap();
    let figures = cli["report"]["figures"].as_array().unwrap();
    let library = CaseFile::from_json(calculator.demo_json()).unwrap().evaluate().unwrap();
    let element = |key: &str| key.strip_prefix("element_").and_then(|k| k.split('_').next()).and_then(|n| n.parse::<usize>().ok());
    let main: Vec<&Value> = figures.iter().filter(|f| element(f["key"].as_str().unwrap()).is_none()).collect();
    assert_rows_match(b, "results", &main, &library).await;
    let checks = cli["report"]["checks"].as_array().unwrap();
    let verdict_of = async |key: &str| b.text(&format!("[data-testid=verdict-{key}]")).await.to_lowercase();
    for c in checks.iter().filter(|c| element(c["key"].as_str().unwrap()).is_none()) {
        let key = c["key"].as_str().unwrap();
        let shown = verdict_of(key).await;
        assert!(shown.contains(c["verdict"].as_str().unwrap()), "{key}: page {shown}, CLI {}", c["verdict"]);
    }
    let parts = figures.iter().filter_map(|f| element(f["key"].as_str().unwrap())).max().unwrap_or(0);
    for n in 1..=parts {
        b.click(&format!("[data-testid=part-{n}]")).await;
        b.text_when("[data-testid=element-detail] h3", |t| t.starts_with(&format!("Element {n}:"))).await;
        let mine: Vec<&Value> = figures.iter().filter(|f| element(f["key"].as_str().unwrap()) == Some(n)).collect();
        assert_rows_match(b, "element-results", &mine, &library).await;
        for c in checks.iter().filter(|c| element(c["key"].as_str().unwrap()) == Some(n)) {
            let key = c["key"].as_str().unwrap();
            let shown = verdict_of(key).await;
            assert!(shown.contains(c["verdict"].as_str().unwrap()), "{key}: page {shown}, CLI {}", c["verdict"]);
        }
    }
}

#[tokio::test]
async fn demo_case_renders_and_matches_the_command_line() {
    let b = Browser::start().await;
    b.open_page().await;
    assert!(b.text("[data-testid=safety-notice]").await.contains("Engineering estimates"));
    assert!(b.js("return document.querySelector('[data-testid=case-title-input]').value;").await.as_str().unwrap().contains("Demo (invented)"));

    assert_page_matches_cli(&b, Calculator::TubularReactor).await;
    // Hand check of the headline number: V = π (0.76 mm)² / 4 × 10 m = 4.5365 mL; τ = V / 0.5 mL/min.
    assert_eq!(b.text("[data-testid=result-residence_time]").await, "9.073");
    assert!(b.text("[data-testid=verdict-pressure_budget]").await.to_lowercase().contains("fine"));
    b.screenshot("demo").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn invalid_entries_show_a_message_at_the_field_and_results_stay() {
    let b = Browser::start().await;
    b.open_page().await;
    let demo = b.text("[data-testid=result-residence_time]").await;
    for (typed, expect) in [("abc", "not a number"), ("-1", "allowed: ≥ 1e-5 mm"), ("0", "allowed: ≥ 1e-5 mm"), ("1e400", "too large")] {
        // Results update on every keystroke, so "1e40" on the way to "1e400" is a valid entry:
        // the results must stay at what the last valid text gave.
        let (head, _) = typed.split_at(typed.len() - 1);
        b.type_into("inner_diameter", head).await;
        let before = b.text("[data-testid=result-residence_time]").await;
        b.type_into("inner_diameter", typed).await;
        let msg = b.text_when("[data-testid=error-inner_diameter]", |t| t.contains(expect)).await;
        assert!(msg.contains(typed), "{msg}");
        assert!(b.exists("[data-testid=stale-notice]").await, "stale notice for {typed}");
        assert_eq!(b.text("[data-testid=result-residence_time]").await, before, "results stay for {typed}");
        // Other fields show no error.
        assert!(!b.exists("[data-testid=error-length]").await);
    }
    b.screenshot("invalid-entry").await;
    b.type_into("inner_diameter", "0.76").await;
    b.text_when("[data-testid=result-residence_time]", |t| t == demo).await;
    assert!(!b.exists("[data-testid=error-inner_diameter]").await);
    assert!(!b.exists("[data-testid=stale-notice]").await);
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn edits_update_results_and_units_do_not_change_them() {
    let b = Browser::start().await;
    b.open_page().await;
    // Doubling the flow halves the residence time: 9.073 → 4.536 min.
    b.type_into("flow", "1").await;
    b.text_when("[data-testid=result-residence_time]", |t| t == "4.536").await;
    // The same flow in µL/min: the field converts, the result stays.
    b.choose("unit-flow", "µL/min").await;
    let shown = b.client.find(fantoccini::Locator::Css("[data-testid=input-flow]")).await.unwrap().prop("value").await.unwrap();
    assert_eq!(shown.as_deref(), Some("1000"));
    assert_eq!(b.text("[data-testid=result-residence_time]").await, "4.536");
    // A result shown in seconds: 4.536 min × 60 = 272.2 s.
    b.choose("result-unit-residence_time", "s").await;
    b.text_when("[data-testid=result-residence_time]", |t| t == "272.2").await;
    // Recirculation adds the loop figures: batch 40 + 4.53646 mL = 44.53646 mL, 3 passes at
    // 1 mL/min = 133.6094 min.
    b.click("[data-testid=option-operation-recirculation]").await;
    b.text_when("[data-testid=result-total_time]", |t| t == "133.6").await;
    assert!(b.exists("[data-testid=input-passes]").await);
    // Significant figures apply everywhere.
    b.choose("sig-figs", "6").await;
    b.text_when("[data-testid=result-total_time]", |t| t == "133.609").await;
    b.screenshot("recirculation").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn over_pressure_is_a_problem_with_its_caution_beside_it() {
    let b = Browser::start().await;
    b.open_page().await;
    assert!(!b.exists("[data-testid=caution-pressure_budget]").await);
    // 5 bar back-pressure + 0.038 bar line drop against a 5 bar rating.
    b.type_into("pressure_rating", "5").await;
    b.text_when("[data-testid=verdict-pressure_budget]", |t| t.to_lowercase().contains("problem")).await;
    let caution = b.text("[data-testid=caution-pressure_budget]").await;
    assert!(caution.contains("Over-pressure"), "{caution}");
    // Within 20 % of the rating: caution.
    b.type_into("pressure_rating", "6").await;
    b.text_when("[data-testid=verdict-pressure_budget]", |t| t.to_lowercase().contains("caution")).await;
    b.screenshot("over-pressure").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn packed_cartridge_demo_matches_the_command_line_and_flags_problems() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-packed_bed]").await;
    b.wait_for("[data-testid=panel-packed_bed]").await;
    b.wait_for("[data-testid=spread-bed_pressure_drop]").await;
    assert_page_matches_cli(&b, Calculator::PackedBed).await;
    b.screenshot("packed-bed-demo").await;

    // Up-flow through a bed free to rise: 1 mL/min in 6.6 mm is 0.49 mm/s superficial, above
    // the 0.15 mm/s minimum fluidisation velocity of these beads (figure on the page).
    b.click("[data-testid=option-flow_direction-up]").await;
    b.text_when("[data-testid=verdict-bed_lifting]", |t| t.to_lowercase().contains("problem")).await;
    assert!(b.text("[data-testid=caution-bed_lifting]").await.contains("lifting bed"));
    // Held between frits, the same flow does not lift it.
    b.click("[data-testid=option-confinement-confined]").await;
    b.text_when("[data-testid=verdict-bed_lifting]", |t| !t.to_lowercase().contains("problem")).await;

    // Fines: 2 µm instead of 150 µm raises the bed pressure drop about (150/2)² = 5600-fold
    // (viscous regime, Ergun), from 0.0075 bar to about 42 bar: past the 20 bar rating.
    b.type_into("particle_diameter", "2").await;
    b.text_when("[data-testid=verdict-pressure_budget]", |t| t.to_lowercase().contains("problem")).await;
    assert!(b.text("[data-testid=caution-pressure_budget]").await.contains("Over-pressure"));
    b.screenshot("packed-bed-over-pressure").await;

    // The tubular form kept its entries while the other calculator was shown.
    b.click("[data-testid=tab-tubular_reactor]").await;
    b.text_when("[data-testid=result-residence_time]", |t| t == "9.073").await;
    assert_clean(&b).await;
    b.close().await;
}

/// Opens element `n`'s detail by clicking it in the drawn line.
async fn select_element(b: &Browser, n: usize) {
    b.wait_for(&format!("[data-testid=part-{n}]")).await;
    b.click(&format!("[data-testid=part-{n}]")).await;
    b.text_when("[data-testid=element-detail] h3", |t| t.starts_with(&format!("Element {n}:"))).await;
}

#[tokio::test]
async fn slurry_line_gives_a_verdict_per_element_and_follows_edits() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-slurry_line]").await;
    b.wait_for("[data-testid=panel-slurry_line]").await;
    b.wait_for("[data-testid=verdict-line_verdict]").await;
    assert_page_matches_cli(&b, Calculator::SlurryLine).await;
    // Every element is drawn, coloured by its verdict; each one's checks open with it.
    for n in 1..=5 {
        assert!(b.exists(&format!("[data-testid=part-{n}]")).await, "element {n} drawn");
        select_element(&b, n).await;
        assert!(b.exists(&format!("[data-testid=verdict-element_{n}_settling]")).await, "element {n}");
        assert!(b.exists(&format!("[data-testid=verdict-element_{n}_clogging]")).await, "element {n}");
    }
    assert!(b.text("[data-testid=narrowest-mark]").await.contains("narrowest"));
    let narrowest = b.text("[data-testid=check-narrowest_passage]").await;
    assert!(narrowest.contains("Element 5") && narrowest.contains("back-pressure regulator seat"), "{narrowest}");
    // Horizontal 1.6 mm tubing: d90 particles reach the wall in a fraction of a second, a plug
    // risk, with its caution beside the verdict.
    select_element(&b, 1).await;
    assert!(b.text("[data-testid=verdict-element_1_settling]").await.to_lowercase().contains("problem"));
    assert!(b.text("[data-testid=caution-element_1_settling]").await.contains("plug"));
    // The summary opens with the verdict and names the failing elements.
    assert!(b.text("[data-testid=overall-verdict]").await.to_lowercase().contains("problem"));
    assert!(b.exists("[data-testid=act-element_1_settling]").await);
    b.screenshot("slurry-demo").await;

    // A 0.10 mm seat against d90 = 60 µm: passage ratio 1.7, below 3 (bridging, Marin et al. 2018).
    b.type_into("element_5_inner_diameter", "0.1").await;
    select_element(&b, 5).await;
    b.text_when("[data-testid=verdict-element_5_clogging]", |t| t.to_lowercase().contains("problem")).await;
    assert!(b.exists("[data-testid=caution-element_5_clogging]").await);
    // Faster flow carries the particles up the vertical run: 10 mL/min gives U = 82.9 mm/s in
    // 1.6 mm, above 5 × the 6.6 mm/s hindered settling velocity of d90.
    b.type_into("flow", "10").await;
    select_element(&b, 4).await;
    b.text_when("[data-testid=verdict-element_4_settling]", |t| t.to_lowercase().contains("fine")).await;
    // Coarser particles bridge the 0.5 mm fitting: d90 = 200 µm gives a passage ratio of 2.5 (< 3).
    select_element(&b, 2).await;
    assert!(!b.text("[data-testid=verdict-element_2_clogging]").await.to_lowercase().contains("problem"));
    b.type_into("d90", "200").await;
    select_element(&b, 2).await;
    b.text_when("[data-testid=verdict-element_2_clogging]", |t| t.to_lowercase().contains("problem")).await;
    // Elements can be added and removed; each new one gets its own verdicts.
    b.click("[data-testid=add-element]").await;
    b.wait_for("[data-testid=part-6]").await;
    select_element(&b, 6).await;
    b.wait_for("[data-testid=verdict-element_6_settling]").await;
    b.click("[data-testid=remove-element-6]").await;
    for _ in 0..50 {
        if !b.exists("[data-testid=part-6]").await {
            break;
        }
        tokio::time::sleep(std::time::Duration::from_millis(50)).await;
    }
    assert!(!b.exists("[data-testid=part-6]").await && !b.exists("[data-testid=verdict-element_6_settling]").await);
    b.screenshot("slurry-edited").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn gas_liquid_demo_shows_equivalents_spreads_and_the_oxygen_caution() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-segmented_flow]").await;
    b.wait_for("[data-testid=panel-segmented_flow]").await;
    b.wait_for("[data-testid=result-gas_equivalents]").await;
    assert_page_matches_cli(&b, Calculator::SegmentedFlow).await;
    // Several slug-length and kLa correlations, each shown with the spread.
    assert!(b.exists("[data-testid=spread-bubble_length]").await);
    assert!(b.exists("[data-testid=spread-kla_per_s]").await);
    // 4.5 % O₂ over acetonitrile at 60 °C stays below 4.83 vol %, 60 % of its estimated LOC
    // (8.04 vol %): fine, with the note on the outlet beside it.
    assert!(b.text("[data-testid=verdict-gas_hazard]").await.to_lowercase().contains("fine"));
    assert!(b.text("[data-testid=check-gas_hazard]").await.contains("8.04 vol %"));
    b.screenshot("gas-liquid-demo").await;
    // Air over the same hot solvent: the verdict turns red, with what to feed instead beside it.
    b.choose("choice-gas", "air").await;
    b.text_when("[data-testid=verdict-gas_hazard]", |t| t.to_lowercase().contains("problem")).await;
    assert!(b.text("[data-testid=caution-gas_hazard]").await.contains("at most 4.83 % O₂"));
    assert!(b.text("[data-testid=overall-verdict]").await.to_lowercase().contains("problem"));
    b.screenshot("gas-liquid-air").await;
    // Pure oxygen is a problem too; a measured LOC entered for the solvent replaces the estimate:
    // 9 % O₂ below a 12 % LOC but above its 60 % margin (7.2 %) is a caution.
    b.choose("choice-gas", "oxygen").await;
    b.type_into("gas_mole_fraction", "100").await;
    b.text_when("[data-testid=verdict-gas_hazard]", |t| t.to_lowercase().contains("problem")).await;
    b.type_into("gas_mole_fraction", "9").await;
    assert!(!b.exists("[data-testid=input-limiting_oxygen]").await);
    b.click("[data-testid=option-loc_source-entered]").await;
    b.type_into("limiting_oxygen", "12").await;
    b.text_when("[data-testid=check-gas_hazard]", |t| t.contains("12.0 vol % as entered") && t.contains("above 7.20 vol %")).await;
    assert!(b.text("[data-testid=verdict-gas_hazard]").await.to_lowercase().contains("caution"));
    // Another solvent changes the properties and every result that depends on them.
    let bond = b.text("[data-testid=result-bond]").await;
    b.choose("choice-solvent", "water").await;
    b.text_when("[data-testid=result-bond]", |t| t != bond).await;
    // A custom liquid asks for its properties.
    b.choose("choice-solvent", "custom").await;
    b.wait_for("[data-testid=input-liquid_viscosity]").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn gas_liquid_cartridge_demo_shows_pressure_holdup_transfer_and_lifting_in_up_flow() {
    // At device pixel ratio 2, so that its chart is checked for sharpness like the others.
    let b = Browser::start_scaled(2.0).await;
    b.open_page().await;
    b.click("[data-testid=tab-gas_liquid_bed]").await;
    b.wait_for("[data-testid=panel-gas_liquid_bed]").await;
    b.wait_for("[data-testid=result-bed_pressure_drop]").await;
    assert_page_matches_cli(&b, Calculator::GasLiquidBed).await;
    // Two correlations with their spread, the holdup spread, k_L a, the regime, the transfer
    // verdict and the caution for opening the bed.
    assert!(b.exists("[data-testid=spread-bed_pressure_drop]").await);
    assert!(b.exists("[data-testid=spread-liquid_holdup]").await);
    assert!(b.exists("[data-testid=result-kla]").await);
    assert!(b.text("[data-testid=verdict-flow_regime]").await.to_lowercase().contains("caution"));
    assert!(b.exists("[data-testid=verdict-gas_transfer]").await);
    assert!(b.exists("[data-testid=caution-catalyst_ignition]").await);
    assert_chart_drawn(&b, "bed_pressure_drop_vs_gas_flow").await;
    b.screenshot("gas-liquid-cartridge-demo").await;
    // Up-flow with the bed free to rise: the two-phase flow lifts it.
    assert!(b.text("[data-testid=verdict-bed_lifting]").await.to_lowercase().contains("fine"));
    b.click("[data-testid=option-flow_direction-up]").await;
    b.wait_for("[data-testid=choice-confinement]").await;
    b.text_when("[data-testid=verdict-bed_lifting]", |t| t.to_lowercase().contains("problem")).await;
    assert!(b.exists("[data-testid=caution-bed_lifting]").await);
    assert_clean(&b).await;
    b.close().await;
}

/// The chart `key` is drawn once scrolled to: its canvas backing store is the CSS size times the
/// device pixel ratio, and it has ink on it (not a blank or transparent canvas).
async fn assert_chart_drawn(b: &Browser, key: &str) {
    b.wait_for(&format!("[data-testid=plot-{key}] canvas")).await;
    // Charts are drawn when on screen: bring this one there.
    b.js(&format!("document.querySelector('[data-testid=plot-{key}]').scrollIntoView(); return true;")).await;
    let v = b
        .js_when(&format!(
            "const c = document.querySelector('[data-testid=plot-{key}] canvas');
             const d = c.getContext('2d').getImageData(0, 0, c.width, c.height).data;
             let ink = 0; for (let i = 0; i < d.length; i += 4) if (d[i+3] > 0 && (d[i] < 200 || d[i+1] < 200 || d[i+2] < 200)) ink++;
             return {{ w: c.width, h: c.height, cw: c.clientWidth, ch: c.clientHeight, r: window.devicePixelRatio, ink }};"
            ),
            // Drawn: its backing store sized for the screen and ink on it (a canvas not drawn yet
            // is 300 px wide and transparent).
            |v| v["ink"].as_f64().is_some_and(|ink| ink > 2000.0) && v["w"].as_f64() != Some(300.0),
        )
        .await;
    let f = |k: &str| v[k].as_f64().unwrap();
    assert_eq!(f("r"), 2.0, "device pixel ratio forced to 2");
    assert!((f("w") - (f("cw") * f("r")).round()).abs() <= 1.0, "{key}: backing width {v}");
    assert!((f("h") - (f("ch") * f("r")).round()).abs() <= 1.0, "{key}: backing height {v}");
    assert!(f("ink") > 2000.0, "{key}: canvas looks blank {v}");
    b.screenshot_of(&format!("[data-testid=plot-{key}]"), &format!("chart-{key}")).await;
}

#[tokio::test]
async fn charts_are_drawn_sharp_on_a_high_density_screen() {
    let b = Browser::start_scaled(2.0).await;
    b.open_page().await;
    b.click("[data-testid=tab-packed_bed]").await;
    assert_chart_drawn(&b, "bed_pressure_drop_vs_flow").await;
    b.screenshot("chart-packed-bed").await;
    b.click("[data-testid=tab-slurry_line]").await;
    assert_chart_drawn(&b, "settling_vs_size").await;
    b.click("[data-testid=tab-segmented_flow]").await;
    for key in ["pressure_profile", "length_profile", "fraction_profile", "bubble_length_vs_gas_fraction", "slug_length_vs_gas_fraction"] {
        assert_chart_drawn(&b, key).await;
    }
    b.screenshot("chart-gas-liquid").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn choosing_a_solvent_and_temperature_updates_properties_and_flags_boiling() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-slurry_line]").await;
    b.wait_for("[data-testid=result-liquid_density]").await;
    // Acetonitrile at 25 °C from the fitted model (0.7769 g/mL; thermo 0.6.1 reference values).
    assert_eq!(b.text("[data-testid=result-liquid_density]").await, "0.7769");
    let dp = b.text("[data-testid=result-total_pressure_drop]").await;
    b.choose("choice-liquid", "dichloromethane").await;
    b.text_when("[data-testid=result-liquid_density]", |t| t != "0.7769").await;
    b.text_when("[data-testid=result-total_pressure_drop]", |t| t != dp).await;
    // DCM at 60 °C with no back-pressure boils: a problem with its caution beside it.
    b.type_into("temperature", "60").await;
    b.type_into("back_pressure", "0").await;
    b.text_when("[data-testid=verdict-boiling]", |t| t.to_lowercase().contains("problem")).await;
    assert!(b.text("[data-testid=caution-boiling]").await.contains("back-pressure"));
    // Outside the fitted range the property row is marked and the warning is in its details.
    b.type_into("back_pressure", "25").await;
    b.type_into("temperature", "130").await;
    b.wait_for("[data-testid=results] tr.warned [data-testid=result-liquid_density]").await;
    // The demo's PFA 1/8″ × 1/16″ keeps 0.57 of its 41 bar(g) at 130 °C (its published tensile
    // strength when hot): 23.4 bar(g), so 25 bar(g) is over it.
    b.text_when("[data-testid=verdict-tubing_rating]", |t| t.to_lowercase().contains("problem")).await;
    assert!(b.text("[data-testid=caution-tubing_rating]").await.contains("polymer"));
    b.screenshot("solvent-boiling").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn choosing_a_solid_sets_its_density_and_a_porous_support_asks_for_its_porosity() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-slurry_line]").await;
    b.wait_for("[data-testid=result-particle_density_used]").await;
    // Demo: potassium phosphate from the solids table, 2.564 g/mL (CRC via chemicals 1.5.2).
    assert_eq!(b.text("[data-testid=result-particle_density_used]").await, "2.564");
    assert!(!b.exists("[data-testid=input-particle_density]").await, "no density entry for a tabulated solid");
    assert!(!b.exists("[data-testid=input-particle_porosity]").await, "no porosity for a dense solid");
    let settling = b.text("[data-testid=result-terminal_velocity_d90]").await;
    // Silica gel: its porosity is asked for, and at 60 % it settles as 2196 × 0.4 + 0.6 × 0.7769
    // = 1.345 g/mL, more slowly than the phosphate.
    b.choose("choice-solid", "silica_gel").await;
    b.wait_for("[data-testid=input-particle_porosity]").await;
    b.type_into("particle_porosity", "60").await;
    b.text_when("[data-testid=result-particle_density_used]", |t| t == "1.345").await;
    b.text_when("[data-testid=result-terminal_velocity_d90]", |t| t != settling).await;
    // An entered density brings its field back.
    b.choose("choice-solid", "entered").await;
    b.wait_for("[data-testid=input-particle_density]").await;
    b.text_when("[data-testid=result-particle_density_used]", |t| t == "2.560").await;
    b.screenshot("solid-choice").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn a_mixture_of_two_solvents_can_be_chosen_and_is_checked() {
    let b = Browser::start().await;
    b.open_page().await;
    b.wait_for("[data-testid=result-liquid_density]").await;
    // Demo: acetonitrile at 60 °C. A mixture asks for its two solvents and the volume fraction.
    let acetonitrile = b.text("[data-testid=result-liquid_density]").await;
    assert!(!b.exists("[data-testid=choice-mixture_first]").await);
    b.choose("choice-liquid", "mixture").await;
    b.wait_for("[data-testid=choice-mixture_first]").await;
    b.choose("choice-mixture_first", "water").await;
    b.choose("choice-mixture_second", "ethanol").await;
    b.type_into("first_volume_fraction", "50").await;
    b.text_when("[data-testid=result-liquid_density]", |t| t != acetonitrile).await;
    // Water with ethanol: the ideal rules are named and their known failure is a caution.
    b.text_when("[data-testid=verdict-liquid_mixture]", |t| t.to_lowercase().contains("caution")).await;
    assert!(b.text("[data-testid=check-liquid_mixture]").await.contains("deviates strongly"));
    assert!(b.text("[data-testid=check-boiling]").await.contains("Raoult"));
    b.screenshot("liquid-mixture").await;
    assert_clean(&b).await;
    b.close().await;
}

/// Opens a copy of the built page changed by `edit`, from `file://`.
async fn open_altered(b: &Browser, name: &str, edit: impl Fn(String) -> String) {
    let page = std::fs::read_to_string(support::page_path()).unwrap();
    let dir = std::path::PathBuf::from(env!("CARGO_MANIFEST_DIR")).join("target/altered-pages");
    std::fs::create_dir_all(&dir).unwrap();
    let path = dir.join(format!("{name}.html"));
    std::fs::write(&path, edit(page)).unwrap();
    b.client.goto(&format!("file://{}", path.display())).await.unwrap();
}

#[tokio::test]
async fn a_browser_that_cannot_run_the_app_shows_why_instead_of_a_blank_page() {
    let b = Browser::start().await;
    // A browser without DecompressionStream (Firefox < 113, Safari < 16.4): simulated by
    // removing it before the loader runs.
    open_altered(&b, "no-decompression", |p| {
        p.replacen("<script type=\"module\">", "<script type=\"module\">\nwindow.DecompressionStream = undefined;", 1)
    })
    .await;
    b.wait_for("[data-testid=boot-error]").await;
    let msg = b.text("[data-testid=boot-error]").await;
    assert!(msg.contains("could not start") && msg.contains("DecompressionStream") && msg.contains("Safari 16.4"), "{msg}");
    assert!(!b.exists("[data-testid=result-residence_time]").await);
    // A damaged file (the packed wasm cut short): the same kind of message, not a dead page.
    open_altered(&b, "damaged", |p| {
        let start = p.find("const wasmGzipBase64 = \"").unwrap() + "const wasmGzipBase64 = \"".len();
        let mut out = p.clone();
        out.replace_range(start..start + 4000, "");
        out
    })
    .await;
    b.wait_for("[data-testid=boot-error]").await;
    assert!(b.text("[data-testid=boot-error]").await.contains("could not start"));
    b.screenshot("boot-error").await;
    b.close().await;
}

#[tokio::test]
async fn entries_that_disagree_are_refused_at_the_field_that_breaks_them() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-slurry_line]").await;
    b.wait_for("[data-testid=panel-slurry_line]").await;
    assert!(!b.exists("[data-testid=stale-notice]").await);
    // d50 below d10: the message sits at d50, which is red, and only then the notice says so.
    b.type_into("d50", "5").await;
    let msg = b.text_when("[data-testid=error-d50]", |t| !t.is_empty()).await;
    assert!(msg.contains("must be above d10 (8.000 µm)"), "{msg}");
    assert_eq!(b.js("return document.querySelector('[data-testid=input-d50]').getAttribute('aria-invalid');").await, "true");
    assert!(b.text("[data-testid=stale-notice]").await.contains("marked in red"));
    assert!(!b.exists("[data-testid=error-d10]").await && !b.exists("[data-testid=error-d90]").await);
    b.type_into("d50", "25").await;
    b.text_when("[data-testid=summary]", |t| !t.is_empty()).await;
    for _ in 0..40 {
        if !b.exists("[data-testid=stale-notice]").await {
            break;
        }
        tokio::time::sleep(std::time::Duration::from_millis(50)).await;
    }
    assert!(!b.exists("[data-testid=stale-notice]").await, "no notice once no field is red");
    // 1e30 in a flow: refused at the field with its range, never a result.
    b.type_into("flow", "1e30").await;
    let msg = b.text_when("[data-testid=error-flow]", |t| !t.is_empty()).await;
    assert!(msg.contains("allowed") && msg.contains("1000 mL/min"), "{msg}");
    assert!(b.text("[data-testid=stale-notice]").await.contains("marked in red"));
    b.assert_clean().await;
    b.close().await;
}

#[tokio::test]
async fn hot_fep_tubing_shows_its_lower_rating_and_where_it_comes_from() {
    let b = Browser::start().await;
    b.open_page().await;
    // The tubular demo runs at 60 °C in 1/16″ × 0.030″ PFA; FEP of the same size is rated lower
    // hot (its published tensile strength falls faster with temperature).
    let pfa = b.text("[data-testid=check-tubing_rating]").await;
    b.choose("choice-tubing_material", "fep").await;
    let fep = b.text_when("[data-testid=check-tubing_rating]", |t| t.contains("FEP")).await;
    let rating = |t: &str| -> f64 {
        let at = t.find("working pressure ").unwrap() + "working pressure ".len();
        t[at..].split(' ').next().unwrap().parse().unwrap()
    };
    assert!(rating(&fep) < rating(&pfa), "FEP {fep} vs PFA {pfa}");
    assert!(fep.contains("temperature factor") && fep.contains("source"), "{fep}");
    // At 150 °C the FEP factor is about a third of PFA's (0.18: 32 bar(g) cold, 5.8 bar(g) hot):
    // the check shows it and turns red for 6 bar of back-pressure.
    b.type_into("back_pressure", "6").await;
    b.type_into("temperature", "150").await;
    b.text_when("[data-testid=check-tubing_rating]", |t| t.contains("150 °C")).await;
    let hot = b.text("[data-testid=check-tubing_rating]").await;
    assert!(hot.contains("0.18"), "{hot}");
    assert!(b.text("[data-testid=verdict-tubing_rating]").await.to_lowercase().contains("problem"));
    assert!(b.exists("[data-testid=caution-tubing_rating]").await);
    b.close().await;
}

#[tokio::test]
async fn models_that_rest_on_recall_are_marked_in_the_spread() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-segmented_flow]").await;
    b.wait_for("[data-testid=result-kla_per_s]").await;
    // Open the k_L a row's details: Vandu and Yue 2007 rest on recall, van Baten–Krishna does not.
    b.js("document.querySelector('[data-testid=spread-kla_per_s]').closest('details').open = true;").await;
    let marks = b
        .js("return [...document.querySelectorAll('[data-testid=spread-kla_per_s] tr')].map(tr => [tr.cells[0].textContent, !!tr.querySelector('.recalled')]);")
        .await;
    let rows = marks.as_array().unwrap();
    let marked = |name: &str| rows.iter().find(|r| r[0].as_str().unwrap().starts_with(name)).map(|r| r[1].as_bool().unwrap());
    assert_eq!(marked("van Baten"), Some(false), "{marks}");
    assert_eq!(marked("Vandu"), Some(true), "{marks}");
    assert!(rows.iter().any(|r| r[0].as_str().unwrap().contains("2007") && r[1] == true), "{marks}");
    b.close().await;
}

#[tokio::test]
async fn a_range_entry_gives_bands_names_the_entry_that_drives_them_and_a_straddled_limit() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-packed_bed]").await;
    b.wait_for("[data-testid=panel-packed_bed]").await;
    assert!(!b.exists("[data-testid=ranges]").await, "no ranges, no band section");
    // Voidage 36–42 % (entered) and flow 1 ± 10 %: the bed's pressure drop moves most with the
    // voidage ((1−ε)²/ε³ in Ergun's viscous term), the residence time with the flow.
    b.click("[data-testid=option-voidage_source-entered]").await;
    b.type_into("voidage", "36-42").await;
    b.type_into("flow", "1 ± 10 %").await;
    b.wait_for("[data-testid=band-bed_pressure_drop]").await;
    assert!(b.text("[data-testid=driver-bed_pressure_drop]").await.starts_with("Bed voidage"));
    assert_eq!(b.text("[data-testid=driver-residence_time]").await, "Flow");
    // The page's band equals the command line's for the same case.
    let mut case: Value = serde_json::from_str(Calculator::PackedBed.demo_json()).unwrap();
    case["inputs"]["voidage_source"] = json!("entered");
    case["inputs"]["voidage"] = json!({"value": 39, "unit": "%", "range": [36, 42]});
    case["inputs"]["flow"] = json!({"value": 1, "unit": "mL/min", "range": [0.9, 1.1]});
    let case = CaseFile::from_json(&case.to_string()).unwrap();
    let band = clearbore::case::ranges::spread(&case).unwrap().band("bed_pressure_drop").cloned().unwrap();
    let shown = b.text("[data-testid=band-bed_pressure_drop]").await;
    let expected = format!("{} to {}", band.dimension.show(band.low, 3), band.dimension.show(band.high, 3));
    assert!(shown.contains(&expected), "{shown} vs {expected}");
    // A back-pressure range that crosses the 20 bar rating: the budget check is said to straddle.
    b.type_into("back_pressure", "10-25").await;
    let straddle = b.text_when("[data-testid=range-verdict-pressure_budget]", |t| t.contains("problem")).await;
    assert!(straddle.contains("straddle"), "{straddle}");
    // The main results stay those of the nominal entries (17.5 bar), shown as usual.
    assert!(b.exists("[data-testid=result-bed_pressure_drop]").await);
    b.screenshot("ranges").await;
    assert_clean(&b).await;
    b.close().await;
}

/// Sends a mouse event of `kind` to the cartridge map at the fractions (`fx` from the left, `fy`
/// from the top) of its canvas.
async fn map_event(b: &Browser, map: &str, kind: &str, fx: f64, fy: f64) {
    b.js(&format!(
        "const c = document.querySelector('[data-testid=map-canvas-{map}]'); const r = c.getBoundingClientRect();
         c.dispatchEvent(new MouseEvent('{kind}', {{ bubbles: true, clientX: r.left + {fx} * r.width, clientY: r.top + {fy} * r.height }}));"
    ))
    .await;
}

/// The map marker's distance from the left (% of the map) once `ok` holds for it (5 s at most).
async fn marker_left_when(b: &Browser, map: &str, ok: impl Fn(f64) -> bool) -> f64 {
    let script = format!("return parseFloat(document.querySelector('[data-testid=map-marker-{map}]').style.left);");
    b.js_when(&script, |v| v.as_f64().is_some_and(&ok)).await.as_f64().unwrap()
}

#[tokio::test]
async fn the_cartridge_map_renders_reads_out_a_cell_moves_the_case_and_follows_the_entries() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-packed_bed]").await;
    // Folded (and not computed) until opened.
    assert!(!b.exists("[data-testid=map-canvas-cartridge_map]").await);
    b.click("[data-testid=panel-packed_bed] [data-testid=map-toggle]").await;
    b.wait_for("[data-testid=map-canvas-cartridge_map]").await;
    b.wait_for("[data-testid=map-marker-cartridge_map]").await;
    // Drawn: fine (green) at the lowest flow with ~100 µm particles, caution (amber) for the
    // coarsest (D_t/d_p below 10: wall effect), problem (red) at the finest particles and the
    // pump's largest flow (5 µm fines past the 20 bar limit).
    let pixel = |x: &str, y: &str| {
        format!("const c = document.querySelector('[data-testid=map-canvas-cartridge_map]'); return Array.from(c.getContext('2d').getImageData({x}, {y}, 1, 1).data);")
    };
    let green = b.js(&pixel("0", "Math.round(0.46 * c.height)")).await;
    let amber = b.js(&pixel("0", "0")).await;
    let red = b.js(&pixel("c.width - 1", "c.height - 1")).await;
    assert_eq!(green, json!([0xb9, 0xdf, 0xc4, 255]), "lowest flow, about 100 µm");
    assert_eq!(amber, json!([0xf3, 0xd9, 0x8b, 255]), "top left: lowest flow, coarsest particles");
    assert_eq!(red, json!([0xec, 0xa5, 0x9f, 255]), "bottom right: the pump's largest flow, the finest particles");
    // The read-out names this case until the pointer is on the map, then the cell under it.
    let own = b.text("[data-testid=map-readout-cartridge_map]").await;
    assert!(own.starts_with("Cell nearest this case: Flow 1"), "{own}");
    map_event(&b, "cartridge_map", "mousemove", 0.99, 0.99).await;
    let cell = b.text_when("[data-testid=map-readout-cartridge_map]", |t| t.starts_with("Flow")).await;
    assert!(cell.contains("problem") && cell.contains("Bed pressure drop (Ergun)"), "{cell}");
    // A click moves the case: the flow field takes the cell's flow (3 significant figures).
    let before = b.js("return document.querySelector('[data-testid=map-marker-cartridge_map]').style.left;").await;
    map_event(&b, "cartridge_map", "click", 0.9, 0.1).await;
    let typed = b.js_when("return document.querySelector('[data-testid=input-flow]').value;", |v| v != "1").await;
    let q: f64 = typed.as_str().unwrap().parse().unwrap();
    assert!(q > 3.0 && q <= 10.0, "flow now {q} mL/min");
    // The marker follows the entry: after the click it sits at the chosen flow, right of where
    // it was; a lower flow typed moves it left again.
    let start = before.as_str().unwrap().trim_end_matches('%').parse::<f64>().unwrap();
    let clicked = marker_left_when(&b, "cartridge_map", |x| x > start + 10.0).await;
    b.type_into("flow", "0.1").await;
    marker_left_when(&b, "cartridge_map", |x| x < clicked - 10.0).await;
    b.screenshot("cartridge-map").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn the_slurry_map_renders_reads_out_a_cell_and_a_click_sets_the_flow_and_the_tubing_bore() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-slurry_line]").await;
    b.wait_for("[data-testid=panel-slurry_line]").await;
    // Folded (and not computed) until opened.
    assert!(!b.exists("[data-testid=map-canvas-slurry_map]").await);
    b.click("[data-testid=panel-slurry_line] [data-testid=map-toggle]").await;
    b.wait_for("[data-testid=map-canvas-slurry_map]").await;
    b.wait_for("[data-testid=map-marker-slurry_map]").await;
    // Drawn as the map evaluated natively: a problem (red) at the narrowest bore and the largest
    // flow (pressure budget), caution (amber) at 4 mm-ish bores and high flow where the 0.5 mm
    // fitting's and the seat's margins over d90 are what limits (row 64 from the bottom, column 200).
    let c = CaseFile::from_json(Calculator::SlurryLine.demo_json()).unwrap();
    let sources: Vec<clearbore::case::EntrySource<'_>> = c.elements.iter().map(clearbore::case::EntrySource).collect();
    let refs: Vec<&dyn clearbore::physics::form::FieldSource> = sources.iter().map(|s| s as _).collect();
    let map = Calculator::SlurryLine.map(&clearbore::case::EntrySource(&c.inputs), &refs).unwrap().unwrap();
    assert_eq!(map.verdicts[map.index(255, 0)], Some(clearbore::physics::report::Verdict::Problem));
    assert_eq!(map.verdicts[map.index(200, 64)], Some(clearbore::physics::report::Verdict::Caution));
    let pixel = |x: usize, y: usize| {
        format!("const c = document.querySelector('[data-testid=map-canvas-slurry_map]'); return Array.from(c.getContext('2d').getImageData({x}, {y}, 1, 1).data);")
    };
    assert_eq!(b.js(&pixel(255, 255)).await, json!([0xec, 0xa5, 0x9f, 255]), "bottom right: narrowest bore, largest flow");
    assert_eq!(b.js(&pixel(200, 255 - 64)).await, json!([0xf3, 0xd9, 0x8b, 255]), "row 64, column 200");
    // The read-out names this case, then the cell under the pointer with the check that limits it.
    let own = b.text("[data-testid=map-readout-slurry_map]").await;
    // (The case's cell: its centre is within half a cell of 2 mL/min and 1.6 mm.)
    assert!(own.starts_with("Cell nearest this case: Flow 1.99 mL/min, tubing bore 1.60 mm: problem (limited by Element 1: settling)"), "{own}");
    map_event(&b, "slurry_map", "mousemove", 0.99, 0.99).await;
    let cell = b.text_when("[data-testid=map-readout-slurry_map]", |t| t.starts_with("Flow")).await;
    assert!(cell.contains("problem (limited by Pressure budget)") && cell.contains("Inlet pressure (gauge)"), "{cell}");
    // A click sets the flow and every tubing and coil bore (elements 1, 3 and 4), not the
    // fitting's opening (element 2).
    let before = b.js("return document.querySelector('[data-testid=map-marker-slurry_map]').style.left;").await;
    map_event(&b, "slurry_map", "click", 0.9, 0.5).await;
    let typed = b.js_when("return document.querySelector('[data-testid=input-flow]').value;", |v| v != "2").await;
    let q: f64 = typed.as_str().unwrap().parse().unwrap();
    assert!(q > 10.0 && q <= 50.0, "flow now {q} mL/min");
    let bore = |n: usize| format!("return document.querySelector('[data-testid=input-element_{n}_inner_diameter]').value;");
    let d: f64 = b.js(&bore(1)).await.as_str().unwrap().parse().unwrap();
    assert!(d > 0.7 && d < 1.3, "tubing bore now {d} mm");
    assert_eq!(b.js(&bore(3)).await, b.js(&bore(1)).await);
    assert_eq!(b.js(&bore(4)).await, b.js(&bore(1)).await);
    assert_eq!(b.js(&bore(2)).await, json!("0.5"));
    // The marker follows: right of where it was.
    let start = before.as_str().unwrap().trim_end_matches('%').parse::<f64>().unwrap();
    marker_left_when(&b, "slurry_map", |x| x > start + 10.0).await;
    b.screenshot("slurry-map").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn the_slurry_size_map_renders_reads_out_a_cell_and_a_click_sets_the_flow_and_scales_the_sizes() {
    use clearbore::physics::report::Verdict;
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-slurry_line]").await;
    b.wait_for("[data-testid=panel-slurry_line]").await;
    // Folded (and not computed) until opened; opening it leaves the bore map folded.
    assert!(!b.exists("[data-testid=map-canvas-slurry_size_map]").await);
    b.click("[data-testid=map-details-slurry_size_map] [data-testid=map-toggle]").await;
    b.wait_for("[data-testid=map-canvas-slurry_size_map]").await;
    b.wait_for("[data-testid=map-marker-slurry_size_map]").await;
    assert!(!b.exists("[data-testid=map-canvas-slurry_map]").await);
    // Drawn as the map evaluated natively, at three cells of different verdicts.
    let c = CaseFile::from_json(Calculator::SlurryLine.demo_json()).unwrap();
    let map = c.map_of(clearbore::case::MapKind::SlurrySize).unwrap().unwrap();
    let colour = |v: Option<Verdict>| match v {
        Some(Verdict::Fine) => json!([0xb9, 0xdf, 0xc4, 255]),
        Some(Verdict::Caution) => json!([0xf3, 0xd9, 0x8b, 255]),
        Some(Verdict::Problem) => json!([0xec, 0xa5, 0x9f, 255]),
        None => json!([0xdd, 0xdd, 0xdd, 255]),
    };
    let mut seen = std::collections::BTreeSet::new();
    for (ix, iy) in [(255, 255), (0, 0), (255, 0), (128, 60), (200, 100), (40, 200)] {
        let v = map.verdicts[map.index(ix, iy)];
        seen.insert(v);
        let pixel = format!(
            "const c = document.querySelector('[data-testid=map-canvas-slurry_size_map]'); return Array.from(c.getContext('2d').getImageData({ix}, {}, 1, 1).data);",
            255 - iy
        );
        assert_eq!(b.js(&pixel).await, colour(v), "cell {ix}, {iy}");
    }
    assert!(seen.len() >= 2, "{seen:?}");
    // The read-out names this case, then the cell under the pointer.
    let own = b.text("[data-testid=map-readout-slurry_size_map]").await;
    assert!(own.starts_with("Cell nearest this case: Flow 1.99 mL/min, particle size d90 "), "{own}");
    map_event(&b, "slurry_size_map", "mousemove", 0.5, 0.5).await;
    let cell = b.text_when("[data-testid=map-readout-slurry_size_map]", |t| t.starts_with("Flow")).await;
    assert!(cell.contains("particle size d90") && cell.contains("Narrowest opening over d90"), "{cell}");
    // A click near the top sets the flow and a large d90, d10 and d50 scaled with it (8/25/60 µm).
    let before = b.js("return document.querySelector('[data-testid=map-marker-slurry_size_map]').style.bottom;").await;
    map_event(&b, "slurry_size_map", "click", 0.9, 0.1).await;
    let typed = b.js_when("return document.querySelector('[data-testid=input-d90]').value;", |v| v != "60").await;
    let d90: f64 = typed.as_str().unwrap().parse().unwrap();
    assert!(d90 > 300.0 && d90 <= 1000.0, "d90 now {d90} µm");
    let value = |key: &str| format!("return document.querySelector('[data-testid=input-{key}]').value;");
    let d10: f64 = b.js(&value("d10")).await.as_str().unwrap().parse().unwrap();
    let d50: f64 = b.js(&value("d50")).await.as_str().unwrap().parse().unwrap();
    // Three significant figures each.
    assert!((d10 / d90 / (8.0 / 60.0) - 1.0).abs() < 0.01 && (d50 / d90 / (25.0 / 60.0) - 1.0).abs() < 0.01, "{d10} / {d50} / {d90}");
    let q: f64 = b.js(&value("flow")).await.as_str().unwrap().parse().unwrap();
    assert!(q > 10.0 && q <= 50.0, "flow now {q} mL/min");
    // The marker follows: higher than it was.
    let start = before.as_str().unwrap().trim_end_matches('%').parse::<f64>().unwrap();
    let script = "return parseFloat(document.querySelector('[data-testid=map-marker-slurry_size_map]').style.bottom);";
    b.js_when(script, |v| v.as_f64().is_some_and(|y| y > start + 20.0)).await;
    b.screenshot("slurry-size-map").await;
    assert_clean(&b).await;
    b.close().await;
}

/// Waits until stage `n` is the last one drawn.
async fn wait_for_stages(b: &Browser, n: usize) {
    for _ in 0..100 {
        if b.exists(&format!("[data-testid=part-{n}]")).await && !b.exists(&format!("[data-testid=part-{}]", n + 1)).await {
            return;
        }
        tokio::time::sleep(std::time::Duration::from_millis(50)).await;
    }
    panic!("the line did not settle at {n} stages");
}

/// A node pressure as the page shows it (4 significant figures, gauge).
fn node_text(report: &clearbore::physics::report::Report, i: usize) -> String {
    let Some(clearbore::physics::diagram::Diagram::Line(line)) = report.diagrams.first() else { panic!("no line") };
    format!("{}(g)", clearbore::physics::units::Dimension::PressureDifference.show(line.node_pressures[i].get(), 4))
}

#[tokio::test]
async fn a_setup_is_built_reordered_and_kept_across_a_reload() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-setup]").await;
    b.wait_for("[data-testid=panel-setup]").await;
    b.wait_for("[data-testid=verdict-pressure_budget]").await;
    wait_for_stages(&b, 7).await;
    // Down to three stages: the piston feed, the 10 m coil and the regulator (the syringe feed,
    // the fitting, the junction and the gas feed removed).
    b.click("[data-testid=remove-element-1]").await;
    wait_for_stages(&b, 6).await;
    b.click("[data-testid=remove-element-5]").await;
    wait_for_stages(&b, 5).await;
    b.click("[data-testid=remove-element-3]").await;
    wait_for_stages(&b, 4).await;
    b.click("[data-testid=remove-element-2]").await;
    wait_for_stages(&b, 3).await;
    let mut demo: Value = serde_json::from_str(Calculator::Setup.demo_json()).unwrap();
    let stages = demo["elements"].as_array().unwrap().clone();
    assert_eq!(stages[4]["kind"], "coil");
    demo["elements"] = Value::Array(vec![stages[1].clone(), stages[4].clone(), stages[6].clone()]);
    let three = CaseFile::from_json(&demo.to_string()).unwrap().evaluate().unwrap();
    b.text_when("[data-testid=node-0]", |t| t == node_text(&three, 0)).await;
    assert!(b.text("[data-testid=check-pressure_budget]").await.contains("coil at stage 2"));

    // A fourth stage goes in before the regulator, a copy of the coil (a second 10 m coil).
    b.click("[data-testid=add-element]").await;
    wait_for_stages(&b, 4).await;
    assert_eq!(b.js("return document.querySelector('[data-testid=\"choice-stage_3_kind\"]').value;").await, "coil");
    assert_eq!(b.js("return document.querySelector('[data-testid=\"choice-stage_4_kind\"]').value;").await, "regulator");
    // A regulator moved ahead of the coil breaks the order rule, said in the notice at its stage.
    b.click("[aria-label='Move stage 4 up']").await;
    let notice = b.text_when("[data-testid=stale-notice]", |t| t.contains("Stage 3: kind")).await;
    assert!(notice.contains("last stage"), "{notice}");
    b.click("[aria-label='Move stage 4 up']").await;
    for _ in 0..100 {
        if !b.exists("[data-testid=stale-notice]").await {
            break;
        }
        tokio::time::sleep(std::time::Duration::from_millis(50)).await;
    }
    assert!(!b.exists("[data-testid=stale-notice]").await, "the order is right again");
    // The copy made a fitting rated just above the set point, 5.01 bar, between the coil and the
    // regulator: it is the part closest to its rating, at stage 3.
    b.choose("choice-stage_3_kind", "fitting").await;
    b.type_into("stage_3_inner_diameter", "0.25").await;
    b.choose("unit-stage_3_length", "mm").await;
    b.type_into("stage_3_length", "10").await;
    b.type_into("stage_3_pressure_rating", "5.01").await;
    wait_for_stages(&b, 4).await;
    let budget = b.text_when("[data-testid=check-pressure_budget]", |t| t.contains("fitting at stage 3")).await;
    assert!(budget.contains("fitting at stage 3"), "{budget}");
    assert!(b.text("[data-testid=verdict-pressure_budget]").await.to_lowercase().contains("caution"));
    let before = b.text("[data-testid=node-2]").await;
    // Moved ahead of the coil, the fitting meets the coil's drop on top of the set point: over its
    // rating, a problem, named at its new place; the node after it now carries the coil's drop.
    b.click("[aria-label='Move stage 3 up']").await;
    b.text_when("[data-testid=check-pressure_budget]", |t| t.contains("fitting at stage 2")).await;
    b.text_when("[data-testid=verdict-pressure_budget]", |t| t.to_lowercase().contains("problem")).await;
    let after = b.text_when("[data-testid=node-2]", |t| t != before).await;
    let mut four = demo.clone();
    let fitting = serde_json::json!({
        "kind": "fitting",
        "inner_diameter": { "value": 0.25, "unit": "mm" },
        "length": { "value": 10, "unit": "mm" },
        "pressure_rating": { "value": 5.01, "unit": "bar" }
    });
    four["elements"] = Value::Array(vec![stages[1].clone(), fitting, stages[4].clone(), stages[6].clone()]);
    let reordered = CaseFile::from_json(&four.to_string()).unwrap().evaluate().unwrap();
    assert_eq!(after, node_text(&reordered, 2));
    b.screenshot("setup-reordered").await;

    // Kept: the workspace saves the setup (each stage holds only its kind's entries) and a reload
    // reopens it as it was.
    tokio::time::sleep(std::time::Duration::from_millis(300)).await;
    b.client.refresh().await.unwrap();
    b.wait_for("[data-testid=summary]").await;
    b.wait_for("[data-testid=panel-setup]").await;
    wait_for_stages(&b, 4).await;
    assert_eq!(b.js("return document.querySelector('[data-testid=\"choice-stage_2_kind\"]').value;").await, "fitting");
    assert_eq!(b.js("return document.querySelector('[data-testid=input-stage_2_pressure_rating]').value;").await, "5.01");
    b.text_when("[data-testid=check-pressure_budget]", |t| t.contains("fitting at stage 2")).await;
    assert_eq!(b.text("[data-testid=node-2]").await, node_text(&reordered, 2));
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn a_gas_feed_in_a_setup_expands_is_checked_at_its_supply_and_for_its_hazard() {
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-setup]").await;
    b.wait_for("[data-testid=panel-setup]").await;
    wait_for_stages(&b, 7).await;
    // The demo's carbon dioxide joins at stage 3: its stage shows the gas's own entries, the gas
    // figures are in the part table, and the gas and its supply are fine.
    assert_eq!(b.js("return document.querySelector('[data-testid=\"choice-stage_3_kind\"]').value;").await, "gas_feed");
    assert!(b.exists("[data-testid=input-stage_3_supply_pressure]").await);
    assert!(!b.exists("[data-testid=input-stage_3_inner_diameter]").await, "a gas feed has no bore to enter");
    assert!(b.text("[data-testid=part-table]").await.contains("Gas flow"));
    let demo = CaseFile::from_json(Calculator::Setup.demo_json()).unwrap().evaluate().unwrap();
    let check = |key: &str| demo.checks.iter().find(|c| c.key == key).unwrap().verdict.word().to_owned();
    assert_eq!(check("gas_hazard"), "fine");
    b.js_when("return document.querySelector('[data-testid=verdict-gas_hazard]')?.textContent ?? '';", |t| t.as_str().is_some_and(|t| t.contains("fine"))).await;
    // Supplied below the pressure where it joins, the gas cannot enter: a problem at the feed,
    // in its stage's detail.
    // (A fine check sits folded in the list of fine ones: read its words whether shown or not.)
    let supply = "return document.querySelector('[data-testid=verdict-stage_3_gas_supply]')?.textContent ?? '';";
    b.click("[data-testid=panel-setup] [data-testid=part-3]").await;
    b.js_when(supply, |t| t.as_str().is_some_and(|t| t.contains("fine"))).await;
    b.type_into("stage_3_supply_pressure", "3").await;
    b.text_when("[data-testid=verdict-stage_3_gas_supply]", |t| t.to_lowercase().contains("problem")).await;
    b.type_into("stage_3_supply_pressure", "10").await;
    // Fine again, the detail opens on the worst stage (the pump's caution at stage 2); stage 3's is
    // one click away.
    b.text_when("[data-testid=panel-setup] [data-testid=element-detail] h3", |t| t.starts_with("Stage 2")).await;
    b.click("[data-testid=panel-setup] [data-testid=part-3]").await;
    b.js_when(supply, |t| t.as_str().is_some_and(|t| t.contains("fine"))).await;
    // Pure oxygen over hot acetonitrile: the hazard is a problem, its caution beside it, as on
    // the gas-liquid tabs (the same rule).
    b.choose("choice-stage_3_gas", "oxygen").await;
    b.text_when("[data-testid=verdict-gas_hazard]", |t| t.to_lowercase().contains("problem")).await;
    assert!(b.text("[data-testid=caution-gas_hazard]").await.contains("Safety"));
    let mut o2: Value = serde_json::from_str(Calculator::Setup.demo_json()).unwrap();
    o2["elements"][2]["gas"] = Value::from("oxygen");
    o2["elements"][2]["loc_source"] = Value::from("typical");
    let o2 = CaseFile::from_json(&o2.to_string()).unwrap().evaluate().unwrap();
    assert_eq!(o2.checks.iter().find(|c| c.key == "gas_hazard").unwrap().verdict.word(), "problem");
    b.screenshot("setup-oxygen").await;
    assert_clean(&b).await;
    b.close().await;
}

#[tokio::test]
async fn the_gas_liquid_map_fills_in_reads_out_a_cell_and_a_click_sets_both_flows() {
    use clearbore::physics::report::Verdict;
    let b = Browser::start().await;
    b.open_page().await;
    b.click("[data-testid=tab-segmented_flow]").await;
    b.wait_for("[data-testid=panel-segmented_flow]").await;
    // The demo with a 16 bar(g) rating over its 15 bar(g) back-pressure: a caution (under 20 %
    // margin) everywhere, a problem at high flows.
    b.type_into("pressure_rating", "16").await;
    // Folded (and not computed) until opened; then filled in a slice at a time.
    assert!(!b.exists("[data-testid=map-canvas-gas_liquid_map]").await);
    b.click("[data-testid=panel-segmented_flow] [data-testid=map-toggle]").await;
    b.wait_for("[data-testid=map-canvas-gas_liquid_map]").await;
    b.wait_for("[data-testid=map-marker-gas_liquid_map]").await;
    b.js_within("return !document.querySelector('[data-testid=map-progress-gas_liquid_map]');", |v| v == &json!(true), 300).await;
    // Drawn as the map evaluated natively: each cell 8 × 8 pixels in its verdict's tint (contour
    // lines and boundaries cross some pixels, so most of the cell's inner 6 × 6 is compared).
    let mut doc: Value = serde_json::from_str(Calculator::SegmentedFlow.demo_json()).unwrap();
    doc["inputs"]["pressure_rating"] = json!({"value": 16, "unit": "bar"});
    let c = CaseFile::from_json(&doc.to_string()).unwrap();
    let map = c.map_of(clearbore::case::MapKind::GasLiquidFlows).unwrap().unwrap();
    let n = map.x.values.len();
    let tint = |v: Option<Verdict>| match v {
        Some(Verdict::Fine) => [0xb9, 0xdf, 0xc4, 255],
        Some(Verdict::Caution) => [0xf3, 0xd9, 0x8b, 255],
        Some(Verdict::Problem) => [0xec, 0xa5, 0x9f, 255],
        None => [0xdd, 0xdd, 0xdd, 255],
    };
    let mut seen = std::collections::BTreeSet::new();
    // Fixed cells, and the middle cell of each verdict the map has.
    let mut cells = vec![(0, 0), (n - 1, n - 1), (n / 2, n / 2), (5, n - 3), (n - 2, 3)];
    for kind in [Verdict::Fine, Verdict::Caution, Verdict::Problem] {
        let of_kind: Vec<usize> = (0..n * n).filter(|&i| map.verdicts[i] == Some(kind)).collect();
        if let Some(&i) = of_kind.get(of_kind.len() / 2) {
            cells.push((i % n, i / n));
        }
    }
    for (ix, iy) in cells {
        let v = map.verdicts[map.index(ix, iy)];
        seen.insert(v);
        let block = format!(
            "const c = document.querySelector('[data-testid=map-canvas-gas_liquid_map]'); const s = c.width / {n};
             return Array.from(c.getContext('2d').getImageData({ix} * s + 1, ({} - {iy}) * s + 1, s - 2, s - 2).data);",
            n - 1
        );
        let data = b.js(&block).await;
        let bytes: Vec<u8> = data.as_array().unwrap().iter().map(|x| x.as_u64().unwrap() as u8).collect();
        let matching = bytes.chunks(4).filter(|p| *p == tint(v)).count();
        assert!(matching * 2 >= bytes.len() / 4, "cell {ix}, {iy}: {matching} of {} pixels in the {v:?} tint", bytes.len() / 4);
    }
    assert!(seen.len() >= 2, "{seen:?}");
    // Contour labels are on the map, and the legend names the lines.
    let labels = b.js("return document.querySelectorAll('[data-testid=map-gas_liquid_map] .map-contour-label').length;").await;
    assert!(labels.as_u64().unwrap() >= 4, "{labels}");
    let legend = b.text("[data-testid=map-gas_liquid_map] .map-legend").await;
    assert!(legend.contains("blue lines: liquid slug length") && legend.contains("purple lines: liquid residence time"), "{legend}");
    // The read-out names this case, then the cell under the pointer with its values.
    let own = b.text("[data-testid=map-readout-gas_liquid_map]").await;
    assert!(own.starts_with("Cell nearest this case: Gas flow (at its reference state) 28.1 mL/min, liquid flow 1.38 mL/min"), "the nearest cell to 30 and 1.5 mL/min: {own}");
    map_event(&b, "gas_liquid_map", "mousemove", 0.99, 0.01).await;
    let cell = b.text_when("[data-testid=map-readout-gas_liquid_map]", |t| t.starts_with("Gas flow")).await;
    assert!(cell.contains("problem (limited by Pressure budget)") && cell.contains("Liquid residence time"), "{cell}");
    // A click sets both flows (three significant figures) and the marker follows.
    let before = b.js("return parseFloat(document.querySelector('[data-testid=map-marker-gas_liquid_map]').style.bottom);").await.as_f64().unwrap();
    map_event(&b, "gas_liquid_map", "click", 0.2, 0.1).await;
    let value = |key: &str| format!("return document.querySelector('[data-testid=input-{key}]').value;");
    let liquid = b.js_when(&value("liquid_flow"), |v| v != "1.5").await;
    let liquid: f64 = liquid.as_str().unwrap().parse().unwrap();
    let gas: f64 = b.js(&value("gas_flow")).await.as_str().unwrap().parse().unwrap();
    assert!(liquid > 5.0 && liquid <= 20.0, "liquid flow now {liquid} mL/min");
    assert!(gas > 0.3 && gas < 2.0, "gas flow now {gas} mL/min");
    let script = "return parseFloat(document.querySelector('[data-testid=map-marker-gas_liquid_map]').style.bottom);";
    b.js_when(script, |v| v.as_f64().is_some_and(|y| y > before + 20.0)).await;
    // The map is filled in again for the new case.
    b.js_within("return !document.querySelector('[data-testid=map-progress-gas_liquid_map]');", |v| v == &json!(true), 300).await;
    b.screenshot("gas-liquid-map").await;
    assert_clean(&b).await;
    b.close().await;
}
