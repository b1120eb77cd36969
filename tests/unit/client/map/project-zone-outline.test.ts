import { describe, expect, it } from "vitest";
import { MAX_EDGE_STEP_DEG, projectZoneOutline } from "../../../../src/components/map/project-zone-outline.ts";
import type { GridPolylines } from "../../../../src/components/map/project-outlines.ts";
import { demoGeometry } from "../../../../server/demo/demo-domain.ts";
import { projectionForGeometry } from "../../../../shared/grid/projection.ts";
import type { LatLonGeometry } from "../../../../shared/grid/geometry-types.ts";
import type { ZoneGeometry } from "../../../../shared/zones/zone-geometry.ts";

/** A 1° latitude–longitude grid over 30–40° N, 100–90° W (11 × 11 points). */
const box: LatLonGeometry = { kind: "latlon", nx: 11, ny: 11, earthRadius: 6_371_229, uvRelativeToGrid: false, lat0: 30, lon0: -100, dlat: 1, dlon: 1 };

const lineOf = (lines: GridPolylines, k: number) => {
  const out: Array<[number, number]> = [];
  for (let v = lines.starts[k]!; v < lines.starts[k + 1]!; v++) out.push([lines.points[v * 2]!, lines.points[v * 2 + 1]!]);
  return out;
};

describe("projectZoneOutline", () => {
  it("carries a ring into grid indices and closes it where it started", () => {
    // A quarter-degree square: each edge is one step long, so no vertex is added.
    const square: ZoneGeometry = { type: "Polygon", coordinates: [[[-95, 35], [-94.75, 35], [-94.75, 35.25], [-95, 35.25], [-95, 35]]] };
    const outline = projectZoneOutline(box, square);
    expect(outline.starts.length - 1).toBe(1);
    // Derived in closed form: on a 1° grid from (30° N, 100° W), i = lon + 100 and j = lat − 30.
    expect(lineOf(outline, 0)).toEqual([[5, 5], [5.25, 5], [5.25, 5.25], [5, 5.25], [5, 5]]);
  });

  it("cuts long edges so the drawn line follows the mask's straight-in-degrees edges", () => {
    const wide: ZoneGeometry = { type: "Polygon", coordinates: [[[-99, 31], [-91, 31], [-91, 32], [-99, 31]]] };
    const outline = projectZoneOutline(box, wide);
    const line = lineOf(outline, 0);
    // Derived in closed form: 8° / 0.25° = 32 pieces, then 1° / 0.25° = 4, then the diagonal's longer side 8° again = 32, plus the closing vertex.
    expect(MAX_EDGE_STEP_DEG).toBe(0.25);
    expect(line.length).toBe(32 + 4 + 32 + 1);
    // Every piece is at most a quarter of a grid length here (1° cells).
    for (let k = 1; k < line.length; k++) {
      expect(Math.abs(line[k]![0] - line[k - 1]![0])).toBeLessThanOrEqual(0.25 + 1e-9);
      expect(Math.abs(line[k]![1] - line[k - 1]![1])).toBeLessThanOrEqual(0.25 + 1e-9);
    }
  });

  it("keeps each ring of a multipolygon (holes included) as its own line", () => {
    const two: ZoneGeometry = {
      type: "MultiPolygon",
      coordinates: [
        [
          [[-99, 31], [-98, 31], [-98, 32], [-99, 31]],
          [[-98.8, 31.1], [-98.2, 31.1], [-98.2, 31.7], [-98.8, 31.1]],
        ],
        [[[-93, 38], [-92, 38], [-92, 39], [-93, 38]]],
      ],
    };
    const outline = projectZoneOutline(box, two);
    expect(outline.starts.length - 1).toBe(3);
    // Derived in closed form: (−93, 38) → (7, 8).
    expect(lineOf(outline, 2)[0]).toEqual([7, 8]);
  });

  it("agrees with the grid's own projection on the demo's Lambert grid", () => {
    const geometry = demoGeometry(40, 30);
    const projection = projectionForGeometry(geometry);
    const corner = projection.gridToLatLon(10, 12, { lat: 0, lon: 0 });
    const tiny: ZoneGeometry = { type: "Polygon", coordinates: [[[corner.lon, corner.lat], [corner.lon + 0.1, corner.lat], [corner.lon, corner.lat + 0.1], [corner.lon, corner.lat]]] };
    const [i, j] = lineOf(projectZoneOutline(geometry, tiny), 0)[0]!;
    // Derived in closed form: the first vertex is the grid point (10, 12) carried there and back (Float32 storage).
    expect(i).toBeCloseTo(10, 3);
    expect(j).toBeCloseTo(12, 3);
  });
});
