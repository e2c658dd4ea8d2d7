import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { StandinApiError, unknownRoute } from "./errors";
import { FormParseError, parseStripeForm, str, stringList, type FormObject } from "./form";
import type { StandinObject } from "./objects";
import { checkoutPage, messagePage, portalPage } from "./pages";
import { createPrice, createProduct, listPrices, listProducts, retrievePrice, retrieveProduct } from "./catalog";
import { checkoutView, createCheckoutSession, payCheckoutSession, retrieveCheckoutSession } from "./checkout";
import { advance } from "./clock";
import { createCustomer, retrieveCustomer, updateCustomer } from "./customers";
import { listEvents, retrieveEvent } from "./events";
import { createPortalSession, portalAction, portalView } from "./portal";
import { cancelSubscription, listSubscriptions, retrieveInvoice, retrieveSubscription, updateSubscription } from "./subscriptions";
import { StandinStore, type StandinSnapshot } from "./store";
import { WebhookSender } from "./webhooks";

interface StandinServerOptions {
  port: number;
  host?: string;
  /** Where events are POSTed; an empty string sends none. */
  webhookUrl: string;
  webhookSecret: string;
  /** A JSON file that keeps the state across restarts; none keeps it in memory only. */
  statePath?: string;
  /** How long a page waits for its events to be delivered before it redirects. */
  settleTimeoutMs?: number;
  log?: (line: string) => void;
}

export interface StandinServer {
  url: string;
  standin: StandinStore;
  sender: WebhookSender | null;
  server: Server;
  /** Resolves once every event so far has been delivered (or given up on). */
  settled(): Promise<void>;
  close(): Promise<void>;
}

type Params = FormObject;
type ApiHandler = (m: RegExpExecArray, p: Params) => unknown;

const LOOPBACK = new Set(["127.0.0.1", "::1", "::ffff:127.0.0.1"]);

/**
 * Starts the stand-in: Stripe's REST API under /v1 (Bearer sk_test_… keys), the checkout and portal pages,
 * and /_control for tests (loopback callers only). Events go out signed to `webhookUrl` in order.
 */
