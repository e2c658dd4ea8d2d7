"use client";

import { useEffect, useState } from "react";
import { Button, ButtonLink } from "@/components/ui/button";
import { WarningIcon } from "@/components/ui/icons";
import { databaseStatus } from "@/components/shell/database-status";

function referenceOf(error: unknown): string | null {
  if (typeof error === "object" && error !== null && "digest" in error && typeof error.digest === "string") return error.digest;
  return null;
}

/** While the database is down, how often to look whether it is back (then the page reloads by itself). */
const RECHECK_MS = 15_000;

// Shown in place of a page that failed. Never the raw error: only a reference the logs can be searched for.
// A page fails this way mostly when the database is down; the health check says so, and then the words
// are a plain "try again in a minute" and the page comes back by itself once the database answers.
export default function PageError({ error, retry }: { error: unknown; retry: () => void }) {
  const reference = referenceOf(error);
  const [database, setDatabase] = useState<"unknown" | "up" | "down">("unknown");

  useEffect(() => {
    let stopped = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    let wasDown = false;
    const check = async () => {
      const state = await databaseStatus();
      if (stopped) return;
      setDatabase(state);
      if (state === "down") {
        wasDown = true;
        timer = setTimeout(check, RECHECK_MS);
      } else if (wasDown && state === "up") {
        window.location.reload();
      }
    };
    void check();
    return () => {
      stopped = true;
      if (timer) clearTimeout(timer);
    };
  }, []);

  if (database === "down") {
    return (
      <section aria-labelledby="error-title" className="mx-auto flex max-w-xl flex-col gap-4 py-8">
        <WarningIcon className="h-10 w-10 text-caution" />
        <h1 id="error-title" className="text-3xl font-bold">
          Try again in a minute
        </h1>
        <p className="text-lg">
          Spanlark cannot reach its saved records right now: jobs, sheets and accounts are out of reach for a moment. This page reloads by itself when they are
          back.
        </p>
        <p className="text-lg">Sizing a member still works: what you enter in the sizing steps is kept on this phone.</p>
        <div className="flex flex-col gap-2 sm:flex-row">
          <ButtonLink href="/size" size="lg">
            Size a member
          </ButtonLink>
          <Button onClick={() => retry()} variant="secondary" size="lg">
            Try again
          </Button>
        </div>
      </section>
    );
  }

  return (
    <section aria-labelledby="error-title" className="mx-auto flex max-w-xl flex-col gap-4 py-8">
      <WarningIcon className="h-10 w-10 text-caution" />
      <h1 id="error-title" className="text-3xl font-bold">
        This page did not load
      </h1>
      <p className="text-lg">
        Something went wrong on our side, not with what you typed. What you entered in the sizing steps is kept on this phone, so trying again loses nothing.
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
