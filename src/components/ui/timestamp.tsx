import { formatLocalBeside, formatUtcDateTime } from "@/lib/time.ts";

/** A moment shown UTC first with local time beside it; `empty` when there is none. */
export function Timestamp({ value, empty = "—" }: { value: string | null | undefined; empty?: string }) {
  if (!value) return <span className="text-muted">{empty}</span>;
  return (
    <time dateTime={value} className="font-mono text-xs whitespace-nowrap tabular-nums">
      <span>{formatUtcDateTime(value)}</span>
      <span className="text-muted"> · {formatLocalBeside(value)}</span>
    </time>
  );
}
