//! Heat balances, the condenser and the separator against computed handbook values.

use stillroom_core::heat::{sensible_heat_j, startup_condensate_kg};
use stillroom_core::separator::{plan_area_m2, stokes_velocity_m_per_s};
use stillroom_core::water::*;

#[test]
fn condenser_duty_per_kg_of_steam() {
    // Saturated steam at 1 atm condensed and cooled to 25/30/35/40 °C, kJ/kg
    // (CoolProp 8.0.0, IAPWS-95); IF97 differs by < 0.1 kJ/kg: tolerance 0.5 kJ/kg.
    let p = 101_325.0;
    let h_g = saturated_vapour_enthalpy_j_per_kg(saturation_temperature_k(p).unwrap()).unwrap();
    for (t_c, duty) in [(25.0, 2570.6), (30.0, 2549.7), (35.0, 2528.8), (40.0, 2507.9)] {
        let got = (h_g - liquid_enthalpy_j_per_kg(t_c + 273.15, p).unwrap()) / 1e3;
        assert!((got - duty).abs() <= 0.5, "to {t_c} °C: {got} kJ/kg, CoolProp {duty}");
    }
}

#[test]
fn start_up_condensate_worked_example() {
    // 100 kg fresh herb (c_p 3.2 kJ/kg K) and 80 kg stainless steel (0.46 kJ/kg K) heated from
    // 20 to 100 °C take 28.5 MJ, about 12.6 kg of steam (arithmetic on published c_p values;
    // h_fg at 1 atm 2256.5 kJ/kg from CoolProp 8.0.0).
    let q = sensible_heat_j(100.0, 3200.0, 20.0, 100.0) + sensible_heat_j(80.0, 460.0, 20.0, 100.0);
    assert!((q / 1e6 - 28.5).abs() < 0.05, "{q}");
    let h_fg = latent_heat_j_per_kg(saturation_temperature_k(101_325.0).unwrap()).unwrap();
    assert!((startup_condensate_kg(q, h_fg) - 12.6).abs() < 0.05);
}

#[test]
fn droplet_velocities_match_a_drag_library() {
    // Terminal velocities from fluids 1.3.1 `v_terminal` with CoolProp water, mm/s (positive
    // rising). At these Reynolds numbers (< 0.2) Stokes' law should agree within 2 %.
    let cases = [
        (885.0, 30.0, 100e-6, 0.749),
        (885.0, 40.0, 100e-6, 0.882),
        (900.0, 20.0, 100e-6, 0.533),
        (950.0, 30.0, 100e-6, 0.312),
        (1050.0, 30.0, 100e-6, -0.371),
        (885.0, 30.0, 50e-6, 0.189),
    ];
    for (rho_oil, t_c, d, want) in cases {
        let rho = liquid_density_kg_per_m3(t_c + 273.15, 101_325.0).unwrap();
        let mu = liquid_viscosity_pa_s(t_c + 273.15, 101_325.0).unwrap();
        let v = stokes_velocity_m_per_s(d, rho_oil, rho, mu) * 1e3;
        assert!(
            (v - want).abs() <= 0.02 * want.abs(),
            "{rho_oil} kg/m3, {t_c} °C, {d} m: {v} mm/s, fluids {want}"
        );
    }
}

#[test]
fn separator_area_for_twenty_litres_an_hour() {
    // 20 L/h of distillate, 100 µm droplets of an 885 kg/m³ oil at 30 °C need >= 74 cm²
    // (A = Q/v with fluids 1.3.1 velocities).
    let rho = liquid_density_kg_per_m3(303.15, 101_325.0).unwrap();
    let mu = liquid_viscosity_pa_s(303.15, 101_325.0).unwrap();
    let v = stokes_velocity_m_per_s(100e-6, 885.0, rho, mu);
    let a = plan_area_m2(20e-3 / 3600.0, v, 1.0) * 1e4;
    assert!((a - 74.0).abs() <= 1.5, "{a} cm²");
}

#[test]
fn api_421_rise_rate_formula() {
    // API 421: V_t = 0.0241 (S_w - S_o)/μ ft/min with μ in poise; at 60 °F, S_w 0.99890,
    // μ 0.01129 P, S_o 0.850, 150 µm: 0.3178 ft/min. Stokes in SI must agree within 0.5 %.
    let v = stokes_velocity_m_per_s(150e-6, 850.0, 998.90, 1.129e-3);
    let ft_per_min = v / 0.3048 * 60.0;
    assert!((ft_per_min - 0.3178).abs() / 0.3178 < 5e-3, "{ft_per_min}");
}
