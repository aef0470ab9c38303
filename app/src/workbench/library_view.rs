//! The saved plans and stills on the page: save the form's plan or still under a name, list
//! them, open one in the form, rename, duplicate, delete (with undo); a pasted plan and a plan
//! handed over by the page (a share link, a kept-aside copy) become new saved plans.
//!
//! Opening never loses the form: when the form's plan is not saved already, identically, it is
//! saved first as a plan of its own, and the grower is told, with an undo.

use super::library::{Equipment, Library, SavedPlan, SavedStill};
use super::{Workbench, share};
use crate::bridge;
use crate::records;
use crate::state::MAX_PASTE_BYTES;
use crate::storage;
use crate::units;
use leptos::prelude::*;
use stillroom_core::Scenario;

/// The longest name a plan or still may have, in characters (a phone shows about this many on
/// two lines).
pub const MAX_NAME_CHARS: usize = 80;

/// Checks a name for a new or renamed entry against the names `taken` by the others: trimmed,
/// not empty, not too long, not already used (ignoring case and the spaces around). `what` is
/// "plan" or "still".
pub fn check_name(name: &str, taken: &[&str], what: &str) -> Result<String, String> {
    let name = name.trim();
    if name.is_empty() {
        return Err(format!("Give the {what} a name."));
    }
    let n = name.chars().count();
    if n > MAX_NAME_CHARS {
        return Err(format!("This name has {n} characters; a name has at most {MAX_NAME_CHARS}."));
    }
    let lower = name.to_lowercase();
    if taken.iter().any(|t| t.trim().to_lowercase() == lower) {
        return Err(format!("A saved {what} is already called “{name}”: choose another name."));
    }
    Ok(name.to_string())
}

/// `base`, or `base (2)`, `base (3)`… : the first not `taken` (ignoring case).
pub fn unique_name(base: &str, taken: &[&str]) -> String {
    let base: String = base.trim().chars().take(MAX_NAME_CHARS - 5).collect();
    let free = |n: &str| !taken.iter().any(|t| t.trim().to_lowercase() == n.to_lowercase());
    if free(&base) {
        return base;
    }
    (2..).map(|i| format!("{base} ({i})")).find(|n| free(n)).unwrap_or(base)
}

/// What the last change did and how to take it back: the lists as they were, and the form's
/// plan to open again (after an opening).
#[derive(Clone)]
struct Undo {
    said: String,
    plans: Vec<SavedPlan>,
    stills: Vec<SavedStill>,
    form: Option<Scenario>,
}

/// The library view's messages, shared by its parts.
#[derive(Clone, Copy)]
pub struct Shelf {
    pub lib: Library,
    pub wb: Workbench,
    /// The last thing done, in words (and its undo).
    undo: RwSignal<Option<Undo>>,
    /// A plan just added from outside, offered to open in the form.
    pub offer: RwSignal<Option<u64>>,
    /// What the page says about the last change without an undo.
    pub said: RwSignal<Option<String>>,
}

impl Shelf {
    pub fn new(wb: Workbench, lib: Library) -> Shelf {
        Shelf { lib, wb, undo: RwSignal::new(None), offer: RwSignal::new(None), said: RwSignal::new(None) }
    }

    fn plan_names(&self) -> Vec<String> {
        self.lib.plans.with_untracked(|p| p.iter().map(|x| x.name.clone()).collect())
    }

    fn still_names(&self) -> Vec<String> {
        self.lib.stills.with_untracked(|s| s.iter().map(|x| x.name.clone()).collect())
    }

    fn remember(&self, said: String, form: Option<Scenario>) {
        let plans = self.lib.plans.get_untracked();
        let stills = self.lib.stills.get_untracked();
        self.said.set(None);
        self.undo.set(Some(Undo { said, plans, stills, form }));
    }

    /// Adds `scenario` as a new saved plan named `base` (made unique); its id.
    pub fn add_plan(&self, base: &str, scenario: Scenario) -> (u64, String) {
        let taken = self.plan_names();
        let name = unique_name(base, &taken.iter().map(String::as_str).collect::<Vec<_>>());
        let id = self.lib.fresh_id();
        let plan = SavedPlan { id, name: name.clone(), saved_ms: storage::now_ms(), scenario };
        self.lib.plans.update(|p| p.push(plan));
        (id, name)
    }

