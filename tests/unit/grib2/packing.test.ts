import { beforeAll, describe, expect, it } from "vitest";
import { decodeGrib2, Grib2DecodeError, loadGrib2Codecs } from "../../../server/ingest/grib2/index.ts";
import { expectMatchesListing } from "./helpers/compare.ts";
import { readFixture, readListing } from "./helpers/fixtures.ts";

beforeAll(async () => {
  await loadGrib2Codecs();
});

/** [fixture, data representation template, bits per value] for every packing ecCodes writes. */
const CASES: [string, number, number][] = [
  ["simple-16bit.grib2", 0, 16],
  ["simple-12bit-wind.grib2", 0, 12],
  ["simple-constant.grib2", 0, 0],
  ["complex.grib2", 2, 12],
  ["complex-spatial-eccodes.grib2", 3, 12],
  ["jpeg2000.grib2", 40, 16],
  ["jpeg2000-8bit.grib2", 40, 8],
  ["jpeg2000-12bit-wind.grib2", 40, 12],
  ["png-8bit.grib2", 41, 8],
  ["png-16bit.grib2", 41, 16],
  ["png-24bit.grib2", 41, 24],
  ["ccsds.grib2", 42, 16],
  ["ccsds-patchy-16bit-block8-rsi2.grib2", 42, 16],
  ["ccsds-patchy-12bit-block16-rsi3.grib2", 42, 12],
  ["ccsds-patchy-24bit-block32-rsi1.grib2", 42, 24],
  ["ccsds-patchy-7bit-block64-rsi2.grib2", 42, 7],
  ["ccsds-patchy-3bit-block8-rsi4.grib2", 42, 3],
  ["ccsds-patchy-10bit-block16-rsi5.grib2", 42, 10],
  ["ccsds-lowentropy-block8-rsi16.grib2", 42, 8],
  ["ccsds-lowentropy-block16-rsi4.grib2", 42, 8],
  ["ccsds-flags6-8bit-lowentropy.grib2", 42, 8],
  ["ccsds-flags15-8bit-lowentropy.grib2", 42, 8],
  ["ccsds-flags30-2bit-patchy.grib2", 42, 2],
  ["ccsds-flags30-4bit-patchy.grib2", 42, 4],
];

describe("packed values equal ecCodes' own decoding", () => {
  it.each(CASES)("%s (template 5.%i, %i bits)", (name, template, bits) => {
    const [field] = decodeGrib2(readFixture(name));
    expect(field.dataTemplate).toBe(template);
    expect(field.bitsPerValue).toBe(bits);
    // Source: ecCodes 2.28 grib_get_data (make-fixtures.sh)
    expectMatchesListing(field, readListing(name)[0]);
  });

  it("a zero-bit field is the reference value everywhere", () => {
    const [field] = decodeGrib2(readFixture("simple-constant.grib2"));
    // Source: ecCodes 2.28 grib_get_data (every point 287.5)
    expect(new Set(field.values)).toEqual(new Set([287.5]));
  });
});

describe("bitmaps (section 6)", () => {
  const BITMAP_CASES: [string, number][] = [
    ["bitmap-simple.grib2", 0],
    ["bitmap-complex.grib2", 2],
    ["bitmap-complex-spatial.grib2", 3],
    ["bitmap-jpeg2000.grib2", 40],
    ["bitmap-ccsds.grib2", 42],
  ];

  it.each(BITMAP_CASES)("%s: missing points are NaN, the rest equal ecCodes", (name, template) => {
    const [field] = decodeGrib2(readFixture(name));
    expect(field.dataTemplate).toBe(template);
    expect(field.hasBitmap).toBe(true);
    // Source: ecCodes 2.28 grib_get_data -m NaN; 26 of 108 points missing (eccodes-keys.txt numberOfMissing)
    expectMatchesListing(field, readListing(name)[0]);
    expect(field.missingCount).toBe(26);
  });

  it("a field whose bitmap marks every point missing decodes to all NaN", () => {
    const [field] = decodeGrib2(readFixture("bitmap-all-missing.grib2"));
    // Source: ecCodes 2.28 grib_get_data -m NaN (108 of 108 missing)
    expect(field.packedValueCount).toBe(0);
    expect(field.missingCount).toBe(108);
    expect(field.values.every(Number.isNaN)).toBe(true);
  });
});

describe("JPEG 2000 limits", () => {
  it("refuses samples wider than the codec returns instead of decoding them wrongly", () => {
    // ecCodes wrote 20-bit samples; the WebAssembly codec hands back saturated 8-bit triples for them.
    expect(() => decodeGrib2(readFixture("jpeg2000-20bit.grib2"))).toThrowError(Grib2DecodeError);
    expect(() => decodeGrib2(readFixture("jpeg2000-20bit.grib2"))).toThrowError(/section 7.*20 bits/);
  });
});
