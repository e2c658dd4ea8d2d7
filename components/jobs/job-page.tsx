"use client";

import { Link } from "@/components/ui/link";
import { useRouter } from "next/navigation";
import { useState, useTransition, type ReactNode } from "react";
import { Button, ButtonLink } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { SelectField } from "@/components/ui/field";
import { EmptyState } from "@/components/ui/empty-state";
import { PageHeader } from "@/components/ui/page-header";
import { StatusBadge } from "@/components/ui/status-badge";
import { useToast } from "@/components/ui/toast";
import { ratioVerdict } from "@/components/ui/ratio-bar";
import { PlusIcon } from "@/components/ui/icons";
import { formatFeetInches } from "@/lib/flow/length";
import { isFramingKind, jobKindLabel, type JobMemberKind } from "@/lib/solver/design/kinds";
import type { Bearing, SupportDesign } from "@/lib/jobs/load-path";
import { BearingForm } from "./bearing-form";
import { deleteJob, deleteMember, duplicateJob, duplicateMember, markChangesSeen, restoreJob, restoreMember, updateMember } from "./actions";
import { JobForm } from "./job-form";
import { LoadPathPicture } from "./load-path-picture";
import { OrderDetailsForm } from "./order-details-form";
import { SupportForm } from "./support-form";
import type { OrderDetails } from "@/lib/orders/order-list";

export type JobPageMember = {
  id: string;
  label: string;
  kind: JobMemberKind;
  headline: string | null;
  pass: boolean | null;
  ratio: number | null;
  governing: string | null;
  spanFt: number | null;
  /** the label of the member that carries this one */
  carriedBy: string | null;
  carriedById?: string | null;
  /** the load basis the saved answer was worked on, and whether the member carries snow */
  loadStandard?: "ASCE 7-16" | "ASCE 7-22";
  carriesSnow?: boolean;
  orderDetails?: OrderDetails;
  /** the loads other members put on it, each saying where it comes from */
  carried?: string[];
  /** "Changed since you last looked: …" when a recheck changed its answer */
  change?: string | null;
  /** why it fails, in words */
  problems?: string[];
  /** a post's or footing's inputs */
  supportDesign?: SupportDesign | null;
  /** framing members: whole length and supports (ft), whether at a spacing, and where it sits on its carrier */
  lengthFt?: number | null;
  supportsFt?: number[];
  atSpacing?: boolean;
  bearing?: Bearing | null;
};

export type JobPageProps = {
  job: { id: string; name: string; siteAddress: string; notes: string; members: JobPageMember[] };
  /** more sections under the members (crew link, job sheets) */
  children?: ReactNode;
  /** what this phone still has to send to the job, and what it sent (above the members) */
  onPhone?: ReactNode;
};

