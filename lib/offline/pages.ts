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

const ID = /^[0-9a-f-]{36}$/i;

/** /size?job=…&member=… (a saved member reopened to change it), its key; null for any other /size address. */
function savedMemberKey(u: URL): string | null {
  const job = u.searchParams.get("job");
  const member = u.searchParams.get("member");
  if (!job || !member || !ID.test(job) || !ID.test(member)) return null;
  return `${u.origin}/size?job=${job}&member=${member}`;
}

/**
 * A saved member reopened to change it (/size?job=…&member=…) is found by those two; any other /size address as
 * /size; every other page by its whole address.
 */
export function pageCacheKey(url: string): string {
  const u = new URL(url);
  if (u.pathname === "/size") return savedMemberKey(u) ?? `${u.origin}/size`;
  return u.href;
}

/**
 * Only the bare /size and a saved member's own /size?job=…&member=… are stored (a /size address with a state
 * would come back as the wrong flow); every other page is stored as answered.
 */
export function shouldCachePage(url: string): boolean {
  const u = new URL(url);
  if (isPrivatePath(u.pathname)) return false;
  if (u.pathname !== "/size") return true;
  // a saved member reopened as it was saved (its own page: a change made on it with no signal waits on the phone)
  return u.search === "" || ([...u.searchParams.keys()].every((k) => k === "job" || k === "member") && savedMemberKey(u) !== null);
}

/** The cache of crew links' site-board PDFs, kept with their pages. */
export const CREW_PDF_CACHE = "spanlark-crew-pdf";

/** /api/crew/<token>/pdf (the letter sheet, the one the crew page links to). */
export function isCrewPdfPath(pathname: string): boolean {
  return /^\/api\/crew\/[^/]+\/pdf$/.test(pathname);
}

/** The PDF of the crew link page at `pathname` (/crew/<token>), or null for any other page. */
export function crewPdfPath(pathname: string): string | null {
  const m = /^\/crew\/([^/]+)\/?$/.exec(pathname);
  return m ? `/api/crew/${m[1]}/pdf` : null;
}
