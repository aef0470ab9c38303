//! # stillroom-core
//!
//! The physics of planning a steam-distillation run for essential oils, one module per
//! phenomenon, in SI units. The one entry point is [`plan::plan`]: a [`scenario::Scenario`]
//! in, a [`plan::Plan`] (or every invalid field at once, as [`scenario::ScenarioErrors`]) out.

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
pub mod water;

pub use plan::{Plan, plan};
pub use scenario::{Scenario, ScenarioErrors};
pub use sizing::{Design, SizingErrors, SizingRequest, size};
