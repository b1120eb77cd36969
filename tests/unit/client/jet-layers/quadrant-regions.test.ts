import { describe, expect, it } from "vitest";
import { quadrantRegions } from "../../../../src/features/grids/jet-layers/quadrant-regions.ts";

/** A grid from rows written north at the top, as one reads them (j = ny − 1 first). */
function grid(rows: string[]): Float32Array {
  const ny = rows.length;
  const nx = rows[0]!.length;
  const values = new Float32Array(nx * ny);
  rows.forEach((row, r) => [...row].forEach((c, i) => (values[(ny - 1 - r) * nx + i] = c === "." ? 0 : Number(c))));
  return values;
}

describe("quadrant regions", () => {
  // Two quadrants side by side; the right half of quadrant 3 is flagged "favoured", one cell of quadrant 1 "ambiguous".
  const quadrant = grid([
    "11113333", //
    "11113333",
    "11113333",
    "........",
  ]);
  const favoured = grid([
    "......11",
    "......11",
    "......11",
    "........",
  ]);
  const ambiguous = grid([
    "1.......",
    "........",
    "........",
    "........",
  ]);

  it("splits the quadrants into patches of one quadrant and one divergence reading", () => {
    const regions = quadrantRegions(quadrant, favoured, ambiguous, 8, 4);
    const summary = regions.map((r) => `${r.code}:${r.reading}:${r.cells}`).sort();
    // Counted by hand from the grids above.
    expect(summary).toEqual(["1:ambiguous:1", "1:neither:11", "3:favoured:6", "3:neither:6"]);
  });

  it("puts each label point on a cell of its own region, near the middle", () => {
    const regions = quadrantRegions(quadrant, favoured, ambiguous, 8, 4);
    const favouredExit = regions.find((r) => r.code === 3 && r.reading === "favoured")!;
    // Counted by hand: columns 6–7, rows 1–3; the middle row j = 2 is nearest the centre (6.5, 2).
    expect(favouredExit.j).toBe(2);
    expect([6, 7]).toContain(favouredExit.i);
    for (const region of regions) expect(quadrant[region.j * 8 + region.i]).toBe(region.code);
  });

  it("keeps patches that only touch at a corner apart, and drops small ones on request", () => {
    const diagonal = grid([
      "3.", //
      ".3",
    ]);
    const none = new Float32Array(4);
    expect(quadrantRegions(diagonal, none, none, 2, 2)).toHaveLength(2);
    expect(quadrantRegions(quadrant, favoured, ambiguous, 8, 4, 2).map((r) => r.cells).sort((a, b) => a - b)).toEqual([6, 6, 11]);
  });

  it("refuses fields that do not fit the grid", () => {
    expect(() => quadrantRegions(quadrant, favoured, new Float32Array(3), 8, 4)).toThrow(/32, 32 and 3 values for a 8 × 4 grid/);
  });
});
