//! The original UNIFAC tables, as data: subgroups (R_k, Q_k), main-group interaction
//! parameters a_mn, and the groups each library compound is made of.
//!
//! Sources:
//! - Subgroup volumes R_k and areas Q_k, and the main-group interaction parameters a_mn:
//!   Hansen, Rasmussen, Fredenslund, Schiller & Gmehling, "Vapor-liquid equilibria by UNIFAC
//!   group contribution. 5. Revision and extension", Ind. Eng. Chem. Res. 30 (1991) 2352-2355,
//!   with the later revision of Wittig, Lohmann & Gmehling, Ind. Eng. Chem. Res. 42 (2003)
//!   183-188, as tabulated by the Dortmund Data Bank's published original-UNIFAC parameters and
//!   stored in thermo 0.6.1 (`thermo.unifac.UFSG` and "UNIFAC original interaction
//!   parameters.tsv", read for this table). The numbers are copied as published.
//! - Group assignments: drawn here from each compound's structure, and found identical to the
//!   Dortmund Data Bank's original-UNIFAC assignment as shipped with thermo 0.6.1
//!   (`UNIFAC_group_assignment_DDBST(CAS, "UNIFAC")`) wherever that has one (looked up under the
//!   CAS number of the racemate or isomer mixture where the listed one is missing). Nerol has
//!   none there, under its own CAS or its isomer mixture's; its row is thermo 0.6.1's own
//!   SMARTS fragmentation into original-UNIFAC subgroups
//!   (`thermo.group_contribution.smarts_fragment_priority` over `thermo.unifac.UNIFAC_SUBGROUPS`,
//!   with RDKit) of the SMILES listed in chemicals 1.5.2, which covers every heavy atom and
//!   gives the DDBST assignment for each of the thirteen compounds added with it. 1,8-cineole
//!   has none anywhere; its row says how it is approximated.
//!
//! Atom counts beside each subgroup let a test rebuild every compound's molar mass from its
//! groups, a check on the assignments independent of the UNIFAC numbers.

/// The main groups used by essential-oil compounds, in the order of [`A_MN_K`].
///
/// Each main group shares one set of interaction parameters among its subgroups.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum MainGroup {
    /// Alkane carbons (Hansen main group 1, "CH2").
    Ch2 = 0,
    /// Olefinic carbons (2, "C=C").
    CC,
    /// Aromatic CH and C (3, "ACH").
    Ach,
    /// Alkyl carbon on an aromatic ring (4, "ACCH2").
    Acch2,
    /// Alcohol hydroxyl (5, "OH").
    Oh,
    /// Phenolic hydroxyl with its ring carbon (8, "ACOH").
    Acoh,
    /// Ketone carbonyl with its neighbouring carbon (9, "CH2CO").
    Ch2co,
    /// Aldehyde (10, "CHO").
    Cho,
    /// Ester of an alkanoic acid (11, "CCOO").
    Ccoo,
    /// Formate ester (12, "HCOO").
    Hcoo,
    /// Ether oxygen with its neighbouring carbon (13, "CH2O").
    Ch2o,
    /// Ester –C(=O)O– without an alkyl carbon, as when the carbonyl sits on a ring (41, "COO").
    Coo,
}

/// Number of main groups in [`MainGroup`] and in each dimension of [`A_MN_K`].
pub const MAIN_GROUP_COUNT: usize = 12;

/// Hansen et al. (1991) main-group numbers, in the order of [`MainGroup`].
pub const MAIN_GROUP_NUMBERS: [u8; MAIN_GROUP_COUNT] = [1, 2, 3, 4, 5, 8, 9, 10, 11, 12, 13, 41];

