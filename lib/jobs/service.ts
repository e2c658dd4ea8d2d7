import "server-only";
import { Op, type Transaction } from "sequelize";
import { getSequelize } from "@/lib/db";
import { HttpError } from "@/lib/http";
import { checkRequest, sizeRequest } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";
import { summarize, type MemberResultSummary } from "@/lib/flow/summary";
import { checkMember, DESIGN_RULES, DESIGN_RULES_CHANGE, DesignInputError, sizeMember } from "@/lib/solver/design";
import type { MemberSpec } from "@/lib/solver/design/schema";
import { getCurrentTables } from "@/lib/tables/current";
import { Job } from "@/models/job";
import { Member } from "@/models/member";
import { cycleIssue, pathMemberOf, workOutJob } from "./load-path";
import type { AddSupportInput, JobInput, SaveMemberInput, UpdateMemberInput } from "./schemas";

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
          bearing: m.bearing,
          supportDesign: m.supportDesign,
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
      if (carrier.kind === "footing" && member.kind !== "post")
        throw new HttpError(400, "invalid input", { issues: [{ path: "carriedByMemberId", message: "Carried by: only posts stand on footings" }] });
      if (member.kind === "footing")
        throw new HttpError(400, "invalid input", {
          issues: [{ path: "carriedByMemberId", message: "Carried by: a footing sits on the soil, not on a member" }],
        });
      const links = await Member.findAll({ where: { jobId: member.jobId, deletedAt: { [Op.is]: null } }, attributes: ["id", "carriedByMemberId"] });
      const cycle = cycleIssue(
        links.map((l) => ({ id: l.id, carriedByMemberId: l.carriedByMemberId ?? null })),
        member.id,
        input.carriedByMemberId,
      );
      if (cycle) throw new HttpError(400, "invalid input", { issues: [{ path: "carriedByMemberId", message: `Carried by: ${cycle}` }] });
    }
    member.carriedByMemberId = input.carriedByMemberId;
  }
  if (input.bearing !== undefined && input.bearing !== null) {
    const carrierId = member.carriedByMemberId;
    const carrier = carrierId ? await Member.findOne({ where: { id: carrierId, deletedAt: { [Op.is]: null } } }) : null;
    const length = carrier?.flowState?.lengthFt;
    const count = member.flowState?.supports.length ?? 0;
    const bad = (path: string, message: string) => new HttpError(400, "invalid input", { issues: [{ path: `bearing.${path}`, message }] });
    if (input.bearing.supports?.some((i) => i >= count)) throw bad("supports", `Its support on it: this member has ${count} supports`);
    for (const key of ["fromFt", "toFt", "xFt"] as const) {
      const v = input.bearing[key];
      if (v !== undefined && length !== undefined && v > length + 1e-9) throw bad(key, `must be on ${carrier?.label ?? "the carrier"}, 0 to ${length} ft`);
    }
  }
  if (input.bearing !== undefined) member.bearing = input.bearing;
  if (input.supportDesign !== undefined) {
    if (member.kind !== input.supportDesign.type)
      throw new HttpError(400, "invalid input", {
        issues: [{ path: "supportDesign.type", message: `Kind: this member is not a ${input.supportDesign.type}` }],
      });
    member.supportDesign = input.supportDesign;
  }
  if (input.runWidthFt !== undefined) member.runWidthFt = input.runWidthFt;
  if (input.postHeightFt !== undefined) member.postHeightFt = input.postHeightFt;
  if (input.postSize !== undefined) member.postSize = input.postSize;
  if (input.footingDiameterIn !== undefined) member.footingDiameterIn = input.footingDiameterIn;
  if (input.footingDepthIn !== undefined) member.footingDepthIn = input.footingDepthIn;
  if (member.flowState === null && (input.flowState !== undefined || input.chosenMember !== undefined || input.loadStandard !== undefined)) {
    throw new HttpError(400, "invalid input", {
      issues: [{ path: "flowState", message: "Inputs: posts and footings take their own inputs, not the sizing flow's" }],
    });
  }
  if (member.flowState !== null && (input.flowState !== undefined || input.chosenMember !== undefined || input.loadStandard !== undefined)) {
    const given = (input.flowState ?? member.flowState) as FlowState;
    const state: FlowState = input.loadStandard !== undefined ? { ...given, loadStandard: input.loadStandard } : given;
    const { summary, chosen } = await computeSummary(state, input.chosenMember !== undefined ? input.chosenMember : member.chosenMember);
    member.flowState = state;
    member.kind = state.kind;
    member.resultSummary = summary;
    member.chosenMember = chosen;
  }
  await member.save();
  await recheckJob(member.jobId, { editedId: member.id, reason: `${member.label} changed` });
  return (await Member.findByPk(member.id)) ?? member;
}

