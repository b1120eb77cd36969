import { describe, expect, it } from "vitest";
import { columnAtPointDto, soundingReportDto } from "../../../../shared/api/soundings.ts";
import { DEMO_SOUNDINGS } from "../../../../shared/demo/soundings.ts";
import { buildSoundingReport } from "../../../../shared/meteo/index.ts";
import { parseSoundingCsv } from "../../../../shared/sounding/csv.ts";
import { areaInLnPressure } from "../../../../src/features/soundings/chart/buoyancy-areas.ts";
import { levelMarkers, shadedAreas, skewTData } from "../../../../src/features/soundings/chart/skew-t-data.ts";
import { hodographSummary, skewTSummary } from "../../../../src/features/soundings/sounding-summary.ts";

// The invented demo soundings only feed the pipeline here: the checks compare the page's pieces with the
// library's own numbers for the same profile, never with values typed in by hand.
const reports = DEMO_SOUNDINGS.map((demo) => soundingReportDto.parse(JSON.parse(JSON.stringify(buildSoundingReport(parseSoundingCsv(demo.csv))))));
const whole = (v: number | null) => Math.round(v!).toLocaleString("en-US");

describe("client schema for the sounding report", () => {
  it("accepts what the server sends, for every demo", () => {
    for (const report of reports) expect(report.levels.length).toBeGreaterThan(5);
  });

  it("accepts a model-column reply and refuses one without a frame", () => {
    const reply = { frame: { id: 1, runId: 1, model: "m", runTime: "2026-05-14T12:00:00.000Z", validTime: "2026-05-14T18:00:00.000Z", forecastHour: 6, ingestJobId: 1 }, point: { i: 1, j: 2, lat: 35, lon: -98 }, report: reports[0] };
    expect(columnAtPointDto.safeParse(reply).success).toBe(true);
    expect(columnAtPointDto.safeParse({ ...reply, frame: undefined }).success).toBe(false);
  });
});

describe("figure summaries", () => {
  const report = reports[0];

  it("names the buoyancy numbers and the shaded parcel on the skew-T", () => {
    const text = skewTSummary(report, "mu");
    expect(text).toContain(`MLCAPE ${whole(report.fields.mlcape)} J/kg`);
    expect(text).toContain(`MUCAPE ${whole(report.fields.mucape)} J/kg`);
    expect(text).toContain("most-unstable parcel");
  });

  it("names shear, helicity, storm motions and the effective layer on the hodograph", () => {
    const text = hodographSummary(report);
    expect(text).toContain(`0–1 km SRH ${whole(report.fields.srh_0_1km)} m²/s²`);
    expect(text).toMatch(/right mover from \d{3}° at \d+ kt/);
    expect(text).toContain(`effective inflow layer ${whole(report.effectiveLayer!.baseHeight)}–${whole(report.effectiveLayer!.topHeight)} m AGL`);
  });
});

describe("skew-T drawing data", () => {
  it("shades exactly the library's CAPE and CIN for each parcel of each demo", () => {
    const RD = 287.04; // J/(kg K): the library's dry-air gas constant, so both sides integrate the same thing.
    for (const report of reports) {
      const data = skewTData(report);
      for (const id of ["sb", "ml", "mu"] as const) {
        const areas = shadedAreas(data, id);
        const sum = (kind: string) => RD * areas.filter((a) => a.kind === kind).reduce((total, a) => total + areaInLnPressure(a), 0);
        // Same integral as the library, so only float rounding at the inserted crossings may differ.
        expect(Math.abs(sum("positive") - report.fields[`${id}cape`]!)).toBeLessThan(0.01);
        const cin = report.fields[`${id}cin`];
        if (cin !== null) expect(Math.abs(sum("negative") - cin)).toBeLessThan(0.01);
      }
    }
  });

  it("marks LCL, LFC and EL at the library's heights", () => {
    for (const report of reports) {
      const markers = levelMarkers(skewTData(report), "ml");
      const height = (kind: string) => markers.find((m) => m.kind === kind)!.height!;
      // Both interpolate height linearly in ln p between the same levels.
      expect(Math.abs(height("LCL") - report.fields.mllcl_hgt!)).toBeLessThan(0.01);
      expect(Math.abs(height("LFC") - report.fields.mllfc_hgt!)).toBeLessThan(0.01);
      expect(Math.abs(height("EL") - report.fields.mlel_hgt!)).toBeLessThan(0.01);
    }
  });
});
