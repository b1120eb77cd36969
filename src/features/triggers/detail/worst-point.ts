/**
 * The grid point with the largest value of a field inside a 0/1 mask (the matched area), as the
 * row-major index j * nx + i; -1 when the mask holds no point with a value. Ties keep the first
 * point met. One pass, no allocation.
 */
export function maxInsideMask(values: Float32Array, mask: Uint8Array): number {
  if (values.length !== mask.length) throw new Error(`maxInsideMask: ${values.length} values but ${mask.length} mask points`);
  let best = -1;
  let bestValue = Number.NEGATIVE_INFINITY;
  for (let k = 0; k < values.length; k++) {
    if (mask[k] === 0) continue;
    const value = values[k]!;
    // NaN fails the comparison, so points without a value are never chosen.
    if (value > bestValue) {
      bestValue = value;
      best = k;
    }
  }
  return best;
}

/** Finite minimum and maximum of a field (null when it has no value at all), for its colour scale. */
export function finiteRange(values: Float32Array): { min: number | null; max: number | null } {
  let min = Number.POSITIVE_INFINITY;
  let max = Number.NEGATIVE_INFINITY;
  for (let k = 0; k < values.length; k++) {
    const value = values[k]!;
    if (value < min) min = value;
    if (value > max) max = value;
  }
  return min <= max ? { min, max } : { min: null, max: null };
}
