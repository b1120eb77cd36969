import type { ColumnWorkspace } from "../parcel/column-workspace.ts";
import { valueAtHeight } from "../kinematics/wind-profile.ts";

/** Environmental lapse rate (K km⁻¹, positive when T falls with height) from 2-m T to 3 km AGL (T interpolated at 3 km). */
export function lapseRate0To3Km(ws: ColumnWorkspace): number {
  const t3 = valueAtHeight(ws, ws.temperature, 3000);
  return (ws.temperature[0] - t3) / 3;
}

/** Value of a level quantity at a pressure (Pa), linear in ln p; NaN outside the column. */
export function valueAtPressure(ws: ColumnWorkspace, values: ArrayLike<number>, pressure: number): number {
  const n = ws.count;
  const p = ws.pressure;
  if (n < 2 || !(pressure <= p[0]) || !(pressure >= p[n - 1])) return Number.NaN;
  let k = 0;
  while (k < n - 2 && p[k + 1] > pressure) k++;
  const lnP = ws.lnPressure;
  const span = lnP[k] - lnP[k + 1];
  const f = span > 0 ? (lnP[k] - Math.log(pressure)) / span : 0;
  return values[k] + f * (values[k + 1] - values[k]);
}

/**
 * 700-500 hPa lapse rate (K km⁻¹): (T700 − T500) / (Z500 − Z700); undefined where the surface is above 700 hPa.
 * Common practice (no single source); checked against the U.S. Standard Atmosphere (6.5 K km⁻¹).
 */
export function lapseRate700To500(ws: ColumnWorkspace): number {
  if (!(ws.count >= 2) || ws.pressure[0] < 70000) return Number.NaN;
  const t700 = valueAtPressure(ws, ws.temperature, 70000);
  const t500 = valueAtPressure(ws, ws.temperature, 50000);
  const z700 = valueAtPressure(ws, ws.height, 70000);
  const z500 = valueAtPressure(ws, ws.height, 50000);
  return ((t700 - t500) / (z500 - z700)) * 1000;
}
