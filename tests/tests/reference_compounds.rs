//! The compound library against handbook boiling points and computed vapour pressures.

use stillroom_core::compounds::{COMPOUNDS, Confidence, find};

/// Published normal boiling points, K, as (id, lowest, highest published value, source).
/// Where sources disagree the correlation must land within 1 K of the span they give.
const HANDBOOK_BOILING_POINTS: &[(&str, f64, f64, &str)] = &[
    ("alpha-pinene", 429.45, 430.0, "CRC Handbook 429.45 K; NIST WebBook 430 K"),
    ("beta-pinene", 438.95, 438.95, "CRC Handbook"),
    ("d-limonene", 448.0, 452.0, "NIST WebBook 450 ± 2 K (CRC Handbook 450.75 K)"),
    ("myrcene", 440.2, 444.15, "CRC Handbook 444.15 K; NIST WebBook 440.2 K"),
    ("p-cymene", 450.0, 450.15, "CRC Handbook 450.15 K; NIST WebBook 450 K"),
    ("1-8-cineole", 449.15, 449.5, "CRC Handbook 449.15 K; NIST WebBook 449.5 K"),
    ("linalyl-acetate", 493.2, 494.15, "CRC Handbook 494.15 K; NIST WebBook 493.2 K"),
    ("camphor", 477.15, 482.3, "CAS Common Chemistry 477 K; NIST WebBook 482.3 K"),
    ("menthol", 485.15, 489.6, "CAS Common Chemistry 485.15 K; CRC (l-) 487.15 K; NIST WebBook 489.6 K"),
    ("carvone", 502.8, 504.15, "CRC Handbook (R)-carvone 504.15 K; NIST WebBook 502.8 K"),
    ("geranial", 502.15, 502.15, "CRC Handbook"),
    ("thymol", 506.0, 506.15, "CRC Handbook 506.15 K; NIST WebBook 506 K"),
    ("carvacrol", 510.0, 514.65, "CRC Handbook 514.65 K; NIST WebBook 510 K"),
    ("eugenol", 526.4, 527.15, "CRC Handbook 527.15 K; NIST WebBook 526.4 K"),
    ("e-anethole", 508.7, 509.15, "CRC Handbook 509.15 K; NIST WebBook 508.7 K"),
    ("estragole", 489.15, 490.8, "CRC Handbook 489.15 K; NIST WebBook 490.8 K"),
    ("geraniol", 502.15, 503.2, "CRC Handbook 502.15 K; NIST WebBook 503.2 K"),
    ("citronellol", 495.2, 497.65, "NIST WebBook 495.2 K; CRC Handbook 497.65 K"),
    ("2-phenylethanol", 491.4, 493.15, "CRC Handbook 493.15 K; NIST WebBook 491.4 K"),
    ("benzyl-alcohol", 478.45, 478.45, "CRC Handbook"),
    (
        "camphene",
        431.65,
        433.65,
        "CAS Common Chemistry 431.65 K; Yaws 433.65 K (both as tabulated in chemicals 1.5.2)",
    ),
    ("terpinolene", 458.0, 460.15, "NIST WebBook 458 K; CRC Handbook 460.15 K"),
    ("delta-3-carene", 443.15, 445.04, "CAS Common Chemistry 443.15 K; NIST WebBook 445.04 K"),
    (
        "alpha-phellandrene",
        445.15,
        448.15,
        "CAS Common Chemistry 445.15 K; CRC Handbook 448.05 K; Yaws 448.15 K",
    ),
    (
        "bornyl-acetate",
        494.15,
        501.15,
        "CAS Common Chemistry 494.15 K; CRC l-bornyl acetate 496.65 K; CRC endo-racemate 501.15 K",
    ),
    ("beta-thujone", 475.65, 476.15, "CAS Common Chemistry β-thujone 475.65 K; Yaws α-thujone 476.15 K"),
    ("nerol", 498.15, 498.15, "CRC Handbook; CAS Common Chemistry; Yaws"),
    ("eugenyl-acetate", 554.15, 554.15, "CRC Handbook; CAS Common Chemistry; Yaws"),
    ("cinnamaldehyde", 519.15, 519.15, "CRC Handbook (trans); CAS Common Chemistry; Yaws"),
    (
        "methyl-salicylate",
        495.15,
        495.83,
        "CAS Common Chemistry 495.15 K; CRC Handbook 495.75 K; NIST WebBook 495.83 K",
    ),
    ("nonadecane", 602.87, 603.15, "NIST WebBook 602.87 K; CRC Handbook 603.15 K"),
    (
        "heneicosane",
        629.25,
        632.15,
        "Wikidata 629.25 K; CAS Common Chemistry 629.65 K; CRC Handbook 632.15 K",
    ),
    (
        "alpha-terpineol",
        490.70,
        492.95,
        "NIST WebBook 490.70 K; CAS Common Chemistry 492.65 K; Yaws 492.95 K",
    ),
    ("geranyl-acetate", 513.15, 513.15, "CAS Common Chemistry; Yaws"),
    (
        "menthyl-acetate",
        496.15,
        502.65,
        "CRC Handbook (-)-menthyl acetate 496.15 K; CAS Common Chemistry 500.15 K (and 502.65 K for the (-)-form); Yaws 501.15 K (all as tabulated in chemicals 1.5.2)",
    ),
    (
        "sabinene",
        436.70,
        437.15,
        "NIST WebBook 436.70 K; Yaws 436.85 K; CAS Common Chemistry 437.15 K (all as tabulated in chemicals 1.5.2)",
    ),
    (
        "alpha-terpinene",
        447.15,
        448.15,
        "CRC Handbook 447.15 K; NIST WebBook 447.20 K; CAS Common Chemistry and Yaws 448.15 K (all as tabulated in chemicals 1.5.2)",
    ),
    (
        "fenchone",
        465.15,
        466.70,
        "CAS Common Chemistry 465.15 K; Yaws 466.55 K; NIST WebBook 466.70 K (all as tabulated in chemicals 1.5.2)",
    ),
];

