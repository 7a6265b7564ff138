//! Speed benchmark, measured (not asserted as a test): the native time of every calculator's demo
//! case, and the sweep of `clearbore::sweep` natively, in wasm (the figure the page benchmark
//! wrote) and in Python `fluids` 1.3.1, with the ratios and the agreement of the values.
//! `./task.sh bench` runs it (`cargo test --profile bench`: release at opt-level 3) after the page
//! benchmark; figures go in the README.
//! It exits 1 only if the values disagree with `fluids` or with the wasm run.
#![allow(clippy::unwrap_used, clippy::expect_used, clippy::panic)]

use std::path::PathBuf;
use std::process::Command;
use std::time::Instant;

use clearbore::case::{Calculator, CaseFile};
use clearbore::sweep::{self, Sweep};
use serde_json::Value;

/// fluids solves v_t by secant to xtol = 1e-12 m/s absolute (1e-8 relative at the slowest solved
/// point, as in tests/settling.rs).
const SOLVED: f64 = 1e-8;
/// Both sides evaluate the same closed form for Ergun; only rounding differs.
const SAME_FORMULA: f64 = 1e-12;
/// fluids returns Stokes' law below this Stokes Reynolds number instead of solving its drag law.
const FLUIDS_STOKES_BELOW: f64 = 0.01;

fn best_ms(runs: usize, mut f: impl FnMut()) -> f64 {
    (0..runs)
        .map(|_| {
            let t0 = Instant::now();
            f();
            t0.elapsed().as_secs_f64() * 1e3
        })
        .fold(f64::INFINITY, f64::min)
}

fn rel(a: f64, b: f64) -> f64 {
    (a / b - 1.0).abs()
}

