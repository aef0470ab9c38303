//! Original UNIFAC in the core against an independent implementation, and against a handbook
//! worked example.
//!
//! Reference library: thermo 0.6.1 (PyPI, with chemicals 1.5.2), `thermo.unifac.UNIFAC` with
//! its original-UNIFAC tables `UFSG` (subgroups) and `UFIP` (interaction parameters), which
//! hold the same published parameters (Hansen et al. 1991, with the 2003 revision) as the
//! core's own table. The values below were computed with it as
//!
//! ```text
//! from thermo.unifac import UNIFAC, UFSG, UFIP, load_unifac_ip
//! load_unifac_ip(); from thermo.unifac import UFIP
//! UNIFAC.from_subgroups(T=t_k, xs=x, chemgroups=[THERMO_GROUPS[id] for id in ids],
//!                       version=0, interaction_data=UFIP, subgroups=UFSG).gammas()
//! ```
//!
//! with the group assignments in `THERMO_GROUPS` (thermo's subgroup numbers, which are
//! Hansen's), and copied here with all their digits. The oils are invented crop-like mixtures,
//! their mole fractions chosen for the test, not analyses of real oils.

use stillroom_core::activity::groups::{SUBGROUPS, Sub};
use stillroom_core::activity::{OilGroups, activity_coefficients, groups_of};
use stillroom_core::compounds::COMPOUNDS;

/// The group assignment handed to thermo for each compound: (UFSG subgroup number, count).
const THERMO_GROUPS: &[(&str, &[(u16, u8)])] = &[
    ("linalool", &[(1, 3), (2, 2), (4, 1), (5, 1), (8, 1), (14, 1)]),
    ("linalyl-acetate", &[(1, 3), (2, 2), (4, 1), (5, 1), (8, 1), (21, 1)]),
    ("1-8-cineole", &[(1, 3), (2, 3), (3, 1), (4, 2), (27, 1)]),
    ("camphor", &[(1, 3), (2, 2), (3, 1), (4, 2), (19, 1)]),
    ("terpinen-4-ol", &[(1, 3), (2, 3), (3, 1), (4, 1), (8, 1), (14, 1)]),
    ("beta-caryophyllene", &[(1, 3), (2, 5), (3, 2), (4, 1), (7, 1), (8, 1)]),
    ("menthol", &[(1, 3), (2, 3), (3, 4), (14, 1)]),
    ("menthone", &[(1, 3), (2, 2), (3, 3), (19, 1)]),
    ("d-limonene", &[(1, 2), (2, 3), (3, 1), (7, 1), (8, 1)]),
    ("eugenol", &[(5, 1), (9, 3), (10, 1), (12, 1), (17, 1), (24, 1)]),
    ("citronellol", &[(1, 3), (2, 4), (3, 1), (8, 1), (14, 1)]),
    ("geraniol", &[(1, 3), (2, 3), (8, 2), (14, 1)]),
    ("2-phenylethanol", &[(2, 1), (9, 5), (12, 1), (14, 1)]),
    ("thymol", &[(1, 2), (9, 3), (11, 1), (13, 1), (17, 1)]),
    ("p-cymene", &[(1, 2), (9, 4), (11, 1), (13, 1)]),
    ("gamma-terpinene", &[(1, 3), (2, 2), (3, 1), (8, 2)]),
    ("carvacrol", &[(1, 2), (9, 3), (11, 1), (13, 1), (17, 1)]),
    ("citronellal", &[(1, 3), (2, 3), (3, 1), (8, 1), (20, 1)]),
    ("geranial", &[(1, 3), (2, 2), (8, 2), (20, 1)]),
    ("e-anethole", &[(1, 1), (6, 1), (9, 4), (10, 2), (24, 1)]),
    ("estragole", &[(5, 1), (9, 4), (10, 1), (12, 1), (24, 1)]),
    ("carvone", &[(1, 2), (2, 1), (3, 1), (7, 1), (8, 1), (19, 1)]),
    ("myrcene", &[(1, 2), (2, 2), (5, 1), (7, 1), (8, 1)]),
    ("alpha-pinene", &[(1, 3), (2, 2), (3, 2), (4, 1), (8, 1)]),
    ("beta-pinene", &[(1, 2), (2, 3), (3, 2), (4, 1), (7, 1)]),
    ("benzyl-alcohol", &[(9, 5), (12, 1), (14, 1)]),
    ("camphene", &[(1, 2), (2, 3), (3, 2), (4, 1), (7, 1)]),
    ("terpinolene", &[(1, 3), (2, 3), (8, 1), (70, 1)]),
    ("delta-3-carene", &[(1, 3), (2, 2), (3, 2), (4, 1), (8, 1)]),
    ("alpha-phellandrene", &[(1, 3), (2, 1), (3, 2), (6, 1), (8, 1)]),
    ("bornyl-acetate", &[(1, 3), (2, 3), (3, 2), (4, 2), (21, 1)]),
    ("beta-thujone", &[(1, 3), (2, 1), (3, 3), (4, 1), (19, 1)]),
    ("alpha-terpineol", &[(1, 3), (2, 3), (3, 1), (4, 1), (8, 1), (14, 1)]),
    ("geranyl-acetate", &[(1, 3), (2, 3), (8, 2), (21, 1)]),
    ("eugenyl-acetate", &[(5, 1), (9, 3), (10, 2), (12, 1), (21, 1), (24, 1)]),
    ("cinnamaldehyde", &[(6, 1), (9, 5), (10, 1), (20, 1)]),
    ("nerol", &[(1, 3), (2, 3), (8, 2), (14, 1)]),
    ("methyl-salicylate", &[(1, 1), (9, 4), (10, 1), (17, 1), (77, 1)]),
    ("sabinene", &[(1, 2), (2, 3), (3, 2), (4, 1), (7, 1)]),
    ("alpha-terpinene", &[(1, 3), (2, 2), (3, 1), (8, 2)]),
    ("fenchone", &[(1, 3), (2, 2), (3, 1), (4, 2), (19, 1)]),
    ("menthyl-acetate", &[(1, 3), (2, 3), (3, 4), (21, 1)]),
    ("nonadecane", &[(1, 2), (2, 17)]),
    ("heneicosane", &[(1, 2), (2, 19)]),
];

