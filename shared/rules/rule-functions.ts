/**
 * The only functions a rule may call. Anything else is refused by the checker, so an expression can
 * reach nothing outside the field arrays and this list. The editor reads it for autocompletion.
 */
import type { ArithmeticOperator, NumericFunctionName } from "./rule-ast.ts";

export type RuleFunctionName = NumericFunctionName | "oneof";

export interface RuleFunctionInfo {
  readonly name: RuleFunctionName;
  readonly signature: string;
  readonly minArgs: number;
  /** Infinity for functions that take any number of arguments. */
  readonly maxArgs: number;
  readonly summary: string;
}

/** Metres per second in one knot: 1 kt = 1852 m per hour (international nautical mile, 1929 definition). */
export const METRES_PER_SECOND_PER_KNOT = 1852 / 3600;

export const RULE_FUNCTIONS: readonly RuleFunctionInfo[] = [
  { name: "abs", signature: "abs(x)", minArgs: 1, maxArgs: 1, summary: "Size of x without its sign." },
  { name: "sqrt", signature: "sqrt(x)", minArgs: 1, maxArgs: 1, summary: "Square root of x (not met where x < 0)." },
  { name: "min", signature: "min(a, b, ...)", minArgs: 2, maxArgs: Infinity, summary: "Smallest of the values." },
  { name: "max", signature: "max(a, b, ...)", minArgs: 2, maxArgs: Infinity, summary: "Largest of the values." },
  {
    name: "hypot",
    signature: "hypot(u, v)",
    minArgs: 2,
    maxArgs: 2,
    summary: "Length of the vector (u, v), e.g. a wind speed from its components.",
  },
  {
    name: "kt",
    signature: "kt(number)",
    minArgs: 1,
    maxArgs: 1,
    summary: "A threshold written in knots, converted to the m/s the wind fields are stored in.",
  },
  {
    name: "oneof",
    signature: "oneof(category_field, code, ...)",
    minArgs: 2,
    maxArgs: Infinity,
    summary: "Met where a category field has one of the listed codes or labels.",
  },
];

const BY_NAME = new Map<string, RuleFunctionInfo>(RULE_FUNCTIONS.map((f) => [f.name, f]));

export function ruleFunctionByName(name: string): RuleFunctionInfo | undefined {
  return BY_NAME.get(name);
}

/**
 * Scalar meaning of each numeric function. The compiler folds constant calls with it, and its array
 * kernels use the very same operations, so both give bit-identical doubles.
 */
export function applyNumericFunction(name: NumericFunctionName, args: readonly number[]): number {
  switch (name) {
    case "abs":
      return Math.abs(args[0]);
    case "sqrt":
      return Math.sqrt(args[0]);
    case "min":
      return args.reduce((a, b) => Math.min(a, b));
    case "max":
      return args.reduce((a, b) => Math.max(a, b));
    case "hypot":
      return vectorLength(args[0], args[1]);
    case "kt":
      return args[0] * METRES_PER_SECOND_PER_KNOT;
  }
}

/** Plain sqrt(u² + v²): the grid values are far from overflow, and Math.hypot is much slower in loops. */
export function vectorLength(u: number, v: number): number {
  return Math.sqrt(u * u + v * v);
}

/** Scalar meaning of each arithmetic operator (`^` is Math.pow, as in the array kernels). */
export function applyArithmetic(op: ArithmeticOperator, a: number, b: number): number {
  switch (op) {
    case "+":
      return a + b;
    case "-":
      return a - b;
    case "*":
      return a * b;
    case "/":
      return a / b;
    case "^":
      return Math.pow(a, b);
  }
}
