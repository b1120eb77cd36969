import { describe, expect, it } from "vitest";
import type { FieldKey } from "../../../shared/fields.ts";
import { evaluateSpatialCondition, summariseMatches, type MatchSummary } from "../../../shared/rules/aggregate.ts";
import { compileRule } from "../../../shared/rules/compile-rule.ts";
import { parseRuleOrThrow } from "../../../shared/rules/parse-rule.ts";

const NaN32 = Number.NaN;

/**
 * A hand-built 2 x 5 frame. The zone is the first row. In the zone, mlcape is met at 3 of the 4 points
 * with data (the fifth point is missing); the second row also matches but lies outside the zone.
 */
const frame = new Map<FieldKey, Float32Array>([
  ["mlcape", Float32Array.from([1500, 2500, 900, 1200, NaN32, 3000, 3000, 3000, 3000, 3000])],
  ["stp_eff", Float32Array.from([1.5, NaN32, 9, 0.5, 2, 8, 8, 8, 8, 8])],
]);
const zone = Uint8Array.from([1, 1, 1, 1, 1, 0, 0, 0, 0, 0]);
const fields = (key: FieldKey) => frame.get(key);

function summary(expression = "mlcape >= 1000", zoneMask: Uint8Array | "whole grid" = zone): MatchSummary {
  const rule = compileRule(parseRuleOrThrow(expression));
  const n = zone.length;
  return summariseMatches({
    met: rule.evaluate(fields, n),
    notMet: rule.evaluateNotMet(fields, n),
    zone: zoneMask === "whole grid" ? undefined : zoneMask,
    fields,
    summaryKeys: [...rule.fieldKeys, "stp_eff"],
  });
}

describe("summariseMatches", () => {
  it("counts zone, decided and matched points and the coverage among points with data", () => {
    const s = summary();
    expect(s.zonePoints).toBe(5); // Derived in closed form: the zone mask has five 1s
    expect(s.decidedPoints).toBe(4); // Derived in closed form: the missing mlcape point is left out
    expect(s.matchedPoints).toBe(3); // Derived in closed form: 1500, 2500, 1200 >= 1000
    expect(s.coveragePercent).toBe(75); // Derived in closed form: 3 / 4
  });

  it("summarises each field over the matched points of the zone only, skipping missing values", () => {
    const [mlcape, stp] = summary().fields;
    expect(mlcape).toEqual({ key: "mlcape", max: 2500, min: 1200, mean: (1500 + 2500 + 1200) / 3, points: 3 }); // Derived in closed form
    expect(stp).toEqual({ key: "stp_eff", max: 1.5, min: 0.5, mean: 1, points: 2 }); // Derived in closed form: 1.5 and 0.5 (the matched point at 2500 J/kg has no stp_eff)
  });

  it("uses the whole grid when no zone is given", () => {
    const s = summary("mlcape >= 1000", "whole grid");
    expect([s.zonePoints, s.decidedPoints, s.matchedPoints]).toEqual([10, 9, 8]); // Derived in closed form
  });

  it("gives null statistics and coverage when nothing matched or nothing could be decided", () => {
    const none = summary("mlcape > 5000");
    expect(none.matchedPoints).toBe(0);
    expect(none.coveragePercent).toBe(0);
    expect(none.fields[0]).toEqual({ key: "mlcape", max: null, min: null, mean: null, points: 0 });
    const empty = summary("mlcape >= 1000", new Uint8Array(10));
    expect(empty.coveragePercent).toBeNull();
  });

  it("refuses masks and fields of the wrong length", () => {
    const met = new Uint8Array(10);
    expect(() => summariseMatches({ met, notMet: new Uint8Array(9), fields, summaryKeys: [] })).toThrow(/"not met" mask has 9/);
    expect(() => summariseMatches({ met, notMet: met, zone: new Uint8Array(3), fields, summaryKeys: [] })).toThrow(/zone mask has 3/);
    expect(() => summariseMatches({ met, notMet: met, fields: () => new Float32Array(2), summaryKeys: ["mlcape"] })).toThrow(/has 2 values/);
  });
});

describe("evaluateSpatialCondition", () => {
  const s = summary(); // 3 matched of 4 decided, stp_eff over matches from 0.5 to 1.5

  it("any point: met as soon as one point matched", () => {
    expect(evaluateSpatialCondition({ kind: "any-point" }, s)).toEqual({ met: true, reason: "3 points met the expression; any point is enough." });
    expect(evaluateSpatialCondition({ kind: "any-point" }, summary("mlcape > 5000"))).toEqual({ met: false, reason: "No point of the zone met the expression." });
  });

  it("at least N points", () => {
    expect(evaluateSpatialCondition({ kind: "min-points", points: 3 }, s).met).toBe(true); // Derived in closed form: 3 >= 3
    const four = evaluateSpatialCondition({ kind: "min-points", points: 4 }, s);
    expect(four).toEqual({ met: false, reason: "3 points met the expression; at least 4 required." });
  });

  it("at least P % of the zone's points with data", () => {
    expect(evaluateSpatialCondition({ kind: "min-coverage", percent: 75 }, s).met).toBe(true); // Derived in closed form: 75 >= 75
    const eighty = evaluateSpatialCondition({ kind: "min-coverage", percent: 80 }, s);
    expect(eighty).toEqual({ met: false, reason: "3 points met the expression: 75 % of the zone's points with data; at least 80 % required." });
  });

  it("zone maximum or minimum of a field, over the matched points, beyond a value", () => {
    const max = evaluateSpatialCondition({ kind: "zone-extreme", statistic: "max", field: "stp_eff", comparison: ">=", value: 1 }, s);
    expect(max).toEqual({ met: true, reason: "Maximum stp_eff over the matched points is 1.5; needs >= 1." });
    // Outside the zone stp_eff reaches 8 and at an unmatched zone point 9: neither counts.
    expect(evaluateSpatialCondition({ kind: "zone-extreme", statistic: "max", field: "stp_eff", comparison: ">", value: 2 }, s).met).toBe(false);
    const min = evaluateSpatialCondition({ kind: "zone-extreme", statistic: "min", field: "mlcape", comparison: "<", value: 1000 }, s);
    expect(min).toEqual({ met: false, reason: "Minimum mlcape over the matched points is 1200 J kg-1; needs < 1000 J kg-1." });
  });

  it("explains a zone that covers no grid point, and a field that was not summarised", () => {
    const empty = summary("mlcape >= 1000", new Uint8Array(10));
    expect(evaluateSpatialCondition({ kind: "any-point" }, empty)).toEqual({ met: false, reason: "The zone covers no grid point." });
    expect(() => evaluateSpatialCondition({ kind: "zone-extreme", statistic: "max", field: "pwat", comparison: ">=", value: 40 }, s)).toThrow(/"pwat" was not summarised/);
  });
});
