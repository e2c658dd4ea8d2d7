"use client";

import { useEffect, useRef, useState } from "react";
import useSWR from "swr";
import type { SizeOutput } from "@/lib/solver/design/size";
import { sizeRequest } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";
import { phoneWorkedOut, type PhoneWorkedOut, type TablesStamp } from "@/lib/offline/answers";
import { keepWorkedOut, rechecking } from "@/components/offline/phone-answers";
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

function delay<T>(ms: number, value: T): Promise<T> {
  return new Promise((resolve) => setTimeout(() => resolve(value), ms));
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
 * tables. `stamp` names the tables used when known; `replaced` is what the phone worked out for the same request with no
 * signal, which this server answer rechecks, else null.
 */
export type SizeAnswer = SizeOutput & { onPhone: TablesStamp | null; stamp: TablesStamp | null; replaced: PhoneWorkedOut | null };

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
    // the version the server sized with, named in full (fetched once when it is new to this phone); the answer
    // waits 2 s for it at most (then names the version by its id) and the tables go on arriving in the background
    const kept = await Promise.race([refreshPhoneTables(out.tables).catch(() => null), delay(2_000, null)]);
    // what this phone worked out for the same request with no signal, if anything: the server's answer is its
    // recheck (kept after it, so a second server answer on reconnect, or after a reload, still shows the recheck)
    const replaced = rechecking(body);
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
    keepWorkedOut(body, phoneWorkedOut(answer, kept.stamp, Date.now()));
    return answer;
  }
}

const RECHECK_FIRST_RETRY_MS = 5_000;
const RECHECK_LONGEST_WAIT_MS = 30_000;

const SWR_OPTIONS = {
  keepPreviousData: true,
  revalidateOnFocus: false,
  revalidateOnReconnect: true,
  shouldRetryOnError: false,
  dedupingInterval: 10_000,
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
  const { mutate, data, isValidating } = swr;
  const validating = useRef(isValidating);
  useEffect(() => {
    validating.current = isValidating;
  }, [isValidating]);

  // back online with an answer from the phone: ask the server at once, then again after 5, 10, 20 and every 30 s
  // while none is on its way, until the server has answered. The first request as the signal returns may be lost
  // or refused; SWR's own refreshInterval cannot do this (it reads the data only when the key changes, when an
  // answer worked out offline is not there yet).
  // (a string, so a request lost again, which answers with an equal but new phone answer, does not restart this)
  const onPhoneWith = data?.onPhone?.id ?? null;
  useEffect(() => {
    if (!online || onPhoneWith === null) return;
    let tries = 0;
    let timer: ReturnType<typeof setTimeout>;
    const later = () => {
      timer = setTimeout(again, Math.min(RECHECK_FIRST_RETRY_MS * 2 ** tries++, RECHECK_LONGEST_WAIT_MS));
    };
    const again = () => {
      if (!validating.current) void mutate();
      later();
    };
    void mutate();
    later();
    return () => clearTimeout(timer);
  }, [online, onPhoneWith, mutate]);

  return swr;
}
