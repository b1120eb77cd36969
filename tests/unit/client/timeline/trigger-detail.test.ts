import { describe, expect, it } from "vitest";
import { coverageSeries, validTimeExtent } from "../../../../src/features/triggers/detail/coverage-series.ts";
import { defaultFrameId, expressionFields, expressionOf, framesOfTrigger } from "../../../../src/features/triggers/detail/trigger-frames.ts";
import { finiteRange, maxInsideMask } from "../../../../src/features/triggers/detail/worst-point.ts";
import { triggerFrame } from "../../../helpers/trigger-summary.ts";

describe("maxInsideMask", () => {
  it("finds the largest value inside the matched area, not the largest overall", () => {
    const values = Float32Array.from([9, 1, 5, Number.NaN, 7, 2]);
    const mask = Uint8Array.from([0, 1, 1, 1, 1, 0]);
    expect(maxInsideMask(values, mask)).toBe(4); // Derived in closed form: inside are 1, 5, NaN, 7; the 9 is outside
  });

  it("keeps the first of equal values and answers -1 when nothing inside has a value", () => {
    expect(maxInsideMask(Float32Array.from([3, 3]), Uint8Array.from([1, 1]))).toBe(0);
    expect(maxInsideMask(Float32Array.from([Number.NaN, 4]), Uint8Array.from([1, 0]))).toBe(-1);
    expect(() => maxInsideMask(new Float32Array(2), new Uint8Array(3))).toThrow(/2 values but 3 mask points/);
  });
});

describe("finiteRange", () => {
  it("skips missing values and is null for a field with none", () => {
    expect(finiteRange(Float32Array.from([Number.NaN, -2, 8, Number.NaN]))).toEqual({ min: -2, max: 8 });
    expect(finiteRange(Float32Array.from([Number.NaN]))).toEqual({ min: null, max: null });
  });
});

describe("framesOfTrigger and defaultFrameId", () => {
  const older = "2026-05-14T12:00:00Z";
  const newer = "2026-05-14T13:00:00Z";
  const frames = [
    triggerFrame({ evaluationId: 1, frameId: 11, runTime: older, validTime: "2026-05-14T18:00:00Z", coveragePercent: 60 }),
    triggerFrame({ evaluationId: 2, frameId: 21, runTime: newer, validTime: "2026-05-14T18:00:00Z", coveragePercent: 20 }),
    triggerFrame({ evaluationId: 3, frameId: 22, runTime: newer, validTime: "2026-05-14T19:00:00Z", coveragePercent: 35 }),
    triggerFrame({ evaluationId: 4, frameId: 23, runTime: newer, validTime: "2026-05-14T20:00:00Z", coveragePercent: 35 }),
    triggerFrame({ evaluationId: 5, frameId: 24, runTime: newer, validTime: "2026-05-14T21:00:00Z", met: false, coveragePercent: 0 }),
  ];

  it("orders frames by valid time then run, keeping a frame's latest check once", () => {
    const again = triggerFrame({ evaluationId: 9, frameId: 22, runTime: newer, validTime: "2026-05-14T19:00:00Z", coveragePercent: 36 });
    const listed = framesOfTrigger([...frames, again]);
    expect(listed.map((f) => f.frameId)).toEqual([11, 21, 22, 23, 24]);
    expect(listed.find((f) => f.frameId === 22)?.evaluationId).toBe(9);
  });

  it("opens the map on the widest matched frame of the newest run, the earlier one on a tie", () => {
    expect(defaultFrameId(frames)).toBe(22);
  });

  it("falls back to the newest frame when nothing matched, and to null with no frames", () => {
    const unmet = frames.map((f) => ({ ...f, met: false }));
    expect(defaultFrameId(unmet)).toBe(24);
    expect(defaultFrameId([])).toBeNull();
  });
});

describe("expressionFields", () => {
  it("lists the fields an expression reads, numeric ones first", () => {
    // Field keys from the catalogue (shared/fields.ts).
    expect(expressionFields("jet_div_favoured == 1 and mlcape >= 1000 and shear_0_6km >= 20")).toEqual(["mlcape", "shear_0_6km", "jet_div_favoured"]);
    expect(expressionFields("mlcape >=")).toEqual([]);
  });

  it("reads the expression defensively from a stored definition", () => {
    expect(expressionOf({ definition: { expression: "mlcape > 1" } })).toBe("mlcape > 1");
    expect(expressionOf({ definition: null })).toBe("");
    expect(expressionOf({ definition: { expression: 42 } })).toBe("");
  });
});

describe("coverageSeries", () => {
  it("makes one series per run, oldest run first, points by valid time", () => {
    const series = coverageSeries([
      triggerFrame({ frameId: 2, runTime: "2026-05-14T13:00:00Z", validTime: "2026-05-14T19:00:00Z", coveragePercent: 30 }),
      triggerFrame({ frameId: 1, runTime: "2026-05-14T13:00:00Z", validTime: "2026-05-14T18:00:00Z", coveragePercent: null, met: false }),
      triggerFrame({ frameId: 3, runTime: "2026-05-14T12:00:00Z", validTime: "2026-05-14T18:00:00Z", coveragePercent: 10 }),
    ]);
    expect(series.map((s) => s.runTime)).toEqual(["2026-05-14T12:00:00Z", "2026-05-14T13:00:00Z"]);
    expect(series[1]!.points.map((p) => [p.frameId, p.coverage, p.met])).toEqual([
      [1, 0, false],
      [2, 30, true],
    ]);
    // Derived in closed form: 18Z and 19Z on 2026-05-14 in epoch milliseconds.
    expect(validTimeExtent(series)).toEqual([Date.UTC(2026, 4, 14, 18), Date.UTC(2026, 4, 14, 19)]);
    expect(validTimeExtent([])).toBeNull();
  });
});
