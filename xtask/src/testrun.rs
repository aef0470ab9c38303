//! Reading test-runner summaries: libtest and wasm-bindgen-test-runner both close each test binary
//! with `test result: ok. N passed; M failed; K ignored; ...`.

/// Counts from one or more summary lines.
#[derive(Debug, Clone, Copy, Default, PartialEq, Eq)]
pub struct Counts {
    pub passed: u64,
    pub failed: u64,
    pub ignored: u64,
    /// How many summary lines were added up.
    pub suites: u64,
}

impl Counts {
    pub fn add(&mut self, other: Counts) {
        self.passed += other.passed;
        self.failed += other.failed;
        self.ignored += other.ignored;
        self.suites += other.suites;
    }
}

/// The counts on one summary line, or `None` if the line is not one.
pub fn parse_summary(line: &str) -> Option<Counts> {
    let rest = line.trim().strip_prefix("test result: ")?;
    let (_verdict, rest) = rest.split_once(". ")?;
    let mut c = Counts { suites: 1, ..Counts::default() };
    let mut any = false;
    for part in rest.split(';') {
        let mut words = part.split_whitespace();
        let (Some(n), Some(what)) = (words.next(), words.next()) else {
            continue;
        };
        let Ok(n) = n.parse::<u64>() else { continue };
        match what {
            "passed" => {
                c.passed = n;
                any = true;
            }
            "failed" => c.failed = n,
            "ignored" => c.ignored = n,
            _ => {}
        }
    }
    any.then_some(c)
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn libtest_lines() {
        let ok =
            "test result: ok. 12 passed; 0 failed; 2 ignored; 0 measured; 0 filtered out; finished in 0.31s";
        assert_eq!(parse_summary(ok), Some(Counts { passed: 12, failed: 0, ignored: 2, suites: 1 }));
        let bad = "test result: FAILED. 3 passed; 1 failed; 0 ignored; 0 measured; 0 filtered out; finished in 0.01s";
        assert_eq!(parse_summary(bad).map(|c| (c.passed, c.failed)), Some((3, 1)));
    }

    #[test]
    fn runner_line_and_noise() {
        let wasm = "test result: ok. 1 passed; 0 failed; 0 ignored; 0 filtered out; finished in 0.07s";
        assert_eq!(parse_summary(wasm).map(|c| c.passed), Some(1));
        assert_eq!(parse_summary("test heading ... ok"), None);
        assert_eq!(parse_summary("running 3 tests"), None);
        assert_eq!(parse_summary("test result: nothing here"), None);
    }

    #[test]
    fn add_sums_fields() {
        let mut t = Counts::default();
        t.add(parse_summary("test result: ok. 2 passed; 0 failed; 1 ignored").unwrap());
        t.add(parse_summary("test result: ok. 5 passed; 0 failed; 0 ignored").unwrap());
        assert_eq!((t.passed, t.failed, t.ignored, t.suites), (7, 0, 1, 2));
    }
}
