import "server-only";
import { recheckIfOutdated } from "@/lib/jobs/service";
import { notCheckedFor } from "@/lib/caution";
import { Op } from "sequelize";
import { getSequelize } from "@/lib/db";
import { env } from "@/lib/env";
import { HttpError } from "@/lib/http";
import { CrewLink } from "@/models/crew-link";
import { Job } from "@/models/job";
import { Member } from "@/models/member";
import { scheduleRow, type ScheduleRow } from "./schedule";
import { crewLinkUrl, hashCrewToken, looksLikeCrewToken, newCrewToken, openCrewToken, sealCrewToken } from "./token";

/**
 * Crew links: the owner's side (create, list, revoke, the link to copy or mail) and the crew's side (open a
 * link by its token). Every owner query is scoped by ownerId, and a job or link of someone else is a 404,
 * the same answer as one that does not exist.
 */

export type CrewLinkStatus = "active" | "revoked" | "expired";

export interface CrewLinkView {
  id: string;
  jobId: string;
  label: string | null;
  status: CrewLinkStatus;
  /** ISO 8601 */
  createdAt: string;
  expiresAt: string | null;
  revokedAt: string | null;
  lastOpenedAt: string | null;
  /** the full link, for a live link whose token can still be opened; null otherwise */
  url: string | null;
}

export function crewLinkStatus(link: Pick<CrewLink, "revokedAt" | "expiresAt">, now: Date = new Date()): CrewLinkStatus {
  if (link.revokedAt) return "revoked";
  if (link.expiresAt && link.expiresAt.getTime() <= now.getTime()) return "expired";
  return "active";
}

function secret(): string {
  return env().NEXTAUTH_SECRET;
}

function view(link: CrewLink, now: Date): CrewLinkView {
  const status = crewLinkStatus(link, now);
  const token = status === "active" ? openCrewToken(link.tokenSealed, secret()) : null;
  return {
    id: link.id,
    jobId: link.jobId,
    label: link.label,
    status,
    createdAt: link.createdAt.toISOString(),
    expiresAt: link.expiresAt?.toISOString() ?? null,
    revokedAt: link.revokedAt?.toISOString() ?? null,
    lastOpenedAt: link.lastOpenedAt?.toISOString() ?? null,
    url: token ? crewLinkUrl(env().APP_URL, token) : null,
  };
}

/** A job of this owner that is not deleted; 404 otherwise. */
export async function ownedJob(ownerId: string, jobId: string): Promise<Job> {
  getSequelize();
  const job = await Job.findOne({ where: { id: jobId, ownerId, deletedAt: { [Op.is]: null } } });
  if (!job) throw new HttpError(404, "job not found");
  return job;
}

/** Live links of an owner across all their jobs (the free tier limits these). */
export async function countActiveCrewLinks(ownerId: string, now: Date = new Date()): Promise<number> {
  getSequelize();
  return CrewLink.count({
    where: {
      ownerId,
      revokedAt: { [Op.is]: null },
      [Op.or]: [{ expiresAt: { [Op.is]: null } }, { expiresAt: { [Op.gt]: now } }],
    },
  });
}

export interface CreateCrewLinkOptions {
  ownerId: string;
  jobId: string;
  label?: string;
  /** 0 = until revoked */
  expiresInDays: number;
  /** null: no limit (paid access) */
  activeLimit: number | null;
  now?: Date;
}

/**
 * Makes a link and returns it with its full URL (the token is in it). With a limit, the count and the
 * insert run in one transaction holding a lock on the owner's row, so two quick presses cannot pass it.
 */
export async function createCrewLink(opts: CreateCrewLinkOptions): Promise<CrewLinkView> {
  const now = opts.now ?? new Date();
  const job = await ownedJob(opts.ownerId, opts.jobId);
  const sequelize = getSequelize();
  const token = newCrewToken();
  const link = await sequelize.transaction(async (transaction) => {
    if (opts.activeLimit !== null) {
      await sequelize.query("SELECT id FROM users WHERE id = :id FOR UPDATE", { replacements: { id: opts.ownerId }, transaction });
      const active = await CrewLink.count({
        where: {
          ownerId: opts.ownerId,
          revokedAt: { [Op.is]: null },
          [Op.or]: [{ expiresAt: { [Op.is]: null } }, { expiresAt: { [Op.gt]: now } }],
        },
        transaction,
      });
      if (active >= opts.activeLimit) {
        throw new HttpError(403, `A free account can keep ${opts.activeLimit} crew links live at once. Revoke one you no longer need, or subscribe for more.`, {
          limit: opts.activeLimit,
          upgrade: "/pricing",
        });
      }
    }
    return CrewLink.create(
      {
        jobId: job.id,
        ownerId: opts.ownerId,
        tokenHash: hashCrewToken(token),
        tokenSealed: sealCrewToken(token, secret()),
        label: opts.label?.trim() ? opts.label.trim() : null,
        expiresAt: opts.expiresInDays > 0 ? new Date(now.getTime() + opts.expiresInDays * 86_400_000) : null,
      },
      { transaction },
    );
  });
  return { ...view(link, now), url: crewLinkUrl(env().APP_URL, token) };
}

