//! The crop presets, as data: one row per crop, every number with its source.
//!
//! Conventions used throughout:
//! - Where a source gives a range and no typical value, "typical" is the midpoint of the range
//!   (a choice made here, no source). A composition limit given only as "at most x %" is
//!   entered as x/2 unless a typical value is printed.
//! - Compositions list only compounds of the library (`crate::compounds::COMPOUNDS`); what is
//!   left out is named in `composition_source`. The oil is renormalised over the listed ones.
//! - Relative densities (d20/20, d25/25) are turned into kg/m³ with the density of water at the
//!   same temperature (998.2 kg/m³ at 20 °C, 997.0 at 25 °C; IAPWS-95, computed with
//!   iapws 1.5.5). Ranges given as "specific gravity" without a reference temperature are read
//!   as g/cm³.
//! - First-order constants derived from a run time use k ≈ 3 / t95 (95 % recovered at t95).
//! - Heat capacity of the charge follows its moisture: `charge_heat_capacity_j_per_kg_k`
//!   (Siebel's mass-weighted rule) of `moisture_fraction` and dry matter at 1700 J/(kg K)
//!   (wood 1630). At 84 % water it gives 3.78 kJ/(kg K), inside the 3.2-4.0 measured on fresh
//!   leaves of 13 species (Zhang, Kaiser, Zhang, Marcelis & Vialet-Chabrand, Plant Methods 2025,
//!   doi:10.1186/s13007-025-01326-3); at 60 % and 10 % it gives 3.19 and 1.95, against 3.23 and
//!   2.02 from the Choi & Okos (1986) model (ASHRAE Refrigeration Handbook, coefficients from
//!   memory).
//! - Oil content and moisture are on the basis of `charge_condition` (fresh, wilted or dried).
//!   A figure published on the other basis is converted by the dry matter: × (1 - w_to)/(1 - w_from).
//! - Run and rate constant agree through t95 = 3/k: where the run time is the better-sourced
//!   number k is derived from it, otherwise the run is derived from k (the row says which).
//! - `typical_water_to_oil_ratio` is practice where a figure was found; otherwise it is derived
//!   from the row itself (steam rate × typical run / oil content), a factor 2 either side.
//! - Charge (packing) densities other than the lavender one are from memory: fresh leafy herbs
//!   loosely forked or trodden 100-250 kg/m³, dried herb 80-150, crushed seeds 350-550, wood
//!   chips 200-300; the middle of the class is taken unless the row says otherwise.

use super::*;

const fn spread(low: f64, typical: f64, high: f64) -> Spread {
    Spread { low, typical, high }
}

const WILTED_HEAT_SOURCE: &str = source!(
    "Wilted or woody-leaved material at about 60 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K)): 3.19 kJ/(kg K), against 3.23 from the Choi & Okos model (ASHRAE Refrigeration Handbook, coefficients from memory)"
);
const DRIED_HEAT_SOURCE: &str = source!(
    "Air-dried material at about 10 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K)): 1.95 kJ/(kg K), against 2.02 from the Choi & Okos model (ASHRAE Refrigeration Handbook, coefficients from memory)"
);

const WARM_CONDENSATE_SOURCE: &str = source!(
    "Oils that crystallise or congeal (peppermint, aniseed, fennel, caraway, rose): keep the condenser worm at 30-40 °C (Roundell, The Still-room, 1903, p. 100); separation is faster and cleaner when warm (Bragantia, Instituto Agronômico de Campinas, 1961)"
);
const COOL_CONDENSATE_SOURCE: &str = source!(
    "About 30 °C: common practice, no source. Warmer condensate separates faster (Bragantia, Instituto Agronômico de Campinas, 1961)"
);

