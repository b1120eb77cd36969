import { describe, expect, it } from "vitest";
import { fitGridToBox } from "../../../../src/components/map/grid-canvas-transform.ts";
import { axisPolylines, coreDirection, coreLabelBox, downstreamEnd } from "../../../../src/features/grids/jet-layers/axis-projection.ts";

/** A 100 × 80 grid drawn 1000 × 800 px: 10 px per cell, north at the top. */
const map = fitGridToBox(100, 80, 1, 1000, 800);

const straightEast = Array.from({ length: 11 }, (_, k) => ({ i: 20 + 5 * k, j: 40, s: (k - 4) * 60_000 }));
const straightNorth = Array.from({ length: 6 }, (_, k) => ({ i: 10, j: 10 + 6 * k, s: (k - 2) * 72_000 }));

describe("streak axes on the map", () => {
  it("keeps every axis as its own polyline in grid indices, upstream first", () => {
    const lines = axisPolylines([{ axis: straightEast }, { axis: straightNorth }]);
    expect(Array.from(lines.starts)).toEqual([0, 11, 17]);
    expect([lines.points[0], lines.points[1]]).toEqual([20, 40]);
    expect([lines.points[20], lines.points[21]]).toEqual([70, 40]);
    expect([lines.points[22], lines.points[23]]).toEqual([10, 10]);
    expect(axisPolylines([]).starts).toEqual(new Uint32Array([0]));
  });

  it("points the arrowhead downstream on the screen, where north is up", () => {
    // Derived in closed form: cell (i, j) is centred at ((i + 0.5)·10, (80 − 0.5 − j)·10) px.
    const east = downstreamEnd(straightEast, map)!;
    expect([east.x, east.y]).toEqual([705, 395]);
    expect(east.dirX).toBeCloseTo(1, 12);
    expect(east.dirY).toBeCloseTo(0, 12);
    const north = downstreamEnd(straightNorth, map)!;
    expect(north.dirX).toBeCloseTo(0, 12);
    expect(north.dirY).toBeCloseTo(-1, 12);
    expect(downstreamEnd(straightEast.slice(0, 1), map)).toBeNull();
  });

  it("reads the axis direction at the core, the vertex where s is nearest zero", () => {
    const bent = [
      { i: 10, j: 10, s: -200 },
      { i: 20, j: 10, s: -100 },
      { i: 30, j: 10, s: 0 },
      { i: 30, j: 20, s: 100 },
      { i: 30, j: 30, s: 200 },
    ];
    // Derived in closed form: from vertex 0 (10, 10) to vertex 4 (30, 30), up and to the right at 45°.
    const direction = coreDirection(bent, map);
    expect(direction.x).toBeCloseTo(Math.SQRT1_2, 12);
    expect(direction.y).toBeCloseTo(-Math.SQRT1_2, 12);
  });

  it("puts the core's label on the left of the flow, and on the right when the left would leave the map", () => {
    const size = { width: 120, height: 20 };
    // A westerly: left is north, so the box sits above the core.
    const above = coreLabelBox({ x: 500, y: 400 }, { x: 1, y: 0 }, size, map);
    expect(above.y + size.height).toBeLessThan(400);
    expect(above.x + size.width / 2).toBeCloseTo(500, 9);
    // Near the top edge the box goes below the core instead.
    const below = coreLabelBox({ x: 500, y: 10 }, { x: 1, y: 0 }, size, map);
    expect(below.y).toBeGreaterThan(10);
    // A southerly (flowing up the screen): left is west.
    const west = coreLabelBox({ x: 500, y: 400 }, { x: 0, y: -1 }, size, map);
    expect(west.x + size.width).toBeLessThan(500);
  });

  it("keeps the label inside the map near its corners", () => {
    const size = { width: 120, height: 20 };
    const box = coreLabelBox({ x: 995, y: 5 }, { x: 1, y: 0 }, size, map);
    expect(box.x).toBeGreaterThanOrEqual(2);
    expect(box.x + size.width).toBeLessThanOrEqual(998);
    expect(box.y).toBeGreaterThanOrEqual(2);
    expect(box.y + size.height).toBeLessThanOrEqual(798);
  });
});
