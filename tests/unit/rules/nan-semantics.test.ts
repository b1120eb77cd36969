import { describe, expect, it } from "vitest";
import type { FieldKey } from "../../../shared/fields.ts";
import { compileRule } from "../../../shared/rules/compile-rule.ts";
import { parseRuleOrThrow } from "../../../shared/rules/parse-rule.ts";
import { METRES_PER_SECOND_PER_KNOT } from "../../../shared/rules/rule-functions.ts";

const NaN32 = Number.NaN;

/** Met and not-met masks of an expression over a tiny hand-built frame. */
function masks(expression: string, frame: Partial<Record<FieldKey, number[]>>): { met: number[]; notMet: number[] } {
  const arrays = new Map(Object.entries(frame).map(([k, v]) => [k, Float32Array.from(v as number[])]));
  const n = arrays.values().next().value!.length;
  const rule = compileRule(parseRuleOrThrow(expression));
  const fields = (key: FieldKey) => arrays.get(key);
  return { met: [...rule.evaluate(fields, n)], notMet: [...rule.evaluateNotMet(fields, n)] };
}

// Every expected mask below is derived in closed form from the documented rule: a NaN makes a
// comparison undecided; `not` keeps undecided undecided; `and` is met only where all parts are met
// and not met where any part is not met; `or` is met where any part is met and not met where all are not
// (three-valued, Kleene logic).
describe("missing data (NaN) is never met", () => {
  it("a comparison with NaN is neither met nor not met", () => {
    expect(masks("mlcape > 5", { mlcape: [10, 1, NaN32] })).toEqual({ met: [1, 0, 0], notMet: [0, 1, 0] }); // Derived in closed form
  });

  it("not (NaN > 5) is not met either", () => {
    expect(masks("not (mlcape > 5)", { mlcape: [10, 1, NaN32] })).toEqual({ met: [0, 1, 0], notMet: [1, 0, 0] }); // Derived in closed form
  });

  it("!= is not met at NaN (unlike JavaScript's NaN !== 5)", () => {
    expect(masks("mlcape != 5", { mlcape: [5, 6, NaN32] })).toEqual({ met: [0, 1, 0], notMet: [1, 0, 0] }); // Derived in closed form
    expect(masks("not (mlcape == 5)", { mlcape: [5, 6, NaN32] })).toEqual({ met: [0, 1, 0], notMet: [1, 0, 0] }); // Derived in closed form
  });

  it("and: one missing part leaves it undecided unless another part fails", () => {
    const frame = { mlcape: [NaN32, NaN32, NaN32, 2000], shear_0_6km: [30, 10, NaN32, 30] };
    // Derived in closed form: (undecided, met) -> undecided; (undecided, not met) -> not met; both missing -> undecided.
    expect(masks("mlcape >= 1000 and shear_0_6km >= 20", frame)).toEqual({ met: [0, 0, 0, 1], notMet: [0, 1, 0, 0] });
  });

  it("or: one met part is enough even when another is missing", () => {
    const frame = { mlcape: [NaN32, NaN32, NaN32, 500], shear_0_6km: [30, 10, NaN32, 10] };
    // Derived in closed form: (undecided, met) -> met; (undecided, not met) -> undecided.
    expect(masks("mlcape >= 1000 or shear_0_6km >= 20", frame)).toEqual({ met: [1, 0, 0, 0], notMet: [0, 0, 0, 1] });
  });

  it("not over and/or follows De Morgan without turning missing data into a match", () => {
    const frame = { mlcape: [NaN32, NaN32, 2000, 500], shear_0_6km: [30, 10, 30, 10] };
    // Derived in closed form: not (a and b) = (not a) or (not b).
    expect(masks("not (mlcape >= 1000 and shear_0_6km >= 20)", frame)).toEqual({ met: [0, 1, 0, 1], notMet: [0, 0, 1, 0] });
  });

  it("a yes/no field is met where 1, not met where 0, undecided where missing", () => {
    expect(masks("eff_present", { eff_present: [1, 0, NaN32] })).toEqual({ met: [1, 0, 0], notMet: [0, 1, 0] }); // Derived in closed form
    expect(masks("not eff_present", { eff_present: [1, 0, NaN32] })).toEqual({ met: [0, 1, 0], notMet: [1, 0, 0] }); // Derived in closed form
  });

  it("oneof is undecided at a missing category", () => {
    // Derived in closed form: oneof(x, 3, 4) = (x == 3) or (x == 4).
    expect(masks("oneof(jet_quadrant, left_exit, right_exit)", { jet_quadrant: [3, 4, 1, NaN32] })).toEqual({ met: [1, 1, 0, 0], notMet: [0, 0, 1, 0] });
  });

  it("arithmetic carries NaN through to the comparison", () => {
    const frame = { mucape: [2000, NaN32, 2000], shear_eff: [20, 20, NaN32] };
    expect(masks("mucape * shear_eff / 20000 >= 1", frame)).toEqual({ met: [1, 0, 0], notMet: [0, 0, 0] }); // Derived in closed form: 2000 * 20 / 20000 = 2
    expect(masks("max(mucape, shear_eff) > 0", frame)).toEqual({ met: [1, 0, 0], notMet: [0, 0, 0] }); // Derived in closed form: Math.max with NaN is NaN
  });

  it("sqrt of a negative value is missing, not zero", () => {
    expect(masks("sqrt(mlcin) >= 0", { mlcin: [-4, 0, 9] })).toEqual({ met: [0, 1, 1], notMet: [0, 0, 0] }); // Derived in closed form
  });
});

describe("kt() converts knots to the stored m/s", () => {
  it("uses 1 kt = 1852/3600 m/s", () => {
    expect(METRES_PER_SECOND_PER_KNOT).toBe(1852 / 3600); // Source: BIPM, The International System of Units (SI), 9th ed. (2019), Table 8: knot = 1852/3600 m/s
    // 40 kt = 20.5778 m/s (Derived in closed form from the definition above): 20.57 m/s falls short, 20.58 m/s is enough.
    expect(masks("shear_0_6km >= kt(40)", { shear_0_6km: [20.57, 20.58] }).met).toEqual([0, 1]);
  });
});
