"use client";

import { useId, useState, type MouseEvent } from "react";
import { Button } from "@/components/ui/button";
import { formatFeetInches } from "@/lib/flow/length";
import {
  addOverhang,
  DEFAULT_OVERHANG_FT,
  mainSpanFt,
  maxOverhangFt,
  MAX_LENGTH_FT,
  moveSupport,
  overhangs,
  removeOverhang,
  snapFt,
  sortedSupports,
  spanFromRoughOpeningFt,
  SUPPORT_WORDS,
  supportRange,
  withMainSpan,
  withOverhang,
  type FlowState,
  type FlowSupport,
  type MemberEnd,
} from "@/lib/flow/state";
import { BeamEditor } from "./beam-editor";
import { ChoiceGroup } from "./choice-group";
import { LENGTH_HINT, LengthField } from "./length-field";
import { FlowNumberField } from "./number-field";

export type StepSpanProps = { state: FlowState; update: (fn: (s: FlowState) => FlowState) => void };

const SUPPORT_TYPES: readonly FlowSupport["type"][] = ["pin", "roller", "fixed"];

const ENDS: readonly MemberEnd[] = ["left", "right"];

/** A click from the keyboard (Enter or Space) has no pointer detail; a tap or a mouse click has. */
const fromKeyboard = (event: MouseEvent) => event.detail === 0;

