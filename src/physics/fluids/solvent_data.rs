//! Coefficient table of the built-in solvents, fitted by `tests/reference/solvent_properties.py`
//! (thermo 0.6.1 / chemicals 1.5.2) and pasted here; each source string names where it came from.
//! Where the range of density, viscosity or surface tension runs above the normal boiling point
//! (DCM, acetone, methanol, THF, ethyl acetate, ethanol, MTBE, tert-butanol), the values there
//! are for liquid kept under pressure. tert-butanol melts at 25.2 °C, so its fits start at 26 °C.

use super::models::{
    ANDRADE_FORMULA, ANTOINE_FORMULA, AntoineFit, DENSITY_FORMULA, LinearFit,
    SURFACE_TENSION_FORMULA, VOGEL_FORMULA, ViscosityFit, ViscosityForm,
};
use crate::physics::report::{ModelInfo, ValidityBound};
use crate::physics::units::Dimension;

/// Everything stored for one solvent.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct SolventData {
    /// Name for people.
    pub name: &'static str,
    /// CAS registry number.
    pub cas: &'static str,
    /// Molar mass, g/mol (chemicals 1.5.2).
    pub molar_mass_g_per_mol: f64,
    /// Normal boiling point at 101.325 kPa, K (chemicals 1.5.2).
    pub normal_boiling_point_k: f64,
    /// Melting point, K (chemicals 1.5.2); the fits start at 20 °C or just above it.
    pub melting_point_k: f64,
    /// Density, kg/m³.
    pub density: LinearFit,
    /// Dynamic viscosity, Pa·s.
    pub viscosity: ViscosityFit,
    /// Surface tension against its own vapour or air, N/m.
    pub surface_tension: LinearFit,
    /// Vapour pressure, Pa.
    pub vapour_pressure: AntoineFit,
}