/**
 * Marks a member deleted. One that carries others needs to be told what becomes of them: "keep" leaves
 * them in the job on nothing (their loads go nowhere until they are put on another member), "delete"
 * deletes them too (each comes back with its own Undo). Without the choice the answer is a 409 naming them.
 */
export async function deleteMember(ownerId: string, memberId: string, carried?: "keep" | "delete"): Promise<Member> {
  const sequelize = getSequelize();
  const member = await ownedMember(ownerId, memberId);
  const onIt = await Member.findAll({ where: { carriedByMemberId: member.id, deletedAt: { [Op.is]: null } }, attributes: ["id", "label"] });
  if (onIt.length > 0 && carried === undefined) {
    throw new HttpError(
      409,
      `${onIt.map((m) => m.label).join(", ")} ${onIt.length === 1 ? "bears" : "bear"} on ${member.label}: keep ${onIt.length === 1 ? "it" : "them"} (on nothing) or delete ${onIt.length === 1 ? "it" : "them"} too`,
      {
        carried: onIt.map((m) => ({ id: m.id, label: m.label })),
      },
    );
  }
  await sequelize.transaction(async (transaction) => {
    const now = new Date();
    if (onIt.length > 0 && carried === "delete") await Member.update({ deletedAt: now }, { where: { id: onIt.map((m) => m.id) }, transaction });
    if (onIt.length > 0 && carried === "keep")
      await Member.update({ carriedByMemberId: null, bearing: null }, { where: { id: onIt.map((m) => m.id) }, transaction });
    member.deletedAt = now;
    await member.save({ transaction });
  });
  await recheckJob(member.jobId, { editedId: member.id, reason: `${member.label} was deleted` });
  return member;
}

/** Undo of deleteMember. */
export async function restoreMember(ownerId: string, memberId: string): Promise<Member> {
  getSequelize();
  const member = await ownedMember(ownerId, memberId, undefined, { deleted: true });
  member.deletedAt = null;
  await member.save();
  await recheckJob(member.jobId, { editedId: member.id, reason: `${member.label} came back` });
  return member;
}

/** A copy of the member in the same job, right after it, named "… (copy)". */
export async function duplicateMember(ownerId: string, memberId: string): Promise<Member> {
  const sequelize = getSequelize();
  const copy = await sequelize.transaction(async (transaction) => {
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
        bearing: m.bearing,
        supportDesign: m.supportDesign,
      },
      { transaction },
    );
  });
  // a copy that bears on a carrier adds its loads there
  if (copy.carriedByMemberId) await recheckJob(copy.jobId, { editedId: copy.id, reason: `${copy.label} added` });
  return copy;
}

/**
 * Works a job's load path out again (lib/jobs/load-path.ts) with the current tables and saves every
 * member whose answer changed. A member other than the one just edited whose size or verdict changed
 * is flagged with the reason, on the job page and the crew link, until the builder marks it seen.
 */
export async function recheckJob(jobId: string, opts: { editedId?: string | null; reason: string }): Promise<number> {
  const sequelize = getSequelize();
  const tables = await getCurrentTables();
  return sequelize.transaction(async (transaction) => {
    await sequelize.query("SELECT pg_advisory_xact_lock(hashtext(:key))", { replacements: { key: `job-path:${jobId}` }, transaction });
    const members = await Member.findAll({ where: { jobId, deletedAt: { [Op.is]: null } }, transaction });
    let solved;
    try {
      solved = workOutJob(members.map(pathMemberOf), tables, (m) => (m.id === opts.editedId ? null : opts.reason));
    } catch (err) {
      if (err instanceof DesignInputError) throw new HttpError(400, "The inputs cannot be sized", { issues: err.issues });
      throw err;
    }
    let saved = 0;
    for (const m of members) {
      const out = solved.get(m.id);
      if (!out) continue;
      const same = (a: unknown, b: unknown) => canonical(a) === canonical(b);
      const strip = (v: MemberResultSummary | null) => (v ? { ...v, computedAt: "" } : null);
      if (same(strip(out.summary), strip(m.resultSummary)) && same(out.chosen, m.chosenMember)) continue;
      m.resultSummary = out.summary;
      if (m.flowState !== null) m.chosenMember = out.chosen;
      await m.save({ transaction });
      saved += 1;
    }
    return saved;
  });
}

