import { describe, expect, it } from "vitest";
import proj4 from "proj4";
import type { LambertGeometry, LatLonGeometry, PolarStereographicGeometry } from "../../shared/grid/geometry-types.ts";
import { lambertPlane, planeForward, planeInverse } from "../../shared/grid/conformal-plane.ts";
import { projectionForGeometry } from "../../shared/grid/projection.ts";
import {
  coriolisArray,
  coriolisParameter,
  gridSpacingArrays,
  mapFactorArray,
  mapFactorAtLatitude,
} from "../../shared/grid/map-factor.ts";
import {
  coneConstant,
  rotateEarthToGrid,
  rotateGridToEarth,
  rotationAngle,
  rotationAngleArray,
} from "../../shared/grid/wind-rotation.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";

const RADIUS = 6_371_229;
const DEG = Math.PI / 180;

function lambert(latin1: number, latin2: number, extra: Partial<LambertGeometry> = {}): LambertGeometry {
  return {
    kind: "lambert",
    nx: 60,
    ny: 40,
    earthRadius: RADIUS,
    uvRelativeToGrid: true,
    lat0: 24,
    lon0: -118,
    dx: 40_000,
    dy: 40_000,
    lonV: -97,
    latin1,
    latin2,
    ...extra,
  };
}

function polar(extra: Partial<PolarStereographicGeometry> = {}): PolarStereographicGeometry {
  return {
    kind: "polar",
    nx: 50,
    ny: 50,
    earthRadius: RADIUS,
    uvRelativeToGrid: true,
    lat0: 30,
    lon0: -140,
    dx: 60_000,
    dy: 60_000,
    lonV: -105,
    latTrue: 60,
    southPole: false,
    ...extra,
  };
}

const sphereLonLat = `+proj=longlat +R=${RADIUS} +no_defs`;

describe("Lambert conformal map factor", () => {
  // Source: Snyder (1987), eq. 15-4; values computed independently (Python) by the team's science reference scripts, 6 d.p.
  const tangent385: Array<[number, number]> = [
    [20, 1.05033],
    [33, 1.004513],
    [38.5, 1.0],
    [50, 1.021762],
    [60, 1.085536],
  ];
  it.each(tangent385)("tangent 38.5°: m(%s°) = %s", (lat, expected) => {
    expect(mapFactorAtLatitude(lambert(38.5, 38.5), lat)).toBeCloseTo(expected, 6);
  });

  it("tangent 25°: m(45°) = 1.068505", () => {
    // Source: Snyder (1987), eq. 15-4; computed independently by the team's science reference scripts, 6 d.p.
    expect(mapFactorAtLatitude(lambert(25, 25), 45)).toBeCloseTo(1.068505, 6);
  });

  it("secant 33°/45°: n = 0.630478, m = 1 on both standard parallels, 0.994569 between them", () => {
    const geometry = lambert(33, 45);
    // Source: Snyder (1987), eq. 15-3; computed independently by the team's science reference scripts.
    expect(coneConstant(geometry)).toBeCloseTo(0.630478, 6);
    // Derived in closed form: a secant cone is true to scale on both standard parallels.
    expect(mapFactorAtLatitude(geometry, 33)).toBeCloseTo(1, 12);
    expect(mapFactorAtLatitude(geometry, 45)).toBeCloseTo(1, 12);
    // Source: Snyder (1987), eq. 15-4; computed independently by the team's science reference scripts.
    expect(mapFactorAtLatitude(geometry, 38.5)).toBeCloseTo(0.994569, 6);
  });

  it("tangent cone constant is sin φ1", () => {
    // Derived in closed form: Snyder (1987) gives n = sin φ1 when φ1 = φ2; sin 38.5° = 0.622515.
    expect(coneConstant(lambert(38.5, 38.5))).toBeCloseTo(0.622515, 6);
  });

  it("m matches the ratio of plane length to great-circle length over a short step", () => {
    // Derived in closed form: the map factor is the local ratio of map to ground distance; a 0.01° meridian step checks it.
    const geometry = lambert(30, 60);
    const projection = projectionForGeometry(geometry);
    for (const lat of [25, 40, 55]) {
      const a = projection.latLonToGrid(lat, -90, { i: 0, j: 0 });
      const b = projection.latLonToGrid(lat + 0.01, -90, { i: 0, j: 0 });
      const planeLength = Math.hypot(b.i - a.i, b.j - a.j) * geometry.dx;
      const groundLength = RADIUS * 0.01 * DEG;
      expect(planeLength / groundLength).toBeCloseTo(mapFactorAtLatitude(geometry, lat + 0.005), 5);
    }
  });
});

