//! Clearbore: pre-run checks for continuous-flow chemistry with solids and gases.
//! `physics` is pure Rust (SI inside, no web dependency); `case` is the saved-case format, the
//! share link and the stored workspace, shared by the page and the command line; `export` turns
//! reports into CSV and pasteable tables; `sweep` is the speed benchmark's grid; `ui` is the Leptos page (wasm32 only).
#![forbid(unsafe_code)]

pub mod case;
pub mod cli;
pub mod export;
pub mod physics;
pub mod plot;
pub mod sweep;

#[cfg(target_arch = "wasm32")]
pub mod ui;
