"use client";

import { useFormik } from "formik";
import { rewarmPhonePages } from "@/components/offline/phone-pages";
import { Link } from "@/components/ui/link";
import { signIn } from "next-auth/react";
import { useState } from "react";
import * as yup from "yup";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { EmailField } from "./email-field";
import { FormAlert } from "./form-alert";
import { safeReturnPath } from "@/lib/auth/return-path";
import { emailRule, postJson } from "./form-support";

const schema = yup.object({
  email: emailRule,
  password: yup.string().required("enter your password"),
});

export type SignInFormProps = {
  callbackUrl?: string;
  /** A note from the page that sent the user here ("Password changed", "E-mail confirmed"). */
  notice?: string;
};

type Problem =
  { kind: "invalid" } | { kind: "unverified"; email: string } | { kind: "limited" } | { kind: "offline" } | { kind: "unavailable" } | { kind: "busy" };

export function SignInForm({ callbackUrl, notice }: SignInFormProps) {
  const [problem, setProblem] = useState<Problem | null>(null);
  const [resent, setResent] = useState<"idle" | "sending" | "sent" | "failed">("idle");

  const form = useFormik({
    initialValues: { email: "", password: "" },
    validationSchema: schema,
    onSubmit: async (values) => {
      setProblem(null);
      setResent("idle");
      const email = values.email.trim();
      const target = safeReturnPath(callbackUrl, window.location.origin);
      const result = await signIn("credentials", { email, password: values.password, redirect: false, callbackUrl: target }).catch(() => undefined);
      if (!result) return setProblem({ kind: "offline" });
      if (result.ok && !result.error) {
        // the pages kept for no signal were drawn signed out: fetch them again as this account
        rewarmPhonePages();
        window.location.assign(target);
        return;
      }
      if (result.error === "EmailNotVerified") return setProblem({ kind: "unverified", email });
      if (result.error === "TooManyTries") return setProblem({ kind: "limited" });
      if (result.error === "DatabaseUnavailable") return setProblem({ kind: "unavailable" });
      if (result.error === "TooBusy") return setProblem({ kind: "busy" });
      setProblem({ kind: "invalid" });
    },
  });

  async function resend(email: string) {
    setResent("sending");
    const result = await postJson("/api/auth/verify/resend", { email });
    setResent(result.ok ? "sent" : "failed");
  }

  const fieldError = (name: "email" | "password") => (form.touched[name] ? form.errors[name] : undefined);

  return (
    <form onSubmit={form.handleSubmit} noValidate className="flex flex-col gap-4">
      {notice && !problem ? <FormAlert tone="done">{notice}</FormAlert> : null}
      {problem?.kind === "invalid" ? <FormAlert tone="error">That e-mail and password do not match an account. Check both and try again.</FormAlert> : null}
      {problem?.kind === "limited" ? <FormAlert tone="error">Too many tries. Wait 15 minutes and try again, or choose a new password below.</FormAlert> : null}
      {problem?.kind === "busy" ? (
        <FormAlert tone="error">Spanlark is checking a lot of sign-ins at this moment. Wait a few seconds and press Sign in again.</FormAlert>
      ) : null}
      {problem?.kind === "offline" ? <FormAlert tone="error">No connection. Check your signal and try again.</FormAlert> : null}
      {problem?.kind === "unavailable" ? (
        <FormAlert tone="error">Spanlark cannot reach its saved records right now. Try again in a minute; sizing still works without signing in.</FormAlert>
      ) : null}
      {problem?.kind === "unverified" ? (
        <FormAlert tone="error">
          <p>Confirm your e-mail first: open the link we sent to {problem.email}.</p>
          {resent === "sent" ? (
            <p className="mt-2 font-normal text-ink">A new link is on its way. It works for 48 hours.</p>
          ) : (
            <Button variant="secondary" className="mt-2" loading={resent === "sending"} onClick={() => resend(problem.email)}>
              Send the link again
            </Button>
          )}
          {resent === "failed" ? <p className="mt-2">The link could not be sent just now; try again in a few minutes.</p> : null}
        </FormAlert>
      ) : null}
      <EmailField error={fieldError("email")} {...form.getFieldProps("email")} />
      <TextField label="Password" type="password" autoComplete="current-password" error={fieldError("password")} {...form.getFieldProps("password")} />
      <Button type="submit" size="lg" fullWidth loading={form.isSubmitting}>
        Sign in
      </Button>
      <p className="flex flex-col gap-1 text-center sm:flex-row sm:justify-between">
        <Link href="/forgot-password" className="inline-flex min-h-touch items-center justify-center font-bold">
          Forgot your password?
        </Link>
        <Link
          href={callbackUrl ? `/sign-up?callbackUrl=${encodeURIComponent(callbackUrl)}` : "/sign-up"}
          className="inline-flex min-h-touch items-center justify-center font-bold"
        >
          No account yet? Open one
        </Link>
      </p>
    </form>
  );
}
