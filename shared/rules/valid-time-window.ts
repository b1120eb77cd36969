/**
 * Which frames a rule looks at: every frame, a range of forecast hours (lead time after the run's
 * start), or a range of clock hours UTC of the valid time (e.g. the afternoon and evening, 18 to 3 UTC).
 */

export type ValidTimeWindow =
  | { readonly kind: "any-time" }
  /** Lead times from `fromHour` to `toHour` after the run's initial time, both included. */
  | { readonly kind: "forecast-hours"; readonly fromHour: number; readonly toHour: number }
  /** Valid times whose UTC hour is from `fromHour` to `toHour`, both whole hours included; wraps past midnight when fromHour > toHour. */
  | { readonly kind: "clock-hours-utc"; readonly fromHour: number; readonly toHour: number };

const HOUR_MS = 3_600_000;

export function isWithinValidTimeWindow(window: ValidTimeWindow, times: { readonly runTime: string; readonly validTime: string }): boolean {
  const valid = parseIso(times.validTime, "validTime");
  switch (window.kind) {
    case "any-time":
      return true;
    case "forecast-hours": {
      const leadHours = (valid - parseIso(times.runTime, "runTime")) / HOUR_MS;
      return leadHours >= window.fromHour && leadHours <= window.toHour;
    }
    case "clock-hours-utc": {
      const hour = new Date(valid).getUTCHours();
      return window.fromHour <= window.toHour
        ? hour >= window.fromHour && hour <= window.toHour
        : hour >= window.fromHour || hour <= window.toHour;
    }
  }
}

function parseIso(text: string, name: string): number {
  const ms = Date.parse(text);
  if (Number.isNaN(ms)) throw new RangeError(`${name} is not an ISO date: "${text}".`);
  return ms;
}
