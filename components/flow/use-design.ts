"use client";

import { useEffect, useState } from "react";
import useSWR from "swr";
import type { SizeOutput } from "@/lib/solver/design/size";
import { sizeRequest } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";
import type { TablesStamp } from "@/lib/offline/answers";
import { readPhoneTables, refreshPhoneTables } from "@/components/offline/phone-tables";
import { useOnline } from "@/components/ui/use-online";

/** A refusal from the design routes: the field-level issues of a 400, or why the request failed. */
export class DesignRequestError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly issues: { path: string; message: string }[] = [],
  ) {
    super(message);
  }
}

async function postJson<T>(url: string, body: string): Promise<T> {
  let res: Response;
  try {
    // a signal that connects but never answers counts as none after 12 s
    res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body, signal: AbortSignal.timeout(12_000) });
  } catch {
    throw new DesignRequestError(0, "No connection: your inputs are kept, and the answer comes back when you are online again.");
  }
  const data: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    const record = (data ?? {}) as { error?: unknown; message?: unknown; issues?: unknown };
    const issues = Array.isArray(record.issues) ? (record.issues as { path: string; message: string }[]) : [];
    const message = typeof record.message === "string" ? record.message : typeof record.error === "string" ? record.error : `The server answered ${res.status}`;
    throw new DesignRequestError(res.status, message, issues);
  }
  return data as T;
}

/** The value, once it has stopped changing for `ms` milliseconds. */
export function useDebounced<T>(value: T, ms: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(timer);
  }, [value, ms]);
  return settled;
}

/**
 * A size answer and where it was worked out: `onPhone` null = the server; a stamp = on this phone, with those
 * tables. `stamp` names the tables used when known; `replaced` is the phone's answer to the same request that
 * this server answer replaces (the server's recheck of it), else null.
 */
export type SizeAnswer = SizeOutput & { onPhone: TablesStamp | null; stamp: TablesStamp | null; replaced: SizeAnswer | null };

/** Says a refusal is the lost connection (the phone then works the answer out itself). */
export function isNoConnection(err: unknown): boolean {
  return err instanceof DesignRequestError && err.status === 0;
}

/**
 * Sizes on the server; with no connection, on this phone: the same sizeMember the server runs (loaded only
 * then), with the tables kept here. An answer from the server also keeps the phone's tables current.
 */
async function sizeAnywhere(url: string, body: string): Promise<SizeAnswer> {
  try {
    const out = await postJson<SizeOutput>(url, body);
    // the version the server sized with, named in full (fetched once when it is new to this phone)
    const kept = await refreshPhoneTables(out.tables).catch(() => null);
    // kept (a second server answer, on reconnect, still shows the recheck); the phone's answers to other requests
    // stay too: on reconnect the server may answer an earlier request first, and clearing them then lost this
    // request's recheck. At most 24 are kept (below).
    const replaced = phoneAnswers.get(body) ?? null;
    return { ...out, onPhone: null, stamp: kept?.stamp.id === out.tables ? kept.stamp : null, replaced };
  } catch (err) {
    if (!isNoConnection(err)) throw err;
    const kept = await readPhoneTables();
    if (!kept) {
      throw new DesignRequestError(
        0,
        "No signal, and this phone does not hold the material tables yet: open Spanlark once with a signal and it keeps them for next time. Your inputs are kept.",
      );
    }
    const { sizeMember, DesignInputError } = await import("@/lib/solver/design");
    let answer: SizeAnswer;
    try {
      answer = { ...sizeMember(JSON.parse(body), kept.tables), onPhone: kept.stamp, stamp: kept.stamp, replaced: null };
    } catch (designErr) {
      if (designErr instanceof DesignInputError) throw new DesignRequestError(400, "invalid input", designErr.issues);
      throw designErr;
    }
    phoneAnswers.delete(body);
    phoneAnswers.set(body, answer);
    // a long spell with no signal: keep the latest few requests' answers
    for (const key of phoneAnswers.keys()) if (phoneAnswers.size > 24) phoneAnswers.delete(key);
    return answer;
  }
}

/**
 * The phone's answers by request, until the server has answered another one. Shared by every useSize on the
 * page: requests are shared too (the answer beside the inputs and the answer step ask the same one).
 */
const phoneAnswers = new Map<string, SizeAnswer>();

const SWR_OPTIONS = {
  keepPreviousData: true,
  revalidateOnFocus: false,
  revalidateOnReconnect: true,
  shouldRetryOnError: false,
  dedupingInterval: 10_000,
  // an answer worked out on the phone is sent to the server again every 20 s until the server has checked it
  refreshInterval: (data: SizeAnswer | undefined) => (data?.onPhone ? 20_000 : 0),
} as const;

/**
 * The sizing search for the flow's state (POST /api/size), 250 ms after the last change: one request
 * per edit, answering with the members that pass and the whole check (diagrams, answer line) of each.
 * With no connection the phone works it out (`onPhone`), and the server is asked again once the signal is back.
 */
export function useSize(state: FlowState) {
  const body = useDebounced(JSON.stringify(sizeRequest(state)), 250);
  const swr = useSWR<SizeAnswer, DesignRequestError>(["/api/size", body], ([url, b]: [string, string]) => sizeAnywhere(url, b), SWR_OPTIONS);
  const online = useOnline();
  const { mutate, data } = swr;

  // back online with an answer from the phone: ask the server at once
  useEffect(() => {
    if (online && data?.onPhone) void mutate();
  }, [online, data?.onPhone, mutate]);

  return swr;
}
