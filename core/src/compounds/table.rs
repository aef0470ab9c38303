//! The compound library, as data: one row per compound, every number with its source.
//!
//! Conventions used throughout:
//! - Molar masses are from IUPAC atomic weights (computed with chemicals 1.5.2), in kg/mol.
//! - "CRC" means CRC Handbook of Chemistry and Physics, *Physical Constants of Organic
//!   Compounds*, as tabulated in chemicals 1.5.2. That table stores a density together with its
//!   measurement temperature; the decoded value and temperature are given here.
//! - Vapour-pressure coefficients are copied exactly from the published set named in
//!   `vapour_pressure_source` (as stored in chemicals 1.5.2; NIST WebBook sets converted back to
//!   the WebBook's own form log10(p/bar) = A - B/(T/K + C) by A = A'/ln 10 - 5, B = B'/ln 10,
//!   except the α-terpineol and geranyl acetate rows, kept in thermo 0.6.1's ln(p/Pa) form).
//!   Where the sets stored in chemicals 1.5.2 and thermo 0.6.1 differ by more than 10 % at
//!   100 °C, the row says so and its uncertainty carries the spread.
//!   `t_min_k`..`t_max_k` is the range the authors fitted.
//! - `relative_uncertainty` of a measured set used inside its range is 0.02-0.05: that figure is
//!   common practice, no source. Larger figures are explained in the row.
//! - Compounds with no published correlation get a two-point Antoine in the form
//!   ln(p/Pa) = A - B/(T/K + C) with an assumed C = -43 K (a value typical of the published
//!   terpenoid sets above: cineole -43.6, geraniol -42.4, estragole -41.9). The two points, C and
//!   the resulting A and B are written beside each such row; the fitted range is the span
//!   between the two points. Every such law is checked against a measured point it was not
//!   fitted to (`tests/tests/reference_estimated_laws.rs`), and its uncertainty covers the gap.
//! - A C10H16 hydrocarbon with no published set (sabinene, α-terpinene) gets the isomer-shifted
//!   estimate: the measured C10H16 set nearest in boiling point, times the constant that makes
//!   it boil at the compound's handbook boiling point. The same construction tried on the
//!   table's measured C10H16 sets bounds its error (same test file).
//! - Landolt-Börnstein sets not used because they contradict the handbook boiling point:
//!   geranyl acetate (105-87-3, C = +23.8 K, boils at 469 K against 513 K), citronellyl
//!   acetate (490 K against 502-514 K), pulegone (491 K against 497 K) and citral 5392-40-5
//!   (a 284-312 K fit that boils at 479 K against 502 K); evaluated with chemicals 1.5.2.
//! - Water solubilities marked "from memory" were not checked against a source; they carry a
//!   relative uncertainty of 0.5. Every solubility is a value near 25 °C and is used as is at the
//!   hydrosol's temperature: no temperature dependence was obtained for any compound here.
//!   Martins et al. (Fluid Phase Equilib. 2017) measured geraniol, linalool, citronellol,
//!   thymol, eugenol, carvacrol and p-cymene at 298-323 K and report dissolution as endothermic
//!   (solubility rising with temperature), but their values were not seen, so none is applied;
//!   the dissolved oil of a warm receiver is therefore, if anything, understated.

use super::*;