struct Case {
    oil: &'static str,
    ids: &'static [&'static str],
    /// Mole fractions.
    x: &'static [f64],
    t_k: f64,
    /// γ_i from thermo 0.6.1, as above.
    gamma: &'static [f64],
}

/// At 95 °C and 100 °C, the temperatures of a still at or below sea level.
const THERMO_CASES: &[Case] = &[
    Case {
        oil: "lavender-like",
        ids: &[
            "linalool",
            "linalyl-acetate",
            "1-8-cineole",
            "camphor",
            "terpinen-4-ol",
            "beta-caryophyllene",
        ],
        x: &[0.36, 0.34, 0.08, 0.08, 0.07, 0.07],
        t_k: 368.15,
        gamma: &[
            1.1489174649225922,
            1.1084246878056183,
            1.0990015641663138,
            1.1124198390204878,
            1.2261113095050207,
            1.7470174395511169,
        ],
    },
    Case {
        oil: "lavender-like",
        ids: &[
            "linalool",
            "linalyl-acetate",
            "1-8-cineole",
            "camphor",
            "terpinen-4-ol",
            "beta-caryophyllene",
        ],
        x: &[0.36, 0.34, 0.08, 0.08, 0.07, 0.07],
        t_k: 373.15,
        gamma: &[
            1.146253163581257,
            1.1057804599836483,
            1.098840618792126,
            1.1114536477224692,
            1.2208395188371337,
            1.73621468074872,
        ],
    },
    Case {
        oil: "peppermint-like",
        ids: &["menthol", "menthone", "1-8-cineole", "d-limonene"],
        x: &[0.46, 0.28, 0.12, 0.14],
        t_k: 368.15,
        gamma: &[1.135080267589496, 1.1176489409603865, 1.1496999303071147, 1.4016467695837331],
    },
    Case {
        oil: "peppermint-like",
        ids: &["menthol", "menthone", "1-8-cineole", "d-limonene"],
        x: &[0.46, 0.28, 0.12, 0.14],
        t_k: 373.15,
        gamma: &[1.1325470194751972, 1.1146652386260578, 1.146325735673872, 1.3936009306461403],
    },
    Case {
        oil: "clove-like",
        ids: &["eugenol", "beta-caryophyllene"],
        x: &[0.85, 0.15],
        t_k: 368.15,
        gamma: &[1.0535445358564115, 4.620888767457226],
    },
    Case {
        oil: "clove-like",
        ids: &["eugenol", "beta-caryophyllene"],
        x: &[0.85, 0.15],
        t_k: 373.15,
        gamma: &[1.053158315044321, 4.558767697463383],
    },
    Case {
        oil: "rose-like",
        ids: &["citronellol", "geraniol", "2-phenylethanol"],
        x: &[0.45, 0.35, 0.2],
        t_k: 368.15,
        gamma: &[1.0132552521124045, 1.0148698258472852, 1.2685864361133345],
    },
    Case {
        oil: "rose-like",
        ids: &["citronellol", "geraniol", "2-phenylethanol"],
        x: &[0.45, 0.35, 0.2],
        t_k: 373.15,
        gamma: &[1.0130666436389015, 1.014771002329501, 1.2660599396795096],
    },
    Case {
        oil: "thyme-like",
        ids: &["thymol", "p-cymene", "gamma-terpinene", "linalool", "carvacrol"],
        x: &[0.45, 0.25, 0.18, 0.07, 0.05],
        t_k: 368.15,
        gamma: &[
            1.0079987240764092,
            1.3146507871043673,
            1.3669097799004823,
            0.34779083329049154,
            1.0079987240764092,
        ],
    },
    Case {
        oil: "thyme-like",
        ids: &["thymol", "p-cymene", "gamma-terpinene", "linalool", "carvacrol"],
        x: &[0.45, 0.25, 0.18, 0.07, 0.05],
        t_k: 373.15,
        gamma: &[
            1.0087124747428402,
            1.310043943050245,
            1.3609753040897816,
            0.3587459792017675,
            1.0087124747428402,
        ],
    },
    Case {
        oil: "citronella-like",
        ids: &["citronellal", "geraniol", "citronellol", "d-limonene", "geranial"],
        x: &[0.4, 0.25, 0.15, 0.1, 0.1],
        t_k: 368.15,
        gamma: &[
            1.0530453225761771,
            1.067993735763763,
            1.1126318821990482,
            1.4417660175452482,
            1.0921698728620421,
        ],
    },
    Case {
        oil: "citronella-like",
        ids: &["citronellal", "geraniol", "citronellol", "d-limonene", "geranial"],
        x: &[0.4, 0.25, 0.15, 0.1, 0.1],
        t_k: 373.15,
        gamma: &[
            1.0523648251639084,
            1.0683454999850368,
            1.1120492170972298,
            1.433002649062133,
            1.0909883571228476,
        ],
    },
    Case {
        oil: "anise-like",
        ids: &["e-anethole", "estragole", "d-limonene"],
        x: &[0.9, 0.05, 0.05],
        t_k: 368.15,
        gamma: &[1.0016015319749811, 1.0043005724487541, 1.8345442482583985],
    },
    Case {
        oil: "anise-like",
        ids: &["e-anethole", "estragole", "d-limonene"],
        x: &[0.9, 0.05, 0.05],
        t_k: 373.15,
        gamma: &[1.001587353061855, 1.0044366516660415, 1.8225241960919096],
    },
    Case {
        oil: "spearmint-like",
        ids: &["carvone", "d-limonene", "myrcene", "1-8-cineole"],
        x: &[0.65, 0.22, 0.05, 0.08],
        t_k: 368.15,
        gamma: &[1.0345406261576227, 1.2046322610211633, 1.133543948391498, 1.1945841393083658],
    },
    Case {
        oil: "spearmint-like",
        ids: &["carvone", "d-limonene", "myrcene", "1-8-cineole"],
        x: &[0.65, 0.22, 0.05, 0.08],
        t_k: 373.15,
        gamma: &[1.0341512190662845, 1.2013735553126499, 1.1312263006785304, 1.192288850351825],
    },
    Case {
        oil: "rosemary-like",
        ids: &["1-8-cineole", "alpha-pinene", "camphor", "beta-pinene", "myrcene"],
        x: &[0.45, 0.22, 0.17, 0.08, 0.08],
        t_k: 368.15,
        gamma: &[
            1.0390049306133189,
            1.10994376279019,
            1.1428115772745513,
            1.0925525576781323,
            1.1308042564422636,
        ],
    },
    Case {
        oil: "rosemary-like",
        ids: &["1-8-cineole", "alpha-pinene", "camphor", "beta-pinene", "myrcene"],
        x: &[0.45, 0.22, 0.17, 0.08, 0.08],
        t_k: 373.15,
        gamma: &[
            1.0385531853785923,
            1.1083824771751996,
            1.1402596462360048,
            1.0912362697154392,
            1.129222768318016,
        ],
    },
    Case {
        oil: "ylang-like",
        ids: &["linalool", "benzyl-alcohol", "beta-caryophyllene", "geraniol"],
        x: &[0.45, 0.15, 0.3, 0.1],
        t_k: 368.15,
        gamma: &[1.073516533978075, 1.6773842405220705, 1.8669746025991532, 1.0878408842482739],
    },
    Case {
        oil: "ylang-like",
        ids: &["linalool", "benzyl-alcohol", "beta-caryophyllene", "geraniol"],
        x: &[0.45, 0.15, 0.3, 0.1],
        t_k: 373.15,
        gamma: &[1.0731765960692687, 1.669432294575041, 1.852953587676512, 1.087248255454446],
    },
    Case {
        oil: "peppermint-like, limonene absent",
        ids: &["menthol", "menthone", "1-8-cineole", "d-limonene"],
        x: &[0.5, 0.3, 0.2, 0.0],
        t_k: 368.15,
        gamma: &[1.093246388558058, 1.153024532407215, 1.1795358831847342, 1.5022535739037324],
    },
    Case {
        oil: "peppermint-like, limonene absent",
        ids: &["menthol", "menthone", "1-8-cineole", "d-limonene"],
        x: &[0.5, 0.3, 0.2, 0.0],
        t_k: 373.15,
        gamma: &[1.0913134291696507, 1.14954700624889, 1.1756607466003126, 1.4922367792684903],
    },
    // Oils with the compounds added to the library later: computed the same way, with the same
    // thermo 0.6.1 and chemicals 1.5.2 (Python 3.11), the groups above.
    Case {
        oil: "fir-needle-like",
        ids: &["bornyl-acetate", "camphene", "alpha-pinene", "delta-3-carene", "d-limonene"],
        x: &[0.32, 0.22, 0.18, 0.16, 0.12],
        t_k: 368.15,
        gamma: &[
            1.0914879570582088,
            1.0243718061955305,
            1.0418772056994159,
            1.0418772056994159,
            1.0344582313891064,
        ],
    },
    Case {
        oil: "fir-needle-like",
        ids: &["bornyl-acetate", "camphene", "alpha-pinene", "delta-3-carene", "d-limonene"],
        x: &[0.32, 0.22, 0.18, 0.16, 0.12],
        t_k: 373.15,
        gamma: &[
            1.0899405175470818,
            1.0239817003984093,
            1.041229572836711,
            1.041229572836711,
            1.0342940330384292,
        ],
    },
    Case {
        oil: "cinnamon-leaf-like",
        ids: &["eugenol", "eugenyl-acetate", "cinnamaldehyde", "beta-caryophyllene"],
        x: &[0.78, 0.06, 0.04, 0.12],
        t_k: 368.15,
        gamma: &[1.0262753967078406, 0.5355482823385057, 1.022790009993805, 5.281862791416569],
    },
    Case {
        oil: "cinnamon-leaf-like",
        ids: &["eugenol", "eugenyl-acetate", "cinnamaldehyde", "beta-caryophyllene"],
        x: &[0.78, 0.06, 0.04, 0.12],
        t_k: 373.15,
        gamma: &[1.0263388110241267, 0.541811982761012, 1.0258328157040788, 5.200546322475414],
    },
    Case {
        oil: "rose-geranium-like",
        ids: &["citronellol", "geraniol", "nerol", "geranyl-acetate"],
        x: &[0.42, 0.3, 0.16, 0.12],
        t_k: 368.15,
        gamma: &[1.016036948695137, 1.0063642916117848, 1.0063642916117848, 1.4767420984331392],
    },
    Case {
        oil: "rose-geranium-like",
        ids: &["citronellol", "geraniol", "nerol", "geranyl-acetate"],
        x: &[0.42, 0.3, 0.16, 0.12],
        t_k: 373.15,
        gamma: &[1.015671824877356, 1.0063153987566613, 1.0063153987566613, 1.464308029791196],
    },
    Case {
        oil: "rose-otto-like",
        ids: &["citronellol", "geraniol", "nerol", "2-phenylethanol", "nonadecane", "heneicosane"],
        x: &[0.38, 0.22, 0.09, 0.05, 0.16, 0.1],
        t_k: 368.15,
        gamma: &[
            1.0897975339708166,
            1.117280987737016,
            1.117280987737016,
            1.7208900696787837,
            2.2104348163210914,
            2.304701696203069,
        ],
    },
    Case {
        oil: "rose-otto-like",
        ids: &["citronellol", "geraniol", "nerol", "2-phenylethanol", "nonadecane", "heneicosane"],
        x: &[0.38, 0.22, 0.09, 0.05, 0.16, 0.1],
        t_k: 373.15,
        gamma: &[
            1.0890179646824178,
            1.1166490012502372,
            1.1166490012502372,
            1.712276696666628,
            2.186383798056214,
            2.2771497849728886,
        ],
    },
    Case {
        oil: "sage-like",
        ids: &["beta-thujone", "camphor", "1-8-cineole", "alpha-pinene", "camphene"],
        x: &[0.4, 0.22, 0.18, 0.12, 0.08],
        t_k: 368.15,
        gamma: &[
            1.0344243424502133,
            1.0255398250384904,
            1.1191065947284524,
            1.2079503769717779,
            1.1684121676724684,
        ],
    },
    Case {
        oil: "sage-like",
        ids: &["beta-thujone", "camphor", "1-8-cineole", "alpha-pinene", "camphene"],
        x: &[0.4, 0.22, 0.18, 0.12, 0.08],
        t_k: 373.15,
        gamma: &[
            1.0339757267502994,
            1.025135335696696,
            1.117819225564952,
            1.2040371092226603,
            1.1650701833346424,
        ],
    },
    Case {
        oil: "tea-tree-like",
        ids: &[
            "terpinen-4-ol",
            "gamma-terpinene",
            "alpha-terpineol",
            "terpinolene",
            "1-8-cineole",
            "p-cymene",
        ],
        x: &[0.42, 0.22, 0.05, 0.04, 0.04, 0.23],
        t_k: 368.15,
        gamma: &[
            1.167282217981927,
            1.3309524949192926,
            1.167282217981927,
            1.361066513036541,
            1.125436052872513,
            1.2423587796014088,
        ],
    },
    Case {
        oil: "tea-tree-like",
        ids: &[
            "terpinen-4-ol",
            "gamma-terpinene",
            "alpha-terpineol",
            "terpinolene",
            "1-8-cineole",
            "p-cymene",
        ],
        x: &[0.42, 0.22, 0.05, 0.04, 0.04, 0.23],
        t_k: 373.15,
        gamma: &[
            1.1652204990351032,
            1.324938719567862,
            1.1652204990351032,
            1.3547606971359205,
            1.1222823345806543,
            1.237783639827658,
        ],
    },
    Case {
        oil: "dill-weed-like",
        ids: &["carvone", "d-limonene", "alpha-phellandrene", "myrcene"],
        x: &[0.38, 0.3, 0.28, 0.04],
        t_k: 368.15,
        gamma: &[1.1503096303649938, 1.0679912017952888, 1.0783750484323174, 1.0479376871608597],
    },
    Case {
        oil: "dill-weed-like",
        ids: &["carvone", "d-limonene", "alpha-phellandrene", "myrcene"],
        x: &[0.38, 0.3, 0.28, 0.04],
        t_k: 373.15,
        gamma: &[1.1481742529685965, 1.0668965442637817, 1.0772223812269126, 1.0473542468661874],
    },
    Case {
        oil: "wintergreen-like",
        ids: &["methyl-salicylate", "d-limonene", "linalool", "alpha-pinene"],
        x: &[0.94, 0.02, 0.02, 0.02],
        t_k: 368.15,
        gamma: &[1.0083975581364855, 11.208642650686562, 2.177610599910267, 9.928134563265113],
    },
    Case {
        oil: "wintergreen-like",
        ids: &["methyl-salicylate", "d-limonene", "linalool", "alpha-pinene"],
        x: &[0.94, 0.02, 0.02, 0.02],
        t_k: 373.15,
        gamma: &[1.0083540477534676, 11.01966385986615, 2.1914218584511773, 9.771269398645062],
    },
    Case {
        oil: "mint-like",
        ids: &["menthol", "menthone", "menthyl-acetate", "sabinene"],
        x: &[0.45, 0.3, 0.15, 0.1],
        t_k: 368.15,
        gamma: &[1.1503030758406043, 1.1010578889472065, 1.1646652568892037, 1.4076450746579985],
    },
    Case {
        oil: "mint-like",
        ids: &["menthol", "menthone", "menthyl-acetate", "sabinene"],
        x: &[0.45, 0.3, 0.15, 0.1],
        t_k: 373.15,
        gamma: &[1.1472792459526364, 1.0987166623929088, 1.160763884324797, 1.400419894904857],
    },
    Case {
        oil: "fennel-and-tea-tree-like",
        ids: &["e-anethole", "fenchone", "alpha-terpinene", "terpinen-4-ol", "alpha-pinene"],
        x: &[0.6, 0.12, 0.1, 0.1, 0.08],
        t_k: 368.15,
        gamma: &[
            1.0549664283794509,
            0.9460607397869304,
            1.4928444802365952,
            1.6716384846102903,
            1.4859697863124006,
        ],
    },
    Case {
        oil: "fennel-and-tea-tree-like",
        ids: &["e-anethole", "fenchone", "alpha-terpinene", "terpinen-4-ol", "alpha-pinene"],
        x: &[0.6, 0.12, 0.1, 0.1, 0.08],
        t_k: 373.15,
        gamma: &[
            1.0541865532994832,
            0.9466265832635132,
            1.4858939760316738,
            1.6549087936049354,
            1.4788004612293852,
        ],
    },
];

