import { Grib2DecodeError, type Grib2ErrorLocation } from "./errors.ts";

/**
 * Seconds per unit of WMO-No. 306 GRIB2 Code Table 4.4 (indicator of unit of time range). Months, years and
 * longer units have no fixed length in seconds and are refused.
 */
const SECONDS_PER_UNIT: Record<number, number> = {
  0: 60, // minute
  1: 3600, // hour
  2: 86400, // day
  10: 3 * 3600, // 3 hours
  11: 6 * 3600, // 6 hours
  12: 12 * 3600, // 12 hours
  13: 1, // second
};

export function secondsPerTimeUnit(code: number, where: Grib2ErrorLocation): number {
  const seconds = SECONDS_PER_UNIT[code];
  if (seconds === undefined) {
    throw new Grib2DecodeError(where, `unit of time range ${code} (Code Table 4.4) is not supported; use minutes, hours, days or seconds`);
  }
  return seconds;
}