/** Step 2: the span, overhangs and supports, typed or tapped on the drawing. */
export function StepSpan({ state, update }: StepSpanProps) {
  const [selected, setSelected] = useState<number | null>(null);
  // an end whose overhang field stays open while its length is typed, even through a 0
  const [openEnds, setOpenEnds] = useState<Record<MemberEnd, boolean>>({ left: false, right: false });
  const [said, setSaid] = useState("");
  const idBase = useId();
  const sorted = sortedSupports(state.supports);
  const hang = overhangs(state);
  const sel = selected !== null && selected < state.supports.length ? selected : null;
  const range = sel !== null ? supportRange(state, sel) : null;
  const canOverhang = sorted.length >= 2;
  const hasOverhang = (end: MemberEnd) => canOverhang && (hang[end] > 1e-9 || openEnds[end]);
  const fieldId = (end: MemberEnd) => `${idBase}-overhang-${end}`;
  const addId = (end: MemberEnd) => `${idBase}-add-${end}`;

  const move = (index: number, x: number) => update((s) => moveSupport(s, index, x));

  const onAddOverhang = (end: MemberEnd, event: MouseEvent) => {
    const length = Math.min(DEFAULT_OVERHANG_FT, maxOverhangFt(state, end));
    update((s) => addOverhang(s, end, length));
    setOpenEnds((o) => ({ ...o, [end]: true }));
    setSaid(`${end === "left" ? "Left" : "Right"} overhang added, ${formatFeetInches(length)}. Its length can be typed below the drawing.`);
    // from the keyboard, go on to its length; a tap leaves the phone's keyboard down and the drawing in view
    if (fromKeyboard(event)) {
      requestAnimationFrame(() => {
        const field = document.getElementById(fieldId(end));
        if (!(field instanceof HTMLInputElement)) return;
        field.focus();
        field.select();
      });
    }
  };

  const onRemoveOverhang = (end: MemberEnd) => {
    update((s) => removeOverhang(s, end));
    setOpenEnds((o) => ({ ...o, [end]: false }));
    setSaid(`${end === "left" ? "Left" : "Right"} overhang removed.`);
    requestAnimationFrame(() => document.getElementById(addId(end))?.focus());
  };

  const roughOpening = state.kind === "header" && state.roughOpeningFt !== null && state.roughOpeningFt !== undefined ? state.roughOpeningFt : null;
  const byOpening = state.kind === "header" && sorted.length === 2 && roughOpening !== null;

  return (
    <div className="flex flex-col gap-5">
      {state.kind === "header" && sorted.length === 2 ? (
        <ChoiceGroup
          legend="You know the"
          name="span-or-opening"
          look="segments"
          value={byOpening ? "opening" : "span"}
          onChange={(v) =>
            update((s) => {
              if (v === "span") return { ...s, roughOpeningFt: null };
              const opening = Math.max(1 / 12, mainSpanFt(s) - s.bearingIn / 12);
              return { ...withMainSpan(s, spanFromRoughOpeningFt(opening, s.bearingIn)), roughOpeningFt: opening };
            })
          }
          choices={[
            { value: "span", label: "Span" },
            { value: "opening", label: "Rough opening" },
          ]}
        />
      ) : null}
      {byOpening && roughOpening !== null ? (
        <div className="flex flex-col gap-2">
          <LengthField
            label="Rough opening (between the jack studs)"
            valueFt={roughOpening}
            hint={LENGTH_HINT}
            minFt={0}
            exclusiveMin
            maxFt={MAX_LENGTH_FT - 4}
            onCommit={(ft) => update((s) => ({ ...withMainSpan(s, spanFromRoughOpeningFt(ft, s.bearingIn)), roughOpeningFt: ft }))}
          />
          <p className="rounded-lg bg-paper-sunk p-3 text-ink tabular-nums" aria-live="polite">
            Span {formatFeetInches(spanFromRoughOpeningFt(roughOpening, state.bearingIn))} = rough opening {formatFeetInches(roughOpening)} + half of the{" "}
            {state.bearingIn} in bearing at each end.
          </p>
        </div>
      ) : (
        <LengthField
          label={sorted.length > 2 ? "First span (between the first two supports)" : "Span (between supports)"}
          valueFt={mainSpanFt(state)}
          hint={LENGTH_HINT}
          minFt={0}
          exclusiveMin
          maxFt={MAX_LENGTH_FT}
          onCommit={(ft) => update((s) => withMainSpan(s, ft))}
        />
      )}

      <section aria-labelledby="beam-drawing-title" className="flex flex-col gap-2">
        <h3 id="beam-drawing-title" className="font-bold">
          The member — tap the beam to add a support, tap a support to move or change it, tap “+ Overhang” to run the member past an end support
        </h3>
        <BeamEditor
          state={state}
          selected={sel}
          onSelect={setSelected}
          onAdd={(x) => {
            update((s) => ({ ...s, supports: [...s.supports, { x, type: "roller" }] }));
            setSelected(state.supports.length);
          }}
          onMove={move}
          onSetType={(index, type) => update((s) => ({ ...s, supports: s.supports.map((sup, i) => (i === index ? { ...sup, type } : sup)) }))}
          onRemove={(index) => {
            if (state.supports.length <= 1) return;
            update((s) => ({ ...s, supports: s.supports.filter((_, i) => i !== index) }));
            setSelected(null);
          }}
        />
        {canOverhang ? (
          <div className="grid grid-cols-2 items-start gap-3" role="group" aria-label="Overhangs at the ends">
            {ENDS.map((end) =>
              hasOverhang(end) ? (
                <div key={end} className="flex min-w-0 flex-col gap-1">
                  <LengthField
                    id={fieldId(end)}
                    label={`Overhang past the ${end} support`}
                    valueFt={hang[end]}
                    minFt={0}
                    maxFt={maxOverhangFt(state, end)}
                    onCommit={(ft) => {
                      setOpenEnds((o) => ({ ...o, [end]: true }));
                      update((s) => withOverhang(s, end, snapFt(ft)));
                    }}
                  />
                  <Button
                    variant="secondary"
                    className={end === "right" ? "self-end" : "self-start"}
                    aria-label={`Remove the ${end} overhang`}
                    onClick={() => onRemoveOverhang(end)}
                  >
                    Remove
                  </Button>
                </div>
              ) : (
                <div key={end} className={end === "right" ? "flex justify-end" : "flex justify-start"}>
                  <Button
                    id={addId(end)}
                    variant="secondary"
                    className="px-3"
                    aria-label={`Add an overhang at the ${end} end`}
                    onClick={(event) => onAddOverhang(end, event)}
                  >
                    <span aria-hidden="true">
                      {end === "left" ? "← " : ""}+ Overhang{end === "right" ? " →" : ""}
                    </span>
                  </Button>
                </div>
              ),
            )}
          </div>
        ) : null}
        <p className="sr-only" aria-live="polite">
          {said}
        </p>
        <ul className="flex flex-wrap gap-2" aria-label="Supports">
          {state.supports
            .map((s, i) => ({ s, i }))
            .sort((a, b) => a.s.x - b.s.x)
            .map(({ s, i }, n) => (
              <li key={i}>
                <Button variant={i === sel ? "primary" : "secondary"} aria-pressed={i === sel} onClick={() => setSelected(i === sel ? null : i)}>
                  <span className="tabular-nums">
                    {n + 1}: {SUPPORT_WORDS[s.type].short} at {formatFeetInches(s.x)}
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
            minFt={range?.min ?? 0}
            maxFt={range?.max ?? state.lengthFt}
            hint={
              range
                ? `Anywhere from ${formatFeetInches(range.min)} to ${formatFeetInches(range.max)}: on the member, and not past the next support.`
                : undefined
            }
            onCommit={(ft) => move(sel, ft)}
          />
          <div className="grid grid-cols-4 gap-2" role="group" aria-label="Move the support">
            {[
              { d: -1, t: "← 1 ft", say: "Move 1 ft left" },
              { d: -1 / 12, t: "← 1 in", say: "Move 1 in left" },
              { d: 1 / 12, t: "1 in →", say: "Move 1 in right" },
              { d: 1, t: "1 ft →", say: "Move 1 ft right" },
            ].map(({ d, t, say }) => (
              <Button
                key={t}
                variant="secondary"
                className="px-1 whitespace-nowrap"
                aria-label={say}
                disabled={range !== null && (d < 0 ? state.supports[sel].x <= range.min + 1e-9 : state.supports[sel].x >= range.max - 1e-9)}
                onClick={() => move(sel, state.supports[sel].x + d)}
              >
                {t}
              </Button>
            ))}
          </div>
          <ChoiceGroup
            legend="How it is held"
            name="support-type"
            value={state.supports[sel].type}
            onChange={(type) => update((s) => ({ ...s, supports: s.supports.map((sup, i) => (i === sel ? { ...sup, type } : sup)) }))}
            choices={SUPPORT_TYPES.map((t) => ({ value: t, label: SUPPORT_WORDS[t].name, detail: SUPPORT_WORDS[t].site }))}
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

      <FlowNumberField
        label="Bearing length at each support"
        unit="in"
        unitSpoken="inches"
        value={state.bearingIn}
        min={0}
        exclusiveMin
        max={48}
        hint={
          state.kind === "header"
            ? "How much of the header sits on the jack studs: 1-1/2 in per stud."
            : "How much of the member sits on the wall, beam or post."
        }
        onCommit={(bearingIn) =>
          update((s) =>
            s.kind === "header" && s.roughOpeningFt !== null && s.roughOpeningFt !== undefined && s.supports.length === 2
              ? { ...withMainSpan(s, spanFromRoughOpeningFt(s.roughOpeningFt, bearingIn)), bearingIn }
              : { ...s, bearingIn },
          )
        }
      />
      <p className="figures text-ink-soft">
        Whole member: {formatFeetInches(state.lengthFt)} · {sorted.length} support{sorted.length === 1 ? "" : "s"}
      </p>
    </div>
  );
}
