import { expect } from "vitest";
import type { Grib2Message } from "../../../../server/ingest/grib2/index.ts";
import type { ListedPoint } from "./fixtures.ts";
import { gridPosition } from "./grid-position.ts";

/**
 * Values are returned as float32, so they can differ from ecCodes' double values by float32 rounding: at most
 * one unit in the last place, 2^-23 relative. That is far finer than any packing step in the fixtures.
 */
export const FLOAT32_RELATIVE = 2 ** -23;

/**
 * Checks a decoded field against ecCodes' listing point by point. Each listed latitude/longitude is placed on the
 * canonical grid from the decoded geometry alone, so a wrong scan-order normalisation, corner or spacing shows up
 * as a value mismatch or an off-grid position. Returns the largest position error in grid lengths.
 */
export function expectMatchesListing(
  field: Grib2Message,
  points: ListedPoint[],
  positionTolerance = 1e-6,
  position: (lat: number, lon: number) => { i: number; j: number } = (lat, lon) => gridPosition(field.geometry, lat, lon),
): number {
  const { nx, ny } = field.geometry;
  expect(points.length).toBe(nx * ny);
  const seen = new Uint8Array(nx * ny);
  let worstPosition = 0;
  let mismatches = 0;
  let firstMismatch = "";
  for (const point of points) {
    const { i, j } = position(point.lat, point.lon);
    const ii = Math.round(i);
    const jj = Math.round(j);
    worstPosition = Math.max(worstPosition, Math.abs(i - ii), Math.abs(j - jj));
    expect(ii >= 0 && ii < nx && jj >= 0 && jj < ny, `(${point.lat}, ${point.lon}) falls off the grid at i=${i}, j=${j}`).toBe(true);
    const index = jj * nx + ii;
    seen[index]++;
    const decoded = field.values[index];
    const same = Number.isNaN(point.value)
      ? Number.isNaN(decoded)
      : Math.abs(decoded - point.value) <= Math.abs(point.value) * FLOAT32_RELATIVE + 1e-12;
    if (!same && mismatches++ === 0) firstMismatch = `at (${point.lat}, ${point.lon}) ecCodes ${point.value}, decoded ${decoded}`;
  }
  expect(firstMismatch, `${mismatches} mismatches`).toBe("");
  expect(worstPosition).toBeLessThan(positionTolerance);
  // Every canonical cell was hit exactly once: the mapping is a permutation.
  expect(seen.every((count) => count === 1)).toBe(true);
  expect(field.missingCount).toBe(points.filter((p) => Number.isNaN(p.value)).length);
  return worstPosition;
}
