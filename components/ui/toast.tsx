"use client";

import { createContext, useCallback, useContext, useEffect, useMemo, useRef, useState, type ReactNode } from "react";
import { CheckIcon, UndoIcon } from "./icons";

export type ToastOptions = {
  message: string;
  /** Offers an Undo button; called once when it is pressed (a deleted member comes back). */
  undo?: () => void | Promise<void>;
  /** How long the toast stays, in milliseconds; 8 s by default, long enough to reach for Undo. */
  durationMs?: number;
};

type ToastEntry = ToastOptions & { id: number };

export type ToastApi = {
  show: (options: ToastOptions) => number;
  dismiss: (id: number) => void;
};

const ToastContext = createContext<ToastApi | null>(null);

/** Shows short notes ("Member deleted") with an Undo, above the bottom navigation. Put once in the root layout. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<ToastEntry[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => {
    setToasts((current) => current.filter((toast) => toast.id !== id));
  }, []);

  const show = useCallback((options: ToastOptions) => {
    const id = nextId.current++;
    setToasts((current) => [...current.slice(-2), { ...options, id }]);
    return id;
  }, []);

  const api = useMemo<ToastApi>(() => ({ show, dismiss }), [show, dismiss]);

  return (
    <ToastContext.Provider value={api}>
      {children}
      <div
        aria-live="polite"
        aria-relevant="additions"
        className="no-print pointer-events-none fixed inset-x-0 z-50 flex flex-col items-center gap-2 px-4"
        style={{ bottom: "calc(var(--bottom-nav-h) + var(--action-bar-h) + 0.75rem)" }}
      >
        {toasts.map((toast) => (
          <ToastItem key={toast.id} toast={toast} onDismiss={dismiss} />
        ))}
      </div>
    </ToastContext.Provider>
  );
}

function ToastItem({ toast, onDismiss }: { toast: ToastEntry; onDismiss: (id: number) => void }) {
  const [undoing, setUndoing] = useState(false);
  const { id, message, undo, durationMs = 8000 } = toast;

  useEffect(() => {
    const timer = setTimeout(() => onDismiss(id), durationMs);
    return () => clearTimeout(timer);
  }, [id, durationMs, onDismiss]);

  return (
    <div className="pointer-events-auto flex w-full max-w-md items-center gap-3 rounded-card bg-ink px-4 py-2 text-paper shadow-bar">
      <CheckIcon className="h-5 w-5 shrink-0" />
      <p className="flex-1 py-2">{message}</p>
      {undo ? (
        <button
          type="button"
          disabled={undoing}
          onClick={async () => {
            setUndoing(true);
            try {
              await undo();
            } finally {
              onDismiss(id);
            }
          }}
          className="inline-flex min-h-touch items-center gap-1.5 rounded-lg px-3 font-bold text-amber-light underline underline-offset-4 hover:bg-ink-soft disabled:opacity-60"
        >
          <UndoIcon className="h-5 w-5" />
          Undo
        </button>
      ) : null}
      <button
        type="button"
        onClick={() => onDismiss(id)}
        className="inline-flex min-h-touch min-w-touch items-center justify-center rounded-lg text-paper hover:bg-ink-soft"
      >
        <span aria-hidden="true" className="text-2xl leading-none">
          ×
        </span>
        <span className="sr-only">Dismiss</span>
      </button>
    </div>
  );
}

/** The toast API; throws when the ToastProvider is missing, so a forgotten provider shows in development. */
export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error("useToast must be used inside <ToastProvider>");
  return api;
}
