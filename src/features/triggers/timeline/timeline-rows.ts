import type { TimelineEntryDto } from "@shared/api/triggers.ts";

/**
 * An entry of a kind this client does not know yet (the server may add kinds, such as storm
 * reports): still listed, as a plain line, rather than breaking the timeline.
 */
export interface OtherTimelineEntry {
  kind: "other";
  at: string;
  /** The server's own kind name, shown as the line's label. */
  serverKind: string;
  /** A short description when the entry carries one (name, note or text). */
  text: string | null;
}

/** The kinds the timeline lays out itself; any other kind is read as an OtherTimelineEntry. */
export type KnownTimelineEntry = Extract<TimelineEntryDto, { kind: "trigger" | "grid" | "escalation" }>;

export type TimelineEntry = KnownTimelineEntry | OtherTimelineEntry;

export type TimelineRow =
  | { type: "day"; key: string; day: string; count: number }
  | { type: "entry"; key: string; entry: TimelineEntry };

/** The UTC calendar day of a moment, "2026-05-14"; "unknown" when the time cannot be read. */
export function utcDayOf(at: string): string {
  const time = Date.parse(at);
  return Number.isNaN(time) ? "unknown" : new Date(time).toISOString().slice(0, 10);
}

/** A stable key per entry, so a selection and React's rows survive a refetch that adds entries on top. */
export function entryKey(entry: TimelineEntry): string {
  switch (entry.kind) {
    case "trigger":
      return `trigger-${entry.trigger.id}`;
    case "grid":
      return `grid-${entry.jobId}`;
    case "escalation":
      return `escalation-${entry.triggerId}-${entry.at}`;
    case "other":
      return `${entry.serverKind}-${entry.at}-${entry.text ?? ""}`;
  }
}

const timeOf = (entry: TimelineEntry) => {
  const time = Date.parse(entry.at);
  return Number.isNaN(time) ? Number.NEGATIVE_INFINITY : time;
};

/**
 * The timeline as rows: newest first, with a heading row before each UTC day holding the number of
 * entries under it. Entries with the same key (the same trigger on two pages) are listed once.
 */
export function buildTimelineRows(entries: readonly TimelineEntry[]): TimelineRow[] {
  // Array.prototype.sort is stable, so entries at the same moment keep the server's order.
  const ordered = [...entries].sort((a, b) => timeOf(b) - timeOf(a));
  const rows: TimelineRow[] = [];
  const seen = new Set<string>();
  let heading: Extract<TimelineRow, { type: "day" }> | null = null;
  for (const entry of ordered) {
    const key = entryKey(entry);
    if (seen.has(key)) continue;
    seen.add(key);
    const day = utcDayOf(entry.at);
    if (!heading || heading.day !== day) {
      heading = { type: "day", key: `day-${day}`, day, count: 0 };
      rows.push(heading);
    }
    heading.count++;
    rows.push({ type: "entry", key, entry });
  }
  return rows;
}
