//! The separator (Florentine flask or essencier): oil droplets must rise (or sink) out of the
//! distillate before the water leaves.
//!
//! Design basis as for gravity oil-water separators (API Publication 421, 1990): a design
//! droplet, its Stokes velocity, a plan area of flow over velocity times a turbulence and
//! short-circuit factor.

/// Acceleration of gravity used in the separator, m/s² (standard gravity).
pub const GRAVITY_M_PER_S2: f64 = 9.806_65;

/// Terminal velocity of a small sphere by Stokes' law, m/s: v = g d² (ρ_w - ρ_o) / (18 μ).
/// Positive when the droplet rises (oil lighter than water), negative when it sinks.
///
/// Source: Stokes (1851); Bird, Stewart & Lightfoot, *Transport Phenomena*, eq. 2.6-17.
/// Valid while the droplet Reynolds number ρ_w |v| d / μ stays below about 1 (creeping flow);
/// see [`droplet_reynolds_number`].
///
/// ```
/// use stillroom_core::separator::stokes_velocity_m_per_s;
/// // API 421 check: 150 µm, oil of 850 kg/m³ in water at 15.6 °C (ρ 998.9, μ 1.129 mPa·s):
/// // 0.1617 cm/s.
/// let v = stokes_velocity_m_per_s(150e-6, 850.0, 998.9, 1.129e-3);
/// assert!((v * 100.0 - 0.1617).abs() < 0.0005);
/// ```
pub fn stokes_velocity_m_per_s(
    droplet_diameter_m: f64,
    oil_density_kg_per_m3: f64,
    water_density_kg_per_m3: f64,
    water_viscosity_pa_s: f64,
) -> f64 {
    GRAVITY_M_PER_S2 * droplet_diameter_m.powi(2) * (water_density_kg_per_m3 - oil_density_kg_per_m3)
        / (18.0 * water_viscosity_pa_s)
}

/// Droplet Reynolds number Re = ρ_w |v| d / μ.
///
/// ```
/// use stillroom_core::separator::droplet_reynolds_number;
/// assert!((droplet_reynolds_number(0.0016, 150e-6, 998.9, 1.129e-3) - 0.2124).abs() < 1e-3);
/// ```
pub fn droplet_reynolds_number(
    velocity_m_per_s: f64,
    droplet_diameter_m: f64,
    water_density_kg_per_m3: f64,
    water_viscosity_pa_s: f64,
) -> f64 {
    water_density_kg_per_m3 * velocity_m_per_s.abs() * droplet_diameter_m / water_viscosity_pa_s
}

/// Least plan (surface) area for droplets to separate, m²: A = F Q / |v|.
///
/// Source: API Publication 421 (1990), A_H = F Q / V_t, with F the turbulence and
/// short-circuit factor (about 1.2-1.7; F = 1.2 for a quiet vessel, from memory of API 421's
/// figure). Valid for |v| > 0.
///
/// ```
/// use stillroom_core::separator::plan_area_m2;
/// // 20 L/h at 0.75 mm/s with F = 1: 74 cm².
/// let a = plan_area_m2(20.0e-3 / 3600.0, 0.75e-3, 1.0);
/// assert!((a * 1e4 - 74.07).abs() < 0.01);
/// ```
pub fn plan_area_m2(flow_m3_per_s: f64, velocity_m_per_s: f64, turbulence_factor: f64) -> f64 {
    turbulence_factor * flow_m3_per_s / velocity_m_per_s.abs()
}

/// Diameter of a circle of the given area, m: D = (4 A / π)^0.5.
///
/// ```
/// use stillroom_core::separator::diameter_for_area_m;
/// assert!((diameter_for_area_m(std::f64::consts::PI / 4.0) - 1.0).abs() < 1e-12);
/// ```
pub fn diameter_for_area_m(area_m2: f64) -> f64 {
    (4.0 * area_m2 / std::f64::consts::PI).sqrt()
}

