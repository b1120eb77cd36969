/**
 * Time for display. Staff speak in UTC ("18Z") and think in local time for the public, so every
 * timestamp shows UTC first and local time beside it. Nothing here is used for computation.
 */

export type TimeInput = Date | string | number;

const pad2 = (n: number): string => String(n).padStart(2, "0");

function toDate(value: TimeInput): Date {
  return value instanceof Date ? value : new Date(value);
}

function isValid(date: Date): boolean {
  return !Number.isNaN(date.getTime());
}

/** "18:00Z" */
export function formatUtcTime(value: TimeInput): string {
  const d = toDate(value);
  if (!isValid(d)) return "—";
  return `${pad2(d.getUTCHours())}:${pad2(d.getUTCMinutes())}Z`;
}

/** A model cycle as staff say it: "2025-05-02 12Z", with minutes only when the run is off the hour ("12:30Z"). */
export function formatUtcCycle(value: TimeInput): string {
  const d = toDate(value);
  if (!isValid(d)) return "—";
  const minutes = d.getUTCMinutes() === 0 ? "" : `:${pad2(d.getUTCMinutes())}`;
  return `${d.getUTCFullYear()}-${pad2(d.getUTCMonth() + 1)}-${pad2(d.getUTCDate())} ${pad2(d.getUTCHours())}${minutes}Z`;
}

/** "14:32:05Z", for the header clock. */
export function formatUtcClock(value: TimeInput): string {
  const d = toDate(value);
  if (!isValid(d)) return "—";
  return `${pad2(d.getUTCHours())}:${pad2(d.getUTCMinutes())}:${pad2(d.getUTCSeconds())}Z`;
}

/** "2025-05-02 18:00Z" */
export function formatUtcDateTime(value: TimeInput): string {
  const d = toDate(value);
  if (!isValid(d)) return "—";
  return `${d.getUTCFullYear()}-${pad2(d.getUTCMonth() + 1)}-${pad2(d.getUTCDate())} ${formatUtcTime(d)}`;
}

export interface LocalFormatOptions {
  /** IANA zone; defaults to the browser's. Tests pass one so results do not depend on the machine. */
  timeZone?: string;
  locale?: string;
}

/** "09:32 CDT": 24-hour local time with the zone's short name. */
export function formatLocalTime(value: TimeInput, options: LocalFormatOptions = {}): string {
  const d = toDate(value);
  if (!isValid(d)) return "—";
  const parts = new Intl.DateTimeFormat(options.locale ?? "en-US", {
    hour: "2-digit",
    minute: "2-digit",
    hourCycle: "h23",
    timeZone: options.timeZone,
    timeZoneName: "short",
  }).formatToParts(d);
  const get = (type: Intl.DateTimeFormatPartTypes) => parts.find((p) => p.type === type)?.value ?? "";
  return `${get("hour")}:${get("minute")} ${get("timeZoneName")}`.trim();
}

/** Local calendar day as "2025-05-02" in the given zone. */
function localDay(d: Date, timeZone: string | undefined): string {
  // en-CA formats dates as YYYY-MM-DD.
  return new Intl.DateTimeFormat("en-CA", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).format(d);
}

/** Local time with a short weekday when the local day differs from the UTC day ("Thu 19:00 CDT"). */
export function formatLocalBeside(value: TimeInput, options: LocalFormatOptions = {}): string {
  const d = toDate(value);
  if (!isValid(d)) return "—";
  const time = formatLocalTime(d, options);
  const utcDay = d.toISOString().slice(0, 10);
  if (localDay(d, options.timeZone) === utcDay) return time;
  const weekday = new Intl.DateTimeFormat(options.locale ?? "en-US", { weekday: "short", timeZone: options.timeZone }).format(d);
  return `${weekday} ${time}`;
}

/** Header clock line: "14:32:05Z · 09:32 CDT". */
export function formatClockLine(value: TimeInput, options: LocalFormatOptions = {}): string {
  return `${formatUtcClock(value)} · ${formatLocalTime(value, options)}`;
}

/** Table cell: "2025-05-02 18:00Z · 13:00 CDT". */
export function formatTimestampLine(value: TimeInput, options: LocalFormatOptions = {}): string {
  const d = toDate(value);
  if (!isValid(d)) return "—";
  return `${formatUtcDateTime(d)} · ${formatLocalBeside(d, options)}`;
}

/**
 * Converts the value of an `<input type="datetime-local">` that the user filled in as UTC
 * ("2025-05-02T18:00") to an ISO instant ("2025-05-02T18:00:00.000Z"). Returns null when empty or invalid.
 */
export function utcInputToIso(value: string): string | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2})(?::(\d{2}))?$/.exec(value.trim());
  if (!match) return null;
  const [, y, mo, da, h, mi, s] = match;
  const ms = Date.UTC(Number(y), Number(mo) - 1, Number(da), Number(h), Number(mi), Number(s ?? "0"));
  const d = new Date(ms);
  // Reject dates that Date.UTC silently rolled over (e.g. 31 April).
  if (d.getUTCMonth() !== Number(mo) - 1 || d.getUTCDate() !== Number(da)) return null;
  return d.toISOString();
}

/** The reverse of utcInputToIso: an ISO instant shown in a UTC datetime-local input ("2025-05-02T18:00"). */
export function isoToUtcInput(iso: string | undefined | null): string {
  if (!iso) return "";
  const d = new Date(iso);
  if (!isValid(d)) return "";
  return d.toISOString().slice(0, 16);
}
