/**
 * Answers worked out on the phone with no signal, and the server's recheck of them. Pure: the answer
 * screen, the save queue, the save route and their tests share it.
 */
import type { FlowState } from "@/lib/flow/state";
import type { MemberSpec } from "@/lib/solver/design/schema";
import type { SizeCandidateResult, SizeOutput } from "@/lib/solver/design/size";

/** Which published version of the material tables an answer used: its id, number and date. */
export interface TablesStamp {
  /** the version id (MaterialTables.version) */
  id: string;
  /** 1, 2, 3… as published; null for the starter tables that ship with the app */
  number: number | null;
  /** ISO 8601; null for the starter tables */
  publishedAt: string | null;
}

/** "tables v6 of 2 Dec" (UTC), or "the starter tables" for the tables that ship with the app. */
export function tablesWords(stamp: TablesStamp): string {
  if (stamp.number === null || stamp.publishedAt === null) return "the starter tables";
  const date = new Date(stamp.publishedAt).toLocaleDateString("en-US", { day: "numeric", month: "short", timeZone: "UTC" });
  // "Dec 2" → "2 Dec": the date as a builder writes it on a plan
  const [month, day] = date.split(" ");
  return `tables v${stamp.number} of ${day} ${month}`;
}

/** What an answer says to build: enough to tell two answers apart and to say so. */
export interface AnswerLine {
  /** "3-ply 2x12 No.2 — 2 jack studs each end" */
  headline: string;
  /** "3-ply 2x12 No.2 Douglas Fir-Larch" */
  memberLabel: string;
  spec: MemberSpec;
  /** the governing check's demand over capacity */
  ratio: number;
  governing: string | null;
}

/** What the server answers to a saved member (the same answer to a save sent again with its key). */
export interface SavedMemberResponse {
  jobId: string;
  jobName: string;
  memberId: string;
  label: string;
  /** the answer the server worked out with its current tables; null when nothing in them works */
  answer: AnswerLine | null;
  tables: TablesStamp;
  /** ISO 8601 */
  savedAt: string;
}

/** A saved member as the builder set it (what a change made on a phone is compared with). */
export interface MemberSnapshot {
  label: string;
  flowState: FlowState | null;
  chosenMember: MemberSpec | null;
  /** its answer's headline when it was read; null when nothing works */
  headline: string | null;
}

/** The server's 409 to a change made on a phone whose member changed since (PATCH /api/members/[memberId]). */
export interface MemberConflict {
  memberId: string;
  jobId: string;
  jobName: string;
  /** deleted since the phone opened it */
  deleted: boolean;
  /** its version now (sending the phone's change again over it takes this as the base) */
  version: string;
  current: MemberSnapshot;
}

/** The answer of a member worked out on the phone, kept with a save that waits for a signal. */
export interface PhoneAnswer {
  answer: AnswerLine | null;
  tables: TablesStamp;
}

const sameSpec = (a: MemberSpec, b: MemberSpec): boolean => JSON.stringify(a) === JSON.stringify(b);

/** Of members that pass (best first), the one the answer screen shows: the chosen one while it passes, else the best. */
function shownOf<T>(passing: readonly T[], specOf: (item: T) => MemberSpec, chosen: MemberSpec | null): T | null {
  return (chosen ? passing.find((p) => sameSpec(specOf(p), chosen)) : undefined) ?? passing[0] ?? null;
}

/** The candidate the answer screen shows: the chosen member while it still passes, else the best that passes. */
export function shownCandidate(output: SizeOutput, chosen: MemberSpec | null): SizeCandidateResult | null {
  return shownOf(output.passing, (p) => p.member, chosen);
}

const lineOf = (c: SizeCandidateResult): AnswerLine => ({ headline: c.answer, memberLabel: c.label, spec: c.member, ratio: c.ratio, governing: c.governing });

export function answerLineOf(candidate: SizeCandidateResult | null): AnswerLine | null {
  return candidate ? lineOf(candidate) : null;
}

/**
 * What the phone keeps of an answer it worked out with no signal, until the server has rechecked it: the answer
 * line of every member that passed (the builder may choose another before the signal is back) and the tables used.
 */
export interface PhoneWorkedOut {
  tables: TablesStamp;
  lines: AnswerLine[];
  /** when it was worked out, ms since 1970 */
  at: number;
}

export function phoneWorkedOut(output: SizeOutput, tables: TablesStamp, at: number): PhoneWorkedOut {
  return { tables, lines: output.passing.map(lineOf), at };
}

/** The line the answer screen showed for `chosen` when the phone worked it out (as shownCandidate chose it). */
export function shownLine(kept: PhoneWorkedOut, chosen: MemberSpec | null): AnswerLine | null {
  return shownOf(kept.lines, (l) => l.spec, chosen);
}

/** The server's recheck of an answer worked out on the phone. */
export type Recheck =
  | { same: true; phone: AnswerLine | null; server: AnswerLine | null }
  | {
      same: false;
      phone: AnswerLine | null;
      server: AnswerLine | null;
      /** why they differ, in plain words */
      why: string;
    };

const percent = (ratio: number): number => Math.round(ratio * 100);

/**
 * Compares the answer worked out on the phone with the server's. The same member to build at the same
 * percentage of its capacity is the same answer; anything else is a change, with the reason: the tables
 * changed, or the member no longer passes, or (same tables, same inputs) the app itself was updated.
 */
export function recheck(phone: PhoneAnswer, server: { answer: AnswerLine | null; tables: TablesStamp }): Recheck {
  const a = phone.answer;
  const b = server.answer;
  const same = a === null ? b === null : b !== null && a.headline === b.headline && a.memberLabel === b.memberLabel && percent(a.ratio) === percent(b.ratio);
  if (same) return { same: true, phone: a, server: b };
  let why: string;
  if (phone.tables.id !== server.tables.id) {
    why = `The material tables were updated: this phone used ${tablesWords(phone.tables)}, the server used ${tablesWords(server.tables)}.`;
  } else if (a && b && a.memberLabel !== b.memberLabel) {
    why = `With the same tables (${tablesWords(server.tables)}) the server picked another member; this phone's copy of Spanlark is older than the server's.`;
  } else {
    why = `The tables are the same (${tablesWords(server.tables)}); this phone's copy of Spanlark is older than the server's and worked it out differently.`;
  }
  return { same: false, phone: a, server: b, why };
}

/** "3-ply 2x12 No.2 — 2 jack studs each end (OK 82%)", or that nothing works. */
export function answerWords(line: AnswerLine | null): string {
  return line ? `${line.headline} (${percent(line.ratio)}% of capacity)` : "nothing in the tables works";
}
