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

use crate::state::AppState;
use leptos::prelude::*;
use request::{Choices, HarvestMode, SIZE_FIELDS, SupplyMode, TextProblem, build_request};
use stillroom_core::heat::Fuel;
use stillroom_core::scenario::CondenserKind;
use stillroom_core::sizing::{Design, SizingErrors, SizingRequest, TubeStandard};

/// Which of the page's two views is shown.
#[derive(Debug, Clone, Copy, PartialEq, Eq)]
pub enum Mode {
    Plan,
    FirstStill,
}

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
    /// The view shown.
    pub mode: RwSignal<Mode>,
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
            mode: RwSignal::new(Mode::Plan),
        }
    }

    /// The text signal of a field.
    pub fn text(&self, key: &str) -> RwSignal<String> {
        let i = SIZE_FIELDS.iter().position(|f| f.key == key).unwrap_or(0);
        self.texts[i]
    }
}

/// The two views behind a tab bar: the ordinary plan (the children, kept alive while hidden so
/// nothing typed there is lost) and the first-still design.
#[component]
pub fn Modes<C: IntoView + 'static>(children: TypedChildren<C>) -> impl IntoView {
    // Typed children, not `Children`: boxing the whole plan into an `AnyView` costs ~15 kB.
    let children = children.into_inner();
    let fs = FirstStillState::new();
    let mode = fs.mode;
    provide_context(fs);
    let tab = move |m: Mode| move || if mode.get() == m { "true" } else { "false" };
    view! {
        <div class="modes" role="tablist" aria-label="What to work out">
            <button type="button" role="tab" id="mode-plan" aria-controls="plan-view"
                aria-selected=tab(Mode::Plan) class:chosen=move || mode.get() == Mode::Plan
                on:click=move |_| mode.set(Mode::Plan)>"Plan a run"</button>
            <button type="button" role="tab" id="mode-first" aria-controls="first-still"
                aria-selected=tab(Mode::FirstStill) class:chosen=move || mode.get() == Mode::FirstStill
                on:click=move |_| mode.set(Mode::FirstStill)>"Design a first still"</button>
        </div>
        <div id="plan-view" role="tabpanel" aria-labelledby="mode-plan" hidden=move || mode.get() != Mode::Plan>
            {children()}
        </div>
        <Show when=move || mode.get() == Mode::FirstStill>
            <div id="first-still" role="tabpanel" aria-labelledby="mode-first" class="columns">
                <div class="col-in"><form::FirstStillForm /></div>
                <div class="col-out">
                    <design::DesignHeadline />
                    <UseDesign />
                    <design::BuilderSafety />
                    <design::DesignDetails />
                </div>
            </div>
        </Show>
    }
}

/// "Use this design": opens the design in the ordinary plan, asking first (inside the page)
/// when that would replace what the plan's form holds.
#[component]
fn UseDesign() -> impl IntoView {
    let fs = expect_context::<FirstStillState>();
    // Stored, so the closures below are `Copy` and can be rebuilt with the view.
    let app = StoredValue::new(expect_context::<AppState>());
    let design = fs.design;
    let mode = fs.mode;
    let asking = RwSignal::new(false);
    let ready = move || design.with(|d| matches!(d, Some(Ok(_))));
    let open = move || {
        design.with_untracked(|d| {
            if let Some(Ok(d)) = d {
                app.with_value(|a| a.apply(&d.scenario));
            }
        });
        asking.set(false);
        mode.set(Mode::Plan);
        if let Some(w) = web_sys::window() {
            w.scroll_to_with_x_and_y(0.0, 0.0);
        }
    };
    let ask = move |_| {
        let same = design.with_untracked(|d| match d {
            Some(Ok(d)) => app.with_value(|a| a.scenario.with_untracked(|s| s.scenario == d.scenario)),
            _ => false,
        });
        if same { open() } else { asking.set(true) }
    };
    let now_holds = move || {
        app.with_value(|a| {
            a.scenario.with(|d| {
                let s = &d.scenario;
                let crop = s
                    .charge
                    .crop
                    .as_deref()
                    .and_then(|id| stillroom_core::crops::CROPS.iter().find(|c| c.id == id));
                format!(
                    "The plan's form now holds a {} charge of {}.",
                    crate::units::mass(s.charge.plant_mass_kg),
                    crop.map(|c| c.name.to_lowercase()).unwrap_or_else(|| "the grower's own plant".into())
                )
            })
        })
    };
    view! {
        <section class="use-design" aria-labelledby="h-use-design" hidden=move || !ready()>
                <h2 id="h-use-design">"Plan runs with this design"</h2>
                <p class="hint">"Opens the bought design in “Plan a run”, where every number of a charge can be followed and changed."</p>
                // Both states are drawn once and shown in turn: cheaper than swapping views.
                <div class="confirm" role="group" aria-labelledby="fs-confirm-text" hidden=move || !asking.get()>
                    <p id="fs-confirm-text">{now_holds}" Replace it with this design? (To keep it, copy it first from “This plan as text”.)"</p>
                    <button type="button" id="fs-use-confirm" on:click=move |_| open()>"Replace the plan"</button>
                    <button type="button" id="fs-use-cancel" class="quiet" on:click=move |_| asking.set(false)>"Keep my plan"</button>
                </div>
                <button type="button" id="fs-use" hidden=move || asking.get() on:click=ask>"Use this design"</button>
        </section>
    }
}