/// Correlations known to miss the handbook value by more than 1 K, with the gap allowed and why.
/// Each is still checked, against this wider bound.
const KNOWN_DEVIATIONS: &[(&str, f64, &str)] = &[
    (
        "carvone",
        2.0,
        "the NIST WebBook set was fitted up to 500.7 K only and boils at 500.9 K, 1.9 K under the \
         502.8-504.15 K handbook values; the table carries a 10 % uncertainty for it",
    ),
    (
        "nerol",
        1.5,
        "the Landolt-Börnstein set boils at 499.6 K, 1.4 K over the 498.15 K of CRC, CAS Common \
         Chemistry and Yaws; about 2 % in pressure at 100 °C, inside its 5 %",
    ),
    (
        "beta-thujone",
        1.5,
        "the Landolt-Börnstein set boils at 474.25 K, 1.4 K under the 475.65 K of CAS Common \
         Chemistry (the only handbook value in chemicals 1.5.2); the row carries 10 %",
    ),
    (
        "geranyl-acetate",
        3.6,
        "the NIST WebBook set boils at 516.6 K, at the top of its 346.7-516.5 K range, 3.5 K over the \
         513.15 K of CAS Common Chemistry and Yaws; geranyl acetate decomposes near its boiling \
         point, and the row carries 10 %",
    ),
    (
        "fenchone",
        1.5,
        "the Landolt-Börnstein set, fitted up to 464 K, boils at 464.05 K, 1.1 K under CAS Common \
         Chemistry and 2.6 K under the WebBook; the row carries 5 %",
    ),
    (
        "eugenyl-acetate",
        1.5,
        "the Landolt-Börnstein set boils at 555.4 K, 1.2 K over the 554.15 K of the handbooks",
    ),
];

#[test]
fn every_measured_correlation_reproduces_its_handbook_boiling_point() {
    let mut checked = 0;
    for c in COMPOUNDS.iter().filter(|c| c.vapour_pressure.confidence == Confidence::Measured) {
        let Some(&(_, lo, hi, source)) = HANDBOOK_BOILING_POINTS.iter().find(|(id, ..)| *id == c.id) else {
            panic!("{}: a measured correlation needs a handbook boiling point in this test", c.id);
        };
        let tb = c.vapour_pressure.temperature_at_k(101_325.0).expect("boiling point");
        let allowed = KNOWN_DEVIATIONS.iter().find(|(id, ..)| *id == c.id).map_or(1.0, |d| d.1);
        assert!(
            tb >= lo - allowed && tb <= hi + allowed,
            "{}: correlation boils at {tb:.2} K; {source} gives {lo}-{hi} K",
            c.id
        );
        checked += 1;
    }
    assert!(checked >= 29, "only {checked} measured compounds");
}

#[test]
fn fitted_and_estimated_correlations_pass_through_their_anchor_boiling_point() {
    // Those laws were built through the handbook Tb; checking it guards the typed coefficients.
    for c in COMPOUNDS.iter().filter(|c| c.vapour_pressure.confidence != Confidence::Measured) {
        let tb = c.vapour_pressure.temperature_at_k(101_325.0).unwrap();
        assert!(
            (tb - c.normal_boiling_point_k).abs() <= 1.0,
            "{}: {tb} vs {}",
            c.id,
            c.normal_boiling_point_k
        );
        assert!(
            c.vapour_pressure.relative_uncertainty >= 0.1,
            "{}: an estimate must say it is uncertain",
            c.id
        );
        // Where handbooks list the boiling point, the anchor must be theirs.
        if let Some(&(_, lo, hi, source)) = HANDBOOK_BOILING_POINTS.iter().find(|(id, ..)| *id == c.id) {
            assert!(
                tb >= lo - 1.0 && tb <= hi + 1.0,
                "{}: boils at {tb:.2} K; {source} gives {lo}-{hi} K",
                c.id
            );
        }
    }
}

#[test]
fn linalool_fit_matches_its_published_anchor_at_25_c() {
    // Espinosa Díaz et al., Fluid Phase Equilib. (1999): d-linalool 27 Pa at 298 K.
    let p = find("linalool").unwrap().vapour_pressure.pressure_pa(298.15);
    assert!((p - 27.0).abs() / 27.0 <= 0.02, "{p}");
}

