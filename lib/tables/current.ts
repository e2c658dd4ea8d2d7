import type { MaterialTables } from "./types";
import { STARTER_TABLES } from "./index";

/**
 * The material tables the app's checks read: the current published version. Until the tables
 * database is wired in here, that is the starter data that ships with the code (the same rows
 * the seeders load). Keep the signature: the routes call it on every request.
 */
export async function getCurrentTables(): Promise<MaterialTables> {
  return STARTER_TABLES;
}
