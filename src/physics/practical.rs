//! What lab equipment can do, for the remedies the calculators suggest: a remedy outside these
//! limits is not offered as one; the page says no practical value exists and names what works.
//! Each limit is this tool's reading of ordinary lab practice (common practice, no source) unless
//! its line says otherwise.

use super::form::{Collector, FieldSource};
use super::input::{FieldSpec, field, lab};
use super::report::{Check, Verdict};
use super::units::{Dimension, VolumetricFlow, format_significant};


/// The pump's largest flow: the ceiling of every flow a remedy may ask for.
pub const PUMP_MAX_FLOW: FieldSpec = field(
    "pump_max_flow",
    "Pump's largest flow",
    Dimension::VolumetricFlow,
    lab::LIQUID_FLOW,
    "The most your pump delivers; suggested flows stay below it. 10 mL/min is typical of an HPLC-type lab pump (common practice, no source); enter your pump's.",
);

/// Finest d90 a mill makes of a crystalline base or salt: about 5 µm (jet mills; finer powders
/// re-agglomerate in the slurry; common practice, no source).
pub const FINEST_MILLED_D90: f64 = 5e-6;

/// Finest particles worth packing into a lab cartridge: 10 µm (finer ones pass or blind the
/// usual 2–10 µm frits and need HPLC-grade packing hardware; common practice, no source).
pub const FINEST_PACKING: f64 = 10e-6;

/// Smallest common tubing bore: 0.25 mm (0.010″; common practice, no source).
pub const SMALLEST_BORE: f64 = 0.25e-3;

/// Lab cartridge inner diameters: 2 to 50 mm (HPLC-format columns up to pilot columns; common
/// practice, no source).
pub const CARTRIDGE_DIAMETER: (f64, f64) = (2e-3, 50e-3);

/// Lab cartridge bed lengths: 10 to 300 mm (common practice, no source).
pub const CARTRIDGE_LENGTH: (f64, f64) = (10e-3, 0.3);

/// Pipe Reynolds number up to which flow in a tube stays laminar, the range of every laminar
/// deposition and resuspension result used here (2000: the usual engineering value for the
/// laminar–transitional boundary in round pipes; common practice, no source).
pub const LAMINAR_REYNOLDS: f64 = 2000.0;

/// Reads the pump's largest flow (a case file written before the entry existed is given the
/// stated default of 10 mL/min when it is opened: `Calculator::added_entries`).
pub fn read_pump_max_flow(src: &dyn FieldSource, c: &mut Collector) -> Option<f64> {
    c.take(src.quantity(&PUMP_MAX_FLOW))
}

/// Whether the pump can deliver the entered flow: key `pump_flow`, a problem above its largest flow.
pub fn pump_flow_check(flow: VolumetricFlow, pump_max: VolumetricFlow) -> Check {
    let ml = |q: VolumetricFlow| format_significant(q.ml_per_min(), 3);
    let over = flow.si() > pump_max.si() * (1.0 + 1e-12);
    Check {
        key: "pump_flow",
        topic: "Pump flow",
        verdict: if over { Verdict::Problem } else { Verdict::Fine },
        reason: if over {
            format!("The flow of {} mL/min is more than the pump's largest flow, {} mL/min: this pump cannot run it.", ml(flow), ml(pump_max))
        } else {
            format!("The flow of {} mL/min is within the pump's largest flow, {} mL/min.", ml(flow), ml(pump_max))
        },
        caution: None,
    }
}
