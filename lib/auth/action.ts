import { DATABASE_DOWN_MESSAGE, isDatabaseUnavailable } from "@/lib/db/unavailable";
import { HttpError } from "@/lib/http";
import { assertRole, type Role, type SessionUser } from "./roles";
import { getSessionUser } from "./session";

/** What a server action answers when the caller may not use it (the access test reads `status`). */
export interface ActionDenied {
  ok: false;
  error: string;
  /** 503: the database is down, so the account cannot be checked (nothing was changed) */
  status: 401 | 403 | 404 | 503;
}

/**
 * The first line of every server action: the signed-in account with one of `roles` (none: any account),
 * or an ActionDenied to return as it is.
 *
 *   const auth = await authorizeAction("admin");
 *   if (!auth.ok) return auth;
 */
export async function authorizeAction(...roles: Role[]): Promise<{ ok: true; user: SessionUser } | ActionDenied> {
  try {
    return { ok: true, user: assertRole(await getSessionUser(), roles) };
  } catch (err) {
    if (err instanceof HttpError && (err.status === 401 || err.status === 403)) {
      return { ok: false, error: err.message, status: err.status };
    }
    if (isDatabaseUnavailable(err)) return { ok: false, error: DATABASE_DOWN_MESSAGE, status: 503 };
    throw err;
  }
}
