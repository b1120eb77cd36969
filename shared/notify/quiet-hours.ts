/**
 * Quiet hours: a daily local-time window ("22:00" to "06:30" in a contact's IANA time zone) during
 * which low-severity messages wait for a digest. Works on wall-clock minutes in the contact's zone,
 * so a window keeps its local meaning across daylight-saving changes.
 */

export interface QuietHours {
  /** "HH:MM", local time in `timeZone`. */
  start: string;
  /** "HH:MM"; earlier than `start` means the window runs past midnight. */
  end: string;
  timeZone: string;
}

const MINUTES_PER_DAY = 24 * 60;

export function minutesOfClock(hhmm: string): number {
  const match = /^([01]\d|2[0-3]):([0-5]\d)$/.exec(hhmm);
  if (!match) throw new RangeError(`"${hhmm}" is not a time of day as HH:MM (00:00 to 23:59)`);
  return Number(match[1]) * 60 + Number(match[2]);
}

/** True when `timeZone` is an IANA zone name this runtime knows. */
export function isKnownTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat("en-US", { timeZone });
    return true;
  } catch {
    return false;
  }
}

interface WallClock {
  year: number;
  month: number;
  day: number;
  minutes: number;
}

const formatters = new Map<string, Intl.DateTimeFormat>();

/** The local calendar date and minute of the day of an instant in a time zone. */
function wallClock(at: Date, timeZone: string): WallClock {
  let format = formatters.get(timeZone);
  if (!format) {
    format = new Intl.DateTimeFormat("en-US", { timeZone, hourCycle: "h23", year: "numeric", month: "numeric", day: "numeric", hour: "numeric", minute: "numeric" });
    formatters.set(timeZone, format);
  }
  const parts = format.formatToParts(at);
  const get = (type: Intl.DateTimeFormatPartTypes) => Number(parts.find((p) => p.type === type)?.value ?? "0");
  return { year: get("year"), month: get("month"), day: get("day"), minutes: get("hour") * 60 + get("minute") };
}

/** Zone offset from UTC in minutes at an instant (local = UTC + offset). */
function offsetMinutes(at: Date, timeZone: string): number {
  const w = wallClock(at, timeZone);
  const asUtc = Date.UTC(w.year, w.month - 1, w.day, 0, w.minutes);
  return Math.round((asUtc - Math.floor(at.getTime() / 60_000) * 60_000) / 60_000);
}

/**
 * The instant a local wall-clock time happens in a zone. Two passes settle the offset; a local time
 * skipped by a spring-forward change comes out one hour later, which is what a person would expect.
 */
export function zonedTimeToUtc(year: number, month: number, day: number, minutes: number, timeZone: string): Date {
  const guess = Date.UTC(year, month - 1, day, 0, minutes);
  let instant = guess - offsetMinutes(new Date(guess), timeZone) * 60_000;
  instant = guess - offsetMinutes(new Date(instant), timeZone) * 60_000;
  return new Date(instant);
}

/** Whether `at` falls inside the quiet window (start inclusive, end exclusive). */
export function isInQuietHours(quiet: QuietHours, at: Date): boolean {
  const start = minutesOfClock(quiet.start);
  const end = minutesOfClock(quiet.end);
  if (start === end) return false;
  const now = wallClock(at, quiet.timeZone).minutes;
  return start < end ? now >= start && now < end : now >= start || now < end;
}

/** When the quiet window holding `at` ends, or null when `at` is not in quiet hours. */
export function quietHoursEnd(quiet: QuietHours, at: Date): Date | null {
  if (!isInQuietHours(quiet, at)) return null;
  const end = minutesOfClock(quiet.end);
  const local = wallClock(at, quiet.timeZone);
  // The end is today if it is still ahead on the local clock, otherwise tomorrow.
  const dayShift = local.minutes < end ? 0 : 1;
  const base = new Date(Date.UTC(local.year, local.month - 1, local.day + dayShift));
  const endsAt = zonedTimeToUtc(base.getUTCFullYear(), base.getUTCMonth() + 1, base.getUTCDate(), end, quiet.timeZone);
  // Guard against a window that a clock change made empty: never hold past a day.
  return endsAt.getTime() > at.getTime() ? endsAt : new Date(at.getTime() + MINUTES_PER_DAY * 60_000);
}
