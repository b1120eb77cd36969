import { describe, expect, it } from "vitest";
import { DEFAULT_BARB_STYLE, thinBySpacing, windBarbCounts, windBarbGlyph } from "../../../../src/features/soundings/chart/wind-barb.ts";

const KT = 1852 / 3600; // m/s per knot. Source: BIPM SI Brochure, 9th ed. (2019), Table 8 (nautical mile = 1852 m).
const L = DEFAULT_BARB_STYLE.length;

describe("wind barb feathers", () => {
  it("counts pennants (50 kt), full feathers (10 kt) and half feathers (5 kt)", () => {
    // Common practice (no source): the station-model barb convention.
    expect(windBarbCounts(65)).toEqual({ pennants: 1, full: 1, half: 1 });
    expect(windBarbCounts(40)).toEqual({ pennants: 0, full: 4, half: 0 });
    expect(windBarbCounts(105)).toEqual({ pennants: 2, full: 0, half: 1 });
    expect(windBarbCounts(5)).toEqual({ pennants: 0, full: 0, half: 1 });
  });

  it("rounds the speed to 5 kt and draws a calm circle below 2.5 kt", () => {
    // Common practice (no source): barbs are drawn to the nearest 5 kt.
    expect(windBarbGlyph(0, 63 * KT).roundedKnots).toBe(65);
    expect(windBarbGlyph(0, 62 * KT).roundedKnots).toBe(60);
    expect(windBarbGlyph(2 * KT, 0).calm).toBe(true);
  });
});

describe("wind barb direction", () => {
  it("points the staff toward where the wind comes from", () => {
    // Derived in closed form: a north wind (v < 0) comes from screen-up (−y); a west wind (u > 0) from screen-left.
    const north = windBarbGlyph(0, -20 * KT);
    expect(north.staff[2]).toBeCloseTo(0, 9);
    expect(north.staff[3]).toBeCloseTo(-L, 9);
    const west = windBarbGlyph(20 * KT, 0);
    expect(west.staff[2]).toBeCloseTo(-L, 9);
    expect(west.staff[3]).toBeCloseTo(0, 9);
  });

  it("puts the feathers on the low-pressure side in the Northern Hemisphere", () => {
    // From memory: for a west wind the feathers point north (Buys Ballot: low pressure on the left with the wind behind you).
    const west = windBarbGlyph(20 * KT, 0);
    for (const f of west.feathers) expect(f[3]).toBeLessThan(f[1]);
    const westSouth = windBarbGlyph(20 * KT, 0, { ...DEFAULT_BARB_STYLE, side: -1 });
    for (const f of westSouth.feathers) expect(f[3]).toBeGreaterThan(f[1]);
  });

  it("sets a lone half feather one step in from the end of the staff", () => {
    // Common practice (no source): so that it cannot be read as a full feather.
    const glyph = windBarbGlyph(0, -5 * KT);
    expect(glyph.feathers).toHaveLength(1);
    expect(-glyph.feathers[0][1]).toBeCloseTo(L - DEFAULT_BARB_STYLE.spacing, 9);
  });

  it("draws a pennant as a closed triangle at the end of the staff", () => {
    const glyph = windBarbGlyph(0, -50 * KT);
    expect(glyph.pennants).toHaveLength(1);
    expect(glyph.pennants[0]).toHaveLength(3);
    expect(glyph.pennants[0][0][1]).toBeCloseTo(-L, 9);
  });
});

describe("thinBySpacing", () => {
  it("keeps the surface and then only levels far enough above the last one kept", () => {
    expect(thinBySpacing([600, 595, 588, 580, 560, 559, 540], 13)).toEqual([0, 3, 4, 6]);
  });
});
