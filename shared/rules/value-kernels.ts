/**
 * Loops that compute numbers over one block of points into a Float64 scratch buffer. Intermediate values
 * are kept in double precision so the result matches scalar JavaScript arithmetic bit for bit (the
 * operations mirror `applyArithmetic` and `applyNumericFunction`). NaN flows through untouched.
 */
import type { ArithmeticOperator, NumericFunctionName } from "./rule-ast.ts";
import type { Values } from "./mask-kernels.ts";

export function arithmeticArrays(op: ArithmeticOperator, out: Float64Array, a: Values, aBase: number, b: Values, bBase: number, len: number): void {
  switch (op) {
    case "+":
      for (let i = 0; i < len; i++) out[i] = a[aBase + i] + b[bBase + i];
      break;
    case "-":
      for (let i = 0; i < len; i++) out[i] = a[aBase + i] - b[bBase + i];
      break;
    case "*":
      for (let i = 0; i < len; i++) out[i] = a[aBase + i] * b[bBase + i];
      break;
    case "/":
      for (let i = 0; i < len; i++) out[i] = a[aBase + i] / b[bBase + i];
      break;
    case "^":
      for (let i = 0; i < len; i++) out[i] = Math.pow(a[aBase + i], b[bBase + i]);
      break;
  }
}

/** One-argument functions and unary minus. `kt` never reaches here: its argument is constant and folded. */
export function unaryFunction(name: NumericFunctionName | "negate", out: Float64Array, a: Values, aBase: number, len: number): void {
  switch (name) {
    case "negate":
      for (let i = 0; i < len; i++) out[i] = -a[aBase + i];
      break;
    case "abs":
      for (let i = 0; i < len; i++) out[i] = Math.abs(a[aBase + i]);
      break;
    case "sqrt":
      for (let i = 0; i < len; i++) out[i] = Math.sqrt(a[aBase + i]);
      break;
    default:
      throw new Error(`${name} is not a one-argument function`);
  }
}

/** min, max (applied pairwise for more arguments, as Math.min/max do) and hypot. */
export function binaryFunction(name: NumericFunctionName, out: Float64Array, a: Values, aBase: number, b: Values, bBase: number, len: number): void {
  switch (name) {
    case "min":
      for (let i = 0; i < len; i++) out[i] = Math.min(a[aBase + i], b[bBase + i]);
      break;
    case "max":
      for (let i = 0; i < len; i++) out[i] = Math.max(a[aBase + i], b[bBase + i]);
      break;
    case "hypot":
      for (let i = 0; i < len; i++) {
        const u = a[aBase + i];
        const v = b[bBase + i];
        out[i] = Math.sqrt(u * u + v * v); // same formula as vectorLength()
      }
      break;
    default:
      throw new Error(`${name} is not a two-argument function`);
  }
}

/*
 * The same operations at selected offsets only (idx[0 .. count), offsets within the block). Results go
 * to out[i] at the same offset i, so readers index them exactly as after a dense run.
 */

export function arithmeticArraysAt(op: ArithmeticOperator, out: Float64Array, a: Values, aBase: number, b: Values, bBase: number, idx: Uint16Array, count: number): void {
  switch (op) {
    case "+":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = a[aBase + i] + b[bBase + i]; }
      break;
    case "-":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = a[aBase + i] - b[bBase + i]; }
      break;
    case "*":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = a[aBase + i] * b[bBase + i]; }
      break;
    case "/":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = a[aBase + i] / b[bBase + i]; }
      break;
    case "^":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = Math.pow(a[aBase + i], b[bBase + i]); }
      break;
  }
}

export function unaryFunctionAt(name: NumericFunctionName | "negate", out: Float64Array, a: Values, aBase: number, idx: Uint16Array, count: number): void {
  switch (name) {
    case "negate":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = -a[aBase + i]; }
      break;
    case "abs":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = Math.abs(a[aBase + i]); }
      break;
    case "sqrt":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = Math.sqrt(a[aBase + i]); }
      break;
    default:
      throw new Error(`${name} is not a one-argument function`);
  }
}

export function binaryFunctionAt(name: NumericFunctionName, out: Float64Array, a: Values, aBase: number, b: Values, bBase: number, idx: Uint16Array, count: number): void {
  switch (name) {
    case "min":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = Math.min(a[aBase + i], b[bBase + i]); }
      break;
    case "max":
      for (let j = 0; j < count; j++) { const i = idx[j]; out[i] = Math.max(a[aBase + i], b[bBase + i]); }
      break;
    case "hypot":
      for (let j = 0; j < count; j++) {
        const i = idx[j];
        const u = a[aBase + i];
        const v = b[bBase + i];
        out[i] = Math.sqrt(u * u + v * v);
      }
      break;
    default:
      throw new Error(`${name} is not a two-argument function`);
  }
}
