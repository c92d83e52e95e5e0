"use client";

import {
  createContext,
  useCallback,
  useContext,
  useEffect,
  useMemo,
  useRef,
  useState,
  type ReactNode,
} from "react";

import { cn } from "@/components/ui/cn";
import { CloseIcon } from "@/components/ui/icons";

export type ToastTone = "neutral" | "positive" | "danger";

export type ToastInput = {
  title: string;
  description?: string;
  tone?: ToastTone;
  /** One follow-up, e.g. { label: "Undo", onAction: undoLastApplication }. */
  action?: { label: string; onAction: () => void };
  /** Milliseconds before it leaves by itself; longer by default when there is an action. */
  duration?: number;
};

type Toast = ToastInput & { id: string };

export type ToastApi = {
  /** Shows a toast and returns its id. */
  show: (toast: ToastInput) => string;
  dismiss: (id: string) => void;
};

// Common practice: ~5 s to read a short line; an action needs time to reach and press.
export const TOAST_DURATION_MS = 5000;
export const TOAST_ACTION_DURATION_MS = 10000;
const MAX_VISIBLE = 3;

const ToastContext = createContext<ToastApi | null>(null);

export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(0);

  const dismiss = useCallback((id: string) => {
    setToasts((list) => list.filter((toast) => toast.id !== id));
  }, []);

  const show = useCallback((input: ToastInput) => {
    nextId.current += 1;
    const id = `toast-${nextId.current}`;
    setToasts((list) => [...list, { ...input, id }].slice(-MAX_VISIBLE));
    return id;
  }, []);

  const api = useMemo(() => ({ show, dismiss }), [show, dismiss]);

  return (
    <ToastContext.Provider value={api}>
      {children}
      {/* Always mounted: screen readers only announce changes to a live region that already exists. */}
      <div
        role="status"
        aria-live="polite"
        aria-label="Notifications"
        className="pointer-events-none fixed inset-x-0 bottom-0 z-50 flex flex-col items-center gap-2 p-3 sm:items-end sm:p-6"
      >
        {toasts.map((toast) => (
          <ToastItem key={toast.id} toast={toast} onDismiss={dismiss} />
        ))}
      </div>
    </ToastContext.Provider>
  );
}

export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error("useToast must be called inside <ToastProvider>.");
  return api;
}

const tones: Record<ToastTone, string> = {
  neutral: "border-l-loam-400",
  positive: "border-l-leaf-700",
  danger: "border-l-bloom-700",
};

function ToastItem({ toast, onDismiss }: { toast: Toast; onDismiss: (id: string) => void }) {
  const { id, title, description, tone = "neutral", action } = toast;
  const remaining = useRef(
    toast.duration ?? (action ? TOAST_ACTION_DURATION_MS : TOAST_DURATION_MS),
  );
  // Paused while pointed at or focused, so nobody loses an Undo mid-reach (WCAG 2.2.1).
  const [paused, setPaused] = useState(false);

  useEffect(() => {
    if (paused) return;
    const started = Date.now();
    const timer = setTimeout(() => onDismiss(id), Math.max(0, remaining.current));
    return () => {
      clearTimeout(timer);
      remaining.current -= Date.now() - started;
    };
  }, [paused, id, onDismiss]);

  return (
    <div
      onPointerEnter={() => setPaused(true)}
      onPointerLeave={() => setPaused(false)}
      onFocus={() => setPaused(true)}
      onBlur={(event) => {
        const next = event.relatedTarget;
        if (!(next instanceof Node && event.currentTarget.contains(next))) setPaused(false);
      }}
      className={cn(
        "pointer-events-auto flex w-full max-w-sm items-start gap-2 rounded-card border border-l-4 border-loam-200 bg-white py-2 pr-1 pl-4 text-soil-900 shadow-lg",
        tones[tone],
      )}
    >
      <div className="flex-1 py-2">
        <p className="font-semibold">{title}</p>
        {description ? <p className="text-sm text-soil-700">{description}</p> : null}
      </div>
      {action ? (
        <button
          type="button"
          onClick={() => {
            action.onAction();
            onDismiss(id);
          }}
          className="min-h-11 rounded-control px-3 font-semibold text-leaf-800 hover:bg-leaf-50"
        >
          {action.label}
        </button>
      ) : null}
      <button
        type="button"
        onClick={() => onDismiss(id)}
        aria-label={`Dismiss: ${title}`}
        className="inline-flex size-11 shrink-0 items-center justify-center rounded-control text-soil-700 hover:bg-loam-100"
      >
        <CloseIcon />
      </button>
    </div>
  );
}
