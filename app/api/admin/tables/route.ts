import { NextResponse } from "next/server";
import { route } from "@/lib/http";
import { getCurrentTables } from "@/lib/tables/current";
import { requireTablesAdmin } from "@/lib/tables/db/admin-http";
import { getVersionInfo, isVersionId } from "@/lib/tables/db/queries";
import { tablesToRows } from "@/lib/tables/db/rows";
import { TABLE_KEYS, TABLE_SPECS } from "@/lib/tables/schemas";

export const runtime = "nodejs";

// GET /api/admin/tables — the current version and each table's row count, admin
export const GET = route(async () => {
  await requireTablesAdmin();
  const tables = await getCurrentTables();
  const rows = tablesToRows(tables);
  return NextResponse.json({
    current: isVersionId(tables.version) ? await getVersionInfo(tables.version) : null,
    tables: TABLE_KEYS.map((key) => ({ key, title: TABLE_SPECS[key].title, description: TABLE_SPECS[key].description, rowCount: rows[key].length })),
  });
});
