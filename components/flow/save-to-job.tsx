"use client";

import { Form, Formik } from "formik";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import { saveMember, updateMember } from "@/components/jobs/actions";
import { JobActionAlert, type JobActionProblem } from "@/components/jobs/job-action-alert";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { SelectField, TextField } from "@/components/ui/field";
import { useToast } from "@/components/ui/toast";
import { saveMemberSchema, type SaveMemberForm } from "@/lib/flow/forms";
import { queueSave, whenUnqueued } from "@/components/offline/save-queue";
import type { MemberSnapshot, PhoneAnswer } from "@/lib/offline/answers";
import { KIND_LABELS, type FlowState } from "@/lib/flow/state";
import type { MemberSpec } from "@/lib/solver/design/schema";

export type SaveTarget = {
  jobId: string;
  memberId: string;
  label: string;
  jobName: string;
  /** the member's version when this page was drawn: a change made with no signal applies only to it */
  version?: string;
  /** the member as this page was drawn, to say what changed if it changes elsewhere first */
  base?: MemberSnapshot;
};

export type SaveToJobProps = {
  open: boolean;
  onClose: () => void;
  state: FlowState;
  chosen: MemberSpec | null;
  /** the caller's jobs to choose from */
  jobs: { id: string; name: string }[];
  /** the member being edited, when the flow was opened from a job */
  editing: SaveTarget | null;
  /** the job to offer first */
  preferredJobId?: string | null;
  /** the signed-in account (a save queued with no signal is sent only by it) */
  accountId?: string | null;
  /** the answer as this phone worked it out with no signal, kept with a queued save for the server's recheck */
  phoneAnswer?: PhoneAnswer | null;
};

/** A save that never reached the server (no signal, or the answer was lost): true when fetch itself failed. */
function isUnsent(err: unknown): boolean {
  return err instanceof TypeError || (err instanceof DOMException && (err.name === "AbortError" || err.name === "TimeoutError"));
}

