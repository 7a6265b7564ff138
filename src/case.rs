//! The case document: a calculator's inputs as the user entered them (number and unit per field),
//! with a title, notes and optional times; saved by the page, kept in its workspace, shared as a
//! link and read by the command line. JSON, versioned by `clearbore_case`.
//!
//! Format 2 (this build) adds `notes`, `created` and `modified` to format 1, which still opens
//! (upgraded on read); a newer format is refused by its number. The document is an object whose
//! calculation part is `calculator` + `inputs` (+ `elements` for a line): a setup of several
//! stages can later add a `stages` list of such parts under a new format number without moving
//! anything that exists.

use std::collections::BTreeMap;

use serde::{Deserialize, Serialize};

use crate::physics::form::{ChoiceSpec, FieldSource};
use crate::physics::input::{FieldSpec, InputError};
use crate::physics::packed_bed::{self as bed, PackedBedInput};
use crate::physics::fluids;
use crate::physics::gas_liquid_bed::{self as gas_bed, GasLiquidBedInput};
use crate::physics::report::{NumericalError, Report};
use crate::physics::segmented_flow::{self as gas, SegmentedFlowInput};
use crate::physics::setup::{self, SetupInput};
use crate::physics::slurry::{self, SlurryInput};
use crate::physics::tubular::{self, TubularInput};

mod format;
pub mod link;
pub mod ranges;
pub mod workspace;

pub use format::{FormatProblem, is_iso_8601};

/// The case-file format version this build writes (and the newest it reads).
pub const FORMAT_VERSION: u32 = 2;

/// The oldest case-file format version this build reads (upgraded to [`FORMAT_VERSION`]).
pub const OLDEST_FORMAT_VERSION: u32 = 1;

/// The demo tubular-reactor case (an invented scenario), as shipped in `public/cases/`.
pub const TUBULAR_DEMO_JSON: &str = include_str!("../public/cases/tubular-demo.json");

/// The demo packed-cartridge case (an invented scenario), as shipped in `public/cases/`.
pub const PACKED_BED_DEMO_JSON: &str = include_str!("../public/cases/packed-bed-demo.json");

/// The demo slurry-line case (an invented scenario), as shipped in `public/cases/`.
pub const SLURRY_DEMO_JSON: &str = include_str!("../public/cases/slurry-demo.json");

/// The demo segmented-flow case (an invented scenario), as shipped in `public/cases/`.
pub const SEGMENTED_FLOW_DEMO_JSON: &str = include_str!("../public/cases/segmented-flow-demo.json");

/// The demo gas–liquid cartridge case (an invented scenario), as shipped in `public/cases/`.
pub const GAS_LIQUID_BED_DEMO_JSON: &str = include_str!("../public/cases/gas-liquid-bed-demo.json");

/// The demo whole-setup case (an invented scenario), as shipped in `public/cases/`.
pub const SETUP_DEMO_JSON: &str = include_str!("../public/cases/setup-demo.json");

/// An operating map a calculator offers ([`Calculator::maps`]).
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash)]
pub enum MapKind {
    /// Packed cartridge: flow × particle size.
    CartridgeSize,
    /// Slurry line: flow × tubing bore.
    SlurryBore,
    /// Slurry line: flow × particle size (d90, the distribution scaled with it).
    SlurrySize,
    /// Gas–liquid coil: gas flow × liquid flow.
    GasLiquidFlows,
}

impl MapKind {
    /// Stable key: the map's [`crate::physics::map::Map::key`], used in the page's `data-testid`s.
    pub const fn key(self) -> &'static str {
        match self {
            MapKind::CartridgeSize => "cartridge_map",
            MapKind::SlurryBore => "slurry_map",
            MapKind::SlurrySize => "slurry_size_map",
            MapKind::GasLiquidFlows => "gas_liquid_map",
        }
    }
}

/// Which calculator a case is for.
#[derive(Debug, Clone, Copy, PartialEq, Eq, Hash, Serialize, Deserialize)]
#[serde(rename_all = "snake_case")]
pub enum Calculator {
    /// Plain tubular reactor (volume, residence time, productivity, loop).
    TubularReactor,
    /// Packed cartridge (pressure drop, residence time, capacity, lifting, sizing).
    PackedBed,
    /// Slurry line (settling, deposition, clogging and pressure at every element).
    SlurryLine,
    /// Gas–liquid segmented flow (gas bookkeeping, slugs, mass transfer, pressure along the coil).
    SegmentedFlow,
    /// Gas and liquid together through a packed catalyst cartridge (pressure drop, holdup, transfer).
    GasLiquidBed,
    /// A whole setup as one line of stages: feeds with their pumps, junctions, tubing, coils,
    /// fittings, cartridges and the regulator, with one pressure budget.
    Setup,
}

