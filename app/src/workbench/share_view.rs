//! The form's plan to send: as text (for a message, a file or `stillroom plan scenario.json`),
//! as a link, and as a short summary of its results; each with a Copy button, and the phone's
//! own share sheet where the browser has one.

use super::Workbench;
use super::share;
use crate::units;
use leptos::prelude::*;
use wasm_bindgen::JsCast;
use wasm_bindgen::prelude::*;

/// `navigator.<name>`'s method `method`, when the browser has it.
fn navigator_fn(object: &str, method: &str) -> Option<(JsValue, js_sys::Function)> {
    let nav: JsValue = web_sys::window()?.navigator().into();
    let target = if object.is_empty() { nav } else { js_sys::Reflect::get(&nav, &object.into()).ok()? };
    if target.is_undefined() || target.is_null() {
        return None;
    }
    let f = js_sys::Reflect::get(&target, &method.into()).ok()?.dyn_into::<js_sys::Function>().ok()?;
    Some((target, f))
}

/// Selects the text of the box `id`, so the grower can copy it by hand.
fn select(id: &str) {
    let el = web_sys::window().and_then(|w| w.document()).and_then(|d| d.get_element_by_id(id));
    if let Some(el) = el {
        if let Some(t) = el.dyn_ref::<web_sys::HtmlTextAreaElement>() {
            t.select();
        } else if let Some(i) = el.dyn_ref::<web_sys::HtmlInputElement>() {
            i.select();
        }
    }
}

/// Copies `text` to the clipboard; where the browser will not, selects the box `id` instead.
fn copy(text: String, id: &'static str, said: RwSignal<Option<String>>) {
    let by_hand = move || {
        select(id);
        said.set(Some("The text is selected: copy it with your phone's Copy (press and hold).".into()));
    };
    let Some((clip, write)) = navigator_fn("clipboard", "writeText") else { return by_hand() };
    let Ok(promise) = write.call1(&clip, &text.into()).and_then(|p| p.dyn_into::<js_sys::Promise>()) else {
        return by_hand();
    };
    leptos::task::spawn_local(async move {
        match wasm_bindgen_futures::JsFuture::from(promise).await {
            Ok(_) => said.set(Some("Copied.".into())),
            Err(_) => by_hand(),
        }
    });
}

/// Hands the link and summary to the phone's share sheet (Web Share API).
fn send(title: &str, text: &str, url: &str, said: RwSignal<Option<String>>) {
    let Some((nav, share)) = navigator_fn("", "share") else { return };
    let data = js_sys::Object::new();
    for (k, v) in [("title", title), ("text", text), ("url", url)] {
        let _ = js_sys::Reflect::set(&data, &k.into(), &v.into());
    }
    let Ok(promise) = share.call1(&nav, &data).and_then(|p| p.dyn_into::<js_sys::Promise>()) else {
        said.set(Some("This browser could not share it: use Copy instead.".into()));
        return;
    };
    leptos::task::spawn_local(async move {
        if let Err(e) = wasm_bindgen_futures::JsFuture::from(promise).await {
            let name = js_sys::Reflect::get(&e, &"name".into()).ok().and_then(|n| n.as_string());
            // The grower closing the share sheet is no failure.
            if name.as_deref() != Some("AbortError") {
                said.set(Some("It could not be shared: use Copy instead.".into()));
            }
        }
    });
}

/// The page's address without its fragment: what a share link starts with.
fn page_address() -> String {
    let Some(loc) = web_sys::window().map(|w| w.location()) else { return String::new() };
    format!(
        "{}{}{}",
        loc.origin().unwrap_or_default(),
        loc.pathname().unwrap_or_default(),
        loc.search().unwrap_or_default()
    )
}

/// The form's plan as text, as a link, and as a summary.
#[component]
pub fn ShareView() -> impl IntoView {
    let wb = expect_context::<Workbench>();
    let said = RwSignal::new(None::<String>);
    let text = Memo::new(move |_| {
        wb.current.with(|s| s.as_ref().and_then(|s| serde_json::to_string_pretty(s).ok())).unwrap_or_default()
    });
    let link =
        Memo::new(move |_| wb.current.with(|s| s.as_ref().map(|s| share::make_link(&page_address(), s))));
    let summary = Memo::new(move |_| {
        let system = wb.units.get();
        wb.current.with(|s| s.as_ref().and_then(|s| units::with_system(system, || share::summary(s))))
    });
    let link_text = move || link.get().and_then(|l| l.ok()).unwrap_or_default();
    let can_share = navigator_fn("", "share").is_some();
    let share_it = move |_| {
        let body = summary.get_untracked().unwrap_or_default();
        send("Stillroom plan", &body, &link_text(), said);
    };
    view! {
        <section class="share" aria-labelledby="h-share">
            <h2 id="h-share">"Send the form's plan"</h2>
            <p class="hint" hidden=move || wb.current.with(|s| s.is_some())>
                "The plan's form could not be read: open “Plan a run” once, then come back."</p>
            <p class="error" id="share-link-error" aria-live="polite">{move || link.get().and_then(|l| l.err())}</p>
            <div class="field">
                <label for="share-link"><span class="label">"A link that opens this plan"</span></label>
                <input id="share-link" type="text" readonly prop:value=link_text />
            </div>
            <div class="share-actions">
                <button type="button" id="share-link-copy" on:click=move |_| copy(link_text(), "share-link", said)>"Copy the link"</button>
                <Show when=move || can_share>
                    <button type="button" id="share-send" on:click=share_it>"Share…"</button>
                </Show>
            </div>
            <div class="field">
                <label for="share-summary"><span class="label">"The results in a few lines, for a message"</span></label>
                <textarea id="share-summary" rows="9" readonly prop:value=move || summary.get().unwrap_or_else(|| "No results: fix the plan's marked fields first.".into())></textarea>
            </div>
            <button type="button" id="share-summary-copy" on:click=move |_| copy(summary.get_untracked().unwrap_or_default(), "share-summary", said)>"Copy the summary"</button>
            <div class="field">
                <label for="plan-text"><span class="label">"The plan as text"</span></label>
                <p class="hint">"For a message or a file; the command-line tool reads it too: stillroom plan scenario.json"</p>
                <textarea id="plan-text" rows="6" readonly spellcheck="false" prop:value=move || text.get()></textarea>
            </div>
            <button type="button" id="plan-text-copy" on:click=move |_| copy(text.get_untracked(), "plan-text", said)>"Copy the plan's text"</button>
            <p class="hint" id="share-said" role="status" aria-live="polite">{move || said.get()}</p>
        </section>
    }
}
