//! Test support for Stillroom's end-to-end tests: the built page in `dist/`, served by the xtask
//! static server and driven in headless Chromium through ChromeDriver.

#[cfg(not(target_arch = "wasm32"))]
pub mod browser;
#[cfg(not(target_arch = "wasm32"))]
pub mod drive;

/// The error type the end-to-end tests return.
pub type BoxError = Box<dyn std::error::Error + Send + Sync + 'static>;
