import { describe, expect, it } from "vitest";
import type { FieldKey } from "../../../shared/fields.ts";
import { compileRule, RuleEvaluationError } from "../../../shared/rules/compile-rule.ts";
import { parseRule, parseRuleOrThrow } from "../../../shared/rules/parse-rule.ts";
import { BLOCK_SIZE } from "../../../shared/rules/rule-steps.ts";
import { conditionAt } from "./per-point-evaluator.ts";
import { randomCondition, randomFrame, seededRandom, type Random } from "./random-rules.ts";

/**
 * A random rule the checker accepts. The generator sometimes builds a rule that reads no field or a
 * constant with no finite value (sqrt(-1)); those are redrawn, and nothing else may be refused.
 */
function acceptedRandomRule(r: Random): string {
  for (;;) {
    const expression = randomCondition(r, 1 + Math.floor(r() * 4));
    const parsed = parseRule(expression);
    if (parsed.ok) return expression;
    for (const e of parsed.errors) expect(["NO_FIELDS", "INVALID_NUMBER"], `${expression}: ${e.message}`).toContain(e.code);
  }
}

/** Met / not-met masks from the per-point reference. */
function referenceMasks(expression: string, frame: Map<FieldKey, Float32Array>, n: number): { met: Uint8Array; notMet: Uint8Array } {
  const rule = parseRuleOrThrow(expression);
  const fields = (key: string) => frame.get(key as FieldKey)!;
  const met = new Uint8Array(n);
  const notMet = new Uint8Array(n);
  for (let i = 0; i < n; i++) {
    const v = conditionAt(rule.root, fields, i);
    met[i] = v === true ? 1 : 0;
    notMet[i] = v === false ? 1 : 0;
  }
  return { met, notMet };
}

/** Index of the first difference, or -1: far more readable in a failure than two huge arrays. */
function firstDifference(a: Uint8Array, b: Uint8Array): number {
  if (a.length !== b.length) return Math.min(a.length, b.length);
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return i;
  return -1;
}

describe("compileRule against a per-point evaluation", () => {
  it("gives identical masks on random rules over random grids with missing data", () => {
    const r = seededRandom(7);
    let checked = 0;
    let metPoints = 0;
    for (let trial = 0; trial < 400; trial++) {
      const expression = acceptedRandomRule(r);
      const n = trial % 50 === 0 ? Math.floor(r() * 8) : 1 + Math.floor(r() * (3 * BLOCK_SIZE + 200));
      const frame = randomFrame(r, n, [0, 0.1, 0.5][trial % 3]);
      const compiled = compileRule(parseRuleOrThrow(expression));
      const fields = (key: FieldKey) => frame.get(key);
      const expected = referenceMasks(expression, frame, n);
      const met = compiled.evaluate(fields, n);
      const notMet = compiled.evaluateNotMet(fields, n);
      expect(firstDifference(met, expected.met), `met mask of ${expression}`).toBe(-1);
      expect(firstDifference(notMet, expected.notMet), `not-met mask of ${expression}`).toBe(-1);
      checked++;
      metPoints += expected.met.reduce((a, b) => a + b, 0);
    }
    expect(checked).toBe(400);
    expect(metPoints).toBeGreaterThan(0); // the random rules are not all trivially unmet
  });

  it("reuses a caller's output buffer and gives the same answer on repeated calls", () => {
    const r = seededRandom(11);
    const n = 2 * BLOCK_SIZE + 17;
    const frame = randomFrame(r, n, 0.1);
    const compiled = compileRule(parseRuleOrThrow("mlcape > 5 and (shear_0_6km >= 2 or not eff_present)"));
    const out = new Uint8Array(n).fill(7);
    const first = compiled.evaluate((k) => frame.get(k), n, out);
    expect(first).toBe(out);
    const again = compiled.evaluate((k) => frame.get(k), n);
    expect(firstDifference(first, again)).toBe(-1);
    expect(firstDifference(first, referenceMasks("mlcape > 5 and (shear_0_6km >= 2 or not eff_present)", frame, n).met)).toBe(-1);
  });
});

describe("compileRule frame checks", () => {
  const compiled = compileRule(parseRuleOrThrow("mlcape >= 1000 and shear_0_6km >= 20"));

  it("names a field the frame lacks", () => {
    const mlcape = new Float32Array(4);
    expect(() => compiled.evaluate((k) => (k === "mlcape" ? mlcape : undefined), 4)).toThrow(/no Float32Array for field "shear_0_6km"/);
  });

  it("refuses arrays whose length is not the point count", () => {
    const short = new Float32Array(3);
    const full = new Float32Array(4);
    expect(() => compiled.evaluate((k) => (k === "mlcape" ? full : short), 4)).toThrow(RuleEvaluationError);
    expect(() => compiled.evaluate((k) => (k === "mlcape" ? full : short), 4)).toThrow(/"shear_0_6km" has 3 values; the frame has 4 points/);
  });

  it("refuses an output buffer of the wrong length and a bad point count", () => {
    const full = new Float32Array(4);
    expect(() => compiled.evaluate(() => full, 4, new Uint8Array(5))).toThrow(/output mask has 5 entries/);
    expect(() => compiled.evaluate(() => full, 2.5)).toThrow(/whole number/);
  });
});
