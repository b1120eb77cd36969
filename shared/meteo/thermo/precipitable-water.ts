import { STANDARD_GRAVITY } from "../constants.ts";
import type { ColumnWorkspace } from "../parcel/column-workspace.ts";

/** Top of the precipitable-water integral (Pa). */
export const PRECIPITABLE_WATER_TOP = 30000;

/**
 * Precipitable water (kg m⁻² ≡ mm): PW = (1/g) ∫ q dp from the surface to 300 hPa, trapezoid in p, with q at
 * 300 hPa interpolated linearly in ln p (hydrostatic column water; e.g. Wallace and Hobbs 2006, ch. 3).
 * NaN when the column does not reach 300 hPa.
 */
export function precipitableWater(ws: ColumnWorkspace): number {
  const n = ws.count;
  const p = ws.pressure;
  if (n < 2 || p[0] <= PRECIPITABLE_WATER_TOP || p[n - 1] > PRECIPITABLE_WATER_TOP) return Number.NaN;
  const r = ws.mixingRatio;
  let sum = 0;
  let k = 0;
  let qPrev = r[0] / (1 + r[0]);
  for (; k + 1 < n && p[k + 1] >= PRECIPITABLE_WATER_TOP; k++) {
    const q = r[k + 1] / (1 + r[k + 1]);
    sum += 0.5 * (qPrev + q) * (p[k] - p[k + 1]);
    qPrev = q;
  }
  if (p[k] > PRECIPITABLE_WATER_TOP) {
    const qNext = r[k + 1] / (1 + r[k + 1]);
    const f = (ws.lnPressure[k] - Math.log(PRECIPITABLE_WATER_TOP)) / (ws.lnPressure[k] - ws.lnPressure[k + 1]);
    const qTop = qPrev + f * (qNext - qPrev);
    sum += 0.5 * (qPrev + qTop) * (p[k] - PRECIPITABLE_WATER_TOP);
  }
  return sum / STANDARD_GRAVITY;
}
