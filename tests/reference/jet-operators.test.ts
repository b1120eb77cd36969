import { describe, expect, it } from "vitest";
import type { LatLonGeometry } from "../../shared/grid/geometry-types.ts";
import { horizontalGridFor, type FPlaneGeometry } from "../../shared/meteo/jet/horizontal-grid.ts";
import { divergence, gradient, relativeVorticity, velocityGradient } from "../../shared/meteo/jet/operators.ts";
import { geostrophicWind, ageostrophicWind } from "../../shared/meteo/jet/geostrophic.ts";
import { petterssenFrontogenesis } from "../../shared/meteo/jet/frontogenesis.ts";
import { naturalCoordinates } from "../../shared/meteo/jet/natural-coordinates.ts";
import { STANDARD_GRAVITY } from "../../shared/meteo/constants.ts";
import { gaussianJetStreak, curvedJetStreak, planeGrid } from "../helpers/jet-test-fields.ts";

const RADIUS = 6_371_229;
const DEG = Math.PI / 180;

function fPlane(nx: number, ny: number, dx: number, f = 1e-4): FPlaneGeometry {
  return { kind: "fplane", nx, ny, dx, dy: dx, coriolis: f, uvRelativeToGrid: true };
}

/** Fills u, v (and anything else) from a function of plane position (m), origin at the grid centre. */
function planeField(geometry: FPlaneGeometry, fn: (x: number, y: number) => number): Float32Array {
  const out = new Float32Array(geometry.nx * geometry.ny);
  for (let j = 0; j < geometry.ny; j++) {
    for (let i = 0; i < geometry.nx; i++) {
      out[j * geometry.nx + i] = fn((i - (geometry.nx - 1) / 2) * geometry.dx, (j - (geometry.ny - 1) / 2) * geometry.dy);
    }
  }
  return out;
}

function interior(nx: number, ny: number): number[] {
  const points: number[] = [];
  for (let j = 1; j < ny - 1; j++) for (let i = 1; i < nx - 1; i++) points.push(j * nx + i);
  return points;
}

describe("solid-body rotation on an f-plane", () => {
  const geometry = fPlane(41, 31, 50_000);
  const grid = horizontalGridFor(geometry);
  const omega = 1e-5;
  const u = planeField(geometry, (_x, y) => -omega * y);
  const v = planeField(geometry, (x) => omega * x);

  it("has zero divergence and vorticity 2Ω at every interior point", () => {
    const div = divergence(grid, u, v);
    const vort = relativeVorticity(grid, u, v);
    for (const k of interior(geometry.nx, geometry.ny)) {
      // Source: Derived in closed form (solid-body rotation: δ = 0, ζ = 2Ω; Holton and Hakim 2013, ch. 4)
      expect(Math.abs(div[k])).toBeLessThan(1e-12);
      expect(vort[k]).toBeCloseTo(2 * omega, 11);
    }
  });

  it("leaves the outermost rows and columns undefined", () => {
    const div = divergence(grid, u, v);
    // Common practice (no source): centred differences have no value on the border.
    expect(Number.isNaN(div[0])).toBe(true);
    expect(Number.isNaN(div[geometry.nx - 1])).toBe(true);
    expect(Number.isNaN(div[(geometry.ny - 1) * geometry.nx + 5])).toBe(true);
    expect(Number.isNaN(div[5 * geometry.nx])).toBe(true);
  });

  it("has streamline curvature 1/r (counter-clockwise)", () => {
    const natural = naturalCoordinates(grid, u, v);
    const k = 15 * geometry.nx + 30; // 10 columns east of the centre: r = 500 km
    // Source: Derived in closed form (circular streamlines of radius r have curvature 1/r)
    expect(natural.curvature[k]).toBeCloseTo(1 / 500_000, 9);
  });
});

function latLonGeometry(): LatLonGeometry {
  return { kind: "latlon", nx: 121, ny: 101, earthRadius: RADIUS, uvRelativeToGrid: false, lat0: 5, lon0: -150, dlat: 0.5, dlon: 0.5 };
}

