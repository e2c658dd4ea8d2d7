"use client";

import dynamic from "next/dynamic";
import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import { BottomActionBar } from "@/components/ui/bottom-action-bar";
import { Button, ButtonLink } from "@/components/ui/button";
import { CheckIcon } from "@/components/ui/icons";
import { cx } from "@/components/ui/cx";
import { defaultFlowState } from "@/lib/flow/defaults";
import { FLOW_STEPS, KIND_LABELS, STEP_TITLES, type FlowLocation, type FlowState, type FlowStepId, type MemberKind } from "@/lib/flow/state";
import { spanWords } from "@/lib/flow/summary";
import { flowSearch, STORAGE_KEY, storeLocation } from "@/lib/flow/address";
import type { FlowStart } from "@/lib/flow/url";
import type { CheckOutput } from "@/lib/solver/design/check";
import type { MemberSpec } from "@/lib/solver/design/schema";
import { FieldProblemsContext, type ReportFieldProblem } from "./field-problems";
import type { SaveTarget } from "./save-to-job";
import { StepKind } from "./step-kind";
import { Skeleton } from "@/components/ui/spinner";

// Each step's code loads with its step (the server still renders the step a link opens at): the first screen
// carries the choice of member only, not the drawing, the loads, the materials or the answer and its diagrams.
const stepLoading = () => <Skeleton width="100%" height="24rem" />;
const StepSpan = dynamic(() => import("./step-span").then((m) => m.StepSpan), { loading: stepLoading });
const StepLoads = dynamic(() => import("./step-loads").then((m) => m.StepLoads), { loading: stepLoading });
const StepMaterial = dynamic(() => import("./step-material").then((m) => m.StepMaterial), { loading: stepLoading });
const Answer = dynamic(() => import("./answer").then((m) => m.Answer), { loading: stepLoading });

/** True on a screen wide enough for the live answer beside the inputs (Tailwind's lg); false until known. */
function useWideScreen(): boolean {
  const [wide, setWide] = useState(false);
  useEffect(() => {
    const query = window.matchMedia("(min-width: 1024px)");
    const update = () => setWide(query.matches);
    update();
    query.addEventListener("change", update);
    return () => query.removeEventListener("change", update);
  }, []);
  return wide;
}

// saving (a form library and the job actions) loads when the builder first asks to save
const SaveToJob = dynamic(() => import("./save-to-job").then((m) => m.SaveToJob), { ssr: false });

export type SizingFlowProps = {
  initial: FlowLocation;
  from: FlowStart["from"];
  /** the page's query, to resume from local storage when the URL holds no state */
  params: { s?: string; step?: string; kind?: string };
  signedIn: boolean;
  jobs: { id: string; name: string }[];
  editing: SaveTarget | null;
  /** open "Save to a job" at once (back from signing in) */
  openSave: boolean;
  /** the member chosen when the flow was saved (editing a member) */
  initialChosen?: MemberSpec | null;
  /** the job to offer first when saving (the flow was opened from a job's page) */
  preferredJobId?: string | null;
};

function readStorage(): string | null {
  try {
    return window.localStorage.getItem(STORAGE_KEY);
  } catch {
    return null;
  }
}

function writeStorage(value: string): void {
  try {
    window.localStorage.setItem(STORAGE_KEY, value);
  } catch {
    // private browsing or a full store: the URL still holds everything
  }
}

function StepNav({ step, onGo }: { step: FlowStepId; onGo: (step: FlowStepId) => void }) {
  const current = FLOW_STEPS.indexOf(step);
  return (
    <nav aria-label="Steps" className="no-print">
      <ol className="flex gap-1.5">
        {FLOW_STEPS.map((id, i) => {
          const done = i < current;
          const here = i === current;
          return (
            <li key={id} className="flex-1">
              <button
                type="button"
                onClick={() => onGo(id)}
                aria-current={here ? "step" : undefined}
                className={cx(
                  "flex min-h-touch w-full flex-col items-center justify-center gap-0.5 rounded-lg border-2 px-1 text-sm font-bold",
                  here
                    ? "border-ink bg-ink text-paper"
                    : done
                      ? "border-spruce bg-spruce-light text-spruce-dark"
                      : "border-rule-strong bg-paper-raised text-ink-soft",
                )}
              >
                <span className="flex items-center gap-1">
                  {done ? <CheckIcon className="h-4 w-4" aria-hidden="true" /> : null}
                  <span className="figures">{i + 1}</span>
                </span>
                <span className="hidden sm:block">{STEP_TITLES[id]}</span>
                <span className="sr-only sm:hidden">{STEP_TITLES[id]}</span>
                {done ? <span className="sr-only">(done)</span> : null}
              </button>
            </li>
          );
        })}
      </ol>
    </nav>
  );
}

