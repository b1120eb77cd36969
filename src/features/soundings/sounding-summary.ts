import type { SoundingReportDto } from "@shared/api/soundings.ts";
import { formatNumber, formatWindKnots } from "@/lib/format-units.ts";
import { fieldText } from "./field-groups.ts";
import { PARCEL_NAMES, PARCEL_TAGS, parcelFieldKeys, type ParcelId } from "./parcels.ts";

/** Meteorological direction (degrees clockwise from north) the wind (u east, v north) blows from. */
export function directionFrom(u: number, v: number): number {
  const degrees = (Math.atan2(-u, -v) * 180) / Math.PI;
  return Math.round((degrees + 360) % 360);
}

function motionText(label: string, motion: readonly [number, number]): string {
  const [u, v] = motion;
  return `${label} from ${String(directionFrom(u, v)).padStart(3, "0")}° at ${formatWindKnots(Math.hypot(u, v))}`;
}

/** The skew-T's accessible name: the buoyancy numbers it shows, and which parcel's areas are shaded. */
export function skewTSummary(report: SoundingReportDto, shaded: ParcelId): string {
  const f = report.fields;
  const keys = parcelFieldKeys(shaded);
  return [
    `Skew-T diagram: SBCAPE ${fieldText("sbcape", f)}, MLCAPE ${fieldText("mlcape", f)}, MUCAPE ${fieldText("mucape", f)}`,
    `MLCIN ${fieldText("mlcin", f)}, ML LCL ${fieldText("mllcl_hgt", f)}`,
    `shaded areas: ${PARCEL_NAMES[shaded]} parcel (${PARCEL_TAGS[shaded]}CAPE ${fieldText(keys.cape, f)}, ${PARCEL_TAGS[shaded]}CIN ${fieldText(keys.cin, f)})`,
  ].join(", ") + ".";
}

/** The hodograph's accessible name: shear, helicity, storm motions and the effective inflow layer. */
export function hodographSummary(report: SoundingReportDto): string {
  const f = report.fields;
  const parts = [
    `Hodograph: 0–6 km shear ${fieldText("shear_0_6km", f)}`,
    `0–1 km SRH ${fieldText("srh_0_1km", f)}`,
    `0–3 km SRH ${fieldText("srh_0_3km", f)}`,
  ];
  if (report.stormMotion) {
    parts.push(motionText("right mover", report.stormMotion.rm), motionText("left mover", report.stormMotion.lm));
  } else {
    parts.push("storm motions undefined");
  }
  const eff = report.effectiveLayer;
  parts.push(
    eff
      ? `effective inflow layer ${formatNumber(eff.baseHeight)}–${formatNumber(eff.topHeight)} m AGL with ESRH ${fieldText("srh_eff", f)}`
      : "no effective inflow layer",
  );
  return parts.join(", ") + ".";
}
