"use client";

import { useEffect, useState } from "react";
import { useOnline } from "@/components/ui/use-online";
import { buttonClasses } from "@/components/ui/button";
import { CREW_PDF_CACHE } from "@/lib/offline/pages";

/**
 * The crew link's "Print for the site board (PDF)". The service worker keeps the PDF on the phone when the page
 * is kept (lib/offline/sw.ts); with no signal this says how old that copy is, or that there is none yet.
 */
export function CrewPdfLink({ token }: { token: string }) {
  const href = `/api/crew/${token}/pdf`;
  const online = useOnline();
  const [kept, setKept] = useState<string | null | undefined>(undefined);

  useEffect(() => {
    if (online || typeof caches === "undefined") return;
    let live = true;
    void caches
      .open(CREW_PDF_CACHE)
      .then((cache) => cache.match(new URL(href, window.location.origin).href))
      .then((res) => {
        const date = res?.headers.get("date");
        if (live) setKept(res ? (date && !Number.isNaN(Date.parse(date)) ? new Date(date).toISOString() : "") : null);
      })
      .catch(() => live && setKept(null));
    return () => {
      live = false;
    };
  }, [online, href]);

  return (
    <div className="no-print flex flex-col gap-1">
      <a href={href} download className={`${buttonClasses({ variant: "secondary" })} w-full sm:w-fit`} data-testid="crew-board-pdf">
        Print for the site board (PDF)
      </a>
      {!online && kept !== undefined ? (
        <p className="text-ink" data-testid="crew-pdf-kept">
          {kept === null ? (
            "No signal: the PDF was not kept on this phone yet; it needs a signal the first time."
          ) : kept ? (
            <>
              No signal: the PDF kept on this phone, last updated{" "}
              <time dateTime={kept}>
                {new Date(kept).toLocaleString("en-US", { weekday: "short", month: "short", day: "numeric", hour: "numeric", minute: "2-digit" })}
              </time>
              .
            </>
          ) : (
            "No signal: the PDF kept on this phone."
          )}
        </p>
      ) : null}
    </div>
  );
}
