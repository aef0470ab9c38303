//! From one charge to a season: how many charges a harvest makes.

/// Plant mass one still holds, kg: charge density times the still's working volume.
///
/// ```
/// use stillroom_core::season::charge_mass_kg;
/// // A 60 L still packed to 165 kg/m³ holds 9.9 kg of fresh lavender.
/// assert!((charge_mass_kg(0.060, 165.0) - 9.9).abs() < 1e-9);
/// ```
pub fn charge_mass_kg(still_volume_m3: f64, charge_density_kg_per_m3: f64) -> f64 {
    still_volume_m3 * charge_density_kg_per_m3
}

/// Charges needed for a harvest: the harvest divided by the charge mass, rounded up.
///
/// ```
/// use stillroom_core::season::charges_for_harvest;
/// assert_eq!(charges_for_harvest(1000.0, 150.0), 7);
/// assert_eq!(charges_for_harvest(0.0, 150.0), 0);
/// ```
pub fn charges_for_harvest(harvest_kg: f64, charge_kg: f64) -> u32 {
    if harvest_kg <= 0.0 || charge_kg <= 0.0 {
        0
    } else {
        (harvest_kg / charge_kg - 1e-9).ceil().max(1.0) as u32
    }
}
