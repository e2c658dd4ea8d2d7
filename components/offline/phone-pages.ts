"use client";

import { PAGES_CACHE } from "@/lib/offline/pages";

// The page caches the service worker fills (ours, and the ones of Serwist's default rules for page data).
const PAGE_CACHES = [PAGES_CACHE, "pages", "pages-rsc", "pages-rsc-prefetch", "others"];

/**
 * Forgets the pages kept on this phone (they show the account's jobs) and asks the service worker to fetch
 * the home page and the sizing flow again as whoever is now signed in. Called on signing out.
 */
export async function forgetPhonePages(): Promise<void> {
  if (typeof caches === "undefined") return;
  await Promise.all(PAGE_CACHES.map((name) => caches.delete(name).catch(() => false)));
}

/** Asks the service worker to fetch the warm pages again (after signing in, the page shows the account's jobs). */
export function rewarmPhonePages(): void {
  navigator.serviceWorker?.controller?.postMessage({ type: "WARM_PAGES" });
}