/// Every compound of the library.
pub static COMPOUNDS: &[Compound] = &[
    // ---------------------------------------------------------------- monoterpene hydrocarbons
    Compound {
        id: "alpha-pinene",
        name: "α-Pinene",
        cas: "80-56-8",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 853.9,
        density_temperature_c: 25.0,
        normal_boiling_point_k: 429.45,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 430 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 3.92161, b: 1411.868995, c: -68.817 },
            t_min_k: 292.59,
            t_max_k: 428.91,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 292.59-428.91 K (as stored in chemicals 1.5.2, converted to log10 bar)"
        ),
        water_solubility_kg_per_m3: 0.0025,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 2.5 mg/L near 25 °C, from memory; within the 5-30 mg/L measured for terpene hydrocarbons by Fichan, Larroche & Gros, J. Chem. Eng. Data 44 (1999) 56-62; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8539 g/cm³ at 25 °C"
        ),
    },
    Compound {
        id: "beta-pinene",
        name: "β-Pinene",
        cas: "127-91-3",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 860.0,
        density_temperature_c: 25.0,
        normal_boiling_point_k: 438.95,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2)"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 3.94631, b: 1465.028984, c: -67.626 },
            t_min_k: 291.86,
            t_max_k: 439.06,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 291.86-439.06 K (as stored in chemicals 1.5.2, converted to log10 bar)"
        ),
        water_solubility_kg_per_m3: 0.0049,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 4.9 mg/L near 25 °C, from memory; within the 5-30 mg/L measured for terpene hydrocarbons by Fichan, Larroche & Gros, J. Chem. Eng. Data 44 (1999) 56-62; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.860 g/cm³ at 25 °C"
        ),
    },
    Compound {
        id: "d-limonene",
        name: "d-Limonene",
        cas: "5989-27-5",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 841.1,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 450.75,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 450 ± 2 K. The enantiomers and the racemate (dipentene) share these values"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.471987, b: 4697.952852, c: -19.639 },
            t_min_k: 290.0,
            t_max_k: 450.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 290-450 K (as stored in chemicals 1.5.2); agrees with the 200 Pa at 298 K measured by Espinosa Díaz et al., Fluid Phase Equilib. (1999)"
        ),
        water_solubility_kg_per_m3: 0.0138,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 13.8 mg/L at 25 °C (measured by Massaldi & King, 1973; the number itself from memory); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8411 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "myrcene",
        name: "Myrcene",
        cas: "123-35-3",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 801.3,
        density_temperature_c: 15.0,
        normal_boiling_point_k: 444.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 440.2 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 4.56112, b: 1849.102, c: -38.899 },
            t_min_k: 287.7,
            t_max_k: 444.7,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 287.7-444.7 K (as stored in chemicals 1.5.2, converted to log10 bar)"
        ),
        water_solubility_kg_per_m3: 0.005,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 4-6 mg/L near 25 °C, from memory (5 mg/L taken); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8013 g/cm³ at 15 °C"
        ),
    },
    Compound {
        id: "p-cymene",
        name: "p-Cymene",
        cas: "99-87-6",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.134218,
        liquid_density_kg_per_m3: 857.3,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 450.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 450 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Pa { a: 9.17215, b: 1606.89, c: -64.58 },
            t_min_k: 338.28,
            t_max_k: 479.6,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th ed., Antoine, 338.28-479.6 K (as stored in chemicals 1.5.2); the same curve as the Landolt-Börnstein IV/20 set"
        ),
        water_solubility_kg_per_m3: 0.023,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 23 mg/L near 25 °C, from memory (measured at 298-323 K by Martins et al., Fluid Phase Equilib. 2017; their values not seen); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8573 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "gamma-terpinene",
        name: "γ-Terpinene",
        cas: "99-85-4",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 849.2,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 456.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 456.2 K"
        ),
        // No published correlation. Two-point Antoine, C = -43 K, through
        //   (456.15 K, 101325 Pa)  normal boiling point (CRC) and
        //   (373.15 K, 7470 Pa)    Lee-Kesler corresponding-states estimate (computed with
        //                          chemicals 1.5.2: Tc 661.0 K, Pc 28.00 bar, omega 0.373 fitted
        //                          so that the estimate boils at Tb).
        //   B = ln(101325/7470)/(1/330.15 - 1/413.15) = 4285.0410, A = ln 7470 + B/330.15 = 21.897724.
        // The same Lee-Kesler procedure is within 4 % of the measured α-pinene set at 100 °C, so
        // 0.1 for this hydrocarbon (judgement from that one check, no source). No measured
        // reduced-pressure point was found; the law's slope is checked against ΔHvap 51.4 kJ/mol
        // at 298 K (Gharagheizi compilation in chemicals 1.5.2) in reference_estimated_laws.rs.
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 21.897724, b: 4285.0410, c: -43.0 },
            t_min_k: 373.15,
            t_max_k: 456.15,
            relative_uncertainty: 0.1,
            confidence: Confidence::Estimated,
        },
        vapour_pressure_source: source!(
            "Estimate: two-point Antoine (C = -43 K) through Tb 456.15 K (CRC Handbook) and the Lee-Kesler estimate 7470 Pa at 373.15 K (computed with chemicals 1.5.2, Tc/Pc from its tables); no measured correlation found"
        ),
        water_solubility_kg_per_m3: 0.009,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 9 mg/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.849 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "camphene",
        name: "Camphene",
        cas: "79-92-5",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 842.0,
        density_temperature_c: 54.0,
        normal_boiling_point_k: 433.96,
        boiling_point_source: source!(
            "431.65 K (CAS Common Chemistry, as tabulated in chemicals 1.5.2) to 433.65 K (Yaws, same); the law below boils at 433.96 K. Melts near 50 °C (from memory): a liquid in the still"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.333832, b: 4299.508923, c: -36.143 },
            t_min_k: 323.0,
            t_max_k: 434.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 323-434 K (as stored in chemicals 1.5.2); the NIST WebBook set (thermo 0.6.1) agrees within 0.2 % at 100 °C"
        ),
        water_solubility_kg_per_m3: 0.0046,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 4.6 mg/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: about 0.842 g/cm³ for the liquid at 54 °C, from memory"
        ),
    },
    Compound {
        id: "terpinolene",
        name: "Terpinolene",
        cas: "586-62-9",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 863.2,
        density_temperature_c: 15.0,
        normal_boiling_point_k: 460.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 458 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.747768, b: 4622.826408, c: -46.738 },
            t_min_k: 313.0,
            t_max_k: 458.0,
            // The NIST WebBook set (313.7-452.1 K, as stored in thermo 0.6.1) gives 6758 Pa at
            // 100 °C against this set's 5352, 26.3 % more, though it boils at 463.4 K, 3-5 K over
            // the handbooks; this set reproduces the boiling point. 0.27 carries the spread.
            relative_uncertainty: 0.27,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 313-458 K (as stored in chemicals 1.5.2); the NIST WebBook set is 26 % higher at 100 °C"
        ),
        water_solubility_kg_per_m3: 0.0095,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 9.5 mg/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8632 g/cm³ at 15 °C"
        ),
    },
    Compound {
        id: "delta-3-carene",
        name: "δ-3-Carene",
        cas: "13466-78-9",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 867.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 445.04,
        boiling_point_source: source!(
            "NIST WebBook 445.04 K (as tabulated in chemicals 1.5.2); CAS Common Chemistry 443.15 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 20.486537, b: 3255.012575, c: -81.627 },
            t_min_k: 362.0,
            t_max_k: 445.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 362-445 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 0.005,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 5 mg/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: about 0.867 g/cm³ at 20 °C, from memory"
        ),
    },
    Compound {
        id: "alpha-phellandrene",
        name: "α-Phellandrene",
        cas: "99-83-2",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 841.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 448.05,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); CAS Common Chemistry 445.15 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.141912, b: 4285.873014, c: -44.643 },
            t_min_k: 315.0,
            t_max_k: 448.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 315-448 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 0.005,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 5 mg/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8410 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "sabinene",
        name: "Sabinene",
        cas: "3387-41-5",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 844.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 436.85,
        boiling_point_source: source!(
            "Yaws 436.85 K (as tabulated in chemicals 1.5.2); NIST WebBook 436.70 K, CAS Common Chemistry 437.15 K"
        ),
        // No measured vapour-pressure set in chemicals 1.5.2 or thermo 0.6.1. Estimate: the
        // isomer-shifted law. The measured C10H16 set nearest in boiling point (β-pinene's NIST
        // WebBook Antoine, b = 1465.028984, c = -67.626, log10 bar) keeps its shape and its A is
        // moved so that it boils at sabinene's 436.85 K: A = log10(1.01325) + b/(Tb + c) =
        // 3.973576. The same construction tried on the table's measured C10H16 sets misses by up
        // to 42 % at 100 °C (tests/tests/reference_estimated_laws.rs); 0.45 covers that.
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 3.973576, b: 1465.028984, c: -67.626 },
            t_min_k: 291.86,
            t_max_k: 439.06,
            relative_uncertainty: 0.45,
            confidence: Confidence::Estimated,
        },
        vapour_pressure_source: source!(
            "Estimate: β-pinene's NIST WebBook Antoine (as stored in chemicals 1.5.2) shifted to sabinene's handbook boiling point, 436.85 K (Yaws via chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 0.005,
        water_solubility_relative_uncertainty: 1.0,
        water_solubility_source: source!(
            "Estimate: about 5 mg/L near 25 °C, as for the other C10H16 hydrocarbons (5-30 mg/L measured for terpene hydrocarbons by Fichan, Larroche & Gros, J. Chem. Eng. Data 44 (1999) 56-62); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: about 0.844 g/cm³ at 20 °C, from memory"
        ),
    },
    Compound {
        id: "alpha-terpinene",
        name: "α-Terpinene",
        cas: "99-86-5",
        class: CompoundClass::MonoterpeneHydrocarbon,
        molar_mass_kg_per_mol: 0.136234,
        liquid_density_kg_per_m3: 837.5,
        density_temperature_c: 19.0,
        normal_boiling_point_k: 447.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook 447.20 K, CAS Common Chemistry and Yaws 448.15 K"
        ),
        // No measured vapour-pressure set in chemicals 1.5.2 or thermo 0.6.1. Estimate: the
        // isomer-shifted law (as for sabinene). The measured C10H16 set nearest in boiling point
        // is α-phellandrene's Landolt-Börnstein Antoine (b = 4285.873014, c = -44.643, ln Pa),
        // another p-menthadiene; A moved so that it boils at the CRC 447.15 K: A = ln(101325) +
        // b/(Tb + c) = 22.174035. 0.45 as for sabinene.
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.174035, b: 4285.873014, c: -44.643 },
            t_min_k: 315.0,
            t_max_k: 448.0,
            relative_uncertainty: 0.45,
            confidence: Confidence::Estimated,
        },
        vapour_pressure_source: source!(
            "Estimate: α-phellandrene's Landolt-Börnstein IV/20 Antoine (as stored in chemicals 1.5.2) shifted to α-terpinene's CRC boiling point, 447.15 K"
        ),
        water_solubility_kg_per_m3: 0.005,
        water_solubility_relative_uncertainty: 1.0,
        water_solubility_source: source!(
            "Estimate: about 5 mg/L near 25 °C, as for the other C10H16 hydrocarbons (5-30 mg/L measured for terpene hydrocarbons by Fichan, Larroche & Gros, J. Chem. Eng. Data 44 (1999) 56-62); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8375 g/cm³ at 19 °C (temperature read from the table's encoding)"
        ),
    },
    // ---------------------------------------------------------------- oxygenated monoterpenes
    Compound {
        id: "1-8-cineole",
        name: "1,8-Cineole (eucalyptol)",
        cas: "470-82-6",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.154249,
        liquid_density_kg_per_m3: 926.7,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 449.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 449.5 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 21.593021, b: 4082.497185, c: -43.648 },
            t_min_k: 288.0,
            t_max_k: 449.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 288-449 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 3.5,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 3.5 g/L at 21 °C, from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.9267 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "linalool",
        name: "Linalool",
        cas: "78-70-6",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.154249,
        liquid_density_kg_per_m3: 870.0,
        density_temperature_c: 15.0,
        normal_boiling_point_k: 471.77,
        boiling_point_source: source!(
            "NIST Chemistry WebBook (as tabulated in chemicals 1.5.2); 198-199 °C in common handbooks"
        ),
        // No published correlation found. Two-point Antoine, C = -43 K, through
        //   (298.15 K, 27 Pa)      measured, Espinosa Díaz, Guetachew, Landy, Jose & Voilley,
        //                          Fluid Phase Equilib. (1999), and
        //   (471.77 K, 101325 Pa)  normal boiling point, NIST WebBook.
        //   B = ln(101325/27)/(1/255.15 - 1/428.77) = 5186.0097, A = ln 27 + B/255.15 = 23.621174.
        //   Gives 2733 Pa at 100 °C (2418 Pa with C = 0, 2895 Pa with C = -60).
        // 0.15: about the spread between C = 0 and C = -60 at 100 °C (judgement, no source).
        // No wide-range published set was found: chemicals 1.5.2 and thermo 0.6.1 carry none for
        // linalool, and the Antoine constants Espinosa Díaz et al. fitted over 223-468 K were not
        // seen (abstract only). Checked against points the fit did not use: bp 194-197 °C at
        // 720 mmHg and 0.17 mmHg at 25 °C (supplier data quoted by ChemicalBook), and
        // ΔHvap 60.2 kJ/mol at 298 K (Gharagheizi compilation in chemicals 1.5.2); see
        // tests/tests/reference_estimated_laws.rs.
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 23.621174, b: 5186.0097, c: -43.0 },
            t_min_k: 298.15,
            t_max_k: 471.77,
            relative_uncertainty: 0.15,
            confidence: Confidence::FittedToPublishedPoints,
        },
        vapour_pressure_source: source!(
            "Two-point Antoine (assumed C = -43 K) through 27 Pa at 298.15 K (Espinosa Díaz et al., Fluid Phase Equilib. 1999) and Tb 471.77 K (NIST WebBook)"
        ),
        water_solubility_kg_per_m3: 1.59,
        water_solubility_relative_uncertainty: 0.1,
        water_solubility_source: source!(
            "1.6 g/L at 25 °C (International Chemical Safety Card, as quoted by French Wikipedia); 1.589 g/L (English Wikipedia infobox); 1.45 g/L (ChemicalBook); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: 0.870 g/cm³ at 15 °C (Frontiers in Bioengineering and Biotechnology, 2020, Table 1); 0.87 at 25 °C (ChemicalBook)"
        ),
    },
    Compound {
        id: "linalyl-acetate",
        name: "Linalyl acetate",
        cas: "115-95-7",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.196286,
        liquid_density_kg_per_m3: 895.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 494.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 493.2 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 4.77892, b: 2093.912019, c: -54.798 },
            t_min_k: 328.6,
            t_max_k: 493.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 328.6-493 K (as stored in chemicals 1.5.2, converted to log10 bar); the Landolt-Börnstein IV/20 set agrees within 0.3 % at 100 °C"
        ),
        water_solubility_kg_per_m3: 0.02,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.01-0.03 g/L, from memory (low confidence; 0.02 taken); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8950 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "camphor",
        name: "Camphor",
        cas: "76-22-2",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.152233,
        liquid_density_kg_per_m3: 990.0,
        density_temperature_c: 25.0,
        normal_boiling_point_k: 482.3,
        boiling_point_source: source!(
            "NIST Chemistry WebBook (as tabulated in chemicals 1.5.2); CAS Common Chemistry gives 477 K"
        ),
        // The set is for the liquid (451-506 K). Camphor melts near 175-179 °C (from memory), so
        // at 95-100 °C it is a solid and its real (sublimation) pressure is lower than this
        // extrapolation: 0.3 is a judgement, no source.
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 3.30967, b: 1096.290994, c: -148.579 },
            t_min_k: 451.2,
            t_max_k: 505.5,
            relative_uncertainty: 0.3,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine for the liquid, 451.2-505.5 K (as stored in chemicals 1.5.2, converted to log10 bar); extrapolated below its range near 100 °C, where camphor is solid"
        ),
        water_solubility_kg_per_m3: 1.6,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 1.6 g/L near 25 °C, from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: about 0.99 g/cm³ for the solid at 25 °C, from memory (no liquid value)"
        ),
    },
    Compound {
        id: "menthol",
        name: "Menthol (DL)",
        cas: "89-78-1",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.156265,
        liquid_density_kg_per_m3: 903.0,
        density_temperature_c: 15.0,
        normal_boiling_point_k: 487.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds, for l-menthol 2216-51-5 (as tabulated in chemicals 1.5.2); NIST WebBook gives 489.6 K and CAS Common Chemistry 485.15 K for DL-menthol"
        ),
        // The DL (unspecified) set is used for the menthol of mint oils (l-menthol) too: it is the
        // one whose range covers 95-100 °C (the Landolt-Börnstein l-menthol set starts at 372 K).
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 5.38347, b: 2405.946003, c: -37.853 },
            t_min_k: 329.0,
            t_max_k: 485.0,
            relative_uncertainty: 0.05, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine for DL-menthol (89-78-1), 329-485 K (as stored in chemicals 1.5.2, converted to log10 bar); the Landolt-Börnstein IV/20 l-menthol set (372-487 K) is 6 % higher at 100 °C"
        ),
        water_solubility_kg_per_m3: 0.45,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.43-0.46 g/L near 25 °C, from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, l-menthol (supercooled liquid) 0.9030 g/cm³ at 15 °C, taken for the DL liquid"
        ),
    },
    Compound {
        id: "menthone",
        name: "Menthone (l-)",
        cas: "14073-97-3",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.154249,
        liquid_density_kg_per_m3: 895.4,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 480.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2)"
        ),
        // No published correlation. Two-point Antoine, C = -43 K, through
        //   (480.15 K, 101325 Pa)  normal boiling point (CRC) and
        //   (373.15 K, 4179 Pa)    Lee-Kesler corresponding-states estimate (computed with
        //                          chemicals 1.5.2: Tc 710.0 K, Pc 27.50 bar, omega 0.279).
        //   B = ln(101325/4179)/(1/330.15 - 1/437.15) = 4300.4302, A = ln 4179 + B/330.15 = 21.363513.
        // The same procedure is off by +31 % (cineole), +60 % (geraniol) and -48 % (thymol) at
        // 100 °C against measured sets, hence 0.3 (judgement from that check, no source).
        // Checked against 67 Pa at 20 °C for (-)-menthone (German Wikipedia infobox, a supplier
        // value), which the fit did not use: the law gives 65 Pa (reference_estimated_laws.rs).
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 21.363513, b: 4300.4302, c: -43.0 },
            t_min_k: 373.15,
            t_max_k: 480.15,
            relative_uncertainty: 0.3,
            confidence: Confidence::Estimated,
        },
        vapour_pressure_source: source!(
            "Estimate: two-point Antoine (C = -43 K) through Tb 480.15 K (CRC Handbook) and the Lee-Kesler estimate 4179 Pa at 373.15 K (computed with chemicals 1.5.2, Tc/Pc from its tables); no measured correlation found"
        ),
        water_solubility_kg_per_m3: 0.69,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.69 g/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8954 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "citronellal",
        name: "Citronellal",
        cas: "106-23-0",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.154249,
        liquid_density_kg_per_m3: 853.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 478.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 481 K"
        ),
        // No published correlation. Two-point Antoine, C = -43 K, through
        //   (352.65 K, 933 Pa)     bp 79-80 °C at 7 mmHg (as listed by benchchem.com for
        //                          (R)-citronellal, citing the literature; low weight) and
        //   (478.15 K, 101325 Pa)  normal boiling point (CRC).
        //   B = ln(101325/933)/(1/309.65 - 1/435.15) = 5032.6778, A = ln 933 + B/309.65 = 23.091475.
        // 2560 Pa at 100 °C. The corresponding-states estimate used before (3553 Pa) put the 7 mmHg
        // boiling point at 71 °C and 2104 Pa at 88 °C, against the 1400 Pa (14 hPa at 88 °C) a
        // supplier lists (ChemicalBook); this law gives 1441 Pa there (checked in
        // tests/tests/reference_estimated_laws.rs). 0.2: both points are of low weight (judgement).
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 23.091475, b: 5032.6778, c: -43.0 },
            t_min_k: 352.65,
            t_max_k: 478.15,
            relative_uncertainty: 0.2,
            confidence: Confidence::FittedToPublishedPoints,
        },
        vapour_pressure_source: source!(
            "Two-point Antoine (assumed C = -43 K) through bp 79-80 °C at 7 mmHg (benchchem.com, citing the literature; low weight) and Tb 478.15 K (CRC Handbook); no published correlation found"
        ),
        water_solubility_kg_per_m3: 0.1,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.04-0.2 g/L near 25 °C, from memory (low confidence; 0.1 taken); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.853 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "terpinen-4-ol",
        name: "Terpinen-4-ol",
        cas: "562-74-3",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.154249,
        liquid_density_kg_per_m3: 926.2,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 482.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2)"
        ),
        // No published correlation and no reduced-pressure boiling point found. Antoine with
        // C = -43 K through the normal boiling point and with the slope of the enthalpy of
        // vaporisation 55.5 kJ/mol at 298.15 K (Gharagheizi et al. compilation, as tabulated in
        // chemicals 1.5.2; a DIPPR-based value that may itself be an estimate):
        //   ΔH = R B T²/(T + C)²  ->  B = 55500/(R (298.15/255.15)²) = 4888.5529,
        //   A = ln 101325 + B/(482.15 - 43) = 22.657941; 2568 Pa at 100 °C.
        // The Lee-Kesler estimate used before (4966 Pa at 100 °C) implies 45.5 kJ/mol, 18 % under
        // the compiled value; the same estimate runs 60 % high for geraniol against its measured
        // set, as expected for an alcohol. The same construction applied to 15 compounds with
        // measured sets lands -49 % to +22 % at 100 °C, and 17-49 % low for the four alcohols
        // and phenols among them (thymol, 2-phenylethanol, benzyl alcohol, eugenol); checked in
        // tests/tests/reference_estimated_laws.rs. Hence 0.5, and the true value is more likely
        // above this law than below. No measured pressure was found to check it directly.
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.657941, b: 4888.5529, c: -43.0 },
            t_min_k: 298.15,
            t_max_k: 482.15,
            relative_uncertainty: 0.5,
            confidence: Confidence::Estimated,
        },
        vapour_pressure_source: source!(
            "Estimate: Antoine (C = -43 K) through Tb 482.15 K (CRC Handbook) with the slope of ΔHvap 55.5 kJ/mol at 298 K (Gharagheizi et al. compilation, as tabulated in chemicals 1.5.2); no measured vapour pressure found"
        ),
        water_solubility_kg_per_m3: 0.7,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.4-1 g/L near 25 °C, from memory (low confidence; 0.7 taken); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.926 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "carvone",
        name: "Carvone (l-)",
        cas: "6485-40-1",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.150218,
        liquid_density_kg_per_m3: 959.3,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 504.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds, (R)-carvone (as tabulated in chemicals 1.5.2); NIST WebBook gives 502.8 K for unspecified carvone"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 5.02972, b: 2348.261012, c: -33.473 },
            t_min_k: 330.6,
            t_max_k: 500.7,
            relative_uncertainty: 0.1, // its boiling point is 1.9 K under the handbook values
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine for carvone (99-49-0, stereoisomer unspecified), 330.6-500.7 K (as stored in chemicals 1.5.2, converted to log10 bar); the Landolt-Börnstein IV/20 set agrees within 0.3 % at 100 °C. Enantiomers share the curve"
        ),
        water_solubility_kg_per_m3: 1.3,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 1.3 g/L near 25 °C, from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, (R)-carvone 0.9593 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "geranial",
        name: "Geranial ((E)-citral)",
        cas: "141-27-5",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.152233,
        liquid_density_kg_per_m3: 888.8,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 502.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2)"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 23.289405, b: 5443.826939, c: -38.879 },
            t_min_k: 334.0,
            t_max_k: 501.0,
            relative_uncertainty: 0.05, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for 3,7-dimethyl-2,6-octadienal, 334-501 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 0.6,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.6 g/L near 20 °C for citral, from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8888 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "thymol",
        name: "Thymol",
        cas: "89-83-8",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.150218,
        liquid_density_kg_per_m3: 970.0,
        density_temperature_c: 25.0,
        normal_boiling_point_k: 506.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 506 K; melts at 322.75 K (CRC)"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 5.29395, b: 2522.332016, c: -28.575 },
            t_min_k: 337.5,
            t_max_k: 505.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 337.5-505 K (as stored in chemicals 1.5.2, converted to log10 bar)"
        ),
        water_solubility_kg_per_m3: 0.9,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.90 g/L at 20 °C, from memory (measured at 298-323 K by Martins et al., Fluid Phase Equilib. 2017; their values not seen); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, supercooled liquid 0.970 g/cm³ at 25 °C"
        ),
    },
    Compound {
        id: "carvacrol",
        name: "Carvacrol",
        cas: "499-75-2",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.150218,
        liquid_density_kg_per_m3: 977.2,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 514.65,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 510 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 5.34179, b: 2549.856992, c: -32.705 },
            t_min_k: 343.0,
            t_max_k: 510.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 343-510 K (as stored in chemicals 1.5.2, converted to log10 bar)"
        ),
        water_solubility_kg_per_m3: 1.25,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 1.25 g/L near 25 °C, from memory (measured at 298-323 K by Martins et al., Fluid Phase Equilib. 2017; their values not seen); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.9772 g/cm³ at 20 °C (temperature read from the table's encoding, ±0.001 g/cm³)"
        ),
    },
    Compound {
        id: "bornyl-acetate",
        name: "Bornyl acetate",
        cas: "76-49-3",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.196286,
        liquid_density_kg_per_m3: 982.0,
        density_temperature_c: 25.0,
        normal_boiling_point_k: 496.65,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds, l-bornyl acetate 496.65 K (as tabulated in chemicals 1.5.2); 494.15 K (CAS Common Chemistry) to 501.15 K (CRC, endo-racemate)"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.272537, b: 4969.119088, c: -33.952 },
            t_min_k: 320.0,
            t_max_k: 496.0,
            relative_uncertainty: 0.05, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for bornyl acetate 76-49-3, 320-496 K (as stored in chemicals 1.5.2); enantiomers share the curve"
        ),
        water_solubility_kg_per_m3: 0.03,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.02-0.04 g/L near 25 °C, from memory (low confidence; 0.03 taken); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, l-bornyl acetate 0.982 g/cm³ at 25 °C (temperature read from the table's encoding, ±0.001 g/cm³). Melts near 27-29 °C (CRC): a liquid in the still"
        ),
    },
    Compound {
        id: "fenchone",
        name: "Fenchone",
        cas: "4695-62-9",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.152233,
        liquid_density_kg_per_m3: 948.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 466.55,
        boiling_point_source: source!(
            "Yaws 466.55 K, NIST WebBook 466.70 K (both for (+)-fenchone 4695-62-9, as tabulated in chemicals 1.5.2); CAS Common Chemistry 465.15 K (fenchone 1195-79-5); the law below boils at 464.05 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.444678, b: 4700.128795, c: -33.58 },
            t_min_k: 301.0,
            t_max_k: 464.0,
            // The NIST WebBook set (301-464 K, thermo 0.6.1) gives 5479 Pa at 100 °C against this
            // set's 5449, 0.5 % apart; the law boils 1.1-2.6 K under the handbooks, about 5 % in
            // pressure near the boiling point: 0.05.
            relative_uncertainty: 0.05,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for D-fenchone, 301-464 K (as stored in chemicals 1.5.2); the NIST WebBook set agrees within 0.5 % at 100 °C"
        ),
        water_solubility_kg_per_m3: 1.0,
        water_solubility_relative_uncertainty: 1.0,
        water_solubility_source: source!(
            "Estimate: about 1 g/L near 25 °C, taken of the order of its bicyclic isomer camphor (1.6 g/L, from memory); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: about 0.948 g/cm³ at 20 °C, from memory"
        ),
    },
    Compound {
        id: "menthyl-acetate",
        name: "Menthyl acetate",
        cas: "16409-45-3",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.198306,
        liquid_density_kg_per_m3: 924.4,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 500.15,
        boiling_point_source: source!(
            "CAS Common Chemistry 500.15 K (16409-45-3 and 89-48-5); Yaws 501.15 K (89-48-5); CRC Handbook 496.15 K ((-)-menthyl acetate, 2623-23-6); all as tabulated in chemicals 1.5.2; the law below boils at 500.26 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.796767, b: 5164.106599, c: -42.074 },
            t_min_k: 331.0,
            t_max_k: 500.0,
            // One measured set; it boils at 500.26 K, within 4.1 K of every handbook value
            // (496.15-502.65 K), about 10 % in pressure there (d ln p/dT = 0.025 /K): 0.1.
            relative_uncertainty: 0.1,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for p-menth-3-yl acetate, 331-500 K (as stored in chemicals 1.5.2); mint's (-)-menthyl acetate, a stereoisomer, shares the row"
        ),
        water_solubility_kg_per_m3: 0.03,
        water_solubility_relative_uncertainty: 1.0,
        water_solubility_source: source!(
            "Estimate: no measured value found; taken as bornyl acetate's (0.03 g/L, from memory), another terpene ester of about the same size; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights, C12H22O2 (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, (-)-menthyl acetate 0.9244 g/cm³ (as tabulated in chemicals 1.5.2, no temperature given there; 20 °C assumed, the handbook's usual, from memory)"
        ),
    },
    Compound {
        id: "beta-thujone",
        name: "Thujone (β; α entered as β)",
        cas: "471-15-8",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.152233,
        liquid_density_kg_per_m3: 917.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 475.65,
        boiling_point_source: source!(
            "CAS Common Chemistry (as tabulated in chemicals 1.5.2); α-thujone 476.15 K (Yaws, same)"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.720206, b: 4896.626802, c: -36.821 },
            t_min_k: 311.0,
            t_max_k: 474.0,
            relative_uncertainty: 0.1, // the α-diastereomer shares the row (see the source)
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for β-thujone, 311-474 K (as stored in chemicals 1.5.2). Sage oil's α-thujone, its diastereomer (Tb 476.15 K against 475.65 K), is entered as this row: 0.1 for that (judgement)"
        ),
        water_solubility_kg_per_m3: 0.4,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.4 g/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: about 0.917 g/cm³ at 20 °C, from memory"
        ),
    },
    Compound {
        id: "alpha-terpineol",
        name: "α-Terpineol",
        cas: "98-55-5",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.154249,
        liquid_density_kg_per_m3: 935.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 490.70,
        boiling_point_source: source!(
            "NIST WebBook 490.70 K (as tabulated in chemicals 1.5.2); CAS Common Chemistry 492.65 K, Yaws 492.95 K. Melts near 31-38 °C (from memory): a liquid in the still"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 21.710891, b: 4248.182, c: -74.617 },
            t_min_k: 357.0,
            t_max_k: 490.1,
            relative_uncertainty: 0.05, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 357-490.1 K (as stored in thermo 0.6.1, ln(p/Pa) form); the only published set found"
        ),
        water_solubility_kg_per_m3: 2.42,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "2.42 g/L (Wikipedia 'Terpineol' infobox, citing GESTIS, isomer mixture); 7.1 g/L at 25 °C is also quoted (smolecule.com, HSDB-type text): 0.5 for that spread; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: 0.93 g/cm³ (Wikipedia 'Terpineol' infobox, citing GESTIS, isomer mixture); 0.935 at 20 °C for the α-isomer, from memory"
        ),
    },
    Compound {
        id: "geranyl-acetate",
        name: "Geranyl acetate",
        cas: "105-87-3",
        class: CompoundClass::OxygenatedMonoterpene,
        molar_mass_kg_per_mol: 0.196286,
        liquid_density_kg_per_m3: 910.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 513.15,
        boiling_point_source: source!(
            "CAS Common Chemistry and Yaws, 513.15 K (as tabulated in chemicals 1.5.2); decomposes near its boiling point (from memory)"
        ),
        // The NIST WebBook set boils at 516.6 K, 3.5 K over the handbook value: about 8 % in
        // pressure at 100 °C, hence 0.1 (judgement). The Landolt-Börnstein set for 105-87-3
        // (C = +23.8 K) boils at 469 K and gives 4833 Pa at 100 °C: not used.
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 24.059228, b: 6154.9366, c: -25.54 },
            t_min_k: 346.7,
            t_max_k: 516.5,
            relative_uncertainty: 0.1,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 346.7-516.5 K (as stored in thermo 0.6.1, ln(p/Pa) form); 574 Pa at 100 °C"
        ),
        water_solubility_kg_per_m3: 0.02,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 20 mg/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: about 0.907-0.918 g/cm³, from memory; 0.910 at 20 °C taken"
        ),
    },
    // ---------------------------------------------------------------- phenylpropanoids
    Compound {
        id: "eugenol",
        name: "Eugenol",
        cas: "97-53-0",
        class: CompoundClass::Phenylpropanoid,
        molar_mass_kg_per_mol: 0.164201,
        liquid_density_kg_per_m3: 1065.2,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 527.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 526.4 K"
        ),
        // The Landolt-Börnstein set (288-333 K) is a low-temperature fit that puts Tb near
        // 507.5 K; the WebBook set below covers 95-100 °C and reproduces Tb.
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 5.08897, b: 2463.351004, c: -42.226 },
            t_min_k: 351.6,
            t_max_k: 526.7,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 351.6-526.7 K (as stored in chemicals 1.5.2, converted to log10 bar)"
        ),
        water_solubility_kg_per_m3: 2.46,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 2.46 g/L near 25 °C, from memory (measured at 298-323 K by Martins et al., Fluid Phase Equilib. 2017; their values not seen); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 1.0652 g/cm³ at 20 °C (temperature read from the table's encoding, ±0.001 g/cm³)"
        ),
    },
    Compound {
        id: "e-anethole",
        name: "(E)-Anethole",
        cas: "4180-23-8",
        class: CompoundClass::Phenylpropanoid,
        molar_mass_kg_per_mol: 0.148202,
        liquid_density_kg_per_m3: 988.2,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 509.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 508.7 K; melts near 21-22 °C"
        ),
        // The Landolt-Börnstein set filed under (E)-anethole 4180-23-8 (293-363 K) is a
        // low-temperature fit that puts Tb near 457 K; the set for anethole 104-46-1 is used.
        // Near 100 °C the two Landolt-Börnstein sets disagree: 1004 Pa (104-46-1, used) against
        // 1159 Pa (4180-23-8, 293-363 K, 10 K extrapolated), 15.5 % apart (evaluated with
        // chemicals 1.5.2); 0.16 carries that spread (the other set within 1σ).
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.94533, b: 5371.491228, c: -38.144 },
            t_min_k: 335.0,
            t_max_k: 508.0,
            relative_uncertainty: 0.16,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for anethole 104-46-1 (4-propenylanisole, mixed stereoisomers), 335-508 K (as stored in chemicals 1.5.2); the set filed under 4180-23-8 is 15 % higher at 100 °C"
        ),
        water_solubility_kg_per_m3: 0.11,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.11 g/L near 25 °C, from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.9882 g/cm³ at 20 °C (temperature read from the table's encoding, ±0.001 g/cm³)"
        ),
    },
    Compound {
        id: "estragole",
        name: "Estragole (methyl chavicol)",
        cas: "140-67-0",
        class: CompoundClass::Phenylpropanoid,
        molar_mass_kg_per_mol: 0.148202,
        liquid_density_kg_per_m3: 965.0,
        density_temperature_c: 25.0,
        normal_boiling_point_k: 489.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 490.8 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 5.03793, b: 2246.738987, c: -41.799 },
            t_min_k: 325.8,
            t_max_k: 488.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 325.8-488 K (as stored in chemicals 1.5.2, converted to log10 bar)"
        ),
        water_solubility_kg_per_m3: 0.18,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.18 g/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.965 g/cm³ at 25 °C"
        ),
    },
    Compound {
        id: "eugenyl-acetate",
        name: "Eugenyl acetate",
        cas: "93-28-7",
        class: CompoundClass::Phenylpropanoid,
        molar_mass_kg_per_mol: 0.206238,
        liquid_density_kg_per_m3: 1080.6,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 554.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); the law below boils 1.2 K higher"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 24.031643, b: 6526.371202, c: -33.501 },
            t_min_k: 374.0,
            t_max_k: 555.0,
            relative_uncertainty: 0.05, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 374-555 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 0.4,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.4 g/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 1.0806 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "cinnamaldehyde",
        name: "(E)-Cinnamaldehyde",
        cas: "14371-10-9",
        class: CompoundClass::Phenylpropanoid,
        molar_mass_kg_per_mol: 0.132159,
        liquid_density_kg_per_m3: 1049.7,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 519.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds, trans-cinnamaldehyde (as tabulated in chemicals 1.5.2); CAS Common Chemistry and Yaws give 519.15 K for 104-55-2"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 24.06259, b: 6164.225224, c: -27.704 },
            t_min_k: 349.0,
            t_max_k: 519.0,
            relative_uncertainty: 0.05, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for cinnamaldehyde 104-55-2, 349-519 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 1.1,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 1.1 g/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 1.0497 g/cm³ at 20 °C"
        ),
    },
    // ---------------------------------------------------------------- sesquiterpenes
    Compound {
        id: "beta-caryophyllene",
        name: "β-Caryophyllene",
        cas: "87-44-5",
        class: CompoundClass::Sesquiterpene,
        molar_mass_kg_per_mol: 0.204351,
        liquid_density_kg_per_m3: 907.5,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 529.6,
        boiling_point_source: source!(
            "529.1 K at 100.7 kPa, the pure-caryophyllene end of an isobaric VLE study (J. Chem. Eng. Data 65 (2020) 3770-3777), 529.6 K at 101.325 kPa by the law below. Handbook values spread over 256-264 °C (529-537 K): 256-259 °C (The Good Scents Company), 262-264 °C (Wikipedia infobox); the 402.65 K of CAS Common Chemistry is the 14 mmHg boiling point"
        ),
        // Antoine ln(p/Pa) = A - B/(T/K + C), C = -43 K assumed (see the header), A and B fitted
        // here by least squares in ln p to three measured points:
        //   (391.65 K, 1293 Pa)    bp 118-119 °C at 9.7 mmHg, Merck Index (drugfuture.com text)
        //   (402.65 K, 1867 Pa)    bp 129-130 °C at 14 mmHg, Merck Index (same entry)
        //   (529.1 K, 100700 Pa)   J. Chem. Eng. Data 65 (2020) 3770 (boiling temperature at 100.7 kPa)
        //   giving A = 22.674945, B = 5425.4970; residuals -5 %, +6 %, -1 % in p.
        // 514 Pa (3.9 mmHg) at 100 °C. Two-point laws through other pairs of these points and the
        // handbook 263 °C give 474-562 Pa at 100 °C, hence 0.2 (judgement from that spread).
        // Checked against the handbook normal boiling points, which the fit did not use
        // (tests/tests/reference_estimated_laws.rs).
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 22.674945, b: 5425.4970, c: -43.0 },
            t_min_k: 391.65,
            t_max_k: 529.6,
            relative_uncertainty: 0.2,
            confidence: Confidence::FittedToPublishedPoints,
        },
        vapour_pressure_source: source!(
            "Fitted here (Antoine, C = -43 K, least squares) to bp 118-119 °C at 9.7 mmHg and 129-130 °C at 14 mmHg (Merck Index) and 529.1 K at 100.7 kPa (J. Chem. Eng. Data 65 (2020) 3770); no published correlation found"
        ),
        water_solubility_kg_per_m3: 0.00003,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.01-0.05 mg/L, from memory (low confidence; 0.03 mg/L taken); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.9075 g/cm³ at 20 °C"
        ),
    },
    // ---------------------------------------------------------------- rose alcohols
    Compound {
        id: "geraniol",
        name: "Geraniol",
        cas: "106-24-1",
        class: CompoundClass::RoseAlcohol,
        molar_mass_kg_per_mol: 0.154249,
        liquid_density_kg_per_m3: 889.4,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 502.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 503.2 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 23.847298, b: 5682.190548, c: -42.419 },
            t_min_k: 342.0,
            t_max_k: 503.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for 3,7-dimethyl-trans-2,6-octadien-1-ol, 342-503 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 0.69,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.69 g/L near 25 °C, from memory (measured at 298-323 K by Martins et al., Fluid Phase Equilib. 2017; their values not seen); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8894 g/cm³ at 20 °C"
        ),
    },
    Compound {
        id: "citronellol",
        name: "Citronellol",
        cas: "106-22-9",
        class: CompoundClass::RoseAlcohol,
        molar_mass_kg_per_mol: 0.156265,
        liquid_density_kg_per_m3: 855.0,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 495.2,
        boiling_point_source: source!(
            "NIST Chemistry WebBook (as tabulated in chemicals 1.5.2); 497.65 K in chemicals' default table"
        ),
        // Two published sets disagree by 15 % at 100 °C (WebBook 929 Pa, Landolt-Börnstein IV/20
        // 807 Pa, 366-499 K; evaluated with chemicals 1.5.2), hence 0.15, the whole spread
        // (judgement, no source).
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 5.79249, b: 2711.958016, c: -26.552 },
            t_min_k: 339.6,
            t_max_k: 494.7,
            relative_uncertainty: 0.15,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 339.6-494.7 K (as stored in chemicals 1.5.2, converted to log10 bar); the Landolt-Börnstein IV/20 set (366-499 K) is 13 % lower at 100 °C"
        ),
        water_solubility_kg_per_m3: 0.2,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.2 g/L near 25 °C, from memory (measured for DL-citronellol at 298-323 K by Martins et al., Fluid Phase Equilib. 2017; their values not seen); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: about 0.855 g/cm³ at 20 °C, from memory"
        ),
    },
    Compound {
        id: "2-phenylethanol",
        name: "2-Phenylethanol",
        cas: "60-12-8",
        class: CompoundClass::RoseAlcohol,
        molar_mass_kg_per_mol: 0.122164,
        liquid_density_kg_per_m3: 1020.2,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 493.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 491.4 K"
        ),
        // Both published sets start near 406 K, so 95-100 °C is about 35 K below the fitted
        // range: 0.1 for the extrapolation (judgement, no source).
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLog10Bar { a: 3.74729, b: 1318.141991, c: -139.694 },
            t_min_k: 406.2,
            t_max_k: 492.1,
            relative_uncertainty: 0.1,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "NIST Chemistry WebBook Antoine, 406.2-492.1 K (as stored in chemicals 1.5.2, converted to log10 bar); extrapolated about 35 K below its range at 95-100 °C"
        ),
        water_solubility_kg_per_m3: 21.0,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 20-22 g/L near 25 °C, from memory (21 taken); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 1.0202 g/cm³ at 20 °C (temperature read from the table's encoding, ±0.001 g/cm³)"
        ),
    },
    Compound {
        id: "nerol",
        name: "Nerol",
        cas: "106-25-2",
        class: CompoundClass::RoseAlcohol,
        molar_mass_kg_per_mol: 0.154249,
        liquid_density_kg_per_m3: 875.6,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 498.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); the law below boils 1.4 K higher"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 24.09676, b: 5999.901239, c: -22.294 },
            t_min_k: 335.0,
            t_max_k: 499.0,
            relative_uncertainty: 0.05, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine for nerol ((Z)-3,7-dimethyl-2,6-octadien-1-ol), 335-499 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 1.3,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 1.3 g/L near 25 °C, from memory (low confidence); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.8756 g/cm³ at 20 °C"
        ),
    },
    // ---------------------------------------------------------------- other
    Compound {
        id: "benzyl-alcohol",
        name: "Benzyl alcohol",
        cas: "100-51-6",
        class: CompoundClass::Other,
        molar_mass_kg_per_mol: 0.108138,
        liquid_density_kg_per_m3: 1041.9,
        density_temperature_c: 24.0,
        normal_boiling_point_k: 478.45,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook gives 478 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::Wagner25 {
                tc_k: 715.0,
                pc_pa: 4_300_000.0,
                a: -7.29099,
                b: 1.17084,
                c: -4.7167,
                d: -5.53,
            },
            t_min_k: 257.85,
            t_max_k: 715.0,
            // Other published sets at 100 °C (thermo 0.6.1): VDI PPDS 2049, Landolt-Börnstein
            // 2054, DIPPR (Perry 8th ed.) 2065, NIST WebBook 2215, Wagner (McGarry) 2307 Pa, against
            // this set's 2086: -1.8 % to +10.6 % from it, carried as 0.11.
            relative_uncertainty: 0.11,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Poling, Prausnitz & O'Connell, The Properties of Gases and Liquids, 5th ed., Wagner 2.5,5, 257.85-715 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 42.0,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 40-43 g/L near 25 °C, from memory (42 taken); no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 1.0419 g/cm³ at 24 °C"
        ),
    },
    Compound {
        id: "methyl-salicylate",
        name: "Methyl salicylate",
        cas: "119-36-8",
        class: CompoundClass::Other,
        molar_mass_kg_per_mol: 0.152147,
        liquid_density_kg_per_m3: 1181.2,
        density_temperature_c: 25.0,
        normal_boiling_point_k: 495.75,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook 495.83 K"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 21.245101, b: 4032.49655, c: -81.032 },
            t_min_k: 327.0,
            t_max_k: 496.0,
            relative_uncertainty: 0.03, // common practice, no source
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 327-496 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 0.7,
        water_solubility_relative_uncertainty: 0.5,
        water_solubility_source: source!(
            "About 0.7 g/L near 25 °C, from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 1.1812 g/cm³ at 25 °C (temperature read from the table's encoding, ±0.001 g/cm³)"
        ),
    },
    Compound {
        id: "nonadecane",
        name: "Nonadecane (rose stearoptene)",
        cas: "629-92-5",
        class: CompoundClass::Other,
        molar_mass_kg_per_mol: 0.268521,
        liquid_density_kg_per_m3: 785.5,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 603.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); NIST WebBook 602.87 K. Melts at 304.65 K (CRC)"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 21.046088, b: 4450.436468, c: -135.55 },
            t_min_k: 462.0,
            t_max_k: 639.0,
            // 100 °C is 90 K under the fitted range. Other sets at 100 °C (thermo 0.6.1): Poling
            // Antoine 10, VDI PPDS 10, DIPPR (Perry 8th ed.) 11, Poling Wagner 12 Pa; 0.2 carries
            // that spread (the WebBook set, a 306-328 K fit, is left out).
            relative_uncertainty: 0.2,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 462-639 K (as stored in chemicals 1.5.2); extrapolated about 90 K below its range near 100 °C"
        ),
        water_solubility_kg_per_m3: 1e-06,
        water_solubility_relative_uncertainty: 1.0,
        water_solubility_source: source!(
            "Practically insoluble (long-chain alkane, well under 1 mg/L), from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.7855 g/cm³ at 20 °C (temperature read from the table's encoding)"
        ),
    },
    Compound {
        id: "heneicosane",
        name: "Heneicosane (rose stearoptene)",
        cas: "629-94-7",
        class: CompoundClass::Other,
        molar_mass_kg_per_mol: 0.296574,
        liquid_density_kg_per_m3: 791.9,
        density_temperature_c: 20.0,
        normal_boiling_point_k: 632.15,
        boiling_point_source: source!(
            "CRC Handbook, Physical Constants of Organic Compounds (as tabulated in chemicals 1.5.2); CAS Common Chemistry 629.65 K, NIST WebBook 629.84 K. Melts at 313.55 K (CRC)"
        ),
        vapour_pressure: VapourPressure {
            form: CorrelationForm::AntoineLnPa { a: 21.483579, b: 4893.223581, c: -138.25 },
            t_min_k: 393.0,
            t_max_k: 630.0,
            // At 100 °C, 20 K below this set's range, it gives 2 Pa; the NIST WebBook set
            // (425.8-623.7 K, as stored in thermo 0.6.1) gives 6 Pa. A factor of 3: 0.9, the most
            // the table allows, and the plan's result hardly depends on it (a few % of rose oil).
            relative_uncertainty: 0.9,
            confidence: Confidence::Measured,
        },
        vapour_pressure_source: source!(
            "Landolt-Börnstein IV/20 (Dykyj, Svoboda, Wilhoit, Frenkel, Hall) Antoine, 393-630 K (as stored in chemicals 1.5.2)"
        ),
        water_solubility_kg_per_m3: 1e-06,
        water_solubility_relative_uncertainty: 1.0,
        water_solubility_source: source!(
            "Practically insoluble (long-chain alkane, well under 1 mg/L), from memory; no temperature dependence known: used as is at the hydrosol's temperature"
        ),
        property_source: source!(
            "Molar mass: IUPAC atomic weights (computed with chemicals 1.5.2); density: CRC Handbook, Physical Constants of Organic Compounds, 0.7919 g/cm³ at 20 °C (temperature read from the table's encoding)"
        ),
    },
];

