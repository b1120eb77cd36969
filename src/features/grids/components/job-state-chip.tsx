import type { IngestJobDto } from "@shared/api/grids.ts";
import { Chip, type Tone } from "@/components/ui/chip.tsx";

const STATE_LOOK: Record<IngestJobDto["state"], { label: string; tone: Tone }> = {
  queued: { label: "Queued", tone: "neutral" },
  decoding: { label: "Decoding", tone: "accent" },
  diagnosing: { label: "Diagnosing", tone: "accent" },
  ready: { label: "Ready", tone: "ok" },
  failed: { label: "Failed", tone: "danger" },
};

export function JobStateChip({ state }: { state: IngestJobDto["state"] }) {
  const look = STATE_LOOK[state];
  return <Chip tone={look.tone}>{look.label}</Chip>;
}
