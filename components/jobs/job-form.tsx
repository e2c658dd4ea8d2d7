"use client";

import { Form, Formik } from "formik";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { jobFormSchema, type JobForm as JobFormValues } from "@/lib/flow/forms";
import { createJob, updateJob } from "./actions";
import { JobActionAlert, type JobActionProblem } from "./job-action-alert";

export type JobFormProps = {
  /** the job being changed, or null for a new one */
  job: { id: string; name: string; siteAddress: string; notes: string } | null;
  onDone?: () => void;
};

/** A job's name, site address and notes: a new job, or changes to one. */
export function JobForm({ job, onDone }: JobFormProps) {
  const router = useRouter();
  const [serverError, setServerError] = useState<JobActionProblem | null>(null);
  return (
    <Formik<JobFormValues>
      initialValues={{ name: job?.name ?? "", siteAddress: job?.siteAddress ?? "", notes: job?.notes ?? "" }}
      validationSchema={jobFormSchema}
      onSubmit={async (values, helpers) => {
        setServerError(null);
        const result = job ? await updateJob({ jobId: job.id, ...values }) : await createJob(values);
        if (!result.ok) {
          setServerError({ message: result.error, upgrade: "upgrade" in result ? result.upgrade : undefined });
          helpers.setSubmitting(false);
          return;
        }
        if (onDone) onDone();
        if (job) router.refresh();
        else router.push(`/jobs/${result.jobId}`);
      }}
    >
      {(form) => (
        <Form noValidate className="flex flex-col gap-4">
          <TextField label="Job name" required {...form.getFieldProps("name")} error={form.touched.name ? form.errors.name : undefined} />
          <TextField
            label="Site address"
            autoComplete="street-address"
            {...form.getFieldProps("siteAddress")}
            error={form.touched.siteAddress ? form.errors.siteAddress : undefined}
          />
          <div className="flex flex-col gap-1">
            <label htmlFor="job-notes" className="font-bold">
              Notes
            </label>
            <textarea
              id="job-notes"
              rows={4}
              {...form.getFieldProps("notes")}
              aria-invalid={form.touched.notes && form.errors.notes ? true : undefined}
              className="block w-full rounded-lg border-2 border-rule-strong bg-paper-raised px-3 py-2 text-base text-ink"
            />
            {form.touched.notes && form.errors.notes ? <p className="text-sm font-bold text-over-ink">{form.errors.notes}</p> : null}
          </div>
          {serverError ? <JobActionAlert problem={serverError} /> : null}
          <div className="flex gap-2">
            <Button type="submit" loading={form.isSubmitting}>
              {job ? "Save the job" : "Make the job"}
            </Button>
          </div>
        </Form>
      )}
    </Formik>
  );
}