/// Main-group interaction parameters a_mn, K, row m, column n, in the order of [`MainGroup`]
/// (Hansen main groups 1, 2, 3, 4, 5, 8, 9, 10, 11, 12, 13, 41); Ψ_mn = exp(−a_mn / T).
///
/// Source: Hansen et al. (1991), Table 2, with the revision of Wittig et al. (2003), as
/// tabulated by the Dortmund Data Bank (thermo 0.6.1, "UNIFAC original interaction
/// parameters.tsv"). The ACOH/CH2O pair (−162.8742 and −178.5461), given to four decimals
/// unlike the rest, is taken to come from the 2003 revision (from memory).
#[rustfmt::skip]
pub static A_MN_K: [[f64; MAIN_GROUP_COUNT]; MAIN_GROUP_COUNT] = [
    //  CH2       C=C      ACH      ACCH2    OH       ACOH        CH2CO    CHO      CCOO     HCOO     CH2O         COO
    [     0.0,   86.02,   61.13,   76.5,   986.5,  1333.0,      476.4,   677.0,   232.1,   507.0,   251.5,       387.1  ], // CH2
    [   -35.36,   0.0,    38.81,   74.15,  524.1,   526.1,      182.6,   448.75,   37.85,  333.5,   214.5,        48.33 ], // C=C
    [   -11.12,   3.446,   0.0,   167.0,   636.1,  1329.0,       25.77,  347.3,     5.994, 287.1,    32.14,      103.5  ], // ACH
    [   -69.7, -113.6,  -146.8,     0.0,   803.2,   884.9,      -52.1,   586.8,  5688.0,   197.8,   213.1,        69.26 ], // ACCH2
    [   156.4,  457.0,    89.6,    25.82,    0.0,  -259.7,       84.0,  -203.6,   101.1,   267.8,    28.06,      190.3  ], // OH
    [   275.8,  217.5,    25.34,  244.2,  -451.6,     0.0,     -356.1,  -271.1,  -449.4,   -32.52, -162.8742,   -494.2  ], // ACOH
    [    26.76,  42.92,  140.1,   365.8,   164.5,  -133.1,        0.0,   -37.36, -213.7,  -190.4,  -103.6,       -18.8  ], // CH2CO
    [   505.7,   56.3,    23.39,  106.0,   529.0,  -155.6,      128.0,     0.0,  -110.3,   766.0,   304.1,      -275.5  ], // CHO
    [   114.8,  132.1,    85.84, -170.0,   245.4,   -36.72,     372.2,   185.1,     0.0,  -241.8,  -235.7,       560.2  ], // CCOO
    [   329.3,  110.4,    18.12,  428.0,   139.4,  -234.25,     385.4,  -236.5,  1167.0,     0.0,  -234.0,      -122.3  ], // HCOO
    [    83.36,  26.51,   52.13,   65.69,  237.7,  -178.5461,   191.1,    -7.838,  461.3,   457.3,     0.0,       417.0  ], // CH2O
    [   529.0, 1397.0,   317.6,   615.8,    88.63, -167.3,      123.4,   577.5,  -234.9,   145.4,  -247.8,         0.0  ], // COO
];

/// The subgroups used by essential-oil compounds, in the order of [`SUBGROUPS`].
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Sub {
    Ch3 = 0,
    Ch2,
    Ch,
    C,
    Ch2EqCh,
    ChEqCh,
    Ch2EqC,
    ChEqC,
    CEqC,
    Ach,
    Ac,
    Acch3,
    Acch2,
    Acch,
    Oh,
    Acoh,
    Ch3co,
    Ch2co,
    /// Aldehyde CHO (subgroup 20).
    Cho,
    Ch3coo,
    Ch2coo,
    Hcoo,
    Ch3o,
    Ch2o,
    /// Ether CH–O (subgroup 26), not the aldehyde.
    ChoEther,
    /// Cyclic-ether CH2–O (subgroup 27, "FCH2O", as in tetrahydrofuran).
    Fch2o,
    /// Ester –C(=O)O– alone, its neighbouring carbons counted in other groups (subgroup 77, "COO").
    Coo,
}

/// One UNIFAC subgroup: its number and name in Hansen et al. (1991), main group, van der Waals
/// volume R_k and area Q_k (both relative to a polymethylene segment, dimensionless), and its
/// atoms.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct Subgroup {
    pub sub: Sub,
    pub number: u16,
    pub name: &'static str,
    pub main: MainGroup,
    pub r: f64,
    pub q: f64,
    pub carbon: u8,
    pub hydrogen: u8,
    pub oxygen: u8,
}

const fn sg(
    sub: Sub,
    number: u16,
    name: &'static str,
    main: MainGroup,
    r: f64,
    q: f64,
    (carbon, hydrogen, oxygen): (u8, u8, u8),
) -> Subgroup {
    Subgroup { sub, number, name, main, r, q, carbon, hydrogen, oxygen }
}

