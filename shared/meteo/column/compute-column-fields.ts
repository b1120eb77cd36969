import type { ColumnWorkspace } from "../parcel/column-workspace.ts";
import type { LiftSettings } from "../parcel/lift-parcel.ts";
import type { ParcelResult } from "../parcel/parcel-result.ts";
import { liftMixedLayerParcel, liftMostUnstableParcel, liftSurfaceParcel } from "../parcel/parcel-sources.ts";
import { findEffectiveInflowLayer } from "../parcel/effective-inflow-layer.ts";
import { equivalentPotentialTemperatureWithLcl } from "../thermo/equivalent-potential-temperature.ts";
import { lclTemperature } from "../thermo/lcl.ts";
import { lapseRate0To3Km, lapseRate700To500 } from "../thermo/lapse-rate.ts";
import { precipitableWater } from "../thermo/precipitable-water.ts";
import { bulkWindDifference } from "../kinematics/bulk-shear.ts";
import { bunkersStormMotion } from "../kinematics/bunkers-motion.ts";
import { meanWind } from "../kinematics/mean-wind.ts";
import { stormRelativeHelicity } from "../kinematics/storm-relative-helicity.ts";
import { windAtHeight } from "../kinematics/wind-profile.ts";
import {
  significantTornadoEffective,
  significantTornadoFixed,
  supercellCompositeEffective,
  supercellCompositeFixed,
} from "../composites.ts";
import type { ResolvedColumnOptions } from "./column-options.ts";
import { FIELD_SLOT as F } from "./field-slots.ts";

function writeParcel(out: Float64Array, parcel: ParcelResult, cape: number, cin: number, lcl: number, lfc: number, el: number): void {
  out[cape] = parcel.cape;
  out[cin] = parcel.cin;
  if (lcl >= 0) out[lcl] = parcel.lclHeight;
  if (lfc >= 0) out[lfc] = parcel.lfcHeight;
  out[el] = parcel.elHeight;
}

/**
 * The single core of the column library: from a loaded workspace, writes every column field (raw, before QC)
 * into `out` in catalogue order, and leaves parcels, storm motion and the effective layer in the workspace
 * for metadata and reports. Allocates nothing.
 */
export function computeColumnFields(ws: ColumnWorkspace, lift: LiftSettings, options: ResolvedColumnOptions, out: Float64Array): void {
  out.fill(Number.NaN);
  if (ws.count < 2) return;
  const sb = ws.surfaceParcel;
  const ml = ws.mixedLayerParcel;
  const mu = ws.mostUnstableParcel;

  liftSurfaceParcel(ws, lift, sb);
  writeParcel(out, sb, F.sbcape, F.sbcin, F.sblcl_hgt, F.sblfc_hgt, F.sbel_hgt);
  liftMixedLayerParcel(ws, lift, ml);
  writeParcel(out, ml, F.mlcape, F.mlcin, F.mllcl_hgt, F.mllfc_hgt, F.mlel_hgt);
  liftMostUnstableParcel(ws, lift, mu);
  writeParcel(out, mu, F.mucape, F.mucin, -1, -1, F.muel_hgt);
  out[F.mu_src_pres] = mu.originPressure;

  const t0 = ws.temperature[0];
  out[F.thetae_sfc] = equivalentPotentialTemperatureWithLcl(t0, ws.pressure[0], ws.mixingRatio[0], ws.vaporPressure[0], lclTemperature(t0, ws.dewpoint[0]));
  out[F.lapse_0_3km] = lapseRate0To3Km(ws);
  out[F.lapse_700_500] = lapseRate700To500(ws);
  out[F.pwat] = precipitableWater(ws);

  const shear6 = bulkWindDifference(ws, 0, 6000);
  out[F.shear_0_1km] = bulkWindDifference(ws, 0, 1000);
  out[F.shear_0_3km] = bulkWindDifference(ws, 0, 3000);
  out[F.shear_0_6km] = shear6;

  const mean = ws.meanWind0To6Km;
  const rm = ws.rightMover;
  const lm = ws.leftMover;
  bunkersStormMotion(ws, mean, rm, lm);
  out[F.meanwind_0_6km_u] = mean.u;
  out[F.meanwind_0_6km_v] = mean.v;
  out[F.storm_rm_u] = rm.u;
  out[F.storm_rm_v] = rm.v;
  out[F.storm_lm_u] = lm.u;
  out[F.storm_lm_v] = lm.v;

  // Hemisphere convention: the storm that turns cyclonically is the right mover in the north, the left in the south.
  const south = options.hemisphere === "south";
  const cx = south ? lm.u : rm.u;
  const cy = south ? lm.v : rm.v;
  const sign = south ? -1 : 1;
  const srh1 = stormRelativeHelicity(ws, 0, 1000, cx, cy);
  const srh3 = stormRelativeHelicity(ws, 0, 3000, cx, cy);
  out[F.srh_0_1km] = srh1;
  out[F.srh_0_3km] = srh3;

  const eff = ws.effectiveLayer;
  findEffectiveInflowLayer(ws, lift, mu.cape, eff);
  let esrh = 0;
  let ebwd = 0;
  if (eff.present && !Number.isNaN(mu.elHeight)) {
    esrh = stormRelativeHelicity(ws, eff.baseHeight, eff.topHeight, cx, cy);
    const topOfHalf = eff.baseHeight + 0.5 * (mu.elHeight - eff.baseHeight);
    const base = windAtHeight(ws, eff.baseHeight, ws.scratchVector);
    const top = windAtHeight(ws, topOfHalf, ws.scratchVector2);
    ebwd = Math.hypot(top.u - base.u, top.v - base.v);
  }
  out[F.eff_present] = eff.present ? 1 : 0;
  out[F.eff_base_hgt] = eff.baseHeight;
  out[F.eff_top_hgt] = eff.topHeight;
  out[F.srh_eff] = esrh;
  out[F.shear_eff] = ebwd;

  out[F.scp_eff] = supercellCompositeEffective(mu.cape, sign * esrh, ebwd);
  out[F.stp_fixed] = significantTornadoFixed(sb.cape, sb.lclHeight, sign * srh1, shear6);
  out[F.stp_eff] = significantTornadoEffective(ml.cape, ml.lclHeight, sign * esrh, ebwd, ml.cin, eff.present ? eff.baseHeight : 0);
  if (options.enableScpFixed) {
    const low = meanWind(ws, 0, 500, ws.scratchVector);
    const du = mean.u - low.u;
    const dv = mean.v - low.v;
    out[F.scp_fixed] = supercellCompositeFixed(mu.cape, sign * srh3, 0.5 * (du * du + dv * dv));
  }
}
