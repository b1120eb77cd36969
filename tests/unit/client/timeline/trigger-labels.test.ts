import { describe, expect, it } from "vitest";
import { formatCoverage, formatDayHeading, formatRunLabel, formatValidWindow, keyValues } from "../../../../src/features/triggers/timeline/trigger-labels.ts";

// America/Chicago keeps daylight time (UTC−5) in May. Source: IANA tz database, zone America/Chicago.
const chicago = { timeZone: "America/Chicago" };

describe("formatRunLabel", () => {
  it("names a run by its cycle hour, as staff say it", () => {
    expect(formatRunLabel("2026-05-14T13:00:00Z")).toBe("13Z run"); // Common practice (no source): "13Z run"
    expect(formatRunLabel("2026-05-14T06:30:00Z")).toBe("06:30Z run");
    expect(formatRunLabel("garbage")).toBe("run —");
  });
});

describe("formatValidWindow", () => {
  it("writes a window within one UTC day once, UTC first and local beside", () => {
    // Source: IANA tz database, America/Chicago UTC−5 in May (18Z = 13:00 CDT, 21Z = 16:00 CDT).
    expect(formatValidWindow("2026-05-14T18:00:00Z", "2026-05-14T21:00:00Z", chicago)).toEqual({ utc: "18:00–21:00Z", local: "13:00–16:00 CDT" });
  });

  it("writes a single valid time on its own", () => {
    expect(formatValidWindow("2026-05-14T18:00:00Z", "2026-05-14T18:00:00Z", chicago)).toEqual({ utc: "18:00Z", local: "13:00 CDT" });
  });

  it("names both days for a window across UTC midnight", () => {
    // Derived in closed form: 2026-05-14 is a Thursday (2026-01-01 is a Thursday; day 134 of the year is too).
    expect(formatValidWindow("2026-05-14T22:00:00Z", "2026-05-15T02:00:00Z", chicago)).toEqual({ utc: "Thu 14 May 22:00Z – Fri 15 May 02:00Z", local: "17:00–21:00 CDT" });
  });

  it("writes the zone name for each end when daylight time changes inside the window", () => {
    // Source: IANA tz database: US daylight time ended at 2026-11-01 07:00Z (02:00 CDT → 01:00 CST).
    expect(formatValidWindow("2026-11-01T05:00:00Z", "2026-11-01T09:00:00Z", chicago).local).toBe("00:00 CDT – 03:00 CST");
  });
});

describe("formatDayHeading", () => {
  it("gives the UTC date and the stretch of local time that day covers", () => {
    // Source: IANA tz database, America/Chicago UTC−5 in May: 00Z is 19:00 CDT the evening before.
    expect(formatDayHeading("2026-05-14", chicago)).toEqual({ utc: "Thu 14 May 2026", local: "Wed 19:00 – Thu 19:00 CDT" });
    expect(formatDayHeading("unknown", chicago).utc).toBe("Unknown day");
  });
});

describe("keyValues", () => {
  it("shows the strongest matched values in display units, leaving flags out", () => {
    const values = keyValues([
      { key: "mlcape", max: 2450, min: 1000, mean: 1500 },
      { key: "jet_div_favoured", max: 1, min: 1, mean: 1 },
      // 20.5778 m/s is 40.0 kt: 1 kt = 1852 m / 3600 s. Source: BIPM SI Brochure, 9th ed. (2019), Table 8.
      { key: "shear_0_6km", max: 20.5778, min: 10, mean: 15 },
    ]);
    expect(values).toEqual([
      { key: "mlcape", text: "2,450 J/kg" },
      { key: "shear_0_6km", text: "40 kt" },
    ]);
  });

  it("skips fields without a value or outside the catalogue, and stops at the limit", () => {
    expect(keyValues([{ key: "mlcape", max: null, min: null, mean: null }, { key: "not_a_field", max: 3, min: 3, mean: 3 }])).toEqual([]);
    const many = ["mlcape", "sbcape", "mucape", "mlcin"].map((key) => ({ key, max: 100, min: 0, mean: 50 }));
    expect(keyValues(many, 2).map((v) => v.key)).toEqual(["mlcape", "sbcape"]);
  });
});

describe("formatCoverage", () => {
  it("rounds to whole percent, marks a sliver, and dashes a missing value", () => {
    expect(formatCoverage(42.4)).toBe("42 %");
    expect(formatCoverage(0.3)).toBe("< 1 %");
    expect(formatCoverage(0)).toBe("0 %");
    expect(formatCoverage(null)).toBe("—");
  });
});
