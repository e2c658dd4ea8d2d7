"use client";

import type { PhoneWorkedOut } from "@/lib/offline/answers";

/**
 * The answers this phone worked out with no signal, by sizing request, kept in local storage so the server's
 * recheck can still be shown after the page was reloaded or the app closed and opened again (a page reloads by
 * itself when the signal comes back mid-request, and a phone may close the app in a pocket). The latest 24
 * requests are kept, for two weeks at most, and for 15 minutes after the server first rechecked one (long enough
 * for a reload to show the recheck again; an answer sized with a signal days later is not called a recheck).
 */

const KEY = "spanlark-phone-answers";
const MOST = 24;
const LONGEST_MS = 14 * 24 * 3600 * 1000;
const AFTER_RECHECK_MS = 15 * 60 * 1000;

/** a kept answer, and when the server first rechecked it (ms since 1970) */
type Kept = PhoneWorkedOut & { checkedAt?: number };

let held: Map<string, Kept> | null = null;

function isKept(value: unknown): value is Kept {
  const v = value as Kept | null;
  return (
    typeof v === "object" &&
    v !== null &&
    typeof v.at === "number" &&
    Array.isArray(v.lines) &&
    typeof v.tables === "object" &&
    v.tables !== null &&
    typeof v.tables.id === "string" &&
    (v.checkedAt === undefined || typeof v.checkedAt === "number")
  );
}

function load(): Map<string, Kept> {
  if (held) return held;
  held = new Map();
  try {
    const raw: unknown = JSON.parse(localStorage.getItem(KEY) ?? "[]");
    const since = Date.now() - LONGEST_MS;
    if (Array.isArray(raw)) {
      for (const entry of raw as unknown[]) {
        if (Array.isArray(entry) && typeof entry[0] === "string" && isKept(entry[1]) && entry[1].at > since) held.set(entry[0], entry[1]);
      }
    }
  } catch {
    // storage refused or damaged: the answers of this visit are still kept in memory
  }
  return held;
}

function save(all: Map<string, Kept>): void {
  try {
    localStorage.setItem(KEY, JSON.stringify([...all]));
  } catch {
    // storage full or refused: kept in memory for this visit
  }
}

/**
 * What this phone worked out for `body` (a sizing request's JSON) with no signal, as the server answers the same
 * request: the first such answer is its recheck (noted, so it is shown again for 15 minutes and then forgotten).
 */
export function rechecking(body: string, now = Date.now()): PhoneWorkedOut | null {
  const all = load();
  const kept = all.get(body);
  if (!kept) return null;
  if (kept.checkedAt === undefined) {
    all.set(body, { ...kept, checkedAt: now });
    save(all);
  } else if (now - kept.checkedAt > AFTER_RECHECK_MS) {
    all.delete(body);
    save(all);
    return null;
  }
  return { tables: kept.tables, lines: kept.lines, at: kept.at };
}

/** Keeps what this phone worked out for `body` with no signal, as the latest (to be rechecked). */
export function keepWorkedOut(body: string, kept: PhoneWorkedOut): void {
  const all = load();
  all.delete(body);
  all.set(body, { tables: kept.tables, lines: kept.lines, at: kept.at });
  for (const key of all.keys()) if (all.size > MOST) all.delete(key);
  save(all);
}

/** Forgets everything kept (tests). */
export function forgetWorkedOut(): void {
  held = null;
  try {
    localStorage.removeItem(KEY);
  } catch {
    // nothing kept
  }
}
