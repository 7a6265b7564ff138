//! Stable keys and labels of the per-stage inputs, figures and checks of a setup
//! (`stage_3_pressure_drop`, "Stage 3: pressure drop"), as static tables like the slurry line's.

pub use crate::physics::slurry::keys::{ElementKey, MAX_ELEMENTS as MAX_STAGES};
use crate::physics::slurry::keys::numbered_keys;

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
    /// Figure: largest pressure the pump can give.
    PUMP_PRESSURE = "pump_pressure", "largest pump pressure";
    /// Check: pressure against the part's rating.
    PRESSURE = "pressure", "pressure against its rating";
    /// Check: pump.
    PUMP_CHECK = "pump_check", "pump";
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
