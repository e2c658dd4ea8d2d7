import "server-only";
import { Op, type Transaction } from "sequelize";
import { getSequelize } from "@/lib/db";
import { HttpError } from "@/lib/http";
import { checkRequest, sizeRequest } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";
import { summarize, type MemberResultSummary } from "@/lib/flow/summary";
import { checkMember, DesignInputError, sizeMember } from "@/lib/solver/design";
import type { MemberSpec } from "@/lib/solver/design/schema";
import { getCurrentTables } from "@/lib/tables/current";
import { Job } from "@/models/job";
import { Member } from "@/models/member";
import type { JobInput, SaveMemberInput, UpdateMemberInput } from "./schemas";

/**
 * Changes to jobs and members. Every function takes the owner's id first and touches only that
 * owner's rows: anything else is a 404 (the same answer as a row that does not exist). Deleting is
 * soft (deletedAt) so Undo can bring a job or member back.
 */

const NOT_FOUND_JOB = "Job not found";
const NOT_FOUND_MEMBER = "Member not found";

async function ownedJob(ownerId: string, jobId: string, transaction?: Transaction, opts: { deleted?: boolean } = {}): Promise<Job> {
  const job = await Job.findOne({ where: { id: jobId, ownerId, deletedAt: opts.deleted ? { [Op.not]: null } : { [Op.is]: null } }, transaction });
  if (!job) throw new HttpError(404, NOT_FOUND_JOB);
  return job;
}

async function ownedMember(ownerId: string, memberId: string, transaction?: Transaction, opts: { deleted?: boolean } = {}): Promise<Member> {
  const member = await Member.findOne({
    where: { id: memberId, deletedAt: opts.deleted ? { [Op.not]: null } : { [Op.is]: null } },
    include: [{ model: Job, as: "job", required: true, where: { ownerId, deletedAt: { [Op.is]: null } } }],
    transaction,
  });
  if (!member) throw new HttpError(404, NOT_FOUND_MEMBER);
  return member;
}

/** The free plan's limit on saved jobs; null = no limit. */
export type SavedJobsLimit = number | null;

async function assertRoomForJob(ownerId: string, limit: SavedJobsLimit, transaction: Transaction): Promise<void> {
  if (limit === null) return;
  // one owner's job count is read under a lock on the owner's jobs, so two saves at once cannot both slip under the limit
  const count = await Job.count({ where: { ownerId, deletedAt: { [Op.is]: null } }, transaction });
  if (count >= limit) {
    throw new HttpError(402, `The free plan keeps ${limit} saved jobs. Delete a job or subscribe to keep more.`, { upgrade: "/pricing" });
  }
}

export async function createJob(ownerId: string, input: JobInput, limit: SavedJobsLimit): Promise<Job> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext(:key))", { replacements: { key: `jobs:${ownerId}` }, transaction });
    await assertRoomForJob(ownerId, limit, transaction);
    return Job.create({ ownerId, name: input.name, siteAddress: input.siteAddress, notes: input.notes }, { transaction });
  });
}

export async function updateJob(ownerId: string, jobId: string, input: JobInput): Promise<Job> {
  getSequelize();
  const job = await ownedJob(ownerId, jobId);
  job.name = input.name;
  job.siteAddress = input.siteAddress;
  job.notes = input.notes;
  await job.save();
  return job;
}

/** Marks the job deleted; its members stay with it and come back with Undo. */
export async function deleteJob(ownerId: string, jobId: string): Promise<void> {
  getSequelize();
  const job = await ownedJob(ownerId, jobId);
  job.deletedAt = new Date();
  await job.save();
}

/** Undo of deleteJob. Counts against the free plan's limit like a new job. */
export async function restoreJob(ownerId: string, jobId: string, limit: SavedJobsLimit): Promise<Job> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext(:key))", { replacements: { key: `jobs:${ownerId}` }, transaction });
    const job = await ownedJob(ownerId, jobId, transaction, { deleted: true });
    await assertRoomForJob(ownerId, limit, transaction);
    job.deletedAt = null;
    await job.save({ transaction });
    return job;
  });
}

