"use server";

import { revalidatePath } from "next/cache";
import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
import { createCrewLink as createLink, liveCrewLink, revokeCrewLink as revokeLink, type CrewLinkView } from "@/lib/crew/links";
import { createCrewLinkSchema, crewLinkIdSchema, sendCrewLinkSchema } from "@/lib/crew/schemas";
import { HttpError, zodIssues, type FieldIssue } from "@/lib/http";
import { logger } from "@/lib/logger";
import { sendMail } from "@/lib/mail";
import { jobSharedMail } from "@/lib/mail/templates/job-shared";
import { getPlanLimits } from "@/lib/payments/subscriptions";

export type CrewActionFailure = { ok: false; error: string; status?: number; issues?: FieldIssue[] } | ActionDenied;
export type CrewLinkResult = { ok: true; link: CrewLinkView } | CrewActionFailure;
export type SendCrewLinkResult = { ok: true; sentTo: string } | CrewActionFailure;

function failure(err: unknown, fallback: string): CrewActionFailure {
  if (err instanceof HttpError && err.status < 500) return { ok: false, error: err.message, status: err.status };
  logger.error({ err }, fallback);
  return { ok: false, error: `${fallback} Try again in a minute.`, status: 500 };
}

// createCrewLink — make a read-only crew link for one of the caller's jobs, signed-in owner of the job
export async function createCrewLink(input: unknown): Promise<CrewLinkResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = createCrewLinkSchema.safeParse(input);
  if (!parsed.success) return { ok: false, error: "Check the link's settings.", status: 400, issues: zodIssues(parsed.error) };
  try {
    const limits = await getPlanLimits(auth.user);
    const link = await createLink({
      ownerId: auth.user.id,
      jobId: parsed.data.jobId,
      label: parsed.data.label,
      expiresInDays: parsed.data.expiresInDays,
      activeLimit: limits.activeCrewLinks,
    });
    revalidatePath(`/jobs/${parsed.data.jobId}`);
    return { ok: true, link };
  } catch (err) {
    return failure(err, "The crew link could not be made.");
  }
}

// revokeCrewLink — stop a crew link working at once, signed-in owner of the link
export async function revokeCrewLink(input: unknown): Promise<CrewLinkResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = crewLinkIdSchema.safeParse(input);
  if (!parsed.success) return { ok: false, error: "That is not a crew link.", status: 400, issues: zodIssues(parsed.error) };
  try {
    const link = await revokeLink(auth.user.id, parsed.data.linkId);
    revalidatePath(`/jobs/${link.jobId}`);
    return { ok: true, link };
  } catch (err) {
    return failure(err, "The crew link could not be revoked.");
  }
}

// sendCrewLink — e-mail a live crew link to someone (template job-shared), signed-in owner of the link
export async function sendCrewLink(input: unknown): Promise<SendCrewLinkResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = sendCrewLinkSchema.safeParse(input);
  if (!parsed.success) return { ok: false, error: "Check the e-mail address.", status: 400, issues: zodIssues(parsed.error) };
  try {
    const { url, job } = await liveCrewLink(auth.user.id, parsed.data.linkId);
    const mail = jobSharedMail({
      link: url,
      jobName: job.name,
      senderName: auth.user.name,
      senderCompany: auth.user.company,
      siteAddress: job.siteAddress || null,
      note: parsed.data.note || null,
    });
    await sendMail({ to: parsed.data.to, ...mail });
    return { ok: true, sentTo: parsed.data.to };
  } catch (err) {
    return failure(err, "The e-mail could not be sent.");
  }
}
