/// <reference lib="webworker" />
// Spanlark's service worker (built by @serwist/turbopack from this file, served at /serwist/sw.js by
// app/serwist/[path]/route.ts). It keeps the app usable with no signal:
// - the built scripts, styles and fonts are precached at install (the sizing flow's code and the fonts included);
// - pages are network-first: a page opened once is served from this phone when the network is gone, whole,
//   headers included, so its Content-Security-Policy nonce still matches its scripts;
// - "/" and "/size" are fetched into the cache when this worker activates (the first visit), so
//   the sizing flow opens offline even if the builder never went further than the home page;
// - API answers are never cached here (the material tables are kept by the page, in IndexedDB, with their version).
// A new worker waits until the builder accepts "A newer Spanlark is ready — reload" (it is never forced mid-flow).
import { defaultCache } from "@serwist/turbopack/worker";
import { NetworkFirst, NetworkOnly, Serwist, type PrecacheEntry, type SerwistGlobalConfig, type SerwistPlugin } from "serwist";
import { OFFLINE_PAGE, PAGES_CACHE, WARM_PAGES, isPrivatePath, pageCacheKey, shouldCachePage } from "./pages";

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}

declare const self: ServiceWorkerGlobalScope;

/** Keys /size?… to /size (only the bare page is kept: the flow's state lives in the URL and local storage). */
const pageKeys: SerwistPlugin = {
  cacheKeyWillBeUsed: async ({ request }) => pageCacheKey(request.url),
  cacheWillUpdate: async ({ request, response }) => (response.status === 200 && shouldCachePage(request.url) ? response : null),
};

// No network timeout: a slow server must not be answered with an older copy (a page drawn before signing in, a
// job before its last save); the kept copy is for when the network fails.
const pages = new NetworkFirst({ cacheName: PAGES_CACHE, plugins: [pageKeys] });

async function warmPages(extra: string[] = []): Promise<void> {
  const cache = await caches.open(PAGES_CACHE);
  const urls = [...WARM_PAGES, ...extra]
    .map((path) => new URL(path, self.location.origin))
    .filter((u) => u.origin === self.location.origin && shouldCachePage(u.href));
  await Promise.all(
    urls.map(async (url) => {
      try {
        const res = await fetch(url, { credentials: "same-origin", headers: { accept: "text/html" } });
        if (res.ok) await cache.put(pageCacheKey(url.href), res);
      } catch {
        // no signal while warming: the next visit with one fills the cache
      }
    }),
  );
}

const serwist = new Serwist({
  precacheEntries: self.__SW_MANIFEST,
  skipWaiting: false,
  clientsClaim: true,
  navigationPreload: false,
  runtimeCaching: [
    { matcher: ({ url, sameOrigin }) => sameOrigin && (url.pathname.startsWith("/api/") || isPrivatePath(url.pathname)), handler: new NetworkOnly() },
    { matcher: ({ request, sameOrigin }) => sameOrigin && request.mode === "navigate", handler: pages },
    ...defaultCache,
  ],
  fallbacks: {
    entries: [{ url: OFFLINE_PAGE, matcher: ({ request }) => request.mode === "navigate" }],
  },
});

self.addEventListener("activate", (event) => {
  event.waitUntil(warmPages());
});

// The page asks for a fresh copy of the warm pages after signing in (their content depends on who is signed in),
// and for itself when it was drawn before this worker took over (the first visit: a crew link opened once).
self.addEventListener("message", (event) => {
  const data = event.data as { type?: unknown; urls?: unknown } | null;
  if (data?.type !== "WARM_PAGES") return;
  const extra = Array.isArray(data.urls) ? data.urls.filter((u): u is string => typeof u === "string").slice(0, 4) : [];
  event.waitUntil(warmPages(extra));
});

serwist.addEventListeners();
