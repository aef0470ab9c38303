//! The fuel's price in US customary units on the built release page: typed per gallon of
//! propane or per therm of natural gas, held in the scenario per the core's sales unit (kg, m³),
//! the run's cost as the core plans it natively, and the price unchanged by a switch of units.

use fantoccini::Client;
use serde_json::json;
use stillroom_core::{Scenario, plan};
use stillroom_tests::BoxError;
use stillroom_tests::browser::{self, wait_text};
use stillroom_tests::drive::{self, choose, tap, type_into};

/// NIST SP 811 (2008) Appendix B.8: "gallon [U.S.] ... 3.785 411 784 E-03 m³" (exact).
const GAL_M3: f64 = 3.785_411_784e-3;
/// NIST SP 811 (2008) Appendix B.8: "therm (U.S.) ... 1.054 804 E+08 J".
const THERM_J: f64 = 1.054_804e8;
/// Liquid propane at 60 °F: relative density 0.507 (GPA 2145, from memory) times water's
/// 999.0 kg/m³ at 60 °F; the density the page gives its gallons of propane in.
const PROPANE_KG_PER_M3: f64 = 0.507 * 999.0;
/// Natural gas as a US utility bills it, per m³: the core's 36.6 MJ net (PNNL, GREET) on the
/// gross basis, times 1,089 / 983 (GREET's gross and net Btu/ft³, from memory).
const NATURAL_GAS_J_PER_M3: f64 = 36.6e6 * 1089.0 / 983.0;

/// The form's price label, whether or not its section is open.
async fn price_label(c: &Client) -> Result<String, BoxError> {
    let v = c
        .execute("return document.querySelector('label[for=f-fuel_price] .unit').textContent;", vec![])
        .await?;
    Ok(v.as_str().unwrap_or_default().to_string())
}

async fn price_text(c: &Client) -> Result<String, BoxError> {
    let v = c.execute("return document.getElementById('f-fuel_price').value;", vec![]).await?;
    Ok(v.as_str().unwrap_or_default().to_string())
}

/// The form's scenario, once its fuel and price are as wanted (read over the page's bridge).
async fn scenario_with(c: &Client, fuel: &str, price: f64) -> Result<Scenario, BoxError> {
    let start = std::time::Instant::now();
    loop {
        let s = drive::form_plan(c).await?;
        let got = s["costs"]["fuel_price_per_unit"].as_f64();
        if s["boiler"]["fuel"] == json!(fuel) && got.is_some_and(|p| (p - price).abs() <= 1e-12 * price) {
            return Ok(serde_json::from_value(s)?);
        }
        if start.elapsed() > browser::WAIT {
            return Err(format!("the form holds {fuel:?} at {got:?} per unit, wanted {price}: {s}").into());
        }
        tokio::time::sleep(std::time::Duration::from_millis(50)).await;
    }
}

/// The run's cost the page shows, to the three figures it shows, against the core's plan of
/// the same scenario run natively.
async fn cost_matches_the_core(c: &Client, s: &Scenario) -> Result<f64, BoxError> {
    let p = plan(s).map_err(|e| e.to_string())?;
    let cost = p.energy.cost.as_ref().ok_or("the core plans no cost")?;
    assert!(cost.fuel > 0.0 && cost.fuel == cost.total, "only the fuel is priced: {cost:?}");
    let want = cost.total;
    let close = |t: &str| {
        let n: String =
            t.split_whitespace().next().unwrap_or("").chars().filter(|ch| *ch != '\u{202f}').collect();
        n.parse::<f64>().is_ok_and(|shown| (shown - want).abs() <= 0.005 * want)
    };
    wait_text(c, "[data-out=cost]", |t| t.contains("USD") && close(t))
        .await
        .map_err(|e| format!("the core costs the run at {want} USD: {e}"))?;
    Ok(want)
}

#[tokio::test]
async fn a_fuel_price_is_typed_per_gallon_or_therm_and_costs_the_run_as_the_core_does() -> Result<(), BoxError>
{
    let page = browser::open().await?;
    drive::start_clean(&page).await?;
    let c = &page.client;
    tap(c, "#units-us").await?;
    wait_text(c, "[data-out=water_boiling_point]", |t| t.ends_with("°F")).await?;
    type_into(c, "f-currency", "USD").await?;
    choose(c, "f-fuel", "propane").await?;
    type_into(c, "f-fuel_price", "2.75").await?;
    assert_eq!(price_label(c).await?, "USD per gal");

    // 2.75 per gal of liquid propane: 1 gal = 3.785 411 784e-3 m³ × 506.493 kg/m³ = 1.917 28 kg,
    // so 2.75 / 1.917 28 = 1.4343 per kg.
    let per_kg = 2.75 / (GAL_M3 * PROPANE_KG_PER_M3);
    assert!((per_kg - 1.434_320).abs() < 1e-6, "{per_kg}");
    let propane = scenario_with(c, "propane", per_kg).await?;
    let propane_cost = cost_matches_the_core(c, &propane).await?;

    // Metric and back: the text is written per kg and again per gal, the price exactly kept.
    tap(c, "#units-metric").await?;
    wait_text(c, "[data-out=water_boiling_point]", |t| t.ends_with("°C")).await?;
    assert_eq!(price_label(c).await?, "USD per kg");
    assert_eq!(
        drive::form_plan(c).await?["costs"]["fuel_price_per_unit"].as_f64(),
        propane.costs.fuel_price_per_unit
    );
    tap(c, "#units-us").await?;
    wait_text(c, "[data-out=water_boiling_point]", |t| t.ends_with("°F")).await?;
    assert_eq!(price_text(c).await?, "2.75");
    assert_eq!(
        drive::form_plan(c).await?["costs"]["fuel_price_per_unit"].as_f64(),
        propane.costs.fuel_price_per_unit
    );

    // Natural gas: the same text is now read per therm (the propane price behind it is not kept):
    // 1 m³ holds 40 546 694 / 105 480 400 = 0.384 40 therm, so 2.75 × 0.384 40 = 1.057 10 per m³.
    choose(c, "f-fuel", "natural_gas").await?;
    let per_m3 = 2.75 * NATURAL_GAS_J_PER_M3 / THERM_J;
    assert!((per_m3 - 1.057_101).abs() < 1e-6, "{per_m3}");
    let gas = scenario_with(c, "natural_gas", per_m3).await?;
    assert_eq!(price_label(c).await?, "USD per therm");
    assert_eq!(price_text(c).await?, "2.75");
    let gas_cost = cost_matches_the_core(c, &gas).await?;
    assert!(gas_cost != propane_cost, "the cost follows the fuel: {gas_cost} and {propane_cost}");

    // Back to metric: per m³, the scenario's price exactly as it was.
    tap(c, "#units-metric").await?;
    wait_text(c, "[data-out=water_boiling_point]", |t| t.ends_with("°C")).await?;
    assert_eq!(price_label(c).await?, "USD per m³");
    assert_eq!(
        drive::form_plan(c).await?["costs"]["fuel_price_per_unit"].as_f64(),
        gas.costs.fuel_price_per_unit
    );
    cost_matches_the_core(c, &gas).await?;
    page.close().await
}