/// One entry of a calculator's form, in page order.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum FormItem {
    /// A quantity with a unit.
    Field(FieldSpec),
    /// A choice between named options.
    Choice(ChoiceSpec),
    /// A heading over the entries that follow it (shown when any of them is).
    Heading(&'static str),
}

use FormItem::{Choice, Field, Heading};



const TUBULAR_LAYOUT: &[FormItem] = &[
    Heading("Reactor and feed"),
    Choice(tubular::OPERATION),
    Field(tubular::INNER_DIAMETER),
    Field(tubular::LENGTH),
    Field(tubular::FLOW),
    Field(tubular::CONCENTRATION),
    Field(tubular::YIELD),
    Field(tubular::MOLAR_MASS),
    Field(tubular::RESERVOIR),
    Field(tubular::PASSES),
    Heading("Liquid"),
    Choice(fluids::selection::LIQUID),
    Choice(fluids::selection::MIXTURE_FIRST),
    Choice(fluids::selection::MIXTURE_SECOND),
    Field(fluids::FIRST_VOLUME_FRACTION),
    Field(fluids::selection::TEMPERATURE),
    Field(tubular::DENSITY),
    Field(tubular::VISCOSITY),
    Heading("Pressure and tubing"),
    Field(tubular::BACK_PRESSURE),
    Field(crate::physics::ambient::AMBIENT_PRESSURE),
    Field(tubular::RATING),
    Choice(crate::physics::tubing::MATERIAL),
    Choice(crate::physics::tubing::SIZE),
];

const PACKED_BED_LAYOUT: &[FormItem] = &[
    Heading("Cartridge and bed"),
    Field(bed::TUBE_DIAMETER),
    Choice(bed::BED_LENGTH_SOURCE),
    Field(bed::BED_LENGTH),
    Choice(bed::SIZE_MODE),
    Field(bed::PARTICLE_DIAMETER),
    Field(bed::D10),
    Field(bed::D50),
    Field(bed::D90),
    Choice(bed::PARTICLE_SHAPE),
    Field(bed::SPHERICITY),
    Choice(crate::physics::solids::SOLID),
    Field(bed::PARTICLE_DENSITY),
    Field(crate::physics::solids::PARTICLE_POROSITY),
    Choice(bed::VOIDAGE_SOURCE),
    Field(bed::VOIDAGE),
    Heading("Flow and liquid"),
    Field(bed::FLOW),
    Field(crate::physics::practical::PUMP_MAX_FLOW),
    Choice(bed::FLOW_DIRECTION),
    Choice(bed::CONFINEMENT),
    Choice(fluids::selection::LIQUID),
    Choice(fluids::selection::MIXTURE_FIRST),
    Choice(fluids::selection::MIXTURE_SECOND),
    Field(fluids::FIRST_VOLUME_FRACTION),
    Field(fluids::selection::TEMPERATURE),
    Field(bed::DENSITY),
    Field(bed::VISCOSITY),
    Heading("Pressure limits and tubing"),
    Field(bed::BACK_PRESSURE),
    Field(crate::physics::ambient::AMBIENT_PRESSURE),
    Field(bed::PUMP_LIMIT),
    Field(bed::RATING),
    Field(bed::FITTING_RATING),
    Choice(crate::physics::tubing::MATERIAL),
    Choice(crate::physics::tubing::SIZE),
    Heading("Capacity and sizing"),
    Field(bed::SOLID_MASS),
    Choice(bed::BED_ROLE),
    Field(bed::LOADING),
    Field(bed::CONCENTRATION),
    Field(bed::STOICHIOMETRY),
    Choice(bed::SIZING),
    Field(bed::TARGET_RESIDENCE_TIME),
    Field(bed::MAX_PRESSURE_DROP),
];

const SLURRY_LAYOUT: &[FormItem] = &[
    Heading("Operation and liquid"),
    Choice(slurry::OPERATION),
    Field(slurry::PASSES),
    Field(slurry::FLOW),
    Field(crate::physics::practical::PUMP_MAX_FLOW),
    Choice(fluids::selection::LIQUID),
    Choice(fluids::selection::MIXTURE_FIRST),
    Choice(fluids::selection::MIXTURE_SECOND),
    Field(fluids::FIRST_VOLUME_FRACTION),
    Field(fluids::selection::TEMPERATURE),
    Field(slurry::DENSITY),
    Field(slurry::VISCOSITY),
    Heading("Solids"),
    Choice(crate::physics::solids::SOLID),
    Field(slurry::PARTICLE_DENSITY),
    Field(crate::physics::solids::PARTICLE_POROSITY),
    Choice(slurry::SIZE_MODE),
    Field(slurry::PARTICLE_SIZE),
    Field(slurry::D10),
    Field(slurry::D50),
    Field(slurry::D90),
    Field(slurry::SPHERICITY),
    Choice(slurry::LOADING_BASIS),
    Field(slurry::LOADING),
    Heading("Pressure and tubing"),
    Field(slurry::BACK_PRESSURE),
    Field(crate::physics::ambient::AMBIENT_PRESSURE),
    Field(slurry::RATING),
    Choice(crate::physics::tubing::MATERIAL),
    Choice(crate::physics::tubing::SIZE),
];

