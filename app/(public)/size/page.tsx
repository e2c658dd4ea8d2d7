import type { Metadata } from "next";
import { notFound, redirect } from "next/navigation";
import { SizingFlow } from "@/components/flow/sizing-flow";
import { getSessionUser } from "@/lib/auth/session";
import { nullWhenDatabaseDown } from "@/lib/db/unavailable";
import { memberVersion } from "@/lib/jobs/edit-once";
import { getMember, jobChoices } from "@/lib/jobs/queries";
import { resolveFlowStart } from "@/lib/flow/url";

export const metadata: Metadata = { title: "Size a member" };

type SizePageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

const one = (v: string | string[] | undefined): string | undefined => (Array.isArray(v) ? v[0] : v);

// GET /size — the sizing flow, no sign-in; ?job=&member= reopens a saved member for its owner
export default async function SizePage({ searchParams }: SizePageProps) {
  const query = await searchParams;
  const params = { s: one(query.s), step: one(query.step), kind: one(query.kind) };
  const jobId = one(query.job);
  const memberId = one(query.member);
  // Sizing works while the database is down (the tables are cached): the page then shows the flow as to
  // someone signed out. Reopening a saved member needs the database, so that still fails to the error page.
  const user = jobId && memberId ? await getSessionUser() : await getSessionUser().catch(nullWhenDatabaseDown);
  const jobs = user ? await jobChoices(user.id) : [];

  if (jobId && memberId) {
    if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/size?job=${jobId}&member=${memberId}`)}`);
    const member = await getMember(user.id, memberId);
    if (!member || member.jobId !== jobId || member.flowState === null) notFound();
    const savedState = member.flowState;
    const fromUrl = resolveFlowStart(params, null);
    const location =
      fromUrl.from === "url" ? fromUrl.location : { state: savedState, step: params.step === "answer" ? ("answer" as const) : ("span" as const) };
    return (
      <SizingFlow
        initial={location}
        from="saved"
        params={params}
        signedIn
        jobs={jobs}
        editing={{
          jobId: member.jobId,
          memberId: member.id,
          label: member.label,
          jobName: member.jobName,
          version: memberVersion(member),
          base: { label: member.label, flowState: member.flowState, chosenMember: member.chosenMember, headline: member.resultSummary?.headline ?? null },
        }}
        openSave={false}
        initialChosen={member.chosenMember}
        accountId={user.id}
      />
    );
  }

  const start = resolveFlowStart(params, null);
  const preferred = one(query.for);
  return (
    <SizingFlow
      initial={start.location}
      from={start.from}
      params={params}
      signedIn={user !== null}
      jobs={jobs}
      editing={null}
      openSave={one(query.save) === "1"}
      preferredJobId={preferred && jobs.some((j) => j.id === preferred) ? preferred : null}
      accountId={user?.id ?? null}
    />
  );
}
