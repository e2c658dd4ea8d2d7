import { env } from "@/lib/env";
import { HttpError, route } from "@/lib/http";
import { openCrewLink } from "@/lib/crew/links";
import { crewPdf, crewPdfVersion, etagMatches } from "@/lib/crew/pdf-cache";
import { crewLinkUrl } from "@/lib/crew/token";
import { paperSchema } from "@/lib/orders/schemas";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ token: string }> };

// GET /api/crew/[token]/pdf — the one-page crew sheet for the site board (?paper=letter|a4), anyone holding a live crew link; 404 otherwise
export const GET = route<Ctx>(async (req, ctx) => {
  const { token } = await ctx.params;
  const paper = paperSchema.safeParse(new URL(req.url).searchParams.get("paper") ?? "letter");
  if (!paper.success) throw new HttpError(400, "invalid input", { issues: [{ path: "paper", message: paper.error.issues[0].message }] });
  const view = await openCrewLink(token);
  if (!view) throw new HttpError(404, "This crew link is not active");
  const url = crewLinkUrl(env().APP_URL, token);
  const now = new Date();
  const version = crewPdfVersion(view, url, paper.data, now);
  // the phone may keep it (the service worker does, for no signal) but asks each time: an unchanged sheet is a 304, never drawn again
  const headers = { etag: `"${version}"`, "cache-control": "private, no-cache", "referrer-policy": "no-referrer" };
  if (etagMatches(req.headers.get("if-none-match"), headers.etag)) return new Response(null, { status: 304, headers });
  const pdf = await crewPdf(view, url, paper.data, now, version);
  return new Response(new Uint8Array(pdf), {
    headers: { ...headers, "content-type": "application/pdf", "content-disposition": 'attachment; filename="crew-sheet.pdf"' },
  });
});
