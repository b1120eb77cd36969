import type { HistoryNotificationDto, HistoryTimelineItemDto } from "@shared/api/history.ts";
import { Chip, type Tone } from "@/components/ui/chip.tsx";
import { Loading } from "@/components/ui/loading.tsx";
import { Notice } from "@/components/ui/notice.tsx";
import { Timestamp } from "@/components/ui/timestamp.tsx";
import { describeError } from "@/lib/describe-error.ts";
import { EVENT_LABELS } from "@/lib/trigger-words.ts";
import { useHistoryTrigger } from "../api/get-trigger-history.ts";

const CHANNEL_LABELS: Record<string, string> = { email: "E-mail", sms: "Text message" };
const STATE_TONES: Record<string, Tone> = { sent: "ok", failed: "danger", queued: "caution", sending: "caution", held: "neutral", digested: "neutral" };

function NotificationLine({ n }: { n: HistoryNotificationDto }) {
  const why = n.change === "escalated" ? `escalation${n.level ? ` (level ${n.level})` : ""}` : n.change;
  return (
    <div className="flex flex-col gap-0.5">
      <span>
        {CHANNEL_LABELS[n.channel] ?? n.channel} to <span className="font-medium">{n.recipient}</span> <span className="font-mono text-xs text-muted">{n.address}</span> · {why}{" "}
        <Chip tone={STATE_TONES[n.state] ?? "neutral"}>{n.state}</Chip>
        {n.sentAt && (
          <span className="text-muted">
            {" "}
            · delivered <Timestamp value={n.sentAt} />
          </span>
        )}
      </span>
      {n.deliveries.length > 0 && (
        <span className="text-xs text-muted">
          {n.deliveries.map((d) => `attempt ${d.attempt}: ${d.outcome}${d.error ? ` (${d.error})` : ""}`).join(" · ")}
        </span>
      )}
      {n.state === "failed" && n.lastError && <span className="text-xs text-danger">Last error: {n.lastError}</span>}
    </div>
  );
}

function ItemLine({ item }: { item: HistoryTimelineItemDto }) {
  if (item.kind === "notification") return <NotificationLine n={item.notification} />;
  const { event } = item;
  return (
    <span>
      <span className={event.kind === "notify-failed" || event.kind === "escalated" ? "font-medium text-danger" : "font-medium"}>{EVENT_LABELS[event.kind]}</span>
      {event.actor ? ` by ${event.actor}` : event.kind === "opened" || event.kind === "expired" ? " by Bellwether" : ""}
      {event.note && <span className="text-muted"> — {event.note}</span>}
    </span>
  );
}

/** Everything that happened to one trigger and every message sent about it, oldest first. */
export function TriggerStory({ triggerId }: { triggerId: number }) {
  const story = useHistoryTrigger(triggerId);
  if (story.isPending) return <Loading label="Loading the trigger's events…" />;
  if (story.isError)
    return (
      <Notice tone="danger" title="Could not load this trigger's events">
        {describeError(story.error).message}
      </Notice>
    );
  const { timeline } = story.data;
  return (
    <ol aria-label={`Events and messages of trigger ${triggerId}`} className="flex flex-col gap-1.5">
      {timeline.length === 0 && <li className="text-muted">No events were recorded.</li>}
      {timeline.map((item) => (
        <li key={`${item.kind}-${item.kind === "event" ? item.event.id : item.notification.id}`} className="grid grid-cols-[15rem_1fr] gap-3">
          <Timestamp value={item.at} />
          <ItemLine item={item} />
        </li>
      ))}
    </ol>
  );
}
