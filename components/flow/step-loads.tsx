"use client";

import dynamic from "next/dynamic";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { SelectField } from "@/components/ui/field";
import { LOAD_CASE_LABELS } from "@/lib/flow/forms";
import { formatFeetInches } from "@/lib/flow/length";
import { newLoadId, type FlowAreaLoad, type FlowLineLoad, type FlowPointLoad, type FlowState } from "@/lib/flow/state";
import { OCCUPANCY_PRESETS, findOccupancyPreset } from "@/lib/solver/asce7/loads";
import { designFlatRoofSnow, EXPOSURE_CE, EXPOSURE_WORDS, THERMAL_CT, THERMAL_WORDS, type RoofExposure, type RoofThermal } from "@/lib/solver/asce7/snow";
import { asdSnowFactor } from "@/lib/solver/asce7/combinations";
import type { LoadStandard } from "@/lib/solver/asce7/standard";
import { LOAD_CASES, type LoadCase } from "@/lib/solver/types";
import { ChoiceGroup } from "./choice-group";
import { LengthField } from "./length-field";
import { FlowNumberField } from "./number-field";
import { TributarySketch } from "./tributary-sketch";

// the load dialogs (and the form library in them) load with this step, not with the flow's first screen
const PointLoadDialog = dynamic(() => import("./load-dialog").then((m) => m.PointLoadDialog), { ssr: false });
const LineLoadDialog = dynamic(() => import("./load-dialog").then((m) => m.LineLoadDialog), { ssr: false });

export type StepLoadsProps = { state: FlowState; update: (fn: (s: FlowState) => FlowState) => void };

const SPACINGS = [12, 16, 19.2, 24];
const caseOptions = LOAD_CASES.map((c) => ({ value: c, label: LOAD_CASE_LABELS[c] }));
const presetOptions = [
  ...OCCUPANCY_PRESETS.map((p) => ({ value: p.id, label: `${p.label} — ${p.psf} psf ${p.case}` })),
  { value: "custom", label: "Other (type the psf)" },
];
const EXPOSURES = (Object.keys(EXPOSURE_CE) as RoofExposure[]).map((value) => ({ value, label: `${EXPOSURE_WORDS[value]} (Ce ${EXPOSURE_CE[value]})` }));
const THERMALS = (Object.keys(THERMAL_CT) as RoofThermal[]).map((value) => ({ value, label: `${THERMAL_WORDS[value]} (Ct ${THERMAL_CT[value]})` }));

function AreaLoadRow({ load, index, onChange, onRemove }: { load: FlowAreaLoad; index: number; onChange: (l: FlowAreaLoad) => void; onRemove: () => void }) {
  const preset = findOccupancyPreset(load.preset);
  return (
    <li className="flex flex-col gap-3 rounded-card border-2 border-rule bg-paper-raised p-3">
      <SelectField
        label={`Area load ${index + 1}`}
        options={presetOptions}
        value={preset ? preset.id : "custom"}
        onChange={(event) => {
          const p = findOccupancyPreset(event.target.value);
          onChange(p ? { ...load, preset: p.id, label: p.label, case: p.case, psf: p.psf } : { ...load, preset: "custom", label: "Other area load" });
        }}
      />
      <div className="grid grid-cols-2 gap-3">
        <FlowNumberField
          label="Load"
          unit="psf"
          unitSpoken="pounds per square foot"
          value={load.psf}
          min={0}
          max={1000}
          onCommit={(psf) => onChange({ ...load, psf, preset: preset && preset.psf === psf ? preset.id : "custom" })}
        />
        <SelectField
          label="Case"
          options={caseOptions.map((o) => ({ ...o, label: o.value }))}
          value={load.case}
          onChange={(event) => onChange({ ...load, case: event.target.value as LoadCase, preset: "custom" })}
        />
      </div>
      <div className="flex items-center justify-between gap-2">
        <p className="text-sm text-graphite">
          {preset && preset.psf === load.psf && preset.case === load.case ? `Source: ${preset.source}` : "Your own value"}
        </p>
        <Button variant="ghost" onClick={onRemove} aria-label={`Remove area load ${index + 1}, ${load.label}`}>
          Remove
        </Button>
      </div>
    </li>
  );
}

