import { NextResponse } from "next/server";
import { databaseIsUp } from "@/lib/db";
import { route } from "@/lib/http";

export const runtime = "nodejs";
export const dynamic = "force-dynamic";

// GET /api/health — app and database state, no sign-in
export const GET = route(async () => {
  const up = await databaseIsUp();
  return NextResponse.json({ ok: up, app: "up", db: up ? "up" : "down" }, { status: up ? 200 : 503 });
});
