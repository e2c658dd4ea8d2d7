"use client";

import { SelectField } from "@/components/ui/field";
import { overhangs, spansFt, wallOf, type FlowState, type MaterialFamily } from "@/lib/flow/state";
import { conditionQuestions } from "@/lib/flow/conditions";
import { INCISED_SPECIES } from "@/lib/solver/design/wood";
import { DEFLECTION_PRESETS } from "@/lib/solver/design/presets";
import { ENGINEERED } from "@/lib/tables/engineered";
import { I_JOISTS } from "@/lib/tables/i-joists";
import { SAWN_GRADES as GRADES, SPECIES, type SawnGrade, type Species } from "@/lib/tables/types";
import { ChoiceGroup } from "./choice-group";
import { LengthField } from "./length-field";
import { FlowNumberField } from "./number-field";

export type StepMaterialProps = { state: FlowState; update: (fn: (s: FlowState) => FlowState) => void };

const FAMILIES: { value: MaterialFamily; label: string; detail: string }[] = [
  { value: "any", label: "Any", detail: "the lightest member that works, from every table" },
  { value: "sawn", label: "Sawn lumber", detail: "one piece: 2x8, 2x10, 4x12…" },
  { value: "built-up", label: "Built-up plies", detail: "2, 3 or 4 plies of 2x nailed together" },
  { value: "engineered", label: "Engineered wood", detail: "LVL, PSL or glulam" },
  { value: "ijoist", label: "Wood I-joists", detail: "PRI-20 to PRI-90, 9-1/2 to 16 in deep; floors and flat roofs" },
  { value: "steel", label: "Steel", detail: "W-shapes, A992" },
  { value: "cfs", label: "Cold-formed steel", detail: "C-joists like 800S162-54; headers of two C-sections" },
];

/** Cold-formed steel flange widths in the tables, in (the designation's 162, 200, 250). */
const CFS_FLANGES = [
  { value: "", label: "Any flange width" },
  { value: "1.62", label: "1-5/8 in (S162)" },
  { value: "2", label: "2 in (S200)" },
  { value: "2.5", label: "2-1/2 in (S250)" },
];

function Checkbox({ label, hint, checked, onChange }: { label: string; hint?: string; checked: boolean; onChange: (v: boolean) => void }) {
  return (
    <label className="flex min-h-touch cursor-pointer items-start gap-3 py-1">
      <input type="checkbox" className="mt-1 h-6 w-6 shrink-0 accent-spruce" checked={checked} onChange={(e) => onChange(e.target.checked)} />
      <span className="flex flex-col">
        <span className="font-bold">{label}</span>
        {hint ? <span className="text-sm text-graphite">{hint}</span> : null}
      </span>
    </label>
  );
}