    /// Adds `equipment` as a new saved still named `base` (made unique); its name.
    pub fn add_still(&self, base: &str, equipment: Equipment) -> String {
        let taken = self.still_names();
        let name = unique_name(base, &taken.iter().map(String::as_str).collect::<Vec<_>>());
        let id = self.lib.fresh_id();
        let still = SavedStill { id, name: name.clone(), saved_ms: storage::now_ms(), equipment };
        self.lib.stills.update(|s| s.push(still));
        name
    }

    /// Opens `scenario` in the form, after saving the form's plan as a new one if it is not saved
    /// already; `what` names what is opened. False if the form could not be read, or would
    /// refuse the plan.
    fn open(&self, scenario: Scenario, what: &str) -> bool {
        // What the form would refuse is refused here, where the grower asked for it.
        if let Err(e) = records::fits(&scenario, "") {
            self.said.set(Some(format!("{what} was not opened: {e}. The form is unchanged.")));
            return false;
        }
        self.wb.refresh();
        let Some(form) = self.wb.current.get_untracked() else {
            self.said.set(Some(
                "The plan's form could not be read, so nothing was opened: open “Plan a run” once, then try again.".into(),
            ));
            return false;
        };
        let already = self.lib.plans.with_untracked(|p| p.iter().any(|x| x.scenario == form));
        if already || form == scenario {
            self.undo.set(None);
            self.said.set(Some(format!("Opened {what} in the form.")));
        } else {
            let before_plans = self.lib.plans.get_untracked();
            let before_stills = self.lib.stills.get_untracked();
            let stamp = storage::local_time(storage::now_ms());
            let (_, kept) = self.add_plan(&format!("Form before opening {what}, {stamp}"), form.clone());
            self.said.set(None);
            self.undo.set(Some(Undo {
                said: format!(
                    "Opened {what} in the form. The form's plan before it was not saved, so it is saved now as “{kept}”."
                ),
                plans: before_plans,
                stills: before_stills,
                form: Some(form),
            }));
        }
        self.offer.set(None);
        self.wb.open_in_plan(&scenario);
        true
    }

    fn take_back(&self) {
        if let Some(u) = self.undo.get_untracked() {
            self.lib.plans.set(u.plans);
            self.lib.stills.set(u.stills);
            if let Some(form) = u.form {
                self.wb.open_in_plan(&form);
            }
            self.undo.set(None);
            self.said.set(Some("Undone.".into()));
        }
    }
}

/// Takes in what the page handed over: share links and plan texts become new saved plans, a
/// designed still (from the first-still mode) a new saved still, a library record is merged. Called when the workbench starts and on each inbox event.
pub fn take_inbox(shelf: Shelf) {
    for link in bridge::take_inbox_of(bridge::INBOX_LINK) {
        match share::read_link(&link) {
            Ok(s) => {
                let stamp = storage::local_time(storage::now_ms());
                let (id, name) = shelf.add_plan(&format!("Shared plan, {stamp}"), s);
                shelf.undo.set(None);
                shelf
                    .said
                    .set(Some(format!("The link's plan is saved as “{name}”. Your form is unchanged.")));
                shelf.offer.set(Some(id));
            }
            Err(e) => shelf.said.set(Some(format!("The link in the address could not be opened. {e}"))),
        }
        clear_fragment();
    }
    for text in bridge::take_inbox_of(bridge::INBOX_PLAN) {
        match records::read_scenario(&text) {
            Ok(s) => {
                let stamp = storage::local_time(storage::now_ms());
                let (id, name) = shelf.add_plan(&format!("Kept plan, {stamp}"), s);
                shelf.undo.set(None);
                shelf.said.set(Some(format!("The kept copy is saved as “{name}”. Your form is unchanged.")));
                shelf.offer.set(Some(id));
            }
            Err(e) => shelf.said.set(Some(format!("The plan could not be read: {e}."))),
        }
    }
    for text in bridge::take_inbox_of(bridge::INBOX_STILL) {
        match records::read_scenario(&text) {
            Ok(s) => {
                let stamp = storage::local_time(storage::now_ms());
                let name = shelf.add_still(&format!("First still design, {stamp}"), Equipment::of(&s));
                shelf.undo.set(None);
                shelf.said.set(Some(format!(
                    "The designed still, boiler, condenser and separator are saved as “{name}”."
                )));
            }
            Err(e) => shelf.said.set(Some(format!("The designed still could not be read: {e}."))),
        }
    }
    for text in bridge::take_inbox_of(bridge::INBOX_LIBRARY) {
        let said = match super::library::read_library(&text) {
            Ok(record) => super::backup::merge_library(shelf.lib, record).words("saved plans and stills"),
            Err(e) => format!("The saved plans and stills could not be read: {e}."),
        };
        shelf.said.set(Some(said));
    }
}

