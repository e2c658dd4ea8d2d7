"use client";

import { useActionState, type ReactNode } from "react";
import { Button, type ButtonVariant } from "@/components/ui/button";
import { WarningIcon } from "@/components/ui/icons";
import type { BillingActionResult } from "./actions";

export type BillingActionFormProps = {
  action: (previous: BillingActionResult, form: FormData) => Promise<BillingActionResult>;
  /** Hidden fields sent with the form (the plan). */
  fields?: Record<string, string>;
  label: ReactNode;
  variant?: ButtonVariant;
  testId?: string;
};

/**
 * One button that runs a billing action and, when it works, leaves for the payment page or the portal. A
 * refusal (already subscribed, no subscription yet, a payment service that does not answer) is shown
 * under the button in words.
 */
export function BillingActionForm({ action, fields = {}, label, variant = "primary", testId }: BillingActionFormProps) {
  const [state, formAction, pending] = useActionState(action, null);
  return (
    <form action={formAction} className="flex flex-col gap-2">
      {Object.entries(fields).map(([name, value]) => (
        <input key={name} type="hidden" name={name} value={value} />
      ))}
      <Button type="submit" variant={variant} size="lg" fullWidth loading={pending} data-testid={testId}>
        {label}
      </Button>
      {state && !state.ok ? (
        <p role="alert" className="flex items-start gap-1.5 font-bold text-over-ink">
          <WarningIcon className="mt-0.5 h-5 w-5 shrink-0" />
          <span>{state.error}</span>
        </p>
      ) : null}
    </form>
  );
}
