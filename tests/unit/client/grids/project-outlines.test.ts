import fs from "node:fs";
import { describe, expect, it } from "vitest";
import { mesh } from "topojson-client";
import type { GeometryCollection, Topology } from "topojson-specification";
import { polylineCount, projectOutlines, type GridPolylines } from "../../../../src/components/map/project-outlines.ts";
import { demoGeometry } from "../../../../server/demo/demo-domain.ts";
import { projectionForGeometry } from "../../../../shared/grid/projection.ts";
import type { LatLonGeometry } from "../../../../shared/grid/geometry-types.ts";

/** A 1° latitude–longitude grid over 30–40° N, 100–90° W (11 × 11 points). */
const box: LatLonGeometry = { kind: "latlon", nx: 11, ny: 11, earthRadius: 6_371_229, uvRelativeToGrid: false, lat0: 30, lon0: -100, dlat: 1, dlon: 1 };

const line = (lines: GridPolylines, k: number) => {
  const out: Array<[number, number]> = [];
  for (let v = lines.starts[k]!; v < lines.starts[k + 1]!; v++) out.push([lines.points[v * 2]!, lines.points[v * 2 + 1]!]);
  return out;
};

describe("projectOutlines", () => {
  it("keeps the part of a line that lies on the grid, vertex by vertex", () => {
    // Along 35° N from 105° W to 85° W, one vertex per degree.
    const parallel = Array.from({ length: 21 }, (_, k) => [-105 + k, 35] as const);
    const projected = projectOutlines(box, [parallel]);
    expect(polylineCount(projected)).toBe(1);
    // Derived in closed form: 100° W … 90° W are i = 0 … 10; 35° N is j = 5. Vertices at 101° W and 89° W lie off the drawn area.
    expect(line(projected, 0)).toEqual(Array.from({ length: 11 }, (_, i) => [i, 5]));
  });

  it("breaks a line where it leaves the grid and starts again where it comes back", () => {
    const zigzag = [[-99, 31], [-98, 32], [-98, 45], [-97, 33], [-96, 34]] as const;
    const projected = projectOutlines(box, [zigzag]);
    // Derived in closed form: (−99, 31) → (1, 1), (−98, 32) → (2, 2), then 45° N is off the grid, (−97, 33) → (3, 3), (−96, 34) → (4, 4).
    expect(polylineCount(projected)).toBe(2);
    expect(line(projected, 0)).toEqual([[1, 1], [2, 2]]);
    expect(line(projected, 1)).toEqual([[3, 3], [4, 4]]);
  });

  it("drops a lone vertex and a line that never touches the grid", () => {
    const projected = projectOutlines(box, [[[-95, 35]], [[-60, 10], [-59, 11]]]);
    expect(polylineCount(projected)).toBe(0);
    expect(projected.points.length).toBe(0);
  });

  it("does not draw across a global grid where a line crosses the antimeridian", () => {
    const world: LatLonGeometry = { kind: "latlon", nx: 360, ny: 181, earthRadius: 6_371_229, uvRelativeToGrid: false, lat0: -90, lon0: 0, dlat: 1, dlon: 1 };
    const crossing = [[178, 0], [179, 0], [-179, 0], [-178, 0]] as const;
    const projected = projectOutlines(world, [crossing]);
    for (let k = 0; k < polylineCount(projected); k++) {
      const vertices = line(projected, k);
      for (let v = 1; v < vertices.length; v++) expect(Math.abs(vertices[v]![0] - vertices[v - 1]![0])).toBeLessThan(5);
    }
  });

  it("carries Lambert grid points back to their own indices", () => {
    const lambert = demoGeometry();
    const projection = projectionForGeometry(lambert);
    const points = [[10, 20], [50.5, 41], [99, 83]].map(([i, j]) => {
      const at = projection.gridToLatLon(i!, j!, { lat: 0, lon: 0 });
      return [at.lon, at.lat] as const;
    });
    const projected = projectOutlines(lambert, [points]);
    // Derived in closed form: forward after inverse through the same conformal plane is the identity (to float32 precision).
    const back = line(projected, 0);
    expect(back).toHaveLength(3);
    [[10, 20], [50.5, 41], [99, 83]].forEach(([i, j], k) => {
      expect(back[k]![0]).toBeCloseTo(i!, 3);
      expect(back[k]![1]).toBeCloseTo(j!, 3);
    });
  });

  it("puts the real Kansas–Oklahoma line on the demo grid along 37° N", () => {
    const topology = JSON.parse(fs.readFileSync("node_modules/us-atlas/states-10m.json", "utf8")) as Topology<{ states: GeometryCollection }>;
    const borders = mesh(topology, topology.objects.states, (a, b) => a !== b).coordinates;
    const lambert = demoGeometry();
    const projected = projectOutlines(lambert, borders);
    expect(polylineCount(projected)).toBeGreaterThan(5);
    const projection = projectionForGeometry(lambert);
    const on37: number[] = [];
    for (let v = 0; v < projected.points.length / 2; v++) {
      const i = projected.points[v * 2]!;
      const j = projected.points[v * 2 + 1]!;
      // Every kept vertex lies on the drawn grid area.
      expect(i).toBeGreaterThanOrEqual(-0.5);
      expect(i).toBeLessThanOrEqual(lambert.nx - 0.5);
      expect(j).toBeGreaterThanOrEqual(-0.5);
      expect(j).toBeLessThanOrEqual(lambert.ny - 0.5);
      const at = projection.gridToLatLon(i, j, { lat: 0, lon: 0 });
      if (Math.abs(at.lat - 37) < 0.02 && at.lon > -102.05 && at.lon < -94.6) on37.push(at.lon);
    }
    // From memory: the Kansas–Oklahoma boundary (with Colorado's southern corner) runs along 37° N
    // from 102° W to about 94.6° W (US Census state boundaries). Its vertices there must span that stretch.
    expect(Math.min(...on37)).toBeLessThan(-101.5);
    expect(Math.max(...on37)).toBeGreaterThan(-95.2);
  });
});
