/**
 * Which pages the service worker keeps on the phone, and under which key. Pure (used by the worker and
 * its tests).
 */

export const PAGES_CACHE = "spanlark-pages";

/** Shown for a page that was never opened with a signal (precached at install). */
export const OFFLINE_PAGE = "/offline";

/** Fetched into the cache when the worker starts and after signing in or out: the home page and the sizing flow. */
export const WARM_PAGES = ["/", "/size"] as const;

/** Pages never kept on the phone: the admin's pages and the sign-in pages' tokens. */
export function isPrivatePath(pathname: string): boolean {
  return pathname === "/admin" || pathname.startsWith("/admin/") || pathname.startsWith("/reset-password") || pathname.startsWith("/verify");
}

/** /size with any query is kept and found as /size; every other page by its whole address. */
export function pageCacheKey(url: string): string {
  const u = new URL(url);
  if (u.pathname === "/size") return `${u.origin}/size`;
  return u.href;
}

/**
 * Only the bare /size is stored (a /size address with a state or a saved member to reopen would come back
 * as the wrong flow); every other page is stored as answered.
 */
export function shouldCachePage(url: string): boolean {
  const u = new URL(url);
  if (isPrivatePath(u.pathname)) return false;
  return u.pathname !== "/size" || u.search === "";
}