/// Agreement asked for: the same equations with the same parameters agree to rounding.
const TOLERANCE: f64 = 1e-6;

#[test]
fn group_assignments_are_those_given_to_thermo() {
    for c in COMPOUNDS {
        let ours = groups_of(c.id).unwrap_or_else(|| panic!("{} has no UNIFAC groups", c.id));
        let mut ours: Vec<(u16, u8)> =
            ours.groups.iter().map(|&(s, n)| (SUBGROUPS[s as usize].number, n)).collect();
        ours.sort_unstable();
        let (_, theirs) = THERMO_GROUPS
            .iter()
            .find(|(id, _)| *id == c.id)
            .unwrap_or_else(|| panic!("{} is not among the compounds checked against thermo", c.id));
        assert_eq!(ours, theirs.to_vec(), "{}", c.id);
    }
}

#[test]
fn every_library_compound_appears_in_a_thermo_case() {
    for c in COMPOUNDS {
        assert!(THERMO_CASES.iter().any(|case| case.ids.contains(&c.id)), "{} is not checked", c.id);
    }
}

#[test]
fn activity_coefficients_agree_with_thermo() {
    let mut worst = 0.0f64;
    for case in THERMO_CASES {
        let ours = activity_coefficients(case.ids, case.x, case.t_k).unwrap();
        for ((id, g), want) in case.ids.iter().zip(&ours).zip(case.gamma) {
            let dev = (g - want).abs() / want;
            worst = worst.max(dev);
            assert!(dev < TOLERANCE, "{} at {} K, {id}: core {g}, thermo {want}", case.oil, case.t_k);
        }
    }
    println!("largest relative deviation from thermo 0.6.1: {worst:.2e}");
}

