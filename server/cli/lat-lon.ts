import { CliUsageError } from "./command.ts";

/** Parses `--at LAT,LON` (decimal degrees, longitude east positive). */
export function parseLatLon(value: string | true | undefined): { lat: number; lon: number } {
  const m = typeof value === "string" ? /^\s*(-?\d+(?:\.\d+)?)\s*,\s*(-?\d+(?:\.\d+)?)\s*$/.exec(value) : null;
  if (!m) throw new CliUsageError(`--at: expected LAT,LON in decimal degrees (e.g. 35.2,-97.4), got "${String(value)}"`);
  const lat = Number(m[1]);
  const lon = Number(m[2]);
  if (lat < -90 || lat > 90) throw new CliUsageError(`--at: latitude ${lat} is outside -90..90`);
  if (lon < -180 || lon > 360) throw new CliUsageError(`--at: longitude ${lon} is outside -180..360`);
  return { lat, lon };
}
