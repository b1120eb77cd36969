/**
 * The Gaussian jet streak in uniform westerly flow (f-plane, Δx = 25 km): exact divergence, speeds, quadrant
 * labels, divergence signs per quadrant in both hemispheres, and rotated copies of the same streak.
 */
import { describe, expect, it } from "vitest";
import { horizontalGridFor } from "../../shared/meteo/jet/horizontal-grid.ts";
import { divergence } from "../../shared/meteo/jet/operators.ts";
import { gaussianSmooth } from "../../shared/meteo/jet/smoothing.ts";
import { naturalCoordinates, windSpeed } from "../../shared/meteo/jet/natural-coordinates.ts";
import { computeJetFields, type JetFieldsResult } from "../../shared/meteo/jet/compute-jet-fields.ts";
import { QUADRANT } from "../../shared/meteo/jet/labels.ts";
import { gaussianJetStreak, indexNearest, rotatePoint, type AnalyticJet } from "../helpers/jet-test-fields.ts";

/** The four probe points (m, streak frame) and what the four-quadrant model expects there. */
const PROBES = [
  { name: "left exit", x: 600_000, y: 150_000, quadrant: QUADRANT.leftExit, northDivergence: 1, alongSign: -1, crossSign: -1 },
  { name: "right exit", x: 600_000, y: -150_000, quadrant: QUADRANT.rightExit, northDivergence: -1, alongSign: -1, crossSign: 1 },
  { name: "left entrance", x: -600_000, y: 150_000, quadrant: QUADRANT.leftEntrance, northDivergence: -1, alongSign: 1, crossSign: -1 },
  { name: "right entrance", x: -600_000, y: -150_000, quadrant: QUADRANT.rightEntrance, northDivergence: 1, alongSign: 1, crossSign: 1 },
] as const;

function run(jet: AnalyticJet): JetFieldsResult {
  return computeJetFields({ geometry: jet.grid.geometry, u: jet.u, v: jet.v, height: jet.height });
}

function probeIndex(jet: AnalyticJet, probe: { x: number; y: number }, rotationDegrees = 0): number {
  const p = rotatePoint(probe.x, probe.y, rotationDegrees);
  return indexNearest(jet.grid, p.x, p.y);
}

describe("Gaussian jet streak: the analytic field itself", () => {
  const jet = gaussianJetStreak({ f: 1e-4 });
  const grid = horizontalGridFor(jet.grid.geometry);

  it("has |δ| = 4.618e-5 s⁻¹ at (±600, ±150) km, and centred differences at 25 km reproduce it within 1 %", () => {
    const numerical = divergence(grid, jet.u, jet.v);
    for (const probe of PROBES) {
      const k = probeIndex(jet, probe);
      // Source: Derived in closed form (δ = 4 U1 x y G (U0 + 2 U1 G) / (f Lx² Ly²)), 4.618e-5 s⁻¹
      expect(Math.abs(jet.exactDivergence[k])).toBeCloseTo(4.618e-5, 8);
      expect(Math.sign(jet.exactDivergence[k])).toBe(probe.northDivergence);
      // Source: computed by the team's science reference scripts: centred differences within 1 %
      expect(Math.abs(numerical[k] / jet.exactDivergence[k] - 1)).toBeLessThan(0.01);
    }
  });

  it("blows 44.6 m/s at the left points, 46.0 m/s at the right points, 60 m/s at the core; 57.6 m/s after the 75 km smoother", () => {
    const speed = windSpeed(jet.u, jet.v);
    const centre = indexNearest(jet.grid, 0, 0);
    for (const probe of PROBES) {
      const expected = probe.y > 0 ? 44.6 : 46.0;
      // Source: Derived in closed form (the analytic wind at the probe points), 0.1 m/s
      expect(speed[probeIndex(jet, probe)]).toBeCloseTo(expected, 1);
    }
    // Source: Derived in closed form (U0 + U1 at the core)
    expect(speed[centre]).toBeCloseTo(60, 4);
    const smoothedSpeed = windSpeed(gaussianSmooth(grid, jet.u, 75_000), gaussianSmooth(grid, jet.v, 75_000));
    // Source: computed by the team's science reference scripts (75 km Gaussian smoother), 0.1 m/s
    expect(smoothedSpeed[centre]).toBeCloseTo(57.6, 1);
  });
});

