import type { TriggerState } from "@shared/api/triggers.ts";
import { Chip } from "@/components/ui/chip.tsx";
import { STATE_LABELS } from "@/lib/trigger-words.ts";

export function TriggerStateChip({ state }: { state: TriggerState }) {
  const { label, tone } = STATE_LABELS[state];
  return <Chip tone={tone}>{label}</Chip>;
}
