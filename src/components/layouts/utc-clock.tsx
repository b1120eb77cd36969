import { useNow } from "@/hooks/use-now.ts";
import { formatLocalTime, formatUtcClock } from "@/lib/time.ts";

/** "14:32:05Z · 09:32 CDT": UTC first, as staff speak it, with local time beside it. */
export function UtcClock() {
  const now = useNow();
  return (
    <time dateTime={now.toISOString()} className="font-mono text-sm tabular-nums" aria-label="Current time">
      <span className="text-ink">{formatUtcClock(now)}</span>
      <span className="text-muted"> · {formatLocalTime(now)}</span>
    </time>
  );
}
