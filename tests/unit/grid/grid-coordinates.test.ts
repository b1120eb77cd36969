import { describe, expect, it } from "vitest";
import type { LambertGeometry, LatLonGeometry, PolarStereographicGeometry } from "../../../shared/grid/geometry-types.ts";
import { boundingBox, geometryKey, gridCoordinates, nearestGridPoint } from "../../../shared/grid/grid-coordinates.ts";
import { projectionForGeometry } from "../../../shared/grid/projection.ts";

const RADIUS = 6_371_229;

const globalHalfDegree: LatLonGeometry = {
  kind: "latlon",
  nx: 720,
  ny: 361,
  earthRadius: RADIUS,
  uvRelativeToGrid: false,
  lat0: -90,
  lon0: 0,
  dlat: 0.5,
  dlon: 0.5,
};

const regional: LatLonGeometry = { ...globalHalfDegree, nx: 41, ny: 21, lat0: 30, lon0: 170, dlat: 0.25, dlon: 0.5 };

const conus: LambertGeometry = {
  kind: "lambert",
  nx: 90,
  ny: 60,
  earthRadius: RADIUS,
  uvRelativeToGrid: true,
  lat0: 21,
  lon0: -121,
  dx: 50_000,
  dy: 50_000,
  lonV: -96,
  latin1: 35,
  latin2: 45,
};

const arctic: PolarStereographicGeometry = {
  kind: "polar",
  nx: 101,
  ny: 101,
  earthRadius: RADIUS,
  uvRelativeToGrid: true,
  lat0: 40,
  lon0: -150,
  dx: 100_000,
  dy: 100_000,
  lonV: -105,
  latTrue: 60,
  southPole: false,
};

describe("gridCoordinates", () => {
  it("places (0, 0) at the south-west corner and steps east then north", () => {
    const { lat, lon } = gridCoordinates(regional);
    // Derived in closed form: lat = lat0 + j dlat, lon = lon0 + i dlon wrapped to (−180, 180].
    expect(lat[0]).toBeCloseTo(30, 5);
    expect(lon[0]).toBeCloseTo(170, 5);
    expect(lon[1]).toBeCloseTo(170.5, 5);
    expect(lon[20]).toBeCloseTo(180, 5); // i = 20 lands on the antimeridian
    expect(lon[21]).toBeCloseTo(-179.5, 5);
    expect(lat[41]).toBeCloseTo(30.25, 5);
  });

  it("returns the cached arrays for an equal geometry", () => {
    const first = gridCoordinates(conus);
    const second = gridCoordinates({ ...conus });
    // Common practice (no source): equal keys share one computation.
    expect(second.lat).toBe(first.lat);
  });

  it("Lambert first point is the geometry's lat0/lon0", () => {
    const { lat, lon } = gridCoordinates(conus);
    // Derived in closed form: index 0 is (i, j) = (0, 0).
    expect(lat[0]).toBeCloseTo(21, 4);
    expect(lon[0]).toBeCloseTo(-121, 4);
  });
});

describe("geometryKey", () => {
  it("differs between grids and ignores the wind flag", () => {
    // Common practice (no source): a cache key changes with position but not with how winds are read.
    expect(geometryKey(conus)).not.toBe(geometryKey({ ...conus, dx: 25_000 }));
    expect(geometryKey(conus)).toBe(geometryKey({ ...conus, uvRelativeToGrid: false }));
  });
});

describe("nearestGridPoint", () => {
  it("rounds the inverse projection on a Lambert grid", () => {
    const projection = projectionForGeometry(conus);
    const at = projection.gridToLatLon(37.3, 12.6, { lat: 0, lon: 0 });
    // Derived in closed form: (37.3, 12.6) rounds to (37, 13).
    expect(nearestGridPoint(conus, at.lat, at.lon)).toEqual({ i: 37, j: 13, index: 13 * 90 + 37 });
  });

  it("returns null outside the grid", () => {
    // Derived in closed form: 0° N 0° E is far from a North American grid.
    expect(nearestGridPoint(conus, 0, 0)).toBeNull();
    expect(nearestGridPoint(regional, 29, 175)).toBeNull();
  });

  it("wraps longitude on a global grid", () => {
    // Derived in closed form: −0.2° is nearest to column 0 (0°), 359.8° likewise; 359.7° → column 719 (359.5°).
    expect(nearestGridPoint(globalHalfDegree, 10, -0.2)).toEqual({ i: 0, j: 200, index: 200 * 720 });
    expect(nearestGridPoint(globalHalfDegree, 10, 359.8)?.i).toBe(0);
    expect(nearestGridPoint(globalHalfDegree, 10, -0.3)?.i).toBe(719);
    expect(nearestGridPoint(globalHalfDegree, -90, 45)?.index).toBe(90);
  });

  it("accepts longitudes east of the antimeridian on a regional grid that crosses it", () => {
    // Derived in closed form: −179.5° is 9.5° east of 170°, i.e. i = 21.
    expect(nearestGridPoint(regional, 31, -179.5)).toEqual({ i: 21, j: 4, index: 4 * 41 + 21 });
  });
});

describe("boundingBox", () => {
  it("regional grid across the antimeridian: west > east", () => {
    // Derived in closed form: 170° to 190° (= −170°), 30° to 35° N.
    expect(boundingBox(regional)).toEqual({ south: 30, north: 35, west: 170, east: -170 });
  });

  it("global grid spans every longitude", () => {
    // Derived in closed form: −90° to 90°, whole circle.
    expect(boundingBox(globalHalfDegree)).toEqual({ south: -90, north: 90, west: -180, east: 180 });
  });

  it("a polar grid holding the pole reaches 90° N and every longitude", () => {
    const box = boundingBox(arctic);
    // Derived in closed form: the pole lies inside this 10 000 km square.
    expect(box.north).toBe(90);
    expect(box.west).toBe(-180);
    expect(box.east).toBe(180);
    expect(box.south).toBeLessThan(41);
  });

  it("Lambert grid box holds all its points", () => {
    const box = boundingBox(conus);
    const { lat, lon } = gridCoordinates(conus);
    // Derived in closed form: every point lies inside the box returned.
    for (let k = 0; k < lat.length; k++) {
      expect(lat[k]).toBeGreaterThanOrEqual(box.south);
      expect(lat[k]).toBeLessThanOrEqual(box.north);
      expect(lon[k]).toBeGreaterThanOrEqual(box.west);
      expect(lon[k]).toBeLessThanOrEqual(box.east);
    }
  });
});
