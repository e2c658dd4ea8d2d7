"use client";

import { useEffect, useId, useRef, type ReactNode } from "react";
import { CrossIcon } from "./icons";
import { cx } from "./cx";

export type DialogProps = {
  open: boolean;
  /** Called on Escape, on the close button and on a tap outside the panel. */
  onClose: () => void;
  title: string;
  description?: ReactNode;
  children?: ReactNode;
  /** The dialog's buttons, laid out at its foot (within thumb reach on a phone). */
  actions?: ReactNode;
  className?: string;
};

/**
 * A modal on the browser's own <dialog>: focus moves in and is kept inside, Escape closes it, focus returns
 * to where it was. A sheet rising from the bottom on phones, a centered panel on wider screens.
 */
export function Dialog({ open, onClose, title, description, children, actions, className }: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const descriptionId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) {
      if (typeof dialog.showModal === "function") dialog.showModal();
      else dialog.setAttribute("open", "");
    } else if (!open && dialog.open) {
      if (typeof dialog.close === "function") dialog.close();
      else dialog.removeAttribute("open");
    }
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onCancel={(event) => {
        event.preventDefault();
        onClose();
      }}
      onClick={(event) => {
        if (event.target === ref.current) onClose();
      }}
      className={cx(
        "m-0 mt-auto w-full max-w-none rounded-t-2xl border-2 border-ink bg-paper p-0 text-ink backdrop:bg-ink/60",
        "sm:m-auto sm:max-w-lg sm:rounded-2xl",
        className,
      )}
    >
      <div className="flex max-h-[85vh] flex-col">
        <div className="flex items-start justify-between gap-3 border-b-2 border-rule px-4 pt-4 pb-3">
          <h2 id={titleId} className="pt-2 text-xl font-bold">
            {title}
          </h2>
          <button
            type="button"
            onClick={onClose}
            className="inline-flex min-h-touch min-w-touch items-center justify-center rounded-lg text-ink hover:bg-paper-sunk"
          >
            <CrossIcon className="h-6 w-6" />
            <span className="sr-only">Close</span>
          </button>
        </div>
        <div className="overflow-y-auto px-4 py-4">
          {description ? (
            <p id={descriptionId} className="mb-3 text-ink-soft">
              {description}
            </p>
          ) : null}
          {children}
        </div>
        {actions ? <div className="pb-safe flex flex-col-reverse gap-2 border-t-2 border-rule px-4 pt-3 sm:flex-row sm:justify-end">{actions}</div> : null}
      </div>
    </dialog>
  );
}
