import { describe, expect, it } from "vitest";
import { chooseArrowScale, KEY_ARROW_PX, SHORTEST_ARROW_PX, speedPercentile90 } from "../../../../src/features/grids/jet-layers/arrow-scale.ts";

describe("ageostrophic arrow scale", () => {
  it("finds the 90th-percentile speed to a quarter of a metre per second, ignoring points without a value", () => {
    const u = new Float32Array(101);
    const v = new Float32Array(101);
    for (let k = 0; k < 100; k++) {
      // Speeds 1…100 m/s, half of them as north winds: the speed counts, not the direction.
      if (k % 2 === 0) u[k] = k + 1;
      else v[k] = -(k + 1);
    }
    u[100] = Number.NaN;
    // Derived in closed form: 90 of the 100 speeds are at most 90 m/s.
    const p90 = speedPercentile90(u, v)!;
    expect(p90).toBeGreaterThanOrEqual(90);
    expect(p90).toBeLessThanOrEqual(90.25);
    expect(speedPercentile90(new Float32Array([Number.NaN]), new Float32Array([0]))).toBeNull();
  });

  it("picks the smallest round key that keeps nine arrows in ten shorter than the gap between arrows", () => {
    // Derived in closed form: 15 m/s × 16 px / 30 px = 8 m/s is the smallest key allowed, so the key is 10 m/s.
    expect(chooseArrowScale(15, 30).keySpeed).toBe(10);
    // 36 m/s × 16 / 30 = 19.2 m/s → 20 m/s; the 90th-percentile arrow is then 28.8 px long, inside the 30-px gap.
    const strong = chooseArrowScale(36, 30);
    expect(strong.keySpeed).toBe(20);
    expect(36 * strong.pixelsPerMetrePerSecond).toBeCloseTo(28.8, 9);
    expect(strong.pixelsPerMetrePerSecond * strong.keySpeed).toBeCloseTo(KEY_ARROW_PX, 9);
    // Derived in closed form: at 16 px per 20 m/s an arrow of 3 px (the shortest drawn) stands for 3.75 m/s.
    expect(strong.slowestDrawn).toBeCloseTo((SHORTEST_ARROW_PX * 20) / KEY_ARROW_PX, 9);
    // Calm flow: 2 m/s keys keep weak arrows visible.
    expect(chooseArrowScale(1, 30).keySpeed).toBe(2);
  });

  it("falls back to a 10 m/s key when the field has no values", () => {
    // Common practice (no source): 10 m/s is a usual key for upper-level ageostrophic wind.
    expect(chooseArrowScale(null, 30).keySpeed).toBe(10);
  });
});
