import { describe, expect, it } from "vitest";
import { greatCircleKm, KM_PER_DEGREE, MEAN_EARTH_RADIUS_KM } from "../../../shared/verification/great-circle.ts";
import { distanceOutsideZoneKm, distanceToZoneEdgeKm } from "../../../shared/verification/zone-proximity.ts";
import type { ZoneGeometry } from "../../../shared/zones/zone-geometry.ts";

const SQUARE: ZoneGeometry = { type: "Polygon", coordinates: [[[-99, 35], [-98, 35], [-98, 36], [-99, 36], [-99, 35]]] };

describe("great-circle distance", () => {
  it("gives a degree of latitude and a quarter meridian", () => {
    // Derived in closed form: arc = R·Δφ on a sphere of the GRS80 mean radius (Moritz 2000), 6371.0088 km
    expect(greatCircleKm(35, -98, 36, -98)).toBeCloseTo(MEAN_EARTH_RADIUS_KM * (Math.PI / 180), 9);
    expect(greatCircleKm(0, 10, 90, 10)).toBeCloseTo((MEAN_EARTH_RADIUS_KM * Math.PI) / 2, 6);
  });

  it("shrinks east–west spacing with the cosine of latitude for short hops", () => {
    // Derived in closed form: for small Δλ on one parallel, distance ≈ R·Δλ·cos φ
    const d = greatCircleKm(60, 0, 60, 0.01);
    expect(d).toBeCloseTo(KM_PER_DEGREE * 0.01 * 0.5, 4);
  });
});

describe("distance from a report to a zone", () => {
  it("is zero inside and the perpendicular distance outside", () => {
    expect(distanceOutsideZoneKm(SQUARE, 35.5, -98.5, 0.5)).toBe(0);
    // Derived in closed form: 0.1° of latitude north of the top edge = 0.1 · 111.195 km
    expect(distanceOutsideZoneKm(SQUARE, 36.1, -98.5, 0.5)).toBeCloseTo(0.1 * KM_PER_DEGREE, 6);
    // Derived in closed form: 0.1° of longitude east of the east edge at 35.5° N ≈ 0.1 · 111.195 · cos 35.5° (local plane)
    expect(distanceOutsideZoneKm(SQUARE, 35.5, -97.9, 0.5)).toBeCloseTo(0.1 * KM_PER_DEGREE * Math.cos((35.5 * Math.PI) / 180), 6);
  });

  it("treats a point on the edge, or within the tolerance of it, as inside", () => {
    expect(distanceOutsideZoneKm(SQUARE, 36, -98.5, 0.5)).toBe(0);
    expect(distanceOutsideZoneKm(SQUARE, 36.003, -98.5, 0.5)).toBe(0);
    expect(distanceOutsideZoneKm(SQUARE, 36.01, -98.5, 0.5)).toBeGreaterThan(1);
    // Common practice (no source): distance to the nearest corner when beyond both edges
    expect(distanceToZoneEdgeKm(SQUARE, 36.1, -97.9)).toBeCloseTo(greatCircleKm(36.1, -97.9, 36, -98), 0);
  });
});
