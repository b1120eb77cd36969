/**
 * Compiles a checked rule ONCE into a vectorised evaluator. Evaluation walks the compiled steps block by
 * block over whole arrays; there is no parsing, no interpreter call per point and no generated code (no
 * `new Function`: it would need 'unsafe-eval' under the client's content security policy).
 *
 * Missing data: each condition is met, not met, or undecided (a NaN reached it). Only "met" sets the mask.
 * `not` is compiled by pushing it down to the comparisons (De Morgan), where it swaps the operator:
 * not (x > 5) becomes x <= 5, which is false at a NaN just like x > 5 is. So `not` never turns
 * "undecided" into "met". `and` is met only where all parts are met, `or` where any part is met
 * (an `or` with one part met is met even if another part is undecided).
 */
import type { FieldKey } from "../fields.ts";
import type { CheckedRule, ComparisonOperator, ConditionNode, NumberNode } from "./rule-ast.ts";
import { applyArithmetic, applyNumericFunction } from "./rule-functions.ts";
import {
  ArithmeticValue, ChainMask, BLOCK_SIZE, CompareConstantMask, CompareMask, ConstantMask, ConstantValue,
  FieldSlot, FieldValue, FlagMask, FoldValue, ScratchPool, UnaryValue, type MaskStep, type ValueStep,
} from "./rule-steps.ts";

/** Gives the Float32Array of a catalogue field for the frame being evaluated (undefined when absent). */
export type FieldSource = (key: FieldKey) => Float32Array | undefined;

export interface CompiledRule {
  readonly fieldKeys: readonly FieldKey[];
  readonly normalised: string;
  /** 1 where the rule is met. Writes into `out` when given (length n), so repeated calls allocate nothing. */
  evaluate(fields: FieldSource, n: number, out?: Uint8Array): Uint8Array;
  /** 1 where the rule is decidedly not met (enough data, and false). Neither mask is set where data is missing. */
  evaluateNotMet(fields: FieldSource, n: number, out?: Uint8Array): Uint8Array;
}

/** A frame that does not fit the compiled rule: a missing field or arrays of the wrong length. */
export class RuleEvaluationError extends Error {
  constructor(message: string) {
    super(message);
    this.name = "RuleEvaluationError";
  }
}

const pool = new ScratchPool();

const OPPOSITE: Readonly<Record<ComparisonOperator, ComparisonOperator>> = { "<": ">=", "<=": ">", ">": "<=", ">=": "<", "==": "!=", "!=": "==" };
/** `c op x` rewritten as `x MIRRORED[op] c`. */
const MIRRORED: Readonly<Record<ComparisonOperator, ComparisonOperator>> = { "<": ">", "<=": ">=", ">": "<", ">=": "<=", "==": "==", "!=": "!=" };

export function compileRule(rule: CheckedRule): CompiledRule {
  const slots = new Map<FieldKey, FieldSlot>(rule.fieldKeys.map((k) => [k, new FieldSlot(k)]));
  const lowering = new Lowering(slots);
  const met = lowering.condition(rule.root, true, 0);
  let notMet: MaskStep | undefined; // compiled on first use: most callers only need "met"

  const run = (root: MaskStep, fields: FieldSource, n: number, out: Uint8Array | undefined): Uint8Array => {
    const mask = prepare(slots, fields, n, out);
    try {
      for (let start = 0; start < n; start += BLOCK_SIZE) root.run(mask, start, start, Math.min(BLOCK_SIZE, n - start));
    } finally {
      for (const slot of slots.values()) slot.release();
    }
    return mask;
  };
  return {
    fieldKeys: rule.fieldKeys,
    normalised: rule.normalised,
    evaluate: (fields, n, out) => run(met, fields, n, out),
    evaluateNotMet: (fields, n, out) => run((notMet ??= lowering.condition(rule.root, false, 0)), fields, n, out),
  };
}

/** Checks the frame against what the rule reads and binds each field's array to its slot. */
function prepare(slots: ReadonlyMap<FieldKey, FieldSlot>, fields: FieldSource, n: number, out: Uint8Array | undefined): Uint8Array {
  if (!Number.isInteger(n) || n < 0) throw new RuleEvaluationError(`The point count must be a whole number >= 0, got ${n}.`);
  for (const slot of slots.values()) {
    const data = fields(slot.key);
    if (!(data instanceof Float32Array)) throw new RuleEvaluationError(`The frame has no Float32Array for field "${slot.key}".`);
    if (data.length !== n) throw new RuleEvaluationError(`Field "${slot.key}" has ${data.length} values; the frame has ${n} points.`);
    slot.data = data;
  }
  if (out && out.length !== n) throw new RuleEvaluationError(`The output mask has ${out.length} entries; the frame has ${n} points.`);
  return out ?? new Uint8Array(n);
}

