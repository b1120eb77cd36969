import type { TriggerEventDto } from "@shared/api/triggers.ts";
import { Panel } from "@/components/ui/panel.tsx";
import { EVENT_LABELS } from "@/lib/trigger-words.ts";
import { UtcLocalTime } from "./utc-local-time.tsx";

/**
 * A few words from an event's extra data (a notification's channel), never the whole object; row
 * ids ("frameId", "contactId") mean nothing to a forecaster and are left out.
 */
function describeData(data: unknown): string | null {
  if (typeof data !== "object" || data === null || Array.isArray(data)) return null;
  const parts = Object.entries(data as Record<string, unknown>)
    .filter(([key, value]) => !/(Id|Version)$/.test(key) && (typeof value === "string" || typeof value === "number" || typeof value === "boolean"))
    .slice(0, 4)
    .map(([key, value]) => `${key}: ${String(value)}`);
  return parts.length ? parts.join(" · ") : null;
}

const KIND_CLASSES: Partial<Record<TriggerEventDto["kind"], string>> = {
  opened: "text-caution",
  acknowledged: "text-ok",
  escalated: "text-caution",
  "notify-failed": "text-danger",
};

/** Everything that happened to the trigger, oldest first, with who did it. */
export function TriggerEvents({ events }: { events: readonly TriggerEventDto[] }) {
  return (
    <Panel title="Events">
      {events.length === 0 ? (
        <p className="text-muted">No events yet.</p>
      ) : (
        <ol className="flex flex-col" data-testid="trigger-events">
          {events.map((event) => {
            const extra = describeData(event.data);
            return (
              <li key={event.id} className="grid grid-cols-[11rem_1fr] gap-x-3 border-b border-line/60 py-1.5 text-xs last:border-0">
                <UtcLocalTime value={event.at} className="text-xs" />
                <div className="min-w-0">
                  <span className={`font-medium ${KIND_CLASSES[event.kind] ?? "text-ink"}`}>{EVENT_LABELS[event.kind]}</span>
                  <span className="text-muted"> · {event.actor ?? "Bellwether"}</span>
                  {event.note && <p className="mt-0.5 break-words whitespace-pre-wrap text-ink">{event.note}</p>}
                  {extra && <p className="mt-0.5 font-mono break-words text-muted">{extra}</p>}
                </div>
              </li>
            );
          })}
        </ol>
      )}
    </Panel>
  );
}
