import { greatCircleKm } from "../verification/great-circle.ts";
import type { StormReportKind } from "./storm-report-kinds.ts";

/**
 * Two reports describe the same event when they are of the same kind, no more than this far apart
 * in time and space. Observers of one storm report minutes and a few kilometres apart; a report
 * sent twice (by two spotters, or one file uploaded twice) falls well inside these limits.
 */
export const DUPLICATE_MINUTES = 10;
export const DUPLICATE_KM = 3;

export interface ComparableReport {
  /** ISO instant. */
  time: string;
  latitude: number;
  longitude: number;
  kind: StormReportKind;
}

export function isDuplicateReport(a: ComparableReport, b: ComparableReport): boolean {
  if (a.kind !== b.kind) return false;
  if (Math.abs(Date.parse(a.time) - Date.parse(b.time)) > DUPLICATE_MINUTES * 60_000) return false;
  return greatCircleKm(a.latitude, a.longitude, b.latitude, b.longitude) <= DUPLICATE_KM;
}