describe("latitude–longitude grid", () => {
  const geometry = latLonGeometry();
  const grid = horizontalGridFor(geometry);
  const n = geometry.nx * geometry.ny;
  const latOf = (k: number) => geometry.lat0 + Math.floor(k / geometry.nx) * geometry.dlat;
  const pointAt = (latDeg: number) => Math.round((latDeg - geometry.lat0) / geometry.dlat) * geometry.nx + 60;

  it("solid-body rotation of the atmosphere: δ = 0, ζ = 2Ω_b sin φ", () => {
    const omega = 2e-6;
    const u = new Float32Array(n);
    const v = new Float32Array(n);
    for (let k = 0; k < n; k++) u[k] = omega * RADIUS * Math.cos(latOf(k) * DEG);
    const div = divergence(grid, u, v);
    const vort = relativeVorticity(grid, u, v);
    for (const k of interior(geometry.nx, geometry.ny)) {
      const expected = 2 * omega * Math.sin(latOf(k) * DEG);
      // Source: Derived in closed form (spherical vorticity of u = Ω_b a cos φ; Holton and Hakim 2013, spherical operators)
      expect(Math.abs(vort[k] - expected)).toBeLessThan(1e-4 * 2 * omega);
      expect(Math.abs(div[k])).toBeLessThan(1e-12);
    }
  });

  it("zonal flow along parallels curves cyclonically with curvature tan φ / a", () => {
    const u = new Float32Array(n).fill(30);
    const v = new Float32Array(n);
    const natural = naturalCoordinates(grid, u, v, undefined, velocityGradient(grid, u, v));
    const k = pointAt(35);
    // Source: Derived in closed form (geodesic curvature of a parallel of latitude is tan φ / a)
    expect(natural.curvature[k] / (Math.tan(35 * DEG) / RADIUS)).toBeCloseTo(1, 3);
  });

  it("geostrophic wind of Z = −(Ω a U / g) sin²φ is u_g = U cos φ, and undefined within 10° of the equator", () => {
    const U = 20;
    const earthOmega = 7.292115e-5;
    const height = new Float32Array(n);
    for (let k = 0; k < n; k++) height[k] = -((earthOmega * RADIUS * U) / STANDARD_GRAVITY) * Math.sin(latOf(k) * DEG) ** 2;
    const wind = geostrophicWind(grid, height);
    const k40 = pointAt(40);
    // Source: Derived in closed form (u_g = −(g/(f a)) ∂Z/∂φ with f = 2Ω sin φ; Holton and Hakim 2013, ch. 3)
    expect(wind.u[k40]).toBeCloseTo(U * Math.cos(40 * DEG), 2);
    expect(Math.abs(wind.v[k40])).toBeLessThan(1e-6);
    // Common practice (no source): no geostrophic wind equatorward of 10°.
    expect(Number.isNaN(wind.u[pointAt(9.5)])).toBe(true);
    expect(Number.isFinite(wind.u[pointAt(10.5)])).toBe(true);
  });
});

