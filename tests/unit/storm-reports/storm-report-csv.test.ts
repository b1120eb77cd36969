import { describe, expect, it } from "vitest";
import { parseStormReportCsv, STORM_REPORT_CSV_HEADER, StormReportFileError } from "../../../shared/storm-reports/storm-report-csv.ts";
import { isDuplicateReport } from "../../../shared/storm-reports/duplicate-reports.ts";
import { csvCell, csvDocument, splitCsvRecords } from "../../../shared/csv/csv-text.ts";

const NOW = new Date("2026-05-15T00:00:00Z");
const csv = (...rows: string[]) => [STORM_REPORT_CSV_HEADER, ...rows].join("\n");

describe("storm-report CSV", () => {
  it("reads good rows in SI, with the magnitude as reported kept beside", () => {
    const rows = parseStormReportCsv(
      csv(
        "2026-05-14T21:35Z,35.51,-97.42,tornado,2,EF,Brief touchdown",
        "2026-05-14 21:40:00+00:00,35.6,-97.3,Hail,1.75,in,",
        "2026-05-14T16:50-05:00,35.7,-97.1,wind,65,kt,\"Tree down, power lines\"",
        "2026-05-14T22:00Z,35.8,-97.0,wind,,,",
      ),
      NOW,
    );
    expect(rows.every((r) => r.ok)).toBe(true);
    const [tornado, hail, wind, unrated] = rows.map((r) => (r.ok ? r.report : null));
    expect(tornado).toMatchObject({ time: "2026-05-14T21:35:00.000Z", kind: "tornado", magnitude: 2, magnitudeUnit: "EF", magnitudeSi: 2, remarks: "Brief touchdown" });
    // Source: NIST SP 811 (2008), Appendix B: 1 in = 0.0254 m exactly → 1.75 in = 0.04445 m
    expect(hail).toMatchObject({ time: "2026-05-14T21:40:00.000Z", kind: "hail", magnitudeUnit: "in" });
    expect(hail!.magnitudeSi).toBeCloseTo(0.04445, 12);
    // A −05:00 offset is converted: 16:50 − (−5 h) = 21:50Z. Source: ISO 8601 offset rule.
    expect(wind).toMatchObject({ time: "2026-05-14T21:50:00.000Z", remarks: "Tree down, power lines" });
    // Source: knot = 1852 m per hour (BIPM SI Brochure, 9th ed., Table 8) → 65 kt = 33.4389 m/s
    expect(wind!.magnitudeSi).toBeCloseTo((65 * 1852) / 3600, 10);
    expect(unrated).toMatchObject({ magnitude: null, magnitudeUnit: null, magnitudeSi: null });
  });

  it("refuses bad rows one by one, naming the file line and the problem, and keeps the good ones", () => {
    const rows = parseStormReportCsv(
      csv(
        "2026-05-14T21:35Z,35.5,-97.4,tornado,2,EF,fine",
        "2026-05-14T21:35Z,95,-97.4,hail,1,in,",
        "2026-05-14T21:35Z,35.5,-97.4,funnel,,,",
        "2026-05-14T21:35Z,35.5,-97.4,hail,3,kt,",
        "2026-05-14T21:35Z,35.5,-97.4,tornado,2.5,EF,",
        "2026-02-30T21:35Z,35.5,-97.4,wind,50,kt,",
        "2026-05-17T21:35Z,35.5,-97.4,wind,50,kt,",
        "2026-05-14T21:35Z,35.5,-97.4,wind,50,kt,a,b",
        "",
        "2026-05-14T21:35Z,abc,-97.4,wind,50,kt,",
        "2026-05-14T21:35Z,35.5,-97.4,hail,12,in,",
      ),
      NOW,
    );
    const refused = rows.filter((r) => !r.ok).map((r) => [r.line, r.ok ? "" : r.reason]);
    expect(rows[0]!.ok).toBe(true);
    expect(refused).toEqual([
      [3, "latitude 95 is outside −90 to 90 degrees"],
      [4, 'kind "funnel" is not one of tornado, hail, wind'],
      [5, 'magnitude_unit "kt" does not suit hail (use in, mm)'],
      [6, "an EF rating is a whole number 0–5, not 2.5"],
      [7, 'time_utc "2026-02-30T21:35Z" is not a real date and time'],
      [8, 'time_utc "2026-05-17T21:35Z" is more than 24 hours in the future'],
      [9, "8 cells where 7 are expected; put remarks that contain commas in double quotes"],
      // line 10 is blank and skipped
      [11, 'latitude "abc" is not a number in decimal degrees'],
      [12, "magnitude 12 in is outside the plausible range (above 0 to 10 in)"],
    ]);
  });

  it("refuses the whole file when the header is wrong or the quoting is broken", () => {
    expect(() => parseStormReportCsv("time,lat,lon\n", NOW)).toThrow(StormReportFileError);
    expect(() => parseStormReportCsv("", NOW)).toThrow(/the file is empty/);
    expect(() => parseStormReportCsv(csv('2026-05-14T21:35Z,35.5,-97.4,wind,50,kt,"unclosed'), NOW)).toThrow(/line 2: a quoted cell is never closed/);
    // A byte-order mark and CRLF line ends are fine
    expect(parseStormReportCsv(`\ufeff${STORM_REPORT_CSV_HEADER}\r\n2026-05-14T21:35Z,35.5,-97.4,wind,50,kt,\r\n`, NOW)).toHaveLength(1);
  });
});

describe("CSV text", () => {
  it("round-trips quotes, commas and line breaks (RFC 4180)", () => {
    const doc = csvDocument(["a", "b"], [["x, y", 'say "hi"'], ["line\nbreak", 3]]);
    expect(splitCsvRecords(doc).map((r) => r.cells)).toEqual([
      ["a", "b"],
      ["x, y", 'say "hi"'],
      ["line\nbreak", "3"],
    ]);
  });

  it("keeps spreadsheet formulas inert in free text but writes numbers as numbers", () => {
    // Common practice (no source): OWASP guidance on CSV injection prefixes a quote to =, +, -, @
    expect(csvCell("=HYPERLINK(1)")).toBe("'=HYPERLINK(1)");
    expect(csvCell(-3.5)).toBe("-3.5");
    expect(csvCell(null)).toBe("");
    expect(csvCell(Number.NaN)).toBe("");
  });
});

describe("duplicate reports", () => {
  const base = { time: "2026-05-14T21:35:00Z", latitude: 35.5, longitude: -97.4, kind: "hail" as const };
  it("are the same kind within 10 minutes and 3 km", () => {
    expect(isDuplicateReport(base, { ...base, time: "2026-05-14T21:44:00Z", latitude: 35.52 })).toBe(true);
    expect(isDuplicateReport(base, { ...base, time: "2026-05-14T21:46:00Z" })).toBe(false);
    // 0.03° of latitude ≈ 3.3 km (Derived in closed form: 0.03 · 111.2 km)
    expect(isDuplicateReport(base, { ...base, latitude: 35.53 })).toBe(false);
    expect(isDuplicateReport(base, { ...base, kind: "wind" })).toBe(false);
  });
});
