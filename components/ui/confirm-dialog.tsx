"use client";

import { useId, useState, type FormEvent, type ReactNode } from "react";

import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { Input } from "@/components/ui/input";
import { confirmTextMismatch, sameConfirmText } from "@/lib/confirm-text";

export type ConfirmDialogProps = {
  open: boolean;
  onCancel: () => void;
  onConfirm: () => void;
  title: ReactNode;
  /** What will happen, in plain words ("The garden, its beds and logs are removed."). */
  children?: ReactNode;
  /** Label of the confirming button, naming the action: "Delete garden". */
  confirmLabel: string;
  cancelLabel?: string;
  /**
   * A word the person must type before the confirm button works (e.g. the
   * garden's name). Case counts; curly and straight quotes, dashes and spaces do not
   * (lib/confirm-text.ts), and a line under the field says what does not match yet.
   */
  confirmText?: string;
  /** "danger" for destructive actions (the default), "primary" otherwise. */
  tone?: "danger" | "primary";
  /** The confirmed action is running: the button shows a spinner. */
  pending?: boolean;
};

export function ConfirmDialog({
  open,
  onCancel,
  title,
  pending = false,
  ...rest
}: ConfirmDialogProps) {
  return (
    <Dialog open={open} onClose={onCancel} title={title} closeOnBackdrop={!pending}>
      {/* Dialog mounts its content only while open, so the typed word starts empty each time. */}
      <ConfirmBody onCancel={onCancel} pending={pending} {...rest} />
    </Dialog>
  );
}

function ConfirmBody({
  onCancel,
  onConfirm,
  children,
  confirmLabel,
  cancelLabel = "Cancel",
  confirmText,
  tone = "danger",
  pending,
}: Omit<ConfirmDialogProps, "open" | "title">) {
  const [typed, setTyped] = useState("");
  const inputId = useId();
  const hintId = useId();
  const matches = confirmText === undefined || sameConfirmText(typed, confirmText);
  const mismatch = confirmText === undefined ? null : confirmTextMismatch(typed, confirmText);

  function submit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    // Enter in the field submits too, so the guard must sit here, not only on the button.
    if (matches && !pending) onConfirm();
  }

  return (
    <form onSubmit={submit} className="flex flex-col gap-4">
      {children ? <div className="text-soil-900">{children}</div> : null}
      {confirmText !== undefined ? (
        <div className="flex flex-col gap-1.5">
          <label htmlFor={inputId} className="font-semibold">
            Type <span className="font-mono">{confirmText}</span> to confirm
          </label>
          <Input
            id={inputId}
            value={typed}
            onChange={(event) => setTyped(event.target.value)}
            autoComplete="off"
            autoCapitalize="off"
            autoCorrect="off"
            spellCheck={false}
            aria-describedby={mismatch ? hintId : undefined}
            data-autofocus
          />
          {/* Polite: read after typing pauses, not on every key. */}
          <p id={hintId} aria-live="polite" className="min-h-5 text-sm text-soil-700">
            {mismatch}
          </p>
        </div>
      ) : null}
      <div className="flex flex-col-reverse gap-2 sm:flex-row sm:justify-end">
        <Button
          variant="secondary"
          onClick={onCancel}
          disabled={pending}
          data-autofocus={confirmText === undefined ? true : undefined}
        >
          {cancelLabel}
        </Button>
        <Button type="submit" variant={tone} pending={pending} disabled={!matches}>
          {confirmLabel}
        </Button>
      </div>
    </form>
  );
}
