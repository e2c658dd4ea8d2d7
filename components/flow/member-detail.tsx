"use client";

import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { RatioBar } from "@/components/ui/ratio-bar";
import { StatusBadge } from "@/components/ui/status-badge";
import { formatFeetInches } from "@/lib/flow/length";
import type { CheckOutput } from "@/lib/solver/design/check";
import { ratioPercent } from "@/lib/solver/design/ratio-percent";
import { citationOf } from "@/lib/tables/citations";
import { checkTitle } from "@/lib/solver/design/check-words";
import { checkDetail } from "./words";

export type MemberDetailProps = {
  open: boolean;
  check: CheckOutput | null;
  chosen: boolean;
  /** whether the crew builds jack studs under this member's ends (jackStudsUnder): otherwise the bearing alone is shown */
  jackStuds: boolean;
  onChoose: () => void;
  onClose: () => void;
};

const FACTOR_WORDS: Record<string, string> = {
  CrBasis: "Cr, why",
  incised: "Incised (Ci)",
  incisedBasis: "Incised, why",
  CD: "CD, load duration",
  lambda: "λ, time effect",
  CM: "CM, wet service",
  Ct: "Ct, temperature",
  CL: "CL, beam stability",
  CF: "CF, size",
  CV: "CV, volume",
  Cfu: "Cfu, flat use",
  Ci: "Ci, incising",
  Cr: "Cr, repetitive member",
  Cb: "Cb, bearing area",
  Kcr: "Kcr, creep",
  Fb: "Fb, reference bending (psi)",
  FbPrime: "Fb′, adjusted bending (psi)",
  Fv: "Fv, reference shear (psi)",
  FvPrime: "Fv′, adjusted shear (psi)",
  FcPerp: "Fc⊥, reference bearing (psi)",
  FcPerpPrime: "Fc⊥′, adjusted bearing (psi)",
  E: "E (psi)",
  EPrime: "E′ (psi)",
  Emin: "Emin (psi)",
  EminPrime: "Emin′ (psi)",
  Fy: "Fy (ksi)",
  Mp: "Mp (kip-ft)",
  Lp: "Lp (ft)",
  Lr: "Lr (ft)",
  Lb: "Lb, unbraced length (ft)",
  Mn: "Mn (kip-ft)",
  omegaB: "Ωb",
  phiB: "φb",
  standard: "Standard",
  EKsi: "E (ksi)",
  CbLtb: "Cb, moment gradient",
  Fn: "Fn, flexural stress (ksi)",
  Se: "Se, effective section modulus (in³)",
  Vn: "Vn, shear strength (kip)",
  Ieff: "I, effective at service (in⁴)",
  bearingStiffeners: "Bearing stiffeners at supports",
  pieces: "C-sections",
};

function fmt(v: number): string {
  if (Number.isInteger(v)) return v.toLocaleString("en-US");
  return Math.abs(v) >= 100 ? Math.round(v).toLocaleString("en-US") : String(Math.round(v * 1000) / 1000);
}

/** Every factor of the check as rows of words and figures (nested factors such as CM by property spelt out). */
export function factorRows(factors: CheckOutput["factors"]): { name: string; value: string }[] {
  const rows: { name: string; value: string }[] = [];
  for (const [key, value] of Object.entries(factors as unknown as Record<string, unknown>)) {
    // Cb is the bearing area factor in wood (NDS §3.10.4) but the moment-gradient factor in steel (AISC 360-16 §F1).
    const name = key === "Cb" && "Mp" in (factors as object) ? FACTOR_WORDS.CbLtb : (FACTOR_WORDS[key] ?? key);
    if (typeof value === "number") rows.push({ name, value: fmt(value) });
    else if (typeof value === "string") rows.push({ name, value });
    else if (typeof value === "boolean") rows.push({ name, value: value ? "yes" : "no" });
    else if (value && typeof value === "object") {
      const parts = Object.entries(value as Record<string, unknown>)
        .filter(([, v]) => typeof v === "number")
        .map(([k, v]) => `${k} ${fmt(v as number)}`);
      if (parts.length > 0) rows.push({ name, value: parts.join(", ") });
    }
  }
  return rows;
}

