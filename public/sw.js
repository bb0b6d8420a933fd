// Throwline's focus-call service worker. Registered only by the focus call page (lib/offline/focus-worker.ts),
// scoped to that page, so it never answers for any other page. What it does:
// - the focus call page itself: network first; the last copy from this device when the network is gone;
// - /_next/static files: named by their content, so a kept copy is always right (cache first);
// - a unit's focus photo: its address carries the upload's id and changes with the photo (cache first);
// - the production's fixtures read: network first, the last copy when offline.
// Writes (PATCH, POST) are never touched: the page queues them itself while offline.
// The cache is named after the page's code version (?v=): a deploy registers a new worker whose activation
// deletes every older cache, so old app code is never served once the new page has been seen.
const VERSION = new URL(self.location.href).searchParams.get("v") || "0";
const PREFIX = "throwline-focus-";
const CACHE = PREFIX + VERSION;

self.addEventListener("install", () => {
  self.skipWaiting();
});

self.addEventListener("activate", (event) => {
  event.waitUntil(
    (async () => {
      for (const name of await caches.keys()) if (name.startsWith(PREFIX) && name !== CACHE) await caches.delete(name);
      await self.clients.claim();
    })(),
  );
});

const isStatic = (url) => url.pathname.startsWith("/_next/static/");
const isPhoto = (url) => /^\/api\/productions\/\d+\/fixtures\/\d+\/photo$/.test(url.pathname);
const isFixturesRead = (url) => /^\/api\/productions\/\d+\/fixtures$/.test(url.pathname);
const isFocusCall = (url) => /^\/productions\/\d+\/focus\/call\/?$/.test(url.pathname);
const keepable = (url) => isStatic(url) || isPhoto(url) || isFixturesRead(url) || isFocusCall(url);

/** Only whole, same-origin answers that were not redirected (a sign-in redirect must never be kept). */
const worthKeeping = (res) => res && res.ok && res.type === "basic" && !res.redirected;

async function fromNetwork(request) {
  const res = await fetch(request);
  if (worthKeeping(res)) {
    const cache = await caches.open(CACHE);
    await cache.put(request, res.clone());
  }
  return res;
}

async function networkFirst(request, url) {
  try {
    return await fromNetwork(request);
  } catch (err) {
    const cache = await caches.open(CACHE);
    // The focus call's page is the same for every ?position= and ?unit= (the page reads them itself).
    const kept =
      (await cache.match(request, { ignoreVary: true })) ??
      (isFocusCall(url) ? await cache.match(request, { ignoreSearch: true, ignoreVary: true }) : undefined);
    if (kept) return kept;
    throw err;
  }
}

async function cacheFirst(request) {
  const kept = await caches.match(request, { cacheName: CACHE, ignoreVary: true });
  return kept ?? fromNetwork(request);
}

self.addEventListener("fetch", (event) => {
  const { request } = event;
  if (request.method !== "GET") return;
  const url = new URL(request.url);
  if (url.origin !== self.location.origin || !keepable(url)) return;
  // Next's own in-page navigation data (RSC) and prefetches are left to the network.
  if (url.searchParams.has("_rsc") || request.headers.get("rsc")) return;
  if (request.mode === "navigate" && !isFocusCall(url)) return;
  event.respondWith(isStatic(url) || isPhoto(url) ? cacheFirst(request) : networkFirst(request, url));
});

// The page asks for its page, static files, fixtures read and the position's photos to be kept now, while it
// is still online (they were loaded before this worker existed, so it has not seen them).
self.addEventListener("message", (event) => {
  if (event.data?.type !== "keep") return;
  const port = event.ports[0];
  event.waitUntil(
    (async () => {
      const cache = await caches.open(CACHE);
      let ok = true;
      for (const href of event.data.urls) {
        const url = new URL(href, self.location.origin);
        if (url.origin !== self.location.origin || !keepable(url)) continue;
        if ((isStatic(url) || isPhoto(url)) && (await cache.match(url.href))) continue;
        try {
          const res = await fetch(url.href, { credentials: "same-origin" });
          if (worthKeeping(res)) await cache.put(url.href, res);
          else ok = false;
        } catch {
          ok = false;
        }
      }
      port?.postMessage({ ok });
    })(),
  );
});
