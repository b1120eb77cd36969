import type { ColumnWorkspace } from "./column-workspace.ts";
import type { LiftSettings } from "./lift-parcel.ts";
import { liftLevelParcel } from "./parcel-sources.ts";

/** Qualifying parcel: CAPE ≥ 100 J kg⁻¹ and CIN ≥ −250 J kg⁻¹ (Thompson et al. 2007). */
export const EFFECTIVE_MIN_CAPE = 100;
export const EFFECTIVE_MIN_CIN = -250;
/** Bellwether limits: the base is searched in the lowest 300 hPa, the top no higher than 500 hPa (inclusive). */
export const EFFECTIVE_BASE_SEARCH_DEPTH = 30000;
export const EFFECTIVE_TOP_LIMIT_PRESSURE = 50000;

export class EffectiveLayer {
  present = false;
  baseLevel = -1;
  topLevel = -1;
  baseHeight = Number.NaN;
  topHeight = Number.NaN;

  clear(): void {
    this.present = false;
    this.baseLevel = -1;
    this.topLevel = -1;
    this.baseHeight = Number.NaN;
    this.topHeight = Number.NaN;
  }
}

/**
 * Effective inflow layer (Thompson et al. 2007): lifting a parcel from each level upward, the base is the first
 * qualifying level and the top the last level of that first contiguous run of qualifying levels.
 * Parcels are lifted only as far as needed: the search ends at the first failing level after the run.
 * If the most-unstable CAPE is under 100 J kg⁻¹ no level is tried (the MU parcel is taken as the column's
 * most buoyant one, a shortcut that saves almost all the work on stable columns).
 */
export function findEffectiveInflowLayer(ws: ColumnWorkspace, settings: LiftSettings, mostUnstableCape: number, out: EffectiveLayer): void {
  out.clear();
  if (!(mostUnstableCape >= EFFECTIVE_MIN_CAPE)) return;
  const parcel = ws.scratchParcel;
  const baseLimit = ws.pressure[0] - EFFECTIVE_BASE_SEARCH_DEPTH;
  const count = ws.count;
  let k = 0;
  for (; k < count - 1 && ws.pressure[k] >= baseLimit; k++) {
    liftLevelParcel(ws, settings, k, parcel);
    if (parcel.cape >= EFFECTIVE_MIN_CAPE && parcel.cin >= EFFECTIVE_MIN_CIN) break;
  }
  if (k >= count - 1 || ws.pressure[k] < baseLimit) return;
  out.present = true;
  out.baseLevel = k;
  out.topLevel = k;
  for (let top = k + 1; top < count - 1 && ws.pressure[top] >= EFFECTIVE_TOP_LIMIT_PRESSURE; top++) {
    liftLevelParcel(ws, settings, top, parcel);
    if (!(parcel.cape >= EFFECTIVE_MIN_CAPE && parcel.cin >= EFFECTIVE_MIN_CIN)) break;
    out.topLevel = top;
  }
  out.baseHeight = ws.height[out.baseLevel];
  out.topHeight = ws.height[out.topLevel];
}
