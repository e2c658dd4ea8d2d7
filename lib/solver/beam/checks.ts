import type { BeamInput } from "../types";
import { formatFt, type InputIssue } from "./errors";

/** Contract limits (issue 3): the member and its loads. */
export const LIMITS = {
  maxLengthFt: 200,
  maxSupports: 20,
  maxLoads: 200,
  maxStations: 1000,
} as const;

/** Two positions closer than this fraction of the length are the same point. */
export const SAME_POINT = 1e-9;

function onMember(x: number, length: number): boolean {
  return x >= 0 && x <= length;
}

function finite(v: unknown): v is number {
  return typeof v === "number" && Number.isFinite(v);
}

// Paths are built only when there is something to report: this runs on every analysis.
function needFinite(issues: InputIssue[], list: string, i: number, key: string, v: unknown, unit: string): void {
  if (!finite(v)) issues.push({ path: `${list}.${i}.${key}`, message: `must be a finite number (${unit})` });
}

function onMemberIssue(issues: InputIssue[], list: string, i: number, key: string, x: unknown, L: number): boolean {
  if (finite(x) && onMember(x, L)) return true;
  const path = key ? `${list}.${i}.${key}` : `${list}.${i}`;
  if (!finite(x)) issues.push({ path, message: "must be a finite number (ft)" });
  else issues.push({ path, message: `must be on the member, between 0 and ${formatFt(L)} ft (got ${formatFt(x)})` });
  return false;
}

/**
 * Checks that depend on more than one field (positions against the length, from < to, repeated
 * supports). Shared by the zod schema and by analyzeBeam, so both give the same words.
 * Assumes the scalar fields have their types; reports non-finite numbers too.
 */
export function geometryIssues(input: BeamInput, maxLoads: number = LIMITS.maxLoads): InputIssue[] {
  const issues: InputIssue[] = [];
  const L = input.length;
  if (!finite(L) || L <= 0) {
    issues.push({ path: "length", message: "must be a number greater than 0 (ft)" });
    return issues;
  }
  if (L > LIMITS.maxLengthFt) issues.push({ path: "length", message: `must be at most ${LIMITS.maxLengthFt} ft` });
  if (!finite(input.E) || input.E <= 0) issues.push({ path: "E", message: "must be a number greater than 0 (psi)" });
  if (!finite(input.I) || input.I <= 0) issues.push({ path: "I", message: "must be a number greater than 0 (in^4)" });
  const sup = input.supports;
  if (sup.length > LIMITS.maxSupports) issues.push({ path: "supports", message: `at most ${LIMITS.maxSupports} supports` });
  for (let i = 0; i < sup.length; i++) {
    const s = sup[i];
    if (onMemberIssue(issues, "supports", i, "x", s.x, L)) {
      for (let j = 0; j < i; j++) {
        if (Math.abs(sup[j].x - s.x) <= SAME_POINT * L) {
          issues.push({ path: `supports.${i}.x`, message: `another support (supports.${j}) is already at x = ${formatFt(s.x)} ft` });
          break;
        }
      }
    }
    if (s.type !== "pin" && s.type !== "roller" && s.type !== "fixed") {
      issues.push({ path: `supports.${i}.type`, message: 'must be "pin", "roller" or "fixed"' });
    }
  }
  const loads = input.loads;
  if (loads.length > maxLoads) issues.push({ path: "loads", message: `at most ${maxLoads} loads` });
  for (let i = 0; i < loads.length; i++) {
    const ld = loads[i];
    if (ld.type === "point" || ld.type === "moment") {
      onMemberIssue(issues, "loads", i, "x", ld.x, L);
      if (ld.type === "point") needFinite(issues, "loads", i, "P", ld.P, "lb");
      else needFinite(issues, "loads", i, "M", ld.M, "lb-ft");
    } else if (ld.type === "udl" || ld.type === "linear") {
      const okFrom = onMemberIssue(issues, "loads", i, "from", ld.from, L);
      const okTo = onMemberIssue(issues, "loads", i, "to", ld.to, L);
      if (okFrom && okTo && !(ld.to - ld.from > SAME_POINT * L)) {
        issues.push({ path: `loads.${i}.to`, message: `must be greater than from (${formatFt(ld.from)} ft)` });
      }
      if (ld.type === "udl") needFinite(issues, "loads", i, "w", ld.w, "plf");
      else {
        needFinite(issues, "loads", i, "w1", ld.w1, "plf");
        needFinite(issues, "loads", i, "w2", ld.w2, "plf");
      }
    } else {
      issues.push({ path: `loads.${i}.type`, message: 'must be "point", "udl", "linear" or "moment"' });
    }
  }
  const at = input.at;
  if (at) {
    if (at.length > LIMITS.maxStations) issues.push({ path: "at", message: `at most ${LIMITS.maxStations} stations` });
    for (let i = 0; i < at.length; i++) onMemberIssue(issues, "at", i, "", at[i], L);
  }
  return issues;
}