/** Step 3: what the member carries. */
export function StepLoads({ state, update }: StepLoadsProps) {
  const [pointDialog, setPointDialog] = useState<{ open: boolean; load: FlowPointLoad | null }>({ open: false, load: null });
  const [lineDialog, setLineDialog] = useState<{ open: boolean; load: FlowLineLoad | null }>({ open: false, load: null });
  const standard: LoadStandard = state.loadStandard ?? "ASCE 7-16";
  const snow = designFlatRoofSnow({ pg: state.snow.groundPsf, Ce: EXPOSURE_CE[state.snow.exposure], Ct: THERMAL_CT[state.snow.thermal] }, standard);
  const widthFt = state.width.mode === "spacing" ? state.width.spacingIn / 12 : state.width.tributaryFt;
  const r1 = (v: number) => (Math.round(v * 10) / 10).toLocaleString("en-US");
  const roofLivePsf = state.areaLoads.filter((a) => a.case === "Lr").reduce((sum, a) => sum + a.psf, 0);
  const hasOtherSnow =
    state.pointLoads.some((p) => p.case === "S") || state.lineLoads.some((l) => l.case === "S") || state.areaLoads.some((a) => a.case === "S");

  return (
    <div className="flex flex-col gap-6">
      <section aria-labelledby="width-title" className="flex flex-col gap-3">
        <h3 id="width-title" className="text-xl font-bold">
          How wide a strip it carries
        </h3>
        <ChoiceGroup
          legend="The member carries"
          name="width-mode"
          look="segments"
          value={state.width.mode}
          onChange={(mode) =>
            update((s) => ({
              ...s,
              width: mode === "spacing" ? { mode, spacingIn: 16 } : { mode, tributaryFt: 12 },
              repetitive: mode === "spacing" ? s.repetitive : false,
            }))
          }
          choices={[
            { value: "spacing", label: "Joist spacing" },
            { value: "tributary", label: "Tributary width" },
          ]}
        />
        {state.width.mode === "spacing" ? (
          <div className="flex flex-col gap-3">
            <ChoiceGroup
              legend="Spacing, center to center"
              name="spacing"
              look="segments"
              value={SPACINGS.includes(state.width.spacingIn) ? String(state.width.spacingIn) : ""}
              onChange={(v) => update((s) => ({ ...s, width: { mode: "spacing", spacingIn: Number(v) } }))}
              choices={SPACINGS.map((n) => ({ value: String(n), label: `${n} in` }))}
            />
            <FlowNumberField
              label="Or type the spacing"
              unit="in"
              unitSpoken="inches"
              value={state.width.spacingIn}
              min={0}
              exclusiveMin
              max={96}
              onCommit={(spacingIn) => update((s) => ({ ...s, width: { mode: "spacing", spacingIn } }))}
            />
          </div>
        ) : (
          <LengthField
            label="Tributary width"
            valueFt={state.width.tributaryFt}
            minFt={0}
            exclusiveMin
            maxFt={60}
            hint="Half the joist span on each side, added together"
            onCommit={(tributaryFt) => update((s) => ({ ...s, width: { mode: "tributary", tributaryFt } }))}
          />
        )}
        <TributarySketch mode={state.width.mode} />
      </section>

      <section aria-labelledby="area-title" className="flex flex-col gap-3">
        <h3 id="area-title" className="text-xl font-bold">
          Floor and roof loads
        </h3>
        <p className="text-ink-soft">Pounds per square foot over the strip above. Minimum live loads from IRC 2021 Table R301.5.</p>
        <ul className="flex flex-col gap-3">
          {state.areaLoads.map((load, i) => (
            <AreaLoadRow
              key={load.id}
              load={load}
              index={i}
              onChange={(l) => update((s) => ({ ...s, areaLoads: s.areaLoads.map((a) => (a.id === load.id ? l : a)) }))}
              onRemove={() => update((s) => ({ ...s, areaLoads: s.areaLoads.filter((a) => a.id !== load.id) }))}
            />
          ))}
        </ul>
        <div>
          <Button
            variant="secondary"
            onClick={() =>
              update((s) => ({ ...s, areaLoads: [...s.areaLoads, { id: newLoadId("a"), preset: "custom", label: "Other area load", case: "D", psf: 0 }] }))
            }
          >
            + Add an area load
          </Button>
        </div>
      </section>

      <section aria-labelledby="snow-title" className="flex flex-col gap-3">
        <h3 id="snow-title" className="text-xl font-bold">
          Snow
        </h3>
        <label className="flex min-h-touch cursor-pointer items-center gap-3">
          <input
            type="checkbox"
            className="h-6 w-6 accent-spruce"
            checked={state.snow.on}
            onChange={(event) => update((s) => ({ ...s, snow: { ...s.snow, on: event.target.checked } }))}
          />
          <span className="font-bold">Roof snow on this member</span>
        </label>
        {state.snow.on || hasOtherSnow ? (
          <ChoiceGroup
            legend="Which map is your ground snow number from?"
            name="snow-map"
            value={standard}
            hint="Ask the building department if unsure. The older map is the safe reading of a number."
            onChange={(loadStandard) => update((s) => ({ ...s, loadStandard }))}
            choices={[
              { value: "ASCE 7-16", label: "The map in the 2021 code or older", detail: "ASCE 7-16: snow counted in full (D + S). Most areas still use this." },
              { value: "ASCE 7-22", label: "The newer risk-based map", detail: "2024 code, ASCE 7-22: its numbers are larger, counted at 0.7 (D + 0.7S)." },
            ]}
          />
        ) : null}
        {state.snow.on ? (
          <div className="flex flex-col gap-3">
            <FlowNumberField
              label="Ground snow load, pg"
              unit="psf"
              unitSpoken="pounds per square foot"
              hint="The number on that map for your site"
              value={state.snow.groundPsf}
              min={0}
              max={500}
              onCommit={(groundPsf) => update((s) => ({ ...s, snow: { ...s.snow, groundPsf } }))}
            />
            <div className="grid gap-3 sm:grid-cols-2">
              <SelectField
                label="Roof exposure"
                options={EXPOSURES}
                value={state.snow.exposure}
                onChange={(e) => update((s) => ({ ...s, snow: { ...s.snow, exposure: e.target.value as RoofExposure } }))}
              />
              <SelectField
                label="Building heat"
                options={THERMALS}
                value={state.snow.thermal}
                onChange={(e) => update((s) => ({ ...s, snow: { ...s.snow, thermal: e.target.value as RoofThermal } }))}
              />
            </div>
            <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 rounded-lg bg-paper-sunk p-3 text-ink tabular-nums" aria-label="Roof loads on this member">
              <dt className="font-bold">Roof snow</dt>
              <dd>
                {r1(snow.ps)} psf → {r1(snow.ps * widthFt)} plf
                {asdSnowFactor(standard) !== 1 ? `, counted as ${r1(0.7 * snow.ps * widthFt)} plf (0.7S)` : ""}
              </dd>
              {roofLivePsf > 0 ? (
                <>
                  <dt className="font-bold">Roof live load</dt>
                  <dd>
                    {r1(roofLivePsf)} psf → {r1(roofLivePsf * widthFt)} plf
                  </dd>
                </>
              ) : null}
            </dl>
            <p className="text-sm text-graphite">
              pf = 0.7 × Ce × Ct × pg = {r1(snow.pf)} psf, at least {r1(snow.pm)} psf ({snow.clause}); the larger of roof snow and roof live load governs.
            </p>
          </div>
        ) : null}
      </section>

      <section aria-labelledby="extra-title" className="flex flex-col gap-3">
        <h3 id="extra-title" className="text-xl font-bold">
          Posts, walls and partial loads
        </h3>
        {state.pointLoads.length + state.lineLoads.length === 0 ? <p className="text-ink-soft">None yet.</p> : null}
        <ul className="flex flex-col gap-2">
          {state.pointLoads.map((p) => (
            <li key={p.id} className="flex items-center justify-between gap-2 rounded-lg border-2 border-rule bg-paper-raised p-2 pl-3">
              <span className="tabular-nums">
                <span className="font-bold">{p.label}</span>: {p.P.toLocaleString("en-US")} lb {p.case} at {formatFeetInches(p.x)}
              </span>
              <span className="flex gap-1">
                <Button variant="ghost" onClick={() => setPointDialog({ open: true, load: p })} aria-label={`Change ${p.label}`}>
                  Change
                </Button>
                <Button
                  variant="ghost"
                  onClick={() => update((s) => ({ ...s, pointLoads: s.pointLoads.filter((x) => x.id !== p.id) }))}
                  aria-label={`Remove ${p.label}`}
                >
                  Remove
                </Button>
              </span>
            </li>
          ))}
          {state.lineLoads.map((l) => (
            <li key={l.id} className="flex items-center justify-between gap-2 rounded-lg border-2 border-rule bg-paper-raised p-2 pl-3">
              <span className="tabular-nums">
                <span className="font-bold">{l.label}</span>: {l.w.toLocaleString("en-US")} plf {l.case}, {formatFeetInches(l.from)} to {formatFeetInches(l.to)}
              </span>
              <span className="flex gap-1">
                <Button variant="ghost" onClick={() => setLineDialog({ open: true, load: l })} aria-label={`Change ${l.label}`}>
                  Change
                </Button>
                <Button
                  variant="ghost"
                  onClick={() => update((s) => ({ ...s, lineLoads: s.lineLoads.filter((x) => x.id !== l.id) }))}
                  aria-label={`Remove ${l.label}`}
                >
                  Remove
                </Button>
              </span>
            </li>
          ))}
        </ul>
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" onClick={() => setPointDialog({ open: true, load: null })}>
            + Post or point load
          </Button>
          <Button variant="secondary" onClick={() => setLineDialog({ open: true, load: null })}>
            + Wall or line load
          </Button>
        </div>
      </section>

      <PointLoadDialog
        open={pointDialog.open}
        lengthFt={state.lengthFt}
        initial={pointDialog.load}
        onClose={() => setPointDialog({ open: false, load: null })}
        onSave={(load) => {
          update((s) => ({
            ...s,
            pointLoads: s.pointLoads.some((p) => p.id === load.id) ? s.pointLoads.map((p) => (p.id === load.id ? load : p)) : [...s.pointLoads, load],
          }));
          setPointDialog({ open: false, load: null });
        }}
      />
      <LineLoadDialog
        open={lineDialog.open}
        lengthFt={state.lengthFt}
        initial={lineDialog.load}
        onClose={() => setLineDialog({ open: false, load: null })}
        onSave={(load) => {
          update((s) => ({
            ...s,
            lineLoads: s.lineLoads.some((p) => p.id === load.id) ? s.lineLoads.map((p) => (p.id === load.id ? load : p)) : [...s.lineLoads, load],
          }));
          setLineDialog({ open: false, load: null });
        }}
      />
    </div>
  );
}
