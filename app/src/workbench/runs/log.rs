//! The log's own rules, apart from the page: lot numbers, merging an imported log, the CSV.

use stillroom_core::calibration::RunRecord;
use stillroom_core::crops::CROPS;

/// The page's lot pattern: crop code, year, running number (`LAV-2026-003`).
pub const DEFAULT_LOT_PATTERN: &str = "{CROP}-{YEAR}-{N}";
/// Longest lot number or pattern kept, characters.
pub const MAX_LOT_CHARS: usize = 40;

/// The crop's short code for lot numbers: its id's first three letters, upper case; `RUN`
/// without a preset.
pub fn crop_code(crop: Option<&str>) -> String {
    let code: String = crop.unwrap_or("").chars().filter(|c| c.is_ascii_alphanumeric()).take(3).collect();
    if code.is_empty() { "RUN".to_string() } else { code.to_ascii_uppercase() }
}

/// The crop's name, or "no preset".
pub fn crop_name(id: Option<&str>) -> String {
    id.and_then(|id| CROPS.iter().find(|c| c.id == id))
        .map(|c| c.name.to_string())
        .unwrap_or_else(|| "no preset".to_string())
}

/// The part a crop preset charges ("fresh flowering tops"), from its material.
pub fn plant_part(crop: Option<&str>) -> String {
    crop.and_then(|id| CROPS.iter().find(|c| c.id == id))
        .and_then(|c| c.material.split_once(", ").map(|(_, part)| part.to_string()))
        .unwrap_or_default()
}

fn fill(pattern: &str, crop: Option<&str>, year: &str, n: usize) -> String {
    let pattern = if pattern.trim().is_empty() { DEFAULT_LOT_PATTERN } else { pattern.trim() };
    let with_n = if pattern.contains("{N}") { pattern.to_string() } else { format!("{pattern}-{{N}}") };
    with_n.replace("{CROP}", &crop_code(crop)).replace("{YEAR}", year).replace("{N}", &format!("{n:03}"))
}

/// The next free lot number of the pattern: the running number after the runs already logged,
/// bumped past any lot in use. A pattern without `{N}` gets `-{N}` at its end, so lots stay
/// unique.
pub fn next_lot(pattern: &str, crop: Option<&str>, year: &str, runs: &[RunRecord]) -> String {
    lot_from(pattern, crop, year, runs, runs.len() + 1)
}

/// The first lot of the pattern from running number `n` on that no run holds.
fn lot_from(pattern: &str, crop: Option<&str>, year: &str, runs: &[RunRecord], mut n: usize) -> String {
    loop {
        let lot = fill(pattern, crop, year, n);
        if !runs.iter().any(|r| r.lot == lot) {
            return lot;
        }
        n += 1;
    }
}

/// `lot` made unique in `taken` with a suffix (`-b`, `-c`, ... then `-2`, `-3`, ...).
pub fn unique_lot(lot: &str, taken: &[RunRecord]) -> String {
    let used = |l: &str| taken.iter().any(|r| r.lot == l);
    if !used(lot) {
        return lot.to_string();
    }
    (2..).map(|i| format!("{lot}-{i}")).find(|l| !used(l)).unwrap_or_default()
}

/// Gives every run without a lot one of the pattern (a log migrated from before lots).
pub fn fill_missing_lots(runs: &mut [RunRecord], pattern: &str) {
    for i in 0..runs.len() {
        if runs[i].lot.trim().is_empty() {
            let year =
                runs[i].date.get(..4).filter(|y| y.chars().all(|c| c.is_ascii_digit())).unwrap_or("OLD");
            let lot = lot_from(pattern, runs[i].crop.as_deref(), year, runs, i + 1);
            runs[i].lot = lot;
        }
    }
}

/// What an import added and skipped.
#[derive(Debug, Clone, Default, PartialEq)]
pub struct Merged {
    pub added: usize,
    /// Records already in the log, word for word.
    pub skipped: usize,
    /// Added under another lot number, as (theirs, kept as).
    pub renamed: Vec<(String, String)>,
}

impl Merged {
    /// In the grower's words.
    pub fn words(&self) -> String {
        let runs = |n: usize| if n == 1 { "1 run".to_string() } else { format!("{n} runs") };
        let mut text = format!("Added {}", runs(self.added));
        if self.skipped > 0 {
            text.push_str(&format!("; skipped {} already in your log", runs(self.skipped)));
        }
        if !self.renamed.is_empty() {
            let list: Vec<String> = self.renamed.iter().map(|(a, b)| format!("{a} as {b}")).collect();
            text.push_str(&format!("; lot numbers already in use kept with a suffix: {}", list.join(", ")));
        }
        text + "."
    }
}