#[cfg(test)]
mod tests {
    use super::*;
    use std::collections::HashSet;

    fn is_id(s: &str) -> bool {
        !s.is_empty()
            && !s.starts_with('-')
            && !s.ends_with('-')
            && !s.contains("--")
            && s.bytes().all(|b| b.is_ascii_lowercase() || b.is_ascii_digit() || b == b'-')
    }

    fn coefficients(form: &CorrelationForm) -> Vec<f64> {
        match *form {
            CorrelationForm::AntoineLnPa { a, b, c }
            | CorrelationForm::AntoineLog10Bar { a, b, c }
            | CorrelationForm::AntoineLog10Pa { a, b, c }
            | CorrelationForm::AntoineLog10MmHgCelsius { a, b, c } => vec![a, b, c],
            CorrelationForm::Wagner25 { tc_k, pc_pa, a, b, c, d } => vec![tc_k, pc_pa, a, b, c, d],
        }
    }

    #[test]
    fn library_is_large_enough() {
        assert!(COMPOUNDS.len() >= 24, "only {} compounds", COMPOUNDS.len());
    }

    #[test]
    fn ids_are_unique_and_well_formed() {
        let mut seen = HashSet::new();
        for c in COMPOUNDS {
            assert!(is_id(c.id), "badly formed id {:?}", c.id);
            assert!(seen.insert(c.id), "duplicate id {:?}", c.id);
        }
    }