const SLURRY_ELEMENT_LAYOUT: &[FormItem] = &[
    Choice(slurry::ELEMENT_KIND),
    Choice(slurry::ELEMENT_ORIENTATION),
    Field(slurry::ELEMENT_INNER_DIAMETER),
    Field(slurry::ELEMENT_LENGTH),
];

const SEGMENTED_FLOW_LAYOUT: &[FormItem] = &[
    Heading("Gas"),
    Choice(gas::GAS),
    Field(gas::GAS_MOLE_FRACTION),
    Field(gas::GAS_FLOW),
    Choice(gas::REFERENCE_STATE),
    Field(gas::REFERENCE_TEMPERATURE),
    Field(gas::REFERENCE_PRESSURE),
    Heading("Liquid"),
    Choice(gas::SOLVENT),
    Field(fluids::CUSTOM_DENSITY),
    Field(fluids::CUSTOM_VISCOSITY),
    Field(fluids::CUSTOM_SURFACE_TENSION),
    Choice(gas::SOLUBILITY_SOURCE),
    Field(gas::SOLUBILITY),
    Field(gas::DIFFUSIVITY),
    Field(gas::LIQUID_FLOW),
    Field(gas::CONCENTRATION),
    Heading("Junction and coil"),
    Field(gas::INNER_DIAMETER),
    Choice(gas::JUNCTION),
    Field(gas::JUNCTION_WIDTH),
    Field(gas::LENGTH),
    Field(gas::TEMPERATURE),
    Heading("Pressure, consumption and hazards"),
    Field(gas::BACK_PRESSURE),
    Field(crate::physics::ambient::AMBIENT_PRESSURE),
    Field(gas::RATING),
    Choice(crate::physics::tubing::MATERIAL),
    Choice(crate::physics::tubing::SIZE),
    Choice(gas::CONSUMPTION),
    Field(gas::CONSUMED_FRACTION),
    Choice(gas::LOC_SOURCE),
    Field(gas::LIMITING_OXYGEN_FIELD),
];

const GAS_LIQUID_BED_LAYOUT: &[FormItem] = &[
    Heading("Cartridge and catalyst bed"),
    Field(bed::TUBE_DIAMETER),
    Field(bed::BED_LENGTH),
    Choice(bed::SIZE_MODE),
    Field(bed::PARTICLE_DIAMETER),
    Field(bed::D10),
    Field(bed::D50),
    Field(bed::D90),
    Choice(bed::PARTICLE_SHAPE),
    Field(bed::SPHERICITY),
    Choice(crate::physics::solids::SOLID),
    Field(bed::PARTICLE_DENSITY),
    Field(crate::physics::solids::PARTICLE_POROSITY),
    Choice(bed::VOIDAGE_SOURCE),
    Field(bed::VOIDAGE),
    Heading("Liquid and substrate"),
    Choice(fluids::selection::LIQUID),
    Choice(fluids::selection::MIXTURE_FIRST),
    Choice(fluids::selection::MIXTURE_SECOND),
    Field(fluids::FIRST_VOLUME_FRACTION),
    Field(fluids::selection::TEMPERATURE),
    Field(bed::DENSITY),
    Field(bed::VISCOSITY),
    Field(fluids::CUSTOM_SURFACE_TENSION),
    Field(gas_bed::LIQUID_FLOW),
    Field(gas_bed::CONCENTRATION),
    Heading("Gas"),
    Choice(gas::GAS),
    Field(gas::GAS_MOLE_FRACTION),
    Field(gas::GAS_FLOW),
    Choice(gas::REFERENCE_STATE),
    Field(gas::REFERENCE_TEMPERATURE),
    Field(gas::REFERENCE_PRESSURE),
    Field(gas_bed::GAS_STOICHIOMETRY),
    Choice(gas::LOC_SOURCE),
    Field(gas::LIMITING_OXYGEN_FIELD),
    Choice(gas::SOLUBILITY_SOURCE),
    Field(gas::SOLUBILITY),
    Field(gas::DIFFUSIVITY),
    Heading("Flow direction"),
    Choice(gas_bed::FLOW_DIRECTION),
    Choice(bed::CONFINEMENT),
    Heading("Pressure limits and tubing"),
    Field(bed::BACK_PRESSURE),
    Field(crate::physics::ambient::AMBIENT_PRESSURE),
    Field(bed::PUMP_LIMIT),
    Field(bed::RATING),
    Field(bed::FITTING_RATING),
    Choice(crate::physics::tubing::MATERIAL),
    Choice(crate::physics::tubing::SIZE),
    Heading("What the chemistry needs"),
    Choice(gas_bed::DEMAND),
    Field(gas_bed::TARGET_CONVERSION),
    Field(gas_bed::REQUIRED_RATE),
];

