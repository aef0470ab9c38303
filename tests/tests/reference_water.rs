//! Water and steam against the IAPWS verification tables and computed steam-table values.
//!
//! Sources are named beside each check. "(IAPWS table)" values are the published verification
//! values of IAPWS R7-97(2012) and R12-08; "(iapws 1.5.5)" and "(CoolProp 8.0.0)" values were
//! computed with those general-purpose libraries from PyPI.

use stillroom_core::water::*;

fn rel(a: f64, b: f64) -> f64 {
    (a - b).abs() / b.abs()
}

#[test]
fn if97_table_35_saturation_pressures() {
    // IAPWS R7-97(2012), Table 35: p_s at 300, 500, 600 K, MPa.
    for (t_k, p_mpa) in [(300.0, 0.353658941e-2), (500.0, 0.263889776e1), (600.0, 0.123443146e2)] {
        let p = saturation_pressure_pa(t_k).unwrap();
        assert!(rel(p, p_mpa * 1e6) <= 1e-6, "p_s({t_k} K) = {p} Pa, table {p_mpa} MPa");
    }
}

#[test]
fn if97_table_36_saturation_temperatures() {
    // IAPWS R7-97(2012), Table 36: T_s at 0.1, 1, 10 MPa, K.
    for (p_mpa, t_k) in [(0.1, 0.372755919e3), (1.0, 0.453035632e3), (10.0, 0.584149488e3)] {
        let t = saturation_temperature_k(p_mpa * 1e6).unwrap();
        assert!(rel(t, t_k) <= 1e-6, "T_s({p_mpa} MPa) = {t} K, table {t_k} K");
    }
}

#[test]
fn if97_tables_5_and_15_enthalpies_from_the_crate() {
    // The crate behind the water module, held to IAPWS R7-97(2012) Table 5 (region 1) and
    // Table 15 (region 2) check values, kJ/kg. (Region 2 pressure is 0.0035 MPa, not 0.001.)
    let cases = [
        (3.0, 300.0, 0.115331273e3),
        (80.0, 300.0, 0.184142828e3),
        (3.0, 500.0, 0.975542239e3),
        (0.0035, 300.0, 0.254991145e4),
        (0.0035, 700.0, 0.333568375e4),
        (30.0, 700.0, 0.263149474e4),
    ];
    for (p_mpa, t_k, h) in cases {
        let got = seuif97::pt(p_mpa, t_k - 273.15, seuif97::OH);
        assert!(rel(got, h) <= 1e-6, "h({p_mpa} MPa, {t_k} K) = {got}, table {h}");
    }
}

#[test]
fn iapws_2008_viscosity_table_4_from_the_crate() {
    // IAPWS R12-08, Table 4 (industrial use, no critical enhancement), µPa·s at (T, ρ). The
    // crate reaches the viscosity only through IF97 states (p ≤ 100 MPa), so the table's points
    // at 1200 kg/m³ (298.15 K) and 1000 kg/m³ (373.15 and 433.15 K), which lie at several
    // hundred MPa, cannot be asked; these two can.
    let cases = [(298.15, 998.0, 889.735100), (433.15, 1.0, 14.538324)];
    for (t_k, rho, mu) in cases {
        let got = seuif97::tv(t_k - 273.15, 1.0 / rho, seuif97::ODV) * 1e6;
        assert!(rel(got, mu) <= 1e-6, "mu({t_k} K, {rho} kg/m3) = {got}, table {mu}");
    }
}

#[test]
fn latent_heat_matches_if97_steam_tables() {
    // IF97 h_fg, kJ/kg, computed with iapws 1.5.5 (IAPWS97); tolerance 0.1 kJ/kg.
    let cases = [
        (80.0, 2308.066),
        (90.0, 2282.560),
        (95.0, 2269.595),
        (99.0, 2259.111),
        (100.0, 2256.473),
        (110.0, 2229.704),
        (120.0, 2202.150),
    ];
    for (t_c, hfg) in cases {
        let got = latent_heat_j_per_kg(t_c + 273.15).unwrap() / 1e3;
        assert!((got - hfg).abs() <= 0.1, "h_fg({t_c} °C) = {got}, iapws {hfg}");
    }
}

#[test]
fn liquid_density_matches_iapws_95() {
    // ρ at 0.101325 MPa, IAPWS-95 computed with iapws 1.5.5 (= CoolProp 8.0.0 HEOS); IF97
    // differs from IAPWS-95 by at most 0.015 kg/m³ here, so the tolerance is 0.02 kg/m³.
    let cases = [
        (10.0, 999.7025),
        (20.0, 998.2072),
        (30.0, 995.6495),
        (40.0, 992.2164),
        (60.0, 983.1958),
        (80.0, 971.7904),
        (95.0, 961.8879),
        (99.0, 959.0661),
    ];
    for (t_c, rho) in cases {
        let got = liquid_density_kg_per_m3(t_c + 273.15, 101_325.0).unwrap();
        assert!((got - rho).abs() <= 0.02, "rho({t_c} °C) = {got}, IAPWS-95 {rho}");
    }
}

#[test]
fn liquid_viscosity_within_one_percent_from_10_to_99_c() {
    // IAPWS 2008 viscosity with IAPWS-95 density, mPa·s, computed with iapws 1.5.5. The brief
    // asks for 1 %; the IF97 density differs by at most 0.015 kg/m³, so 1e-4 is what we hold.
    let cases = [
        (10.0, 1.30590),
        (20.0, 1.00160),
        (30.0, 0.79722),
        (40.0, 0.65273),
        (50.0, 0.54652),
        (60.0, 0.46604),
        (80.0, 0.35405),
        (90.0, 0.31418),
        (95.0, 0.29709),
        (99.0, 0.28457),
    ];
    for (t_c, mu) in cases {
        let got = liquid_viscosity_pa_s(t_c + 273.15, 101_325.0).unwrap() * 1e3;
        assert!(rel(got, mu) <= 1e-4, "mu({t_c} °C) = {got}, iapws {mu}");
    }
}

#[test]
fn heat_to_raise_steam_from_feed_water() {
    // Saturated steam at 1 atm from feed water at 10/15/20 °C, kJ/kg (CoolProp 8.0.0, IAPWS-95).
    // IF97 and IAPWS-95 differ by about 0.07 kJ/kg here: tolerance 0.5 kJ/kg.
    let t_s = saturation_temperature_k(101_325.0).unwrap();
    let h_g = saturated_vapour_enthalpy_j_per_kg(t_s).unwrap();
    for (feed_c, q) in [(10.0, 2633.4), (15.0, 2612.5), (20.0, 2591.5)] {
        let got = (h_g - liquid_enthalpy_j_per_kg(feed_c + 273.15, 101_325.0).unwrap()) / 1e3;
        assert!((got - q).abs() <= 0.5, "steam from {feed_c} °C: {got}, CoolProp {q}");
    }
}

#[test]
fn boiling_point_at_one_atmosphere() {
    // Tsat(101.325 kPa) = 99.9743 °C (IF97, iapws 1.5.5; IAPWS-95 agrees to 5e-6 K).
    let t = saturation_temperature_k(101_325.0).unwrap() - 273.15;
    assert!((t - 99.9743).abs() < 1e-4, "{t}");
}