/// Subgroup table, indexed by [`Sub`]. Source of every R_k and Q_k: Hansen et al. (1991),
/// Table 1 (as tabulated in thermo 0.6.1 `UFSG`); atoms (C, H, O) from each group's formula.
#[rustfmt::skip]
pub static SUBGROUPS: [Subgroup; 27] = [
    sg(Sub::Ch3,      1,  "CH3",     MainGroup::Ch2,   0.9011, 0.848, (1, 3, 0)),
    sg(Sub::Ch2,      2,  "CH2",     MainGroup::Ch2,   0.6744, 0.540, (1, 2, 0)),
    sg(Sub::Ch,       3,  "CH",      MainGroup::Ch2,   0.4469, 0.228, (1, 1, 0)),
    sg(Sub::C,        4,  "C",       MainGroup::Ch2,   0.2195, 0.000, (1, 0, 0)),
    sg(Sub::Ch2EqCh,  5,  "CH2=CH",  MainGroup::CC,    1.3454, 1.176, (2, 3, 0)),
    sg(Sub::ChEqCh,   6,  "CH=CH",   MainGroup::CC,    1.1167, 0.867, (2, 2, 0)),
    sg(Sub::Ch2EqC,   7,  "CH2=C",   MainGroup::CC,    1.1173, 0.988, (2, 2, 0)),
    sg(Sub::ChEqC,    8,  "CH=C",    MainGroup::CC,    0.8886, 0.676, (2, 1, 0)),
    sg(Sub::CEqC,     70, "C=C",     MainGroup::CC,    0.6605, 0.485, (2, 0, 0)),
    sg(Sub::Ach,      9,  "ACH",     MainGroup::Ach,   0.5313, 0.400, (1, 1, 0)),
    sg(Sub::Ac,       10, "AC",      MainGroup::Ach,   0.3652, 0.120, (1, 0, 0)),
    sg(Sub::Acch3,    11, "ACCH3",   MainGroup::Acch2, 1.2663, 0.968, (2, 3, 0)),
    sg(Sub::Acch2,    12, "ACCH2",   MainGroup::Acch2, 1.0396, 0.660, (2, 2, 0)),
    sg(Sub::Acch,     13, "ACCH",    MainGroup::Acch2, 0.8121, 0.348, (2, 1, 0)),
    sg(Sub::Oh,       14, "OH",      MainGroup::Oh,    1.0000, 1.200, (0, 1, 1)),
    sg(Sub::Acoh,     17, "ACOH",    MainGroup::Acoh,  0.8952, 0.680, (1, 1, 1)),
    sg(Sub::Ch3co,    18, "CH3CO",   MainGroup::Ch2co, 1.6724, 1.488, (2, 3, 1)),
    sg(Sub::Ch2co,    19, "CH2CO",   MainGroup::Ch2co, 1.4457, 1.180, (2, 2, 1)),
    sg(Sub::Cho,      20, "CHO",     MainGroup::Cho,   0.9980, 0.948, (1, 1, 1)),
    sg(Sub::Ch3coo,   21, "CH3COO",  MainGroup::Ccoo,  1.9031, 1.728, (2, 3, 2)),
    sg(Sub::Ch2coo,   22, "CH2COO",  MainGroup::Ccoo,  1.6764, 1.420, (2, 2, 2)),
    sg(Sub::Hcoo,     23, "HCOO",    MainGroup::Hcoo,  1.2420, 1.188, (1, 1, 2)),
    sg(Sub::Ch3o,     24, "CH3O",    MainGroup::Ch2o,  1.1450, 1.088, (1, 3, 1)),
    sg(Sub::Ch2o,     25, "CH2O",    MainGroup::Ch2o,  0.9183, 0.780, (1, 2, 1)),
    sg(Sub::ChoEther, 26, "CHO",     MainGroup::Ch2o,  0.6908, 0.468, (1, 1, 1)),
    sg(Sub::Fch2o,    27, "FCH2O",   MainGroup::Ch2o,  0.9183, 1.100, (1, 2, 1)),
    sg(Sub::Coo,      77, "COO",     MainGroup::Coo,   1.3800, 1.200, (1, 0, 2)),
];

/// The UNIFAC groups of one library compound.
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct CompoundGroups {
    /// The compound's id in [`crate::compounds::COMPOUNDS`].
    pub id: &'static str,
    /// Subgroups and how many of each the molecule holds.
    pub groups: &'static [(Sub, u8)],
    /// Whether the groups describe the molecule exactly (false: an approximation, see `note`).
    pub exact: bool,
    pub note: &'static str,
}

const DDBST: &str = "structure; same as the DDBST original-UNIFAC assignment (thermo 0.6.1)";

const fn row(id: &'static str, groups: &'static [(Sub, u8)], note: &'static str) -> CompoundGroups {
    CompoundGroups { id, groups, exact: true, note }
}

