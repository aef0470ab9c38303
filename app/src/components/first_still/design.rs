//! The design, shown: headline cards, each part in full with what the physics asks for and what
//! to buy, the design's allowances and their sources, and the builder's cautions. Every number
//! comes from the core's `Design` through [`crate::units`], in the page's units (the cards and
//! parts are drawn inside [`units::with_system`]). Catalogue labels are the shops' own words
//! (a "200 L drum", "15 mm" tube); in US customary the size follows in US units.

use super::FirstStillState;
use super::request::unplaced;
use crate::units::{self, UnitSystem, sp811};
use leptos::prelude::*;
use stillroom_core::scenario::CondenserKind;
use stillroom_core::sizing::{Design, Purchase};

/// "needs A → buy B": the least that meets the request, and the size bought.
fn buy(p: &Purchase, show: impl Fn(f64) -> String) -> String {
    format!("needs {} → buy {}", show(p.exact), p.label)
}

fn us() -> bool {
    units::system() == UnitSystem::UsCustomary
}

/// A height in the still or separator: mm, or inches.
fn mm(m: f64) -> String {
    units::millimetres(m)
}

/// A tube's bore: mm to a tenth, or inches to a thousandth (as tube tables give it).
fn bore(m: f64) -> String {
    if us() {
        return format!("{} in", units::fixed(m / sp811::IN_M, 3));
    }
    format!("{} mm", units::fixed(m * 1000.0, 1))
}

fn fuel_amount(d: &Design, amount: f64) -> String {
    units::fuel(amount, d.scenario.boiler.fuel)
}

/// A card's figure for a bought part: the catalogue label, or in US customary the size in US
/// units (the note under it names the label to ask for).
fn label(p: &Purchase, show: fn(f64) -> String) -> String {
    if us() { show(p.rounded) } else { p.label.clone() }
}

/// Water to fill: kg, or US gallons (a kilogram taken as a litre, as the plan's form does).
fn water_amount(kg: f64) -> String {
    if us() { units::volume(kg / 1e3) } else { units::mass(kg) }
}

/// Packing density: kg/m³, or lb/ft³ (NIST SP 811).
fn density(kg_per_m3: f64) -> String {
    if us() {
        return format!("{} lb/ft³", units::sig3(kg_per_m3 * sp811::FT3_M3 / sp811::LB_KG));
    }
    format!("{} kg/m³", units::sig3(kg_per_m3))
}

/// Tube to buy: the core's whole metres, or whole feet at least as long.
fn tube_to_buy(m: f64) -> String {
    if us() {
        return format!("buy {} ft", units::fixed((m / sp811::FT_M).ceil(), 0));
    }
    format!("buy {} m", units::plain(m))
}

/// One headline card: label, figure, note, the figure's SI value for tests and tools, and its
/// output key.
pub struct CardText {
    pub label: &'static str,
    pub out: &'static str,
    pub value: String,
    pub note: String,
    pub si: Option<f64>,
}

fn card(label: &'static str, out: &'static str, value: String, note: String, si: Option<f64>) -> CardText {
    CardText { label, out, value, note, si }
}

