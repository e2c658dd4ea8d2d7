import "server-only";
import { createHash } from "node:crypto";
import { Op, UniqueConstraintError } from "sequelize";
import { getSequelize } from "@/lib/db";
import { HttpError } from "@/lib/http";
import type { FlowState } from "@/lib/flow/state";
import type { MemberConflict, MemberSnapshot, SavedMemberResponse } from "@/lib/offline/answers";
import { getCurrentTables } from "@/lib/tables/current";
import { tablesStamp } from "@/lib/tables/stamp";
import { Job } from "@/models/job";
import { Member } from "@/models/member";
import { MemberSave } from "@/models/member-save";
import type { EditMemberInput } from "./schemas";
import { savedAnswerOf } from "./save-once";
import { computeSummary, recheckJob } from "./service";

/**
 * A change to a saved member made on a phone with no signal and sent later, applied exactly once and only to
 * the member the phone changed: the change carries an idempotency key (recorded in member_saves with its answer,
 * in the change's transaction, as a save's is) and the version of the member it was made on. If the member has
 * changed since (edited on another screen, renamed, moved), nothing is applied: 409 with the member as it is now,
 * so the phone can say what changed and keep the builder's change.
 */

/** JSON with object keys sorted (PostgreSQL's jsonb gives keys back in its own order). */
function stableJson(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(stableJson).join(",")}]`;
  if (value !== null && typeof value === "object") {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${stableJson(v)}`).join(",")}}`;
  }
  return JSON.stringify(value);
}

/**
 * What the builder set on a member, as a sha-256 hex: its name, inputs, chosen member and where it sits. The
 * answer the server works out is not part of it (a recheck after new tables is not a change of the builder's).
 */
export function memberVersion(m: {
  label: string;
  flowState: unknown;
  chosenMember: unknown;
  carriedByMemberId?: string | null;
  bearing?: unknown;
  supportDesign?: unknown;
}): string {
  const what = {
    label: m.label,
    flowState: m.flowState,
    chosenMember: m.chosenMember,
    carriedBy: m.carriedByMemberId ?? null,
    bearing: m.bearing ?? null,
    supportDesign: m.supportDesign ?? null,
  };
  return createHash("sha256").update(stableJson(what)).digest("hex");
}

export function memberSnapshot(m: Member): MemberSnapshot {
  return { label: m.label, flowState: m.flowState, chosenMember: m.chosenMember, headline: m.resultSummary?.headline ?? null };
}

/** sha-256 of the change as parsed, with the member it is for, without the account. */
export function editHash(memberId: string, input: EditMemberInput): string {
  const { accountId: _account, ...rest } = input;
  return createHash("sha256")
    .update(stableJson({ edit: memberId, ...rest }))
    .digest("hex");
}

function replay(earlier: MemberSave, hash: string): { response: SavedMemberResponse; replayed: true } {
  if (earlier.requestHash !== hash) {
    throw new HttpError(422, "invalid input", {
      issues: [{ path: "Idempotency-Key", message: "Idempotency-Key: this key was already used for a different change; send a new key for a new change" }],
    });
  }
  return { response: earlier.response, replayed: true };
}

/** 404 unless `memberId` is a member (deleted or not: a change to a deleted one is a 409) of one of the owner's live jobs; before the body is read. */
export async function assertOwnsMember(ownerId: string, memberId: string): Promise<void> {
  getSequelize();
  const found = /^[0-9a-f-]{36}$/i.test(memberId)
    ? await Member.count({
        where: { id: memberId },
        include: [{ model: Job, as: "job", required: true, where: { ownerId, deletedAt: { [Op.is]: null } } }],
      })
    : 0;
  if (!found) throw new HttpError(404, "Member not found");
}

export async function editMemberOnce(
  ownerId: string,
  key: string,
  memberId: string,
  input: EditMemberInput,
): Promise<{ response: SavedMemberResponse; replayed: boolean }> {
  if (input.accountId !== undefined && input.accountId !== ownerId) {
    throw new HttpError(409, "This change was made while another account was signed in on this phone; sign in to that account to send it.");
  }
  const sequelize = getSequelize();
  const hash = editHash(memberId, input);
  const earlier = await MemberSave.findOne({ where: { ownerId, idempotencyKey: key } });
  if (earlier) return replay(earlier, hash);
  // the answer is worked out before the member is locked (it is the slow part)
  const { summary, chosen } = await computeSummary(input.flowState as FlowState, input.chosenMember);
  let outcome: { response: SavedMemberResponse; replayed: boolean } | null = null;
  let jobId: string | null = null;
  try {
    await sequelize.transaction(async (transaction) => {
      const member = await Member.findOne({
        where: { id: memberId },
        include: [{ model: Job, as: "job", required: true, where: { ownerId, deletedAt: { [Op.is]: null } } }],
        lock: { level: transaction.LOCK.UPDATE, of: Member },
        transaction,
      });
      if (!member || !member.job) throw new HttpError(404, "Member not found");
      // the same change sent twice at once: the second waited for the first's lock and now replays its answer
      const first = await MemberSave.findOne({ where: { ownerId, idempotencyKey: key }, transaction });
      if (first) {
        outcome = replay(first, hash);
        return;
      }
      if (member.flowState === null) {
        throw new HttpError(400, "invalid input", {
          issues: [{ path: "flowState", message: "Inputs: posts and footings take their own inputs, not the sizing flow's" }],
        });
      }
      const version = memberVersion(member);
      if (member.deletedAt !== null || version !== input.baseVersion) {
        const conflict: MemberConflict = {
          memberId: member.id,
          jobId: member.jobId,
          jobName: member.job.name,
          deleted: member.deletedAt !== null,
          version,
          current: memberSnapshot(member),
        };
        throw new HttpError(
          409,
          member.deletedAt !== null
            ? `${member.label} was deleted from ${member.job.name} after this phone opened it; nothing was changed.`
            : `${member.label} was changed on another screen after this phone opened it; nothing was changed.`,
          { conflict },
        );
      }
      member.label = input.label;
      member.flowState = input.flowState as FlowState;
      member.kind = input.flowState.kind;
      member.resultSummary = summary;
      member.chosenMember = chosen;
      await member.save({ transaction });
      member.job.changed("updatedAt", true);
      await member.job.save({ transaction });
      const tables = await tablesStamp(summary ? { version: summary.tables } : await getCurrentTables());
      const response: SavedMemberResponse = {
        jobId: member.jobId,
        jobName: member.job.name,
        memberId: member.id,
        label: member.label,
        answer: savedAnswerOf(summary),
        tables,
        savedAt: new Date().toISOString(),
      };
      await MemberSave.create({ ownerId, idempotencyKey: key, memberId: member.id, requestHash: hash, response, createdAt: new Date() }, { transaction });
      outcome = { response, replayed: false };
      jobId = member.jobId;
    });
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      const first = await MemberSave.findOne({ where: { ownerId, idempotencyKey: key } });
      if (first) return replay(first, hash);
    }
    throw err;
  }
  if (!outcome) throw new Error("the change made no answer");
  // the members on it and under it are worked out again, as after any change
  if (jobId) await recheckJob(jobId, { editedId: memberId, reason: `${input.label} changed` });
  return outcome;
}
