//! Site pressure against the US Standard Atmosphere 1976.

use stillroom_core::atmosphere::*;

#[test]
fn ussa_1976_table_i_pressures_by_geometric_altitude() {
    // US Standard Atmosphere 1976, Table I (indexed by geometric altitude), Pa. The printed
    // values have five significant digits; the tolerance is 0.05 %.
    let table = [
        (0.0, 1.01325e5),
        (500.0, 9.5461e4),
        (1000.0, 8.9876e4),
        (1500.0, 8.4559e4),
        (2000.0, 7.9501e4),
        (2500.0, 7.4691e4),
        (3000.0, 7.0121e4),
        (3500.0, 6.5780e4),
        (4000.0, 6.1660e4),
        (4500.0, 5.7752e4),
        (5000.0, 5.4048e4),
    ];
    for (z, p) in table {
        let got = standard_pressure_pa(z).unwrap();
        assert!((got - p).abs() / p <= 5e-4, "P({z} m) = {got}, table {p}");
    }
}

#[test]
fn ussa_1976_formula_values_to_a_hundredth_of_a_pascal() {
    // The same formula computed with fluids 1.3.1 ATMOSPHERE_1976 (geometric Z), Pa.
    for (z, p) in [(1000.0, 89_876.29), (2000.0, 79_501.42), (4000.0, 61_660.44), (5000.0, 54_048.29)] {
        let got = standard_pressure_pa(z).unwrap();
        assert!((got - p).abs() <= 0.02, "P({z} m) = {got}, fluids {p}");
    }
}

#[test]
fn ussa_1976_table_i_temperatures() {
    // US Standard Atmosphere 1976, Table I: T at 1000, 1500, 2000, 4000 m, K.
    for (z, t) in [(1000.0, 281.651), (1500.0, 278.402), (2000.0, 275.154), (4000.0, 262.166)] {
        let got = standard_temperature_k(z).unwrap();
        assert!((got - t).abs() <= 1e-3, "T({z} m) = {got}, table {t}");
    }
}

#[test]
fn engineering_barometric_formula_in_feet() {
    // engineersedge.com "Standard Atmospheric Data": p = 14.696 (1 - 6.8754e-6 Z[ft])^5.2559 psia;
    // 1000 ft -> 14.175 psia, 5000 ft -> 12.230 psia. That fit treats Z as geopotential; 0.05 %.
    for (ft, psia) in [(1000.0, 14.175), (5000.0, 12.230)] {
        let got = standard_pressure_pa(ft * 0.3048).unwrap() / 6894.757;
        assert!((got - psia).abs() / psia <= 5e-4, "{ft} ft: {got} psia, published {psia}");
    }
}

#[test]
fn altitude_outside_the_accepted_range_is_an_error() {
    assert!(standard_pressure_pa(-600.0).is_err());
    assert!(standard_pressure_pa(6500.0).is_err());
    assert!(standard_pressure_pa(6000.0).is_ok());
}

#[test]
fn sea_level_report_converts_back_to_station_pressure() {
    // A report of exactly standard sea-level pressure must give back the standard station
    // pressure: Table I at 2000 m, 7.9501e4 Pa.
    let got = station_pressure_from_sea_level_pa(101_325.0, 2000.0).unwrap();
    assert!((got - 7.9501e4).abs() / 7.9501e4 <= 5e-4);
    // A low of 990 hPa at sea level lowers the station pressure in proportion.
    let low = station_pressure_from_sea_level_pa(99_000.0, 2000.0).unwrap();
    assert!((low / got - 99_000.0 / 101_325.0).abs() < 1e-12);
}