describe("Snyder (1987) worked example, Lambert conformal conic on the sphere", () => {
  it("R = 1, φ1 = 33°, φ2 = 45°, origin 23° N 96° W; point 35° N 75° W → x = 0.2966785, y = 0.2462112", () => {
    const plane = lambertPlane(33, 45, -96, 1);
    const origin = planeForward(plane, 23, -96, { x: 0, y: 0 });
    const point = planeForward(plane, 35, -75, { x: 0, y: 0 });
    // From memory: Snyder (1987), numerical example for the spherical Lambert conformal conic (n = 0.6304777, ρ0 = 1.5071429).
    expect(plane.n).toBeCloseTo(0.6304777, 7);
    expect(-origin.y).toBeCloseTo(1.5071429, 7);
    expect(point.x - origin.x).toBeCloseTo(0.2966785, 7);
    expect(point.y - origin.y).toBeCloseTo(0.2462112, 7);
    const back = planeInverse(plane, point.x, point.y, { lat: 0, lon: 0 });
    expect(back.lat).toBeCloseTo(35, 10);
    expect(back.lon).toBeCloseTo(-75, 10);
  });
});

describe("projection against proj4 (outside reference)", () => {
  // Points spread over each grid, including its corners.
  const samples: Array<[number, number]> = [
    [0, 0],
    [59, 0],
    [0, 39],
    [59, 39],
    [17.5, 23.25],
    [42, 7],
  ];

  const lambertCases: Array<[string, LambertGeometry, string]> = [
    ["tangent 38.5°", lambert(38.5, 38.5), "+proj=lcc +lat_1=38.5 +lat_2=38.5 +lat_0=38.5 +lon_0=-97"],
    ["secant 30°/60°", lambert(30, 60), "+proj=lcc +lat_1=30 +lat_2=60 +lat_0=45 +lon_0=-97"],
    [
      "southern secant −20°/−40°",
      lambert(-20, -40, { lat0: -48, lon0: 115, lonV: 135 }),
      "+proj=lcc +lat_1=-20 +lat_2=-40 +lat_0=-30 +lon_0=135",
    ],
  ];
  const polarCases: Array<[string, PolarStereographicGeometry, string]> = [
    ["north, true at 60°", polar(), "+proj=stere +lat_0=90 +lat_ts=60 +lon_0=-105"],
    [
      "south, true at −71°",
      polar({ lat0: -55, lon0: -135, lonV: 0, latTrue: -71, southPole: true, dx: 80_000, dy: 80_000 }),
      "+proj=stere +lat_0=-90 +lat_ts=-71 +lon_0=0",
    ],
  ];

  it.each([...lambertCases, ...polarCases])("%s: grid → lat/lon → proj4 plane offsets equal (i dx, j dy)", (_, geometry, definition) => {
    const target = `${definition} +R=${RADIUS} +units=m +no_defs`;
    const projection = projectionForGeometry(geometry);
    const [x0, y0] = proj4(sphereLonLat, target, [geometry.lon0, geometry.lat0]);
    for (const [i, j] of samples) {
      if (i >= geometry.nx || j >= geometry.ny) continue;
      const geo = projection.gridToLatLon(i, j, { lat: 0, lon: 0 });
      const [x, y] = proj4(sphereLonLat, target, [geo.lon, geo.lat]);
      // Source: proj4 library (2.22.0); 1 mm on grids thousands of km wide.
      expect(x - x0).toBeCloseTo(i * geometry.dx, 3);
      expect(y - y0).toBeCloseTo(j * geometry.dy, 3);
    }
  });

  it.each([...lambertCases, ...polarCases])("%s: proj4 plane → lat/lon → grid indices round trip", (_, geometry, definition) => {
    const target = `${definition} +R=${RADIUS} +units=m +no_defs`;
    const projection = projectionForGeometry(geometry);
    const [x0, y0] = proj4(sphereLonLat, target, [geometry.lon0, geometry.lat0]);
    for (const [i, j] of samples) {
      const [lon, lat] = proj4(target, sphereLonLat, [x0 + i * geometry.dx, y0 + j * geometry.dy]);
      const ij = projection.latLonToGrid(lat, lon, { i: 0, j: 0 });
      // Source: proj4 library (2.22.0) inverse; 1e-6 of a grid length.
      expect(ij.i).toBeCloseTo(i, 6);
      expect(ij.j).toBeCloseTo(j, 6);
    }
  });
});

