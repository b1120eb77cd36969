/**
 * Prints a checked rule in one canonical spelling: lower-case word operators, one space around binary
 * operators, and only the parentheses that the tree needs (plus a few that help a reader, e.g. around a
 * power under a minus sign). Parsing the printed text gives back the same tree, so version histories can
 * compare normalised texts.
 */
import type { ConditionNode, NumberNode } from "./rule-ast.ts";

/** Binding strength, weakest first; mirrors expr-eval-fork's grammar (prefix `-`/`not` bind tighter than `^`'s left side). */
const Strength = { Or: 1, And: 2, Compare: 3, Sum: 4, Product: 5, Prefix: 6, Power: 7, Atom: 8 } as const;
type Strength = (typeof Strength)[keyof typeof Strength];

type Node = ConditionNode | NumberNode;

export function formatRule(root: ConditionNode): string {
  return print(root);
}

function print(node: Node): string {
  switch (node.kind) {
    case "field":
    case "flag":
      return node.key;
    case "constant":
      return node.text;
    case "call":
      return `${node.name}(${node.args.map(print).join(", ")})`;
    case "one-of":
      return `oneof(${[node.subject, ...node.options].map(print).join(", ")})`;
    case "negate":
      return `-${wrap(node.operand, strength(node.operand) < Strength.Atom)}`;
    case "not":
      return `not ${wrap(node.operand, strength(node.operand) < Strength.Atom)}`;
    case "compare":
    case "arithmetic":
    case "logical":
      return printBinary(node);
  }
}

function printBinary(node: Extract<Node, { kind: "compare" | "arithmetic" | "logical" }>): string {
  const own = strength(node);
  // `^` groups to the right; every other operator groups to the left.
  const rightAssociative = node.kind === "arithmetic" && node.op === "^";
  const left = wrap(node.left, rightAssociative ? strength(node.left) <= own : strength(node.left) < own);
  const right = wrap(node.right, rightAssociative ? strength(node.right) < own : strength(node.right) <= own);
  return `${left} ${node.op} ${right}`;
}

function wrap(node: Node, parenthesise: boolean): string {
  return parenthesise ? `(${print(node)})` : print(node);
}

function strength(node: Node): Strength {
  switch (node.kind) {
    case "logical":
      return node.op === "or" ? Strength.Or : Strength.And;
    case "compare":
      return Strength.Compare;
    case "arithmetic":
      if (node.op === "+" || node.op === "-") return Strength.Sum;
      return node.op === "^" ? Strength.Power : Strength.Product;
    case "negate":
    case "not":
      return Strength.Prefix;
    default:
      return Strength.Atom;
  }
}
