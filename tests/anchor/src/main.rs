//! A measuring anchor for `cargo xtask bench`, **not a product page**: a minimal Leptos 0.8
//! client-side page with as many number inputs, pickers and formatted outputs as the plan page,
//! and no physics. Each output is a formatted sum of products of the inputs, so what it costs to
//! load and to update is the framework's floor; BENCHMARKS.md shows the page's figures as ratios
//! over it.
//!
//! It carries the element ids the bench's scripts read on the page (`#f-plant_mass` is the edited
//! input, `[data-out=steam_total]` the watched output, shown in kg), so they run on it unchanged,
//! and `window.stillroomWasmBytes()` as the page has it. Built by `cargo xtask bench` into
//! `<target>/anchor-dist/`, never into `dist/`.

use leptos::prelude::*;

/// Number inputs on the plan page's form as a first visit shows it (`#f-*` inputs with a decimal
/// keyboard; counted in the built page with the default scenario on 2026-12-03; fields shown only
/// for some choices, such as a station barometer, are not there).
const NUMBER_INPUTS: usize = 25;
/// Pickers on the plan page's form (`#f-*` selects and checkboxes), counted the same way.
const PICKERS: usize = 7;
/// Formatted outputs on the plan page (`[data-out]`), counted the same way.
const OUTPUTS: usize = 62;
/// Units the outputs are shown in, in turn (the watched output, the first, in kg).
const UNITS: [&str; 6] = ["kg", "kW", "°C", "min", "L", "m²"];

/// One number input: the text as typed and what it reads as.
#[derive(Clone, Copy)]
struct NumberInput {
    n: usize,
    text: RwSignal<String>,
    value: Memo<Result<f64, String>>,
}

/// Input `n`'s key (its element id is `f-KEY`): the first is the plant mass the bench edits.
fn key(n: usize) -> String {
    if n == 0 { "plant_mass".to_string() } else { format!("in_{n:02}") }
}

/// Reads a typed number; a message for anything that is not a finite number.
fn read(text: &str) -> Result<f64, String> {
    match text.trim().parse::<f64>() {
        Ok(v) if v.is_finite() => Ok(v),
        _ => Err(format!("“{}” is not a number: type one such as 12.5", text.trim())),
    }
}

/// Output `j` from the inputs `x` and the pickers' factors `f`: every output moves with the first
/// input (the plant mass), as nearly every answer of the plan does.
fn output(j: usize, x: &[f64], f: &[f64]) -> f64 {
    let spread: f64 = x.iter().enumerate().map(|(i, xi)| xi * (((i + j) % 7) as f64 + 1.0) / 7.0).sum();
    x[0] * x[j % x.len()] * f[j % f.len()] + spread
}

#[component]
fn NumberField(input: NumberInput) -> impl IntoView {
    let key = key(input.n);
    let (id, err_id) = (format!("f-{key}"), format!("e-{key}"));
    let message = move || input.value.with(|v| v.as_ref().err().cloned());
    view! {
        <div class="field" class:invalid=move || message().is_some()>
            <label for=id.clone()><span class="label">{key}</span></label>
            <input
                id=id
                type="text"
                inputmode="decimal"
                autocomplete="off"
                aria-describedby=err_id.clone()
                prop:value=move || input.text.get()
                on:input=move |ev| input.text.set(event_target_value(&ev))
            />
            <p class="error" id=err_id aria-live="polite">{message}</p>
        </div>
    }
}

#[component]
fn Picker(n: usize, factor: RwSignal<f64>) -> impl IntoView {
    let id = format!("f-pick_{n:02}");
    view! {
        <div class="field">
            <label for=id.clone()><span class="label">{format!("Picker {n}")}</span></label>
            <select id=id on:change=move |ev| factor.set(event_target_value(&ev).parse().unwrap_or(1.0))>
                <option value="1" selected>"one"</option>
                <option value="1.1">"one and a tenth"</option>
                <option value="1.25">"one and a quarter"</option>
            </select>
        </div>
    }
}

#[component]
fn Output(label: String, out: String, value: Signal<String>) -> impl IntoView {
    view! {
        <div class="row">
            <dt>{label}</dt>
            <dd data-out=out>{move || value.get()}</dd>
        </div>
    }
}

#[component]
fn Anchor() -> impl IntoView {
    let inputs: Vec<NumberInput> = (0..NUMBER_INPUTS)
        .map(|i| {
            let start = if i == 0 { "15".to_string() } else { format!("{}", 1.0 + i as f64 * 0.25) };
            let text = RwSignal::new(start);
            NumberInput { n: i, text, value: Memo::new(move |_| read(&text.get())) }
        })
        .collect();
    let factors: Vec<RwSignal<f64>> = (0..PICKERS).map(|_| RwSignal::new(1.0)).collect();
    // All outputs at once from all inputs, as the page plans once per edit; none while an input
    // does not read as a number.
    let outputs = {
        let (inputs, factors) = (inputs.clone(), factors.clone());
        Memo::new(move |_| {
            let x: Vec<f64> = inputs.iter().map(|i| i.value.get()).collect::<Result<_, _>>().ok()?;
            let f: Vec<f64> = factors.iter().map(|f| f.get()).collect();
            Some((0..OUTPUTS).map(|j| output(j, &x, &f)).collect::<Vec<f64>>())
        })
    };
    let rows = (0..OUTPUTS)
        .map(|j| {
            let out = if j == 0 { "steam_total".to_string() } else { format!("out_{j:02}") };
            let unit = UNITS[j % UNITS.len()];
            let value = Signal::derive(move || {
                outputs
                    .with(|o| o.as_ref().map_or_else(|| "–".to_string(), |o| format!("{:.3} {unit}", o[j])))
            });
            view! { <Output label=format!("Output {j}") out=out value=value /> }
        })
        .collect_view();
    view! {
        <main class="page">
            <h1>"Measuring anchor (not a product page)"</h1>
            <div class="columns">
                <div class="col-out"><dl class="details">{rows}</dl></div>
                <div class="col-in">
                    {inputs.into_iter().map(|input| view! { <NumberField input=input /> }).collect_view()}
                    {factors.into_iter().enumerate().map(|(n, factor)| view! { <Picker n=n factor=factor /> }).collect_view()}
                </div>
            </div>
        </main>
    }
}

/// `window.stillroomWasmBytes()`: the module's memory in bytes, as the page reports its own.
fn expose_memory() {
    use wasm_bindgen::prelude::*;
    let Some(w) = web_sys::window() else { return };
    let bytes = Closure::<dyn Fn() -> String>::new(|| {
        let buffer = js_sys::Reflect::get(&wasm_bindgen::memory(), &"buffer".into());
        let bytes = buffer.and_then(|b| js_sys::Reflect::get(&b, &"byteLength".into()));
        bytes.ok().and_then(|b| b.as_f64()).map(|b| format!("{b}")).unwrap_or_default()
    });
    let _ = js_sys::Reflect::set(&w, &"stillroomWasmBytes".into(), bytes.as_ref());
    bytes.forget();
}

fn main() {
    expose_memory();
    leptos::mount::mount_to_body(Anchor);
}