/** A copy of the job and its live members, named "… (copy)". */
export async function duplicateJob(ownerId: string, jobId: string, limit: SavedJobsLimit): Promise<Job> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext(:key))", { replacements: { key: `jobs:${ownerId}` }, transaction });
    const job = await ownedJob(ownerId, jobId, transaction);
    await assertRoomForJob(ownerId, limit, transaction);
    const copy = await Job.create({ ownerId, name: `${job.name} (copy)`.slice(0, 120), siteAddress: job.siteAddress, notes: job.notes }, { transaction });
    const members = await Member.findAll({
      where: { jobId: job.id, deletedAt: { [Op.is]: null } },
      order: [
        ["sortOrder", "ASC"],
        ["createdAt", "ASC"],
      ],
      transaction,
    });
    const idMap = new Map<string, string>();
    for (const m of members) {
      const c = await Member.create(
        {
          jobId: copy.id,
          label: m.label,
          kind: m.kind,
          flowState: m.flowState,
          resultSummary: m.resultSummary,
          chosenMember: m.chosenMember,
          sortOrder: m.sortOrder,
          runWidthFt: m.runWidthFt,
          postHeightFt: m.postHeightFt,
          postSize: m.postSize,
          footingDiameterIn: m.footingDiameterIn,
          footingDepthIn: m.footingDepthIn,
        },
        { transaction },
      );
      idMap.set(m.id, c.id);
    }
    // carried-by links point at the copies inside the new job
    for (const m of members) {
      const carrier = m.carriedByMemberId ? idMap.get(m.carriedByMemberId) : undefined;
      const copyId = idMap.get(m.id);
      if (carrier && copyId) await Member.update({ carriedByMemberId: carrier }, { where: { id: copyId }, transaction });
    }
    return copy;
  });
}

/**
 * The answer for a state and a chosen member, worked out again on the server with the current
 * tables (a saved answer never trusts numbers sent by the browser). Without a chosen member, the
 * best that passes is taken.
 */
export async function computeSummary(state: FlowState, chosen: MemberSpec | null): Promise<{ summary: MemberResultSummary | null; chosen: MemberSpec | null }> {
  const tables = await getCurrentTables();
  try {
    let spec = chosen;
    if (!spec) {
      const size = sizeMember(sizeRequest(state), tables);
      spec = size.passing[0]?.member ?? null;
    }
    if (!spec) return { summary: null, chosen: null };
    const check = checkMember(checkRequest(state, spec), tables);
    return { summary: summarize(state, check), chosen: spec };
  } catch (err) {
    if (err instanceof DesignInputError) throw new HttpError(400, "The inputs cannot be sized", { issues: err.issues });
    throw err;
  }
}

async function nextSortOrder(jobId: string, transaction?: Transaction): Promise<number> {
  const max = (await Member.max("sortOrder", { where: { jobId }, transaction })) as number | null;
  return (max ?? -1) + 1;
}

/** Runs inside a save's transaction once the member is made (the idempotent save records its answer there). */
export type AfterSave = (saved: { job: Job; member: Member; summary: MemberResultSummary | null }, transaction: Transaction) => Promise<void>;

/** Saves the flow's answer as a member of one of the owner's jobs, or of a new job made now. */
export async function saveMember(
  ownerId: string,
  input: SaveMemberInput,
  limit: SavedJobsLimit,
  afterSave?: AfterSave,
): Promise<{ job: Job; member: Member; summary: MemberResultSummary | null }> {
  const { summary, chosen } = await computeSummary(input.flowState as FlowState, input.chosenMember);
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    let job: Job;
    if (input.jobId) {
      job = await ownedJob(ownerId, input.jobId, transaction);
    } else if (input.newJob) {
      await sequelize.query("SELECT pg_advisory_xact_lock(hashtext(:key))", { replacements: { key: `jobs:${ownerId}` }, transaction });
      await assertRoomForJob(ownerId, limit, transaction);
      job = await Job.create({ ownerId, name: input.newJob.name, siteAddress: input.newJob.siteAddress, notes: input.newJob.notes }, { transaction });
    } else {
      throw new HttpError(400, "invalid input", { issues: [{ path: "jobId", message: "Job: pick a job or give a new job's name" }] });
    }
    const member = await Member.create(
      {
        jobId: job.id,
        label: input.label,
        kind: input.flowState.kind,
        flowState: input.flowState as FlowState,
        resultSummary: summary,
        chosenMember: chosen,
        sortOrder: await nextSortOrder(job.id, transaction),
      },
      { transaction },
    );
    job.changed("updatedAt", true);
    await job.save({ transaction });
    if (afterSave) await afterSave({ job, member, summary }, transaction);
    return { job, member, summary };
  });
}

