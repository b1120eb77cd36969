/**
 * A Lambert conformal grid, where map factors differ from 1 by up to several per cent and grid axes turn away
 * from east/north: flows whose divergence and vorticity are known on the sphere must come out right.
 */
import { describe, expect, it } from "vitest";
import type { LambertGeometry } from "../../shared/grid/geometry-types.ts";
import { gridCoordinates } from "../../shared/grid/grid-coordinates.ts";
import { mapFactorArray } from "../../shared/grid/map-factor.ts";
import { horizontalGridFor } from "../../shared/meteo/jet/horizontal-grid.ts";
import { windOnGridAxes } from "../../shared/meteo/jet/wind-basis.ts";
import { divergence, relativeVorticity, velocityGradient } from "../../shared/meteo/jet/operators.ts";
import { naturalCoordinates } from "../../shared/meteo/jet/natural-coordinates.ts";
import { computeJetFields } from "../../shared/meteo/jet/compute-jet-fields.ts";
import { STANDARD_GRAVITY } from "../../shared/meteo/constants.ts";

const RADIUS = 6_371_229;
const DEG = Math.PI / 180;

const geometry: LambertGeometry = {
  kind: "lambert",
  nx: 90,
  ny: 70,
  earthRadius: RADIUS,
  uvRelativeToGrid: false,
  lat0: 18,
  lon0: -128,
  dx: 40_000,
  dy: 40_000,
  lonV: -97,
  latin1: 38.5,
  latin2: 38.5,
};
const n = geometry.nx * geometry.ny;
const { lat } = gridCoordinates(geometry);
const grid = horizontalGridFor(geometry);

/** Earth-relative wind from a function of latitude (degrees). */
function earthWind(fnU: (latDeg: number) => number, fnV: (latDeg: number) => number) {
  const u = new Float32Array(n);
  const v = new Float32Array(n);
  for (let k = 0; k < n; k++) {
    u[k] = fnU(lat[k]);
    v[k] = fnV(lat[k]);
  }
  return { u, v };
}

function interiorPoints(): number[] {
  const points: number[] = [];
  for (let j = 2; j < geometry.ny - 2; j += 3) for (let i = 2; i < geometry.nx - 2; i += 3) points.push(j * geometry.nx + i);
  return points;
}

describe("Lambert grid (tangent 38.5°, 40 km)", () => {
  it("really has map factors away from 1 and turned axes", () => {
    const m = mapFactorArray(geometry);
    let largest = 0;
    for (let k = 0; k < n; k++) largest = Math.max(largest, m[k]);
    // Source: Snyder (1987), eq. 15-4: m ≈ 1.05 near 20°N on this cone
    expect(largest).toBeGreaterThan(1.04);
  });

  it("solid-body rotation given Earth-relative: δ = 0 and ζ = 2Ω_b sin φ", () => {
    const omega = 2e-6;
    const earth = earthWind((phi) => omega * RADIUS * Math.cos(phi * DEG), () => 0);
    const wind = windOnGridAxes(grid, earth.u, earth.v, false);
    const div = divergence(grid, wind.u, wind.v);
    const vort = relativeVorticity(grid, wind.u, wind.v);
    for (const k of interiorPoints()) {
      // Source: Derived in closed form (spherical vorticity of u = Ω_b a cos φ; Holton and Hakim 2013), computed
      // here through the map-factor form ζ = m² [∂(v/m)/∂X − ∂(u/m)/∂Y] of Haltiner and Williams (1980)
      // (From memory: the chapter and equation number).
      expect(Math.abs(vort[k] / (2 * omega * Math.sin(lat[k] * DEG)) - 1)).toBeLessThan(1e-3);
      expect(Math.abs(div[k])).toBeLessThan(1e-3 * 2 * omega);
    }
  });

  it("poleward flow v = V cos φ spreads out on the sphere: δ = −2 (V/a) sin φ", () => {
    const V = 10;
    const earth = earthWind(() => 0, (phi) => V * Math.cos(phi * DEG));
    const wind = windOnGridAxes(grid, earth.u, earth.v, false);
    const div = divergence(grid, wind.u, wind.v);
    const vort = relativeVorticity(grid, wind.u, wind.v);
    for (const k of interiorPoints()) {
      const expected = (-2 * V * Math.sin(lat[k] * DEG)) / RADIUS;
      // Source: Derived in closed form (δ = (1/(a cos φ)) ∂(v cos φ)/∂φ; Holton and Hakim 2013), through the
      // map-factor form δ = m² [∂(u/m)/∂X + ∂(v/m)/∂Y] (Haltiner and Williams 1980; From memory: equation number)
      expect(Math.abs(div[k] / expected - 1)).toBeLessThan(1e-3);
      expect(Math.abs(vort[k])).toBeLessThan(1e-3 * Math.abs(expected));
    }
  });

  it("westerly flow along parallels has cyclonic curvature tan φ / a, as on a latitude–longitude grid", () => {
    const earth = earthWind(() => 30, () => 0);
    const wind = windOnGridAxes(grid, earth.u, earth.v, false);
    const natural = naturalCoordinates(grid, wind.u, wind.v, undefined, velocityGradient(grid, wind.u, wind.v));
    for (const k of interiorPoints()) {
      // Source: Derived in closed form (geodesic curvature of a parallel), 0.5 %
      expect(Math.abs(natural.curvature[k] / (Math.tan(lat[k] * DEG) / RADIUS) - 1)).toBeLessThan(5e-3);
    }
  });

  it("reports the geostrophic wind Earth-relative: Z = −(Ω a U / g) sin²φ gives u_g = U cos φ, v_g = 0", () => {
    const U = 20;
    const earthOmega = 7.292115e-5;
    const height = new Float32Array(n);
    for (let k = 0; k < n; k++) height[k] = 10_000 - ((earthOmega * RADIUS * U) / STANDARD_GRAVITY) * Math.sin(lat[k] * DEG) ** 2;
    const calm = new Float32Array(n);
    const result = computeJetFields({ geometry, u: calm, v: calm, height });
    for (const k of interiorPoints()) {
      if (Math.abs(lat[k]) < 10) continue;
      // Source: Derived in closed form (u_g = −(g/(f a)) ∂Z/∂φ, f = 2Ω sin φ); 0.1 m/s after the 75 km smoother
      expect(Math.abs(result.fields.jet_ug[k] - U * Math.cos(lat[k] * DEG))).toBeLessThan(0.1);
      expect(Math.abs(result.fields.jet_vg[k])).toBeLessThan(0.1);
      // With no wind at all, the ageostrophic wind is minus the geostrophic wind.
      expect(result.fields.jet_uag[k]).toBeCloseTo(-result.fields.jet_ug[k], 5);
    }
  });
});
