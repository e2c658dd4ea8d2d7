import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CrewLinkPanel } from "@/components/crew/crew-link-panel";
import { JobPage } from "@/components/jobs/job-page";
import { JobOnPhone } from "@/components/offline/job-on-phone";
import { SheetPanel } from "@/components/sheets/sheet-panel";
import { userForPage } from "@/lib/auth/guard";
import { getJob } from "@/lib/jobs/queries";
import { recheckIfOutdated } from "@/lib/jobs/service";
import { changeWords } from "@/lib/flow/summary";

export const metadata: Metadata = { title: "Job" };
export const dynamic = "force-dynamic";

type JobRouteProps = { params: Promise<{ jobId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

// GET /jobs/[jobId] — one of the caller's jobs with its members; 404 for anyone but the owner
export default async function JobRoute({ params, searchParams }: JobRouteProps) {
  const { jobId } = await params;
  const query = await searchParams;
  const user = await userForPage(`/jobs/${jobId}`);
  const found = await getJob(user.id, jobId);
  if (!found) notFound();
  // new tables published since the members were worked out: the whole load path is worked out again first
  const job = (await recheckIfOutdated(found.id)) ? await getJob(user.id, jobId) : found;
  if (!job) notFound();
  return (
    <JobPage
      onPhone={<JobOnPhone jobId={job.id} />}
      job={{
        id: job.id,
        name: job.name,
        siteAddress: job.siteAddress,
        notes: job.notes,
        members: job.members.map((m) => ({
          id: m.id,
          label: m.label,
          kind: m.kind,
          headline: m.resultSummary?.headline ?? null,
          pass: m.resultSummary?.pass ?? null,
          ratio: m.resultSummary?.ratio ?? null,
          governing: m.resultSummary?.governing ?? null,
          spanFt: m.resultSummary?.spanFt ?? null,
          carriedBy: m.carriedByMemberId ? (job.members.find((c) => c.id === m.carriedByMemberId)?.label ?? null) : null,
          carriedById: m.carriedByMemberId,
          loadStandard: m.flowState?.loadStandard ?? "ASCE 7-16",
          carriesSnow: m.flowState
            ? m.flowState.snow.on || [...m.flowState.areaLoads, ...m.flowState.pointLoads, ...m.flowState.lineLoads].some((l) => l.case === "S")
            : false,
          orderDetails: m.orderDetails,
          carried: (m.resultSummary?.carried ?? []).map((c) => c.words),
          change: m.resultSummary ? changeWords(m.resultSummary) : null,
          problems: m.resultSummary?.problems ?? [],
          supportDesign: m.supportDesign,
          lengthFt: m.flowState?.lengthFt ?? null,
          supportsFt: m.flowState ? [...m.flowState.supports].map((x) => x.x).sort((a, b) => a - b) : undefined,
          atSpacing: m.flowState?.width.mode === "spacing",
          bearing: m.bearing,
        })),
      }}
    >
      <CrewLinkPanel jobId={job.id} jobName={job.name} />
      <SheetPanel
        jobId={job.id}
        saveOnArrival={query.saveSheet === "1"}
        savedSheetId={typeof query.sheet === "string" && /^[0-9a-f-]{36}$/i.test(query.sheet) ? query.sheet : undefined}
      />
    </JobPage>
  );
}
