import { formatMagnitude, STORM_REPORT_KIND_LABELS, type StormReportKind } from "@shared/storm-reports/storm-report-kinds.ts";

/** A score from 0 to 1 with two decimals, "—" when it has no denominator. */
export function formatScore(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? "—" : value.toFixed(2);
}

/** Minutes as staff say them: "45 min", "3 h 05 min", "—". */
export function formatMinutes(minutes: number | null | undefined): string {
  if (minutes === null || minutes === undefined || !Number.isFinite(minutes)) return "—";
  const whole = Math.round(minutes);
  if (whole < 60) return `${whole} min`;
  return `${Math.floor(whole / 60)} h ${String(whole % 60).padStart(2, "0")} min`;
}

/** "Hail 1.75 in", "Tornado EF2", "Wind" (no magnitude given). */
export function describeReport(report: { kind: StormReportKind; magnitude: number | null; magnitudeUnit: string | null }): string {
  const magnitude = formatMagnitude(report.magnitude, report.magnitudeUnit);
  return magnitude ? `${STORM_REPORT_KIND_LABELS[report.kind]} ${magnitude}` : STORM_REPORT_KIND_LABELS[report.kind];
}

/** Latitude and longitude to two decimals with hemispheres: "35.50° N, 97.42° W". */
export function formatPlace(latitude: number, longitude: number): string {
  return `${Math.abs(latitude).toFixed(2)}° ${latitude >= 0 ? "N" : "S"}, ${Math.abs(longitude).toFixed(2)}° ${longitude >= 0 ? "E" : "W"}`;
}
