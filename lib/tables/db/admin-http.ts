import "server-only";
import { requireRole } from "@/lib/auth/session";
import { getSequelize } from "@/lib/db";
import { HttpError } from "@/lib/http";
import { getCurrentTables, getTablesVersion, TablesVersionNotFoundError } from "../current";
import { CsvUploadError } from "../csv/upload";
import { isTableKey, TABLE_KEYS, TABLE_SPECS, type TableKey } from "../schemas";
import type { MaterialTables } from "../types";
import { versionQuery } from "./admin-schemas";
import { TablesChangeError } from "./errors";
import type { Actor } from "./write";

/** Shared steps of the admin table routes: the admin check, the [table] segment, the ?version query, and error mapping. */

/** The signed-in admin as the author of a new version (401 signed out, 403 for any other role). */
export async function requireTablesAdmin(): Promise<Actor> {
  const user = await requireRole("admin");
  getSequelize();
  return { id: user.id, email: user.email };
}

export function tableFromParam(value: string): TableKey {
  if (!isTableKey(value)) throw new HttpError(404, `no table "${value}"; the tables are ${TABLE_KEYS.join(", ")}`);
  return value;
}

/** The tables a `?version=ID` query names (the current ones without it); 404 when the id names no version. */
export async function tablesForVersionQuery(req: Request): Promise<MaterialTables> {
  const { version } = versionQuery.parse(Object.fromEntries(new URL(req.url).searchParams));
  try {
    return version ? await getTablesVersion(version) : await getCurrentTables();
  } catch (err) {
    if (err instanceof TablesVersionNotFoundError) throw new HttpError(404, "no such version of the tables");
    throw err;
  }
}

/** Runs a table operation, turning its refusals into HttpErrors with the same status and message. */
export async function tablesOperation<T>(operation: () => Promise<T>): Promise<T> {
  try {
    return await operation();
  } catch (err) {
    if (err instanceof TablesChangeError) throw new HttpError(err.status, err.message, err.details);
    if (err instanceof CsvUploadError) throw new HttpError(err.status, err.message);
    throw err;
  }
}

export function tableTitle(key: TableKey): string {
  return TABLE_SPECS[key].title;
}
