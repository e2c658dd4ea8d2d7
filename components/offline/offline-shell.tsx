"use client";

import { Serwist } from "@serwist/window";
import { usePathname, useRouter } from "next/navigation";
import { useCallback, useEffect, useRef, useState } from "react";
import { useOnline } from "@/components/flow/use-design";
import { isCrewPage } from "@/components/shell/nav-items";
import { Button } from "@/components/ui/button";
import { CheckIcon, InfoIcon, WarningIcon } from "@/components/ui/icons";
import { answerWords } from "@/lib/offline/answers";
import { refreshPhoneTables } from "./phone-tables";
import { forgetSave, onQueueChange, queuedSaves, sendQueuedSaves, type QueuedSave, type SentSave } from "./save-queue";

const RETRY_MS = 30_000;

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
  const [sent, setSent] = useState<SentSave[]>([]);
  const registered = useRef(false);

  useEffect(() => {
    if (registered.current || process.env.NODE_ENV !== "production" || !("serviceWorker" in navigator)) return;
    registered.current = true;
    const sw = new Serwist("/serwist/sw.js", { scope: "/", type: "classic" });
    sw.addEventListener("waiting", () => setUpdate(sw));
    // this page was drawn before the worker took over (the first visit): ask it to keep this page too
    if (!navigator.serviceWorker.controller) {
      sw.addEventListener("controlling", () => navigator.serviceWorker.controller?.postMessage({ type: "WARM_PAGES", urls: [window.location.href] }));
    }
    void sw.register().catch(() => undefined);
  }, []);

  const reloadQueue = useCallback(() => {
    void queuedSaves().then(setWaiting);
  }, []);

  const send = useCallback(async () => {
    const done = await sendQueuedSaves();
    if (done.length > 0) {
      setSent((before) => [...before, ...done]);
      router.refresh();
    }
  }, [router]);

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

  const pending = waiting.filter((s) => !s.refused);
  const refused = waiting.filter((s) => s.refused);

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
            <span className="font-bold">No signal.</span> Sizing works on this phone; saves wait here until the signal is back.
            {pending.length > 0 ? ` ${pending.length} ${pending.length === 1 ? "save is" : "saves are"} waiting to send.` : ""}
          </span>
        </p>
      ) : pending.length > 0 ? (
        <p role="status" className="flex items-start gap-2 rounded-lg border-2 border-rule-strong bg-paper-raised p-2 text-ink" data-testid="saves-waiting">
          <InfoIcon className="mt-0.5 h-5 w-5 shrink-0" />
          <span>
            {pending.length} {pending.length === 1 ? "save made" : "saves made"} with no signal {pending.length === 1 ? "is" : "are"} waiting to send (
            {pending.map((s) => s.label).join(", ")}). Sign in with the account that made {pending.length === 1 ? "it" : "them"} if you signed out.
          </span>
        </p>
      ) : null}
      {refused.map((s) => (
        <div key={s.key} role="alert" className="flex flex-col gap-1 rounded-lg border-2 border-over bg-over-bg p-2 pl-3 text-ink">
          <p className="flex items-start gap-2 font-bold text-over-ink">
            <WarningIcon className="mt-0.5 h-5 w-5 shrink-0" /> {s.label} was not saved to {s.jobName}.
          </p>
          <p>{s.refused}</p>
          <Button variant="secondary" className="self-start" onClick={() => void forgetSave(s.key)}>
            Discard it
          </Button>
        </div>
      ))}
      {sent.map(({ save, response, recheck }) => (
        <div
          key={save.key}
          role={recheck && !recheck.same ? "alert" : "status"}
          className={
            recheck && !recheck.same
              ? "flex flex-col gap-1 rounded-lg border-2 border-over bg-over-bg p-2 pl-3 text-ink"
              : "flex flex-col gap-1 rounded-lg border-2 border-spruce bg-spruce-light p-2 pl-3 text-ink"
          }
          data-testid="sent-save"
        >
          <p className="flex items-start gap-2 font-bold">
            <CheckIcon className="mt-0.5 h-5 w-5 shrink-0 text-sound" /> {response.label} saved to {response.jobName} from this phone.
          </p>
          {recheck ? (
            recheck.same ? (
              <p>Rechecked by the server: the same answer as worked out on this phone.</p>
            ) : (
              <>
                <p className="font-bold text-over-ink">Rechecked by the server: the answer changed.</p>
                <p>This phone worked out: {answerWords(recheck.phone)}.</p>
                <p>The server says: {answerWords(recheck.server)}. The job keeps the server&apos;s answer.</p>
                <p>Why: {recheck.why}</p>
              </>
            )
          ) : (
            <p>The server worked out its answer: {answerWords(response.answer)}.</p>
          )}
          <Button variant="ghost" className="self-start" onClick={() => setSent((all) => all.filter((x) => x.save.key !== save.key))}>
            Dismiss
          </Button>
        </div>
      ))}
    </div>
  );
}
