import { LN_REFERENCE_PRESSURE, MOLAR_MASS_RATIO, POISSON_EXPONENT } from "../constants.ts";
import { saturationVaporPressure } from "../thermo/saturation-vapor-pressure.ts";
import { virtualTemperature } from "../thermo/temperature.ts";
import type { PseudoAdiabatTable } from "../thermo/pseudo-adiabat-table.ts";
import type { ColumnWorkspace } from "./column-workspace.ts";

/** Parcel work stops at 100 hPa: levels above it are ignored (the EL search ends there). */
export const COLUMN_TOP_PRESSURE = 10000;

export function beginColumn(ws: ColumnWorkspace): void {
  ws.count = 0;
}

/**
 * Appends one level when its pressure-only terms are already known (isobaric grids compute ln p,
 * the Exner factor and the table row once per grid, not once per column). Returns false when the
 * workspace is full or the level lies above the column top.
 */
export function appendPreparedLevel(
  ws: ColumnWorkspace,
  pressure: number,
  lnPressure: number,
  exner: number,
  tableRow: number,
  temperature: number,
  dewpoint: number,
  heightAgl: number,
  u: number,
  v: number,
): boolean {
  const k = ws.count;
  if (k >= ws.capacity || pressure < COLUMN_TOP_PRESSURE) return false;
  const e = saturationVaporPressure(dewpoint);
  const r = (MOLAR_MASS_RATIO * e) / (pressure - e);
  ws.pressure[k] = pressure;
  ws.lnPressure[k] = lnPressure;
  ws.exner[k] = exner;
  ws.tableRow[k] = tableRow;
  ws.temperature[k] = temperature;
  ws.dewpoint[k] = dewpoint;
  ws.vaporPressure[k] = e;
  ws.mixingRatio[k] = r;
  ws.virtualTemperature[k] = virtualTemperature(temperature, r);
  ws.height[k] = heightAgl;
  ws.u[k] = u;
  ws.v[k] = v;
  ws.count = k + 1;
  return true;
}

/** Appends one level, deriving the pressure-only terms here (surface level, soundings). */
export function appendLevel(
  ws: ColumnWorkspace,
  table: PseudoAdiabatTable,
  pressure: number,
  temperature: number,
  dewpoint: number,
  heightAgl: number,
  u: number,
  v: number,
): boolean {
  const lnPressure = Math.log(pressure);
  const exner = Math.exp(POISSON_EXPONENT * (lnPressure - LN_REFERENCE_PRESSURE));
  return appendPreparedLevel(ws, pressure, lnPressure, exner, table.rowPosition(lnPressure), temperature, dewpoint, heightAgl, u, v);
}
