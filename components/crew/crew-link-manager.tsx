"use client";

import { useRouter } from "next/navigation";
import { useState, useSyncExternalStore, useTransition, type FormEvent } from "react";
import { Button, buttonClasses } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { useToast } from "@/components/ui/toast";
import type { CrewLinkView } from "@/lib/crew/links";
import { createCrewLink, revokeCrewLink, sendCrewLink } from "./actions";

export type CrewLinkManagerProps = {
  jobId: string;
  links: CrewLinkView[];
  /** live links allowed at once (free tier), null for no limit */
  activeLimit: number | null;
  /** live links across all the owner's jobs */
  activeCount: number;
  /** the job's name, for the text message and the share sheet */
  jobName: string;
  /** QR code (SVG) of each live link by link id */
  qrSvgs?: Record<string, string>;
};

/** The words sent with a crew link by text message or the share sheet. */
export function crewMessage(jobName: string, url: string): string {
  return `${jobName}: the member schedule to build from (read only) ${url}`;
}

/** An sms: link that opens the phone's messages with the text filled in and no recipient chosen yet. */
export function smsHref(body: string): string {
  return `sms:?&body=${encodeURIComponent(body)}`;
}

const EXPIRY_OPTIONS = [
  { value: "0", label: "Until I revoke it" },
  { value: "1", label: "1 day" },
  { value: "7", label: "7 days" },
  { value: "30", label: "30 days" },
  { value: "90", label: "90 days" },
];

const noChange = () => () => undefined;

const STATUS_WORDS: Record<CrewLinkView["status"], string> = { active: "Live", revoked: "Revoked", expired: "Expired" };

function dateWords(iso: string): string {
  return new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "short", year: "numeric" });
}

function LinkRow({ link, onChanged, jobName, qrSvg }: { link: CrewLinkView; onChanged: () => void; jobName: string; qrSvg?: string }) {
  const toast = useToast();
  // the share sheet exists only in some browsers, and only in the browser: false on the server
  const canShare = useSyncExternalStore(
    noChange,
    () => typeof navigator.share === "function",
    () => false,
  );
  const [qrOpen, setQrOpen] = useState(true);

  const share = async () => {
    if (!link.url) return;
    try {
      await navigator.share({ title: `${jobName} — crew link`, text: `${jobName}: the member schedule to build from (read only)`, url: link.url });
    } catch (err) {
      if ((err as Error).name !== "AbortError") toast.show({ message: "Could not open the share sheet: copy the link instead." });
    }
  };
  const [pending, startTransition] = useTransition();
  const [mailOpen, setMailOpen] = useState(false);
  const [to, setTo] = useState("");
  const [note, setNote] = useState("");
  const [mailError, setMailError] = useState<string | null>(null);

  const copy = async () => {
    if (!link.url) return;
    try {
      await navigator.clipboard.writeText(link.url);
      toast.show({ message: "Crew link copied." });
    } catch {
      toast.show({ message: "Could not copy: press and hold the link to copy it." });
    }
  };

  const revoke = () => {
    if (!window.confirm("Revoke this crew link? Anyone who has it will see “This link is no longer active”.")) return;
    startTransition(async () => {
      const result = await revokeCrewLink({ linkId: link.id });
      toast.show({ message: result.ok ? "Crew link revoked. It stopped working at once." : result.error });
      if (result.ok) onChanged();
    });
  };

  const send = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setMailError(null);
    startTransition(async () => {
      const result = await sendCrewLink({ linkId: link.id, to, note });
      if (result.ok) {
        toast.show({ message: `Crew link sent to ${result.sentTo}.` });
        setMailOpen(false);
        setTo("");
        setNote("");
      } else {
        setMailError("issues" in result && result.issues?.length ? result.issues.map((i) => `${i.path}: ${i.message}`).join("; ") : result.error);
      }
    });
  };

  const live = link.status === "active";
  return (
    <li className="flex flex-col gap-2 rounded-card border-2 border-rule bg-paper-raised p-3" data-testid="crew-link-row" data-status={link.status}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="font-bold">{link.label || "Crew link"}</p>
        <p className={live ? "font-bold text-sound-ink" : "font-bold text-graphite"}>
          {STATUS_WORDS[link.status]}
          {live && link.expiresAt ? ` until ${dateWords(link.expiresAt)}` : ""}
        </p>
      </div>
      <p className="text-sm text-ink-soft">
        Made {dateWords(link.createdAt)}
        {link.lastOpenedAt ? ` · last opened ${dateWords(link.lastOpenedAt)}` : " · not opened yet"}
      </p>
      {live && link.url ? (
        <input
          readOnly
          value={link.url}
          aria-label="Crew link address"
          className="min-h-touch w-full rounded-lg border-2 border-rule bg-paper px-3 font-mono text-sm"
          onFocus={(e) => e.currentTarget.select()}
          data-testid="crew-link-url"
        />
      ) : null}
      {live && !link.url ? <p className="text-sm">This link can no longer be shown here; revoke it and make a new one.</p> : null}
      {live ? (
        <div className="flex flex-wrap gap-2">
          {link.url ? (
            <Button variant="secondary" onClick={copy}>
              Copy link
            </Button>
          ) : null}
          {link.url ? (
            <a href={smsHref(crewMessage(jobName, link.url))} className={buttonClasses({ variant: "secondary" })} data-testid="crew-link-sms">
              Text it
            </a>
          ) : null}
          {link.url && canShare ? (
            <Button variant="secondary" onClick={share} data-testid="crew-link-share">
              Share…
            </Button>
          ) : null}
          {link.url ? (
            <Button variant="secondary" onClick={() => setMailOpen((o) => !o)} aria-expanded={mailOpen}>
              E-mail it
            </Button>
          ) : null}
          {qrSvg ? (
            <Button variant="secondary" onClick={() => setQrOpen((o) => !o)} aria-expanded={qrOpen} data-testid="crew-link-qr-toggle">
              {qrOpen ? "Hide QR code" : "QR code"}
            </Button>
          ) : null}
          {link.url ? (
            <a
              href={`/api/crew/${link.url.split("/crew/")[1]}/pdf`}
              download
              className={buttonClasses({ variant: "secondary" })}
              data-testid="crew-link-board-pdf"
            >
              Site board PDF
            </a>
          ) : null}
          <Button variant="danger" onClick={revoke} loading={pending}>
            Revoke
          </Button>
        </div>
      ) : null}
      {live && qrSvg && qrOpen ? (
        <figure className="flex flex-col items-center gap-2 rounded-card border-2 border-rule bg-white p-3" data-testid="crew-link-qr">
          {/* the SVG is drawn by the qrcode package from our own link: no outside markup */}
          <div
            className="h-56 w-56 [&>svg]:h-full [&>svg]:w-full"
            dangerouslySetInnerHTML={{ __html: qrSvg }}
            role="img"
            aria-label={`QR code of the crew link for ${jobName}`}
          />
          <figcaption className="text-center text-sm text-ink-soft">Point a phone&apos;s camera at it to open the schedule.</figcaption>
        </figure>
      ) : null}
      {live && mailOpen ? (
        <form onSubmit={send} className="flex flex-col gap-2" noValidate>
          <TextField
            label="Send to"
            type="email"
            inputMode="email"
            autoComplete="email"
            value={to}
            onChange={(e) => setTo(e.target.value)}
            required
            error={mailError ?? undefined}
          />
          <TextField label="Note (optional)" value={note} onChange={(e) => setNote(e.target.value)} maxLength={500} />
          <Button type="submit" loading={pending} className="w-full sm:w-fit">
            Send
          </Button>
        </form>
      ) : null}
    </li>
  );
}

