import "server-only";
import { Op, fn, col, where as sqlWhere, type WhereOptions } from "sequelize";
import { getSequelize } from "@/lib/db";
import { Job } from "@/models/job";
import { Member } from "@/models/member";
import type { FlowState } from "@/lib/flow/state";
import type { JobMemberKind } from "@/lib/solver/design/kinds";
import type { Bearing, SupportDesign } from "./load-path";
import type { MemberResultSummary } from "@/lib/flow/summary";
import type { MemberSpec } from "@/lib/solver/design/schema";
import type { OrderDetails } from "@/lib/orders/order-list";

/**
 * Reads of jobs and their members. Every query is scoped by the owner's id: a job or member of
 * someone else, or one deleted, is not found (the caller answers 404), whatever the caller's role.
 */

export interface JobListItem {
  id: string;
  name: string;
  siteAddress: string;
  memberCount: number;
  updatedAt: Date;
}

export interface MemberView {
  id: string;
  jobId: string;
  label: string;
  kind: JobMemberKind;
  /** the sizing flow's inputs; null for posts and footings */
  flowState: FlowState | null;
  resultSummary: MemberResultSummary | null;
  chosenMember: MemberSpec | null;
  carriedByMemberId: string | null;
  bearing: Bearing | null;
  supportDesign: SupportDesign | null;
  sortOrder: number;
  updatedAt: Date;
  /** what the order list needs beyond the sizing (widths, posts, footings) */
  orderDetails: OrderDetails;
}

export interface JobView {
  id: string;
  name: string;
  siteAddress: string;
  notes: string;
  createdAt: Date;
  updatedAt: Date;
  members: MemberView[];
}

/** Escapes % and _ so a search for "50%" finds those characters, not everything. */
function likePattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}

export function memberView(m: Member): MemberView {
  return {
    id: m.id,
    jobId: m.jobId,
    label: m.label,
    kind: m.kind,
    flowState: m.flowState,
    resultSummary: m.resultSummary,
    chosenMember: m.chosenMember,
    carriedByMemberId: m.carriedByMemberId ?? null,
    bearing: m.bearing ?? null,
    supportDesign: m.supportDesign ?? null,
    sortOrder: m.sortOrder,
    updatedAt: m.updatedAt,
    orderDetails: {
      runWidthFt: m.runWidthFt ?? null,
      postHeightFt: m.postHeightFt ?? null,
      postSize: m.postSize ?? null,
      footingDiameterIn: m.footingDiameterIn ?? null,
      footingDepthIn: m.footingDepthIn ?? null,
    },
  };
}

/** The owner's jobs, newest change first; `search` matches the name or the site address (any case). */
export async function listJobs(ownerId: string, search = ""): Promise<JobListItem[]> {
  getSequelize();
  const q = search.trim().slice(0, 120);
  const filter: WhereOptions = q
    ? {
        [Op.or]: [
          sqlWhere(fn("lower", col("Job.name")), Op.like, likePattern(q.toLowerCase())),
          sqlWhere(fn("lower", col("Job.site_address")), Op.like, likePattern(q.toLowerCase())),
        ],
      }
    : {};
  const jobs = await Job.findAll({
    where: { ownerId, deletedAt: { [Op.is]: null }, ...filter },
    order: [["updatedAt", "DESC"]],
    limit: 200,
  });
  const counts = jobs.length
    ? ((await Member.count({ where: { jobId: jobs.map((j) => j.id), deletedAt: { [Op.is]: null } }, group: ["job_id"] })) as unknown as {
        job_id: string;
        count: number;
      }[])
    : [];
  const byJob = new Map(counts.map((c) => [c.job_id, Number(c.count)]));
  return jobs.map((j) => ({ id: j.id, name: j.name, siteAddress: j.siteAddress, memberCount: byJob.get(j.id) ?? 0, updatedAt: j.updatedAt }));
}

/** The owner's live jobs as choices (for "Save to job"). */
export async function jobChoices(ownerId: string): Promise<{ id: string; name: string }[]> {
  getSequelize();
  const jobs = await Job.findAll({ where: { ownerId, deletedAt: { [Op.is]: null } }, order: [["updatedAt", "DESC"]], attributes: ["id", "name"], limit: 200 });
  return jobs.map((j) => ({ id: j.id, name: j.name }));
}

/** How many live jobs the owner holds (for the free plan's limit). */
export async function countJobs(ownerId: string): Promise<number> {
  getSequelize();
  return Job.count({ where: { ownerId, deletedAt: { [Op.is]: null } } });
}

/** One of the owner's jobs with its live members in order; null when it is not theirs, deleted or missing. */
export async function getJob(ownerId: string, jobId: string): Promise<JobView | null> {
  getSequelize();
  if (!/^[0-9a-f-]{36}$/i.test(jobId)) return null;
  const job = await Job.findOne({ where: { id: jobId, ownerId, deletedAt: { [Op.is]: null } } });
  if (!job) return null;
  const members = await Member.findAll({
    where: { jobId: job.id, deletedAt: { [Op.is]: null } },
    order: [
      ["sortOrder", "ASC"],
      ["createdAt", "ASC"],
    ],
  });
  return {
    id: job.id,
    name: job.name,
    siteAddress: job.siteAddress,
    notes: job.notes,
    createdAt: job.createdAt,
    updatedAt: job.updatedAt,
    members: members.map(memberView),
  };
}

/** One live member of one of the owner's live jobs; null otherwise. */
export async function getMember(ownerId: string, memberId: string): Promise<(MemberView & { jobName: string }) | null> {
  getSequelize();
  if (!/^[0-9a-f-]{36}$/i.test(memberId)) return null;
  const member = await Member.findOne({
    where: { id: memberId, deletedAt: { [Op.is]: null } },
    include: [{ model: Job, as: "job", required: true, where: { ownerId, deletedAt: { [Op.is]: null } } }],
  });
  if (!member || !member.job) return null;
  return { ...memberView(member), jobName: member.job.name };
}
