"use client";

import { BeamDiagram } from "@/components/diagrams/beam-diagram";
import { LoadDiagram } from "@/components/diagrams/load-diagram";
import type { CheckOutput } from "@/lib/solver/design/check";

export type AnswerDiagramsProps = { check: CheckOutput };

const oneDecimal = (v: number) => (Math.round(v * 100) / 100).toFixed(2);

/**
 * Loads, shear, moment and deflection of the chosen member as the server worked them out with its
 * check (exact polynomial segments): shear and moment under the combination that governs strength,
 * deflection and reactions under the service combination that governs total-load deflection.
 */
export function AnswerDiagrams({ check }: AnswerDiagramsProps) {
  const d = check.diagrams;
  if (!d) return <p className="text-ink-soft">The diagrams cannot be drawn for this layout.</p>;
  return (
    <div className="grid gap-5 lg:grid-cols-2">
      <LoadDiagram
        title="Loads (unfactored, by case)"
        lengthFt={d.lengthFt}
        supports={d.supports}
        loads={d.loads}
        reactions={d.service.reactions}
        subtitle={`Reactions under ${d.service.combination.name}`}
      />
      <BeamDiagram
        title="Shear V (lb)"
        subtitle={d.strength.combination.name}
        quantity="V"
        unit="lb"
        segments={d.strength.segments}
        extremes={d.strength.shear}
        supports={d.supports}
      />
      <BeamDiagram
        title="Moment M (lb-ft)"
        subtitle={d.strength.combination.name}
        quantity="M"
        unit="lb-ft"
        segments={d.strength.segments}
        extremes={d.strength.moment}
        supports={d.supports}
      />
      <BeamDiagram
        title="Deflection (in, down)"
        subtitle={d.service.combination.name}
        quantity="deflection"
        unit="in"
        segments={d.service.segments}
        extremes={d.service.deflection}
        supports={d.supports}
        format={oneDecimal}
      />
    </div>
  );
}
