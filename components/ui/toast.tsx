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
import { CircleCheck, CircleX, Info, X } from "lucide-react";
import { cn } from "./cn";

export type ToastTone = "info" | "success" | "error";

export type ToastOptions = {
  title: string;
  description?: string;
  tone?: ToastTone;
};

type ToastEntry = Required<Pick<ToastOptions, "title" | "tone">> & { id: string; description?: string };

export type ToastApi = {
  /** Shows a message and returns its id. */
  toast: (options: ToastOptions) => string;
  dismiss: (id: string) => void;
};

const ToastContext = createContext<ToastApi | null>(null);

export type ToastProviderProps = {
  children: ReactNode;
  /** How long a message stays, in milliseconds; paused while pointed at or focused. */
  duration?: number;
  /** Accessible name of the region that holds the messages. */
  label?: string;
};

const toneStyles: Record<ToastTone, { icon: typeof Info; iconClass: string; edge: string }> = {
  info: { icon: Info, iconClass: "text-accent", edge: "border-l-accent" },
  success: { icon: CircleCheck, iconClass: "text-within", edge: "border-l-within" },
  error: { icon: CircleX, iconClass: "text-over", edge: "border-l-over" },
};

let counter = 0;
function nextId(): string {
  counter += 1;
  return `toast-${counter}`;
}

export function ToastProvider({ children, duration = 5000, label = "Notifications" }: ToastProviderProps) {
  const [toasts, setToasts] = useState<ToastEntry[]>([]);

  const dismiss = useCallback((id: string) => {
    setToasts((current) => current.filter((entry) => entry.id !== id));
  }, []);

  const toast = useCallback((options: ToastOptions) => {
    const id = nextId();
    const entry: ToastEntry = { id, title: options.title, description: options.description, tone: options.tone ?? "info" };
    // Newest last, and no more than a handful: a burst of saves should not bury the page.
    setToasts((current) => [...current, entry].slice(-4));
    return id;
  }, []);

  const api = useMemo<ToastApi>(() => ({ toast, dismiss }), [toast, dismiss]);

  return (
    <ToastContext.Provider value={api}>
      {children}
      {/* Always in the document: a live region only announces changes to a region that already exists. */}
      <div
        role="region"
        aria-label={label}
        aria-live="polite"
        aria-relevant="additions text"
        className="pointer-events-none fixed inset-x-0 bottom-0 z-50 flex flex-col items-center gap-2 p-3 sm:items-end sm:p-4 print:hidden"
      >
        {toasts.map((entry) => (
          <ToastMessage key={entry.id} entry={entry} duration={duration} onDismiss={dismiss} />
        ))}
      </div>
    </ToastContext.Provider>
  );
}

type ToastMessageProps = {
  entry: ToastEntry;
  duration: number;
  onDismiss: (id: string) => void;
};

function ToastMessage({ entry, duration, onDismiss }: ToastMessageProps) {
  const [paused, setPaused] = useState(false);
  const remaining = useRef(duration);

  useEffect(() => {
    if (paused) return;
    const startedAt = Date.now();
    const timer = setTimeout(() => onDismiss(entry.id), remaining.current);
    return () => {
      clearTimeout(timer);
      remaining.current = Math.max(0, remaining.current - (Date.now() - startedAt));
    };
  }, [paused, entry.id, onDismiss]);

  const { icon: Icon, iconClass, edge } = toneStyles[entry.tone];

  return (
    <div
      className={cn(
        "pointer-events-auto flex w-full max-w-sm items-start gap-3 rounded-md border border-l-4 border-rule bg-panel py-3 pr-1.5 pl-3 text-ink shadow-card",
        edge,
      )}
      onMouseEnter={() => setPaused(true)}
      onMouseLeave={() => setPaused(false)}
      onFocus={() => setPaused(true)}
      onBlur={() => setPaused(false)}
    >
      <Icon aria-hidden="true" className={cn("mt-0.5 size-5 shrink-0", iconClass)} />
      <div className="min-w-0 flex-1 py-0.5">
        <p className="text-sm leading-5 font-semibold">{entry.title}</p>
        {entry.description ? <p className="mt-0.5 text-sm leading-snug text-ink-soft">{entry.description}</p> : null}
      </div>
      <button
        type="button"
        onClick={() => onDismiss(entry.id)}
        aria-label={`Dismiss: ${entry.title}`}
        className="-my-1.5 inline-flex size-10 shrink-0 items-center justify-center rounded-md text-ink-soft hover:bg-sunken hover:text-ink"
      >
        <X aria-hidden="true" className="size-4" />
      </button>
    </div>
  );
}

/** The toast API of the nearest ToastProvider. */
export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error("useToast needs a <ToastProvider> above it in the tree.");
  return api;
}
