"use client";

import { useSyncExternalStore } from "react";

function subscribeOnline(onChange: () => void): () => void {
  window.addEventListener("online", onChange);
  window.addEventListener("offline", onChange);
  return () => {
    window.removeEventListener("online", onChange);
    window.removeEventListener("offline", onChange);
  };
}

/**
 * navigator.onLine, kept current (true while rendering on the server). In a module of its own so that the pages
 * which only need to know about the signal (the crew link, the shell) do not carry the sizing flow's data library.
 */
export function useOnline(): boolean {
  return useSyncExternalStore(
    subscribeOnline,
    () => navigator.onLine,
    () => true,
  );
}
