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

/// Coil area in a well-mixed bath at one temperature, m²: a condensing section at constant
/// ΔT = T_sat − T_bath, then a sub-cooling section with ΔT_lm of (T_sat − T_bath, T_out − T_bath).
///
/// A coil in an unstirred tub sees the tub's (mixed) water on its whole length, not a stream
/// that warms along it: the distillate can leave no colder than the bath, so T_out > T_bath.
/// Source: Incropera, *Fundamentals of Heat and Mass Transfer*, §11.3 (one fluid at constant
/// temperature, eq. 11.14-11.15). Valid for T_sat > T_out > T_bath, U > 0.
///
/// ```
/// use stillroom_core::condenser::coil_in_bath_area_m2;
/// // 10 kW condensing at 100 °C and 0.8 kW sub-cooling to 40 °C in a 30 °C bath,
/// // U 800 and 150: 10000/(800·70) + 800/(150·ΔT_lm(70, 10)) = 0.1786 + 0.1730 m².
/// let a = coil_in_bath_area_m2(10_000.0, 800.0, 800.0, 150.0, 100.0, 30.0, 40.0);
/// assert!((a - 0.3515).abs() < 1e-3);
/// ```
pub fn coil_in_bath_area_m2(
    condensing_w: f64,
    subcooling_w: f64,
    condensing_u_w_per_m2_k: f64,
    subcooling_u_w_per_m2_k: f64,
    saturation_c: f64,
    bath_c: f64,
    outlet_c: f64,
) -> f64 {
    let condensing = area_m2(condensing_w, condensing_u_w_per_m2_k, saturation_c - bath_c);
    let lmtd = log_mean_temperature_difference_k(saturation_c - bath_c, outlet_c - bath_c);
    let subcooling =
        if subcooling_w > 0.0 { area_m2(subcooling_w, subcooling_u_w_per_m2_k, lmtd) } else { 0.0 };
    condensing + subcooling
}

/// A tub of water taking a steady duty over a run: unfed while it stays at or under its warmest
/// allowed temperature, then fed cold water at the bottom with the warm overflow leaving at
/// that temperature (a well-mixed tank: overflow leaves at the tank's temperature).
#[derive(Debug, Clone, Copy, PartialEq)]
pub struct TubCourse {
    /// The tub's temperature at the end of the run, °C.
    pub end_c: f64,
    /// When the tub reaches its warmest allowed temperature, s after the start, if it does.
    pub feed_from_s: Option<f64>,
    /// Feed needed from then on, kg/s (0 when it never needs one).
    pub feed_kg_per_s: f64,
    /// Water used over the run: the tub's fill plus any feed, kg.
    pub water_used_kg: f64,
}

/// The tub's course over a run: T(t) = T₀ + Q t / (m c_p) until T_max, then a feed
/// ṁ = Q / (c_p (T_max − T_feed)) holds it there.
///
/// Source: energy balance of a well-mixed tank (lumped capacitance; losses to air neglected,
/// which errs on the side of feeding early). Valid for Q > 0, T_max > T₀.
///
/// ```
/// use stillroom_core::condenser::tub_course;
/// // 200 kg at 15 °C, 10 kW for an hour, warmest 45 °C: warm by 2508 s, then 0.0797 kg/s.
/// let t = tub_course(200.0, 4180.0, 15.0, 45.0, 10_000.0, 3600.0);
/// assert!((t.feed_from_s.unwrap() - 2508.0).abs() < 1.0);
/// assert!((t.water_used_kg - 287.08).abs() < 0.01);
/// assert_eq!(t.end_c, 45.0);
/// ```
pub fn tub_course(
    water_mass_kg: f64,
    heat_capacity_j_per_kg_k: f64,
    start_c: f64,
    warmest_c: f64,
    duty_w: f64,
    run_s: f64,
) -> TubCourse {
    let unfed_end_c = start_c + duty_w * run_s / (water_mass_kg * heat_capacity_j_per_kg_k);
    if unfed_end_c <= warmest_c {
        return TubCourse {
            end_c: unfed_end_c,
            feed_from_s: None,
            feed_kg_per_s: 0.0,
            water_used_kg: water_mass_kg,
        };
    }
    let feed_from_s = tub_warming_time_s(water_mass_kg, heat_capacity_j_per_kg_k, start_c, warmest_c, duty_w);
    let feed = cooling_water_flow_kg_per_s(duty_w, heat_capacity_j_per_kg_k, start_c, warmest_c);
    TubCourse {
        end_c: warmest_c,
        feed_from_s: Some(feed_from_s),
        feed_kg_per_s: feed,
        water_used_kg: water_mass_kg + feed * (run_s - feed_from_s),
    }
}
