"use client";

import { recheck, type Recheck } from "@/lib/offline/answers";
import { SYNC_TAG, markSentSeen, putQueued, readQueue, readSent, removeQueued, sendQueue, type QueuedSave, type SentRecord } from "@/lib/offline/queue";

export type { QueuedSave, SentRecord } from "@/lib/offline/queue";

/**
 * The page's side of the queue of saves and changes made with no signal (lib/offline/queue.ts): queues them,
 * asks the service worker to send them by Background Sync where the browser has it (even with no Spanlark page
 * open), sends them itself while a page is open (every browser), and tells the page when anything changed
 * (here, or in the worker: it posts QUEUE_CHANGED).
 */

const CHANGED = "spanlark:save-queue";
let sending: Promise<boolean> | null = null;

function announce(): void {
  window.dispatchEvent(new Event(CHANGED));
}

/** Calls `listener` whenever an item is queued, sent or refused, by this page or by the service worker; returns the unsubscribe. */
export function onQueueChange(listener: () => void): () => void {
  const fromWorker = (event: MessageEvent) => {
    if ((event.data as { type?: unknown } | null)?.type === "QUEUE_CHANGED") listener();
  };
  window.addEventListener(CHANGED, listener);
  navigator.serviceWorker?.addEventListener("message", fromWorker);
  return () => {
    window.removeEventListener(CHANGED, listener);
    navigator.serviceWorker?.removeEventListener("message", fromWorker);
  };
}

type SyncRegistration = ServiceWorkerRegistration & { sync?: { register: (tag: string) => Promise<void> } };

/** Asks the service worker to send the queue when the signal is back, page open or not (Background Sync; a no-op without it). */
async function askWorkerToSend(): Promise<void> {
  if (!("serviceWorker" in navigator) || !navigator.serviceWorker.controller) return;
  try {
    const registration = (await navigator.serviceWorker.ready) as SyncRegistration;
    await registration.sync?.register(SYNC_TAG);
  } catch {
    // no Background Sync here (or refused): the open page sends it
  }
}

/** Dismisses a note about a waiting item (`dismiss`) once it has left the queue: sent, settled or discarded. */
export function whenUnqueued(key: string, dismiss: () => void): void {
  const stop = onQueueChange(() => {
    void queuedSaves().then((waiting) => {
      if (waiting.some((s) => s.key === key)) return;
      stop();
      dismiss();
    });
  });
  // the note goes by itself in seconds: listen no longer than it can show
  setTimeout(stop, 60_000);
}

export async function queueSave(save: QueuedSave): Promise<void> {
  await putQueued(save);
  announce();
  await askWorkerToSend();
}

export async function queuedSaves(): Promise<QueuedSave[]> {
  return readQueue();
}

export async function sentSaves(): Promise<SentRecord[]> {
  return readSent();
}

export async function forgetSave(key: string): Promise<void> {
  await removeQueued(key);
  announce();
}

export async function dismissSent(key: string): Promise<void> {
  await markSentSeen(key);
  announce();
}

/** The builder keeps their change over the member as it is now: queued again on its current version, under a new key. */
export async function sendMineAnyway(save: QueuedSave): Promise<void> {
  if (!save.conflict) return;
  const again: QueuedSave = {
    ...save,
    key: crypto.randomUUID(),
    body: { ...save.body, baseVersion: save.conflict.version },
    base: save.conflict.current,
    conflict: undefined,
    refused: undefined,
    queuedAt: new Date().toISOString(),
  };
  await putQueued(again);
  await removeQueued(save.key);
  announce();
  await askWorkerToSend();
}

/** The server's recheck of a sent item's phone answer; null when the phone had none. */
export function recheckOf(record: SentRecord): Recheck | null {
  return record.phoneAnswer ? recheck(record.phoneAnswer, record.response) : null;
}

/** Sends every waiting item once (one sender at a time per page); answers whether anything changed (sent, refused, in conflict). */
export function sendQueuedSaves(): Promise<boolean> {
  sending ??= sendQueue("page")
    .then((outcome) => {
      if (outcome.changed) announce();
      return outcome.changed;
    })
    .finally(() => {
      sending = null;
    });
  return sending;
}

/** Calls `listener` when the service worker sent or settled queued items (the page should read the server again). */
export function onWorkerSent(listener: () => void): () => void {
  const fromWorker = (event: MessageEvent) => {
    if ((event.data as { type?: unknown } | null)?.type === "QUEUE_CHANGED") listener();
  };
  navigator.serviceWorker?.addEventListener("message", fromWorker);
  return () => navigator.serviceWorker?.removeEventListener("message", fromWorker);
}
