import type { TriggerSummaryDto } from "@shared/api/triggers.ts";
import { fieldByKey } from "@shared/fields.ts";
import { formatFieldValue } from "@/lib/format-units.ts";
import { formatLocalTime, formatUtcTime, type LocalFormatOptions } from "@/lib/time.ts";

const pad2 = (n: number) => String(n).padStart(2, "0");
const WEEKDAYS = ["Sun", "Mon", "Tue", "Wed", "Thu", "Fri", "Sat"];
const MONTHS = ["Jan", "Feb", "Mar", "Apr", "May", "Jun", "Jul", "Aug", "Sep", "Oct", "Nov", "Dec"];

/** A model run as staff name it on a busy screen: "13Z run" ("13:30Z run" off the hour). */
export function formatRunLabel(runTime: string): string {
  const d = new Date(runTime);
  if (Number.isNaN(d.getTime())) return "run —";
  return `${pad2(d.getUTCHours())}${d.getUTCMinutes() === 0 ? "" : `:${pad2(d.getUTCMinutes())}`}Z run`;
}

/** "Thu 14 May" in UTC. */
function utcDayLabel(d: Date): string {
  return `${WEEKDAYS[d.getUTCDay()]} ${d.getUTCDate()} ${MONTHS[d.getUTCMonth()]}`;
}

/**
 * A trigger's valid-time window, UTC first and local beside: "18:00–21:00Z" and "13:00–16:00 CDT";
 * a single valid time reads "18:00Z"; a window across UTC midnight names both days.
 */
export function formatValidWindow(first: string, last: string, options: LocalFormatOptions = {}): { utc: string; local: string } {
  const a = new Date(first);
  const b = new Date(last);
  if (Number.isNaN(a.getTime()) || Number.isNaN(b.getTime())) return { utc: "—", local: "—" };
  if (a.getTime() === b.getTime()) return { utc: formatUtcTime(a), local: formatLocalTime(a, options) };
  const sameDay = a.toISOString().slice(0, 10) === b.toISOString().slice(0, 10);
  const utc = sameDay ? `${formatUtcTime(a).slice(0, 5)}–${formatUtcTime(b)}` : `${utcDayLabel(a)} ${formatUtcTime(a)} – ${utcDayLabel(b)} ${formatUtcTime(b)}`;
  const localA = formatLocalTime(a, options);
  const localB = formatLocalTime(b, options);
  // "13:00 CDT" and "16:00 CDT" share the zone name: write it once.
  const zoneA = localA.slice(6);
  const local = zoneA && zoneA === localB.slice(6) ? `${localA.slice(0, 5)}–${localB}` : `${localA} – ${localB}`;
  return { utc, local };
}

/**
 * A timeline day heading: the UTC date, and beside it the stretch of local time that UTC day covers
 * ("Wed 19:00 – Thu 19:00 CDT" for a US Central office in summer).
 */
export function formatDayHeading(day: string, options: LocalFormatOptions = {}): { utc: string; local: string } {
  const start = new Date(`${day}T00:00:00Z`);
  if (Number.isNaN(start.getTime())) return { utc: "Unknown day", local: "" };
  const end = new Date(start.getTime() + 86_400_000);
  const weekday = (d: Date) => new Intl.DateTimeFormat(options.locale ?? "en-US", { weekday: "short", timeZone: options.timeZone }).format(d);
  const localStart = formatLocalTime(start, options);
  const localEnd = formatLocalTime(end, options);
  return {
    utc: `${utcDayLabel(start)} ${start.getUTCFullYear()}`,
    local: `${weekday(start)} ${localStart.slice(0, 5)} – ${weekday(end)} ${localEnd}`,
  };
}

export interface KeyValue {
  key: string;
  /** "2,450 J/kg", "45 kt" */
  text: string;
}

/**
 * The strongest values among the matched points, in display units, for the fields that hold
 * numbers (flags and categories say nothing beyond "the rule matched"). At most `limit`.
 */
export function keyValues(fields: TriggerSummaryDto["peak"]["fields"], limit = 3): KeyValue[] {
  const out: KeyValue[] = [];
  for (const peak of fields) {
    const field = fieldByKey(peak.key);
    if (!field || field.kind !== "number" || peak.max === null) continue;
    const unit = field.display.unit;
    out.push({ key: peak.key, text: `${formatFieldValue(field, peak.max)}${unit ? ` ${unit}` : ""}` });
    if (out.length >= limit) break;
  }
  return out;
}

/** Peak coverage of the zone: "42 %", "< 1 %" for a sliver, "—" when the rule is not about area. */
export function formatCoverage(percent: number | null): string {
  if (percent === null || !Number.isFinite(percent)) return "—";
  if (percent > 0 && percent < 1) return "< 1 %";
  return `${Math.round(percent)} %`;
}
