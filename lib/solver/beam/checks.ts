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

/**
 * Checks that depend on more than one field (positions against the length, from < to, repeated
 * supports). Shared by the zod schema and by analyzeBeam, so both give the same words.
 * Assumes the scalar fields have their types; reports non-finite numbers too.
 */
export function geometryIssues(input: BeamInput): InputIssue[] {
  const issues: InputIssue[] = [];
  const L = input.length;
  if (!finite(L) || L <= 0) {
    issues.push({ path: "length", message: "must be a number greater than 0 (ft)" });
    return issues;
  }
  if (L > LIMITS.maxLengthFt) issues.push({ path: "length", message: `must be at most ${LIMITS.maxLengthFt} ft` });
  if (!finite(input.E) || input.E <= 0) issues.push({ path: "E", message: "must be a number greater than 0 (psi)" });
  if (!finite(input.I) || input.I <= 0) issues.push({ path: "I", message: "must be a number greater than 0 (in^4)" });
  const range = `between 0 and ${formatFt(L)} ft`;
  if (input.supports.length > LIMITS.maxSupports) {
    issues.push({ path: "supports", message: `at most ${LIMITS.maxSupports} supports` });
  }
  const seen: number[] = [];
  input.supports.forEach((s, i) => {
    if (!finite(s.x)) issues.push({ path: `supports.${i}.x`, message: "must be a finite number (ft)" });
    else if (!onMember(s.x, L)) issues.push({ path: `supports.${i}.x`, message: `must be on the member, ${range} (got ${formatFt(s.x)})` });
    else {
      const j = seen.findIndex((x) => Math.abs(x - s.x) <= SAME_POINT * L);
      if (j >= 0) issues.push({ path: `supports.${i}.x`, message: `another support (supports.${j}) is already at x = ${formatFt(s.x)} ft` });
    }
    seen.push(finite(s.x) ? s.x : Number.NaN);
    if (s.type !== "pin" && s.type !== "roller" && s.type !== "fixed") {
      issues.push({ path: `supports.${i}.type`, message: 'must be "pin", "roller" or "fixed"' });
    }
  });
  if (input.loads.length > LIMITS.maxLoads) issues.push({ path: "loads", message: `at most ${LIMITS.maxLoads} loads` });
  input.loads.forEach((ld, i) => {
    const p = `loads.${i}`;
    const num = (key: string, v: unknown, unit: string) => {
      if (!finite(v)) issues.push({ path: `${p}.${key}`, message: `must be a finite number (${unit})` });
    };
    if (ld.type === "point" || ld.type === "moment") {
      if (!finite(ld.x)) issues.push({ path: `${p}.x`, message: "must be a finite number (ft)" });
      else if (!onMember(ld.x, L)) issues.push({ path: `${p}.x`, message: `must be on the member, ${range} (got ${formatFt(ld.x)})` });
      if (ld.type === "point") num("P", ld.P, "lb");
      else num("M", ld.M, "lb-ft");
    } else {
      const okFrom = finite(ld.from);
      const okTo = finite(ld.to);
      if (!okFrom) issues.push({ path: `${p}.from`, message: "must be a finite number (ft)" });
      else if (!onMember(ld.from, L)) issues.push({ path: `${p}.from`, message: `must be on the member, ${range} (got ${formatFt(ld.from)})` });
      if (!okTo) issues.push({ path: `${p}.to`, message: "must be a finite number (ft)" });
      else if (!onMember(ld.to, L)) issues.push({ path: `${p}.to`, message: `must be on the member, ${range} (got ${formatFt(ld.to)})` });
      if (okFrom && okTo && !(ld.to - ld.from > SAME_POINT * L)) {
        issues.push({ path: `${p}.to`, message: `must be greater than from (${formatFt(ld.from)} ft)` });
      }
      if (ld.type === "udl") num("w", ld.w, "plf");
      else {
        num("w1", ld.w1, "plf");
        num("w2", ld.w2, "plf");
      }
    }
  });
  if (input.at) {
    if (input.at.length > LIMITS.maxStations) issues.push({ path: "at", message: `at most ${LIMITS.maxStations} stations` });
    input.at.forEach((x, i) => {
      if (!finite(x)) issues.push({ path: `at.${i}`, message: "must be a finite number (ft)" });
      else if (!onMember(x, L)) issues.push({ path: `at.${i}`, message: `must be on the member, ${range} (got ${formatFt(x)})` });
    });
  }
  return issues;
}