describe("polar stereographic map factor", () => {
  it("is 1 at the true-scale latitude and (1 + sin φc)/2 at the pole", () => {
    const north = polar();
    // Derived in closed form: k = 2 k0 / (1 + sin φ) with k0 = (1 + sin 60°)/2 gives 1 at 60° and k0 = 0.933013 at 90°.
    expect(mapFactorAtLatitude(north, 60)).toBeCloseTo(1, 12);
    expect(mapFactorAtLatitude(north, 90)).toBeCloseTo((1 + Math.sin(60 * DEG)) / 2, 12);
    expect(mapFactorAtLatitude(north, 90)).toBeCloseTo(0.933013, 6);
    const south = polar({ latTrue: -71, southPole: true, lonV: 0, lat0: -55 });
    // Derived in closed form: the southern aspect mirrors the northern one.
    expect(mapFactorAtLatitude(south, -71)).toBeCloseTo(1, 12);
    expect(mapFactorAtLatitude(south, -40)).toBeCloseTo(mapFactorAtLatitude(polar({ latTrue: 71 }), 40), 12);
  });

  it("matches the plane-to-ground length ratio over a short step", () => {
    // Derived in closed form: the map factor is the local ratio of map to ground distance.
    const geometry = polar();
    const projection = projectionForGeometry(geometry);
    const a = projection.latLonToGrid(45, -120, { i: 0, j: 0 });
    const b = projection.latLonToGrid(45.01, -120, { i: 0, j: 0 });
    const ratio = (Math.hypot(b.i - a.i, b.j - a.j) * geometry.dx) / (RADIUS * 0.01 * DEG);
    expect(ratio).toBeCloseTo(mapFactorAtLatitude(geometry, 45.005), 5);
  });
});

describe("wind rotation", () => {
  it("n = 0.622515, λ − λ0 = +20° → θ = 12.4503°; a 10 m/s westerly is (9.7648, 2.1559) grid-relative", () => {
    const geometry = lambert(38.5, 38.5);
    const theta = rotationAngle(geometry, geometry.lonV + 20);
    // Source: θ = n (λ − λ0), Snyder (1987) eq. 14-4; value computed independently by the team's science reference scripts.
    expect(theta / DEG).toBeCloseTo(12.4503, 4);
    const u = Float32Array.of(10);
    const v = Float32Array.of(0);
    rotateEarthToGrid(u, v, Float32Array.of(theta));
    // Source: u_g = u_e cos θ − v_e sin θ, v_g = u_e sin θ + v_e cos θ; values computed independently by the team's science reference scripts.
    expect(u[0]).toBeCloseTo(9.7648, 4);
    expect(v[0]).toBeCloseTo(2.1559, 4);
    rotateGridToEarth(u, v, Float32Array.of(theta));
    // Derived in closed form: the two rotations are inverses.
    expect(u[0]).toBeCloseTo(10, 5);
    expect(v[0]).toBeCloseTo(0, 5);
  });

  it("λ − λ0 is wrapped across the antimeridian", () => {
    const geometry = lambert(38.5, 38.5, { lonV: 170 });
    // Derived in closed form: 190° − 170° and −170° − 170° are both +20° after wrapping to (−180°, 180°].
    expect(rotationAngle(geometry, -170)).toBeCloseTo(0.622515 * 20 * DEG, 6);
  });

  it.each([
    ["Lambert secant 30°/60°", lambert(30, 60)],
    ["Lambert southern", lambert(-20, -40, { lat0: -48, lon0: 115, lonV: 135 })],
    ["north polar stereographic", polar()],
    ["south polar stereographic", polar({ lat0: -55, lon0: -135, lonV: 0, latTrue: -71, southPole: true, dx: 80_000, dy: 80_000 })],
  ])("%s: θ equals the angle of the projected meridian from the grid's j axis", (_, geometry) => {
    // Derived in closed form: project a short northward step and measure its direction on the grid.
    const projection = projectionForGeometry(geometry);
    const theta = rotationAngleArray(geometry);
    const { lat, lon } = gridCoordinates(geometry);
    for (const k of [0, geometry.nx - 1, geometry.nx * geometry.ny - 1, (geometry.ny >> 1) * geometry.nx + 3]) {
      const a = projection.latLonToGrid(lat[k], lon[k], { i: 0, j: 0 });
      const b = projection.latLonToGrid(lat[k] + 0.001, lon[k], { i: 0, j: 0 });
      // A northward (earth) vector (0, 1) appears on the grid as (−sin θ, cos θ).
      const measured = Math.atan2(-(b.i - a.i), b.j - a.j);
      expect(measured).toBeCloseTo(theta[k], 4);
    }
  });

  it("a latitude–longitude grid needs no rotation", () => {
    const geometry: LatLonGeometry = { kind: "latlon", nx: 4, ny: 3, earthRadius: RADIUS, uvRelativeToGrid: false, lat0: 0, lon0: 0, dlat: 1, dlon: 1 };
    // Derived in closed form: grid axes are east and north.
    expect(Array.from(rotationAngleArray(geometry))).toEqual(new Array(12).fill(0));
  });
});

