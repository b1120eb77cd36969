/**
 * Sample quantile by linear interpolation between order statistics: definition 7 of Hyndman and
 * Fan (1996), "Sample quantiles in statistical packages", The American Statistician 50, 361–365
 * (the default of R and NumPy). With sorted values x₁ ≤ … ≤ xₙ and h = (n − 1)·p + 1, the quantile
 * is x⌊h⌋ + (h − ⌊h⌋)(x⌊h⌋₊₁ − x⌊h⌋). Null for an empty sample.
 *
 * `sorted` must already be in ascending order (sorting is the caller's, done once for several p).
 */
export function quantileOfSorted(sorted: ArrayLike<number>, p: number): number | null {
  const n = sorted.length;
  if (n === 0) return null;
  if (!(p >= 0 && p <= 1)) throw new RangeError(`quantile probability must lie in [0, 1], got ${p}`);
  const h = (n - 1) * p;
  const low = Math.floor(h);
  const high = Math.min(low + 1, n - 1);
  return sorted[low]! + (h - low) * (sorted[high]! - sorted[low]!);
}

/** Ascending copy as a Float64Array (numeric order, unlike Array.prototype.sort's default). */
export function sortedAscending(values: readonly number[]): Float64Array {
  return Float64Array.from(values).sort();
}

/** Median and 90th percentile of a sample (null when empty). */
export function medianAndP90(values: readonly number[]): { median: number | null; p90: number | null } {
  const sorted = sortedAscending(values);
  return { median: quantileOfSorted(sorted, 0.5), p90: quantileOfSorted(sorted, 0.9) };
}
