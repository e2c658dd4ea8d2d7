import "server-only";
import { designSpecOf, type MemberResultSummary } from "@/lib/flow/summary";
import { createHash } from "node:crypto";
import { UniqueConstraintError } from "sequelize";
import { getSequelize } from "@/lib/db";
import { HttpError } from "@/lib/http";
import type { AnswerLine, SavedMemberResponse } from "@/lib/offline/answers";
import { getCurrentTables } from "@/lib/tables/current";
import { tablesStamp } from "@/lib/tables/stamp";
import { MemberSave } from "@/models/member-save";
import type { SaveMemberInput } from "./schemas";
import { saveMember, type SavedJobsLimit } from "./service";

/**
 * A save of a member that carries an idempotency key, made exactly once: the first send saves the member and
 * records its answer under (account, key) in the same transaction; any later send with that key gets the same
 * answer back and makes nothing (a phone that lost the answer to its save and sends it again). Two sends at
 * the same moment race on the primary key: the second waits for the first to commit, then replays its answer.
 */

/** sha-256 of the save as parsed, without the key and account: the same save sent again hashes the same. */
/** The answer line a save or an edit reports back to the phone; a member saved from the flow is framing, so its answer always has a design spec. */
export function savedAnswerOf(summary: MemberResultSummary | null): AnswerLine | null {
  const spec = designSpecOf(summary);
  return summary && spec ? { headline: summary.headline, memberLabel: summary.memberLabel, spec, ratio: summary.ratio, governing: summary.governing } : null;
}

export function saveHash(input: SaveMemberInput): string {
  const { saveKey: _key, accountId: _account, ...rest } = input;
  return createHash("sha256").update(JSON.stringify(rest)).digest("hex");
}

function replay(earlier: MemberSave, hash: string): { response: SavedMemberResponse; replayed: true } {
  if (earlier.requestHash !== hash) {
    throw new HttpError(422, "invalid input", {
      issues: [{ path: "Idempotency-Key", message: "Idempotency-Key: this key was already used for a different save; send a new key for a new save" }],
    });
  }
  return { response: earlier.response, replayed: true };
}

export async function saveMemberOnce(
  ownerId: string,
  key: string,
  input: SaveMemberInput,
  limit: SavedJobsLimit,
): Promise<{ response: SavedMemberResponse; replayed: boolean }> {
  if (input.accountId !== undefined && input.accountId !== ownerId) {
    throw new HttpError(409, "This save was made while another account was signed in on this phone; sign in to that account to send it.");
  }
  getSequelize();
  const hash = saveHash(input);
  const earlier = await MemberSave.findOne({ where: { ownerId, idempotencyKey: key } });
  if (earlier) return replay(earlier, hash);
  try {
    let response: SavedMemberResponse | null = null;
    await saveMember(ownerId, input, limit, async ({ job, member, summary }, transaction) => {
      const tables = await tablesStamp(summary ? { version: summary.tables } : await getCurrentTables());
      const saved: SavedMemberResponse = {
        jobId: job.id,
        jobName: job.name,
        memberId: member.id,
        label: member.label,
        answer: savedAnswerOf(summary),
        tables,
        savedAt: member.createdAt.toISOString(),
      };
      await MemberSave.create(
        { ownerId, idempotencyKey: key, memberId: member.id, requestHash: hash, response: saved, createdAt: new Date() },
        { transaction },
      );
      response = saved;
    });
    if (!response) throw new Error("the save made no answer");
    return { response, replayed: false };
  } catch (err) {
    if (err instanceof UniqueConstraintError) {
      const first = await MemberSave.findOne({ where: { ownerId, idempotencyKey: key } });
      if (first) return replay(first, hash);
    }
    throw err;
  }
}
