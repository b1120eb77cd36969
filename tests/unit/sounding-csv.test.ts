import { describe, expect, it } from "vitest";
import { parseSoundingCsv, SoundingFormatError, SOUNDING_CSV_HEADER } from "../../shared/sounding/csv.ts";
import { DEMO_SOUNDINGS } from "../../shared/demo/soundings.ts";

const GOOD_ROWS = ["1000,110,25,18,180,10", "925,800,20,15,200,20", "850,1500,15,10,220,30", "700,3100,5,-5,240,40", "500,5800,-12,-30,250,50"];

function csv(...rows: string[]): string {
  return [SOUNDING_CSV_HEADER, ...rows].join("\n");
}

function errorOf(text: string): SoundingFormatError {
  try {
    parseSoundingCsv(text);
  } catch (err) {
    if (err instanceof SoundingFormatError) return err;
    throw err;
  }
  throw new Error("expected a SoundingFormatError");
}

describe("sounding CSV reader", () => {
  it("reads a valid file into SI units, surface first", () => {
    const profile = parseSoundingCsv(csv(...GOOD_ROWS));
    expect(profile.pressure[0]).toBe(100000);
    expect(profile.temperature[0]).toBeCloseTo(298.15, 9);
    expect(profile.lines).toEqual([2, 3, 4, 5, 6]);
    // Derived in closed form: a 10-kt wind from the south (180°) blows toward +y: u = 0, v = +5.144 m/s.
    expect(profile.u[0]).toBeCloseTo(0, 9);
    expect(profile.v[0]).toBeCloseTo(10 * (1852 / 3600), 9);
  });

  it("skips blank lines, accepts CRLF and a byte-order mark, and keeps rows without wind as NaN", () => {
    const text = "\uFEFF" + [SOUNDING_CSV_HEADER, "", GOOD_ROWS[0], "850,1500,15,10,,", "", ...GOOD_ROWS.slice(3), "   ", "400,7200,-22,-40,255,60", ""].join("\r\n");
    const profile = parseSoundingCsv(text);
    expect(profile.pressure.length).toBe(5);
    expect(profile.u[1]).toBeNaN();
    expect(profile.v[1]).toBeNaN();
    expect(profile.lines).toEqual([3, 4, 6, 7, 9]);
  });

  it("reads both demo soundings", () => {
    for (const demo of DEMO_SOUNDINGS) expect(parseSoundingCsv(demo.csv).pressure.length).toBeGreaterThanOrEqual(5);
  });

  const failures: Array<[string, string, number, RegExp]> = [
    ["wrong header", ["pressure,height,temp,dewpoint,dir,speed", ...GOOD_ROWS].join("\n"), 1, /header must be exactly/],
    ["empty file", "\n\n", 1, /empty/],
    ["non-monotonic pressure", csv(GOOD_ROWS[0], GOOD_ROWS[1], "930,1600,15,10,220,30", ...GOOD_ROWS.slice(3)), 4, /pressure_hpa 930 does not decrease from 925 on line 3/],
    ["height not increasing", csv(GOOD_ROWS[0], "925,100,20,15,200,20", ...GOOD_ROWS.slice(2)), 3, /height_m 100 does not increase/],
    ["dewpoint above temperature", csv(GOOD_ROWS[0], GOOD_ROWS[1], "850,1500,15,16,220,30", ...GOOD_ROWS.slice(3)), 4, /dewpoint_c 16 is above temp_c 15/],
    ["impossible temperature", csv(GOOD_ROWS[0], "925,800,95,15,200,20", ...GOOD_ROWS.slice(2)), 3, /temp_c 95 is outside the possible range/],
    ["impossible pressure", csv("1200,110,25,18,180,10", ...GOOD_ROWS.slice(1)), 2, /pressure_hpa 1200 is outside/],
    ["impossible wind direction", csv(GOOD_ROWS[0], "925,800,20,15,400,20", ...GOOD_ROWS.slice(2)), 3, /wind_dir_deg 400 is outside/],
    ["negative wind speed", csv(GOOD_ROWS[0], "925,800,20,15,200,-3", ...GOOD_ROWS.slice(2)), 3, /wind_speed_kt -3 is outside/],
    ["too few levels", csv(...GOOD_ROWS.slice(0, 3)), 4, /3 levels; at least 5 are needed/],
    ["truncated row", csv(GOOD_ROWS[0], "925,800,20", ...GOOD_ROWS.slice(2)), 3, /truncated row: expected 6 cells/],
    ["too many cells", csv(GOOD_ROWS[0], "925,800,20,15,200,20,7", ...GOOD_ROWS.slice(2)), 3, /expected 6 cells, found 7/],
    ["non-numeric cell", csv(GOOD_ROWS[0], "925,800,warm,15,200,20", ...GOOD_ROWS.slice(2)), 3, /temp_c "warm" is not a number/],
    ["missing temperature", csv(GOOD_ROWS[0], "925,800,,15,200,20", ...GOOD_ROWS.slice(2)), 3, /temp_c is empty/],
    ["half a wind", csv(GOOD_ROWS[0], "925,800,20,15,200,", ...GOOD_ROWS.slice(2)), 3, /wind_speed_kt is empty but wind_dir_deg is not/],
  ];
  for (const [name, text, line, message] of failures) {
    it(`rejects ${name} with the file line in the message`, () => {
      const err = errorOf(text);
      expect(err.line).toBe(line);
      expect(err.message).toMatch(new RegExp(`^line ${line}: `));
      expect(err.message).toMatch(message);
    });
  }
});
