//! Stable keys and labels of the per-stage inputs, figures and checks of a setup
//! (`stage_3_pressure_drop`, "Stage 3: pressure drop"), as static tables like the slurry line's.

pub use crate::physics::slurry::keys::{ElementKey, MAX_ELEMENTS as MAX_STAGES};
use crate::physics::input::InputError;
use crate::physics::slurry::keys::numbered_keys;

/// The tables of the gas feed's entries, which its shared reader names by their plain keys.
const GAS_ENTRIES: [&[ElementKey; MAX_STAGES]; 9] =
    [&GAS, &GAS_MOLE_FRACTION, &GAS_FLOW, &REFERENCE_STATE, &REFERENCE_TEMPERATURE, &REFERENCE_PRESSURE, &LOC_SOURCE, &LIMITING_OXYGEN, &SUPPLY_PRESSURE];

/// An error of a stage's entry read by a shared reader (named by its plain key, `gas_flow`),
/// named at stage `i` (`stage_3_gas_flow`); an entry without a table keeps its name.
pub fn named(i: usize, e: InputError) -> InputError {
    let prefix = format!("stage_{}_", i + 1);
    match GAS_ENTRIES.iter().filter_map(|t| t.get(i)).find(|k| k.key.strip_prefix(prefix.as_str()) == Some(e.field)) {
        Some(k) => InputError { field: k.key, label: k.label, ..e },
        None => e,
    }
}

numbered_keys! {
    "stage", "Stage";
    /// Input: stage kind.
    KIND = "kind", "kind";
    /// Input: pump type of a feed.
    PUMP = "pump", "pump";
    /// Input: feed flow.
    FLOW = "flow", "feed flow";
    /// Input: the pump's largest flow.
    PUMP_MAX_FLOW = "pump_max_flow", "pump's largest flow";
    /// Input: pump pressure limit.
    PUMP_LIMIT = "pump_limit", "pump pressure limit";
    /// Input: syringe drive force.
    DRIVE_FORCE = "drive_force", "syringe drive force";
    /// Input: syringe barrel bore.
    BARREL_BORE = "barrel_bore", "syringe barrel bore";
    /// Input: syringe barrel rating.
    BARREL_RATING = "barrel_rating", "syringe barrel rating";
    /// Input: solids volume fraction of a feed.
    SOLIDS = "solids_fraction", "solids in the feed";
    /// Input: bore or narrowest opening (cartridge: tube diameter).
    INNER_DIAMETER = "inner_diameter", "inner diameter";
    /// Input: length (cartridge: bed length).
    LENGTH = "length", "length";
    /// Input: the part's pressure rating.
    RATING = "pressure_rating", "pressure rating";
    /// Input: particle diameter of a packed cartridge.
    PARTICLE_DIAMETER = "particle_diameter", "particle diameter";
    /// Input: bed voidage of a packed cartridge.
    VOIDAGE = "voidage", "bed voidage";
    /// Input: the gas.
    GAS = "gas", "gas";
    /// Input: mole fraction of the gas in the feed.
    GAS_MOLE_FRACTION = "gas_mole_fraction", "gas in the feed";
    /// Input: gas flow at the reference state.
    GAS_FLOW = "gas_flow", "gas flow at the reference state";
    /// Input: reference state of the gas flow.
    REFERENCE_STATE = "reference_state", "reference state of the gas flow";
    /// Input: entered reference temperature.
    REFERENCE_TEMPERATURE = "reference_temperature", "reference temperature";
    /// Input: entered reference pressure.
    REFERENCE_PRESSURE = "reference_pressure", "reference pressure";
    /// Input: where the limiting oxygen concentration comes from.
    LOC_SOURCE = "loc_source", "limiting oxygen concentration source";
    /// Input: entered limiting oxygen concentration.
    LIMITING_OXYGEN = "limiting_oxygen", "limiting oxygen concentration";
    /// Input: gas supply pressure.
    SUPPLY_PRESSURE = "supply_pressure", "gas supply pressure";
    /// Input: regulator set point.
    SET_POINT = "set_point", "set point";
    /// Figure: liquid flow through the stage.
    LIQUID_FLOW = "liquid_flow", "liquid flow";
    /// Figure: volume the liquid fills.
    VOLUME = "volume", "liquid volume";
    /// Figure: liquid residence time.
    RESIDENCE_TIME = "residence_time", "liquid residence time";
    /// Figure: pressure drop.
    PRESSURE_DROP = "pressure_drop", "pressure drop";
    /// Figure: pressure at the inlet (gauge).
    INLET_PRESSURE = "inlet_pressure", "inlet pressure (gauge)";
    /// Figure: solids volume fraction in the stage.
    SOLIDS_FRACTION = "solids_volume_fraction", "solids volume fraction";
    /// Figure: suspension viscosity.
    SUSPENSION_VISCOSITY = "suspension_viscosity", "suspension viscosity";
    /// Figure: passage-to-particle ratio.
    PASSAGE_RATIO = "passage_ratio", "passage-to-particle ratio (d90)";
    /// Figure: gas fed, all species.
    GAS_MOLAR_FLOW = "gas_molar_flow", "gas fed (all species)";
    /// Figure: actual gas flow at the stage's outlet.
    GAS_FLOW_OUTLET = "gas_flow_outlet", "actual gas flow at the outlet";
    /// Figure: gas residence time.
    GAS_RESIDENCE_TIME = "gas_residence_time", "gas residence time";
    /// Figure: gas fraction at the outlet.
    GAS_FRACTION = "gas_fraction_outlet", "gas fraction β at the outlet";
    /// Figure: bubble length at the outlet.
    BUBBLE_LENGTH = "bubble_length_outlet", "bubble length at the outlet";
    /// Figure: slug length at the outlet.
    SLUG_LENGTH = "slug_length_outlet", "slug length at the outlet";
    /// Figure: largest pressure the pump can give.
    PUMP_PRESSURE = "pump_pressure", "largest pump pressure";
    /// Check: pressure against the part's rating.
    PRESSURE = "pressure", "pressure against its rating";
    /// Check: pump.
    PUMP_CHECK = "pump_check", "pump";
    /// Check: the flow regime of a run of gas tubes (at its first tube).
    FLOW_REGIME = "flow_regime", "flow regime";
    /// Check: gas supply pressure against the pressure where the gas joins.
    GAS_SUPPLY = "gas_supply", "gas supply pressure";
    /// Check: clogging.
    CLOGGING = "clogging", "clogging and bridging";
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn keys_are_numbered_from_one() {
        assert_eq!(PRESSURE_DROP[2].key, "stage_3_pressure_drop");
        assert_eq!(PRESSURE_DROP[2].label, "Stage 3: pressure drop");
    }
}
