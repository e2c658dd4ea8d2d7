"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { parseLength } from "@/lib/flow/length";
import type { MemberKind } from "@/lib/flow/state";
import type { OrderDetails } from "@/lib/orders/order-list";
import { updateMember } from "./actions";

export type OrderDetailsFormProps = {
  memberId: string;
  label: string;
  kind: MemberKind;
  details: OrderDetails;
  /** the member stands on posts (and those on footings) built on the job page: the order list counts those instead */
  built?: { posts: string | null; footings: string | null };
};

const WIDTH_WORDS: Partial<Record<MemberKind, string>> = {
  "floor-joist": "Floor width the joists repeat across",
  "deck-joist": "Deck width the joists repeat across",
  rafter: "Roof length the rafters repeat along",
};

/** Which order details a kind of member takes: a width for joists and rafters, posts and footings for beams. */
export function orderDetailsApply(kind: MemberKind): { width: boolean; posts: boolean } {
  return { width: kind in WIDTH_WORDS, posts: kind === "deck-beam" || kind === "beam" };
}

function feetText(ft: number | null): string {
  return ft === null ? "" : String(Math.round(ft * 1000) / 1000);
}

/** Parses a length as builders type it (12' 6", 12-6, 150") to ft; "" is null; anything else an error. */
function lengthFt(raw: string): number | null | string {
  if (!raw.trim()) return null;
  const parsed = parseLength(raw);
  return parsed.ok ? parsed.feet : parsed.message;
}

/** The order details of one member, under its card on the job page. */
export function OrderDetailsForm({ memberId, label, kind, details, built }: OrderDetailsFormProps) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [width, setWidth] = useState(feetText(details.runWidthFt));
  const [postHeight, setPostHeight] = useState(feetText(details.postHeightFt));
  const [postSize, setPostSize] = useState(details.postSize ?? "6x6");
  const [diameter, setDiameter] = useState(details.footingDiameterIn?.toString() ?? "");
  const [depth, setDepth] = useState(details.footingDepthIn?.toString() ?? "");
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [saved, setSaved] = useState(false);
  const apply = orderDetailsApply(kind);
  if (!apply.width && !apply.posts) return null;

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setSaved(false);
    const found: Record<string, string> = {};
    const input: Record<string, unknown> = { memberId };
    if (apply.width) {
      const w = lengthFt(width);
      if (typeof w === "string") found.runWidthFt = `Width: ${w}`;
      else input.runWidthFt = w;
    }
    if (apply.posts) {
      const h = lengthFt(postHeight);
      if (typeof h === "string") found.postHeightFt = `Post height: ${h}`;
      else input.postHeightFt = h;
      input.postSize = postSize;
      for (const [key, raw, name] of [
        ["footingDiameterIn", diameter, "Footing diameter"],
        ["footingDepthIn", depth, "Footing depth"],
      ] as const) {
        if (!raw.trim()) input[key] = null;
        else if (!Number.isFinite(Number(raw))) found[key] = `${name}: type a number of inches`;
        else input[key] = Number(raw);
      }
    }
    setErrors(found);
    if (Object.keys(found).length > 0) return;
    startTransition(async () => {
      const result = await updateMember(input);
      if (!result.ok) {
        const issues = "issues" in result && result.issues ? result.issues : [];
        setErrors(issues.length ? Object.fromEntries(issues.map((i) => [i.path, i.message])) : { form: result.error });
        return;
      }
      setSaved(true);
      router.refresh();
    });
  };

  return (
    <details className="rounded-lg border-2 border-rule p-3" data-testid="order-details">
      <summary className="min-h-touch cursor-pointer content-center font-bold">
        For the order list
        {apply.width && details.runWidthFt === null ? <span className="ml-2 font-normal text-caution-ink">(width needed)</span> : null}
      </summary>
      <form onSubmit={submit} noValidate className="mt-2 flex flex-col gap-3" aria-label={`Order details of ${label}`}>
        {apply.width ? (
          <TextField
            label={WIDTH_WORDS[kind] ?? "Width"}
            hint="e.g. 16' or 16-6"
            inputMode="text"
            value={width}
            onChange={(e) => setWidth(e.target.value)}
            error={errors.runWidthFt}
            name="runWidthFt"
          />
        ) : null}
        {apply.posts ? (
          <>
            <div className="grid grid-cols-2 gap-3">
              <TextField
                label="Post height"
                hint="ft, e.g. 4'"
                value={postHeight}
                onChange={(e) => setPostHeight(e.target.value)}
                error={errors.postHeightFt}
                name="postHeightFt"
              />
              <SelectField
                label="Post size"
                value={postSize}
                onChange={(e) => setPostSize(e.target.value)}
                options={["4x4", "4x6", "6x6", "8x8"].map((v) => ({ value: v, label: v }))}
                error={errors.postSize}
              />
            </div>
            <div className="grid grid-cols-2 gap-3">
              <TextField
                label="Footing across"
                hint="in"
                inputMode="decimal"
                value={diameter}
                onChange={(e) => setDiameter(e.target.value)}
                error={errors.footingDiameterIn}
                name="footingDiameterIn"
              />
              <TextField
                label="Footing depth"
                hint="in"
                inputMode="decimal"
                value={depth}
                onChange={(e) => setDepth(e.target.value)}
                error={errors.footingDepthIn}
                name="footingDepthIn"
              />
            </div>
            <p className="text-sm text-ink-soft">Spanlark counts posts and concrete from these numbers; it does not check them.</p>
            {built?.posts ? (
              <p className="text-sm text-ink-soft" data-testid="order-details-built">
                This member stands on {built.posts}
                {built.footings ? ` on ${built.footings}` : ""}, built and checked on this page: the order list counts{" "}
                {built.footings ? "those posts and footings" : "those posts"}, and these numbers only for supports not on them.
              </p>
            ) : null}
          </>
        ) : null}
        {errors.form ? (
          <p role="alert" className="font-bold text-over-ink">
            {errors.form}
          </p>
        ) : null}
        <div className="flex items-center gap-3">
          <Button type="submit" variant="secondary" loading={pending}>
            Save
          </Button>
          {saved ? (
            <span role="status" className="font-bold text-sound-ink">
              Saved
            </span>
          ) : null}
        </div>
      </form>
    </details>
  );
}
