/**
 * Recursive Gaussian filter of Deriche (1993): the Gaussian is approximated by two damped cosine/sine pairs,
 *   g(x) ≈ (a0 cos(w0 x/σ) + a1 sin(w0 x/σ)) e^{−b0 x/σ} + (c0 cos(w1 x/σ) + c1 sin(w1 x/σ)) e^{−b1 x/σ},  x ≥ 0,
 * whose z-transform is a fourth-order rational function, so a causal pass (x ≥ 0) plus an anti-causal pass
 * (x < 0) apply it at a cost independent of σ. From memory: the eight constants below; they give g(0) = 1.000
 * and g(σ) = 0.6067 (a Gaussian: 0.6065), and the tests check the filter against the closed-form response.
 * Ends: the passes start from steady state, as if the (possibly padded) signal stayed constant beyond them.
 */

const A0 = 1.68;
const A1 = 3.735;
const B0 = 1.783;
const W0 = 0.6318;
const C0 = -0.6803;
const C1 = -0.2598;
const B1 = 1.723;
const W1 = 1.997;

/** Number of coefficients per filter in the packed layout of `recursiveGaussianCoefficients`. */
export const RECURSIVE_COEFFICIENT_COUNT = 15;

/**
 * Packed coefficients for σ (in samples): [p0, p1, p2, p3, q1, q2, q3, q4, a1, a2, a3, a4, causal gain,
 * anti-causal gain, normalisation]. Causal: y⁺[n] = Σ p_k x[n−k] − Σ q_k y⁺[n−k]; anti-causal:
 * y⁻[n] = Σ a_k x[n+k] − Σ q_k y⁻[n+k]; result (y⁺ + y⁻) / normalisation.
 */
export function recursiveGaussianCoefficients(sigmaSteps: number, out: Float64Array, offset = 0): void {
  const r0 = Math.exp(-B0 / sigmaSteps);
  const r1 = Math.exp(-B1 / sigmaSteps);
  const cos0 = Math.cos(W0 / sigmaSteps);
  const sin0 = Math.sin(W0 / sigmaSteps);
  const cos1 = Math.cos(W1 / sigmaSteps);
  const sin1 = Math.sin(W1 / sigmaSteps);
  // Each damped pair: numerator N = n0 + n1 z⁻¹, denominator D = 1 + e1 z⁻¹ + e2 z⁻².
  const n00 = A0;
  const n01 = r0 * (A1 * sin0 - A0 * cos0);
  const e01 = -2 * r0 * cos0;
  const e02 = r0 * r0;
  const n10 = C0;
  const n11 = r1 * (C1 * sin1 - C0 * cos1);
  const e11 = -2 * r1 * cos1;
  const e12 = r1 * r1;
  // P = N0 D1 + N1 D0 (degree 3), Q = D0 D1 (degree 4).
  const p0 = n00 + n10;
  const p1 = n01 + n00 * e11 + n11 + n10 * e01;
  const p2 = n01 * e11 + n00 * e12 + n11 * e01 + n10 * e02;
  const p3 = n01 * e12 + n11 * e02;
  const q1 = e01 + e11;
  const q2 = e02 + e01 * e11 + e12;
  const q3 = e01 * e12 + e02 * e11;
  const q4 = e02 * e12;
  const causalGain = (p0 + p1 + p2 + p3) / (1 + q1 + q2 + q3 + q4);
  const anticausalGain = causalGain - p0;
  const values = [p0, p1, p2, p3, q1, q2, q3, q4, p1 - q1 * p0, p2 - q2 * p0, p3 - q3 * p0, -q4 * p0, causalGain, anticausalGain];
  for (let k = 0; k < values.length; k++) out[offset + k] = values[k];
  out[offset + 14] = causalGain + anticausalGain;
}

/**
 * Filters `count` samples of `source` (from `start`, stride 1) and writes samples n ∈ [keepFrom, keepFrom +
 * keepCount) to target[targetStart + n]; `scratch` holds ≥ count values. Padding a line and keeping only its
 * middle lets the caller choose how the signal continues beyond the ends.
 */
export function recursiveGaussianLine(
  source: ArrayLike<number>,
  start: number,
  count: number,
  c: Float64Array,
  scratch: Float64Array,
  target: Float64Array,
  targetStart: number,
  keepFrom = 0,
  keepCount = count,
): void {
  const [p0, p1, p2, p3, q1, q2, q3, q4, a1, a2, a3, a4, causalGain, anticausalGain, norm] = c;
  const first = source[start];
  let x1 = first;
  let x2 = first;
  let x3 = first;
  let y1 = first * causalGain;
  let y2 = y1;
  let y3 = y1;
  let y4 = y1;
  for (let n = 0; n < count; n++) {
    const x = source[start + n];
    const y = p0 * x + p1 * x1 + p2 * x2 + p3 * x3 - q1 * y1 - q2 * y2 - q3 * y3 - q4 * y4;
    scratch[n] = y;
    x3 = x2;
    x2 = x1;
    x1 = x;
    y4 = y3;
    y3 = y2;
    y2 = y1;
    y1 = y;
  }
  const last = source[start + count - 1];
  x1 = x2 = x3 = last;
  let x4 = last;
  y1 = y2 = y3 = y4 = last * anticausalGain;
  const keepTo = keepFrom + keepCount;
  for (let n = count - 1; n >= 0; n--) {
    const y = a1 * x1 + a2 * x2 + a3 * x3 + a4 * x4 - q1 * y1 - q2 * y2 - q3 * y3 - q4 * y4;
    if (n >= keepFrom && n < keepTo) target[targetStart + n] = (scratch[n] + y) / norm;
    x4 = x3;
    x3 = x2;
    x2 = x1;
    x1 = source[start + n];
    y4 = y3;
    y3 = y2;
    y2 = y1;
    y1 = y;
  }
}
