"use client";

import { useSyncExternalStore } from "react";
import { InfoIcon } from "@/components/ui/icons";
import { useOnline } from "@/components/ui/use-online";

export type CopyAgeProps = {
  /** when the page was read from the server, ISO 8601 */
  readAt: string;
  /** when what it shows last changed, ISO 8601 */
  changedAt: string;
};

const noSubscription = () => () => undefined;

function localTime(iso: string): string {
  return new Date(iso).toLocaleString("en-US", { weekday: "short", month: "short", day: "numeric", hour: "numeric", minute: "2-digit" });
}

function utcTime(iso: string): string {
  return `${new Date(iso).toLocaleString("en-US", { month: "short", day: "numeric", hour: "numeric", minute: "2-digit", timeZone: "UTC" })} UTC`;
}

/**
 * When a page kept on the phone was last updated, and, with no signal, that this is the phone's copy. The
 * times are written in the phone's own time zone once in the browser (UTC in the server's first draw).
 */
export function CopyAge({ readAt, changedAt }: CopyAgeProps) {
  const online = useOnline();
  const inBrowser = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
  const format = inBrowser ? localTime : utcTime;
  return (
    <div className="flex flex-col gap-1" data-testid="copy-age">
      {!online ? (
        <p role="status" className="flex items-start gap-2 rounded-lg border-2 border-ink bg-paper-raised p-2 font-bold text-ink" data-testid="copy-offline">
          <InfoIcon className="mt-0.5 h-5 w-5 shrink-0" />
          <span>
            No signal: this is the copy kept on this phone, last updated <time dateTime={readAt}>{format(readAt)}</time>. Ask the builder before cutting if it
            may have changed since.
          </span>
        </p>
      ) : null}
      <p className="text-ink-soft">
        Schedule last changed <time dateTime={changedAt}>{format(changedAt)}</time> · updated on this screen <time dateTime={readAt}>{format(readAt)}</time>
      </p>
    </div>
  );
}
