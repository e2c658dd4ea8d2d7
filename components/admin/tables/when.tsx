"use client";

import { useSyncExternalStore } from "react";

const subscribe = () => () => undefined;

/**
 * A moment as the viewer's clock reads it. The server does not know the viewer's time zone, so it renders
 * UTC (marked as such) and the browser re-renders in local time once hydrated, without a mismatch.
 */
export function When({ iso }: { iso: string }) {
  const local = useSyncExternalStore(
    subscribe,
    () => true,
    () => false,
  );
  const date = new Date(iso);
  const text = local
    ? date.toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short" })
    : `${date.toLocaleString("en-US", { dateStyle: "medium", timeStyle: "short", timeZone: "UTC" })} UTC`;
  return <time dateTime={iso}>{text}</time>;
}
