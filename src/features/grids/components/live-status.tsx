import { useServerEventStatus } from "@/hooks/use-server-events.ts";

const LOOK = {
  open: { text: "Live", dot: "bg-ok", title: "Progress arrives as it happens." },
  connecting: { text: "Connecting…", dot: "bg-caution", title: "Opening the live connection to the server." },
  retrying: { text: "Reconnecting…", dot: "bg-caution", title: "The live connection dropped; lists refresh every 15 s meanwhile." },
  idle: { text: "Not live", dot: "bg-muted", title: "No live connection." },
} as const;

/** Whether the page is receiving live updates from the server. */
export function LiveStatus() {
  const look = LOOK[useServerEventStatus()];
  return (
    <span role="status" title={look.title} className="inline-flex items-center gap-1.5 text-xs text-muted">
      <span aria-hidden="true" className={`inline-block h-2 w-2 rounded-full ${look.dot}`} />
      {look.text}
    </span>
  );
}
