import type { TriggerState } from "@shared/api/triggers.ts";
import { Chip } from "@/components/ui/chip.tsx";
import { STATE_LABELS } from "@/lib/trigger-words.ts";

export const TRIGGER_STATE_LABELS: Record<TriggerState, string> = Object.fromEntries(Object.entries(STATE_LABELS).map(([k, v]) => [k, v.label])) as Record<TriggerState, string>;

/** A trigger's state in the words and tones every trigger screen uses. */
export function TriggerStateLabel({ state }: { state: TriggerState }) {
  return <Chip tone={STATE_LABELS[state].tone}>{STATE_LABELS[state].label}</Chip>;
}