/** Changes a member's name, inputs, chosen member or the member carrying it; the answer is worked out again when the inputs change. */
export async function updateMember(ownerId: string, input: UpdateMemberInput): Promise<Member> {
  getSequelize();
  const member = await ownedMember(ownerId, input.memberId);
  if (input.label !== undefined) member.label = input.label;
  if (input.carriedByMemberId !== undefined) {
    if (input.carriedByMemberId === member.id)
      throw new HttpError(400, "invalid input", { issues: [{ path: "carriedByMemberId", message: "Carried by: a member cannot carry itself" }] });
    if (input.carriedByMemberId !== null) {
      const carrier = await Member.findOne({ where: { id: input.carriedByMemberId, jobId: member.jobId, deletedAt: { [Op.is]: null } } });
      if (!carrier)
        throw new HttpError(400, "invalid input", { issues: [{ path: "carriedByMemberId", message: "Carried by: pick a member of the same job" }] });
    }
    member.carriedByMemberId = input.carriedByMemberId;
  }
  if (input.runWidthFt !== undefined) member.runWidthFt = input.runWidthFt;
  if (input.postHeightFt !== undefined) member.postHeightFt = input.postHeightFt;
  if (input.postSize !== undefined) member.postSize = input.postSize;
  if (input.footingDiameterIn !== undefined) member.footingDiameterIn = input.footingDiameterIn;
  if (input.footingDepthIn !== undefined) member.footingDepthIn = input.footingDepthIn;
  if (input.flowState !== undefined || input.chosenMember !== undefined || input.loadStandard !== undefined) {
    const given = (input.flowState ?? member.flowState) as FlowState;
    const state: FlowState = input.loadStandard !== undefined ? { ...given, loadStandard: input.loadStandard } : given;
    const { summary, chosen } = await computeSummary(state, input.chosenMember !== undefined ? input.chosenMember : member.chosenMember);
    member.flowState = state;
    member.kind = state.kind;
    member.resultSummary = summary;
    member.chosenMember = chosen;
  }
  await member.save();
  return member;
}

export async function deleteMember(ownerId: string, memberId: string): Promise<Member> {
  getSequelize();
  const member = await ownedMember(ownerId, memberId);
  member.deletedAt = new Date();
  await member.save();
  return member;
}

/** Undo of deleteMember. */
export async function restoreMember(ownerId: string, memberId: string): Promise<Member> {
  getSequelize();
  const member = await ownedMember(ownerId, memberId, undefined, { deleted: true });
  member.deletedAt = null;
  await member.save();
  return member;
}

/** A copy of the member in the same job, right after it, named "… (copy)". */
export async function duplicateMember(ownerId: string, memberId: string): Promise<Member> {
  const sequelize = getSequelize();
  return sequelize.transaction(async (transaction) => {
    const m = await ownedMember(ownerId, memberId, transaction);
    await Member.increment("sortOrder", { by: 1, where: { jobId: m.jobId, sortOrder: { [Op.gt]: m.sortOrder } }, transaction });
    return Member.create(
      {
        jobId: m.jobId,
        label: `${m.label} (copy)`.slice(0, 120),
        kind: m.kind,
        flowState: m.flowState,
        resultSummary: m.resultSummary,
        chosenMember: m.chosenMember,
        carriedByMemberId: m.carriedByMemberId,
        sortOrder: m.sortOrder + 1,
        runWidthFt: m.runWidthFt,
        postHeightFt: m.postHeightFt,
        postSize: m.postSize,
        footingDiameterIn: m.footingDiameterIn,
        footingDepthIn: m.footingDepthIn,
      },
      { transaction },
    );
  });
}