const SETUP_LAYOUT: &[FormItem] = &[
    Heading("Liquid"),
    Choice(fluids::selection::LIQUID),
    Choice(fluids::selection::MIXTURE_FIRST),
    Choice(fluids::selection::MIXTURE_SECOND),
    Field(fluids::FIRST_VOLUME_FRACTION),
    Field(fluids::selection::TEMPERATURE),
    Field(tubular::DENSITY),
    Field(tubular::VISCOSITY),
    Field(fluids::CUSTOM_SURFACE_TENSION),
    Heading("Solids"),
    Field(setup::D90),
    Heading("Product"),
    Field(tubular::CONCENTRATION),
    Field(tubular::YIELD),
    Field(tubular::MOLAR_MASS),
    Heading("Tubing and atmosphere"),
    Field(crate::physics::ambient::AMBIENT_PRESSURE),
    Choice(crate::physics::tubing::MATERIAL),
    Choice(crate::physics::tubing::SIZE),
];

const SETUP_STAGE_LAYOUT: &[FormItem] = &[
    Choice(setup::KIND),
    Choice(setup::PUMP),
    Field(setup::FLOW),
    Field(setup::PUMP_MAX_FLOW),
    Field(setup::PUMP_LIMIT),
    Field(setup::DRIVE_FORCE),
    Field(setup::BARREL_BORE),
    Field(setup::BARREL_RATING),
    Field(setup::SOLIDS),
    Choice(crate::physics::segmented_flow::GAS),
    Field(crate::physics::segmented_flow::GAS_MOLE_FRACTION),
    Field(crate::physics::segmented_flow::GAS_FLOW),
    Choice(crate::physics::segmented_flow::REFERENCE_STATE),
    Field(crate::physics::segmented_flow::REFERENCE_TEMPERATURE),
    Field(crate::physics::segmented_flow::REFERENCE_PRESSURE),
    Field(setup::SUPPLY_PRESSURE),
    Choice(crate::physics::hazards::oxygen::LOC_SOURCE),
    Field(crate::physics::hazards::oxygen::LIMITING_OXYGEN_FIELD),
    Field(setup::INNER_DIAMETER),
    Field(setup::LENGTH),
    Field(setup::PARTICLE_DIAMETER),
    Field(setup::VOIDAGE),
    Field(setup::RATING),
    Field(setup::SET_POINT),
];

impl Calculator {
    /// Every calculator, in page order.
    pub const ALL: [Calculator; 6] = [
        Calculator::TubularReactor,
        Calculator::PackedBed,
        Calculator::SlurryLine,
        Calculator::SegmentedFlow,
        Calculator::GasLiquidBed,
        Calculator::Setup,
    ];

