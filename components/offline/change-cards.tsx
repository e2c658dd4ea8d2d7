"use client";

import { Button } from "@/components/ui/button";
import { CheckIcon, WarningIcon } from "@/components/ui/icons";
import { answerWords } from "@/lib/offline/answers";
import { memberChanges } from "@/lib/offline/member-change";
import { formatFeetInches } from "@/lib/solver/lengths";
import { dismissSent, forgetSave, recheckOf, sendMineAnyway, type QueuedSave, type SentRecord } from "./save-queue";

/** "1 change waiting to send", "2 changes waiting to send" (saves and changes alike). */
export function waitingWords(count: number): string {
  return `${count} ${count === 1 ? "change" : "changes"} waiting to send`;
}

/** A time as the phone shows it: "Thu 2:14 PM" (today's date is left out). */
export function phoneTime(iso: string): string {
  const d = new Date(iso);
  const today = new Date().toDateString() === d.toDateString();
  return d.toLocaleString(
    "en-US",
    today ? { hour: "numeric", minute: "2-digit" } : { weekday: "short", month: "short", day: "numeric", hour: "numeric", minute: "2-digit" },
  );
}

/** A change made on this phone whose member was changed on another screen since: what changed, and the builder's choice. */
export function ConflictCard({ save }: { save: QueuedSave }) {
  const conflict = save.conflict;
  if (!conflict) return null;
  const now = conflict.current;
  const changes = save.base && !conflict.deleted ? memberChanges(save.base, now) : [];
  const mine = save.body as { label?: string; flowState?: { lengthFt?: number } };
  return (
    <div role="alert" className="flex flex-col gap-2 rounded-lg border-2 border-over bg-over-bg p-3 text-ink" data-testid="change-conflict">
      <p className="flex items-start gap-2 font-bold text-over-ink">
        <WarningIcon className="mt-0.5 h-5 w-5 shrink-0" />
        {conflict.deleted
          ? `Your change to ${save.label} in ${conflict.jobName} was not sent: it was deleted after this phone opened it.`
          : `Your change to ${save.label} in ${conflict.jobName} was not sent: it was changed on another screen after this phone opened it.`}
      </p>
      {conflict.deleted ? null : changes.length > 0 ? (
        <div>
          <p className="font-bold">Changed since:</p>
          <ul className="list-disc pl-6">
            {changes.map((line) => (
              <li key={line}>{line}</li>
            ))}
          </ul>
        </div>
      ) : (
        <p>Its inputs are the same; the server worked its answer out again.</p>
      )}
      {now.headline && !conflict.deleted ? <p>It now reads: {now.headline}.</p> : null}
      <p>
        Your change is kept on this phone
        {mine.flowState?.lengthFt !== undefined ? ` (${mine.label ?? save.label}, span ${formatFeetInches(mine.flowState.lengthFt)})` : ""}. Nothing was
        overwritten.
      </p>
      <div className="flex flex-col gap-2 sm:flex-row">
        {conflict.deleted ? null : <Button onClick={() => void sendMineAnyway(save)}>Send mine over it</Button>}
        <Button variant="secondary" onClick={() => void forgetSave(save.key)}>
          Discard mine
        </Button>
      </div>
    </div>
  );
}

/** A save or change made on this phone that the server took: where it went and what the server made of it. */
export function SentCard({ record, dismissible = true }: { record: SentRecord; dismissible?: boolean }) {
  const { response } = record;
  const check = recheckOf(record);
  const changed = check !== null && !check.same;
  const what =
    record.kind === "edit" ? `Your change to ${response.label} reached ${response.jobName}` : `${response.label} saved to ${response.jobName} from this phone`;
  return (
    <div
      role={changed ? "alert" : "status"}
      className={
        changed
          ? "flex flex-col gap-1 rounded-lg border-2 border-over bg-over-bg p-2 pl-3 text-ink"
          : "flex flex-col gap-1 rounded-lg border-2 border-spruce bg-spruce-light p-2 pl-3 text-ink"
      }
      data-testid="sent-save"
    >
      <p className="flex items-start gap-2 font-bold">
        <CheckIcon className="mt-0.5 h-5 w-5 shrink-0 text-sound" /> {what}.
      </p>
      <p>
        Sent <time dateTime={record.sentAt}>{phoneTime(record.sentAt)}</time>
        {record.by === "background" ? " in the background, by this phone" : ""}.
      </p>
      {check ? (
        check.same ? (
          <p>Rechecked by the server: the same answer as worked out on this phone.</p>
        ) : (
          <>
            <p className="font-bold text-over-ink">Rechecked by the server: the answer changed.</p>
            <p>This phone worked out: {answerWords(check.phone)}.</p>
            <p>The server says: {answerWords(check.server)}. The job keeps the server&apos;s answer.</p>
            <p>Why: {check.why}</p>
          </>
        )
      ) : (
        <p>The server worked out its answer: {answerWords(response.answer)}.</p>
      )}
      {dismissible ? (
        <Button variant="ghost" className="self-start" onClick={() => void dismissSent(record.key)}>
          Dismiss
        </Button>
      ) : null}
    </div>
  );
}
