// Stillroom start-up: starts the page's wasm module and looks after the offline copy.
//
// A file of its own (not a script inside index.html) so the page's Content-Security-Policy
// needs no 'unsafe-inline'.
import init from "./stillroom_app.js";

const started = init({ module_or_path: new URL("./stillroom_app_bg.wasm", import.meta.url) });
started.catch((err) => {
  const p = document.createElement("p");
  p.className = "notice";
  p.textContent = "Stillroom could not start: " + err;
  document.body.append(p);
  console.error(err);
});

// The first-still designer and the workbench are modules of their own, each loaded the first
// time its tab is opened (the page calls these), so a first visit downloads only what a first
// plan needs.
function lazyModule(stem, rootId, what, styles) {
  let loading = null;
  return () => {
    if (styles && !document.querySelector('link[href="' + styles + '"]')) {
      const link = document.createElement("link");
      link.rel = "stylesheet";
      link.href = styles;
      document.head.append(link);
    }
    loading ??= import("./" + stem + ".js")
      .then((m) => m.default({ module_or_path: new URL("./" + stem + "_bg.wasm", import.meta.url) }))
      .catch((err) => {
        loading = null;
        const root = document.getElementById(rootId);
        if (root) root.textContent = "The " + what + " could not be loaded (" + err + "). Check the connection and open the tab again.";
      });
    return loading;
  };
}
window.stillroomFirstStill = lazyModule("stillroom_first_still", "first-still-root", "first-still designer");
// The workbench brings its own stylesheet, kept out of the first load.
window.stillroomWorkbench = lazyModule("stillroom_workbench", "workbench-root", "workbench", "./workbench.css");

// A new version's service worker installs in the background and then waits. The grower is told,
// and it takes over only when they tap "Use the new version" (never in the middle of an entry);
// the page then reloads once, on the new version.
let applying = false;

function offer(worker) {
  const bar = document.getElementById("update");
  if (!bar) return;
  bar.hidden = false;
  document.getElementById("update-apply").onclick = () => {
    // The page marks <html data-unsaved> (the plan) or <html data-unsaved-workbench> while
    // entries could not be saved: a reload would drop them.
    const root = document.documentElement;
    if (
      (root.hasAttribute("data-unsaved") || root.hasAttribute("data-unsaved-workbench")) &&
      !window.confirm("Your latest entries are not saved in this browser. Download everything first, or they are lost when the page reloads. Reload anyway?")
    ) {
      return;
    }
    applying = true;
    worker.postMessage({ type: "apply-update" });
  };
  document.getElementById("update-later").onclick = () => {
    bar.hidden = true;
  };
}

function watch(reg) {
  if (reg.waiting && navigator.serviceWorker.controller) offer(reg.waiting);
  reg.addEventListener("updatefound", () => {
    const worker = reg.installing;
    if (!worker) return;
    worker.addEventListener("statechange", () => {
      // With no controller this is the first install: nothing to replace, nothing to say.
      if (worker.state === "installed" && navigator.serviceWorker.controller) offer(worker);
    });
  });
  navigator.serviceWorker.addEventListener("controllerchange", () => {
    if (applying) {
      applying = false;
      window.location.reload();
    }
  });
}

// The offline copy is made once the first plan is on screen and the page's own files have
// arrived: the worker then finds them in the HTTP cache (see sw.js), so a first visit does not
// download the page twice, and it never competes with the page for a slow link.
const loaded = new Promise((done) => {
  if (document.readyState === "complete") done();
  else window.addEventListener("load", done, { once: true });
});
if ("serviceWorker" in navigator) {
  Promise.all([started, loaded])
    .then(() => new Promise((done) => requestAnimationFrame(() => setTimeout(done, 0))))
    .then(() => navigator.serviceWorker.register("./sw.js"))
    .then(watch)
    .catch((err) => console.warn("offline cache off:", err));
}