    #[test]
    fn cas_numbers_are_unique_and_well_formed() {
        let mut seen = HashSet::new();
        for c in COMPOUNDS {
            let parts: Vec<&str> = c.cas.split('-').collect();
            assert_eq!(parts.len(), 3, "{}: CAS {:?}", c.id, c.cas);
            assert!(
                parts.iter().all(|p| !p.is_empty() && p.bytes().all(|b| b.is_ascii_digit())),
                "{}: CAS {:?}",
                c.id,
                c.cas
            );
            assert_eq!(parts[1].len(), 2, "{}: CAS {:?}", c.id, c.cas);
            assert_eq!(parts[2].len(), 1, "{}: CAS {:?}", c.id, c.cas);
            assert!(seen.insert(c.cas), "duplicate CAS {:?}", c.cas);
        }
    }

    #[test]
    fn every_text_field_is_filled() {
        for c in COMPOUNDS {
            assert!(!c.name.trim().is_empty(), "{}: empty name", c.id);
        }
    }

    #[cfg(feature = "source-texts")]
    #[test]
    fn every_source_is_filled() {
        for c in COMPOUNDS {
            for (label, text) in c.sources() {
                assert!(!text.trim().is_empty(), "{}: empty source for {}", c.id, label);
            }
        }
    }