/// The design at a glance.
pub fn cards(d: &Design) -> Vec<CardText> {
    let (still, heat, cond, sep, plan) = (&d.still, &d.heat, &d.condenser, &d.separator, &d.planned);
    let amps = heat.current_a.map(|a| format!("; draws {} A", units::sig3(a))).unwrap_or_default();
    let water = match (&cond.tub_volume_m3, cond.kind) {
        (Some(t), CondenserKind::CoilInTub) => format!("tub {}", buy(t, units::volume)),
        _ => format!("cooling water {}", units::litres_per_minute(cond.cooling_water_flow_kg_per_s)),
    };
    let sep_size = match (sep.diameter_m, sep.height_m) {
        (Some(w), Some(h)) => format!("; {} across × {} high", units::length(w), units::length(h)),
        _ => String::new(),
    };
    let season =
        plan.oil_per_season_kg.map(|kg| format!("; {} in the season", units::mass(kg))).unwrap_or_default();
    let oil = &plan.oil_per_charge_kg;
    vec![
        card(
            "Still",
            "fs_still",
            label(&still.volume_m3, units::volume),
            format!(
                "{}; {} across × {} high, grid {} up",
                buy(&still.volume_m3, units::volume),
                units::length(still.diameter_m),
                units::length(still.height_m),
                units::length(still.grid_height_m)
            ),
            Some(still.volume_m3.rounded),
        ),
        card(
            "Heat",
            "fs_heat",
            label(&heat.heat_input_w, units::kilowatts),
            format!("{}{amps}", buy(&heat.heat_input_w, units::kilowatts)),
            Some(heat.heat_input_w.rounded),
        ),
        card(
            "Charge",
            "fs_charge",
            units::mass(d.charge_kg),
            format!("{} a day, {} with turnarounds", d.charges_per_day, units::duration(plan.day_time_s)),
            Some(d.charge_kg),
        ),
        card(
            "Fill the boiler with",
            "fs_fill",
            format!("{} of water", water_amount(d.boiler.fill_kg)),
            format!(
                "{} boils off in the first charge, {} stays over the heater",
                water_amount(d.boiler.boiled_off_kg),
                water_amount(d.boiler.heater_cover_kg)
            ),
            Some(d.boiler.fill_kg),
        ),
        card(
            "First drop after",
            "fs_first_drop",
            units::duration(plan.time_to_first_drop_s),
            "from lighting the heat, cold".into(),
            Some(plan.time_to_first_drop_s),
        ),
        card(
            "A charge takes",
            "fs_run",
            units::duration(plan.first_charge_time_s),
            format!(
                "the first, from lighting; {} of distilling; later ones {}",
                units::duration(plan.time_after_first_drop_s),
                units::duration(plan.later_charge_time_s)
            ),
            Some(plan.first_charge_time_s),
        ),
        card(
            "Fuel a day",
            "fs_fuel",
            fuel_amount(d, plan.fuel_per_day),
            format!("{} per charge", fuel_amount(d, plan.fuel_per_charge)),
            Some(plan.fuel_per_day),
        ),
        card(
            "Condenser",
            "fs_condenser",
            cond.tube_inner_diameter_m.label.clone(),
            format!(
                "{} of tube for {}; {water}",
                units::length(cond.tube_length_m),
                units::kilowatts(cond.duty_w)
            ),
            Some(cond.tube_outer_diameter_m),
        ),
        card(
            "Separator",
            "fs_separator",
            label(&sep.volume_m3, units::volume),
            format!("{}{sep_size}", buy(&sep.volume_m3, units::volume)),
            Some(sep.volume_m3.rounded),
        ),
        card(
            "Oil per charge",
            "fs_oil",
            units::mass(oil.central),
            format!("likely {} to {}{season}", units::mass(oil.low), units::mass(oil.high)),
            Some(oil.central),
        ),
    ]
}

