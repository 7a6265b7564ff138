//! The workspace the page keeps in the browser's local storage: the open cases, each with an id,
//! and which one is active, versioned by `clearbore_workspace`. Reading a stored record either
//! gives the workspace or says why it cannot be used (damaged, or from a newer version), so that
//! the page can keep the record's text aside, untouched, and report it.

use serde::Serialize;
use serde_json::Value;

use super::{CaseError, CaseFile, format};

/// The workspace format this build writes (and the newest it reads).
pub const WORKSPACE_VERSION: u32 = 1;

/// A case open in the workspace.
#[derive(Debug, Clone, PartialEq, Serialize)]
pub struct OpenCase {
    /// Stable within the workspace (never reused while the case is open).
    pub id: u64,
    /// The case.
    pub case: CaseFile,
}

/// The open cases and the active one.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct Workspace {
    /// In the order the page lists them.
    pub cases: Vec<OpenCase>,
    /// Id of the case on screen; `None` when no case is open.
    pub active: Option<u64>,
}

/// Why a stored workspace record cannot be used. The page keeps the record's text aside and
/// never writes over it.
#[derive(Debug, Clone, PartialEq, Eq)]
pub enum StoredError {
    /// The record is damaged or not a workspace: what is wrong, in words.
    Corrupt(String),
    /// The record, or a case in it, was written by a newer Clearbore.
    NewerVersion {
        /// `"workspace"` or `"case"`: which format is newer.
        format: &'static str,
        /// The version found.
        found: u64,
    },
}

impl std::fmt::Display for StoredError {
    fn fmt(&self, f: &mut std::fmt::Formatter<'_>) -> std::fmt::Result {
        match self {
            StoredError::Corrupt(why) => write!(f, "the cases stored in this browser cannot be read: {why}"),
            StoredError::NewerVersion { format, found } => write!(
                f,
                "the cases stored in this browser were written by a newer version of Clearbore ({format} format {found}); \
                 open them with that version"
            ),
        }
    }
}

impl std::error::Error for StoredError {}

#[derive(Serialize)]
struct Stored<'a> {
    clearbore_workspace: u32,
    active: Option<u64>,
    cases: &'a [OpenCase],
}

impl Workspace {
    /// The record to store: compact JSON.
    pub fn to_storage(&self) -> String {
        let stored = Stored { clearbore_workspace: WORKSPACE_VERSION, active: self.active, cases: &self.cases };
        // Serialising plain data with string keys cannot fail.
        serde_json::to_string(&stored).unwrap_or_default()
    }

    /// Reads a stored record. Every case in it is read as a case file is (older case formats are
    /// upgraded); a damaged case, a repeated id or an active id that names no case makes the
    /// whole record unusable, so that nothing in it is silently dropped.
    pub fn from_storage(text: &str) -> Result<Workspace, StoredError> {
        let value = format::parse_json(text).map_err(StoredError::Corrupt)?;
        let corrupt = |why: &str| StoredError::Corrupt(why.to_owned());
        let doc = value.as_object().ok_or_else(|| corrupt("it is not a workspace record"))?;
        match doc.get("clearbore_workspace").and_then(Value::as_u64) {
            None | Some(0) => return Err(corrupt("it is not a workspace record (no workspace format number)")),
            Some(n) if n > u64::from(WORKSPACE_VERSION) => return Err(StoredError::NewerVersion { format: "workspace", found: n }),
            Some(_) => {}
        }
        if let Some(key) = doc.keys().find(|k| !["clearbore_workspace", "active", "cases"].contains(&k.as_str())) {
            return Err(StoredError::Corrupt(format!("it has an entry \"{key}\" that a workspace does not have")));
        }
        let list = doc.get("cases").and_then(Value::as_array).ok_or_else(|| corrupt("its list of cases is missing"))?;
        let mut cases: Vec<OpenCase> = Vec::with_capacity(list.len());
        for (i, item) in list.iter().enumerate() {
            let n = i + 1;
            let entry = item.as_object().filter(|o| o.len() == 2);
            let (Some(id), Some(case)) = (entry.and_then(|o| o.get("id")).and_then(Value::as_u64), entry.and_then(|o| o.get("case"))) else {
                return Err(StoredError::Corrupt(format!("case {n} is not stored as an id and a case")));
            };
            if cases.iter().any(|c| c.id == id) {
                return Err(StoredError::Corrupt(format!("case {n} has the same id ({id}) as another")));
            }
            let case = format::read_value(case).map_err(|e| match e {
                CaseError::NewerVersion { found } => StoredError::NewerVersion { format: "case", found },
                other => {
                    let title = item.get("case").and_then(|c| c.get("title")).and_then(Value::as_str).filter(|t| !t.is_empty());
                    let name = title.map_or_else(|| format!("case {n}"), |t| format!("case {n} (\"{t}\")"));
                    StoredError::Corrupt(format!("{name}: {other}"))
                }
            })?;
            cases.push(OpenCase { id, case });
        }
        let active = match doc.get("active") {
            None | Some(Value::Null) => None,
            Some(v) => match v.as_u64() {
                Some(id) if cases.iter().any(|c| c.id == id) => Some(id),
                _ => return Err(corrupt("the case marked active is not among the stored cases")),
            },
        };
        Ok(Workspace { cases, active })
    }

    /// Adds a case at the end of the list with a new id (one above the largest in use) and
    /// returns the id. The active case does not change.
    pub fn add(&mut self, case: CaseFile) -> u64 {
        let id = self.unused_id();
        self.cases.push(OpenCase { id, case });
        id
    }

    fn unused_id(&self) -> u64 {
        self.cases.iter().map(|c| c.id).max().map_or(1, |m| m.saturating_add(1))
    }

    /// The case with this id.
    pub fn get(&self, id: u64) -> Option<&CaseFile> {
        self.cases.iter().find(|c| c.id == id).map(|c| &c.case)
    }

    /// The case with this id, to change.
    pub fn get_mut(&mut self, id: u64) -> Option<&mut CaseFile> {
        self.cases.iter_mut().find(|c| c.id == id).map(|c| &mut c.case)
    }

    /// The active case.
    pub fn active_case(&self) -> Option<&OpenCase> {
        self.active.and_then(|id| self.cases.iter().find(|c| c.id == id))
    }

    /// Takes a case out, returning its place in the list with it (for an undo). If it was
    /// active, no case is active afterwards.
    pub fn remove(&mut self, id: u64) -> Option<(usize, OpenCase)> {
        let at = self.cases.iter().position(|c| c.id == id)?;
        if self.active == Some(id) {
            self.active = None;
        }
        Some((at, self.cases.remove(at)))
    }

    /// Puts a removed case back at its place (or at the end if the list got shorter) and returns
    /// its id: the one it had, or a new one if that id was given to another case meanwhile.
    pub fn restore(&mut self, at: usize, mut case: OpenCase) -> u64 {
        if self.cases.iter().any(|c| c.id == case.id) {
            case.id = self.unused_id();
        }
        let id = case.id;
        self.cases.insert(at.min(self.cases.len()), case);
        id
    }
}
