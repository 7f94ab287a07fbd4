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

import { cn } from "./cn";
import { ToneIcon, type Tone } from "./tone-icon";

export type ToastTone = "neutral" | "good" | "warn" | "poor";

export type ToastInput = {
  /** What happened, in one sentence ("Stock updated."). */
  title: string;
  /** A second line with detail, when one is needed. */
  description?: string;
  tone?: ToastTone;
  /** Milliseconds before it leaves on its own; 0 keeps it until dismissed. Default 6000. */
  durationMs?: number;
};

type ToastItem = ToastInput & { id: number };

type ToastApi = {
  /** Shows a toast and returns its id. */
  notify: (toast: ToastInput) => number;
  dismiss: (id: number) => void;
};

const ToastContext = createContext<ToastApi | null>(null);

// At most this many on screen; older ones give way so a burst cannot cover the page.
const maxVisible = 4;

/** Holds the toasts and their live region; put it once in the root layout. */
export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<ToastItem[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => {
    setToasts((current) => current.filter((toast) => toast.id !== id));
  }, []);

  const notify = useCallback((toast: ToastInput) => {
    const id = nextId.current++;
    setToasts((current) => [...current.slice(-(maxVisible - 1)), { ...toast, id }]);
    return id;
  }, []);

  const api = useMemo(() => ({ notify, dismiss }), [notify, dismiss]);

  return (
    <ToastContext value={api}>
      {children}
      {/* The region exists before any toast so screen readers register it and announce
          additions politely, after what they are reading. */}
      <div
        aria-live="polite"
        aria-relevant="additions text"
        className="pointer-events-none fixed inset-x-0 bottom-0 z-50 flex flex-col items-center gap-2 p-4 sm:inset-x-auto sm:top-auto sm:right-0 sm:items-end"
      >
        {toasts.map((toast) => (
          <ToastCard key={toast.id} toast={toast} onDismiss={dismiss} />
        ))}
      </div>
    </ToastContext>
  );
}

/** `const toast = useToast(); toast.notify({ tone: "good", title: "Stock updated." })`. */
export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error("useToast must be used inside <ToastProvider>");
  return api;
}

const toneClasses: Record<ToastTone, { edge: string; icon: string }> = {
  neutral: { edge: "border-l-dusk-500", icon: "text-dusk-600" },
  good: { edge: "border-l-moss-500", icon: "text-moss-600" },
  warn: { edge: "border-l-ember-500", icon: "text-ember-700" },
  poor: { edge: "border-l-berry-500", icon: "text-berry-600" },
};

const toneIcons: Record<ToastTone, Tone> = {
  neutral: "info",
  good: "good",
  warn: "warn",
  poor: "poor",
};

function ToastCard({ toast, onDismiss }: { toast: ToastItem; onDismiss: (id: number) => void }) {
  const { id, title, description, tone = "neutral", durationMs = 6000 } = toast;
  // Hovering or focusing a toast holds it, so nobody loses a message mid-read (WCAG 2.2.1).
  const [paused, setPaused] = useState(false);

  useEffect(() => {
    if (paused || durationMs <= 0) return;
    const timer = setTimeout(() => onDismiss(id), durationMs);
    return () => clearTimeout(timer);
  }, [paused, durationMs, id, onDismiss]);

  return (
    <div
      onMouseEnter={() => setPaused(true)}
      onMouseLeave={() => setPaused(false)}
      onFocus={() => setPaused(true)}
      onBlur={() => setPaused(false)}
      className={cn(
        "pointer-events-auto flex w-full max-w-sm animate-rise-in items-start gap-3 rounded-xl border border-l-4 border-paper-300 bg-paper-50 p-4 shadow-lift",
        toneClasses[tone].edge,
      )}
    >
      <ToneIcon tone={toneIcons[tone]} className={cn("mt-0.5 size-5", toneClasses[tone].icon)} />
      <div className="flex min-w-0 flex-1 flex-col gap-0.5">
        <p className="font-bold text-ink">{title}</p>
        {description ? <p className="text-sm text-ink-soft">{description}</p> : null}
      </div>
      <button
        type="button"
        onClick={() => onDismiss(id)}
        aria-label="Dismiss notification"
        className="-mt-1 -mr-1 rounded-lg p-1.5 text-ink-soft hover:bg-paper-200 hover:text-ink focus-visible:outline-3 focus-visible:outline-dusk-500"
      >
        <svg viewBox="0 0 20 20" aria-hidden="true" className="size-4 fill-current">
          <path d="M5.7 4.3 10 8.6l4.3-4.3 1.4 1.4L11.4 10l4.3 4.3-1.4 1.4L10 11.4l-4.3 4.3-1.4-1.4L8.6 10 4.3 5.7z" />
        </svg>
      </button>
    </div>
  );
}
