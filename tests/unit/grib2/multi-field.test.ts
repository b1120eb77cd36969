import { describe, expect, it } from "vitest";
import { decodeGrib2 } from "../../../server/ingest/grib2/index.ts";
import { expectMatchesListing } from "./helpers/compare.ts";
import { readFixture, readListing } from "./helpers/fixtures.ts";

describe("several fields in one message (sections 3-7 and 4-7 repeated)", () => {
  // Written by own-encoder/write-own-fixtures.ts from ecCodes messages: A with a bitmap, B reusing A's bitmap
  // (indicator 254), C with its own grid and no bitmap.
  const fields = decodeGrib2(readFixture("own-multi-field.grib2"));
  const listing = readListing("own-multi-field.grib2");

  it("yields three fields of one message", () => {
    expect(fields.map((f) => [f.index, f.messageNumber, f.fieldInMessage])).toEqual([
      [0, 1, 0],
      [1, 1, 1],
      [2, 1, 2],
    ]);
    expect(fields.map((f) => f.parameter.shortName)).toEqual(["t", "dpt", "t"]);
  });

  it("applies the previous bitmap where section 6 says 254", () => {
    expect(fields[1].hasBitmap).toBe(true);
    // Source: ecCodes 2.28 grib_get numberOfMissing (26) for fields A and B
    expect([fields[0].missingCount, fields[1].missingCount, fields[2].missingCount]).toEqual([26, 26, 0]);
  });

  it("every field equals ecCodes' decoding", () => {
    // Source: ecCodes 2.28 grib_get_data (multi-field support on)
    fields.forEach((field, k) => expectMatchesListing(field, listing[k]));
    expect(fields[2].scanningMode).toBe(0x40);
  });
});