/** The owner's crew links for one job: make one, copy it, e-mail it, revoke it. */
export function CrewLinkManager({ jobId, links, activeLimit, activeCount, jobName, qrSvgs = {} }: CrewLinkManagerProps) {
  const router = useRouter();
  const toast = useToast();
  const [pending, startTransition] = useTransition();
  const [label, setLabel] = useState("");
  const [expires, setExpires] = useState("0");
  const [error, setError] = useState<string | null>(null);
  const atLimit = activeLimit !== null && activeCount >= activeLimit;
  const live = links.filter((l) => l.status === "active");
  const ended = links.filter((l) => l.status !== "active");

  const create = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    setError(null);
    startTransition(async () => {
      const result = await createCrewLink({ jobId, label, expiresInDays: Number(expires) });
      if (result.ok) {
        setLabel("");
        if (result.link.url) {
          try {
            await navigator.clipboard.writeText(result.link.url);
            toast.show({ message: "Crew link made and copied." });
          } catch {
            toast.show({ message: "Crew link made. Copy it from the list." });
          }
        }
        router.refresh();
      } else {
        setError(result.error);
      }
    });
  };

  return (
    <div className="flex flex-col gap-3">
      <p className="text-ink-soft">
        Anyone with a crew link sees this job&apos;s member schedule and the caution, read only, without an account. Revoke it and it stops working at once.
      </p>
      {activeLimit !== null ? (
        <p className="text-sm" data-testid="crew-link-limit">
          Free account: {activeCount} of {activeLimit} crew links live (across all your jobs).
        </p>
      ) : null}
      <form onSubmit={create} className="flex flex-col gap-2 sm:flex-row sm:items-end" noValidate>
        <TextField label="Who it is for (optional)" value={label} onChange={(e) => setLabel(e.target.value)} maxLength={80} containerClassName="sm:flex-1" />
        <SelectField label="Works for" options={EXPIRY_OPTIONS} value={expires} onChange={(e) => setExpires(e.target.value)} />
        <Button type="submit" loading={pending} disabled={atLimit} data-testid="crew-link-create">
          Make crew link
        </Button>
      </form>
      {atLimit ? <p className="font-bold text-caution-ink">Revoke a live link, or subscribe, to make another.</p> : null}
      {error ? (
        <p role="alert" className="font-bold text-over-ink">
          {error}
        </p>
      ) : null}
      {live.length > 0 ? (
        <ul className="flex flex-col gap-2" aria-label="Live crew links">
          {live.map((l) => (
            <LinkRow key={l.id} link={l} onChanged={() => router.refresh()} jobName={jobName} qrSvg={qrSvgs[l.id]} />
          ))}
        </ul>
      ) : null}
      {ended.length > 0 ? (
        <details className="rounded-card border-2 border-rule p-3">
          <summary className="min-h-touch cursor-pointer content-center font-bold">Revoked and expired links ({ended.length})</summary>
          <ul className="mt-2 flex flex-col gap-2" aria-label="Revoked and expired crew links">
            {ended.map((l) => (
              <LinkRow key={l.id} link={l} onChanged={() => router.refresh()} jobName={jobName} />
            ))}
          </ul>
        </details>
      ) : null}
    </div>
  );
}
