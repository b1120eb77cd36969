/**
 * The maths of a windowed (virtualised) list: rows of known heights stacked in one scroll box, of
 * which only those near the visible part are rendered. Kept free of the DOM so it can be tested.
 *
 * Offsets are prefix sums: offsets[k] is the top of row k and offsets[n] the height of all n rows.
 */

/** Tops of every row plus the total height, from each row's height in pixels. */
export function layoutRows(heights: ArrayLike<number>): Float64Array {
  const offsets = new Float64Array(heights.length + 1);
  for (let k = 0; k < heights.length; k++) offsets[k + 1] = offsets[k]! + Math.max(0, heights[k]!);
  return offsets;
}

/** Number of rows a layout holds. */
export function rowCount(offsets: Float64Array): number {
  return offsets.length - 1;
}

/** The row under a vertical position (binary search), clamped to the first and last row; -1 when empty. */
export function rowAt(offsets: Float64Array, y: number): number {
  const n = rowCount(offsets);
  if (n <= 0) return -1;
  let lo = 0;
  let hi = n - 1;
  // The last row whose top is at or above y.
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (offsets[mid]! <= y) lo = mid;
    else hi = mid - 1;
  }
  return lo;
}

export interface RowRange {
  /** First row to render. */
  start: number;
  /** One past the last row to render. */
  end: number;
}

/**
 * The rows to render for a scroll position: those that overlap the viewport, plus `overscan` rows on
 * each side so a quick scroll does not show blank space before React catches up.
 */
export function visibleRows(offsets: Float64Array, scrollTop: number, viewportHeight: number, overscan = 4): RowRange {
  const n = rowCount(offsets);
  if (n <= 0) return { start: 0, end: 0 };
  const first = rowAt(offsets, Math.max(0, scrollTop));
  // A row starting exactly at the bottom edge is not visible yet.
  const last = rowAt(offsets, Math.max(0, scrollTop + viewportHeight - 1e-6));
  return { start: Math.max(0, first - overscan), end: Math.min(n, last + 1 + overscan) };
}

/**
 * The scroll position that brings a row fully into view while moving as little as possible: the
 * same position when it is already visible, otherwise the row lands at the nearer edge, `margin`
 * pixels in (so the row after a selection stays in sight).
 */
export function scrollTopToReveal(offsets: Float64Array, index: number, scrollTop: number, viewportHeight: number, margin = 0): number {
  const n = rowCount(offsets);
  if (index < 0 || index >= n) return scrollTop;
  const top = offsets[index]!;
  const bottom = offsets[index + 1]!;
  const maxScroll = Math.max(0, offsets[n]! - viewportHeight);
  let next = scrollTop;
  if (top - margin < scrollTop) next = top - margin;
  else if (bottom + margin > scrollTop + viewportHeight) next = bottom + margin - viewportHeight;
  return Math.min(maxScroll, Math.max(0, next));
}
