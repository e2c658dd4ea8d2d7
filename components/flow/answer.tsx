"use client";

import { TradeText } from "@/components/ui/trade-text";
import dynamic from "next/dynamic";
import { useEffect, useMemo, useState, type ReactNode } from "react";
import { Caution } from "@/components/ui/caution";
import { NOT_CHECKED_COLD_FORMED } from "@/lib/caution";
import { RatioBar, ratioVerdict } from "@/components/ui/ratio-bar";
import { Skeleton, Spinner } from "@/components/ui/spinner";
import { StatusBadge } from "@/components/ui/status-badge";
import { CheckIcon, InfoIcon, WarningIcon } from "@/components/ui/icons";
import { cx } from "@/components/ui/cx";
import { formatFeetInches, formatInches } from "@/lib/flow/length";
import { answerFacts, jackStudsUnder, shortLabel, spanWords } from "@/lib/flow/summary";
import { KIND_LABELS, type FlowState, type FlowStepId } from "@/lib/flow/state";
import type { CheckOutput } from "@/lib/solver/design/check";
import type { MemberSpec } from "@/lib/solver/design/schema";
import type { SizeCandidateResult } from "@/lib/solver/design/size";
import { isNoConnection, useSize } from "./use-design";
import { answerLineOf, answerWords, recheck, shownCandidate, shownLine, tablesWords, type PhoneAnswer, type Recheck } from "@/lib/offline/answers";
import { checkTitle } from "@/lib/solver/design/check-words";
import { checkDetail } from "./words";

// the diagrams (d3) and the full check load with the answer, not with the flow's first screen
const AnswerDiagrams = dynamic(() => import("./answer-diagrams").then((m) => m.AnswerDiagrams), {
  ssr: false,
  loading: () => <Skeleton width="100%" height="40rem" />,
});
const MemberDetail = dynamic(() => import("./member-detail").then((m) => m.MemberDetail), { ssr: false });

export type AnswerProps = {
  state: FlowState;
  /** the member chosen to build (null: the best that works) */
  chosen: MemberSpec | null;
  onChoose: (spec: MemberSpec) => void;
  /** the chosen member's full check, once known (for saving) */
  onChosenCheck?: (check: CheckOutput | null) => void;
  onGoTo: (step: FlowStepId) => void;
  /** "full" on the answer step; "live" beside the inputs on a wide screen */
  variant?: "full" | "live";
  /** an action beside the answer on wide screens (on a phone it sits in the bottom bar) */
  action?: ReactNode;
  /** the shown answer when this phone worked it out with no signal (null: the server's), for saving */
  onPhoneAnswer?: (answer: PhoneAnswer | null) => void;
};

const SHOWN = 5;
const sameSpec = (a: MemberSpec, b: MemberSpec) => JSON.stringify(a) === JSON.stringify(b);

/** Which step holds the field an issue names. */
function stepOfPath(path: string): FlowStepId {
  if (/^(lengthFt|supports|bearingIn)/.test(path)) return "span";
  if (/^(loads|spacingIn|tributaryFt)/.test(path)) return "loads";
  return "material";
}

const FIELD_WORDS: Record<string, string> = {
  lengthFt: "Span",
  supports: "Supports",
  loads: "Loads",
  spacingIn: "Joist spacing",
  tributaryFt: "Tributary width",
  bearingIn: "Bearing length",
  member: "Material",
  limits: "Deflection limits",
  conditions: "Conditions",
};

/** "supports.1.x" → "Support 2"; "spacingIn" → "Joist spacing". */
function fieldWords(path: string): string {
  const [head, index] = path.split(".");
  const word = FIELD_WORDS[head] ?? head;
  if (index !== undefined && /^\d+$/.test(index) && (head === "supports" || head === "loads")) return `${word.slice(0, -1)} ${Number(index) + 1}`;
  return word;
}

function Problem({ title, issues, onGoTo }: { title: string; issues: { path: string; message: string }[]; onGoTo: (step: FlowStepId) => void }) {
  return (
    <div role="alert" className="rounded-card border-2 border-over bg-over-bg p-4">
      <p className="flex items-center gap-2 font-bold text-over-ink">
        <WarningIcon className="h-6 w-6" /> {title}
      </p>
      <ul className="mt-2 flex flex-col gap-2">
        {issues.map((i, n) => (
          <li key={n}>
            <span className="text-ink">
              {i.path ? <span className="font-bold">{fieldWords(i.path)}: </span> : null}
              {i.message}
            </span>{" "}
            {i.path ? (
              <button type="button" className="min-h-touch font-bold text-spruce underline underline-offset-4" onClick={() => onGoTo(stepOfPath(i.path))}>
                Fix {fieldWords(i.path).toLowerCase()}
              </button>
            ) : null}
          </li>
        ))}
      </ul>
    </div>
  );
}