    #[cfg(not(feature = "source-texts"))]
    #[test]
    fn sources_are_left_out_without_the_feature() {
        for c in COMPOUNDS {
            assert!(c.sources().iter().all(|&(_, t)| t.is_empty()), "{}", c.id);
        }
    }

    #[test]
    fn numbers_are_finite_and_positive() {
        for c in COMPOUNDS {
            let vp = &c.vapour_pressure;
            for (field, x) in [
                ("molar_mass_kg_per_mol", c.molar_mass_kg_per_mol),
                ("liquid_density_kg_per_m3", c.liquid_density_kg_per_m3),
                ("density_temperature_c", c.density_temperature_c),
                ("normal_boiling_point_k", c.normal_boiling_point_k),
                ("water_solubility_kg_per_m3", c.water_solubility_kg_per_m3),
                ("water_solubility_relative_uncertainty", c.water_solubility_relative_uncertainty),
                ("t_min_k", vp.t_min_k),
                ("t_max_k", vp.t_max_k),
                ("relative_uncertainty", vp.relative_uncertainty),
            ] {
                assert!(x.is_finite() && x > 0.0, "{}: {} = {}", c.id, field, x);
            }
            assert!(vp.t_min_k < vp.t_max_k, "{}: empty fitted range", c.id);
            for x in coefficients(&vp.form) {
                assert!(x.is_finite(), "{}: non-finite coefficient", c.id);
            }
        }
    }

