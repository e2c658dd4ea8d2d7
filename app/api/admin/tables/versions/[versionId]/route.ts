import { NextResponse } from "next/server";
import { HttpError, route } from "@/lib/http";
import { requireTablesAdmin } from "@/lib/tables/db/admin-http";
import { getVersionDetail } from "@/lib/tables/db/queries";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ versionId: string }> };

// GET /api/admin/tables/versions/[versionId] — one version with what it changed, admin
export const GET = route(async (_req: Request, ctx: Ctx) => {
  await requireTablesAdmin();
  const detail = await getVersionDetail((await ctx.params).versionId);
  if (!detail) throw new HttpError(404, "no such version of the tables");
  return NextResponse.json(detail);
});
