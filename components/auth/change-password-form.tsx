"use client";

import { useFormik } from "formik";
import { signOut } from "next-auth/react";
import { useState } from "react";
import * as yup from "yup";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { changePassword } from "./actions";
import { FormAlert } from "./form-alert";
import { issuesToErrors, newPasswordRule, PASSWORD_MIN } from "./form-support";

const schema = yup.object({
  currentPassword: yup.string().required("enter your current password"),
  newPassword: newPasswordRule,
});

/** Changes the password; every session ends with it, so the person signs in again with the new one. */
export function ChangePasswordForm() {
  const [formError, setFormError] = useState<string | null>(null);
  const [done, setDone] = useState(false);

  const form = useFormik({
    initialValues: { currentPassword: "", newPassword: "" },
    validationSchema: schema,
    onSubmit: async (values, helpers) => {
      setFormError(null);
      const result = await changePassword(values).catch(() => null);
      if (!result) return setFormError("No connection. Check your signal and try again.");
      if (result.ok) {
        setDone(true);
        await signOut({ callbackUrl: "/sign-in?from=reset" });
        return;
      }
      if ("issues" in result && result.issues) helpers.setErrors(issuesToErrors(result.issues));
      setFormError(result.error[0].toUpperCase() + result.error.slice(1));
    },
  });

  if (done) return <FormAlert tone="done">Password changed. Taking you to sign in with the new one…</FormAlert>;

  return (
    <form onSubmit={form.handleSubmit} noValidate className="flex flex-col gap-4">
      <TextField
        label="Current password"
        type="password"
        autoComplete="current-password"
        error={form.touched.currentPassword ? form.errors.currentPassword : undefined}
        {...form.getFieldProps("currentPassword")}
      />
      <TextField
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters. You will sign in again with it, here and on every other device.`}
        error={form.touched.newPassword ? form.errors.newPassword : undefined}
        {...form.getFieldProps("newPassword")}
      />
      {formError ? <FormAlert tone="error">{formError}</FormAlert> : null}
      <Button type="submit" variant="secondary" loading={form.isSubmitting} className="sm:self-start">
        Change password
      </Button>
    </form>
  );
}
