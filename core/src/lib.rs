//! # stillroom-core
//!
//! The physics of planning a steam-distillation run for essential oils, one module per
//! phenomenon, in SI units. The one entry point is [`plan::plan`]: a [`scenario::Scenario`]
//! in, a [`plan::Plan`] (or every invalid field at once, as [`scenario::ScenarioErrors`]) out.

/// A source text in a data table (`crops/table.rs`, `compounds/table.rs`): the text itself with
/// the feature `source-texts` (on by default), `""` without it. Every row keeps its source beside
/// its number in the Rust source; a binary that never shows the texts (the page's wasm modules,
/// which fetch them from the build's `sources.json` when asked) leaves them out: 67 kB of the
/// plan module after wasm-opt, 18.7 kB gzip.
#[cfg(feature = "source-texts")]
macro_rules! source {
    ($text:literal) => {
        $text
    };
}
/// A source text in a data table: left out of this build (the feature `source-texts` is off).
#[cfg(not(feature = "source-texts"))]
macro_rules! source {
    ($text:literal) => {
        ""
    };
}

pub mod activity;
pub mod atmosphere;
pub mod calibration;
pub mod codistillation;
pub mod compounds;
pub mod condenser;
pub mod crops;
pub mod heat;
#[cfg(feature = "json")]
pub mod json_path;
pub mod numeric;
pub mod oil;
pub mod plan;
pub mod recovery;
pub mod scenario;
pub mod season;
pub mod separator;
pub mod sizing;
#[cfg(feature = "json")]
pub mod sweep;
mod tagged_sections;
pub mod water;

pub use plan::{Plan, plan};
pub use scenario::{Scenario, ScenarioErrors};
pub use sizing::{Design, SizingErrors, SizingRequest, size};
