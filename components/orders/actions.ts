"use server";

import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
import { HttpError, zodIssues, type FieldIssue } from "@/lib/http";
import { logger } from "@/lib/logger";
import { sendMail } from "@/lib/mail";
import { orderListMail } from "@/lib/mail/templates/order-list";
import { orderCsv } from "@/lib/orders/csv";
import { renderOrderPdf } from "@/lib/orders/pdf";
import { getJobOrder } from "@/lib/orders/queries";
import { emailOrderSchema, orderFileName } from "@/lib/orders/schemas";

export type EmailOrderResult = { ok: true; sentTo: string } | { ok: false; error: string; status?: number; issues?: FieldIssue[] } | ActionDenied;

// emailOrderList — e-mail a job's order list (CSV and PDF attached) to an address the builder types, signed-in owner of the job
export async function emailOrderList(input: unknown): Promise<EmailOrderResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = emailOrderSchema.safeParse(input);
  if (!parsed.success) {
    const issues = zodIssues(parsed.error);
    return { ok: false, error: issues.map((i) => i.message).join("; "), status: 400, issues };
  }
  try {
    const order = await getJobOrder(auth.user.id, parsed.data.jobId);
    if (!order) throw new HttpError(404, "Job not found");
    const mail = orderListMail({
      jobName: order.job.name,
      siteAddress: order.job.siteAddress || null,
      senderName: auth.user.name,
      senderCompany: auth.user.company,
      note: parsed.data.note || null,
      list: order.list,
    });
    const pdf = await renderOrderPdf(order);
    await sendMail({
      to: parsed.data.to,
      ...mail,
      attachments: [
        { filename: orderFileName(order.job.name, "csv"), content: orderCsv(order.list), contentType: "text/csv; charset=utf-8" },
        { filename: orderFileName(order.job.name, "pdf"), content: pdf, contentType: "application/pdf" },
      ],
    });
    return { ok: true, sentTo: parsed.data.to };
  } catch (err) {
    if (err instanceof HttpError && err.status < 500) return { ok: false, error: err.message, status: err.status };
    logger.error({ err }, "order list mail failed");
    return { ok: false, error: "The order list could not be sent. Try again in a minute.", status: 500 };
  }
}
