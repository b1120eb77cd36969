import { describe, expect, it } from "vitest";
import { createSkewTGeometry, pathThrough, type SkewTFrame } from "../../../../src/features/soundings/chart/skew-t-geometry.ts";

const FRAME: SkewTFrame = {
  left: 50,
  top: 10,
  width: 500,
  height: 600,
  bottomPressure: 105000,
  topPressure: 10000,
  leftTemperature: 233.15,
  rightTemperature: 323.15,
  skew: 1,
};
const g = createSkewTGeometry(FRAME);
const bottom = FRAME.top + FRAME.height;

describe("skew-T coordinates", () => {
  it("puts the bottom and top pressures on the plot's edges", () => {
    expect(g.yOfPressure(105000)).toBeCloseTo(bottom, 9);
    expect(g.yOfPressure(10000)).toBeCloseTo(FRAME.top, 9);
  });

  it("is linear in ln p: the geometric mean of two pressures sits halfway between them", () => {
    // Derived in closed form: y ∝ ln p, and ln √(p1 p2) = (ln p1 + ln p2) / 2.
    const y1 = g.yOfPressure(100000);
    const y2 = g.yOfPressure(25000);
    expect(g.yOfPressure(Math.sqrt(100000 * 25000))).toBeCloseTo((y1 + y2) / 2, 9);
  });

  it("spans the bottom edge from the left to the right temperature", () => {
    expect(g.xOf(233.15, 105000)).toBeCloseTo(FRAME.left, 9);
    expect(g.xOf(323.15, 105000)).toBeCloseTo(FRAME.left + FRAME.width, 9);
  });

  it("leans isotherms at 45° when skew is 1", () => {
    // Derived in closed form: x = x0(T) + skew·(y_bottom − y), so Δx = −Δy along an isotherm.
    const a = { x: g.xOf(273.15, 90000), y: g.yOfPressure(90000) };
    const b = { x: g.xOf(273.15, 30000), y: g.yOfPressure(30000) };
    expect(b.x - a.x).toBeCloseTo(-(b.y - a.y), 9);
  });

  it("inverts: the temperature and pressure under a drawn point are the ones drawn", () => {
    for (const [t, p] of [[300, 100000], [250, 50000], [200, 15000]]) {
      const x = g.xOf(t, p);
      const y = g.yOfPressure(p);
      expect(g.pressureOfY(y)).toBeCloseTo(p, 6);
      expect(g.temperatureAt(x, y)).toBeCloseTo(t, 9);
    }
  });
});

describe("pathThrough", () => {
  it("lifts the pen over missing values", () => {
    const d = pathThrough(g, [
      { pressure: 100000, temperature: 300 },
      { pressure: 90000, temperature: Number.NaN },
      { pressure: 80000, temperature: 290 },
      { pressure: 70000, temperature: 285 },
    ]);
    expect(d.match(/M/g)).toHaveLength(2);
    expect(d.match(/L/g)).toHaveLength(1);
  });
});
