import { describe, expect, it } from "vitest";
import type { LatLonGeometry } from "../../../shared/grid/geometry-types.ts";
import type { ColumnGrid } from "../../../shared/meteo/column/column-grid.ts";
import { gridHemisphere, isobaricLevelsFromColumnGrid, jetInputFromLevels } from "../../../shared/meteo/jet/jet-input.ts";
import { computeJetFields } from "../../../shared/meteo/jet/compute-jet-fields.ts";
import { QUADRANT } from "../../../shared/meteo/jet/labels.ts";

function latLon(lat0: number): LatLonGeometry {
  return { kind: "latlon", nx: 161, ny: 81, earthRadius: 6_371_229, uvRelativeToGrid: false, lat0, lon0: -140, dlat: 0.5, dlon: 0.5 };
}

describe("jet input from a frame's isobaric levels", () => {
  it("tells the hemisphere from the grid centre", () => {
    expect(gridHemisphere(latLon(20))).toBe("north");
    expect(gridHemisphere(latLon(-60))).toBe("south");
    expect(gridHemisphere({ kind: "fplane", nx: 3, ny: 3, dx: 1, dy: 1, coriolis: -1e-4, uvRelativeToGrid: true })).toBe("south");
  });

  it("views each level of a column grid without copying", () => {
    const n = 4;
    const levelMajor = (offset: number) => Float32Array.from({ length: 3 * n }, (_, k) => offset + k);
    const grid = { pointCount: n, levelPressures: [85_000, 70_000, 25_000], u: levelMajor(0), v: levelMajor(100), height: levelMajor(200), temperature: levelMajor(300) } as unknown as ColumnGrid;
    const levels = isobaricLevelsFromColumnGrid(grid);
    expect(levels.map((l) => l.pressure)).toEqual([85_000, 70_000, 25_000]);
    expect(Array.from(levels[2].u)).toEqual([8, 9, 10, 11]);
    expect(levels[1].temperature!.buffer).toBe(grid.temperature.buffer);
  });

  it("picks the seasonal jet level and the 850/700 hPa levels", () => {
    const geometry = latLon(20);
    const n = geometry.nx * geometry.ny;
    const make = (pressure: number) => ({ pressure, u: new Float32Array(n), v: new Float32Array(n), height: new Float32Array(n), temperature: new Float32Array(n) });
    const levels = [make(85_000), make(70_000), make(30_000), make(25_000)];
    const winter = jetInputFromLevels(geometry, levels, "2026-01-10T00:00:00Z");
    expect(winter.input.jetLevelPressure).toBe(30_000);
    expect(winter.input.u).toBe(levels[2].u);
    expect(winter.input.p850?.temperature).toBe(levels[0].temperature);
    expect(winter.input.p700?.u).toBe(levels[1].u);
    expect(jetInputFromLevels(geometry, levels, "2026-07-10T00:00:00Z").input.jetLevelPressure).toBe(25_000);
  });
});

describe("a jet streak on a latitude–longitude grid", () => {
  // A 60 m/s westerly streak centred at 40°N 100°W in a 20 m/s westerly current, Earth-relative winds.
  const geometry = latLon(20);
  const n = geometry.nx * geometry.ny;
  const u = new Float32Array(n);
  for (let j = 0; j < geometry.ny; j++) {
    for (let i = 0; i < geometry.nx; i++) {
      const lat = geometry.lat0 + j * geometry.dlat;
      const lon = geometry.lon0 + i * geometry.dlon;
      u[j * geometry.nx + i] = 20 + 40 * Math.exp(-(((lon + 100) / 12) ** 2) - ((lat - 40) / 3) ** 2);
    }
  }
  const result = computeJetFields({ geometry, u, v: new Float32Array(n), height: new Float32Array(n).fill(10_000) });
  const at = (lat: number, lon: number) => Math.round((lat - geometry.lat0) / geometry.dlat) * geometry.nx + Math.round((lon - geometry.lon0) / geometry.dlon);

  it("reports the core in latitude and longitude", () => {
    expect(result.streaks).toHaveLength(1);
    // Derived in closed form: the streak is centred at 40°N, 100°W.
    expect(result.streaks[0].core.lat).toBeCloseTo(40, 0);
    expect(result.streaks[0].core.lon).toBeCloseTo(-100, 0);
    expect(result.streaks[0].axis[0].lon).toBeLessThan(-110);
  });

  it("labels north of the axis as left and downstream as exit", () => {
    expect(result.fields.jet_quadrant[at(41.5, -92)]).toBe(QUADRANT.leftExit);
    expect(result.fields.jet_quadrant[at(38.5, -108)]).toBe(QUADRANT.rightEntrance);
  });
});
