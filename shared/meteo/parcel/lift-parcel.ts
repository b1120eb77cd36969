import { LN_REFERENCE_PRESSURE, MOLAR_MASS_RATIO, POISSON_EXPONENT } from "../constants.ts";
import { saturationVaporPressure } from "../thermo/saturation-vapor-pressure.ts";
import { virtualTemperature } from "../thermo/temperature.ts";
import { lclTemperature } from "../thermo/lcl.ts";
import { integratePseudoAdiabat } from "../thermo/pseudo-adiabat.ts";
import type { PseudoAdiabatTable } from "../thermo/pseudo-adiabat-table.ts";
import { analyzeBuoyancy, valueAtPosition } from "./buoyancy-bookkeeping.ts";
import type { ColumnWorkspace } from "./column-workspace.ts";
import type { ParcelResult } from "./parcel-result.ts";

/** 'reference': RK4 through every level; 'table': bilinear pseudo-adiabat table (grids). */
export type PseudoAdiabatMethod = "reference" | "table";

export interface LiftSettings {
  method: PseudoAdiabatMethod;
  /** Compare Tv of parcel and environment (Doswell and Rasmussen 1994); false compares T (tests only). */
  virtualCorrection: boolean;
  table: PseudoAdiabatTable;
}

/**
 * Lifts a parcel from column level `originLevel` with its own temperature (K), mixing ratio (kg kg⁻¹) and
 * dewpoint (K), fills the workspace node arrays and writes CAPE, CIN, LCL, LFC and EL into `result`.
 *
 * Below the LCL θ and r are conserved (T = θ (p/p00)^κ); the LCL comes from Bolton (1980), eq. 15 and the
 * dry adiabat; above it the parcel follows the pseudo-adiabat (canonical ODE, saturated, r = rs).
 * The LCL is inserted as an extra node; the environment there is interpolated linearly in ln p (T and Td).
 */
export function liftParcel(
  ws: ColumnWorkspace,
  settings: LiftSettings,
  originLevel: number,
  temperature: number,
  mixingRatio: number,
  dewpoint: number,
  result: ParcelResult,
): void {
  const o = originLevel;
  const count = ws.count;
  const virtual = settings.virtualCorrection;
  const table = settings.table;
  const lnP = ws.lnPressure;
  const record = ws.recordParcelTemperature;
  const nodeLnP = ws.nodeLnPressure;
  const nodeZ = ws.nodeHeight;
  const nodeDelta = ws.nodeDelta;
  const nodeT = ws.nodeParcelTemperature;
  const nodeTv = ws.nodeParcelVirtualTemperature;

  const theta = temperature / ws.exner[o];
  const lclTemp = lclTemperature(temperature, dewpoint);
  let lnLcl = LN_REFERENCE_PRESSURE + Math.log(lclTemp / theta) / POISSON_EXPONENT;
  if (lnLcl > lnP[o]) lnLcl = lnP[o];

  // Table path: find the parcel's pseudo-adiabat once; fall back to RK4 outside the table.
  let useTable = settings.method === "table";
  let column = Number.NaN;
  if (useTable) {
    const row = table.rowPosition(lnLcl);
    column = Number.isNaN(row) ? Number.NaN : table.columnPositionOf(lclTemp, row);
    if (Number.isNaN(column)) useTable = false;
  }
  const tvValues = virtual ? table.virtualTemperature : table.temperature;

  let n = 0;
  const originTv = virtualTemperature(temperature, mixingRatio);
  nodeLnP[0] = lnP[o];
  nodeZ[0] = ws.height[o];
  nodeT[0] = temperature;
  nodeTv[0] = originTv;
  nodeDelta[0] = virtual ? originTv - ws.virtualTemperature[o] : temperature - ws.temperature[o];
  n = 1;
  let lclNode = lnLcl >= lnP[o] ? 0 : -1;

  let moistT = lclTemp;
  let moistLnP = lnLcl;
  for (let k = o + 1; k < count; k++) {
    const lnPk = lnP[k];
    if (lclNode < 0 && lnPk <= lnLcl) {
      // Insert the LCL between level k-1 and level k.
      const f = (lnP[k - 1] - lnLcl) / (lnP[k - 1] - lnPk);
      const envT = ws.temperature[k - 1] + f * (ws.temperature[k] - ws.temperature[k - 1]);
      let envValue = envT;
      if (virtual) {
        const envTd = ws.dewpoint[k - 1] + f * (ws.dewpoint[k] - ws.dewpoint[k - 1]);
        const e = saturationVaporPressure(envTd);
        const p = Math.exp(lnLcl);
        envValue = virtualTemperature(envT, (MOLAR_MASS_RATIO * e) / (p - e));
      }
      const parcelTv = virtualTemperature(lclTemp, mixingRatio);
      nodeLnP[n] = lnLcl;
      nodeZ[n] = ws.height[k - 1] + f * (ws.height[k] - ws.height[k - 1]);
      nodeT[n] = lclTemp;
      nodeTv[n] = parcelTv;
      nodeDelta[n] = (virtual ? parcelTv : lclTemp) - envValue;
      lclNode = n;
      n++;
    }
    let parcelT: number;
    let parcelValue: number;
    if (lclNode < 0) {
      parcelT = theta * ws.exner[k];
      const tv = virtualTemperature(parcelT, mixingRatio);
      nodeTv[n] = tv;
      parcelValue = virtual ? tv : parcelT;
    } else if (useTable) {
      const row = ws.tableRow[k];
      parcelValue = table.sample(tvValues, column, row);
      parcelT = record || !virtual ? table.sample(table.temperature, column, row) : Number.NaN;
      nodeTv[n] = virtual ? parcelValue : Number.NaN;
    } else {
      parcelT = integratePseudoAdiabat(moistT, moistLnP, lnPk);
      moistT = parcelT;
      moistLnP = lnPk;
      const p = ws.pressure[k];
      const es = saturationVaporPressure(parcelT);
      const tv = virtualTemperature(parcelT, (MOLAR_MASS_RATIO * es) / (p - es));
      nodeTv[n] = tv;
      parcelValue = virtual ? tv : parcelT;
    }
    nodeLnP[n] = lnPk;
    nodeZ[n] = ws.height[k];
    nodeT[n] = parcelT;
    nodeDelta[n] = parcelValue - (virtual ? ws.virtualTemperature[k] : ws.temperature[k]);
    n++;
  }
  if (lclNode < 0) lclNode = n - 1; // LCL above the column top: no moist ascent at all
  ws.nodeCount = n;
  ws.lclNode = lclNode;

  const b = ws.buoyancy;
  analyzeBuoyancy(nodeLnP, nodeDelta, n, lnLcl < nodeLnP[n - 1] ? n : lclNode, b);

  result.originLevel = o;
  result.originPressure = ws.pressure[o];
  result.originHeight = ws.height[o];
  result.originTemperature = temperature;
  result.originMixingRatio = mixingRatio;
  result.lclTemperature = lclTemp;
  result.lclPressure = Math.exp(lnLcl);
  result.lclHeight = lnLcl < nodeLnP[n - 1] ? Number.NaN : nodeZ[lclNode];
  result.cape = b.cape;
  result.cin = b.cin;
  result.lfcHeight = valueAtPosition(nodeZ, b.lfcPosition);
  result.lfcPressure = Math.exp(valueAtPosition(nodeLnP, b.lfcPosition));
  result.elHeight = valueAtPosition(nodeZ, b.elPosition);
  result.elPressure = Math.exp(valueAtPosition(nodeLnP, b.elPosition));
  result.elCapped = b.elCapped && !Number.isNaN(b.lfcPosition);
}