export async function startStandinServer(options: StandinServerOptions): Promise<StandinServer> {
  const host = options.host ?? "127.0.0.1";
  const log = options.log ?? (() => {});
  let publicUrl = `http://${host}:${options.port}`;
  const sender = options.webhookUrl ? new WebhookSender({ url: options.webhookUrl, secret: options.webhookSecret, log }) : null;
  const standin = new StandinStore({
    get publicUrl() {
      return publicUrl;
    },
    onEvent: (event) => sender?.enqueue(event),
  });
  if (options.statePath && existsSync(options.statePath)) {
    standin.restore(JSON.parse(readFileSync(options.statePath, "utf8")) as StandinSnapshot);
    log(`state loaded from ${options.statePath}`);
  }
  const idempotent = new Map<string, { fingerprint: string; status: number; body: string }>();

  const persist = () => {
    if (!options.statePath) return;
    mkdirSync(path.dirname(options.statePath), { recursive: true });
    const tmp = `${options.statePath}.tmp`;
    writeFileSync(tmp, JSON.stringify(standin.snapshot()));
    renameSync(tmp, options.statePath);
  };

  const settled = async () => {
    if (!sender) return;
    await Promise.race([sender.settled(), new Promise((r) => setTimeout(r, options.settleTimeoutMs ?? 20_000))]);
  };

  const api: Array<[string, RegExp, ApiHandler]> = [
    ["POST", /^\/v1\/products$/, (_m, p) => createProduct(standin, p)],
    ["GET", /^\/v1\/products$/, (_m, p) => listProducts(standin, p)],
    ["GET", /^\/v1\/products\/([^/]+)$/, (m) => retrieveProduct(standin, m[1])],
    ["POST", /^\/v1\/prices$/, (_m, p) => createPrice(standin, p)],
    ["GET", /^\/v1\/prices$/, (_m, p) => listPrices(standin, p)],
    ["GET", /^\/v1\/prices\/([^/]+)$/, (m) => retrievePrice(standin, m[1])],
    ["POST", /^\/v1\/customers$/, (_m, p) => createCustomer(standin, p)],
    ["GET", /^\/v1\/customers\/([^/]+)$/, (m) => retrieveCustomer(standin, m[1])],
    ["POST", /^\/v1\/customers\/([^/]+)$/, (m, p) => updateCustomer(standin, m[1], p)],
    ["POST", /^\/v1\/checkout\/sessions$/, (_m, p) => createCheckoutSession(standin, p)],
    ["GET", /^\/v1\/checkout\/sessions\/([^/]+)$/, (m) => retrieveCheckoutSession(standin, m[1])],
    ["GET", /^\/v1\/subscriptions$/, (_m, p) => listSubscriptions(standin, p)],
    ["GET", /^\/v1\/subscriptions\/([^/]+)$/, (m) => retrieveSubscription(standin, m[1])],
    ["POST", /^\/v1\/subscriptions\/([^/]+)$/, (m, p) => updateSubscription(standin, m[1], p)],
    ["DELETE", /^\/v1\/subscriptions\/([^/]+)$/, (m) => cancelSubscription(standin, m[1])],
    ["GET", /^\/v1\/invoices\/([^/]+)$/, (m) => retrieveInvoice(standin, m[1])],
    ["POST", /^\/v1\/billing_portal\/sessions$/, (_m, p) => createPortalSession(standin, p)],
    ["GET", /^\/v1\/events$/, (_m, p) => listEvents(standin, p)],
    ["GET", /^\/v1\/events\/([^/]+)$/, (m) => retrieveEvent(standin, m[1])],
  ];

  async function handleApi(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    const method = req.method ?? "GET";
    const auth = req.headers.authorization ?? "";
    const key = /^Bearer\s+(\S+)$/i.exec(auth)?.[1];
    if (!key) {
      return json(res, 401, {
        error: { type: "invalid_request_error", message: "You did not provide an API key. Provide it in the Authorization header as Bearer sk_test_…" },
      });
    }
    if (!/^(sk|rk)_test_\S+$/.test(key)) {
      return json(res, 401, { error: { type: "invalid_request_error", message: `Invalid API Key provided: ${key.slice(0, 8)}********` } });
    }
    const version = req.headers["stripe-version"];
    if (typeof version === "string" && version) standin.apiVersion = version;

    const body = method === "POST" ? await readBody(req) : "";
    const idempotencyKey = method === "POST" ? req.headers["idempotency-key"] : undefined;
    const fingerprint = `${method} ${url.pathname} ${body}`;
    if (typeof idempotencyKey === "string" && idempotent.has(idempotencyKey)) {
      const cached = idempotent.get(idempotencyKey);
      if (cached && cached.fingerprint !== fingerprint) {
        return json(res, 400, {
          error: {
            type: "idempotency_error",
            message: `Keys for idempotent requests can only be used with the same parameters they were first used with.`,
          },
        });
      }
      if (cached) return send(res, cached.status, "application/json", cached.body, { "idempotent-replayed": "true" });
    }

    let status = 200;
    let out: unknown;
    try {
      const params = { ...parseStripeForm(url.search.slice(1)), ...parseStripeForm(body) };
      const route = api.find(([m, re]) => m === method && re.test(url.pathname));
      if (!route) throw unknownRoute(method, url.pathname);
      const match = route[1].exec(url.pathname);
      if (!match) throw unknownRoute(method, url.pathname);
      const expand = stringList(params, "expand") ?? [];
      delete params.expand;
      out = expandPaths(route[2](match, params), expand, standin);
      if (method !== "GET") persist();
    } catch (err) {
      const e = toApiError(err);
      status = e.status;
      out = e.body();
    }
    const text = JSON.stringify(out, null, 2);
    if (typeof idempotencyKey === "string" && status < 500) idempotent.set(idempotencyKey, { fingerprint, status, body: text });
    send(res, status, "application/json", text, { "request-id": `req_${Math.random().toString(36).slice(2, 16)}` });
  }

  async function handlePage(req: IncomingMessage, res: ServerResponse, url: URL): Promise<boolean> {
    const method = req.method ?? "GET";
    const wantsJson = (req.headers.accept ?? "").includes("application/json");
    let m = /^\/checkout\/([^/]+)$/.exec(url.pathname);
    if (m && method === "GET") {
      try {
        send(res, 200, "text/html; charset=utf-8", checkoutPage(checkoutView(standin, m[1])));
      } catch (err) {
        send(res, toApiError(err).status, "text/html; charset=utf-8", messagePage("Checkout not found", "This checkout link is not valid."));
      }
      return true;
    }
    m = /^\/checkout\/([^/]+)\/pay$/.exec(url.pathname);
    if (m && method === "POST") {
      const form = parseStripeForm(await readBody(req));
      const card = { number: str(form, "number") ?? "", expiry: str(form, "expiry") ?? "", cvc: str(form, "cvc") ?? "" };
      try {
        const session = payCheckoutSession(standin, m[1], card);
        persist();
        await settled();
        const redirect = session.success_url.replace("{CHECKOUT_SESSION_ID}", session.id);
        if (wantsJson) {
          json(res, 200, { session, redirect_url: redirect });
          return true;
        }
        res.writeHead(303, { location: redirect });
        res.end();
      } catch (err) {
        const e = toApiError(err);
        persist();
        if (wantsJson) {
          json(res, e.status, e.body());
          return true;
        }
        try {
          const view = checkoutView(standin, m[1]);
          // The page itself loads fine: the decline is said on it (a 4xx would read as a broken page).
          send(res, 200, "text/html; charset=utf-8", checkoutPage({ ...view, error: e.message, values: { ...card, name: str(form, "name") } }));
        } catch {
          send(res, 404, "text/html; charset=utf-8", messagePage("Checkout not found", "This checkout link is not valid."));
        }
      }
      return true;
    }
    m = /^\/portal\/([^/]+)$/.exec(url.pathname);
    if (m && method === "GET") {
      try {
        const view = portalView(standin, m[1]);
        const done = url.searchParams.get("done");
        const notice =
          done === "cancel"
            ? "Your subscription will end at the close of the current period."
            : done === "resume"
              ? "Your subscription will renew as before."
              : done === "cancel-now"
                ? "Your subscription has ended."
                : undefined;
        send(res, 200, "text/html; charset=utf-8", portalPage({ ...view, email: view.customer.email, notice }));
      } catch (err) {
        send(res, toApiError(err).status, "text/html; charset=utf-8", messagePage("Portal link not valid", "Open the portal again from the site."));
      }
      return true;
    }
    m = /^\/portal\/([^/]+)\/(cancel|resume|cancel-now)$/.exec(url.pathname);
    if (m && method === "POST") {
      const form = parseStripeForm(await readBody(req));
      const action = m[2] === "cancel-now" ? "cancel_now" : (m[2] as "cancel" | "resume");
      try {
        const subscription = portalAction(standin, m[1], str(form, "subscription") ?? "", action);
        persist();
        await settled();
        if (wantsJson) {
          json(res, 200, subscription);
          return true;
        }
        res.writeHead(303, { location: `/portal/${m[1]}?done=${m[2]}` });
        res.end();
      } catch (err) {
        const e = toApiError(err);
        if (wantsJson) {
          json(res, e.status, e.body());
          return true;
        }
        send(res, e.status, "text/html; charset=utf-8", messagePage("That did not work", e.message));
      }
      return true;
    }
    return false;
  }

  async function handleControl(req: IncomingMessage, res: ServerResponse, url: URL): Promise<void> {
    if (!LOOPBACK.has(req.socket.remoteAddress ?? "")) {
      return json(res, 403, { error: { type: "invalid_request_error", message: "The control endpoints answer loopback callers only." } });
    }
    const method = req.method ?? "GET";
    try {
      const raw = method === "POST" ? await readBody(req) : "";
      const params: Params = raw.trim().startsWith("{") ? jsonParams(raw) : parseStripeForm(raw);
      if (method === "POST" && url.pathname === "/_control/advance") {
        const result = advance(standin, params);
        persist();
        await settled();
        return json(res, 200, result);
      }
      if (method === "POST" && url.pathname === "/_control/reset") {
        standin.reset();
        idempotent.clear();
        persist();
        return json(res, 200, { ok: true });
      }
      if (method === "POST" && url.pathname === "/_control/settle") {
        await settled();
        return json(res, 200, { ok: true });
      }
      if (method === "GET" && url.pathname === "/_control/deliveries") {
        return json(res, 200, { deliveries: sender?.deliveries ?? [] });
      }
      if (method === "GET" && url.pathname === "/_control/health") {
        return json(res, 200, { ok: true, now: standin.now(), webhookUrl: options.webhookUrl });
      }
      throw unknownRoute(method, url.pathname);
    } catch (err) {
      const e = toApiError(err);
      return json(res, e.status, e.body());
    }
  }

  const server = createServer((req, res) => {
    const url = new URL(req.url ?? "/", publicUrl);
    if (url.pathname === "/favicon.ico") {
      res.writeHead(204, { "cache-control": "max-age=86400" });
      res.end();
      return;
    }
    const work = url.pathname.startsWith("/v1/")
      ? handleApi(req, res, url)
      : url.pathname.startsWith("/_control/")
        ? handleControl(req, res, url)
        : handlePage(req, res, url).then((handled) => {
            if (!handled) send(res, 404, "text/html; charset=utf-8", messagePage("Not found", "The local payment stand-in has no page here."));
          });
    work.catch((err: unknown) => {
      log(`error: ${(err as Error).stack ?? String(err)}`);
      if (!res.headersSent) json(res, 500, { error: { type: "api_error", message: "The stand-in failed on this request." } });
      else res.end();
    });
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port, host, () => resolve());
  });
  const port = (server.address() as AddressInfo).port;
  publicUrl = `http://${host}:${port}`;

  return {
    url: publicUrl,
    standin,
    sender,
    server,
    settled: async () => {
      await sender?.settled();
    },
    close: () =>
      new Promise<void>((resolve) => {
        server.closeAllConnections();
        server.close(() => resolve());
      }),
  };
}

