import type { ColumnFieldKey } from "../fields.ts";
import { resolveColumnOptions, type ColumnOptions } from "./column/column-options.ts";
import type { ColumnProfile } from "./column/column-profile.ts";
import { computeColumnFields } from "./column/compute-column-fields.ts";
import { COLUMN_FIELD_COUNT } from "./column/field-slots.ts";
import { columnMeta, fieldRecord, liftSettingsFor, loadProfile, type ColumnDiagnosticsMeta } from "./column/diagnose-column.ts";
import type { ColumnWorkspace } from "./parcel/column-workspace.ts";
import type { LiftSettings } from "./parcel/lift-parcel.ts";
import type { ParcelResult } from "./parcel/parcel-result.ts";
import { liftMixedLayerParcel, liftMostUnstableParcel, liftSurfaceParcel } from "./parcel/parcel-sources.ts";

/**
 * A parcel's path for plotting: one entry per node (origin, inserted LCL, every level above), pressures in Pa,
 * temperatures in K; the LCL/LFC/EL pressures are null where undefined.
 */
export interface ParcelTrace {
  pressure: number[];
  temperature: number[];
  virtualTemperature: number[];
  lclPressure: number | null;
  lfcPressure: number | null;
  elPressure: number | null;
}

export interface SoundingLevel {
  /** Pa */
  pressure: number;
  /** m above ground */
  height: number;
  /** K */
  temperature: number;
  /** K */
  dewpoint: number;
  /** m s⁻¹, null where the level had no wind */
  u: number | null;
  v: number | null;
}

/**
 * Everything the Soundings page draws, JSON-serialisable, SI units throughout: the catalogue fields (as from
 * diagnoseColumn), metadata, the levels used, the SB/ML/MU parcel paths, Bunkers storm motions ([u, v] m s⁻¹)
 * and the effective inflow layer (m AGL).
 */
export interface SoundingReport {
  fields: Record<ColumnFieldKey, number | null>;
  meta: ColumnDiagnosticsMeta;
  levels: SoundingLevel[];
  parcels: { sb: ParcelTrace | null; ml: ParcelTrace | null; mu: ParcelTrace | null };
  stormMotion: { rm: [number, number]; lm: [number, number] } | null;
  effectiveLayer: { baseHeight: number; topHeight: number } | null;
}

function nullable(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

function traceParcel(
  ws: ColumnWorkspace,
  lift: LiftSettings,
  liftFn: (ws: ColumnWorkspace, lift: LiftSettings, result: ParcelResult) => void,
): ParcelTrace | null {
  const parcel = ws.scratchParcel;
  liftFn(ws, lift, parcel);
  if (parcel.originLevel < 0) return null;
  const n = ws.nodeCount;
  const trace: ParcelTrace = {
    pressure: [],
    temperature: [],
    virtualTemperature: [],
    lclPressure: nullable(parcel.lclPressure),
    lfcPressure: nullable(parcel.lfcPressure),
    elPressure: nullable(parcel.elPressure),
  };
  for (let k = 0; k < n; k++) {
    trace.pressure.push(Math.exp(ws.nodeLnPressure[k]));
    trace.temperature.push(ws.nodeParcelTemperature[k]);
    trace.virtualTemperature.push(ws.nodeParcelVirtualTemperature[k]);
  }
  return trace;
}

/** Builds the Soundings-page report for one profile (reference pseudo-adiabat unless options say otherwise). */
export function buildSoundingReport(profile: ColumnProfile, options?: ColumnOptions): SoundingReport {
  const resolved = resolveColumnOptions(options, "reference");
  const ws = loadProfile(profile, true);
  const lift = liftSettingsFor(resolved);
  const raw = new Float64Array(COLUMN_FIELD_COUNT);
  computeColumnFields(ws, lift, resolved, raw);
  const fields = fieldRecord(raw);
  const meta = columnMeta(ws, resolved);

  const rm = ws.rightMover;
  const lm = ws.leftMover;
  const stormMotion = Number.isFinite(rm.u) && Number.isFinite(lm.u) ? { rm: [rm.u, rm.v] as [number, number], lm: [lm.u, lm.v] as [number, number] } : null;
  const eff = ws.effectiveLayer;
  const effectiveLayer = eff.present ? { baseHeight: eff.baseHeight, topHeight: eff.topHeight } : null;

  const levels: SoundingLevel[] = [];
  for (let k = 0; k < ws.count; k++) {
    levels.push({
      pressure: ws.pressure[k],
      height: ws.height[k],
      temperature: ws.temperature[k],
      dewpoint: ws.dewpoint[k],
      u: nullable(ws.u[k]),
      v: nullable(ws.v[k]),
    });
  }
  const parcels = {
    sb: traceParcel(ws, lift, liftSurfaceParcel),
    ml: traceParcel(ws, lift, liftMixedLayerParcel),
    mu: traceParcel(ws, lift, liftMostUnstableParcel),
  };
  return { fields, meta, levels, parcels, stormMotion, effectiveLayer };
}