/** Step 4: what it is made of, and the conditions the checks need. */
export function StepMaterial({ state, update }: StepMaterialProps) {
  const m = state.material;
  // only what applies to the chosen material is asked (wood-only questions name wood under "any")
  const asked = conditionQuestions(state);
  // Spanlark's default when the builder has not said: fir and spruce incised, Southern Pine not (NDS 2018 §4.3.8)
  const incisedDefault = m.family === "any" ? true : INCISED_SPECIES.includes(m.species);
  const incised = state.incised ?? incisedDefault;
  const inWall = state.kind === "header" || state.kind === "beam";
  const preset = DEFLECTION_PRESETS.find((p) => p.live === state.limits.live && p.total === state.limits.total);
  // where the member hogs under gravity load (more than one span, an overhang) the bottom edge is in compression
  const ends = overhangs(state);
  const hogs = spansFt(state).length !== 1 || ends.left > 1e-9 || ends.right > 1e-9;
  return (
    <div className="flex flex-col gap-6">
      <ChoiceGroup
        legend="Material"
        name="family"
        value={m.family}
        onChange={(family) =>
          update((s) => ({
            ...s,
            material: { ...s.material, family, plies: family === "sawn" ? 1 : 0, product: family === s.material.family ? s.material.product : "" },
          }))
        }
        choices={FAMILIES.map((f) => ({ value: f.value, label: f.label, detail: f.detail }))}
      />

      {m.family === "sawn" || m.family === "built-up" ? (
        <div className="grid gap-3 sm:grid-cols-2">
          <SelectField
            label="Species"
            options={SPECIES.map((s) => ({ value: s, label: s }))}
            value={m.species}
            onChange={(e) => update((s) => ({ ...s, material: { ...s.material, species: e.target.value as Species } }))}
          />
          <SelectField
            label="Grade"
            options={GRADES.map((g) => ({ value: g, label: g }))}
            value={m.grade}
            onChange={(e) => update((s) => ({ ...s, material: { ...s.material, grade: e.target.value as SawnGrade } }))}
          />
          {m.family === "built-up" ? (
            <SelectField
              label="Plies"
              options={[
                { value: "0", label: "Let Spanlark pick (2 to 4)" },
                { value: "2", label: "2 plies" },
                { value: "3", label: "3 plies" },
                { value: "4", label: "4 plies" },
              ]}
              value={String(m.plies)}
              onChange={(e) => update((s) => ({ ...s, material: { ...s.material, plies: Number(e.target.value) } }))}
            />
          ) : null}
        </div>
      ) : null}

      {inWall ? (
        <ChoiceGroup
          legend={state.kind === "header" ? "Wall framing" : "Is the beam in a stud wall?"}
          name="wall-framing"
          look="segments"
          hint="Only members that fill the wall are offered: 2 plies with a 1/2 in spacer fill a 2x4 wall, 3 plies with two spacers a 2x6 wall."
          value={state.kind === "header" ? (wallOf(state) ?? "2x4") : (state.wallFraming ?? "none")}
          onChange={(wallFraming) => update((s) => ({ ...s, wallFraming }))}
          choices={[
            { value: "2x4", label: "2x4 wall" },
            { value: "2x6", label: "2x6 wall" },
            ...(state.kind === "beam" ? [{ value: "none" as const, label: "Not in a wall" }] : []),
          ]}
        />
      ) : null}

      {asked.incised !== "no" ? (
        <ChoiceGroup
          legend={asked.incised === "wood" ? "If it is sawn lumber: treated, with small slits in its faces?" : "Treated lumber with small slits in its faces?"}
          name="incised"
          look="segments"
          hint={`Most treated fir and spruce is; Southern Pine usually is not. Slits (incising) lower the strength: ×0.80 on bending and shear, ×0.95 on stiffness (NDS 2018 §4.3.8).${state.incised === null || state.incised === undefined ? ` Assumed ${incisedDefault ? "yes" : "no"} for ${m.family === "any" ? "fir and spruce (no for Southern Pine)" : m.species}.` : ""}`}
          value={incised ? "yes" : "no"}
          onChange={(v) => update((s) => ({ ...s, incised: v === "yes" }))}
          choices={[
            { value: "yes", label: "Yes, slits" },
            { value: "no", label: "No slits" },
          ]}
        />
      ) : null}

      {m.family === "engineered" ? (
        <SelectField
          label="Product"
          hint="Typical values — confirm with the supplier's published values."
          options={[{ value: "", label: "Any engineered product" }, ...ENGINEERED.map((p) => ({ value: p.name, label: `${p.name} (${p.kind})` }))]}
          value={m.product}
          onChange={(e) => update((s) => ({ ...s, material: { ...s.material, product: e.target.value } }))}
        />
      ) : null}

      {m.family === "ijoist" ? (
        <SelectField
          label="I-joist series"
          hint="APA PRI-400 generic values. A maker's own joists carry their own values; use those where they differ."
          options={[{ value: "", label: "Any series" }, ...[...new Set(I_JOISTS.map((j) => j.series))].map((series) => ({ value: series, label: series }))]}
          value={m.product}
          onChange={(e) => update((s) => ({ ...s, material: { ...s.material, product: e.target.value } }))}
        />
      ) : null}

      {m.family === "cfs" ? (
        <SelectField
          label="Flange width"
          hint="AISI S100-16 checks; Fy 33 ksi below 54 mil and 50 ksi from 54 mil up (order 50 ksi steel where the answer uses it). Bearing stiffeners are added where the web needs them."
          options={CFS_FLANGES}
          value={m.product}
          onChange={(e) => update((s) => ({ ...s, material: { ...s.material, product: e.target.value } }))}
        />
      ) : null}

      <section aria-labelledby="limits-title" className="flex flex-col gap-3">
        <h3 id="limits-title" className="text-xl font-bold">
          How stiff
        </h3>
        <SelectField
          label="Deflection limits"
          options={[
            ...DEFLECTION_PRESETS.map((p) => ({ value: p.id, label: `${p.label}: L/${p.live} live, L/${p.total} total` })),
            { value: "own", label: "My own limits" },
          ]}
          value={preset ? preset.id : "own"}
          hint={preset ? preset.source : "Set below"}
          onChange={(e) => {
            const p = DEFLECTION_PRESETS.find((d) => d.id === e.target.value);
            if (p && p.live !== null && p.total !== null)
              update((s) => ({ ...s, limits: { live: p.live ?? s.limits.live, total: p.total ?? s.limits.total } }));
          }}
        />
        <div className="grid grid-cols-2 gap-3">
          <FlowNumberField
            label="Live load limit"
            hint="360 means L/360"
            unit="L/n"
            unitSpoken="span divided by this number"
            value={state.limits.live}
            min={60}
            max={2000}
            onCommit={(live) => update((s) => ({ ...s, limits: { ...s.limits, live } }))}
          />
          <FlowNumberField
            label="Total load limit"
            hint="240 means L/240"
            unit="L/n"
            unitSpoken="span divided by this number"
            value={state.limits.total}
            min={60}
            max={2000}
            onCommit={(total) => update((s) => ({ ...s, limits: { ...s.limits, total } }))}
          />
        </div>
      </section>

      <section aria-labelledby="conditions-title" className="flex flex-col gap-1">
        <h3 id="conditions-title" className="mb-2 text-xl font-bold">
          Conditions
        </h3>
        {asked.wet !== "no" ? (
          <Checkbox
            label={asked.wet === "wood" ? "Wood in wet service" : "Wet service"}
            hint={
              asked.wet === "wood"
                ? "Wood only: outdoors or damp, like decks and exposed framing. Steel is checked the same wet or dry; I-joists, LVL and PSL are left out when wet."
                : m.family === "engineered"
                  ? "Outdoors or damp: decks, exposed framing. Glulam only; LVL and PSL are for dry service."
                  : "Outdoors or damp: decks, exposed framing"
            }
            checked={state.wet}
            onChange={(wet) => update((s) => ({ ...s, wet }))}
          />
        ) : null}
        {m.family === "ijoist" ? (
          <p className="py-1 text-sm text-graphite">I-joists are for dry service only (APA PRI-400): for a deck or wet framing choose sawn lumber.</p>
        ) : null}
        {asked.repetitive !== "no" && state.width.mode === "spacing" && state.width.spacingIn <= 24 ? (
          <Checkbox
            label={asked.repetitive === "wood" ? "Wood joists share the load" : "Joists share the load"}
            hint={`${asked.repetitive === "wood" ? "Sawn lumber only: three" : "Three"} or more at 24 in or less, sheathed together (repetitive members, Cr)`}
            checked={state.repetitive}
            onChange={(repetitive) => update((s) => ({ ...s, repetitive }))}
          />
        ) : null}
        <Checkbox label="Count the member's own weight" checked={state.selfWeight} onChange={(selfWeight) => update((s) => ({ ...s, selfWeight }))} />
        <LengthField
          containerClassName="mt-3"
          label="Top edge braced every"
          hint="0 when the floor or roof sheathing is nailed along it"
          valueFt={state.unbracedFt}
          minFt={0}
          maxFt={state.lengthFt}
          onCommit={(unbracedFt) => update((s) => ({ ...s, unbracedFt }))}
        />
        {m.family !== "ijoist" && hogs ? (
          <Checkbox
            label="Bottom edge braced along its length"
            hint="A ceiling fastened right to it. Not ticked: over a support or on an overhang the bottom edge is taken as braced only at the supports."
            checked={state.bottomBraced === true}
            onChange={(bottomBraced) => update((s) => ({ ...s, bottomBraced }))}
          />
        ) : null}
      </section>
    </div>
  );
}