/** The sizing flow: one step per screen on a phone, the inputs beside a live answer on a wide screen. */
export function SizingFlow({ initial, from, params, signedIn, jobs, editing, openSave, initialChosen = null, preferredJobId = null }: SizingFlowProps) {
  const [location, setLocation] = useState<FlowLocation>(initial);
  const [resumed, setResumed] = useState(false);
  const [chosen, setChosen] = useState<MemberSpec | null>(initialChosen);
  const [chosenCheck, setChosenCheck] = useState<CheckOutput | null>(null);
  const [saveOpen, setSaveOpen] = useState(openSave && signedIn);
  const [saveAsked, setSaveAsked] = useState(saveOpen);
  const headingRef = useRef<HTMLHeadingElement>(null);
  const lastStep = useRef<FlowStepId>(initial.step);
  const fromPop = useRef(false);
  const storedAtArrival = useRef<string | null | undefined>(undefined);
  const resumedOnce = useRef(false);
  const { state, step } = location;
  // the live answer beside the inputs is only drawn (and only asked of the server) where there is room for it
  const wide = useWideScreen();
  // the fields of this step that hold an entry that cannot be used (input id → message), and whether the
  // builder tried to go on with one (the step then says so and stays)
  const problems = useRef(new Map<string, string>());
  const [problemCount, setProblemCount] = useState(0);
  const [held, setHeld] = useState(false);
  const reportProblem = useCallback<ReportFieldProblem>((fieldId, message) => {
    const had = problems.current.get(fieldId) ?? null;
    if (had === message) return;
    if (message === null) problems.current.delete(fieldId);
    else problems.current.set(fieldId, message);
    setProblemCount(problems.current.size);
    if (problems.current.size === 0) setHeld(false);
  }, []);
  const editJob = editing?.jobId;
  const editMember = editing?.memberId;
  const extra = useMemo(
    () => (editJob && editMember ? { job: editJob, member: editMember } : preferredJobId ? { for: preferredJobId } : {}),
    [editJob, editMember, preferredJobId],
  );
  const isEditing = editing !== null;

  // The URL may hold no state (a plain /size or /size?kind=): resume the stored one when it fits. Local storage
  // exists only in the browser, so it is read once the page is there, before this page first writes to it.
  useEffect(() => {
    if (storedAtArrival.current === undefined) storedAtArrival.current = readStorage();
    if (editing || (from !== "new" && from !== "kind")) return;
    const stored = storedAtArrival.current;
    if (!stored) return;
    let stale = false;
    // reading a stored state back checks it with the flow's schema, fetched only when there is one to read
    void import("@/lib/flow/url").then(({ resolveFlowStart }) => {
      const start = resolveFlowStart(params, stored);
      if (stale || start.from !== "storage" || resumedOnce.current) return;
      resumedOnce.current = true;
      lastStep.current = start.location.step;
      setLocation(start.location);
      setResumed(true);
    });
    return () => {
      stale = true;
    };
  }, [editing, from, params]);

  // Keep the address bar and local storage in step with every change; a new step is a new history entry.
  useEffect(() => {
    const url = `/size${flowSearch(location, extra)}`;
    if (fromPop.current) {
      fromPop.current = false;
    } else if (location.step !== lastStep.current) {
      window.history.pushState(null, "", url);
    } else {
      window.history.replaceState(null, "", url);
    }
    lastStep.current = location.step;
    if (!isEditing) writeStorage(storeLocation(location));
  }, [location, extra, isEditing]);

  useEffect(() => {
    const onPop = () => {
      const search = new URLSearchParams(window.location.search);
      void import("@/lib/flow/url").then(({ resolveFlowStart }) => {
        const start = resolveFlowStart({ s: search.get("s"), step: search.get("step"), kind: search.get("kind") }, null);
        if (start.from === "url") {
          fromPop.current = true;
          lastStep.current = start.location.step;
          setLocation(start.location);
        }
      });
    };
    window.addEventListener("popstate", onPop);
    return () => window.removeEventListener("popstate", onPop);
  }, []);

  const update = useCallback((fn: (s: FlowState) => FlowState) => setLocation((loc) => ({ ...loc, state: fn(loc.state) })), []);

  const goTo = useCallback((next: FlowStepId) => {
    const [fieldId] = problems.current.keys();
    if (fieldId) {
      // a bad entry holds the step: going on would carry the value from before as if it were the one typed
      setHeld(true);
      const field = document.getElementById(fieldId);
      field?.scrollIntoView({ block: "center" });
      field?.focus();
      return;
    }
    setHeld(false);
    setLocation((loc) => ({ ...loc, step: next }));
    window.scrollTo({ top: 0 });
    requestAnimationFrame(() => headingRef.current?.focus());
  }, []);

  const index = FLOW_STEPS.indexOf(step);
  const prev = index > 0 ? FLOW_STEPS[index - 1] : null;
  const next = index < FLOW_STEPS.length - 1 ? FLOW_STEPS[index + 1] : null;
  const onKind = (kind: MemberKind) => {
    if (kind === state.kind) return;
    setChosen(null);
    setLocation((loc) => ({ ...loc, state: defaultFlowState(kind) }));
  };

  const returnTo = `/size${flowSearch({ state, step: "answer" }, extra)}&save=1`;
  const summaryLine =
    problemCount > 0 ? (
      <span className="font-bold text-over-ink">Fix the field marked in red</span>
    ) : (
      <span className="font-bold tabular-nums">
        {KIND_LABELS[state.kind]} · {spanWords(state)}
      </span>
    );

  const saveAction = signedIn ? (
    <Button
      size="lg"
      className="px-3"
      onClick={() => {
        setSaveAsked(true);
        setSaveOpen(true);
      }}
      disabled={!chosenCheck}
    >
      {editing ? "Save the changes" : "Save to a job"}
    </Button>
  ) : (
    <ButtonLink size="lg" className="px-3 whitespace-nowrap" href={`/sign-in?callbackUrl=${encodeURIComponent(returnTo)}`}>
      Sign in to save
    </ButtonLink>
  );

  const stepBody = (
    <>
      {step === "kind" ? <StepKind kind={state.kind} onChange={onKind} /> : null}
      {step === "span" ? <StepSpan state={state} update={update} /> : null}
      {step === "loads" ? <StepLoads state={state} update={update} /> : null}
      {step === "material" ? <StepMaterial state={state} update={update} /> : null}
      {step === "answer" ? (
        <Answer state={state} chosen={chosen} onChoose={setChosen} onChosenCheck={setChosenCheck} onGoTo={goTo} action={saveAction} />
      ) : null}
    </>
  );

  return (
    <div className="flex flex-col gap-5">
      <header className="flex flex-col gap-3">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h1 className="text-3xl leading-tight font-bold">{editing ? `Edit ${editing.label}` : "Size a member"}</h1>
          {editing ? <p className="text-ink-soft">in {editing.jobName}</p> : null}
        </div>
        <StepNav step={step} onGo={goTo} />
        {resumed ? (
          <p className="flex flex-wrap items-center gap-2 rounded-lg bg-spruce-light p-2 pl-3 text-ink" role="status">
            Picked up where you left off.
            <Button
              variant="ghost"
              onClick={() => {
                setResumed(false);
                setChosen(null);
                setLocation({ state: defaultFlowState(state.kind), step: "kind" });
              }}
            >
              Start over
            </Button>
          </p>
        ) : null}
      </header>

      <div className={cx("grid gap-8", step !== "answer" && "lg:grid-cols-[minmax(0,1fr)_minmax(0,26rem)]")}>
        <section aria-labelledby="step-title" className="flex min-w-0 flex-col gap-4">
          <h2 id="step-title" ref={headingRef} tabIndex={-1} className="text-2xl font-bold focus:outline-none">
            <span className="block text-base font-bold text-graphite">
              Step {index + 1} of {FLOW_STEPS.length}
            </span>
            {step === "answer" ? "What to build" : STEP_TITLES[step]}
          </h2>
          {held && problemCount > 0 ? (
            <p role="alert" className="rounded-card border-2 border-over bg-over-bg p-3 font-bold text-over-ink" data-testid="step-held">
              Not yet: fix the field marked in red, then go on.
            </p>
          ) : null}
          <FieldProblemsContext.Provider value={reportProblem}>{stepBody}</FieldProblemsContext.Provider>
        </section>
        {step !== "answer" ? (
          <aside aria-label="Answer so far" className="hidden lg:block">
            <div className="sticky top-4 flex flex-col gap-3">
              <h2 className="text-xl font-bold">Answer so far</h2>
              {wide ? (
                <>
                  {problemCount > 0 ? (
                    <p className="font-bold text-over-ink">Fix the field marked in red: the answer below is for the value before it.</p>
                  ) : null}
                  <Answer state={state} chosen={chosen} onChoose={setChosen} onGoTo={goTo} variant="live" />
                </>
              ) : (
                <Skeleton width="100%" height="12rem" />
              )}
              <Button variant="secondary" onClick={() => goTo("answer")}>
                See the whole answer
              </Button>
            </div>
          </aside>
        ) : null}
      </div>

      <BottomActionBar summary={summaryLine}>
        {prev ? (
          <Button variant="secondary" size="lg" className="px-3" onClick={() => goTo(prev)}>
            Back
          </Button>
        ) : null}
        {next ? (
          <Button size="lg" className="px-3" onClick={() => goTo(next)}>
            {next === "answer" ? "See the answer" : `Next: ${STEP_TITLES[next]}`}
          </Button>
        ) : (
          saveAction
        )}
      </BottomActionBar>

      {signedIn && saveAsked ? (
        <SaveToJob
          open={saveOpen}
          onClose={() => setSaveOpen(false)}
          state={state}
          chosen={chosenCheck ? chosenCheck.member.spec : chosen}
          jobs={jobs}
          editing={editing}
          preferredJobId={preferredJobId}
        />
      ) : null}
    </div>
  );
}
