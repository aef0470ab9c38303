//! The usual cautions of the trade. Shown on every plan, not hidden behind a click.

use leptos::prelude::*;

#[component]
pub fn Cautions() -> impl IntoView {
    view! {
        <section class="cautions" aria-labelledby="h-cautions">
            <h2 id="h-cautions">"Safety first"</h2>
            <ul>
                <li>"Steam and hot distillate scald. Wear gloves and eye protection; open lids and swap charges only with the heat off and the pressure gone."</li>
                <li>"A still must never be sealed. Keep the vapour path to the condenser open and clear, and never run the boiler dry or with a blocked outlet."</li>
                <li>"Essential oils and their vapours burn. Keep flames and sparks away from the receiver and separator; a warm separator gives off more vapour."</li>
                <li>"Burning propane, gas or wood needs fresh air: run fired stills outdoors or in a well-ventilated shed, and check hoses and fittings for leaks."</li>
                <li>"Keep electric heaters, cables and sockets away from water and earth them properly."</li>
                <li>"These figures are planning estimates from published physics, not a design approval. Boilers, pressure vessels, gas and electrical work must follow your local codes and, where they require it, a licensed installer or inspector."</li>
            </ul>
        </section>
    }
}
