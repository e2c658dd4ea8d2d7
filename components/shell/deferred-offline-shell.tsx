"use client";

import dynamic from "next/dynamic";
import { useEffect, useState } from "react";

// The offline shell (service worker registration, the update offer, the no-signal bar, saves waiting on the
// phone) is not needed to draw the page: its code loads once the page has loaded and the browser is idle, so it
// never competes with the first paint or with hydration on a slow phone.
const OfflineShell = dynamic(() => import("@/components/offline/offline-shell").then((m) => m.OfflineShell), { ssr: false });

/** Calls `run` once the window's load event has fired and the main thread is idle (at most `timeout` ms later). */
export function afterLoadAndIdle(run: () => void, timeout = 2000): () => void {
  let cancelled = false;
  let stop = () => {};
  const whenIdle = () => {
    if (cancelled) return;
    if (typeof window.requestIdleCallback === "function") {
      const id = window.requestIdleCallback(() => !cancelled && run(), { timeout });
      stop = () => window.cancelIdleCallback(id);
    } else {
      const id = window.setTimeout(() => !cancelled && run(), 1);
      stop = () => window.clearTimeout(id);
    }
  };
  if (document.readyState === "complete") whenIdle();
  else window.addEventListener("load", whenIdle, { once: true });
  return () => {
    cancelled = true;
    window.removeEventListener("load", whenIdle);
    stop();
  };
}

export function DeferredOfflineShell() {
  const [ready, setReady] = useState(false);
  useEffect(() => afterLoadAndIdle(() => setReady(true)), []);
  return ready ? <OfflineShell /> : null;
}
