import { Link } from "@/components/ui/link";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { ArrowRightIcon } from "@/components/ui/icons";

export type JobListProps = {
  jobs: { id: string; name: string; siteAddress: string; memberCount: number; updatedAt: string }[];
  query: string;
};

/** The caller's jobs with a search box (a plain GET form: works without script). */
export function JobList({ jobs, query }: JobListProps) {
  return (
    <div className="flex flex-col gap-4">
      <form role="search" action="/jobs" method="get" className="flex items-end gap-2">
        <div className="flex flex-1 flex-col gap-1">
          <label htmlFor="job-search" className="font-bold">
            Find a job
          </label>
          <input
            id="job-search"
            name="q"
            type="search"
            defaultValue={query}
            placeholder="Name or site address"
            className="block min-h-touch w-full rounded-lg border-2 border-rule-strong bg-paper-raised px-3 py-2 text-base text-ink placeholder:text-graphite"
          />
        </div>
        <button type="submit" className="min-h-touch rounded-lg border-2 border-spruce bg-paper-raised px-4 font-bold text-spruce">
          Search
        </button>
      </form>
      {query ? (
        <p className="text-ink-soft" role="status">
          {jobs.length === 0 ? "No job" : jobs.length === 1 ? "1 job" : `${jobs.length} jobs`} matching “{query}”.{" "}
          <Link href="/jobs" className="inline-flex min-h-touch items-center font-bold">
            Show all
          </Link>
        </p>
      ) : null}
      {jobs.length === 0 && !query ? (
        <EmptyState
          title="No jobs yet"
          body="Size a member, then save it to a job — or start a job first."
          action={<ButtonLink href="/size">Size a member</ButtonLink>}
        />
      ) : (
        <ul className="flex flex-col gap-3">
          {jobs.map((job) => (
            <li key={job.id}>
              <Link
                href={`/jobs/${job.id}`}
                className="group flex min-h-touch-lg items-center gap-3 rounded-card border-2 border-rule bg-paper-raised p-4 text-ink no-underline hover:border-spruce"
              >
                <span className="flex min-w-0 flex-1 flex-col">
                  <span className="text-lg font-bold group-hover:underline">{job.name}</span>
                  {job.siteAddress ? <span className="text-ink-soft">{job.siteAddress}</span> : null}
                  <span className="text-sm text-graphite">
                    {job.memberCount === 1 ? "1 member" : `${job.memberCount} members`} · changed{" "}
                    {new Date(job.updatedAt).toLocaleDateString("en-US", { month: "short", day: "numeric", year: "numeric" })}
                  </span>
                </span>
                <ArrowRightIcon className="h-6 w-6 shrink-0 text-spruce" />
              </Link>
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
