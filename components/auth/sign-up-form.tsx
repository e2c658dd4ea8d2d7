"use client";

import { useFormik } from "formik";
import { Link } from "@/components/ui/link";
import { useState } from "react";
import * as yup from "yup";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { EmailField } from "./email-field";
import { FormAlert } from "./form-alert";
import { companyRule, emailRule, issuesToErrors, nameRule, newPasswordRule, PASSWORD_MIN, postJson } from "./form-support";

const schema = yup.object({ name: nameRule, company: companyRule, email: emailRule, password: newPasswordRule });

export type SignUpFormProps = {
  /** the page that asked for an account, carried to sign-in so it returns there */
  callbackUrl?: string;
};

export function SignUpForm({ callbackUrl }: SignUpFormProps = {}) {
  const signInHref = callbackUrl ? `/sign-in?callbackUrl=${encodeURIComponent(callbackUrl)}` : "/sign-in";
  const [sentTo, setSentTo] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);
  const [resent, setResent] = useState<"idle" | "sending" | "sent">("idle");

  const form = useFormik({
    initialValues: { name: "", company: "", email: "", password: "" },
    validationSchema: schema,
    onSubmit: async (values, helpers) => {
      setFormError(null);
      // the page that sent the builder here goes into the confirmation link, so confirming leads back to it
      const body = { ...values, email: values.email.trim(), company: values.company.trim() || null, returnTo: callbackUrl ?? null };
      const result = await postJson<{ message: string }>("/api/auth/sign-up", body);
      if (result.ok) {
        setSentTo(body.email);
        return;
      }
      if (result.issues.length > 0) helpers.setErrors(issuesToErrors(result.issues));
      setFormError(result.error);
    },
  });

  if (sentTo) {
    return (
      <div className="flex flex-col gap-4" data-testid="sign-up-sent">
        <FormAlert tone="done">Check your e-mail</FormAlert>
        <p>
          We sent a message to <strong className="break-all">{sentTo}</strong>. Open the link in it to confirm your address, then sign in. The link works for 48
          hours.
        </p>
        <p className="text-ink-soft">Nothing after a few minutes? Look in the spam folder, or send it again.</p>
        <Button
          variant="secondary"
          loading={resent === "sending"}
          disabled={resent === "sent"}
          onClick={async () => {
            setResent("sending");
            await postJson("/api/auth/verify/resend", { email: sentTo, returnTo: callbackUrl ?? null });
            setResent("sent");
          }}
        >
          {resent === "sent" ? "Sent again" : "Send it again"}
        </Button>
        <Link href={signInHref} className="inline-flex min-h-touch items-center font-bold">
          Go to sign in
        </Link>
      </div>
    );
  }

  const fieldError = (name: keyof typeof form.values) => (form.touched[name] ? form.errors[name] : undefined);

  return (
    <form onSubmit={form.handleSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <FormAlert tone="error">{formError}</FormAlert> : null}
      <TextField label="Your name" autoComplete="name" required error={fieldError("name")} {...form.getFieldProps("name")} />
      <TextField
        label="Company"
        hint="Shown on job sheets you print or share. Leave it blank if you work on your own."
        autoComplete="organization"
        error={fieldError("company")}
        {...form.getFieldProps("company")}
      />
      <EmailField required error={fieldError("email")} {...form.getFieldProps("email")} />
      <TextField
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters. A few words you will remember work well.`}
        required
        error={fieldError("password")}
        {...form.getFieldProps("password")}
      />
      <Button type="submit" size="lg" fullWidth loading={form.isSubmitting}>
        Open my account
      </Button>
      <p className="text-center">
        <Link href={signInHref} className="inline-flex min-h-touch items-center font-bold">
          Already have an account? Sign in
        </Link>
      </p>
    </form>
  );
}
