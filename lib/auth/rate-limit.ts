import { QueryTypes } from "sequelize";
import { getSequelize } from "@/lib/db";

/** At most `max` attempts per `windowMs` for one key, e.g. `sign-in:ip:203.0.113.9`. */
export interface Limit {
  key: string;
  max: number;
  windowMs: number;
}

export interface LimitResult {
  allowed: boolean;
  count: number;
  /** Seconds until the window ends (0 while allowed). */
  retryAfterSeconds: number;
}

/**
 * Counts one attempt against a fixed window. A single INSERT … ON CONFLICT DO UPDATE opens a new window when
 * the old one has passed and otherwise adds one, atomically, so concurrent requests on several servers all
 * count. Attempts made while blocked count too: hammering keeps the door shut.
 */
export async function hit(limit: Limit, now: Date = new Date()): Promise<LimitResult> {
  const cutoff = new Date(now.getTime() - limit.windowMs);
  const rows = await getSequelize().query<{ count: number; window_start: Date }>(
    `INSERT INTO rate_limits (key, window_start, count) VALUES (:key, :now, 1)
     ON CONFLICT (key) DO UPDATE SET
       window_start = CASE WHEN rate_limits.window_start <= :cutoff THEN EXCLUDED.window_start ELSE rate_limits.window_start END,
       count = CASE WHEN rate_limits.window_start <= :cutoff THEN 1 ELSE rate_limits.count + 1 END
     RETURNING count, window_start`,
    { replacements: { key: limit.key, now, cutoff }, type: QueryTypes.SELECT },
  );
  const row = rows[0];
  const count = Number(row.count);
  const allowed = count <= limit.max;
  const endsAt = new Date(row.window_start).getTime() + limit.windowMs;
  return { allowed, count, retryAfterSeconds: allowed ? 0 : Math.max(1, Math.ceil((endsAt - now.getTime()) / 1000)) };
}

/** Counts one attempt against every limit; blocked when any of them is over. */
export async function hitAll(limits: readonly Limit[], now: Date = new Date()): Promise<LimitResult> {
  const results = await Promise.all(limits.map((l) => hit(l, now)));
  const blocked = results.filter((r) => !r.allowed);
  if (Math.random() < 0.01) void pruneRateLimits(now).catch(() => undefined);
  if (blocked.length === 0) return { allowed: true, count: Math.max(...results.map((r) => r.count)), retryAfterSeconds: 0 };
  return {
    allowed: false,
    count: Math.max(...blocked.map((r) => r.count)),
    retryAfterSeconds: Math.max(...blocked.map((r) => r.retryAfterSeconds)),
  };
}

/**
 * Gives back one attempt on each key (never below zero): a successful sign-in does not use up the
 * allowance, so only failures lock an address or a client out.
 */
export async function refund(limits: readonly Limit[]): Promise<void> {
  await getSequelize().query("UPDATE rate_limits SET count = count - 1 WHERE key IN (:keys) AND count > 0", {
    replacements: { keys: limits.map((l) => l.key) },
  });
}

/** Drops counters whose window ended over a day ago (they would restart at 1 anyway). */
export async function pruneRateLimits(now: Date = new Date()): Promise<void> {
  await getSequelize().query("DELETE FROM rate_limits WHERE window_start < :before", {
    replacements: { before: new Date(now.getTime() - 24 * 60 * 60 * 1000) },
  });
}
