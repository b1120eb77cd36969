/**
 * Column diagnostics throughput on an invented 300 × 300 grid with 40 isobaric levels: columns per second for
 * the full column field set on one thread and on the worker pool, and peak memory (rss sampled, heapUsed).
 * Optional row: NCL's wrf_cape_2d on the same grid, when `ncl` is on PATH (never a dependency).
 */
import { spawnSync } from "node:child_process";
import os from "node:os";
import { diagnoseColumnGrid, type ColumnGrid, type ColumnOptions } from "../../shared/meteo/index.ts";
import { ColumnDiagnosticsPool, allocateSharedFloat32 } from "../../server/diagnostics/column-pool.ts";
import { emptyOutput, syntheticGrid } from "../helpers/synthetic-column-grid.ts";

const SIDE = Number(process.env.BENCH_GRID_SIDE ?? 300);
const LEVELS = 40;

class MemorySampler {
  peakRss = 0;
  peakHeap = 0;
  private timer: NodeJS.Timeout | null = null;
  start(): void {
    this.sample();
    this.timer = setInterval(() => this.sample(), 20);
  }
  sample(): void {
    const usage = process.memoryUsage();
    this.peakRss = Math.max(this.peakRss, usage.rss);
    this.peakHeap = Math.max(this.peakHeap, usage.heapUsed);
  }
  stop(): void {
    if (this.timer) clearInterval(this.timer);
    this.sample();
  }
}

const mb = (bytes: number) => `${(bytes / 2 ** 20).toFixed(0)} MB`;
const rate = (columns: number, ms: number) => Math.round(columns / (ms / 1000)).toLocaleString("en-US");

/** Wall time and CPU time (all threads of this process) of one call, in ms. */
async function timed(work: () => unknown): Promise<{ wall: number; cpu: number }> {
  const cpu0 = process.cpuUsage();
  const t0 = performance.now();
  await work();
  const wall = performance.now() - t0;
  const cpu = process.cpuUsage(cpu0);
  return { wall, cpu: (cpu.user + cpu.system) / 1000 };
}

function describe(label: string, columns: number, time: { wall: number; cpu: number }, threads = 1): string {
  return `${label}: ${rate(columns, time.wall)} columns/s wall (${(time.wall / 1000).toFixed(2)} s), ` +
    `${rate(columns, time.cpu)} columns per CPU-second${threads > 1 ? " (all threads)" : ""}`;
}

async function singleThread(grid: ColumnGrid, options: ColumnOptions, points: number): Promise<{ wall: number; cpu: number }> {
  const output = emptyOutput(grid);
  // Warm-up on a slice so the JIT has compiled the hot path before timing.
  diagnoseColumnGrid(grid, output, options, { start: 0, end: Math.min(points, 2000) });
  return timed(() => diagnoseColumnGrid(grid, output, options, { start: 0, end: points }));
}

function nclAvailable(): boolean {
  return spawnSync("ncl", ["-V"], { encoding: "utf8" }).status === 0;
}

export async function run(): Promise<void> {
  const memory = new MemorySampler();
  memory.start();
  const n = SIDE * SIDE;
  const t0 = performance.now();
  const grid = syntheticGrid({ pointCount: n, levelCount: LEVELS, seed: 2024, makeArray: allocateSharedFloat32 });
  console.log(`grid ${SIDE} × ${SIDE} × ${LEVELS} levels built in ${((performance.now() - t0) / 1000).toFixed(1)} s`);

  // The machine is shared: CPU-second rates are the per-core figure; wall rates include waiting for a core.
  const referencePoints = Math.min(n, 10000);
  const reference = await singleThread(grid, { pseudoAdiabat: "reference" }, referencePoints);
  console.log(describe(`one thread, RK4 pseudo-adiabats (${referencePoints} columns)`, referencePoints, reference));
  const single = await singleThread(grid, { pseudoAdiabat: "table" }, n);
  console.log(describe("one thread, table pseudo-adiabats (full set)", n, single));

  const threads = os.availableParallelism();
  const pool = new ColumnDiagnosticsPool({ threads });
  try {
    await pool.diagnose(syntheticGrid({ pointCount: 2000, levelCount: LEVELS, seed: 1, makeArray: allocateSharedFloat32 })); // start + warm workers
    const pooled = await timed(() => pool.diagnose(grid));
    console.log(describe(`pool, ${threads} threads`, n, pooled, threads));
  } finally {
    await pool.destroy();
  }
  memory.stop();
  console.log(`peak rss ${mb(memory.peakRss)}, peak heapUsed ${mb(memory.peakHeap)} (main thread; input grid ${mb(n * LEVELS * 5 * 4)})`);

  if (!nclAvailable()) {
    console.log("ncl not on PATH: skipping the NCL wrf_cape_2d comparison row");
    return;
  }
  console.log("ncl found, but the comparison script is not written yet: skipping the NCL row");
}
