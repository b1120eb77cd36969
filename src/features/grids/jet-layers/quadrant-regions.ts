/**
 * The quadrant shading's areas, as places to write on the map: each connected patch of one
 * quadrant and one divergence reading (favoured, ambiguous or neither) becomes a region with a
 * label point. The label point is the region's own cell nearest its centre of mass, so it lies
 * inside the region even when the region is bent.
 */

export type DivergenceReading = "favoured" | "ambiguous" | "neither";

export interface QuadrantRegion {
  /** `jet_quadrant` code of the region (never 0). */
  code: number;
  reading: DivergenceReading;
  /** Number of grid cells in the region. */
  cells: number;
  /** Label point (a cell of the region), grid indices. */
  i: number;
  j: number;
}

const READING_FAVOURED = 1;
const READING_AMBIGUOUS = 2;

/** Packs quadrant and reading into one key per cell: 0 outside every streak. */
function regionKey(quadrant: number, favoured: number, ambiguous: number): number {
  if (!(quadrant >= 1)) return 0;
  const reading = favoured === 1 ? READING_FAVOURED : ambiguous === 1 ? READING_AMBIGUOUS : 0;
  return Math.round(quadrant) * 4 + reading;
}

/**
 * Regions of at least `minCells` cells, by 4-neighbour connection (diagonal touches do not join two
 * patches, so the four quadrants meeting at the core stay apart). One pass with an explicit stack.
 */
export function quadrantRegions(
  quadrant: Float32Array,
  favoured: Float32Array,
  ambiguous: Float32Array,
  nx: number,
  ny: number,
  minCells = 1,
): QuadrantRegion[] {
  const n = nx * ny;
  if (quadrant.length !== n || favoured.length !== n || ambiguous.length !== n) {
    throw new RangeError(`quadrantRegions: fields of ${quadrant.length}, ${favoured.length} and ${ambiguous.length} values for a ${nx} × ${ny} grid`);
  }
  const keys = new Int32Array(n);
  for (let k = 0; k < n; k++) keys[k] = regionKey(quadrant[k]!, favoured[k]!, ambiguous[k]!);
  const seen = new Uint8Array(n);
  // Cells of the region being filled, in the order they were reached (also serves as the stack).
  const members = new Int32Array(n);
  const regions: QuadrantRegion[] = [];

  for (let start = 0; start < n; start++) {
    const key = keys[start]!;
    if (key === 0 || seen[start]) continue;
    let count = 0;
    let next = 0;
    members[count++] = start;
    seen[start] = 1;
    let sumI = 0;
    let sumJ = 0;
    while (next < count) {
      const k = members[next++]!;
      const i = k % nx;
      const j = (k - i) / nx;
      sumI += i;
      sumJ += j;
      if (i > 0 && !seen[k - 1] && keys[k - 1] === key) (seen[k - 1] = 1), (members[count++] = k - 1);
      if (i < nx - 1 && !seen[k + 1] && keys[k + 1] === key) (seen[k + 1] = 1), (members[count++] = k + 1);
      if (j > 0 && !seen[k - nx] && keys[k - nx] === key) (seen[k - nx] = 1), (members[count++] = k - nx);
      if (j < ny - 1 && !seen[k + nx] && keys[k + nx] === key) (seen[k + nx] = 1), (members[count++] = k + nx);
    }
    if (count < minCells) continue;
    const centreI = sumI / count;
    const centreJ = sumJ / count;
    let best = start;
    let bestDistance = Infinity;
    for (let m = 0; m < count; m++) {
      const k = members[m]!;
      const i = k % nx;
      const j = (k - i) / nx;
      const distance = (i - centreI) ** 2 + (j - centreJ) ** 2;
      if (distance < bestDistance) [best, bestDistance] = [k, distance];
    }
    const reading = key % 4;
    regions.push({
      code: (key - reading) / 4,
      reading: reading === READING_FAVOURED ? "favoured" : reading === READING_AMBIGUOUS ? "ambiguous" : "neither",
      cells: count,
      i: best % nx,
      j: Math.floor(best / nx),
    });
  }
  return regions;
}
