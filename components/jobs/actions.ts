"use server";

import { revalidatePath } from "next/cache";
import type { ZodType } from "zod";
import { authorizeAction, type ActionDenied } from "@/lib/auth/action";
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

// createJob — a new job for the caller, signed-in account (free plan: up to its saved-jobs limit)
export async function createJob(input: unknown): Promise<JobResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(jobInputSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const limits = await getPlanLimits(auth.user);
    const job = await jobs.createJob(auth.user.id, parsed.data, limits.savedJobs);
    revalidatePath("/jobs");
    return { ok: true, jobId: job.id };
  } catch (err) {
    return failure(err, "The job could not be made.");
  }
}

// updateJob — rename a job, change its address or notes, owner of the job
export async function updateJob(input: unknown): Promise<JobResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(updateJobSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const job = await jobs.updateJob(auth.user.id, parsed.data.jobId, parsed.data);
    revalidatePath("/jobs");
    revalidatePath(`/jobs/${job.id}`);
    return { ok: true, jobId: job.id };
  } catch (err) {
    return failure(err, "The job could not be saved.");
  }
}

// deleteJob — delete a job (Undo with restoreJob), owner of the job
export async function deleteJob(input: unknown): Promise<JobResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(jobIdSchema, input);
  if (!parsed.ok) return parsed;
  try {
    await jobs.deleteJob(auth.user.id, parsed.data.jobId);
    revalidatePath("/jobs");
    return { ok: true, jobId: parsed.data.jobId };
  } catch (err) {
    return failure(err, "The job could not be deleted.");
  }
}

// restoreJob — undo a job's deletion, owner of the job
export async function restoreJob(input: unknown): Promise<JobResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(jobIdSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const limits = await getPlanLimits(auth.user);
    await jobs.restoreJob(auth.user.id, parsed.data.jobId, limits.savedJobs);
    revalidatePath("/jobs");
    return { ok: true, jobId: parsed.data.jobId };
  } catch (err) {
    return failure(err, "The job could not be brought back.");
  }
}

// duplicateJob — copy a job with its members, owner of the job (free plan: counts as a new job)
export async function duplicateJob(input: unknown): Promise<JobResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(jobIdSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const limits = await getPlanLimits(auth.user);
    const copy = await jobs.duplicateJob(auth.user.id, parsed.data.jobId, limits.savedJobs);
    revalidatePath("/jobs");
    return { ok: true, jobId: copy.id };
  } catch (err) {
    return failure(err, "The job could not be copied.");
  }
}

// saveMember — save the sizing flow's answer to one of the caller's jobs (or a new one), signed-in account
export async function saveMember(input: unknown): Promise<MemberResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(saveMemberSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const limits = await getPlanLimits(auth.user);
    const { job, member } = await jobs.saveMember(auth.user.id, parsed.data, limits.savedJobs);
    revalidatePath("/jobs");
    revalidatePath(`/jobs/${job.id}`);
    return { ok: true, jobId: job.id, memberId: member.id };
  } catch (err) {
    return failure(err, "The member could not be saved.");
  }
}

// updateMember — change a saved member (name, inputs, chosen member, what carries it), owner of its job
export async function updateMember(input: unknown): Promise<MemberResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(updateMemberSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const member = await jobs.updateMember(auth.user.id, parsed.data);
    revalidatePath(`/jobs/${member.jobId}`);
    return { ok: true, jobId: member.jobId, memberId: member.id };
  } catch (err) {
    return failure(err, "The member could not be saved.");
  }
}

// deleteMember — delete a member (Undo with restoreMember), owner of its job
export async function deleteMember(input: unknown): Promise<MemberResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(memberIdSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const member = await jobs.deleteMember(auth.user.id, parsed.data.memberId);
    revalidatePath(`/jobs/${member.jobId}`);
    return { ok: true, jobId: member.jobId, memberId: member.id };
  } catch (err) {
    return failure(err, "The member could not be deleted.");
  }
}

// restoreMember — undo a member's deletion, owner of its job
export async function restoreMember(input: unknown): Promise<MemberResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(memberIdSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const member = await jobs.restoreMember(auth.user.id, parsed.data.memberId);
    revalidatePath(`/jobs/${member.jobId}`);
    return { ok: true, jobId: member.jobId, memberId: member.id };
  } catch (err) {
    return failure(err, "The member could not be brought back.");
  }
}

// duplicateMember — copy a member within its job, owner of its job
export async function duplicateMember(input: unknown): Promise<MemberResult> {
  const auth = await authorizeAction();
  if (!auth.ok) return auth;
  const parsed = parse(memberIdSchema, input);
  if (!parsed.ok) return parsed;
  try {
    const copy = await jobs.duplicateMember(auth.user.id, parsed.data.memberId);
    revalidatePath(`/jobs/${copy.jobId}`);
    return { ok: true, jobId: copy.jobId, memberId: copy.id };
  } catch (err) {
    return failure(err, "The member could not be copied.");
  }
}
