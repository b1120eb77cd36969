import os from "node:os";
import { Piscina } from "piscina";
import { allocateColumnGridOutput, validateColumnGrid, type ColumnGrid, type ColumnGridOutput, type ColumnOptions, type HumidityField } from "../../shared/meteo/index.ts";
import type { ColumnTask } from "./column-task.ts";

/**
 * Runs the column library over a grid on worker threads (piscina), splitting the grid into point ranges.
 *
 * Memory choice: SharedArrayBuffer rather than transfer. Every worker reads the same 3-D inputs and writes
 * disjoint point ranges of the same outputs; with shared memory nothing is copied per task and the results land
 * in place, whereas transferring would mean slicing every field per chunk and stitching the outputs back.
 * Inputs not already on SharedArrayBuffers are copied once (see shareColumnGrid to avoid that copy).
 * Results are bit-identical to a single-thread diagnoseColumnGrid call: each column is computed independently
 * by the same code.
 */
export interface ColumnPoolOptions {
  /** Worker threads; default: available cores. */
  threads?: number;
  /** Point ranges per thread (more gives better balance between cheap stable and costly buoyant columns). */
  chunksPerThread?: number;
}

export function allocateSharedFloat32(length: number): Float32Array {
  return new Float32Array(new SharedArrayBuffer(length * Float32Array.BYTES_PER_ELEMENT));
}

function shared(array: Float32Array): Float32Array {
  if (array.buffer instanceof SharedArrayBuffer) return array;
  const copy = allocateSharedFloat32(array.length);
  copy.set(array);
  return copy;
}

function sharedHumidity(field: HumidityField): HumidityField {
  return { kind: field.kind, values: shared(field.values) };
}

/** The same grid with every array on a SharedArrayBuffer (arrays already shared are reused, not copied). */
export function shareColumnGrid(grid: ColumnGrid): ColumnGrid {
  const s = grid.surface;
  return {
    pointCount: grid.pointCount,
    levelPressures: Float64Array.from(grid.levelPressures),
    temperature: shared(grid.temperature),
    humidity: sharedHumidity(grid.humidity),
    height: shared(grid.height),
    u: shared(grid.u),
    v: shared(grid.v),
    surface: {
      pressure: shared(s.pressure),
      temperature: shared(s.temperature),
      humidity: sharedHumidity(s.humidity),
      u: shared(s.u),
      v: shared(s.v),
      height: shared(s.height),
    },
  };
}

export class ColumnDiagnosticsPool {
  private readonly pool: Piscina<ColumnTask, number>;
  readonly threads: number;
  private readonly chunksPerThread: number;

  constructor(options: ColumnPoolOptions = {}) {
    this.threads = Math.max(1, options.threads ?? os.availableParallelism());
    this.chunksPerThread = Math.max(1, options.chunksPerThread ?? 4);
    this.pool = new Piscina<ColumnTask, number>({
      filename: new URL("./column-worker.ts", import.meta.url).href,
      execArgv: ["--import", "tsx"],
      minThreads: this.threads,
      maxThreads: this.threads,
    });
  }

  /** Every column field for every point of the grid; outputs are Float32Arrays on SharedArrayBuffers. */
  async diagnose(grid: ColumnGrid, options: ColumnOptions = {}, onProgress?: (fraction: number) => void): Promise<ColumnGridOutput> {
    validateColumnGrid(grid);
    const input = shareColumnGrid(grid);
    const output = allocateColumnGridOutput(grid.pointCount, allocateSharedFloat32);
    const n = grid.pointCount;
    const chunks = Math.min(n, this.threads * this.chunksPerThread);
    const tasks: Promise<number>[] = [];
    for (let c = 0; c < chunks; c++) {
      const start = Math.floor((c * n) / chunks);
      const end = Math.floor(((c + 1) * n) / chunks);
      if (end > start) tasks.push(this.pool.run({ grid: input, output, options, start, end }));
    }
    let finished = 0;
    if (onProgress) for (const task of tasks) void task.then((count) => onProgress((finished += count) / n), () => {});
    const done = (await Promise.all(tasks)).reduce((a, b) => a + b, 0);
    if (done !== n) throw new Error(`column pool computed ${done} of ${n} columns`);
    return output;
  }

  async destroy(): Promise<void> {
    await this.pool.destroy();
  }
}
