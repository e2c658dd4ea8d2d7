import { requireUser } from "@/lib/auth/session";
import { HttpError, route } from "@/lib/http";
import { SHEET_REPRINT_DENIED, sheetAccess } from "@/lib/sheets/access";
import { renderSheetPdf, type Paper } from "@/lib/sheets/pdf";
import { getJobSheet } from "@/lib/sheets/sheets";
import { liveCrewLinkUrl } from "@/lib/crew/links";
import { crewQrPng } from "@/lib/crew/qr";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ id: string }> };

function fileName(title: string): string {
  const base = title
    .normalize("NFKD")
    .replace(/[^A-Za-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 80);
  return `${base || "job-sheet"}.pdf`;
}

// GET /api/sheets/[id]/pdf — the job sheet as a PDF (?paper=letter|a4), signed-in owner with a subscription
export const GET = route<Ctx>(async (req, ctx) => {
  const user = await requireUser();
  const { id } = await ctx.params;
  const sheet = await getJobSheet(user.id, id);
  if (!(await sheetAccess(user)).canReprint) throw new HttpError(403, SHEET_REPRINT_DENIED, { upgrade: "/pricing" });
  const paperParam = new URL(req.url).searchParams.get("paper") ?? "letter";
  if (paperParam !== "letter" && paperParam !== "a4")
    throw new HttpError(400, "invalid input", { issues: [{ path: "paper", message: "must be letter or a4" }] });
  const crewUrl = await liveCrewLinkUrl(user.id, sheet.jobId);
  const pdf = await renderSheetPdf(sheet.snapshot, paperParam as Paper, crewUrl ? { url: crewUrl, qrPng: await crewQrPng(crewUrl, 300) } : null);
  return new Response(new Uint8Array(pdf), {
    status: 200,
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${fileName(sheet.title)}"`,
      "cache-control": "private, no-store",
    },
  });
});