/// Merges `incoming` into `log` without overwriting: a record already there (identical) is
/// skipped, one whose lot number is taken by another record is added under a suffixed lot.
pub fn merge(log: &mut Vec<RunRecord>, incoming: Vec<RunRecord>) -> Merged {
    let mut out = Merged::default();
    for mut run in incoming {
        if log.contains(&run) {
            out.skipped += 1;
            continue;
        }
        let lot = unique_lot(&run.lot, log);
        if lot != run.lot {
            out.renamed.push((run.lot.clone(), lot.clone()));
            run.lot = lot;
        }
        log.push(run);
        out.added += 1;
    }
    out
}

/// A CSV cell (RFC 4180 quoting); a text starting like a formula gets a leading `'` so a
/// spreadsheet shows it rather than runs it.
fn cell(text: &str) -> String {
    let text = if text.starts_with(['=', '+', '-', '@']) { format!("'{text}") } else { text.to_string() };
    if text.contains([',', '"', '\n', '\r']) { format!("\"{}\"", text.replace('"', "\"\"")) } else { text }
}

fn num(v: Option<f64>, scale: f64) -> String {
    v.filter(|v| v.is_finite()).map(|v| format!("{}", (v * scale * 1e6).round() / 1e6)).unwrap_or_default()
}

/// The log as CSV, one run a line, metric units named in the header.
pub fn csv(runs: &[RunRecord]) -> String {
    let mut out = String::from(
        "lot,date,crop,plant_part,charge_kg,distilled_min,fuel_used,fuel_unit,oil_ml,hydrosol_l,earlier_min,earlier_oil_ml,note\r\n",
    );
    for r in runs {
        let row = [
            cell(&r.lot),
            cell(&r.date),
            cell(r.crop.as_deref().unwrap_or("")),
            cell(&r.plant_part),
            num(Some(r.plant_mass_kg), 1.0),
            num(Some(r.distilling_time_s), 1.0 / 60.0),
            num(r.fuel_used, 1.0),
            cell(&r.fuel_unit),
            num(Some(r.oil_volume_m3), 1e6),
            num(r.hydrosol_volume_m3, 1e3),
            num(r.earlier.as_ref().map(|e| e.time_s), 1.0 / 60.0),
            num(r.earlier.as_ref().map(|e| e.oil_volume_m3), 1e6),
            cell(&r.note),
        ];
        out.push_str(&row.join(","));
        out.push_str("\r\n");
    }
    out
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    fn run(lot: &str, ml: f64) -> RunRecord {
        RunRecord {
            lot: lot.into(),
            plant_mass_kg: 20.0,
            distilling_time_s: 3600.0,
            oil_volume_m3: ml * 1e-6,
            ..RunRecord::default()
        }
    }

    #[wasm_bindgen_test]
    fn lots_follow_the_pattern_and_skip_those_in_use() {
        let runs = vec![run("LAV-2026-002", 1.0)];
        assert_eq!(next_lot("", Some("lavender"), "2026", &runs), "LAV-2026-003");
        assert_eq!(next_lot("", Some("lavender"), "2026", &[run("LAV-2026-001", 1.0)]), "LAV-2026-002");
        assert_eq!(next_lot("{CROP}/{N}", None, "2026", &[]), "RUN/001");
        assert_eq!(next_lot("Larkfield", None, "2026", &[]), "Larkfield-001");
    }

    #[wasm_bindgen_test]
    fn runs_without_lots_are_numbered_in_their_order() {
        let mut runs = vec![run("", 1.0), run("", 2.0), run("RUN-OLD-002", 3.0)];
        fill_missing_lots(&mut runs, "");
        let lots: Vec<&str> = runs.iter().map(|r| r.lot.as_str()).collect();
        assert_eq!(lots, ["RUN-OLD-001", "RUN-OLD-003", "RUN-OLD-002"]);
    }

    #[wasm_bindgen_test]
    fn a_merge_skips_the_same_and_keeps_a_clash_under_a_suffix() {
        let mut log = vec![run("A", 1.0), run("B", 2.0)];
        let got = merge(&mut log, vec![run("A", 1.0), run("B", 3.0), run("C", 4.0)]);
        assert_eq!((got.added, got.skipped), (2, 1));
        assert_eq!(got.renamed, vec![("B".to_string(), "B-2".to_string())]);
        assert_eq!(log.len(), 4);
        assert!(got.words().contains("skipped 1 run"));
        // Merging the same again adds nothing.
        let again = merge(&mut log.clone(), log.clone());
        assert_eq!((again.added, again.skipped), (0, 4));
    }

    #[wasm_bindgen_test]
    fn csv_quotes_what_needs_it_and_defuses_formulas() {
        let mut r = run("A,1", 200.0);
        r.note = "=SUM(1) \"quoted\"".into();
        let text = csv(&[r]);
        let line = text.lines().nth(1).unwrap();
        assert!(line.starts_with("\"A,1\",,,,20,60,,,200,"), "{line}");
        assert!(line.ends_with("\"'=SUM(1) \"\"quoted\"\"\""), "{line}");
    }
}
