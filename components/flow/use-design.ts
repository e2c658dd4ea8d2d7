"use client";

import { useEffect, useState } from "react";
import useSWR from "swr";
import type { SizeOutput } from "@/lib/solver/design/size";
import { sizeRequest } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";

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
    res = await fetch(url, { method: "POST", headers: { "content-type": "application/json" }, body });
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
 */
export function useSize(state: FlowState) {
  const body = useDebounced(JSON.stringify(sizeRequest(state)), 250);
  return useSWR<SizeOutput, DesignRequestError>(["/api/size", body], ([url, b]: [string, string]) => postJson<SizeOutput>(url, b), SWR_OPTIONS);
}
