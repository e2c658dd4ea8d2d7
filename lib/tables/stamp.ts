import "server-only";
import type { TablesStamp } from "@/lib/offline/answers";
import { getVersionInfo } from "./db/queries";
import { STARTER_TABLES } from "./index";
import type { MaterialTables } from "./types";

// Versions never change once published, so a stamp once read is kept for the life of the process.
const stamps = new Map<string, TablesStamp>();

/** The number and date of a version of the tables (the starter tables have neither). */
export async function tablesStamp(tables: Pick<MaterialTables, "version">): Promise<TablesStamp> {
  const id = tables.version;
  if (id === STARTER_TABLES.version) return { id, number: null, publishedAt: null };
  const held = stamps.get(id);
  if (held) return held;
  const info = await getVersionInfo(id);
  const stamp: TablesStamp = { id, number: info?.number ?? null, publishedAt: info?.createdAt ?? null };
  if (info) stamps.set(id, stamp);
  return stamp;
}