describe("Gaussian jet streak, Northern Hemisphere (f = +1e-4 s⁻¹)", () => {
  const jet = gaussianJetStreak({ f: 1e-4 });
  const result = run(jet);
  const fields = result.fields;
  const grid = horizontalGridFor(jet.grid.geometry);
  const natural = naturalCoordinates(grid, gaussianSmooth(grid, jet.u, 75_000), gaussianSmooth(grid, jet.v, 75_000));

  it("finds one straight streak whose core sits at the centre with 57.6 m/s", () => {
    expect(result.streaks).toHaveLength(1);
    const streak = result.streaks[0];
    // Source: Derived in closed form (the streak is centred on the grid's middle point)
    expect(streak.core.i).toBeCloseTo((jet.grid.geometry.nx - 1) / 2, 1);
    expect(streak.core.j).toBeCloseTo((jet.grid.geometry.ny - 1) / 2, 1);
    // Source: computed by the team's science reference scripts (75 km Gaussian smoother), 0.1 m/s
    expect(streak.core.speed).toBeCloseTo(57.6, 1);
    // Source: computed by the team's science reference scripts: |Δα| ≈ 5° for this field (straight class)
    expect(Math.abs(streak.turningAngleDegrees)).toBeGreaterThan(2);
    expect(Math.abs(streak.turningAngleDegrees)).toBeLessThan(8);
    expect(streak.curvatureClass).toBe(0);
    expect(streak.curvatureStrong).toBe(false);
  });

  it.each(PROBES)("labels the $name point and finds the textbook divergence sign there", (probe) => {
    const k = probeIndex(jet, probe);
    // Source: Bluestein (1993), Vol. II; Uccellini and Kocin (1987): four-quadrant model. From memory: exact page/figure.
    expect(fields.jet_quadrant[k]).toBe(probe.quadrant);
    expect(Math.sign(fields.jet_div[k])).toBe(probe.northDivergence);
    // Source: Derived in closed form (speed falls downstream of the core and away from the axis)
    expect(Math.sign(natural.alongSpeedChange[k])).toBe(probe.alongSign);
    expect(Math.sign(fields.jet_along_accel[k])).toBe(probe.alongSign);
    expect(Math.sign(natural.crossSpeedGradient[k])).toBe(probe.crossSign);
    // NH straight streak: divergence favoured in the left exit and right entrance only.
    expect(fields.jet_div_favoured[k]).toBe(probe.northDivergence > 0 ? 1 : 0);
    // Source: Common practice (no source): notable upper divergence ≥ 1e-5 s⁻¹ (smoothed δ here ≈ 3.7e-5)
    expect(fields.jet_ascent_support[k]).toBe(probe.northDivergence > 0 ? 1 : 0);
    expect(fields.jet_div_ambiguous[k]).toBe(0);
  });

  it("sets the boolean quadrant fields to match the category", () => {
    const leftExit = probeIndex(jet, PROBES[0]);
    const rightEntrance = probeIndex(jet, PROBES[3]);
    expect([fields.jet_left_exit[leftExit], fields.jet_exit[leftExit], fields.jet_entrance[leftExit]]).toEqual([1, 1, 0]);
    expect([fields.jet_right_entrance[rightEntrance], fields.jet_exit[rightEntrance], fields.jet_entrance[rightEntrance]]).toEqual([1, 0, 1]);
  });

  it("measures σ and ν in metres from the core and the axis", () => {
    const k = probeIndex(jet, PROBES[0]);
    // Derived in closed form: the probe lies 600 km downstream and 150 km left of a nearly straight axis;
    // the axis bends by a few tens of km over 600 km, so agreement is to ~40 km.
    expect(fields.jet_along_dist[k]).toBeGreaterThan(560_000);
    expect(fields.jet_along_dist[k]).toBeLessThan(640_000);
    expect(fields.jet_axis_dist[k]).toBeGreaterThan(110_000);
    expect(fields.jet_axis_dist[k]).toBeLessThan(190_000);
    // Source: computed by the team's science reference scripts (75 km Gaussian smoother), 0.1 m/s
    expect(fields.jet_core_speed[k]).toBeCloseTo(57.6, 1);
  });

  it("agrees with the local speed-gradient check, so no data-quality warning", () => {
    // Common practice (no source): the 20 % disagreement limit of the product's own QC.
    expect(result.fallbackDisagreement).toBeLessThan(0.2);
    expect(result.warnings).toEqual([]);
  });
});

describe("Gaussian jet streak, Southern Hemisphere mirror (f = −1e-4 s⁻¹)", () => {
  const jet = gaussianJetStreak({ f: -1e-4 });
  const fields = run(jet).fields;

  it.each(PROBES)("keeps the $name label, flips the divergence sign and the favoured side", (probe) => {
    const k = probeIndex(jet, probe);
    // Source: Derived in closed form (v_ag changes sign with f, so δ does)
    expect(Math.sign(jet.exactDivergence[k])).toBe(-probe.northDivergence);
    // Source: Bluestein (1993), Vol. II; Uccellini and Kocin (1987): SH divergence in the right exit and left entrance
    expect(fields.jet_quadrant[k]).toBe(probe.quadrant);
    expect(Math.sign(fields.jet_div[k])).toBe(-probe.northDivergence);
    expect(fields.jet_div_favoured[k]).toBe(probe.northDivergence < 0 ? 1 : 0);
  });
});

describe.each([30, -45])("Gaussian jet streak rotated by %s°", (rotation) => {
  const jet = gaussianJetStreak({ f: 1e-4, rotationDegrees: rotation });
  const fields = run(jet).fields;
  const numerical = divergence(horizontalGridFor(jet.grid.geometry), jet.u, jet.v);

  it.each(PROBES)("labels the rotated $name point the same and keeps δ", (probe) => {
    const k = probeIndex(jet, probe, rotation);
    // Source: Bluestein (1993), Vol. II; Uccellini and Kocin (1987): labels do not depend on the streak's orientation
    expect(fields.jet_quadrant[k]).toBe(probe.quadrant);
    expect(Math.sign(fields.jet_div[k])).toBe(probe.northDivergence);
    // Source: computed by the team's science reference scripts: numerical δ within 2 % of exact after snapping to grid points
    expect(Math.abs(numerical[k] / jet.exactDivergence[k] - 1)).toBeLessThan(0.02);
  });
});
