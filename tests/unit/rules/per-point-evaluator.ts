/**
 * The straightforward reference for the compiled evaluator: walks the typed tree at one point at a time
 * with plain three-valued logic (true, false, or null for "undecided because data is missing").
 * Written independently of the compiler's De Morgan push-down and block kernels, so agreement between
 * the two is evidence, not a tautology.
 */
import type { ConditionNode, NumberNode } from "../../../shared/rules/rule-ast.ts";

export type PointFields = (key: string) => Float32Array;

export function conditionAt(node: ConditionNode, fields: PointFields, i: number): boolean | null {
  switch (node.kind) {
    case "flag": {
      const x = fields(node.key)[i];
      return Number.isNaN(x) ? null : x !== 0;
    }
    case "compare": {
      const a = numberAt(node.left, fields, i);
      const b = numberAt(node.right, fields, i);
      if (Number.isNaN(a) || Number.isNaN(b)) return null;
      return compare(node.op, a, b);
    }
    case "one-of": {
      const x = numberAt(node.subject, fields, i);
      if (Number.isNaN(x)) return null;
      return node.options.some((o) => numberAt(o, fields, i) === x);
    }
    case "not": {
      const v = conditionAt(node.operand, fields, i);
      return v === null ? null : !v;
    }
    case "logical": {
      const a = conditionAt(node.left, fields, i);
      const b = conditionAt(node.right, fields, i);
      if (node.op === "and") {
        if (a === false || b === false) return false;
        return a === true && b === true ? true : null;
      }
      if (a === true || b === true) return true;
      return a === false && b === false ? false : null;
    }
  }
}

export function numberAt(node: NumberNode, fields: PointFields, i: number): number {
  switch (node.kind) {
    case "field":
      return fields(node.key)[i];
    case "constant":
      return node.value;
    case "negate":
      return -numberAt(node.operand, fields, i);
    case "arithmetic": {
      const a = numberAt(node.left, fields, i);
      const b = numberAt(node.right, fields, i);
      if (node.op === "+") return a + b;
      if (node.op === "-") return a - b;
      if (node.op === "*") return a * b;
      if (node.op === "/") return a / b;
      return Math.pow(a, b); // expr-eval's `^`
    }
    case "call": {
      const args = node.args.map((a) => numberAt(a, fields, i));
      if (node.name === "abs") return Math.abs(args[0]);
      if (node.name === "sqrt") return Math.sqrt(args[0]);
      if (node.name === "min") return Math.min(...args);
      if (node.name === "max") return Math.max(...args);
      if (node.name === "hypot") return Math.sqrt(args[0] * args[0] + args[1] * args[1]);
      return args[0] * (1852 / 3600); // kt: 1 kt = 1852 m per hour
    }
  }
}

function compare(op: string, a: number, b: number): boolean {
  switch (op) {
    case "<":
      return a < b;
    case "<=":
      return a <= b;
    case ">":
      return a > b;
    case ">=":
      return a >= b;
    case "==":
      return a === b;
    default:
      return a !== b;
  }
}
