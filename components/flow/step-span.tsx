"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { formatFeetInches } from "@/lib/flow/length";
import { MAX_LENGTH_FT } from "@/lib/flow/schema";
import { clamp, mainSpanFt, overhangs, snapFt, sortedSupports, withMainSpan, withOverhang, type FlowState, type FlowSupport } from "@/lib/flow/state";
import { BeamEditor } from "./beam-editor";
import { ChoiceGroup } from "./choice-group";
import { LENGTH_HINT, LengthField } from "./length-field";
import { FlowNumberField } from "./number-field";

export type StepSpanProps = { state: FlowState; update: (fn: (s: FlowState) => FlowState) => void };

const SUPPORT_TYPES: { value: FlowSupport["type"]; label: string; detail: string }[] = [
  { value: "pin", label: "Pin", detail: "sits on a post or wall, held in place" },
  { value: "roller", label: "Roller", detail: "sits on it, free to slide" },
  { value: "fixed", label: "Fixed", detail: "built in, cannot turn" },
];

/** Step 2: the span, overhangs and supports, typed or tapped on the drawing. */
export function StepSpan({ state, update }: StepSpanProps) {
  const [selected, setSelected] = useState<number | null>(null);
  const sorted = sortedSupports(state.supports);
  const hang = overhangs(state);
  const sel = selected !== null && selected < state.supports.length ? selected : null;

  const moveSupport = (index: number, x: number) =>
    update((s) => ({ ...s, supports: s.supports.map((sup, i) => (i === index ? { ...sup, x: clamp(snapFt(x), 0, s.lengthFt) } : sup)) }));

  return (
    <div className="flex flex-col gap-5">
      <LengthField
        label={sorted.length > 2 ? "First span (between the first two supports)" : "Span (between supports)"}
        valueFt={mainSpanFt(state)}
        hint={LENGTH_HINT}
        minFt={0}
        exclusiveMin
        maxFt={MAX_LENGTH_FT}
        onCommit={(ft) => update((s) => withMainSpan(s, ft))}
      />

      <section aria-labelledby="beam-drawing-title" className="flex flex-col gap-2">
        <h3 id="beam-drawing-title" className="font-bold">
          The member — tap the beam to add a support, tap a support to change it
        </h3>
        <BeamEditor
          state={state}
          selected={sel}
          onSelect={setSelected}
          onAdd={(x) => {
            update((s) => ({ ...s, supports: [...s.supports, { x, type: "roller" }] }));
            setSelected(state.supports.length);
          }}
          onMove={moveSupport}
          onSetType={(index, type) => update((s) => ({ ...s, supports: s.supports.map((sup, i) => (i === index ? { ...sup, type } : sup)) }))}
          onRemove={(index) => {
            if (state.supports.length <= 1) return;
            update((s) => ({ ...s, supports: s.supports.filter((_, i) => i !== index) }));
            setSelected(null);
          }}
        />
        <ul className="flex flex-wrap gap-2" aria-label="Supports">
          {state.supports
            .map((s, i) => ({ s, i }))
            .sort((a, b) => a.s.x - b.s.x)
            .map(({ s, i }, n) => (
              <li key={i}>
                <Button variant={i === sel ? "primary" : "secondary"} aria-pressed={i === sel} onClick={() => setSelected(i === sel ? null : i)}>
                  <span className="tabular-nums">
                    {n + 1}: {s.type} at {formatFeetInches(s.x)}
                  </span>
                </Button>
              </li>
            ))}
          <li>
            <Button
              variant="ghost"
              onClick={() => {
                const xs = [...sorted.map((s) => s.x)];
                let best = { gap: -1, at: state.lengthFt / 2 };
                for (let i = 1; i < xs.length; i++) if (xs[i] - xs[i - 1] > best.gap) best = { gap: xs[i] - xs[i - 1], at: (xs[i] + xs[i - 1]) / 2 };
                update((s) => ({ ...s, supports: [...s.supports, { x: snapFt(best.at), type: "roller" }] }));
                setSelected(state.supports.length);
              }}
            >
              + Add a support
            </Button>
          </li>
        </ul>
      </section>

      {sel !== null ? (
        <section aria-labelledby="support-edit-title" className="flex flex-col gap-3 rounded-card border-2 border-amber bg-amber-light/40 p-3">
          <h3 id="support-edit-title" className="font-bold">
            Support {sorted.indexOf(state.supports[sel]) + 1}
          </h3>
          <LengthField
            label="Position from the left end"
            valueFt={state.supports[sel].x}
            minFt={0}
            maxFt={state.lengthFt}
            onCommit={(ft) => moveSupport(sel, ft)}
          />
          <div className="grid grid-cols-4 gap-2" role="group" aria-label="Nudge the support">
            {[
              { d: -1, t: "← 1 ft" },
              { d: -1 / 12, t: "← 1 in" },
              { d: 1 / 12, t: "1 in →" },
              { d: 1, t: "1 ft →" },
            ].map(({ d, t }) => (
              <Button key={t} variant="secondary" className="px-1 whitespace-nowrap" onClick={() => moveSupport(sel, state.supports[sel].x + d)}>
                {t}
              </Button>
            ))}
          </div>
          <ChoiceGroup
            legend="How it is held"
            name="support-type"
            look="segments"
            value={state.supports[sel].type}
            onChange={(type) => update((s) => ({ ...s, supports: s.supports.map((sup, i) => (i === sel ? { ...sup, type } : sup)) }))}
            choices={SUPPORT_TYPES.map((t) => ({ value: t.value, label: t.label }))}
            hint={SUPPORT_TYPES.map((t) => `${t.label}: ${t.detail}`).join(". ")}
          />
          <div className="flex gap-2">
            <Button
              variant="danger"
              disabled={state.supports.length <= 1}
              onClick={() => {
                update((s) => ({ ...s, supports: s.supports.filter((_, i) => i !== sel) }));
                setSelected(null);
              }}
            >
              Remove this support
            </Button>
            <Button variant="ghost" onClick={() => setSelected(null)}>
              Done
            </Button>
          </div>
        </section>
      ) : null}

      <div className="grid gap-4 sm:grid-cols-2">
        <LengthField label="Overhang past the left support" valueFt={hang.left} minFt={0} maxFt={MAX_LENGTH_FT / 2} hint="0 for none" onCommit={(ft) => update((s) => withOverhang(s, "left", ft))} />
        <LengthField label="Overhang past the right support" valueFt={hang.right} minFt={0} maxFt={MAX_LENGTH_FT / 2} hint="0 for none" onCommit={(ft) => update((s) => withOverhang(s, "right", ft))} />
      </div>

      <FlowNumberField
        label="Bearing length at each support"
        unit="in"
        unitSpoken="inches"
        value={state.bearingIn}
        min={0}
        exclusiveMin
        max={48}
        hint={state.kind === "header" ? "How much of the header sits on the jack studs: 1-1/2 in per stud." : "How much of the member sits on the wall, beam or post."}
        onCommit={(bearingIn) => update((s) => ({ ...s, bearingIn }))}
      />
      <p className="figures text-ink-soft">
        Whole member: {formatFeetInches(state.lengthFt)} · {sorted.length} support{sorted.length === 1 ? "" : "s"}
      </p>
    </div>
  );
}