/// A practical upright cylinder holding `volume_m3` with at least `min_area_m2` of surface and
/// no taller than `max_height_to_diameter` times its diameter, as (diameter, height), m.
///
/// D = max(√(4 A_min/π), (4 V / (π r))^(1/3)), H = 4 V / (π D²). The area rule is API 421's;
/// the shape limit keeps a receiver from becoming a tall pipe in which the layers mix
/// (common practice, no source).
///
/// ```
/// use stillroom_core::separator::practical_cylinder_m;
/// // 0.7 L with at least 8 cm²: the shape limit (H ≤ 2 D) wins, D = 7.6 cm, H = 15.3 cm.
/// let (d, h) = practical_cylinder_m(0.7e-3, 8e-4, 2.0);
/// assert!((d - 0.0764).abs() < 1e-3 && (h / d - 2.0).abs() < 1e-9);
/// // 20 L/h through 200 cm² with only 1 L: the area wins and the vessel is squat.
/// let (d, h) = practical_cylinder_m(1e-3, 0.02, 2.0);
/// assert!((d - 0.1596).abs() < 1e-3 && h < d);
/// ```
pub fn practical_cylinder_m(volume_m3: f64, min_area_m2: f64, max_height_to_diameter: f64) -> (f64, f64) {
    let by_area = diameter_for_area_m(min_area_m2);
    let by_shape = (4.0 * volume_m3 / (std::f64::consts::PI * max_height_to_diameter)).cbrt();
    let d = by_area.max(by_shape);
    (d, 4.0 * volume_m3 / (std::f64::consts::PI * d * d))
}

/// Height of the oil-water interface in a receiver with a top overflow and a gooseneck, m.
///
/// The lighter liquid leaves over the top outlet at height h_top; the heavier liquid leaves from
/// the bottom through a gooseneck whose overflow stands at h_neck. The pressure at the bottom is
/// the same through the vessel and through the gooseneck:
/// ρ_light g (h_top − h_i) + ρ_heavy g h_i = ρ_heavy g h_neck, so
/// h_i = (ρ_heavy h_neck − ρ_light h_top) / (ρ_heavy − ρ_light).
///
/// Source: hydrostatics (Pascal's law); the same balance sets the interface of a continuous
/// gravity decanter (Perry's Chemical Engineers' Handbook, decanters, from memory). Valid at rest
/// and for slow outflow (friction in the gooseneck neglected), ρ_heavy > ρ_light; a result
/// outside 0..h_top means one liquid leaves through the other's outlet.
///
/// ```
/// use stillroom_core::separator::interface_height_m;
/// // Oil 880 over water 995, top outlet 300 mm, water gooseneck at 295 mm:
/// // h_i = (995·0.295 − 880·0.300)/115 = 0.2567 m, an oil layer of 43 mm.
/// let h = interface_height_m(880.0, 995.0, 0.300, 0.295);
/// assert!((h - 0.256739).abs() < 1e-5);
/// ```
pub fn interface_height_m(light_kg_per_m3: f64, heavy_kg_per_m3: f64, top_outlet_m: f64, neck_m: f64) -> f64 {
    (heavy_kg_per_m3 * neck_m - light_kg_per_m3 * top_outlet_m) / (heavy_kg_per_m3 - light_kg_per_m3)
}

/// Gooseneck height that holds the interface at a chosen height, m: the inverse of
/// [`interface_height_m`], h_neck = h_i + (ρ_light/ρ_heavy)(h_top − h_i).
///
/// ```
/// use stillroom_core::separator::{gooseneck_height_m, interface_height_m};
/// let neck = gooseneck_height_m(880.0, 995.0, 0.300, 0.240);
/// assert!((interface_height_m(880.0, 995.0, 0.300, neck) - 0.240).abs() < 1e-12);
/// ```
pub fn gooseneck_height_m(
    light_kg_per_m3: f64,
    heavy_kg_per_m3: f64,
    top_outlet_m: f64,
    interface_m: f64,
) -> f64 {
    interface_m + light_kg_per_m3 / heavy_kg_per_m3 * (top_outlet_m - interface_m)
}

/// How far the interface moves per unit of gooseneck height: ∂h_i/∂h_neck = ρ_heavy/(ρ_heavy − ρ_light).
/// Large when the densities are close: then the gooseneck must be set to the millimetre.
///
/// ```
/// use stillroom_core::separator::interface_sensitivity;
/// // Oil 980 over water 992: the interface moves 83 mm per mm of gooseneck.
/// assert!((interface_sensitivity(980.0, 992.0) - 82.67).abs() < 0.01);
/// ```
pub fn interface_sensitivity(light_kg_per_m3: f64, heavy_kg_per_m3: f64) -> f64 {
    heavy_kg_per_m3 / (heavy_kg_per_m3 - light_kg_per_m3)
}
