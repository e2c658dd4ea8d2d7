import { NextResponse } from "next/server";
import { HttpError, route } from "@/lib/http";
import { csvIsClean } from "@/lib/tables/csv/format";
import { requireTablesAdmin, tableFromParam, tablesOperation } from "@/lib/tables/db/admin-http";
import { readUpload } from "@/lib/tables/db/import-flow";
import { importRows } from "@/lib/tables/db/write";
import { TABLE_SPECS } from "@/lib/tables/schemas";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ table: string }> };

// POST /api/admin/tables/[table]/import — apply an uploaded CSV, all or nothing, as one new version, admin
export const POST = route(async (req: Request, ctx: Ctx) => {
  const actor = await requireTablesAdmin();
  const table = tableFromParam((await ctx.params).table);
  const upload = await readUpload(req, table);
  const { parsed } = upload;
  if (!csvIsClean(parsed)) {
    const message = parsed.fileError
      ? `nothing was applied: ${parsed.fileError}`
      : `nothing was applied: ${parsed.rejected.length} of ${parsed.lineCount} lines have problems`;
    throw new HttpError(400, message, { fileError: parsed.fileError, rejected: parsed.rejected });
  }
  const note = upload.note || `Imported ${upload.fileName} into ${TABLE_SPECS[table].title} (${upload.mode})`;
  const result = await tablesOperation(() => importRows(table, parsed.rows, upload.mode, { actor, note, baseVersionId: upload.baseVersionId }));
  return NextResponse.json({
    created: result.created,
    version: result.version,
    counts: { added: result.summary.added, changed: result.summary.changed, removed: result.summary.removed },
    message: result.created ? `published version ${result.version.number}` : "the tables already hold exactly these rows, so no new version was published",
  });
});
