import type { ReactNode } from "react";
import type { Tone } from "./chip.tsx";

const TONE_CLASSES: Record<Tone, string> = {
  neutral: "border-line bg-raised",
  accent: "border-accent/40 bg-accent/10",
  ok: "border-ok/40 bg-ok/10",
  caution: "border-caution/50 bg-caution/10",
  danger: "border-danger/50 bg-danger/10",
};

/**
 * An inline message. Errors use role="alert" so screen readers announce them when they appear;
 * calmer notes are plain text.
 */
export function Notice({ tone = "neutral", title, children }: { tone?: Tone; title?: ReactNode; children?: ReactNode }) {
  return (
    <div role={tone === "danger" ? "alert" : undefined} className={`rounded border px-3 py-2 ${TONE_CLASSES[tone]}`}>
      {title && <p className="font-medium">{title}</p>}
      {children && <div className={title ? "mt-0.5 text-muted" : ""}>{children}</div>}
    </div>
  );
}
