/**
 * The flow's state in the address bar (`/size?step=loads&s=…`) and in local storage, so a reload,
 * a shared link or a dropped connection loses nothing. The state is JSON in base64url (UTF-8 safe).
 */
import { defaultFlowState } from "./defaults";
import { parseFlowState } from "./schema";
import { isMemberKind, isStep } from "./address";
import type { FlowLocation, FlowState } from "./state";

export { encodeFlowState, flowSearch, isMemberKind, isStep, STORAGE_KEY, storeLocation } from "./address";

function fromBase64Url(text: string): Uint8Array | null {
  if (!/^[A-Za-z0-9_-]*$/.test(text)) return null;
  const padded = text.replace(/-/g, "+").replace(/_/g, "/") + "===".slice((text.length + 3) % 4);
  try {
    const binary = atob(padded);
    const bytes = new Uint8Array(binary.length);
    for (let i = 0; i < binary.length; i++) bytes[i] = binary.charCodeAt(i);
    return bytes;
  } catch {
    return null;
  }
}

/** The state in an `s=` parameter; null when it is missing, garbled or does not fit the schema. */
export function decodeFlowState(text: string | null | undefined): FlowState | null {
  if (!text) return null;
  const bytes = fromBase64Url(text);
  if (!bytes) return null;
  try {
    return parseFlowState(JSON.parse(new TextDecoder("utf-8", { fatal: true }).decode(bytes)));
  } catch {
    return null;
  }
}

export interface FlowStart {
  location: FlowLocation;
  /** where the state came from, for a short note ("Picked up where you left off") */
  from: "url" | "storage" | "kind" | "saved" | "new";
}

/**
 * Where the flow starts, in order: a state in the URL; `?kind=` from the home page (resuming the
 * stored state when it is the same kind, else that kind's defaults, at the span step); the stored
 * state; else a new floor joist at the first step.
 */
export function resolveFlowStart(params: { s?: string | null; step?: string | null; kind?: string | null }, stored: string | null): FlowStart {
  const step = isStep(params.step) ? params.step : null;
  const fromUrl = decodeFlowState(params.s);
  if (fromUrl) return { location: { state: fromUrl, step: step ?? "span" }, from: "url" };

  const storedLocation = readStoredLocation(stored);
  if (isMemberKind(params.kind)) {
    if (storedLocation && storedLocation.state.kind === params.kind)
      return { location: { ...storedLocation, step: step ?? storedLocation.step }, from: "storage" };
    return { location: { state: defaultFlowState(params.kind), step: step ?? "span" }, from: "kind" };
  }
  if (storedLocation) return { location: { ...storedLocation, step: step ?? storedLocation.step }, from: "storage" };
  return { location: { state: defaultFlowState("floor-joist"), step: "kind" }, from: "new" };
}

export function readStoredLocation(stored: string | null): FlowLocation | null {
  if (!stored) return null;
  try {
    const raw: unknown = JSON.parse(stored);
    if (typeof raw !== "object" || raw === null) return null;
    const record = raw as { step?: unknown; state?: unknown };
    const state = parseFlowState(record.state);
    if (!state) return null;
    const step = typeof record.step === "string" && isStep(record.step) ? record.step : "span";
    return { state, step };
  } catch {
    return null;
  }
}
