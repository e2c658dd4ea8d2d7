/**
 * Saves and changes made with no signal wait here (IndexedDB, through idb-keyval) until the server takes them,
 * each under the key it is sent with (Idempotency-Key): sending one again after a lost answer never makes a
 * second member or applies a change twice, so it is removed only once the server has answered it. Two senders
 * share this queue: an open Spanlark page (every browser), and the service worker's Background Sync (browsers
 * that have it, with no page open). Both may send the same item at once; the key makes that one save.
 * No window or React here: the service worker imports it too.
 */
import { createStore, del, entries, get, set, update } from "idb-keyval";
import type { MemberConflict, MemberSnapshot, PhoneAnswer, SavedMemberResponse } from "./answers";

/** The Background Sync tag the page registers and the worker answers. */
export const SYNC_TAG = "spanlark-saves";

export interface QueuedSave {
  /** the idempotency key, a UUID made when the builder pressed Save */
  key: string;
  /** a new member (POST /api/members) or a change to a saved one (PATCH /api/members/[memberId]); absent = "save" */
  kind?: "save" | "edit";
  /** the member changed (kind "edit") */
  memberId?: string;
  /** the job it goes to, when it already exists (null: a new job made by the save) */
  jobId?: string | null;
  /** the body sent */
  body: Record<string, unknown>;
  /** for the words on screen */
  label: string;
  jobName: string;
  /** the answer as this phone worked it out, when it did (compared with the server's when sent) */
  phoneAnswer: PhoneAnswer | null;
  /** the member as this phone opened it (kind "edit"), to say what changed on a conflict */
  base?: MemberSnapshot;
  /** ISO 8601 */
  queuedAt: string;
  /** set when the server refused it for good (the builder must act); such an item is not sent again by itself */
  refused?: string;
  /** set when the member changed on another screen since this phone opened it (409): kept until the builder decides */
  conflict?: MemberConflict;
}

/** A save or change the server took, as kept on the phone for the job page ("sent 2:14 PM"). */
export interface SentRecord {
  key: string;
  kind: "save" | "edit";
  label: string;
  response: SavedMemberResponse;
  phoneAnswer: PhoneAnswer | null;
  /** ISO 8601, when it was made on this phone */
  queuedAt: string;
  /** ISO 8601, when the server's answer reached this phone */
  sentAt: string;
  /** who sent it: an open page, or the service worker with no page open */
  by: "page" | "background";
  /** the builder dismissed its message */
  seen?: boolean;
}

export interface SendOutcome {
  sent: SentRecord[];
  /** items left unsent because the network failed (the sender tries again later) */
  unsent: number;
  /** anything in the queue changed (sent, refused, conflict) */
  changed: boolean;
}

/** Sent records are kept this long for the job page, and at most this many. */
const SENT_KEEP_MS = 14 * 24 * 3600 * 1000;
const SENT_KEEP_COUNT = 50;

let queue: ReturnType<typeof createStore> | null = null;
let sentLog: ReturnType<typeof createStore> | null = null;

function queueStore(): ReturnType<typeof createStore> {
  queue ??= createStore("spanlark-saves", "saves");
  return queue;
}

function sentStore(): ReturnType<typeof createStore> {
  sentLog ??= createStore("spanlark-sent", "sent");
  return sentLog;
}

export const kindOf = (s: QueuedSave): "save" | "edit" => s.kind ?? "save";

/** The job an item goes to, when it already exists (a save to a new job has none until it is sent). */
export function jobOf(s: QueuedSave): string | null {
  if (s.jobId) return s.jobId;
  return typeof s.body.jobId === "string" ? s.body.jobId : null;
}

export async function putQueued(save: QueuedSave): Promise<void> {
  await set(save.key, save, queueStore());
}

export async function readQueue(): Promise<QueuedSave[]> {
  try {
    const all = await entries<string, QueuedSave>(queueStore());
    return all.map(([, v]) => v).sort((a, b) => a.queuedAt.localeCompare(b.queuedAt));
  } catch {
    return [];
  }
}

export async function removeQueued(key: string): Promise<void> {
  await del(key, queueStore());
}

export async function readSent(): Promise<SentRecord[]> {
  try {
    const all = await entries<string, SentRecord>(sentStore());
    return all.map(([, v]) => v).sort((a, b) => b.sentAt.localeCompare(a.sentAt));
  } catch {
    return [];
  }
}

export async function markSentSeen(key: string): Promise<void> {
  await update<SentRecord | undefined>(key, (v) => (v ? { ...v, seen: true } : v), sentStore());
}

async function recordSent(record: SentRecord): Promise<void> {
  // sent by the page and by the worker at once: the first record stays (its time is when it first arrived)
  if (await get(record.key, sentStore())) return;
  await set(record.key, record, sentStore());
  const all = await readSent();
  const cutoff = Date.now() - SENT_KEEP_MS;
  await Promise.all(all.filter((r, i) => i >= SENT_KEEP_COUNT || Date.parse(r.sentAt) < cutoff).map((r) => del(r.key, sentStore())));
}

function requestFor(save: QueuedSave): { url: string; method: string } {
  return kindOf(save) === "edit" ? { url: `/api/members/${save.memberId}`, method: "PATCH" } : { url: "/api/members", method: "POST" };
}

/** Sends every waiting item once, in the order they were made; answers what the server took. */
export async function sendQueue(by: SentRecord["by"], origin = ""): Promise<SendOutcome> {
  const outcome: SendOutcome = { sent: [], unsent: 0, changed: false };
  const waiting = (await readQueue()).filter((s) => !s.refused && !s.conflict);
  for (const [i, save] of waiting.entries()) {
    const { url, method } = requestFor(save);
    let res: Response;
    try {
      res = await fetch(`${origin}${url}`, {
        method,
        credentials: "same-origin",
        headers: { "content-type": "application/json", "idempotency-key": save.key },
        body: JSON.stringify(save.body),
        signal: AbortSignal.timeout(20_000),
      });
    } catch {
      outcome.unsent = waiting.length - i; // no signal yet: try again later, same keys
      break;
    }
    if (res.ok) {
      const response = (await res.json()) as SavedMemberResponse;
      const record: SentRecord = {
        key: save.key,
        kind: kindOf(save),
        label: save.label,
        response,
        phoneAnswer: save.phoneAnswer,
        queuedAt: save.queuedAt,
        sentAt: new Date().toISOString(),
        by,
      };
      await recordSent(record);
      await removeQueued(save.key);
      outcome.sent.push(record);
      outcome.changed = true;
      continue;
    }
    // signed out, a server or database hiccup, too many requests: it waits for the next try
    if (res.status === 401 || res.status === 408 || res.status === 429 || res.status >= 500) {
      outcome.unsent += 1;
      continue;
    }
    const data = (await res.json().catch(() => null)) as { error?: string; issues?: { message: string }[]; conflict?: MemberConflict } | null;
    if (res.status === 409 && data?.conflict) {
      const conflict = data.conflict;
      await update<QueuedSave>(save.key, (v) => ({ ...(v ?? save), conflict }), queueStore());
    } else {
      const why = data?.issues?.length ? data.issues.map((x) => x.message).join("; ") : (data?.error ?? `The server answered ${res.status}`);
      await update<QueuedSave>(save.key, (v) => ({ ...(v ?? save), refused: why }), queueStore());
    }
    outcome.changed = true;
  }
  return outcome;
}
