/**
 * Test helper: reads the data section of an `ncdump` listing (Debian netcdf-bin) into plain
 * numbers, with null where ncdump printed "_" (a value equal to the variable's fill value).
 */
import { readFileSync } from "node:fs";

export function fixturePath(name: string): string {
  return new URL(`../../fixtures/netcdf/${name}`, import.meta.url).pathname;
}

export function readFixture(name: string): Uint8Array {
  return new Uint8Array(readFileSync(fixturePath(name)));
}

export function ncdumpValues(listingName: string): Map<string, Array<number | null>> {
  const text = readFileSync(fixturePath(listingName), "utf8");
  const data = text.slice(text.indexOf("\ndata:") + "\ndata:".length, text.lastIndexOf("}"));
  const values = new Map<string, Array<number | null>>();
  for (const match of data.matchAll(/(\w+)\s*=([^;]*);/g)) {
    const items = match[2].split(",").map((item) => item.trim());
    if (items.some((item) => item.startsWith('"'))) continue;
    values.set(
      match[1],
      items.map((item) => (item === "_" ? null : Number(item))),
    );
  }
  return values;
}
