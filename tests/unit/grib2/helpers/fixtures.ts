import { readFileSync } from "node:fs";

const FIXTURE_DIR = new URL("../../../fixtures/grib2/", import.meta.url);

export function readFixture(name: string): Uint8Array {
  return new Uint8Array(readFileSync(new URL(name, FIXTURE_DIR)));
}

/** One point of an ecCodes grib_get_data listing: latitude, longitude and value (NaN = missing). */
export interface ListedPoint {
  lat: number;
  lon: number;
  value: number;
}

/** ecCodes' decoding of a fixture, one array of points per field, in the order ecCodes stores them. */
export function readListing(name: string): ListedPoint[][] {
  const fields: ListedPoint[][] = [];
  for (const line of readFileSync(new URL(`${name}.values.txt`, FIXTURE_DIR), "utf8").split("\n")) {
    if (line.startsWith("Latitude")) {
      fields.push([]);
      continue;
    }
    const parts = line.trim().split(/\s+/);
    if (parts.length !== 3) continue;
    const [lat, lon, value] = parts.map(Number);
    fields[fields.length - 1].push({ lat, lon, value });
  }
  return fields;
}

/** Rows of eccodes-keys.txt (ecCodes grib_get of metadata keys) for one fixture, one per field. */
export function readEccodesKeys(name: string): Record<string, string>[] {
  const lines = readFileSync(new URL("eccodes-keys.txt", FIXTURE_DIR), "utf8").trim().split("\n");
  const header = lines[0].split(/\s+/);
  return lines
    .slice(1)
    .map((line) => line.trim().split(/\s+/))
    .filter((cells) => cells[0] === name)
    .map((cells) => Object.fromEntries(header.map((key, k) => [key, cells[k]])));
}

/** Original values of a fixture written by the test folder's own encoder (null = missing). */
export function readOriginal(name: string): { values: (number | null)[]; options: { decimalScale: number } } {
  return JSON.parse(readFileSync(new URL(`${name}.original.json`, FIXTURE_DIR), "utf8"));
}

/** "20070323" + "1200" from ecCodes keys as an ISO time. */
export function isoFromEccodes(date: string, time: string): string {
  const hhmm = time.padStart(4, "0");
  return `${date.slice(0, 4)}-${date.slice(4, 6)}-${date.slice(6, 8)}T${hhmm.slice(0, 2)}:${hhmm.slice(2, 4)}:00Z`;
}