function toApiError(err: unknown): StandinApiError {
  if (err instanceof StandinApiError) return err;
  if (err instanceof FormParseError) return new StandinApiError(400, "invalid_request_error", err.message, "parameter_invalid", err.param);
  return new StandinApiError(500, "api_error", "The stand-in failed on this request.");
}

function jsonParams(raw: string): Params {
  const parsed: unknown = JSON.parse(raw);
  const out: Params = {};
  if (parsed && typeof parsed === "object" && !Array.isArray(parsed)) {
    for (const [k, v] of Object.entries(parsed)) out[k] = String(v);
  }
  return out;
}

/** Replaces ids with objects at each `expand[]` path (`subscription`, `data.product`, `items.data.price`). */
function expandPaths(value: unknown, paths: string[], standin: StandinStore): unknown {
  for (const p of paths) expandOne(value, p.split("."), standin);
  return value;
}

function expandOne(node: unknown, parts: string[], standin: StandinStore): void {
  if (!node || typeof node !== "object" || parts.length === 0) return;
  if (Array.isArray(node)) {
    for (const item of node) expandOne(item, parts, standin);
    return;
  }
  const record = node as Record<string, unknown>;
  const [head, ...rest] = parts;
  const current = record[head];
  if (typeof current === "string") {
    const found: StandinObject | undefined = standin.find(current);
    if (found) {
      record[head] = found;
      expandOne(found, rest, standin);
    }
    return;
  }
  expandOne(current, rest, standin);
}

function readBody(req: IncomingMessage): Promise<string> {
  return new Promise((resolve, reject) => {
    const chunks: Buffer[] = [];
    let size = 0;
    req.on("data", (c: Buffer) => {
      size += c.length;
      if (size > 1_000_000) {
        reject(new Error("body too large"));
        req.destroy();
        return;
      }
      chunks.push(c);
    });
    req.on("end", () => resolve(Buffer.concat(chunks).toString("utf8")));
    req.on("error", reject);
  });
}

function send(res: ServerResponse, status: number, type: string, body: string, headers: Record<string, string> = {}): void {
  res.writeHead(status, { "content-type": type, "cache-control": "no-store", ...headers });
  res.end(body);
}

function json(res: ServerResponse, status: number, body: unknown): void {
  send(res, status, "application/json", JSON.stringify(body, null, 2));
}
