import type { Metadata } from "next";
import { JobList } from "@/components/jobs/job-list";
import { ButtonLink } from "@/components/ui/button";
import { PageHeader } from "@/components/ui/page-header";
import { PlusIcon } from "@/components/ui/icons";
import { userForPage } from "@/lib/auth/guard";
import { listJobs } from "@/lib/jobs/queries";

export const metadata: Metadata = { title: "Jobs" };
export const dynamic = "force-dynamic";

type JobsPageProps = { searchParams: Promise<Record<string, string | string[] | undefined>> };

// GET /jobs — the caller's jobs, searchable by name or address, signed-in account
export default async function JobsPage({ searchParams }: JobsPageProps) {
  const query = await searchParams;
  const q = typeof query.q === "string" ? query.q.slice(0, 120) : "";
  const user = await userForPage(q ? `/jobs?q=${encodeURIComponent(q)}` : "/jobs");
  const jobs = await listJobs(user.id, q);
  return (
    <div className="flex flex-col gap-4 pb-8">
      <PageHeader
        title="Jobs"
        lead="Each job keeps the members sized for one site."
        actions={
          <ButtonLink href="/jobs/new" icon={<PlusIcon className="h-5 w-5" />}>
            New job
          </ButtonLink>
        }
      />
      <JobList jobs={jobs.map((j) => ({ ...j, updatedAt: j.updatedAt.toISOString() }))} query={q} />
    </div>
  );
}
