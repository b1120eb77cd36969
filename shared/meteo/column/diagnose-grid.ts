import { COLUMN_FIELD_KEYS, fieldByKey } from "../../fields.ts";
import { LN_REFERENCE_PRESSURE, MOLAR_MASS_RATIO, POISSON_EXPONENT } from "../constants.ts";
import { GridShapeError } from "../errors.ts";
import { ColumnWorkspace } from "../parcel/column-workspace.ts";
import { appendLevel, appendPreparedLevel, beginColumn } from "../parcel/column-loader.ts";
import { dewpointFromVaporPressure, saturationVaporPressure } from "../thermo/saturation-vapor-pressure.ts";
import { getPseudoAdiabatTable } from "../thermo/pseudo-adiabat-table.ts";
import { resolveColumnOptions, type ColumnOptions } from "./column-options.ts";
import { validateColumnGrid, validateColumnGridOutput, type ColumnGrid, type ColumnGridOutput, type HumidityKind } from "./column-grid.ts";
import { computeColumnFields } from "./compute-column-fields.ts";
import { COLUMN_FIELD_COUNT } from "./field-slots.ts";
import { liftSettingsFor } from "./diagnose-column.ts";

export interface PointRange {
  /** First point (inclusive) and end (exclusive); default the whole grid. */
  start: number;
  end: number;
}

/** Dewpoint (K) from any supported humidity form, never above the temperature. */
export function dewpointFrom(kind: HumidityKind, value: number, temperature: number, pressure: number): number {
  let td: number;
  if (kind === "dewpoint") td = value;
  else if (kind === "specificHumidity") td = dewpointFromVaporPressure((value * pressure) / (MOLAR_MASS_RATIO + (1 - MOLAR_MASS_RATIO) * value));
  else td = dewpointFromVaporPressure(value * saturationVaporPressure(temperature));
  return td > temperature ? temperature : td;
}

/**
 * Batch entry point: every column field for every point in `range`, written into preallocated Float32Arrays
 * (NaN = undefined or outside the QC range). Pressure-only terms are computed once per grid and the column
 * workspace is reused, so nothing is allocated per column. Uses the pseudo-adiabat table unless options say
 * otherwise. Results are identical to diagnoseColumn with the same options (up to float32 storage).
 */
export function diagnoseColumnGrid(grid: ColumnGrid, output: ColumnGridOutput, options?: ColumnOptions, range?: PointRange): void {
  validateColumnGrid(grid);
  validateColumnGridOutput(output, grid.pointCount);
  const start = range?.start ?? 0;
  const end = range?.end ?? grid.pointCount;
  if (!(start >= 0 && end <= grid.pointCount && start <= end)) {
    throw new GridShapeError(`range: expected 0 ≤ start ≤ end ≤ ${grid.pointCount}, received ${start}..${end}`);
  }
  const resolved = resolveColumnOptions(options, "table");
  const lift = liftSettingsFor(resolved);
  const table = lift.table;

  // Isobaric levels sorted by decreasing pressure, with their pressure-only terms.
  const levelCount = grid.levelPressures.length;
  const order = Array.from({ length: levelCount }, (_, k) => k).sort((a, b) => grid.levelPressures[b] - grid.levelPressures[a]);
  const levelIndex = Int32Array.from(order);
  const levelP = new Float64Array(levelCount);
  const levelLnP = new Float64Array(levelCount);
  const levelExner = new Float64Array(levelCount);
  const levelRow = new Float64Array(levelCount);
  for (let j = 0; j < levelCount; j++) {
    const p = grid.levelPressures[levelIndex[j]];
    levelP[j] = p;
    levelLnP[j] = Math.log(p);
    levelExner[j] = Math.exp(POISSON_EXPONENT * (levelLnP[j] - LN_REFERENCE_PRESSURE));
    levelRow[j] = table.rowPosition(levelLnP[j]);
  }

  const ws = new ColumnWorkspace(levelCount + 1);
  const raw = new Float64Array(COLUMN_FIELD_COUNT);
  const outputs = COLUMN_FIELD_KEYS.map((key) => output[key]);
  const lows = Float64Array.from(COLUMN_FIELD_KEYS, (key) => fieldByKey(key)!.range[0]);
  const highs = Float64Array.from(COLUMN_FIELD_KEYS, (key) => fieldByKey(key)!.range[1]);
  const n = grid.pointCount;
  const s = grid.surface;
  const humidityKind = grid.humidity.kind;
  const humidity = grid.humidity.values;
  const surfaceHumidityKind = s.humidity.kind;

  for (let point = start; point < end; point++) {
    beginColumn(ws);
    const pSfc = s.pressure[point];
    const tSfc = s.temperature[point];
    const zSfc = s.height[point];
    const tdSfc = dewpointFrom(surfaceHumidityKind, s.humidity.values[point], tSfc, pSfc);
    if (pSfc > 0 && tSfc > 0 && tdSfc > 0) {
      appendLevel(ws, table, pSfc, tSfc, tdSfc, 0, s.u[point], s.v[point]);
      for (let j = 0; j < levelCount; j++) {
        const p = levelP[j];
        if (p >= pSfc) continue;
        const index = levelIndex[j] * n + point;
        const t = grid.temperature[index];
        const z = grid.height[index] - zSfc;
        const td = dewpointFrom(humidityKind, humidity[index], t, p);
        const u = grid.u[index];
        const v = grid.v[index];
        // A level with missing data, or not above the previous one, is left out of this column.
        if (!(t > 0 && td > 0 && z > ws.height[ws.count - 1]) || Number.isNaN(u) || Number.isNaN(v)) continue;
        if (!appendPreparedLevel(ws, p, levelLnP[j], levelExner[j], levelRow[j], t, td, z, u, v)) break;
      }
    }
    computeColumnFields(ws, lift, resolved, raw);
    for (let f = 0; f < COLUMN_FIELD_COUNT; f++) {
      const value = raw[f];
      outputs[f][point] = value >= lows[f] && value <= highs[f] ? value : Number.NaN;
    }
  }
}
