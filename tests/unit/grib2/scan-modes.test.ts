import { describe, expect, it } from "vitest";
import { decodeGrib2 } from "../../../server/ingest/grib2/index.ts";
import { readScanMode } from "../../../server/ingest/grib2/scan-mode.ts";
import { toCanonicalOrder } from "../../../server/ingest/grib2/scan-order.ts";
import { expectMatchesListing } from "./helpers/compare.ts";
import { readFixture, readListing } from "./helpers/fixtures.ts";

describe("every scanning mode ecCodes writes lands in the canonical layout", () => {
  // [fixture, scanning mode octet]; the grid is 250E..272E by 2 degrees, 34N..50N by 2 degrees.
  const CASES: [string, string][] = [
    ["simple-16bit.grib2", "00"],
    ["scan-40.grib2", "40"],
    ["scan-80.grib2", "80"],
    ["scan-c0.grib2", "c0"],
    ["scan-20.grib2", "20"],
    ["scan-60.grib2", "60"],
    ["scan-a0.grib2", "a0"],
    ["scan-e0.grib2", "e0"],
  ];

  it.each(CASES)("%s (scanning mode 0x%s)", (name, mode) => {
    const [field] = decodeGrib2(readFixture(name));
    expect(field.scanningMode).toBe(parseInt(mode, 16));
    const geometry = field.geometry;
    if (geometry.kind !== "latlon") throw new Error("expected a lat-lon grid");
    // Source: ecCodes 2.28 grib_get_data; the south-west point of every listing is 34N 250E, spacing 2 degrees
    expect([geometry.lat0, geometry.lon0, geometry.dlat, geometry.dlon]).toEqual([34, 250, 2, 2]);
    expect([geometry.nx, geometry.ny]).toEqual([12, 9]);
    expectMatchesListing(field, readListing(name)[0]);
  });
});

describe("toCanonicalOrder, from the definitions of WMO-No. 306 Flag Table 3.4", () => {
  // Storage holds 0..5 for a 3 x 2 grid; canonical rows are south first, west to east.
  const storage = Float32Array.from([0, 1, 2, 3, 4, 5]);
  const reorder = (hex: string) => Array.from(toCanonicalOrder(storage, 3, 2, readScanMode(parseInt(hex, 16), {})));

  it.each([
    // Derived by hand from the flag definitions.
    ["40", [0, 1, 2, 3, 4, 5]], // +i, +j: already canonical
    ["00", [3, 4, 5, 0, 1, 2]], // first stored row is the northern one
    ["80", [5, 4, 3, 2, 1, 0]], // rows run east to west, north row first
    ["c0", [2, 1, 0, 5, 4, 3]], // rows run east to west, south row first
    ["60", [0, 2, 4, 1, 3, 5]], // columns stored south to north
    ["20", [1, 3, 5, 0, 2, 4]], // columns stored north to south
    ["50", [0, 1, 2, 5, 4, 3]], // alternate rows: the second stored row runs east to west
    ["10", [5, 4, 3, 0, 1, 2]], // alternate rows, north row first
    ["d0", [2, 1, 0, 3, 4, 5]], // alternate rows starting east to west
    ["70", [0, 3, 4, 1, 2, 5]], // alternate columns: the second stored column runs north to south
    ["e0", [4, 2, 0, 5, 3, 1]], // columns stored south to north, the first one in the east
    ["a0", [5, 3, 1, 4, 2, 0]], // columns stored north to south, the first one in the east
  ])("scanning mode 0x%s", (flags, expected) => {
    expect(reorder(flags)).toEqual(expected);
  });

  it("returns the same array when no reordering is needed", () => {
    expect(toCanonicalOrder(storage, 3, 2, readScanMode(0x40, {}))).toBe(storage);
  });

  it("refuses the staggered-row bits 5-8", () => {
    expect(() => readScanMode(0x48, { messageNumber: 1, section: 3, byteOffset: 80 })).toThrowError(/message 1, section 3, at byte 80: .*staggered/);
  });
});
