/**
 * Type rules for the six comparison operators, the place most rule mistakes show up:
 * - `<`, `<=`, `>`, `>=` compare numbers only (category codes have no order; yes/no fields are tested alone);
 * - `==`, `!=` also compare a category field with one of its codes or labels, and a yes/no field with
 *   0, 1 or another yes/no field.
 */
import type { SyntaxNode } from "./build-syntax-tree.ts";
import type { Checked, RuleTypeChecker } from "./check-rule-types.ts";
import type { ComparisonOperator, NumberNode } from "./rule-ast.ts";

type Binary = Extract<SyntaxNode, { kind: "binary" }>;

export function checkComparison(checker: RuleTypeChecker, node: Binary): Checked {
  const op = node.op as ComparisonOperator;
  const left = checker.check(node.left);
  const right = checker.check(node.right);
  if (left.type === "invalid" || right.type === "invalid") return { type: "invalid" };
  const operands = op === "==" || op === "!=" ? equalityOperands(checker, node, left, right) : orderingOperands(checker, node, left, right);
  if (!operands) return { type: "invalid" };
  return { type: "condition", node: { kind: "compare", op, left: operands[0], right: operands[1], span: checker.span(node) } };
}

function orderingOperands(checker: RuleTypeChecker, node: Binary, left: Checked, right: Checked): [NumberNode, NumberNode] | undefined {
  const l = orderable(checker, node.left, left, node.op);
  const r = orderable(checker, node.right, right, node.op);
  return l && r ? [l, r] : undefined;
}

function orderable(checker: RuleTypeChecker, side: SyntaxNode, value: Checked, op: string): NumberNode | undefined {
  if (value.type === "category") {
    checker.report("WRONG_TYPE", `"${value.field.key}" is a category and its codes have no order, so "${op}" does not apply. Use ==, != or oneof().`, side);
    return undefined;
  }
  if (value.type === "flag") {
    const key = value.field.key;
    checker.report("WRONG_TYPE", `"${key}" is a yes/no field; test it on its own (${key}) or with not (not ${key}) instead of "${op}".`, side);
    return undefined;
  }
  return checker.requireNumber(value, side, `"${op}"`)?.node;
}

function equalityOperands(checker: RuleTypeChecker, node: Binary, left: Checked, right: Checked): [NumberNode, NumberNode] | undefined {
  if (left.type === "category" || right.type === "category") {
    const onLeft = left.type === "category";
    const category = (onLeft ? left : right) as Extract<Checked, { type: "category" }>;
    const code = checker.categoryCode(category.field, onLeft ? right : left, onLeft ? node.right : node.left);
    if (!code) return undefined;
    return onLeft ? [category.node, code] : [code, category.node];
  }
  if (left.type === "flag" || right.type === "flag") {
    const l = flagOperand(checker, node.left, left);
    const r = flagOperand(checker, node.right, right);
    return l && r ? [l, r] : undefined;
  }
  if (left.type === "label" || right.type === "label") {
    const onLeft = left.type === "label";
    const label = (onLeft ? left : right) as Extract<Checked, { type: "label" }>;
    checker.reportLabel(label.name, onLeft ? node.left : node.right);
    return undefined;
  }
  const message = (side: SyntaxNode): string =>
    `"${checker.quote(side)}" is a condition; "${node.op}" compares values. Join conditions with and / or.`;
  const l = left.type === "condition" ? (checker.report("WRONG_TYPE", message(node.left), node.left), undefined) : checker.requireNumber(left, node.left, `"${node.op}"`);
  const r = right.type === "condition" ? (checker.report("WRONG_TYPE", message(node.right), node.right), undefined) : checker.requireNumber(right, node.right, `"${node.op}"`);
  return l && r ? [l.node, r.node] : undefined;
}

/** A side of `flag == x`: the flag itself, another flag, or the constant 0 or 1. */
function flagOperand(checker: RuleTypeChecker, side: SyntaxNode, value: Checked): NumberNode | undefined {
  if (value.type === "flag") return value.node;
  if (value.type === "number" && (value.constant === 0 || value.constant === 1)) return value.node;
  if (value.type === "number" && value.constant !== undefined) {
    checker.report("WRONG_TYPE", `A yes/no field is 0 or 1, so it never equals ${value.constant}.`, side);
    return undefined;
  }
  checker.report("WRONG_TYPE", `A yes/no field can only be compared with 0, 1 or another yes/no field; "${checker.quote(side)}" is none of these.`, side);
  return undefined;
}