#[test]
fn vapour_pressures_at_95_and_100_c_match_the_published_sets() {
    // Each correlation evaluated with chemicals 1.5.2 (its own tables), Pa; 0.5 % tolerance.
    let cases: &[(&str, f64, f64)] = &[
        ("1-8-cineole", 8203.0, 9928.0),
        ("d-limonene", 8038.0, 9726.0),
        ("alpha-pinene", 16029.0, 19160.0),
        ("beta-pinene", 11787.0, 14164.0),
        ("p-cymene", 7566.0, 9217.0),
        ("eugenol", 340.0, 442.0),
        ("geraniol", 604.0, 786.0),
        ("e-anethole", 787.0, 1004.0),
        // Landolt-Börnstein IV/20 sets, evaluated with chemicals 1.5.2:
        ("camphene", 11894.0, 14413.0),
        ("terpinolene", 4294.0, 5352.0),
        ("delta-3-carene", 9193.0, 11170.0),
        ("alpha-phellandrene", 7286.0, 8914.0),
        ("nerol", 853.0, 1092.0),
        ("bornyl-acetate", 1642.0, 2045.0),
        ("eugenyl-acetate", 92.7, 123.5),
        ("methyl-salicylate", 1340.0, 1704.0),
        ("beta-thujone", 2811.0, 3502.0),
        ("cinnamaldehyde", 386.0, 502.0),
        ("fenchone", 4431.1, 5449.4),
        ("menthyl-acetate", 1053.3, 1337.8),
        // NIST WebBook sets as stored in thermo 0.6.1, evaluated with it:
        ("alpha-terpineol", 1391.7, 1773.5),
        ("geranyl-acetate", 443.4, 574.1),
    ];
    for &(id, p95, p100) in cases {
        let vp = find(id).unwrap().vapour_pressure;
        for (t, want) in [(368.15, p95), (373.15, p100)] {
            let got = vp.pressure_pa(t);
            assert!((got - want).abs() / want <= 5e-3, "{id} at {t} K: {got} Pa, chemicals {want}");
        }
    }
}

#[test]
fn two_published_sets_that_disagree_carry_their_spread() {
    // Where two measured sets of one compound disagree near 100 °C, the row's 1σ uncertainty must
    // reach the other set: relative_uncertainty ≥ |p_other / p_used − 1|. Pressures at 100 °C, Pa,
    // each set evaluated with thermo 0.6.1 / chemicals 1.5.2 (their stored Landolt-Börnstein IV/20,
    // NIST WebBook, Poling, DIPPR (Perry 8th ed.), VDI PPDS and McGarry sets). A gap a symmetric
    // relative uncertainty cannot express (a factor of 3) is carried at the table's ceiling of
    // 0.9, which the ranges' own cap on the vapour-pressure swing also uses.
    const CEILING: f64 = 0.9;
    let cases: &[(&str, f64, &[f64], &str)] = &[
        ("e-anethole", 1003.6, &[1159.5], "Landolt-Börnstein 104-46-1 (used) against 4180-23-8"),
        ("citronellol", 928.9, &[807.0], "NIST WebBook (used) against Landolt-Börnstein"),
        ("terpinolene", 5352.0, &[6758.2], "Landolt-Börnstein (used) against NIST WebBook"),
        (
            "benzyl-alcohol",
            2086.3,
            &[2054.3, 2215.2, 2307.0, 2065.0, 2048.6],
            "Poling Wagner (used) against Landolt-Börnstein, WebBook, McGarry Wagner, DIPPR, VDI PPDS",
        ),
        (
            "nonadecane",
            10.1,
            &[10.1, 12.1, 10.8, 10.3],
            "Landolt-Börnstein (used) against Poling, DIPPR, VDI PPDS",
        ),
        ("heneicosane", 1.9, &[6.5], "Landolt-Börnstein (used) against NIST WebBook"),
    ];
    for &(id, used, others, source) in cases {
        let vp = find(id).unwrap().vapour_pressure;
        let p = vp.pressure_pa(373.15);
        assert!((p - used).abs() / used <= 0.03, "{id}: row gives {p:.1} Pa at 100 °C, the used set {used}");
        let gap = others.iter().map(|o| (o / used - 1.0).abs()).fold(0.0, f64::max);
        assert!(
            vp.relative_uncertainty >= gap.min(CEILING),
            "{id}: uncertainty {} does not reach the {:.1} % gap between published sets ({source})",
            vp.relative_uncertainty,
            gap * 100.0
        );
    }
}

#[test]
fn at_least_twenty_compounds_across_the_families() {
    use stillroom_core::compounds::CompoundClass::*;
    assert!(COMPOUNDS.len() >= 44);
    for class in [MonoterpeneHydrocarbon, OxygenatedMonoterpene, Phenylpropanoid, Sesquiterpene, RoseAlcohol]
    {
        assert!(COMPOUNDS.iter().any(|c| c.class == class), "{class:?} missing");
    }
}