/// Every crop preset.
pub static CROPS: &[Crop] = &[
    Crop {
        id: "lavender",
        name: "Lavender",
        material: "Lavandula angustifolia, fresh or wilted flowering tops",
        oil_content_percent: spread(0.6, 0.9, 1.5),
        oil_content_source: source!(
            "Low 0.6: 0.6-1.0 % (ChemicalBook lavender oil page, text apparently from Fenaroli's Handbook); typical 0.9: steam distillation (CSIR-CIMAP, W. Himalaya, ResearchGate 232957741); high 1.5: 0.5-1.5 % fresh (islandlavender.com, low weight)"
        ),
        composition: &[
            ("linalool", 0.315),
            ("linalyl-acetate", 0.36),
            ("terpinen-4-ol", 0.04),
            ("1-8-cineole", 0.015),
            ("camphor", 0.0075),
            ("d-limonene", 0.005),
            ("alpha-terpineol", 0.01),
        ],
        composition_source: source!(
            "ISO 3515:2002 (other origins) via PMC9148000 Table 2 (Molecules 27:3216): linalool 20-43, linalyl acetate 25-47, terpinen-4-ol ≤ 8, 1,8-cineole ≤ 3, camphor ≤ 1.5, limonene ≤ 1, α-terpineol ≤ 2 %; midpoints or half-limits. Not in the library: lavandulyl acetate, cis- and trans-β-ocimene, 3-octanone, lavandulol"
        ),
        oil_density_kg_per_m3: 883.0,
        oil_density_source: source!(
            "d20/20 0.880-0.890 (Surburg & Panten, Common Fragrance and Flavor Materials, French lavender, via ChemicalBook); midpoint × 998.2 kg/m³"
        ),
        rate_constant_per_min: spread(0.012, 0.05, 0.08),
        rate_constant_source: source!(
            "Typical 0.05: yield maximum at 60 min (Zheljazkov, Cantrell, Astatkie & Jeliazkova, J Oleo Sci 62:195-199, 2013), k ≈ 3/60; low 0.012: two points (1 % at 40 min, 2 % at 120 min; Wesołowska, Jadczak & Grzeszczuk, Herba Polonica) fitted to first order, a lower bound; high 0.08: near the exudation constant 0.072 per min measured for lavandin (Cerpa, Mato & Cocero, AIChE J 54:909-917, 2008), rounded up, judgement"
        ),
        typical_run_min: spread(30.0, 60.0, 90.0),
        typical_run_source: source!(
            "Typical 60: yield maximum at 60 min (Zheljazkov et al. 2013), the same source as k; low 30: 30-40 min in traditional Provence alembics, which leave oil behind (terraroma.fr, lavandes.fr, low weight); high 90: from memory"
        ),
        typical_water_to_oil_ratio: spread(10.0, 20.0, 30.0),
        water_to_oil_source: source!(
            "At most 20:1 in good practice (E.F.K. Denny, in Lis-Balchin (ed.), Lavender: the genus Lavandula, 2002; attribution from memory); 10 and 30 from memory"
        ),
        steam_rate_kg_per_h_per_kg: 0.3,
        steam_rate_source: source!(
            "Total distillate water:oil should not exceed 20:1 for lavender (text attributed to E.F.K. Denny in Lis-Balchin (ed.), Lavender: the genus Lavandula, 2002; attribution from memory), i.e. at most 0.13-0.3 kg steam per kg charge per run for 0.67-1.5 % oil; 0.3 kg/h per kg (range 0.2-0.6) is a judgement, no source"
        ),
        charge_density_kg_per_m3: 165.0,
        charge_density_source: source!(
            "60 L still packed to the top with 9-11 kg of fresh lavender: 150-183 kg/m³ (ebonyhillsfarm.com.au, low weight); middle taken"
        ),
        charge_condition: ChargeCondition::Wilted,
        moisture_fraction: 0.6,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.6,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "No published moisture at harvest found; lavender is usually wilted 1-2 days before distilling (terraroma.fr, lavandes.fr, low weight); 50-65 % water at cutting from memory, 60 % taken; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "lavandin",
        name: "Lavandin",
        material: "Lavandula × intermedia ('Grosso', 'Super', 'Abrial'), fresh or wilted flowering stems",
        oil_content_percent: spread(1.36, 2.0, 3.0),
        oil_content_source: source!(
            "Low 1.36 ± 0.14 %: 'Super', bench steam distillation (Cerpa, Mato & Cocero, AIChE J 54:909-917, 2008); typical 2.0: 50 kg lavandin per kg oil (phyto-aroma.com, low weight); high 3.0: 1.5-3 % (islandlavender.com, low weight)"
        ),
        composition: &[
            ("linalool", 0.305),
            ("linalyl-acetate", 0.315),
            ("camphor", 0.0725),
            ("1-8-cineole", 0.06),
            ("terpinen-4-ol", 0.0325),
            ("d-limonene", 0.01),
        ],
        composition_source: source!(
            "ISO 8902 (lavandin Grosso) via PMC9000678 Table 6 (Molecules 27:2152): linalool 24-37, linalyl acetate 25-38, camphor 6.5-8, 1,8-cineole 4-8, terpinen-4-ol 1.5-5, limonene 0.5-1.5 %; midpoints. Not in the library: borneol 1.5-3.5, lavandulyl acetate 1.5-3.5 %"
        ),
        oil_density_kg_per_m3: 889.0,
        oil_density_source: source!(
            "Lavandin Abrial, ISO 3054: 0.885-0.897 (iso.org abstract; read as d20/20, from memory of ISO practice); midpoint × 998.2 kg/m³"
        ),
        rate_constant_per_min: spread(0.04, 0.07, 0.08),
        rate_constant_source: source!(
            "Typical 0.07: exudation constant 0.072 per min, lavandin 'Super', bench steam distillation (Cerpa, Mato & Cocero, AIChE J 54:909-917, 2008); low 0.04: chopped green lavandin in caissons, 1-1.5 h per batch (terraroma.fr, low weight), k ≈ 3/75 rounded; high 0.08: judgement, no source"
        ),
        typical_run_min: spread(30.0, 40.0, 90.0),
        typical_run_source: source!(
            "30-40 min for whole stems in traditional alembics; 60-90 min for chopped green material in mobile caissons (terraroma.fr, low weight)"
        ),
        typical_water_to_oil_ratio: spread(19.0, 25.0, 33.0),
        water_to_oil_source: source!(
            "19-33:1 worked out from caisson fuel use, about 200 L fuel oil per hour for about 100 kg oil per caisson over 1-1.5 h (greenandzen blog, terraroma.fr, low weight); 25 taken"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!(
            "Caissons: ≈200 L fuel oil per hour for ≈100 kg oil per caisson over 1-1.5 h (greenandzen blog, terraroma.fr, low weight) gives ≈1.9-2.2 t/h steam (35.8 MJ/L, boiler 70-80 %) and water:oil 19-33:1; 0.4 kg/h per kg for whole stems (0.6 chopped) is a judgement, no source"
        ),
        charge_density_kg_per_m3: 165.0,
        charge_density_source: source!(
            "Taken equal to fresh lavender: 60 L still packed with 9-11 kg, 150-183 kg/m³ (ebonyhillsfarm.com.au, low weight); no lavandin value found"
        ),
        charge_condition: ChargeCondition::Wilted,
        moisture_fraction: 0.6,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.6,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Taken equal to wilted lavender: 60 % water from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "peppermint",
        name: "Peppermint",
        material: "Mentha × piperita, fresh or lightly wilted herb",
        oil_content_percent: spread(0.3, 0.5, 0.7),
        oil_content_source: source!(
            "0.3-0.7 % of fresh overground parts (ChemicalBook peppermint oil page); typical = midpoint"
        ),
        composition: &[
            ("menthol", 0.425),
            ("menthone", 0.23),
            ("1-8-cineole", 0.0875),
            ("menthyl-acetate", 0.064),
            ("d-limonene", 0.03),
        ],
        composition_source: source!(
            "Ph. Eur. ranges (europeanmedical.info; whatdoesmean.net repeats them): menthol 30-55, menthone 14-32, cineole 3.5-14, menthyl acetate 2.8-10, limonene 1-5 %; midpoints. Menthol of mint is l-menthol; its vapour pressure is taken from the DL-menthol set. Not in the library: isomenthone 1.5-10, menthofuran 1-9, pulegone ≤ 4 %"
        ),
        oil_density_kg_per_m3: 903.0,
        oil_density_source: source!(
            "US oils d20/20 0.899-0.911 (Surburg & Panten, Common Fragrance and Flavor Materials, via ChemicalBook); midpoint × 998.2 kg/m³"
        ),
        rate_constant_per_min: spread(0.025, 0.04, 0.06),
        rate_constant_source: source!(
            "No fitted constant found for peppermint; 0.04 (0.025-0.06) matches a 60-90 min run (run times from memory), judgement"
        ),
        typical_run_min: spread(60.0, 75.0, 90.0),
        typical_run_source: source!("60-90 min after the first drop, from memory (1-1.5 h in a mint tub)"),
        typical_water_to_oil_ratio: spread(60.0, 120.0, 240.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 75/60 / 0.005 ≈ 120 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!(
            "No published steam rate for peppermint seen; 0.5 kg/h per kg is a judgement close to the 0.54 kg/h per kg of a 300 g rosemary test (kttpmt.ntt.edu.vn, Vietnam)"
        ),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.84,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.84,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh peppermint leaves 83.2-84.9 % water, wet basis (Pliestić, Dobričević & Filipović, hrcak.srce.hr/18199); heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 40.0,
        distillate_temperature_source: WARM_CONDENSATE_SOURCE,
    },
    Crop {
        id: "spearmint",
        name: "Spearmint",
        material: "Mentha spicata, fresh herb",
        oil_content_percent: spread(0.25, 0.375, 0.5),
        oil_content_source: source!(
            "0.25-0.5 % (A Treatise on Beverages, 1890s, 'Oil of Spearmint'); typical = midpoint"
        ),
        composition: &[("carvone", 0.62), ("d-limonene", 0.15), ("1-8-cineole", 0.02), ("myrcene", 0.02)],
        composition_source: source!(
            "From memory: carvone about 55-70 %, limonene 10-25 %, 1,8-cineole and myrcene about 2 % each. The carvone and limonene of spearmint are the l-enantiomers; enantiomers share vapour pressure, so the l-carvone and d-limonene rows are used"
        ),
        oil_density_kg_per_m3: 923.0,
        oil_density_source: source!(
            "About 0.917-0.934 at 25 °C (FCC-type range), from memory; midpoint × 997.0 kg/m³"
        ),
        rate_constant_per_min: spread(0.025, 0.04, 0.06),
        rate_constant_source: source!(
            "No fitted constant found; taken equal to peppermint (a 60-90 min run, from memory), judgement"
        ),
        typical_run_min: spread(60.0, 75.0, 90.0),
        typical_run_source: source!("1-1.5 h, from memory"),
        typical_water_to_oil_ratio: spread(85.0, 170.0, 340.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 75/60 / 0.00375 ≈ 170 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!("Taken equal to peppermint, judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.8,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.8,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Mint (M. spicata) 60-88 % water (ilovetranslation copy of a drying paper, low weight), 80 % taken; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "rosemary",
        name: "Rosemary",
        material: "Salvia rosmarinus (Rosmarinus officinalis), leafy tips, cineole type",
        oil_content_percent: spread(0.5, 1.2, 2.5),
        oil_content_source: source!(
            "Leaves hold 0.5-2.5 % (ChemicalBook, text from Leung, Encyclopedia of Common Natural Ingredients); typical 1.20 % by steam distillation (Boutekedjiret et al. 1997, via Lawrence, Progress in Essential Oils, perfumerflavorist.com)"
        ),
        composition: &[
            ("1-8-cineole", 0.605),
            ("alpha-pinene", 0.115),
            ("camphor", 0.10),
            ("beta-pinene", 0.065),
            ("camphene", 0.045),
        ],
        composition_source: source!(
            "1,8-cineole 58-63 % in the Moroccan cineole chemotype ('A Study of Moroccan Rosemary Oils', scilit); the others from memory of the ISO 1342 Tunisian/Moroccan type: α-pinene 9-14, camphor 5-15, β-pinene 4-9, camphene 2.5-6.5 %; midpoints"
        ),
        oil_density_kg_per_m3: 901.0,
        oil_density_source: source!(
            "About 0.892-0.910 at 20 °C (ISO 1342-type range), from memory; midpoint"
        ),
        rate_constant_per_min: spread(0.02, 0.03, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; 0.03 (0.02-0.05) matches the 70 min run of a 300 g test (kttpmt.ntt.edu.vn, Vietnam) and 100 min runs in a steam column (sid.ir), judgement"
        ),
        typical_run_min: spread(70.0, 90.0, 120.0),
        typical_run_source: source!(
            "70 min (kttpmt.ntt.edu.vn, Vietnam); 100 min (sid.ir research-plan abstract, Iran); 120 min upper end from memory"
        ),
        typical_water_to_oil_ratio: spread(15.0, 21.0, 40.0),
        water_to_oil_source: source!(
            "21:1 in a 300 g test of dried, blended rosemary (kttpmt.ntt.edu.vn, Vietnam); 15 and 40 from memory"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!(
            "0.045 mL/s distillate from 300 g of dried, blended rosemary = 0.54 kg/h per kg, water:oil ≈ 21:1 (kttpmt.ntt.edu.vn, Vietnam); a lower steam flow gave a higher yield in a small column (sid.ir); 0.5 taken"
        ),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Wilted,
        moisture_fraction: 0.6,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.6,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: WILTED_HEAT_SOURCE,
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "eucalyptus-globulus",
        name: "Eucalyptus (blue gum)",
        material: "Eucalyptus globulus, fresh or partly dried leaves",
        oil_content_percent: spread(0.88, 1.0, 3.5),
        oil_content_source: source!(
            "Low 0.88: 0.96 % v/w from fresh leaves, Algeria (Boukhatem et al., Int. Lett. Chem. Phys. Astron. 36:303, 2014) × 0.915 oil density; typical 1.0: about 1 % of fresh or partly dried leaves (ChemicalBook; eucalyptusoil.com); high 3.5: commercial, fresh-leaf basis 1.5-3.5 %, from memory"
        ),
        composition: &[("1-8-cineole", 0.65), ("alpha-pinene", 0.16), ("d-limonene", 0.06)],
        composition_source: source!(
            "Crude oil more than 60 % 1,8-cineole and 10-22 % α-pinene (Bauer, Garbe & Surburg text via ChemicalBook, CAS 8000-48-4); Indian natural oil 60-63 % cineole; limonene trace-12 % (BP, eucalyptusoil.com); cineole 0.65 and midpoints taken"
        ),
        oil_density_kg_per_m3: 913.0,
        oil_density_source: source!(
            "Crude oil d20/20 0.905-0.925 (Surburg & Panten, Common Fragrance and Flavor Materials, via ChemicalBook); midpoint × 998.2 kg/m³"
        ),
        rate_constant_per_min: spread(0.01, 0.02, 0.03),
        rate_constant_source: source!(
            "No fitted constant found; the leaf oil lies in internal cavities, so slower than surface-gland herbs (from memory); 0.02 (0.01-0.03) matches a 90-150 min run, judgement"
        ),
        typical_run_min: spread(90.0, 120.0, 150.0),
        typical_run_source: source!("1-2 h for fresh leaf, longer in commercial stills, from memory"),
        typical_water_to_oil_ratio: spread(40.0, 80.0, 160.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 120/60 / 0.01 ≈ 80 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!(
            "No normalised rate found (a pilot unit ran 5.73 g/min, Armijo et al., Rev Per Quím Ing Quím 15(2):19-27, 2012, charge not given); 0.4 kg/h per kg is a judgement, no source"
        ),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Leaves with twigs, loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Wilted,
        moisture_fraction: 0.6,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.6,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: WILTED_HEAT_SOURCE,
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "tea-tree",
        name: "Tea tree",
        material: "Melaleuca alternifolia, leaves and terminal branchlets, finely cut",
        oil_content_percent: spread(1.0, 1.5, 2.3),
        oil_content_source: source!(
            "1-2 % of wet material (biologyinsights.com, low weight), typical = midpoint; high 2.30 % from needle leaves by hydrodistillation (EOPAA abstract, eopaa.com.au)"
        ),
        composition: &[
            ("terpinen-4-ol", 0.40),
            ("gamma-terpinene", 0.19),
            ("1-8-cineole", 0.075),
            ("p-cymene", 0.0625),
            ("alpha-pinene", 0.035),
            ("d-limonene", 0.0225),
            ("terpinolene", 0.0325),
            ("alpha-terpineol", 0.0475),
            ("alpha-terpinene", 0.09),
        ],
        composition_source: source!(
            "ISO 4730 via PMC5516420 Table 1 and teatree.org.au: terpinen-4-ol ≥ 30 (typical 40), γ-terpinene 10-28, α-terpinene 5-13, 1,8-cineole ≤ 15, p-cymene 0.5-12, α-pinene 1-6, limonene 0.5-4, terpinolene 1.5-5, α-terpineol 1.5-8 %; typical, midpoints or half-limits"
        ),
        oil_density_kg_per_m3: 890.0,
        oil_density_source: source!(
            "0.89 g/cm³ at 20 °C (ECHA registration dossier summary, chesar.echa.europa.eu)"
        ),
        rate_constant_per_min: spread(0.025, 0.03, 0.04),
        rate_constant_source: source!(
            "Commercial stills 'cook' the cut biomass for up to 2 h (ATTIA, attia.org.au); k ≈ 0.025-0.03 per min if about 95 % is then recovered; high 0.04: judgement, no source"
        ),
        typical_run_min: spread(90.0, 105.0, 120.0),
        typical_run_source: source!(
            "Up to 2 h (ATTIA, attia.org.au); 1.5-2 h per batch (ecoarts.cn, low weight)"
        ),
        typical_water_to_oil_ratio: spread(29.0, 58.0, 120.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 105/60 / 0.015 ≈ 58 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!("No published steam rate seen; 0.5 kg/h per kg is a judgement, no source"),
        charge_density_kg_per_m3: 250.0,
        charge_density_source: source!(
            "Finely cut leaf and branchlet, packed: upper end of fresh leafy herbs (100-250 kg/m³) and middle of wood chips (200-300 kg/m³), from memory"
        ),
        charge_condition: ChargeCondition::Wilted,
        moisture_fraction: 0.6,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.6,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: WILTED_HEAT_SOURCE,
        distillate_temperature_c: 40.0,
        distillate_temperature_source: source!(
            "The condenser brings the mixture to 35-55 °C; the oil then stands 12 h in day tanks (ATTIA, attia.org.au); 40 °C taken"
        ),
    },
    Crop {
        id: "clove-bud",
        name: "Clove bud",
        material: "Syzygium aromaticum, dried buds, comminuted",
        oil_content_percent: spread(12.9, 16.0, 21.0),
        oil_content_source: source!(
            "Buds 12.9-18.5 % (Zachariah et al. 2005, via the book 'Volatiles from herbs and spices', issuhub.com); 15-21 % volatile oil (Merck Index / Leung text, druglead.com); typical 16 %"
        ),
        composition: &[("eugenol", 0.75), ("eugenyl-acetate", 0.145), ("beta-caryophyllene", 0.085)],
        composition_source: source!(
            "Eugenol 60-90 %, eugenyl acetate 2-27 %, β-caryophyllene 5-12 % (Merck Index text, druglead.com/cds/clove.html); midpoints"
        ),
        oil_density_kg_per_m3: 1046.0,
        oil_density_source: source!(
            "d25/25 1.038-1.060, heavier than water (Merck Index text, druglead.com); midpoint × 997.0 kg/m³"
        ),
        rate_constant_per_min: spread(0.0042, 0.005, 0.0063),
        rate_constant_source: source!(
            "No fitted constant found; derived from the 8-12 h run (from memory) by k = 3/t95: 3/600, 3/720 and 3/480 per min. Clove is limited by steam, not by rate: eugenol needs at least about 25 kg water per kg oil (ideal immiscible equilibrium, computed with thermo 0.6.1 and CoolProp 8.0.0)"
        ),
        typical_run_min: spread(480.0, 600.0, 720.0),
        typical_run_source: source!("8-12 h or more, from memory"),
        typical_water_to_oil_ratio: spread(30.0, 40.0, 60.0),
        water_to_oil_source: source!(
            "From memory: 30-60:1 in practice. It cannot be under the ideal minimum, about 25:1 for eugenol alone at one atmosphere (computed with thermo 0.6.1 and CoolProp 8.0.0) and 26.5:1 for this oil with its eugenyl acetate (this program, sea level)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!(
            "0.5 kg/h per kg is a judgement, no source; the run needs at least 4-5 kg steam per kg buds in total (about 25 kg water per kg eugenol at equilibrium × 16 % oil; computed with thermo 0.6.1 and CoolProp 8.0.0)"
        ),
        charge_density_kg_per_m3: 350.0,
        charge_density_source: source!(
            "Crushed seeds 350-550 kg/m³, from memory; lower end taken for comminuted buds"
        ),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: DRIED_HEAT_SOURCE,
        distillate_temperature_c: 30.0,
        distillate_temperature_source: source!(
            "About 30 °C: common practice, no source. The oil sinks (d25/25 1.038-1.060, Merck Index text): use a separator that draws oil from the bottom"
        ),
    },
    Crop {
        id: "coriander-seed",
        name: "Coriander seed",
        material: "Coriandrum sativum, crushed ripe fruit",
        oil_content_percent: spread(0.3, 0.75, 1.7),
        oil_content_source: source!(
            "0.3-1.2 % (aho97.com crop page), typical = midpoint; high 1.4-1.7 % for Norwegian fruit (book page 'Volatiles from herbs and spices', issuhub.com); 0.5-1 % (A Treatise on Beverages)"
        ),
        composition: &[
            ("linalool", 0.785),
            ("alpha-pinene", 0.05),
            ("camphor", 0.039),
            ("gamma-terpinene", 0.038),
            ("d-limonene", 0.026),
            ("geranyl-acetate", 0.021),
        ],
        composition_source: source!(
            "One Polish oil: linalool 78.5, α-pinene 5.0, camphor 3.9, γ-terpinene 3.8, limonene 2.6, geranyl acetate 2.1 % (Pol J Food Nutr Sci 68(3):243-249, 2018)"
        ),
        oil_density_kg_per_m3: 865.0,
        oil_density_source: source!(
            "Specific gravity 0.860-0.870 (A Treatise on Beverages, 'Oil of Coriander'); USP: 0.863-0.875; midpoint of the first"
        ),
        rate_constant_per_min: spread(0.03, 0.05, 0.09),
        rate_constant_source: source!(
            "Hydrodistillation of crushed fruit: 1.20 % at 15 min, 1.62 % at 2 h (Pol J Food Nutr Sci 68(3):243-249, 2018) gives k ≈ 0.09 per min; steam distillation assumed slower (0.05, low 0.03), judgement"
        ),
        typical_run_min: spread(35.0, 60.0, 100.0),
        typical_run_source: source!(
            "Derived from k by t95 = 3/k (3/0.09, 3/0.05, 3/0.03 min); a 2 h laboratory run recovered 1.62 % (Pol J Food Nutr Sci 68(3), 2018)"
        ),
        typical_water_to_oil_ratio: spread(26.0, 53.0, 110.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 60/60 / 0.0075 ≈ 53 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("No published steam rate seen; 0.4 kg/h per kg is a judgement, no source"),
        charge_density_kg_per_m3: 450.0,
        charge_density_source: source!("Crushed seeds 350-550 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: DRIED_HEAT_SOURCE,
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "thyme",
        name: "Thyme",
        material: "Thymus vulgaris (thymol type), flowering tops",
        oil_content_percent: spread(1.7, 2.1, 2.5),
        oil_content_source: source!(
            "1.7-2.5 kg per 100 kg flowering tops (puressentiel.com herbarium, low weight); typical = midpoint"
        ),
        composition: &[
            ("thymol", 0.46),
            ("p-cymene", 0.21),
            ("gamma-terpinene", 0.075),
            ("linalool", 0.0475),
            ("carvacrol", 0.03),
        ],
        composition_source: source!(
            "From memory (thymol-type thyme oil): thymol 37-55, p-cymene 14-28, γ-terpinene 4-11, linalool 3-6.5, carvacrol 0.5-5.5 %; midpoints"
        ),
        oil_density_kg_per_m3: 925.0,
        oil_density_source: source!("About 0.915-0.935 at 20 °C (thymol type), from memory; midpoint"),
        rate_constant_per_min: spread(0.02, 0.03, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; taken equal to rosemary (a leafy Lamiaceae herb distilled 70-120 min), judgement"
        ),
        typical_run_min: spread(90.0, 120.0, 180.0),
        typical_run_source: source!("1.5-3 h, from memory"),
        typical_water_to_oil_ratio: spread(24.0, 48.0, 96.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 120/60 / 0.021 ≈ 48 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!(
            "Taken equal to rosemary (0.54 kg/h per kg in a 300 g test, kttpmt.ntt.edu.vn, Vietnam), judgement"
        ),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Wilted,
        moisture_fraction: 0.6,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.6,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: WILTED_HEAT_SOURCE,
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "oregano",
        name: "Oregano",
        material: "Origanum spp. (carvacrol type), dried herb",
        oil_content_percent: spread(1.5, 2.75, 4.0),
        oil_content_source: source!("1.5-4 % of dried herb, from memory; typical = midpoint"),
        composition: &[
            ("carvacrol", 0.65),
            ("p-cymene", 0.08),
            ("gamma-terpinene", 0.05),
            ("thymol", 0.02),
            ("beta-caryophyllene", 0.02),
        ],
        composition_source: source!(
            "From memory (carvacrol-type oregano oil): carvacrol about 60-75, p-cymene 5-10, γ-terpinene 3-7, thymol and β-caryophyllene about 2 % each"
        ),
        oil_density_kg_per_m3: 948.0,
        oil_density_source: source!("About 0.935-0.960 at 20 °C, from memory; midpoint"),
        rate_constant_per_min: spread(0.017, 0.02, 0.025),
        rate_constant_source: source!(
            "No fitted constant found; derived from the 2-3 h run (from memory) by k = 3/t95: 3/150, 3/180 and 3/120 per min"
        ),
        typical_run_min: spread(120.0, 150.0, 180.0),
        typical_run_source: source!("2-3 h, from memory"),
        typical_water_to_oil_ratio: spread(22.0, 45.0, 90.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 150/60 / 0.0275 ≈ 45 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!(
            "Taken equal to rosemary (0.54 kg/h per kg of dried charge in a 300 g test, kttpmt.ntt.edu.vn, Vietnam), judgement"
        ),
        charge_density_kg_per_m3: 115.0,
        charge_density_source: source!("Dried leaves or herb 80-150 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: DRIED_HEAT_SOURCE,
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "clary-sage",
        name: "Clary sage",
        material: "Salvia sclarea, fresh inflorescences",
        oil_content_percent: spread(0.15, 0.165, 0.18),
        oil_content_source: source!(
            "0.15-0.18 %, maximum at the end of flowering (J-STAGE abstract, journal code jsta1957, vol. 21); typical = midpoint. The '0.7-1.5 %' of Wikipedia 'Sage oil' is probably another basis"
        ),
        composition: &[("linalyl-acetate", 0.67), ("linalool", 0.15), ("beta-caryophyllene", 0.02)],
        composition_source: source!(
            "From memory: linalyl acetate about 56-78, linalool 6.5-24, β-caryophyllene about 2 %; midpoints. Not in the library: germacrene D, sclareol (α-terpineol, a few %, is left out too)"
        ),
        oil_density_kg_per_m3: 899.0,
        oil_density_source: source!("About 0.890-0.908 at 20 °C, from memory; midpoint"),
        rate_constant_per_min: spread(0.025, 0.033, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; derived from the 1-2 h run (from memory) by k = 3/t95: 3/90, 3/120 and 3/60 per min"
        ),
        typical_run_min: spread(60.0, 90.0, 120.0),
        typical_run_source: source!("1-2 h, from memory"),
        typical_water_to_oil_ratio: spread(140.0, 270.0, 540.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.3 × 90/60 / 0.00165 ≈ 270 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.3,
        steam_rate_source: source!("Taken equal to lavender, judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.8,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.8,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh inflorescences, 80 % water from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "german-chamomile",
        name: "German chamomile",
        material: "Matricaria chamomilla, fresh flower heads",
        oil_content_percent: spread(0.067, 0.14, 0.22),
        oil_content_source: source!(
            "0.3-1.0 % of the dried flower heads (Šavikin et al., Lekovite sirovine, abstract; pharmacopoeial assays are on the dried drug), converted to fresh flowers at 80 % water (fresh) and 10 % (dried): × (1 - 0.8)/(1 - 0.1) = 0.222, giving 0.067-0.22 %; typical = midpoint; a steam distillation reached 3.1 g oil per kg flowers after 720 min (Gawde, Cantrell, Zheljazkov, Astatkie & Schlegel, chamomile kinetics abstract)"
        ),
        composition: &[("beta-caryophyllene", 1.0)],
        composition_source: source!(
            "The main compounds (bisabolol oxides A and B, bisabolone oxide A, chamazulene, (E)-β-farnesene, spiroethers; Gawde et al.; Šavikin et al.) are not in the library. β-Caryophyllene, a C15 sesquiterpene hydrocarbon like (E)-β-farnesene, stands in for the whole oil (fraction 1 by construction): a choice made here, no source; the real oil is less volatile"
        ),
        oil_density_kg_per_m3: 930.0,
        oil_density_source: source!("About 0.91-0.95 (blue, viscous), from memory; midpoint"),
        rate_constant_per_min: spread(0.006, 0.008, 0.012),
        rate_constant_source: source!(
            "Key constituents plateau after about 240 min, maximum 3.1 g/kg at 720 min (Gawde et al., chamomile steam-distillation kinetics abstract); t95 ≈ 240-480 min gives k ≈ 0.006-0.012 per min"
        ),
        typical_run_min: spread(240.0, 360.0, 480.0),
        typical_run_source: source!(
            "Plateau after about 240 min (Gawde et al.); 6-13 h in practice, from memory"
        ),
        typical_water_to_oil_ratio: spread(850.0, 1700.0, 3400.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 360/60 / 0.0014 ≈ 1700 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("No published steam rate seen; 0.4 kg/h per kg is a judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.8,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.8,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh flower heads, 80 % water from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "rose",
        name: "Damask rose",
        material: "Rosa damascena, fresh flowers",
        oil_content_percent: spread(0.017, 0.025, 0.067),
        oil_content_source: source!(
            "1/6000-1/3000 of flower weight, 0.017-0.033 % (Wikipedia 'Rose oil'); typical 0.025: 1 kg oil per about 4000 kg flowers (sonomascentstudio.com, low weight; phyto-aroma.com, low weight); high 0.067 % after 5 h (Sharma & Kumar, J Essent Oil Bear Plants 21:92, 2018)"
        ),
        composition: &[
            ("citronellol", 0.30),
            ("geraniol", 0.18),
            ("nerol", 0.08),
            ("nonadecane", 0.10),
            ("heneicosane", 0.04),
            ("2-phenylethanol", 0.02),
        ],
        composition_source: source!(
            "From memory (ISO 9842-type rose oil): citronellol about 20-40, geraniol 15-22, 2-phenylethanol 1-3 % (most of it stays in the rose water). nerol 5-12 % (8 taken), the paraffin 'stearoptene' about 15 %, mostly nonadecane with some heneicosane (10 + 4 taken). Not in the library: eicosane, methyleugenol, farnesol (a few % each)"
        ),
        oil_density_kg_per_m3: 855.0,
        oil_density_source: source!(
            "About 0.848-0.861 (ISO 9842-type), from memory; midpoint. The oil congeals near 18-23 °C"
        ),
        rate_constant_per_min: spread(0.01, 0.03, 0.05),
        rate_constant_source: source!(
            "Typical 0.03 and high 0.05: the still is fired 60-105 min for the first stage (Wikipedia 'Rose oil'), k ≈ 3/100 and 3/60; low 0.01: maximum oil content reached at 5 h (Sharma & Kumar, J Essent Oil Bear Plants 21:92, 2018), k ≈ 3/300"
        ),
        typical_run_min: spread(60.0, 90.0, 300.0),
        typical_run_source: source!(
            "60-105 min first stage, then cohobation of the waters (Wikipedia 'Rose oil'); 5 h to the maximum (Sharma & Kumar 2018)"
        ),
        typical_water_to_oil_ratio: spread(2000.0, 4000.0, 8000.0),
        water_to_oil_source: source!(
            "1 kg oil per 3000-6000 kg flowers (Wikipedia 'Rose oil') with about 1 kg of first distillate per kg flowers (from memory), before cohobation; low and high from memory"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!(
            "No published steam rate seen (rose is traditionally water-distilled); 0.4 kg/h per kg is a judgement, no source"
        ),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken for fresh flowers"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.8,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.8,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh flowers, 80 % water from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 40.0,
        distillate_temperature_source: WARM_CONDENSATE_SOURCE,
    },
    Crop {
        id: "juniper-berry",
        name: "Juniper berry",
        material: "Juniperus communis, dried berries, crushed",
        oil_content_percent: spread(0.5, 1.5, 2.6),
        oil_content_source: source!(
            "0.5-0.6 % non-fermented, 0.8-1.6 % fermented, dried Italian berries up to 2.6 % (ChemicalBook juniper berry oil, Fenaroli text); typical 1.5, from memory"
        ),
        composition: &[
            ("alpha-pinene", 0.416),
            ("beta-pinene", 0.276),
            ("d-limonene", 0.064),
            ("terpinen-4-ol", 0.035),
        ],
        composition_source: source!(
            "A laboratory oil: α-pinene 41.6, β-pinene 27.6, limonene 6.4 % (Falcão et al., Ind. Crops Prod. 124:878, 2018; α-pinene 25-45 % in Bauer, Garbe & Surburg via ChemicalBook CB5126800); terpinen-4-ol 1-6 %, the main oxygenated compound (Bauer, Garbe & Surburg), midpoint. A commercial oil in the same paper had α-pinene 31.1, myrcene 16.3, sabinene 7.5 % (not entered: the laboratory oil is the basis of this row, and it reports no sabinene)"
        ),
        oil_density_kg_per_m3: 865.0,
        oil_density_source: source!(
            "d20 0.850-0.880 (Bauer, Garbe & Surburg via ChemicalBook CB5126800); midpoint, read as g/cm³"
        ),
        rate_constant_per_min: spread(0.01, 0.015, 0.02),
        rate_constant_source: source!(
            "Washing and diffusion run at the same time in juniper berries (Marković et al., J Chem Technol Biotechnol 91:883-891, 2016), values not seen; 0.015 matches a 3-5 h run, judgement; about 30 % may come off at once from crushed berries, judgement"
        ),
        typical_run_min: spread(180.0, 240.0, 300.0),
        typical_run_source: source!("3-5 h, judgement; 4-8 h, from memory"),
        typical_water_to_oil_ratio: spread(55.0, 110.0, 220.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 240/60 / 0.015 ≈ 110 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("No published steam rate seen; 0.4 kg/h per kg is a judgement, no source"),
        charge_density_kg_per_m3: 450.0,
        charge_density_source: source!(
            "Crushed seeds 350-550 kg/m³, from memory; middle taken for crushed berries"
        ),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: DRIED_HEAT_SOURCE,
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "lemongrass",
        name: "Lemongrass",
        material: "Cymbopogon flexuosus / C. citratus, fresh or partly wilted leaves, cut",
        oil_content_percent: spread(0.2, 0.265, 0.5),
        oil_content_source: source!(
            "Typical 0.265: 2.98 mL oil per kg from a 25-30 kg water-steam still, 10 mm cut, 180 min (thuvienso.quangbinhuni.edu.vn) × 0.885 oil density; 0.2-0.5 % of fresh leaves, from memory"
        ),
        composition: &[("geranial", 0.75), ("myrcene", 0.10), ("geraniol", 0.03)],
        composition_source: source!(
            "From memory: citral (geranial + neral) 65-85 %, myrcene up to 10-20 % in C. citratus, geraniol a few %. Neral is not in the library: all citral is entered as geranial (neral is the more volatile isomer; the 485.1 K listed for it in chemicals 1.5.2 is only a Joback group-contribution estimate and no measured vapour pressure was found, so this underestimates the oil's volatility by an unknown, probably small, amount)"
        ),
        oil_density_kg_per_m3: 882.0,
        oil_density_source: source!(
            "Specific gravity 0.8725-0.8965 at 25 °C (Nepali producer specifications, alternative.org.np, nripl.net; low weight); midpoint × 997.0 kg/m³"
        ),
        rate_constant_per_min: spread(0.009, 0.045, 0.05),
        rate_constant_source: source!(
            "Typical 0.045: mean k 0.0451 for steam distillation of 100 g (Amenaghawon et al., IJASE 12(2):107-115, 2014; unit presumably per min); low 0.009: hydrodistillation 0.0087-0.0109 per min (Baou et al., Asian J Res Chem 15(3), 2022); high 0.05: judgement"
        ),
        typical_run_min: spread(60.0, 70.0, 180.0),
        typical_run_source: source!(
            "Optimum 180 min in a 25-30 kg water-steam still (thuvienso.quangbinhuni.edu.vn); typical 70 ≈ 3/k with the measured k 0.045 (Amenaghawon et al. 2014); 60-120 min, judgement"
        ),
        typical_water_to_oil_ratio: spread(110.0, 220.0, 440.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 70/60 / 0.00265 ≈ 220 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!(
            "No normalised rate found; looser packing and more steam raise yield in 70-1000 kg pilot stills (Koul et al., Indian J Chem Technol 11:135-139, 2004); 0.5 kg/h per kg is a judgement"
        ),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.8,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.8,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh leaves, 80 % water from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 32.0,
        distillate_temperature_source: source!(
            "For the related citronella grass the condensate should be 30-35 °C, with losses above 60 °C (haihangindustry.com, low weight); 32 °C taken"
        ),
    },
    Crop {
        id: "basil",
        name: "Sweet basil",
        material: "Ocimum basilicum (linalool type), fresh flowering herb",
        oil_content_percent: spread(0.21, 0.21, 0.43),
        oil_content_source: source!(
            "0.21 % by steam distillation, 0.43 % by water distillation (Özek et al. 1995, via Lawrence, Progress in Essential Oils, perfumerflavorist.com)"
        ),
        composition: &[("linalool", 0.50), ("estragole", 0.10), ("1-8-cineole", 0.06), ("eugenol", 0.06)],
        composition_source: source!(
            "From memory (linalool-type sweet basil): linalool about 40-60, estragole 5-20, 1,8-cineole and eugenol about 3-10 % each"
        ),
        oil_density_kg_per_m3: 910.0,
        oil_density_source: source!(
            "About 0.90-0.92 for the linalool type, from memory (the methyl-chavicol type is 0.952-0.973); midpoint"
        ),
        rate_constant_per_min: spread(0.025, 0.04, 0.06),
        rate_constant_source: source!(
            "No fitted constant found (basil was modelled by single-plate diffusion, Cassel et al., Ind. Crops Prod. 29:171-176, 2009, values not seen); taken equal to peppermint, judgement"
        ),
        typical_run_min: spread(60.0, 90.0, 120.0),
        typical_run_source: source!("1-2 h, from memory"),
        typical_water_to_oil_ratio: spread(180.0, 360.0, 720.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 90/60 / 0.0021 ≈ 360 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!("Taken equal to peppermint, judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.85,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.85,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh herb, about 85 % water from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "cedarwood",
        name: "Cedarwood (juniper wood)",
        material: "Juniperus spp. (western juniper, eastern red cedar) wood chips or sawdust",
        oil_content_percent: spread(0.9, 1.4, 3.5),
        oil_content_source: source!(
            "Western juniper: 0.9-1.25 % of dry wood (Kurth & Lackey 1948), about 1.4 % over 32 charges (Kurth & Ross 1954), both via Oregon Forest Products Lab Report C-3 (juniper.oregonstate.edu); Virginian/Texas commercial 2.5-3.5 %, from memory. Steam distillation recovers only about half of the oil in chips (USDA-ARS news, 1999)"
        ),
        composition: &[("beta-caryophyllene", 1.0)],
        composition_source: source!(
            "The main compounds (α-cedrene, thujopsene, cedrol; from memory) are not in the library. β-Caryophyllene, a C15H24 sesquiterpene like α-cedrene (Tb 535.65 K, CRC via chemicals 1.5.2), stands in for the whole oil (fraction 1 by construction): a choice made here, no source; cedrol is less volatile"
        ),
        oil_density_kg_per_m3: 950.0,
        oil_density_source: source!("About 0.940-0.960 (Virginian, d20), from memory; midpoint"),
        rate_constant_per_min: spread(0.001, 0.003, 0.006),
        rate_constant_source: source!(
            "No fitted constant found; k ≈ 3/t95 for runs of 8 h (0.006), 16 h (0.003) and 48 h (0.001), the run times from memory"
        ),
        typical_run_min: spread(480.0, 960.0, 2880.0),
        typical_run_source: source!("8-48 h, from memory"),
        typical_water_to_oil_ratio: spread(230.0, 460.0, 920.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 960/60 / 0.014 ≈ 460 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("No published steam rate seen; 0.4 kg/h per kg is a judgement, no source"),
        charge_density_kg_per_m3: 250.0,
        charge_density_source: source!("Wood chips 200-300 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.12,
        dry_matter_heat_capacity_j_per_kg_k: DRY_WOOD_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.12,
            DRY_WOOD_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Air-dry wood at about 12 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`) with dry wood 1630 J/(kg K) (ASHRAE woods, computed with ht 1.2.0): 0.88 × 1630 + 0.12 × 4180 ≈ 1940"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "anise-seed",
        name: "Anise seed",
        material: "Pimpinella anisum, crushed ripe fruit",
        oil_content_percent: spread(1.5, 2.5, 4.0),
        oil_content_source: source!(
            "1.5-4 %, typical 2.5 %, from memory. A pilot steam distillation showed two regimes with a critical oil content of 0.011 g/g (Romdhane & Tizaoui, J Chem Technol Biotechnol 80(7):759-766, 2005)"
        ),
        composition: &[("e-anethole", 0.90), ("estragole", 0.02)],
        composition_source: source!("From memory: (E)-anethole about 87-94 %, estragole 0.5-5 %"),
        oil_density_kg_per_m3: 985.0,
        oil_density_source: source!("About 0.980-0.990 at 20 °C, from memory; midpoint"),
        rate_constant_per_min: spread(0.017, 0.025, 0.05),
        rate_constant_source: source!(
            "No constant seen (Romdhane & Tizaoui 2005 report two regimes, values not seen); derived from the 1-3 h run (from memory) by k = 3/t95: 3/120, 3/180 and 3/60 per min"
        ),
        typical_run_min: spread(60.0, 120.0, 180.0),
        typical_run_source: source!("1-3 h, from memory"),
        typical_water_to_oil_ratio: spread(16.0, 32.0, 64.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 120/60 / 0.025 ≈ 32 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("No published steam rate seen; 0.4 kg/h per kg is a judgement, no source"),
        charge_density_kg_per_m3: 450.0,
        charge_density_source: source!("Crushed seeds 350-550 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: DRIED_HEAT_SOURCE,
        distillate_temperature_c: 40.0,
        distillate_temperature_source: WARM_CONDENSATE_SOURCE,
    },
    Crop {
        id: "fennel-seed",
        name: "Sweet fennel seed",
        material: "Foeniculum vulgare var. dulce, crushed ripe fruit",
        oil_content_percent: spread(2.0, 4.0, 6.0),
        oil_content_source: source!("2-6 %, from memory; typical = midpoint"),
        composition: &[
            ("e-anethole", 0.75),
            ("d-limonene", 0.05),
            ("estragole", 0.04),
            ("fenchone", 0.03),
            ("alpha-phellandrene", 0.01),
        ],
        composition_source: source!(
            "From memory (sweet fennel): (E)-anethole about 70-85 %, limonene about 5 %, estragole 2-6 %, fenchone a few % (3 taken), α-phellandrene about 1 %"
        ),
        oil_density_kg_per_m3: 968.0,
        oil_density_source: source!("About 0.960-0.975 at 20 °C, from memory; midpoint"),
        rate_constant_per_min: spread(0.017, 0.025, 0.05),
        rate_constant_source: source!(
            "No constant seen (fennel fits simultaneous washing and diffusion in hydrodistillation, Milojević et al., Hem. Ind. 67(5):843-859, 2013, values not seen); derived from the 1-3 h run (from memory) by k = 3/t95: 3/120, 3/180 and 3/60 per min"
        ),
        typical_run_min: spread(60.0, 120.0, 180.0),
        typical_run_source: source!("1-3 h, from memory"),
        typical_water_to_oil_ratio: spread(10.0, 20.0, 40.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 120/60 / 0.04 ≈ 20 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("No published steam rate seen; 0.4 kg/h per kg is a judgement, no source"),
        charge_density_kg_per_m3: 450.0,
        charge_density_source: source!("Crushed seeds 350-550 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: DRIED_HEAT_SOURCE,
        distillate_temperature_c: 40.0,
        distillate_temperature_source: WARM_CONDENSATE_SOURCE,
    },
    Crop {
        id: "lemon-balm",
        name: "Lemon balm",
        material: "Melissa officinalis, fresh herb at the start of flowering",
        oil_content_percent: spread(0.008, 0.014, 0.083),
        oil_content_source: source!(
            "Typical 0.014 % by distillation of the fresh herb (0.112 % of the dried herb, 0.13 % with cohobation; FAO, Flavours and fragrances of plant origin, fao.org/docrep/x5043e); low 0.008: 10000-12000 kg of leaves and flowers per kg oil (everphi.com, low weight); high 0.083: 1200 kg leaves per kg oil (sebattic.com, Turkey, basis not stated, low weight). One of the poorest yielders: a small still gives millilitres"
        ),
        composition: &[("geranial", 0.744), ("citronellal", 0.063)],
        composition_source: source!(
            "Hydrodistilled Algerian leaf oil: geranial 44.2, neral 30.2, citronellal 6.3 % (PMC4464394, EXCLI J. 2015). Neral entered as geranial (as for lemongrass): 0.442 + 0.302. Not in the library: β-caryophyllene, caryophyllene oxide, germacrene D (a few % each)"
        ),
        oil_density_kg_per_m3: 890.0,
        oil_density_source: source!("About 0.88-0.90, from memory; 0.89 taken"),
        rate_constant_per_min: spread(0.025, 0.0333, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/90, 3/120 and 3/60 per min), judgement"
        ),
        typical_run_min: spread(60.0, 90.0, 120.0),
        typical_run_source: source!("1-2 h, from memory"),
        typical_water_to_oil_ratio: spread(2200.0, 4300.0, 8600.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 90/60 / 0.00014 ≈ 4300 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.8,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.8,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh herb, about 80 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "yarrow",
        name: "Yarrow",
        material: "Achillea millefolium, fresh flowering tops",
        oil_content_percent: spread(0.1, 0.2, 0.4),
        oil_content_source: source!(
            "0.1-0.4 % of fresh flowering tops, from memory (the blue chamazulene types at the upper end); typical 0.2, judgement"
        ),
        composition: &[
            ("beta-pinene", 0.1),
            ("sabinene", 0.1),
            ("1-8-cineole", 0.1),
            ("camphor", 0.1),
            ("camphene", 0.03),
            ("beta-caryophyllene", 0.32),
        ],
        composition_source: source!(
            "From memory (very variable between chemotypes): sabinene and β-pinene together 10-25 %, 1,8-cineole 5-15, camphor 5-15, camphene 1-5 %, sesquiterpenes (germacrene D, β-caryophyllene, chamazulene) 20-45 %. The 20 % of sabinene and β-pinene split evenly between them, and the sesquiterpenes entered as β-caryophyllene: choices made here, no source; chamazulene is less volatile"
        ),
        oil_density_kg_per_m3: 910.0,
        oil_density_source: source!("About 0.90-0.92, from memory"),
        rate_constant_per_min: spread(0.0167, 0.025, 0.0333),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/120, 3/180 and 3/90 per min), judgement"
        ),
        typical_run_min: spread(90.0, 120.0, 180.0),
        typical_run_source: source!("1.5-3 h, from memory"),
        typical_water_to_oil_ratio: spread(200.0, 400.0, 800.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 120/60 / 0.002 ≈ 400 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.75,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.75,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh flowering tops, about 75 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "helichrysum",
        name: "Helichrysum (immortelle)",
        material: "Helichrysum italicum, fresh flowering tops",
        oil_content_percent: spread(0.05, 0.1, 0.2),
        oil_content_source: source!(
            "0.05-0.2 % of fresh flowering tops, from memory; typical 0.1, judgement"
        ),
        composition: &[
            ("alpha-pinene", 0.2),
            ("bornyl-acetate", 0.2),
            ("d-limonene", 0.05),
            ("beta-caryophyllene", 0.3),
        ],
        composition_source: source!(
            "From memory (Corsican type): neryl acetate 5-35, α-pinene 5-25, limonene 2-8 %, sesquiterpene hydrocarbons (γ-curcumene, italicene, β-selinene, β-caryophyllene) 20-40 %. Neryl acetate (not in the library) entered as bornyl acetate, another C12H20O2 monoterpenyl acetate of similar boiling point, and the sesquiterpenes as β-caryophyllene: choices made here, no source"
        ),
        oil_density_kg_per_m3: 900.0,
        oil_density_source: source!("About 0.89-0.91, from memory"),
        rate_constant_per_min: spread(0.0125, 0.0167, 0.025),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/180, 3/240 and 3/120 per min), judgement"
        ),
        typical_run_min: spread(120.0, 180.0, 240.0),
        typical_run_source: source!("2-4 h, from memory"),
        typical_water_to_oil_ratio: spread(600.0, 1200.0, 2400.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 180/60 / 0.001 ≈ 1200 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.7,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.7,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh flowering tops of a dry-country shrub, about 70 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "silver-fir",
        name: "Silver fir needles",
        material: "Abies alba, fresh needles and young twigs, chopped",
        oil_content_percent: spread(0.25, 0.3, 0.35),
        oil_content_source: source!(
            "0.25-0.35 % from the needles and small branches (Lawrence, Progress in Essential Oils: silver fir, Perfumer & Flavorist); about 0.3 % (Surburg & Panten text via ChemicalBook CB4958888)"
        ),
        composition: &[
            ("beta-pinene", 0.328),
            ("alpha-pinene", 0.173),
            ("camphene", 0.167),
            ("bornyl-acetate", 0.09),
            ("d-limonene", 0.061),
        ],
        composition_source: source!(
            "Commercial steam-distilled oil from fresh branch tips, pilot production in Montenegro: β-pinene 32.8, α-pinene 17.3, camphene 16.7, bornyl acetate 9.0, limonene 6.1 % (abstract, 'Essential oil of Abies alba Mill., Pinaceae, from the pilot production in Montenegro'). Not in the library: β-phellandrene 4.9 %"
        ),
        oil_density_kg_per_m3: 870.0,
        oil_density_source: source!(
            "d25/25 0.867-0.878 (Surburg & Panten text via ChemicalBook CB4958888); about the midpoint × 997.0 kg/m³"
        ),
        rate_constant_per_min: spread(0.0125, 0.02, 0.0333),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/150, 3/240 and 3/90 per min), judgement"
        ),
        typical_run_min: spread(90.0, 150.0, 240.0),
        typical_run_source: source!("1.5-4 h, from memory"),
        typical_water_to_oil_ratio: spread(160.0, 330.0, 660.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 150/60 / 0.003 ≈ 330 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 200.0,
        charge_density_source: source!(
            "Chopped needles and twigs: upper half of fresh leafy material (100-250 kg/m³), from memory"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.65,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.65,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh needles and twigs, about 65 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "sweet-orange-peel",
        name: "Sweet orange peel (steam-distilled)",
        material: "Citrus sinensis, fresh peel, chopped or minced",
        oil_content_percent: spread(0.5, 1.0, 1.5),
        oil_content_source: source!(
            "0.5-1.5 % of fresh peel, from memory; typical = midpoint. Most orange oil is cold-pressed; steam distillation of peel left from juicing gives the distilled oil"
        ),
        composition: &[("d-limonene", 0.93), ("myrcene", 0.02), ("alpha-pinene", 0.005)],
        composition_source: source!("From memory: limonene 90-96, myrcene 1.5-2.5, α-pinene about 0.5 %"),
        oil_density_kg_per_m3: 846.0,
        oil_density_source: source!("About 0.842-0.850 at 20 °C, from memory"),
        rate_constant_per_min: spread(0.0333, 0.05, 0.0667),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/60, 3/90 and 3/45 per min), judgement"
        ),
        typical_run_min: spread(45.0, 60.0, 90.0),
        typical_run_source: source!("45-90 min, from memory"),
        typical_water_to_oil_ratio: spread(20.0, 40.0, 80.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 60/60 / 0.01 ≈ 40 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 400.0,
        charge_density_source: source!("Chopped fresh peel 350-450 kg/m³, from memory"),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.78,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.78,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh peel, about 78 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "rose-geranium",
        name: "Rose geranium",
        material: "Pelargonium graveolens ('Rosé' type), fresh leaves and stems",
        oil_content_percent: spread(0.06, 0.12, 0.18),
        oil_content_source: source!(
            "Steam distillation of the fresh herb 0.06-0.18 % (water-steam 0.09-0.12, water distillation 0.16-0.22 %), cultivar 'Kelkar' (Babu & Kaul, Flavour Fragr. J. 20:222-231, 2005); typical = midpoint"
        ),
        composition: &[
            ("citronellol", 0.4),
            ("geraniol", 0.13),
            ("linalool", 0.06),
            ("menthone", 0.06),
            ("beta-caryophyllene", 0.05),
        ],
        composition_source: source!(
            "From memory (Bourbon/Egyptian types): citronellol 20-40, citronellyl formate 7-12, geraniol 6-18, linalool 3-10, isomenthone 4-8 %, guaia-6,9-diene and other sesquiterpenes a few %. Citronellyl formate entered as citronellol (0.30 + 0.10), isomenthone as menthone (a diastereomer), the sesquiterpenes as β-caryophyllene: choices made here, no source"
        ),
        oil_density_kg_per_m3: 888.0,
        oil_density_source: source!("About 0.884-0.892, from memory"),
        rate_constant_per_min: spread(0.02, 0.0333, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/90, 3/150 and 3/60 per min), judgement"
        ),
        typical_run_min: spread(60.0, 90.0, 150.0),
        typical_run_source: source!("1-2.5 h, from memory"),
        typical_water_to_oil_ratio: spread(250.0, 500.0, 1000.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 90/60 / 0.0012 ≈ 500 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.8,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.8,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh leaves and stems, about 80 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "sage",
        name: "Sage",
        material: "Salvia officinalis, dried leaves",
        oil_content_percent: spread(0.92, 1.6, 2.3),
        oil_content_source: source!(
            "10.0-24.8 mL oil per kg in commercial dried leaves from nine countries (Raal et al., Phyton 93(8):2051-2062, 2024) × 0.92 oil density; typical = midpoint. Leaves 1.1 %, flowering parts 1.6 % in New Zealand (Perry et al., J. Agric. Food Chem. 47:2048, 1999)"
        ),
        composition: &[
            ("beta-thujone", 0.4),
            ("camphor", 0.2),
            ("1-8-cineole", 0.11),
            ("camphene", 0.045),
            ("alpha-pinene", 0.035),
            ("beta-caryophyllene", 0.05),
        ],
        composition_source: source!(
            "Dalmatian oils: α-thujone 28-40, camphor 12-35, 1,8-cineole (+ cis-β-ocimene) 9.3-13.2 % (Perfumer & Flavorist GC-MS data bank, sage oils); β-thujone 3-8.5 % (Surburg & Panten text via ChemicalBook CB0687764); camphene 2.6-7.1, α-pinene 1.3-5.8 % (Raal et al. 2024); α-humulene about 5 %, from memory. α- and β-thujone entered as the β-thujone row (diastereomers), α-humulene as β-caryophyllene. Thujone is toxic: keep the oil and hydrosol away from internal use"
        ),
        oil_density_kg_per_m3: 920.0,
        oil_density_source: source!(
            "d20/20 0.910-0.930 (Surburg & Panten text via ChemicalBook CB0687764); midpoint"
        ),
        rate_constant_per_min: spread(0.02, 0.0333, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/90, 3/150 and 3/60 per min), judgement"
        ),
        typical_run_min: spread(60.0, 90.0, 150.0),
        typical_run_source: source!("1-2.5 h, from memory"),
        typical_water_to_oil_ratio: spread(24.0, 47.0, 94.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 90/60 / 0.016 ≈ 47 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!(
            "0.5 kg/h per kg, taken equal to rosemary (0.54 kg/h per kg of dried charge in a 300 g test, kttpmt.ntt.edu.vn), judgement"
        ),
        charge_density_kg_per_m3: 115.0,
        charge_density_source: source!("Dried leaves or herb 80-150 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Dried leaves, about 10 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "hyssop",
        name: "Hyssop",
        material: "Hyssopus officinalis, fresh flowering herb",
        oil_content_percent: spread(0.2, 0.4, 0.8),
        oil_content_source: source!("0.2-0.8 % of the fresh herb, from memory; typical 0.4, judgement"),
        composition: &[
            ("camphor", 0.55),
            ("beta-pinene", 0.15),
            ("1-8-cineole", 0.03),
            ("beta-caryophyllene", 0.03),
        ],
        composition_source: source!(
            "From memory: pinocamphone and isopinocamphone together 35-70 %, β-pinene 10-20 %, 1,8-cineole and β-caryophyllene a few % each. Pinocamphone and isopinocamphone (bicyclic C10H16O ketones, not in the library) entered as camphor: a choice made here, no source; the sabinene of some oils has no figure of its own here and is counted in the β-pinene share. Pinocamphone is a convulsant: handle the oil with care"
        ),
        oil_density_kg_per_m3: 930.0,
        oil_density_source: source!("About 0.92-0.94, from memory"),
        rate_constant_per_min: spread(0.02, 0.0333, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/90, 3/150 and 3/60 per min), judgement"
        ),
        typical_run_min: spread(60.0, 90.0, 150.0),
        typical_run_source: source!("1-2.5 h, from memory"),
        typical_water_to_oil_ratio: spread(75.0, 150.0, 300.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 90/60 / 0.004 ≈ 150 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.75,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.75,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh flowering herb, about 75 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "dill-seed",
        name: "Dill seed",
        material: "Anethum graveolens, crushed ripe fruit",
        oil_content_percent: spread(2.0, 3.0, 4.0),
        oil_content_source: source!("2-4 % of the ripe fruit, from memory; typical = midpoint"),
        composition: &[("carvone", 0.5), ("d-limonene", 0.4), ("alpha-phellandrene", 0.01)],
        composition_source: source!(
            "From memory: carvone 40-60, limonene 30-50 %, α-phellandrene and dillapiole up to a few %. The carvone of dill is (S)-(+)-carvone; enantiomers share vapour pressure"
        ),
        oil_density_kg_per_m3: 905.0,
        oil_density_source: source!("About 0.895-0.915 at 20 °C, from memory"),
        rate_constant_per_min: spread(0.0167, 0.025, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/120, 3/180 and 3/60 per min), judgement"
        ),
        typical_run_min: spread(60.0, 120.0, 180.0),
        typical_run_source: source!("1-3 h, from memory (as for the other umbelliferous seeds)"),
        typical_water_to_oil_ratio: spread(14.0, 27.0, 54.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 120/60 / 0.03 ≈ 27 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 450.0,
        charge_density_source: source!("Crushed seeds 350-550 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Air-dried fruit, about 10 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "palmarosa",
        name: "Palmarosa",
        material: "Cymbopogon martinii var. motia, dried grass, cut",
        oil_content_percent: spread(0.4, 0.7, 1.0),
        oil_content_source: source!(
            "0.4-1 % of the dried grass, from memory; typical 0.7, judgement. The highest yield comes from grass dried for about a week after cutting (circulating-oils-library.com, low weight)"
        ),
        composition: &[
            ("geraniol", 0.78),
            ("geranyl-acetate", 0.1),
            ("linalool", 0.03),
            ("beta-caryophyllene", 0.015),
        ],
        composition_source: source!(
            "Geraniol 60-85 % (Weiss, Essential Oil Crops, CAB International 1997, via westcoastaromatherapy.com); total alcohols 80-96 % as geraniol (Nepali producer specification, biosysnepal.com.np); 0.78 taken. Geranyl acetate 5-15 %, linalool 2-4, β-caryophyllene 1-2 %, from memory; midpoints"
        ),
        oil_density_kg_per_m3: 890.0,
        oil_density_source: source!(
            "Specific gravity 0.8805-0.9007 at 25 °C (biosysnepal.com.np specification); midpoint × 997.0 kg/m³"
        ),
        rate_constant_per_min: spread(0.0167, 0.02, 0.025),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/150, 3/180 and 3/120 per min), judgement"
        ),
        typical_run_min: spread(120.0, 150.0, 180.0),
        typical_run_source: source!("Stems and leaves distilled for 2-3 h (Wikipedia 'Palmarosa Oil')"),
        typical_water_to_oil_ratio: spread(90.0, 180.0, 360.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 150/60 / 0.007 ≈ 180 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!("Taken equal to lemongrass (0.5 kg/h per kg), judgement"),
        charge_density_kg_per_m3: 150.0,
        charge_density_source: source!(
            "Cut grass, partly dried: between dried herb (80-150) and fresh leafy material (100-250 kg/m³), from memory"
        ),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.12,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.12,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Grass dried about a week, about 12 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "cinnamon-leaf",
        name: "Cinnamon leaf",
        material: "Cinnamomum verum, dried leaves and twigs",
        oil_content_percent: spread(0.5, 1.0, 1.8),
        oil_content_source: source!("0.5-1.8 % of the leaves, from memory; typical 1.0, judgement"),
        composition: &[
            ("eugenol", 0.78),
            ("beta-caryophyllene", 0.04),
            ("eugenyl-acetate", 0.03),
            ("linalool", 0.025),
            ("cinnamaldehyde", 0.015),
        ],
        composition_source: source!(
            "From memory (Sri Lankan leaf oil): eugenol 70-85, β-caryophyllene 2-8, eugenyl acetate 1-5, linalool 1-4, cinnamaldehyde 0.5-3 %, benzyl benzoate a few % (not in the library)"
        ),
        oil_density_kg_per_m3: 1040.0,
        oil_density_source: source!("About 1.030-1.050, heavier than water, from memory"),
        rate_constant_per_min: spread(0.01, 0.0167, 0.025),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/180, 3/300 and 3/120 per min), judgement"
        ),
        typical_run_min: spread(120.0, 180.0, 300.0),
        typical_run_source: source!("2-5 h, from memory"),
        typical_water_to_oil_ratio: spread(75.0, 150.0, 300.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 180/60 / 0.01 ≈ 150 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!(
            "0.5 kg/h per kg, judgement, no source; like clove the run is limited by steam: eugenol needs at least about 25 kg water per kg"
        ),
        charge_density_kg_per_m3: 115.0,
        charge_density_source: source!("Dried leaves or herb 80-150 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Dried leaves and twigs, about 10 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: source!(
            "About 30 °C: common practice, no source. The oil sinks (density about 1.04, from memory): use a separator that draws oil from the bottom"
        ),
    },
    Crop {
        id: "holy-basil",
        name: "Holy basil (tulsi)",
        material: "Ocimum tenuiflorum, fresh flowering herb",
        oil_content_percent: spread(0.2, 0.4, 0.7),
        oil_content_source: source!("0.2-0.7 % of the fresh herb, from memory; typical 0.4, judgement"),
        composition: &[("eugenol", 0.5), ("beta-caryophyllene", 0.25), ("1-8-cineole", 0.02)],
        composition_source: source!(
            "From memory (eugenol type): eugenol 30-70, β-caryophyllene 10-20, β-elemene and germacrene D 5-15 % (entered as β-caryophyllene: a choice made here, no source), 1,8-cineole a few %; methyl eugenol up to 10 % in some types (not in the library)"
        ),
        oil_density_kg_per_m3: 970.0,
        oil_density_source: source!("About 0.95-1.00, from memory (near water: separation is slow)"),
        rate_constant_per_min: spread(0.0167, 0.025, 0.05),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/120, 3/180 and 3/60 per min), judgement"
        ),
        typical_run_min: spread(60.0, 120.0, 180.0),
        typical_run_source: source!("1-3 h, from memory"),
        typical_water_to_oil_ratio: spread(120.0, 250.0, 500.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.5 × 120/60 / 0.004 ≈ 250 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.5,
        steam_rate_source: source!("Taken equal to sweet basil (0.5 kg/h per kg), judgement"),
        charge_density_kg_per_m3: 175.0,
        charge_density_source: source!(
            "Fresh leafy herbs loosely forked or trodden: 100-250 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Fresh,
        moisture_fraction: 0.8,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.8,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Fresh herb, about 80 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: source!(
            "About 30 °C: common practice, no source. The oil is close to water in density (0.95-1.00, from memory): give the separator time, and look for oil at both top and bottom"
        ),
    },
    Crop {
        id: "hops",
        name: "Hops",
        material: "Humulus lupulus, dried cones",
        oil_content_percent: spread(0.25, 0.5, 3.0),
        oil_content_source: source!(
            "Low 0.25: yields after distillation about 0.25 % of about 0.5 % present (Surburg & Panten text via ChemicalBook CB2961383); typical 0.5: 0.3-0.6 parts per 100 by steam distillation (Chapman, Brewing, 1912); high 3: 0.5-3 % of hop weight (buffalobeerbiochemist.com, aroma varieties, low weight)"
        ),
        composition: &[("myrcene", 0.5), ("beta-caryophyllene", 0.4)],
        composition_source: source!(
            "Myrcene typically 50 % or more at harvest (Oxford Companion to Beer, 2012); humulene, myrcene, β-caryophyllene and farnesene make up more than 90 % of the oil (Burdock via ChemicalBook CB2961383). α-Humulene and farnesene (C15H24, not in the library) entered with β-caryophyllene (5-15 %): a choice made here, no source"
        ),
        oil_density_kg_per_m3: 850.0,
        oil_density_source: source!("About 0.82-0.88, from memory"),
        rate_constant_per_min: spread(0.0125, 0.0167, 0.0333),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95 (3/180, 3/240 and 3/90 per min), judgement"
        ),
        typical_run_min: spread(90.0, 180.0, 240.0),
        typical_run_source: source!("1.5-4 h, from memory"),
        typical_water_to_oil_ratio: spread(120.0, 240.0, 480.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 180/60 / 0.005 ≈ 240 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 115.0,
        charge_density_source: source!(
            "Dried cones, like dried herb 80-150 kg/m³, from memory; middle taken"
        ),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Dried cones (kilned to about 10 % water), about 10 % water, from memory; heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K))"
        ),
        distillate_temperature_c: 30.0,
        distillate_temperature_source: COOL_CONDENSATE_SOURCE,
    },
    Crop {
        id: "patchouli",
        name: "Patchouli",
        material: "Pogostemon cablin, sun-dried leaves",
        oil_content_percent: spread(1.5, 2.0, 3.0),
        oil_content_source: source!(
            "About 2 % from sun-dried leaves (Bauer, Garbe & Surburg, Common Fragrance and Flavor Materials, via ChemicalBook patchouli oil page, CAS 8014-09-3); 1.5-3.0 % from properly dried leaves (same page, a second handbook text)"
        ),
        composition: &[("beta-caryophyllene", 1.0)],
        composition_source: source!(
            "Patchoulol 27-35 %, α-bulnesene 13-21, α-guaiene 11-16, β-patchoulene 1.8-3.5, seychellene 1-3 % (Bauer, Garbe & Surburg via ChemicalBook, CAS 8014-09-3); none of them is in the library. β-Caryophyllene, a C15H24 sesquiterpene like α-bulnesene and α-guaiene, stands in for the whole oil (fraction 1 by construction): a choice made here, no source. Patchoulol, a C15H26O alcohol and a third of the oil, is less volatile than the stand-in, so the least steam is understated"
        ),
        oil_density_kg_per_m3: 962.0,
        oil_density_source: source!(
            "d20/20 0.952-0.975 (Bauer, Garbe & Surburg via ChemicalBook, CAS 8014-09-3); midpoint × 998.2 kg/m³"
        ),
        rate_constant_per_min: spread(0.0021, 0.00625, 0.0083),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95: 3/1440, 3/480 and 3/360 per min"
        ),
        typical_run_min: spread(360.0, 480.0, 1440.0),
        typical_run_source: source!(
            "6-8 h in a small still, from memory; up to 24 h and more in industrial stills (ChemicalBook patchouli oil page, CB5130861)"
        ),
        typical_water_to_oil_ratio: spread(80.0, 160.0, 320.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 480/60 / 0.02 = 160 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 115.0,
        charge_density_source: source!("Dried leaves or herb 80-150 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: DRIED_HEAT_SOURCE,
        distillate_temperature_c: 30.0,
        distillate_temperature_source: source!(
            "About 30 °C: common practice, no source. A viscous oil close to water in density (0.95-0.98): give the separator time, and look for oil at both top and bottom"
        ),
    },
    Crop {
        id: "vetiver",
        name: "Vetiver",
        material: "Chrysopogon zizanioides (Vetiveria zizanioides), air-dried roots, chopped and soaked",
        oil_content_percent: spread(0.5, 1.0, 2.0),
        oil_content_source: source!("0.5-2 % of air-dried roots, typical 1 %, from memory"),
        composition: &[("beta-caryophyllene", 1.0)],
        composition_source: source!(
            "One of the most complex oils, of sesquiterpene alcohols and hydrocarbons (Lavania, CIMAP Lucknow, Other Uses and Utilization of Vetiver); khusimol, vetiselinenol, α- and β-vetivone and zizaene among the main ones, from memory; none of them is in the library. β-Caryophyllene, a C15H24 sesquiterpene, stands in for the whole oil (fraction 1 by construction): a choice made here, no source. The alcohols and ketones that make most of the oil are far less volatile than the stand-in, so the least steam and the run are understated"
        ),
        oil_density_kg_per_m3: 1010.0,
        oil_density_source: source!("About 0.99-1.03 at 20 °C, from memory; midpoint"),
        rate_constant_per_min: spread(0.0021, 0.0025, 0.0042),
        rate_constant_source: source!(
            "No fitted constant found; derived from the typical run by k = 3/t95: 3/1440, 3/1200 and 3/720 per min"
        ),
        typical_run_min: spread(720.0, 1200.0, 1440.0),
        typical_run_source: source!(
            "18-24 h (The Vetiver Network, quoted on transcendentalscent.blogspot.com, 2008); up to 24 h (vetivergrassuk.com); 12 h as the low end, from memory"
        ),
        typical_water_to_oil_ratio: spread(400.0, 800.0, 1600.0),
        water_to_oil_source: source!(
            "No practice figure found: derived from this row, steam rate × typical run / oil content = 0.4 × 1200/60 / 0.01 = 800 kg/kg; low and high a factor 2 either side (judgement)"
        ),
        steam_rate_kg_per_h_per_kg: 0.4,
        steam_rate_source: source!("0.4 kg/h per kg, judgement, no source"),
        charge_density_kg_per_m3: 200.0,
        charge_density_source: source!("Chopped dried roots 150-250 kg/m³, from memory; middle taken"),
        charge_condition: ChargeCondition::Dried,
        moisture_fraction: 0.1,
        dry_matter_heat_capacity_j_per_kg_k: DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        plant_heat_capacity_j_per_kg_k: charge_heat_capacity_j_per_kg_k(
            0.1,
            DRY_PLANT_MATTER_HEAT_CAPACITY_J_PER_KG_K,
        ),
        thermal_source: source!(
            "Air-dried roots at about 10 % water, from memory (the soak before charging wets the surface and is not counted here); heat capacity from the moisture by Siebel's rule (`charge_heat_capacity_j_per_kg_k`, dry matter 1700 J/(kg K)): 1.95 kJ/(kg K)"
        ),
        distillate_temperature_c: 40.0,
        distillate_temperature_source: source!(
            "About 40 °C: common practice, no source. The oil is very viscous and its density is close to water's (0.99-1.03, from memory): a warm receiver separates it faster (Bragantia, Instituto Agronômico de Campinas, 1961); watch for the oil at both top and bottom"
        ),
    },
];

#[cfg(test)]
mod tests {
    use super::*;
    use crate::compounds::COMPOUNDS;
    use std::collections::HashSet;

    fn is_id(s: &str) -> bool {
        !s.is_empty()
            && !s.starts_with('-')
            && !s.ends_with('-')
            && !s.contains("--")
            && s.bytes().all(|b| b.is_ascii_lowercase() || b.is_ascii_digit() || b == b'-')
    }

    fn spreads(c: &Crop) -> [(&'static str, Spread); 4] {
        [
            ("oil_content_percent", c.oil_content_percent),
            ("rate_constant_per_min", c.rate_constant_per_min),
            ("typical_run_min", c.typical_run_min),
            ("typical_water_to_oil_ratio", c.typical_water_to_oil_ratio),
        ]
    }

    #[test]
    fn table_is_large_enough() {
        assert!(CROPS.len() >= 35, "only {} crops", CROPS.len());
    }

    #[test]
    fn ids_are_unique_and_well_formed() {
        let mut seen = HashSet::new();
        for c in CROPS {
            assert!(is_id(c.id), "badly formed id {:?}", c.id);
            assert!(seen.insert(c.id), "duplicate id {:?}", c.id);
        }
    }

    #[test]
    fn composition_ids_exist_and_fractions_are_in_unit_interval() {
        for c in CROPS {
            assert!(!c.composition.is_empty(), "{}: empty composition", c.id);
            let mut seen = HashSet::new();
            let mut total = 0.0;
            for &(id, x) in c.composition {
                assert!(COMPOUNDS.iter().any(|k| k.id == id), "{}: unknown compound {:?}", c.id, id);
                assert!(seen.insert(id), "{}: {:?} listed twice", c.id, id);
                assert!(x.is_finite() && x > 0.0 && x <= 1.0, "{}: {} fraction {}", c.id, id, x);
                total += x;
            }
            assert!(total <= 1.0 + 1e-9, "{}: fractions add up to {}", c.id, total);
        }
    }

    #[test]
    fn spreads_are_ordered_finite_and_positive() {
        for c in CROPS {
            for (field, s) in spreads(c) {
                for x in [s.low, s.typical, s.high] {
                    assert!(x.is_finite() && x > 0.0, "{}: {} has {}", c.id, field, x);
                }
                assert!(
                    s.low <= s.typical && s.typical <= s.high,
                    "{}: {} not ordered: {:?}",
                    c.id,
                    field,
                    s
                );
            }
        }
    }

    #[test]
    fn numbers_are_finite_and_positive() {
        for c in CROPS {
            for (field, x) in [
                ("oil_density_kg_per_m3", c.oil_density_kg_per_m3),
                ("steam_rate_kg_per_h_per_kg", c.steam_rate_kg_per_h_per_kg),
                ("charge_density_kg_per_m3", c.charge_density_kg_per_m3),
                ("moisture_fraction", c.moisture_fraction),
                ("plant_heat_capacity_j_per_kg_k", c.plant_heat_capacity_j_per_kg_k),
                ("dry_matter_heat_capacity_j_per_kg_k", c.dry_matter_heat_capacity_j_per_kg_k),
                ("distillate_temperature_c", c.distillate_temperature_c),
            ] {
                assert!(x.is_finite() && x > 0.0, "{}: {} = {}", c.id, field, x);
            }
        }
    }

    #[test]
    fn units_are_the_stated_ones() {
        // Guards against fractions entered as percent, g/cm³ as kg/m³, kJ as J and the like.
        for c in CROPS {
            assert!(c.oil_content_percent.high < 30.0, "{}", c.id);
            assert!(c.moisture_fraction < 1.0, "{}", c.id);
            assert!((700.0..1200.0).contains(&c.oil_density_kg_per_m3), "{}", c.id);
            assert!((10.0..1000.0).contains(&c.charge_density_kg_per_m3), "{}", c.id);
            assert!((500.0..4200.0).contains(&c.plant_heat_capacity_j_per_kg_k), "{}", c.id);
            assert!((1000.0..2500.0).contains(&c.dry_matter_heat_capacity_j_per_kg_k), "{}", c.id);
            assert!(c.rate_constant_per_min.high < 1.0, "{}", c.id);
            assert!(c.steam_rate_kg_per_h_per_kg < 5.0, "{}", c.id);
            assert!(c.distillate_temperature_c < 100.0, "{}", c.id);
        }
    }

    #[test]
    fn every_text_field_is_filled() {
        for c in CROPS {
            for (field, text) in [("name", c.name), ("material", c.material)] {
                assert!(!text.trim().is_empty(), "{}: empty {}", c.id, field);
            }
        }
    }

    #[cfg(feature = "source-texts")]
    #[test]
    fn every_source_is_filled_and_labelled_once() {
        for c in CROPS {
            for (label, text) in c.sources() {
                assert!(!text.trim().is_empty(), "{}: empty source for {}", c.id, label);
            }
        }
        let labels: HashSet<&str> = CROPS[0].sources().iter().map(|&(l, _)| l).collect();
        assert_eq!(labels.len(), 10, "labels repeat");
    }

    #[cfg(not(feature = "source-texts"))]
    #[test]
    fn sources_are_left_out_without_the_feature() {
        for c in CROPS {
            assert!(c.sources().iter().all(|&(_, t)| t.is_empty()), "{}", c.id);
        }
    }

    #[test]
    fn typical_run_agrees_with_the_rate_constant() {
        // First-order release: 95 % is out at t95 = 3/k (the convention of the table header).
        for c in CROPS {
            let t95 = 3.0 / c.rate_constant_per_min.typical;
            let run = c.typical_run_min;
            assert!(
                run.low <= t95 && t95 <= run.high,
                "{}: 3/k = {t95:.0} min outside the typical run {:?}",
                c.id,
                run
            );
            // 20 %: the run a table row quotes and the 3/k of its own constant are one figure
            // read two ways (the earlier 25 % let lavender's 45 min stand against 3/k = 60).
            assert!(
                (run.typical - t95).abs() <= 0.2 * t95,
                "{}: typical run {} min against 3/k = {t95:.0} min",
                c.id,
                run.typical
            );
        }
    }

    #[test]
    fn moisture_matches_the_charge_condition() {
        for c in CROPS {
            let (lo, hi) = c.charge_condition.usual_moisture_fraction();
            assert!(
                (lo..=hi).contains(&c.moisture_fraction),
                "{}: {:?} charge at {} water",
                c.id,
                c.charge_condition,
                c.moisture_fraction
            );
        }
    }

    #[test]
    fn fresh_charges_have_the_heat_capacity_measured_on_fresh_leaves() {
        // 3.2-4.0 kJ/(kg K) for fresh leaves of 13 species (Zhang et al., Plant Methods 2025).
        for c in CROPS.iter().filter(|c| c.charge_condition == ChargeCondition::Fresh) {
            let cp = c.plant_heat_capacity_j_per_kg_k;
            assert!((3200.0..=4000.0).contains(&cp), "{}: {cp} J/(kg K)", c.id);
        }
    }

    /// Rows whose whole oil is one library compound standing in for compounds the library lacks:
    /// they cover 100 % by construction, so the coverage test cannot judge them; they are named
    /// here and must say so in their composition source.
    const WHOLE_OIL_STAND_INS: &[&str] = &["german-chamomile", "cedarwood", "patchouli", "vetiver"];

    #[test]
    fn listed_compounds_cover_most_of_the_oil() {
        // Renormalising over the listed compounds is only fair when they are most of the oil.
        for c in CROPS {
            let single = c.composition.len() == 1 && c.composition[0].1 >= 0.999;
            if WHOLE_OIL_STAND_INS.contains(&c.id) {
                // The mark is in the source text, so it is checked where the texts are built in.
                let marked = !cfg!(feature = "source-texts") || c.composition_source.contains("stands in");
                assert!(single && marked, "{}: not a marked stand-in", c.id);
                continue;
            }
            assert!(!single, "{}: one compound as the whole oil is a stand-in; name it as one", c.id);
            let total: f64 = c.composition.iter().map(|&(_, x)| x).sum();
            assert!(total >= 0.7, "{}: listed compounds cover only {:.0} %", c.id, total * 100.0);
        }
    }
}
