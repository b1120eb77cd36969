import { createContext, useCallback, useContext, useMemo, useRef, useState, type ReactNode } from "react";

type ToastTone = "success" | "error" | "info";

interface Toast {
  id: number;
  tone: ToastTone;
  title: string;
  detail?: string;
}

interface ToastApi {
  success: (title: string, detail?: string) => void;
  error: (title: string, detail?: string) => void;
  info: (title: string, detail?: string) => void;
}

const ToastContext = createContext<ToastApi | null>(null);

/** Success and info toasts leave on their own; errors stay until dismissed so nobody misses them. */
const AUTO_DISMISS_MS = 6000;

const TONE_CLASSES: Record<ToastTone, string> = {
  success: "border-ok/50",
  error: "border-danger/60",
  info: "border-accent/50",
};

const TONE_MARK: Record<ToastTone, string> = { success: "text-ok", error: "text-danger", info: "text-accent" };

export function ToastProvider({ children }: { children: ReactNode }) {
  const [toasts, setToasts] = useState<Toast[]>([]);
  const nextId = useRef(1);

  const dismiss = useCallback((id: number) => setToasts((list) => list.filter((t) => t.id !== id)), []);

  const push = useCallback(
    (tone: ToastTone, title: string, detail?: string) => {
      const id = nextId.current++;
      setToasts((list) => [...list.slice(-4), { id, tone, title, detail }]);
      if (tone !== "error") window.setTimeout(() => dismiss(id), AUTO_DISMISS_MS);
    },
    [dismiss],
  );

  const api = useMemo<ToastApi>(
    () => ({
      success: (title, detail) => push("success", title, detail),
      error: (title, detail) => push("error", title, detail),
      info: (title, detail) => push("info", title, detail),
    }),
    [push],
  );

  const render = (list: Toast[]) =>
    list.map((toast) => (
      <div
        key={toast.id}
        className={`pointer-events-auto flex w-80 items-start gap-2 rounded-md border bg-raised px-3 py-2 shadow-lg ${TONE_CLASSES[toast.tone]}`}
      >
        <span aria-hidden="true" className={`mt-px ${TONE_MARK[toast.tone]}`}>
          ●
        </span>
        <div className="min-w-0 flex-1">
          <p className="font-medium">{toast.title}</p>
          {toast.detail && <p className="mt-0.5 text-xs break-words text-muted">{toast.detail}</p>}
        </div>
        <button
          type="button"
          onClick={() => dismiss(toast.id)}
          aria-label={`Dismiss: ${toast.title}`}
          className="rounded px-1 text-muted hover:text-ink"
        >
          ×
        </button>
      </div>
    ));

  return (
    <ToastContext.Provider value={api}>
      {children}
      <div className="pointer-events-none fixed right-4 bottom-4 z-50 flex flex-col gap-2">
        {/* Two live regions: failures interrupt, confirmations wait their turn. */}
        <div role="alert" aria-live="assertive" className="flex flex-col gap-2">
          {render(toasts.filter((t) => t.tone === "error"))}
        </div>
        <div role="status" aria-live="polite" className="flex flex-col gap-2">
          {render(toasts.filter((t) => t.tone !== "error"))}
        </div>
      </div>
    </ToastContext.Provider>
  );
}

export function useToast(): ToastApi {
  const api = useContext(ToastContext);
  if (!api) throw new Error("useToast needs a ToastProvider above it");
  return api;
}
