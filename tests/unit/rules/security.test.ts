import { describe, expect, it } from "vitest";
import { FIELD_KEYS, type FieldKey } from "../../../shared/fields.ts";
import { compileRule } from "../../../shared/rules/compile-rule.ts";
import { parseRule, parseRuleOrThrow } from "../../../shared/rules/parse-rule.ts";
import type { RuleErrorCode } from "../../../shared/rules/rule-ast.ts";

/**
 * Expressions that try to reach past the fields and the function list. Each must be refused by the
 * checks (never by luck at run time), with the code that says why.
 */
const ATTEMPTS: readonly [string, readonly RuleErrorCode[]][] = [
  // member access and the prototype chain
  ["mlcape.constructor > 1", ["MEMBER_ACCESS_NOT_ALLOWED"]],
  ["constructor.constructor('return process')() > 1", ["MEMBER_ACCESS_NOT_ALLOWED", "STRING_NOT_ALLOWED"]],
  ["constructor > 1", ["UNKNOWN_FIELD"]],
  ["__proto__ > 1", ["UNKNOWN_FIELD"]],
  ["prototype > 1", ["UNKNOWN_FIELD"]],
  ["toString > 1", ["UNKNOWN_FIELD"]],
  ["valueOf(1) > 1", ["UNKNOWN_FUNCTION"]],
  ["hasOwnProperty(mlcape) > 1", ["UNKNOWN_FUNCTION"]],
  ["constructor(1) > 1", ["UNKNOWN_FUNCTION"]],
  ["mlcape[0] > 1", ["ARRAY_NOT_ALLOWED"]],
  // function definitions and assignment
  ["f(x) = x * 2; f(mlcape) > 1", ["ASSIGNMENT_NOT_ALLOWED", "MULTIPLE_STATEMENTS"]],
  ["mlcape = 5", ["ASSIGNMENT_NOT_ALLOWED"]],
  ["(x) => x", ["ASSIGNMENT_NOT_ALLOWED"]],
  // strings of every quote
  ["'abc' == 'abc'", ["STRING_NOT_ALLOWED"]],
  ['"a" > mlcape', ["STRING_NOT_ALLOWED"]],
  ["`a` > mlcape", ["STRING_NOT_ALLOWED"]],
  ["mlcape || 'x'", ["STRING_NOT_ALLOWED"]],
  // the host's globals and the parser library's own functions and constants
  ["process > 1", ["UNKNOWN_FIELD"]],
  ["globalThis > 1", ["UNKNOWN_FIELD"]],
  ["this > 1", ["UNKNOWN_FIELD"]],
  ["eval(1) > 1", ["UNKNOWN_FUNCTION"]],
  ["Function(1) > 1", ["UNKNOWN_FUNCTION"]],
  ["require(1) > 1", ["UNKNOWN_FUNCTION"]],
  ["import(1) > 1", ["UNKNOWN_FUNCTION"]],
  ["random() > 0.5", ["UNKNOWN_FUNCTION"]],
  ["if(mlcape > 1, 1, 0) > 0", ["UNKNOWN_FUNCTION"]],
  ["map(abs, mlcape) > 1", ["UNKNOWN_FUNCTION", "FUNCTION_NOT_CALLED"]],
  ["PI > mlcape", ["UNKNOWN_FIELD"]],
  ["sin mlcape > 1", ["SYNTAX_ERROR"]],
  // the parser library's other operators
  ["mlcape > 1 ? 1 : 0", ["CONDITIONAL_NOT_ALLOWED"]],
  ["mlcape in [1, 2]", ["ARRAY_NOT_ALLOWED"]],
  ["mlcape! > 1", ["SYNTAX_ERROR"]],
  ["0x10 > mlcape", ["INVALID_NUMBER"]],
  ["\\u0061 > 1", ["UNEXPECTED_CHARACTER"]],
  ["mlcape > 1; process.exit()", ["MULTIPLE_STATEMENTS", "MEMBER_ACCESS_NOT_ALLOWED"]],
];

describe("rule expressions cannot reach anything but fields and whitelisted functions", () => {
  it.each(ATTEMPTS)("refuses %s", (expression, codes) => {
    const result = parseRule(expression);
    expect(result.ok).toBe(false);
    if (result.ok) return;
    for (const error of result.errors) expect(codes).toContain(error.code);
  });

  it("leaves Object.prototype untouched after parsing hostile input", () => {
    const before = Object.getOwnPropertyNames(Object.prototype).sort();
    for (const [expression] of ATTEMPTS) parseRule(expression);
    expect(Object.getOwnPropertyNames(Object.prototype).sort()).toEqual(before);
    expect(({} as Record<string, unknown>).polluted).toBeUndefined();
  });

  it("an evaluation asks the frame only for the catalogue fields the rule names", () => {
    const rule = compileRule(parseRuleOrThrow("mlcape >= 1000 and (shear_0_6km >= kt(40) or not eff_present)"));
    const asked: string[] = [];
    const data = new Float32Array(3);
    rule.evaluate((key) => {
      asked.push(key);
      return data;
    }, 3);
    expect(asked.sort()).toEqual(["eff_present", "mlcape", "shear_0_6km"]);
    for (const key of asked) expect(FIELD_KEYS).toContain(key as FieldKey);
  });
});
