"use client";

import { useFormik } from "formik";
import { Link } from "@/components/ui/link";
import { useState } from "react";
import * as yup from "yup";
import { ButtonLink, Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { FormAlert } from "./form-alert";
import { issuesToErrors, newPasswordRule, PASSWORD_MIN, postJson, signInWithTicket } from "./form-support";

const schema = yup.object({
  password: newPasswordRule,
  confirm: yup
    .string()
    .required("type the new password again")
    .oneOf([yup.ref("password")], "the two passwords differ"),
});

export type ResetPasswordFormProps = { token: string };

export function ResetPasswordForm({ token }: ResetPasswordFormProps) {
  const [done, setDone] = useState(false);
  const [signedIn, setSignedIn] = useState(false);
  const [linkProblem, setLinkProblem] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);

  const form = useFormik({
    initialValues: { password: "", confirm: "" },
    validationSchema: schema,
    onSubmit: async (values, helpers) => {
      setFormError(null);
      const result = await postJson<{ ticket?: string }>("/api/auth/password/reset", { token, password: values.password });
      if (result.ok) {
        setSignedIn(await signInWithTicket(result.data.ticket));
        return setDone(true);
      }
      const tokenIssue = result.issues.find((i) => i.path === "token");
      if (tokenIssue) return setLinkProblem(result.error);
      if (result.issues.length > 0) helpers.setErrors(issuesToErrors(result.issues));
      setFormError(result.error);
    },
  });

  if (done && signedIn) {
    return (
      <div className="flex flex-col gap-4" data-testid="reset-done">
        <FormAlert tone="done">Password changed. You are signed in.</FormAlert>
        <p className="text-ink-soft">Anywhere else still signed in to this account has been signed out.</p>
        <ButtonLink href="/jobs" size="lg" fullWidth data-testid="reset-carry-on">
          Go to your jobs
        </ButtonLink>
      </div>
    );
  }

  if (done) {
    return (
      <div className="flex flex-col gap-4" data-testid="reset-done">
        <FormAlert tone="done">Password changed. Sign in with the new one.</FormAlert>
        <p className="text-ink-soft">Anywhere else still signed in to this account has been signed out.</p>
        <ButtonLink href="/sign-in?from=reset" size="lg" fullWidth>
          Sign in
        </ButtonLink>
      </div>
    );
  }

  if (linkProblem) {
    return (
      <div className="flex flex-col gap-4">
        <FormAlert tone="error">{linkProblem}</FormAlert>
        <ButtonLink href="/forgot-password" size="lg" fullWidth>
          Send me a new link
        </ButtonLink>
      </div>
    );
  }

  return (
    <form onSubmit={form.handleSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <FormAlert tone="error">{formError}</FormAlert> : null}
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        error={form.touched.password ? form.errors.password : undefined}
        {...form.getFieldProps("password")}
      />
      <TextField
        label="New password again"
        type="password"
        autoComplete="new-password"
        error={form.touched.confirm ? form.errors.confirm : undefined}
        {...form.getFieldProps("confirm")}
      />
      <Button type="submit" size="lg" fullWidth loading={form.isSubmitting}>
        Save the new password
      </Button>
      <p className="text-center">
        <Link href="/sign-in" className="inline-flex min-h-touch items-center font-bold">
          Back to sign in
        </Link>
      </p>
    </form>
  );
}
