import { formatLocalBeside, formatUtcTime } from "@/lib/time.ts";

/** A time of day, UTC first with local beside ("14:05Z · 09:05 CDT"), full date and time on hover. */
export function UtcLocalTime({ value, className = "" }: { value: string; className?: string }) {
  return (
    <time dateTime={value} title={new Date(value).toUTCString()} className={`font-mono whitespace-nowrap tabular-nums ${className}`}>
      {formatUtcTime(value)}
      <span className="text-muted"> · {formatLocalBeside(value)}</span>
    </time>
  );
}