/// Removes a `#plan=` fragment from the address, so a reload does not add the plan again.
fn clear_fragment() {
    let Some(w) = web_sys::window() else { return };
    let loc = w.location();
    if !loc.hash().unwrap_or_default().starts_with(share::LINK_MARK) {
        return;
    }
    let bare = format!("{}{}", loc.pathname().unwrap_or_default(), loc.search().unwrap_or_default());
    if let Ok(h) = w.history() {
        let _ = h.replace_state_with_url(&wasm_bindgen::JsValue::NULL, "", Some(&bare));
    }
}

/// The message line of the saved plans and stills, with Undo and "Open it in the form".
#[component]
fn ShelfNotice() -> impl IntoView {
    let shelf = expect_context::<Shelf>();
    let open_offered = move |_| {
        let id = shelf.offer.get_untracked();
        let found = shelf.lib.plans.with_untracked(|p| p.iter().find(|x| Some(x.id) == id).cloned());
        if let Some(p) = found {
            shelf.open(p.scenario, &format!("“{}”", p.name));
        }
    };
    view! {
        <div class="shelf-notice" role="status" aria-live="polite">
            <p id="shelf-said">{move || shelf.undo.with(|u| u.as_ref().map(|u| u.said.clone())).or_else(|| shelf.said.get())}</p>
            <Show when=move || shelf.undo.with(|u| u.is_some())>
                <button type="button" id="shelf-undo" class="quiet" on:click=move |_| shelf.take_back()>"Undo"</button>
            </Show>
            <Show when=move || shelf.offer.get().is_some()>
                <button type="button" id="shelf-open-offered" on:click=open_offered>"Open it in the form"</button>
            </Show>
        </div>
    }
}

/// The inline rename of one entry: the text, Save and Cancel, and why a name is refused.
#[component]
fn Rename(
    start: String,
    /// Tries a name: `Err` to show it.
    apply: Callback<String, Result<(), String>>,
    done: Callback<()>,
) -> impl IntoView {
    let draft = RwSignal::new(start);
    let problem = RwSignal::new(None::<String>);
    let save = move || match apply.run(draft.get_untracked()) {
        Ok(()) => done.run(()),
        Err(e) => problem.set(Some(e)),
    };
    view! {
        <div class="rename">
            <label class="label">"New name"
                <input type="text" class="rename-input" autocomplete="off" maxlength="200"
                    prop:value=move || draft.get()
                    on:input=move |ev| draft.set(event_target_value(&ev))
                    on:keydown=move |ev| if ev.key() == "Enter" { save() } />
            </label>
            <p class="error rename-error" aria-live="polite">{move || problem.get()}</p>
            <div class="saved-actions">
                <button type="button" class="rename-save" on:click=move |_| save()>"Save the name"</button>
                <button type="button" class="quiet rename-cancel" on:click=move |_| done.run(())>"Cancel"</button>
            </div>
        </div>
    }
}

fn plan_line(p: &SavedPlan) -> String {
    format!(
        "{} · {} · saved {}",
        share::crop_name(&p.scenario),
        units::mass(p.scenario.charge.plant_mass_kg),
        storage::local_time(p.saved_ms)
    )
}

fn still_line(s: &SavedStill) -> String {
    let volume =
        s.equipment.still.volume_m3.map(units::volume).unwrap_or_else(|| "size from the charge".into());
    format!("{volume} still · saved {}", storage::local_time(s.saved_ms))
}

