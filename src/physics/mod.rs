//! Pure-Rust physics: SI inside, no web dependency. Compiles natively (tests, command line) and
//! to wasm32 (the page). One folder per phenomenon, one file per correlation.

pub mod ambient;
pub mod diagram;
pub mod fluids;
pub mod form;
pub mod gas_liquid_bed;
pub mod gases;
pub mod hazards;
pub mod map;
pub mod input;
pub mod numeric;
pub mod ode;
pub mod packed_bed;
pub mod pipe_flow;
pub mod plot;
pub mod practical;
pub mod report;
pub mod segmented_flow;
pub mod setup;
pub mod settling;
pub mod slurry;
pub mod solids;
pub mod tubing;
pub mod tubular;
pub mod units;