/** Save the answer to a job (an existing one or a new one), or save the changes of the member being edited. */
export function SaveToJob({ open, onClose, state, chosen, jobs, editing, preferredJobId = null, accountId = null, phoneAnswer = null }: SaveToJobProps) {
  const toast = useToast();
  const router = useRouter();
  const [serverError, setServerError] = useState<JobActionProblem | null>(null);
  // one key per save, kept until the server has it: pressing Save again after a lost answer, or the queue
  // sending it later, saves it once
  const saveKey = useRef<string | null>(null);
  const defaultLabel = `${KIND_LABELS[state.kind]}`;

  return (
    <Dialog
      open={open}
      onClose={onClose}
      title={editing ? "Save the changes" : "Save to a job"}
      description={editing ? `${editing.label} in ${editing.jobName}` : "Keep this member with the job it belongs to."}
    >
      {open ? (
        <Formik<SaveMemberForm>
          initialValues={{
            jobId: editing ? editing.jobId : jobs.some((j) => j.id === preferredJobId) && preferredJobId ? preferredJobId : (jobs[0]?.id ?? "new"),
            newJobName: "",
            newJobAddress: "",
            label: editing ? editing.label : defaultLabel,
          }}
          validationSchema={saveMemberSchema}
          onSubmit={async (values, helpers) => {
            setServerError(null);
            const jobName = editing
              ? editing.jobName
              : values.jobId === "new"
                ? values.newJobName
                : (jobs.find((j) => j.id === values.jobId)?.name ?? "the job");
            saveKey.current ??= crypto.randomUUID();
            const key = saveKey.current;
            const input = {
              ...(values.jobId === "new" ? { newJob: { name: values.newJobName, siteAddress: values.newJobAddress, notes: "" } } : { jobId: values.jobId }),
              label: values.label,
              flowState: state,
              chosenMember: chosen,
              saveKey: key,
              ...(accountId ? { accountId } : {}),
            };
            const keepOnPhone = async () => {
              await queueSave({ key, body: input, label: values.label, jobName, phoneAnswer, queuedAt: new Date().toISOString() });
              saveKey.current = null;
              onClose();
              const note = toast.show({ message: `No signal: ${values.label} is saved on this phone and goes to ${jobName} when the signal is back.` });
              whenUnqueued(key, () => toast.dismiss(note));
            };
            // a change to a saved member waits on the phone too, applied later only if nobody changed the member meanwhile
            const offlineEdit = editing?.version && editing.base ? { version: editing.version, base: editing.base } : null;
            const keepChangeOnPhone = async (target: SaveTarget, made: { version: string; base: MemberSnapshot }) => {
              await queueSave({
                key,
                kind: "edit",
                memberId: target.memberId,
                jobId: target.jobId,
                body: { baseVersion: made.version, label: values.label, flowState: state, chosenMember: chosen, ...(accountId ? { accountId } : {}) },
                label: values.label,
                jobName,
                phoneAnswer,
                base: made.base,
                queuedAt: new Date().toISOString(),
              });
              saveKey.current = null;
              onClose();
              const note = toast.show({
                message: `No signal: your change to ${values.label} is kept on this phone and goes to ${jobName} when the signal is back.`,
              });
              whenUnqueued(key, () => toast.dismiss(note));
            };
            if (!navigator.onLine && (!editing || offlineEdit)) {
              if (editing && offlineEdit) await keepChangeOnPhone(editing, offlineEdit);
              else await keepOnPhone();
              return;
            }
            let result: Awaited<ReturnType<typeof saveMember>>;
            try {
              result = editing
                ? await updateMember({ memberId: editing.memberId, label: values.label, flowState: state, chosenMember: chosen })
                : await saveMember(input);
            } catch (err) {
              if (!isUnsent(err)) throw err;
              if (!editing) {
                await keepOnPhone();
                return;
              }
              if (offlineEdit) {
                await keepChangeOnPhone(editing, offlineEdit);
                return;
              }
              setServerError({ message: "No signal: changes to a saved member need a signal. Your inputs are kept; try again when you have one." });
              helpers.setSubmitting(false);
              return;
            }
            if (!result.ok) {
              const issues = "issues" in result ? result.issues : undefined;
              const upgrade = "upgrade" in result ? result.upgrade : undefined;
              setServerError({ message: issues && issues.length > 0 ? issues.map((i) => i.message).join("; ") : result.error, upgrade });
              helpers.setSubmitting(false);
              return;
            }
            saveKey.current = null;
            onClose();
            toast.show({ message: `${values.label} saved to ${jobName}` });
            router.refresh();
          }}
        >
          {(form) => (
            <Form noValidate className="flex flex-col gap-4">
              {!editing ? (
                <SelectField
                  label="Job"
                  options={[...jobs.map((j) => ({ value: j.id, label: j.name })), { value: "new", label: "+ A new job" }]}
                  {...form.getFieldProps("jobId")}
                  error={form.touched.jobId ? form.errors.jobId : undefined}
                />
              ) : null}
              {!editing && form.values.jobId === "new" ? (
                <>
                  <TextField
                    label="New job's name"
                    required
                    {...form.getFieldProps("newJobName")}
                    error={form.touched.newJobName ? form.errors.newJobName : undefined}
                  />
                  <TextField
                    label="Site address"
                    autoComplete="street-address"
                    {...form.getFieldProps("newJobAddress")}
                    error={form.touched.newJobAddress ? form.errors.newJobAddress : undefined}
                  />
                </>
              ) : null}
              <TextField
                label="Member name"
                hint="What the crew calls it, e.g. H1 kitchen header"
                required
                {...form.getFieldProps("label")}
                error={form.touched.label ? form.errors.label : undefined}
              />
              {serverError ? <JobActionAlert problem={serverError} /> : null}
              <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
                <Button variant="secondary" onClick={onClose}>
                  Cancel
                </Button>
                <Button type="submit" loading={form.isSubmitting}>
                  {editing ? "Save the changes" : "Save"}
                </Button>
              </div>
            </Form>
          )}
        </Formik>
      ) : null}
    </Dialog>
  );
}