/// One saved plan in the list.
#[component]
fn PlanItem(plan: SavedPlan) -> impl IntoView {
    let shelf = expect_context::<Shelf>();
    let renaming = RwSignal::new(false);
    let id = plan.id;
    let name = plan.name.clone();
    let apply = Callback::new(move |new: String| {
        let taken: Vec<String> = shelf
            .lib
            .plans
            .with_untracked(|p| p.iter().filter(|x| x.id != id).map(|x| x.name.clone()).collect());
        let name = check_name(&new, &taken.iter().map(String::as_str).collect::<Vec<_>>(), "plan")?;
        shelf.remember(format!("Renamed to “{name}”."), None);
        shelf.lib.plans.update(|p| {
            if let Some(x) = p.iter_mut().find(|x| x.id == id) {
                x.name = name.clone();
                x.saved_ms = storage::now_ms();
            }
        });
        Ok(())
    });
    let (open_s, open_name) = (plan.scenario.clone(), plan.name.clone());
    let open = move |_| {
        shelf.open(open_s.clone(), &format!("“{open_name}”"));
    };
    let (dup_s, dup_name) = (plan.scenario.clone(), plan.name.clone());
    let duplicate = move |_| {
        let (plans, stills) = (shelf.lib.plans.get_untracked(), shelf.lib.stills.get_untracked());
        let (_, made) = shelf.add_plan(&dup_name, dup_s.clone());
        shelf.said.set(None);
        shelf
            .undo
            .set(Some(Undo { said: format!("Duplicated as “{made}”."), plans, stills, form: None }));
    };
    let del_name = plan.name.clone();
    let delete = move |_| {
        shelf.remember(format!("Deleted “{del_name}”."), None);
        shelf.lib.plans.update(|p| p.retain(|x| x.id != id));
        if shelf.offer.get_untracked() == Some(id) {
            shelf.offer.set(None);
        }
    };
    view! {
        <li class="saved" data-plan=id>
            <p class="saved-name">{name.clone()}</p>
            <p class="hint">{plan_line(&plan)}</p>
            <Show when=move || renaming.get()>
                <Rename start=name.clone() apply=apply done=Callback::new(move |_| renaming.set(false)) />
            </Show>
            <div class="saved-actions" hidden=move || renaming.get()>
                <button type="button" class="plan-open" on:click=open>"Open in the form"</button>
                <button type="button" class="quiet plan-rename" on:click=move |_| renaming.set(true)>"Rename"</button>
                <button type="button" class="quiet plan-duplicate" on:click=duplicate>"Duplicate"</button>
                <button type="button" class="quiet plan-delete" on:click=delete>"Delete"</button>
            </div>
        </li>
    }
}

/// One saved still in the list.
#[component]
fn StillItem(still: SavedStill) -> impl IntoView {
    let shelf = expect_context::<Shelf>();
    let renaming = RwSignal::new(false);
    let id = still.id;
    let name = still.name.clone();
    let apply = Callback::new(move |new: String| {
        let taken: Vec<String> = shelf
            .lib
            .stills
            .with_untracked(|s| s.iter().filter(|x| x.id != id).map(|x| x.name.clone()).collect());
        let name = check_name(&new, &taken.iter().map(String::as_str).collect::<Vec<_>>(), "still")?;
        shelf.remember(format!("Renamed to “{name}”."), None);
        shelf.lib.stills.update(|s| {
            if let Some(x) = s.iter_mut().find(|x| x.id == id) {
                x.name = name.clone();
                x.saved_ms = storage::now_ms();
            }
        });
        Ok(())
    });
    let (equipment, use_name) = (still.equipment.clone(), still.name.clone());
    let use_it = move |_| {
        shelf.wb.refresh();
        match shelf.wb.current.get_untracked() {
            Some(form) => {
                shelf.open(
                    equipment.fitted_to(&form),
                    &format!("the still “{use_name}” with the plan's crop"),
                );
            }
            None => shelf.said.set(Some(
                "The plan's form could not be read: open “Plan a run” once, then try again.".into(),
            )),
        }
    };
    let del_name = still.name.clone();
    let delete = move |_| {
        shelf.remember(format!("Deleted the still “{del_name}”."), None);
        shelf.lib.stills.update(|s| s.retain(|x| x.id != id));
    };
    view! {
        <li class="saved" data-still=id>
            <p class="saved-name">{name.clone()}</p>
            <p class="hint">{still_line(&still)}</p>
            <Show when=move || renaming.get()>
                <Rename start=name.clone() apply=apply done=Callback::new(move |_| renaming.set(false)) />
            </Show>
            <div class="saved-actions" hidden=move || renaming.get()>
                <button type="button" class="still-use" on:click=use_it>"Use with the plan's crop"</button>
                <button type="button" class="quiet still-rename" on:click=move |_| renaming.set(true)>"Rename"</button>
                <button type="button" class="quiet still-delete" on:click=delete>"Delete"</button>
            </div>
        </li>
    }
}

