//! The bracketing search behind every sized answer: the smallest value for which a monotone
//! test passes. It keeps a failing lower end and a passing upper end and halves the gap, so its
//! answer always passes, and it stops after a fixed number of steps.

/// Most halvings of one search: 2⁻⁴⁰ of the bracket is far below any tolerance used here.
pub const MAX_HALVINGS: u32 = 40;
/// Most doublings while looking for a passing upper end.
pub const MAX_DOUBLINGS: u32 = 40;

/// Why a search found nothing.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum SearchError {
    /// The test fails even at the largest value allowed.
    FailsAtTop { top: f64 },
    /// A bound given was not a positive finite number.
    BadBracket,
}

/// Smallest x in [lo, hi] with `passes(x)`, for a test that fails below some x* and passes above
/// it: bisection of the bracket until it is narrower than `tol`, returning its passing end.
///
/// The answer always passes and lies within `tol` above the true threshold (if the test is
/// monotone); if `passes(lo)` already holds, `lo` is returned. Source: bisection (any
/// numerical-analysis text, e.g. Press et al., *Numerical Recipes*, §9.1). Valid for a monotone
/// test; on a test that is not, it still ends and still returns a passing x.
///
/// ```
/// use stillroom_core::sizing::search::smallest_passing;
/// // The smallest x with x² ≥ 2 on [0, 4], to 1e-9.
/// let x = smallest_passing(|x| x * x >= 2.0, 0.0, 4.0, 1e-9).unwrap();
/// assert!(x * x >= 2.0 && (x - 2f64.sqrt()).abs() < 1e-9);
/// ```
pub fn smallest_passing(
    mut passes: impl FnMut(f64) -> bool,
    lo: f64,
    hi: f64,
    tol: f64,
) -> Result<f64, SearchError> {
    if !(lo.is_finite() && hi.is_finite() && lo <= hi && tol > 0.0) {
        return Err(SearchError::BadBracket);
    }
    if passes(lo) {
        return Ok(lo);
    }
    if !passes(hi) {
        return Err(SearchError::FailsAtTop { top: hi });
    }
    let (mut fail, mut pass) = (lo, hi);
    for _ in 0..MAX_HALVINGS {
        if pass - fail <= tol {
            break;
        }
        let mid = 0.5 * (fail + pass);
        if passes(mid) {
            pass = mid;
        } else {
            fail = mid;
        }
    }
    Ok(pass)
}

/// A passing upper end for [`smallest_passing`]: doubles `start` until `passes` holds, never
/// beyond `cap` (tried last). Returns (a failing value below, the passing value).
///
/// ```
/// use stillroom_core::sizing::search::bracket_up;
/// let (lo, hi) = bracket_up(|x| x >= 10.0, 1.0, 100.0).unwrap();
/// assert_eq!((lo, hi), (8.0, 16.0));
/// ```
pub fn bracket_up(
    mut passes: impl FnMut(f64) -> bool,
    start: f64,
    cap: f64,
) -> Result<(f64, f64), SearchError> {
    if !(start.is_finite() && start > 0.0 && cap.is_finite() && cap >= start) {
        return Err(SearchError::BadBracket);
    }
    let mut below = start;
    let mut x = start;
    for _ in 0..MAX_DOUBLINGS {
        if passes(x) {
            return Ok((below, x));
        }
        if x >= cap {
            return Err(SearchError::FailsAtTop { top: cap });
        }
        below = x;
        x = (2.0 * x).min(cap);
    }
    Err(SearchError::FailsAtTop { top: x })
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn the_answer_passes_even_for_a_step() {
        let x = smallest_passing(|x| x >= 3.3, 0.0, 10.0, 1e-6).unwrap();
        assert!(x >= 3.3 && x - 3.3 < 1e-6);
    }

    #[test]
    fn a_test_failing_at_the_top_is_an_error() {
        assert_eq!(smallest_passing(|_| false, 0.0, 1.0, 1e-6), Err(SearchError::FailsAtTop { top: 1.0 }));
        assert!(bracket_up(|_| false, 1.0, 1e3).is_err());
    }

    #[test]
    fn nan_bounds_are_refused() {
        assert_eq!(smallest_passing(|_| true, f64::NAN, 1.0, 1e-6), Err(SearchError::BadBracket));
        assert_eq!(bracket_up(|_| true, 0.0, 1.0), Err(SearchError::BadBracket));
    }

    #[test]
    fn a_non_monotone_test_still_ends_on_a_passing_value() {
        let mut calls = 0;
        let x = smallest_passing(
            |x| {
                calls += 1;
                (x * 7.0).sin() > 0.0 || x > 9.0
            },
            -1.0,
            10.0,
            1e-12,
        )
        .unwrap();
        assert!((x * 7.0).sin() > 0.0 || x > 9.0);
        assert!(calls <= 2 + MAX_HALVINGS as usize);
    }
}
