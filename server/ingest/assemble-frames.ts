import { geometryKey } from "../../shared/grid/geometry-key.ts";
import type { GridGeometry } from "../../shared/grid/geometry-types.ts";
import { rotateGridToEarth, rotationAngleArray } from "../../shared/grid/wind-rotation.ts";
import type { ColumnGrid, HumidityField, HumidityKind } from "../../shared/meteo/column/column-grid.ts";
import { describeLevel, type GridRecord, type ModelParameter } from "./grid-record.ts";

/** One valid time of one run, ready for the column and jet diagnostics. Winds are Earth-relative. */
export interface FrameInput {
  model: string;
  runTime: string;
  validTime: string;
  forecastHour: number;
  geometry: GridGeometry;
  /** Isobaric levels (Pa), decreasing; 3-D arrays in `grid` are level-major in this order. */
  levels: number[];
  grid: ColumnGrid;
  /** True when the file carried no surface height and it was derived from the isobaric heights. */
  surfaceHeightDerived: boolean;
}

export interface AssembledFrames {
  frames: FrameInput[];
  /** Fields present in the file but not used, one readable line each. */
  ignored: string[];
}

/** A file that cannot become a frame: the message lists what is missing or inconsistent. */
export class FrameAssemblyError extends Error {}

const HUMIDITY_PREFERENCE: ReadonlyArray<[ModelParameter, HumidityKind]> = [
  ["dewpoint", "dewpoint"],
  ["relative_humidity", "relativeHumidity"],
  ["specific_humidity", "specificHumidity"],
];

const LABEL: Record<ModelParameter, string> = {
  temperature: "temperature",
  dewpoint: "dewpoint",
  relative_humidity: "relative humidity",
  specific_humidity: "specific humidity",
  u_wind: "u wind",
  v_wind: "v wind",
  geopotential_height: "geopotential height",
  pressure: "surface pressure",
  surface_height: "surface height",
};

const recordLabel = (r: GridRecord) => `${r.sourceName} at ${describeLevel(r)}`;

class FrameGroup {
  readonly isobaric = new Map<ModelParameter, Map<number, GridRecord>>();
  readonly near = new Map<string, GridRecord>();
  readonly all: GridRecord[] = [];
  constructor(readonly first: GridRecord) {}

  add(r: GridRecord): void {
    this.all.push(r);
    if (!r.parameter) return;
    if (r.levelKind === "isobaric") {
      let byLevel = this.isobaric.get(r.parameter);
      if (!byLevel) this.isobaric.set(r.parameter, (byLevel = new Map()));
      byLevel.set(r.level, r);
    } else {
      this.near.set(`${r.parameter}|${r.levelKind}|${r.level}`, r);
    }
  }

  surface(parameter: ModelParameter, kind: GridRecord["levelKind"], level: number): GridRecord | undefined {
    return this.near.get(`${parameter}|${kind}|${level}`);
  }
}

/** Groups decoded records into frames (one per model, run time and valid time) and checks each. */
export function assembleFrames(records: readonly GridRecord[]): AssembledFrames {
  if (records.length === 0) throw new FrameAssemblyError("The file holds no fields.");
  const groups = new Map<string, FrameGroup>();
  for (const raw of records) {
    // One spelling of every time, so "…T12:00:00Z" and "…T12:00:00.000Z" are the same run.
    const r = { ...raw, runTime: canonicalTime(raw.runTime, raw), validTime: canonicalTime(raw.validTime, raw) };
    const key = `${r.model}|${r.runTime}|${r.validTime}`;
    let group = groups.get(key);
    if (!group) groups.set(key, (group = new FrameGroup(r)));
    group.add(r);
  }
  const frames: FrameInput[] = [];
  const ignored = new Set<string>();
  for (const group of [...groups.values()].sort((a, b) => a.first.validTime.localeCompare(b.first.validTime))) {
    const { frame, used } = buildFrame(group);
    frames.push(frame);
    for (const r of group.all) if (!used.has(r)) ignored.add(recordLabel(r));
  }
  return { frames, ignored: [...ignored].sort() };
}

