//! The condenser: how much heat it must take out, how much cooling water that needs, how fast a
//! tub warms, and how much tube it takes.

/// Log-mean temperature difference of two end differences, K:
/// ΔT_lm = (ΔT1 - ΔT2) / ln(ΔT1/ΔT2), and ΔT1 when they are equal.
///
/// Source: Incropera, *Fundamentals of Heat and Mass Transfer*, eq. 11.15. Valid for ΔT1, ΔT2 > 0.
///
/// ```
/// use stillroom_core::condenser::log_mean_temperature_difference_k;
/// // Steam at 100 °C condensing against water 20 -> 40 °C: (80 - 60)/ln(80/60) = 69.52 K.
/// let lmtd = log_mean_temperature_difference_k(80.0, 60.0);
/// assert!((lmtd - 69.52).abs() < 0.01);
/// ```
pub fn log_mean_temperature_difference_k(dt1_k: f64, dt2_k: f64) -> f64 {
    if (dt1_k - dt2_k).abs() < 1e-9 * dt1_k.abs().max(1.0) {
        dt1_k
    } else {
        (dt1_k - dt2_k) / (dt1_k / dt2_k).ln()
    }
}

/// Cooling-water flow to carry a heat duty with a given temperature rise, kg/s:
/// ṁ = Q / (c_p (T_out - T_in)).
///
/// Source: steady-flow energy balance. Valid for T_out > T_in, liquid water.
///
/// ```
/// use stillroom_core::condenser::cooling_water_flow_kg_per_s;
/// // 10 kW with water warming 15 -> 35 °C (c_p 4180): 0.1196 kg/s ≈ 7.2 L/min.
/// assert!((cooling_water_flow_kg_per_s(10_000.0, 4180.0, 15.0, 35.0) - 0.11962).abs() < 1e-5);
/// ```
pub fn cooling_water_flow_kg_per_s(
    duty_w: f64,
    heat_capacity_j_per_kg_k: f64,
    inlet_c: f64,
    outlet_c: f64,
) -> f64 {
    duty_w / (heat_capacity_j_per_kg_k * (outlet_c - inlet_c))
}

/// Heat-transfer area for a duty, m²: A = Q / (U ΔT_lm).
///
/// Source: Incropera eq. 11.14. Valid for U > 0, ΔT_lm > 0.
///
/// ```
/// use stillroom_core::condenser::area_m2;
/// assert!((area_m2(10_000.0, 800.0, 69.52) - 0.1798).abs() < 1e-4);
/// ```
pub fn area_m2(duty_w: f64, u_w_per_m2_k: f64, lmtd_k: f64) -> f64 {
    duty_w / (u_w_per_m2_k * lmtd_k)
}

/// Length of round tube with a given outer area, m: L = A / (π d_o).
///
/// ```
/// use stillroom_core::condenser::tube_length_m;
/// // 0.18 m² of 12.7 mm tube: 4.51 m.
/// assert!((tube_length_m(0.18, 0.0127) - 4.511).abs() < 1e-3);
/// ```
pub fn tube_length_m(area_m2: f64, outer_diameter_m: f64) -> f64 {
    area_m2 / (std::f64::consts::PI * outer_diameter_m)
}

/// Time for a well-stirred tub of water to warm from one temperature to another under a steady
/// heat input, s: t = m c_p (T_end - T_start) / Q (losses to air neglected, which errs on the
/// side of refilling early).
///
/// ```
/// use stillroom_core::condenser::tub_warming_time_s;
/// // 200 kg of water, 15 -> 45 °C, 10 kW: 2508 s ≈ 42 min.
/// assert!((tub_warming_time_s(200.0, 4180.0, 15.0, 45.0, 10_000.0) - 2508.0).abs() < 1.0);
/// ```
pub fn tub_warming_time_s(
    water_mass_kg: f64,
    heat_capacity_j_per_kg_k: f64,
    start_c: f64,
    end_c: f64,
    duty_w: f64,
) -> f64 {
    water_mass_kg * heat_capacity_j_per_kg_k * (end_c - start_c) / duty_w
}
