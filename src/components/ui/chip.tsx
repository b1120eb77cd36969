import type { ReactNode } from "react";

export type Tone = "neutral" | "accent" | "ok" | "caution" | "danger";

const TONE_CLASSES: Record<Tone, string> = {
  neutral: "border-line bg-raised text-ink",
  accent: "border-accent/40 bg-accent/10 text-accent",
  ok: "border-ok/40 bg-ok/10 text-ok",
  caution: "border-caution/40 bg-caution/10 text-caution",
  danger: "border-danger/50 bg-danger/10 text-danger",
};

/** A small label: roles, statuses, counts. */
export function Chip({ tone = "neutral", children, className = "" }: { tone?: Tone; children: ReactNode; className?: string }) {
  return (
    <span className={`inline-flex items-center rounded border px-1.5 py-px text-xs font-medium whitespace-nowrap ${TONE_CLASSES[tone]} ${className}`}>
      {children}
    </span>
  );
}