    #[test]
    fn units_are_the_stated_ones() {
        // Guards against g/mol, g/cm³ or °C slipping into the kg/mol, kg/m³ and K fields.
        for c in COMPOUNDS {
            assert!((0.05..0.5).contains(&c.molar_mass_kg_per_mol), "{}", c.id);
            assert!((500.0..1500.0).contains(&c.liquid_density_kg_per_m3), "{}", c.id);
            assert!((-50.0..100.0).contains(&c.density_temperature_c), "{}", c.id);
            assert!((300.0..700.0).contains(&c.normal_boiling_point_k), "{}", c.id);
            assert!(c.vapour_pressure.relative_uncertainty < 1.0, "{}", c.id);
            assert!(c.water_solubility_relative_uncertainty <= 1.0, "{}", c.id);
        }
    }

    #[test]
    fn antoine_sets_have_positive_b_and_wagner_sets_a_critical_point() {
        for c in COMPOUNDS {
            match c.vapour_pressure.form {
                CorrelationForm::AntoineLnPa { b, .. }
                | CorrelationForm::AntoineLog10Bar { b, .. }
                | CorrelationForm::AntoineLog10Pa { b, .. }
                | CorrelationForm::AntoineLog10MmHgCelsius { b, .. } => {
                    assert!(b > 0.0, "{}", c.id)
                }
                CorrelationForm::Wagner25 { tc_k, pc_pa, .. } => {
                    assert!(tc_k > c.normal_boiling_point_k && pc_pa > 101_325.0, "{}", c.id)
                }
            }
        }
    }

    #[test]
    fn two_point_fits_are_labelled_as_such() {
        // A row whose Antoine C is exactly the assumed -43 K was fitted here, not measured.
        for c in COMPOUNDS {
            if let CorrelationForm::AntoineLnPa { c: cc, .. } = c.vapour_pressure.form
                && cc == -43.0
            {
                assert_ne!(c.vapour_pressure.confidence, Confidence::Measured, "{}", c.id);
            }
        }
    }
}
