import { revalidatePath } from "next/cache";
import type { ZodType } from "zod";
import { DATABASE_DOWN_MESSAGE, isDatabaseUnavailable } from "@/lib/db/unavailable";
import { HttpError } from "@/lib/http";
import { logger } from "@/lib/logger";
import { zodIssues, type FieldIssue } from "@/lib/zod-issues";
import { assertRole, type Role, type SessionUser } from "./roles";
import { getSessionUser } from "./session";

/** What a server action answers when the caller may not use it (the access test reads `status`). */
export interface ActionDenied {
  ok: false;
  error: string;
  /** 503: the database is down, so the account cannot be checked (nothing was changed) */
  status: 401 | 403 | 404 | 503;
}

/** What a server action answers when it refuses the input or the work fails: the message, and the fields at fault. */
export interface ActionFailure {
  ok: false;
  error: string;
  status: number;
  issues?: FieldIssue[];
  /** where to go to lift a plan's limit, when that is what stopped it */
  upgrade?: string;
}

export type ActionResult<R> = ({ ok: true } & R) | ActionFailure | ActionDenied;

/** The signed-in account with one of `roles` (none: any account), or an ActionDenied to return as it is. */
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

export interface ActionSteps<T, R> {
  /** roles allowed; none: any signed-in account */
  roles?: Role[];
  schema: ZodType<T>;
  /** the message for input that does not parse; default: the issues' messages */
  invalid?: string;
  /** what the caller reads when something unexpected fails */
  failed: string;
  /** the status of that answer (default 500; 502 where an outside service failed) */
  failedStatus?: number;
  run: (user: SessionUser, data: T) => Promise<R>;
  /** the pages that show what the action changed, refreshed once it succeeds */
  refresh?: (done: R, data: T) => string[];
}

/**
 * Every server action goes through here: authorize, parse, run, refresh, shape the failure. An HttpError
 * under 500 from `run` becomes its message, status and issues; anything else is logged and answered with `failed`.
 *
 *   export async function revokeCrewLink(input: unknown) {
 *     return runAction(input, { schema: crewLinkIdSchema, failed: "The crew link could not be revoked.", run: ..., refresh: ... });
 *   }
 */
export async function runAction<T, R extends object>(input: unknown, steps: ActionSteps<T, R>): Promise<ActionResult<R>> {
  const auth = await authorizeAction(...(steps.roles ?? []));
  if (!auth.ok) return auth;
  const parsed = steps.schema.safeParse(input);
  if (!parsed.success) {
    const issues = zodIssues(parsed.error);
    return { ok: false, error: steps.invalid ?? issues.map((i) => i.message).join("; "), status: 400, issues };
  }
  let done: R;
  try {
    done = await steps.run(auth.user, parsed.data);
  } catch (err) {
    if (err instanceof HttpError && err.status < 500) {
      const details = (err.details ?? {}) as { issues?: FieldIssue[]; upgrade?: string };
      return {
        ok: false,
        error: err.message,
        status: err.status,
        ...(details.issues ? { issues: details.issues } : {}),
        ...(details.upgrade ? { upgrade: details.upgrade } : {}),
      };
    }
    if (isDatabaseUnavailable(err)) return { ok: false, error: DATABASE_DOWN_MESSAGE, status: 503 };
    logger.error({ err }, steps.failed);
    return { ok: false, error: `${steps.failed} Try again in a minute.`, status: steps.failedStatus ?? 500 };
  }
  for (const page of steps.refresh?.(done, parsed.data) ?? []) revalidatePath(page);
  return { ok: true, ...done };
}
