//! How numbers are shown: the plan's SI values in the units a grower reads, rounded to what the
//! physics can honestly claim. Components call these and nothing else for numbers.

/// A number with a fixed count of decimals, a minus sign that reads as one, no "-0".
pub fn fixed(v: f64, decimals: usize) -> String {
    if !v.is_finite() {
        return "–".to_string();
    }
    let s = format!("{:.*}", decimals, v);
    let s = if s.trim_start_matches('-').chars().all(|c| c == '0' || c == '.') {
        s.trim_start_matches('-').to_string()
    } else {
        s
    };
    s.replace('-', "−")
}

/// A number as a person would type it back: no trailing zeros.
pub fn plain(v: f64) -> String {
    let s = format!("{:.6}", v);
    s.trim_end_matches('0').trim_end_matches('.').to_string()
}

/// A number to about three significant figures.
pub fn sig3(v: f64) -> String {
    let a = v.abs();
    let decimals = if a >= 100.0 {
        0
    } else if a >= 10.0 {
        1
    } else if a >= 1.0 {
        2
    } else if a >= 0.1 {
        3
    } else {
        4
    };
    fixed(v, decimals)
}

pub fn kpa(pa: f64) -> String {
    format!("{} kPa", fixed(pa / 1e3, 1))
}

pub fn celsius(c: f64) -> String {
    format!("{} °C", fixed(c, 1))
}

/// A temperature difference, with its sign.
pub fn kelvin_shift(k: f64) -> String {
    let s = fixed(k, 1);
    if k > 0.05 { format!("+{s} K") } else { format!("{s} K") }
}

/// Mass: grams under 1 kg, kilograms above, tonnes above 10 t.
pub fn mass(kg: f64) -> String {
    if kg.abs() < 1.0 {
        format!("{} g", sig3(kg * 1e3))
    } else if kg.abs() < 10_000.0 {
        format!("{} kg", sig3(kg))
    } else {
        format!("{} t", sig3(kg / 1e3))
    }
}

/// Volume: millilitres under 1 L, litres above, cubic metres above 10 m³.
pub fn volume(m3: f64) -> String {
    let l = m3 * 1e3;
    if l.abs() < 1.0 {
        format!("{} mL", sig3(l * 1e3))
    } else if l.abs() < 10_000.0 {
        format!("{} L", sig3(l))
    } else {
        format!("{} m³", sig3(m3))
    }
}

/// Duration as hours and minutes.
pub fn duration(s: f64) -> String {
    if !s.is_finite() {
        return "–".to_string();
    }
    let total_min = (s / 60.0).round() as i64;
    let (h, m) = (total_min / 60, total_min % 60);
    if h == 0 { format!("{m} min") } else { format!("{h} h {m:02} min") }
}

pub fn kilowatts(w: f64) -> String {
    format!("{} kW", sig3(w / 1e3))
}

pub fn area(m2: f64) -> String {
    if m2 < 0.1 { format!("{} cm²", sig3(m2 * 1e4)) } else { format!("{} m²", sig3(m2)) }
}

pub fn length(m: f64) -> String {
    if m < 1.0 { format!("{} cm", sig3(m * 100.0)) } else { format!("{} m", sig3(m)) }
}

pub fn litres_per_minute(kg_per_s: f64) -> String {
    format!("{} L/min", sig3(kg_per_s * 60.0))
}

pub fn litres_per_hour(m3_per_s: f64) -> String {
    format!("{} L/h", sig3(m3_per_s * 3.6e6))
}

pub fn mm_per_s(m_per_s: f64) -> String {
    format!("{} mm/s", sig3(m_per_s * 1e3))
}

pub fn percent(fraction: f64) -> String {
    format!("{} %", sig3(fraction * 100.0))
}

/// A low–high range with a central value, e.g. "120 mL (90–150)".
pub fn range(central: String, low: String, high: String) -> String {
    format!("{central} ({low} – {high})")
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn readable_units() {
        assert_eq!(duration(3900.0), "1 h 05 min");
        assert_eq!(duration(600.0), "10 min");
        assert_eq!(mass(0.1234), "123 g");
        assert_eq!(volume(0.0071), "7.10 L");
        assert_eq!(fixed(-0.01, 1), "0.0");
        assert_eq!(kelvin_shift(-1.04), "−1.0 K");
    }
}
