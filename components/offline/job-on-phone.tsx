"use client";

import { useEffect, useState } from "react";
import { useOnline } from "@/components/ui/use-online";
import { InfoIcon } from "@/components/ui/icons";
import { jobOf, kindOf } from "@/lib/offline/queue";
import { ConflictCard, phoneTime, waitingWords } from "./change-cards";
import { onQueueChange, queuedSaves, sentSaves, type QueuedSave, type SentRecord } from "./save-queue";

/**
 * On a job's page: the saves and changes made to it on this phone that are still waiting to send ("2 changes
 * waiting to send"), those the server refused or found in conflict, and those sent, with when. Read from this
 * phone's queue (IndexedDB), so it shows with no signal too; nothing when the phone has nothing for the job.
 */
export function JobOnPhone({ jobId }: { jobId: string }) {
  const online = useOnline();
  const [waiting, setWaiting] = useState<QueuedSave[]>([]);
  const [sent, setSent] = useState<SentRecord[]>([]);

  useEffect(() => {
    const load = () => {
      void queuedSaves().then((all) => setWaiting(all.filter((s) => jobOf(s) === jobId)));
      void sentSaves().then((all) => setSent(all.filter((r) => r.response.jobId === jobId).slice(0, 10)));
    };
    load();
    return onQueueChange(load);
  }, [jobId]);

  const pending = waiting.filter((s) => !s.refused && !s.conflict);
  const conflicts = waiting.filter((s) => s.conflict && !s.refused);
  const refused = waiting.filter((s) => s.refused);
  if (waiting.length === 0 && sent.length === 0) return null;

  const what = (kind: "save" | "edit", label: string) => (kind === "edit" ? `change to ${label}` : `${label} (new)`);

  return (
    <section
      aria-labelledby="on-phone-title"
      className="flex flex-col gap-3 rounded-card border-2 border-rule-strong bg-paper-raised p-4"
      data-testid="job-on-phone"
    >
      <h2 id="on-phone-title" className="text-2xl font-bold">
        From this phone
      </h2>
      {pending.length > 0 ? (
        <div className="flex flex-col gap-1" data-testid="job-waiting">
          <p role="status" className="flex items-start gap-2 text-lg font-bold text-ink">
            <InfoIcon className="mt-1 h-5 w-5 shrink-0" />
            <span>
              {waitingWords(pending.length)}
              {online ? "; sending now." : pending.length === 1 ? ": it goes when the signal is back." : ": they go when the signal is back."}
            </span>
          </p>
          <ul className="list-disc pl-6 text-ink">
            {pending.map((s) => (
              <li key={s.key}>
                {what(kindOf(s), s.label)}, made <time dateTime={s.queuedAt}>{phoneTime(s.queuedAt)}</time>
              </li>
            ))}
          </ul>
        </div>
      ) : null}
      {conflicts.map((s) => (
        <ConflictCard key={s.key} save={s} />
      ))}
      {refused.map((s) => (
        <p key={s.key} role="alert" className="rounded-lg border-2 border-over bg-over-bg p-2 font-bold text-over-ink">
          Not sent: {what(kindOf(s), s.label)}. {s.refused}
        </p>
      ))}
      {sent.length > 0 ? (
        <div className="flex flex-col gap-1" data-testid="job-sent">
          <p className="font-bold text-ink">Sent</p>
          <ul className="list-disc pl-6 text-ink">
            {sent.map((r) => (
              <li key={r.key}>
                {what(r.kind, r.response.label)}: sent <time dateTime={r.sentAt}>{phoneTime(r.sentAt)}</time>
                {r.by === "background" ? " in the background, by this phone" : ""} (made <time dateTime={r.queuedAt}>{phoneTime(r.queuedAt)}</time>)
              </li>
            ))}
          </ul>
        </div>
      ) : null}
    </section>
  );
}
