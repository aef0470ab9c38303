// Starts the measuring anchor's wasm module, as the page's start.js starts the page's (a file of
// its own so the Content-Security-Policy needs no 'unsafe-inline').
import init from "./stillroom_anchor.js";

init({ module_or_path: new URL("./stillroom_anchor_bg.wasm", import.meta.url) }).catch((err) => {
  document.body.textContent = "The anchor could not start: " + err;
  console.error(err);
});
