"use client";

import { Serwist } from "@serwist/window";
import { usePathname, useRouter } from "next/navigation";
import { useCallback, useEffect, useRef, useState } from "react";
import { useOnline } from "@/components/ui/use-online";
import { isCrewPage } from "@/components/shell/nav-items";
import { Button } from "@/components/ui/button";
import { InfoIcon, WarningIcon } from "@/components/ui/icons";
import { ConflictCard, SentCard, waitingWords } from "./change-cards";
import { refreshPhoneTables } from "./phone-tables";
import { forgetSave, onQueueChange, onWorkerSent, queuedSaves, sendQueuedSaves, sentSaves, type QueuedSave, type SentRecord } from "./save-queue";

const RETRY_MS = 30_000;
/** A sent save's message is shown until dismissed, for this long at most. */
const SENT_SHOWN_MS = 24 * 3600 * 1000;

/**
 * Spanlark with no signal, once per page: registers the service worker (built app only), offers a newer version
 * when one is waiting (never forced: the builder may be mid-flow), says when there is no signal, keeps the phone's
 * material tables current, sends the saves that waited on the phone once the signal is back and says what the
 * server made of each (rechecked: same answer, or which changed and why).
 */
export function OfflineShell() {
  const online = useOnline();
  const router = useRouter();
  // the crew's page says for itself how old its copy is; the crew has no saves or sizing
  const crew = isCrewPage(usePathname() ?? "/");
  const [update, setUpdate] = useState<Serwist | null>(null);
  const [waiting, setWaiting] = useState<QueuedSave[]>([]);
  const [sent, setSent] = useState<SentRecord[]>([]);
  const registered = useRef(false);

  useEffect(() => {
    if (registered.current || process.env.NODE_ENV !== "production" || !("serviceWorker" in navigator)) return;
    registered.current = true;
    const sw = new Serwist("/serwist/sw.js", { scope: "/", type: "classic" });
    sw.addEventListener("waiting", () => setUpdate(sw));
    // the browser looks for a newer worker on each page load; a phone that keeps the app open looks when it comes back to it
    document.addEventListener("visibilitychange", () => {
      if (document.visibilityState === "visible") void sw.update();
    });
    // this page was drawn before the worker took over (the first visit): ask it to keep this page too
    if (!navigator.serviceWorker.controller) {
      sw.addEventListener("controlling", () => navigator.serviceWorker.controller?.postMessage({ type: "WARM_PAGES", urls: [window.location.href] }));
    }
    void sw.register().catch(() => undefined);
  }, []);

  const reloadQueue = useCallback(() => {
    void queuedSaves().then(setWaiting);
    const since = Date.now() - SENT_SHOWN_MS;
    void sentSaves().then((all) => setSent(all.filter((r) => !r.seen && Date.parse(r.sentAt) > since).reverse()));
  }, []);

  const send = useCallback(async () => {
    if (await sendQueuedSaves()) router.refresh();
  }, [router]);

  // the service worker sent (or settled) queued items: the page reads the server again
  useEffect(() => onWorkerSent(() => router.refresh()), [router]);

  useEffect(() => {
    reloadQueue();
    return onQueueChange(reloadQueue);
  }, [reloadQueue]);

  useEffect(() => {
    if (!online) return;
    void refreshPhoneTables();
    const soon = setTimeout(() => void send(), 0);
    const timer = setInterval(() => void send(), RETRY_MS);
    return () => {
      clearTimeout(soon);
      clearInterval(timer);
    };
  }, [online, send]);

  const pending = waiting.filter((s) => !s.refused && !s.conflict);
  const refused = waiting.filter((s) => s.refused);
  const conflicts = waiting.filter((s) => s.conflict && !s.refused);

  return (
    <div className="no-print mx-auto flex w-full max-w-5xl flex-col gap-2 px-4 empty:hidden [&:not(:empty)]:pt-3" data-testid="offline-shell">
      {update ? (
        <div role="status" className="flex flex-wrap items-center justify-between gap-2 rounded-lg border-2 border-spruce bg-spruce-light p-2 pl-3">
          <span className="font-bold text-ink">A newer Spanlark is ready.</span>
          <Button
            size="md"
            onClick={() => {
              update.addEventListener("controlling", () => window.location.reload());
              update.messageSkipWaiting();
            }}
          >
            Reload
          </Button>
        </div>
      ) : null}
      {crew ? null : !online ? (
        <p role="status" className="flex items-start gap-2 rounded-lg border-2 border-ink bg-paper-raised p-2 text-ink" data-testid="offline-bar">
          <InfoIcon className="mt-0.5 h-5 w-5 shrink-0" />
          <span>
            <span className="font-bold">No signal.</span> Sizing works on this phone; saves and changes wait here until the signal is back.
            {pending.length > 0 ? ` ${waitingWords(pending.length)}.` : ""}
          </span>
        </p>
      ) : pending.length > 0 ? (
        <p role="status" className="flex items-start gap-2 rounded-lg border-2 border-rule-strong bg-paper-raised p-2 text-ink" data-testid="saves-waiting">
          <InfoIcon className="mt-0.5 h-5 w-5 shrink-0" />
          <span>
            {waitingWords(pending.length)} ({pending.map((s) => s.label).join(", ")}). Sign in with the account that made {pending.length === 1 ? "it" : "them"}{" "}
            if you signed out.
          </span>
        </p>
      ) : null}
      {refused.map((s) => (
        <div key={s.key} role="alert" className="flex flex-col gap-1 rounded-lg border-2 border-over bg-over-bg p-2 pl-3 text-ink">
          <p className="flex items-start gap-2 font-bold text-over-ink">
            <WarningIcon className="mt-0.5 h-5 w-5 shrink-0" />{" "}
            {s.kind === "edit" ? `Your change to ${s.label} was not sent.` : `${s.label} was not saved to ${s.jobName}.`}
          </p>
          <p>{s.refused}</p>
          <Button variant="secondary" className="self-start" onClick={() => void forgetSave(s.key)}>
            Discard it
          </Button>
        </div>
      ))}
      {conflicts.map((s) => (
        <ConflictCard key={s.key} save={s} />
      ))}
      {sent.map((record) => (
        <SentCard key={record.key} record={record} />
      ))}
    </div>
  );
}