/** A member's whole check: each check with its demand, capacity and combination, every factor, the loads and assumptions. */
export function MemberDetail({ open, check, chosen, jackStuds, onChoose, onClose }: MemberDetailProps) {
  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={check ? check.member.label : "Member"}
      actions={
        check ? (
          <>
            <Button variant="secondary" onClick={onClose}>
              Close
            </Button>
            {check.pass && !chosen ? <Button onClick={onChoose}>Build this one</Button> : null}
          </>
        ) : null
      }
    >
      {check ? (
        <div className="flex flex-col gap-5">
          <p className="flex flex-wrap items-center gap-2">
            <StatusBadge
              status={check.pass ? "pass" : "fail"}
              label={check.pass ? `Works — ${ratioPercent(check.ratio, true)}% used` : `Does not work — ${ratioPercent(check.ratio, false)}%`}
            />
            {chosen ? <span className="font-bold text-ink">Chosen</span> : null}
          </p>
          <section className="flex flex-col gap-4" aria-label="Checks">
            {check.checks.map((c) => (
              <div key={c.name} className="flex flex-col gap-1">
                <RatioBar ratio={c.ratio} label={checkTitle(c.name)} governing={c.name === check.governing} detail={checkDetail(c)} />
                {c.note ? <p className="text-sm text-graphite">{c.note}</p> : null}
              </div>
            ))}
          </section>
          <section aria-labelledby="factors-title">
            <h3 id="factors-title" className="mb-2 font-bold">
              Factors and design values
            </h3>
            <dl className="figures grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 text-sm">
              {factorRows(check.factors).map((r) => (
                <div key={r.name} className="contents">
                  <dt className="text-ink-soft">{r.name}</dt>
                  <dd className="text-right text-ink">{r.value}</dd>
                </div>
              ))}
            </dl>
          </section>
          <section aria-labelledby="section-title">
            <h3 id="section-title" className="mb-2 font-bold">
              Section
            </h3>
            <p className="text-sm tabular-nums">
              {[
                check.member.section.b !== null ? `b = ${fmt(check.member.section.b)} in` : null,
                `d = ${fmt(check.member.section.d)} in`,
                check.member.section.A !== null ? `A = ${fmt(check.member.section.A)} in²` : null,
                check.member.section.S !== null ? `S = ${fmt(check.member.section.S)} in³` : null,
                check.member.section.EI !== undefined ? `EI = ${fmt(check.member.section.EI / 1e6)} × 10⁶ lbf-in²` : `I = ${fmt(check.member.section.I)} in⁴`,
                `weight ${fmt(check.member.weightPlf)} plf`,
              ]
                .filter(Boolean)
                .join(" · ")}
            </p>
            {check.member.note ? <p className="mt-1 text-sm text-caution-ink">{check.member.note}</p> : null}
            <p className="mt-1 text-sm text-graphite">{[...new Set(check.member.sources.map(citationOf))].join("; ")}</p>
          </section>
          <section aria-labelledby="loads-title">
            <h3 id="loads-title" className="mb-2 font-bold">
              Loads on the member
            </h3>
            <ul className="list-disc space-y-1 pl-5 text-sm tabular-nums">
              {check.loads.map((l, i) => (
                <li key={i}>{l.note}</li>
              ))}
            </ul>
          </section>
          <section aria-labelledby="reactions-detail-title">
            <h3 id="reactions-detail-title" className="mb-2 font-bold">
              Supports
            </h3>
            <ul className="space-y-1 text-sm tabular-nums">
              {check.reactions.map((r, i) => (
                <li key={i}>
                  At {formatFeetInches(r.x)}: {fmt(r.maxDown)} lb down ({r.maxDownCombination})
                  {r.uplift > 0 ? `, ${fmt(r.uplift)} lb uplift (${r.upliftCombination})` : ""}; bearing needed {fmt(r.requiredBearing)} in of {fmt(r.bearing)}{" "}
                  in
                  {r.studs
                    ? ` (the wood under its ${fmt(r.studs.widthIn)} in bearing width needs ${fmt(r.studs.woodIn)} in, the steel ${fmt(r.studs.steelIn)} in)`
                    : ""}
                  {jackStuds && r.jackStuds !== null ? `; ${r.jackStuds} jack stud${r.jackStuds === 1 ? "" : "s"}` : ""}
                </li>
              ))}
            </ul>
          </section>
          <section aria-labelledby="assumptions-title">
            <h3 id="assumptions-title" className="mb-2 font-bold">
              Assumptions
            </h3>
            <ul className="list-disc space-y-1 pl-5 text-sm">
              {check.assumptions.map((a, i) => (
                <li key={i}>{a}</li>
              ))}
              <li>
                Deflection limits: {check.limits.live !== null ? `L/${check.limits.live} live` : "live not checked"},{" "}
                {check.limits.total !== null ? `L/${check.limits.total} total` : "total not checked"} — {check.limits.source}
              </li>
              <li>Material tables: {check.tables}</li>
            </ul>
          </section>
        </div>
      ) : null}
    </Dialog>
  );
}