/** JSON with keys in one order (PostgreSQL's JSONB keeps its own), undefined fields left out: to compare answers. */
function canonical(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(canonical).join(",")}]`;
  if (v !== null && typeof v === "object") {
    const entries = Object.entries(v as Record<string, unknown>)
      .filter(([, x]) => x !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, x]) => `${JSON.stringify(k)}:${canonical(x)}`).join(",")}}`;
  }
  return JSON.stringify(v) ?? "null";
}

/**
 * A job whose members were worked out with other tables than the current ones (the admin published new tables),
 * or whose framing answers came from an earlier edition of the design rules (lib/solver/design/rules.ts), is
 * worked out again; each answer that changes is flagged with why.
 */
export async function recheckIfOutdated(jobId: string): Promise<boolean> {
  getSequelize();
  const tables = await getCurrentTables();
  const members = await Member.findAll({ where: { jobId, deletedAt: { [Op.is]: null } }, attributes: ["id", "resultSummary", "flowState"] });
  if (members.some((m) => m.resultSummary !== null && m.resultSummary.tables !== tables.version)) {
    await recheckJob(jobId, { editedId: null, reason: "new material tables were published" });
    return true;
  }
  if (members.some((m) => m.flowState !== null && m.resultSummary !== null && m.resultSummary.rules !== DESIGN_RULES)) {
    await recheckJob(jobId, { editedId: null, reason: DESIGN_RULES_CHANGE });
    return true;
  }
  return false;
}

/** Posts under a member (one under each of its supports), or footings under posts; the member above is put on them. */
export async function addSupport(ownerId: string, input: AddSupportInput): Promise<Member> {
  const sequelize = getSequelize();
  const job = await ownedJob(ownerId, input.jobId);
  const under = await Member.findOne({ where: { id: input.underMemberId, jobId: job.id, deletedAt: { [Op.is]: null } } });
  if (!under) throw new HttpError(400, "invalid input", { issues: [{ path: "underMemberId", message: "Under: pick a member of this job" }] });
  if (input.design.type === "post" && under.flowState === null)
    throw new HttpError(400, "invalid input", { issues: [{ path: "underMemberId", message: "Under: posts go under a beam, header or joist" }] });
  if (input.design.type === "footing" && under.kind !== "post")
    throw new HttpError(400, "invalid input", { issues: [{ path: "underMemberId", message: "Under: footings go under posts" }] });
  const created = await sequelize.transaction(async (transaction) => {
    const m = await Member.create(
      {
        jobId: job.id,
        label: input.label,
        kind: input.design.type,
        flowState: null,
        resultSummary: null,
        chosenMember: null,
        supportDesign: input.design,
        sortOrder: await nextSortOrder(job.id, transaction),
      },
      { transaction },
    );
    under.carriedByMemberId = m.id;
    under.bearing = null;
    await under.save({ transaction });
    return m;
  });
  await recheckJob(job.id, { editedId: created.id, reason: `${input.label} added` });
  return (await Member.findByPk(created.id)) ?? created;
}

/** Clears the "changed since you last looked" flags of a job's members (the builder has seen them). */
export async function markChangesSeen(ownerId: string, jobId: string): Promise<void> {
  getSequelize();
  const job = await ownedJob(ownerId, jobId);
  const members = await Member.findAll({ where: { jobId: job.id, deletedAt: { [Op.is]: null } } });
  for (const m of members) {
    if (m.resultSummary?.change) {
      m.resultSummary = { ...m.resultSummary, change: null };
      await m.save();
    }
  }
}
