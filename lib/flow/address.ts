/**
 * The flow's place in the address bar and local storage, written: `/size?step=loads&s=…` holds the state as
 * JSON in base64url (UTF-8 safe). No schema here, so the flow's first screen carries no validation library;
 * reading a state back (./url.ts) checks it with the flow's zod schema.
 */
import { FLOW_STEPS, MEMBER_KINDS, type FlowLocation, type FlowState, type FlowStepId, type MemberKind } from "./state";

export const STORAGE_KEY = "spanlark.flow.v1";

function toBase64Url(bytes: Uint8Array): string {
  let binary = "";
  for (const b of bytes) binary += String.fromCharCode(b);
  return btoa(binary).replace(/\+/g, "-").replace(/\//g, "_").replace(/=+$/, "");
}

export function encodeFlowState(state: FlowState): string {
  return toBase64Url(new TextEncoder().encode(JSON.stringify(state)));
}

export function isMemberKind(value: string | null | undefined): value is MemberKind {
  return typeof value === "string" && (MEMBER_KINDS as readonly string[]).includes(value);
}

export function isStep(value: string | null | undefined): value is FlowStepId {
  return typeof value === "string" && (FLOW_STEPS as readonly string[]).includes(value);
}

/** The flow's query string for a location, plus any job/member being edited. */
export function flowSearch(location: FlowLocation, extra: { job?: string; member?: string; for?: string } = {}): string {
  const params = new URLSearchParams();
  if (extra.job) params.set("job", extra.job);
  if (extra.member) params.set("member", extra.member);
  if (extra.for) params.set("for", extra.for);
  params.set("step", location.step);
  params.set("s", encodeFlowState(location.state));
  return `?${params.toString()}`;
}

export function storeLocation(location: FlowLocation): string {
  return JSON.stringify({ step: location.step, state: location.state });
}
