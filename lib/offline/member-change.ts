/**
 * What changed in a saved member between the copy a phone opened and the member as it is now, in the words a
 * builder reads on the conflict message. Pure: the phone and its tests share it.
 */
import type { FlowState } from "@/lib/flow/state";
import { formatFeetInches } from "@/lib/solver/lengths";
import type { MemberSpec } from "@/lib/solver/design/schema";
import type { MemberSnapshot } from "./answers";

const same = (a: unknown, b: unknown): boolean => JSON.stringify(a ?? null) === JSON.stringify(b ?? null);

function widthWords(w: FlowState["width"]): string {
  return w.mode === "spacing" ? `${w.spacingIn} in on center` : `${formatFeetInches(w.tributaryFt)} carried width`;
}

/** The loads without where they sit (positions follow the span when it changes; the span line says so). */
function loadsApart(s: FlowState): unknown {
  const strip = <T extends object>(l: T) => Object.fromEntries(Object.entries(l).filter(([k]) => k !== "x" && k !== "from" && k !== "to"));
  return [s.areaLoads, s.pointLoads.map(strip), s.lineLoads.map(strip), s.snow];
}

function loadCount(s: FlowState): number {
  return s.areaLoads.length + s.pointLoads.length + s.lineLoads.length + (s.snow.on ? 1 : 0);
}

function specWords(spec: MemberSpec | null): string {
  if (!spec) return "the best that passes";
  const s = spec as Record<string, unknown>;
  if (typeof s.size === "string") {
    const plies = typeof s.plies === "number" && s.plies > 1 ? `${s.plies}-ply ` : "";
    return [`${plies}${s.size}`, s.grade, s.species].filter((x) => typeof x === "string" && x).join(" ");
  }
  const parts = Object.entries(s)
    .filter(([k, v]) => k !== "material" && (typeof v === "string" || typeof v === "number"))
    .map(([, v]) => String(v));
  return parts.join(" ") || spec.material;
}

/**
 * One line per thing that differs ("span: was 6′, now 10′"), the name first; an empty list when the builder's
 * inputs are the same (then only the answer was worked out again).
 */
export function memberChanges(base: MemberSnapshot, now: MemberSnapshot): string[] {
  const lines: string[] = [];
  if (base.label !== now.label) lines.push(`name: was “${base.label}”, now “${now.label}”`);
  const a = base.flowState;
  const b = now.flowState;
  if (a && b) {
    if (a.kind !== b.kind) lines.push(`kind of member: was ${a.kind}, now ${b.kind}`);
    if (a.lengthFt !== b.lengthFt) lines.push(`span: was ${formatFeetInches(a.lengthFt)}, now ${formatFeetInches(b.lengthFt)}`);
    const supportTypes = (x: FlowState) => x.supports.map((p) => p.type);
    if (!same(supportTypes(a), supportTypes(b))) lines.push(`supports: were ${a.supports.length}, now ${b.supports.length} (added, removed or changed)`);
    if (!same(a.width, b.width)) lines.push(`width: was ${widthWords(a.width)}, now ${widthWords(b.width)}`);
    if (!same(loadsApart(a), loadsApart(b))) {
      lines.push(`loads: were ${loadCount(a)}, now ${loadCount(b)} (added, removed or changed)`);
    }
    if (!same(a.material, b.material)) lines.push(`material: was ${a.material.family} ${a.material.species}, now ${b.material.family} ${b.material.species}`);
    if (!same(a.limits, b.limits)) lines.push(`deflection limits: were L/${a.limits.live}, now L/${b.limits.live} (live)`);
    if (a.bearingIn !== b.bearingIn) lines.push(`bearing length: was ${a.bearingIn} in, now ${b.bearingIn} in`);
    if (a.loadStandard !== b.loadStandard) lines.push(`load basis: was ${a.loadStandard}, now ${b.loadStandard}`);
    const known = new Set([
      "kind",
      "lengthFt",
      "supports",
      "width",
      "areaLoads",
      "pointLoads",
      "lineLoads",
      "snow",
      "material",
      "limits",
      "bearingIn",
      "loadStandard",
    ]);
    const other = Object.keys({ ...a, ...b }).filter((k) => !known.has(k) && !same((a as Record<string, unknown>)[k], (b as Record<string, unknown>)[k]));
    if (other.length > 0) lines.push(`other inputs changed (${other.join(", ")})`);
  } else if (!same(a, b)) {
    lines.push("inputs: changed");
  }
  if (!same(base.chosenMember, now.chosenMember)) lines.push(`chosen member: was ${specWords(base.chosenMember)}, now ${specWords(now.chosenMember)}`);
  return lines;
}
