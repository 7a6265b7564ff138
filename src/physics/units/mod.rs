//! Units: SI quantity newtypes, the lab units a field accepts, parsing of typed text and
//! formatting to significant figures. Conversion factors are NIST SP 811 (2008), Appendix B.

mod format;
mod quantities;
mod table;

pub use format::format_significant;
pub use quantities::*;
pub(crate) use quantities::si_quantity;
pub use table::{Dimension, NumberError, TypedRange, Unit, parse_entry, parse_number, parse_range, unit_by_symbol};
