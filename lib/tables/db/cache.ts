import type { MaterialTables } from "../types";

/**
 * The process's cache of material tables, keyed by version id, and what it believes the current version is.
 * Versions are immutable, so a version once loaded stays valid forever; only "which one is current" can go
 * stale, and lib/tables/current.ts explains how that is kept right. Kept on globalThis so Next.js's module
 * reloading in development does not start a second cache or a second listener.
 */
export interface TablesCache {
  byId: Map<string, MaterialTables>;
  /** loads in flight, so concurrent requests for one version share one set of queries */
  loading: Map<string, Promise<MaterialTables | null>>;
  /** the current version id as last learnt; null = unknown, ask the database */
  currentId: string | null;
  /** the current version id as last confirmed, kept through invalidations: what is served while the database is down */
  lastCurrentId: string | null;
  /** until this time (ms since epoch) the database is taken as down and lastCurrentId is served without asking */
  unreachableUntil: number;
  /** bumped on every invalidation, so an answer that raced with a change is not kept */
  generation: number;
}

/** Versions kept in memory; the least recently used is dropped first (one version is about 600 rows). */
export const MAX_CACHED_VERSIONS = 12;

const holder = globalThis as unknown as { spanlarkTablesCache?: TablesCache };

export function tablesCache(): TablesCache {
  holder.spanlarkTablesCache ??= { byId: new Map(), loading: new Map(), currentId: null, lastCurrentId: null, unreachableUntil: 0, generation: 0 };
  return holder.spanlarkTablesCache;
}

export function rememberVersion(tables: MaterialTables): void {
  const cache = tablesCache();
  cache.byId.delete(tables.version);
  cache.byId.set(tables.version, tables);
  for (const id of cache.byId.keys()) {
    if (cache.byId.size <= MAX_CACHED_VERSIONS) break;
    if (id !== cache.currentId && id !== cache.lastCurrentId) cache.byId.delete(id);
  }
}

/** A version was just committed by this process: it is current from now on. */
export function noteNewVersion(tables: MaterialTables): void {
  const cache = tablesCache();
  cache.generation += 1;
  cache.currentId = tables.version;
  cache.lastCurrentId = tables.version;
  rememberVersion(tables);
}

/** Another process may have committed a version (a notification, or the listener restarting). */
export function invalidateCurrent(): void {
  const cache = tablesCache();
  cache.generation += 1;
  cache.currentId = null;
}

/** Forgets everything (tests that switch databases). */
export function clearTablesCache(): void {
  const cache = tablesCache();
  cache.byId.clear();
  cache.loading.clear();
  cache.lastCurrentId = null;
  cache.unreachableUntil = 0;
  invalidateCurrent();
}
