// Registers the focus call's service worker (public/sw.js) and tells it what to keep on the device.
// The worker is scoped to one production's focus call page, so it never stands between any other page
// and the network. Its cache is named after the app code the page runs (a hash of the page's own script
// addresses, which Next names by content): a deploy brings new addresses, a new worker, and the old cache
// is dropped, so stale app code is never served once the network has delivered the new page.

/** Addresses of the app's static files this page has loaded (scripts, styles, fonts): all content-named. */
function staticAssets(): string[] {
  const urls = new Set<string>();
  for (const e of performance.getEntriesByType("resource")) urls.add(e.name);
  for (const s of Array.from(document.scripts)) if (s.src) urls.add(s.src);
  for (const l of Array.from(document.querySelectorAll<HTMLLinkElement>("link[rel=stylesheet], link[rel=preload]")))
    if (l.href) urls.add(l.href);
  return [...urls].filter((u) => {
    const url = new URL(u, location.href);
    return url.origin === location.origin && url.pathname.startsWith("/_next/static/");
  });
}

/** A short hash of the page's script addresses (FNV-1a): changes whenever a deploy changes the app code. */
export function codeVersion(scriptUrls: string[]): string {
  let h = 0x811c9dc5;
  for (const ch of [...scriptUrls].sort().join("|")) {
    h ^= ch.charCodeAt(0);
    h = Math.imul(h, 0x01000193);
  }
  return (h >>> 0).toString(36);
}

export const focusCallScope = (productionId: number) => `/productions/${productionId}/focus/call`;

/**
 * Registers (or updates) the worker and asks it to keep the page, its static files and the given
 * addresses (the fixtures read, the position's photos). Resolves once the worker has them.
 */
export async function keepFocusCallOffline(productionId: number, extra: string[]): Promise<boolean> {
  if (!("serviceWorker" in navigator) || !window.isSecureContext) return false;
  const scripts = Array.from(document.scripts)
    .map((s) => s.src)
    .filter(Boolean);
  const registration = await navigator.serviceWorker.register(`/sw.js?v=${codeVersion(scripts)}`, {
    scope: focusCallScope(productionId),
    updateViaCache: "none",
  });
  const worker = registration.installing ?? registration.waiting ?? registration.active;
  if (!worker) return false;
  if (worker.state !== "activated")
    await new Promise<void>((resolve) => {
      const onChange = () => {
        if (worker.state === "activated" || worker.state === "redundant") {
          worker.removeEventListener("statechange", onChange);
          resolve();
        }
      };
      worker.addEventListener("statechange", onChange);
    });
  const active = registration.active;
  if (!active) return false;
  const urls = [location.href, ...staticAssets(), ...extra];
  return new Promise<boolean>((resolve) => {
    const channel = new MessageChannel();
    channel.port1.onmessage = (e) => resolve(e.data?.ok === true);
    active.postMessage({ type: "keep", urls }, [channel.port2]);
  });
}