fn main() {
    let mut ok = true;
    let profile = if cfg!(debug_assertions) { "DEBUG build: not representative, use --profile bench" } else { "optimised build" };
    println!("Clearbore speed benchmark (native, {profile}; this machine)");
    println!("  evaluate, demo case of each tab (200 runs):");
    for c in Calculator::ALL {
        let case = CaseFile::from_json(c.demo_json()).unwrap();
        case.evaluate().unwrap();
        let mut times: Vec<f64> = (0..200).map(|_| best_ms(1, || drop(std::hint::black_box(case.evaluate().unwrap())))).collect();
        times.sort_by(f64::total_cmp);
        println!("    {:<22} {:>7.3} ms median, {:>7.3} ms p95", c.title(), times[100], times[190]);
    }
    println!("  operating map, demo case (best of 20):");
    for c in Calculator::ALL {
        for &kind in c.maps() {
            let case = CaseFile::from_json(c.demo_json()).unwrap();
            let cells = case.map_of(kind).unwrap().unwrap().verdicts.len();
            let ms = best_ms(20, || drop(std::hint::black_box(case.map_of(kind))));
            println!("    {:<22} {:<16} {ms:>7.3} ms for {cells} cells", c.title(), kind.key());
        }
    }

    let (rho, mu) = sweep::water().unwrap();
    let cells = sweep::SIZES * sweep::DENSITIES;
    let t0 = Instant::now();
    let native: Sweep = sweep::run(rho, mu).unwrap();
    let first_ms = t0.elapsed().as_secs_f64() * 1e3;
    let native_ms = best_ms(20, || drop(std::hint::black_box(sweep::run(rho, mu).unwrap())));
    println!("  sweep {} × {} = {cells} cells, water at 25 °C (ρ = {:.2} kg/m³, μ = {:.4e} Pa s):", sweep::SIZES, sweep::DENSITIES, rho.si(), mu.si());
    println!("    native   {native_ms:>9.2} ms best of 20   (first run, building the Re_t(Ar) table: {first_ms:.2} ms)");

    // wasm: written by the page benchmark (tests/page_budget.rs) when CLEARBORE_WASM_SWEEP_OUT is set.
    let wasm_file = std::env::var_os("CLEARBORE_WASM_SWEEP_OUT").map(PathBuf::from);
    let wasm: Option<Value> = wasm_file.as_ref().and_then(|p| std::fs::read_to_string(p).ok()).and_then(|t| serde_json::from_str(&t).ok());
    let wasm_ms = wasm.as_ref().and_then(|w| w["ms"].as_f64());
    match (&wasm, wasm_ms) {
        (Some(w), Some(ms)) => {
            let agree = rel(w["checksum"].as_f64().unwrap(), native.checksum());
            println!("    wasm     {ms:>9.2} ms best of {} in headless Chromium   checksum within {agree:.1e} of native", w["runs"]);
            ok &= agree < 1e-12;
        }
        _ => println!("    wasm     not measured (run the page benchmark first: ./task.sh bench)"),
    }

    // fluids, in its own virtual environment (./task.sh bench installs it).
    let python = std::env::var_os("CLEARBORE_FLUIDS_PYTHON").map(PathBuf::from).unwrap_or_else(|| PathBuf::from("target/bench-venv/bin/python"));
    let out = std::env::temp_dir().join(format!("clearbore-sweep-fluids-{}.json", std::process::id()));
    let status = Command::new(&python)
        .arg(concat!(env!("CARGO_MANIFEST_DIR"), "/tests/reference/sweep_fluids.py"))
        .arg(format!("{:e}", rho.si()))
        .arg(format!("{:e}", mu.si()))
        .arg(&out)
        .status();
    let fluids_ms = match status {
        Ok(s) if s.success() => {
            let f: Value = serde_json::from_str(&std::fs::read_to_string(&out).unwrap()).unwrap();
            let _ = std::fs::remove_file(&out);
            let ms = f["seconds"].as_f64().unwrap() * 1e3;
            println!("    fluids   {ms:>9.2} ms best of {}   (fluids {}, Python {})", f["repeats"], f["fluids_version"].as_str().unwrap(), f["python_version"].as_str().unwrap());
            let (mut solved, mut stokes, mut ergun, mut n_solved) = (0.0f64, 0.0f64, 0.0f64, 0);
            for (k, (v, dpdz)) in native.terminal_velocity.iter().zip(&native.ergun_gradient).enumerate() {
                let (i, j) = (k / sweep::DENSITIES, k % sweep::DENSITIES);
                let d = sweep::diameter(i);
                let v_stokes = 9.80665 * d * d * (sweep::particle_density(j) - rho.si()) / (18.0 * mu.si());
                let e = rel(*v, f["terminal_velocity"][k].as_f64().unwrap());
                if rho.si() * v_stokes * d / mu.si() < FLUIDS_STOKES_BELOW {
                    stokes = stokes.max(e);
                } else {
                    solved = solved.max(e);
                    n_solved += 1;
                }
                ergun = ergun.max(rel(*dpdz, f["ergun_gradient"][k].as_f64().unwrap()));
            }
            println!("    agreement with fluids: terminal velocity within {solved:.1e} where fluids solves its drag law ({n_solved} cells, bound {SOLVED:.0e});");
            println!("      {stokes:.1e} where fluids returns Stokes' law instead (Re_Stokes < {FLUIDS_STOKES_BELOW}: the drag laws differ there by design); Ergun within {ergun:.1e} (bound {SAME_FORMULA:.0e})");
            ok &= solved < SOLVED && ergun < SAME_FORMULA;
            Some(ms)
        }
        other => {
            println!("    fluids   not measured ({} could not run the script: {other:?})", python.display());
            None
        }
    };
    println!("  ratios:");
    if let Some(f) = fluids_ms {
        println!("    native is {:>7.1}× faster than fluids (aim ≥ 200×)", f / native_ms);
    }
    if let Some(w) = wasm_ms {
        println!("    wasm takes {:>6.2}× the native time (aim ≤ 1.5×)", w / native_ms);
    }
    std::process::exit(if ok { 0 } else { 1 });
}
