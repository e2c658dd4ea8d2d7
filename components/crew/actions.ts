"use server";

import { runAction, type ActionDenied, type ActionFailure, type ActionResult } from "@/lib/auth/action";
import { createCrewLink as createLink, liveCrewLink, revokeCrewLink as revokeLink, type CrewLinkView } from "@/lib/crew/links";
import { createCrewLinkSchema, crewLinkIdSchema, sendCrewLinkSchema } from "@/lib/crew/schemas";
import { sendMail } from "@/lib/mail";
import { jobSharedMail } from "@/lib/mail/templates/job-shared";
import { getPlanLimits } from "@/lib/payments/subscriptions";

export type CrewActionFailure = ActionFailure | ActionDenied;
export type CrewLinkResult = ActionResult<{ link: CrewLinkView }>;
export type SendCrewLinkResult = ActionResult<{ sentTo: string }>;

// createCrewLink — make a read-only crew link for one of the caller's jobs, signed-in owner of the job
export async function createCrewLink(input: unknown): Promise<CrewLinkResult> {
  return runAction(input, {
    schema: createCrewLinkSchema,
    invalid: "Check the link's settings.",
    failed: "The crew link could not be made.",
    run: async (user, data) => {
      const limits = await getPlanLimits(user);
      const link = await createLink({
        ownerId: user.id,
        jobId: data.jobId,
        label: data.label,
        expiresInDays: data.expiresInDays,
        activeLimit: limits.activeCrewLinks,
      });
      return { link };
    },
    refresh: (_done, data) => [`/jobs/${data.jobId}`],
  });
}

// revokeCrewLink — stop a crew link working at once, signed-in owner of the link
export async function revokeCrewLink(input: unknown): Promise<CrewLinkResult> {
  return runAction(input, {
    schema: crewLinkIdSchema,
    invalid: "That is not a crew link.",
    failed: "The crew link could not be revoked.",
    run: async (user, data) => ({ link: await revokeLink(user.id, data.linkId) }),
    refresh: (done) => [`/jobs/${done.link.jobId}`],
  });
}

// sendCrewLink — e-mail a live crew link to someone (template job-shared), signed-in owner of the link
export async function sendCrewLink(input: unknown): Promise<SendCrewLinkResult> {
  return runAction(input, {
    schema: sendCrewLinkSchema,
    invalid: "Check the e-mail address.",
    failed: "The e-mail could not be sent.",
    run: async (user, data) => {
      const { url, job } = await liveCrewLink(user.id, data.linkId);
      const mail = jobSharedMail({
        link: url,
        jobName: job.name,
        senderName: user.name,
        senderCompany: user.company,
        siteAddress: job.siteAddress || null,
        note: data.note || null,
      });
      await sendMail({ to: data.to, ...mail });
      return { sentTo: data.to };
    },
  });
}