    /// Stable key, as in case files.
    pub const fn key(self) -> &'static str {
        match self {
            Calculator::TubularReactor => "tubular_reactor",
            Calculator::PackedBed => "packed_bed",
            Calculator::SlurryLine => "slurry_line",
            Calculator::SegmentedFlow => "segmented_flow",
            Calculator::GasLiquidBed => "gas_liquid_bed",
            Calculator::Setup => "setup",
        }
    }

    /// Name for people.
    pub const fn title(self) -> &'static str {
        match self {
            Calculator::TubularReactor => "Tubular reactor",
            Calculator::PackedBed => "Packed cartridge",
            Calculator::SlurryLine => "Slurry line",
            Calculator::SegmentedFlow => "Gas–liquid flow",
            Calculator::GasLiquidBed => "Gas–liquid cartridge",
            Calculator::Setup => "Whole setup",
        }
    }

    /// The figures a chemist reads first, shown in the answer summary (keys of the report).
    pub const fn headline(self) -> &'static [&'static str] {
        match self {
            Calculator::TubularReactor => &["residence_time", "inlet_pressure", "productivity"],
            Calculator::PackedBed => &["residence_time", "bed_pressure_drop", "inlet_pressure"],
            Calculator::SlurryLine => &["inlet_pressure", "narrowest_passage", "total_pressure_drop"],
            Calculator::SegmentedFlow => &["gas_equivalents", "residence_time", "saturation_time", "inlet_pressure"],
            Calculator::GasLiquidBed => &["bed_pressure_drop", "liquid_residence_time", "capacity", "required_rate"],
            Calculator::Setup => &["inlet_pressure", "residence_time", "total_pressure_drop", "narrowest_passage"],
        }
    }

    /// One sentence on what it answers.
    pub const fn summary(self) -> &'static str {
        match self {
            Calculator::TubularReactor => {
                "Volume, residence time, productivity and space-time yield of a plain tube, single pass or as a \
                 recirculation loop, with the line pressure checked against your weakest component."
            }
            Calculator::PackedBed => {
                "Back-pressure of a packed bed from several published correlations, residence time between the \
                 particles, how long the bed lasts, whether up-flow lifts it, and the bed that meets a target."
            }
            Calculator::SlurryLine => {
                "Whether solids stay suspended, settle or plug at every element of the line, from the pump to the \
                 back-pressure regulator, the pressure it takes, and what would make a failing element work."
            }
            Calculator::SegmentedFlow => {
                "How much gas reaches the liquid, the slug pattern it forms, how fast it dissolves against the \
                 residence time, and the pressure and bubble length along the coil up to the back-pressure regulator."
            }
            Calculator::GasLiquidBed => {
                "Gas and liquid pumped together through a catalyst cartridge: the pressure it takes, how much liquid the \
                 bed holds and for how long, whether the gas reaches the catalyst as fast as the chemistry needs it, \
                 and what would help."
            }
            Calculator::Setup => {
                "The whole line at once: feeds and their pumps, junctions, tubing, coils, fittings, cartridges and the \
                 back-pressure regulator, with the pressure at every joint against each part's rating, what each pump \
                 must deliver, the narrowest passage the solids meet and the total residence time."
            }
        }
    }

    /// The form in page order.
    pub const fn layout(self) -> &'static [FormItem] {
        match self {
            Calculator::TubularReactor => TUBULAR_LAYOUT,
            Calculator::PackedBed => PACKED_BED_LAYOUT,
            Calculator::SlurryLine => SLURRY_LAYOUT,
            Calculator::SegmentedFlow => SEGMENTED_FLOW_LAYOUT,
            Calculator::GasLiquidBed => GAS_LIQUID_BED_LAYOUT,
            Calculator::Setup => SETUP_LAYOUT,
        }
    }

    /// The form of one element of a line, for calculators that take a list of elements.
    pub const fn element_layout(self) -> Option<&'static [FormItem]> {
        match self {
            Calculator::SlurryLine => Some(SLURRY_ELEMENT_LAYOUT),
            Calculator::Setup => Some(SETUP_STAGE_LAYOUT),
            Calculator::TubularReactor | Calculator::PackedBed | Calculator::SegmentedFlow | Calculator::GasLiquidBed => None,
        }
    }

    /// The shipped demo case (an invented scenario).
    pub const fn demo_json(self) -> &'static str {
        match self {
            Calculator::TubularReactor => TUBULAR_DEMO_JSON,
            Calculator::PackedBed => PACKED_BED_DEMO_JSON,
            Calculator::SlurryLine => SLURRY_DEMO_JSON,
            Calculator::SegmentedFlow => SEGMENTED_FLOW_DEMO_JSON,
            Calculator::GasLiquidBed => GAS_LIQUID_BED_DEMO_JSON,
            Calculator::Setup => SETUP_DEMO_JSON,
        }
    }

    /// File name of the demo case under `public/cases/`.
    pub const fn demo_file(self) -> &'static str {
        match self {
            Calculator::TubularReactor => "tubular-demo.json",
            Calculator::PackedBed => "packed-bed-demo.json",
            Calculator::SlurryLine => "slurry-demo.json",
            Calculator::SegmentedFlow => "segmented-flow-demo.json",
            Calculator::GasLiquidBed => "gas-liquid-bed-demo.json",
            Calculator::Setup => "setup-demo.json",
        }
    }

    /// Entries added to this calculator after case files of format version 1 were first written,
    /// with the value a file that lacks them is read with, so that older files open unchanged on
    /// the page and the command line alike.
    pub const fn added_entries(self) -> &'static [(&'static str, Added)] {
        const PUMP: (&str, Added) = ("pump_max_flow", Added::Quantity(10.0, "mL/min"));
        match self {
            Calculator::SegmentedFlow => &[("tubing_material", Added::Choice("none"))],
            Calculator::PackedBed | Calculator::SlurryLine => &[PUMP],
            Calculator::TubularReactor | Calculator::GasLiquidBed | Calculator::Setup => &[],
        }
    }

    /// The first word of the keys of a line's per-element inputs, figures and checks
    /// (`element_3_length`, `stage_3_length`).
    pub const fn element_prefix(self) -> &'static str {
        match self {
            Calculator::Setup => "stage",
            _ => "element",
        }
    }

    /// Whether a new line element goes before the last one (a setup ends with its regulator),
    /// rather than after it.
    pub const fn keeps_last_element(self) -> bool {
        matches!(self, Calculator::Setup)
    }

    /// The case format version that introduced this calculator (older files cannot name it).
    pub const fn since_format(self) -> u32 {
        match self {
            Calculator::Setup => 2,
            _ => 1,
        }
    }

    /// Whether `key` names one of this calculator's fields or choices.
    pub fn knows(self, key: &str) -> bool {
        layout_has(self.layout(), key)
    }

    /// Whether [`Calculator::map`] gives a map for this calculator (its first of [`Calculator::maps`]).
    pub const fn has_map(self) -> bool {
        matches!(self, Calculator::PackedBed | Calculator::SlurryLine | Calculator::SegmentedFlow)
    }

    /// The operating maps of this calculator, in the order the page shows them (empty for none):
    /// pass one to [`Calculator::map_of`].
    pub const fn maps(self) -> &'static [MapKind] {
        match self {
            Calculator::PackedBed => &[MapKind::CartridgeSize],
            Calculator::SlurryLine => &[MapKind::SlurryBore, MapKind::SlurrySize],
            Calculator::SegmentedFlow => &[MapKind::GasLiquidFlows],
            Calculator::TubularReactor | Calculator::GasLiquidBed | Calculator::Setup => &[],
        }
    }

    /// The operating map `kind` of the case (`None` when `kind` is not one of
    /// [`Calculator::maps`] or the case gives no such map; the inputs' errors when they are
    /// invalid). `elements` as for [`Calculator::evaluate`].
    pub fn map_of(self, kind: MapKind, src: &dyn FieldSource, elements: &[&dyn FieldSource]) -> Option<Result<crate::physics::map::Map, CaseError>> {
        match (self, kind) {
            (_, MapKind::CartridgeSize | MapKind::SlurryBore | MapKind::GasLiquidFlows) if self.maps().first() == Some(&kind) => self.map(src, elements),
            (Calculator::SlurryLine, MapKind::SlurrySize) => match SlurryInput::from_source(src, elements) {
                Ok(input) => slurry::map::size_map(&input, slurry::map::CELLS).map(Ok),
                Err(e) => Some(Err(CaseError::Inputs(e))),
            },
            _ => None,
        }
    }

    /// The operating map of the case, for a calculator that has one: its verdict over a grid of
    /// two entries (`None` for the others; the inputs' errors when they are invalid).
    /// `elements` are the line's elements, as for [`Calculator::evaluate`]. The slurry line has none
    /// without a tubing or coil element (its bore axis would change nothing).
    pub fn map(self, src: &dyn FieldSource, elements: &[&dyn FieldSource]) -> Option<Result<crate::physics::map::Map, CaseError>> {
        match self {
            Calculator::PackedBed => Some(
                PackedBedInput::from_source(src)
                    .map(|input| bed::map::cartridge_map(&input, bed::map::CELLS))
                    .map_err(CaseError::Inputs),
            ),
            Calculator::SlurryLine => match SlurryInput::from_source(src, elements) {
                Ok(input) => slurry::map::line_map(&input, slurry::map::CELLS).map(Ok),
                Err(e) => Some(Err(CaseError::Inputs(e))),
            },
            Calculator::SegmentedFlow => Some(
                SegmentedFlowInput::from_source(src)
                    .map(|input| gas::map::gas_liquid_map(&input, gas::map::CELLS))
                    .map_err(CaseError::Inputs),
            ),
            Calculator::TubularReactor | Calculator::GasLiquidBed | Calculator::Setup => None,
        }
    }

    /// The operating map `kind` as a job the page computes a few cells at a time
    /// ([`crate::physics::map::MapJob`]): the gas–liquid map cell by cell, the others already
    /// done. As [`Calculator::map_of`] otherwise.
    pub fn map_job(self, kind: MapKind, src: &dyn FieldSource, elements: &[&dyn FieldSource]) -> Option<Result<crate::physics::map::MapJob, CaseError>> {
        match (self, kind) {
            (Calculator::SegmentedFlow, MapKind::GasLiquidFlows) => Some(
                SegmentedFlowInput::from_source(src).map(|input| gas::map::job(&input, gas::map::CELLS)).map_err(CaseError::Inputs),
            ),
            _ => self.map_of(kind, src, elements).map(|m| m.map(crate::physics::map::MapJob::done)),
        }
    }

    /// Validates the inputs from `src` (and, for a line, one source per element) and runs the
    /// calculator.
    pub fn evaluate(self, src: &dyn FieldSource, elements: &[&dyn FieldSource]) -> Result<Report, CaseError> {
        match self {
            Calculator::SlurryLine => {
                let input = SlurryInput::from_source(src, elements).map_err(CaseError::Inputs)?;
                slurry::element::evaluate(&input).map_err(CaseError::Numerical)
            }
            Calculator::SegmentedFlow => {
                let input = SegmentedFlowInput::from_source(src).map_err(CaseError::Inputs)?;
                gas::evaluate(&input).map_err(|e| CaseError::Calculation(e.to_string()))
            }
            Calculator::TubularReactor => {
                let input = TubularInput::from_source(src).map_err(CaseError::Inputs)?;
                tubular::evaluate(&input).map_err(CaseError::Numerical)
            }
            Calculator::PackedBed => {
                let input = PackedBedInput::from_source(src).map_err(CaseError::Inputs)?;
                bed::evaluate(&input).map_err(CaseError::Numerical)
            }
            Calculator::GasLiquidBed => {
                let input = GasLiquidBedInput::from_source(src).map_err(CaseError::Inputs)?;
                gas_bed::evaluate(&input).map_err(|e| CaseError::Calculation(e.to_string()))
            }
            Calculator::Setup => {
                let input = SetupInput::from_source(src, elements).map_err(CaseError::Inputs)?;
                setup::evaluate(&input).map_err(|e| match e {
                    setup::evaluate::SetupError::Numerical(e) => CaseError::Numerical(e),
                    e => CaseError::Calculation(e.to_string()),
                })
            }
        }
    }
}