describe("geostrophic and ageostrophic wind of the Gaussian jet streak (f-plane, 25 km)", () => {
  const jet = gaussianJetStreak({ f: 1e-4 });
  const grid = horizontalGridFor(jet.grid.geometry);
  const geostrophic = geostrophicWind(grid, jet.height);
  const ageostrophic = ageostrophicWind(jet.u, jet.v, geostrophic.u, geostrophic.v);
  const { nx, ny } = jet.grid.geometry;

  it("recovers the non-divergent wind from Z = (f/g) ψ within 0.1 m/s", () => {
    let worst = 0;
    for (const k of interior(nx, ny)) {
      worst = Math.max(worst, Math.abs(geostrophic.u[k] - jet.uNonDivergent[k]), Math.abs(geostrophic.v[k] - jet.vNonDivergent[k]));
    }
    // Source: computed by the team's science reference scripts (centred differences at 25 km), 0.1 m/s
    expect(worst).toBeLessThan(0.1);
  });

  it("leaves only the cross-stream ageostrophic wind v_ag = (1/f) u ∂u/∂x", () => {
    let worst = 0;
    for (const k of interior(nx, ny)) {
      const expectedV = jet.v[k] - jet.vNonDivergent[k];
      worst = Math.max(worst, Math.abs(ageostrophic.u[k]), Math.abs(ageostrophic.v[k] - expectedV));
    }
    // Source: Derived in closed form (the field is built as V_g + (0, v_ag)); same 0.1 m/s operator tolerance
    expect(worst).toBeLessThan(0.1);
  });

  it("finds no ageostrophic wind at all in the purely geostrophic part", () => {
    const none = ageostrophicWind(jet.uNonDivergent, jet.vNonDivergent, geostrophic.u, geostrophic.v);
    let worst = 0;
    for (const k of interior(nx, ny)) worst = Math.max(worst, Math.hypot(none.u[k], none.v[k]));
    // Source: computed by the team's science reference scripts (geostrophic operator check, 0.1 m/s at 25 km)
    expect(worst).toBeLessThan(0.1);
  });
});

describe("Petterssen frontogenesis in closed form", () => {
  const geometry = fPlane(21, 21, 20_000);
  const grid = horizontalGridFor(geometry);
  const alpha = 1e-5;
  const gamma = 1e-5;
  const centre = 10 * geometry.nx + 10;
  // θ is stored as float32 (300 K to ~7 significant digits), so agreement is to about 1e-4 relative.
  const closeTo = (value: number, expected: number) => expect(Math.abs(value - expected)).toBeLessThan(1e-4 * Math.abs(expected));

  it("pure deformation across the isentropes: F = αΓ = 0.108 K (100 km)⁻¹ (3 h)⁻¹", () => {
    const u = planeField(geometry, (x) => alpha * x);
    const v = planeField(geometry, (_x, y) => -alpha * y);
    const theta = planeField(geometry, (_x, y) => 300 + gamma * y);
    const f = petterssenFrontogenesis(grid, theta, u, v);
    // Source: Derived in closed form (Petterssen 1936; Bluestein 1993, Vol. I), 0.108 K (100 km)⁻¹ (3 h)⁻¹
    closeTo(f[centre], 0.108);
  });

  it("pure convergence: the same 0.108", () => {
    const u = planeField(geometry, (x) => -alpha * x);
    const v = planeField(geometry, (_x, y) => -alpha * y);
    const theta = planeField(geometry, (_x, y) => 300 + gamma * y);
    const f = petterssenFrontogenesis(grid, theta, u, v);
    // Source: Derived in closed form (F = −½|∇θ|δ for pure convergence), 0.108 K (100 km)⁻¹ (3 h)⁻¹
    closeTo(f[centre], 0.108);
  });

  it("deformation along the isentropes weakens the gradient: −0.108", () => {
    const u = planeField(geometry, (x) => alpha * x);
    const v = planeField(geometry, (_x, y) => -alpha * y);
    const theta = planeField(geometry, (x) => 300 + gamma * x);
    const f = petterssenFrontogenesis(grid, theta, u, v);
    // Source: Derived in closed form (isentropes parallel to the axis of contraction: F = −αΓ)
    closeTo(f[centre], -0.108);
  });

  it("equals ½|∇θ|(D cos 2β − δ) for a general linear wind", () => {
    const [a, b, c, d] = [3e-6, -7e-6, 5e-6, 2e-6]; // u = a x + b y, v = c x + d y
    const u = planeField(geometry, (x, y) => a * x + b * y);
    const v = planeField(geometry, (x, y) => c * x + d * y);
    const [gx, gy] = [4e-6, 9e-6];
    const theta = planeField(geometry, (x, y) => 290 + gx * x + gy * y);
    const f = petterssenFrontogenesis(grid, theta, u, v);
    // Axis of dilatation at angle ψ with tan 2ψ = (c + b)/(a − d); β = angle between isentropes and that axis.
    const total = Math.hypot(a - d, c + b);
    const dilatationAxis = 0.5 * Math.atan2(c + b, a - d);
    const isentropeDirection = Math.atan2(gy, gx) + Math.PI / 2;
    const beta = isentropeDirection - dilatationAxis;
    const expected = 0.5 * Math.hypot(gx, gy) * (total * Math.cos(2 * beta) - (a + d)) * 1.08e9;
    // Source: Petterssen (1936); Bluestein (1993), Vol. I: the resultant-deformation form of the same F
    closeTo(f[centre], expected);
  });

  it("is zero where the temperature gradient is below 10⁻⁷ K/m", () => {
    const u = planeField(geometry, (x) => alpha * x);
    const v = planeField(geometry, (_x, y) => -alpha * y);
    const theta = planeField(geometry, (_x, y) => 300 + 1e-8 * y);
    // Common practice (no source): no isentrope direction, no frontogenesis.
    expect(petterssenFrontogenesis(grid, theta, u, v)[centre]).toBe(0);
  });
});

