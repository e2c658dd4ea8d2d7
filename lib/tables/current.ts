import type { Sequelize } from "sequelize";
import { getSequelize } from "@/lib/db";
import { isDatabaseUnavailable } from "@/lib/db/unavailable";
import { logger } from "@/lib/logger";
import { clearTablesCache, invalidateCurrent, rememberVersion, tablesCache } from "./db/cache";
import { currentVersionId, isVersionId, loadVersion } from "./db/queries";
import { TABLE_VERSIONS_CHANNEL } from "./db/write";
import { STARTER_TABLES } from "./index";
import type { MaterialTables } from "./types";

/**
 * The material tables the design checks read, through a cache keyed by version id.
 *
 * Versions are immutable, so a loaded version is kept and reused without asking the database again.
 * Only "which version is current" can change, and it is kept right two ways:
 *  1. in-process: the write functions (lib/tables/db/write.ts) mark their new version current the
 *     moment their transaction commits, so the admin's next sizing uses it at once;
 *  2. across processes: every new version sends a PostgreSQL NOTIFY on TABLE_VERSIONS_CHANNEL from
 *     inside its transaction (delivered on commit). The app server LISTENs on one pooled connection
 *     and, on a notification, forgets the current id, so the next request reads the new one.
 * LISTEN/NOTIFY was chosen over checking "SELECT max(number)" on every request so that a request
 * whose version is in memory never waits on the database. Until the listener is up (start-up, after
 * its connection drops, or in a script that does not start it) each call instead reads the current
 * id with one indexed query (unique index on table_versions.number): never stale, only a little slower.
 * Outside the server (the CLI's --db, the seeders) no listener is started, so the process can exit.
 *
 * With no DATABASE_URL (the CLI without --db, pure unit tests) or an empty database (not seeded yet),
 * the starter tables that ship in lib/tables are current; their version is STARTER_TABLES.version.
 */

/** A version id that names no version. */
export class TablesVersionNotFoundError extends Error {
  constructor(readonly versionId: string) {
    super(`no version "${versionId}" of the material tables`);
    this.name = "TablesVersionNotFoundError";
  }
}

/** The subset of node-postgres's Client the listener uses (Sequelize hands out pg Clients). */
interface ListenClient {
  query(sql: string): Promise<unknown>;
  on(event: "notification", listener: (message: { channel: string; payload?: string }) => void): unknown;
  on(event: "error" | "end", listener: () => void): unknown;
}

function isListenClient(connection: object): connection is ListenClient {
  const c = connection as Partial<Record<"query" | "on", unknown>>;
  return typeof c.query === "function" && typeof c.on === "function";
}

interface ListenerState {
  status: "off" | "starting" | "listening";
  sequelize: Sequelize | null;
  connection: object | null;
  retry: ReturnType<typeof setTimeout> | null;
  /** the last start failed (so the next failure is not logged again) */
  failing?: boolean;
}

const holder = globalThis as unknown as { spanlarkTablesListener?: ListenerState };

function listener(): ListenerState {
  holder.spanlarkTablesListener ??= { status: "off", sequelize: null, connection: null, retry: null };
  return holder.spanlarkTablesListener;
}

const RETRY_MS = 5_000;
/** After the database fails to answer, how long the last known version is served before asking it again. */
const UNREACHABLE_HOLD_MS = 5_000;

/**
 * Starts listening for new versions on one connection from the pool (idempotent). Called by the app
 * server on its first read of the tables; tests call it directly.
 */
export async function startTablesListener(sequelize: Sequelize = getSequelize()): Promise<void> {
  const state = listener();
  if (state.status !== "off") return;
  state.status = "starting";
  state.sequelize = sequelize;
  let connection: object | null = null;
  try {
    connection = await sequelize.connectionManager.getConnection({ type: "write" });
    if (!isListenClient(connection)) throw new Error("the database connection cannot LISTEN");
    const client = connection;
    const dropped = () => {
      if (state.connection !== client) return;
      logger.warn("material tables listener lost its connection; reading the current version from the database until it is back");
      stopListening(state, true);
      state.retry = setTimeout(() => {
        state.retry = null;
        if (state.sequelize) void startTablesListener(state.sequelize);
      }, RETRY_MS);
      state.retry.unref?.();
    };
    client.on("notification", (message) => {
      if (message.channel === TABLE_VERSIONS_CHANNEL) invalidateCurrent();
    });
    client.on("error", dropped);
    client.on("end", dropped);
    await client.query(`LISTEN ${TABLE_VERSIONS_CHANNEL}`);
    state.connection = client;
    state.status = "listening";
    if (state.failing) logger.info("material tables listener is back");
    state.failing = false;
    // A version published before LISTEN took effect would otherwise go unnoticed.
    invalidateCurrent();
  } catch (err) {
    // Said once per outage, not at every retry.
    if (!state.failing) logger.warn({ err }, "material tables listener could not start; reading the current version from the database on each request");
    state.failing = true;
    if (connection) await sequelize.connectionManager.destroyConnection(connection).catch(() => undefined);
    state.status = "off";
    // Try again later rather than on every request while the database is down.
    if (!state.retry && state.sequelize === sequelize) {
      state.retry = setTimeout(() => {
        state.retry = null;
        if (state.sequelize) void startTablesListener(state.sequelize);
      }, RETRY_MS);
      state.retry.unref?.();
    }
  }
}

