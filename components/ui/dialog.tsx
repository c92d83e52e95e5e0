"use client";

import { useEffect, useId, useRef, type ReactNode } from "react";

import { cn } from "@/components/ui/cn";
import { CloseIcon } from "@/components/ui/icons";

export type DialogProps = {
  open: boolean;
  /** Called for Escape, the close button and a backdrop tap; the parent sets open=false. */
  onClose: () => void;
  title: ReactNode;
  description?: ReactNode;
  children?: ReactNode;
  /** Buttons row at the bottom (Cancel / Save …). */
  footer?: ReactNode;
  /** A tap on the dimmed backdrop closes; off for dialogs holding unsaved input. */
  closeOnBackdrop?: boolean;
  className?: string;
};

/**
 * A modal on the native <dialog>: showModal() gives the focus trap, inert page
 * and top layer for free. Where showModal is missing (older engines, jsdom) it
 * degrades to a plain open dialog with the same Escape and focus handling.
 * Focus goes to the element marked `data-autofocus`, else the first field,
 * else the Close button; on close it returns to whatever opened the dialog.
 */
export function Dialog({
  open,
  onClose,
  title,
  description,
  children,
  footer,
  closeOnBackdrop = true,
  className,
}: DialogProps) {
  const ref = useRef<HTMLDialogElement>(null);
  const returnFocusTo = useRef<HTMLElement | null>(null);
  const titleId = useId();
  const descriptionId = useId();
  // Kept in a ref so the effects below do not re-run when the parent passes a new closure.
  const onCloseRef = useRef(onClose);
  useEffect(() => {
    onCloseRef.current = onClose;
  });

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog || !open) return;
    const active = document.activeElement;
    returnFocusTo.current = active instanceof HTMLElement ? active : null;
    if (!dialog.open) {
      if (typeof dialog.showModal === "function") dialog.showModal();
      else dialog.setAttribute("open", "");
    }
    // Engines differ on where showModal puts focus (and the fallback puts it nowhere),
    // so pick it ourselves: a marked control, else the first field, else Close.
    const target =
      dialog.querySelector<HTMLElement>("[data-autofocus]") ??
      dialog.querySelector<HTMLElement>("input:not([disabled]), select, textarea") ??
      dialog.querySelector<HTMLElement>("button");
    target?.focus();
    return () => {
      if (typeof dialog.close === "function" && dialog.open) dialog.close();
      else dialog.removeAttribute("open");
      // Back to the control that opened the dialog (WCAG 2.4.3 focus order).
      const target = returnFocusTo.current;
      if (target?.isConnected) target.focus();
    };
  }, [open]);

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    // The browser closes on Escape by itself; cancel it so the parent's state stays the truth.
    const onCancel = (event: Event) => {
      event.preventDefault();
      onCloseRef.current();
    };
    dialog.addEventListener("cancel", onCancel);
    return () => dialog.removeEventListener("cancel", onCancel);
  }, []);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={description ? descriptionId : undefined}
      onKeyDown={(event) => {
        if (event.key === "Escape") {
          event.preventDefault();
          onClose();
        }
      }}
      onClick={(event) => {
        // A click whose target is the <dialog> itself landed on the backdrop.
        if (closeOnBackdrop && event.target === event.currentTarget) onClose();
      }}
      className={cn(
        "m-auto w-[calc(100%-1.5rem)] max-w-lg rounded-card bg-white p-0 text-soil-900 shadow-xl",
        "max-h-[calc(100dvh-1.5rem)] backdrop:bg-soil-900/60",
        className,
      )}
    >
      {open ? (
        <div className="flex max-h-[inherit] flex-col">
          <div className="flex items-start justify-between gap-3 border-b border-loam-200 px-4 py-3 sm:px-6">
            <div className="flex flex-col gap-1 pt-2">
              <h2 id={titleId} className="font-display text-xl font-semibold">
                {title}
              </h2>
              {description ? (
                <p id={descriptionId} className="text-soil-700">
                  {description}
                </p>
              ) : null}
            </div>
            <button
              type="button"
              onClick={onClose}
              aria-label="Close"
              className="inline-flex size-11 shrink-0 items-center justify-center rounded-control text-soil-700 hover:bg-loam-100"
            >
              <CloseIcon />
            </button>
          </div>
          <div className="overflow-y-auto px-4 py-4 sm:px-6">{children}</div>
          {footer ? (
            <div className="flex flex-col-reverse gap-2 border-t border-loam-200 px-4 py-3 sm:flex-row sm:justify-end sm:px-6">
              {footer}
            </div>
          ) : null}
        </div>
      ) : null}
    </dialog>
  );
}
