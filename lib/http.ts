import "server-only";
import { randomUUID } from "node:crypto";
import { NextResponse } from "next/server";
import { ZodError, type ZodType } from "zod";
import { logger } from "@/lib/logger";
import { zodIssues, type FieldIssue } from "@/lib/zod-issues";

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

/** Parses a JSON request body with a zod schema; a bad body becomes a 400 naming each field. */
export async function parseJson<T>(req: Request, schema: ZodType<T>): Promise<T> {
  let body: unknown;
  try {
    body = await req.json();
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

/** A public solver route's request body as JSON, or its 400 when the body is not JSON (path "" names the whole body). */
export async function readJsonBody(req: Request): Promise<{ ok: true; body: unknown } | { ok: false; response: Response }> {
  try {
    return { ok: true, body: JSON.parse(await req.text()) };
  } catch {
    return { ok: false, response: invalidInput([{ path: "", message: "the body is not valid JSON" }]) };
  }
}

type Handler<C> = (req: Request, ctx: C) => Promise<Response>;

/**
 * Wraps a route handler: gives each request an id, logs one line per request, turns HttpError and
 * ZodError into JSON 4xx answers, and any other error into a plain 500 that hides the details.
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
      } else if (err instanceof ZodError) {
        res = NextResponse.json({ error: "invalid input", issues: zodIssues(err) }, { status: 400 });
      } else {
        logger.error({ err, requestId, method: req.method, path: url.pathname }, "request failed");
        res = NextResponse.json({ error: "something went wrong on our side; try again", requestId }, { status: 500 });
      }
    }
    res.headers.set("x-request-id", requestId);
    logger.info(
      { requestId, method: req.method, path: url.pathname, status: res.status, ms: Math.round(performance.now() - started) },
      "request",
    );
    return res;
  };
}
