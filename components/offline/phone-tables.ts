"use client";

import { createStore, get, set } from "idb-keyval";
import type { TablesStamp } from "@/lib/offline/answers";
import type { MaterialTables } from "@/lib/tables/types";

/**
 * The published material tables kept on this phone with their version (IndexedDB), so the sizing flow can
 * work an answer out with no signal. Refreshed from GET /api/tables whenever the server is reachable and holds
 * a newer version than the one kept here.
 */

export interface PhoneTables {
  stamp: TablesStamp;
  tables: MaterialTables;
  /** when this phone last heard the version was current, ISO 8601 */
  checkedAt: string;
}

const KEY = "current";
let store: ReturnType<typeof createStore> | null = null;
let held: PhoneTables | null = null;
let refreshing: Promise<PhoneTables | null> | null = null;
const TABLES_TIMEOUT_MS = 20_000;

function tablesStore(): ReturnType<typeof createStore> {
  store ??= createStore("spanlark-tables", "tables");
  return store;
}

/** The tables kept on this phone, or null (never fetched, or storage unavailable). */
export async function readPhoneTables(): Promise<PhoneTables | null> {
  if (held) return held;
  try {
    held = (await get<PhoneTables>(KEY, tablesStore())) ?? null;
  } catch {
    held = null;
  }
  return held;
}

async function fetchTables(): Promise<PhoneTables | null> {
  const kept = await readPhoneTables();
  // a signal that connects but never answers must not hold the tables (and every answer waiting on them) forever
  const res = await fetch("/api/tables", {
    cache: "no-store",
    headers: kept ? { "if-none-match": `"${kept.stamp.id}"` } : {},
    signal: AbortSignal.timeout(TABLES_TIMEOUT_MS),
  });
  if (res.status === 304 && kept) return kept;
  if (!res.ok) return kept;
  const body = (await res.json()) as { stamp: TablesStamp; tables: MaterialTables };
  const next: PhoneTables = { stamp: body.stamp, tables: body.tables, checkedAt: new Date().toISOString() };
  held = next;
  try {
    await set(KEY, next, tablesStore());
  } catch {
    // storage full or refused: the tables stay in memory for this visit
  }
  return next;
}

/**
 * Makes sure the phone holds the current tables: fetches them when none are kept, or when `currentId` (the
 * version the server just sized with) is not the one kept. Quiet when offline.
 */
export async function refreshPhoneTables(currentId?: string): Promise<PhoneTables | null> {
  const kept = await readPhoneTables();
  if (kept && currentId !== undefined && kept.stamp.id === currentId) return kept;
  if (typeof navigator !== "undefined" && !navigator.onLine) return kept;
  refreshing ??= fetchTables()
    .catch(() => kept)
    .finally(() => {
      refreshing = null;
    });
  return refreshing;
}
