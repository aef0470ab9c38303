//! The page's second mode: designing a first still. The grower says what they will distil and
//! what they can hold to; the core's `size` designs the still, heat, condenser and separator,
//! each rounded to what can be bought. "Use this design" opens the design in the ordinary plan.
//!
//! The mode keeps its own signals here (not in the plan's state): the form's texts and choices,
//! the parsed request (a memo, so an edit that leaves the request unchanged costs nothing) and
//! the design (a memo on the request). Nothing is computed until the mode is first opened.

mod design;
mod form;
pub mod request;

use crate::bridge;
use leptos::prelude::*;
use request::{Choices, HarvestMode, SIZE_FIELDS, SupplyMode, TextProblem, build_request};
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
        let field_texts = texts.clone();
        let request = Memo::new(move |_| {
            let text = |key: &str| {
                SIZE_FIELDS
                    .iter()
                    .position(|f| f.key == key)
                    .map(|i| field_texts[i].get())
                    .unwrap_or_default()
            };
            choices.with(|c| build_request(&text, c))
        });
        // Recomputed only when the parsed request changes.
        let design = Memo::new(move |_| request.with(|r| r.as_ref().ok().map(stillroom_core::size)));
        FirstStillState {
            texts,
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
        }
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
    provide_context(FirstStillState::new());
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
/// asking first inside the page, since it replaces what the plan's form holds.
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
                bridge::send(bridge::OPEN_PLAN_EVENT, &json);
            }
        });
        asking.set(false);
    };
    view! {
        <section class="use-design" aria-labelledby="h-use-design" hidden=move || !ready()>
                <h2 id="h-use-design">"Plan runs with this design"</h2>
                <p class="hint">"Opens the bought design in “Plan a run”, where every number of a charge can be followed and changed."</p>
                // Both states are drawn once and shown in turn: cheaper than swapping views.
                <div class="confirm" role="group" aria-labelledby="fs-confirm-text" hidden=move || !asking.get()>
                    <p id="fs-confirm-text">"This replaces what the plan's form holds now. Replace it with this design? (To keep it, save it first under “Saved plans”.)"</p>
                    <button type="button" id="fs-use-confirm" on:click=move |_| open()>"Replace the plan"</button>
                    <button type="button" id="fs-use-cancel" class="quiet" on:click=move |_| asking.set(false)>"Keep my plan"</button>
                </div>
                <button type="button" id="fs-use" hidden=move || asking.get() on:click=move |_| asking.set(true)>"Use this design"</button>
        </section>
    }
}