/** What the server said of an answer this phone worked out with no signal. */
function RecheckNote({ recheck: r }: { recheck: Recheck }) {
  if (r.same) {
    return (
      <p className="mb-3 flex items-start gap-2 rounded-lg bg-spruce-light p-2 text-ink" role="status" data-testid="answer-rechecked">
        <CheckIcon className="mt-0.5 h-5 w-5 shrink-0 text-sound" />
        <span>Rechecked by the server now the signal is back: the same answer as this phone worked out.</span>
      </p>
    );
  }
  return (
    <div className="mb-3 rounded-lg border-2 border-over bg-over-bg p-2 text-ink" role="alert" data-testid="answer-rechecked">
      <p className="flex items-start gap-2 font-bold text-over-ink">
        <WarningIcon className="mt-0.5 h-5 w-5 shrink-0" /> Rechecked by the server: the answer changed.
      </p>
      <p>This phone worked out: {answerWords(r.phone)}.</p>
      <p>The server says: {answerWords(r.server)}. Build what the server says.</p>
      <p>Why: {r.why}</p>
    </div>
  );
}

function CandidateCard({
  candidate,
  check,
  chosen,
  onOpen,
}: {
  candidate: SizeCandidateResult;
  check: CheckOutput | undefined;
  chosen: boolean;
  onOpen: () => void;
}) {
  const verdict = ratioVerdict(candidate.ratio);
  return (
    <li>
      {/* The card reads as text; its one control is "Full check, every factor", named by those very words (and the
          member, for a screen reader), stretched over the whole card so a tap anywhere on it opens the check. */}
      <div
        className={cx(
          "relative flex w-full flex-col gap-3 rounded-card border-2 bg-paper-raised p-4 text-left hover:border-spruce",
          chosen ? "border-amber border-l-8" : "border-rule",
        )}
      >
        <div className="flex flex-wrap items-center justify-between gap-2">
          <h3 className="text-xl font-bold text-ink">{shortLabel(candidate.member, candidate.label)}</h3>
          <StatusBadge status={verdict.pass ? "pass" : "fail"} label={verdict.text} />
        </div>
        <p className="text-ink-soft">
          {candidate.label} · {checkTitle(candidate.governing)} governs · {Math.round(candidate.weightPlf * 10) / 10} plf
          {chosen ? <span className="ml-2 rounded bg-amber-light px-1.5 font-bold text-ink">chosen</span> : null}
        </p>
        <div className="flex min-h-[13.5rem] flex-col gap-2">
          {check
            ? check.checks.map((c) => (
                <RatioBar key={c.name} ratio={c.ratio} label={checkTitle(c.name)} governing={c.name === check.governing} detail={checkDetail(c)} />
              ))
            : Array.from({ length: 4 }, (_, i) => <Skeleton key={i} width="100%" height="2.75rem" />)}
        </div>
        <button
          type="button"
          onClick={onOpen}
          className="min-h-touch self-start text-left font-bold text-spruce underline underline-offset-4 after:absolute after:inset-0 after:rounded-card after:content-['']"
        >
          Full check, every factor<span className="sr-only"> of {candidate.label}</span>
        </button>
      </div>
    </li>
  );
}

