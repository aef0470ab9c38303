// Stillroom offline cache.
//
// The build writes its id into the cache name and the list of built files into PRECACHE, so each
// new build installs a fresh cache. A new worker does not take over by itself: it waits until the
// page, on the grower's tap, sends {type: "apply-update"}; then it activates, drops the old cache,
// and the page reloads once.
//
// Cache keys: the full URL, query string included (no ignoreSearch), so `a.js?x=1` and `a.js?x=2`
// are never answered with each other. The precache holds each built file under its plain URL.
// - Navigations (page loads): an exact cached match, else the cached index.html for any URL in the
//   scope's own folder whatever its query (the page is one document and reads no query); a deeper
//   in-scope path is redirected to the scope (the page's files are addressed relative to it).
//   Only with nothing cached does a navigation go to the network.
// - Other same-origin GETs: an exact cached match, else the network; a response is stored only
//   for a URL without a query string, so the cache holds the build's files and does not grow.
const BUILD = "__STILLROOM_BUILD_ID__";
const CACHE = "stillroom-" + BUILD;
const PRECACHE = ["./", "./index.html"/*__STILLROOM_PRECACHE__*/];
const SCOPE = new URL(self.registration.scope);

self.addEventListener("install", (event) => {
  event.waitUntil(
    (async () => {
      const cache = await caches.open(CACHE);
      // Revalidated with the server (`no-cache`), so a new build never precaches an old file, yet
      // a file the page has just fetched comes back as a bodiless 304 from the HTTP cache: a first
      // visit downloads each file once. (The page registers this worker after its first plan.)
      await cache.addAll(PRECACHE.map((url) => new Request(url, { cache: "no-cache" })));
    })()
  );
});

self.addEventListener("message", (event) => {
  if (event.data && event.data.type === "apply-update") self.skipWaiting();
});

self.addEventListener("activate", (event) => {
  event.waitUntil(
    (async () => {
      const names = await caches.keys();
      await Promise.all(
        names
          .filter((name) => name.startsWith("stillroom-") && name !== CACHE)
          .map((name) => caches.delete(name))
      );
      await self.clients.claim();
    })()
  );
});

async function navigate(request) {
  const cache = await caches.open(CACHE);
  const exact = await cache.match(request);
  if (exact) return exact;
  const url = new URL(request.url);
  const rest = url.pathname.slice(SCOPE.pathname.length);
  if (rest.includes("/")) return Response.redirect(SCOPE.href + url.search, 302);
  const page = await cache.match(new URL("./index.html", SCOPE).href);
  return page || fetch(request);
}

async function fetchFile(request) {
  const cache = await caches.open(CACHE);
  const hit = await cache.match(request);
  if (hit) return hit;
  const response = await fetch(request);
  if (response.ok && response.type === "basic" && new URL(request.url).search === "") {
    await cache.put(request, response.clone());
  }
  return response;
}

self.addEventListener("fetch", (event) => {
  const request = event.request;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin || !url.pathname.startsWith(SCOPE.pathname)) return;
  event.respondWith(request.mode === "navigate" ? navigate(request) : fetchFile(request));
});
