import { describe, expect, it } from "vitest";
import { chooseColourScale } from "../../../../src/components/map/colour-scale.ts";
import { blockMeans, contourBlockSize, contourLevels, traceContours } from "../../../../src/components/map/field-contours.ts";
import { describeMapField } from "../../../../src/components/map/map-fields.ts";

describe("contours", () => {
  it("draws lines at the legend's inner ticks only", () => {
    const field = describeMapField({ key: "mlcape", unit: "J kg-1" });
    const scale = chooseColourScale(field, { min: 0, max: 4578 });
    if (scale.kind === "categorical") throw new Error("expected a ramp");
    // Derived in closed form: the ramp runs 0–5000 with ticks every 1000; the ends are left out.
    expect(contourLevels(field, scale).map((level) => level.value)).toEqual([1000, 2000, 3000, 4000]);
  });

  it("converts display ticks back to stored units", () => {
    const field = describeMapField({ key: "shear_0_6km", unit: "m s-1" });
    const scale = chooseColourScale(field, { min: 0, max: 20 });
    if (scale.kind === "categorical") throw new Error("expected a ramp");
    const levels = contourLevels(field, scale);
    // Derived in closed form: 20 m/s = 38.9 kt, so the ramp runs 0–40 kt with ticks every 5 kt.
    expect(levels.map((level) => level.display)).toEqual([5, 10, 15, 20, 25, 30, 35]);
    // Source: BIPM SI Brochure, 9th ed. (2019), Table 8: 1 kt = 1852/3600 m/s.
    expect(levels[1]!.value).toBeCloseTo(10 * (1852 / 3600), 9);
  });

  it("places a line where a linear field crosses the level, in grid indices", () => {
    const nx = 8;
    const ny = 6;
    const values = new Float32Array(nx * ny);
    for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) values[j * nx + i] = 100 * i;
    const [level] = traceContours(values, nx, ny, [{ value: 250, display: 250 }]);
    const { points, starts } = level!.rings;
    expect(starts.length).toBeGreaterThan(1);
    // Derived in closed form: 100·i = 250 at i = 2.5; the line runs the full height of the grid.
    let inner = 0;
    for (let v = 0; v < points.length / 2; v++) {
      const i = points[v * 2]!;
      const j = points[v * 2 + 1]!;
      if (j > -0.5 && j < ny - 0.5) {
        expect(i).toBeCloseTo(2.5, 6);
        inner++;
      }
    }
    expect(inner).toBeGreaterThan(0);
  });

  it("leaves out the stretches that only close a ring along the grid's edge", () => {
    const nx = 6;
    const ny = 6;
    const values = new Float32Array(nx * ny).fill(1000);
    const [level] = traceContours(values, nx, ny, [{ value: 500, display: 500 }]);
    // Every value is above the level, so the only "contour" is the grid's border: nothing is drawn.
    expect(level!.rings.points.length).toBe(0);
  });

  it("treats missing values as below every level", () => {
    const nx = 7;
    const ny = 7;
    const values = new Float32Array(nx * ny).fill(Number.NaN);
    for (let j = 2; j <= 4; j++) for (let i = 2; i <= 4; i++) values[j * nx + i] = 10;
    const [level] = traceContours(values, nx, ny, [{ value: 5, display: 5 }]);
    // One ring around the valued 3 × 3 block (i, j = 2…4), halfway to the missing cells around it
    // (d3-contour's rule for a neighbour without a value).
    const { points } = level!.rings;
    expect(points.length).toBeGreaterThan(0);
    for (let v = 0; v < points.length / 2; v++) {
      for (const coordinate of [points[v * 2]!, points[v * 2 + 1]!]) {
        expect(coordinate).toBeGreaterThanOrEqual(1.5);
        expect(coordinate).toBeLessThanOrEqual(4.5);
      }
    }
  });
});

describe("contours of large grids", () => {
  it("traces a large grid from block means and puts the lines back on the fine grid", () => {
    const nx = 40;
    const ny = 30;
    const values = new Float32Array(nx * ny);
    for (let j = 0; j < ny; j++) for (let i = 0; i < nx; i++) values[j * nx + i] = 100 * i;
    // 1200 points with at most 300 allowed: 2 × 2 blocks. Derived in closed form: ⌈√(1200 / 300)⌉ = 2.
    expect(contourBlockSize(nx, ny, 300)).toBe(2);
    const [level] = traceContours(values, nx, ny, [{ value: 1200, display: 1200 }], 300);
    const { points } = level!.rings;
    expect(points.length).toBeGreaterThan(0);
    // Derived in closed form: the field is linear, so block means stay on it and 100·i = 1200 at i = 12 exactly.
    for (let v = 0; v < points.length / 2; v++) expect(points[v * 2]!).toBeCloseTo(12, 5);
  });

  it("averages whole blocks, skipping missing values and the partial edge blocks", () => {
    const values = Float32Array.from([
      1, 3, 10, Number.NaN, 7,
      5, 7, 20, Number.NaN, 7,
      Number.NaN, Number.NaN, 2, 2, 7,
    ]);
    const means = blockMeans(values, 5, 3, 2);
    // Derived in closed form: blocks (0,0) = mean(1, 3, 5, 7) = 4 and (1,0) = mean(10, 20) = 15; the fifth column and third row are partial.
    expect(means).toMatchObject({ nx: 2, ny: 1 });
    expect([...means.values]).toEqual([4, 15]);
    expect([...blockMeans(Float32Array.from([Number.NaN, Number.NaN, Number.NaN, Number.NaN]), 2, 2, 2).values]).toEqual([Number.NaN]);
  });
});
