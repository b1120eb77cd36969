import type { TriggerState } from "@shared/api/triggers.ts";
import { Chip, type Tone } from "@/components/ui/chip.tsx";

const STATE: Record<TriggerState, { label: string; tone: Tone }> = {
  open: { label: "Open", tone: "caution" },
  acknowledged: { label: "Acknowledged", tone: "accent" },
  cleared: { label: "Cleared", tone: "neutral" },
  expired: { label: "Expired", tone: "neutral" },
  "false-alarm": { label: "False alarm", tone: "danger" },
};

export const TRIGGER_STATE_LABELS: Record<TriggerState, string> = Object.fromEntries(Object.entries(STATE).map(([k, v]) => [k, v.label])) as Record<TriggerState, string>;

export function TriggerStateLabel({ state }: { state: TriggerState }) {
  return <Chip tone={STATE[state].tone}>{STATE[state].label}</Chip>;
}
