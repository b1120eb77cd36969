import { describe, expect, it } from "vitest";
import { anyPointWithinKm, anySetWithinKm, pointsOfMask } from "../../../shared/verification/matched-points.ts";
import { KM_PER_DEGREE } from "../../../shared/verification/great-circle.ts";

describe("matched points", () => {
  const lat = Float32Array.from([35, 35, 36, 36]);
  const lon = Float32Array.from([-98, -97, -98, -97]);

  it("gathers the points a mask marks", () => {
    const points = pointsOfMask(Uint8Array.from([0, 1, 1, 0]), lat, lon);
    expect([...points.lat]).toEqual([35, 36]);
    expect([...points.lon]).toEqual([-97, -98]);
  });

  it("finds a point within the distance, by great-circle distance", () => {
    const points = pointsOfMask(Uint8Array.from([1, 0, 0, 0]), lat, lon);
    // Derived in closed form: 0.2° of latitude north of (35, −98) is 0.2 · 111.195 = 22.24 km away
    expect(anyPointWithinKm(points, 35.2, -98, 0.2 * KM_PER_DEGREE + 0.01)).toBe(true);
    expect(anyPointWithinKm(points, 35.2, -98, 0.2 * KM_PER_DEGREE - 0.01)).toBe(false);
    const empty = pointsOfMask(new Uint8Array(4), lat, lon);
    expect(anySetWithinKm([empty, points], 35, -98, 1)).toBe(true);
    expect(anySetWithinKm([empty], 35, -98, 1000)).toBe(false);
  });
});
