import { CHANNEL_LABELS, type NotificationDto } from "@shared/api/notifications.ts";
import type { Tone } from "@/components/ui/chip.tsx";

/** Plain words for why a message was written. */
export function reasonLabel(n: Pick<NotificationDto, "change" | "level">): string {
  switch (n.change) {
    case "opened":
      return "New trigger";
    case "severity-rose":
      return "Severity rose";
    case "escalated":
      return `Escalation, level ${n.level ?? 1}`;
    case "digest":
      return "Quiet-hours digest";
  }
}

export function channelLabel(n: Pick<NotificationDto, "channel">): string {
  return CHANNEL_LABELS[n.channel];
}

/** The state as a short label and a tone; a queued row that has been tried before is "retrying". */
export function resultOf(n: Pick<NotificationDto, "state" | "attempts" | "digestId">): { label: string; tone: Tone } {
  switch (n.state) {
    case "sent":
      return { label: "Sent", tone: "ok" };
    case "failed":
      return { label: "Failed", tone: "danger" };
    case "sending":
      return { label: "Sending", tone: "accent" };
    case "queued":
      return n.attempts > 0 ? { label: "Retrying", tone: "caution" } : { label: "Queued", tone: "neutral" };
    case "held":
      return { label: "Held (quiet hours)", tone: "neutral" };
    case "digested":
      return { label: n.digestId ? `In digest #${n.digestId}` : "In a digest", tone: "neutral" };
  }
}

/** "3 sent, 1 retrying, 1 failed" */
export function deliverySummary(list: ReadonlyArray<Pick<NotificationDto, "state" | "attempts" | "digestId">>): string {
  const counts = new Map<string, number>();
  for (const n of list) {
    const label = resultOf(n).label.replace(/ #\d+$/, "").toLowerCase();
    counts.set(label, (counts.get(label) ?? 0) + 1);
  }
  return [...counts.entries()].map(([label, count]) => `${count} ${label}`).join(", ");
}