/// The value an entry added after version 1 takes in a file that lacks it.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum Added {
    /// A quantity: number and unit symbol (the stated default, e.g. the pump's 10 mL/min).
    Quantity(f64, &'static str),
    /// An option key.
    Choice(&'static str),
}

impl Added {
    /// The entry it stands for.
    pub fn entry(self) -> Entry {
        match self {
            Added::Quantity(value, unit) => Entry::Quantity { value, unit: unit.to_owned(), range: None },
            Added::Choice(key) => Entry::Choice(key.to_owned()),
        }
    }
}

/// One entry: a quantity as typed (number and unit symbol), or the key of a chosen option.
#[derive(Debug, Clone, PartialEq, Serialize)]
#[serde(untagged)]
pub enum Entry {
    /// A number in a unit, e.g. `{"value": 0.76, "unit": "mm"}`.
    Quantity {
        /// The number as entered.
        value: f64,
        /// Unit symbol, one of the field's units.
        unit: String,
        /// Lowest and highest value in the same unit, when the entry is a range (`"range": [0.36,
        /// 0.42]`); the results use `value`, the range gives their band.
        #[serde(skip_serializing_if = "Option::is_none")]
        range: Option<[f64; 2]>,
    },
    /// An option key, e.g. `"single_pass"`.
    Choice(String),
}

fn layout_has(layout: &[FormItem], key: &str) -> bool {
    layout.iter().any(|item| item.key() == Some(key))
}

impl FormItem {
    /// The entry's key; `None` for a heading.
    pub const fn key(&self) -> Option<&'static str> {
        match self {
            Field(f) => Some(f.key),
            Choice(c) => Some(c.key),
            Heading(_) => None,
        }
    }
}