/// Group assignment of every compound of the library.
pub static COMPOUND_GROUPS: &[CompoundGroups] = &[
    // Monoterpene hydrocarbons.
    row("alpha-pinene", &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::Ch, 2), (Sub::C, 1), (Sub::ChEqC, 1)], DDBST),
    row("beta-pinene", &[(Sub::Ch3, 2), (Sub::Ch2, 3), (Sub::Ch, 2), (Sub::C, 1), (Sub::Ch2EqC, 1)], DDBST),
    row(
        "d-limonene",
        &[(Sub::Ch3, 2), (Sub::Ch2, 3), (Sub::Ch, 1), (Sub::ChEqC, 1), (Sub::Ch2EqC, 1)],
        "structure; same as the DDBST original-UNIFAC assignment of dipentene, CAS 138-86-3 (thermo 0.6.1)",
    ),
    row(
        "myrcene",
        &[(Sub::Ch3, 2), (Sub::Ch2, 2), (Sub::Ch2EqCh, 1), (Sub::Ch2EqC, 1), (Sub::ChEqC, 1)],
        DDBST,
    ),
    row("p-cymene", &[(Sub::Ch3, 2), (Sub::Ach, 4), (Sub::Acch3, 1), (Sub::Acch, 1)], DDBST),
    row("gamma-terpinene", &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::Ch, 1), (Sub::ChEqC, 2)], DDBST),
    row("camphene", &[(Sub::Ch3, 2), (Sub::Ch2, 3), (Sub::Ch, 2), (Sub::C, 1), (Sub::Ch2EqC, 1)], DDBST),
    row("terpinolene", &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::ChEqC, 1), (Sub::CEqC, 1)], DDBST),
    row("delta-3-carene", &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::Ch, 2), (Sub::C, 1), (Sub::ChEqC, 1)], DDBST),
    row(
        "alpha-phellandrene",
        &[(Sub::Ch3, 3), (Sub::Ch2, 1), (Sub::Ch, 2), (Sub::ChEqCh, 1), (Sub::ChEqC, 1)],
        DDBST,
    ),
    row("sabinene", &[(Sub::Ch3, 2), (Sub::Ch2, 3), (Sub::Ch, 2), (Sub::C, 1), (Sub::Ch2EqC, 1)], DDBST),
    row("alpha-terpinene", &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::Ch, 1), (Sub::ChEqC, 2)], DDBST),
    // Oxygenated monoterpenes.
    CompoundGroups {
        id: "1-8-cineole",
        groups: &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::Ch, 1), (Sub::C, 2), (Sub::Fch2o, 1)],
        exact: false,
        note: "approximate: original UNIFAC has no group for an ether oxygen between two carbons that \
               carry no hydrogen (DDBST lists no original-UNIFAC assignment). The ring oxygen and one \
               of its carbons are taken as the cyclic-ether group FCH2O, its two hydrogens borrowed \
               from a ring CH2 counted as C, so that atoms and molar mass balance",
    },
    row(
        "linalool",
        &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::C, 1), (Sub::Ch2EqCh, 1), (Sub::ChEqC, 1), (Sub::Oh, 1)],
        DDBST,
    ),
    row(
        "linalyl-acetate",
        &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::C, 1), (Sub::Ch2EqCh, 1), (Sub::ChEqC, 1), (Sub::Ch3coo, 1)],
        DDBST,
    ),
    row("camphor", &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::Ch, 1), (Sub::C, 2), (Sub::Ch2co, 1)], DDBST),
    row(
        "menthol",
        &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::Ch, 4), (Sub::Oh, 1)],
        "structure; same as the DDBST original-UNIFAC assignment of menthol, CAS 2216-51-5 (thermo 0.6.1)",
    ),
    row(
        "menthone",
        &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::Ch, 3), (Sub::Ch2co, 1)],
        "structure; same as the DDBST original-UNIFAC assignment of menthone, CAS 14073-97-3 (thermo 0.6.1)",
    ),
    row(
        "bornyl-acetate",
        &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::Ch, 2), (Sub::C, 2), (Sub::Ch3coo, 1)],
        DDBST,
    ),
    row(
        "beta-thujone",
        &[(Sub::Ch3, 3), (Sub::Ch2, 1), (Sub::Ch, 3), (Sub::C, 1), (Sub::Ch2co, 1)],
        "structure; DDBST lists none under CAS 471-15-8, same as its original-UNIFAC assignment of \
         3-thujanone (stereochemistry unstated), CAS 1125-12-8, and of alpha-thujone, CAS 546-80-5 \
         (thermo 0.6.1), and as thermo's SMARTS fragmentation",
    ),
    CompoundGroups {
        id: "fenchone",
        groups: &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::Ch, 1), (Sub::C, 2), (Sub::Ch2co, 1)],
        exact: false,
        note: "approximate: DDBST lists no original-UNIFAC assignment, and both carbons beside the \
               carbonyl carry no hydrogen, which no original-UNIFAC ketone group describes. The \
               carbonyl and one of them are taken as CH2CO, its two hydrogens borrowed from a ring \
               CH2 counted as C (as for 1,8-cineole), so that atoms and molar mass balance",
    },
    row(
        "menthyl-acetate",
        &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::Ch, 4), (Sub::Ch3coo, 1)],
        "structure; same as the DDBST original-UNIFAC assignment of menthyl acetate, CAS 89-48-5 (thermo 0.6.1)",
    ),
    row(
        "alpha-terpineol",
        &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::Ch, 1), (Sub::C, 1), (Sub::ChEqC, 1), (Sub::Oh, 1)],
        DDBST,
    ),
    row("geranyl-acetate", &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::ChEqC, 2), (Sub::Ch3coo, 1)], DDBST),
    row("citronellal", &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::Ch, 1), (Sub::ChEqC, 1), (Sub::Cho, 1)], DDBST),
    row(
        "terpinen-4-ol",
        &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::Ch, 1), (Sub::C, 1), (Sub::ChEqC, 1), (Sub::Oh, 1)],
        DDBST,
    ),
    row(
        "carvone",
        &[(Sub::Ch3, 2), (Sub::Ch2, 1), (Sub::Ch, 1), (Sub::Ch2EqC, 1), (Sub::ChEqC, 1), (Sub::Ch2co, 1)],
        DDBST,
    ),
    row(
        "geranial",
        &[(Sub::Ch3, 3), (Sub::Ch2, 2), (Sub::ChEqC, 2), (Sub::Cho, 1)],
        "structure; same as the DDBST original-UNIFAC assignment of citral, CAS 5392-40-5 (thermo 0.6.1)",
    ),
    // Phenols and phenylpropanoids.
    row("thymol", &[(Sub::Ch3, 2), (Sub::Ach, 3), (Sub::Acch3, 1), (Sub::Acch, 1), (Sub::Acoh, 1)], DDBST),
    row("carvacrol", &[(Sub::Ch3, 2), (Sub::Ach, 3), (Sub::Acch3, 1), (Sub::Acch, 1), (Sub::Acoh, 1)], DDBST),
    row(
        "eugenol",
        &[(Sub::Ch2EqCh, 1), (Sub::Ach, 3), (Sub::Ac, 1), (Sub::Acch2, 1), (Sub::Acoh, 1), (Sub::Ch3o, 1)],
        DDBST,
    ),
    row("e-anethole", &[(Sub::Ch3, 1), (Sub::ChEqCh, 1), (Sub::Ach, 4), (Sub::Ac, 2), (Sub::Ch3o, 1)], DDBST),
    row(
        "eugenyl-acetate",
        &[(Sub::Ch2EqCh, 1), (Sub::Ach, 3), (Sub::Ac, 2), (Sub::Acch2, 1), (Sub::Ch3coo, 1), (Sub::Ch3o, 1)],
        DDBST,
    ),
    row("cinnamaldehyde", &[(Sub::ChEqCh, 1), (Sub::Ach, 5), (Sub::Ac, 1), (Sub::Cho, 1)], DDBST),
    row(
        "estragole",
        &[(Sub::Ch2EqCh, 1), (Sub::Ach, 4), (Sub::Ac, 1), (Sub::Acch2, 1), (Sub::Ch3o, 1)],
        DDBST,
    ),
    // Sesquiterpenes.
    row(
        "beta-caryophyllene",
        &[(Sub::Ch3, 3), (Sub::Ch2, 5), (Sub::Ch, 2), (Sub::C, 1), (Sub::Ch2EqC, 1), (Sub::ChEqC, 1)],
        DDBST,
    ),
    // Rose alcohols and other aromatics.
    row("geraniol", &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::ChEqC, 2), (Sub::Oh, 1)], DDBST),
    row("citronellol", &[(Sub::Ch3, 3), (Sub::Ch2, 4), (Sub::Ch, 1), (Sub::ChEqC, 1), (Sub::Oh, 1)], DDBST),
    // Nerol is geraniol's cis isomer; UNIFAC groups do not tell the two apart.
    row(
        "nerol",
        &[(Sub::Ch3, 3), (Sub::Ch2, 3), (Sub::ChEqC, 2), (Sub::Oh, 1)],
        "structure; DDBST lists no original-UNIFAC assignment under CAS 106-25-2 nor 624-15-7 \
         (isomers unstated); same as thermo 0.6.1's SMARTS fragmentation of its SMILES \
         (chemicals 1.5.2) and as the DDBST assignment of geraniol",
    ),
    row("2-phenylethanol", &[(Sub::Ch2, 1), (Sub::Ach, 5), (Sub::Acch2, 1), (Sub::Oh, 1)], DDBST),
    row("benzyl-alcohol", &[(Sub::Ach, 5), (Sub::Acch2, 1), (Sub::Oh, 1)], DDBST),
    // The carbonyl carbon is bonded to the ring and the methyl to the oxygen: neither CH3COO nor
    // CH2COO fits, and the ester is the COO group, its neighbours counted as AC and CH3.
    row(
        "methyl-salicylate",
        &[(Sub::Ch3, 1), (Sub::Ach, 4), (Sub::Ac, 1), (Sub::Acoh, 1), (Sub::Coo, 1)],
        DDBST,
    ),
    // Paraffins of the rose's wax (stearoptene).
    row("nonadecane", &[(Sub::Ch3, 2), (Sub::Ch2, 17)], DDBST),
    row("heneicosane", &[(Sub::Ch3, 2), (Sub::Ch2, 19)], DDBST),
];

