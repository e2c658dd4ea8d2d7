/**
 * Where to go after signing in. A return path comes from the address bar (?callbackUrl=…), so it is the
 * attacker's choice; it is accepted only if a browser, reading it as a link on one of our pages, would stay
 * on our origin. The test is the browser's own: the WHATWG URL parser (the `URL` class implements it) resolves
 * the value against our origin, which strips tabs and newlines anywhere, trims leading and trailing spaces
 * and control characters, and reads "\" as "/" — so "/<TAB>/evil.example/", "/\evil" and " //evil" all
 * resolve to another host and are refused. What is returned is the parsed path, never the raw value.
 */

/** Where a refused or missing return path leads. */
export const DEFAULT_RETURN_PATH = "/account";

/** Stands in for our origin where the caller has none at hand; only the path of the answer is used. */
const FALLBACK_ORIGIN = "https://spanlark.invalid";

// A return path is written as an absolute path. Scheme-relative or scheme-bearing forms ("https:evil",
// "javascript:…") are refused even where a parser would resolve them onto our origin.
const LEADING_JUNK = /^[\u0000-\u0020]+/;
const TAB_OR_NEWLINE = /[\t\n\r]/g;

/** The same-origin path (with query and fragment) `value` leads to, or DEFAULT_RETURN_PATH. */
export function safeReturnPath(value: string | null | undefined, origin: string = FALLBACK_ORIGIN): string {
  if (!value) return DEFAULT_RETURN_PATH;
  const cleaned = value.replace(TAB_OR_NEWLINE, "").replace(LEADING_JUNK, "");
  if (!cleaned.startsWith("/") && !cleaned.startsWith("\\")) return DEFAULT_RETURN_PATH;
  let base: URL;
  let target: URL;
  try {
    base = new URL(origin);
    target = new URL(value, base);
  } catch {
    return DEFAULT_RETURN_PATH;
  }
  if (target.origin !== base.origin || target.username !== "" || target.password !== "") return DEFAULT_RETURN_PATH;
  const path = `${target.pathname}${target.search}${target.hash}`;
  // "/.//evil" parses to the path "//evil", which a browser would read as another host when used as a link.
  if (!path.startsWith("/") || path.startsWith("//")) return DEFAULT_RETURN_PATH;
  return path;
}

/** For next-auth's redirect callback: `url` if it stays on `baseUrl`'s origin (as a path or a full address), else `baseUrl`. */
export function sameOriginRedirect(url: string, baseUrl: string): string {
  let base: URL;
  try {
    base = new URL(baseUrl);
  } catch {
    return baseUrl;
  }
  const cleaned = url.replace(TAB_OR_NEWLINE, "").replace(LEADING_JUNK, "");
  if (cleaned.startsWith("/") || cleaned.startsWith("\\")) {
    const path = safeReturnPath(url, base.origin);
    return `${base.origin}${path}`;
  }
  try {
    const target = new URL(url);
    if (target.origin === base.origin && target.username === "" && target.password === "") {
      return `${base.origin}${safeReturnPath(`${target.pathname}${target.search}${target.hash}`, base.origin)}`;
    }
  } catch {
    // not an address: fall through
  }
  return baseUrl;
}
