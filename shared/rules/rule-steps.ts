/**
 * The pieces a compiled rule is made of. Each step works on one block of points at a time (BLOCK_SIZE),
 * so scratch buffers stay small and in cache and are reused for every block and every evaluation.
 * Nothing here allocates while evaluating.
 */
import type { FieldKey } from "../fields.ts";
import type { ArithmeticOperator, ComparisonOperator, NumericFunctionName } from "./rule-ast.ts";
import { filterByMask, filterCompareArrays, filterCompareWithConstant, filterFlag, indicesOf, writeIndexed } from "./filter-kernels.ts";
import { PartOrder } from "./part-order.ts";
import { compareArrays, compareWithConstant, flagMask, type Values } from "./mask-kernels.ts";
import { arithmeticArrays, arithmeticArraysAt, binaryFunction, binaryFunctionAt, unaryFunction, unaryFunctionAt } from "./value-kernels.ts";

/** Points per block: 4096 doubles (32 KiB) fit a typical L1/L2 cache together with the field slices read. */
export const BLOCK_SIZE = 4096;

const NO_DATA = new Float32Array(0);

/** The array of one field for the evaluation in progress; shared by every step that reads the field. */
export class FieldSlot {
  data: Float32Array = NO_DATA;
  constructor(readonly key: FieldKey) {}
  /** Drops the frame's array after an evaluation, so a compiled rule never keeps a frame alive. */
  release(): void {
    this.data = NO_DATA;
  }
}

/**
 * A condition over one block of points [start, start + len).
 * run: writes its 0/1 mask into dst[dstBase ...] and returns the number of 1s.
 * filter: keeps the entries of idx[0 .. count) (offsets within the block) whose bit equals `keep`,
 * moving them to the front, and returns how many were kept.
 */
export interface MaskStep {
  run(dst: Uint8Array, dstBase: number, start: number, len: number): number;
  filter(idx: Uint16Array, count: number, start: number, len: number, keep: 0 | 1): number;
}

/**
 * Makes numbers for the block starting at `start`; afterwards the value at offset i is data[base + i].
 * run: for every offset below len. runAt: only for the offsets idx[0 .. count) (the points still in play).
 */
export interface ValueStep {
  readonly data: Values;
  readonly base: number;
  run(start: number, len: number): void;
  runAt(start: number, idx: Uint16Array, count: number): void;
}

export class FieldValue implements ValueStep {
  data: Values = NO_DATA;
  base = 0;
  constructor(private readonly slot: FieldSlot) {}
  run(start: number): void {
    this.data = this.slot.data;
    this.base = start; // read the field in place: no copy
  }
  runAt(start: number): void {
    this.run(start);
  }
}

/** A constant used inside arithmetic: a block-long buffer filled once, so kernels need no constant variants. */
export class ConstantValue implements ValueStep {
  readonly data: Float64Array;
  readonly base = 0;
  constructor(readonly value: number) {
    this.data = new Float64Array(BLOCK_SIZE).fill(value);
  }
  run(): void {}
  runAt(): void {}
}

export class ArithmeticValue implements ValueStep {
  readonly base = 0;
  constructor(
    private readonly op: ArithmeticOperator,
    private readonly left: ValueStep,
    private readonly right: ValueStep,
    readonly data: Float64Array,
  ) {}
  run(start: number, len: number): void {
    this.left.run(start, len);
    this.right.run(start, len);
    arithmeticArrays(this.op, this.data, this.left.data, this.left.base, this.right.data, this.right.base, len);
  }
  runAt(start: number, idx: Uint16Array, count: number): void {
    this.left.runAt(start, idx, count);
    this.right.runAt(start, idx, count);
    arithmeticArraysAt(this.op, this.data, this.left.data, this.left.base, this.right.data, this.right.base, idx, count);
  }
}

export class UnaryValue implements ValueStep {
  readonly base = 0;
  constructor(
    private readonly name: NumericFunctionName | "negate",
    private readonly operand: ValueStep,
    readonly data: Float64Array,
  ) {}
  run(start: number, len: number): void {
    this.operand.run(start, len);
    unaryFunction(this.name, this.data, this.operand.data, this.operand.base, len);
  }
  runAt(start: number, idx: Uint16Array, count: number): void {
    this.operand.runAt(start, idx, count);
    unaryFunctionAt(this.name, this.data, this.operand.data, this.operand.base, idx, count);
  }
}

/** min / max over any number of arguments (folded pairwise), or hypot over two. */
export class FoldValue implements ValueStep {
  readonly base = 0;
  constructor(
    private readonly name: NumericFunctionName,
    private readonly args: readonly ValueStep[],
    readonly data: Float64Array,
  ) {}
  run(start: number, len: number): void {
    for (const a of this.args) a.run(start, len);
    const [first, second] = this.args;
    binaryFunction(this.name, this.data, first.data, first.base, second.data, second.base, len);
    for (let k = 2; k < this.args.length; k++) binaryFunction(this.name, this.data, this.data, 0, this.args[k].data, this.args[k].base, len);
  }
  runAt(start: number, idx: Uint16Array, count: number): void {
    for (const a of this.args) a.runAt(start, idx, count);
    const [first, second] = this.args;
    binaryFunctionAt(this.name, this.data, first.data, first.base, second.data, second.base, idx, count);
    for (let k = 2; k < this.args.length; k++) binaryFunctionAt(this.name, this.data, this.data, 0, this.args[k].data, this.args[k].base, idx, count);
  }
}

