/**
 * Jet-streak cores: local maxima of the smoothed speed inside the 8-connected regions where S ≥ coreSpeed.
 *
 * Cells are visited from fastest to slowest and grown into regions with a union–find (the usual way to
 * measure the prominence of peaks). When two regions meet, the meeting cell is the saddle between their
 * peaks; the lower peak stays a core only if it stands at least `coreProminence` above that saddle and
 * lies at least `coreSeparation` from the higher peak. Regions of fewer than `minCoreCells` cells are noise.
 */
import type { HorizontalGrid } from "./horizontal-grid.ts";
import type { JetSettings } from "./jet-settings.ts";
import type { JetCore } from "./jet-types.ts";
import { GridScratch } from "./grid-scratch.ts";

type CoreSettings = Pick<JetSettings, "coreSpeed" | "coreSeparation" | "coreProminence" | "minCoreCells">;

export function findJetCores(grid: HorizontalGrid, speed: Float32Array, settings: CoreSettings, scratch: GridScratch = new GridScratch()): JetCore[] {
  const { nx, ny } = grid;
  const cells = fastCellsFastestFirst(speed, settings.coreSpeed);
  const parent = scratch.int32("coreParent", nx * ny).fill(-1);
  // For a region root: its highest cell (the region's peak).
  const peak = scratch.int32("corePeak", nx * ny);
  const survivors: number[] = [];
  const roots = new Int32Array(8);

  for (let c = 0; c < cells.length; c++) {
    const cell = cells[c];
    const i = cell % nx;
    const j = (cell - i) / nx;
    let rootCount = 0;
    for (let dj = -1; dj <= 1; dj++) {
      const jj = j + dj;
      if (jj < 0 || jj >= ny) continue;
      for (let di = -1; di <= 1; di++) {
        const ii = i + di;
        if ((di === 0 && dj === 0) || ii < 0 || ii >= nx) continue;
        const neighbour = jj * nx + ii;
        if (parent[neighbour] < 0) continue;
        const root = findRoot(parent, neighbour);
        let seen = false;
        for (let r = 0; r < rootCount; r++) if (roots[r] === root) seen = true;
        if (!seen) roots[rootCount++] = root;
      }
    }
    if (rootCount === 0) {
      parent[cell] = cell;
      peak[cell] = cell;
      continue;
    }
    // Join the region with the highest peak; every other region meets it at this saddle.
    let main = roots[0];
    for (let r = 1; r < rootCount; r++) if (speed[peak[roots[r]]] > speed[peak[main]]) main = roots[r];
    parent[cell] = main;
    for (let r = 0; r < rootCount; r++) {
      const other = roots[r];
      if (other === main) continue;
      const lowerPeak = peak[other];
      const standsOut = speed[lowerPeak] - speed[cell] >= settings.coreProminence;
      const farEnough = physicalDistance(grid, lowerPeak, peak[main]) >= settings.coreSeparation;
      if (standsOut && farEnough) survivors.push(lowerPeak);
      parent[other] = main;
    }
  }

  const candidates: number[] = [];
  for (let c = 0; c < cells.length; c++) if (parent[cells[c]] === cells[c]) candidates.push(peak[cells[c]]);
  for (const p of survivors) candidates.push(p);
  // Region sizes, indexed by the root cell (only fast cells are ever roots); the peak array is free now.
  const size = peak;
  for (let c = 0; c < cells.length; c++) size[cells[c]] = 0;
  for (let c = 0; c < cells.length; c++) size[findRoot(parent, cells[c])]++;

  const kept: number[] = [];
  candidates.sort((a, b) => speed[b] - speed[a] || a - b);
  for (const p of candidates) {
    if (size[findRoot(parent, p)] < settings.minCoreCells) continue;
    // A last guard: no two cores closer than the separation, whichever regions they came from.
    if (kept.some((q) => physicalDistance(grid, p, q) < settings.coreSeparation)) continue;
    kept.push(p);
  }
  return kept.map((p) => refineCore(grid, speed, p));
}

/** Indices of cells with S ≥ threshold, sorted by decreasing speed (ties by index, for repeatable output). */
function fastCellsFastestFirst(speed: Float32Array, threshold: number): Int32Array {
  let count = 0;
  for (let k = 0; k < speed.length; k++) if (speed[k] >= threshold) count++;
  const cells = new Int32Array(count);
  let next = 0;
  for (let k = 0; k < speed.length; k++) if (speed[k] >= threshold) cells[next++] = k;
  return cells.sort((a, b) => speed[b] - speed[a] || a - b);
}

function findRoot(parent: Int32Array, cell: number): number {
  let root = cell;
  while (parent[root] !== root) root = parent[root];
  // Path compression keeps later look-ups short.
  let walk = cell;
  while (parent[walk] !== root) {
    const next = parent[walk];
    parent[walk] = root;
    walk = next;
  }
  return root;
}

/** Physical distance (m) between two grid points, using the mean scale factors of the pair. */
function physicalDistance(grid: HorizontalGrid, a: number, b: number): number {
  const { nx, hx, hy } = grid;
  const ai = a % nx;
  const bi = b % nx;
  const dx = (bi - ai) * 0.5 * (hx[a] + hx[b]);
  const dy = ((b - bi) / nx - (a - ai) / nx) * 0.5 * (hy[a] + hy[b]);
  return Math.hypot(dx, dy);
}

/** Sub-grid position of a maximum from a parabola through it and its two neighbours along i and along j. */
function refineCore(grid: HorizontalGrid, speed: Float32Array, index: number): JetCore {
  const { nx, ny } = grid;
  const i = index % nx;
  const j = (index - i) / nx;
  const offsetI = i > 0 && i < nx - 1 ? parabolaPeak(speed[index - 1], speed[index], speed[index + 1]) : 0;
  const offsetJ = j > 0 && j < ny - 1 ? parabolaPeak(speed[index - nx], speed[index], speed[index + nx]) : 0;
  return { index, i: i + offsetI, j: j + offsetJ, speed: speed[index] };
}

/** Offset (in steps, within ±0.5) of the vertex of the parabola through three equally spaced values. */
export function parabolaPeak(before: number, centre: number, after: number): number {
  const curvature = before - 2 * centre + after;
  if (!(curvature < 0)) return 0;
  const offset = (0.5 * (before - after)) / curvature;
  return Math.max(-0.5, Math.min(0.5, offset));
}
