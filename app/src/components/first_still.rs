//! The page's second mode: designing a first still. The grower says what they will distil and
//! what they can hold to; the core's `size` designs the still, heat, condenser and separator,
//! each rounded to what can be bought. "Use this design" opens the design in the ordinary plan.
//!
//! The mode keeps its own signals here (not in the plan's state): the form's texts and choices,
//! the parsed request (a memo, so an edit that leaves the request unchanged costs nothing) and
//! the design (a memo on the request). Nothing is computed until the mode is first opened.
//! The units are the page's choice ([`bridge::units`], followed on [`bridge::UNITS_EVENT`]):
//! a switch rewrites each text in the new unit and pins its exact SI value behind it, as the
//! plan's form does, so the request stays exactly as it was.

mod design;
mod form;
pub mod request;

use crate::bridge;
use crate::units::UnitSystem;
use leptos::prelude::*;
use request::{Choices, HarvestMode, SIZE_FIELDS, SupplyMode, TextProblem, build_request, si_value};
use stillroom_core::heat::Fuel;
use stillroom_core::scenario::CondenserKind;
use stillroom_core::sizing::{Design, SizingErrors, SizingRequest, TubeStandard};

/// The request as typed: the request, or every field whose text cannot be read.
pub type Parsed = Result<SizingRequest, Vec<(&'static str, TextProblem)>>;

/// The first-still mode's signals, shared with its components through context.
#[derive(Clone)]
pub struct FirstStillState {
    /// One text per entry of [`SIZE_FIELDS`], in the same order.
    texts: Vec<RwSignal<String>>,
    /// Per field, the text a unit switch wrote and the exact SI value behind it.
    pinned: StoredValue<Vec<Option<(String, f64)>>>,
    /// The units the texts are typed in and the design is shown in.
    pub units: RwSignal<UnitSystem>,
    pub crop: RwSignal<String>,
    pub harvest: RwSignal<HarvestMode>,
    pub fuel: RwSignal<Fuel>,
    pub supply: RwSignal<SupplyMode>,
    pub phases: RwSignal<u8>,
    pub condenser: RwSignal<CondenserKind>,
    pub tubes: RwSignal<TubeStandard>,
    pub choices: Memo<Choices>,
    pub request: Memo<Parsed>,
    /// `None` while the request cannot be read.
    pub design: Memo<Option<Result<Design, SizingErrors>>>,
}

impl FirstStillState {
    fn new() -> FirstStillState {
        let start = Choices::default();
        let texts: Vec<RwSignal<String>> =
            SIZE_FIELDS.iter().map(|f| RwSignal::new(f.start.to_string())).collect();
        let crop = RwSignal::new(start.crop);
        let harvest = RwSignal::new(start.harvest);
        let fuel = RwSignal::new(start.fuel);
        let supply = RwSignal::new(start.supply);
        let phases = RwSignal::new(start.phases);
        let condenser = RwSignal::new(start.condenser);
        let tubes = RwSignal::new(start.tubes);
        let choices = Memo::new(move |_| Choices {
            crop: crop.get(),
            harvest: harvest.get(),
            fuel: fuel.get(),
            supply: supply.get(),
            phases: phases.get(),
            condenser: condenser.get(),
            tubes: tubes.get(),
        });
        let pinned = StoredValue::new(vec![None; SIZE_FIELDS.len()]);
        let units = RwSignal::new(UnitSystem::Metric);
        let field_texts = texts.clone();
        let request = Memo::new(move |_| {
            let system = units.get();
            let read = |key: &'static str| {
                let Some(i) = SIZE_FIELDS.iter().position(|f| f.key == key) else {
                    return Ok(None);
                };
                let text = field_texts[i].get();
                let exact = pinned.with_value(|p| p[i].as_ref().filter(|(t, _)| *t == text).map(|(_, v)| *v));
                match exact {
                    Some(si) => Ok(Some(si)),
                    None => si_value(&SIZE_FIELDS[i], &text, system),
                }
            };
            choices.with(|c| build_request(&read, c))
        });
        // Recomputed only when the parsed request changes.
        let design = Memo::new(move |_| request.with(|r| r.as_ref().ok().map(stillroom_core::size)));
        let fs = FirstStillState {
            texts,
            pinned,
            units,
            crop,
            harvest,
            fuel,
            supply,
            phases,
            condenser,
            tubes,
            choices,
            request,
            design,
        };
        // The starting entries are metric: shown in the page's units from the start, and a
        // grower on US units starts with the tube sizes sold in inches.
        let page_units = bridge::units();
        if page_units == UnitSystem::UsCustomary {
            fs.tubes.set(TubeStandard::Us);
        }
        fs.set_units(page_units);
        fs
    }

    /// Switches the units: each text that converts is rewritten in the new unit, its exact SI
    /// value pinned behind it (a text that is not a number stays as typed).
    pub fn set_units(&self, to: UnitSystem) {
        let from = self.units.get_untracked();
        if from == to {
            return;
        }
        for (i, (f, text)) in SIZE_FIELDS.iter().zip(&self.texts).enumerate() {
            if !f.converts() {
                continue;
            }
            let before = text.get_untracked();
            let exact = self
                .pinned
                .with_value(|p| p[i].as_ref().filter(|(t, _)| *t == before).map(|(_, v)| *v))
                .or_else(|| si_value(f, &before, from).ok().flatten());
            let converted = exact.map(|si| request::text_in(f, si, to)).unwrap_or(before);
            self.pinned.update_value(|p| p[i] = exact.map(|v| (converted.clone(), v)));
            text.set(converted);
        }
        self.units.set(to);
    }

    /// The text signal of a field.
    pub fn text(&self, key: &str) -> RwSignal<String> {
        let i = SIZE_FIELDS.iter().position(|f| f.key == key).unwrap_or(0);
        self.texts[i]
    }
}