export class ConstantMask implements MaskStep {
  constructor(private readonly bit: 0 | 1) {}
  run(dst: Uint8Array, dstBase: number, _start: number, len: number): number {
    dst.fill(this.bit, dstBase, dstBase + len);
    return this.bit * len;
  }
  filter(_idx: Uint16Array, count: number, _start: number, _len: number, keep: 0 | 1): number {
    return this.bit === keep ? count : 0;
  }
}

export class FlagMask implements MaskStep {
  constructor(
    private readonly slot: FieldSlot,
    private readonly wanted: 0 | 1,
  ) {}
  run(dst: Uint8Array, dstBase: number, start: number, len: number): number {
    return flagMask(this.wanted, dst, dstBase, this.slot.data, start, len);
  }
  filter(idx: Uint16Array, count: number, start: number, _len: number, keep: 0 | 1): number {
    return filterFlag(this.wanted, idx, count, this.slot.data, start, keep);
  }
}

export class CompareConstantMask implements MaskStep {
  constructor(
    private readonly op: ComparisonOperator,
    private readonly value: ValueStep,
    private readonly constant: number,
  ) {}
  run(dst: Uint8Array, dstBase: number, start: number, len: number): number {
    this.value.run(start, len);
    return compareWithConstant(this.op, dst, dstBase, this.value.data, this.value.base, this.constant, len);
  }
  filter(idx: Uint16Array, count: number, start: number, _len: number, keep: 0 | 1): number {
    this.value.runAt(start, idx, count);
    return filterCompareWithConstant(this.op, idx, count, this.value.data, this.value.base, this.constant, keep);
  }
}

export class CompareMask implements MaskStep {
  constructor(
    private readonly op: ComparisonOperator,
    private readonly left: ValueStep,
    private readonly right: ValueStep,
  ) {}
  run(dst: Uint8Array, dstBase: number, start: number, len: number): number {
    this.left.run(start, len);
    this.right.run(start, len);
    return compareArrays(this.op, dst, dstBase, this.left.data, this.left.base, this.right.data, this.right.base, len);
  }
  filter(idx: Uint16Array, count: number, start: number, _len: number, keep: 0 | 1): number {
    this.left.runAt(start, idx, count);
    this.right.runAt(start, idx, count);
    return filterCompareArrays(this.op, idx, count, this.left.data, this.left.base, this.right.data, this.right.base, keep);
  }
}

/**
 * An `and` or `or` over several parts, tracking the points still "in play": for `and` (bit 1) the points
 * met so far, for `or` (bit 0) the points not met so far. The first part (in learned order, see
 * PartOrder) runs densely over the block; the points in play are listed in `idx`, and each later part,
 * with its arithmetic, only examines those. A block with nothing left in play is finished at once.
 */
export class ChainMask implements MaskStep {
  private readonly ranking: PartOrder;
  constructor(
    private readonly parts: readonly MaskStep[],
    /** 1: met where all parts are met (and). 0: not met only where no part is met (or). */
    private readonly bit: 0 | 1,
    private readonly idx: Uint16Array,
    private readonly fallback: Uint8Array,
  ) {
    this.ranking = new PartOrder(parts.length);
  }

  run(dst: Uint8Array, dstBase: number, start: number, len: number): number {
    const { parts, bit, idx, ranking } = this;
    const order = ranking.order;
    ranking.startBlock();
    const met = parts[order[0]].run(dst, dstBase, start, len);
    let inPlay = bit === 1 ? met : len - met;
    ranking.note(order[0], len, inPlay);
    if (inPlay === 0) return met;
    indicesOf(dst, dstBase, len, bit, idx);
    for (let k = 1; k < parts.length && inPlay > 0; k++) {
      const examined = inPlay;
      inPlay = parts[order[k]].filter(idx, inPlay, start, len, bit);
      ranking.note(order[k], examined, inPlay);
    }
    writeIndexed(dst, dstBase, len, idx, inPlay, bit);
    return bit === 1 ? inPlay : len - inPlay;
  }

  filter(idx: Uint16Array, count: number, start: number, len: number, keep: 0 | 1): number {
    if (keep !== this.bit) {
      // The mixed case (e.g. "not met" of an `and` inside an `or`): evaluate densely, then pick.
      this.run(this.fallback, 0, start, len);
      return filterByMask(idx, count, this.fallback, keep);
    }
    const order = this.ranking.order;
    for (let k = 0; k < this.parts.length && count > 0; k++) count = this.parts[order[k]].filter(idx, count, start, len, keep);
    return count;
  }
}

/**
 * Scratch buffers by (tree depth, position among siblings). Siblings never share a buffer, and a node's
 * children only use deeper levels, so results a parent still needs are never overwritten. One pool serves
 * every compiled rule: evaluation is synchronous, so two rules never run at the same time in one thread.
 */
export class ScratchPool {
  private readonly masks: Uint8Array[][] = [];
  private readonly values: Float64Array[][] = [];
  private readonly indices: Uint16Array[][] = [];

  mask(depth: number, index: number): Uint8Array {
    return slot(this.masks, depth, index, () => new Uint8Array(BLOCK_SIZE));
  }

  /** Offsets within a block fit 16 bits because BLOCK_SIZE <= 65536. */
  index(depth: number): Uint16Array {
    return slot(this.indices, depth, 0, () => new Uint16Array(BLOCK_SIZE));
  }

  value(depth: number, index: number): Float64Array {
    return slot(this.values, depth, index, () => new Float64Array(BLOCK_SIZE));
  }
}

function slot<T>(levels: T[][], depth: number, index: number, make: () => T): T {
  const level = (levels[depth] ??= []);
  return (level[index] ??= make());
}
