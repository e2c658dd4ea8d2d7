/**
 * Telling "the database is not answering" apart from other failures, so it becomes a 503 and a plain "try again
 * in a minute" instead of a 500. No imports: the route wrapper and the error pages' checks use it without
 * loading the database layer.
 */

/** What a user reads while the database is down (routes' JSON error, server actions, the page shown instead). */
export const DATABASE_DOWN_MESSAGE = "Spanlark cannot reach its saved records right now. Try again in a minute.";

/** Seconds a client is told to wait (Retry-After). */
export const DATABASE_RETRY_AFTER_SECONDS = 60;

// Sequelize's connection errors (ConnectionError and its subclasses: refused, timed out, acquire timeout,
// host not found or not reachable, invalid connection) are named "Sequelize…".
const SEQUELIZE_CONNECTION = /^Sequelize(Connection|HostNot|InvalidConnection)/;
// PostgreSQL SQLSTATE: class 08 connection exception; 57P01-57P03 shutting down or starting up; 53300 too many connections.
const PG_UNAVAILABLE = /^(08...|57P0[123]|53300)$/;
// Socket errors from node-postgres before or between queries.
const NODE_UNAVAILABLE = new Set(["ECONNREFUSED", "ECONNRESET", "ETIMEDOUT", "EPIPE", "ENOTFOUND", "EAI_AGAIN", "EHOSTUNREACH", "ENETUNREACH"]);
// node-postgres's own words when a connection ends under a query.
const PG_CLIENT_MESSAGES = /Connection terminated|connection timeout|timeout expired|is not queryable|Client was closed/i;

function field(err: object, name: string): unknown {
  return (err as Record<string, unknown>)[name];
}

/** True when `err` (or an error it wraps) says the database cannot be reached or is restarting. */
export function isDatabaseUnavailable(err: unknown, depth = 0): boolean {
  if (typeof err !== "object" || err === null || depth > 4) return false;
  const name = field(err, "name");
  const code = field(err, "code");
  const message = field(err, "message");
  if (typeof name === "string" && SEQUELIZE_CONNECTION.test(name)) return true;
  if (typeof code === "string" && (PG_UNAVAILABLE.test(code) || NODE_UNAVAILABLE.has(code))) return true;
  if (typeof message === "string" && PG_CLIENT_MESSAGES.test(message)) return true;
  const errors = field(err, "errors");
  if (Array.isArray(errors) && errors.some((e) => isDatabaseUnavailable(e, depth + 1))) return true; // AggregateError (dual-stack connect)
  return ["parent", "original", "cause"].some((key) => {
    const inner = field(err, key);
    return inner !== err && isDatabaseUnavailable(inner, depth + 1);
  });
}

/** The JSON 503 a route answers while the database is down. */
export function databaseUnavailableResponse(): Response {
  return Response.json(
    { error: DATABASE_DOWN_MESSAGE, retryAfterSeconds: DATABASE_RETRY_AFTER_SECONDS },
    { status: 503, headers: { "retry-after": String(DATABASE_RETRY_AFTER_SECONDS) } },
  );
}

/** For a `.catch` where a page can do without the database: null while it is down, any other error thrown on. */
export function nullWhenDatabaseDown(err: unknown): null {
  if (isDatabaseUnavailable(err)) return null;
  throw err;
}
