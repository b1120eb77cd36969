import { fieldByKey, toDisplayUnit } from "../../../shared/fields.ts";

/** Display formatting for outgoing messages: UTC first, office local time beside it. */

const pad = (n: number) => String(n).padStart(2, "0");

export function utcDateTime(iso: string): string {
  const d = new Date(iso);
  return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())} ${pad(d.getUTCHours())}:${pad(d.getUTCMinutes())}Z`;
}

export function utcCycle(iso: string): string {
  const d = new Date(iso);
  return `${d.getUTCFullYear()}-${pad(d.getUTCMonth() + 1)}-${pad(d.getUTCDate())} ${pad(d.getUTCHours())}Z`;
}

/** "Sat 2 May 13:00 CDT" in the office's zone. */
export function localDateTime(iso: string, timeZone: string): string {
  const parts = new Intl.DateTimeFormat("en-US", { timeZone, weekday: "short", day: "numeric", month: "short", hour: "2-digit", minute: "2-digit", hourCycle: "h23", timeZoneName: "short" }).formatToParts(new Date(iso));
  const get = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? "";
  return `${get("weekday")} ${get("day")} ${get("month")} ${get("hour")}:${get("minute")} ${get("timeZoneName")}`;
}

/** A valid-time span in UTC: one time, or "from to to" with the date once when both share it. */
export function utcSpan(from: string, to: string): string {
  if (from === to) return utcDateTime(from);
  const a = utcDateTime(from);
  const b = utcDateTime(to);
  return a.slice(0, 10) === b.slice(0, 10) ? `${a} to ${b.slice(11)}` : `${a} to ${b}`;
}

export function localSpan(from: string, to: string, timeZone: string): string {
  return from === to ? localDateTime(from, timeZone) : `${localDateTime(from, timeZone)} to ${localDateTime(to, timeZone)}`;
}

/** A stored (SI) value in the field's display unit: "2,340 J/kg", "48 kt". */
export function displayValue(key: string, value: number | null): string {
  if (value === null || !Number.isFinite(value)) return "n/a";
  const field = fieldByKey(key);
  if (!field) return String(value);
  const shown = toDisplayUnit(field, value);
  const number = shown.toLocaleString("en-US", { minimumFractionDigits: field.display.decimals, maximumFractionDigits: field.display.decimals });
  return field.display.unit ? `${number} ${field.display.unit}` : number;
}

/** One line per field that met the rule: its range over the matched points. */
export function peakLines(fields: ReadonlyArray<{ key: string; max: number | null; min: number | null }>): string[] {
  return fields.map((f) => {
    const low = displayValue(f.key, f.min);
    const high = displayValue(f.key, f.max ?? f.min);
    return f.min !== null && f.max !== null && low !== high ? `${f.key}: ${low} to ${high}` : `${f.key}: ${high}`;
  });
}
