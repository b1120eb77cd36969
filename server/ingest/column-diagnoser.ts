import { setImmediate as yieldToEventLoop } from "node:timers/promises";
import { allocateColumnGridOutput } from "../../shared/meteo/column/column-grid.ts";
import { diagnoseColumnGrid } from "../../shared/meteo/column/diagnose-grid.ts";
import type { ColumnOptions } from "../../shared/meteo/column/column-options.ts";
import type { ColumnDiagnoser } from "./frame-processor.ts";
import type { ColumnDiagnosticsPool } from "../diagnostics/column-pool.ts";

/**
 * Column diagnostics on the main thread in slices, yielding between slices so the server keeps
 * answering requests. Used when no worker pool is configured (tests, tiny grids).
 */
export function inProcessColumnDiagnoser(options?: ColumnOptions, sliceColumns = 2000): ColumnDiagnoser {
  return async (frame, onProgress) => {
    const n = frame.grid.pointCount;
    const output = allocateColumnGridOutput(n);
    for (let start = 0; start < n; start += sliceColumns) {
      const end = Math.min(n, start + sliceColumns);
      diagnoseColumnGrid(frame.grid, output, options, { start, end });
      onProgress(end / n);
      await yieldToEventLoop();
    }
    return output;
  };
}

/** Column diagnostics on the worker-thread pool: every core, the server's own thread stays free. */
export function poolColumnDiagnoser(pool: ColumnDiagnosticsPool, options?: ColumnOptions): ColumnDiagnoser {
  return (frame, onProgress) => pool.diagnose(frame.grid, options, onProgress);
}
