/**
 * Moves labels stacked along y apart so none overlaps: walking from the bottom of the figure up, each label sits
 * at least `minGap` px above the one below it. Returns the new y of each label in the order given.
 */
export function spreadUpward(ys: readonly number[], minGap: number): number[] {
  const order = ys.map((y, index) => ({ y, index })).sort((a, b) => b.y - a.y);
  const out = new Array<number>(ys.length);
  let previous = Number.POSITIVE_INFINITY;
  for (const { y, index } of order) {
    const placed = Math.min(y, previous - minGap);
    out[index] = placed;
    previous = placed;
  }
  return out;
}
