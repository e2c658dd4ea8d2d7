"use client";

import { useMemo } from "react";
import { BeamDiagram, type DiagramExtreme } from "@/components/diagrams/beam-diagram";
import { LoadDiagram } from "@/components/diagrams/load-diagram";
import { combinationFactors, diagramBeam } from "@/lib/flow/request";
import type { FlowState } from "@/lib/flow/state";
import { analyzeBeam } from "@/lib/solver/beam";
import type { CheckOutput } from "@/lib/solver/design/check";
import type { Load } from "@/lib/solver/types";

export type AnswerDiagramsProps = { state: FlowState; check: CheckOutput };

/** Same-case uniform loads over the same stretch drawn as one band. */
function mergeBands(loads: readonly Load[]): Load[] {
  const out: Load[] = [];
  for (const l of loads) {
    if (l.type === "udl") {
      const same = out.find((o): o is Extract<Load, { type: "udl" }> => o.type === "udl" && o.case === l.case && Math.abs(o.from - l.from) < 1e-9 && Math.abs(o.to - l.to) < 1e-9);
      if (same) {
        same.w += l.w;
        continue;
      }
      out.push({ ...l });
    } else out.push(l);
  }
  return out;
}

const oneDecimal = (v: number) => (Math.round(v * 100) / 100).toFixed(2);

/**
 * Loads, shear, moment and deflection of the chosen member, drawn exactly from the solver's
 * polynomial segments: shear and moment under the combination that governs bending, deflection
 * under the combination that governs total-load deflection.
 */
export function AnswerDiagrams({ state, check }: AnswerDiagramsProps) {
  const drawn = useMemo(() => {
    try {
      const beam = diagramBeam(state, check);
      const bending = check.checks.find((c) => c.name === "bending");
      const deflection = check.checks.find((c) => c.name === "deflection-total");
      const strengthName = bending?.combination ?? "D+L";
      const serviceName = deflection?.combination ?? strengthName;
      const strength = analyzeBeam(beam, combinationFactors(strengthName) ?? undefined);
      const service = analyzeBeam(beam, combinationFactors(serviceName) ?? undefined);
      const e = strength.extremes;
      const vExtremes: DiagramExtreme[] = [];
      const vMax = e.Vabs;
      vExtremes.push({ x: vMax.x, value: vMax.value, label: "Largest shear" });
      const mExtremes: DiagramExtreme[] = [];
      if (e.Mpos.value > 1e-6) mExtremes.push({ x: e.Mpos.x, value: e.Mpos.value, label: "Largest moment" });
      if (e.Mneg.value < -1e-6) mExtremes.push({ x: e.Mneg.x, value: e.Mneg.value, label: "Largest hogging moment" });
      const dExtremes: DiagramExtreme[] = [];
      if (service.extremes.deflDown.value > 1e-9) dExtremes.push({ x: service.extremes.deflDown.x, value: service.extremes.deflDown.value, label: "Largest sag" });
      if (service.extremes.deflUp.value < -1e-9) dExtremes.push({ x: service.extremes.deflUp.x, value: service.extremes.deflUp.value, label: "Largest lift" });
      return { beam, strength, service, strengthName, serviceName, vExtremes, mExtremes, dExtremes };
    } catch {
      return null;
    }
  }, [state, check]);

  if (!drawn) return <p className="text-ink-soft">The diagrams cannot be drawn for this layout.</p>;
  return (
    <div className="grid gap-5 lg:grid-cols-2">
      <LoadDiagram
        title="Loads (unfactored, by case)"
        lengthFt={drawn.beam.length}
        supports={drawn.beam.supports}
        loads={mergeBands(drawn.beam.loads)}
        reactions={drawn.service.reactions}
        subtitle={`Reactions under ${drawn.serviceName}`}
      />
      <BeamDiagram title="Shear V (lb)" subtitle={drawn.strengthName} quantity="V" unit="lb" segments={drawn.strength.segments} extremes={drawn.vExtremes} supports={drawn.beam.supports} />
      <BeamDiagram title="Moment M (lb-ft)" subtitle={drawn.strengthName} quantity="M" unit="lb-ft" segments={drawn.strength.segments} extremes={drawn.mExtremes} supports={drawn.beam.supports} />
      <BeamDiagram
        title="Deflection (in, down)"
        subtitle={drawn.serviceName}
        quantity="deflection"
        unit="in"
        segments={drawn.service.segments}
        extremes={drawn.dExtremes}
        supports={drawn.beam.supports}
        format={oneDecimal}
      />
    </div>
  );
}
