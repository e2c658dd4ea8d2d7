import "server-only";
import { randomUUID } from "node:crypto";
import { NextResponse } from "next/server";
import { ZodError, type ZodType } from "zod";
import { databaseUnavailableResponse, isDatabaseUnavailable } from "@/lib/db/unavailable";
import { logger } from "@/lib/logger";
import { zodIssues, type FieldIssue } from "@/lib/zod-issues";
import { contentTypeRefusal } from "@/lib/security/origin";

/** An error with an HTTP status and a message fit to show a user (never a raw internal error). */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
  }
}

export { zodIssues, type FieldIssue } from "@/lib/zod-issues";

/**
 * The most a request body may hold, in bytes. A body over its cap is refused with 413 before the rest is read,
 * so a large POST costs the server no more memory than the cap.
 *  - engine: POST /api/solve, /api/check, /api/size. The largest valid input (20 supports, 200 loads, 1,000
 *    stations, every number written out in full) is under 40 KB.
 *  - json: every other JSON body (sign-up, admin row edits, webhooks).
 *  - csvImport: a CSV upload (lib/tables/csv: 1 MB file) with its multipart framing and form fields.
 * Server actions are capped by Next.js itself (serverActions.bodySizeLimit, 1 MB by default).
 */
export const BODY_LIMITS = {
  engine: 64 * 1024,
  json: 256 * 1024,
  csvImport: 1024 * 1024 + 16 * 1024,
} as const;

function sizeText(bytes: number): string {
  return bytes >= 1024 * 1024
    ? `${(bytes / (1024 * 1024)).toLocaleString("en-US", { maximumFractionDigits: 1 })} MB`
    : `${Math.ceil(bytes / 1024).toLocaleString("en-US")} KB`;
}

/** 413, with the cap in words and in bytes. */
export function bodyTooLarge(limitBytes: number): HttpError {
  return new HttpError(413, `the request body is too large; the most accepted here is ${sizeText(limitBytes)}`, { limitBytes });
}

/**
 * A request's body as bytes, refusing with HttpError 413 a body over `limitBytes`: at once when Content-Length
 * says so, otherwise as soon as the running count passes the cap (a chunked body states no length), without
 * reading the rest. No body reads as empty.
 */
export async function readBodyBytes(req: Request, limitBytes: number): Promise<Uint8Array<ArrayBuffer>> {
  const stated = req.headers.get("content-length");
  if (stated !== null && /^\d+$/.test(stated.trim()) && Number(stated) > limitBytes) throw bodyTooLarge(limitBytes);
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limitBytes) {
      await reader.cancel().catch(() => undefined);
      throw bodyTooLarge(limitBytes);
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const chunk of chunks) {
    bytes.set(chunk, at);
    at += chunk.byteLength;
  }
  return bytes;
}

/** A request's body as UTF-8 text, capped as readBodyBytes caps it. */
export async function readBodyText(req: Request, limitBytes: number): Promise<string> {
  return new TextDecoder().decode(await readBodyBytes(req, limitBytes));
}

/** A JSON 413 answer for routes that answer without `route()`. */
export function bodyTooLargeResponse(err: HttpError): Response {
  return Response.json({ error: err.message, ...err.details }, { status: 413 });
}

/** Parses a JSON request body with a zod schema; a bad body becomes a 400 naming each field, one over `limitBytes` a 413. */
export async function parseJson<T>(req: Request, schema: ZodType<T>, { limitBytes = BODY_LIMITS.json }: { limitBytes?: number } = {}): Promise<T> {
  const text = await readBodyText(req, limitBytes);
  let body: unknown;
  try {
    body = JSON.parse(text);
  } catch {
    throw new HttpError(400, "the request body is not valid JSON", { issues: [{ path: "", message: "not valid JSON" }] });
  }
  const parsed = schema.safeParse(body);
  if (!parsed.success) throw new HttpError(400, "invalid input", { issues: zodIssues(parsed.error) });
  return parsed.data;
}

/** 400 { error: "invalid input", issues }: how the public solver routes refuse input their own checks find. */
export function invalidInput(issues: FieldIssue[]): Response {
  return Response.json({ error: "invalid input", issues }, { status: 400 });
}

/**
 * A public solver route's request body as JSON, or its refusal: 415 unless declared JSON, 413 over the engine routes' cap
 * (BODY_LIMITS.engine), 400 when the body is not JSON (path "" names the whole body).
 */
export async function readJsonBody(
  req: Request,
  limitBytes: number = BODY_LIMITS.engine,
): Promise<{ ok: true; body: unknown } | { ok: false; response: Response }> {
  // 415 before reading anything unless the body is declared JSON (lib/security/origin.ts).
  const wrongType = contentTypeRefusal(req.method, new URL(req.url).pathname, req.headers);
  if (wrongType) return { ok: false, response: Response.json({ error: wrongType.error }, { status: wrongType.status }) };
  let text: string;
  try {
    text = await readBodyText(req, limitBytes);
  } catch (err) {
    if (err instanceof HttpError && err.status === 413) return { ok: false, response: bodyTooLargeResponse(err) };
    throw err;
  }
  try {
    return { ok: true, body: JSON.parse(text) };
  } catch {
    return { ok: false, response: invalidInput([{ path: "", message: "the body is not valid JSON" }]) };
  }
}

type Handler<C> = (req: Request, ctx: C) => Promise<Response>;

/**
 * Wraps a route handler: gives each request an id, logs one line per request, turns HttpError and
 * ZodError into JSON 4xx answers, a database that cannot be reached into a JSON 503 (Retry-After), and any
 * other error into a plain 500 that hides the details.
 */
export function route<C>(handler: Handler<C>): Handler<C> {
  return async (req, ctx) => {
    const requestId = req.headers.get("x-request-id") ?? randomUUID();
    const started = performance.now();
    const url = new URL(req.url);
    let res: Response;
    try {
      res = await handler(req, ctx);
    } catch (err) {
      if (err instanceof HttpError) {
        res = NextResponse.json({ error: err.message, ...err.details }, { status: err.status });
        const retryAfter = err.details?.retryAfterSeconds;
        if (typeof retryAfter === "number" && (err.status === 429 || err.status === 503)) res.headers.set("retry-after", String(retryAfter));
      } else if (err instanceof ZodError) {
        res = NextResponse.json({ error: "invalid input", issues: zodIssues(err) }, { status: 400 });
      } else if (isDatabaseUnavailable(err)) {
        logger.warn({ err, requestId, method: req.method, path: url.pathname }, "database unavailable");
        res = databaseUnavailableResponse();
      } else {
        logger.error({ err, requestId, method: req.method, path: url.pathname }, "request failed");
        res = NextResponse.json({ error: "something went wrong on our side; try again", requestId }, { status: 500 });
      }
    }
    res.headers.set("x-request-id", requestId);
    logger.info({ requestId, method: req.method, path: url.pathname, status: res.status, ms: Math.round(performance.now() - started) }, "request");
    return res;
  };
}