/// One part of the design in full: a heading and its (label, output key, value) rows.
pub type Part = (&'static str, Vec<(&'static str, &'static str, String)>);

fn or_dash(v: Option<String>) -> String {
    v.unwrap_or_else(|| "–".into())
}

/// "needs A → buy B (rounded)".
fn bought(p: &Purchase, show: fn(f64) -> String) -> String {
    format!("{} ({})", buy(p, show), show(p.rounded))
}

/// Each part of the design in full.
pub fn parts(d: &Design) -> Vec<Part> {
    let (still, heat, cond, sep, plan) = (&d.still, &d.heat, &d.condenser, &d.separator, &d.planned);
    let oil = &plan.oil_per_charge_kg;
    vec![
        (
            "Still",
            vec![
                ("Plant per charge", "fs_charge_kg", units::mass(d.charge_kg)),
                (
                    "Its volume, as packed",
                    "fs_charge_volume",
                    format!(
                        "{} at {}",
                        units::volume(still.charge_volume_m3),
                        density(still.packing_density_kg_per_m3)
                    ),
                ),
                ("Vessel", "fs_vessel", bought(&still.volume_m3, units::volume)),
                (
                    "Diameter × height",
                    "fs_vessel_size",
                    format!("{} × {}", units::length(still.diameter_m), units::length(still.height_m)),
                ),
                ("Boiler water depth", "fs_water_depth", mm(still.water_depth_m)),
                ("Grid above the bottom", "fs_grid", mm(still.grid_height_m)),
                ("Top of the charge", "fs_charge_top", mm(still.charge_top_m)),
                ("The vessel holds, at this packing", "fs_capacity", units::mass(still.capacity_kg)),
                ("Shell metal", "fs_metal", units::mass(still.metal_mass_kg)),
            ],
        ),
        (
            "Heat and boiler",
            vec![
                ("Heat input", "fs_heat_input", bought(&heat.heat_input_w, units::kilowatts)),
                ("Most on offer", "fs_supply", units::kilowatts(heat.supply_limit_w)),
                (
                    "Current drawn",
                    "fs_current",
                    or_dash(heat.current_a.map(|a| format!("{} A", units::sig3(a)))),
                ),
                (
                    "Steam raised",
                    "fs_steam",
                    format!(
                        "{}, {} {} of charge",
                        units::kg_per_hour(heat.steam_rate_kg_per_s),
                        // The same number in lb/h per lb: a ratio per hour.
                        units::sig3(heat.specific_steam_rate_kg_per_h_per_kg),
                        if us() { "lb/h per lb" } else { "kg/h per kg" },
                    ),
                ),
                ("Boiler fill", "fs_boiler_fill", water_amount(d.boiler.fill_kg)),
                (
                    "Fuel per charge / per day",
                    "fs_fuel_rows",
                    format!(
                        "{} / {}",
                        fuel_amount(d, plan.fuel_per_charge),
                        fuel_amount(d, plan.fuel_per_day)
                    ),
                ),
                (
                    "Water per charge, boiler and cooling",
                    "fs_water",
                    units::volume(plan.water_per_run_kg / 1000.0),
                ),
            ],
        ),
        (
            "Time",
            vec![
                ("First drop after", "fs_first_drop_row", units::duration(plan.time_to_first_drop_s)),
                (
                    "First charge, lighting to end",
                    "fs_first_charge",
                    units::duration(plan.first_charge_time_s),
                ),
                (
                    "Each later charge, started hot",
                    "fs_later_charge",
                    units::duration(plan.later_charge_time_s),
                ),
                (
                    "Charges a day / the day's still time",
                    "fs_day",
                    format!("{} / {}", d.charges_per_day, units::duration(plan.day_time_s)),
                ),
            ],
        ),
        (
            "Condenser",
            vec![
                ("Heat to take out", "fs_duty", units::kilowatts(cond.duty_w)),
                ("Tube bore", "fs_tube", bought(&cond.tube_inner_diameter_m, bore)),
                (
                    "Tube length",
                    "fs_tube_length",
                    format!("{}; {}", units::length(cond.tube_length_m), tube_to_buy(cond.tube_to_buy_m)),
                ),
                (
                    "Tub",
                    "fs_tub",
                    cond.tub_volume_m3
                        .as_ref()
                        .map(|t| bought(t, units::volume))
                        .unwrap_or_else(|| "– (fed jacket)".into()),
                ),
                (
                    "Tub water",
                    "fs_tub_water",
                    or_dash(cond.tub_water_kg.as_ref().map(|t| {
                        format!("needs {}; fill {}", water_amount(t.exact), water_amount(t.rounded))
                    })),
                ),
                (
                    "Tub at the end of the first charge",
                    "fs_tub_end",
                    or_dash(cond.tub_end_c.map(units::celsius)),
                ),
                ("Refilling the tub takes", "fs_tub_refill", or_dash(cond.tub_refill_s.map(units::duration))),
                (
                    "Cooling water, fed",
                    "fs_cooling_flow",
                    match cond.kind {
                        CondenserKind::TubeInTube => {
                            units::litres_per_minute(cond.cooling_water_flow_kg_per_s)
                        }
                        CondenserKind::CoilInTub => "– (tub)".into(),
                    },
                ),
                ("Distillate leaves at", "fs_distillate", units::celsius(cond.distillate_outlet_c)),
            ],
        ),
        (
            "Separator",
            vec![
                ("Volume", "fs_sep_volume", bought(&sep.volume_m3, units::volume)),
                (
                    "Diameter × height",
                    "fs_sep_size",
                    match (sep.diameter_m, sep.height_m) {
                        (Some(w), Some(h)) => format!("{} × {}", units::length(w), units::length(h)),
                        _ => "the oil will not part by gravity".into(),
                    },
                ),
                ("Top outlet at", "fs_top_outlet", or_dash(sep.top_outlet_height_m.map(mm))),
                ("Gooseneck (water) outlet at", "fs_gooseneck", or_dash(sep.gooseneck_height_m.map(mm))),
                ("Oil-water interface at", "fs_interface", or_dash(sep.interface_height_m.map(mm))),
                ("Distillate stands in it for", "fs_residence", units::duration(sep.residence_time_s)),
            ],
        ),
        (
            "Oil",
            vec![
                (
                    "Per charge",
                    "fs_oil_charge",
                    units::range(units::mass(oil.central), units::mass(oil.low), units::mass(oil.high)),
                ),
                ("Per day", "fs_oil_day", units::mass(plan.oil_per_day_kg)),
                (
                    "Per season",
                    "fs_oil_season",
                    plan.oil_per_season_kg
                        .map(units::mass)
                        .unwrap_or_else(|| "give the days of harvest".into()),
                ),
                ("Hydrosol per charge", "fs_hydrosol", units::volume(plan.hydrosol_per_charge_m3)),
            ],
        ),
    ]
}

/// Why there is no design: a headline and the errors no shown field carries.
fn blocked(fs: &FirstStillState) -> Option<(String, Vec<String>)> {
    if let Some(n) = fs.request.with(|r| r.as_ref().err().map(|p| p.len())) {
        return Some((format!("Fix the {n} marked field(s) to see the design."), Vec::new()));
    }
    fs.design.with(|r| match r {
        Some(Err(e)) => {
            let system = fs.units.get();
            let others = fs.choices.with(|c| unplaced(e, c, system));
            let shown = e.errors.len() - others.len();
            let head = if shown > 0 {
                format!("No design yet: see the {shown} marked field(s).")
            } else {
                "No design yet.".to_string()
            };
            Some((head, others))
        }
        _ => None,
    })
}

/// The design at a glance, or why there is none.
#[component]
pub fn DesignHeadline() -> impl IntoView {
    let fs = expect_context::<FirstStillState>();
    let d = fs.design;
    let system = fs.units;
    let why = Memo::new(move |_| blocked(&fs));
    let shown = move || {
        let system = system.get();
        d.with(|r| r.as_ref().and_then(|r| r.as_ref().ok()).map(|d| units::with_system(system, || cards(d))))
            .unwrap_or_default()
    };
    view! {
        <section class="headline" aria-labelledby="h-fs-design" aria-live="polite">
            <h2 id="h-fs-design">"Your first still"</h2>
            <div class="notice" data-out="fs_blocked" hidden=move || why.with(|w| w.is_none())>
                <p>{move || why.with(|w| w.as_ref().map(|w| w.0.clone()))}</p>
                <ul>{move || why.with(|w| w.as_ref().map(|w| w.1.clone()).unwrap_or_default()).into_iter().map(|m| view! { <li>{m}</li> }).collect_view()}</ul>
            </div>
            <div class="cards">
                {move || shown().into_iter().map(|c| view! {
                    <div class="card">
                        <p class="card-label">{c.label}</p>
                        <p class="card-value" data-out=c.out data-si=c.si.map(|v| v.to_string())>{c.value}</p>
                        <p class="card-note">{c.note}</p>
                    </div>
                }).collect_view()}
            </div>
        </section>
    }
}

/// Each part in full, the plan's warnings for the bought design, and the allowances.
#[component]
pub fn DesignDetails() -> impl IntoView {
    let fs = expect_context::<FirstStillState>();
    let d = fs.design;
    let units_in = fs.units;
    let body = move || {
        let system = units_in.get();
        d.with(|r| {
            let d = r.as_ref()?.as_ref().ok()?;
            let allowances = d
                .allowances
                .iter()
                .map(|a| {
                    let unit = if a.unit.is_empty() { String::new() } else { format!(" {}", a.unit) };
                    (format!("{}: {}{unit}", a.name, units::plain(a.value)), a.source.clone())
                })
                .chain([
                    (format!("Vessel: {}", d.still.volume_m3.label), d.still.volume_m3.source.clone()),
                    (format!("Heat: {}", d.heat.heat_input_w.label), d.heat.heat_input_w.source.clone()),
                    (
                        format!("Tube: {}", d.condenser.tube_inner_diameter_m.label),
                        d.condenser.tube_inner_diameter_m.source.clone(),
                    ),
                    (format!("Separator: {}", d.separator.volume_m3.label), d.separator.volume_m3.source.clone()),
                ])
                .collect::<Vec<_>>();
            let warnings: Vec<(String, String)> =
                d.planned.warnings.iter().map(|w| (w.code.clone(), w.message.clone())).collect();
            let has_warnings = !warnings.is_empty();
            Some(view! {
                <section class="details" aria-labelledby="h-fs-details">
                    <h2 id="h-fs-details">"The design in full"</h2>
                    {units::with_system(system, || parts(d)).into_iter().map(|(heading, rows)| view! {
                        <h3>{heading}</h3>
                        <dl>{rows.into_iter().map(|(label, out, value)| view! {
                            <div class="row"><dt>{label}</dt><dd data-out=out>{value}</dd></div>
                        }).collect_view()}</dl>
                    }).collect_view()}
                    {has_warnings.then(|| view! { <h3>"Watch out"</h3> })}
                    <ul class="fs-list">{warnings.into_iter().map(|(code, m)| view! { <li data-warning=code>{m}</li> }).collect_view()}</ul>
                    <h3>"For this design"</h3>
                    <ul class="fs-list" data-out="fs_cautions">{d.cautions.iter().map(|m| view! { <li>{m.clone()}</li> }).collect_view()}</ul>
                    <details class="sources" data-out="fs_allowances">
                        <summary>"What the design allows for, and why"</summary>
                        <dl class="source-list">
                            {allowances.into_iter().map(|(what, source)| view! { <dt>{what}</dt><dd>{source}</dd> }).collect_view()}
                        </dl>
                    </details>
                </section>
            })
        })
    };
    view! { {body} }
}

/// What every builder must hold to, shown with every design.
#[component]
pub fn BuilderSafety() -> impl IntoView {
    view! {
        <section class="cautions builder" aria-labelledby="h-fs-safety" data-out="fs_safety">
            <h2 id="h-fs-safety">"Before you build"</h2>
            <ul>
                <li>"Leave the steam a free way out: nothing that can close (no valve, tap or stopper) between the boiler and the condenser, and the condenser's outlet open to the air."</li>
                <li>"A boiler that can be shut must carry a pressure-relief valve sized for the heat, set low and pointed where its blast harms no one. These designs assume an open still and are not pressure vessels."</li>
                <li>"Everything the steam and distillate touch must be safe with food and with the oil: no lead solder (use lead-free or silver solder), no galvanised (zinc-coated) parts, no brass with lead in it. Aluminium reacts with some oils and with acid hydrosols; some oils soften plastics and rubber seals, so choose glass, stainless steel or copper."</li>
                <li>"Run gas and wood fires outdoors or with plenty of fresh air: they make carbon monoxide. Keep gas bottles upright, away from the heat, and test every joint for leaks."</li>
                <li>"Electric elements and their circuit are for a licensed electrician to fit: water, steam and earth faults kill."</li>
                <li>"Local building, gas, electrical and pressure-equipment codes come first, before anything on this page."</li>
            </ul>
        </section>
    }
}
