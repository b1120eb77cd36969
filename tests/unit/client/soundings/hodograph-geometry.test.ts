import { describe, expect, it } from "vitest";
import { hodographBetween, hodographPoints, hodographWindow, ringLabelSpot, ringSpacing, windAtHeight } from "../../../../src/features/soundings/chart/hodograph-geometry.ts";

const KT = 1852 / 3600; // m/s per knot. Source: BIPM SI Brochure, 9th ed. (2019), Table 8.

// A straight-line hodograph: u grows 5 kt per km, v is 10 kt everywhere; levels at 0, 0.5, 2, 4, 7 km.
const levels = [0, 500, 2000, 4000, 7000].map((height) => ({ height, u: (5 * height) / 1000 * KT, v: 10 * KT }));

describe("hodograph geometry", () => {
  const points = hodographPoints(levels);

  it("converts winds to knots and skips levels without wind", () => {
    const withGap = [...levels, { height: 8000, u: null, v: null }];
    expect(hodographPoints(withGap)).toHaveLength(5);
    expect(points[4].u).toBeCloseTo(35, 9);
    expect(points[4].v).toBeCloseTo(10, 9);
  });

  it("interpolates the wind linearly in height", () => {
    // Derived in closed form: u = 5 kt/km × z on this profile.
    expect(windAtHeight(points, 3000)?.u).toBeCloseTo(15, 9);
    expect(windAtHeight(points, 9000)).toBeNull();
  });

  it("cuts a band with both ends on its bounds so neighbouring bands meet", () => {
    const low = hodographBetween(points, 0, 1000);
    const mid = hodographBetween(points, 1000, 3000);
    expect(low.map((p) => p.height)).toEqual([0, 500, 1000]);
    expect(mid.map((p) => p.height)).toEqual([1000, 2000, 3000]);
    expect(low[low.length - 1]).toEqual(mid[0]);
    // Derived in closed form: u(1 km) = 5 kt, u(3 km) = 15 kt.
    expect(mid[0].u).toBeCloseTo(5, 9);
    expect(mid[2].u).toBeCloseTo(15, 9);
  });

  it("stops a band at the top of the data", () => {
    expect(hodographBetween(points, 6000, 12000).map((p) => p.height)).toEqual([6000, 7000]);
    expect(hodographBetween(points, 8000, 12000)).toEqual([]);
  });

  it("frames every point with a margin and keeps at least ±20 kt", () => {
    const view = hodographWindow([{ u: 0, v: 0 }, { u: 60, v: 20 }]);
    expect(view.centerU).toBe(30);
    expect(view.halfSpan).toBeGreaterThan(30);
    expect(hodographWindow([{ u: 2, v: 1 }]).halfSpan).toBe(20);
  });

  it("widens the rings for strong winds", () => {
    expect(ringSpacing(45)).toBe(10);
    expect(ringSpacing(85)).toBe(20);
  });
});

describe("ringLabelSpot", () => {
  it("labels a ring on an axis away from the drawn winds", () => {
    // Winds east of the origin: the −u axis is farthest from all of them (40 kt from the nearest).
    const winds = [{ u: 20, v: 20 }, { u: 40, v: 10 }, { u: 20, v: 0 }];
    expect(ringLabelSpot(20, () => true, winds)).toEqual({ u: -20, v: 0 });
    // With the −u axis out of view, the next clearest spot is below the origin.
    expect(ringLabelSpot(20, (u) => u > -1, winds)).toEqual({ u: 0, v: -20 });
  });

  it("skips spots out of view and is null when none is in view", () => {
    const spot = ringLabelSpot(20, (u) => u < 0, []);
    expect(spot).toEqual({ u: -20, v: 0 });
    expect(ringLabelSpot(20, () => false, [])).toBeNull();
  });
});
