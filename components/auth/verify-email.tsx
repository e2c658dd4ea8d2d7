"use client";

import { useEffect, useState } from "react";
import { Button, ButtonLink } from "@/components/ui/button";
import { FormAlert } from "./form-alert";
import { postJson, signInWithTicket } from "./form-support";

export type VerifyEmailProps = {
  token: string;
  /** the page the builder signed up from (a checked same-origin path): confirming leads back there */
  returnTo?: string;
};

/**
 * One tap confirms the address. The link alone does not: mail scanners open links before people do, and a
 * single-use link spent by a scanner would leave the person with a dead one.
 */
export function VerifyEmail({ token, returnTo }: VerifyEmailProps) {
  const [state, setState] = useState<"idle" | "working" | "done" | "signed-in" | "failed">("idle");
  const [message, setMessage] = useState("");

  // Signed in and sent here from a page (a job's "Save job sheet", the plans): straight back to it.
  useEffect(() => {
    if (state === "signed-in" && returnTo) window.location.assign(returnTo);
  }, [state, returnTo]);

  if (state === "signed-in" && returnTo) {
    return (
      <div className="flex flex-col gap-4" data-testid="verify-done">
        <FormAlert tone="done">Your e-mail is confirmed and you are signed in. Taking you back to where you were…</FormAlert>
        <ButtonLink href={returnTo} size="lg" fullWidth data-testid="verify-carry-on">
          Back to where you were
        </ButtonLink>
      </div>
    );
  }

  if (state === "signed-in") {
    return (
      <div className="flex flex-col gap-4" data-testid="verify-done">
        <FormAlert tone="done">Your e-mail is confirmed and you are signed in.</FormAlert>
        <ButtonLink href="/size" size="lg" fullWidth data-testid="verify-carry-on">
          Size a member
        </ButtonLink>
        <ButtonLink href="/jobs" variant="secondary" fullWidth>
          Your jobs
        </ButtonLink>
      </div>
    );
  }

  if (state === "done") {
    return (
      <div className="flex flex-col gap-4" data-testid="verify-done">
        <FormAlert tone="done">Your e-mail is confirmed.</FormAlert>
        <ButtonLink href={returnTo ? `/sign-in?from=verified&callbackUrl=${encodeURIComponent(returnTo)}` : "/sign-in?from=verified"} size="lg" fullWidth>
          Sign in
        </ButtonLink>
      </div>
    );
  }

  return (
    <div className="flex flex-col gap-4">
      {state === "failed" ? <FormAlert tone="error">{message}</FormAlert> : null}
      <Button
        size="lg"
        fullWidth
        loading={state === "working"}
        onClick={async () => {
          setState("working");
          const result = await postJson<{ ticket?: string }>("/api/auth/verify", { token });
          if (result.ok) return setState((await signInWithTicket(result.data.ticket)) ? "signed-in" : "done");
          setMessage(result.error);
          setState("failed");
        }}
      >
        Confirm my e-mail
      </Button>
      {state === "failed" ? (
        <ButtonLink href="/sign-in" variant="secondary" fullWidth>
          Go to sign in
        </ButtonLink>
      ) : null}
    </div>
  );
}
