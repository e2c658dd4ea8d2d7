import { NextResponse } from "next/server";
import { HttpError, parseJson, route } from "@/lib/http";
import { requireTablesAdmin, tablesOperation } from "@/lib/tables/db/admin-http";
import { restoreBody } from "@/lib/tables/db/admin-schemas";
import { getVersionInfo } from "@/lib/tables/db/queries";
import { restoreVersion } from "@/lib/tables/db/write";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ versionId: string }> };

// POST /api/admin/tables/versions/[versionId]/restore — publish a copy of an earlier version as the newest, admin
export const POST = route(async (req: Request, ctx: Ctx) => {
  const actor = await requireTablesAdmin();
  const { versionId } = await ctx.params;
  const body = await parseJson(req, restoreBody);
  const target = await getVersionInfo(versionId);
  if (!target) throw new HttpError(404, "no such version of the tables");
  const note = body.note || `Restored version ${target.number}`;
  const result = await tablesOperation(() => restoreVersion(versionId, { actor, note, baseVersionId: body.baseVersionId }));
  return NextResponse.json({
    created: result.created,
    version: result.version,
    counts: { added: result.summary.added, changed: result.summary.changed, removed: result.summary.removed },
    message: result.created
      ? `published version ${result.version.number}, a copy of version ${target.number}`
      : `the current tables already equal version ${target.number}, so no new version was published`,
  });
});
