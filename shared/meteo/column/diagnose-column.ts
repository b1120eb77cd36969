import { COLUMN_FIELD_KEYS, applyFieldRange, fieldByKey, type ColumnFieldKey, type FieldDefinition } from "../../fields.ts";
import { COMPOSITE_FORMULA_VERSIONS } from "../composites.ts";
import { ColumnWorkspace } from "../parcel/column-workspace.ts";
import { appendLevel, beginColumn } from "../parcel/column-loader.ts";
import type { LiftSettings } from "../parcel/lift-parcel.ts";
import type { ParcelResult } from "../parcel/parcel-result.ts";
import { getPseudoAdiabatTable } from "../thermo/pseudo-adiabat-table.ts";
import { resolveColumnOptions, type ColumnOptions, type ResolvedColumnOptions } from "./column-options.ts";
import { validateColumnProfile, type ColumnProfile } from "./column-profile.ts";
import { computeColumnFields } from "./compute-column-fields.ts";
import { COLUMN_FIELD_COUNT } from "./field-slots.ts";

export interface ColumnDiagnosticsMeta {
  elCapped: { sb: boolean; ml: boolean; mu: boolean };
  /** Where the most-unstable parcel starts: pressure (Pa) and height (m AGL); null when undefined. */
  muSource: { pressure: number | null; height: number | null };
  formulaVersions: typeof COMPOSITE_FORMULA_VERSIONS;
  options: ResolvedColumnOptions;
}

export interface ColumnDiagnostics {
  fields: Record<ColumnFieldKey, number | null>;
  meta: ColumnDiagnosticsMeta;
}

const DEFINITIONS: readonly FieldDefinition[] = COLUMN_FIELD_KEYS.map((key) => fieldByKey(key)!);

let workspace = new ColumnWorkspace(64);
const raw = new Float64Array(COLUMN_FIELD_COUNT);

function nullable(value: number): number | null {
  return Number.isFinite(value) ? value : null;
}

/**
 * Fills interior wind gaps linearly in height from the nearest levels that have wind; gaps at either end stay
 * NaN (no extrapolation), so layers reaching them come out undefined.
 */
function windAt(profile: ColumnProfile, component: ArrayLike<number>, k: number): number {
  if (!Number.isNaN(component[k])) return component[k];
  let below = k - 1;
  while (below >= 0 && (Number.isNaN(profile.u[below]) || Number.isNaN(profile.v[below]))) below--;
  let above = k + 1;
  while (above < component.length && (Number.isNaN(profile.u[above]) || Number.isNaN(profile.v[above]))) above++;
  if (below < 0 || above >= component.length) return Number.NaN;
  const z = profile.height;
  const f = (z[k] - z[below]) / (z[above] - z[below]);
  return component[below] + f * (component[above] - component[below]);
}

/** Loads a profile into a workspace (exported for the sounding report, which needs the node arrays). */
export function loadProfile(profile: ColumnProfile, recordParcelTemperature: boolean): ColumnWorkspace {
  validateColumnProfile(profile);
  const n = profile.pressure.length;
  if (workspace.capacity < n) workspace = new ColumnWorkspace(n);
  workspace.recordParcelTemperature = recordParcelTemperature;
  const table = getPseudoAdiabatTable();
  beginColumn(workspace);
  const zSurface = profile.height[0];
  for (let k = 0; k < n; k++) {
    const t = profile.temperature[k];
    const td = Math.min(profile.dewpoint[k], t);
    const u = windAt(profile, profile.u, k);
    const v = windAt(profile, profile.v, k);
    if (!appendLevel(workspace, table, profile.pressure[k], t, td, profile.height[k] - zSurface, u, v)) break;
  }
  return workspace;
}

export function liftSettingsFor(options: ResolvedColumnOptions): LiftSettings {
  return { method: options.pseudoAdiabat, virtualCorrection: options.virtualCorrection, table: getPseudoAdiabatTable() };
}

/** Builds the JSON-friendly metadata from the parcels left in the workspace. */
export function columnMeta(ws: ColumnWorkspace, options: ResolvedColumnOptions): ColumnDiagnosticsMeta {
  const mu: ParcelResult = ws.mostUnstableParcel;
  return {
    elCapped: { sb: ws.surfaceParcel.elCapped, ml: ws.mixedLayerParcel.elCapped, mu: mu.elCapped },
    muSource: { pressure: nullable(mu.originPressure), height: nullable(mu.originHeight) },
    formulaVersions: COMPOSITE_FORMULA_VERSIONS,
    options,
  };
}

/** QC'd field record: out-of-range or undefined values become null. */
export function fieldRecord(values: Float64Array): Record<ColumnFieldKey, number | null> {
  const fields = {} as Record<ColumnFieldKey, number | null>;
  for (let i = 0; i < COLUMN_FIELD_KEYS.length; i++) {
    fields[COLUMN_FIELD_KEYS[i]] = nullable(applyFieldRange(DEFINITIONS[i], values[i]));
  }
  return fields;
}

/**
 * Every column diagnostic for one profile (e.g. a sounding): fields keyed by catalogue key in SI units
 * (null where undefined or outside the QC range) plus metadata. Uses the reference pseudo-adiabat integrator
 * unless options say otherwise. Throws InvalidProfileError for malformed input.
 */
export function diagnoseColumn(profile: ColumnProfile, options?: ColumnOptions): ColumnDiagnostics {
  const resolved = resolveColumnOptions(options, "reference");
  const ws = loadProfile(profile, false);
  computeColumnFields(ws, liftSettingsFor(resolved), resolved, raw);
  return { fields: fieldRecord(raw), meta: columnMeta(ws, resolved) };
}
