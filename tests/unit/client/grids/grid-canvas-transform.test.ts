import { describe, expect, it } from "vitest";
import { canvasToGrid, cellAspect, cellAtCanvas, fitGridToBox, gridToCanvas } from "../../../../src/components/map/grid-canvas-transform.ts";
import { demoGeometry } from "../../../../server/demo/demo-domain.ts";
import type { LatLonGeometry } from "../../../../shared/grid/geometry-types.ts";

describe("fitting the grid into the page", () => {
  it("fills the width when the grid is wide, the height when it is tall", () => {
    // Derived in closed form: 100 × 50 square cells in 800 × 600 → 800 × 400, 8 px per cell.
    expect(fitGridToBox(100, 50, 1, 800, 600)).toMatchObject({ width: 800, height: 400, cellWidth: 8, cellHeight: 8 });
    // 50 × 100 in 800 × 600 → height-limited: 300 × 600, 6 px per cell.
    expect(fitGridToBox(50, 100, 1, 800, 600)).toMatchObject({ width: 300, height: 600, cellWidth: 6, cellHeight: 6 });
  });

  it("keeps the cells' shape in the projection plane", () => {
    const lambert = demoGeometry();
    expect(cellAspect(lambert)).toBe(1); // Derived in closed form: dx = dy = 12 km
    const latlon: LatLonGeometry = { kind: "latlon", nx: 11, ny: 3, earthRadius: 6_371_229, uvRelativeToGrid: false, lat0: 59, lon0: 0, dlat: 1, dlon: 1 };
    // A degree of longitude at 60° N is half a degree of latitude long: cos 60° = 0.5. Derived in closed form.
    expect(cellAspect(latlon)).toBeCloseTo(0.5, 12);
  });
});

describe("canvas ↔ grid", () => {
  const t = fitGridToBox(4, 3, 1, 40, 1000); // 10 px per cell, 40 × 30 px

  it("puts (0, 0) at the south-west cell's centre and north at the top", () => {
    // Derived in closed form: the centre of cell (0, 0) is 5 px from the left and 5 px above the bottom (y = 25).
    expect(gridToCanvas(t, 0, 0, { x: 0, y: 0 })).toEqual({ x: 5, y: 25 });
    expect(gridToCanvas(t, 3, 2, { x: 0, y: 0 })).toEqual({ x: 35, y: 5 });
  });

  it("inverts exactly", () => {
    for (const [i, j] of [[0, 0], [1.25, 0.5], [3, 2], [-0.5, 2.5]] as const) {
      const at = gridToCanvas(t, i, j, { x: 0, y: 0 });
      const back = canvasToGrid(t, at.x, at.y, { i: 0, j: 0 });
      expect(back.i).toBeCloseTo(i, 12);
      expect(back.j).toBeCloseTo(j, 12);
    }
  });

  it("finds the cell under a pixel and nothing off the grid", () => {
    expect(cellAtCanvas(t, 0, 0)).toEqual({ i: 0, j: 2 }); // top-left pixel: west column, north row
    expect(cellAtCanvas(t, 39.9, 29.9)).toEqual({ i: 3, j: 0 }); // bottom-right pixel: east column, south row
    expect(cellAtCanvas(t, 15, 15)).toEqual({ i: 1, j: 1 });
    expect(cellAtCanvas(t, -0.1, 10)).toBeNull();
    expect(cellAtCanvas(t, 10, 30)).toBeNull();
  });
});
