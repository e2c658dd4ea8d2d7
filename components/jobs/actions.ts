"use server";

import { runAction, type ActionDenied, type ActionFailure, type ActionResult } from "@/lib/auth/action";
import {
  addSupportSchema,
  deleteMemberSchema,
  jobIdSchema,
  jobInputSchema,
  memberIdSchema,
  saveMemberSchema,
  updateJobSchema,
  updateMemberSchema,
} from "@/lib/jobs/schemas";
import { saveMemberOnce } from "@/lib/jobs/save-once";
import * as jobs from "@/lib/jobs/service";
import { getPlanLimits } from "@/lib/payments/subscriptions";

export type JobActionFailure = ActionFailure | ActionDenied;
export type JobResult = ActionResult<{ jobId: string }>;
export type MemberResult = ActionResult<{ jobId: string; memberId: string }>;

const jobList = (): string[] => ["/jobs"];
const jobListAndPage = (done: { jobId: string }): string[] => ["/jobs", `/jobs/${done.jobId}`];
const jobPage = (done: { jobId: string }): string[] => [`/jobs/${done.jobId}`];

// createJob — a new job for the caller, signed-in account (free plan: up to its saved-jobs limit)
export async function createJob(input: unknown): Promise<JobResult> {
  return runAction(input, {
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
  return runAction(input, {
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
  return runAction(input, {
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
  return runAction(input, {
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
  return runAction(input, {
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
  return runAction(input, {
    schema: saveMemberSchema,
    failed: "The member could not be saved.",
    refresh: jobListAndPage,
    run: async (user, data) => {
      const limits = await getPlanLimits(user);
      if (data.saveKey) {
        // with a key the save is made once however often it is sent (see lib/jobs/save-once.ts)
        const { response } = await saveMemberOnce(user.id, data.saveKey, data, limits.savedJobs);
        return { jobId: response.jobId, memberId: response.memberId };
      }
      const { job, member } = await jobs.saveMember(user.id, data, limits.savedJobs);
      return { jobId: job.id, memberId: member.id };
    },
  });
}

// updateMember — change a saved member (name, inputs, chosen member, what carries it), owner of its job
export async function updateMember(input: unknown): Promise<MemberResult> {
  return runAction(input, {
    schema: updateMemberSchema,
    failed: "The member could not be saved.",
    refresh: jobPage,
    run: async (user, data) => {
      const member = await jobs.updateMember(user.id, data);
      return { jobId: member.jobId, memberId: member.id };
    },
  });
}

// deleteMember — delete a member (Undo with restoreMember); one that carries others says what becomes of them (409 until it does), owner of its job
export async function deleteMember(input: unknown): Promise<MemberResult> {
  return runAction(input, {
    schema: deleteMemberSchema,
    failed: "The member could not be deleted.",
    refresh: jobPage,
    run: async (user, data) => {
      const member = await jobs.deleteMember(user.id, data.memberId, data.carried);
      return { jobId: member.jobId, memberId: member.id };
    },
  });
}

// restoreMember — undo a member's deletion, owner of its job
export async function restoreMember(input: unknown): Promise<MemberResult> {
  return runAction(input, {
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
  return runAction(input, {
    schema: memberIdSchema,
    failed: "The member could not be copied.",
    refresh: jobPage,
    run: async (user, data) => {
      const copy = await jobs.duplicateMember(user.id, data.memberId);
      return { jobId: copy.jobId, memberId: copy.id };
    },
  });
}

// addSupport — posts under a member (one under each support) or footings under posts, on the job's load path, owner of the job
export async function addSupport(input: unknown): Promise<MemberResult> {
  return runAction(input, {
    schema: addSupportSchema,
    failed: "The posts or footings could not be added.",
    refresh: jobPage,
    run: async (user, data) => {
      const member = await jobs.addSupport(user.id, data);
      return { jobId: member.jobId, memberId: member.id };
    },
  });
}

// markChangesSeen — clear the job's "changed since you last looked" flags, owner of the job
export async function markChangesSeen(input: unknown): Promise<JobResult> {
  return runAction(input, {
    schema: jobIdSchema,
    failed: "The changes could not be marked seen.",
    refresh: jobPage,
    run: async (user, data) => {
      await jobs.markChangesSeen(user.id, data.jobId);
      return { jobId: data.jobId };
    },
  });
}
