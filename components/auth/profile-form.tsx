"use client";

import { useFormik } from "formik";
import { useState } from "react";
import * as yup from "yup";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { updateProfile } from "./actions";
import { FormAlert } from "./form-alert";
import { companyRule, issuesToErrors, nameRule } from "./form-support";

const schema = yup.object({ name: nameRule, company: companyRule });

export type ProfileFormProps = { name: string; company: string | null };

export function ProfileForm({ name, company }: ProfileFormProps) {
  const [status, setStatus] = useState<{ tone: "done" | "error"; text: string } | null>(null);

  const form = useFormik({
    initialValues: { name, company: company ?? "" },
    validationSchema: schema,
    onSubmit: async (values, helpers) => {
      setStatus(null);
      const result = await updateProfile({ name: values.name, company: values.company.trim() || null }).catch(() => null);
      if (!result) return setStatus({ tone: "error", text: "No connection. Check your signal and try again; your changes are still here." });
      if (result.ok) {
        helpers.resetForm({ values: { name: result.name, company: result.company ?? "" } });
        return setStatus({ tone: "done", text: "Saved." });
      }
      if ("issues" in result && result.issues) helpers.setErrors(issuesToErrors(result.issues));
      setStatus({ tone: "error", text: result.error });
    },
  });

  return (
    <form onSubmit={form.handleSubmit} noValidate className="flex flex-col gap-4">
      <TextField label="Your name" autoComplete="name" error={form.touched.name ? form.errors.name : undefined} {...form.getFieldProps("name")} />
      <TextField
        label="Company"
        hint="Shown on job sheets you print or share."
        autoComplete="organization"
        error={form.touched.company ? form.errors.company : undefined}
        {...form.getFieldProps("company")}
      />
      {status ? <FormAlert tone={status.tone}>{status.text}</FormAlert> : null}
      <Button type="submit" loading={form.isSubmitting} disabled={!form.dirty} className="sm:self-start">
        Save name and company
      </Button>
    </form>
  );
}
