import { NextResponse } from "next/server";
import { route } from "@/lib/http";
import { requireTablesAdmin, tableFromParam, tablesForVersionQuery } from "@/lib/tables/db/admin-http";
import { getVersionInfo, isVersionId } from "@/lib/tables/db/queries";
import { tablesToRows } from "@/lib/tables/db/rows";
import { rowsOf } from "@/lib/tables/db/validate";
import { rowKey, rowToFlat, TABLE_SPECS } from "@/lib/tables/schemas";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ table: string }> };

// GET /api/admin/tables/[table]?version=ID — one table's rows (current version by default), admin
export const GET = route(async (req: Request, ctx: Ctx) => {
  await requireTablesAdmin();
  const table = tableFromParam((await ctx.params).table);
  const tables = await tablesForVersionQuery(req);
  const spec = TABLE_SPECS[table];
  const rows = rowsOf(tablesToRows(tables), table);
  return NextResponse.json({
    table: { key: table, title: spec.title, description: spec.description, fields: spec.fields, summary: spec.summary, tableSource: spec.tableSource ?? null },
    version: isVersionId(tables.version) ? await getVersionInfo(tables.version) : null,
    rows: rows.map((row) => ({ key: rowKey(table, row), values: rowToFlat(table, row) })),
  });
});