/// The table, in the order of [`super::Solvent::ALL`].
pub const SOLVENTS: [SolventData; 21] = [
    // water
    SolventData {
        name: "water",
        cas: "7732-18-5",
        molar_mass_g_per_mol: 18.01528,
        normal_boiling_point_k: 373.124,
        melting_point_k: 273.15,
        density: LinearFit {
            at_293_k: 1000.3498164730788,
            slope_per_k: -0.4449504736646991,
            info: ModelInfo {
                name: "water density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Vogel {
                a: -10.561897294578658,
                b: 552.7177221075439,
                c: 141.91364109659614,
            },
            info: ModelInfo {
                name: "water viscosity, Vogel",
                formula: VOGEL_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.07289538701172955,
            slope_per_k: -0.00016779890838314264,
            info: ModelInfo {
                name: "water surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method IAPWS_SIGMA: IAPWS release on the surface tension of ordinary water (2014)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 10.105081581596478,
            b: 1679.9957131826097,
            c: -43.72295470521576,
            info: ModelInfo {
                name: "water vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method IAPWS_PSAT: IAPWS saturation-pressure equation for water",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(275.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // methanol
    SolventData {
        name: "methanol",
        cas: "67-56-1",
        molar_mass_g_per_mol: 32.04186,
        normal_boiling_point_k: 337.632,
        melting_point_k: 175.15,
        density: LinearFit {
            at_293_k: 791.4375272635662,
            slope_per_k: -0.971207212577999,
            info: ModelInfo {
                name: "methanol density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -11.90049524410071,
                b: 1307.2763938445237,
            },
            info: ModelInfo {
                name: "methanol viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.022587908391385306,
            slope_per_k: -8.507018777498408e-05,
            info: ModelInfo {
                name: "methanol surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 10.182920840570487,
            b: 1569.921885619938,
            c: -34.40738994573896,
            info: ModelInfo {
                name: "methanol vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // ethanol
    SolventData {
        name: "ethanol",
        cas: "64-17-5",
        molar_mass_g_per_mol: 46.06844,
        normal_boiling_point_k: 351.57,
        melting_point_k: 159.05,
        density: LinearFit {
            at_293_k: 790.0156579269051,
            slope_per_k: -0.906307996911582,
            info: ModelInfo {
                name: "ethanol density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -12.734544799719222,
                b: 1761.6677276600453,
            },
            info: ModelInfo {
                name: "ethanol viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.022404809408336144,
            slope_per_k: -8.503404186697556e-05,
            info: ModelInfo {
                name: "ethanol surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 10.194456912201312,
            b: 1577.4748069979998,
            c: -47.5975027686379,
            info: ModelInfo {
                name: "ethanol vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(433.15),
                }],
            },
        },
    },
    // 2-propanol
    SolventData {
        name: "2-propanol",
        cas: "67-63-0",
        molar_mass_g_per_mol: 60.09502,
        normal_boiling_point_k: 355.36,
        melting_point_k: 183.65,
        density: LinearFit {
            at_293_k: 787.5062865389577,
            slope_per_k: -1.0470187406847553,
            info: ModelInfo {
                name: "2-propanol density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -15.082378406412511,
                b: 2651.4765858940646,
            },
            info: ModelInfo {
                name: "2-propanol viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.021282011773972653,
            slope_per_k: -8.382662994743916e-05,
            info: ModelInfo {
                name: "2-propanol surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 10.099653323710504,
            b: 1487.1831386411739,
            c: -63.43243773611089,
            info: ModelInfo {
                name: "2-propanol vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method WAGNER_MCGARRY: Wagner equation, coefficients of McGarry, Ind. Eng. Chem. Process Des. Dev. 22 (1983) 313",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(373.15),
                }],
            },
        },
    },
    // acetonitrile
    SolventData {
        name: "acetonitrile",
        cas: "75-05-8",
        molar_mass_g_per_mol: 41.05192,
        normal_boiling_point_k: 354.75,
        melting_point_k: 226.65,
        density: LinearFit {
            at_293_k: 782.5126185052958,
            slope_per_k: -1.1127428338553953,
            info: ModelInfo {
                name: "acetonitrile density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -10.905999999999997,
                b: 872.0199999999988,
            },
            info: ModelInfo {
                name: "acetonitrile viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.028806036550293835,
            slope_per_k: -0.0001254382176183955,
            info: ModelInfo {
                name: "acetonitrile surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.563055056667766,
            b: 1530.4632171649969,
            c: -18.83439656448785,
            info: ModelInfo {
                name: "acetonitrile vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // acetone
    SolventData {
        name: "acetone",
        cas: "67-64-1",
        molar_mass_g_per_mol: 58.07914,
        normal_boiling_point_k: 329.225,
        melting_point_k: 178.35,
        density: LinearFit {
            at_293_k: 790.9412012247988,
            slope_per_k: -1.173194558739974,
            info: ModelInfo {
                name: "acetone density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -11.029447842045617,
                b: 886.0790342770115,
            },
            info: ModelInfo {
                name: "acetone viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.023304668733063888,
            slope_per_k: -0.00012289376497033974,
            info: ModelInfo {
                name: "acetone surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.311468848812968,
            b: 1247.6617668796557,
            c: -39.54176541024426,
            info: ModelInfo {
                name: "acetone vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(463.15),
                }],
            },
        },
    },
    // tetrahydrofuran (THF)
    SolventData {
        name: "tetrahydrofuran (THF)",
        cas: "109-99-9",
        molar_mass_g_per_mol: 72.10572,
        normal_boiling_point_k: 339.15,
        melting_point_k: 165.15,
        density: LinearFit {
            at_293_k: 885.884369452151,
            slope_per_k: -1.1158582345131902,
            info: ModelInfo {
                name: "tetrahydrofuran (THF) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -10.789331185517513,
                b: 923.152424958069,
            },
            info: ModelInfo {
                name: "tetrahydrofuran (THF) viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.02731000000000001,
            slope_per_k: -0.0001263333333333332,
            info: ModelInfo {
                name: "tetrahydrofuran (THF) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.117625520960413,
            b: 1200.6789862760163,
            c: -47.164274196048154,
            info: ModelInfo {
                name: "tetrahydrofuran (THF) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // 2-methyltetrahydrofuran (2-MeTHF)
    SolventData {
        name: "2-methyltetrahydrofuran (2-MeTHF)",
        cas: "96-47-9",
        molar_mass_g_per_mol: 86.1323,
        normal_boiling_point_k: 353.15,
        melting_point_k: 137.15,
        density: LinearFit {
            at_293_k: 854.5511850727669,
            slope_per_k: -1.1141254862042036,
            info: ModelInfo {
                name: "2-methyltetrahydrofuran (2-MeTHF) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "0.854 g/mL at 20 °C: English Wikipedia '2-Methyltetrahydrofuran'; relative temperature slope from the COSTALD estimate (Hankinson & Thomson 1979) via thermo",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -10.930075719908128,
                b: 943.014239308731,
            },
            info: ModelInfo {
                name: "2-methyltetrahydrofuran (2-MeTHF) viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "ESTIMATE: Letsou & Stiel corresponding states, AIChE J. 19 (1973) 409 (citation from memory), via thermo 0.6.1, times THF's measured/estimated ratio at each temperature (THF: DIPPR, Perry's 8th ed.); the same estimate reproduces MTBE's DIPPR viscosity within 7 %; no measured value could be read",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.023283516130360504,
            slope_per_k: -0.00011347226346626224,
            info: ModelInfo {
                name: "2-methyltetrahydrofuran (2-MeTHF) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method BROCK_BIRD: ESTIMATE: Brock & Bird corresponding-states method, AIChE J. 1 (1955) 174 (citation from memory); no measured value found - Brock-Bird checked on THF here: max deviation 1.1 %",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 8.950090000000003,
            b: 1175.5100000000018,
            c: -55.34799999999979,
            info: ModelInfo {
                name: "2-methyltetrahydrofuran (2-MeTHF) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method ANTOINE_POLING: Antoine coefficients of Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th ed. (2001), App. A",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(377.49),
                }],
            },
        },
    },
    // ethyl acetate
    SolventData {
        name: "ethyl acetate",
        cas: "141-78-6",
        molar_mass_g_per_mol: 88.10512,
        normal_boiling_point_k: 350.25,
        melting_point_k: 189.15,
        density: LinearFit {
            at_293_k: 900.2558681830286,
            slope_per_k: -1.243763870061867,
            info: ModelInfo {
                name: "ethyl acetate density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -11.313838828986917,
                b: 1063.8930627044776,
            },
            info: ModelInfo {
                name: "ethyl acetate viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.023717848296727184,
            slope_per_k: -0.00011982178147394564,
            info: ModelInfo {
                name: "ethyl acetate surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.2225758817713,
            b: 1244.4116431304312,
            c: -55.16226810388736,
            info: ModelInfo {
                name: "ethyl acetate vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method WAGNER_MCGARRY: Wagner equation, coefficients of McGarry, Ind. Eng. Chem. Process Des. Dev. 22 (1983) 313",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(289.0),
                    high: Some(473.15),
                }],
            },
        },
    },
    // toluene
    SolventData {
        name: "toluene",
        cas: "108-88-3",
        molar_mass_g_per_mol: 92.13842,
        normal_boiling_point_k: 383.746,
        melting_point_k: 179.2,
        density: LinearFit {
            at_293_k: 867.113803869635,
            slope_per_k: -0.9495739232875924,
            info: ModelInfo {
                name: "toluene density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -11.063356974028329,
                b: 1061.8994220516722,
            },
            info: ModelInfo {
                name: "toluene viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.028483702607335935,
            slope_per_k: -0.00011953912985600389,
            info: ModelInfo {
                name: "toluene surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.095168459077275,
            b: 1354.734986072624,
            c: -52.49665950442974,
            info: ModelInfo {
                name: "toluene vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // n-heptane
    SolventData {
        name: "n-heptane",
        cas: "142-82-5",
        molar_mass_g_per_mol: 100.20194,
        normal_boiling_point_k: 371.55,
        melting_point_k: 182.15,
        density: LinearFit {
            at_293_k: 684.2145645854654,
            slope_per_k: -0.8798342322787726,
            info: ModelInfo {
                name: "n-heptane density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -11.225666598938732,
                b: 1007.5660670117875,
            },
            info: ModelInfo {
                name: "n-heptane viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.020210798941552456,
            slope_per_k: -9.716318282231464e-05,
            info: ModelInfo {
                name: "n-heptane surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method REFPROP_FIT: library fit to the reference correlation as implemented in CoolProp/REFPROP",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.059963268878516,
            b: 1286.5160873980485,
            c: -54.23398498962709,
            info: ModelInfo {
                name: "n-heptane vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method HEOS_FIT: library fit to the reference equation of state as implemented in CoolProp",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // dichloromethane (DCM)
    SolventData {
        name: "dichloromethane (DCM)",
        cas: "75-09-2",
        molar_mass_g_per_mol: 84.93258,
        normal_boiling_point_k: 312.95,
        melting_point_k: 178.1,
        density: LinearFit {
            at_293_k: 1328.9776309311878,
            slope_per_k: -2.0065664225893673,
            info: ModelInfo {
                name: "dichloromethane (DCM) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -10.541951979607564,
                b: 819.9720750369307,
            },
            info: ModelInfo {
                name: "dichloromethane (DCM) viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.027980012665341617,
            slope_per_k: -0.00015940865460493638,
            info: ModelInfo {
                name: "dichloromethane (DCM) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method VDI_PPDS: VDI Heat Atlas, 2nd ed. (2010), ch. D3, PPDS equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.297976351544829,
            b: 1201.4794988092694,
            c: -33.47192110329017,
            info: ModelInfo {
                name: "dichloromethane (DCM) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method WAGNER_MCGARRY: Wagner equation, coefficients of McGarry, Ind. Eng. Chem. Process Des. Dev. 22 (1983) 313",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // N,N-dimethylformamide (DMF)
    SolventData {
        name: "N,N-dimethylformamide (DMF)",
        cas: "68-12-2",
        molar_mass_g_per_mol: 73.09378,
        normal_boiling_point_k: 425.95,
        melting_point_k: 212.15,
        density: LinearFit {
            at_293_k: 949.3922392651108,
            slope_per_k: -0.9472681857527581,
            info: ModelInfo {
                name: "N,N-dimethylformamide (DMF) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -10.6394201429016,
                b: 1050.9629873649667,
            },
            info: ModelInfo {
                name: "N,N-dimethylformamide (DMF) viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.03650835434102024,
            slope_per_k: -0.00013382861638460374,
            info: ModelInfo {
                name: "N,N-dimethylformamide (DMF) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.372601656452371,
            b: 1618.6001310668482,
            c: -54.26502697764141,
            info: ModelInfo {
                name: "N,N-dimethylformamide (DMF) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(453.15),
                }],
            },
        },
    },
    // dimethyl sulfoxide (DMSO)
    SolventData {
        name: "dimethyl sulfoxide (DMSO)",
        cas: "67-68-5",
        molar_mass_g_per_mol: 78.13344,
        normal_boiling_point_k: 465.05,
        melting_point_k: 291.55,
        density: LinearFit {
            at_293_k: 1101.2724921047907,
            slope_per_k: -0.9931521257670528,
            info: ModelInfo {
                name: "dimethyl sulfoxide (DMSO) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Vogel {
                a: -10.271670469187107,
                b: 851.3654959433676,
                c: 87.84913369862686,
            },
            info: ModelInfo {
                name: "dimethyl sulfoxide (DMSO) viscosity, Vogel",
                formula: VOGEL_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.04353043956826183,
            slope_per_k: -0.00011732113229752051,
            info: ModelInfo {
                name: "dimethyl sulfoxide (DMSO) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.78689814971474,
            b: 2011.058274989392,
            c: -43.10811983514188,
            info: ModelInfo {
                name: "dimethyl sulfoxide (DMSO) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(294.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // N-methyl-2-pyrrolidone (NMP)
    SolventData {
        name: "N-methyl-2-pyrrolidone (NMP)",
        cas: "872-50-4",
        molar_mass_g_per_mol: 99.13106,
        normal_boiling_point_k: 477.35,
        melting_point_k: 249.15,
        density: LinearFit {
            at_293_k: 1032.183617927525,
            slope_per_k: -0.8862069729999982,
            info: ModelInfo {
                name: "N-methyl-2-pyrrolidone (NMP) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "German Wikipedia 'N-Methyl-2-pyrrolidon', quadratic rho(T) (read on a mirror, primary source not checked); agrees with 1.034 g/mL at 20 °C, Danish EPA report 87-7614-055-5 (2003), App. 17",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -10.700121027460726,
                b: 1280.0,
            },
            info: ModelInfo {
                name: "N-methyl-2-pyrrolidone (NMP) viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "1.65 mPa·s at 25 °C: German Wikipedia 'N-Methyl-2-pyrrolidon'; temperature dependence B = 1280 K FROM MEMORY, unverified - check against Yang et al., J. Chem. Eng. Data 53 (2008) 1639",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.04120055059168254,
            slope_per_k: -0.00011310938851580116,
            info: ModelInfo {
                name: "N-methyl-2-pyrrolidone (NMP) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(337.88),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.180010000000001,
            b: 1655.29,
            c: -80.35500000000002,
            info: ModelInfo {
                name: "N-methyl-2-pyrrolidone (NMP) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method LANDOLT: Antoine coefficients from Landolt-Börnstein, as collected in chemicals",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(336.0),
                    high: Some(473.15),
                }],
            },
        },
    },
    // 1,4-dioxane
    SolventData {
        name: "1,4-dioxane",
        cas: "123-91-1",
        molar_mass_g_per_mol: 88.10512,
        normal_boiling_point_k: 374.35,
        melting_point_k: 284.95,
        density: LinearFit {
            at_293_k: 1034.5159813716493,
            slope_per_k: -1.1493055412904511,
            info: ModelInfo {
                name: "1,4-dioxane density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Vogel {
                a: -9.964752133465568,
                b: 588.6405507590324,
                c: 115.93692631095173,
            },
            info: ModelInfo {
                name: "1,4-dioxane viscosity, Vogel",
                formula: VOGEL_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.033549839713662065,
            slope_per_k: -0.00014074995209524608,
            info: ModelInfo {
                name: "1,4-dioxane surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.420036172790153,
            b: 1483.3766638146844,
            c: -38.51550118077603,
            info: ModelInfo {
                name: "1,4-dioxane vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(287.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // N,N-dimethylacetamide (DMAc)
    SolventData {
        name: "N,N-dimethylacetamide (DMAc)",
        cas: "127-19-5",
        molar_mass_g_per_mol: 87.12036,
        normal_boiling_point_k: 439.05,
        melting_point_k: 253.15,
        density: LinearFit {
            at_293_k: 941.9451388047601,
            slope_per_k: -0.9211827358838889,
            info: ModelInfo {
                name: "N,N-dimethylacetamide (DMAc) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "0.9372 g/mL at 25 °C FROM MEMORY (handbook value, not checked); relative temperature slope from the COSTALD estimate (Hankinson & Thomson 1979) via thermo",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -11.6787922142546,
                b: 1621.9161258966717,
            },
            info: ModelInfo {
                name: "N,N-dimethylacetamide (DMAc) viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method VISWANATH_NATARAJAN_3: Viswanath & Natarajan, Data Book on the Viscosity of Liquids (1989), three-term fit as collected in thermo",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.03505450913016062,
            slope_per_k: -0.00016031224899603388,
            info: ModelInfo {
                name: "N,N-dimethylacetamide (DMAc) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(298.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 7.884548324858215,
            b: 911.2170911704663,
            c: -122.2896827566225,
            info: ModelInfo {
                name: "N,N-dimethylacetamide (DMAc) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method ANTOINE_WEBBOOK: Antoine coefficients of the NIST Chemistry WebBook, as collected in chemicals (30-90 °C), refitted here together with the normal boiling point (chemicals); the two disagree: the fit is 6.2 % off the WebBook values and 0.5 % off 1 atm at the boiling point",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(303.15),
                    high: Some(439.05),
                }],
            },
        },
    },
    // methyl tert-butyl ether (MTBE)
    SolventData {
        name: "methyl tert-butyl ether (MTBE)",
        cas: "1634-04-4",
        molar_mass_g_per_mol: 88.14818,
        normal_boiling_point_k: 328.25,
        melting_point_k: 164.15,
        density: LinearFit {
            at_293_k: 741.5934527341377,
            slope_per_k: -1.0752450237090252,
            info: ModelInfo {
                name: "methyl tert-butyl ether (MTBE) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -11.351745795169174,
                b: 1001.1075377065303,
            },
            info: ModelInfo {
                name: "methyl tert-butyl ether (MTBE) viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.018523312723337043,
            slope_per_k: -0.00010732098595639798,
            info: ModelInfo {
                name: "methyl tert-butyl ether (MTBE) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method BROCK_BIRD: ESTIMATE: Brock & Bird corresponding-states method, AIChE J. 1 (1955) 174 (citation from memory); thermo's VDI Heat Atlas table covers only 58-230 °C: Brock-Bird is within 2.3 % of it at 59-80 °C",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 8.961982533706834,
            b: 1094.4716792545066,
            c: -51.58102921894798,
            info: ModelInfo {
                name: "methyl tert-butyl ether (MTBE) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // cyclopentyl methyl ether (CPME)
    SolventData {
        name: "cyclopentyl methyl ether (CPME)",
        cas: "5614-37-9",
        molar_mass_g_per_mol: 100.15888,
        normal_boiling_point_k: 378.59,
        melting_point_k: 133.15,
        density: LinearFit {
            at_293_k: 860.4061997613765,
            slope_per_k: -1.0197848991261782,
            info: ModelInfo {
                name: "cyclopentyl methyl ether (CPME) density, linear in T",
                formula: DENSITY_FORMULA,
                source: "0.86 g/mL at 20 °C FROM MEMORY (maker's data sheet, not checked); relative temperature slope from the COSTALD estimate (Hankinson & Thomson 1979) via thermo",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -10.544057725982329,
                b: 897.7597171490863,
            },
            info: ModelInfo {
                name: "cyclopentyl methyl ether (CPME) viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "ESTIMATE: Letsou & Stiel corresponding states, AIChE J. 19 (1973) 409 (citation from memory), via thermo 0.6.1, times THF's measured/estimated ratio at each temperature (THF: DIPPR, Perry's 8th ed.); the same estimate reproduces MTBE's DIPPR viscosity within 7 %; no measured value could be read",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.02643086217375155,
            slope_per_k: -0.00011345662690465666,
            info: ModelInfo {
                name: "cyclopentyl methyl ether (CPME) surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(333.25),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.177258413256911,
            b: 1352.0147055372431,
            c: -55.196656446627564,
            info: ModelInfo {
                name: "cyclopentyl methyl ether (CPME) vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method AMBROSE_WALTON: ESTIMATE: Ambrose & Walton corresponding-states vapour pressure, Pure Appl. Chem. 61 (1989) 1395 (citation from memory), from the critical constants and acentric factor in chemicals",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(273.15),
                    high: Some(473.15),
                }],
            },
        },
    },
    // tert-butanol
    SolventData {
        name: "tert-butanol",
        cas: "75-65-0",
        molar_mass_g_per_mol: 74.1216,
        normal_boiling_point_k: 355.45,
        melting_point_k: 298.35,
        density: LinearFit {
            at_293_k: 789.977645465828,
            slope_per_k: -1.186471758084013,
            info: ModelInfo {
                name: "tert-butanol density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(299.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Vogel {
                a: -10.632369964182768,
                b: 456.7010132922555,
                c: 211.04995048087144,
            },
            info: ModelInfo {
                name: "tert-butanol viscosity, Vogel",
                formula: VOGEL_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(299.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.020572956713690017,
            slope_per_k: -9.741045891400045e-05,
            info: ModelInfo {
                name: "tert-butanol surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(299.15),
                    high: Some(333.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.25746132407349,
            b: 1063.9804239117068,
            c: -105.2478604004299,
            info: ModelInfo {
                name: "tert-butanol vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method WAGNER_POLING: Wagner equation, coefficients of Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th ed. (2001)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(301.15),
                    high: Some(433.15),
                }],
            },
        },
    },
    // acetic acid
    SolventData {
        name: "acetic acid",
        cas: "64-19-7",
        molar_mass_g_per_mol: 60.05196,
        normal_boiling_point_k: 391.05,
        melting_point_k: 289.85,
        density: LinearFit {
            at_293_k: 1047.584016008239,
            slope_per_k: -1.0590172342704365,
            info: ModelInfo {
                name: "acetic acid density, linear in T",
                formula: DENSITY_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        viscosity: ViscosityFit {
            form: ViscosityForm::Andrade {
                a: -11.2114986942576,
                b: 1315.8592066383821,
            },
            info: ModelInfo {
                name: "acetic acid viscosity, Andrade",
                formula: ANDRADE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method DIPPR_PERRY_8E: Perry's Chemical Engineers' Handbook, 8th ed. (2008), DIPPR equations",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        surface_tension: LinearFit {
            at_293_k: 0.027498252448341202,
            slope_per_k: -9.733774658317661e-05,
            info: ModelInfo {
                name: "acetic acid surface tension, linear in T",
                formula: SURFACE_TENSION_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method Fit 2023: thermo author's 2023 fit to literature data (provenance weaker)",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(293.15),
                    high: Some(353.15),
                }],
            },
        },
        vapour_pressure: AntoineFit {
            a: 9.780306499473987,
            b: 1700.5963795720927,
            c: -34.773473885435045,
            info: ModelInfo {
                name: "acetic acid vapour pressure, Antoine",
                formula: ANTOINE_FORMULA,
                source: "thermo 0.6.1 / chemicals 1.5.2 method WAGNER_MCGARRY: Wagner equation, coefficients of McGarry, Ind. Eng. Chem. Process Des. Dev. 22 (1983) 313",
                validity: &[ValidityBound {
                    quantity: "temperature",
                    dimension: Dimension::Temperature,
                    low: Some(304.0),
                    high: Some(473.15),
                }],
            },
        },
    },
];
