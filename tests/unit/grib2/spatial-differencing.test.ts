import { describe, expect, it } from "vitest";
import { decodeGrib2 } from "../../../server/ingest/grib2/index.ts";
import {
  encodeComplex,
  SECONDARY_MISSING,
  type ComplexEncodeOptions,
} from "../../fixtures/grib2/own-encoder/complex-packing-encoder.ts";
import { bitmapIndicatorSection, buildMessage, readSections, sectionOf } from "../../fixtures/grib2/own-encoder/message-builder.ts";
import { syntheticField } from "../../fixtures/grib2/own-encoder/synthetic-field.ts";
import { expectMatchesListing, FLOAT32_RELATIVE } from "./helpers/compare.ts";
import { readFixture, readListing, readOriginal } from "./helpers/fixtures.ts";

/**
 * ecCodes 2.28 cannot write real spatial differencing (its template 5.3 output uses order 0), so these files come
 * from the test folder's own encoder, written from WMO-No. 306 templates 5.2/5.3 and 7.2/7.3. Two independent
 * readers must agree with the values that went in: ecCodes' grib_get_data and Bellwether's decoder.
 */
const OWN_FIXTURES = [
  "own-spatial-order2.grib2",
  "own-spatial-order1.grib2",
  "own-complex-missing.grib2",
  "own-spatial-order2-missing.grib2",
  "own-spatial-order2-constant.grib2",
];

/** Original values are in storage order; these fixtures scan north row first (mode 0), 12 x 9. */
function storedToCanonical(values: Float32Array, nx: number, ny: number, k: number): number {
  const row = Math.floor(k / nx);
  return values[(ny - 1 - row) * nx + (k % nx)];
}

describe("complex packing written by the own encoder", () => {
  it.each(OWN_FIXTURES)("%s: ecCodes reads back exactly the values that were encoded", (name) => {
    const original = readOriginal(name).values;
    const listed = readListing(name)[0];
    expect(listed).toHaveLength(original.length);
    listed.forEach((point, k) => {
      const expected = original[k];
      // Source: the encoder's input, rounded to its decimal scale (Derived in closed form)
      if (expected === null) expect(point.value).toBeNaN();
      else expect(Math.abs(point.value - expected)).toBeLessThan(1e-6);
    });
  });

  it.each(OWN_FIXTURES)("%s: Bellwether decodes the values that were encoded", (name) => {
    const [field] = decodeGrib2(readFixture(name));
    const original = readOriginal(name).values;
    const { nx, ny } = field.geometry;
    original.forEach((expected, k) => {
      const decoded = storedToCanonical(field.values, nx, ny, k);
      // Source: the encoder's input, rounded to its decimal scale (Derived in closed form)
      if (expected === null) expect(decoded).toBeNaN();
      else expect(Math.abs(decoded - expected)).toBeLessThanOrEqual(Math.abs(expected) * FLOAT32_RELATIVE);
    });
    expect(field.missingCount).toBe(original.filter((v) => v === null).length);
    // Source: ecCodes 2.28 grib_get_data
    expectMatchesListing(field, readListing(name)[0]);
  });

  it("the second-order file really uses template 5.3 with order 2", () => {
    const bytes = readFixture("own-spatial-order2.grib2");
    const [field] = decodeGrib2(bytes);
    expect(field.dataTemplate).toBe(3);
    // Octet 48 of section 5 holds the order of spatial differencing (WMO-No. 306 template 5.3).
    const section5 = readSections(bytes).sections.get(5)!;
    expect(section5[47]).toBe(2);
  });
});

describe("round trips through the own encoder, in memory", () => {
  // +j scanning, so storage order is the canonical order.
  const base = readSections(readFixture("scan-40.grib2"));
  const pattern = syntheticField(12, 9);
  const negative = pattern.map((v, k) => v - 300 + (k % 7) * 0.37);

  const encodeAndDecode = (values: number[], options: ComplexEncodeOptions) => {
    const { section5, section7 } = encodeComplex(values, options);
    const message = buildMessage(base.discipline, [
      sectionOf(base, 1),
      sectionOf(base, 3),
      sectionOf(base, 4),
      section5,
      bitmapIndicatorSection(255),
      section7,
    ]);
    return decodeGrib2(message)[0];
  };

  const CASES: [string, number[], ComplexEncodeOptions][] = [
    ["order 2, one long group", pattern, { order: 2, decimalScale: 2, groupLengths: [200], missingManagement: 0 }],
    ["order 2, groups of one value", pattern, { order: 2, decimalScale: 1, groupLengths: [1], missingManagement: 0 }],
    ["order 1, negative values", negative, { order: 1, decimalScale: 3, groupLengths: [4, 10], missingManagement: 0 }],
    ["order 0, negative values", negative, { order: 0, decimalScale: 2, groupLengths: [3, 5, 9], missingManagement: 0 }],
    ["order 0, a constant field", pattern.map(() => -12.25), { order: 0, decimalScale: 2, groupLengths: [7], missingManagement: 0 }],
    [
      "order 1, primary missing in a whole group",
      pattern.map((v, k) => (k >= 10 && k < 30 ? Number.NaN : v)),
      { order: 1, decimalScale: 2, groupLengths: [5], missingManagement: 1 },
    ],
    [
      "order 2, primary and secondary missing",
      pattern.map((v, k) => (k % 5 === 0 ? Number.NaN : k % 7 === 1 ? SECONDARY_MISSING : v)),
      { order: 2, decimalScale: 2, groupLengths: [6, 10], missingManagement: 2 },
    ],
  ];

  it.each(CASES)("%s", (_label, values, options) => {
    const field = encodeAndDecode(values, options);
    const scale = 10 ** options.decimalScale;
    values.forEach((v, k) => {
      // Source: the encoder's input rounded to its decimal scale (Derived in closed form)
      if (Number.isNaN(v) || v === SECONDARY_MISSING) {
        expect(field.values[k]).toBeNaN();
      } else {
        const expected = Math.round(v * scale) / scale;
        expect(Math.abs(field.values[k] - expected)).toBeLessThanOrEqual(Math.abs(expected) * FLOAT32_RELATIVE + 1e-12);
      }
    });
    expect(field.missingCount).toBe(values.filter((v) => Number.isNaN(v) || v === SECONDARY_MISSING).length);
  });
});
