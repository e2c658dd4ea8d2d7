import { NextResponse } from "next/server";
import { route } from "@/lib/http";
import { requireTablesAdmin } from "@/lib/tables/db/admin-http";
import { listQuery } from "@/lib/tables/db/admin-schemas";
import { listVersions } from "@/lib/tables/db/queries";

export const runtime = "nodejs";

// GET /api/admin/tables/versions?limit=&offset= — the history of published versions, newest first, admin
export const GET = route(async (req: Request) => {
  await requireTablesAdmin();
  const query = listQuery.parse(Object.fromEntries(new URL(req.url).searchParams));
  return NextResponse.json(await listVersions(query));
});
