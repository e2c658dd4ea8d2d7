import { requireUser } from "@/lib/auth/session";
import { HttpError, route } from "@/lib/http";
import { orderCsv } from "@/lib/orders/csv";
import { renderOrderPdf } from "@/lib/orders/pdf";
import { getJobOrder } from "@/lib/orders/queries";
import { orderFileName, orderFormatSchema, paperSchema } from "@/lib/orders/schemas";

export const runtime = "nodejs";

type Ctx = { params: Promise<{ jobId: string }> };

// GET /api/jobs/[jobId]/order — the job's order list as a file (?format=csv|pdf, ?paper=letter|a4), signed-in owner of the job
export const GET = route<Ctx>(async (req, ctx) => {
  const user = await requireUser();
  const { jobId } = await ctx.params;
  const params = new URL(req.url).searchParams;
  const format = orderFormatSchema.safeParse(params.get("format") ?? "csv");
  const paper = paperSchema.safeParse(params.get("paper") ?? "letter");
  const issues = [
    ...(format.success ? [] : [{ path: "format", message: format.error.issues[0].message }]),
    ...(paper.success ? [] : [{ path: "paper", message: paper.error.issues[0].message }]),
  ];
  if (issues.length > 0) throw new HttpError(400, "invalid input", { issues });
  const order = await getJobOrder(user.id, jobId);
  if (!order) throw new HttpError(404, "Job not found");
  const headers = { "cache-control": "private, no-store" };
  if (format.data === "csv") {
    return new Response(orderCsv(order.list), {
      headers: {
        ...headers,
        "content-type": "text/csv; charset=utf-8",
        "content-disposition": `attachment; filename="${orderFileName(order.job.name, "csv")}"`,
      },
    });
  }
  const pdf = await renderOrderPdf(order, paper.data ?? "letter");
  return new Response(new Uint8Array(pdf), {
    headers: { ...headers, "content-type": "application/pdf", "content-disposition": `attachment; filename="${orderFileName(order.job.name, "pdf")}"` },
  });
});