/** Turns the typed tree into steps; `depth` and sibling index pick scratch buffers from the pool. */
class Lowering {
  constructor(private readonly slots: ReadonlyMap<FieldKey, FieldSlot>) {}

  /** Steps that mark where `node` is decidedly `wanted` (true: met, false: not met). */
  condition(node: ConditionNode, wanted: boolean, depth: number): MaskStep {
    switch (node.kind) {
      case "flag":
        return new FlagMask(this.slot(node.key), wanted ? 1 : 0);
      case "not":
        return this.condition(node.operand, !wanted, depth);
      case "compare":
        return this.compare(wanted ? node.op : OPPOSITE[node.op], node.left, node.right, depth);
      case "one-of": {
        // oneof(x, a, b) means x == a or x == b.
        const parts: ConditionNode[] = node.options.map((option) => ({ kind: "compare", op: "==", left: node.subject, right: option, span: node.span }));
        return this.chain("or", parts, wanted, depth);
      }
      case "logical":
        return this.chain(node.op, flatten(node, node.op), wanted, depth);
    }
  }

  /** and/or over several parts; "not met" of an `and` is an `or` of the parts' "not met", and vice versa. */
  private chain(op: "and" | "or", parts: readonly ConditionNode[], wanted: boolean, depth: number): MaskStep {
    const steps = parts.map((p) => this.condition(p, wanted, depth + 1));
    if (steps.length === 1) return steps[0];
    const idx = pool.index(depth);
    const fallback = pool.mask(depth, 1);
    // "Met" of an `and` (or "not met" of an `or`) needs every part; the other two need any part.
    return new ChainMask(steps, (op === "and") === wanted ? 1 : 0, idx, fallback);
  }

  private compare(op: ComparisonOperator, left: NumberNode, right: NumberNode, depth: number): MaskStep {
    const l = constantValue(left);
    const r = constantValue(right);
    if (l !== undefined && r !== undefined) return new ConstantMask(compareScalars(op, l, r) ? 1 : 0);
    if (r !== undefined) return new CompareConstantMask(op, this.value(left, depth + 1, 0), r);
    if (l !== undefined) return new CompareConstantMask(MIRRORED[op], this.value(right, depth + 1, 0), l);
    return new CompareMask(op, this.value(left, depth + 1, 0), this.value(right, depth + 1, 1));
  }

  private value(node: NumberNode, depth: number, index: number): ValueStep {
    const constant = constantValue(node);
    if (constant !== undefined) return new ConstantValue(constant);
    const out = pool.value(depth, index);
    switch (node.kind) {
      case "field":
        return new FieldValue(this.slot(node.key));
      case "negate":
        return new UnaryValue("negate", this.value(node.operand, depth + 1, 0), out);
      case "arithmetic":
        return new ArithmeticValue(node.op, this.value(node.left, depth + 1, 0), this.value(node.right, depth + 1, 1), out);
      case "call": {
        const args = node.args.map((a, i) => this.value(a, depth + 1, i));
        return args.length === 1 ? new UnaryValue(node.name, args[0], out) : new FoldValue(node.name, args, out);
      }
      case "constant":
        throw new Error("constants are handled above");
    }
  }

  private slot(key: FieldKey): FieldSlot {
    const slot = this.slots.get(key);
    if (!slot) throw new Error(`field ${key} is missing from the rule's field list`);
    return slot;
  }
}

/** The parts of a run of the same operator: a and (b and c) and d -> [a, b, c, d]. */
function flatten(node: ConditionNode, op: "and" | "or"): ConditionNode[] {
  return node.kind === "logical" && node.op === op ? [...flatten(node.left, op), ...flatten(node.right, op)] : [node];
}

/** The value of a subtree that reads no field, computed with the same scalar operations as the kernels. */
export function constantValue(node: NumberNode): number | undefined {
  switch (node.kind) {
    case "field":
      return undefined;
    case "constant":
      return node.value;
    case "negate": {
      const v = constantValue(node.operand);
      return v === undefined ? undefined : -v;
    }
    case "arithmetic": {
      const a = constantValue(node.left);
      const b = constantValue(node.right);
      return a === undefined || b === undefined ? undefined : applyArithmetic(node.op, a, b);
    }
    case "call": {
      const args = node.args.map(constantValue);
      return args.every((a) => a !== undefined) ? applyNumericFunction(node.name, args as number[]) : undefined;
    }
  }
}

/** Scalar comparison with the evaluator's NaN rule: false whenever a side is NaN. */
export function compareScalars(op: ComparisonOperator, a: number, b: number): boolean {
  if (Number.isNaN(a) || Number.isNaN(b)) return false;
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
    case "!=":
      return a !== b;
  }
}
