/**
 * CF time coordinates: "<unit> since <reference date>" (CF conventions, section 4.4) turned into
 * ISO 8601 UTC strings. Only calendars that agree with JavaScript's proleptic Gregorian Date
 * for modern dates are accepted.
 */
import { NetcdfDecodeError } from "./errors.ts";

const MILLISECONDS_PER_UNIT: Record<string, number> = {
  second: 1000,
  seconds: 1000,
  sec: 1000,
  secs: 1000,
  s: 1000,
  minute: 60_000,
  minutes: 60_000,
  min: 60_000,
  mins: 60_000,
  hour: 3_600_000,
  hours: 3_600_000,
  hr: 3_600_000,
  hrs: 3_600_000,
  h: 3_600_000,
  day: 86_400_000,
  days: 86_400_000,
  d: 86_400_000,
};

const GREGORIAN_CALENDARS = new Set(["standard", "gregorian", "proleptic_gregorian"]);

export interface TimeAxisUnits {
  millisecondsPerUnit: number;
  referenceEpochMs: number;
}

const REFERENCE_DATE =
  /^(\d{1,4})-(\d{1,2})-(\d{1,2})(?:[T\s]+(\d{1,2}):(\d{1,2})(?::(\d{1,2}(?:\.\d*)?))?)?\s*(Z|UTC|GMT|[+-]\d{1,2}(?::?\d{2})?)?$/i;

/** Parses "hours since 2024-05-20 12:00:00" (and the usual variants); throws NetcdfDecodeError("bad-time"). */
export function parseTimeUnits(units: string | undefined, calendar: string | undefined, variable: string): TimeAxisUnits {
  if (calendar !== undefined && !GREGORIAN_CALENDARS.has(calendar.trim().toLowerCase())) {
    throw new NetcdfDecodeError("bad-time", `calendar "${calendar}" is not supported (use standard, gregorian or proleptic_gregorian)`, variable);
  }
  const match = /^\s*([a-z]+)\s+since\s+(.+?)\s*$/i.exec(units ?? "");
  if (!match) throw new NetcdfDecodeError("bad-time", `time units "${units ?? ""}" are not of the form "<unit> since <date>"`, variable);
  const millisecondsPerUnit = MILLISECONDS_PER_UNIT[match[1].toLowerCase()];
  if (millisecondsPerUnit === undefined) {
    throw new NetcdfDecodeError("bad-time", `time unit "${match[1]}" is not one of seconds, minutes, hours or days`, variable);
  }
  const date = REFERENCE_DATE.exec(match[2]);
  if (!date) throw new NetcdfDecodeError("bad-time", `reference date "${match[2]}" cannot be read`, variable);
  const [, year, month, day, hour = "0", minute = "0", second = "0", zone] = date;
  const secondsWhole = Math.floor(Number(second));
  const fractionMs = Math.round((Number(second) - secondsWhole) * 1000);
  const utc = new Date(0);
  utc.setUTCFullYear(Number(year), Number(month) - 1, Number(day));
  utc.setUTCHours(Number(hour), Number(minute), secondsWhole, fractionMs);
  return { millisecondsPerUnit, referenceEpochMs: utc.getTime() - zoneOffsetMs(zone) };
}

function zoneOffsetMs(zone: string | undefined): number {
  if (zone === undefined || /^(z|utc|gmt)$/i.test(zone)) return 0;
  const match = /^([+-])(\d{1,2}):?(\d{2})?$/.exec(zone)!;
  const minutes = Number(match[2]) * 60 + Number(match[3] ?? 0);
  return (match[1] === "-" ? -1 : 1) * minutes * 60_000;
}

/** One time value → ISO 8601 UTC, rounded to the millisecond. */
export function timeValueToIso(value: number, axis: TimeAxisUnits, variable: string): string {
  const ms = Math.round(axis.referenceEpochMs + value * axis.millisecondsPerUnit);
  const date = new Date(ms);
  if (!Number.isFinite(value) || Number.isNaN(date.getTime())) {
    throw new NetcdfDecodeError("bad-time", `time value ${value} is not a valid date`, variable);
  }
  return date.toISOString();
}
