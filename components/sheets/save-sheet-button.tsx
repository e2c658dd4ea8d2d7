"use client";

import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
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
