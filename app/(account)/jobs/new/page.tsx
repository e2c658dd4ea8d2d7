import type { Metadata } from "next";
import { JobForm } from "@/components/jobs/job-form";
import { PageHeader } from "@/components/ui/page-header";
import { userForPage } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "New job" };
export const dynamic = "force-dynamic";

// GET /jobs/new — start a job, signed-in account
export default async function NewJobPage() {
  await userForPage("/jobs/new");
  return (
    <div className="flex max-w-xl flex-col gap-4 pb-8">
      <PageHeader title="New job" back={{ href: "/jobs", label: "Jobs" }} lead="A job is one site: a house, an addition, a deck." />
      <JobForm job={null} />
    </div>
  );
}
