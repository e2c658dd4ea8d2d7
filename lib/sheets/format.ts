/**
 * How the crew page, the printable sheet and the PDF write numbers: one place, so all three round the
 * same way. Pure.
 */
import { formatFeetInches } from "@/lib/flow/length";
import { ratioPercent as percentOf } from "@/lib/solver/design/ratio-percent";

/** 0.6373 → "64%", 0.996 → "99.6%", 1.004 → "100.4%" (lib/solver/design/ratio-percent.ts: never 100% for a near pass, never 100% or less for a failure) */
export function ratioPercent(ratio: number, pass: boolean = ratio <= 1): string {
  return `${percentOf(ratio, pass)}%`;
}

/** 2671.4 → "2,671 lb" */
export function formatLb(lb: number): string {
  return `${Math.round(lb).toLocaleString("en-US")} lb`;
}

/** A demand or capacity with its unit, to a sensible precision for that unit. */
export function formatCheckValue(value: number, unit: string): string {
  if (!Number.isFinite(value)) return "—";
  let digits: number;
  if (unit === "in") digits = 3;
  else if (unit === "kip" || unit === "kip-ft" || unit === "ksi") digits = 2;
  else digits = Math.abs(value) >= 100 ? 0 : 1;
  return `${value.toLocaleString("en-US", { minimumFractionDigits: digits, maximumFractionDigits: digits })} ${unit}`;
}

/** "1 Dec 2026" in UTC, so the date does not move with the reader's time zone. */
export function formatSheetDate(iso: string): string {
  return new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric", timeZone: "UTC" });
}

/** "1 Dec 2026, 22:31 UTC": tells apart two sheets saved the same day. */
export function formatSheetDateTime(iso: string): string {
  const time = new Date(iso).toLocaleTimeString("en-GB", { hour: "2-digit", minute: "2-digit", timeZone: "UTC" });
  return `${formatSheetDate(iso)}, ${time} UTC`;
}

/** "Left end", "Right end", or "Support 2 at 8' 0"" for the ones between. */
export function supportName(index: number, count: number, x: number): string {
  if (count === 2) return index === 0 ? "Left end" : "Right end";
  return `Support ${index + 1} at ${formatFeetInches(x)}`;
}

/** Unfactored reaction by load case: "D 1,371 lb, Lr 1,300 lb, S 1,365 lb". */
export function byCaseWords(byCase: Partial<Record<string, number>>): string {
  const parts = Object.entries(byCase)
    .filter((e): e is [string, number] => typeof e[1] === "number" && Math.abs(e[1]) >= 0.5)
    .map(([k, v]) => `${k} ${formatLb(v)}`);
  return parts.length > 0 ? parts.join(", ") : "—";
}
