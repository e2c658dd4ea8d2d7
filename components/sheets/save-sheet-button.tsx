"use client";

import { useRouter } from "next/navigation";
import { useEffect, useRef, useState, useTransition } from "react";
import { Button } from "@/components/ui/button";
import { saveJobSheet } from "./actions";

export type SaveSheetButtonProps = {
  jobId: string;
};

/** Freezes the job into a new sheet and opens it. */
export function SaveSheetButton({ jobId }: SaveSheetButtonProps) {
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const save = () => {
    setError(null);
    startTransition(async () => {
      const result = await saveJobSheet({ jobId });
      if (result.ok) router.push(`/sheets/${result.sheet.id}`);
      else setError(result.error);
    });
  };
  return (
    <div className="flex flex-col gap-2">
      <Button onClick={save} loading={pending} className="w-full sm:w-fit" data-testid="sheet-save">
        Save job sheet
      </Button>
      {error ? (
        <p role="alert" className="font-bold text-over-ink">
          {error}
        </p>
      ) : null}
    </div>
  );
}

/**
 * Saves the job's sheet once, on arriving back from checkout (the builder pressed "Save job sheet" before
 * subscribing), then stays on the job with the new sheet announced. The address loses ?saveSheet so a reload
 * does not save a second one.
 */
export function SaveSheetOnArrival({ jobId }: SaveSheetButtonProps) {
  const router = useRouter();
  const started = useRef(false);
  const [error, setError] = useState<string | null>(null);
  useEffect(() => {
    if (started.current) return;
    started.current = true;
    void saveJobSheet({ jobId }).then((result) => {
      if (result.ok) router.replace(`/jobs/${jobId}?sheet=${result.sheet.id}`);
      else {
        setError(result.error);
        router.replace(`/jobs/${jobId}`);
      }
    });
  }, [jobId, router]);
  return (
    <p role="status" className="font-bold" data-testid="sheet-saving-after-checkout">
      {error ?? "Saving your job sheet…"}
    </p>
  );
}
