"use server";

import { revalidatePath } from "next/cache";
import type { ZodType } from "zod";
import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
import type { SessionUser } from "@/lib/auth/roles";
import { HttpError, zodIssues, type FieldIssue } from "@/lib/http";
import { jobIdSchema, jobInputSchema, memberIdSchema, saveMemberSchema, updateJobSchema, updateMemberSchema } from "@/lib/jobs/schemas";
import * as jobs from "@/lib/jobs/service";
import { logger } from "@/lib/logger";
import { getPlanLimits } from "@/lib/payments/subscriptions";

export type JobActionFailure = { ok: false; error: string; status: number; issues?: FieldIssue[]; upgrade?: string } | ActionDenied;
export type JobResult = { ok: true; jobId: string } | JobActionFailure;
export type MemberResult = { ok: true; jobId: string; memberId: string } | JobActionFailure;

function failure(err: unknown, fallback: string): JobActionFailure {
  if (err instanceof HttpError && err.status < 500) {
    const details = (err.details ?? {}) as { issues?: FieldIssue[]; upgrade?: string };
    return { ok: false, error: err.message, status: err.status, issues: details.issues, upgrade: details.upgrade };
  }
  logger.error({ err }, fallback);
  return { ok: false, error: `${fallback} Try again in a minute.`, status: 500 };
}

function parse<T>(schema: ZodType<T>, input: unknown): { ok: true; data: T } | { ok: false; error: string; status: 400; issues: FieldIssue[] } {
  const parsed = schema.safeParse(input);
  if (parsed.success) return { ok: true, data: parsed.data };
  const issues = zodIssues(parsed.error);
  return { ok: false, error: issues.map((i) => i.message).join("; "), status: 400, issues };
}

interface JobActionSteps<T, R extends { jobId: string }> {
  schema: ZodType<T>;
  /** What the caller reads when something unexpected fails (the 500 case). */
  failed: string;
  /** The pages that show what the action changed, refreshed once it succeeds. */
  refresh: (done: R) => string[];
  run: (user: SessionUser, data: T) => Promise<R>;
}

/** The steps every action here shares: signed-in caller, parsed input, the work, refreshed pages, the answer's shape. */
async function jobAction<T, R extends { jobId: string }>(input: unknown, steps: JobActionSteps<T, R>): Promise<({ ok: true } & R) | JobActionFailure> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(steps.schema, input);
  if (!parsed.ok) return parsed;
  try {
    const done = await steps.run(auth.user, parsed.data);
    for (const page of steps.refresh(done)) revalidatePath(page);
    return { ok: true, ...done };
  } catch (err) {
    return failure(err, steps.failed);
  }
}

const jobList = (): string[] => ["/jobs"];
const jobListAndPage = (done: { jobId: string }): string[] => ["/jobs", `/jobs/${done.jobId}`];
const jobPage = (done: { jobId: string }): string[] => [`/jobs/${done.jobId}`];

// createJob — a new job for the caller, signed-in account (free plan: up to its saved-jobs limit)
export async function createJob(input: unknown): Promise<JobResult> {
  return jobAction(input, {
    schema: jobInputSchema,
    failed: "The job could not be made.",
    refresh: jobList,
    run: async (user, data) => {
      const limits = await getPlanLimits(user);
      const job = await jobs.createJob(user.id, data, limits.savedJobs);
      return { jobId: job.id };
    },
  });
}

// updateJob — rename a job, change its address or notes, owner of the job
export async function updateJob(input: unknown): Promise<JobResult> {
  return jobAction(input, {
    schema: updateJobSchema,
    failed: "The job could not be saved.",
    refresh: jobListAndPage,
    run: async (user, data) => {
      const job = await jobs.updateJob(user.id, data.jobId, data);
      return { jobId: job.id };
    },
  });
}

// deleteJob — delete a job (Undo with restoreJob), owner of the job
export async function deleteJob(input: unknown): Promise<JobResult> {
  return jobAction(input, {
    schema: jobIdSchema,
    failed: "The job could not be deleted.",
    refresh: jobList,
    run: async (user, data) => {
      await jobs.deleteJob(user.id, data.jobId);
      return { jobId: data.jobId };
    },
  });
}

// restoreJob — undo a job's deletion, owner of the job
export async function restoreJob(input: unknown): Promise<JobResult> {
  return jobAction(input, {
    schema: jobIdSchema,
    failed: "The job could not be brought back.",
    refresh: jobList,
    run: async (user, data) => {
      const limits = await getPlanLimits(user);
      await jobs.restoreJob(user.id, data.jobId, limits.savedJobs);
      return { jobId: data.jobId };
    },
  });
}

// duplicateJob — copy a job with its members, owner of the job (free plan: counts as a new job)
export async function duplicateJob(input: unknown): Promise<JobResult> {
  return jobAction(input, {
    schema: jobIdSchema,
    failed: "The job could not be copied.",
    refresh: jobList,
    run: async (user, data) => {
      const limits = await getPlanLimits(user);
      const copy = await jobs.duplicateJob(user.id, data.jobId, limits.savedJobs);
      return { jobId: copy.id };
    },
  });
}

// saveMember — save the sizing flow's answer to one of the caller's jobs (or a new one), signed-in account
export async function saveMember(input: unknown): Promise<MemberResult> {
  return jobAction(input, {
    schema: saveMemberSchema,
    failed: "The member could not be saved.",
    refresh: jobListAndPage,
    run: async (user, data) => {
      const limits = await getPlanLimits(user);
      const { job, member } = await jobs.saveMember(user.id, data, limits.savedJobs);
      return { jobId: job.id, memberId: member.id };
    },
  });
}

// updateMember — change a saved member (name, inputs, chosen member, what carries it), owner of its job
export async function updateMember(input: unknown): Promise<MemberResult> {
  return jobAction(input, {
    schema: updateMemberSchema,
    failed: "The member could not be saved.",
    refresh: jobPage,
    run: async (user, data) => {
      const member = await jobs.updateMember(user.id, data);
      return { jobId: member.jobId, memberId: member.id };
    },
  });
}

// deleteMember — delete a member (Undo with restoreMember), owner of its job
export async function deleteMember(input: unknown): Promise<MemberResult> {
  return jobAction(input, {
    schema: memberIdSchema,
    failed: "The member could not be deleted.",
    refresh: jobPage,
    run: async (user, data) => {
      const member = await jobs.deleteMember(user.id, data.memberId);
      return { jobId: member.jobId, memberId: member.id };
    },
  });
}

// restoreMember — undo a member's deletion, owner of its job
export async function restoreMember(input: unknown): Promise<MemberResult> {
  return jobAction(input, {
    schema: memberIdSchema,
    failed: "The member could not be brought back.",
    refresh: jobPage,
    run: async (user, data) => {
      const member = await jobs.restoreMember(user.id, data.memberId);
      return { jobId: member.jobId, memberId: member.id };
    },
  });
}

// duplicateMember — copy a member within its job, owner of its job
export async function duplicateMember(input: unknown): Promise<MemberResult> {
  return jobAction(input, {
    schema: memberIdSchema,
    failed: "The member could not be copied.",
    refresh: jobPage,
    run: async (user, data) => {
      const copy = await jobs.duplicateMember(user.id, data.memberId);
      return { jobId: copy.jobId, memberId: copy.id };
    },
  });
}