/// The first-still view: the form, the design, and the way back to the plan.
#[component]
pub fn FirstStillView() -> impl IntoView {
    let fs = FirstStillState::new();
    provide_context(fs.clone());
    let switch = window_event_listener_untyped(bridge::UNITS_EVENT, move |_| fs.set_units(bridge::units()));
    on_cleanup(move || switch.remove());
    view! {
        <div id="first-still" class="columns">
            <div class="col-in"><form::FirstStillForm /></div>
            <div class="col-out">
                <design::DesignHeadline />
                <UseDesign />
                <design::BuilderSafety />
                <design::DesignDetails />
            </div>
        </div>
    }
}

/// Mounts the first-still view into the page's `#first-still-root`, replacing its loading line
/// (the first-still module's entry point).
pub fn mount() {
    let root =
        web_sys::window().and_then(|w| w.document()).and_then(|d| d.get_element_by_id("first-still-root"));
    if let Some(root) = root {
        use wasm_bindgen::JsCast;
        root.set_inner_html("");
        if let Ok(root) = root.dyn_into::<web_sys::HtmlElement>() {
            leptos::mount::mount_to(root, FirstStillView).forget();
        }
    }
}

/// "Use this design": sends the design to the plan (an event the plan's view listens for),
/// asking first inside the page, since it replaces what the plan's form holds; and hands it to
/// the workbench, which keeps its equipment under "Saved stills" (loaded now if it is not yet,
/// so the still is saved even if its tab is never opened).
#[component]
fn UseDesign() -> impl IntoView {
    let fs = expect_context::<FirstStillState>();
    let design = fs.design;
    let asking = RwSignal::new(false);
    let ready = move || design.with(|d| matches!(d, Some(Ok(_))));
    let open = move || {
        design.with_untracked(|d| {
            if let Some(Ok(d)) = d
                && let Ok(json) = serde_json::to_string(&d.scenario)
            {
                bridge::post(bridge::INBOX_STILL, &json);
                bridge::load_module(bridge::WORKBENCH_LOADER);
                bridge::send(bridge::OPEN_PLAN_EVENT, &json);
            }
        });
        asking.set(false);
    };
    view! {
        <section class="use-design" aria-labelledby="h-use-design" hidden=move || !ready()>
                <h2 id="h-use-design">"Plan runs with this design"</h2>
                <p class="hint">"Opens the bought design in “Plan a run”, where every number of a charge can be followed and changed, and keeps its equipment under “Saved stills”, to use with any crop."</p>
                // Both states are drawn once and shown in turn: cheaper than swapping views.
                <div class="confirm" role="group" aria-labelledby="fs-confirm-text" hidden=move || !asking.get()>
                    <p id="fs-confirm-text">"This replaces what the plan's form holds now (to keep that, save it first under “Saved plans”). The design's still, boiler, condenser and separator are also saved under “Saved stills”. Replace the plan with this design?"</p>
                    <button type="button" id="fs-use-confirm" on:click=move |_| open()>"Replace the plan"</button>
                    <button type="button" id="fs-use-cancel" class="quiet" on:click=move |_| asking.set(false)>"Keep my plan"</button>
                </div>
                <button type="button" id="fs-use" hidden=move || asking.get() on:click=move |_| asking.set(true)>"Use this design"</button>
        </section>
    }
}