/// A name box and a button that saves something of the form under that name.
#[component]
fn SaveBox(
    id: &'static str,
    label: &'static str,
    button: &'static str,
    /// Saves under the name; the message to show.
    save: Callback<String, Result<String, String>>,
) -> impl IntoView {
    let shelf = expect_context::<Shelf>();
    let name = RwSignal::new(String::new());
    let problem = RwSignal::new(None::<String>);
    let go = move || match save.run(name.get_untracked()) {
        Ok(said) => {
            problem.set(None);
            name.set(String::new());
            shelf.undo.set(None);
            shelf.said.set(Some(said));
        }
        Err(e) => problem.set(Some(e)),
    };
    let input_id = format!("{id}-name");
    view! {
        <div class="field save-box">
            <label for=input_id.clone()><span class="label">{label}</span></label>
            <input id=input_id type="text" autocomplete="off" maxlength="200"
                prop:value=move || name.get() on:input=move |ev| name.set(event_target_value(&ev))
                on:keydown=move |ev| if ev.key() == "Enter" { go() } />
            <p class="error" id=format!("{id}-error") aria-live="polite">{move || problem.get()}</p>
            <button type="button" id=format!("{id}-save") on:click=move |_| go()>{button}</button>
        </div>
    }
}

/// The pasted-plan box: any plan text becomes a new saved plan; the form is not touched.
#[component]
fn PastePlan() -> impl IntoView {
    let shelf = expect_context::<Shelf>();
    let text = RwSignal::new(String::new());
    let outcome = RwSignal::new(None::<Result<String, String>>);
    let add = move |_| {
        let t = text.get_untracked();
        let read = if t.len() > MAX_PASTE_BYTES {
            Err(format!(
                "This text is {} kB; the page reads plans of up to {} kB (a plan is usually under 10 kB). Check that only the plan was copied.",
                t.len().div_ceil(1024),
                MAX_PASTE_BYTES / 1024
            ))
        } else if t.trim().is_empty() {
            Err("Paste a plan's text (or a share link) into the box first.".into())
        } else if t.contains(share::LINK_MARK) {
            share::read_link(&t)
        } else {
            records::read_scenario(&t).map_err(|e| format!("This is not a plan the page can read: {e}."))
        };
        match read {
            Ok(s) => {
                let stamp = storage::local_time(storage::now_ms());
                let (id, name) = shelf.add_plan(&format!("Pasted plan, {stamp}"), s);
                text.set(String::new());
                shelf.undo.set(None);
                shelf.offer.set(Some(id));
                outcome.set(Some(Ok(format!("Saved as “{name}”. Your form is unchanged."))));
            }
            Err(e) => outcome.set(Some(Err(e))),
        }
    };
    view! {
        <div class="field paste-plan">
            <label for="paste-plan"><span class="label">"Paste a plan or a share link"</span></label>
            <textarea id="paste-plan" rows="4" autocomplete="off" spellcheck="false"
                prop:value=move || text.get() on:input=move |ev| text.set(event_target_value(&ev))></textarea>
            <p class="error" id="paste-error" aria-live="polite">{move || outcome.get().and_then(|r| r.err())}</p>
            <p class="hint" id="paste-done" aria-live="polite">{move || outcome.get().and_then(|r| r.ok())}</p>
            <button type="button" id="paste-add" on:click=add>"Add as a new saved plan"</button>
        </div>
    }
}

