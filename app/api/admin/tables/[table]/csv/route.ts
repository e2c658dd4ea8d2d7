import { route } from "@/lib/http";
import { tableToCsv } from "@/lib/tables/csv/format";
import { requireTablesAdmin, tableFromParam, tablesForVersionQuery } from "@/lib/tables/db/admin-http";
import { getVersionInfo, isVersionId } from "@/lib/tables/db/queries";
import { tablesToRows } from "@/lib/tables/db/rows";
import { rowsOf } from "@/lib/tables/db/validate";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ table: string }> };

// GET /api/admin/tables/[table]/csv?version=ID — one table as a CSV file (current version by default), admin
export const GET = route(async (req: Request, ctx: Ctx) => {
  await requireTablesAdmin();
  const table = tableFromParam((await ctx.params).table);
  const tables = await tablesForVersionQuery(req);
  const info = isVersionId(tables.version) ? await getVersionInfo(tables.version) : null;
  const name = `spanlark-${table}-${info ? `v${info.number}` : "starter"}.csv`;
  return new Response(tableToCsv(table, rowsOf(tablesToRows(tables), table)), {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="${name}"`,
      "cache-control": "no-store",
    },
  });
});
