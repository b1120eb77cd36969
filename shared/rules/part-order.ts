/**
 * Learns which parts of an and/or chain settle the most points, so they run first. The outcome does not
 * depend on the order (met-where-all-met and met-where-any-met are symmetric, missing data included),
 * only the work does: when the rarest condition goes first, the others only look at the few points left.
 *
 * Each part's "pass rate" is the share of the points it examined that stayed in play afterwards. Rates
 * are re-ranked every few blocks and then halved, so the order follows the weather across the grid.
 */

/** Blocks between re-rankings: often enough to follow regions, rarely enough to cost nothing. */
const BLOCKS_PER_RANKING = 8;

export class PartOrder {
  /** Part indices, the order to run them in. */
  readonly order: Uint8Array;
  private readonly examined: Float64Array;
  private readonly passed: Float64Array;
  private blocks = 0;

  constructor(partCount: number) {
    if (partCount > 255) throw new Error("a chain has at most 255 parts");
    this.order = Uint8Array.from({ length: partCount }, (_, i) => i);
    this.examined = new Float64Array(partCount);
    this.passed = new Float64Array(partCount);
  }

  /** Call once per block, before running the parts. */
  startBlock(): void {
    if (++this.blocks < BLOCKS_PER_RANKING) return;
    this.blocks = 0;
    this.rank();
  }

  note(part: number, examined: number, passed: number): void {
    this.examined[part] += examined;
    this.passed[part] += passed;
  }

  private rank(): void {
    const { order, examined, passed } = this;
    // Insertion sort: chains are short, and it allocates nothing.
    for (let a = 1; a < order.length; a++) {
      const part = order[a];
      const rate = passRate(passed[part], examined[part]);
      let b = a - 1;
      while (b >= 0 && passRate(passed[order[b]], examined[order[b]]) > rate) {
        order[b + 1] = order[b];
        b--;
      }
      order[b + 1] = part;
    }
    for (let p = 0; p < order.length; p++) {
      examined[p] *= 0.5;
      passed[p] *= 0.5;
    }
  }
}

/** With one imagined pass and one imagined stop added, an unseen part counts as 0.5, not 0/0. */
function passRate(passed: number, examined: number): number {
  return (passed + 1) / (examined + 2);
}
