import { env } from "@/lib/env";
import { HttpError, route } from "@/lib/http";
import { openCrewLink } from "@/lib/crew/links";
import { renderCrewPdf } from "@/lib/crew/pdf";
import { crewQrPng } from "@/lib/crew/qr";
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
  const pdf = await renderCrewPdf(view, { url, qrPng: await crewQrPng(url, 400) }, paper.data);
  return new Response(new Uint8Array(pdf), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": 'attachment; filename="crew-sheet.pdf"',
      "cache-control": "private, no-store",
      "referrer-policy": "no-referrer",
    },
  });
});
