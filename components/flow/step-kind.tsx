"use client";

import { MemberKindSketch } from "@/components/shell/member-kind-sketch";
import { KIND_HINTS } from "@/lib/flow/defaults";
import { KIND_LABELS, MEMBER_KINDS, type MemberKind } from "@/lib/flow/state";
import { ChoiceGroup } from "./choice-group";

export type StepKindProps = { kind: MemberKind; onChange: (kind: MemberKind) => void };

/** Step 1: what is being sized. Each kind starts with its own sensible loads and supports. */
export function StepKind({ kind, onChange }: StepKindProps) {
  return (
    <div className="flex flex-col gap-4">
      <ChoiceGroup
        legend="Pick the member"
        name="kind"
        value={kind}
        onChange={onChange}
        hint="Each starts with typical loads for that member; you can change every value in the next steps."
        choices={MEMBER_KINDS.map((k) => ({ value: k, label: KIND_LABELS[k], media: <MemberKindSketch kind={k} className="h-10 w-14" /> }))}
      />
      <p className="rounded-lg border-2 border-rule bg-paper-raised p-3 text-ink-soft">
        <span className="font-bold text-ink">Starting point: </span>
        {KIND_HINTS[kind]}
      </p>
    </div>
  );
}
