/// <reference lib="webworker" />
// Spanlark's service worker (built by @serwist/turbopack from this file, served at /serwist/sw.js by
// app/serwist/[path]/route.ts). It keeps the app usable with no signal:
// - the built scripts, styles and fonts are precached at install (the sizing flow's code and the fonts included);
// - pages are network-first: a page opened once is served from this phone when the network is gone, whole,
//   headers included, so its Content-Security-Policy nonce still matches its scripts;
// - "/" and "/size" are fetched into the cache when this worker activates (the first visit), so
//   the sizing flow opens offline even if the builder never went further than the home page;
// - API answers are never cached here (the material tables are kept by the page, in IndexedDB, with their version).
// - a crew link's site-board PDF is kept when its page is kept, network-first, so it opens with no signal;
// - saves and changes made with no signal are sent by Background Sync (the "sync" event, tag SYNC_TAG) even when
//   no Spanlark page is open, from the same queue and with the same idempotency keys the open page uses.
// A new worker waits until the builder accepts "A newer Spanlark is ready — reload" (it is never forced mid-flow).
import { defaultCache } from "@serwist/turbopack/worker";
import { NetworkFirst, NetworkOnly, Serwist, type PrecacheEntry, type SerwistGlobalConfig, type SerwistPlugin } from "serwist";
import { CREW_PDF_CACHE, OFFLINE_PAGE, PAGES_CACHE, WARM_PAGES, crewPdfPath, isCrewPdfPath, isPrivatePath, pageCacheKey, shouldCachePage } from "./pages";
import { SYNC_TAG, sendQueue } from "./queue";

declare global {
  interface WorkerGlobalScope extends SerwistGlobalConfig {
    __SW_MANIFEST: (PrecacheEntry | string)[] | undefined;
  }
}

declare const self: ServiceWorkerGlobalScope;

/**
 * A crew link's site-board PDF, fetched into the phone's cache beside its page (the crew reads both on site). The
 * kept copy's ETag goes with the request: an unchanged sheet comes back as a 304 (the server draws nothing) and the
 * kept copy is marked current.
 */
async function keepCrewPdf(pageUrl: string): Promise<void> {
  const pdf = crewPdfPath(new URL(pageUrl).pathname);
  if (!pdf) return;
  try {
    const cache = await caches.open(CREW_PDF_CACHE);
    const key = new URL(pdf, self.location.origin).href;
    const kept = await cache.match(key);
    const etag = kept?.headers.get("etag");
    const res = await fetch(pdf, { credentials: "same-origin", headers: etag ? { "if-none-match": etag } : {} });
    if (res.status === 304 && kept) {
      const headers = new Headers(kept.headers);
      headers.set("date", res.headers.get("date") ?? new Date().toUTCString());
      await cache.put(key, new Response(await kept.blob(), { status: 200, headers }));
    } else if (res.ok) await cache.put(key, res);
  } catch {
    // no signal: kept the next time the page is opened with one
  }
}

/** Keys /size?… to /size (only the bare page is kept: the flow's state lives in the URL and local storage). */
const pageKeys: SerwistPlugin = {
  cacheKeyWillBeUsed: async ({ request }) => pageCacheKey(request.url),
  cacheWillUpdate: async ({ request, response }) => (response.status === 200 && shouldCachePage(request.url) ? response : null),
  // runs inside the fetch event's waitUntil (after the page has its answer)
  cacheDidUpdate: async ({ request }) => keepCrewPdf(request.url),
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
        if (res.ok) {
          await cache.put(pageCacheKey(url.href), res);
          await keepCrewPdf(url.href);
        }
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
    { matcher: ({ url, sameOrigin }) => sameOrigin && isCrewPdfPath(url.pathname), handler: new NetworkFirst({ cacheName: CREW_PDF_CACHE }) },
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

interface SyncEvent extends ExtendableEvent {
  readonly tag: string;
  readonly lastChance: boolean;
}

/** Tells the open pages (if any) that the queue changed, so their counts and messages follow. */
async function tellPages(): Promise<void> {
  for (const client of await self.clients.matchAll({ type: "window" })) client.postMessage({ type: "QUEUE_CHANGED" });
}

// Background Sync: the browser fires this when the signal is back, whether or not a Spanlark page is open. The
// queue is the page's (IndexedDB); the keys make a save sent here and by a page at once one save. Items left
// unsent because the network failed make the sync fail, so the browser tries again later.
self.addEventListener("sync", (event) => {
  const sync = event as SyncEvent;
  if (sync.tag !== SYNC_TAG) return;
  sync.waitUntil(
    sendQueue("background").then(async (outcome) => {
      if (outcome.changed) await tellPages();
      if (outcome.unsent > 0) throw new Error(`${outcome.unsent} saves still waiting for a signal`);
    }),
  );
});

serwist.addEventListeners();