/** The job's links, newest first, live ones with their URL. */
export async function listCrewLinks(ownerId: string, jobId: string, now: Date = new Date()): Promise<CrewLinkView[]> {
  await ownedJob(ownerId, jobId);
  const links = await CrewLink.findAll({ where: { ownerId, jobId }, order: [["createdAt", "DESC"]] });
  return links.map((l) => view(l, now));
}

/** The newest live crew link of an owner's job that can be shown (for the QR code on a job sheet); null when there is none or the job is gone. */
export async function liveCrewLinkUrl(ownerId: string, jobId: string | null, now: Date = new Date()): Promise<string | null> {
  if (!jobId) return null;
  try {
    return (await listCrewLinks(ownerId, jobId, now)).find((l) => l.status === "active" && l.url)?.url ?? null;
  } catch (err) {
    if (err instanceof HttpError && err.status === 404) return null;
    throw err;
  }
}

async function ownedLink(ownerId: string, linkId: string): Promise<CrewLink> {
  getSequelize();
  const link = await CrewLink.findOne({ where: { id: linkId, ownerId } });
  if (!link) throw new HttpError(404, "crew link not found");
  return link;
}

/** Revokes a link at once; revoking it again changes nothing. */
export async function revokeCrewLink(ownerId: string, linkId: string, now: Date = new Date()): Promise<CrewLinkView> {
  const link = await ownedLink(ownerId, linkId);
  if (!link.revokedAt) await link.update({ revokedAt: now });
  return view(link, now);
}

/** A live link with its URL and job, for copying or mailing; 409 when it is revoked, expired or cannot be shown. */
export async function liveCrewLink(ownerId: string, linkId: string, now: Date = new Date()): Promise<{ link: CrewLinkView; url: string; job: Job }> {
  const link = await ownedLink(ownerId, linkId);
  const v = view(link, now);
  if (v.status !== "active") throw new HttpError(409, `this crew link is ${v.status}; make a new one`);
  if (!v.url) throw new HttpError(409, "this link can no longer be shown (the server's key changed); revoke it and make a new one");
  const job = await ownedJob(ownerId, link.jobId);
  return { link: v, url: v.url, job };
}

export interface CrewJobView {
  job: { name: string; siteAddress: string; notes: string };
  rows: ScheduleRow[];
  expiresAt: string | null;
  /** what Spanlark does not check, for the members on this job (cold-formed steel adds its items) */
  notChecked: readonly string[];
  /** when the job or one of its members last changed, ISO 8601 */
  changedAt: string;
  /** when this view was read from the database, ISO 8601 (a phone that kept the page shows how old its copy is) */
  readAt: string;
}

/**
 * The crew's view of a job, from a token; null when the token is unknown, revoked or expired, or the job
 * is deleted (the page answers all of these the same way, with a 404). Reads only; the only write is the
 * link's last-opened time, at most once a minute.
 */
export async function openCrewLink(token: string, now: Date = new Date()): Promise<CrewJobView | null> {
  if (!looksLikeCrewToken(token)) return null;
  getSequelize();
  const link = await CrewLink.findOne({ where: { tokenHash: hashCrewToken(token) } });
  if (!link || crewLinkStatus(link, now) !== "active") return null;
  const job = await Job.findOne({ where: { id: link.jobId, ownerId: link.ownerId, deletedAt: { [Op.is]: null } } });
  if (!job) return null;
  // new tables since the members were worked out: the crew never reads a stale answer
  await recheckIfOutdated(job.id);
  const members = await Member.findAll({
    where: { jobId: job.id, deletedAt: { [Op.is]: null } },
    order: [
      ["sortOrder", "ASC"],
      ["createdAt", "ASC"],
    ],
  });
  if (!link.lastOpenedAt || now.getTime() - link.lastOpenedAt.getTime() > 60_000) {
    await CrewLink.update({ lastOpenedAt: now }, { where: { id: link.id } });
  }
  return {
    job: { name: job.name, siteAddress: job.siteAddress, notes: job.notes },
    rows: members.map((m) => scheduleRow({ id: m.id, label: m.label, kind: m.kind, resultSummary: m.resultSummary })),
    expiresAt: link.expiresAt?.toISOString() ?? null,
    notChecked: notCheckedFor(members.map((m) => m.resultSummary?.spec.material)),
    changedAt: new Date(Math.max(job.updatedAt.getTime(), ...members.map((m) => m.updatedAt.getTime()))).toISOString(),
    readAt: now.toISOString(),
  };
}
