/**
 * The crew's member schedule: one row per member, in the job's order, read from the answer saved with
 * each member (Member.resultSummary), so the crew sees the numbers the builder saw. Pure.
 */
import { formatFeetInches, formatInches } from "@/lib/flow/length";
import { jobKindLabel, type JobMemberKind } from "@/lib/solver/design/kinds";
import { basisWords, changeWords, type MemberResultSummary } from "@/lib/flow/summary";
import { checkWords } from "@/lib/solver/design/check-words";
import { formatLb, supportName } from "@/lib/sheets/format";
import { ratioPercent } from "@/lib/solver/design/ratio-percent";

export interface ScheduleSupport {
  name: string;
  /** "2,671 lb down" (and uplift when there is one) */
  reaction: string;
  /** "2 jack studs" or "3" bearing (needs 15/16")" */
  bearing: string;
}

export interface ScheduleRow {
  id: string;
  label: string;
  kindLabel: string;
  /** "3-ply 2x12 No.2 — 2 jack studs each end", or null when no size is chosen */
  headline: string | null;
  memberLabel: string | null;
  /** "10' 0"" and, with overhangs, the whole length */
  span: string;
  supports: ScheduleSupport[];
  /** "OK 64% (bending)" or a warning */
  verdict: { pass: boolean; words: string } | null;
  /** the load basis and assumptions the crew must know, as the answer screen said them */
  facts: string[];
  /** the loads other members put on this one, each saying where it comes from */
  carried: string[];
  /** "Changed since you last looked: now 3-ply 2x12 No.2 (was 2-ply 2x12 No.2) — J1 deck joists changed" */
  change: string | null;
  /** why it fails, in words */
  problems: string[];
}

export interface ScheduleMemberSource {
  id: string;
  label: string;
  kind: JobMemberKind;
  resultSummary: MemberResultSummary | null;
}

export function scheduleRow(m: ScheduleMemberSource): ScheduleRow {
  const s = m.resultSummary;
  if (!s) {
    return {
      id: m.id,
      label: m.label,
      kindLabel: jobKindLabel(m.kind),
      headline: null,
      memberLabel: null,
      span: "—",
      supports: [],
      verdict: null,
      facts: [],
      carried: [],
      change: null,
      problems: [],
    };
  }
  const overhang = Math.abs(s.lengthFt - s.spanFt) > 1 / 192;
  const span =
    m.kind === "post"
      ? `${formatFeetInches(s.spanFt)} tall`
      : m.kind === "footing"
        ? "—"
        : overhang
          ? `${formatFeetInches(s.spanFt)} (member ${formatFeetInches(s.lengthFt)} long)`
          : formatFeetInches(s.spanFt);
  const supports = s.reactions.map((r, i) => {
    if (m.kind === "post") return { name: `Post ${i + 1}`, reaction: `${formatLb(r.maxDown)} down`, bearing: "onto its footing" };
    const reaction = r.uplift > 0 ? `${formatLb(r.maxDown)} down, ${formatLb(r.uplift)} uplift` : `${formatLb(r.maxDown)} down`;
    const bearing =
      r.jackStuds !== null
        ? `${r.jackStuds} jack stud${r.jackStuds === 1 ? "" : "s"}`
        : `${formatInches(r.bearing)} bearing (needs ${formatInches(Math.max(r.requiredBearing, 0))})`;
    return { name: supportName(i, s.reactions.length, r.x), reaction, bearing };
  });
  const pct = `${ratioPercent(s.ratio, s.pass)}%`;
  return {
    id: m.id,
    label: m.label,
    kindLabel: jobKindLabel(m.kind),
    headline: s.headline,
    memberLabel: s.memberLabel,
    span,
    supports,
    verdict: { pass: s.pass, words: s.pass ? `OK ${pct}${s.governing ? `, ${checkWords(s.governing)} governs` : ""}` : `Over ${pct}: do not build this` },
    // answers saved before the basis was recorded were worked on ASCE 7-22
    facts: s.facts ?? [basisWords(s.loadStandard ?? "ASCE 7-22", true)],
    carried: (s.carried ?? []).map((c) => c.words),
    change: changeWords(s),
    problems: s.problems ?? [],
  };
}
