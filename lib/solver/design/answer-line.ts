/**
 * The answer line: what to build and what each support needs, in the words the crew uses
 * ("3-ply 2x12 No.2 — 2 jack studs each end"). One function for the routes, the CLI, the answer
 * screen, the crew link and the job sheet, so they agree word for word. What the supports need
 * follows the kind of member:
 * - a header, or a beam bearing on a stud wall: jack studs under each end (1-1/2 in each);
 * - floor and deck joists, rafters: the bearing on the plate, beam or hanger;
 * - a deck beam: the bearing on each post;
 * - a beam on posts or walls (no stud wall given): the bearing at each support.
 * Without a kind, members at a spacing read as joists and the rest as beams.
 */
import { formatInches } from "../lengths";
import type { MemberKind } from "./kinds";
import type { MemberSpec } from "./schema";

/** How the plies of a built-up header go together, when the input says. */
export interface AnswerAssembly {
  plies: number;
  /** thickness of each spacer between plies, in (0 = none) */
  spacerIn: number;
  /** how many spacers (default 1 when spacerIn > 0) */
  spacers?: number;
}

/** What a support needs, as the answer line reads it. */
export interface SupportNeed {
  /** 1-1/2 in jack studs under a member's end, null where they do not apply (interior support, steel not in a stud wall) */
  jackStuds: number | null;
  /** bearing length the member needs here, in */
  requiredBearing: number;
  /** bearing length the check used here, in */
  bearing?: number;
  /** cold-formed steel: this support needs a bearing stiffener */
  bearingStiffener?: boolean;
}

export interface AnswerLineInput {
  spec: MemberSpec;
  /** the member's full label, e.g. "3-ply 2x12 Douglas Fir-Larch No.2" */
  label: string;
  kind?: MemberKind;
  /** joists and rafters: spacing on center, in */
  spacingIn?: number;
  /** a beam in a stud wall (the input names the wall framing) */
  inStudWall?: boolean;
  assembly?: AnswerAssembly | null;
  supports: readonly SupportNeed[];
}

/** The member as a builder says it: "3-ply 2x12 No.2", "W8x18", "1-3/4 x 11-7/8 LVL 2.0E", "11-7/8 in PRI-40". */
export function shortLabel(spec: MemberSpec, fullLabel: string): string {
  if (spec.material === "sawn") return `${spec.plies > 1 ? `${spec.plies}-ply ` : ""}${spec.size} ${spec.grade}`;
  if (spec.material === "steel") return spec.shape;
  if (spec.material === "cfs") return spec.assembly === "single" ? spec.section : `2-${spec.section} ${spec.assembly === "box" ? "box" : "back-to-back"}`;
  if (spec.material === "ijoist") {
    // "PRI-40 11-7/8" → "11-7/8 in PRI-40", as a framer orders it
    const [series, ...depth] = spec.joist.split(" ");
    return `${depth.length > 0 ? `${depth.join(" ")} in ` : ""}${series}${spec.stiffeners ? " with web stiffeners" : ""}`;
  }
  return fullLabel;
}

type Bearing = "studs" | "joist" | "post" | "support";

/** What the supports of this kind of member are described by. */
export function bearingRule(kind: MemberKind | undefined, spacingIn: number | undefined, inStudWall = false): Bearing {
  switch (kind ?? (spacingIn !== undefined ? "floor-joist" : "beam")) {
    case "header":
      return "studs";
    case "beam":
      return inStudWall ? "studs" : "support";
    case "deck-beam":
      return "post";
    default:
      return "joist";
  }
}

/** Whether jack studs are what the crew builds under this member's ends. */
export function jackStudsApply(kind: MemberKind | undefined, spacingIn: number | undefined, inStudWall = false): boolean {
  return bearingRule(kind, spacingIn, inStudWall) === "studs";
}

const SPACER_COUNT: Readonly<Record<number, string>> = { 2: "two", 3: "three" };

const studs = (n: number) => `${n} jack stud${n === 1 ? "" : "s"}`;

// The bearing the check used, or more where the member needs more; never less than 1-1/2 in, the least
// bearing IRC 2021 R502.6 allows for joists and beams on wood or metal.
const bearingNeeded = (supports: readonly SupportNeed[]) => formatInches(Math.max(1.5, ...supports.map((s) => Math.max(s.requiredBearing, s.bearing ?? 0))));

/**
 * What the supports need in words: "2 jack studs each end", "2 jack studs at support 1, 3 jack studs
 * at support 2", "1-1/2" bearing each end on the plate, beam or hanger", "3" bearing on each post".
 * "each end" only for a member on two supports, "at each support" on three or more.
 */
export function supportWords(supports: readonly SupportNeed[], rule: Bearing = "support"): string {
  if (supports.length === 0) return "";
  const where = supports.length === 2 ? "each end" : supports.length === 1 ? "at the support" : "at each support";
  const counts = supports.map((s) => s.jackStuds);
  if (rule === "studs" && counts.every((c): c is number => c !== null)) {
    if (counts.every((c) => c === counts[0])) return `${studs(counts[0])} ${where}`;
    return counts.map((c, i) => `${studs(c)} at support ${i + 1}`).join(", ");
  }
  const need = bearingNeeded(supports);
  if (rule === "joist") return `${need} bearing ${where} on the plate, beam or hanger`;
  if (rule === "post") return `${need} bearing on ${supports.length === 1 ? "the post" : "each post"}`;
  return `${need} bearing ${where}`;
}

/**
 * Cold-formed steel: where bearing stiffeners go, as the trade writes it: ", bearing stiffeners at the
 * supports" (every support), ", bearing stiffener at support 2", ", bearing stiffeners at supports 1 and 3".
 */
export function stiffenerWords(supports: readonly SupportNeed[]): string {
  const at = supports.map((s, i) => (s.bearingStiffener ? i + 1 : 0)).filter((i) => i > 0);
  if (at.length === 0) return "";
  if (at.length === supports.length) return at.length === 1 ? ", bearing stiffener at the support" : ", bearing stiffeners at the supports";
  if (at.length === 1) return `, bearing stiffener at support ${at[0]}`;
  return `, bearing stiffeners at supports ${at.slice(0, -1).join(", ")} and ${at[at.length - 1]}`;
}

/** The answer line: "2x10 No.2 at 16 in o.c. — 1-1/2" bearing each end on the plate, beam or hanger". */
export function answerLine(a: AnswerLineInput): string {
  const spacing = a.spacingIn !== undefined ? ` at ${Math.round(a.spacingIn * 100) / 100} in o.c.` : "";
  const n = a.assembly?.spacers ?? 1;
  const spacer =
    a.assembly && a.assembly.plies > 1 && a.assembly.spacerIn > 0 && n > 0
      ? ` with ${n === 1 ? "" : `${SPACER_COUNT[n] ?? n} `}${formatInches(a.assembly.spacerIn)} spacer${n === 1 ? "" : "s"}`
      : "";
  const name = `${shortLabel(a.spec, a.label)}${spacer}${spacing}${stiffenerWords(a.supports)}`;
  const words = supportWords(a.supports, bearingRule(a.kind, a.spacingIn, a.inStudWall));
  return words ? `${name} — ${words}` : name;
}
