// Pages while the database is down: a page that needs saved records fails inside Next.js, which can only answer
// such a failure with a 500 (a page cannot choose its own status). The server therefore holds back every page
// response of 500 or more, asks PostgreSQL whether it answers (one probe shared by the requests of 2 s), and,
// when it does not, answers 503 with Retry-After and a plain page that says to try again in a minute and reloads
// itself; otherwise the held-back response goes out unchanged. Pages that need no database (the sizing steps)
// keep working, and nothing needs restarting: the next request after the database is back renders normally.
import pg from "pg";

// The words of lib/db/unavailable.ts DATABASE_DOWN_MESSAGE (this file runs without the app's TypeScript).
const MESSAGE = "Spanlark cannot reach its saved records right now. Try again in a minute.";
const RETRY_AFTER_SECONDS = 60;
/** The plain page reloads itself this often until the database is back. */
const RELOAD_SECONDS = 20;
const PROBE_TIMEOUT_MS = 2_000;
const PROBE_REUSE_MS = 2_000;

export const DATABASE_DOWN_PAGE = `<!doctype html>
<html lang="en">
<head>
<meta charset="utf-8">
<meta name="viewport" content="width=device-width, initial-scale=1">
<meta http-equiv="refresh" content="${RELOAD_SECONDS}">
<meta name="robots" content="noindex">
<title>Try again in a minute — Spanlark</title>
<style>
  body { margin: 0; background: #F7F5EF; color: #15191E; font: 1.0625rem/1.6 system-ui, sans-serif; }
  main { max-width: 36rem; margin: 0 auto; padding: 2.5rem 1.25rem; }
  .brand { font-weight: 700; color: #1E5B4F; margin: 0 0 2rem; }
  .note { display: flex; gap: 0.75rem; align-items: flex-start; background: #FFF4D6; color: #6B4600; border: 1px solid #8A5A00; border-radius: 0.75rem; padding: 1rem; }
  .note svg { flex: none; width: 1.75rem; height: 1.75rem; }
  h1 { font-size: 1.875rem; line-height: 1.2; margin: 1.5rem 0 0.75rem; }
  a { display: inline-flex; align-items: center; min-height: 56px; padding: 0 1.5rem; margin: 0.5rem 0.5rem 0 0; border-radius: 0.75rem; font-weight: 700; text-decoration: none; }
  .primary { background: #1E5B4F; color: #FFFFFF; }
  .secondary { border: 2px solid #1E5B4F; color: #1E5B4F; }
  a:focus-visible { outline: 3px solid #0B57D0; outline-offset: 2px; }
</style>
</head>
<body>
<main>
<p class="brand">Spanlark</p>
<div class="note" role="status">
<svg viewBox="0 0 24 24" aria-hidden="true"><path fill="currentColor" d="M12 2 1 21h22L12 2Zm0 5.5 7.5 12h-15L12 7.5ZM11 10v5h2v-5h-2Zm0 6v2h2v-2h-2Z"/></svg>
<p style="margin:0">${MESSAGE}</p>
</div>
<h1>Try again in a minute</h1>
<p>Jobs, job sheets and accounts are out of reach for a moment. Nothing you saved is lost, and this page reloads by itself every ${RELOAD_SECONDS} seconds until they are back.</p>
<p>Sizing a member still works: what you enter in the sizing steps is kept on this phone.</p>
<p><a class="primary" href="/size">Size a member</a><a class="secondary" href="">Try again</a></p>
</main>
</body>
</html>
`;

let probe = { at: 0, pending: null, down: false };

/** True when the database at DATABASE_URL does not answer "SELECT 1" (probed at most once per 2 s). */
export async function databaseIsDown(url = process.env.DATABASE_URL) {
  if (!url) return false;
  if (probe.pending) return probe.pending;
  if (Date.now() - probe.at < PROBE_REUSE_MS) return probe.down;
  probe.pending = (async () => {
    const client = new pg.Client({ connectionString: url, connectionTimeoutMillis: PROBE_TIMEOUT_MS, query_timeout: PROBE_TIMEOUT_MS });
    client.on("error", () => undefined);
    try {
      await client.connect();
      await client.query("SELECT 1");
      return false;
    } catch {
      return true;
    } finally {
      client.end().catch(() => undefined);
    }
  })().then((down) => {
    probe = { at: Date.now(), pending: null, down };
    return down;
  });
  return probe.pending;
}

/** A page request (not an API route or a built file), whose failure a person sees as a page. */
export function isPageRequest(req) {
  const path = (req.url ?? "/").split("?")[0];
  return (req.method === "GET" || req.method === "HEAD") && !path.startsWith("/api/") && !path.startsWith("/_next/static/");
}

/**
 * Wraps `res` so that a page response with a status of 500 or more is held back until the database has been
 * probed: then either the plain 503 page or the original response is sent. Other responses pass untouched.
 * The wrappers stay in place and call the methods they wrapped: Next.js wraps them again (compression), and
 * putting the originals back would cut its wrappers out.
 */
export function holdFailedPages(req, res, isDown = databaseIsDown) {
  if (!isPageRequest(req)) return;
  const original = { writeHead: res.writeHead, write: res.write, end: res.end, flushHeaders: res.flushHeaders };
  const held = []; // [method, args]
  let holding = null; // null = undecided, true = holding back a failure, false = passing through

  const decide = (status) => {
    if (holding === null) holding = (status ?? res.statusCode) >= 500;
    return holding;
  };

  const finish = async () => {
    const down = await isDown().catch(() => false);
    holding = false;
    if (down && !res.headersSent) {
      for (const name of res.getHeaderNames()) res.removeHeader(name);
      original.writeHead.call(res, 503, {
        "content-type": "text/html; charset=utf-8",
        "retry-after": String(RETRY_AFTER_SECONDS),
        "cache-control": "no-store",
        "content-security-policy": "default-src 'none'; style-src 'unsafe-inline'; base-uri 'none'; form-action 'none'; frame-ancestors 'none'",
        "x-content-type-options": "nosniff",
      });
      original.end.call(res, req.method === "HEAD" ? undefined : DATABASE_DOWN_PAGE);
      return;
    }
    for (const [method, args] of held) original[method].apply(res, args);
  };

  res.writeHead = function (status, ...rest) {
    if (!decide(status)) return original.writeHead.call(res, status, ...rest);
    res.statusCode = status;
    // Held back, the headers are not sent, so each write asks for them again (Node's implicit header): keep the first.
    if (!held.some(([method]) => method === "writeHead")) held.push(["writeHead", [status, ...rest]]);
    return res;
  };
  res.flushHeaders = function () {
    if (!decide()) return original.flushHeaders.call(res);
  };
  res.write = function (...args) {
    if (!decide()) return original.write.apply(res, args);
    const callback = typeof args.at(-1) === "function" ? args.pop() : null;
    held.push(["write", args]);
    if (callback) queueMicrotask(() => callback());
    return true;
  };
  res.end = function (...args) {
    if (!decide()) return original.end.apply(res, args);
    const callback = typeof args.at(-1) === "function" ? args.pop() : null;
    held.push(["end", args]);
    void finish().finally(() => callback?.());
    return res;
  };
}
