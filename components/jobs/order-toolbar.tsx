"use client";

import { useState, useTransition, type FormEvent } from "react";
import { emailOrderList } from "@/components/orders/actions";
import { Button, buttonClasses } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { useToast } from "@/components/ui/toast";

export type OrderToolbarProps = {
  jobId: string;
};

/** Print, CSV and PDF of a job's order list. */
export function OrderToolbar({ jobId }: OrderToolbarProps) {
  return (
    <div className="no-print grid grid-cols-3 gap-2 sm:flex sm:flex-wrap">
      {/* plain links: the browser downloads the file; the app's router must not try to render it */}
      <a href={`/api/jobs/${jobId}/order?format=pdf`} download className={buttonClasses()} data-testid="order-pdf">
        PDF
      </a>
      <a href={`/api/jobs/${jobId}/order?format=csv`} download className={buttonClasses({ variant: "secondary" })} data-testid="order-csv">
        CSV
      </a>
      <Button variant="secondary" onClick={() => window.print()}>
        Print
      </Button>
    </div>
  );
}

/** "E-mail it to the yard": the list in the mail's body, CSV and PDF attached. */
export function OrderEmailForm({ jobId }: OrderToolbarProps) {
  const toast = useToast();
  const [pending, startTransition] = useTransition();
  const [to, setTo] = useState("");
  const [note, setNote] = useState("");
  const [error, setError] = useState<string | null>(null);

  const send = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setError(null);
    startTransition(async () => {
      const result = await emailOrderList({ jobId, to, note });
      if (result.ok) {
        toast.show({ message: `Order list sent to ${result.sentTo}.` });
        setNote("");
      } else {
        setError("issues" in result && result.issues?.length ? result.issues.map((i) => i.message).join("; ") : result.error);
      }
    });
  };

  return (
    <div className="no-print">
      <form onSubmit={send} noValidate className="flex flex-col gap-2 rounded-card border-2 border-rule bg-paper-raised p-4" aria-label="E-mail the order list">
        <h2 className="text-lg font-bold">E-mail it to the yard</h2>
        <TextField
          label="Send to"
          type="email"
          inputMode="email"
          autoComplete="email"
          value={to}
          onChange={(e) => setTo(e.target.value)}
          error={error ?? undefined}
          data-testid="order-mail-to"
        />
        <TextField label="Note (optional)" hint="Delivery day, who to call" value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} />
        <Button type="submit" loading={pending} className="w-full sm:w-fit" data-testid="order-mail-send">
          Send the order list
        </Button>
      </form>
    </div>
  );
}