/// Field key → entry: the inputs of a case, or of one element of a line.
pub type Entries = BTreeMap<String, Entry>;

/// A case: its calculator's inputs with a title and notes. Read only through
/// [`CaseFile::from_json`] (or a workspace or link), which checks every entry's shape.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct CaseFile {
    /// Format version: [`FORMAT_VERSION`] once read (older files are upgraded).
    pub clearbore_case: u32,
    /// A name for people; empty for an untitled case.
    pub title: String,
    /// Free-text notes (what was tried, why), kept with the case and printed on the record.
    pub notes: String,
    /// When the case was first saved, ISO 8601 (as the page's clock gives it); `None` when not
    /// known (files from the command line or format 1).
    #[serde(skip_serializing_if = "Option::is_none")]
    pub created: Option<String>,
    /// When the case was last changed, ISO 8601; `None` when not known.
    #[serde(skip_serializing_if = "Option::is_none")]
    pub modified: Option<String>,
    /// The calculator the inputs belong to.
    pub calculator: Calculator,
    /// Field key → entry.
    pub inputs: Entries,
    /// For a line: the elements in flow order, each field key → entry.
    #[serde(skip_serializing_if = "Vec::is_empty")]
    pub elements: Vec<Entries>,
}

/// Why a case could not be read or evaluated.
#[derive(Debug, Clone, PartialEq)]
pub enum CaseError {
    /// Not a case document this build can read: every problem found, each at its place.
    Format(Vec<FormatProblem>),
    /// Written by a newer Clearbore, in case format `found` (this build reads up to
    /// [`FORMAT_VERSION`]).
    NewerVersion {
        /// The format version in the file.
        found: u64,
    },
    /// One or more fields are impossible or unreadable.
    Inputs(Vec<InputError>),
    /// The computation failed numerically.
    Numerical(NumericalError),
    /// The calculation could not give a result (no convergence, gas used up, …), in words.
    Calculation(String),
}

impl std::fmt::Display for CaseError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            CaseError::Format(problems) => {
                f.write_str("not a case file this version of Clearbore can read:")?;
                for p in problems {
                    write!(f, "\n  {p}")?;
                }
                Ok(())
            }
            CaseError::NewerVersion { found } => write!(
                f,
                "this case was written by a newer version of Clearbore (case format {found}); this version reads case \
                 formats {OLDEST_FORMAT_VERSION} to {FORMAT_VERSION}. Open it with the newer version."
            ),
            CaseError::Inputs(errors) => {
                for (i, e) in errors.iter().enumerate() {
                    if i > 0 {
                        writeln!(f)?;
                    }
                    write!(f, "{e}")?;
                }
                Ok(())
            }
            CaseError::Numerical(e) => write!(f, "{e}"),
            CaseError::Calculation(m) => f.write_str(m),
        }
    }
}

