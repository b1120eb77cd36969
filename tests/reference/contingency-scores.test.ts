import { describe, expect, it } from "vitest";
import { countsFromTable, csiFromPodAndSuccessRatio, proportionCorrect, verificationScores } from "../../shared/verification/contingency-scores.ts";

/**
 * Finley's 1884 tornado forecasts, the classic 2 × 2 example of forecast verification.
 * Source: Finley (1884) as tabulated by the WWRP/WGNE Joint Working Group on Forecast Verification
 * Research ("Finley (1884) Tornado Forecasts", CAWCR verification pages) and discussed by Murphy
 * (1996), Wea. Forecasting 11, 3–20: 28 hits, 72 false alarms, 23 misses, 2680 correct negatives.
 */
const FINLEY = { hits: 28, falseAlarms: 72, misses: 23, correctNegatives: 2680 };

describe("contingency scores on Finley's tornado forecasts", () => {
  const scores = verificationScores(countsFromTable(FINLEY));

  it("reproduces the published scores", () => {
    // Source: JWGFVR Finley page — accuracy 96.6 %, bias "roughly twice", POD "slightly more than half", FAR 72 %, threat score 23 %
    expect(proportionCorrect(FINLEY)).toBeCloseTo(0.966, 3);
    expect(scores.far).toBeCloseTo(0.72, 10);
    expect(scores.csi).toBeCloseTo(0.23, 2);
    expect(scores.pod!).toBeGreaterThan(0.5);
    expect(scores.pod!).toBeLessThan(0.6);
    expect(scores.bias!).toBeGreaterThan(1.9);
    expect(scores.bias!).toBeLessThan(2.0);
  });

  it("gives exactly the textbook fractions of the table's counts", () => {
    // Derived in closed form: POD = a/(a+c) = 28/51, FAR = b/(a+b) = 72/100, CSI = a/(a+b+c) = 28/123, bias = (a+b)/(a+c) = 100/51 (Wilks 2011, §8.2.2)
    expect(scores.pod).toBeCloseTo(28 / 51, 12);
    expect(scores.far).toBeCloseTo(72 / 100, 12);
    expect(scores.csi).toBeCloseTo(28 / 123, 12);
    expect(scores.bias).toBeCloseTo(100 / 51, 12);
    expect(scores.successRatio).toBeCloseTo(28 / 100, 12);
  });
});

describe("performance-diagram relations (Roebber 2009)", () => {
  it("CSI from POD and success ratio equals a/(a+b+c) for any one-to-one table", () => {
    // Derived in closed form: 1/(1/SR + 1/POD − 1) = a/(a+b+c) with SR = a/(a+b), POD = a/(a+c)
    for (const [a, b, c] of [
      [1, 1, 1],
      [5, 0, 3],
      [7, 2, 0],
      [40, 13, 9],
    ] as const) {
      const pod = a / (a + c);
      const sr = a / (a + b);
      expect(csiFromPodAndSuccessRatio(pod, sr)).toBeCloseTo(a / (a + b + c), 12);
    }
  });

  it("is 0 when nothing was detected and null when there is nothing to score", () => {
    // Derived in closed form: a = 0 gives CSI = 0/(b+c) = 0; POD has no denominator without reports
    expect(verificationScores({ verifiedTriggers: 0, falseAlarms: 4, detectedReports: 0, misses: 2 })).toMatchObject({ pod: 0, far: 1, successRatio: 0, csi: 0, bias: 2 });
    expect(verificationScores({ verifiedTriggers: 0, falseAlarms: 3, detectedReports: 0, misses: 0 })).toMatchObject({ pod: null, far: 1, csi: null, bias: null });
    expect(verificationScores({ verifiedTriggers: 0, falseAlarms: 0, detectedReports: 0, misses: 2 })).toMatchObject({ pod: 0, far: null, csi: null, bias: 0 });
  });

  it("counts each side on its own when one report verifies two triggers", () => {
    // Derived in closed form: 2 verified triggers + 1 false alarm, 1 detected report + 1 miss → POD 1/2, FAR 1/3, bias 3/2, CSI = 1/(3/2 + 2 − 1)
    const s = verificationScores({ verifiedTriggers: 2, falseAlarms: 1, detectedReports: 1, misses: 1 });
    expect(s.pod).toBeCloseTo(0.5, 12);
    expect(s.far).toBeCloseTo(1 / 3, 12);
    expect(s.bias).toBeCloseTo(1.5, 12);
    expect(s.csi).toBeCloseTo(1 / (1.5 + 2 - 1), 12);
  });
});
