//! The page's components.

pub mod cautions;
pub mod first_still;
pub mod inputs;
pub mod kept_aside;
pub mod modes;
pub mod plan_rows;
pub mod results;
pub mod run_sheet;
