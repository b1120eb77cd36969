/**
 * Loops that turn values into 0/1 masks over one block of points. Each returns how many 1s it wrote,
 * which lets `and`/`or` chains skip work for a block whose outcome is already settled.
 *
 * NaN rule: every comparison is false when either side is NaN, including `!=` (JavaScript's `!==` alone
 * would say NaN != 5 is true). So "x >= c" and its opposite "x < c" are both false at a missing value,
 * which is what lets the compiler negate a comparison by swapping the operator.
 *
 * The operator switch sits outside the loops so each loop body is one comparison and one store;
 * `+(a >= c)` turns the boolean into 0/1 without a branch (a branch would mispredict on noisy fields).
 */
import type { ComparisonOperator } from "./rule-ast.ts";

export type Values = Float32Array | Float64Array;

/** dst[dstBase + i] = a[aBase + i] op c, for i < len. `c` is finite (the checker refuses other constants). */
export function compareWithConstant(op: ComparisonOperator, dst: Uint8Array, dstBase: number, a: Values, aBase: number, c: number, len: number): number {
  let count = 0;
  switch (op) {
    case "<":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] < c);
      break;
    case "<=":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] <= c);
      break;
    case ">":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] > c);
      break;
    case ">=":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] >= c);
      break;
    case "==":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] === c);
      break;
    case "!=":
      for (let i = 0; i < len; i++) {
        const x = a[aBase + i];
        count += dst[dstBase + i] = +(x === x) & +(x !== c);
      }
      break;
  }
  return count;
}

/** dst[dstBase + i] = a[aBase + i] op b[bBase + i], false wherever either side is NaN. */
export function compareArrays(op: ComparisonOperator, dst: Uint8Array, dstBase: number, a: Values, aBase: number, b: Values, bBase: number, len: number): number {
  let count = 0;
  switch (op) {
    case "<":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] < b[bBase + i]);
      break;
    case "<=":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] <= b[bBase + i]);
      break;
    case ">":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] > b[bBase + i]);
      break;
    case ">=":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] >= b[bBase + i]);
      break;
    case "==":
      for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] === b[bBase + i]);
      break;
    case "!=":
      for (let i = 0; i < len; i++) {
        const x = a[aBase + i];
        const y = b[bBase + i];
        count += dst[dstBase + i] = +(x === x) & +(y === y) & +(x !== y);
      }
      break;
  }
  return count;
}

/** A yes/no field as a mask: `wanted` 1 marks points where it is set (non-zero), 0 where it is 0; NaN marks neither. */
export function flagMask(wanted: 0 | 1, dst: Uint8Array, dstBase: number, a: Values, aBase: number, len: number): number {
  let count = 0;
  if (wanted === 1) {
    for (let i = 0; i < len; i++) {
      const x = a[aBase + i];
      count += dst[dstBase + i] = +(x === x) & +(x !== 0);
    }
  } else {
    for (let i = 0; i < len; i++) count += dst[dstBase + i] = +(a[aBase + i] === 0);
  }
  return count;
}

export function andInto(dst: Uint8Array, dstBase: number, src: Uint8Array, len: number): number {
  let count = 0;
  for (let i = 0; i < len; i++) count += dst[dstBase + i] &= src[i];
  return count;
}

export function orInto(dst: Uint8Array, dstBase: number, src: Uint8Array, len: number): number {
  let count = 0;
  for (let i = 0; i < len; i++) count += dst[dstBase + i] |= src[i];
  return count;
}
