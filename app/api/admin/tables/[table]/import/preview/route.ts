import { NextResponse } from "next/server";
import { route } from "@/lib/http";
import { requireTablesAdmin, tableFromParam } from "@/lib/tables/db/admin-http";
import { previewUpload, readUpload } from "@/lib/tables/db/import-flow";
import { getVersionInfo } from "@/lib/tables/db/queries";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ table: string }> };

// POST /api/admin/tables/[table]/import/preview — check an uploaded CSV and show what it would change, writes nothing, admin
export const POST = route(async (req: Request, ctx: Ctx) => {
  await requireTablesAdmin();
  const table = tableFromParam((await ctx.params).table);
  const upload = await readUpload(req, table);
  const preview = await previewUpload(table, upload, async (id) => (await getVersionInfo(id))?.number ?? null);
  return NextResponse.json(preview);
});
