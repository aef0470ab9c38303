//! A number typed outside the main form's fields is read by the same rule and says how it was
//! read where it could be meant another way: "1,500" is 1500 and "1.500" is 1.5, each with
//! "read as …" beside the field (the rule of `fields::read_number`: a lone separator followed by
//! exactly three digits is the ambiguous case, as ISO 80000-1:2009 allows the comma or the point
//! as the decimal sign; from memory).

use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, wait_text};
use stillroom_tests::drive::{self, fill, tap, wait_for};

#[tokio::test]
async fn numbers_typed_outside_the_main_form_say_how_they_were_read() -> Result<(), BoxError> {
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    // The oil analysis: one line of the grower's own mixture.
    c.find(fantoccini::Locator::Id("f-oil")).await?.select_by_value("mixture").await?;
    tap(c, "#mix-add").await?;
    wait_for(c, ".mix-line input").await?;
    fill(c, ".mix-line input", "1.500").await?;
    wait_text(c, ".mix-line .reading", |t| t == "read as 1.5").await?;
    fill(c, ".mix-line input", "35").await?;
    wait_text(c, ".mix-line .reading", str::is_empty).await?;
    // The first-still form's harvest.
    tap(c, "#mode-first").await?;
    wait_for(c, "#fs-kg_per_day").await?;
    fill(c, "#fs-kg_per_day", "1,500").await?;
    wait_text(c, "#fs-n-kg_per_day", |t| t == "read as 1500").await?;
    // The workbench's run log.
    tap(c, "#mode-workbench").await?;
    wait_for(c, "#run-mass").await?;
    fill(c, "#run-mass", "1,500").await?;
    wait_text(c, "#run-mass-reading", |t| t == "read as 1500").await?;
    fill(c, "#run-mass", "20").await?;
    wait_text(c, "#run-mass-reading", str::is_empty).await?;
    page.close().await
}
