import { timelineEntryDto } from "@shared/api/triggers.ts";
import type { OtherTimelineEntry, TimelineEntry } from "../timeline/timeline-rows.ts";

const KNOWN_KINDS = new Set(["trigger", "grid", "escalation"]);

const isRecord = (value: unknown): value is Record<string, unknown> => typeof value === "object" && value !== null && !Array.isArray(value);

/** A few readable words from an entry this client has no layout for: its own or a nested object's name, kind, note or remarks. */
function describeOther(entry: Record<string, unknown>): string | null {
  const words: string[] = [];
  const take = (source: Record<string, unknown>) => {
    for (const name of ["name", "kind", "note", "text", "remarks"]) {
      const value = source[name];
      if (typeof value === "string" && value.trim() !== "" && !(source === entry && name === "kind")) words.push(value.trim());
    }
    if (source.invented === true) words.push("(invented)");
  };
  take(entry);
  for (const value of Object.values(entry)) if (isRecord(value)) take(value);
  const text = words.join(" · ");
  return text ? (text.length > 160 ? `${text.slice(0, 157)}…` : text) : null;
}

/**
 * Checks one timeline entry from the server. Triggers, grid arrivals and escalations are read
 * strictly; an entry of another kind (one the server added later) becomes a plain "other" line;
 * something that is not an entry at all (no kind or no readable time) is dropped.
 */
export function readTimelineEntry(raw: unknown): TimelineEntry | null {
  if (!isRecord(raw) || typeof raw.kind !== "string" || typeof raw.at !== "string" || Number.isNaN(Date.parse(raw.at))) return null;
  if (KNOWN_KINDS.has(raw.kind)) {
    const parsed = timelineEntryDto.safeParse(raw);
    return parsed.success ? (parsed.data as TimelineEntry) : null;
  }
  const other: OtherTimelineEntry = { kind: "other", at: raw.at, serverKind: raw.kind, text: describeOther(raw) };
  return other;
}
