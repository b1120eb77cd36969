import { describe, expect, it } from "vitest";
import type { GridGeometry } from "../../../../shared/grid/geometry-types.ts";
import { projectionForGeometry } from "../../../../shared/grid/projection.ts";
import { cellAspect, fitGridToBox } from "../../../../src/components/map/grid-canvas-transform.ts";
import { ageostrophicArrows, firstSample, thinningStride } from "../../../../src/features/grids/jet-layers/ageostrophic-arrows.ts";

/** A 12-km Lambert grid tangent at 38.5° N over the plains (the shape of the demo domain). */
const lambert: GridGeometry = {
  kind: "lambert",
  nx: 100,
  ny: 84,
  earthRadius: 6371229,
  uvRelativeToGrid: false,
  lat0: 31.358509,
  lon0: 255.786777,
  dx: 12000,
  dy: 12000,
  lonV: 262,
  latin1: 38.5,
  latin2: 38.5,
};

const uniform = (geometry: GridGeometry, value: number) => new Float32Array(geometry.nx * geometry.ny).fill(value);
const mapOf = (geometry: GridGeometry, width: number) => fitGridToBox(geometry.nx, geometry.ny, cellAspect(geometry), width, 10_000);

/**
 * Direction on screen of a short step east (or north) from the point: both ends are put through the
 * grid's own projection and then onto the canvas, so nothing here uses the wind-rotation formula.
 */
function stepDirection(geometry: GridGeometry, cell: { w: number; h: number }, lat: number, lon: number, east: number, north: number) {
  const projection = projectionForGeometry(geometry);
  const a = projection.latLonToGrid(lat, lon, { i: 0, j: 0 });
  const b = projection.latLonToGrid(lat + north * 1e-3, lon + (east * 1e-3) / Math.cos((lat * Math.PI) / 180), { i: 0, j: 0 });
  const x = (b.i - a.i) * cell.w;
  const y = -(b.j - a.j) * cell.h;
  const length = Math.hypot(x, y);
  return { x: x / length, y: y / length };
}

describe("ageostrophic arrows: thinning", () => {
  it("keeps about one arrow per spacing on screen, centred on the grid", () => {
    // Derived in closed form: 34 px over 10-px cells rounds to every 3rd cell.
    expect(thinningStride(10, 34)).toBe(3);
    expect(thinningStride(60, 34)).toBe(1);
    // Derived in closed form: 100 points at stride 3 leave 0 spare cells, 84 points leave 2 (one each side).
    expect(firstSample(100, 3)).toBe(0);
    expect(firstSample(84, 3)).toBe(1);
  });

  it("samples every third cell of a 100 × 84 grid drawn 1000 px wide, and leaves out points without a value", () => {
    const map = mapOf(lambert, 1000);
    const u = uniform(lambert, 10);
    const v = uniform(lambert, 0);
    const all = ageostrophicArrows(u, v, lambert, map);
    // Derived in closed form: i = 0, 3, …, 99 (34 columns) × j = 1, 4, …, 82 (28 rows).
    expect(all.count).toBe(34 * 28);
    expect([all.strideI, all.strideJ]).toEqual([3, 3]);
    // Neighbours along a row are three cells, 30 px, apart.
    expect(all.x[1]! - all.x[0]!).toBeCloseTo(30, 4);
    u[1 * lambert.nx + 3] = Number.NaN; // a sampled point (i 3, j 1)
    u[2 * lambert.nx + 3] = Number.NaN; // a point between samples
    expect(ageostrophicArrows(u, v, lambert, map).count).toBe(34 * 28 - 1);
  });

  it("refuses components that do not fit the grid", () => {
    expect(() => ageostrophicArrows(new Float32Array(5), new Float32Array(5), lambert, mapOf(lambert, 1000))).toThrow(/5 and 5 values for a 100 × 84 grid/);
  });
});

