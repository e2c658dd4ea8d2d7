"use client";

import { Button, ButtonLink } from "@/components/ui/button";
import { WarningIcon } from "@/components/ui/icons";

function referenceOf(error: unknown): string | null {
  if (typeof error === "object" && error !== null && "digest" in error && typeof error.digest === "string") return error.digest;
  return null;
}

// Shown in place of a page that failed. Never the raw error: only a reference the logs can be searched for.
export default function PageError({ error, retry }: { error: unknown; retry: () => void }) {
  const reference = referenceOf(error);
  return (
    <section aria-labelledby="error-title" className="mx-auto flex max-w-xl flex-col gap-4 py-8">
      <WarningIcon className="h-10 w-10 text-caution" />
      <h1 id="error-title" className="text-3xl font-bold">
        This page did not load
      </h1>
      <p className="text-lg">
        Something went wrong on our side, not with what you typed. What you entered in the sizing steps is kept on this
        phone, so trying again loses nothing.
      </p>
      {reference ? (
        <p className="text-ink-soft">
          If it keeps happening, tell us this reference: <span className="figures font-bold text-ink">{reference}</span>
        </p>
      ) : null}
      <div className="flex flex-col gap-2 sm:flex-row">
        <Button onClick={() => retry()} size="lg">
          Try again
        </Button>
        <ButtonLink href="/" variant="secondary" size="lg">
          Go to the start
        </ButtonLink>
      </div>
    </section>
  );
}