/** Step 5: the answer first, then the members that work, the supports and the diagrams. */
export function Answer({ state, chosen, onChoose, onChosenCheck, onGoTo, variant = "full", action, onPhoneAnswer }: AnswerProps) {
  const size = useSize(state);
  const passing = size.data?.passing ?? [];
  const shown = passing.slice(0, variant === "full" ? SHOWN : 1);
  const chosenSpec = chosen && passing.some((p) => sameSpec(p.member, chosen)) ? chosen : (passing[0]?.member ?? null);
  const checkOf = (spec: MemberSpec) => passing.find((p) => sameSpec(p.member, spec))?.check;
  const chosenCheck = chosenSpec ? checkOf(chosenSpec) : undefined;
  const chosenCandidate = chosenSpec ? passing.find((p) => sameSpec(p.member, chosenSpec)) : undefined;
  const [detail, setDetail] = useState<MemberSpec | null>(null);
  const detailCheck = detail ? checkOf(detail) : undefined;

  useEffect(() => {
    onChosenCheck?.(chosenCheck ?? null);
  }, [chosenCheck, onChosenCheck]);

  const onPhone = size.data?.onPhone ?? null;
  const phoneAnswer = useMemo<PhoneAnswer | null>(
    () => (size.data && onPhone ? { answer: answerLineOf(shownCandidate(size.data, chosen)), tables: onPhone } : null),
    [size.data, onPhone, chosen],
  );
  useEffect(() => {
    onPhoneAnswer?.(phoneAnswer);
  }, [phoneAnswer, onPhoneAnswer]);
  const serverCheck = useMemo(() => {
    const replaced = size.data?.replaced;
    if (!size.data || !replaced) return null;
    const phone = { answer: shownLine(replaced, chosen), tables: replaced.tables };
    const tables = size.data.stamp ?? (size.data.tables === phone.tables.id ? phone.tables : { id: size.data.tables, number: null, publishedAt: null });
    return recheck(phone, { answer: answerLineOf(shownCandidate(size.data, chosen)), tables });
  }, [size.data, chosen]);

  const busy = size.isLoading || size.isValidating;
  const headline = chosenCandidate?.answer ?? null;
  const studs = jackStudsUnder(state);

  return (
    <div className="flex flex-col gap-6" aria-busy={busy}>
      <section aria-labelledby="answer-title" className="flex flex-col gap-3">
        <h2 id="answer-title" className="sr-only">
          The answer
        </h2>
        <p className="text-ink-soft tabular-nums">
          {KIND_LABELS[state.kind]}, {spanWords(state)}
          <span className="ml-2 inline-flex h-5 w-5 align-middle">{busy ? <Spinner size="sm" label="Working out the answer" /> : null}</span>
        </p>
        <div className="min-h-[7.5rem] rounded-card border-2 border-ink bg-paper-raised p-4" aria-live="polite">
          {size.error && isNoConnection(size.error) ? (
            <p role="status" className="flex items-start gap-2 text-lg text-ink" data-testid="answer-no-signal">
              <InfoIcon className="mt-1 h-6 w-6 shrink-0 text-spruce" /> {size.error.message}
            </p>
          ) : size.error ? (
            <Problem
              title="Spanlark cannot size this yet"
              issues={size.error.issues.length > 0 ? size.error.issues : [{ path: "", message: size.error.message }]}
              onGoTo={onGoTo}
            />
          ) : headline && chosenCandidate ? (
            <>
              {onPhone ? (
                <p className="mb-3 flex items-start gap-2 rounded-lg bg-caution-bg p-2 text-caution-ink" role="status" data-testid="answer-on-phone">
                  <InfoIcon className="mt-0.5 h-5 w-5 shrink-0" />
                  <span>No signal: worked out on this phone with {tablesWords(onPhone)}; the server rechecks it when the signal is back.</span>
                </p>
              ) : serverCheck ? (
                <RecheckNote recheck={serverCheck} />
              ) : null}
              <p className="text-sm font-bold tracking-wide text-graphite uppercase">Build</p>
              <p className="text-3xl leading-tight font-bold text-ink" data-testid="answer-headline">
                <TradeText text={headline} />
              </p>
              <p className="mt-2 flex flex-wrap items-center gap-2 text-ink-soft">
                <StatusBadge status="pass" label={ratioVerdict(chosenCandidate.ratio).text} />
                <span>
                  {checkTitle(chosenCandidate.governing)} governs · {chosenCandidate.label}
                </span>
              </p>
              {chosenCheck ? (
                <ul className="mt-3 flex flex-col gap-1 border-t-2 border-rule pt-2 text-ink" data-testid="answer-facts">
                  {answerFacts(chosenCheck).map((f) => (
                    <li key={f}>
                      <TradeText text={f} />
                    </li>
                  ))}
                </ul>
              ) : null}
              {action ? <div className="mt-3 hidden md:block">{action}</div> : null}
            </>
          ) : size.data ? (
            <>
              <p className="flex items-center gap-2 text-2xl font-bold text-over-ink">
                <WarningIcon className="h-7 w-7" /> Nothing in the tables works
              </p>
              <p className="mt-1 text-ink">
                {size.data.candidates === 0 && size.data.notFittingWall > 0
                  ? `None of these members fills a ${size.data.wallFraming} wall. Try other plies, another material or the other wall framing.`
                  : `None of the ${size.data.candidates} members checked carries this load over this span. Try another material, more plies, a shorter span or another support.`}
                {size.data.candidates > 0 && size.data.notFittingWall > 0 ? ` Members that do not fill a ${size.data.wallFraming} wall were left out.` : ""}
              </p>
            </>
          ) : (
            <div className="flex flex-col gap-2">
              <Skeleton width="4rem" height="1rem" />
              <Skeleton width="90%" height="2.25rem" />
              <Skeleton width="60%" height="1.5rem" />
            </div>
          )}
        </div>
        <Caution also={chosenCandidate?.member.material === "cfs" ? NOT_CHECKED_COLD_FORMED : undefined} />
      </section>

      {variant === "full" ? (
        <>
          <section aria-labelledby="supports-title" className="flex flex-col gap-2">
            <h2 id="supports-title" className="text-2xl font-bold">
              At the supports
            </h2>
            <div className="min-h-[6rem]">
              {chosenCheck ? (
                <ul className="grid gap-2 sm:grid-cols-2">
                  {chosenCheck.reactions.map((r, i) => (
                    <li key={i} className="rounded-card border-2 border-rule bg-paper-raised p-3 tabular-nums">
                      <p className="font-bold">
                        Support {i + 1} at {formatFeetInches(r.x)}
                      </p>
                      <p>
                        {Math.round(r.maxDown).toLocaleString("en-US")} lb down <span className="text-graphite">({r.maxDownCombination})</span>
                      </p>
                      {r.uplift > 0 ? (
                        <p className="font-bold text-over-ink">
                          {Math.round(r.uplift).toLocaleString("en-US")} lb uplift ({r.upliftCombination}) — tie it down
                        </p>
                      ) : null}
                      <p>
                        <TradeText
                          text={
                            studs && r.jackStuds !== null
                              ? `${r.jackStuds} jack stud${r.jackStuds === 1 ? "" : "s"} (needs ${formatInches(r.requiredBearing)} of bearing)`
                              : `Bearing: needs ${formatInches(r.requiredBearing)}, you have ${formatInches(r.bearing)}`
                          }
                        />
                      </p>
                    </li>
                  ))}
                </ul>
              ) : (
                <Skeleton width="100%" height="6rem" />
              )}
            </div>
          </section>

          <section aria-labelledby="members-title" className="flex flex-col gap-2">
            <h2 id="members-title" className="text-2xl font-bold">
              Members that work, best first
            </h2>
            <p className="text-ink-soft">Lightest first. Tap one for its full check.</p>
            <ul className="grid gap-3 lg:grid-cols-2">
              {size.data
                ? shown.map((c) => (
                    <CandidateCard
                      key={JSON.stringify(c.member)}
                      candidate={c}
                      check={checkOf(c.member)}
                      chosen={chosenSpec !== null && sameSpec(c.member, chosenSpec)}
                      onOpen={() => setDetail(c.member)}
                    />
                  ))
                : Array.from({ length: 2 }, (_, i) => <Skeleton key={i} width="100%" height="20rem" />)}
            </ul>
            {size.data && size.data.failing.length > 0 ? (
              <details className="rounded-card border-2 border-rule bg-paper-raised p-3">
                <summary className="min-h-touch cursor-pointer py-2 font-bold">Nearest that do not work</summary>
                <ul className="flex flex-col gap-2">
                  {size.data.failing.map((f) => (
                    <li key={JSON.stringify(f.member)} className="flex flex-wrap items-center gap-2">
                      <StatusBadge status="fail" label={ratioVerdict(f.ratio).text} />
                      <span className="font-bold">{f.label}</span>
                      <span className="text-ink-soft">{f.reason}</span>
                    </li>
                  ))}
                </ul>
              </details>
            ) : null}
          </section>

          <section aria-labelledby="diagrams-title" className="flex flex-col gap-2">
            <h2 id="diagrams-title" className="text-2xl font-bold">
              Diagrams{chosenCandidate ? ` for ${shortLabel(chosenCandidate.member, chosenCandidate.label)}` : ""}
            </h2>
            <div className="min-h-[40rem]">{chosenCheck ? <AnswerDiagrams check={chosenCheck} /> : <Skeleton width="100%" height="40rem" />}</div>
          </section>
        </>
      ) : null}

      <MemberDetail
        open={detail !== null}
        check={detailCheck ?? null}
        chosen={detail !== null && chosenSpec !== null && sameSpec(detail, chosenSpec)}
        jackStuds={studs}
        onChoose={() => {
          if (detail) onChoose(detail);
          setDetail(null);
        }}
        onClose={() => setDetail(null)}
      />
    </div>
  );
}
