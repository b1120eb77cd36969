import { describe, expect, it } from "vitest";
import { unmapResidual } from "../../../server/ingest/grib2/ccsds/predictor.ts";

/**
 * The forward prediction-error mapper of CCSDS 121.0-B-2 (preprocessor, unit-delay predictor), written here from
 * the standard's definition: with theta = min(prediction - min, max - prediction) and error d = x - prediction,
 * delta = 2d for 0 <= d <= theta, 2|d| - 1 for -theta <= d < 0, theta + |d| otherwise.
 */
function mapResidual(sample: number, prediction: number, minimum: number, maximum: number): number {
  const theta = Math.min(prediction - minimum, maximum - prediction);
  const d = sample - prediction;
  if (d >= 0 && d <= theta) return 2 * d;
  if (d < 0 && d >= -theta) return 2 * -d - 1;
  return theta + Math.abs(d);
}

describe("CCSDS prediction-error unmapping", () => {
  it.each([
    ["unsigned 4-bit", 0, 15],
    ["signed 4-bit", -8, 7],
    ["unsigned 1-bit", 0, 1],
  ])("inverts the mapping for every sample and prediction (%s)", (_label, minimum, maximum) => {
    for (let prediction = minimum; prediction <= maximum; prediction++) {
      const seen = new Set<number>();
      for (let sample = minimum; sample <= maximum; sample++) {
        const delta = mapResidual(sample, prediction, minimum, maximum);
        seen.add(delta);
        // Derived in closed form: unmapping the mapped residual gives the sample back
        expect(unmapResidual(delta, prediction, minimum, maximum)).toBe(sample);
      }
      // The mapping is a bijection onto 0 .. max - min.
      expect(seen.size).toBe(maximum - minimum + 1);
      expect(Math.max(...seen)).toBe(maximum - minimum);
    }
  });

  it("maps small errors to small codes: 0, -1, +1, -2 become 0, 1, 2, 3", () => {
    // Derived in closed form from the definition above, prediction 100 of an 8-bit range
    expect([0, 1, 2, 3].map((delta) => unmapResidual(delta, 100, 0, 255))).toEqual([100, 99, 101, 98]);
  });
});