/// The per-oil structure answers as the one-call function does, call after call.
#[test]
fn a_prepared_oil_gives_the_same_answer_every_time() {
    let case = &THERMO_CASES[0];
    let oil = OilGroups::new(case.ids).unwrap();
    for _ in 0..3 {
        let g = oil.gamma(case.x, case.t_k).unwrap();
        for (g, want) in g.iter().zip(case.gamma) {
            assert!((g - want).abs() < TOLERANCE * want);
        }
    }
}

/// Handbook worked example: acetone (1) / n-pentane (2) at 307 K, x1 = 0.047, original UNIFAC
/// gives γ1 = 4.99 and γ2 = 1.005 (Poling, Prausnitz & O'Connell, *The Properties of Gases and
/// Liquids*, 5th ed., Example 8-12; from memory; the measured values there are 4.41 and 1.11).
/// Groups: acetone CH3 + CH3CO; n-pentane 2 CH3 + 3 CH2.
#[test]
fn acetone_in_pentane_matches_the_handbook_example() {
    let acetone: &[(Sub, u8)] = &[(Sub::Ch3, 1), (Sub::Ch3co, 1)];
    let pentane: &[(Sub, u8)] = &[(Sub::Ch3, 2), (Sub::Ch2, 3)];
    let g = OilGroups::from_groups(&[acetone, pentane]).unwrap().gamma(&[0.047, 0.953], 307.0).unwrap();
    assert!((g[0] - 4.99).abs() < 0.005, "γ1 = {}", g[0]);
    assert!((g[1] - 1.005).abs() < 0.0005, "γ2 = {}", g[1]);
}
