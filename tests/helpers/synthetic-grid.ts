import type { GridRecord, ModelParameter } from "../../server/ingest/grid-record.ts";
import type { LatLonGeometry } from "../../shared/grid/geometry-types.ts";

/**
 * A small made-up model grid (latitude–longitude, a few isobaric levels) for pipeline tests.
 * The atmosphere is invented and only has to be plausible; no test uses it as a check value.
 */
export const SYNTHETIC_GEOMETRY: LatLonGeometry = {
  kind: "latlon",
  nx: 6,
  ny: 5,
  lat0: 34,
  lon0: -100,
  dlat: 0.5,
  dlon: 0.5,
  earthRadius: 6_371_229,
  uvRelativeToGrid: false,
};

const LEVELS_HPA = [1000, 925, 850, 700, 500, 300, 250, 200, 150, 100];

function standardHeight(pHpa: number): number {
  // Hypsometric height of a 288 K surface and 6.5 K/km lapse rate (good enough for a synthetic grid).
  return (288 / 0.0065) * (1 - Math.pow(pHpa / 1013.25, 0.190263));
}

export interface SyntheticOptions {
  runTime?: string;
  validTimes?: string[];
  /** Leave out one parameter, to test the missing-field message. */
  omit?: ModelParameter;
  model?: string;
  /** Multiplies the wind's growth with height (1 = the default profile; 0 = no shear aloft). */
  shearScale?: number;
}

export function syntheticRecords(options: SyntheticOptions = {}): GridRecord[] {
  const runTime = options.runTime ?? "2026-05-14T12:00:00.000Z";
  const validTimes = options.validTimes ?? ["2026-05-14T18:00:00.000Z"];
  const model = options.model ?? "synthetic";
  const g = SYNTHETIC_GEOMETRY;
  const n = g.nx * g.ny;
  const records: GridRecord[] = [];
  const field = (fill: (i: number, j: number) => number) => {
    const values = new Float32Array(n);
    for (let j = 0; j < g.ny; j++) for (let i = 0; i < g.nx; i++) values[j * g.nx + i] = fill(i, j);
    return values;
  };
  for (const validTime of validTimes) {
    const base = { model, runTime, validTime, geometry: g };
    const push = (parameter: ModelParameter, levelKind: GridRecord["levelKind"], level: number, values: Float32Array) => {
      if (parameter !== options.omit) records.push({ ...base, parameter, sourceName: parameter, levelKind, level, values });
    };
    for (const p of LEVELS_HPA) {
      const z = standardHeight(p);
      const t = Math.max(288 - 0.0065 * z, 216.65);
      push("temperature", "isobaric", p * 100, field((i) => t + 0.3 * i));
      push("dewpoint", "isobaric", p * 100, field((i) => t - 4 - (p < 700 ? 15 : 0) + 0.2 * i));
      push("u_wind", "isobaric", p * 100, field(() => 5 + (z / 1000) * 3 * (options.shearScale ?? 1)));
      push("v_wind", "isobaric", p * 100, field((_, j) => 8 - z / 2000 + j * 0.1));
      push("geopotential_height", "isobaric", p * 100, field(() => z));
    }
    push("pressure", "surface", 0, field((i) => 98500 - i * 50));
    push("temperature", "height_above_ground", 2, field((i) => 299 + 0.3 * i));
    push("dewpoint", "height_above_ground", 2, field((i) => 292 + 0.2 * i));
    push("u_wind", "height_above_ground", 10, field(() => 3));
    push("v_wind", "height_above_ground", 10, field(() => 9));
    push("surface_height", "surface", 0, field((i) => 200 + i * 4));
    records.push({ ...base, parameter: null, sourceName: "visibility", levelKind: "surface", level: 0, values: field(() => 10000) });
  }
  return records;
}

/** A few bytes that pass the GRIB2 magic check; the test decoder ignores the content. */
export function fakeGribBytes(tag: string): Buffer {
  return Buffer.concat([Buffer.from("GRIB\0\0\0\x02", "latin1"), Buffer.from(tag)]);
}