/// Saved plans and stills.
#[component]
pub fn LibraryView() -> impl IntoView {
    let shelf = expect_context::<Shelf>();
    let (lib, wb) = (shelf.lib, shelf.wb);
    let save_plan = Callback::new(move |name: String| {
        wb.refresh();
        let form = wb
            .current
            .get_untracked()
            .ok_or("The plan's form could not be read: open “Plan a run” once, then try again.")?;
        let taken = shelf.plan_names();
        let name = check_name(&name, &taken.iter().map(String::as_str).collect::<Vec<_>>(), "plan")?;
        let id = lib.fresh_id();
        lib.plans.update(|p| {
            p.push(SavedPlan { id, name: name.clone(), saved_ms: storage::now_ms(), scenario: form })
        });
        Ok(format!("The form's plan is saved as “{name}”."))
    });
    let save_still = Callback::new(move |name: String| {
        wb.refresh();
        let form = wb
            .current
            .get_untracked()
            .ok_or("The plan's form could not be read: open “Plan a run” once, then try again.")?;
        let taken = shelf.still_names();
        let name = check_name(&name, &taken.iter().map(String::as_str).collect::<Vec<_>>(), "still")?;
        let id = lib.fresh_id();
        let equipment = Equipment::of(&form);
        lib.stills.update(|s| {
            s.push(SavedStill { id, name: name.clone(), saved_ms: storage::now_ms(), equipment })
        });
        Ok(format!("The form's still, boiler, condenser and separator are saved as “{name}”."))
    });
    view! {
        <section class="library" aria-labelledby="h-library">
            <h2 id="h-library">"Saved plans"</h2>
            <ShelfNotice />
            <p class="error" id="library-unsaved" role="alert">{move || wb.store.unsaved()}</p>
            <SaveBox id="plan" label="Save the form's plan as" button="Save the plan" save=save_plan />
            <ul class="saved-list" id="saved-plans">
                {move || lib.plans.get().into_iter().rev().map(|p| view! { <PlanItem plan=p /> }).collect_view()}
            </ul>
            <p class="hint" hidden=move || lib.plans.with(|p| !p.is_empty())>"No saved plans yet."</p>
            <PastePlan />
            <h2 id="h-stills">"Saved stills"</h2>
            <p class="hint">"A still is the equipment only (still, boiler, condenser, separator): use it with any crop."</p>
            <SaveBox id="still" label="Save the form's still as" button="Save the still" save=save_still />
            <ul class="saved-list" id="saved-stills">
                {move || lib.stills.get().into_iter().rev().map(|s| view! { <StillItem still=s /> }).collect_view()}
            </ul>
            <p class="hint" hidden=move || lib.stills.with(|s| !s.is_empty())>"No saved stills yet."</p>
        </section>
    }
}

/// The saved plans and stills, sending the form's plan, and the backup file, in that order; what
/// the page handed over is taken in when they are first drawn and whenever more arrives.
#[component]
pub fn SavedParts() -> impl IntoView {
    let shelf = expect_context::<Shelf>();
    Effect::new(move |_| untrack(|| take_inbox(shelf)));
    let inbox = window_event_listener_untyped(bridge::INBOX_EVENT, move |_| take_inbox(shelf));
    on_cleanup(move || inbox.remove());
    view! {
        <LibraryView />
        <super::share_view::ShareView />
        <super::backup::Backup />
    }
}

#[cfg(test)]
mod tests {
    use super::*;
    use wasm_bindgen_test::wasm_bindgen_test;

    #[wasm_bindgen_test]
    fn a_name_is_trimmed_and_refused_when_empty_long_or_taken() {
        let taken = ["Lavender, July", "Mint"];
        assert_eq!(check_name("  Rosemary  ", &taken, "plan").unwrap(), "Rosemary");
        assert!(check_name("   ", &taken, "plan").unwrap_err().contains("name"));
        assert!(check_name(" mint ", &taken, "plan").unwrap_err().contains("already"));
        assert!(check_name("LAVENDER, JULY", &taken, "still").unwrap_err().contains("still"));
        let long = "x".repeat(MAX_NAME_CHARS + 1);
        assert!(check_name(&long, &taken, "plan").unwrap_err().contains("at most"));
        assert!(check_name(&"é".repeat(MAX_NAME_CHARS), &taken, "plan").is_ok(), "counted in characters");
    }

    #[wasm_bindgen_test]
    fn a_clashing_name_gets_the_first_free_number() {
        assert_eq!(unique_name("Mint", &[]), "Mint");
        assert_eq!(unique_name("Mint", &["mint"]), "Mint (2)");
        assert_eq!(unique_name("Mint", &["Mint", "Mint (2)", "Mint (3)"]), "Mint (4)");
        let made = unique_name(&"y".repeat(200), &[]);
        assert!(check_name(&format!("{made} (9)"), &[], "plan").is_ok(), "{}", made.len());
    }
}
