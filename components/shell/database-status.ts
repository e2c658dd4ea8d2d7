/** The database's state as GET /api/health reports it; "unknown" when the app itself does not answer. */
export async function databaseStatus(): Promise<"up" | "down" | "unknown"> {
  try {
    const res = await fetch("/api/health", { cache: "no-store" });
    const body = (await res.json().catch(() => ({}))) as { db?: unknown };
    if (body.db === "down") return "down";
    if (body.db === "up") return "up";
    return "unknown";
  } catch {
    return "unknown";
  }
}
