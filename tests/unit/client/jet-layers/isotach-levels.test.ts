import { describe, expect, it } from "vitest";
import { isotachLevels } from "../../../../src/features/grids/jet-layers/isotach-levels.ts";

describe("isotach levels", () => {
  it("runs every 10 kt from 60 kt up to the fastest wind", () => {
    // 56.34 m/s is 109.5 kt (1 kt = 1852/3600 m/s), so the last line is 100 kt.
    const levels = isotachLevels(56.34);
    expect(levels.map((level) => level.display)).toEqual([60, 70, 80, 90, 100]);
    // Source: BIPM SI Brochure, 9th ed. (2019), Table 8: 1 kt = 1852/3600 m/s.
    expect(levels[0]!.value).toBeCloseTo((60 * 1852) / 3600, 9);
    expect(levels[4]!.value).toBeCloseTo((100 * 1852) / 3600, 9);
  });

  it("includes a level the fastest wind just reaches", () => {
    // Source: BIPM SI Brochure, 9th ed. (2019), Table 8: 70 kt = 70 × 1852/3600 m/s.
    expect(isotachLevels((70 * 1852) / 3600).map((level) => level.display)).toEqual([60, 70]);
  });

  it("draws nothing when no wind reaches 60 kt or the frame has no speed", () => {
    // 25 m/s is 48.6 kt (Source: BIPM SI Brochure, 9th ed. (2019), Table 8).
    expect(isotachLevels(25)).toEqual([]);
    expect(isotachLevels(null)).toEqual([]);
    expect(isotachLevels(Number.NaN)).toEqual([]);
  });
});
