import { route } from "@/lib/http";
import { getCurrentTables } from "@/lib/tables/current";
import { tablesStamp } from "@/lib/tables/stamp";

export const runtime = "nodejs";

// GET /api/tables — the current published material tables with their version, number and date, for a phone to
// size with when it has no signal (If-None-Match with the version id it holds: 304 when still current), no sign-in
export const GET = route(async (req) => {
  const tables = await getCurrentTables();
  const etag = `"${tables.version}"`;
  const headers = { etag, "cache-control": "no-cache" };
  if (req.headers.get("if-none-match") === etag) return new Response(null, { status: 304, headers });
  const stamp = await tablesStamp(tables);
  return Response.json({ stamp, tables }, { headers });
});
