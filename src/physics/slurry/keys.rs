//! Stable keys and labels of the per-element figures, checks and input fields
//! (`element_3_settling`, "Element 3: settling"), as static tables so reports hold no leaked strings.

/// Most elements a line may have.
pub const MAX_ELEMENTS: usize = 24;

/// The key and label of one per-element item.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub struct ElementKey {
    /// Stable key, e.g. `element_3_settling`.
    pub key: &'static str,
    /// Label for people, e.g. "Element 3: settling".
    pub label: &'static str,
}

/// A table of numbered keys: `($prefix, $Prefix; $suffix, $label; 1 2 …)` gives
/// `{prefix}_{n}_{suffix}` with the label "{Prefix} {n}: {label}". Shared with the setup's stages.
macro_rules! numbered_table {
    ($prefix:literal, $title:literal; $suffix:literal, $label:literal; $($n:literal)*) => {
        [$($crate::physics::slurry::keys::ElementKey { key: concat!($prefix, "_", $n, "_", $suffix), label: concat!($title, " ", $n, ": ", $label) }),*]
    };
}
pub(crate) use numbered_table;

/// Declares one table of [`MAX_ELEMENTS`] numbered keys per `NAME = suffix, label;` line, keyed
/// `{prefix}_{n}_{suffix}`.
macro_rules! numbered_keys {
    ($prefix:literal, $title:literal; $($(#[$doc:meta])* $name:ident = $suffix:literal, $label:literal;)*) => {
        $(
            $(#[$doc])*
            pub const $name: [$crate::physics::slurry::keys::ElementKey; $crate::physics::slurry::keys::MAX_ELEMENTS] =
                $crate::physics::slurry::keys::numbered_table!($prefix, $title; $suffix, $label; 1 2 3 4 5 6 7 8 9 10 11 12 13 14 15 16 17 18 19 20 21 22 23 24);
        )*
    };
}
pub(crate) use numbered_keys;

numbered_keys! {
    "element", "Element";
    /// Input: element kind.
    KIND = "kind", "kind";
    /// Input: orientation.
    ORIENTATION = "orientation", "orientation";
    /// Input: inner diameter (narrowest opening).
    INNER_DIAMETER = "inner_diameter", "inner diameter";
    /// Input: length.
    LENGTH = "length", "length";
    /// Figure: mean liquid velocity.
    MEAN_VELOCITY = "mean_velocity", "mean velocity";
    /// Figure: liquid residence time.
    RESIDENCE_TIME = "residence_time", "liquid residence time";
    /// Figure: hindered settling velocity of the largest particles.
    HINDERED_VELOCITY = "hindered_settling_velocity", "hindered settling velocity (d90)";
    /// Figure: time to settle across the bore.
    TIME_TO_SETTLE = "time_to_settle", "time to settle across the bore (d90)";
    /// Figure: settling number Z.
    SETTLING_NUMBER = "settling_number", "settling number Z (d90)";
    /// Figure: mass fraction deposited.
    DEPOSITED_FRACTION = "deposited_fraction", "fraction of solids reaching the wall";
    /// Figure: laminar Shields number.
    SHIELDS_NUMBER = "shields_number", "laminar Shields number (d90)";
    /// Figure: particle residence time.
    PARTICLE_RESIDENCE_TIME = "particle_residence_time", "particle residence time (d90)";
    /// Figure: solids holdup.
    SOLIDS_HOLDUP = "solids_holdup", "solids volume fraction in the element";
    /// Figure: pressure drop.
    PRESSURE_DROP = "pressure_drop", "pressure drop";
    /// Figure: passage-to-particle ratio.
    PASSAGE_RATIO = "passage_ratio", "passage-to-particle ratio (d90)";
    /// Figure: turbulent deposition velocity (reference only).
    DEPOSITION_VELOCITY = "deposition_velocity_reference", "turbulent limit-deposit velocity (reference only)";
    /// Figure: minimum flow that fixes the element.
    MINIMUM_FLOW = "minimum_flow", "minimum flow for this element";
    /// Figure: largest particle size the element tolerates.
    MAXIMUM_PARTICLE_SIZE = "maximum_particle_size", "largest particle size for this element";
    /// Check: settling.
    SETTLING = "settling", "settling";
    /// Check: clogging.
    CLOGGING = "clogging", "clogging and bridging";
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn keys_are_numbered_from_one() {
        assert_eq!(SETTLING[2].key, "element_3_settling");
        assert_eq!(SETTLING[2].label, "Element 3: settling");
        assert_eq!(CLOGGING[MAX_ELEMENTS - 1].key, "element_24_clogging");
    }
}