/** A job: its members (edit, duplicate, delete with Undo) and the job's own actions. */
export function JobPage({ job, children, onPhone }: JobPageProps) {
  const router = useRouter();
  const toast = useToast();
  const [editing, setEditing] = useState(false);
  const [confirmDelete, setConfirmDelete] = useState(false);
  const [pending, startTransition] = useTransition();
  const [problem, setProblem] = useState<string | null>(null);

  const run = (work: () => Promise<void>) => startTransition(work);

  const [askCarried, setAskCarried] = useState<{ member: JobPageMember; message: string } | null>(null);
  const [supportDialog, setSupportDialog] = useState<{ type: SupportDesign["type"]; under?: JobPageMember; editing?: JobPageMember } | null>(null);

  const removeMember = (m: JobPageMember, carried?: "keep" | "delete") =>
    run(async () => {
      const result = await deleteMember(carried ? { memberId: m.id, carried } : { memberId: m.id });
      setAskCarried(null);
      if (!result.ok) {
        if (result.status === 409) setAskCarried({ member: m, message: result.error });
        else setProblem(result.error);
        return;
      }
      router.refresh();
      toast.show({
        message: `${m.label} deleted`,
        undo: async () => {
          const back = await restoreMember({ memberId: m.id });
          if (!back.ok) setProblem(back.error);
          router.refresh();
        },
      });
    });

  const copyMember = (m: JobPageMember) =>
    run(async () => {
      const result = await duplicateMember({ memberId: m.id });
      if (!result.ok) setProblem(result.error);
      else toast.show({ message: `${m.label} copied` });
      router.refresh();
    });

  return (
    <div className="flex flex-col gap-6 pb-8">
      <PageHeader
        title={job.name}
        lead={job.siteAddress || undefined}
        back={{ href: "/jobs", label: "Jobs" }}
        actions={
          <ButtonLink href={`/size?for=${job.id}`} icon={<PlusIcon className="h-5 w-5" />}>
            Size a member
          </ButtonLink>
        }
      />
      {job.notes ? <p className="max-w-prose whitespace-pre-line text-ink">{job.notes}</p> : null}
      {problem ? (
        <p role="alert" className="rounded-lg border-2 border-over bg-over-bg p-3 font-bold text-over-ink">
          {problem}
        </p>
      ) : null}

      {onPhone}
      <section aria-labelledby="members-title" className="flex flex-col gap-3">
        <h2 id="members-title" className="text-2xl font-bold">
          Members
        </h2>
        {job.members.some((m) => m.change) ? (
          <div className="flex flex-col gap-2 rounded-lg border-2 border-caution-ink/40 bg-caution-bg p-3 text-ink" data-testid="changes">
            <p className="font-bold">⚠ Some answers changed since you last looked (marked below).</p>
            <div>
              <Button
                variant="secondary"
                disabled={pending}
                onClick={() =>
                  run(async () => {
                    const result = await markChangesSeen({ jobId: job.id });
                    if (!result.ok) setProblem(result.error);
                    router.refresh();
                  })
                }
              >
                I have seen the changes
              </Button>
            </div>
          </div>
        ) : null}
        <LoadPathPicture
          members={job.members.map((m) => ({ id: m.id, label: m.label, kindLabel: jobKindLabel(m.kind), carriedById: m.carriedById ?? null, pass: m.pass }))}
        />
        {job.members.length === 0 ? (
          <EmptyState
            title="No members yet"
            body="Size a member and save it to this job."
            action={<ButtonLink href={`/size?for=${job.id}`}>Size a member</ButtonLink>}
          />
        ) : (
          <ul className="flex flex-col gap-3">
            {job.members.map((m) => {
              const verdict = m.ratio !== null ? ratioVerdict(m.ratio) : null;
              return (
                <li key={m.id} className="flex flex-col gap-3 rounded-card border-2 border-rule bg-paper-raised p-4">
                  <div className="flex flex-wrap items-start justify-between gap-2">
                    <div className="min-w-0">
                      <h3 className="text-lg font-bold">{m.label}</h3>
                      <p className="text-sm text-graphite tabular-nums">
                        {jobKindLabel(m.kind)}
                        {m.spanFt !== null && isFramingKind(m.kind) ? ` · ${formatFeetInches(m.spanFt)} span` : ""}
                        {m.carriedBy ? ` · bears on ${m.carriedBy}` : ""}
                      </p>
                    </div>
                    {verdict ? (
                      <StatusBadge status={verdict.pass ? "pass" : "fail"} label={verdict.text} />
                    ) : (
                      <StatusBadge status="caution" label="Not sized" />
                    )}
                  </div>
                  <p className={`text-xl font-bold ${m.pass === false ? "text-over-ink" : "text-ink"}`}>
                    {m.headline ?? (isFramingKind(m.kind) ? "Nothing in the tables worked for these inputs." : "Nothing bears on it yet.")}
                  </p>
                  {m.change ? (
                    <p className="rounded-lg border-2 border-caution-ink/40 bg-caution-bg p-2 font-bold text-ink" data-testid="member-change">
                      ⚠ {m.change}
                    </p>
                  ) : null}
                  {m.problems && m.problems.length > 0 ? (
                    <ul className="list-disc rounded-lg border-2 border-over bg-over-bg p-2 pl-6 text-over-ink" data-testid="member-problems">
                      {m.problems.map((p) => (
                        <li key={p}>✕ {p}</li>
                      ))}
                    </ul>
                  ) : null}
                  {m.carried && m.carried.length > 0 ? (
                    <div className="text-sm text-ink" data-testid="member-carried">
                      <p className="font-bold">Loads on it:</p>
                      <ul className="list-disc pl-6">
                        {m.carried.map((c) => (
                          <li key={c}>{c}</li>
                        ))}
                      </ul>
                    </div>
                  ) : null}
                  {m.loadStandard === "ASCE 7-22" && m.carriesSnow ? (
                    <div className="flex flex-col gap-2 rounded-lg border-2 border-caution-ink/40 bg-caution-bg p-3 text-ink" data-testid="recheck-basis">
                      <p>
                        Worked out with ground snow from the newer risk-based map (ASCE 7-22, counted at 0.7). Most building departments still give the number
                        from the map in the 2021 code or older, counted in full.
                      </p>
                      <div>
                        <Button
                          variant="secondary"
                          disabled={pending}
                          onClick={() =>
                            run(async () => {
                              const result = await updateMember({ memberId: m.id, loadStandard: "ASCE 7-16" });
                              if (!result.ok) {
                                setProblem(result.error);
                                return;
                              }
                              router.refresh();
                              toast.show({ message: `${m.label} re-checked on the older map (ASCE 7-16)` });
                            })
                          }
                        >
                          Re-check on the older map
                        </Button>
                      </div>
                    </div>
                  ) : null}
                  {job.members.length > 1 && m.kind !== "footing" ? (
                    <SelectField
                      label="Bears on"
                      options={[
                        { value: "", label: "A wall, post or footing" },
                        ...job.members.filter((c) => c.id !== m.id).map((c) => ({ value: c.id, label: c.label })),
                      ]}
                      value={m.carriedById ?? ""}
                      disabled={pending}
                      onChange={(event) => {
                        const carriedByMemberId = event.target.value || null;
                        run(async () => {
                          const result = await updateMember({ memberId: m.id, carriedByMemberId });
                          if (!result.ok) setProblem(result.error);
                          router.refresh();
                        });
                      }}
                    />
                  ) : null}
                  {(() => {
                    const carrier = m.carriedById ? job.members.find((c) => c.id === m.carriedById) : undefined;
                    if (!carrier || !isFramingKind(carrier.kind) || !isFramingKind(m.kind) || !m.supportsFt || carrier.lengthFt == null) return null;
                    return (
                      <BearingForm
                        key={`${m.id}-${carrier.id}`}
                        memberId={m.id}
                        carrierLabel={carrier.label}
                        carrierLengthFt={carrier.lengthFt}
                        supportsFt={m.supportsFt}
                        atSpacing={m.atSpacing ?? false}
                        bearing={m.bearing ?? null}
                      />
                    );
                  })()}
                  {m.orderDetails && isFramingKind(m.kind) ? <OrderDetailsForm memberId={m.id} label={m.label} kind={m.kind} details={m.orderDetails} /> : null}
                  <div className="flex flex-wrap gap-2">
                    {isFramingKind(m.kind) ? (
                      <ButtonLink href={`/size?job=${job.id}&member=${m.id}`} variant="secondary">
                        Edit
                      </ButtonLink>
                    ) : (
                      <Button variant="secondary" onClick={() => setSupportDialog({ type: m.kind === "post" ? "post" : "footing", editing: m })}>
                        Change
                      </Button>
                    )}
                    {isFramingKind(m.kind) && m.kind !== "floor-joist" && m.kind !== "deck-joist" && m.kind !== "rafter" ? (
                      <Button variant="secondary" onClick={() => setSupportDialog({ type: "post", under: m })}>
                        Add posts under
                      </Button>
                    ) : null}
                    {m.kind === "post" ? (
                      <Button variant="secondary" onClick={() => setSupportDialog({ type: "footing", under: m })}>
                        Add footings under
                      </Button>
                    ) : null}
                    <Button variant="ghost" disabled={pending} onClick={() => copyMember(m)} aria-label={`Duplicate ${m.label}`}>
                      Duplicate
                    </Button>
                    <Button variant="ghost" disabled={pending} onClick={() => removeMember(m)} aria-label={`Delete ${m.label}`}>
                      Delete
                    </Button>
                  </div>
                </li>
              );
            })}
          </ul>
        )}
      </section>

      {job.members.length > 0 ? (
        <section aria-labelledby="order-title" className="flex flex-col gap-2 rounded-card border-2 border-rule bg-paper-raised p-4">
          <h2 id="order-title" className="text-2xl font-bold">
            Order list
          </h2>
          <p className="text-ink-soft">
            The lumber, studs, posts and concrete these members take, by size and stock length, priced where the yard&apos;s prices are on file.
          </p>
          <ButtonLink href={`/jobs/${job.id}/order`} className="w-full sm:w-fit" data-testid="open-order">
            Open the order list
          </ButtonLink>
        </section>
      ) : null}

      {children}

      <section aria-labelledby="job-actions-title" className="flex flex-col gap-3">
        <h2 id="job-actions-title" className="text-2xl font-bold">
          This job
        </h2>
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" onClick={() => setEditing(true)}>
            Change name, address, notes
          </Button>
          <Button
            variant="secondary"
            disabled={pending}
            onClick={() =>
              run(async () => {
                const result = await duplicateJob({ jobId: job.id });
                if (!result.ok) {
                  setProblem(result.error);
                  return;
                }
                toast.show({ message: `${job.name} copied` });
                router.push(`/jobs/${result.jobId}`);
              })
            }
          >
            Duplicate the job
          </Button>
          <Button variant="danger" onClick={() => setConfirmDelete(true)}>
            Delete the job
          </Button>
        </div>
        <p className="text-sm text-graphite">
          <Link href="/jobs" className="inline-flex min-h-touch items-center font-bold">
            All jobs
          </Link>
        </p>
      </section>

      <Dialog
        open={supportDialog !== null}
        onClose={() => setSupportDialog(null)}
        title={
          supportDialog?.editing
            ? `Change ${supportDialog.editing.label}`
            : supportDialog?.type === "post"
              ? `Posts under ${supportDialog.under?.label ?? ""}`
              : `Footings under ${supportDialog?.under?.label ?? ""}`
        }
        description={
          supportDialog?.editing ? undefined : supportDialog?.type === "post" ? "One post under each of its supports." : "One footing under each post."
        }
      >
        {supportDialog ? (
          <SupportForm
            jobId={job.id}
            type={supportDialog.type}
            under={supportDialog.under ? { id: supportDialog.under.id, label: supportDialog.under.label } : undefined}
            editing={
              supportDialog.editing?.supportDesign
                ? { id: supportDialog.editing.id, label: supportDialog.editing.label, design: supportDialog.editing.supportDesign }
                : undefined
            }
            onDone={() => setSupportDialog(null)}
          />
        ) : null}
      </Dialog>
      <Dialog
        open={askCarried !== null}
        onClose={() => setAskCarried(null)}
        title={`Delete ${askCarried?.member.label ?? ""}?`}
        description={askCarried?.message}
        actions={
          <>
            <Button variant="secondary" disabled={pending} onClick={() => askCarried && removeMember(askCarried.member, "keep")}>
              Keep them, on nothing
            </Button>
            <Button variant="danger" disabled={pending} onClick={() => askCarried && removeMember(askCarried.member, "delete")}>
              Delete them too
            </Button>
          </>
        }
      />
      <Dialog open={editing} onClose={() => setEditing(false)} title="Change the job">
        {editing ? <JobForm job={job} onDone={() => setEditing(false)} /> : null}
      </Dialog>
      <Dialog
        open={confirmDelete}
        onClose={() => setConfirmDelete(false)}
        title="Delete this job?"
        description={`${job.name} and its ${job.members.length === 1 ? "member" : `${job.members.length} members`} go. You can undo it for a few seconds.`}
        actions={
          <>
            <Button variant="secondary" onClick={() => setConfirmDelete(false)}>
              Keep it
            </Button>
            <Button
              variant="danger"
              loading={pending}
              onClick={() =>
                run(async () => {
                  const result = await deleteJob({ jobId: job.id });
                  setConfirmDelete(false);
                  if (!result.ok) {
                    setProblem(result.error);
                    return;
                  }
                  toast.show({
                    message: `${job.name} deleted`,
                    undo: async () => {
                      const back = await restoreJob({ jobId: job.id });
                      if (back.ok) router.push(`/jobs/${job.id}`);
                    },
                  });
                  router.push("/jobs");
                })
              }
            >
              Delete
            </Button>
          </>
        }
      />
    </div>
  );
}