function buildFrame(group: FrameGroup): { frame: FrameInput; used: Set<GridRecord> } {
  const { model, runTime, validTime } = group.first;
  const when = `${validTime} (run ${runTime})`;
  const missing: string[] = [];
  const used = new Set<GridRecord>();

  // Humidity: the first form available on every level that has the other four fields.
  const core: ModelParameter[] = ["temperature", "u_wind", "v_wind", "geopotential_height"];
  const coreLevels = intersectLevels(core.map((p) => group.isobaric.get(p)));
  let humidity: [ModelParameter, HumidityKind] | undefined;
  let levels: number[] = [];
  for (const candidate of HUMIDITY_PREFERENCE) {
    const withHumidity = intersectLevels([group.isobaric.get(candidate[0])], coreLevels);
    if (withHumidity.length > levels.length) {
      levels = withHumidity;
      humidity = candidate;
    }
  }
  for (const p of core) if (!group.isobaric.has(p)) missing.push(`isobaric ${LABEL[p]}`);
  if (!humidity) missing.push("isobaric humidity (dewpoint, relative or specific humidity)");
  else if (levels.length < 3) missing.push(`at least 3 complete isobaric levels (found ${levels.length})`);

  const surfacePressure = group.surface("pressure", "surface", 0);
  const t2 = group.surface("temperature", "height_above_ground", 2);
  const surfaceHumidity = HUMIDITY_PREFERENCE.map(([p, kind]) => [group.surface(p, "height_above_ground", 2), kind] as const).find(([r]) => r);
  const u10 = group.surface("u_wind", "height_above_ground", 10);
  const v10 = group.surface("v_wind", "height_above_ground", 10);
  const zs = group.surface("surface_height", "surface", 0) ?? group.surface("geopotential_height", "surface", 0);
  if (!surfacePressure) missing.push("surface pressure");
  if (!t2) missing.push("2 m temperature");
  if (!surfaceHumidity) missing.push("2 m humidity (dewpoint, relative or specific humidity)");
  if (!u10) missing.push("10 m u wind");
  if (!v10) missing.push("10 m v wind");
  if (missing.length > 0) throw new FrameAssemblyError(`Missing required fields for ${when}: ${missing.join("; ")}.`);

  const geometry = group.first.geometry;
  const key = geometryKey(geometry);
  const n = geometry.nx * geometry.ny;
  const pick = (r: GridRecord): Float32Array => {
    if (geometryKey(r.geometry) !== key) {
      throw new FrameAssemblyError(`${recordLabel(r)} is on a different grid from the other fields of ${when}.`);
    }
    if (r.values.length !== n) throw new FrameAssemblyError(`${recordLabel(r)} has ${r.values.length} values, expected ${n}.`);
    used.add(r);
    return r.values;
  };

  levels.sort((a, b) => b - a);
  const stack = (p: ModelParameter): Float32Array => {
    const out = new Float32Array(levels.length * n);
    const byLevel = group.isobaric.get(p)!;
    levels.forEach((level, k) => out.set(pick(byLevel.get(level)!), k * n));
    return out;
  };
  const temperature = stack("temperature");
  const u = stack("u_wind");
  const v = stack("v_wind");
  const height = stack("geopotential_height");
  const humidityValues = stack(humidity![0]);
  const surface = {
    pressure: pick(surfacePressure!),
    temperature: pick(t2!),
    humidity: { kind: surfaceHumidity![1], values: pick(surfaceHumidity![0]!) } as HumidityField,
    u: Float32Array.from(pick(u10!)),
    v: Float32Array.from(pick(v10!)),
    height: zs ? pick(zs) : surfaceHeightFromIsobaric(levels, height, pick(surfacePressure!), n),
  };
  if (geometry.kind !== "latlon" && geometry.uvRelativeToGrid) {
    const theta = rotationAngleArray(geometry);
    rotateGridToEarth(surface.u, surface.v, theta);
    for (let k = 0; k < levels.length; k++) rotateGridToEarth(u.subarray(k * n, (k + 1) * n), v.subarray(k * n, (k + 1) * n), theta);
  }
  const grid: ColumnGrid = {
    pointCount: n,
    levelPressures: levels,
    temperature,
    humidity: { kind: humidity![1], values: humidityValues },
    height,
    u,
    v,
    surface,
  };
  const forecastHour = (Date.parse(validTime) - Date.parse(runTime)) / 3_600_000;
  return {
    frame: { model, runTime, validTime, forecastHour, geometry: { ...geometry, uvRelativeToGrid: false }, levels, grid, surfaceHeightDerived: !zs },
    used,
  };
}

function canonicalTime(iso: string, record: GridRecord): string {
  const ms = Date.parse(iso);
  if (!Number.isFinite(ms)) throw new FrameAssemblyError(`${recordLabel(record)} carries an unreadable time "${iso}".`);
  return new Date(ms).toISOString();
}

function intersectLevels(maps: Array<Map<number, GridRecord> | undefined>, start?: number[]): number[] {
  let levels = start ?? (maps[0] ? [...maps[0].keys()] : []);
  for (const m of maps) levels = m ? levels.filter((l) => m.has(l)) : [];
  return levels;
}

/**
 * Ground height where the file has none: the isobaric geopotential height interpolated linearly
 * in ln p to the surface pressure (extrapolated from the two lowest levels when the ground lies
 * below the lowest level).
 */
export function surfaceHeightFromIsobaric(levels: number[], height: Float32Array, surfacePressure: Float32Array, n: number): Float32Array {
  const out = new Float32Array(n);
  const lnp = levels.map(Math.log);
  for (let i = 0; i < n; i++) {
    const lnps = Math.log(surfacePressure[i]!);
    let k = 0;
    while (k < levels.length - 2 && lnp[k + 1]! >= lnps) k++;
    const z0 = height[k * n + i]!;
    const z1 = height[(k + 1) * n + i]!;
    out[i] = z0 + ((z1 - z0) * (lnps - lnp[k]!)) / (lnp[k + 1]! - lnp[k]!);
  }
  return out;
}
