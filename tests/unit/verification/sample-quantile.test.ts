import { describe, expect, it } from "vitest";
import { medianAndP90, quantileOfSorted, sortedAscending } from "../../../shared/verification/sample-quantile.ts";

describe("sample quantiles (Hyndman and Fan 1996, definition 7)", () => {
  it("interpolates between order statistics", () => {
    const sorted = sortedAscending([40, 10, 30, 20]);
    // Derived in closed form: h = (n−1)p; p = 0.5 → h = 1.5 → 20 + 0.5·10 = 25; p = 0.9 → h = 2.7 → 30 + 0.7·10 = 37
    expect(quantileOfSorted(sorted, 0.5)).toBeCloseTo(25, 12);
    expect(quantileOfSorted(sorted, 0.9)).toBeCloseTo(37, 12);
    expect(quantileOfSorted(sorted, 0)).toBe(10);
    expect(quantileOfSorted(sorted, 1)).toBe(40);
  });

  it("matches R's default quantile() on a textbook sample", () => {
    // Source: Hyndman and Fan (1996), definition 7 is R's type 7; for 1..10, quantile(1:10, 0.9) = 9.1 and median 5.5 (closed form h = 9·0.9 = 8.1)
    expect(medianAndP90([1, 2, 3, 4, 5, 6, 7, 8, 9, 10])).toEqual({ median: 5.5, p90: expect.closeTo(9.1, 12) });
  });

  it("handles one value, none, and numbers that a text sort would misorder", () => {
    expect(medianAndP90([7])).toEqual({ median: 7, p90: 7 });
    expect(medianAndP90([])).toEqual({ median: null, p90: null });
    // Common practice (no source): numeric order, so 9 < 10 < 100
    expect(quantileOfSorted(sortedAscending([100, 9, 10]), 0.5)).toBe(10);
    expect(() => quantileOfSorted(sortedAscending([1]), 1.5)).toThrow(/\[0, 1\]/);
  });
});
