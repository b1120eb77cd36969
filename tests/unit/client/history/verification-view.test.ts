import { describe, expect, it } from "vitest";
import { geoArea } from "d3-geo";
import { biasLine, csiContour } from "../../../../src/features/history/charts/performance-geometry.ts";
import { ringsForSphere } from "../../../../src/features/history/charts/report-map.tsx";
import { describeReport, formatMinutes, formatPlace, formatScore } from "../../../../src/features/history/format-verification.ts";
import { defaultPeriod, searchFromVerificationQuery, verificationQueryFromSearch } from "../../../../src/features/history/verification-search-params.ts";
import { historyFiltersFromSearch, searchFromHistoryFilters } from "../../../../src/features/history/history-search-params.ts";
import { csiFromPodAndSuccessRatio } from "../../../../shared/verification/contingency-scores.ts";

describe("performance diagram lines (Roebber 2009)", () => {
  it("puts every point of a CSI contour at that CSI", () => {
    for (const c of [0.1, 0.4, 0.8]) {
      const line = csiContour(c, 20);
      // Derived in closed form: the contour runs from (SR = c, POD = 1) to (SR = 1, POD = c)
      expect(line[0]![0]).toBeCloseTo(c, 12);
      expect(line[0]![1]).toBeCloseTo(1, 12);
      expect(line.at(-1)![1]).toBeCloseTo(c, 12);
      for (const [sr, pod] of line) expect(csiFromPodAndSuccessRatio(pod, sr)).toBeCloseTo(c, 12);
    }
  });

  it("ends bias rays on the square's edge, with POD / SR equal to the bias", () => {
    // Derived in closed form: bias = POD / SR; above 1 the ray leaves through the top (POD = 1)
    expect(biasLine(2)[1]).toEqual([0.5, 1]);
    expect(biasLine(0.5)[1]).toEqual([1, 0.5]);
    expect(() => csiContour(1)).toThrow(RangeError);
  });
});

describe("zones drawn on the sphere", () => {
  it("reverses a counter-clockwise ring that d3 would read as the rest of the globe", () => {
    const ccw = { type: "Polygon", coordinates: [[[-99, 35], [-98, 35], [-98, 36], [-99, 36], [-99, 35]]] };
    // Common practice (no source): d3-geo treats clockwise exterior rings as the small side
    expect(geoArea(ccw as never)).toBeGreaterThan(2 * Math.PI);
    const fixed = ringsForSphere(ccw);
    expect(geoArea(fixed as never)).toBeLessThan(0.001);
    expect(ringsForSphere(fixed)).toEqual(fixed);
  });
});

describe("verification formatting", () => {
  it("writes scores, minutes, places and reports as staff read them", () => {
    expect(formatScore(2 / 3)).toBe("0.67");
    expect(formatScore(null)).toBe("—");
    expect(formatMinutes(45)).toBe("45 min");
    expect(formatMinutes(185)).toBe("3 h 05 min");
    expect(formatMinutes(null)).toBe("—");
    expect(formatPlace(35.5, -97.42)).toBe("35.50° N, 97.42° W");
    expect(describeReport({ kind: "tornado", magnitude: 2, magnitudeUnit: "EF" })).toBe("Tornado EF2");
    expect(describeReport({ kind: "hail", magnitude: 1.75, magnitudeUnit: "in" })).toBe("Hail 1.75 in");
    expect(describeReport({ kind: "wind", magnitude: null, magnitudeUnit: null })).toBe("Wind");
  });
});

describe("filters in the URL", () => {
  const now = new Date("2026-05-14T15:20:00Z");

  it("defaults the verification period to yesterday, today and tomorrow (UTC days)", () => {
    expect(defaultPeriod(now)).toEqual({ from: "2026-05-13T00:00:00.000Z", to: "2026-05-16T00:00:00.000Z" });
    expect(verificationQueryFromSearch(new URLSearchParams(), now)).toMatchObject({ ...defaultPeriod(now), space: "zone", windowHours: 1 });
  });

  it("round-trips a verification query and drops a bad parameter without losing the rest", () => {
    const query = verificationQueryFromSearch(new URLSearchParams("from=2026-05-01T00:00:00.000Z&to=2026-05-02T00:00:00.000Z&ruleId=3&space=area&distanceKm=20&kinds=hail,tornado"), now);
    expect(query).toMatchObject({ ruleId: 3, space: "area", distanceKm: 20, kinds: ["hail", "tornado"] });
    expect(verificationQueryFromSearch(searchFromVerificationQuery(query), now)).toEqual(query);
    const damaged = verificationQueryFromSearch(new URLSearchParams("ruleId=3&windowHours=lots"), now);
    expect(damaged).toMatchObject({ ruleId: 3, windowHours: 1 });
  });

  it("round-trips the history filters and ignores a hand-edited bad one", () => {
    const filters = historyFiltersFromSearch(new URLSearchParams("ruleId=2&severity=urgent&acknowledgedBy=none&state=bogus"));
    expect(filters).toEqual({ ruleId: 2, severity: "urgent", acknowledgedBy: "none" });
    expect(historyFiltersFromSearch(searchFromHistoryFilters(filters))).toEqual(filters);
  });
});