describe("ageostrophic arrows: from east/north to the map", () => {
  it("turns an east wind along the parallels of a Lambert grid", () => {
    const map = mapOf(lambert, 1000);
    const samples = ageostrophicArrows(uniform(lambert, 12), uniform(lambert, 0), lambert, map);
    const projection = projectionForGeometry(lambert);
    const where = { lat: 0, lon: 0 };
    const n = Math.sin((38.5 * Math.PI) / 180);
    for (let k = 0; k < samples.count; k += 37) {
      const i = samples.x[k]! / map.cellWidth - 0.5;
      const j = lambert.ny - 0.5 - samples.y[k]! / map.cellHeight;
      projection.gridToLatLon(i, j, where);
      // Derived: the parallel's own direction on the map, by finite difference of the projection.
      const expected = stepDirection(lambert, { w: map.cellWidth, h: map.cellHeight }, where.lat, where.lon, 1, 0);
      expect(samples.dirX[k]).toBeCloseTo(expected.x, 4);
      expect(samples.dirY[k]).toBeCloseTo(expected.y, 4);
      // Source: Snyder (1987), eqs. 14-4 and 15-3: east is turned up from the grid's x axis by θ = n (λ − λ0), n = sin φ1 for a tangent cone.
      const theta = n * (((where.lon - lambert.lonV + 540) % 360) - 180) * (Math.PI / 180);
      expect(Math.atan2(-samples.dirY[k]!, samples.dirX[k]!)).toBeCloseTo(theta, 4);
      expect(samples.speed[k]).toBeCloseTo(12, 5);
    }
  });

  it("turns a north wind along the meridians, toward the cone's apex", () => {
    const map = mapOf(lambert, 1000);
    const samples = ageostrophicArrows(uniform(lambert, 0), uniform(lambert, 7), lambert, map);
    const projection = projectionForGeometry(lambert);
    const where = { lat: 0, lon: 0 };
    for (let k = 5; k < samples.count; k += 53) {
      projection.gridToLatLon(samples.x[k]! / map.cellWidth - 0.5, lambert.ny - 0.5 - samples.y[k]! / map.cellHeight, where);
      // Derived: the meridian's direction on the map, by finite difference of the projection.
      const expected = stepDirection(lambert, { w: map.cellWidth, h: map.cellHeight }, where.lat, where.lon, 0, 1);
      expect(samples.dirX[k]).toBeCloseTo(expected.x, 4);
      expect(samples.dirY[k]).toBeCloseTo(expected.y, 4);
    }
  });

  it("keeps a north-east wind at 45° where a latitude–longitude map is drawn true to scale", () => {
    // 61 rows from 50° N to 65° N: the map's aspect is exact on the middle row, 57.5° N.
    const latlon: GridGeometry = { kind: "latlon", nx: 41, ny: 61, earthRadius: 6371229, uvRelativeToGrid: false, lat0: 50, lon0: -20, dlat: 0.25, dlon: 0.25 };
    const map = mapOf(latlon, 820);
    const samples = ageostrophicArrows(uniform(latlon, 10), uniform(latlon, 10), latlon, map, 1);
    const middle = 30 * latlon.nx + 20;
    // Derived in closed form: at the middle latitude a degree of longitude is drawn cos φ times a degree of
    // latitude, so equal east and north distances are equal on screen and the arrow points up-right at 45°.
    expect(Math.atan2(-samples.dirY[middle]!, samples.dirX[middle]!)).toBeCloseTo(Math.PI / 4, 6);
    // Farther north the map draws a degree of longitude wider than it really is, so the same wind points
    // flatter there, exactly as a step along it does.
    const north = 60 * latlon.nx + 20;
    const expected = stepDirection(latlon, { w: map.cellWidth, h: map.cellHeight }, 65, -15, Math.SQRT1_2, Math.SQRT1_2);
    expect(samples.dirX[north]).toBeCloseTo(expected.x, 4);
    expect(samples.dirY[north]).toBeCloseTo(expected.y, 4);
    expect(Math.atan2(-samples.dirY[north]!, samples.dirX[north]!)).toBeLessThan(Math.PI / 4);
  });
});
