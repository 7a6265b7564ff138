//! The workbench: one form per calculator, kept for the whole visit, and which one is shown.
//! Shared by context so that opening a case file can switch to its calculator.

use leptos::prelude::*;

use super::calculator::CalculatorForm;
use crate::case::{Calculator, CaseFile};

/// Every calculator's form and the one on screen.
#[derive(Debug, Clone)]
pub struct Workbench {
    /// The calculator shown.
    pub active: RwSignal<Calculator>,
    forms: Vec<CalculatorForm>,
}

impl Workbench {
    /// The form of `calculator`.
    pub fn form(&self, calculator: Calculator) -> Option<CalculatorForm> {
        self.forms.iter().find(|f| f.calculator == calculator).cloned()
    }

    /// Loads a case into its calculator's form and shows that calculator.
    pub fn open(&self, case: &CaseFile) {
        if let Some(form) = self.form(case.calculator) {
            form.load(case);
            self.active.set(case.calculator);
        }
    }
}

/// Creates the forms (each loaded with its demo case) and provides the workbench.
pub fn provide_workbench() -> Workbench {
    let bench = Workbench {
        active: RwSignal::new(Calculator::TubularReactor),
        forms: Calculator::ALL.iter().map(|c| CalculatorForm::new(*c)).collect(),
    };
    provide_context(bench.clone());
    bench
}

/// The workbench provided by [`provide_workbench`].
pub fn use_workbench() -> Option<Workbench> {
    use_context::<Workbench>()
}
