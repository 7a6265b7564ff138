//! Share links: a case carried in the URL fragment (`#c1=…`), compressed, so that it never leaves
//! the browser (a fragment is not sent with a request). Compact case JSON → raw deflate
//! (RFC 1951) → base64url without padding (RFC 4648 §5), behind a link-format prefix.

use base64::Engine;
use base64::engine::general_purpose::URL_SAFE_NO_PAD;

use super::{CaseError, CaseFile, format};

/// The link format this build writes and reads.
pub const LINK_VERSION: u32 = 1;

/// The largest case a link may unpack to (bytes of JSON): far above any real case, so a crafted
/// link cannot make the page unpack without bound.
const MAX_UNPACKED: usize = 1 << 20;

/// Why a link does not open.
#[derive(Debug, Clone, PartialEq)]
pub enum LinkError {
    /// The text is not a case link of this app (no `#c1=` part).
    NotALink,
    /// It looks like one, but its text was cut short or changed; the reason in words.
    Damaged(&'static str),
    /// Made by a newer Clearbore, in link format `found`.
    NewerVersion {
        /// The link format in the link.
        found: u64,
    },
    /// The link unpacked, but the case in it does not read (including a newer case format).
    Case(CaseError),
}

impl std::fmt::Display for LinkError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            LinkError::NotALink => f.write_str("this is not a Clearbore case link (a case link ends in #c1= followed by the case)"),
            LinkError::Damaged(why) => write!(f, "this case link is damaged: {why}. Ask for the link again, copied whole"),
            LinkError::NewerVersion { found } => write!(
                f,
                "this case link was made by a newer version of Clearbore (link format {found}); this version opens link \
                 format {LINK_VERSION}. Open it with the newer version"
            ),
            LinkError::Case(e) => write!(f, "the case in this link does not open: {e}"),
        }
    }
}

impl std::error::Error for LinkError {}

impl CaseFile {
    /// The case as a URL fragment without the `#`: `c1=` and the compressed case. Set it as the
    /// page's `location.hash`.
    pub fn to_link_fragment(&self) -> String {
        // Serialising plain data with string keys cannot fail.
        let json = serde_json::to_string(self).unwrap_or_default();
        let packed = miniz_oxide::deflate::compress_to_vec(json.as_bytes(), 9);
        format!("c{LINK_VERSION}={}", URL_SAFE_NO_PAD.encode(packed))
    }

    /// Opens a case link: a whole address (`…/clearbore.html#c1=…`), a fragment with or without
    /// its `#`, surrounding spaces allowed.
    pub fn from_link(text: &str) -> Result<CaseFile, LinkError> {
        let text = text.trim();
        let fragment = match text.split_once('#') {
            Some((_, after)) => after,
            None => text,
        };
        let (prefix, payload) = fragment.split_once('=').ok_or(LinkError::NotALink)?;
        let version = prefix.strip_prefix('c').filter(|v| !v.is_empty() && v.bytes().all(|b| b.is_ascii_digit()));
        let version: u64 = version.ok_or(LinkError::NotALink)?.parse().map_err(|_| LinkError::NotALink)?;
        if version > u64::from(LINK_VERSION) {
            return Err(LinkError::NewerVersion { found: version });
        }
        if version != u64::from(LINK_VERSION) {
            return Err(LinkError::NotALink);
        }
        if payload.is_empty() {
            return Err(LinkError::Damaged("it ends where the case should begin"));
        }
        let packed = URL_SAFE_NO_PAD
            .decode(payload)
            .map_err(|_| LinkError::Damaged("it holds characters or a length that no case link has"))?;
        let json = miniz_oxide::inflate::decompress_to_vec_with_limit(&packed, MAX_UNPACKED)
            .map_err(|_| LinkError::Damaged("its content does not unpack (part of it is missing or changed)"))?;
        let json = String::from_utf8(json).map_err(|_| LinkError::Damaged("its content is not text"))?;
        let value = format::parse_json(&json).map_err(|_| LinkError::Damaged("its content is not a complete case"))?;
        format::read_value(&value).map_err(LinkError::Case)
    }
}
