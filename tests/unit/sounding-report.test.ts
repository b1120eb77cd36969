import { describe, expect, it } from "vitest";
import { buildSoundingReport, diagnoseColumn } from "../../shared/meteo/index.ts";
import { parseSoundingCsv } from "../../shared/sounding/csv.ts";
import { DEMO_SOUNDINGS } from "../../shared/demo/soundings.ts";

// Invented demo sounding: these tests check the report's structure and internal consistency, not values.
const profile = parseSoundingCsv(DEMO_SOUNDINGS[0].csv);
const report = buildSoundingReport(profile);

describe("sounding report", () => {
  it("survives a JSON round trip unchanged", () => {
    expect(JSON.parse(JSON.stringify(report))).toEqual(report);
  });

  it("carries the same fields as diagnoseColumn", () => {
    expect(report.fields).toEqual(diagnoseColumn(profile).fields);
  });

  it("lists every level and three parcel paths with pressure falling along each path", () => {
    expect(report.levels).toHaveLength(profile.pressure.length);
    for (const trace of [report.parcels.sb, report.parcels.ml, report.parcels.mu]) {
      expect(trace).not.toBeNull();
      const p = trace!.pressure;
      expect(p.length).toBe(trace!.temperature.length);
      expect(p.length).toBe(trace!.virtualTemperature.length);
      for (let k = 1; k < p.length; k++) expect(p[k]).toBeLessThanOrEqual(p[k - 1]);
      expect(p).toContain(trace!.lclPressure);
      for (const t of trace!.temperature) expect(Number.isFinite(t)).toBe(true);
    }
  });

  it("reports storm motion and effective layer consistent with the fields", () => {
    expect(report.stormMotion?.rm).toEqual([report.fields.storm_rm_u, report.fields.storm_rm_v]);
    expect(report.effectiveLayer?.topHeight).toBe(report.fields.eff_top_hgt);
  });
});
