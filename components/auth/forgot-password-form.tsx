"use client";

import { useFormik } from "formik";
import { Link } from "@/components/ui/link";
import { useState } from "react";
import * as yup from "yup";
import { Button } from "@/components/ui/button";
import { EmailField } from "./email-field";
import { FormAlert } from "./form-alert";
import { emailRule, issuesToErrors, postJson } from "./form-support";

const schema = yup.object({ email: emailRule });

export function ForgotPasswordForm() {
  const [answer, setAnswer] = useState<string | null>(null);
  const [formError, setFormError] = useState<string | null>(null);

  const form = useFormik({
    initialValues: { email: "" },
    validationSchema: schema,
    onSubmit: async (values, helpers) => {
      setFormError(null);
      const result = await postJson<{ message: string }>("/api/auth/password/forgot", { email: values.email.trim() });
      if (result.ok) return setAnswer(result.data.message);
      if (result.issues.length > 0) helpers.setErrors(issuesToErrors(result.issues));
      setFormError(result.error);
    },
  });

  if (answer) {
    return (
      <div className="flex flex-col gap-4" data-testid="forgot-sent">
        <FormAlert tone="done">{answer}</FormAlert>
        <p className="text-ink-soft">Nothing after a few minutes? Look in the spam folder, or check the address and ask again.</p>
        <Link href="/sign-in" className="inline-flex min-h-touch items-center font-bold">
          Back to sign in
        </Link>
      </div>
    );
  }

  return (
    <form onSubmit={form.handleSubmit} noValidate className="flex flex-col gap-4">
      {formError ? <FormAlert tone="error">{formError}</FormAlert> : null}
      <EmailField error={form.touched.email ? form.errors.email : undefined} {...form.getFieldProps("email")} />
      <Button type="submit" size="lg" fullWidth loading={form.isSubmitting}>
        Send me a link
      </Button>
      <p className="text-center">
        <Link href="/sign-in" className="inline-flex min-h-touch items-center font-bold">
          Remembered it? Sign in
        </Link>
      </p>
    </form>
  );
}
