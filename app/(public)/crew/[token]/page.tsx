import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CrewSchedule } from "@/components/crew/crew-schedule";
import { CopyAge } from "@/components/offline/copy-age";
import { CrewPdfLink } from "@/components/offline/crew-pdf-link";
import { Caution } from "@/components/ui/caution";
import { WarningIcon } from "@/components/ui/icons";
import { openCrewLink } from "@/lib/crew/links";
import { formatSheetDate } from "@/lib/sheets/format";

export const dynamic = "force-dynamic";

// The token is the whole key: keep the page out of search engines and the token out of Referer headers.
export const metadata: Metadata = {
  title: "Crew link",
  robots: { index: false, follow: false, nocache: true },
  referrer: "no-referrer",
};

type CrewPageProps = { params: Promise<{ token: string }> };

// GET /crew/[token] — a job's member schedule, read-only, no sign-in; a revoked or expired link is a 404
export default async function CrewPage({ params }: CrewPageProps) {
  const { token } = await params;
  const view = await openCrewLink(token);
  if (!view) notFound();
  return (
    <article className="mx-auto flex max-w-2xl flex-col gap-5 pb-10" aria-labelledby="crew-title">
      <header className="flex flex-col gap-1">
        <p className="text-sm font-bold tracking-wide text-spruce uppercase">Crew link · read only</p>
        <h1 id="crew-title" className="text-3xl leading-tight font-bold">
          {view.job.name}
        </h1>
        {view.job.siteAddress ? <p className="text-lg text-ink-soft">{view.job.siteAddress}</p> : null}
        {view.expiresAt ? <p className="text-ink-soft">This link works until {formatSheetDate(view.expiresAt)}.</p> : null}
        <CopyAge readAt={view.readAt} changedAt={view.changedAt} />
      </header>
      <CrewPdfLink token={token} />
      <p className="flex items-center gap-2 rounded-card border-2 border-caution bg-caution-bg px-3 py-2 font-bold text-caution-ink">
        <WarningIcon className="h-5 w-5 shrink-0" />
        <a href="#caution" className="inline-flex min-h-touch items-center text-caution-ink">
          Check before you build: read the caution below the schedule.
        </a>
      </p>
      {view.job.notes.trim() ? (
        <section aria-labelledby="crew-notes" className="rounded-card border-2 border-rule bg-paper-raised p-4">
          <h2 id="crew-notes" className="text-lg font-bold">
            Notes from the builder
          </h2>
          <p className="mt-1 text-lg whitespace-pre-line">{view.job.notes}</p>
        </section>
      ) : null}
      <section aria-labelledby="crew-schedule" className="flex flex-col gap-3">
        <h2 id="crew-schedule" className="text-2xl font-bold">
          Member schedule
        </h2>
        <CrewSchedule rows={view.rows} />
      </section>
      <div id="caution" className="scroll-mt-20">
        <Caution variant="full" notChecked={view.notChecked} />
      </div>
      <p className="text-ink-soft">
        Loads are the largest at each support under the service load combinations. Jack studs are 1-1/2 in studs under each end of a header. Ask the builder
        before changing any size.
      </p>
    </article>
  );
}