#[cfg(test)]
mod tests {
    use super::*;
    use crate::compounds::COMPOUNDS;

    /// IUPAC standard atomic weights (abridged), kg/mol: C 12.011, H 1.008, O 15.999.
    const M_C: f64 = 12.011e-3;
    const M_H: f64 = 1.008e-3;
    const M_O: f64 = 15.999e-3;

    fn molar_mass_from_groups(row: &CompoundGroups) -> f64 {
        row.groups
            .iter()
            .map(|&(sub, n)| {
                let s = &SUBGROUPS[sub as usize];
                f64::from(n)
                    * (f64::from(s.carbon) * M_C + f64::from(s.hydrogen) * M_H + f64::from(s.oxygen) * M_O)
            })
            .sum()
    }

    #[test]
    fn subgroup_table_is_indexed_by_its_enum() {
        for (i, s) in SUBGROUPS.iter().enumerate() {
            assert_eq!(s.sub as usize, i, "{}", s.name);
        }
        for (i, a) in SUBGROUPS.iter().enumerate() {
            for b in &SUBGROUPS[i + 1..] {
                assert_ne!(a.number, b.number);
            }
        }
    }

    #[test]
    fn interaction_table_has_a_zero_diagonal() {
        for (m, row) in A_MN_K.iter().enumerate() {
            assert_eq!(row[m], 0.0);
        }
    }

