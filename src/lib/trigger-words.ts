import type { TriggerEventKind, TriggerState } from "@shared/api/triggers.ts";
import type { Tone } from "@/components/ui/chip.tsx";

/**
 * The words every screen uses for a trigger's states and events (timeline, trigger page, history),
 * kept in one place so they read the same everywhere.
 */

/** How a trigger's state reads on screen. Open stands out; closed states step back. */
export const STATE_LABELS: Record<TriggerState, { label: string; tone: Tone }> = {
  open: { label: "Open", tone: "caution" },
  acknowledged: { label: "Acknowledged", tone: "ok" },
  cleared: { label: "Cleared", tone: "neutral" },
  expired: { label: "Expired", tone: "neutral" },
  "false-alarm": { label: "False alarm", tone: "neutral" },
};

export const EVENT_LABELS: Record<TriggerEventKind, string> = {
  opened: "Opened",
  updated: "Updated by a newer frame",
  acknowledged: "Acknowledged",
  commented: "Comment",
  cleared: "Cleared",
  expired: "Expired",
  "false-alarm": "Closed as a false alarm",
  escalated: "Escalated",
  notified: "Notified",
  "notify-failed": "Notification failed",
};