describe("curvature and shear vorticity add up to the relative vorticity", () => {
  function worstResidual(
    geometryGrid: ReturnType<typeof horizontalGridFor>,
    u: Float32Array,
    v: Float32Array,
    include: (k: number) => boolean = () => true,
  ): number {
    const vort = relativeVorticity(geometryGrid, u, v);
    const natural = naturalCoordinates(geometryGrid, u, v);
    let worst = 0;
    let largest = 0;
    for (let k = 0; k < vort.length; k++) {
      if (!include(k) || !Number.isFinite(vort[k]) || !Number.isFinite(natural.curvature[k])) continue;
      largest = Math.max(largest, Math.abs(vort[k]));
      worst = Math.max(worst, Math.abs(vort[k] - (natural.speed[k] * natural.curvature[k] - natural.crossSpeedGradient[k])));
    }
    return worst / largest;
  }

  it("ζ = S K_s − ∂S/∂n within 1 % of max|ζ| on the Gaussian jet streak", () => {
    const jet = gaussianJetStreak({ f: 1e-4, rotationDegrees: 30 });
    // Source: Derived in closed form (natural-coordinate vorticity; Holton and Hakim 2013, ch. 3), residual < 1 %
    expect(worstResidual(horizontalGridFor(jet.grid.geometry), jet.u, jet.v)).toBeLessThan(0.01);
  });

  it("and on the curved streak (Rc = 1500 km), away from the singular centre of the bend", () => {
    const radius = 1_500_000;
    const jet = curvedJetStreak({ radius, mirror: false, f: 1e-4 });
    // The test wind circles the centre (0, Rc) at ≥ 20 m/s, so its vorticity is singular there; stay 500 km away.
    const nx = jet.grid.geometry.nx;
    const farFromCentre = (k: number) => Math.hypot(jet.grid.x[k % nx], jet.grid.y[Math.floor(k / nx)] - radius) > 500_000;
    // Source: Derived in closed form (natural-coordinate vorticity; Holton and Hakim 2013, ch. 3), residual < 1 %
    expect(worstResidual(horizontalGridFor(jet.grid.geometry), jet.u, jet.v, farFromCentre)).toBeLessThan(0.01);
  });
});

describe("gradient", () => {
  it("of a plane F = 2x − 3y is (2, −3) in physical units", () => {
    const plane = planeGrid({ dx: 10_000, xMin: -100_000, xMax: 100_000, yMin: -50_000, yMax: 50_000, f: 1e-4 });
    const field = planeField(plane.geometry, (x, y) => 2 * x - 3 * y);
    const g = gradient(horizontalGridFor(plane.geometry), field);
    const k = 5 * plane.geometry.nx + 10;
    // Source: Derived in closed form
    expect(g.x[k]).toBeCloseTo(2, 6);
    expect(g.y[k]).toBeCloseTo(-3, 6);
  });
});
