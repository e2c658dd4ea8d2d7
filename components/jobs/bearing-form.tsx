"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { formatFeetInches, parseLength } from "@/lib/flow/length";
import type { Bearing } from "@/lib/jobs/load-path";
import { updateMember } from "./actions";

export type BearingFormProps = {
  memberId: string;
  carrierLabel: string;
  carrierLengthFt: number;
  /** the member's supports, ft from its left end, in order */
  supportsFt: number[];
  /** joists or rafters at a spacing: they sit along a stretch of the carrier; otherwise the member bears at one point */
  atSpacing: boolean;
  bearing: Bearing | null;
};

function lengthOrProblem(raw: string, label: string): number | string | undefined {
  if (!raw.trim()) return undefined;
  const parsed = parseLength(raw);
  return parsed.ok ? parsed.feet : `${label}: ${parsed.message}`;
}

/** Where a member sits on the member carrying it: which of its supports, and where along the carrier. */
export function BearingForm({ memberId, carrierLabel, carrierLengthFt, supportsFt, atSpacing, bearing }: BearingFormProps) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const last = Math.max(0, supportsFt.length - 1);
  const [support, setSupport] = useState(String(bearing?.supports?.[0] ?? last));
  const [from, setFrom] = useState(bearing?.fromFt !== undefined ? formatFeetInches(bearing.fromFt) : "");
  const [to, setTo] = useState(bearing?.toFt !== undefined ? formatFeetInches(bearing.toFt) : "");
  const [at, setAt] = useState(bearing?.xFt !== undefined ? formatFeetInches(bearing.xFt) : "");
  const [problem, setProblem] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setProblem(null);
    setSaved(false);
    const next: Bearing = { supports: [Number(support)] };
    const fields = atSpacing ? ([["fromFt", from, "From"] as const, ["toFt", to, "To"] as const] as const) : ([["xFt", at, "Bears at"] as const] as const);
    for (const [key, raw, label] of fields) {
      const v = lengthOrProblem(raw, label);
      if (typeof v === "string") {
        setProblem(v);
        return;
      }
      if (v !== undefined) next[key] = v;
    }
    startTransition(async () => {
      const result = await updateMember({ memberId, bearing: next });
      if (!result.ok) {
        setProblem("issues" in result && result.issues?.length ? result.issues.map((i) => i.message).join("; ") : result.error);
        return;
      }
      setSaved(true);
      router.refresh();
    });
  };

  return (
    <form onSubmit={submit} className="flex flex-col gap-2 rounded-lg border border-rule p-3" noValidate>
      <p className="font-bold">Where it sits on {carrierLabel}</p>
      <SelectField
        label="Its support on it"
        options={supportsFt.map((x, i) => ({ value: String(i), label: `Support ${i + 1}, at ${formatFeetInches(x)}` }))}
        value={support}
        onChange={(e) => setSupport(e.target.value)}
      />
      {atSpacing ? (
        <div className="grid grid-cols-2 gap-2">
          <TextField label={`From, on ${carrierLabel}`} hint={`0' 0" if empty`} value={from} onChange={(e) => setFrom(e.target.value)} />
          <TextField
            label={`To, on ${carrierLabel}`}
            hint={`${formatFeetInches(carrierLengthFt)} if empty`}
            value={to}
            onChange={(e) => setTo(e.target.value)}
          />
        </div>
      ) : (
        <TextField
          label={`Bears at, on ${carrierLabel}`}
          hint={`Its middle (${formatFeetInches(carrierLengthFt / 2)}) if empty`}
          value={at}
          onChange={(e) => setAt(e.target.value)}
        />
      )}
      {problem ? (
        <p role="alert" className="font-bold text-over-ink">
          {problem}
        </p>
      ) : null}
      {saved ? <p role="status">Done: the members below were worked out again.</p> : null}
      <div>
        <Button type="submit" variant="secondary" loading={pending}>
          Set where it sits
        </Button>
      </div>
    </form>
  );
}
