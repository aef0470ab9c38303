//! Test support for Stillroom's end-to-end tests: the built page in `dist/`, served by the xtask
//! static server and driven in headless Chromium through ChromeDriver.

#[cfg(not(target_arch = "wasm32"))]
pub mod browser;
#[cfg(not(target_arch = "wasm32"))]
pub mod drive;

/// The error type the end-to-end tests return.
pub type BoxError = Box<dyn std::error::Error + Send + Sync + 'static>;

/// Pairs of phrases that give opposite advice (the core's list, shared here so the page's tests
/// check the warnings the page shows against the same pairs the core's tests use), and the pairs
/// found together in a set of warning texts.
#[cfg(not(target_arch = "wasm32"))]
pub use stillroom_core::plan::{OPPOSITE_ADVICE, opposite_advice};
