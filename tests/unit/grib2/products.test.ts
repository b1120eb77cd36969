import { describe, expect, it } from "vitest";
import { decodeGrib2, scanGrib2 } from "../../../server/ingest/grib2/index.ts";
import { expectMatchesListing } from "./helpers/compare.ts";
import { isoFromEccodes, readEccodesKeys, readFixture, readListing } from "./helpers/fixtures.ts";

describe("a file of sixteen messages (template 4.0)", () => {
  const fields = decodeGrib2(readFixture("multi-message.grib2"));
  const keys = readEccodesKeys("multi-message.grib2");
  const listing = readListing("multi-message.grib2");

  it("decodes every message, in file order, with ecCodes' values", () => {
    expect(fields).toHaveLength(16);
    fields.forEach((field, k) => {
      expect(field.index).toBe(k);
      expect(field.messageNumber).toBe(k + 1);
      // Source: ecCodes 2.28 grib_get_data
      expectMatchesListing(field, listing[k]);
    });
    // Messages follow each other without gaps.
    fields.slice(1).forEach((field, k) => expect(field.byteOffset).toBe(fields[k].byteOffset + fields[k].byteLength));
  });

  it("reads discipline, category, number, level, reference and valid time as ecCodes does", () => {
    fields.forEach((field, k) => {
      const row = keys[k];
      // Source: ecCodes 2.28 grib_get (eccodes-keys.txt)
      expect([field.discipline, field.category, field.number]).toEqual([
        Number(row.discipline),
        Number(row.parameterCategory),
        Number(row.parameterNumber),
      ]);
      expect(field.refTime).toBe(isoFromEccodes(row.dataDate, row.dataTime));
      expect(field.validTime).toBe(isoFromEccodes(row.validityDate, row.validityTime));
      if (row.scaledValueOfFirstFixedSurface !== "MISSING") {
        expect(field.level).toBe(Number(row.scaledValueOfFirstFixedSurface) / 10 ** Number(row.scaleFactorOfFirstFixedSurface));
      } else {
        expect(field.level).toBe(0);
      }
    });
  });

  it("turns forecast times in hours and in minutes into seconds", () => {
    // Source: make-fixtures.sh writes 6 hours (unit code 1) and, for message 11, 390 minutes (unit code 0)
    expect(fields[0].forecastSeconds).toBe(6 * 3600);
    expect(fields[10].forecastSeconds).toBe(390 * 60);
    // Source: ecCodes 2.28 grib_get validityTime 1830 for message 11
    expect(fields[10].validTime).toBe("2007-03-23T18:30:00Z");
  });

  it("names levels and parameters", () => {
    const summary = fields.map((f) => `${f.parameter.shortName}@${f.levelType}:${f.level}`);
    // Source: WMO-No. 306 Code Tables 4.2 (parameters) and 4.5 (surfaces: 100 isobaric in Pa, 103 height above
    // ground in m, 1 ground, 101 mean sea level); the short names follow the usual GRIB conventions
    expect(summary).toEqual([
      "t@isobaric:50000",
      "u@isobaric:50000",
      "v@isobaric:50000",
      "gh@isobaric:50000",
      "r@isobaric:85000",
      "q@isobaric:85000",
      "dpt@isobaric:70000",
      "2t@heightAboveGround:2",
      "2d@heightAboveGround:2",
      "10u@heightAboveGround:10",
      "10v@heightAboveGround:10",
      "sp@surface:0",
      "orog@surface:0",
      "prmsl@meanSea:0",
      "pres@heightAboveGround:1.5",
      "unknown-10-0-3@surface:0",
    ]);
    // Source: WMO-No. 306 Code Table 4.2-0-0, parameter 0: temperature in K; 4.2-0-2 parameter 2: u wind in m s-1
    expect(fields[0].parameter).toMatchObject({ name: "Temperature", unit: "K" });
    expect(fields[1].parameter.unit).toBe("m s-1");
    expect(fields[0].productTemplate).toBe(0);
    expect(fields[0].statistics).toBeNull();
    expect(fields[0].secondLevel).toBeNull();
  });
});

describe("statistically processed fields", () => {
  it("template 4.8: an accumulation over hours 6 to 12 is valid at the end of its period", () => {
    const [field] = scanGrib2(readFixture("product-4-8.grib2"));
    const [row] = readEccodesKeys("product-4-8.grib2");
    expect(field.productTemplate).toBe(8);
    expect(field.parameter.shortName).toBe("tp");
    // Source: ecCodes 2.28 grib_get (dataDate/dataTime, validityDate/validityTime); stepRange 6-12 in make-fixtures.sh
    expect(field.refTime).toBe(isoFromEccodes(row.dataDate, row.dataTime));
    expect(field.validTime).toBe(isoFromEccodes(row.validityDate, row.validityTime));
    expect(field.forecastSeconds).toBe(12 * 3600);
    // Source: WMO-No. 306 Code Table 4.10, code 1 = accumulation
    expect(field.statistics).toEqual({
      process: 1,
      processName: "accumulation",
      startTime: "2007-03-23T18:00:00Z",
      endTime: "2007-03-24T00:00:00Z",
      lengthSeconds: 6 * 3600,
    });
  });

  it("template 4.11: an ensemble member's 3-hour maximum", () => {
    const [field] = scanGrib2(readFixture("product-4-11.grib2"));
    const [row] = readEccodesKeys("product-4-11.grib2");
    expect(field.productTemplate).toBe(11);
    // Source: make-fixtures.sh writes perturbation 4 of 21 members, stepRange 12-15
    expect(field.ensemble).toMatchObject({ perturbation: 4, membersInEnsemble: 21 });
    // Source: ecCodes 2.28 grib_get validityDate/validityTime
    expect(field.validTime).toBe(isoFromEccodes(row.validityDate, row.validityTime));
    // Source: WMO-No. 306 Code Table 4.10, code 2 = maximum
    expect(field.statistics).toMatchObject({ process: 2, processName: "maximum", lengthSeconds: 3 * 3600 });
    expect([field.parameter.shortName, field.levelType, field.level]).toEqual(["2t", "heightAboveGround", 2]);
  });
});

describe("decoding selected fields only", () => {
  it("unpacks just the fields the filter keeps, with their file positions", () => {
    const bytes = readFixture("multi-message.grib2");
    const winds = decodeGrib2(bytes, { select: (f) => f.parameter.shortName === "u" || f.parameter.shortName === "v" });
    expect(winds.map((f) => [f.index, f.parameter.shortName])).toEqual([
      [1, "u"],
      [2, "v"],
    ]);
    // Source: ecCodes 2.28 grib_get_data
    expectMatchesListing(winds[1], readListing("multi-message.grib2")[2]);
  });
});

describe("scanGrib2 lists metadata without unpacking", () => {
  it("gives the same metadata as decodeGrib2", () => {
    const bytes = readFixture("multi-message.grib2");
    const listed = scanGrib2(bytes);
    const decoded = decodeGrib2(bytes).map(({ values: _values, missingCount: _missing, ...info }) => info);
    expect(listed).toEqual(decoded);
  });
});
