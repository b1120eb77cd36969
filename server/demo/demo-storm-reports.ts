import type { StormReportRow } from "../../shared/storm-reports/storm-report-csv.ts";
import { MAGNITUDE_UNITS, type StormReportKind } from "../../shared/storm-reports/storm-report-kinds.ts";
import { SYSTEM_ACTOR } from "../audit/audit-log.ts";
import type { StormReportService } from "../storm-reports/storm-report.service.ts";
import { defaultDemoRun } from "./demo-run.ts";

/**
 * A handful of INVENTED storm reports for the demo event, so the verification screen has
 * something to score. They fall at the demo run's valid times (forecast hours 2–9), mostly in the
 * eastern zones of the warm sector east of the dryline; one lands in a north-western zone after
 * its triggers ended (a miss) and one east of every zone (outside the rules' area). Nothing here is
 * an observation, and nothing here is used as a check value.
 */
const INVENTED: ReadonlyArray<{ hour: number; minute: number; lat: number; lon: number; kind: StormReportKind; magnitude: number | null; unit: string | null; remarks: string }> = [
  { hour: 3, minute: 10, lat: 35.02, lon: -97.3, kind: "hail", magnitude: 1.25, unit: "in", remarks: "Quarter to half-dollar hail for ten minutes" },
  { hour: 3, minute: 40, lat: 35.3, lon: -97.0, kind: "wind", magnitude: 60, unit: "kt", remarks: "Estimated gust; large limbs down" },
  { hour: 4, minute: 5, lat: 34.9, lon: -95.9, kind: "tornado", magnitude: 1, unit: "EF", remarks: "Brief tornado over open country" },
  { hour: 4, minute: 30, lat: 36.6, lon: -97.4, kind: "hail", magnitude: 2, unit: "in", remarks: "Hen-egg hail, cars dented" },
  { hour: 5, minute: 15, lat: 36.9, lon: -95.7, kind: "tornado", magnitude: 2, unit: "EF", remarks: "Barns destroyed along a 6 km path" },
  { hour: 5, minute: 20, lat: 37.2, lon: -95.5, kind: "wind", magnitude: 70, unit: "kt", remarks: "Measured gust at a farm station" },
  { hour: 5, minute: 45, lat: 36.8, lon: -98.6, kind: "hail", magnitude: 1.75, unit: "in", remarks: "Golf-ball hail" },
  { hour: 6, minute: 0, lat: 36.0, lon: -94.4, kind: "hail", magnitude: 1.5, unit: "in", remarks: "East of the office's zones" },
  { hour: 6, minute: 20, lat: 37.1, lon: -97.0, kind: "tornado", magnitude: 0, unit: "EF", remarks: "Short-lived tornado, tree damage" },
  { hour: 6, minute: 50, lat: 35.4, lon: -95.6, kind: "wind", magnitude: 55, unit: "kt", remarks: "Power poles leaning" },
  { hour: 7, minute: 30, lat: 35.1, lon: -98.7, kind: "hail", magnitude: 1, unit: "in", remarks: "Quarter-size hail" },
  { hour: 8, minute: 10, lat: 36.5, lon: -95.3, kind: "wind", magnitude: 65, unit: "kt", remarks: "Roof peeled from a shed" },
  { hour: 8, minute: 25, lat: 37.0, lon: -100.2, kind: "wind", magnitude: 50, unit: "kt", remarks: "Outflow gust behind the dryline" },
];

/** The invented reports placed on a demo run's clock (hour = forecast hour of that run). */
export function demoStormReports(runTime: Date): StormReportRow[] {
  return INVENTED.map((r) => {
    const unit = r.unit === null ? undefined : MAGNITUDE_UNITS[r.kind].find((u) => u.unit === r.unit);
    return {
      time: new Date(runTime.getTime() + r.hour * 3_600_000 + r.minute * 60_000).toISOString(),
      latitude: r.lat,
      longitude: r.lon,
      kind: r.kind,
      magnitude: r.magnitude,
      magnitudeUnit: unit?.unit ?? null,
      magnitudeSi: unit && r.magnitude !== null ? unit.toSi(r.magnitude) : null,
      remarks: `Invented demo report: ${r.remarks}`,
    };
  });
}

/** Stores the invented reports for the demo run a new database gets (see defaultDemoRun). */
export async function seedDemoStormReports(reports: StormReportService, now = new Date()): Promise<void> {
  await reports.storeInvented(SYSTEM_ACTOR, "demo", demoStormReports(defaultDemoRun(now).runTime));
}
