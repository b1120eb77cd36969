/**
 * Selection-vector loops. After the first part of an `and` chain, only the points still met need the
 * next comparison; `idx` lists their offsets within the block and each filter keeps the entries whose
 * result bit equals `keep` (1 for `and` chains, 0 for `or` chains, which track points not yet met).
 * Loops are branch-free: every entry is written, and the write position advances by the result bit.
 * NaN handling is the same as in mask-kernels.ts.
 */
import type { ComparisonOperator } from "./rule-ast.ts";
import type { Values } from "./mask-kernels.ts";

export function filterCompareWithConstant(op: ComparisonOperator, idx: Uint16Array, count: number, a: Values, aBase: number, c: number, keep: 0 | 1): number {
  const flip = keep ^ 1;
  let k = 0;
  switch (op) {
    case "<":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] < c) ^ flip; }
      break;
    case "<=":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] <= c) ^ flip; }
      break;
    case ">":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] > c) ^ flip; }
      break;
    case ">=":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] >= c) ^ flip; }
      break;
    case "==":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] === c) ^ flip; }
      break;
    case "!=":
      for (let j = 0; j < count; j++) {
        const i = idx[j];
        const x = a[aBase + i];
        idx[k] = i;
        k += (+(x === x) & +(x !== c)) ^ flip;
      }
      break;
  }
  return k;
}

export function filterCompareArrays(op: ComparisonOperator, idx: Uint16Array, count: number, a: Values, aBase: number, b: Values, bBase: number, keep: 0 | 1): number {
  const flip = keep ^ 1;
  let k = 0;
  switch (op) {
    case "<":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] < b[bBase + i]) ^ flip; }
      break;
    case "<=":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] <= b[bBase + i]) ^ flip; }
      break;
    case ">":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] > b[bBase + i]) ^ flip; }
      break;
    case ">=":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] >= b[bBase + i]) ^ flip; }
      break;
    case "==":
      for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] === b[bBase + i]) ^ flip; }
      break;
    case "!=":
      for (let j = 0; j < count; j++) {
        const i = idx[j];
        const x = a[aBase + i];
        const y = b[bBase + i];
        idx[k] = i;
        k += (+(x === x) & +(y === y) & +(x !== y)) ^ flip;
      }
      break;
  }
  return k;
}

/** Yes/no field: the bit is "set" (wanted 1) or "is 0" (wanted 0); NaN gives bit 0 either way. */
export function filterFlag(wanted: 0 | 1, idx: Uint16Array, count: number, a: Values, aBase: number, keep: 0 | 1): number {
  const flip = keep ^ 1;
  let k = 0;
  if (wanted === 1) {
    for (let j = 0; j < count; j++) {
      const i = idx[j];
      const x = a[aBase + i];
      idx[k] = i;
      k += (+(x === x) & +(x !== 0)) ^ flip;
    }
  } else {
    for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += +(a[aBase + i] === 0) ^ flip; }
  }
  return k;
}

/** Keeps entries whose bit in a block mask (offsets from 0) equals `keep`. */
export function filterByMask(idx: Uint16Array, count: number, mask: Uint8Array, keep: 0 | 1): number {
  const flip = keep ^ 1;
  let k = 0;
  for (let j = 0; j < count; j++) { const i = idx[j]; idx[k] = i; k += mask[i] ^ flip; }
  return k;
}

/** Offsets i < len with mask[base + i] === bit, written to idx; returns how many. */
export function indicesOf(mask: Uint8Array, base: number, len: number, bit: 0 | 1, idx: Uint16Array): number {
  const flip = bit ^ 1;
  let k = 0;
  for (let i = 0; i < len; i++) { idx[k] = i; k += mask[base + i] ^ flip; }
  return k;
}

/** Fills dst[base .. base + len) with the opposite of `bit`, then sets `bit` at the listed offsets. */
export function writeIndexed(dst: Uint8Array, base: number, len: number, idx: Uint16Array, count: number, bit: 0 | 1): void {
  dst.fill(bit ^ 1, base, base + len);
  for (let j = 0; j < count; j++) dst[base + idx[j]] = bit;
}