impl std::error::Error for CaseError {}

impl CaseFile {
    /// A new untitled case of `calculator` with these entries, in the current format.
    pub fn new(calculator: Calculator, inputs: Entries, elements: Vec<Entries>) -> Self {
        Self {
            clearbore_case: FORMAT_VERSION,
            title: String::new(),
            notes: String::new(),
            created: None,
            modified: None,
            calculator,
            inputs,
            elements,
        }
    }

    /// Reads case JSON of any format from [`OLDEST_FORMAT_VERSION`] to [`FORMAT_VERSION`]: checks
    /// every entry's shape and key (naming each wrong one by its place, e.g. `inputs.flow`),
    /// refuses a newer format by its number, upgrades an older one, and fills entries added to
    /// the calculator since (see [`Calculator::added_entries`]). Values and units are checked
    /// when the case is evaluated, at their fields.
    pub fn from_json(text: &str) -> Result<Self, CaseError> {
        format::read_text(text)
    }

    /// Pretty JSON, as the page saves it.
    pub fn to_json(&self) -> String {
        // Serialising plain data with string keys cannot fail.
        serde_json::to_string_pretty(self).unwrap_or_default()
    }

    /// A file name from the title (`amide-coupling-cb-7.json`): letters and digits kept (lower
    /// case), everything else a single hyphen, at most 60 characters; `clearbore-{calculator}`
    /// for an untitled case. `extension` without the dot.
    pub fn file_name(&self, extension: &str) -> String {
        let mut stem = String::new();
        for c in self.title.chars().flat_map(char::to_lowercase) {
            if c.is_alphanumeric() {
                stem.push(c);
            } else if !stem.is_empty() && !stem.ends_with('-') {
                stem.push('-');
            }
            if stem.chars().count() >= 60 {
                break;
            }
        }
        let stem = stem.trim_end_matches('-');
        if stem.is_empty() { format!("clearbore-{}.{extension}", self.calculator.key()) } else { format!("{stem}.{extension}") }
    }

    /// Validates the inputs and runs the calculator.
    pub fn evaluate(&self) -> Result<Report, CaseError> {
        let elements: Vec<EntrySource<'_>> = self.elements.iter().map(EntrySource).collect();
        let sources: Vec<&dyn FieldSource> = elements.iter().map(|e| e as &dyn FieldSource).collect();
        self.calculator.evaluate(&EntrySource(&self.inputs), &sources)
    }

    /// The case's operating map `kind` ([`Calculator::map_of`]).
    pub fn map_of(&self, kind: MapKind) -> Option<Result<crate::physics::map::Map, CaseError>> {
        let elements: Vec<EntrySource<'_>> = self.elements.iter().map(EntrySource).collect();
        let sources: Vec<&dyn FieldSource> = elements.iter().map(|e| e as &dyn FieldSource).collect();
        self.calculator.map_of(kind, &EntrySource(&self.inputs), &sources)
    }

    /// The case's operating map ([`Calculator::map`]), for a calculator that has one.
    pub fn map(&self) -> Option<Result<crate::physics::map::Map, CaseError>> {
        let elements: Vec<EntrySource<'_>> = self.elements.iter().map(EntrySource).collect();
        let sources: Vec<&dyn FieldSource> = elements.iter().map(|e| e as &dyn FieldSource).collect();
        self.calculator.map(&EntrySource(&self.inputs), &sources)
    }
}

/// Entries read as a source of field values.
pub struct EntrySource<'a>(pub &'a Entries);

impl FieldSource for EntrySource<'_> {
    fn quantity(&self, spec: &FieldSpec) -> Result<f64, InputError> {
        match self.0.get(spec.key) {
            Some(Entry::Quantity { value, unit, range }) => spec.accept_range(*value, *range, spec.unit(unit)?),
            Some(Entry::Choice(text)) => Err(InputError {
                field: spec.key,
                label: spec.label,
                given: format!("\"{text}\""),
                problem: "expected a quantity such as {\"value\": 1.0, \"unit\": \"mm\"}".to_owned(),
            }),
            None => Err(InputError {
                field: spec.key,
                label: spec.label,
                given: crate::physics::form::MISSING.to_owned(),
                problem: "this field is required".to_owned(),
            }),
        }
    }

    fn choice(&self, spec: &ChoiceSpec) -> Result<usize, InputError> {
        match self.0.get(spec.key) {
            Some(Entry::Choice(key)) => spec.index_of(key),
            Some(Entry::Quantity { value, unit, .. }) => Err(InputError {
                field: spec.key,
                label: spec.label,
                given: format!("{value} {unit}"),
                problem: "expected one of the option names".to_owned(),
            }),
            None => Err(InputError {
                field: spec.key,
                label: spec.label,
                given: crate::physics::form::MISSING.to_owned(),
                problem: "this field is required".to_owned(),
            }),
        }
    }
}
