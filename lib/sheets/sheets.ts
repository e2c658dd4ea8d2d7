import "server-only";
import { designSpecOf } from "@/lib/flow/summary";
import { Op } from "sequelize";
import { getSequelize } from "@/lib/db";
import { HttpError } from "@/lib/http";
import { getCurrentTables } from "@/lib/tables/current";
import { getVersionInfo, isVersionId } from "@/lib/tables/db/queries";
import { JobSheet } from "@/models/job-sheet";
import { Job } from "@/models/job";
import { Member } from "@/models/member";
import type { SessionUser } from "@/lib/auth/session";
import { SHEET_CREATE_DENIED, sheetAccess } from "./access";
import { formatSheetDate } from "./format";
import { buildSheetSnapshot, type SheetSnapshot } from "./snapshot";
import { pathMemberOf, workOutJob } from "@/lib/jobs/load-path";
import { isFramingKind, jobKindLabel } from "@/lib/solver/design/kinds";

export interface SheetListItem {
  id: string;
  jobId: string | null;
  title: string;
  jobName: string;
  memberCount: number;
  tablesVersion: string;
  tablesLabel: string;
  /** ISO 8601 */
  savedAt: string;
}

export interface SheetRecord extends SheetListItem {
  snapshot: SheetSnapshot;
}

function listItem(s: JobSheet): SheetListItem {
  return {
    id: s.id,
    jobId: s.jobId,
    title: s.title,
    jobName: s.snapshot.job.name,
    memberCount: s.snapshot.members.length,
    tablesVersion: s.tablesVersionId,
    tablesLabel: s.snapshot.tablesLabel ?? s.tablesVersionId,
    savedAt: s.snapshot.savedAt,
  };
}

/**
 * Saves a sheet of the job as it is now: every member worked out with the current published tables and
 * frozen in the snapshot. 403 without paid access, 404 for a job that is not the user's, 400 when no
 * member has a size chosen.
 */
export async function saveJobSheet(user: SessionUser, jobId: string, now: Date = new Date()): Promise<SheetListItem> {
  if (!(await sheetAccess(user)).canCreate) throw new HttpError(403, SHEET_CREATE_DENIED, { upgrade: "/pricing" });
  getSequelize();
  const job = await Job.findOne({ where: { id: jobId, ownerId: user.id, deletedAt: { [Op.is]: null } } });
  if (!job) throw new HttpError(404, "job not found");
  const members = await Member.findAll({
    where: { jobId: job.id, deletedAt: { [Op.is]: null } },
    order: [
      ["sortOrder", "ASC"],
      ["createdAt", "ASC"],
    ],
  });
  if (members.length === 0) throw new HttpError(400, "this job has no members yet: size a member and save it to the job first");
  const tables = await getCurrentTables();
  const info = isVersionId(tables.version) ? await getVersionInfo(tables.version) : null;
  const tablesLabel = info ? `version ${info.number}, published ${formatSheetDate(info.createdAt)}` : tables.version;
  // the job's load path with these tables: the loads each member carries, and its posts and footings
  const path = workOutJob(members.map(pathMemberOf), tables, () => null);
  const snapshot = buildSheetSnapshot({
    job: { id: job.id, name: job.name, siteAddress: job.siteAddress, notes: job.notes },
    preparedBy: { name: user.name, company: user.company },
    loadPath: members.flatMap((m) => {
      const s = path.get(m.id)?.summary;
      if (m.flowState !== null || !s) return [];
      return [
        {
          id: m.id,
          label: m.label,
          kindLabel: jobKindLabel(m.kind),
          headline: s.headline,
          pass: s.pass,
          ratio: s.ratio,
          facts: s.facts ?? [],
          problems: s.problems ?? [],
        },
      ];
    }),
    members: members
      .flatMap((m) => {
        const kind = m.kind;
        if (m.flowState === null || !isFramingKind(kind)) return [];
        const worked = path.get(m.id);
        return [
          {
            ...m.get({ plain: true }),
            kind,
            flowState: worked?.state ?? m.flowState,
            carried: worked?.carried ?? [],
            carriedWords: (worked?.summary?.carried ?? []).map((c) => c.words),
          },
        ];
      })
      .map((m) => ({
        id: m.id,
        label: m.label,
        kind: m.kind,
        carried: m.carried,
        carriedWords: m.carriedWords,
        flowState: m.flowState,
        chosenMember: m.chosenMember ?? designSpecOf(m.resultSummary),
        savedTables: m.resultSummary?.tables ?? null,
        savedAnswer: m.resultSummary ? { headline: m.resultSummary.headline, ratio: m.resultSummary.ratio } : null,
      })),
    tables,
    tablesLabel,
    now,
  });
  if (snapshot.members.length === 0) {
    throw new HttpError(400, "none of this job's members has a size chosen yet: open a member and pick the size to build");
  }
  const sheet = await JobSheet.create({
    jobId: job.id,
    ownerId: user.id,
    title: `${job.name} — ${formatSheetDate(snapshot.savedAt)}`,
    tablesVersionId: snapshot.tablesVersion,
    snapshot,
  });
  return listItem(sheet);
}

/** The user's sheets, newest first; only one job's when jobId is given. */
export async function listJobSheets(ownerId: string, jobId?: string): Promise<SheetListItem[]> {
  getSequelize();
  const sheets = await JobSheet.findAll({ where: jobId ? { ownerId, jobId } : { ownerId }, order: [["createdAt", "DESC"]] });
  return sheets.map(listItem);
}

/** One sheet of the user's; 404 for anyone else's (the same answer as a sheet that does not exist). */
export async function getJobSheet(ownerId: string, sheetId: string): Promise<SheetRecord> {
  getSequelize();
  if (!/^[0-9a-f-]{36}$/i.test(sheetId)) throw new HttpError(404, "job sheet not found");
  const sheet = await JobSheet.findOne({ where: { id: sheetId, ownerId } });
  if (!sheet) throw new HttpError(404, "job sheet not found");
  return { ...listItem(sheet), snapshot: sheet.snapshot };
}

/**
 * The job's members whose answer now differs from this frozen sheet's (a member changed, a carried load
 * changed, or new tables were published since it was saved): the sheet stays as it was and says so.
 */
export async function newerNumbers(ownerId: string, sheet: SheetRecord): Promise<string[]> {
  getSequelize();
  if (!sheet.jobId) return [];
  const job = await Job.findOne({ where: { id: sheet.jobId, ownerId, deletedAt: { [Op.is]: null } } });
  if (!job) return [];
  const members = await Member.findAll({ where: { jobId: job.id, deletedAt: { [Op.is]: null } }, attributes: ["id", "label", "resultSummary"] });
  const onSheet = new Map<string, string>([
    ...sheet.snapshot.members.map((m) => [m.id, m.headline] as const),
    ...(sheet.snapshot.loadPath ?? []).map((r) => [r.id, r.headline] as const),
  ]);
  return members.flatMap((m) => {
    const now = m.resultSummary?.headline;
    if (!now) return [];
    const then = onSheet.get(m.id);
    if (then === undefined) return [`${m.label} (added since)`];
    return then === now ? [] : [`${m.label}: now ${now}`];
  });
}