function stopListening(state: ListenerState, destroy: boolean): void {
  const { connection, sequelize } = state;
  state.status = "off";
  state.connection = null;
  invalidateCurrent();
  if (connection && sequelize) {
    if (destroy) void sequelize.connectionManager.destroyConnection(connection).catch(() => undefined);
    else sequelize.connectionManager.releaseConnection(connection);
  }
}

/** Stops listening and gives the connection back (tests, before closing their Sequelize). */
export async function stopTablesListener(): Promise<void> {
  const state = listener();
  if (state.retry) clearTimeout(state.retry);
  state.retry = null;
  if (state.status === "listening" && state.connection && isListenClient(state.connection)) {
    await state.connection.query(`UNLISTEN ${TABLE_VERSIONS_CHANNEL}`).catch(() => undefined);
  }
  stopListening(state, false);
  state.sequelize = null;
}

/** True while new versions are learnt by notification (a cached current version is then used without a query). */
export function tablesListenerIsUp(): boolean {
  return listener().status === "listening";
}

/** Forgets every cached version and the current id (tests that switch databases). */
export function resetTablesCache(): void {
  clearTablesCache();
}

function hasDatabase(): boolean {
  return Boolean(process.env.DATABASE_URL);
}

let warnedEmpty = false;

/** The current published version of the material tables. */
export async function getCurrentTables(): Promise<MaterialTables> {
  if (!hasDatabase()) return STARTER_TABLES;
  getSequelize(); // initializes the models on first use
  // Only the app server listens; in a script the listener's connection would keep the process alive.
  if (process.env.NEXT_RUNTIME === "nodejs" && listener().status === "off" && !listener().retry) void startTablesListener();

  const cache = tablesCache();
  const known = tablesListenerIsUp() ? cache.currentId : null;
  if (known) {
    const held = cache.byId.get(known);
    if (held) return held;
  }
  const generation = cache.generation;
  const lastKnown = cache.lastCurrentId ? cache.byId.get(cache.lastCurrentId) : undefined;
  if (!known && lastKnown && Date.now() < cache.unreachableUntil) return lastKnown;
  let id: string | null;
  try {
    id = known ?? (await currentVersionId());
  } catch (err) {
    // The database is down: keep sizing with the version that was current when it was last reached.
    if (!isDatabaseUnavailable(err) || !lastKnown) throw err;
    if (cache.unreachableUntil === 0) logger.warn({ version: lastKnown.version }, "database unreachable; serving the material tables last known to be current");
    cache.unreachableUntil = Date.now() + UNREACHABLE_HOLD_MS;
    return lastKnown;
  }
  if (cache.unreachableUntil !== 0) logger.info("database reachable again; reading the current material tables from it");
  cache.unreachableUntil = 0;
  if (!id) {
    if (!warnedEmpty) logger.warn("the database holds no version of the material tables (run the seeders); using the starter tables");
    warnedEmpty = true;
    return STARTER_TABLES;
  }
  // Keep the answer only if no change was announced while the query ran.
  if (cache.generation === generation) cache.currentId = id;
  const tables = await getTablesVersion(id);
  cache.lastCurrentId = id;
  return tables;
}

/**
 * One version of the material tables by id, as saved with a job sheet (MaterialTables.version), so a
 * sheet reprints with the numbers it was computed with. STARTER_TABLES.version gives the starter tables.
 * Throws TablesVersionNotFoundError for an id that names no version.
 */
export async function getTablesVersion(id: string): Promise<MaterialTables> {
  if (id === STARTER_TABLES.version) return STARTER_TABLES;
  if (!isVersionId(id) || !hasDatabase()) throw new TablesVersionNotFoundError(id);
  getSequelize();
  const cache = tablesCache();
  const held = cache.byId.get(id);
  if (held) return held;
  let pending = cache.loading.get(id);
  if (!pending) {
    pending = loadVersion(id).finally(() => cache.loading.delete(id));
    cache.loading.set(id, pending);
  }
  const tables = await pending;
  if (!tables) throw new TablesVersionNotFoundError(id);
  rememberVersion(tables);
  return tables;
}