    /// Every compound of the library has groups (a new compound needs a row here), and the
    /// groups rebuild the compound's molar mass (from chemicals 1.5.2 in the compound table)
    /// within 0.5 %: a check that each assignment holds the molecule's atoms.
    #[test]
    fn every_compound_has_groups_that_rebuild_its_molar_mass() {
        for c in COMPOUNDS {
            let rows: Vec<_> = COMPOUND_GROUPS.iter().filter(|g| g.id == c.id).collect();
            assert_eq!(rows.len(), 1, "{}: needs exactly one row in COMPOUND_GROUPS", c.id);
            let m = molar_mass_from_groups(rows[0]);
            let dev = (m - c.molar_mass_kg_per_mol).abs() / c.molar_mass_kg_per_mol;
            assert!(dev < 0.005, "{}: groups give {m} kg/mol, table {}", c.id, c.molar_mass_kg_per_mol);
            assert!(rows[0].exact || !rows[0].note.is_empty());
        }
        for g in COMPOUND_GROUPS {
            assert!(COMPOUNDS.iter().any(|c| c.id == g.id), "{} is not in the compound table", g.id);
        }
    }

    /// The surface area q_i must be positive, or the combinatorial part divides by zero.
    #[test]
    fn every_compound_has_a_positive_area() {
        for g in COMPOUND_GROUPS {
            let q: f64 = g.groups.iter().map(|&(s, n)| f64::from(n) * SUBGROUPS[s as usize].q).sum();
            assert!(q > 0.0, "{}", g.id);
        }
    }
}