describe("Coriolis parameter f = 2Ω sin φ", () => {
  it.each([
    [30, 7.2921e-5],
    [45, 1.03126e-4],
    [60, 1.26303e-4],
  ])("f(%s°) = %s s⁻¹", (lat, expected) => {
    // Derived in closed form: 2 × 7.292115e-5 × sin φ (Ω from GRS80).
    expect(coriolisParameter(lat)).toBeCloseTo(expected, 9);
    expect(coriolisParameter(-lat)).toBeCloseTo(-expected, 9);
  });

  it("array follows the grid latitudes", () => {
    const geometry: LatLonGeometry = { kind: "latlon", nx: 2, ny: 3, earthRadius: RADIUS, uvRelativeToGrid: false, lat0: 30, lon0: 10, dlat: 15, dlon: 5 };
    const f = coriolisArray(geometry);
    // Derived in closed form: rows are 30°, 45°, 60°.
    expect(f[0]).toBeCloseTo(7.2921e-5, 9);
    expect(f[3]).toBeCloseTo(1.03126e-4, 9);
    expect(f[5]).toBeCloseTo(1.26303e-4, 9);
  });
});

describe("grid spacing", () => {
  it("latitude–longitude: dx = a cos φ Δλ, dy = a Δφ", () => {
    const geometry: LatLonGeometry = { kind: "latlon", nx: 3, ny: 3, earthRadius: RADIUS, uvRelativeToGrid: false, lat0: 0, lon0: 0, dlat: 60, dlon: 1 };
    const { dx, dy } = gridSpacingArrays(geometry);
    // Derived in closed form: 6 371 229 m × π/180 = 111 198.9 m per degree; cos 60° = 0.5.
    expect(dx[0]).toBeCloseTo(111_198.9, 0);
    expect(dx[3]).toBeCloseTo(111_198.9 / 2, 0);
    expect(dy[4]).toBeCloseTo(111_198.9 * 60, -1);
  });

  it("projected: nominal length divided by the map factor", () => {
    const geometry = lambert(38.5, 38.5);
    const { dx } = gridSpacingArrays(geometry);
    const m = mapFactorArray(geometry);
    const { lat } = gridCoordinates(geometry);
    for (const k of [0, 100, 2399]) {
      // Derived in closed form: physical length = Δx / m.
      expect(dx[k]).toBeCloseTo(geometry.dx / m[k], 0);
      expect(m[k]).toBeCloseTo(mapFactorAtLatitude(geometry, lat[k]), 5);
    }
  });
});
