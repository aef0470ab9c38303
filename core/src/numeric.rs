//! Small numerical tools: a bracketing root finder that always converges.

/// Why a root could not be found.
#[derive(Debug, Clone, Copy, PartialEq)]
pub enum RootError {
    /// f(lo) and f(hi) have the same sign, so the bracket holds no root.
    NotBracketed { f_lo: f64, f_hi: f64 },
    /// The function returned NaN or infinity inside the bracket.
    NotFinite { x: f64 },
}

/// Finds x in [lo, hi] with f(x) = 0, given f(lo) and f(hi) of opposite signs.
///
/// Method: the Illinois variant of regula falsi (Dowell & Jarratt, BIT 11 (1971) 168-174),
/// which keeps the bracket at every step, so it converges whenever the bracket holds a sign
/// change of a continuous function, and converges superlinearly on smooth functions. Stops when
/// the bracket is narrower than `x_tol` or after 200 steps (then the bracket mid-point is returned).
///
/// ```
/// use stillroom_core::numeric::find_root;
/// let x = find_root(|x| x * x - 2.0, 0.0, 2.0, 1e-12).unwrap();
/// assert!((x - 2f64.sqrt()).abs() < 1e-10);
/// ```
pub fn find_root(f: impl Fn(f64) -> f64, lo: f64, hi: f64, x_tol: f64) -> Result<f64, RootError> {
    let (mut a, mut b) = (lo, hi);
    let (mut fa, mut fb) = (f(a), f(b));
    if !fa.is_finite() {
        return Err(RootError::NotFinite { x: a });
    }
    if !fb.is_finite() {
        return Err(RootError::NotFinite { x: b });
    }
    if fa == 0.0 {
        return Ok(a);
    }
    if fb == 0.0 {
        return Ok(b);
    }
    if fa.signum() == fb.signum() {
        return Err(RootError::NotBracketed { f_lo: fa, f_hi: fb });
    }
    // `side` remembers which end was kept last, to halve its weight (the Illinois step).
    let mut side = 0i8;
    for _ in 0..200 {
        if (b - a).abs() <= x_tol {
            break;
        }
        let mut c = (a * fb - b * fa) / (fb - fa);
        // Guard against a secant step that lands on or outside the bracket through round-off.
        if !(c > a.min(b) && c < a.max(b)) {
            c = 0.5 * (a + b);
        }
        let fc = f(c);
        if !fc.is_finite() {
            return Err(RootError::NotFinite { x: c });
        }
        if fc == 0.0 {
            return Ok(c);
        }
        if fc.signum() == fb.signum() {
            b = c;
            fb = fc;
            if side == -1 {
                fa *= 0.5;
            }
            side = -1;
        } else {
            a = c;
            fa = fc;
            if side == 1 {
                fb *= 0.5;
            }
            side = 1;
        }
    }
    Ok(if fa.abs() < fb.abs() { a } else { b })
}

#[cfg(test)]
mod tests {
    use super::*;

    #[test]
    fn rejects_a_bracket_without_sign_change() {
        assert!(matches!(find_root(|x| x * x + 1.0, -1.0, 1.0, 1e-9), Err(RootError::NotBracketed { .. })));
    }

    #[test]
    fn converges_on_a_steep_exponential() {
        // exp-shaped functions are what vapour-pressure balances look like.
        let x = find_root(|x: f64| (20.0 * x).exp() - 1e6, 0.0, 2.0, 1e-12).unwrap();
        assert!((x - (1e6f64).ln() / 20.0).abs() < 1e-9);
    }
}
