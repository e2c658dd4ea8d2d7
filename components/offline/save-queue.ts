"use client";

import { createStore, del, entries, set, update } from "idb-keyval";
import { recheck, type PhoneAnswer, type Recheck, type SavedMemberResponse } from "@/lib/offline/answers";

/**
 * Saves made with no signal wait here (IndexedDB) until the server takes them, each under the key it will be
 * sent with (Idempotency-Key): sending one again after a lost answer never makes a second member, so a save is
 * removed only once the server has answered it.
 */

export interface QueuedSave {
  /** the idempotency key, a UUID made when the builder pressed Save */
  key: string;
  /** the body of POST /api/members */
  body: Record<string, unknown>;
  /** for the words on screen */
  label: string;
  jobName: string;
  /** the answer as this phone worked it out, when it did (compared with the server's when sent) */
  phoneAnswer: PhoneAnswer | null;
  /** ISO 8601 */
  queuedAt: string;
  /** set when the server refused it for good (the builder must act); such a save is not sent again by itself */
  refused?: string;
}

export interface SentSave {
  save: QueuedSave;
  response: SavedMemberResponse;
  /** the server's recheck of the phone's answer; null when the phone had none (sized online, saved offline) */
  recheck: Recheck | null;
}

const CHANGED = "spanlark:save-queue";
let store: ReturnType<typeof createStore> | null = null;
let sending: Promise<SentSave[]> | null = null;

function queueStore(): ReturnType<typeof createStore> {
  store ??= createStore("spanlark-saves", "saves");
  return store;
}

function announce(): void {
  window.dispatchEvent(new Event(CHANGED));
}

/** Calls `listener` whenever a save is queued, sent or refused; returns the unsubscribe. */
export function onQueueChange(listener: () => void): () => void {
  window.addEventListener(CHANGED, listener);
  return () => window.removeEventListener(CHANGED, listener);
}

export async function queueSave(save: QueuedSave): Promise<void> {
  await set(save.key, save, queueStore());
  announce();
}

export async function queuedSaves(): Promise<QueuedSave[]> {
  try {
    const all = await entries<string, QueuedSave>(queueStore());
    return all.map(([, v]) => v).sort((a, b) => a.queuedAt.localeCompare(b.queuedAt));
  } catch {
    return [];
  }
}

export async function forgetSave(key: string): Promise<void> {
  await del(key, queueStore());
  announce();
}

/** Sends every waiting save once (one sender at a time per page); returns those the server took. */
export function sendQueuedSaves(): Promise<SentSave[]> {
  sending ??= sendAll().finally(() => {
    sending = null;
  });
  return sending;
}

async function sendAll(): Promise<SentSave[]> {
  const sent: SentSave[] = [];
  for (const save of await queuedSaves()) {
    if (save.refused) continue;
    let res: Response;
    try {
      res = await fetch("/api/members", {
        method: "POST",
        headers: { "content-type": "application/json", "idempotency-key": save.key },
        body: JSON.stringify(save.body),
        signal: AbortSignal.timeout(20_000),
      });
    } catch {
      break; // no signal yet: try again later, same key
    }
    if (res.ok) {
      const response = (await res.json()) as SavedMemberResponse;
      await forgetSave(save.key);
      sent.push({ save, response, recheck: save.phoneAnswer ? recheck(save.phoneAnswer, response) : null });
      continue;
    }
    // signed out, a server or database hiccup, too many requests: the save waits for the next try
    if (res.status === 401 || res.status === 408 || res.status === 429 || res.status >= 500) continue;
    const data = (await res.json().catch(() => null)) as { error?: string; issues?: { message: string }[] } | null;
    const why = data?.issues?.length ? data.issues.map((i) => i.message).join("; ") : (data?.error ?? `The server answered ${res.status}`);
    await update<QueuedSave>(save.key, (v) => ({ ...(v ?? save), refused: why }), queueStore());
    announce();
  }
  return sent;
}
